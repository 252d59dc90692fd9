// Coder copies changed outside Fourfold, as a hostile user would with any SQLite tool: forged or
// backdated log rows, impossible coding time, work on articles never handed out, uuids of other
// objects. Each is refused with a message naming the file and what is wrong, and the project is
// left as it was (a full dump before and after, event log included).
#include "core/project/testing/project_database.h"
#include "tests/project/copies_fixture.h"
#include "tests/project/copy_files.h"
#include "tests/support/db_dump.h"

#include <QDateTime>
#include <QFile>

#include <initializer_list>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// A value read from the file at `path` with the SQLite C API.
QString text(const QString &path, const char *sql)
{
    sqlite3 *db = nullptr;
    REQUIRE(sqlite3_open_v2(path.toUtf8().constData(), &db, SQLITE_OPEN_READONLY, nullptr)
        == SQLITE_OK);
    sqlite3_stmt *s = nullptr;
    INFO(sql);
    REQUIRE(sqlite3_prepare_v2(db, sql, -1, &s, nullptr) == SQLITE_OK);
    REQUIRE(sqlite3_step(s) == SQLITE_ROW);
    const QString value =
        QString::fromUtf8(reinterpret_cast<const char *>(sqlite3_column_text(s, 0)));
    sqlite3_finalize(s);
    sqlite3_close(db);
    return value;
}

// A fresh copy of the untouched copy `good`, changed by `sql`.
QString tampered(CopiesFixture &f, const QString &good, const QString &name, const QString &sql)
{
    const QString path = f.dir.filePath(name);
    QFile::remove(path);
    REQUIRE(QFile::copy(good, path));
    execSql(path, sql);
    return path;
}

// Merging `path` fails with InvalidInput naming the file and every one of `words`, and the
// project is exactly as it was.
void refused(CopiesFixture &f, const QString &path, std::initializer_list<QString> words)
{
    const QString before = dumpDatabase(databaseForTesting(*f.main), {});
    auto r = CoderCopies::merge(*f.main, {path});
    REQUIRE_FALSE(r);
    INFO(r.error().message.toStdString());
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(r.error().message.contains(path));
    for (const QString &w : words) {
        INFO(w.toStdString());
        CHECK(r.error().message.contains(w));
    }
    CHECK(dumpDatabase(databaseForTesting(*f.main), {}) == before);
}

QString isoSecondsFromNow(qint64 seconds)
{
    return QDateTime::currentDateTimeUtc().addSecs(seconds).toString(Qt::ISODateWithMs);
}

// The coder changes the note of the problem span on f1 in the copy at `path`, so that the copy
// has something to merge and an event in its log.
void codeSomething(const QString &path)
{
    Project p = openProject(path);
    const CoderId me = coderIn(p, QStringLiteral("C01"));
    Annotation problem =
        onlyAnnotation(p, articleIn(p, QStringLiteral("f1")), me, FramingFunction::Problem);
    AnnotationContent c = problem.content;
    c.note = QStringLiteral("the ferry, not the bus");
    ChangeAnnotationEdit change(problem.id, c, me);
    REQUIRE(p.apply(change));
}

QString addEvent(const QString &at, const QString &coder, const QString &action,
    const QString &type, const QString &object, const QString &detail = QStringLiteral("{}"))
{
    return QStringLiteral("INSERT INTO event_log (at, coder_id, action, object_type, object_uuid, "
                          "detail) VALUES ('%1', %2, '%3', '%4', %5, '%6')")
        .arg(at, coder, action, type, object, detail);
}

const QString kMe = QStringLiteral("(SELECT id FROM coder)");
const QString kMySpan = QStringLiteral("(SELECT min(uuid) FROM annotation)");

} // namespace

TEST_CASE("Issue 20 item 8: forged or backdated event-log rows of a copy are refused")
{
    CopiesFixture f;
    const QString good = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    codeSomething(good);
    const QString annotationChange = QStringLiteral("annotation.change");
    const QString annotation = QStringLiteral("annotation");

    // Backdated years before the hand-out, and two days before it (beyond the day allowed for
    // the coder's clock).
    refused(f,
        tampered(f, good, QStringLiteral("backdated.fourfold"),
            addEvent(QStringLiteral("2019-03-01T09:00:00.000Z"), kMe, annotationChange, annotation,
                kMySpan)),
        {QStringLiteral("(annotation.change)"), QStringLiteral("2019-03-01T09:00:00.000Z"),
            QStringLiteral("before the copy was handed out")});
    refused(f,
        tampered(f, good, QStringLiteral("two-days.fourfold"),
            addEvent(isoSecondsFromNow(-2 * 86400), kMe, annotationChange, annotation, kMySpan)),
        {QStringLiteral("before the copy was handed out")});
    // Dated in the future.
    refused(f,
        tampered(f, good, QStringLiteral("future.fourfold"),
            addEvent(QStringLiteral("2099-01-01T00:00:00.000Z"), kMe, annotationChange, annotation,
                kMySpan)),
        {QStringLiteral("2099-01-01T00:00:00.000Z"), QStringLiteral("in the future")});
    refused(f,
        tampered(f, good, QStringLiteral("not-a-time.fourfold"),
            addEvent(QStringLiteral("yesterday"), kMe, annotationChange, annotation, kMySpan)),
        {QStringLiteral("is not a time")});
    // Kinds a coder's program never writes: the program's own events of a lead, a lead's edit
    // under the coder's name, an edit with a made-up detail, a status event naming an object.
    refused(f,
        tampered(f, good, QStringLiteral("program.fourfold"),
            addEvent(isoSecondsFromNow(0), QStringLiteral("NULL"), QStringLiteral("gold.add"),
                QStringLiteral("gold"), QStringLiteral("'x'"))),
        {QStringLiteral("(gold.add)"), QStringLiteral("is not one a coder's program writes")});
    refused(f,
        tampered(f, good, QStringLiteral("gold.fourfold"),
            addEvent(isoSecondsFromNow(0), kMe, QStringLiteral("gold.add"), QStringLiteral("gold"),
                QStringLiteral("'x'"))),
        {QStringLiteral("(gold.add)"), QStringLiteral("is not an edit a coder can make")});
    refused(f,
        tampered(f, good, QStringLiteral("detail.fourfold"),
            addEvent(isoSecondsFromNow(0), kMe, annotationChange, annotation, kMySpan,
                QStringLiteral("{\"coder\":\"C02\"}"))),
        {QStringLiteral("is not an edit a coder can make")});
    refused(f,
        tampered(f, good, QStringLiteral("status.fourfold"),
            addEvent(isoSecondsFromNow(0), kMe, QStringLiteral("article.status"),
                QStringLiteral("assignment"), kMySpan)),
        {QStringLiteral("is not an edit a coder can make")});
    // Another person's event: a coder the copy does not hold, and C02 slipped in by name.
    refused(f,
        tampered(f, good, QStringLiteral("nobody.fourfold"),
            addEvent(isoSecondsFromNow(0), QStringLiteral("4242"), annotationChange, annotation,
                kMySpan)),
        {QStringLiteral("is not by the copy's coder C01")});
    const QString c02 = text(f.mainPath, "SELECT uuid FROM coder WHERE pseudonym = 'C02'");
    refused(f,
        tampered(f, good, QStringLiteral("other-coder.fourfold"),
            QStringLiteral("INSERT INTO coder (uuid, name, pseudonym, role, created_at) VALUES "
                           "('%1', 'S', 'C02', 'coder', '2026-01-01T00:00:00Z');")
                    .arg(c02)
                + addEvent(isoSecondsFromNow(0),
                    QStringLiteral("(SELECT id FROM coder WHERE pseudonym = 'C02')"),
                    annotationChange, annotation, kMySpan)),
        {QStringLiteral("is not by the copy's coder C01")});
    // The coder's own event about another coder's span.
    const QString theirSpan = text(f.mainPath,
        "SELECT a.uuid FROM annotation a JOIN coder c ON c.id = a.coder_id "
        "WHERE c.pseudonym = 'C02' ORDER BY a.uuid LIMIT 1");
    refused(f,
        tampered(f, good, QStringLiteral("their-span.fourfold"),
            addEvent(isoSecondsFromNow(0), kMe, QStringLiteral("annotation.delete"), annotation,
                QStringLiteral("'%1'").arg(theirSpan))),
        {theirSpan, QStringLiteral("span of another coder")});

    // Within the allowance (an hour early: the coder's clock is slow) the copy merges, and its
    // log joins the project's.
    const QString early = tampered(f, good, QStringLiteral("early.fourfold"),
        addEvent(isoSecondsFromNow(-3600), kMe, annotationChange, annotation, kMySpan));
    REQUIRE(CoderCopies::merge(*f.main, {early}));
    CHECK(count(f.mainPath,
              "SELECT count(*) FROM event_log WHERE action = 'annotation.change' "
              "AND json_extract(detail, '$.copy') IS NOT NULL")
        == 2);
}

TEST_CASE("Issue 20 item 8: an undone edit in a copy is an event the merge accepts")
{
    CopiesFixture f;
    const QString path = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    {
        Project p = openProject(path);
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
        AddAnnotationEdit add(f1, me,
            span(FramingFunction::Remedy, textOf(p, f1),
                QStringLiteral("The council must find the money.")),
            Phase::Reliability);
        REQUIRE(p.apply(add));
        REQUIRE(p.revert(add)); // the row is gone; its uuid is in the log only
    }
    const auto reports = mergeInto(*f.main, {path});
    CHECK(reports[0].added == 0);
    CHECK(count(f.mainPath, "SELECT count(*) FROM event_log WHERE action = 'undo:annotation.add'")
        == 1);
}

TEST_CASE("An answer withdrawn in a copy is an event the merge accepts")
{
    CopiesFixture f;
    const QString path = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    {
        Project p = openProject(path);
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
        SetJudgementEdit answer(f1, me, QStringLiteral("dominant_function"),
            QStringLiteral("cause"), Phase::Reliability);
        REQUIRE(p.apply(answer));
        WithdrawJudgementEdit withdraw(
            f1, me, QStringLiteral("dominant_function"), Phase::Reliability);
        REQUIRE(p.apply(withdraw));
    }
    mergeInto(*f.main, {path});
    CHECK(count(f.mainPath, "SELECT count(*) FROM event_log WHERE action = 'judgement.withdraw'")
        == 1);
    // The answer arrives as the tombstone it is in the copy: the item is unanswered.
    CHECK(count(f.mainPath,
              "SELECT count(*) FROM judgement WHERE item_key = 'dominant_function' AND deleted = 0 "
              "AND coder_id = (SELECT id FROM coder WHERE pseudonym = 'C01')")
        == 0);
}

TEST_CASE("Issue 20 item 8: impossible coding time in a copy is refused and never overflows")
{
    CopiesFixture f;
    const QString good = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    const QString f1 = QStringLiteral("article_id = (SELECT id FROM article WHERE external_id = "
                                      "'f1')");
    const QString f2 = QStringLiteral("article_id = (SELECT id FROM article WHERE external_id = "
                                      "'f2')");

    // 9.2e18 s: in one copy, and in a second one (the second used to overflow the sum).
    for (const QString &name : {QStringLiteral("huge1.fourfold"), QStringLiteral("huge2.fourfold")})
        refused(f,
            tampered(f, good, name,
                QStringLiteral("UPDATE assignment SET active_seconds = 9200000000000000000 "
                               "WHERE %1")
                    .arg(f1)),
            {QStringLiteral("9200000000000000000 s on article \"f1\""),
                QStringLiteral("than has passed since it was handed out")});
    // Negative (the CHECK constraint switched off, as any SQLite tool can).
    refused(f,
        tampered(f, good, QStringLiteral("negative.fourfold"),
            QStringLiteral("PRAGMA ignore_check_constraints = ON; UPDATE assignment SET "
                           "active_seconds = -5 WHERE %1")
                .arg(f1)),
        {QStringLiteral("The coding time of article \"f1\""), QStringLiteral("is -5 s")});
    // Each article possible alone, together more than a day since a hand-out a moment ago.
    refused(f,
        tampered(f, good, QStringLiteral("sum.fourfold"),
            QStringLiteral("UPDATE assignment SET active_seconds = 50000 WHERE %1; UPDATE "
                           "assignment SET active_seconds = 50000 WHERE %2")
                .arg(f1, f2)),
        {QStringLiteral("50000 s on article"), QStringLiteral("50000 s before it")});
    // The same copy with time that fits merges and adds it; so does a second copy.
    const QString fits = tampered(f, good, QStringLiteral("fits.fourfold"),
        QStringLiteral("UPDATE assignment SET active_seconds = 50000 WHERE %1").arg(f1));
    REQUIRE(mergeInto(*f.main, {fits})[0].seconds == 50000);
    const QString second = f.handout(QStringLiteral("C01"), QStringLiteral("second.fourfold"));
    {
        Project p = openProject(second);
        REQUIRE(p.addCodingTime(
            articleIn(p, QStringLiteral("f1")), coderIn(p, QStringLiteral("C01")), 70));
    }
    REQUIRE(mergeInto(*f.main, {second})[0].seconds == 70);
    CHECK(count(f.mainPath,
              "SELECT active_seconds FROM assignment s JOIN article a ON a.id = s.article_id "
              "JOIN coder c ON c.id = s.coder_id WHERE a.external_id = 'f1' AND c.pseudonym = "
              "'C01'")
        == 50070);

    // A project already holding nearly the largest count (written by an older version): the
    // sum is refused, never wrapped.
    const QString third = f.handout(QStringLiteral("C01"), QStringLiteral("third.fourfold"));
    {
        Project p = openProject(third);
        REQUIRE(p.addCodingTime(
            articleIn(p, QStringLiteral("f1")), coderIn(p, QStringLiteral("C01")), 70));
    }
    execSql(f.mainPath,
        QStringLiteral("UPDATE assignment SET active_seconds = 9223372036854775800 WHERE %1 AND "
                       "coder_id = (SELECT id FROM coder WHERE pseudonym = 'C01')")
            .arg(f1));
    refused(f, third, {QStringLiteral("would overflow")});
}

TEST_CASE("Issue 20 item 8: work on an article not handed out in the copy is refused")
{
    CopiesFixture f;
    const QString good = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    // The coder gets hold of f3 (C02's and C03's article, with its exact text) and codes it.
    const QString withF3 =
        QStringLiteral("ATTACH DATABASE '%1' AS lead; INSERT INTO article (id, uuid, external_id, "
                       "title, outlet, published, language, text, length, sha256, metadata, "
                       "source, imported_at, deleted) SELECT id, uuid, external_id, title, outlet, "
                       "published, language, text, length, sha256, metadata, '', imported_at, "
                       "deleted FROM lead.article WHERE external_id = 'f3'; DETACH DATABASE lead;")
            .arg(f.mainPath);
    const QString f3 = QStringLiteral("(SELECT id FROM article WHERE external_id = 'f3')");
    const qsizetype at = f.text3.indexOf(QStringLiteral("Closing it outright is reckless."));
    const QString spanSql = withF3
        + QStringLiteral(
            "INSERT INTO annotation (uuid, article_id, coder_id, function, start, end, "
            "quote, codebook_version_id, phase, created_at, modified_at) VALUES "
            "('11111111-2222-3333-4444-555555555555', %1, (SELECT id FROM coder), "
            "'evaluation', %2, %3, 'Closing it outright is reckless.', (SELECT "
            "max(id) FROM codebook_version), 'reliability', '%4', '%4')")
              .arg(f3)
              .arg(at)
              .arg(at + 32)
              .arg(isoSecondsFromNow(0));
    refused(f, tampered(f, good, QStringLiteral("span-f3.fourfold"), spanSql),
        {QStringLiteral("The span 11111111-2222-3333-4444-555555555555"),
            QStringLiteral("on article \"f3\", which was not handed out to C01 in this copy")});
    refused(f,
        tampered(f, good, QStringLiteral("answer-f3.fourfold"),
            withF3
                + QStringLiteral("INSERT INTO judgement (uuid, article_id, coder_id, item_key, "
                                 "value, codebook_version_id, phase, created_at, modified_at) "
                                 "VALUES ('21111111-2222-3333-4444-555555555555', %1, (SELECT id "
                                 "FROM coder), 'dominant_function', 'remedy', (SELECT max(id) "
                                 "FROM codebook_version), 'reliability', '%2', '%2')")
                      .arg(f3, isoSecondsFromNow(0))),
        {QStringLiteral("The answer 21111111-2222-3333-4444-555555555555"),
            QStringLiteral("on article \"f3\", which was not handed out")});
    refused(f,
        tampered(f, good, QStringLiteral("assignment-f3.fourfold"),
            withF3
                + QStringLiteral("INSERT INTO assignment (uuid, article_id, coder_id, phase, "
                                 "status, created_at) VALUES ('31111111-2222-3333-4444-"
                                 "555555555555', %1, (SELECT id FROM coder), 'reliability', "
                                 "'done', '%2')")
                      .arg(f3, isoSecondsFromNow(0))),
        {QStringLiteral("an assignment of article \"f3\" (phase reliability) that was not handed "
                        "out in this copy")});
    // The same span on f1, which was handed out, merges.
    const qsizetype onF1 = f.text1.indexOf(QStringLiteral("It is a disgrace."));
    const QString fine = tampered(f, good, QStringLiteral("span-f1.fourfold"),
        QStringLiteral("INSERT INTO annotation (uuid, article_id, coder_id, function, start, end, "
                       "quote, codebook_version_id, phase, created_at, modified_at) VALUES "
                       "('41111111-2222-3333-4444-555555555555', (SELECT id FROM article WHERE "
                       "external_id = 'f1'), (SELECT id FROM coder), 'evaluation', %1, %2, 'It "
                       "is a disgrace.', (SELECT max(id) FROM codebook_version), 'reliability', "
                       "'%3', '%3')")
            .arg(onF1)
            .arg(onF1 + 17)
            .arg(isoSecondsFromNow(0)));
    CHECK(mergeInto(*f.main, {fine})[0].added == 1);
}

TEST_CASE("Issue 20 item 8: a copy's row reusing the uuid of another object is refused")
{
    CopiesFixture f;
    const QString good = f.handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    {
        Project p = openProject(good);
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
        AddAnnotationEdit add(f1, me,
            span(FramingFunction::Evaluation, textOf(p, f1), QStringLiteral("It is a disgrace.")),
            Phase::Reliability);
        REQUIRE(p.apply(add));
        SetJudgementEdit answer(f1, me, QStringLiteral("dominant_function"),
            QStringLiteral("cause"), Phase::Reliability);
        REQUIRE(p.apply(answer));
    }
    const QString newSpan =
        QStringLiteral("(SELECT uuid FROM annotation WHERE quote = 'It is a disgrace.')");
    auto reuse = [&](const char *name, const QString &uuid, const QString &what) {
        refused(f,
            tampered(f, good, QString::fromLatin1(name),
                QStringLiteral("UPDATE annotation SET uuid = '%1' WHERE uuid = %2")
                    .arg(uuid, newSpan)),
            {QStringLiteral("The span %1").arg(uuid),
                QStringLiteral("reuses the uuid of another object in the project (%1)").arg(what)});
    };
    reuse("gold.fourfold", text(f.mainPath, "SELECT uuid FROM gold_annotation"),
        QStringLiteral("gold span"));
    reuse("c02-span.fourfold",
        text(f.mainPath,
            "SELECT a.uuid FROM annotation a JOIN coder c ON c.id = a.coder_id "
            "WHERE c.pseudonym = 'C02' ORDER BY a.uuid LIMIT 1"),
        QStringLiteral("span of another coder"));
    reuse("c02-answer.fourfold",
        text(f.mainPath,
            "SELECT j.uuid FROM judgement j JOIN coder c ON c.id = j.coder_id "
            "WHERE c.pseudonym = 'C02'"),
        QStringLiteral("answer"));
    reuse("article.fourfold", text(f.mainPath, "SELECT uuid FROM article WHERE external_id = 'f3'"),
        QStringLiteral("article"));
    reuse("lead.fourfold", text(f.mainPath, "SELECT uuid FROM coder WHERE pseudonym = 'L01'"),
        QStringLiteral("coder"));
    // Inside the copy: the new span takes the uuid of the copy's own new answer.
    refused(f,
        tampered(f, good, QStringLiteral("twice.fourfold"),
            QStringLiteral("UPDATE annotation SET uuid = (SELECT uuid FROM judgement) WHERE uuid = "
                           "%1")
                .arg(newSpan)),
        {QStringLiteral("holds two objects"), QStringLiteral("with the same uuid")});
    // Untouched, the copy merges.
    CHECK(mergeInto(*f.main, {good})[0].added == 2);
}
