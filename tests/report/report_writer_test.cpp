// The reliability report of the sample project, checked against an oracle outside the report:
// `fourfold-cli agree --json` for the same selection (the reliability engine, itself tested on
// the published worked examples of tests/reliability), the project's own records for the counts,
// and poppler's pdftoppm / pdftotext for the PDF. The items the method text must cover are those
// of Lombard, Snyder-Duch & Bracken (2002), Human Communication Research 28(4).
#include "app/report/report_charts.h"
#include "app/report/report_document.h"
#include "app/report/report_writer.h"
#include "core/project/project.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QImage>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QPaintEngine>
#include <QPainter>
#include <QRegularExpression>
#include <QSet>
#include <QStandardPaths>
#include <QSvgRenderer>
#include <QTemporaryDir>

#include <climits>
#include <cmath>
#include <optional>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun run(const QString &program, const QStringList &args)
{
    // A private runtime directory keeps QStandardPaths from warning on stderr where a CI
    // machine has none (the offscreen platform asks for it).
    static QTemporaryDir runtime;
    QProcessEnvironment env = QProcessEnvironment::systemEnvironment();
    if (!env.contains(QStringLiteral("XDG_RUNTIME_DIR")))
        env.insert(QStringLiteral("XDG_RUNTIME_DIR"), runtime.path());
    return runCli(program, args, 180000, env);
}

CliRun cli(const QStringList &args)
{
    return run(QStringLiteral(FOURFOLD_CLI), args);
}

QJsonObject parseObject(const QString &text)
{
    QJsonParseError e;
    const QJsonDocument doc = QJsonDocument::fromJson(text.toUtf8(), &e);
    INFO(text.left(400).toStdString());
    REQUIRE(e.error == QJsonParseError::NoError);
    return doc.object();
}

// Every leaf of `part` is in `whole` with the same value (numbers within 1e-12).
void requireContained(const QJsonValue &part, const QJsonValue &whole, const QString &path)
{
    INFO(path.toStdString());
    if (part.isObject()) {
        REQUIRE(whole.isObject());
        const QJsonObject p = part.toObject(), w = whole.toObject();
        for (auto it = p.begin(); it != p.end(); ++it) {
            REQUIRE(w.contains(it.key()));
            requireContained(it.value(), w.value(it.key()), path + QLatin1Char('.') + it.key());
        }
    } else if (part.isArray()) {
        REQUIRE(whole.isArray());
        const QJsonArray p = part.toArray(), w = whole.toArray();
        REQUIRE(p.size() == w.size());
        for (qsizetype i = 0; i < p.size(); ++i)
            requireContained(p[i], w[i], path + QLatin1Char('.') + QString::number(i));
    } else if (part.isDouble()) {
        REQUIRE(whole.isDouble());
        CHECK(std::abs(part.toDouble() - whole.toDouble()) <= 1e-12);
    } else {
        CHECK(part == whole);
    }
}

QString unescapeHtml(QString s)
{
    s.replace(QStringLiteral("&lt;"), QStringLiteral("<"));
    s.replace(QStringLiteral("&gt;"), QStringLiteral(">"));
    s.replace(QStringLiteral("&quot;"), QStringLiteral("\""));
    s.replace(QStringLiteral("&amp;"), QStringLiteral("&"));
    return s;
}

// The value a figure's data-figure address names: the dotted `path` ("alpha.value",
// "pairs.0.cohen_kappa.ci95.1") in `object`, array steps by index (README, The reliability
// report); undefined if any step is missing. The report writes these addresses but never reads
// them, so the test follows them on its own.
QJsonValue valueAt(const QJsonObject &object, const QString &path)
{
    QJsonValue v = object;
    for (const QString &step : path.split(QLatin1Char('.'))) {
        bool isIndex = false;
        const int index = step.toInt(&isIndex);
        if (v.isArray() && isIndex) {
            const QJsonArray a = v.toArray();
            if (index < 0 || index >= a.size())
                return QJsonValue(QJsonValue::Undefined);
            v = a.at(index);
        } else if (v.isObject() && v.toObject().contains(step)) {
            v = v.toObject().value(step);
        } else {
            return QJsonValue(QJsonValue::Undefined);
        }
    }
    return v;
}

// The text a figure must show, written independently of the report's own formatter.
QString expectedText(const QJsonValue &v, const QString &format)
{
    if (format == QLatin1String("text"))
        return v.isString() ? v.toString() : QStringLiteral("undefined");
    if (!v.isDouble())
        return QStringLiteral("undefined");
    const double d = v.toDouble();
    if (format == QLatin1String("pct"))
        return QString::asprintf("%.1f%%", d * 100.0);
    if (format == QLatin1String("int"))
        return QString::number(qint64(std::llround(d)));
    if (format == QLatin1String("g3"))
        return QString::number(d, 'g', 3);
    REQUIRE(format == QLatin1String("f3"));
    return QString::asprintf("%.3f", d);
}

struct Sample {
    QTemporaryDir dir;
    QString project;
    QString html;
    QString pdf;
};

// Builds the sample project (sample-project/, invented demo data) and writes both reports.
const Sample &sample()
{
    static Sample *s = [] {
        auto *made = new Sample;
        made->project = made->dir.filePath(QStringLiteral("demo.fourfold"));
        made->html = made->dir.filePath(QStringLiteral("report.html"));
        made->pdf = made->dir.filePath(QStringLiteral("report.pdf"));
        const CliRun built = cli(
            {QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), made->project});
        INFO(built.err.toStdString());
        REQUIRE(built.exitCode == 0);
        const CliRun written =
            cli({QStringLiteral("report"), made->project, QStringLiteral("--out"), made->html,
                QStringLiteral("--out"), made->pdf, QStringLiteral("--bootstrap"),
                QStringLiteral("500"), QStringLiteral("--seed"), QStringLiteral("7")});
        INFO(written.err.toStdString());
        REQUIRE(written.exitCode == 0);
        return made;
    }();
    return *s;
}

QString readText(const QString &path)
{
    return QString::fromUtf8(readFile(path));
}

QJsonObject embeddedFigures(const QString &html)
{
    static const QRegularExpression script(
        QStringLiteral("<script type=\"application/json\" id=\"fourfold-figures\">(.*?)</script>"),
        QRegularExpression::DotMatchesEverythingOption);
    const auto m = script.match(html);
    REQUIRE(m.hasMatch());
    return parseObject(m.captured(1));
}

} // namespace

TEST_CASE("every figure of the HTML report equals fourfold-cli agree --json for its selection")
{
    const Sample &s = sample();
    const QString html = readText(s.html);
    const QJsonObject figures = embeddedFigures(html);
    CHECK(figures.value(QStringLiteral("format")).toString()
        == QLatin1String("fourfold-reliability-report/1"));

    // Run agree with each analysis's arguments; the embedded result must be agree's output.
    QHash<QString, QJsonObject> agree;
    const QJsonArray analyses = figures.value(QStringLiteral("analyses")).toArray();
    REQUIRE(analyses.size() >= 6); // four functions, their set, the continuum, and more
    for (const QJsonValue &v : analyses) {
        const QJsonObject a = v.toObject();
        const QString id = a.value(QStringLiteral("id")).toString();
        QStringList args {QStringLiteral("agree"), s.project};
        for (const QJsonValue &arg : a.value(QStringLiteral("agree_arguments")).toArray())
            args << arg.toString();
        args << QStringLiteral("--json");
        const CliRun r = cli(args);
        INFO(id.toStdString() << ": " << r.err.toStdString());
        if (a.contains(QStringLiteral("error"))) {
            CHECK(r.exitCode == 1);
            CHECK(r.err.contains(a.value(QStringLiteral("error")).toString()));
            continue;
        }
        REQUIRE(r.exitCode == 0);
        agree.insert(id, cliJson(r));
        requireContained(a.value(QStringLiteral("result")), agree.value(id), id);
    }
    for (const char *id : {"function-problem", "function-cause", "function-evaluation",
             "function-remedy", "functions", "continuum"})
        CHECK(agree.contains(QLatin1String(id)));
    // The bootstrap ran with the options given (Hayes & Krippendorff 2007 needs a fixed seed).
    const QJsonObject boot = agree.value(QStringLiteral("function-problem"))
                                 .value(QStringLiteral("bootstrap"))
                                 .toObject();
    CHECK(boot.value(QStringLiteral("replicates")).toInt() == 500);
    CHECK(boot.value(QStringLiteral("seed")).toString() == QLatin1String("7"));

    // Every figure shown in the page, value by value, against agree's fresh output.
    static const QRegularExpression figure(QStringLiteral(
        "<span class=\"fig\" data-figure=\"([^\":]*):([^\"]*)\" data-format=\"([^\"]*)\">([^<]*)"
        "</span>"));
    int checked = 0, fromAgree = 0;
    QSet<QString> seenAnalyses;
    for (auto it = figure.globalMatch(html); it.hasNext();) {
        const auto m = it.next();
        const QString id = m.captured(1), path = m.captured(2), format = m.captured(3);
        const QString shown = unescapeHtml(m.captured(4));
        INFO(id.toStdString() << ":" << path.toStdString() << " shows " << shown.toStdString());
        QJsonValue expected;
        if (id == QLatin1String("report")) {
            expected = valueAt(figures, path);
        } else {
            REQUIRE(agree.contains(id));
            expected = valueAt(agree.value(id), path);
            ++fromAgree;
            seenAnalyses.insert(id);
        }
        REQUIRE(!expected.isUndefined());
        CHECK(shown == expectedText(expected, format));
        ++checked;
    }
    // No figure escaped the pattern, and every computed analysis shows up in the page.
    CHECK(checked == html.count(QStringLiteral("class=\"fig\"")));
    CHECK(fromAgree > 150);
    CHECK(seenAnalyses.size() == agree.size());
}

TEST_CASE("the report's counts come from the project: coders, amount coded, sample, gold")
{
    const Sample &s = sample();
    const QJsonObject figures = embeddedFigures(readText(s.html));
    QTemporaryDir dir;
    const QString copy = dir.filePath(QStringLiteral("copy.fourfold"));
    REQUIRE(QFile::copy(s.project, copy));
    auto project = Project::open(copy);
    REQUIRE(project);
    auto coders = project->coders();
    auto annotations = project->allAnnotations();
    auto assignments = project->assignments();
    auto gold = project->goldAnnotations();
    REQUIRE(coders);
    REQUIRE(annotations);
    REQUIRE(assignments);
    REQUIRE(gold);

    // sample-project/README.md: three coders C01–C03 coded the nine reliability articles, and
    // each of them eight of the 24 production articles alone.
    const QJsonArray reported = figures.value(QStringLiteral("coders")).toArray();
    REQUIRE(reported.size() == 3);
    QSet<qint64> shared;
    QHash<qint64, QSet<qint64>> byArticle;
    for (const Assignment &a : *assignments)
        byArticle[a.article.value].insert(a.coder.value);
    for (auto it = byArticle.cbegin(); it != byArticle.cend(); ++it)
        if (it.value().size() >= 2)
            shared.insert(it.key());
    for (const QJsonValue &v : reported) {
        const QJsonObject c = v.toObject();
        const QString pseudonym = c.value(QStringLiteral("pseudonym")).toString();
        INFO(pseudonym.toStdString());
        auto coder = std::find_if(coders->begin(), coders->end(),
            [&](const Coder &k) { return k.pseudonym == pseudonym; });
        REQUIRE(coder != coders->end());
        const auto spans = std::count_if(annotations->begin(), annotations->end(),
            [&](const Annotation &a) { return a.coder == coder->id; });
        const auto articles = std::count_if(assignments->begin(), assignments->end(),
            [&](const Assignment &a) { return a.coder == coder->id; });
        CHECK(c.value(QStringLiteral("spans")).toInt() == spans);
        CHECK(c.value(QStringLiteral("articles")).toInt() == articles);
        CHECK(c.value(QStringLiteral("articles")).toInt() == 17);
        CHECK(c.value(QStringLiteral("shared_articles")).toInt() == 9);
    }
    const QJsonObject sampleFigures = figures.value(QStringLiteral("sample")).toObject();
    CHECK(sampleFigures.value(QStringLiteral("shared_articles")).toInt() == shared.size());
    CHECK(sampleFigures.value(QStringLiteral("shared_articles")).toInt() == 9);
    CHECK(sampleFigures.value(QStringLiteral("project_articles")).toInt() == 40);
    CHECK(figures.value(QStringLiteral("gold")).toObject().value(QStringLiteral("spans")).toInt()
        == qsizetype(gold->size()));
    auto book = project->codebook();
    REQUIRE(book);
    CHECK(figures.value(QStringLiteral("codebook"))
              .toObject()
              .value(QStringLiteral("version"))
              .toInt()
        == book->number);
}

TEST_CASE("the HTML report is self-contained, names no coder and covers Lombard et al.'s items")
{
    const Sample &s = sample();
    const QString html = readText(s.html);
    // No external files, fonts or scripts: the only <script> is the JSON data block.
    CHECK(html.count(QStringLiteral("<script")) == 1);
    CHECK(html.contains(QStringLiteral("<script type=\"application/json\"")));
    CHECK_FALSE(html.contains(QStringLiteral("<link")));
    CHECK_FALSE(html.contains(QStringLiteral("<img")));
    CHECK_FALSE(html.contains(QStringLiteral("url(")));
    CHECK_FALSE(html.contains(QStringLiteral("@import")));
    CHECK_FALSE(html.contains(QStringLiteral("src=")));
    // (SVG's namespace names are identifiers, never fetched.)
    CHECK_FALSE(html.contains(QStringLiteral("href=")));

    // Coder names are personal data: only pseudonyms leave the project (DEVELOPERS.md).
    QTemporaryDir dir;
    const QString copy = dir.filePath(QStringLiteral("copy.fourfold"));
    REQUIRE(QFile::copy(s.project, copy));
    auto project = Project::open(copy);
    REQUIRE(project);
    auto coders = project->coders();
    REQUIRE(coders);
    for (const Coder &c : *coders) {
        INFO(c.pseudonym.toStdString());
        CHECK_FALSE(html.contains(c.name));
        CHECK_FALSE(html.contains(c.name.toHtmlEscaped()));
    }

    // Lombard, Snyder-Duch & Bracken (2002): index and why, value per variable, sample size and
    // how it was drawn, coders and amount coded by each, resolution of disagreements, codebook.
    for (const char *phrase : {"Krippendorff's alpha", "any number of coders", "missing data",
             "reliability sample of", "coded independently", "took part", "C01 coded",
             "adjudication", "codebook", "Lombard", "Hayes &amp; Krippendorff",
             "support tentative conclusions only", "0.667\u00a0≤\u00a0α\u00a0&lt;\u00a00.800"}) {
        INFO(phrase);
        CHECK(html.contains(QString::fromUtf8(phrase)));
    }

    // Both charts are inline SVG that an SVG reader accepts.
    static const QRegularExpression svg(
        QStringLiteral("<svg.*?</svg>"), QRegularExpression::DotMatchesEverythingOption);
    int charts = 0;
    for (auto it = svg.globalMatch(html); it.hasNext();) {
        QSvgRenderer renderer(it.next().captured(0).toUtf8());
        CHECK(renderer.isValid());
        CHECK(renderer.defaultSize().width() > 300);
        ++charts;
    }
    CHECK(charts == 2);
}

TEST_CASE("the PDF report renders with pdftoppm and carries the same alpha values")
{
    const Sample &s = sample();
    const QString pdftoppm = QStandardPaths::findExecutable(QStringLiteral("pdftoppm"));
    const QString pdftotext = QStandardPaths::findExecutable(QStringLiteral("pdftotext"));
    INFO("poppler-utils (tools/debian-packages.txt) must be installed");
    REQUIRE(!pdftoppm.isEmpty());
    REQUIRE(!pdftotext.isEmpty());
    CHECK(readFile(s.pdf).startsWith("%PDF-"));

    QTemporaryDir dir;
    const CliRun rendered = run(pdftoppm,
        {QStringLiteral("-r"), QStringLiteral("30"), QStringLiteral("-png"), s.pdf,
            dir.filePath(QStringLiteral("page"))});
    INFO(rendered.err.toStdString());
    REQUIRE(rendered.exitCode == 0);
    const QStringList pages =
        QDir(dir.path()).entryList({QStringLiteral("page*.png")}, QDir::Files, QDir::Name);
    CHECK(pages.size() >= 3);
    for (const QString &page : pages) {
        const QImage image(dir.filePath(page));
        REQUIRE(!image.isNull());
        CHECK(image.width() < image.height()); // A4 portrait
        // Something is printed on every page, not only its number: at 30 dpi the page number
        // alone inks fewer than 10 of the sampled pixels, the last two lines of the references
        // about 30.
        int ink = 0;
        for (int y = 0; y < image.height(); y += 2)
            for (int x = 0; x < image.width(); x += 2)
                ink += qGray(image.pixel(x, y)) < 160 ? 1 : 0;
        CHECK(ink > 15);
    }

    const CliRun text = run(pdftotext, {QStringLiteral("-layout"), s.pdf, QStringLiteral("-")});
    REQUIRE(text.exitCode == 0);
    CHECK(text.out.contains(QStringLiteral("Method text")));
    for (const char *function : {"problem", "cause", "evaluation", "remedy"}) {
        INFO(function);
        const CliRun r = cli({QStringLiteral("agree"), s.project, QStringLiteral("--unit"),
            QStringLiteral("sentence"), QStringLiteral("--function"), QLatin1String(function),
            QStringLiteral("--json")});
        REQUIRE(r.exitCode == 0);
        const double alpha = cliJson(r)
                                 .value(QStringLiteral("alpha"))
                                 .toObject()
                                 .value(QStringLiteral("value"))
                                 .toDouble();
        CHECK(text.out.contains(QStringLiteral("α = %1").arg(QString::asprintf("%.3f", alpha))));
    }
}

TEST_CASE("report: bad command lines and files fail with a message and leave no file")
{
    const Sample &s = sample();
    QTemporaryDir dir;
    CliRun r = cli({QStringLiteral("report"), s.project});
    CHECK(r.exitCode == 2);
    CHECK(r.err.contains(QStringLiteral("--out")));
    r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"),
        dir.filePath(QStringLiteral("r.txt"))});
    CHECK(r.exitCode == 2);
    CHECK(r.err.contains(QStringLiteral("must end in .html or .pdf")));
    r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"),
        dir.filePath(QStringLiteral("r.html")), QStringLiteral("--unit"),
        QStringLiteral("continuum")});
    CHECK(r.exitCode == 2);
    r = cli({QStringLiteral("report"), dir.filePath(QStringLiteral("missing.fourfold")),
        QStringLiteral("--out"), dir.filePath(QStringLiteral("r.html"))});
    CHECK(r.exitCode == 1);
    CHECK(r.err.startsWith(QStringLiteral("fourfold-cli: ")));
    CHECK_FALSE(QFileInfo::exists(dir.filePath(QStringLiteral("r.html"))));
    const QString unwritable = dir.filePath(QStringLiteral("no/such/dir/r.pdf"));
    r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"), unwritable,
        QStringLiteral("--bootstrap"), QStringLiteral("0")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(unwritable));
    CHECK_FALSE(QFileInfo::exists(unwritable));
    // Fewer than two coders: no reliability to report.
    r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"),
        dir.filePath(QStringLiteral("one.html")), QStringLiteral("--coders"),
        QStringLiteral("C01")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("at least two coders")));
    CHECK_FALSE(QFileInfo::exists(dir.filePath(QStringLiteral("one.html"))));
}

TEST_CASE("a recorded draw of the reliability sample is stated in the method text")
{
    const Sample &s = sample();
    QTemporaryDir dir;
    const QString copy = dir.filePath(QStringLiteral("draw.fourfold"));
    REQUIRE(QFile::copy(s.project, copy));
    // The sample has 40 articles, 9 assigned for reliability (sample-project/README.md): the
    // frame of a new draw is the other 31 (the 24 production articles among them).
    CliRun r = cli({QStringLiteral("assign"), copy, QStringLiteral("--draw"),
        QStringLiteral("reliability"), QStringLiteral("--size"), QStringLiteral("3"),
        QStringLiteral("--stratify"), QStringLiteral("topic"), QStringLiteral("--seed"),
        QStringLiteral("11"), QStringLiteral("--coders"), QStringLiteral("C01,C02")});
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    const QString html = dir.filePath(QStringLiteral("draw.html"));
    r = cli({QStringLiteral("report"), copy, QStringLiteral("--out"), html,
        QStringLiteral("--bootstrap"), QStringLiteral("0")});
    REQUIRE(r.exitCode == 0);
    const QString text = readText(html);
    CHECK(text.contains(QStringLiteral("The 3 articles of the reliability phase were drawn as a "
                                       "sample stratified by topic (seed 11) from a frame of 31 "
                                       "articles not yet assigned to training, pilot or "
                                       "reliability coding")));
    const QJsonObject record =
        valueAt(embeddedFigures(text), QStringLiteral("sample.draw_record")).toObject();
    CHECK(record.value(QStringLiteral("seed")).toString() == QLatin1String("11"));
    CHECK(record.value(QStringLiteral("articles")).toArray().size() == 3);
    // C01 and C02 finished the 9 reliability articles and 8 production articles each; the drawn
    // ones nobody has touched in the reliability phase are not "coded" (Lombard et al. 2002: the
    // amount coded by each coder).
    CHECK(text.contains(QStringLiteral("C01 coded <span class=\"fig\" "
                                       "data-figure=\"report:coders.0.articles\" "
                                       "data-format=\"int\">17</span>")));
    CHECK(text.contains(
        QStringLiteral("Only articles that a coder had marked as finished count for that coder.")));
    CHECK_FALSE(text.contains(QStringLiteral("left out")));
}

TEST_CASE("writeReport: the desktop's entry point writes by suffix and refuses others")
{
    const Sample &s = sample();
    QTemporaryDir dir;
    const QString copy = dir.filePath(QStringLiteral("copy.fourfold"));
    REQUIRE(QFile::copy(s.project, copy));
    auto project = Project::open(copy);
    REQUIRE(project);
    ReportOptions options;
    options.bootstrapReplicates = 0;
    options.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    const QString html = dir.filePath(QStringLiteral("two.html"));
    auto written = writeReport(*project, options, html);
    INFO((written ? QString() : written.error().toString()).toStdString());
    REQUIRE(written);
    const QJsonObject figures = embeddedFigures(readText(html));
    // Two coders, no missing cells: Cohen's kappa joins the figures (Cohen 1960).
    const QJsonObject problem = figures.value(QStringLiteral("analyses"))
                                    .toArray()
                                    .at(0)
                                    .toObject()
                                    .value(QStringLiteral("result"))
                                    .toObject();
    CHECK(problem.value(QStringLiteral("coders")).toArray().size() == 2);
    CHECK(problem.contains(QStringLiteral("cohen_kappa")));
    CHECK_FALSE(problem.contains(QStringLiteral("bootstrap")));

    auto refused = writeReport(*project, options, dir.filePath(QStringLiteral("r.docx")));
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::InvalidArgument);
    CHECK_FALSE(QFileInfo::exists(dir.filePath(QStringLiteral("r.docx"))));
}

TEST_CASE("formatFigure writes each data-format and marks missing values undefined")
{
    // Rounding as printf does it (C standard, 7.21.6.1: %.3f, %.1f, %.3g); common practice for
    // the rest.
    CHECK(formatFigure(0.6925, FigureFormat::Fixed3) == QString::asprintf("%.3f", 0.6925));
    CHECK(formatFigure(0.6925, FigureFormat::Fixed3) == QLatin1String("0.693"));
    CHECK(formatFigure(-0.0104, FigureFormat::Fixed3) == QLatin1String("-0.010"));
    CHECK(formatFigure(0.8966, FigureFormat::Percent) == QLatin1String("89.7%"));
    CHECK(formatFigure(218.0, FigureFormat::Integer) == QLatin1String("218"));
    CHECK(formatFigure(0.0015756996, FigureFormat::Significant3) == QLatin1String("0.00158"));
    for (FigureFormat f : {FigureFormat::Fixed3, FigureFormat::Percent, FigureFormat::Integer,
             FigureFormat::Significant3})
        CHECK(formatFigure(std::nullopt, f) == QLatin1String("undefined"));
    CHECK(figureFormatKey(FigureFormat::Fixed3) == QLatin1String("f3"));
    CHECK(figureFormatKey(FigureFormat::Percent) == QLatin1String("pct"));
    CHECK(figureFormatKey(FigureFormat::Integer) == QLatin1String("int"));
    CHECK(figureFormatKey(FigureFormat::Significant3) == QLatin1String("g3"));
}

TEST_CASE("no title or pseudonym can end the embedded figures early")
{
    // HTML Standard §4.12.1.3 (restrictions for contents of script elements): "<!--" and
    // "</script" must not appear inside; every "<" of the JSON is written as \u003c.
    const Sample &s = sample();
    QTemporaryDir dir;
    const QString copy = dir.filePath(QStringLiteral("hostile.fourfold"));
    REQUIRE(QFile::copy(s.project, copy));
    auto project = Project::open(copy);
    REQUIRE(project);
    ReportOptions options;
    options.bootstrapReplicates = 0;
    options.title = QStringLiteral("</script><!--<script>alert(1)</script>");
    const QString html = dir.filePath(QStringLiteral("hostile.html"));
    REQUIRE(writeReport(*project, options, html));
    const QString text = readText(html);
    const QString open = QStringLiteral("id=\"fourfold-figures\">");
    const qsizetype from = text.indexOf(open) + open.size();
    const qsizetype to = text.indexOf(QStringLiteral("</script>"), from);
    REQUIRE(from > open.size());
    REQUIRE(to > from);
    const QString json = text.mid(from, to - from);
    CHECK_FALSE(json.contains(QLatin1Char('<')));
    CHECK(embeddedFigures(text).value(QStringLiteral("title")).toString() == options.title);
}

TEST_CASE("report --out refuses a symbolic link and replaces a file only with --force")
{
    // A report never writes through a link to somewhere else nor replaces a file unasked
    // (README, "The reliability report").
    const Sample &s = sample();
    QTemporaryDir dir;
    const QString elsewhere = dir.filePath(QStringLiteral("elsewhere.html"));
    REQUIRE(writeFile(dir, QStringLiteral("elsewhere.html"), QByteArray("keep me")).size() > 0);
    const QString link = dir.filePath(QStringLiteral("link.html"));
    REQUIRE(QFile::link(elsewhere, link));
    CliRun r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"), link,
        QStringLiteral("--bootstrap"), QStringLiteral("0")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("is a symbolic link")));
    CHECK(readFile(elsewhere) == QByteArray("keep me"));

    const QString existing = dir.filePath(QStringLiteral("existing.html"));
    REQUIRE(
        writeFile(dir, QStringLiteral("existing.html"), QByteArray("an older report")).size() > 0);
    r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"), existing,
        QStringLiteral("--bootstrap"), QStringLiteral("0")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("exists already")));
    CHECK(readFile(existing) == QByteArray("an older report"));

    r = cli({QStringLiteral("report"), s.project, QStringLiteral("--out"), existing,
        QStringLiteral("--bootstrap"), QStringLiteral("0"), QStringLiteral("--force")});
    INFO(r.err.toStdString());
    CHECK(r.exitCode == 0);
    CHECK(readText(existing).contains(QStringLiteral("<html")));
}

namespace {

// A paint device that records each piece of text drawn on it with the box it takes: what the
// alpha chart's reference-line names are checked against.
class TextRecorder : public QPaintDevice
{
public:
    struct Text {
        QString text;
        QRectF box;
    };
    explicit TextRecorder(QSize size)
        : m_size(size)
        , m_engine(this)
    { }
    QPaintEngine *paintEngine() const override { return &m_engine; }
    std::vector<Text> texts;

protected:
    int metric(PaintDeviceMetric m) const override
    {
        switch (m) {
        case PdmWidth:
            return m_size.width();
        case PdmHeight:
            return m_size.height();
        case PdmWidthMM:
            return m_size.width() * 254 / 960;
        case PdmHeightMM:
            return m_size.height() * 254 / 960;
        case PdmDpiX:
        case PdmDpiY:
        case PdmPhysicalDpiX:
        case PdmPhysicalDpiY:
            return 96;
        case PdmDepth:
            return 32;
        case PdmNumColors:
            return INT_MAX;
        case PdmDevicePixelRatio:
            return 1;
        case PdmDevicePixelRatioScaled:
            return int(devicePixelRatioFScale());
        default:
            return 0;
        }
    }

private:
    class Engine : public QPaintEngine
    {
    public:
        explicit Engine(TextRecorder *device)
            : m_device(device)
        { }
        bool begin(QPaintDevice *) override { return true; }
        bool end() override { return true; }
        void updateState(const QPaintEngineState &) override { }
        void drawPixmap(const QRectF &, const QPixmap &, const QRectF &) override { }
        // Shapes are not recorded (QPaintEngine's own two polygon overloads call each other).
        void drawPolygon(const QPointF *, int, PolygonDrawMode) override { }
        void drawPath(const QPainterPath &) override { }
        void drawTextItem(const QPointF &p, const QTextItem &item) override
        {
            const QPointF at = painter()->transform().map(p);
            m_device->texts.push_back({item.text(),
                QRectF(
                    at.x(), at.y() - item.ascent(), item.width(), item.ascent() + item.descent())});
        }
        Type type() const override { return QPaintEngine::User; }

    private:
        TextRecorder *m_device;
    };
    QSize m_size;
    mutable Engine m_engine;
};

} // namespace

TEST_CASE("the alpha chart names its 0.667 and 0.800 lines apart even on a wide axis")
{
    // Alphas down to -1 stretch the axis over [-1, 1], which puts the two lines closest
    // (Krippendorff's alpha is at least -1 for two or more values; Krippendorff 2011).
    for (double lowest : {0.5, -0.3, -1.0}) {
        INFO(lowest);
        std::vector<AlphaChartRow> rows {
            {QStringLiteral("Problem"), Qt::darkBlue, lowest, {}, {}, {}, {}},
            {QStringLiteral("Cause"), Qt::darkRed, 0.9, 0.85, 0.95, 0.8, 0.97},
        };
        const QSizeF size = alphaChartSize(rows);
        TextRecorder device(size.toSize());
        {
            QPainter p(&device);
            paintAlphaChart(p, rows);
        }
        std::optional<QRectF> tentative, reliable;
        for (const TextRecorder::Text &t : device.texts) {
            if (t.text == QStringLiteral("0.667"))
                tentative = t.box;
            if (t.text == QStringLiteral("0.800"))
                reliable = t.box;
        }
        REQUIRE(tentative);
        REQUIRE(reliable);
        // Side by side at the top, in value order, never overlapping.
        CHECK(tentative->right() <= reliable->left());
        CHECK_FALSE(tentative->intersects(*reliable));
    }
}
