// Coder copies: what a copy holds (checked in the SQLite file itself), merges in every order,
// repeated merges, refused copies, conflicts and their resolution, all-or-nothing under faults.
// The merge rules are a three-way merge against a common base (common practice in version
// control, e.g. diff3); the expected values below follow from the edits each test makes.
#include "core/project/article_status_edit.h"
#include "core/project/testing/project_database.h"
#include "core/store/schema.h"
#include "tests/project/copies_fixture.h"
#include "tests/project/copy_files.h"
#include "tests/support/db_dump.h"

#include <QFile>
#include <QJsonDocument>
#include <QThread>

#include <sqlite3.h>

#include <algorithm>
#include <functional>
#include <map>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// The edits each coder makes in their copy, through the real edits and Project::apply.
void editC01(const QString &path)
{
    Project p = openProject(path);
    const CoderId me = coderIn(p, QStringLiteral("C01"));
    const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
    const ArticleId f2 = articleIn(p, QStringLiteral("f2"));
    const QString t1 = textOf(p, f1);
    AddAnnotationEdit add(f1, me,
        span(FramingFunction::Evaluation, t1, QStringLiteral("It is a disgrace."),
            {{QStringLiteral("polarity"), QStringLiteral("negative")}}),
        Phase::Reliability);
    REQUIRE(p.apply(add));
    Annotation cause = onlyAnnotation(p, f1, me, FramingFunction::Cause);
    AnnotationContent changed = cause.content;
    changed.attributes = {{QStringLiteral("actor"), QStringLiteral("the budget office")}};
    changed.note = QStringLiteral("actor named in the second sentence");
    ChangeAnnotationEdit change(cause.id, changed, me);
    REQUIRE(p.apply(change));
    DeleteAnnotationEdit del(onlyAnnotation(p, f2, me, FramingFunction::Evaluation).id, me);
    REQUIRE(p.apply(del));
    LinkAnnotationsEdit link(add.annotationId(), cause.id, QStringLiteral("judges"), me);
    REQUIRE(p.apply(link));
    SetJudgementEdit answer(
        f1, me, QStringLiteral("dominant_function"), QStringLiteral("cause"), Phase::Reliability);
    REQUIRE(p.apply(answer));
    SetArticleStatusEdit done(f1, me, QStringLiteral("done"));
    REQUIRE(p.apply(done));
    REQUIRE(p.addCodingTime(f1, me, 120));
}

void editC02(const QString &path)
{
    Project p = openProject(path);
    const CoderId me = coderIn(p, QStringLiteral("C02"));
    const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
    const ArticleId f3 = articleIn(p, QStringLiteral("f3"));
    DeleteAnnotationEdit del(onlyAnnotation(p, f1, me, FramingFunction::Remedy).id, me);
    REQUIRE(p.apply(del));
    AddAnnotationEdit add(f3, me,
        span(FramingFunction::Cause, textOf(p, f3),
            QStringLiteral("Shopkeepers fear the loss of trade."),
            {{QStringLiteral("actor"), QStringLiteral("shopkeepers")}}),
        Phase::Reliability);
    REQUIRE(p.apply(add));
    Annotation eval = onlyAnnotation(p, f3, me, FramingFunction::Evaluation);
    AnnotationContent c = eval.content;
    c.confidence = 0.75;
    c.attributes = {{QStringLiteral("polarity"), QStringLiteral("negative")}};
    ChangeAnnotationEdit change(eval.id, c, me);
    REQUIRE(p.apply(change));
    SetJudgementEdit answer(f1, me, QStringLiteral("dominant_function"),
        QStringLiteral("evaluation"), Phase::Reliability);
    REQUIRE(p.apply(answer));
    SetArticleStatusEdit started(f3, me, QStringLiteral("started"));
    REQUIRE(p.apply(started));
    REQUIRE(p.addCodingTime(f3, me, 45));
}

void editC03(const QString &path)
{
    Project p = openProject(path);
    const CoderId me = coderIn(p, QStringLiteral("C03"));
    const ArticleId f2 = articleIn(p, QStringLiteral("f2"));
    const ArticleId f3 = articleIn(p, QStringLiteral("f3"));
    AddAnnotationEdit keep(f2, me,
        span(FramingFunction::Remedy, textOf(p, f2), QStringLiteral("De gemeente moet praten."),
            {{QStringLiteral("explicitness"), QStringLiteral("explicit")}}),
        Phase::Reliability);
    REQUIRE(p.apply(keep));
    AddAnnotationEdit drop(f2, me,
        span(FramingFunction::Evaluation, textOf(p, f2), QStringLiteral("Bewoners zijn boos.")),
        Phase::Reliability);
    REQUIRE(p.apply(drop));
    DeleteAnnotationEdit del(drop.annotationId(), me);
    REQUIRE(p.apply(del));
    Annotation remedy = onlyAnnotation(p, f3, me, FramingFunction::Remedy);
    AnnotationContent c = remedy.content;
    c.attributes = {{QStringLiteral("explicitness"), QStringLiteral("explicit")}};
    ChangeAnnotationEdit change(remedy.id, c, me);
    REQUIRE(p.apply(change));
    SetJudgementEdit answer(
        f2, me, QStringLiteral("dominant_function"), QStringLiteral("problem"), Phase::Reliability);
    REQUIRE(p.apply(answer));
    REQUIRE(p.addCodingTime(f2, me, 30));
}

// Every text cell of every table (FTS shadow tables included) of the SQLite file at `path`,
// read with the SQLite C API directly, not through Fourfold.
QStringList everyCell(const QString &path)
{
    sqlite3 *db = nullptr;
    REQUIRE(sqlite3_open_v2(path.toUtf8().constData(), &db, SQLITE_OPEN_READONLY, nullptr)
        == SQLITE_OK);
    QStringList tables;
    sqlite3_stmt *s = nullptr;
    REQUIRE(sqlite3_prepare_v2(db,
                "SELECT name FROM sqlite_schema WHERE type = 'table' AND sql NOT LIKE "
                "'CREATE VIRTUAL%'",
                -1, &s, nullptr)
        == SQLITE_OK);
    while (sqlite3_step(s) == SQLITE_ROW)
        tables << QString::fromUtf8(reinterpret_cast<const char *>(sqlite3_column_text(s, 0)));
    sqlite3_finalize(s);
    QStringList cells;
    for (const QString &t : tables) {
        const QByteArray sql = QStringLiteral("SELECT * FROM \"%1\"").arg(t).toUtf8();
        REQUIRE(sqlite3_prepare_v2(db, sql.constData(), -1, &s, nullptr) == SQLITE_OK);
        while (sqlite3_step(s) == SQLITE_ROW)
            for (int c = 0; c < sqlite3_column_count(s); ++c) {
                const auto *bytes = static_cast<const char *>(sqlite3_column_blob(s, c));
                cells << t + QLatin1Char(':')
                        + QString::fromUtf8(bytes, sqlite3_column_bytes(s, c));
            }
        sqlite3_finalize(s);
    }
    sqlite3_close(db);
    return cells;
}

} // namespace

TEST_CASE("a coder copy holds that coder's articles and work and nobody else's")
{
    CopiesFixture f;
    const QStringList others = annotationUuidsOf(databaseForTesting(*f.main), QStringLiteral("C02"))
        + annotationUuidsOf(databaseForTesting(*f.main), QStringLiteral("C03"));
    REQUIRE(others.size() == 5);
    const QStringList mine = annotationUuidsOf(databaseForTesting(*f.main), QStringLiteral("C01"));
    REQUIRE(mine.size() == 3);
    auto coders = f.main->coders();
    REQUIRE(coders);
    const QString path = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));

    // Table by table, with the SQLite C API.
    CHECK(count(path, "SELECT count(*) FROM coder") == 1);
    CHECK(count(path, "SELECT count(*) FROM coder WHERE pseudonym = 'C01'") == 1);
    CHECK(count(path, "SELECT count(*) FROM article") == 2);
    CHECK(count(path, "SELECT count(*) FROM article WHERE external_id = 'f3'") == 0);
    CHECK(count(path, "SELECT count(*) FROM annotation") == 3);
    CHECK(count(path,
              "SELECT count(*) FROM annotation a JOIN coder c ON c.id = a.coder_id "
              "WHERE c.pseudonym = 'C01'")
        == 3);
    CHECK(count(path, "SELECT count(*) FROM annotation_link") == 0);
    CHECK(count(path, "SELECT count(*) FROM judgement") == 0);
    CHECK(count(path, "SELECT count(*) FROM assignment") == 2);
    CHECK(count(path, "SELECT count(*) FROM gold_annotation") == 0);
    CHECK(count(path, "SELECT count(*) FROM gold_source") == 0);
    CHECK(count(path, "SELECT count(*) FROM gold_judgement") == 0);
    CHECK(count(path, "SELECT count(*) FROM extractor_run") == 0);
    CHECK(count(path, "SELECT count(*) FROM copy_merge") == 0);
    CHECK(count(path, "SELECT count(*) FROM merge_conflict") == 0);
    CHECK(count(path, "SELECT count(*) FROM codebook_version WHERE created_by IS NOT NULL") == 0);
    CHECK(count(path, "SELECT count(*) FROM event_log") == 1);
    CHECK(count(path, "SELECT count(*) FROM copy_base") == 3 + 2);
    // Full-text index: the other coders' third article cannot be found, the copy's can.
    CHECK(count(path, "SELECT count(*) FROM article_fts WHERE article_fts MATCH 'Oudmolen'") == 0);
    CHECK(count(path, "SELECT count(*) FROM article_fts WHERE article_fts MATCH 'Brakwater'") == 1);
    CHECK(count(path, "SELECT count(*) FROM article_fts_docsize") == 2);

    // Every cell of every table: no other person's name, pseudonym or uuid, no other coder's
    // annotation, no text of the article that was not handed out.
    const QStringList cells = everyCell(path);
    REQUIRE(cells.size() > 50);
    QStringList forbidden = others;
    forbidden << QStringLiteral("Oudmolen");
    for (const Coder &c : *coders)
        if (c.pseudonym != QLatin1String("C01"))
            forbidden << c.name << c.pseudonym << c.uuid;
    for (const QString &word : forbidden) {
        INFO(word.toStdString());
        CHECK(
            std::ranges::none_of(cells, [&](const QString &cell) { return cell.contains(word); }));
    }
    for (const QString &uuid : mine) {
        INFO(uuid.toStdString());
        CHECK(std::ranges::any_of(cells, [&](const QString &cell) { return cell.contains(uuid); }));
    }
    // The file's bytes too (free pages, FTS segments): no name of another person.
    const QByteArray bytes = readFile(path);
    for (const Coder &c : *coders)
        if (c.pseudonym != QLatin1String("C01"))
            CHECK_FALSE(bytes.contains(c.name.toUtf8()));
    CHECK(bytes.contains("Noor Testperson"));

    // It is an ordinary project: it opens, passes the integrity check and knows what it is.
    Project copy = openProject(path);
    auto report = copy.check();
    REQUIRE(report);
    CHECK(report->problems == QStringList {});
    auto info = CoderCopies::copyInfo(copy);
    REQUIRE(info);
    REQUIRE(info->has_value());
    auto coderInCopy = copy.coders();
    REQUIRE(coderInCopy);
    REQUIRE(coderInCopy->size() == 1);
    CHECK((*info)->coderUuid == coderInCopy->front().uuid);
    auto origin = CoderCopies::copyInfo(*f.main);
    REQUIRE(origin);
    CHECK_FALSE(origin->has_value());
    // A copy cannot hand out copies or take merges.
    auto again =
        CoderCopies::handout(copy, QStringLiteral("C01"), f.dir.filePath(QStringLiteral("x")));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Unsupported);
    auto merged = CoderCopies::merge(copy, {path});
    REQUIRE_FALSE(merged);
    CHECK(merged.error().code == ErrorCode::Unsupported);
}

TEST_CASE("handout refuses an unknown coder, an existing file and a coder without articles")
{
    CopiesFixture f;
    auto r =
        CoderCopies::handout(*f.main, QStringLiteral("C09"), f.dir.filePath(QStringLiteral("a")));
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::NotFound);
    CHECK(r.error().message.contains(QStringLiteral("C09")));
    r = CoderCopies::handout(*f.main, QStringLiteral("L01"), f.dir.filePath(QStringLiteral("b")));
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::NotFound);
    CHECK_FALSE(QFile::exists(f.dir.filePath(QStringLiteral("b"))));
    r = CoderCopies::handout(*f.main, QStringLiteral("C01"), f.mainPath);
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::Duplicate);
    // The name works as well as the pseudonym.
    r = CoderCopies::handout(
        *f.main, QStringLiteral("Sam Testperson"), f.dir.filePath(QStringLiteral("c")));
    REQUIRE(r);
    CHECK(r->coder.pseudonym == QStringLiteral("C02"));
    CHECK(r->articles == 2);
    CHECK(r->annotations == 3);
    CHECK(r->links == 1);
    CHECK(r->judgements == 1);
}

TEST_CASE("three coder copies merged in every order give the same project")
{
    CopiesFixture f;
    const QStringList copies {f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold")),
        f.handout(QStringLiteral("C02"), QStringLiteral("c02.fourfold")),
        f.handout(QStringLiteral("C03"), QStringLiteral("c03.fourfold"))};
    // Meanwhile the lead keeps working in the main project on the lead's own things.
    AdjudicateSpanEdit gold(f.f3, f.lead,
        span(
            FramingFunction::Remedy, f.text3, QStringLiteral("The town should run a trial first.")),
        {}, QStringLiteral("clear remedy"));
    REQUIRE(f.main->apply(gold));
    editC01(copies[0]);
    editC02(copies[1]);
    editC03(copies[2]);
    const QString base = f.snapshot(QStringLiteral("base.fourfold"));
    f.main.reset();

    std::vector<int> order {0, 1, 2};
    QString first;
    int orders = 0;
    do {
        const QString path = f.dir.filePath(QStringLiteral("order%1.fourfold").arg(orders));
        REQUIRE(QFile::copy(base, path));
        Project p = openProject(path);
        for (int i : order) {
            const auto reports = mergeInto(p, {copies[i]});
            REQUIRE(reports.size() == 1);
            CHECK_FALSE(reports[0].alreadyMerged);
            CHECK(reports[0].conflicts == 0);
        }
        const QString dump = uuidDump(databaseForTesting(p), kOrderFree);
        if (orders == 0)
            first = dump;
        else
            CHECK(dump == first);

        // Merging every copy again changes nothing at all, event log included.
        const QString full = dumpDatabase(databaseForTesting(p), {});
        for (const MergeReport &r : mergeInto(p, copies))
            CHECK(r.alreadyMerged);
        CHECK(dumpDatabase(databaseForTesting(p), {}) == full);
        ++orders;
    } while (std::ranges::next_permutation(order).found);
    CHECK(orders == 6);

    // All three in one call is the same again.
    const QString together = f.dir.filePath(QStringLiteral("together.fourfold"));
    REQUIRE(QFile::copy(base, together));
    Project p = openProject(together);
    const auto reports = mergeInto(p, {copies[2], copies[0], copies[1]});
    CHECK(uuidDump(databaseForTesting(p), kOrderFree) == first);

    // And the merged project holds what the coders did.
    const MergeReport &c01 = reports[1];
    CHECK(c01.coderPseudonym == QStringLiteral("C01"));
    CHECK(c01.added == 3); // the evaluation span, its link, the answer
    CHECK(c01.changed == 3); // the cause span, the deleted evaluation, the article's status
    CHECK(c01.deleted == 1);
    CHECK(c01.seconds == 120);
    const Annotation cause = onlyAnnotation(p, f.f1, f.c1, FramingFunction::Cause);
    CHECK(cause.content.attributes.value(QStringLiteral("actor")).toString()
        == QStringLiteral("the budget office"));
    auto c1f2 = p.annotations(f.f2, f.c1);
    REQUIRE(c1f2);
    CHECK(c1f2->empty()); // deleted in the copy: a tombstone now
    CHECK(count(together,
              "SELECT count(*) FROM annotation a JOIN coder c ON c.id = a.coder_id "
              "WHERE c.pseudonym = 'C01' AND a.deleted = 1")
        == 1);
    auto links = p.links(f.f1);
    REQUIRE(links);
    CHECK(std::ranges::count_if(*links, [](const AnnotationLink &l) {
        return l.type == QLatin1String("judges");
    }) == 1);
    auto assignments = p.assignments();
    REQUIRE(assignments);
    for (const Assignment &a : *assignments) {
        if (a.article == f.f1 && a.coder == f.c1) {
            CHECK(a.status == QStringLiteral("done"));
            CHECK(a.activeSeconds == 120);
        }
        if (a.article == f.f3 && a.coder == f.c2)
            CHECK(a.status == QStringLiteral("started"));
        if (a.article == f.f2 && a.coder == f.c3)
            CHECK(a.activeSeconds == 30);
    }
    auto judgements = p.allJudgements();
    REQUIRE(judgements);
    CHECK(judgements->size() == 4);
    for (const Judgement &j : *judgements)
        if (j.coder == f.c2)
            CHECK(j.value == QStringLiteral("evaluation"));
    auto goldSpans = p.goldAnnotations();
    REQUIRE(goldSpans);
    CHECK(goldSpans->size() == 2); // the lead's work in the meantime is kept
    // The coders' own logs joined the project's, once, with their times and the copy named.
    CHECK(count(together,
              "SELECT count(*) FROM event_log WHERE action = 'annotation.add' AND "
              "json_extract(detail, '$.copy') IS NOT NULL AND coder_id IS NOT NULL")
        == 4);
    CHECK(count(together, "SELECT count(*) FROM event_log WHERE action = 'copy.merge'") == 3);
    CHECK(count(together, "SELECT count(*) FROM copy_merge") == 3);
    auto check = p.check();
    REQUIRE(check);
    CHECK(check->problems == QStringList {});
}

TEST_CASE("a tampered, foreign or plain project file is refused and the project is unchanged")
{
    CopiesFixture f;
    const QString good = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    editC01(good);
    const QString before = dumpDatabase(databaseForTesting(*f.main), {});

    // 1. An article text changed (the stored hash left as it was).
    const QString tampered = f.dir.filePath(QStringLiteral("tampered.fourfold"));
    REQUIRE(QFile::copy(good, tampered));
    execSql(tampered, "UPDATE article SET text = replace(text, 'May', 'June')");
    auto r = CoderCopies::merge(*f.main, {good, tampered});
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(r.error().message.contains(QStringLiteral("The text of article \"f1\"")));
    CHECK(r.error().message.contains(tampered));
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // 2. Text and hash changed together: still not the project's text.
    const QString rehashed = f.dir.filePath(QStringLiteral("rehashed.fourfold"));
    REQUIRE(QFile::copy(good, rehashed));
    execSql(
        rehashed, "UPDATE article SET text = replace(text, 'May', 'June'), sha256 = 'x' || sha256");
    r = CoderCopies::merge(*f.main, {rehashed});
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("differs from the project's")));
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // 3. A copy of another project with the same articles and coder pseudonym.
    QTemporaryDir otherDir;
    auto other = Project::create(otherDir.filePath(QStringLiteral("other.fourfold")));
    REQUIRE(other);
    REQUIRE(other->importFile(
        writeFile(otherDir, QStringLiteral("a.jsonl"), kThreeArticles), ImportOptions {}));
    auto otherCoder =
        other->addCoder(QStringLiteral("Noor Testperson"), QStringLiteral("C01"), CoderRole::Coder);
    REQUIRE(otherCoder);
    REQUIRE(other->assign(articleIn(*other, QStringLiteral("f1")), *otherCoder, Phase::Production));
    const QString foreign = otherDir.filePath(QStringLiteral("foreign.fourfold"));
    REQUIRE(CoderCopies::handout(*other, QStringLiteral("C01"), foreign));
    r = CoderCopies::merge(*f.main, {foreign});
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(r.error().message.contains(QStringLiteral("a coder copy of another project")));
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // 4. The same, claiming to be a copy of this project: its articles are not ours.
    auto mainUuid =
        count(f.mainPath, "SELECT count(*) FROM project_setting WHERE key = 'project_uuid'");
    REQUIRE(mainUuid == 1);
    const QString forged = otherDir.filePath(QStringLiteral("forged.fourfold"));
    REQUIRE(QFile::copy(foreign, forged));
    {
        QString uuid;
        {
            auto s = databaseForTesting(*f.main).prepare(
                QStringLiteral("SELECT value FROM project_setting WHERE key = 'project_uuid'"));
            REQUIRE(s);
            REQUIRE(*s->step());
            uuid = s->columnText(0);
        }
        execSql(forged,
            QStringLiteral("UPDATE project_setting SET value = '%1' WHERE key = 'copy_of'")
                .arg(uuid)
                .toUtf8()
                .constData());
    }
    r = CoderCopies::merge(*f.main, {forged});
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // 5. An ordinary project file, and a file that is not there.
    r = CoderCopies::merge(*f.main, {otherDir.filePath(QStringLiteral("other.fourfold"))});
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("not a coder copy")));
    r = CoderCopies::merge(*f.main, {f.dir.filePath(QStringLiteral("missing.fourfold"))});
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::NotFound);
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // 6. Rows of another coder slipped into a copy.
    const QString mixed = f.dir.filePath(QStringLiteral("mixed.fourfold"));
    REQUIRE(QFile::copy(good, mixed));
    execSql(mixed,
        "INSERT INTO coder (uuid, name, pseudonym, role, created_at) VALUES "
        "('00000000-0000-0000-0000-000000000001', 'X', 'C77', 'coder', '2026-01-01');"
        "UPDATE annotation SET coder_id = (SELECT id FROM coder WHERE pseudonym = 'C77') "
        "WHERE id = (SELECT min(id) FROM annotation)");
    r = CoderCopies::merge(*f.main, {mixed});
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("people other than its coder")));
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // 7. A span's quote edited outside Fourfold, and a span beyond its text.
    const QString requoted = f.dir.filePath(QStringLiteral("requoted.fourfold"));
    REQUIRE(QFile::copy(good, requoted));
    execSql(requoted,
        "UPDATE annotation SET quote = 'blames the mayor' WHERE quote = 'blames "
        "the budget'");
    r = CoderCopies::merge(*f.main, {requoted});
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("does not quote its article's text")));
    const QString stretched = f.dir.filePath(QStringLiteral("stretched.fourfold"));
    REQUIRE(QFile::copy(good, stretched));
    execSql(stretched, "UPDATE annotation SET end = 100000 WHERE quote = 'blames the budget'");
    r = CoderCopies::merge(*f.main, {stretched});
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("100000")));
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);

    // The untouched copy still merges.
    REQUIRE(CoderCopies::merge(*f.main, {good}));
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) != before);
}

TEST_CASE("an object changed in the copy and in the project keeps the later change and leaves "
          "the other to the lead")
{
    CopiesFixture f;
    SetJudgementEdit answered(f.f1, f.c1, QStringLiteral("dominant_function"),
        QStringLiteral("problem"), Phase::Reliability);
    REQUIRE(f.main->apply(answered));
    const QString path = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    const Annotation cause = onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Cause);
    const Annotation problem = onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Problem);
    const Annotation eval = onlyAnnotation(*f.main, f.f2, f.c1, FramingFunction::Evaluation);
    auto answerIn = [](Project &p, const QString &value) {
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        SetJudgementEdit set(articleIn(p, QStringLiteral("f1")), me,
            QStringLiteral("dominant_function"), value, Phase::Reliability);
        REQUIRE(p.apply(set));
    };
    {
        // First in the copy: another answer.
        Project copy = openProject(path);
        answerIn(copy, QStringLiteral("cause"));
    }
    QThread::msleep(20); // later edits get later times (milliseconds)
    {
        // Then in the project (the coder working at the office once more): the cause's actor,
        // the problem's note, the evaluation deleted, and the answer changed again.
        AnnotationContent c = cause.content;
        c.attributes = {{QStringLiteral("actor"), QStringLiteral("the mayor")}};
        ChangeAnnotationEdit change(cause.id, c, f.c1);
        REQUIRE(f.main->apply(change));
        AnnotationContent p = problem.content;
        p.note = QStringLiteral("same note");
        ChangeAnnotationEdit same(problem.id, p, f.c1);
        REQUIRE(f.main->apply(same));
        DeleteAnnotationEdit del(eval.id, f.c1);
        REQUIRE(f.main->apply(del));
        answerIn(*f.main, QStringLiteral("remedy"));
    }
    QThread::msleep(20);
    {
        // Last in the copy: another actor, the same note, the evaluation changed.
        Project copy = openProject(path);
        AnnotationContent c = cause.content;
        c.attributes = {{QStringLiteral("actor"), QStringLiteral("the ferry company")}};
        ChangeAnnotationEdit change(cause.id, c, f.c1);
        REQUIRE(copy.apply(change));
        AnnotationContent p = problem.content;
        p.note = QStringLiteral("same note");
        ChangeAnnotationEdit same(problem.id, p, f.c1);
        REQUIRE(copy.apply(same));
        AnnotationContent e = eval.content;
        e.attributes = {{QStringLiteral("polarity"), QStringLiteral("neutral")}};
        ChangeAnnotationEdit changeDeleted(eval.id, e, f.c1);
        REQUIRE(copy.apply(changeDeleted));
    }
    auto reports = mergeInto(*f.main, {path});
    // The cause (two actors), the evaluation (deleted/changed), the answer (cause/remedy).
    CHECK(reports[0].conflicts == 3);
    // The copy's later cause and evaluation are taken; the same note is no change.
    CHECK(reports[0].changed == 2);
    auto open = CoderCopies::conflicts(*f.main, false);
    REQUIRE(open);
    REQUIRE(open->size() == 3);
    CHECK(onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Cause)
              .content.attributes.value(QStringLiteral("actor"))
              .toString()
        == QStringLiteral("the ferry company"));
    auto actorIn = [](const QJsonObject &row) {
        return QJsonDocument::fromJson(row.value(QStringLiteral("attributes")).toString().toUtf8())
            .object()
            .value(QStringLiteral("actor"))
            .toString();
    };
    const auto causeConflict = std::ranges::find_if(
        *open, [&](const MergeConflict &c) { return c.objectUuid == cause.uuid; });
    REQUIRE(causeConflict != open->end());
    CHECK(actorIn(causeConflict->mine) == QStringLiteral("the ferry company"));
    CHECK(actorIn(causeConflict->theirs) == QStringLiteral("the mayor"));
    CHECK(causeConflict->copyUuid.isEmpty()); // the project's own version lost
    // The project's answer is later than the copy's: it stays, the copy's is kept for the lead.
    auto answers = f.main->allJudgements();
    REQUIRE(answers);
    for (const Judgement &j : *answers)
        if (j.coder == f.c1)
            CHECK(j.value == QStringLiteral("remedy"));
    const auto answerConflict = std::ranges::find_if(
        *open, [&](const MergeConflict &c) { return c.objectType == QLatin1String("judgement"); });
    REQUIRE(answerConflict != open->end());
    CHECK(answerConflict->theirs.value(QStringLiteral("value")).toString()
        == QStringLiteral("cause"));
    CHECK(
        answerConflict->mine.value(QStringLiteral("value")).toString() == QStringLiteral("remedy"));

    // Merging again adds no second conflict and changes nothing.
    const QString full = dumpDatabase(databaseForTesting(*f.main), {});
    CHECK(mergeInto(*f.main, {path})[0].alreadyMerged);
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == full);

    // The lead takes back the project's cause and keeps the copy's evaluation.
    auto bad = CoderCopies::resolve(*f.main, cause.uuid, QStringLiteral("both"));
    REQUIRE_FALSE(bad);
    CHECK(bad.error().code == ErrorCode::InvalidArgument);
    REQUIRE(CoderCopies::resolve(*f.main, cause.uuid, QStringLiteral("theirs")));
    REQUIRE(CoderCopies::resolve(*f.main, eval.uuid, QStringLiteral("mine")));
    REQUIRE(CoderCopies::resolve(*f.main, answerConflict->uuid, QStringLiteral("mine")));
    CHECK(onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Cause)
              .content.attributes.value(QStringLiteral("actor"))
              .toString()
        == QStringLiteral("the mayor"));
    CHECK(onlyAnnotation(*f.main, f.f2, f.c1, FramingFunction::Evaluation)
              .content.attributes.value(QStringLiteral("polarity"))
              .toString()
        == QStringLiteral("neutral"));
    open = CoderCopies::conflicts(*f.main, false);
    REQUIRE(open);
    CHECK(open->empty());
    auto all = CoderCopies::conflicts(*f.main, true);
    REQUIRE(all);
    CHECK(all->size() == 3);
    auto again = CoderCopies::resolve(*f.main, cause.uuid, QStringLiteral("mine"));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::NotFound);
    // Settled: the copy merged once more changes nothing.
    const QString settled = dumpDatabase(databaseForTesting(*f.main), {});
    CHECK(mergeInto(*f.main, {path})[0].alreadyMerged);
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == settled);
}

TEST_CASE("two copies for one coder give the same project in either order and lose nothing")
{
    QString first;
    for (int reversed = 0; reversed < 2; ++reversed) {
        CopiesFixture f;
        const QString a = f.handout(QStringLiteral("C01"), QStringLiteral("a.fourfold"));
        const QString b = f.handout(QStringLiteral("C01"), QStringLiteral("b.fourfold"));
        const Annotation cause = onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Cause);
        for (const auto &[path, actor] : {std::pair {a, QStringLiteral("A's actor")},
                 std::pair {b, QStringLiteral("B's actor")}}) {
            QThread::msleep(20); // B's change is the later one
            Project copy = openProject(path);
            AnnotationContent c = cause.content;
            c.attributes = {{QStringLiteral("actor"), actor}};
            ChangeAnnotationEdit change(cause.id, c, f.c1);
            REQUIRE(copy.apply(change));
            REQUIRE(copy.addCodingTime(f.f1, f.c1, 10));
        }
        const QStringList order = reversed ? QStringList {b, a} : QStringList {a, b};
        mergeInto(*f.main, order);
        CHECK(onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Cause)
                  .content.attributes.value(QStringLiteral("actor"))
                  .toString()
            == QStringLiteral("B's actor"));
        auto open = CoderCopies::conflicts(*f.main, false);
        REQUIRE(open);
        REQUIRE(open->size() == 1);
        CHECK(open->front()
                  .theirs.value(QStringLiteral("attributes"))
                  .toString()
                  .contains(QStringLiteral("A's actor")));
        auto assignments = f.main->assignments();
        REQUIRE(assignments);
        for (const Assignment &x : *assignments)
            if (x.article == f.f1 && x.coder == f.c1)
                CHECK(x.activeSeconds == 20); // both copies' time counts
    }
}

TEST_CASE("a merge that fails at any step writes nothing")
{
    CopiesFixture f;
    const QString path = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    editC01(path);
    const QString before = dumpDatabase(databaseForTesting(*f.main), {});
    Database &db = databaseForTesting(*f.main);
    bool succeeded = false;
    for (int failAt = 1; failAt < 500 && !succeeded; ++failAt) {
        int steps = 0;
        db.setFaultHook([&] { return ++steps == failAt ? SQLITE_IOERR : SQLITE_OK; });
        auto r = CoderCopies::merge(*f.main, {path});
        db.setFaultHook({});
        if (r) {
            succeeded = true;
            CHECK(failAt > 10);
        } else {
            INFO(failAt);
            CHECK(dumpDatabase(db, {}) == before);
        }
    }
    CHECK(succeeded);
    CHECK(dumpDatabase(db, {}) != before);
}
