#include "core/exchange/layer_export.h"
#include "core/exchange/w3c_import.h"
#include "core/project/testing/project_database.h"
#include "tests/project/double_coded_project.h"
#include "tests/scoring/scoring_fixture.h"
#include "tests/support/db_dump.h"

#include <QDir>
#include <QJsonDocument>

#include <set>

using namespace fourfold;

namespace {

using F = FramingFunction;

// The options of an export of `layer` as `format` into `dir`; the rest at their defaults.
inline fourfold::ExportOptions exportOptions(
    const fourfold::LayerSpec &layer, fourfold::ExportFormat format, const QString &dir = {})
{
    fourfold::ExportOptions o;
    o.layer = layer;
    o.format = format;
    o.outDir = dir;
    return o;
}

using SpanKey = std::tuple<QString, QString, int, qint64, qint64, QString>;

// Every live annotation as (article external id, coder pseudonym, function, start, end,
// attributes as compact JSON).
std::multiset<SpanKey> spansOf(const Project &p)
{
    std::multiset<SpanKey> out;
    auto coders = p.coders();
    REQUIRE(coders);
    auto articles = p.articles();
    REQUIRE(articles);
    auto all = p.allAnnotations();
    REQUIRE(all);
    for (const Annotation &a : *all) {
        QString coder, article;
        for (const Coder &c : *coders)
            if (c.id == a.coder)
                coder = c.pseudonym;
        for (const ArticleSummary &s : *articles)
            if (s.id == a.article)
                article = s.externalId;
        out.insert({article, coder, int(a.content.function), a.content.range.start,
            a.content.range.end,
            QString::fromUtf8(QJsonDocument(a.content.attributes).toJson(QJsonDocument::Compact))});
    }
    return out;
}

struct RoundTrip : test::ScoringFixture {
    CoderId c1 = addCoder(QStringLiteral("C01"));
    CoderId c2 = addCoder(QStringLiteral("C02"));
    QString exported;

    RoundTrip()
    {
        code(f1, c1, F::Problem, 0, 40);
        code(f1, c1, F::Evaluation, 108, 125,
            QJsonObject {{QStringLiteral("polarity"), QStringLiteral("negative")}});
        code(f1, c2, F::Problem, 4, 22);
        code(f2, c2, F::Remedy, 61, 85);
        code(f2, c2, F::Cause, 40, 59);
        ExportOptions o = exportOptions(LayerSpec {LayerKind::Coders, {}}, ExportFormat::W3c,
            dir.filePath(QStringLiteral("w3c")));
        REQUIRE(exportLayer(project, o));
        exported = QDir(o.outDir).filePath(QStringLiteral("all.jsonld"));
    }

    // A new project holding the same articles, with C01 known and C02 not.
    Project freshProject(const QString &name)
    {
        auto p = Project::create(dir.filePath(name));
        REQUIRE(p);
        REQUIRE(
            p->importFile(test::writeFile(dir, name + QStringLiteral(".jsonl"), test::kTwoArticles),
                ImportOptions {}));
        REQUIRE(p->addCoder(QStringLiteral("Someone"), QStringLiteral("C01"), CoderRole::Coder));
        return std::move(*p);
    }
};

} // namespace

TEST_CASE_METHOD(RoundTrip, "importing the W3C export reproduces every span", "[exchange][w3c]")
{
    Project fresh = freshProject(QStringLiteral("fresh.fourfold"));
    auto report = importW3cAnnotations(fresh, exported);
    REQUIRE(report);
    CHECK(report->spans == 5);
    CHECK(report->codersCreated == QStringList {QStringLiteral("C02")});
    CHECK(spansOf(fresh) == spansOf(project));
    CHECK(spansOf(fresh).size() == 5);
    // Imported codings are finished work: each (article, coder) is marked done in the import's
    // phase, so they count for reliability (CodingScope).
    CHECK(report->articlesDone == 3);
    auto assignments = fresh.assignments();
    REQUIRE(assignments);
    REQUIRE(assignments->size() == 3);
    for (const Assignment &a : *assignments) {
        CHECK(a.status == QStringLiteral("done"));
        CHECK(a.phase == Phase::Production);
    }
}

TEST_CASE_METHOD(RoundTrip, "a W3C import never makes a lead, not even of a lead's spans",
    "[exchange][w3c][people]")
{
    // A lead's own spans in the export carry the lead's pseudonym as their creator.
    const CoderId lead = addCoder(QStringLiteral("L09"), CoderRole::Lead);
    code(f2, lead, F::Problem, 0, 20);
    ExportOptions o = exportOptions(LayerSpec {LayerKind::Coders, {}}, ExportFormat::W3c,
        dir.filePath(QStringLiteral("w3c-lead")));
    REQUIRE(exportLayer(project, o));
    Project fresh = freshProject(QStringLiteral("fresh-lead.fourfold"));
    auto report =
        importW3cAnnotations(fresh, QDir(o.outDir).filePath(QStringLiteral("all.jsonld")));
    REQUIRE(report);
    CHECK(report->codersCreated.contains(QStringLiteral("L09")));
    auto people = fresh.coders();
    REQUIRE(people);
    for (const Coder &c : *people) {
        INFO(c.pseudonym.toStdString());
        CHECK(c.role == CoderRole::Coder);
    }
    // The import makes coders through Project::addCoder, which refuses a lead outright.
    auto refused =
        fresh.addCoder(QStringLiteral("Someone"), QStringLiteral("L10"), CoderRole::Lead);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::NotAllowed);
    auto after = fresh.coderByPseudonym(QStringLiteral("L10"));
    REQUIRE(after);
    CHECK_FALSE(after->has_value());
}

TEST_CASE_METHOD(RoundTrip, "the W3C import refuses bad files whole, naming file and position",
    "[exchange][w3c]")
{
    const QByteArray good = test::readFile(exported);
    struct Case {
        const char *name;
        QByteArray bytes;
        qint64 line; // 0: not checked
        const char *message;
    };
    QByteArray wrongQuote = good;
    wrongQuote.replace("\"exact\": \"It is a disgrace.\"", "\"exact\": \"It is a delight.\"");
    QByteArray unknownArticle = good;
    unknownArticle.replace("ni:///sha-256;", "ni:///sha-256;A");
    QByteArray badFunction = good;
    badFunction.replace("\"value\": \"remedy\"", "\"value\": \"solution\"");
    QByteArray badAttribute = good;
    badAttribute.replace("negative", "furious");
    QByteArray outside = good;
    outside.replace("\"end\": 125", "\"end\": 999");
    const Case cases[] = {
        {"truncated", good.left(good.size() / 2), 0, "not valid JSON"},
        {"not json", "{\n  \"type\": AnnotationCollection\n}", 2, "not valid JSON"},
        {"wrong root", "{\"type\": \"Thing\"}", 1, "neither an AnnotationCollection"},
        {"wrong quote", wrongQuote, 0, "is not the article's text"},
        {"unknown article", unknownArticle, 0, "ni:///sha-256"},
        {"bad function", badFunction, 0, "not a framing function"},
        {"bad attribute", badAttribute, 0, "furious"},
        {"outside", outside, 0, "outside the article"},
    };
    for (const Case &c : cases) {
        INFO(c.name);
        Project fresh = freshProject(
            QStringLiteral("f-%1.fourfold")
                .arg(QString::fromUtf8(c.name).replace(QLatin1Char(' '), QLatin1Char('-'))));
        const QString before = test::dumpDatabase(databaseForTesting(fresh));
        const QString path = test::writeFile(dir, QStringLiteral("bad.jsonld"), c.bytes);
        auto r = importW3cAnnotations(fresh, path);
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidInput);
        CHECK(r.error().file == path);
        CHECK(r.error().message.contains(QString::fromUtf8(c.message)));
        if (c.line)
            CHECK(r.error().line == c.line);
        // Annotation errors point at the annotation's id in the file.
        if (QByteArray(c.name) != "truncated" && QByteArray(c.name) != "not json"
            && QByteArray(c.name) != "wrong root")
            CHECK(r.error().line > 1);
        // All-or-nothing: neither spans nor coders were added.
        CHECK(test::dumpDatabase(databaseForTesting(fresh)) == before);
    }
}

TEST_CASE_METHOD(RoundTrip, "a run's W3C export cannot become a coder's codings", "[exchange][w3c]")
{
    storeRun(QStringLiteral("r"), {{f1, F::Remedy, 75, 107}});
    ExportOptions o = exportOptions(LayerSpec {LayerKind::Run, QStringLiteral("r")},
        ExportFormat::W3c, dir.filePath(QStringLiteral("run")));
    REQUIRE(exportLayer(project, o));
    Project fresh = freshProject(QStringLiteral("run.fourfold"));
    auto r = importW3cAnnotations(fresh, QDir(o.outDir).filePath(QStringLiteral("all.jsonld")));
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("software")));
    auto missing = importW3cAnnotations(fresh, dir.filePath(QStringLiteral("none.jsonld")));
    REQUIRE_FALSE(missing);
    CHECK(missing.error().code == ErrorCode::Io);
}

TEST_CASE_METHOD(
    RoundTrip, "importing the same W3C file again adds nothing and says so", "[exchange][w3c]")
{
    // Into the project the spans came from: every annotation is there already (same ids).
    const QString before =
        test::dumpDatabase(databaseForTesting(project), {QStringLiteral("event_log")});
    auto again = importW3cAnnotations(project, exported);
    REQUIRE(again);
    CHECK(again->spans == 0);
    CHECK(again->skipped == 5);
    CHECK(test::dumpDatabase(databaseForTesting(project), {QStringLiteral("event_log")}) == before);

    // Into a fresh project twice: the second import finds the same coder, function and range.
    Project fresh = freshProject(QStringLiteral("twice.fourfold"));
    auto first = importW3cAnnotations(fresh, exported);
    REQUIRE(first);
    CHECK(first->spans == 5);
    CHECK(first->skipped == 0);
    auto second = importW3cAnnotations(fresh, exported);
    REQUIRE(second);
    CHECK(second->spans == 0);
    CHECK(second->skipped == 5);
    CHECK(spansOf(fresh) == spansOf(project));
}

TEST_CASE("a W3C import compiles the same statements for 6 articles as for 24", "[exchange][w3c]")
{
    // Every annotation reuses the prepared statements of the one before; the statements run
    // grow by the same number per article, never with what is already stored.
    const int sizes[3] = {6, 12, 24};
    qint64 prepared[3] = {};
    qint64 run[3] = {};
    for (int i = 0; i < 3; ++i) {
        test::DoubleCodedProject source(sizes[i]);
        const QString out = source.dir.filePath(QStringLiteral("w3c"));
        REQUIRE(exportLayer(source.project,
            exportOptions(LayerSpec {LayerKind::Coders, {}}, ExportFormat::W3c, out)));
        // The same articles, without codings.
        test::ProjectFixture target;
        QByteArray jsonl;
        for (int a = 1; a <= sizes[i]; ++a)
            jsonl += QStringLiteral("{\"id\":\"d%1\",\"title\":\"Piece %1\",\"language\":\"en\","
                                    "\"text\":\"The quay of Oslade %1 is closing. The levy is "
                                    "to blame. The town must act now.\"}\n")
                         .arg(a)
                         .toUtf8();
        target.importJsonl(jsonl);
        const Database &db = databaseForTesting(target.project);
        const qint64 preparedBefore = db.statementsPrepared();
        const qint64 runBefore = db.statementsRun();
        auto r = importW3cAnnotations(target.project, out + QStringLiteral("/all.jsonld"));
        INFO((r ? QString() : r.error().toString()).toStdString());
        REQUIRE(r);
        CHECK(r->spans == 4 * sizes[i]);
        CHECK(r->skipped == 0);
        prepared[i] = db.statementsPrepared() - preparedBefore;
        run[i] = db.statementsRun() - runBefore;
    }
    CHECK(prepared[0] > 0);
    CHECK(prepared[1] == prepared[0]);
    CHECK(prepared[2] == prepared[0]);
    CHECK(run[2] - run[1] == 2 * (run[1] - run[0]));
}
