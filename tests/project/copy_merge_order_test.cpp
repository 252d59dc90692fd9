// Two copies of one coder that changed the same objects differently (handed out at different
// times, with different articles) and a copy of another coder give the same project whatever the
// order of the merges, in one call or in several: the same rows, the same coding time and the
// same conflicts left for the lead (compared as full dumps of every table but the event log and
// the merge records, and of the conflicts without their own uuid and detection time).
#include "core/project/article_status_edit.h"
#include "core/project/testing/project_database.h"
#include "tests/project/copies_fixture.h"
#include "tests/project/copy_files.h"
#include "tests/support/db_dump.h"

#include <QFile>
#include <QJsonDocument>
#include <QThread>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// The coder's cause span on f1 in the copy `path` gets `actor`; f1 is answered `answer`, marked
// `status`, and coded for `seconds`.
void codeC01(const QString &path, const QString &actor, const QString &answer,
    const QString &status, qint64 seconds)
{
    Project p = openProject(path);
    const CoderId me = coderIn(p, QStringLiteral("C01"));
    const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
    Annotation cause = onlyAnnotation(p, f1, me, FramingFunction::Cause);
    AnnotationContent c = cause.content;
    c.attributes = {{QStringLiteral("actor"), actor}};
    ChangeAnnotationEdit change(cause.id, c, me);
    REQUIRE(p.apply(change));
    SetJudgementEdit set(f1, me, QStringLiteral("dominant_function"), answer, Phase::Reliability);
    REQUIRE(p.apply(set));
    SetArticleStatusEdit mark(f1, me, status);
    REQUIRE(p.apply(mark));
    REQUIRE(p.addCodingTime(f1, me, seconds));
}

QString copyUuidOf(const QString &path)
{
    Project p = openProject(path);
    auto info = CoderCopies::copyInfo(p);
    REQUIRE(info);
    REQUIRE(info->has_value());
    return (*info)->copyUuid;
}

// Later edits get later times: the rule under test orders by modification time (milliseconds).
void later()
{
    QThread::msleep(20);
}

} // namespace

TEST_CASE("Issue 20 item 8: conflicting copies of one coder merge to the same project in any order")
{
    CopiesFixture f;
    const QString a = f.handout(QStringLiteral("C01"), QStringLiteral("a.fourfold"));
    later();
    // Meanwhile in the project: C01's problem span on f1 gets a note at the office, and C01 is
    // given f3 as well. A2 is handed out after both; A knows neither.
    const Annotation problem = onlyAnnotation(*f.main, f.f1, f.c1, FramingFunction::Problem);
    AnnotationContent office = problem.content;
    office.note = QStringLiteral("office note");
    ChangeAnnotationEdit atOffice(problem.id, office, f.c1);
    REQUIRE(f.main->apply(atOffice));
    REQUIRE(f.main->assign(f.f3, f.c1, Phase::Reliability));
    const QString a2 = f.handout(QStringLiteral("C01"), QStringLiteral("a2.fourfold"));
    const QString b = f.handout(QStringLiteral("C02"), QStringLiteral("b.fourfold"));
    later();

    // A: the cause's actor, the answer "cause", f1 done, and a note of its own on the problem.
    codeC01(a, QStringLiteral("A's actor"), QStringLiteral("cause"), QStringLiteral("done"), 30);
    {
        Project p = openProject(a);
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        Annotation mine =
            onlyAnnotation(p, articleIn(p, QStringLiteral("f1")), me, FramingFunction::Problem);
        AnnotationContent c = mine.content;
        c.note = QStringLiteral("A's note");
        ChangeAnnotationEdit change(mine.id, c, me);
        REQUIRE(p.apply(change));
    }
    later();
    // B: C02 deletes the remedy on f1 and answers f1.
    {
        Project p = openProject(b);
        const CoderId me = coderIn(p, QStringLiteral("C02"));
        const ArticleId f1 = articleIn(p, QStringLiteral("f1"));
        DeleteAnnotationEdit del(onlyAnnotation(p, f1, me, FramingFunction::Remedy).id, me);
        REQUIRE(p.apply(del));
        SetJudgementEdit set(f1, me, QStringLiteral("dominant_function"), QStringLiteral("remedy"),
            Phase::Reliability);
        REQUIRE(p.apply(set));
    }
    later();
    // A2, later than A: another actor, another answer (a new answer, not A's), f1 started, and a
    // span on f3.
    codeC01(
        a2, QStringLiteral("A2's actor"), QStringLiteral("problem"), QStringLiteral("started"), 40);
    {
        Project p = openProject(a2);
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        const ArticleId f3 = articleIn(p, QStringLiteral("f3"));
        AddAnnotationEdit add(f3, me,
            span(FramingFunction::Remedy, textOf(p, f3),
                QStringLiteral("The town should run a trial first.")),
            Phase::Reliability);
        REQUIRE(p.apply(add));
    }
    const QString start = f.snapshot(QStringLiteral("start.fourfold"));
    f.main.reset();
    const QString copyA = copyUuidOf(a);

    struct Order {
        const char *name;
        std::vector<QStringList> calls;
    };
    const std::vector<Order> orders {
        {"A B A2 one by one", {{a}, {b}, {a2}}},
        {"A2 B A one by one", {{a2}, {b}, {a}}},
        {"A B A2 in one call", {{a, b, a2}}},
        {"A2 B A in one call", {{a2, b, a}}},
        {"B A2 A one by one", {{b}, {a2}, {a}}},
    };
    QString firstRows;
    QString firstConflicts;
    for (const Order &order : orders) {
        INFO(order.name);
        const QString path = f.dir.filePath(QString::fromLatin1(order.name) + ".fourfold");
        REQUIRE(QFile::copy(start, path));
        Project p = openProject(path);
        for (const QStringList &call : order.calls)
            mergeInto(p, call);
        const QString rows = uuidDump(
            databaseForTesting(p), kOrderFree + QStringList {QStringLiteral("merge_conflict")});
        const QString conflicts = conflictDump(path);
        if (firstRows.isEmpty()) {
            firstRows = rows;
            firstConflicts = conflicts;
        } else {
            CHECK(rows == firstRows);
            CHECK(conflicts == firstConflicts);
        }

        // What the rule decides: the later change wins, the earlier stays open for the lead.
        const Annotation cause = onlyAnnotation(p, f.f1, f.c1, FramingFunction::Cause);
        CHECK(cause.content.attributes.value(QStringLiteral("actor")).toString()
            == QStringLiteral("A2's actor"));
        CHECK(onlyAnnotation(p, f.f1, f.c1, FramingFunction::Problem).content.note
            == QStringLiteral("A's note"));
        auto open = CoderCopies::conflicts(p, false);
        REQUIRE(open);
        std::map<QString, const MergeConflict *> byObject;
        for (const MergeConflict &c : *open)
            byObject[c.objectUuid] = &c;
        REQUIRE(byObject.contains(cause.uuid));
        const MergeConflict &lostCause = *byObject[cause.uuid];
        CHECK(lostCause.copyUuid == copyA);
        CHECK(lostCause.theirs.value(QStringLiteral("attributes"))
                  .toString()
                  .contains(QStringLiteral("A's actor")));
        CHECK(lostCause.mine.value(QStringLiteral("attributes"))
                  .toString()
                  .contains(QStringLiteral("A2's actor")));
        REQUIRE(byObject.contains(problem.uuid));
        CHECK(byObject[problem.uuid]->theirs.value(QStringLiteral("note")).toString()
            == QStringLiteral("office note"));
        // Two answers to one item: A2's is live, A's set aside and open for the lead.
        auto answers = p.allJudgements();
        REQUIRE(answers);
        QStringList live;
        for (const Judgement &j : *answers)
            if (j.coder == f.c1)
                live << j.value;
        CHECK(live == QStringList {QStringLiteral("problem")});
        CHECK(count(path,
                  "SELECT count(*) FROM judgement j JOIN coder c ON c.id = j.coder_id WHERE "
                  "c.pseudonym = 'C01' AND j.deleted = 1 AND j.value = 'cause'")
            == 1);
        CHECK(std::ranges::count_if(*open, [](const MergeConflict &c) {
            return c.objectType == QLatin1String("judgement")
                && c.theirs.value(QStringLiteral("value")).toString() == QLatin1String("cause");
        }) == 1);
        // Both statuses of f1 compete too (no modification time: the higher digest wins).
        CHECK(std::ranges::count_if(*open, [](const MergeConflict &c) {
            return c.objectType == QLatin1String("assignment");
        }) == 1);
        CHECK(open->size() == 4);
        // Time adds up; C02's work and A2's span on f3 are in.
        CHECK(count(path,
                  "SELECT active_seconds FROM assignment s JOIN article a ON a.id = s.article_id "
                  "JOIN coder c ON c.id = s.coder_id WHERE a.external_id = 'f1' AND "
                  "c.pseudonym = 'C01'")
            == 70);
        auto onF3 = p.annotations(f.f3, f.c1);
        REQUIRE(onF3);
        CHECK(onF3->size() == 1);
        auto c02 = p.annotations(f.f1, f.c2);
        REQUIRE(c02);
        CHECK(c02->size() == 1);

        // Merging everything again changes nothing at all.
        const QString full = dumpDatabase(databaseForTesting(p), {});
        for (const MergeReport &r : mergeInto(p, {a, b, a2}))
            CHECK(r.alreadyMerged);
        CHECK(dumpDatabase(databaseForTesting(p), {}) == full);
        auto check = p.check();
        REQUIRE(check);
        CHECK(check->problems == QStringList {});
    }
}
