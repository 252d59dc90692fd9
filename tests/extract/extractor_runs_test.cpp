// Stored extractor runs: several side by side, span files imported whole or not at all with
// file:line errors, deletion, the event log, and fault injection (fail the Nth SQLite step and
// prove nothing was written — the SQLite project's own testing practice).
#include "core/extract/extractor_runs.h"
#include "core/extract/position_baseline.h"
#include "core/project/testing/project_database.h"
#include "core/store/statement.h"
#include "tests/extract/extract_fixture.h"
#include "tests/support/db_dump.h"

#include <sqlite3.h>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// An extractor that counts its calls and returns the spans it is given.
class FakeExtractor final : public Extractor
{
public:
    std::vector<ExtractedSpan> spans;
    int calls = 0;

    QString kind() const override { return QStringLiteral("fake"); }
    QString version() const override { return QStringLiteral("9"); }
    QJsonObject parameters() const override { return {{QStringLiteral("k"), 1}}; }
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &) override
    {
        ++calls;
        return spans;
    }
};

QStringList events(Project &project)
{
    auto stmt = databaseForTesting(project).prepare(QStringLiteral(
        "SELECT action, json_extract(detail, '$.name') FROM event_log WHERE object_type = "
        "'extractor_run' ORDER BY id"));
    REQUIRE(stmt);
    QStringList out;
    while (true) {
        auto row = stmt->step();
        REQUIRE(row);
        if (!*row)
            return out;
        out << stmt->columnText(0) + QLatin1Char(' ') + stmt->columnText(1);
    }
}

struct Fixture : ProjectFixture {
    Fixture() { importJsonl(kFerryArticle + kDykeArticle); }
};

} // namespace

TEST_CASE("runs: several runs side by side, each with its parameters")
{
    Fixture f;
    auto paragraphs = PositionBaseline::create();
    auto sentences =
        PositionBaseline::create({{QStringLiteral("unit"), QStringLiteral("sentence")}});
    REQUIRE(paragraphs);
    REQUIRE(sentences);
    auto a = ExtractorRuns::create(f.project, *paragraphs, QStringLiteral("position"));
    auto b = ExtractorRuns::create(f.project, *sentences, QStringLiteral("position per sentence"));
    REQUIRE(a);
    REQUIRE(b);

    auto runs = ExtractorRuns::runs(f.project);
    REQUIRE(runs);
    REQUIRE(runs->size() == 2);
    CHECK((*runs)[0].name == QStringLiteral("position"));
    CHECK((*runs)[1].name == QStringLiteral("position per sentence"));
    CHECK((*runs)[1].version == QStringLiteral("1"));
    CHECK((*runs)[1].parameters.value(QStringLiteral("unit")).toString()
        == QStringLiteral("sentence"));
    CHECK((*runs)[1].parameters.value(QStringLiteral("extractor")).toString()
        == QStringLiteral("position"));
    CHECK((*runs)[0].uuid != (*runs)[1].uuid);
    CHECK((*runs)[0].createdAt.endsWith(u'Z'));

    auto byName = ExtractorRuns::runByName(f.project, QStringLiteral("position per sentence"));
    REQUIRE(byName);
    REQUIRE(byName->has_value());
    CHECK((*byName)->id == b->id);
    auto missing = ExtractorRuns::runByName(f.project, QStringLiteral("nope"));
    REQUIRE(missing);
    CHECK_FALSE(missing->has_value());

    // ferry: problem [0,37), remedy [85,117), [118,126); dyke: problem [0,27).
    auto spans = ExtractorRuns::spans(f.project, b->id);
    REQUIRE(spans);
    REQUIRE(spans->size() == 4);
    CHECK((*spans)[2].range == TextRange {118, 126});
    CHECK(ExtractorRuns::spanCount(f.project, a->id) == 3);
    CHECK(events(f.project)
        == QStringList {QStringLiteral("extractor_run.add position"),
            QStringLiteral("extractor_run.add position per sentence")});
}

TEST_CASE("runs: a taken or empty name is refused before the extractor runs")
{
    Fixture f;
    FakeExtractor fake;
    REQUIRE(ExtractorRuns::create(f.project, fake, QStringLiteral("one")));
    CHECK(fake.calls == 1);
    auto again = ExtractorRuns::create(f.project, fake, QStringLiteral("one"));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
    CHECK(again.error().message
        == QStringLiteral(
            "There is already a run called \"one\"; choose another name or delete it first."));
    for (const QString &bad : {QString(), QStringLiteral(" x"), QStringLiteral("a\tb")}) {
        auto r = ExtractorRuns::create(f.project, fake, bad);
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidArgument);
    }
    CHECK(fake.calls == 1);
}

TEST_CASE("runs: an extractor's span outside its article stores nothing")
{
    Fixture f;
    FakeExtractor fake;
    ExtractedSpan good;
    good.article = f.articleId(QStringLiteral("ferry"));
    good.range = {0, 5};
    ExtractedSpan bad = good;
    bad.article = f.articleId(QStringLiteral("dyke"));
    bad.range = {20, 28};
    fake.spans = {good, bad};
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    auto r = ExtractorRuns::create(f.project, fake, QStringLiteral("bad"));
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::InvalidInput);
    CHECK(r.error().message
        == QStringLiteral("A span of run \"bad\", [20, 28), does not lie inside article dyke (27 "
                          "code points) or is empty."));
    CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
}

TEST_CASE("runs: a failure at any SQLite step of storing a run writes nothing")
{
    Fixture f;
    auto baseline = PositionBaseline::create();
    REQUIRE(baseline);
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    int failures = 0;
    for (int n = 1; n < 100; ++n) {
        int steps = 0;
        databaseForTesting(f.project).setFaultHook(
            [&] { return ++steps == n ? SQLITE_IOERR : SQLITE_OK; });
        auto r = ExtractorRuns::create(f.project, *baseline, QStringLiteral("p"));
        databaseForTesting(f.project).setFaultHook({});
        if (r) {
            CHECK(ExtractorRuns::spanCount(f.project, r->id) == 3);
            break;
        }
        ++failures;
        CHECK(r.error().code == ErrorCode::Io);
        REQUIRE(dumpDatabase(databaseForTesting(f.project), {}) == before);
    }
    // Reading the project, one run row, three spans, one event: well over five steps.
    CHECK(failures > 5);
}

TEST_CASE("runs: delete removes a run and its spans and logs it")
{
    Fixture f;
    auto baseline = PositionBaseline::create();
    REQUIRE(baseline);
    auto keep = ExtractorRuns::create(f.project, *baseline, QStringLiteral("keep"));
    auto drop = ExtractorRuns::create(f.project, *baseline, QStringLiteral("drop"));
    REQUIRE(keep);
    REQUIRE(drop);
    REQUIRE(ExtractorRuns::deleteRun(f.project, QStringLiteral("drop")));
    auto runs = ExtractorRuns::runs(f.project);
    REQUIRE(runs);
    REQUIRE(runs->size() == 1);
    CHECK(runs->front().name == QStringLiteral("keep"));
    CHECK(ExtractorRuns::spanCount(f.project, drop->id) == 0);
    CHECK(ExtractorRuns::spanCount(f.project, keep->id) == 3);
    auto again = ExtractorRuns::deleteRun(f.project, QStringLiteral("drop"));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::NotFound);
    CHECK(events(f.project).last() == QStringLiteral("extractor_run.delete drop"));
    // The name is free again.
    CHECK(ExtractorRuns::create(f.project, *baseline, QStringLiteral("drop")));
}

TEST_CASE("runs: importing a finished run from a span file")
{
    Fixture f;
    // A leading byte-order mark is accepted; blank lines are skipped; CRLF ends a line too.
    const QString path = writeFile(f.dir, QStringLiteral("spans.jsonl"),
        "\xEF\xBB\xBF{\"article\":\"ferry\",\"function\":\"cause\",\"start\":39,\"end\":83,"
        "\"score\":0.25}\n"
        "\n"
        "{\"article\":\"dyke\",\"function\":\"evaluation\",\"start\":0,\"end\":27,"
        "\"attributes\":{\"polarity\":\"negative\"},\"score\":null}\r\n"
        "{\"article\":\"ferry\",\"function\":\"problem\",\"start\":0,\"end\":37}");
    auto run = ExtractorRuns::importRun(f.project, QStringLiteral("model-a"), path,
        QStringLiteral("2.1"), {{QStringLiteral("threshold"), 0.4}});
    REQUIRE(run);
    CHECK(run->version == QStringLiteral("2.1"));
    CHECK(run->parameters.value(QStringLiteral("extractor")).toString() == QStringLiteral("file"));
    CHECK(
        run->parameters.value(QStringLiteral("file")).toString() == QStringLiteral("spans.jsonl"));
    CHECK(run->parameters.value(QStringLiteral("threshold")).toDouble() == 0.4);
    CHECK(run->parameters.value(QStringLiteral("sha256")).toString().size() == 64);
    auto spans = ExtractorRuns::spans(f.project, run->id);
    REQUIRE(spans);
    REQUIRE(spans->size() == 3);
    // By article (ferry was imported first), then start.
    CHECK((*spans)[0].function == FramingFunction::Problem);
    CHECK((*spans)[1].function == FramingFunction::Cause);
    CHECK((*spans)[1].score == 0.25);
    CHECK((*spans)[2].article == f.articleId(QStringLiteral("dyke")));
    CHECK_FALSE((*spans)[2].score.has_value());
    CHECK((*spans)[2].attributes.value(QStringLiteral("polarity")).toString()
        == QStringLiteral("negative"));
}

TEST_CASE("runs: a malformed span file is refused with file, line and column, nothing stored")
{
    struct Row {
        QByteArray content;
        qint64 line;
        qint64 column;
        const char *what;
    };
    const QByteArray good =
        "{\"article\":\"ferry\",\"function\":\"cause\",\"start\":0,\"end\":5}\n";
    const std::vector<Row> rows {
        // A trailing comma (RFC 8259 §4 allows none): the '}' after it is column 57; Qt's parser
        // (QJsonParseError::offset) reports the position after it, column 58.
        {good + "{\"article\":\"ferry\",\"function\":\"cause\",\"start\":0,\"end\":5,}\n", 2, 58,
            "not valid JSON"},
        {good + good + "{\"article\":\"fjord\",\"function\":\"cause\",\"start\":0,\"end\":5}\n", 3,
            0, "there is no article \"fjord\" in the project"},
        {good + "{\"function\":\"cause\",\"start\":0,\"end\":5}\n", 2, 0,
            "missing field \"article\""},
        {"{\"article\":7,\"function\":\"cause\",\"start\":0,\"end\":5}\n", 1, 0,
            "field \"article\" must be a string, got number"},
        {"{\"article\":\"dyke\",\"function\":\"cause\",\"start\":0,\"end\":28}\n", 1, 0,
            "the span [0, 28) ends past the end of the article, which has 27 code points"},
        {"{\"article\":\"dyke\",\"function\":\"cause\",\"start\":-1,\"end\":2}\n", 1, 0,
            "field \"start\" must be a whole number of code points of at least 0, got -1"},
        {"{\"article\":\"dyke\",\"start\":0,\"end\":2}\n", 1, 0, "missing field \"function\""},
        {"{\"article\":\"dyke\",\"function\":\"cause\",\"start\":0,\"end\":2,\"quote\":\"De\"}\n",
            1, 0,
            "unknown field \"quote\"; a span has the fields article, function, start, end, "
            "score, attributes (put further data inside \"attributes\")"},
        {"[1, 2]\n", 1, 0, "expected a JSON object, got an array"},
        {"{\"article\":\"dyke\",\"function\":\"cause\",\"start\":0,\"end\":2,\"attributes\":[]}\n",
            1, 0, "field \"attributes\" must be an object or null, got array"},
        {"\n  \n", 0, 0, "the file holds no spans"},
        // 0xFF never occurs in UTF-8 (Unicode 15.0 §3.9 Table 3-7): the 17th character.
        {good + "{\"article\":\"dyke\xff\",\"function\":\"cause\",\"start\":0,\"end\":2}\n", 2, 17,
            "invalid UTF-8"},
    };
    for (const Row &row : rows) {
        INFO(row.content.toStdString());
        Fixture f;
        const QString path = writeFile(f.dir, QStringLiteral("bad.jsonl"), row.content);
        const QString before = dumpDatabase(databaseForTesting(f.project), {});
        auto r = ExtractorRuns::importRun(f.project, QStringLiteral("imported"), path);
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidInput);
        CHECK(r.error().file == path);
        CHECK(r.error().line == row.line);
        CHECK(r.error().column == row.column);
        QString where = path;
        if (row.line > 0)
            where += QStringLiteral(":%1").arg(row.line);
        if (row.column > 0)
            where += QStringLiteral(":%1").arg(row.column);
        CHECK(r.error().message.startsWith(
            where + QStringLiteral(": ") + QString::fromUtf8(row.what)));
        CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
    }

    Fixture f;
    auto missing = ExtractorRuns::importRun(
        f.project, QStringLiteral("x"), f.dir.filePath(QStringLiteral("none.jsonl")));
    REQUIRE_FALSE(missing);
    CHECK(missing.error().code == ErrorCode::Io);
}

namespace {

// Records the size of every batch it is given and finds one span at the start of each article.
class BatchRecorder final : public Extractor
{
public:
    explicit BatchRecorder(bool alone)
        : m_alone(alone)
    { }
    std::vector<size_t> batches;

    QString kind() const override { return QStringLiteral("batches"); }
    QString version() const override { return QStringLiteral("1"); }
    QJsonObject parameters() const override { return {}; }
    bool readsArticlesAlone() const override { return m_alone; }
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) override
    {
        batches.push_back(articles.size());
        std::vector<ExtractedSpan> out;
        for (const Article &a : articles) {
            ExtractedSpan s;
            s.article = a.summary.id;
            s.range = TextRange {0, 4};
            out.push_back(s);
        }
        return out;
    }

private:
    bool m_alone = false;
};

} // namespace

TEST_CASE("runs: an extractor that reads articles alone gets them a batch at a time")
{
    ProjectFixture f;
    QByteArray jsonl;
    for (int i = 1; i <= 600; ++i)
        jsonl += "{\"id\": \"g" + QByteArray::number(i)
            + "\", \"title\": \"T\", \"text\": \"Ferry fares rise again in town "
            + QByteArray::number(i) + ".\"}\n";
    f.importJsonl(jsonl);
    BatchRecorder alone(true), whole(false);
    auto a = ExtractorRuns::create(f.project, alone, QStringLiteral("alone"));
    REQUIRE(a);
    auto w = ExtractorRuns::create(f.project, whole, QStringLiteral("whole"));
    REQUIRE(w);
    // 600 articles: two full batches and the rest; an extractor that may compare articles
    // across the study (an external program) gets them all at once.
    CHECK(alone.batches == std::vector<size_t> {256, 256, 88});
    CHECK(whole.batches == std::vector<size_t> {600});
    // Every batch's spans are stored, the same as from one call.
    auto fromBatches = ExtractorRuns::spans(f.project, a->id);
    auto fromOne = ExtractorRuns::spans(f.project, w->id);
    REQUIRE(fromBatches);
    REQUIRE(fromOne);
    CHECK(fromBatches->size() == 600);
    CHECK(fromOne->size() == 600);
}
