// The external-command protocol (core/extract/extractor_protocol.h) with small Python test
// extractors in tests/extract/scripts: a good one, one that exits with an error, one killed by a
// signal, one that hangs, one that prints garbage, and one that echoes given spans. After every
// failure the project must hold no run and be unchanged (all-or-nothing, design.md §7).
#include "core/extract/command_extractor.h"
#include "core/extract/extractor_runs.h"
#include "core/project/testing/project_database.h"
#include "tests/extract/extract_fixture.h"
#include "tests/support/db_dump.h"

#include <QElapsedTimer>
#include <QFile>
#include <QJsonArray>
#include <QThread>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QString script(const char *name, const QString &arguments = {})
{
    QString command = QStringLiteral("/usr/bin/python3 %1/%2")
                          .arg(QStringLiteral(FOURFOLD_EXTRACT_SCRIPTS), QString::fromLatin1(name));
    if (!arguments.isEmpty())
        command += QLatin1Char(' ') + arguments;
    return command;
}

struct Fixture : ProjectFixture {
    Fixture() { importJsonl(kFerryArticle + kDykeArticle); }

    // Runs `command` as run "r" and requires it to fail leaving the project as it was.
    Error runFails(const QString &command, double timeout = 30)
    {
        const QString before = dumpDatabase(databaseForTesting(project), {});
        CommandExtractor extractor(command, timeout);
        auto run = ExtractorRuns::create(project, extractor, QStringLiteral("r"));
        REQUIRE_FALSE(run);
        auto runs = ExtractorRuns::runs(project);
        REQUIRE(runs);
        CHECK(runs->empty());
        CHECK(dumpDatabase(databaseForTesting(project), {}) == before);
        return run.error();
    }
};

// A JSON argument for the echo and fixed-answer scripts: ' for ", no spaces, so that it needs no
// quoting (QProcess::splitCommand knows only double quotes).
QString spansArgument(const QByteArray &json)
{
    return QString::fromUtf8(json).replace(QLatin1Char('"'), QLatin1Char('\''));
}

} // namespace

TEST_CASE("external extractor: a good program's spans are stored as a run, offsets in code points")
{
    Fixture f;
    const QString command = script("first_sentence_extractor.py");
    CommandExtractor extractor(
        command, 30, QStringLiteral("0.3"), {{QStringLiteral("model"), QStringLiteral("tiny")}});
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("first-sentence"));
    REQUIRE(run);
    CHECK(run->name == QStringLiteral("first-sentence"));
    CHECK(run->version == QStringLiteral("0.3"));
    CHECK(run->parameters
        == QJsonObject {{QStringLiteral("extractor"), QStringLiteral("command")},
            {QStringLiteral("command"), command}, {QStringLiteral("timeout"), 30},
            {QStringLiteral("idle_timeout"), 120},
            {QStringLiteral("model"), QStringLiteral("tiny")}});

    auto spans = ExtractorRuns::spans(f.project, run->id);
    REQUIRE(spans);
    const ArticleId ferry = f.articleId(QStringLiteral("ferry"));
    const ArticleId dyke = f.articleId(QStringLiteral("dyke"));
    REQUIRE(spans->size() == 3);
    // Python slices str by code points: the first sentence ends at 37 although the emoji takes
    // two UTF-16 units.
    CHECK((*spans)[0].article == ferry);
    CHECK((*spans)[0].function == FramingFunction::Problem);
    CHECK((*spans)[0].range == TextRange {0, 37});
    CHECK_FALSE((*spans)[0].score.has_value());
    CHECK((*spans)[1].article == ferry);
    CHECK((*spans)[1].function == FramingFunction::Remedy);
    CHECK((*spans)[1].range == TextRange {85, 117});
    CHECK((*spans)[1].score == 0.9);
    CHECK((*spans)[1].attributes.value(QStringLiteral("quote")).toString()
        == QStringLiteral("The council must find the money."));
    CHECK((*spans)[2].article == dyke);
    CHECK((*spans)[2].range == TextRange {0, 27});

    auto one = ExtractorRuns::spans(f.project, run->id, dyke);
    REQUIRE(one);
    CHECK(one->size() == 1);
}

TEST_CASE("external extractor: a program that exits with an error stores nothing")
{
    Fixture f;
    const Error e = f.runFails(script("crashing_extractor.py"));
    CHECK(e.code == ErrorCode::Io);
    CHECK(e.message
        == QStringLiteral("The extractor \"%1\" exited with code 3; nothing was stored.")
               .arg(script("crashing_extractor.py")));
    // The program's stderr is the cause.
    CHECK(e.cause == QStringLiteral("stderr: model file weights.bin not found"));
}

TEST_CASE("external extractor: a program killed by a signal stores nothing")
{
    Fixture f;
    const Error e = f.runFails(script("signal_extractor.py"));
    CHECK(e.code == ErrorCode::Io);
    CHECK(e.message.contains(QStringLiteral("crashed; nothing was stored.")));
}

TEST_CASE("external extractor: a program that hangs is stopped at the timeout")
{
    Fixture f;
    QElapsedTimer timer;
    timer.start();
    const Error e = f.runFails(script("hanging_extractor.py"), 1.5);
    CHECK(timer.elapsed() < 20000);
    CHECK(e.code == ErrorCode::Io);
    CHECK(e.message
        == QStringLiteral("The extractor \"%1\" did not finish within 1.5 s and was stopped; "
                          "nothing was stored.")
               .arg(script("hanging_extractor.py")));
    CHECK(e.cause == QStringLiteral("stderr: thinking..."));
}

TEST_CASE("external extractor: garbage on stdout is refused with the line and column")
{
    Fixture f;
    const Error e = f.runFails(script("garbage_extractor.py"));
    CHECK(e.code == ErrorCode::InvalidInput);
    CHECK(e.file == QStringLiteral("output of \"%1\"").arg(script("garbage_extractor.py")));
    CHECK(e.line == 2);
    // {"id": "x", "spans": [} — the '}' is column 23; Qt's parser (QJsonParseError::offset)
    // reports the position after it, column 24, and the column is Qt's.
    CHECK(e.column == 24);
    CHECK(e.message.startsWith(e.file + QStringLiteral(":2:24: not valid JSON")));
}

TEST_CASE("external extractor: a program that cannot start, or an empty command")
{
    Fixture f;
    Error e = f.runFails(QStringLiteral("/nonexistent/extractor --fast"));
    CHECK(e.code == ErrorCode::Io);
    CHECK(e.message
        == QStringLiteral("The extractor \"/nonexistent/extractor --fast\" could not be started."));
    e = f.runFails(QStringLiteral("   "));
    CHECK(e.code == ErrorCode::InvalidArgument);
}

TEST_CASE("external extractor: malformed answers are refused naming the line")
{
    struct Row {
        QString command;
        qint64 line;
        const char *what;
    };
    const std::vector<Row> rows {
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"remedy","start":0,"end":30}])")),
            2,
            "span 1 of article \"dyke\": the span [0, 30) ends past the end of the article, "
            "which has 27 code points"},
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"frame","start":0,"end":3}])")),
            1,
            "span 1 of article \"ferry\": field \"function\" must be problem, cause, "
            "evaluation or remedy, got \"frame\""},
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"cause","start":4,"end":4}])")),
            1,
            "span 1 of article \"ferry\": the span [4, 4) is empty: \"end\" must be greater "
            "than \"start\""},
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"cause","start":1.5,"end":4}])")),
            1,
            "span 1 of article \"ferry\": field \"start\" must be a whole number of code "
            "points of at least 0, got 1.5"},
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"cause","start":1,"end":"4"}])")),
            1,
            "span 1 of article \"ferry\": field \"end\" must be a whole number of code "
            "points of at least 0, got string"},
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"cause","start":1,"end":4,"label":"x"}])")),
            1,
            "span 1 of article \"ferry\": unknown field \"label\"; a span has the fields "
            "function, start, end, score, attributes (put further data inside "
            "\"attributes\")"},
        {script("echo_spans_extractor.py",
             spansArgument(R"([{"function":"cause","start":1,"end":4,"score":"high"}])")),
            1,
            "span 1 of article \"ferry\": field \"score\" must be a number or null, got "
            "string"},
    };
    for (const Row &row : rows) {
        INFO(row.command.toStdString());
        Fixture f;
        const Error e = f.runFails(row.command);
        CHECK(e.code == ErrorCode::InvalidInput);
        CHECK(e.line == row.line);
        CHECK(e.message
            == QStringLiteral("output of \"%1\":%2: %3")
                   .arg(row.command)
                   .arg(row.line)
                   .arg(QString::fromUtf8(row.what)));
    }
}

TEST_CASE("external extractor: every article must be answered exactly once")
{
    Fixture f;
    // Reads everything, answers nothing, exits 0.
    Error e = f.runFails(QStringLiteral("/usr/bin/python3 -c \"import sys; sys.stdin.read()\""));
    CHECK(e.code == ErrorCode::InvalidInput);
    CHECK(e.message.endsWith(QStringLiteral(": 2 article(s) got no answer: \"dyke\", \"ferry\"")));

    e = f.runFails(script("fixed_answers_extractor.py",
        spansArgument(R"({"id":"ferry","spans":[]} {"id":"ferry","spans":[]})")));
    CHECK(e.line == 2);
    CHECK(
        e.message.endsWith(QStringLiteral(":2: article \"ferry\" was already answered on line 1")));

    e = f.runFails(script("fixed_answers_extractor.py",
        spansArgument(R"({"id":"dyke","spans":[]} {"id":"other","spans":[]})")));
    CHECK(
        e.message.endsWith(QStringLiteral(":2: article \"other\" was not sent to the extractor")));
}

TEST_CASE("external extractor: the input lines follow the protocol")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle);
    // The program echoes its input back in an attribute, so the test can read what it got.
    const QString command = QStringLiteral(
        "/usr/bin/python3 -c \"import sys, json\nfor l in sys.stdin:\n a = json.loads(l)\n "
        "print(json.dumps({'id': a['id'], 'spans': [{'function': 'problem', 'start': 0, "
        "'end': 1, 'attributes': {'input': a}}]}))\"");
    CommandExtractor extractor(command, 30);
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("echo"));
    REQUIRE(run);
    auto spans = ExtractorRuns::spans(f.project, run->id);
    REQUIRE(spans);
    REQUIRE(spans->size() == 1);
    const QJsonObject input = spans->front().attributes.value(QStringLiteral("input")).toObject();
    CHECK(input.keys()
        == QStringList {QStringLiteral("id"), QStringLiteral("language"),
            QStringLiteral("paragraphs"), QStringLiteral("sentences"), QStringLiteral("text"),
            QStringLiteral("title"), QStringLiteral("tokens")});
    CHECK(input.value(QStringLiteral("id")).toString() == QStringLiteral("ferry"));
    CHECK(input.value(QStringLiteral("language")).toString() == QStringLiteral("en"));
    CHECK(input.value(QStringLiteral("paragraphs")).toArray().at(2).toObject()
        == QJsonObject {{QStringLiteral("start"), 85}, {QStringLiteral("end"), 126},
            {QStringLiteral("role"), QStringLiteral("conclusion")}});
    CHECK(input.value(QStringLiteral("sentences")).toArray().at(3).toArray()
        == QJsonArray {118, 126});
    // "Brakwater’s" is one token (U+2019 is MidNumLet, UAX #29 WB6/WB7); the emoji is the
    // third, one code point wide: [18, 19).
    CHECK(input.value(QStringLiteral("tokens")).toArray().at(2).toArray() == QJsonArray {18, 19});
}

TEST_CASE("external extractor: a program that goes silent is stopped at the idle timeout")
{
    Fixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    // No total limit; one second without output stops it.
    CommandExtractor extractor(script("hanging_extractor.py"), 0);
    extractor.setIdleTimeout(1);
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("r"));
    REQUIRE_FALSE(run);
    CHECK(run.error().code == ErrorCode::Io);
    CHECK(run.error().message
        == QStringLiteral("The extractor \"%1\" wrote nothing for 1 s and was stopped; nothing "
                          "was stored.")
               .arg(script("hanging_extractor.py")));
    CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
}

TEST_CASE("external extractor: a slow program that keeps answering is not stopped")
{
    Fixture f;
    // Two articles, 0.8 s of thinking before each answer: the run takes longer than the 1.2 s
    // idle timeout, but an answer comes before 1.2 s pass and the idle clock restarts with it.
    // (The idle clock watches stdout only: a program that only talks on stderr is silent.)
    CommandExtractor extractor(script("slow_extractor.py", QStringLiteral("0.8")), 0);
    extractor.setIdleTimeout(1.2);
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("slow"));
    INFO((run ? QString() : run.error().toString()).toStdString());
    REQUIRE(run);
    CHECK(extractor.parameters().value(QStringLiteral("idle_timeout")).toDouble() == 1.2);
}

TEST_CASE("external extractor: what the program starts does not outlive the run")
{
    Fixture f;
    const QString pidFile = f.dir.filePath(QStringLiteral("helper.pid"));
    CommandExtractor extractor(script("orphan_extractor.py", pidFile), 0);
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("orphan"));
    INFO((run ? QString() : run.error().toString()).toStdString());
    REQUIRE(run);
    const QByteArray pid = readFile(pidFile).trimmed();
    REQUIRE_FALSE(pid.isEmpty());
    // The helper's /proc entry is gone, or it is a zombie waiting for its new parent to reap it.
    QFile stat(QStringLiteral("/proc/%1/stat").arg(QString::fromLatin1(pid)));
    bool alive = false;
    for (int i = 0; i < 50; ++i) {
        alive = stat.open(QIODevice::ReadOnly);
        if (alive) {
            const QByteArray fields = stat.readAll();
            stat.close();
            const qsizetype close = fields.lastIndexOf(')');
            alive = close > 0 && fields.mid(close + 2, 1) != "Z";
        }
        if (!alive)
            break;
        QThread::msleep(20);
    }
    CHECK_FALSE(alive);
}

TEST_CASE("Issue 20 item 6: an extractor that floods stdout is stopped at the output limit")
{
    Fixture f;
    const QString command = QStringLiteral("/bin/sh %1/flooding_extractor.sh stdout")
                                .arg(QStringLiteral(FOURFOLD_EXTRACT_SCRIPTS));
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    CommandExtractor extractor(command, 60);
    extractor.setOutputLimits(qint64(1) << 20, qint64(256) << 10);
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("r"));
    REQUIRE_FALSE(run);
    CHECK(run.error().code == ErrorCode::InvalidInput);
    CHECK(run.error().message
        == QStringLiteral("output of \"%1\": the extractor wrote more than 1 MiB, the most a run "
                          "may write; it was stopped and nothing was stored.")
               .arg(command));
    CHECK(ExtractorRuns::runs(f.project)->empty());
    CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
}

TEST_CASE("Issue 20 item 6: an extractor line beyond the line limit is refused with its line")
{
    Fixture f;
    const QString command = QStringLiteral("/bin/sh %1/flooding_extractor.sh line")
                                .arg(QStringLiteral(FOURFOLD_EXTRACT_SCRIPTS));
    CommandExtractor extractor(command, 60);
    extractor.setOutputLimits(qint64(16) << 20, qint64(256) << 10);
    auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("r"));
    REQUIRE_FALSE(run);
    CHECK(run.error().code == ErrorCode::InvalidInput);
    CHECK(run.error().line == 3);
    CHECK(run.error().message
        == QStringLiteral("output of \"%1\":3: a line is longer than 0.25 MiB, the most one answer "
                          "may be; the extractor was stopped and nothing was stored.")
               .arg(command));
    CHECK(ExtractorRuns::runs(f.project)->empty());
}

TEST_CASE("Issue 20 item 6: only the tail of a flooded stderr is held")
{
    Fixture f;
    const QString scripts = QStringLiteral(FOURFOLD_EXTRACT_SCRIPTS);
    SECTION("a run that succeeds is stored")
    {
        CommandExtractor extractor(
            QStringLiteral("/bin/sh %1/flooding_extractor.sh stderr").arg(scripts), 60);
        auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("noisy"));
        INFO((run ? QString() : run.error().toString()).toStdString());
        REQUIRE(run);
        CHECK(ExtractorRuns::runs(f.project)->size() == 1);
        // 8 MB went through stderr; at most the tail and one read of the pipe were held.
        CHECK(extractor.mostStderrHeld() >= CommandExtractor::kStderrTailBytes);
        CHECK(extractor.mostStderrHeld() <= CommandExtractor::kStderrTailBytes + (qint64(1) << 20));
    }
    SECTION("a run that fails names the last stderr line")
    {
        CommandExtractor extractor(
            QStringLiteral("/bin/sh %1/flooding_extractor.sh stderr-fail").arg(scripts), 60);
        auto run = ExtractorRuns::create(f.project, extractor, QStringLiteral("noisy"));
        REQUIRE_FALSE(run);
        CHECK(run.error().code == ErrorCode::Io);
        CHECK(run.error().message.contains(QStringLiteral("exited with code 3")));
        CHECK(run.error().cause.endsWith(QStringLiteral("LAST-STDERR-LINE")));
        CHECK(extractor.mostStderrHeld() <= CommandExtractor::kStderrTailBytes + (qint64(1) << 20));
    }
}

TEST_CASE("external extractor: the articles go to stdin as the program reads them")
{
    // 3,000 articles of 4,000 characters: 12 MB of protocol lines. They are written as the
    // program takes them, so what waits for stdin stays near kInputAheadBytes (plus one line).
    std::vector<Article> articles(3000);
    for (size_t i = 0; i < articles.size(); ++i) {
        Article &a = articles[i];
        a.summary.id = ArticleId {qint64(i + 1)};
        a.summary.externalId = QStringLiteral("a%1").arg(i);
        a.text = QString(4000, QLatin1Char('x'));
        a.summary.length = a.text.size();
    }
    CommandExtractor extractor(script("first_sentence_extractor.py"), 120);
    auto spans = extractor.extract(articles);
    INFO((spans ? QString() : spans.error().toString()).toStdString());
    REQUIRE(spans);
    CHECK(spans->empty()); // no sentences given, so no spans
    CHECK(extractor.mostInputHeld() > 0);
    CHECK(extractor.mostInputHeld() <= CommandExtractor::kInputAheadBytes + 8192);
}
