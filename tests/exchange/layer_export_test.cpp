#include "core/exchange/iob2_format.h"
#include "core/exchange/layer_export.h"
#include "core/text/offset_map.h"
#include "tests/project/double_coded_project.h"
#include "tests/scoring/scoring_fixture.h"

#include <QCryptographicHash>
#include <QDir>
#include <QFileInfo>
#include <QJsonArray>
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

struct ExportFixture : test::ScoringFixture {
    CoderId c1 = addCoder(QStringLiteral("C01"));
    CoderId c2 = addCoder(QStringLiteral("C02"));
    Article a1 = *project.article(f1);
    Article a2 = *project.article(f2);

    // The range from token i to token j (inclusive) of `a`: token-aligned spans.
    static TextRange tokens(const Article &a, std::size_t i, std::size_t j)
    {
        return TextRange {a.tokens.at(i).start, a.tokens.at(j).end};
    }

    ExportFixture()
    {
        const TextRange p = tokens(a1, 0, 3), c = tokens(a1, 2, 5), r = tokens(a2, 1, 2);
        gold(f1, F::Problem, p.start, p.end);
        gold(f1, F::Cause, c.start, c.end); // overlaps the problem: another column
        gold(f2, F::Remedy, r.start, r.end);
        code(f1, c1, F::Evaluation, 108, 125,
            QJsonObject {{QStringLiteral("polarity"), QStringLiteral("negative")}});
        code(f2, c2, F::Problem, 0, 39);
    }

    ExportReport run(ExportOptions o)
    {
        o.outDir = dir.filePath(QStringLiteral("out-") + exportFormatKey(o.format));
        o.version = QStringLiteral("9.9");
        auto r = exportLayer(project, o);
        REQUIRE(r);
        return *r;
    }
    QByteArray file(ExportFormat f, const QString &name)
    {
        return test::readFile(
            dir.filePath(QStringLiteral("out-") + exportFormatKey(f) + QLatin1Char('/') + name));
    }
};

} // namespace

TEST_CASE_METHOD(ExportFixture, "the W3C export is Web Annotation JSON-LD", "[exchange][w3c]")
{
    run(exportOptions(LayerSpec {LayerKind::Gold, {}}, ExportFormat::W3c));
    QJsonParseError error;
    const QJsonDocument doc =
        QJsonDocument::fromJson(file(ExportFormat::W3c, QStringLiteral("all.jsonld")), &error);
    REQUIRE(error.error == QJsonParseError::NoError);
    // W3C Web Annotation Data Model (2017) §5.1: a collection with its context, id and type.
    const QJsonObject root = doc.object();
    CHECK(root.value(QStringLiteral("@context")).toString()
        == QStringLiteral("http://www.w3.org/ns/anno.jsonld"));
    CHECK(root.value(QStringLiteral("type")).toString() == QStringLiteral("AnnotationCollection"));
    CHECK(root.value(QStringLiteral("total")).toInt() == 3);
    const QJsonArray items =
        root.value(QStringLiteral("first")).toObject().value(QStringLiteral("items")).toArray();
    REQUIRE(items.size() == 3);
    std::set<QString> ids;
    for (const QJsonValue &v : items) {
        const QJsonObject a = v.toObject();
        // §3.1: @context, id (an IRI), type "Annotation", target with source and selector.
        CHECK(a.value(QStringLiteral("@context")).toString()
            == QStringLiteral("http://www.w3.org/ns/anno.jsonld"));
        CHECK(a.value(QStringLiteral("id")).toString().startsWith(QStringLiteral("urn:uuid:")));
        ids.insert(a.value(QStringLiteral("id")).toString());
        CHECK(a.value(QStringLiteral("type")).toString() == QStringLiteral("Annotation"));
        const QJsonObject target = a.value(QStringLiteral("target")).toObject();
        const QString source = target.value(QStringLiteral("source")).toString();
        // RFC 6920 §3: ni:///sha-256;<base64url of the 32-byte digest>, 43 characters unpadded.
        CHECK(source.startsWith(QStringLiteral("ni:///sha-256;")));
        CHECK(source.size() == 14 + 43);
        const QJsonArray selectors = target.value(QStringLiteral("selector")).toArray();
        REQUIRE(selectors.size() == 2);
        const QJsonObject position = selectors[0].toObject();
        const QJsonObject quote = selectors[1].toObject();
        // Web Annotation Data Model §4.2.4 and §4.2.6.
        CHECK(position.value(QStringLiteral("type")).toString()
            == QStringLiteral("TextPositionSelector"));
        CHECK(
            quote.value(QStringLiteral("type")).toString() == QStringLiteral("TextQuoteSelector"));
        const TextRange r {position.value(QStringLiteral("start")).toInteger(),
            position.value(QStringLiteral("end")).toInteger()};
        const Article &article = source
                == QStringLiteral("ni:///sha-256;")
                    + QString::fromLatin1(QByteArray::fromHex(a1.summary.sha256.toLatin1())
                                              .toBase64(QByteArray::Base64UrlEncoding
                                                  | QByteArray::OmitTrailingEquals))
            ? a1
            : a2;
        CHECK(quote.value(QStringLiteral("exact")).toString() == OffsetMap::slice(article.text, r));
        CHECK(a.value(QStringLiteral("creator"))
                  .toObject()
                  .value(QStringLiteral("nickname"))
                  .toString()
            == QStringLiteral("L01"));
        CHECK(
            a.value(QStringLiteral("generator")).toObject().value(QStringLiteral("name")).toString()
            == QStringLiteral("Fourfold"));
        const QJsonArray body = a.value(QStringLiteral("body")).toArray();
        CHECK(functionFromKey(body[0].toObject().value(QStringLiteral("value")).toString())
                  .has_value());
    }
    CHECK(ids.size() == 3);
}

TEST_CASE_METHOD(ExportFixture, "exports name coders by pseudonym only", "[exchange]")
{
    for (ExportFormat f :
        {ExportFormat::Jsonl, ExportFormat::W3c, ExportFormat::Iob2, ExportFormat::Csv}) {
        const ExportReport r = run(exportOptions(LayerSpec {LayerKind::Coders, {}}, f));
        for (const ExportedFile &e : r.files) {
            CHECK_FALSE(file(f, e.name).contains("Test person"));
            CHECK_FALSE(file(f, e.name).contains("Test lead"));
        }
    }
}

TEST_CASE_METHOD(ExportFixture, "JSON Lines spans and articles", "[exchange][jsonl]")
{
    const ExportReport r =
        run(exportOptions(LayerSpec {LayerKind::Coders, {}}, ExportFormat::Jsonl));
    const QList<QByteArray> lines =
        file(ExportFormat::Jsonl, QStringLiteral("all.jsonl")).split('\n');
    REQUIRE(lines.size() == 3); // two spans and the final newline
    const QJsonObject first = QJsonDocument::fromJson(lines[0]).object();
    CHECK(first.value(QStringLiteral("article")).toString() == QStringLiteral("f1"));
    CHECK(first.value(QStringLiteral("sha256")).toString() == a1.summary.sha256);
    CHECK(first.value(QStringLiteral("start")).toInt() == 108);
    CHECK(first.value(QStringLiteral("end")).toInt() == 125);
    CHECK(first.value(QStringLiteral("function")).toString() == QStringLiteral("evaluation"));
    CHECK(first.value(QStringLiteral("quote")).toString() == QStringLiteral("It is a disgrace."));
    CHECK(first.value(QStringLiteral("coder")).toString() == QStringLiteral("C01"));
    CHECK(first.value(QStringLiteral("attributes"))
              .toObject()
              .value(QStringLiteral("polarity"))
              .toString()
        == QStringLiteral("negative"));
    const QList<QByteArray> articles =
        file(ExportFormat::Jsonl, QStringLiteral("all.articles.jsonl")).split('\n');
    CHECK(QJsonDocument::fromJson(articles[0]).object().value(QStringLiteral("text")).toString()
        == a1.text);
    CHECK(r.files.size() == 2);
}

TEST_CASE_METHOD(ExportFixture, "an export without text (--no-text) writes offsets and hashes only",
    "[exchange]")
{
    for (ExportFormat f :
        {ExportFormat::Jsonl, ExportFormat::W3c, ExportFormat::Iob2, ExportFormat::Csv}) {
        ExportOptions o = exportOptions(LayerSpec {LayerKind::Coders, {}}, f);
        o.withText = false;
        const ExportReport r = run(o);
        for (const ExportedFile &e : r.files) {
            const QByteArray bytes = file(f, e.name);
            // Words of both articles and of their titles.
            for (const char *word : {"disgrace", "ferry", "windpark", "Ferry to stop", "Windpark"})
                CHECK_FALSE(bytes.contains(word));
        }
        CHECK(r.manifest.value(QStringLiteral("text_included")).toBool() == false);
    }
}

TEST_CASE_METHOD(ExportFixture, "IOB2 export re-assembles the gold spans", "[exchange][iob2]")
{
    run(exportOptions(LayerSpec {LayerKind::Gold, {}}, ExportFormat::Iob2));
    auto docs =
        readIob2(file(ExportFormat::Iob2, QStringLiteral("all.bio")), QStringLiteral("all.bio"));
    REQUIRE(docs);
    REQUIRE(docs->size() == 2);
    auto gold = project.goldAnnotations();
    REQUIRE(gold);
    std::multiset<std::tuple<QString, int, qint64, qint64>> expected, got;
    for (const GoldAnnotation &g : *gold)
        expected.insert({g.article == f1 ? QStringLiteral("f1") : QStringLiteral("f2"),
            int(g.content.function), g.content.range.start, g.content.range.end});
    for (const Iob2Document &d : *docs) {
        CHECK(d.tokens == (d.externalId == QStringLiteral("f1") ? a1.tokens : a2.tokens));
        for (const Iob2Span &s : d.spans)
            got.insert({d.externalId, int(s.function), s.range.start, s.range.end});
    }
    CHECK(got == expected);
}

TEST_CASE_METHOD(ExportFixture, "CSV article × variable (RFC 4180)", "[exchange][csv]")
{
    run(exportOptions(LayerSpec {LayerKind::Coders, {}}, ExportFormat::Csv));
    const QList<QByteArray> rows = file(ExportFormat::Csv, QStringLiteral("all.csv")).split('\n');
    // RFC 4180 §2: CRLF line ends, a header line.
    CHECK(rows[0]
        == "article,sha256,language,length,source,problem_present,problem_spans,problem_share,"
           "cause_present,cause_spans,cause_share,evaluation_present,evaluation_spans,"
           "evaluation_share,remedy_present,remedy_spans,remedy_share\r");
    REQUIRE(rows.size() == 4); // header, f1 × C01, f2 × C02, final newline
    // f1 (125 code points) coded by C01: one evaluation span of 17 code points.
    CHECK(rows[1]
        == "f1," + a1.summary.sha256.toLatin1()
            + ",en,125,C01,0,0,0.0000,0,0,0.0000,1,1,0.1360,0,0,0.0000\r");
}

TEST_CASE("splits share no article and the manifest holds the hashes", "[exchange][split]")
{
    test::ScoringFixture fx;
    // 30 more invented articles, every third with a cause span in gold besides a problem.
    QByteArray jsonl;
    for (int i = 0; i < 30; ++i)
        jsonl += QStringLiteral("{\"id\":\"n%1\",\"title\":\"Item "
                                "%1\",\"language\":\"en\",\"text\":\"Item %1: the town of Varnby "
                                "votes on the ferry.\"}\n")
                     .arg(i)
                     .toUtf8();
    fx.importJsonl(jsonl, QStringLiteral("more.jsonl"));
    for (int i = 0; i < 30; ++i) {
        const ArticleId id = fx.articleId(QStringLiteral("n%1").arg(i));
        fx.gold(id, F::Problem, 0, 4);
        if (i % 3 == 0)
            fx.gold(id, F::Cause, 9, 13);
    }
    ExportOptions o = exportOptions(LayerSpec {LayerKind::Gold, {}}, ExportFormat::Jsonl);
    o.outDir = fx.dir.filePath(QStringLiteral("split"));
    o.split = *SplitRatios::parse(QStringLiteral("80/10/10"));
    o.seed = 5;
    auto r = exportLayer(fx.project, o);
    REQUIRE(r);
    // No article in two splits, every article in one: from the span files themselves.
    std::map<QString, QString> splitOf;
    int lines = 0;
    for (const QString &split :
        {QStringLiteral("train"), QStringLiteral("dev"), QStringLiteral("test")}) {
        for (const QByteArray &line :
            test::readFile(QDir(o.outDir).filePath(split + QStringLiteral(".jsonl"))).split('\n')) {
            if (line.isEmpty())
                continue;
            ++lines;
            const QString article =
                QJsonDocument::fromJson(line).object().value(QStringLiteral("article")).toString();
            auto [it, inserted] = splitOf.emplace(article, split);
            CHECK(it->second == split);
        }
    }
    CHECK(splitOf.size() == 30);
    CHECK(lines == 40);
    // Stratified: 10 articles with a cause (8/1/1), 20 without (16/2/2).
    const QJsonObject manifest = QJsonDocument::fromJson(
        test::readFile(QDir(o.outDir).filePath(QStringLiteral("manifest.json"))))
                                     .object();
    const QJsonObject splits = manifest.value(QStringLiteral("splits")).toObject();
    CHECK(splits.value(QStringLiteral("train")).toObject().value(QStringLiteral("articles")).toInt()
        == 24);
    CHECK(splits.value(QStringLiteral("dev")).toObject().value(QStringLiteral("articles")).toInt()
        == 3);
    CHECK(splits.value(QStringLiteral("test")).toObject().value(QStringLiteral("articles")).toInt()
        == 3);
    CHECK(splits.value(QStringLiteral("train"))
              .toObject()
              .value(QStringLiteral("per_function"))
              .toObject()
              .value(QStringLiteral("cause"))
              .toObject()
              .value(QStringLiteral("articles"))
              .toInt()
        == 8);
    CHECK(manifest.value(QStringLiteral("codebook_version")).toInt() == 1);
    CHECK(manifest.value(QStringLiteral("seed")).toString() == QStringLiteral("5"));
    CHECK(manifest.value(QStringLiteral("split_ratios"))
              .toObject()
              .value(QStringLiteral("train"))
              .toDouble()
        == 0.8);
    const QJsonArray files = manifest.value(QStringLiteral("files")).toArray();
    // Three splits of spans, articles and gold answers (an empty file: no gold answer here).
    CHECK(files.size() == 9);
    for (const QJsonValue &v : files) {
        const QJsonObject f = v.toObject();
        const QByteArray bytes =
            test::readFile(QDir(o.outDir).filePath(f.value(QStringLiteral("name")).toString()));
        CHECK(f.value(QStringLiteral("sha256")).toString()
            == QString::fromLatin1(
                QCryptographicHash::hash(bytes, QCryptographicHash::Sha256).toHex()));
        CHECK(f.value(QStringLiteral("bytes")).toInteger() == bytes.size());
    }
    // The same seed gives the same files.
    o.outDir = fx.dir.filePath(QStringLiteral("split2"));
    auto again = exportLayer(fx.project, o);
    REQUIRE(again);
    for (std::size_t i = 0; i < r->files.size(); ++i)
        CHECK(again->files[i].sha256 == r->files[i].sha256);
}

TEST_CASE_METHOD(ExportFixture, "a run's spans export with their scores", "[exchange]")
{
    storeRun(QStringLiteral("cues v1"), {{f1, F::Remedy, 75, 107}});
    run(exportOptions(LayerSpec {LayerKind::Run, QStringLiteral("cues v1")}, ExportFormat::Jsonl));
    const QJsonObject span = QJsonDocument::fromJson(
        file(ExportFormat::Jsonl, QStringLiteral("all.jsonl")).split('\n')[0])
                                 .object();
    CHECK(span.value(QStringLiteral("source")).toString() == QStringLiteral("run:cues v1"));
    CHECK(span.value(QStringLiteral("coder")).isNull());
    CHECK(span.value(QStringLiteral("score")).toDouble() == 0.5);
    CHECK(span.value(QStringLiteral("quote")).toString()
        == QStringLiteral("The council must find the money."));
    // A run covers every article: both appear in the articles file.
    CHECK(file(ExportFormat::Jsonl, QStringLiteral("all.articles.jsonl")).count('\n') == 2);
    auto unknown = exportLayer(project,
        exportOptions(LayerSpec {LayerKind::Run, QStringLiteral("nope")}, ExportFormat::Jsonl,
            dir.filePath(QStringLiteral("x"))));
    REQUIRE_FALSE(unknown);
    CHECK(unknown.error().code == ErrorCode::NotFound);
}

TEST_CASE("CSV cells a spreadsheet would run as formulas are neutralised", "[exchange][csv]")
{
    // OWASP's advice on CSV injection (common practice): a leading apostrophe before =, +, -, @,
    // tab or carriage return, except in numbers.
    test::ScoringFixture fx;
    fx.importJsonl("{\"id\":\"=HYPERLINK(\\\"http://x\\\")\",\"title\":\"A\",\"language\":\"en\","
                   "\"text\":\"The ferry stops.\"}\n"
                   "{\"id\":\"-7\",\"title\":\"B\",\"language\":\"en\","
                   "\"text\":\"The dyke holds.\"}\n",
        QStringLiteral("hostile.jsonl"));
    auto coder = fx.project.addCoder(
        QStringLiteral("Someone"), QStringLiteral("@SUM(A1)"), CoderRole::Coder);
    REQUIRE(coder);
    fx.code(fx.articleId(QStringLiteral("=HYPERLINK(\"http://x\")")), *coder, F::Problem, 0, 9);
    fx.code(fx.articleId(QStringLiteral("-7")), *coder, F::Problem, 0, 8);
    ExportOptions o;
    o.layer = LayerSpec {LayerKind::Coders, {}};
    o.format = ExportFormat::Csv;
    o.outDir = fx.dir.filePath(QStringLiteral("csv"));
    REQUIRE(exportLayer(fx.project, o));
    QFile f(QDir(o.outDir).filePath(QStringLiteral("all.csv")));
    REQUIRE(f.open(QIODevice::ReadOnly));
    const QString csv = QString::fromUtf8(f.readAll());
    // The quote inside the id is doubled (RFC 4180), the formula start neutralised.
    CHECK(csv.contains(QStringLiteral("\"'=HYPERLINK(\"\"http://x\"\")\",")));
    CHECK(csv.contains(QStringLiteral(",'@SUM(A1),")));
    CHECK_FALSE(csv.contains(QStringLiteral(",@SUM(A1),")));
    // A number stays a number.
    CHECK(csv.contains(QStringLiteral("\r\n-7,")));
}

TEST_CASE_METHOD(ExportFixture, "the W3C file written a span at a time is what one document gives",
    "[exchange][w3c]")
{
    // The items are streamed into the collection's frame; the file must be exactly Qt's
    // indented form of the whole collection.
    run(exportOptions(LayerSpec {LayerKind::Gold, {}}, ExportFormat::W3c));
    const QByteArray bytes = file(ExportFormat::W3c, QStringLiteral("all.jsonld"));
    const QJsonDocument doc = QJsonDocument::fromJson(bytes);
    REQUIRE(doc.isObject());
    CHECK(doc.object().value(QStringLiteral("total")).toInt() == 3);
    CHECK(doc.object()
              .value(QStringLiteral("first"))
              .toObject()
              .value(QStringLiteral("items"))
              .toArray()
              .size()
        == 3);
    CHECK(doc.toJson(QJsonDocument::Indented) == bytes);
}

TEST_CASE(
    "an export reads each article once whatever the number of coders covering it", "[exchange]")
{
    // Double-coded articles: two coders cover each one, so a writer that read the article per
    // coder's file would read it twice. Statements run grow by the same number per article.
    const int sizes[3] = {6, 12, 24};
    qint64 run[3][2] = {};
    for (int i = 0; i < 3; ++i) {
        test::DoubleCodedProject p(sizes[i]);
        for (const ExportFormat format : {ExportFormat::Iob2, ExportFormat::W3c}) {
            ExportOptions o = exportOptions(LayerSpec {LayerKind::Coders, {}}, format,
                p.dir.filePath(QStringLiteral("out-") + exportFormatKey(format)));
            Result<ExportReport> r;
            run[i][format == ExportFormat::W3c] =
                p.statementsRunBy([&] { r = exportLayer(p.project, o); });
            REQUIRE(r);
            CHECK(r->articleReads == sizes[i]);
        }
    }
    for (int f = 0; f < 2; ++f)
        CHECK(run[2][f] - run[1][f] == 2 * (run[1][f] - run[0][f]));
}

TEST_CASE("an export holds one article's spans at a time in every format", "[exchange]")
{
    // The writer streams the layer article by article: the most spans it holds at once is the
    // largest article's share of the layer, never the layer, with or without a split.
    test::DoubleCodedProject p(12);
    const LayerSpec coders {LayerKind::Coders, {}};
    auto layer = resolveLayer(p.project, coders);
    REQUIRE(layer);
    QHash<qint64, std::size_t> perArticle;
    for (const LayerSpan &s : layer->spans)
        ++perArticle[s.article.value];
    std::size_t largest = 0;
    for (std::size_t n : std::as_const(perArticle))
        largest = std::max(largest, n);
    REQUIRE(largest > 0);
    REQUIRE(layer->spans.size() > 2 * largest);
    for (const ExportFormat format :
        {ExportFormat::Jsonl, ExportFormat::W3c, ExportFormat::Iob2, ExportFormat::Csv})
        for (const bool split : {false, true}) {
            ExportOptions o = exportOptions(coders, format,
                p.dir.filePath(
                    QStringLiteral("held-%1-%2").arg(exportFormatKey(format)).arg(split)));
            if (split)
                o.split =
                    SplitRatios {{QStringLiteral("train"), QStringLiteral("test")}, {0.5, 0.5}};
            auto r = exportLayer(p.project, o);
            REQUIRE(r);
            INFO(exportFormatKey(format).toStdString() << (split ? " split" : ""));
            CHECK(r->mostSpansHeld == largest);
            qint64 spans = 0;
            const QJsonObject splits = r->manifest.value(QStringLiteral("splits")).toObject();
            for (const QString &name : splits.keys())
                spans += splits.value(name).toObject().value(QStringLiteral("spans")).toInteger();
            CHECK(spans == qint64(layer->spans.size()));
        }
}

TEST_CASE("pseudonyms whose file names meet still export to one file each", "[exchange][iob2]")
{
    // "X/1", "X_1" and "X?1" all become "X_1" in a file name, "x_1" differs only in case, and a
    // 300-character pseudonym is longer than a file system allows: every coder still gets a file
    // of their own, and the manifest lists exactly the files written.
    test::ScoringFixture fx;
    const QStringList pseudonyms {QStringLiteral("X/1"), QStringLiteral("X_1"),
        QStringLiteral("X?1"), QStringLiteral("x_1"), QString(300, QLatin1Char('L'))};
    for (const QString &p : pseudonyms) {
        auto coder = fx.project.addCoder(QStringLiteral("Someone"), p, CoderRole::Coder);
        REQUIRE(coder);
        fx.code(fx.f1, *coder, F::Problem, 0, 9);
    }
    ExportOptions o;
    o.layer = LayerSpec {LayerKind::Coders, {}};
    o.format = ExportFormat::Iob2;
    o.outDir = fx.dir.filePath(QStringLiteral("bio"));
    auto report = exportLayer(fx.project, o);
    REQUIRE(report);
    REQUIRE(report->files.size() == 5);
    std::set<QString> names;
    for (const ExportedFile &f : report->files) {
        names.insert(f.name.toCaseFolded());
        CHECK(f.name.size() < 80);
        CHECK(QFileInfo::exists(QDir(o.outDir).filePath(f.name)));
    }
    CHECK(names.size() == 5);
    // Each file holds the documents of one coder, named in its header.
    std::set<QString> sources;
    for (const ExportedFile &f : report->files) {
        const QByteArray bytes = test::readFile(QDir(o.outDir).filePath(f.name));
        for (const QString &p : pseudonyms)
            if (bytes.contains(("source = " + p + "\n").toUtf8()))
                sources.insert(p);
    }
    CHECK(sources.size() == 5);
}
