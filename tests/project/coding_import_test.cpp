#include "core/project/coding_import.h"
#include "core/project/testing/project_database.h"
#include "core/store/codebook_table.h"
#include "project_fixture.h"
#include "tests/support/db_dump.h"

#include <algorithm>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct CodingFixture : ProjectFixture {
    CodingFixture()
    {
        importJsonl(kTwoArticles);
        addCoder(QStringLiteral("C01"));
    }
    Result<CodingImportReport> run(const QByteArray &jsonl)
    {
        return importQuotedCodings(
            project, writeFile(dir, QStringLiteral("codings.jsonl"), jsonl), Phase::Reliability);
    }
};

} // namespace

TEST_CASE("quote-anchored codings land on the right code points")
{
    CodingFixture f;
    auto r = f.run("{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":"
                   "\"blames the budget\",\"attributes\":{\"actor\":\"budget\"}}\n"
                   "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
                   "\"The\",\"occurrence\":2}\n"
                   "\n"
                   "{\"article\":\"f2\",\"coder\":\"C01\",\"item\":\"dominant_function\",\"value\":"
                   "\"evaluation\"}\n");
    REQUIRE(r);
    CHECK(r->spans == 2);
    CHECK(r->judgements == 1);
    auto spans = f.project.annotations(f.articleId(QStringLiteral("f1")));
    REQUIRE(spans);
    REQUIRE(spans->size() == 2);
    CHECK((*spans)[0].content.range == TextRange {55, 72});
    CHECK((*spans)[0].quote == QStringLiteral("blames the budget"));
    CHECK((*spans)[0].phase == Phase::Reliability);
    // The second "The" opens the second paragraph at code point 75.
    CHECK((*spans)[1].content.range == TextRange {75, 78});
    // Imported codings are finished work: f1 and f2 are marked done for C01 in the import's
    // phase, so they count for reliability (CodingScope).
    CHECK(r->articlesDone == 2);
    auto assignments = f.project.assignments();
    REQUIRE(assignments);
    REQUIRE(assignments->size() == 2);
    for (const Assignment &a : *assignments) {
        CHECK(a.status == QStringLiteral("done"));
        CHECK(a.phase == Phase::Reliability);
    }
}

TEST_CASE("codings lines longer than one read step and a last line without a break are read whole")
{
    // Lines are read in steps of 64 KiB (coding_import.cpp): a note of 200,000 characters
    // crosses three steps and the last line of the file has no line break.
    CodingFixture f;
    const QByteArray note(200000, 'n');
    auto r = f.run("{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":"
                   "\"blames the budget\",\"note\":\""
        + note
        + "\"}\n"
          "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
          "\"The\",\"occurrence\":2}");
    REQUIRE(r);
    CHECK(r->spans == 2);
    auto spans = f.project.annotations(f.articleId(QStringLiteral("f1")));
    REQUIRE(spans);
    REQUIRE(spans->size() == 2);
    CHECK((*spans)[0].content.note == QString::fromLatin1(note));
    CHECK((*spans)[1].content.range == TextRange {75, 78});
}

TEST_CASE("a bad codings file names the line and changes nothing")
{
    CodingFixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    struct Case {
        QByteArray second;
        const char *expected;
    };
    const Case cases[] = {
        {"{\"article\":\"f9\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"x\"}",
            "unknown article"},
        {"{\"article\":\"f1\",\"coder\":\"C09\",\"function\":\"cause\",\"quote\":\"x\"}",
            "unknown coder"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"solution\",\"quote\":\"ferry\"}",
            "unknown function"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"zeppelin\"}",
            "does not occur"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"ferry\","
         "\"occurrence\":2}",
            "does not occur 2"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\"}",
            "missing required field \"quote\""},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":7}",
            "\"quote\" must be a non-empty string"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"evaluation\",\"quote\":\"ferry\","
         "\"attributes\":{\"polarity\":\"angry\"}}",
            "not a value"},
        {"{\"article\":\"f1\"", "not a JSON object"},
        // Misspelled keys and wrong types are refused, never dropped (the actor, note and
        // confidence would be lost otherwise).
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"ferry\","
         "\"atributes\":{\"actor\":\"council\"}}",
            "unknown field \"atributes\""},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"ferry\","
         "\"notes\":\"x\"}",
            "unknown field \"notes\""},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"ferry\","
         "\"attributes\":\"x\"}",
            "field \"attributes\" must be an object"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"ferry\","
         "\"confidence\":\"high\"}",
            "field \"confidence\" must be a number"},
        {"{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"ferry\","
         "\"note\":3}",
            "field \"note\" must be text"},
    };
    for (const Case &c : cases) {
        INFO(c.expected);
        auto r = f.run(
            "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":\"ferry\"}\n"
            + c.second + "\n");
        REQUIRE_FALSE(r);
        CHECK(r.error().line == 2);
        CHECK(r.error().message.contains(QString::fromUtf8(c.expected)));
        CHECK(r.error().message.contains(QStringLiteral("codings.jsonl:2")));
        CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
    }
}

TEST_CASE("a lead's gold line becomes a gold span with the overlapping spans as provenance")
{
    CodingFixture f;
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    auto r = f.run("{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":"
                   "\"blames the budget\"}\n"
                   "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
                   "\"blames\"}\n"
                   "{\"article\":\"f1\",\"coder\":\"L01\",\"gold\":true,\"function\":\"cause\","
                   "\"quote\":\"the budget\",\"rationale\":\"the actor only\"}\n");
    REQUIRE(r);
    CHECK(r->spans == 2);
    CHECK(r->gold == 1);
    auto gold = f.project.goldAnnotations(f.articleId(QStringLiteral("f1")));
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    CHECK((*gold)[0].content.range == TextRange {62, 72});
    CHECK((*gold)[0].rationale == QStringLiteral("the actor only"));
    // Only the cause span overlaps with the same function; the problem span is not a source.
    auto spans = f.project.annotations(f.articleId(QStringLiteral("f1")));
    REQUIRE(spans);
    const auto cause = std::ranges::find_if(
        *spans, [](const Annotation &a) { return a.content.function == FramingFunction::Cause; });
    REQUIRE(cause != spans->end());
    REQUIRE((*gold)[0].sources.size() == 1);
    CHECK((*gold)[0].sources[0] == cause->id);
}

TEST_CASE("a gold line from a coder who is not a lead is refused with its line")
{
    CodingFixture f;
    auto r = f.run("{\"article\":\"f1\",\"coder\":\"C01\",\"gold\":true,\"function\":\"cause\","
                   "\"quote\":\"the budget\"}\n");
    REQUIRE_FALSE(r);
    CHECK(r.error().line == 1);
    CHECK(f.project.goldAnnotations()->empty());
}

TEST_CASE("importing many codings parses the codebook at most once")
{
    CodingFixture f;
    // 40 different spans: the first 1, 2, ..., 40 characters of the text (a line the project
    // already holds would be skipped).
    const QByteArray text = "The ferry to Brakwater will stop in May. Dr. Ilse Varn";
    QByteArray jsonl;
    for (int i = 1; i <= 40; ++i)
        jsonl += "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":\""
            + text.left(i) + "\"}\n";
    const qint64 before = store::codebookParses();
    auto r = f.run(jsonl);
    REQUIRE(r);
    CHECK(r->spans == 40);
    // Every span is checked against the codebook; its JSON is parsed once (or not at all when
    // this process has parsed the same codebook before).
    CHECK(store::codebookParses() - before <= 1);
}

TEST_CASE("a codings import compiles the same statements for 40 lines as for 160")
{
    // Every kind of row (span, answer, gold, article marked done) reuses its prepared
    // statements, so what an import compiles does not grow with its lines; and the statements
    // it runs grow by the same number per line, never with what is already stored.
    const int sizes[3] = {10, 20, 40};
    qint64 prepared[3] = {};
    qint64 run[3] = {};
    for (int i = 0; i < 3; ++i) {
        CodingFixture f;
        f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
        QByteArray jsonl = "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\","
                           "\"quote\":\"The ferry\"}\n";
        // Different spans (the first 1, 2, ... characters of f2) and an answer that changes on
        // every line: nothing the project already holds, so nothing is skipped.
        const QByteArray f2 = "Het windpark komt er, bijv. op de dijk. Bewoners zijn boos.";
        const char *values[2] = {"cause", "remedy"};
        for (int k = 0; k < sizes[i]; ++k)
            jsonl += "{\"article\":\"f2\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\""
                + f2.left(k + 1)
                + "\"}\n"
                  "{\"article\":\"f2\",\"coder\":\"C01\",\"item\":\"dominant_function\","
                  "\"value\":\""
                + values[k % 2] + "\"}\n";
        // Gold lines whose one source is the span on f1 ("The ferry"): its first 1, 2, ...
        // characters and on into the text.
        const QByteArray f1 = "The ferry to Brakwater will stop in May. Dr. Ilse Varn blames";
        for (int k = 0; k < sizes[i]; ++k)
            jsonl += "{\"article\":\"f1\",\"coder\":\"L01\",\"gold\":true,\"function\":"
                     "\"problem\",\"quote\":\""
                + f1.left(k + 1) + "\"}\n";
        const Database &db = databaseForTesting(f.project);
        const qint64 preparedBefore = db.statementsPrepared();
        const qint64 runBefore = db.statementsRun();
        auto r = f.run(jsonl);
        INFO((r ? QString() : r.error().toString()).toStdString());
        REQUIRE(r);
        CHECK(r->spans == 1 + sizes[i]);
        CHECK(r->judgements == sizes[i]);
        CHECK(r->gold == sizes[i]);
        CHECK(r->articlesDone == 2);
        prepared[i] = db.statementsPrepared() - preparedBefore;
        run[i] = db.statementsRun() - runBefore;
    }
    CHECK(prepared[0] > 0);
    CHECK(prepared[1] == prepared[0]);
    CHECK(prepared[2] == prepared[0]);
    CHECK(run[2] - run[1] == 2 * (run[1] - run[0]));
}

TEST_CASE("invalid UTF-8 in a codings file names its line and column and changes nothing")
{
    CodingFixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    auto r = f.run("{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
                   "\"ferry\"}\n"
                   "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
                   "\"f\xC3\"}\n");
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(r.error().line == 2);
    CHECK(r.error().column == 62);
    CHECK(r.error().message.contains(QStringLiteral("codings.jsonl:2:62")));
    CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
}

TEST_CASE("importing the same codings file twice adds nothing the second time")
{
    // The rule every importer keeps (README, "Importing"): a second import of the same lines
    // adds no span, answer, gold span, status or log entry.
    CodingFixture f;
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    const QByteArray lines =
        "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":"
        "\"blames the budget\",\"attributes\":{\"actor\":\"budget\"}}\n"
        "{\"article\":\"f2\",\"coder\":\"C01\",\"item\":\"dominant_function\",\"value\":"
        "\"evaluation\"}\n"
        "{\"article\":\"f1\",\"coder\":\"L01\",\"gold\":true,\"function\":\"cause\","
        "\"quote\":\"the budget\",\"rationale\":\"the actor only\"}\n";
    auto first = f.run(lines);
    REQUIRE(first);
    CHECK(first->spans == 1);
    CHECK(first->judgements == 1);
    CHECK(first->gold == 1);
    CHECK(first->skipped == 0);
    const QString before = dumpDatabase(databaseForTesting(f.project), {});

    auto second = f.run(lines);
    REQUIRE(second);
    CHECK(second->spans == 0);
    CHECK(second->judgements == 0);
    CHECK(second->gold == 0);
    CHECK(second->articlesDone == 0);
    CHECK(second->skipped == 3);
    CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);

    // A line repeated inside one file is added once.
    CodingFixture g;
    auto twice = g.run("{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
                       "\"blames\"}\n"
                       "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"problem\",\"quote\":"
                       "\"blames\"}\n");
    REQUIRE(twice);
    CHECK(twice->spans == 1);
    CHECK(twice->skipped == 1);
}
