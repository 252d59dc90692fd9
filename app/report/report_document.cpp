#include "app/report/report_document.h"

#include "core/agreement/agreement_report.h"

#include <QCoreApplication>
#include <QHash>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ReportDocumentText {
    Q_DECLARE_TR_FUNCTIONS(ReportDocumentText)
};

QString esc(const QString &s)
{
    return s.toHtmlEscaped();
}

// The four functions' colours (Okabe & Ito's colour-blind-safe palette, as in the desktop's
// function_style), and a neutral for the set-valued variable.
QColor functionColour(const QString &analysisId)
{
    if (analysisId == QLatin1String("function-problem"))
        return QColor(0xD5, 0x5E, 0x00);
    if (analysisId == QLatin1String("function-cause"))
        return QColor(0x00, 0x72, 0xB2);
    if (analysisId == QLatin1String("function-evaluation"))
        return QColor(0xCC, 0x79, 0xA7);
    if (analysisId == QLatin1String("function-remedy"))
        return QColor(0x00, 0x9E, 0x73);
    return QColor(0x55, 0x5B, 0x66);
}

std::optional<double> number(const QJsonValue &v)
{
    return v.isDouble() ? std::optional<double>(v.toDouble()) : std::nullopt;
}

const char *kCss = R"css(
:root { --ink:#22262e; --muted:#6b707a; --rule:#d8dade; --paper:#fbfaf7; --accent:#1d3f6e;
        --fill:#fff3c4; }
* { box-sizing: border-box; }
body { margin:0; background:var(--paper); color:var(--ink);
       font: 15px/1.5 "DejaVu Sans", "Helvetica Neue", Arial, sans-serif; }
main { max-width: 980px; margin: 0 auto; padding: 28px 32px 60px; }
header.masthead { border-bottom: 3px solid var(--accent); padding-bottom: 14px; margin-bottom: 22px; }
header.masthead .kicker { text-transform: uppercase; letter-spacing: .12em; font-size: 12px;
       color: var(--accent); font-weight: bold; }
h1 { font-size: 28px; margin: 4px 0 6px; }
h2 { font-size: 19px; margin: 34px 0 10px; color: var(--accent);
     border-bottom: 1px solid var(--rule); padding-bottom: 4px; }
h3 { font-size: 15px; margin: 20px 0 6px; }
.meta { color: var(--muted); font-size: 13px; margin: 0; }
.method { background: #fff; border: 1px solid var(--rule); border-left: 5px solid var(--accent);
          padding: 6px 22px; font-family: "DejaVu Serif", Georgia, serif; font-size: 15.5px;
          line-height: 1.65; }
.fill { background: var(--fill); padding: 0 3px; border-radius: 3px; font-style: italic; }
.note { color: var(--muted); font-size: 13px; }
table { border-collapse: collapse; width: 100%; margin: 8px 0 6px; font-size: 13.5px;
        background: #fff; }
th, td { padding: 5px 8px; border-bottom: 1px solid var(--rule); text-align: left;
         vertical-align: top; }
th { background: #eef1f5; font-weight: bold; }
td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
.chip { display: inline-block; width: 11px; height: 11px; border-radius: 2px; margin-right: 6px;
        vertical-align: baseline; }
.ok { color: #1e6b3a; font-weight: bold; } .tentative { color: #8a5a00; font-weight: bold; }
.low { color: #a13a1c; font-weight: bold; } .todo { color: #8a5a00; }
figure { margin: 12px 0 4px; background: #fff; border: 1px solid var(--rule); padding: 12px; }
figure svg { max-width: 100%; height: auto; display: block; }
figcaption { color: var(--muted); font-size: 13px; margin-top: 6px; }
code, pre { font-family: "DejaVu Sans Mono", monospace; font-size: 12.5px; }
pre { background: #fff; border: 1px solid var(--rule); padding: 10px; overflow-x: auto; }
ol.refs li { margin-bottom: 4px; }
@media print { body { background: #fff; } main { padding: 0; } h2 { break-after: avoid; } }
)css";

// The QTextDocument subset (it ignores what it does not know).
const char *kPrintCss = R"css(
body { font-family: "DejaVu Sans"; font-size: 9.5pt; color: #22262e; }
h1 { font-size: 18pt; color: #1d3f6e; margin-bottom: 2pt; }
h2 { font-size: 13pt; color: #1d3f6e; margin-top: 16pt; margin-bottom: 4pt; }
h3 { font-size: 10.5pt; margin-top: 10pt; margin-bottom: 2pt; }
.kicker { font-size: 8pt; color: #1d3f6e; font-weight: bold; }
.meta { color: #6b707a; font-size: 8.5pt; }
.method { font-family: "DejaVu Serif"; font-size: 10pt; }
.fill { background-color: #fff3c4; font-style: italic; }
.note { color: #6b707a; font-size: 8.5pt; }
th { background-color: #eef1f5; font-weight: bold; }
td, th { font-size: 8pt; }
.ok { color: #1e6b3a; font-weight: bold; } .tentative { color: #8a5a00; font-weight: bold; }
.low { color: #a13a1c; font-weight: bold; } .todo { color: #8a5a00; }
pre, code, .commands { font-family: "DejaVu Sans Mono"; font-size: 7pt; }
th { text-align: left; }
)css";

class Builder
{
public:
    Builder(const ReportData &data, ReportFlavour flavour)
        : m_d(data)
        , m_flavour(flavour)
        , m_reportJson(data.toJson())
    { }

    QString build() const;

private:
    QJsonValue value(const QString &analysis, const QString &path) const
    {
        if (analysis == QLatin1String("report"))
            return figureValue(m_reportJson, path);
        const ReportAnalysis *a = m_d.analysis(analysis);
        return a ? figureValue(a->result, path) : QJsonValue(QJsonValue::Undefined);
    }
    // A figure as marked-up text (see report_document.h).
    QString fig(const QString &analysis, const QString &path, const QString &format) const
    {
        return QStringLiteral(
            "<span class=\"fig\" data-figure=\"%1:%2\" data-format=\"%3\">%4</span>")
            .arg(
                esc(analysis), esc(path), format, esc(formatFigure(value(analysis, path), format)));
    }
    QString interval(const QString &analysis, const QString &key) const
    {
        if (value(analysis, key + QStringLiteral(".ci95.0")).isUndefined()
            || !value(analysis, key + QStringLiteral(".ci95")).isArray())
            return QStringLiteral("–");
        return QStringLiteral("[%1, %2]")
            .arg(fig(analysis, key + QStringLiteral(".ci95.0"), QStringLiteral("f3")),
                fig(analysis, key + QStringLiteral(".ci95.1"), QStringLiteral("f3")));
    }
    QString verdictClass(const std::optional<double> &alpha) const
    {
        switch (alphaBand(alpha)) {
        case AlphaBand::Undefined:
            return QStringLiteral("note");
        case AlphaBand::Reliable:
            return QStringLiteral("ok");
        case AlphaBand::Tentative:
            return QStringLiteral("tentative");
        case AlphaBand::Unreliable:
            break;
        }
        return QStringLiteral("low");
    }
    // Krippendorff (2004, §12.2), as alphaVerdict() in core/agreement.
    static QString shortVerdict(const std::optional<double> &alpha)
    {
        switch (alphaBand(alpha)) {
        case AlphaBand::Undefined:
            return ReportDocumentText::tr("undefined");
        case AlphaBand::Reliable:
            return ReportDocumentText::tr("reliable");
        case AlphaBand::Tentative:
            return ReportDocumentText::tr("tentative");
        case AlphaBand::Unreliable:
            break;
        }
        return ReportDocumentText::tr("unreliable");
    }
    QString chip(const QString &analysisId) const
    {
        if (m_flavour == ReportFlavour::Print)
            return QStringLiteral("<span style=\"color:%1\">■</span> ")
                .arg(functionColour(analysisId).name());
        return QStringLiteral("<span class=\"chip\" style=\"background:%1\"></span>")
            .arg(functionColour(analysisId).name());
    }
    QString tableOpen() const
    {
        return m_flavour == ReportFlavour::Print
            ? QStringLiteral("<table width=\"100%\" border=\"0\" cellspacing=\"0\" "
                             "cellpadding=\"3\" style=\"border-collapse:collapse\">")
            : QStringLiteral("<table>");
    }
    QString fillIn(const QString &text) const
    {
        return QStringLiteral("<span class=\"fill\">[%1]</span>").arg(esc(text));
    }
    std::vector<const ReportAnalysis *> ofKind(const QString &kind) const
    {
        std::vector<const ReportAnalysis *> out;
        for (const ReportAnalysis &a : m_d.analyses)
            if (a.kind == kind)
                out.push_back(&a);
        return out;
    }
    QString unitWord(int n) const;

    QString header() const;
    QString methodText() const;
    QString checklist() const;
    QString variableTable() const;
    QString alphaChart() const;
    QString sampleSize() const;
    QString coderTable() const;
    QString pairSection() const;
    QString otherCoefficients() const;
    QString continuumSection() const;
    QString diagnosticsSection() const;
    QString framesSection() const;
    QString reproduce() const;
    QString references() const;
    QString chart(const QString &name, const QSizeF &size, const QString &title,
        const QString &description, const ChartPainter &paint) const;

    const ReportData &m_d;
    ReportFlavour m_flavour;
    QJsonObject m_reportJson;
};

QString Builder::unitWord(int n) const
{
    switch (m_d.options.unit) {
    case UnitKind::Paragraph:
        return n == 1 ? ReportDocumentText::tr("paragraph") : ReportDocumentText::tr("paragraphs");
    case UnitKind::Token:
        return n == 1 ? ReportDocumentText::tr("token") : ReportDocumentText::tr("tokens");
    default:
        return n == 1 ? ReportDocumentText::tr("sentence") : ReportDocumentText::tr("sentences");
    }
}

QString Builder::header() const
{
    QStringList selection;
    selection << ReportDocumentText::tr("unit: %1").arg(unitKindKey(m_d.options.unit));
    selection << ReportDocumentText::tr("phase: %1")
                     .arg(m_d.options.phase ? phaseKey(*m_d.options.phase)
                                            : ReportDocumentText::tr("all phases"));
    selection << ReportDocumentText::tr("bootstrap: %1 replicates, seed %2")
                     .arg(m_d.options.bootstrapReplicates)
                     .arg(m_d.options.seed);
    QString h = QStringLiteral("<header class=\"masthead\"><div class=\"kicker\">%1</div>")
                    .arg(esc(ReportDocumentText::tr("Inter-coder reliability")));
    h += QStringLiteral("<h1>%1</h1>").arg(esc(m_d.title));
    h += QStringLiteral("<p class=\"meta\">%1</p>")
             .arg(esc(ReportDocumentText::tr("Project “%1” · written %2 by %3 · %4")
                          .arg(m_d.projectName, m_d.generatedAt, m_d.program,
                              selection.join(QStringLiteral(" · ")))));
    h += QStringLiteral("</header>");
    return h;
}

QString Builder::methodText() const
{
    const int coders = int(m_d.coders.size());
    QStringList pseudonyms, amounts;
    for (size_t i = 0; i < m_d.coders.size(); ++i) {
        const ReportCoder &c = m_d.coders[i];
        pseudonyms << esc(c.pseudonym);
        const QString base = QStringLiteral("coders.%1.").arg(i);
        amounts << ReportDocumentText::tr("%1 coded %2 articles (%3 spans)")
                       .arg(esc(c.pseudonym),
                           fig(QStringLiteral("report"), base + QStringLiteral("articles"),
                               QStringLiteral("int")),
                           fig(QStringLiteral("report"), base + QStringLiteral("spans"),
                               QStringLiteral("int")));
    }
    QString html = QStringLiteral("<div class=\"method\">");

    // Sample, coders, amount coded, training (Lombard et al. 2002, items 1–4 and 7).
    QString p = ReportDocumentText::tr(
        "Inter-coder reliability was assessed on a reliability sample of %1 articles "
        "that two or more coders coded independently (%2 of them by all %3 coders), "
        "out of %4 articles in the project. ")
                    .arg(fig(QStringLiteral("report"), QStringLiteral("sample.shared_articles"),
                             QStringLiteral("int")),
                        fig(QStringLiteral("report"), QStringLiteral("sample.all_coder_articles"),
                            QStringLiteral("int")),
                        QString::number(coders),
                        fig(QStringLiteral("report"), QStringLiteral("sample.project_articles"),
                            QStringLiteral("int")));
    p += m_d.sampleDraw.isEmpty()
        ? ReportDocumentText::tr("The sample was drawn %1. ")
              .arg(fillIn(ReportDocumentText::tr(
                  "state how the articles were drawn, e.g. a simple random sample "
                  "of the study's articles, with its size and seed")))
        : esc(m_d.sampleDraw) + QLatin1Char(' ');
    p += ReportDocumentText::tr("%1 coders (%2) took part: %3. ")
             .arg(QString::number(coders), pseudonyms.join(QStringLiteral(", ")),
                 amounts.join(QStringLiteral("; ")));
    if (m_d.options.includeUnfinished) {
        p += ReportDocumentText::tr(
            "Articles that coders had started but not yet marked as finished were included. ");
    } else {
        p += ReportDocumentText::tr(
            "Only articles that a coder had marked as finished count for that coder. ");
        QStringList left;
        for (const CountedCodings::LeftOut &l : m_d.leftOut)
            left << ReportDocumentText::tr("%1 (%2)").arg(esc(l.coder)).arg(l.articles.size());
        if (!left.isEmpty())
            p += ReportDocumentText::tr("Articles still in progress were left out: %1. ")
                     .arg(left.join(QStringLiteral(", ")));
    }
    if (m_d.trainingArticles > 0 || m_d.pilotArticles > 0)
        p += ReportDocumentText::tr(
            "Before the reliability coding, coders trained on %1 articles and coded a pilot "
            "of %2 articles; %3. ")
                 .arg(fig(QStringLiteral("report"), QStringLiteral("sample.training_articles"),
                          QStringLiteral("int")),
                     fig(QStringLiteral("report"), QStringLiteral("sample.pilot_articles"),
                         QStringLiteral("int")),
                     fillIn(ReportDocumentText::tr("hours of training")));
    else
        p += ReportDocumentText::tr("Coder training: %1. ")
                 .arg(fillIn(
                     ReportDocumentText::tr("describe the training and its approximate hours")));
    html += QStringLiteral("<p>%1</p>").arg(p);

    // Index and why, value per variable (items 5 and 6).
    QStringList values;
    for (const ReportAnalysis *a : ofKind(QStringLiteral("function"))) {
        QString v = ReportDocumentText::tr("%1 α = %2")
                        .arg(esc(a->label.toLower()),
                            fig(a->id, QStringLiteral("alpha.value"), QStringLiteral("f3")));
        if (a->result.contains(QStringLiteral("bootstrap_units")))
            v += ReportDocumentText::tr(" (95% CI %1)")
                     .arg(interval(a->id, QStringLiteral("bootstrap_units")));
        values << v;
    }
    const ReportAnalysis *all = m_d.analysis(QStringLiteral("functions"));
    p = ReportDocumentText::tr(
        "Each of Entman's (1993) four framing functions was coded as a span of text; for "
        "reliability, each function became a binary variable (present or absent) per %1, a "
        "%2 carrying a function when a coder's span of that function overlaps it. ")
            .arg(unitWord(1), unitWord(1));
    p += esc(ReportDocumentText::tr(
        "We report Krippendorff's alpha (Krippendorff, 2004) because it handles any "
        "number of coders, missing data and any level of measurement (Hayes & "
        "Krippendorff, 2007). "));
    p += ReportDocumentText::tr("Alpha was %1").arg(values.join(QStringLiteral("; ")));
    if (all)
        p += ReportDocumentText::tr(
            "; for the set of functions per %1, compared with the MASI distance (Passonneau, "
            "2006), α = %2")
                 .arg(unitWord(1),
                     fig(all->id, QStringLiteral("alpha.value"), QStringLiteral("f3")));
    p += QStringLiteral(". ");
    if (m_d.options.bootstrapReplicates > 0)
        p += esc(ReportDocumentText::tr(
            "Intervals are 95% percentile bootstrap intervals from %1 resamples of the "
            "units; the table also gives the interval from resampled pairable values "
            "(Hayes & Krippendorff, 2007), which is narrower than its nominal level when "
            "more than two coders are compared. ")
                     .arg(m_d.options.bootstrapReplicates));
    p += esc(ReportDocumentText::tr("Following Krippendorff (2004), variables with α\u00a0≥\u00a0"
                                    "0.800 are relied on "
                                    "and variables with 0.667\u00a0≤\u00a0α\u00a0<\u00a0"
                                    "0.800 support tentative "
                                    "conclusions only. "));
    html += QStringLiteral("<p>%1</p>").arg(p);

    QStringList others;
    for (const QString &kind : {QStringLiteral("item"), QStringLiteral("attribute")})
        for (const ReportAnalysis *a : ofKind(kind))
            if (a->error.isEmpty())
                others << ReportDocumentText::tr("%1 (%2) α = %3")
                              .arg(esc(a->label),
                                  esc(value(a->id, QStringLiteral("alpha.level")).toString()),
                                  fig(a->id, QStringLiteral("alpha.value"), QStringLiteral("f3")));
    if (!others.isEmpty())
        html += QStringLiteral("<p>%1</p>")
                    .arg(ReportDocumentText::tr("For the other variables alpha was: %1.")
                             .arg(others.join(QStringLiteral("; "))));

    // Disagreements (item 8) and the codebook (item 9).
    if (m_d.goldSpans > 0)
        p = ReportDocumentText::tr(
            "Disagreements were resolved by adjudication into a separate gold standard: %1 "
            "spans on %2 articles, decided by %3, %4 of them with a written rationale. The "
            "independent codings were kept unchanged; every figure above comes from them. ")
                .arg(fig(QStringLiteral("report"), QStringLiteral("gold.spans"),
                         QStringLiteral("int")),
                    fig(QStringLiteral("report"), QStringLiteral("gold.articles"),
                        QStringLiteral("int")),
                    esc(m_d.goldDeciders.join(QStringLiteral(", "))),
                    fig(QStringLiteral("report"), QStringLiteral("gold.with_rationale"),
                        QStringLiteral("int")));
    else
        p = ReportDocumentText::tr("No adjudication is recorded in the project yet: %1. ")
                .arg(fillIn(ReportDocumentText::tr(
                    "say how disagreements were resolved, e.g. by discussion or by "
                    "the lead")));
    p += ReportDocumentText::tr("Coding followed version %1 of the codebook (“%2”)")
             .arg(fig(QStringLiteral("report"), QStringLiteral("codebook.version"),
                      QStringLiteral("int")),
                 esc(m_d.codebookName));
    if (m_d.codingsOtherVersion > 0)
        p += ReportDocumentText::tr("; %1 of %2 codings were made under an earlier version")
                 .arg(fig(QStringLiteral("report"),
                          QStringLiteral("codebook.codings_other_version"), QStringLiteral("int")),
                     fig(QStringLiteral("report"), QStringLiteral("codebook.codings"),
                         QStringLiteral("int")));
    p += ReportDocumentText::tr(", which is available at %1.")
             .arg(fillIn(ReportDocumentText::tr("where readers can obtain it")));
    html += QStringLiteral("<p>%1</p>").arg(p);
    html += QStringLiteral("</div>");
    html += QStringLiteral("<p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "Highlighted brackets are for the authors to complete: the project "
                    "does not record these facts.")));
    return html;
}

QString Builder::checklist() const
{
    // The reporting items of Lombard, Snyder-Duch & Bracken (2002), Human Communication
    // Research 28(4), in their order (from memory of the paper's list).
    struct Item {
        QString text;
        bool fromProject;
    };
    const bool drawKnown = !m_d.sampleDraw.isEmpty();
    const bool trainingKnown = false; // hours are never recorded
    const std::vector<Item> items {
        {ReportDocumentText::tr("Size of the reliability sample and how it was selected"),
            drawKnown},
        {ReportDocumentText::tr("Relationship of the reliability sample to the full sample"),
            drawKnown},
        {ReportDocumentText::tr("Number of reliability coders"), true},
        {ReportDocumentText::tr("Amount of coding conducted by each coder"), true},
        {ReportDocumentText::tr("Index or indices selected and why"), true},
        {ReportDocumentText::tr("Reliability for each variable, for each index"), true},
        {ReportDocumentText::tr("Amount of coder training required to reach reliability"),
            trainingKnown},
        {ReportDocumentText::tr("How disagreements were resolved"), m_d.goldSpans > 0},
        {ReportDocumentText::tr("Where the codebook and coding instructions can be obtained"),
            false},
    };
    QString html = tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th>%3</th></tr>")
                .arg(esc(ReportDocumentText::tr("#")), esc(ReportDocumentText::tr("Item")),
                    esc(ReportDocumentText::tr("In this report")));
    int n = 0;
    for (const Item &i : items)
        html +=
            QStringLiteral("<tr><td class=\"num\">%1</td><td>%2</td><td class=\"%3\">%4</td></tr>")
                .arg(++n)
                .arg(esc(i.text), i.fromProject ? QStringLiteral("ok") : QStringLiteral("todo"),
                    esc(i.fromProject
                            ? ReportDocumentText::tr("filled in from the project")
                            : ReportDocumentText::tr("partly filled in; complete the bracket")));
    html += QStringLiteral("</table>");
    return html;
}

QString Builder::variableTable() const
{
    // On paper the level goes under the variable's name and the verdict is one word, so the
    // table fits the width of an A4 page.
    const bool print = m_flavour == ReportFlavour::Print;
    QString html = tableOpen();
    html += print
        ? QStringLiteral("<tr><th width=\"24%\">%1</th>")
              .arg(esc(ReportDocumentText::tr("Variable")))
        : QStringLiteral("<tr><th>%1</th><th>%2</th>")
              .arg(esc(ReportDocumentText::tr("Variable")), esc(ReportDocumentText::tr("Level")));
    html +=
        QStringLiteral(
            "<th class=\"num\" width=\"7%\">%1</th><th class=\"num\" width=\"9%\">%2</th>"
            "<th class=\"num\" width=\"8%\">α</th><th class=\"num\" width=\"13%\">%3</th>"
            "<th class=\"num\" width=\"13%\">%4</th><th class=\"num\" width=\"9%\">%5</th>"
            "<th width=\"17%\">%6</th></tr>")
            .arg(esc(ReportDocumentText::tr("Units")),
                esc(ReportDocumentText::tr("Pairable values")),
                esc(ReportDocumentText::tr("95% CI, units")),
                esc(ReportDocumentText::tr("95% CI, pairs")),
                esc(ReportDocumentText::tr("Agreement")), esc(ReportDocumentText::tr("Verdict")));
    for (const ReportAnalysis &a : m_d.analyses) {
        if (a.kind == QLatin1String("continuum"))
            continue;
        if (!a.error.isEmpty()) {
            html += QStringLiteral("<tr><td>%1</td><td colspan=\"%2\" class=\"note\">%3</td></tr>")
                        .arg(esc(a.label), print ? QStringLiteral("7") : QStringLiteral("8"),
                            esc(ReportDocumentText::tr("not computed: %1").arg(a.error)));
            continue;
        }
        const auto alpha = number(value(a.id, QStringLiteral("alpha.value")));
        const QString level = esc(value(a.id, QStringLiteral("alpha.level")).toString());
        const QString name =
            (a.kind == QLatin1String("function") || a.kind == QLatin1String("functions")
                    ? chip(a.id)
                    : QString())
            + esc(a.label);
        html += print
            ? QStringLiteral("<tr><td>%1<br><span class=\"note\">%2</span></td>").arg(name, level)
            : QStringLiteral("<tr><td>%1</td><td>%2</td>").arg(name, level);
        html += QStringLiteral("<td class=\"num\">%1</td><td class=\"num\">%2</td>"
                               "<td class=\"num\"><b>%3</b></td><td class=\"num\">%4</td>"
                               "<td class=\"num\">%5</td><td class=\"num\">%6</td>")
                    .arg(fig(a.id, QStringLiteral("units"), QStringLiteral("int")),
                        fig(a.id, QStringLiteral("pairable_values"), QStringLiteral("int")),
                        fig(a.id, QStringLiteral("alpha.value"), QStringLiteral("f3")),
                        interval(a.id, QStringLiteral("bootstrap_units")),
                        interval(a.id, QStringLiteral("bootstrap")),
                        fig(a.id, QStringLiteral("percent_agreement"), QStringLiteral("pct")));
        html += QStringLiteral("<td class=\"%1\">%2</td></tr>")
                    .arg(verdictClass(alpha),
                        print ? esc(shortVerdict(alpha))
                              : fig(a.id, QStringLiteral("alpha.verdict"), QStringLiteral("text")));
    }
    html += QStringLiteral("</table>");
    html += QStringLiteral("<p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "Units: %1 (articles for article-level items; passages matched "
                    "across coders for span attributes). Agreement: percent agreement, "
                    "which is not chance-corrected and is never reported alone "
                    "(Lombard et al., 2002). Units: units resampled, percentile "
                    "interval (the interval to report); pairs: pairable values resampled "
                    "with the expected disagreement held fixed (Hayes & Krippendorff, "
                    "2007), too narrow with more than two coders.")
                             .arg(unitWord(2))));
    return html;
}

QString Builder::chart(const QString &name, const QSizeF &size, const QString &title,
    const QString &description, const ChartPainter &paint) const
{
    QString html = QStringLiteral("<figure>");
    // A4 with 18 mm margins leaves about 600 CSS pixels of text width.
    const double fit = std::min(1.0, 600.0 / size.width());
    if (m_flavour == ReportFlavour::Html)
        html += QString::fromUtf8(chartSvg(size, title, description, paint));
    else
        html += QStringLiteral("<p align=\"center\"><img src=\"chart:%1\" width=\"%2\" "
                               "height=\"%3\"></p>")
                    .arg(name)
                    .arg(int(size.width() * fit))
                    .arg(int(size.height() * fit));
    html +=
        QStringLiteral("<figcaption class=\"note\">%1</figcaption></figure>").arg(esc(description));
    return html;
}

QString Builder::alphaChart() const
{
    const std::vector<AlphaChartRow> rows = alphaChartRows(m_d);
    return chart(QStringLiteral("alpha"), alphaChartSize(rows),
        ReportDocumentText::tr("Krippendorff's alpha per variable"),
        ReportDocumentText::tr(
            "Krippendorff's alpha per variable (dots) with 95% bootstrap intervals: whiskers "
            "resample pairable values (Hayes & Krippendorff, 2007), bands resample units. The "
            "lines mark 0.667 and 0.800 (Krippendorff, 2004)."),
        [rows](QPainter &p) { paintAlphaChart(p, rows); });
}

QString Builder::sampleSize() const
{
    QString html = tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th>%5</th></tr>")
                .arg(esc(ReportDocumentText::tr("Variable")),
                    esc(ReportDocumentText::tr("Pairable values")),
                    esc(ReportDocumentText::tr("Rarest value")),
                    esc(ReportDocumentText::tr("Minimum for α ≥ 0.800")),
                    esc(ReportDocumentText::tr("Enough?")));
    for (const ReportAnalysis &a : m_d.analyses) {
        if (!a.result.contains(QStringLiteral("sample_size")))
            continue;
        const int have = value(a.id, QStringLiteral("sample_size.pairable_values")).toInt();
        const int need = value(a.id, QStringLiteral("sample_size.minimum_values")).toInt();
        html +=
            QStringLiteral("<tr><td>%1</td><td class=\"num\">%2</td><td class=\"num\">%3</td>"
                           "<td class=\"num\">%4</td><td class=\"%5\">%6</td></tr>")
                .arg(esc(a.label),
                    fig(a.id, QStringLiteral("sample_size.pairable_values"), QStringLiteral("int")),
                    fig(a.id, QStringLiteral("sample_size.rarest_proportion"),
                        QStringLiteral("pct")),
                    fig(a.id, QStringLiteral("sample_size.minimum_values"), QStringLiteral("int")),
                    have >= need ? QStringLiteral("ok") : QStringLiteral("low"),
                    esc(have >= need ? ReportDocumentText::tr("yes")
                                     : ReportDocumentText::tr("too few values")));
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "Krippendorff's (2004, §11.4) minimum number of pairable values for "
                    "α ≥ 0.800 at p = 0.05, after Bloch & Kraemer (1989), given the share "
                    "of the rarest value.")));
    return html;
}

QString Builder::coderTable() const
{
    QString html = tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th class=\"num\">%5</th>")
                .arg(esc(ReportDocumentText::tr("Coder")), esc(ReportDocumentText::tr("Role")),
                    esc(ReportDocumentText::tr("Articles")),
                    esc(ReportDocumentText::tr("Shared articles")),
                    esc(ReportDocumentText::tr("Spans")));
    for (FramingFunction f : kFramingFunctions)
        html +=
            QStringLiteral("<th class=\"num\">%1%2</th>")
                .arg(chip(QStringLiteral("function-%1").arg(functionKey(f))), esc(functionKey(f)));
    html += QStringLiteral("<th class=\"num\">%1</th></tr>")
                .arg(esc(ReportDocumentText::tr("Answers")));
    for (size_t i = 0; i < m_d.coders.size(); ++i) {
        const QString base = QStringLiteral("coders.%1.").arg(i);
        auto cell = [&](const QString &key) {
            return QStringLiteral("<td class=\"num\">%1</td>")
                .arg(fig(QStringLiteral("report"), base + key, QStringLiteral("int")));
        };
        html += QStringLiteral("<tr><td><b>%1</b></td><td>%2</td>")
                    .arg(esc(m_d.coders[i].pseudonym), esc(m_d.coders[i].role));
        html += cell(QStringLiteral("articles")) + cell(QStringLiteral("shared_articles"))
            + cell(QStringLiteral("spans"));
        for (FramingFunction f : kFramingFunctions)
            html += cell(QStringLiteral("spans_per_function.") + functionKey(f));
        html += cell(QStringLiteral("answers")) + QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "Coders appear by pseudonym only. Articles: coded by the coder "
                    "(assigned, or with a span or an answer); shared: also coded by "
                    "another coder in this report.")));
    return html;
}

QString Builder::pairSection() const
{
    const KappaGrid grid = kappaGrid(m_d);
    QString html = chart(QStringLiteral("kappa"), kappaHeatMapSize(grid),
        ReportDocumentText::tr("Cohen's kappa per coder pair"),
        ReportDocumentText::tr(
            "Cohen's kappa (Cohen, 1960) for each pair of coders and each function, on the %1 "
            "both coded. Darker is higher; hatched cells are undefined.")
            .arg(unitWord(2)),
        [grid](QPainter &p) { paintKappaHeatMap(p, grid); });
    html += tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th class=\"num\">κ</th>"
                           "<th class=\"num\">%5</th></tr>")
                .arg(esc(ReportDocumentText::tr("Variable")), esc(ReportDocumentText::tr("Pair")),
                    esc(ReportDocumentText::tr("Units")), esc(ReportDocumentText::tr("Agreement")),
                    esc(ReportDocumentText::tr("95% CI")));
    for (const ReportAnalysis *a : ofKind(QStringLiteral("function"))) {
        const QJsonArray pairs = a->result.value(QStringLiteral("pairs")).toArray();
        for (qsizetype i = 0; i < pairs.size(); ++i) {
            const QString base = QStringLiteral("pairs.%1.").arg(i);
            const QJsonArray names = pairs[i].toObject().value(QStringLiteral("coders")).toArray();
            html += QStringLiteral("<tr><td>%1%2</td><td>%3 × %4</td><td class=\"num\">%5</td>"
                                   "<td class=\"num\">%6</td><td class=\"num\">%7</td>"
                                   "<td class=\"num\">%8</td></tr>")
                        .arg(i == 0 ? chip(a->id) : QString(), i == 0 ? esc(a->label) : QString(),
                            esc(names.at(0).toString()), esc(names.at(1).toString()),
                            fig(a->id, base + QStringLiteral("units"), QStringLiteral("int")),
                            fig(a->id, base + QStringLiteral("percent_agreement"),
                                QStringLiteral("pct")),
                            fig(a->id, base + QStringLiteral("cohen_kappa.value"),
                                QStringLiteral("f3")),
                            interval(a->id, base + QStringLiteral("cohen_kappa")));
        }
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "95% CI: large-sample interval with the standard error of Fleiss, "
                    "Cohen & Everitt (1969). A coder whose kappa is low with everyone "
                    "else is worth a look before the coders are retrained.")));
    return html;
}

QString Builder::otherCoefficients() const
{
    QString html = tableOpen();
    html +=
        QStringLiteral("<tr><th>%1</th><th class=\"num\">%2</th><th class=\"num\">%3</th>"
                       "<th class=\"num\">%4</th><th class=\"num\">%5</th>"
                       "<th class=\"num\">%6</th></tr>")
            .arg(esc(ReportDocumentText::tr("Variable")), esc(ReportDocumentText::tr("Fleiss' κ")),
                esc(ReportDocumentText::tr("Light's κ")), esc(ReportDocumentText::tr("Cohen's κ")),
                esc(ReportDocumentText::tr("Scott's π")),
                esc(ReportDocumentText::tr("Bennett's S")));
    auto cell = [&](const ReportAnalysis &a, const QString &path) {
        return QStringLiteral("<td class=\"num\">%1</td>")
            .arg(a.result.contains(path.section(QLatin1Char('.'), 0, 0))
                    ? fig(a.id, path, QStringLiteral("f3"))
                    : esc(ReportDocumentText::tr("n/a")));
    };
    for (const ReportAnalysis &a : m_d.analyses) {
        if (a.kind != QLatin1String("function") && a.kind != QLatin1String("item"))
            continue;
        if (!a.error.isEmpty())
            continue;
        html += QStringLiteral("<tr><td>%1</td>").arg(esc(a.label));
        html += cell(a, QStringLiteral("fleiss_kappa.value"))
            + cell(a, QStringLiteral("light_kappa")) + cell(a, QStringLiteral("cohen_kappa.value"))
            + cell(a, QStringLiteral("scott_pi")) + cell(a, QStringLiteral("bennett_s"))
            + QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "For comparison with older studies: Fleiss (1971) and Light (1971) "
                    "for any number of coders, Cohen (1960), Scott (1955) and Bennett, "
                    "Alpert & Goldstein (1954) for two; n/a where their assumptions "
                    "(complete data, two coders) do not hold.")));
    return html;
}

QString Builder::continuumSection() const
{
    const ReportAnalysis *a = m_d.analysis(QStringLiteral("continuum"));
    if (!a)
        return {};
    if (!a->error.isEmpty())
        return QStringLiteral("<p class=\"note\">%1</p>")
            .arg(esc(ReportDocumentText::tr("Not computed: %1").arg(a->error)));
    QString html =
        QStringLiteral("<p>%1</p>")
            .arg(ReportDocumentText::tr(
                "Unitizing alpha (Krippendorff, 2004) compares where the coders "
                "put their spans, character by character, on the %1 articles "
                "that every coder coded (%2 characters laid end to end).")
                     .arg(QString::number(
                              a->result.value(QStringLiteral("articles")).toArray().size()),
                         fig(a->id, QStringLiteral("length"), QStringLiteral("int"))));
    html += tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">α<sub>U</sub></th><th>%4</th></tr>")
                .arg(esc(ReportDocumentText::tr("Function")),
                    esc(ReportDocumentText::tr("Observed disagreement")),
                    esc(ReportDocumentText::tr("Expected disagreement")),
                    esc(ReportDocumentText::tr("Verdict")));
    QStringList keys;
    for (FramingFunction f : kFramingFunctions)
        keys << functionKey(f);
    keys << QStringLiteral("overall");
    for (const QString &key : keys) {
        const QString base = key == QLatin1String("overall")
            ? QStringLiteral("unitizing_alpha.overall.")
            : QStringLiteral("unitizing_alpha.per_function.%1.").arg(key);
        const auto alpha = number(value(a->id, base + QStringLiteral("value")));
        html +=
            QStringLiteral("<tr><td>%1%2</td><td class=\"num\">%3</td><td class=\"num\">%4</td>"
                           "<td class=\"num\"><b>%5</b></td><td class=\"%6\">%7</td></tr>")
                .arg(key == QLatin1String("overall") ? QString()
                                                     : chip(QStringLiteral("function-%1").arg(key)),
                    esc(key == QLatin1String("overall") ? ReportDocumentText::tr("all four") : key),
                    fig(a->id, base + QStringLiteral("observed_disagreement"),
                        QStringLiteral("g3")),
                    fig(a->id, base + QStringLiteral("expected_disagreement"),
                        QStringLiteral("g3")),
                    fig(a->id, base + QStringLiteral("value"), QStringLiteral("f3")),
                    verdictClass(alpha),
                    fig(a->id, base + QStringLiteral("verdict"), QStringLiteral("text")));
    }
    html += QStringLiteral("</table>");
    return html;
}

QString Builder::diagnosticsSection() const
{
    const std::vector<const ReportAnalysis *> functions = ofKind(QStringLiteral("function"));
    if (functions.empty() || !functions.front()->result.contains(QStringLiteral("diagnostics")))
        return {};
    QString html =
        QStringLiteral("<h3>%1</h3>").arg(esc(ReportDocumentText::tr("Alpha without each coder")));
    html += tableOpen()
        + QStringLiteral("<tr><th>%1</th>").arg(esc(ReportDocumentText::tr("Left out")));
    for (const ReportAnalysis *a : functions)
        html += QStringLiteral("<th class=\"num\">%1%2</th>").arg(chip(a->id), esc(a->shortLabel));
    html += QStringLiteral("</tr>");
    for (const ReportCoder &c : m_d.coders) {
        html += QStringLiteral("<tr><td><b>%1</b></td>").arg(esc(c.pseudonym));
        for (const ReportAnalysis *a : functions) {
            const QJsonArray entries =
                figureValue(a->result, QStringLiteral("diagnostics.leave_one_coder_out")).toArray();
            QString cell = QStringLiteral("–");
            for (qsizetype i = 0; i < entries.size(); ++i)
                if (entries[i].toObject().value(QStringLiteral("coder")).toString()
                    == c.pseudonym) {
                    const QString base =
                        QStringLiteral("diagnostics.leave_one_coder_out.%1.").arg(i);
                    const double change =
                        entries[i].toObject().value(QStringLiteral("change")).toDouble();
                    cell =
                        QStringLiteral("%1 <span class=\"%2\">(%3%4)</span>")
                            .arg(fig(a->id, base + QStringLiteral("alpha_without"),
                                     QStringLiteral("f3")),
                                change > 0 ? QStringLiteral("low") : QStringLiteral("note"),
                                change > 0 ? QStringLiteral("+") : QString(),
                                fig(a->id, base + QStringLiteral("change"), QStringLiteral("f3")));
                }
            html += QStringLiteral("<td class=\"num\">%1</td>").arg(cell);
        }
        html += QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "Alpha recomputed without the coder's codings; in brackets the change "
                    "against all coders (positive: the coder pulls alpha down). A "
                    "diagnostic for retraining, not a licence to report the better "
                    "figure (Krippendorff, 2004).")));

    html += QStringLiteral("<h3>%1</h3>")
                .arg(esc(ReportDocumentText::tr("The article that costs most")));
    html += tableOpen()
        + QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th>"
                         "<th class=\"num\">%4</th></tr>")
              .arg(esc(ReportDocumentText::tr("Variable")), esc(ReportDocumentText::tr("Article")),
                  esc(ReportDocumentText::tr("α without it")),
                  esc(ReportDocumentText::tr("Change")));
    for (const ReportAnalysis *a : functions) {
        const QString base = QStringLiteral("diagnostics.leave_one_article_out.0.");
        if (value(a->id, base + QStringLiteral("article")).isUndefined())
            continue;
        html += QStringLiteral("<tr><td>%1%2</td><td>%3</td><td class=\"num\">%4</td>"
                               "<td class=\"num\">%5</td></tr>")
                    .arg(chip(a->id), esc(a->label),
                        fig(a->id, base + QStringLiteral("article"), QStringLiteral("text")),
                        fig(a->id, base + QStringLiteral("alpha_without"), QStringLiteral("f3")),
                        fig(a->id, base + QStringLiteral("change"), QStringLiteral("f3")));
    }
    html += QStringLiteral("</table>");

    // Which function the other coder gave the same passage.
    const ReportAnalysis *first = functions.front();
    const QJsonArray rows =
        figureValue(first->result, QStringLiteral("diagnostics.span_matching.confusion")).toArray();
    if (rows.isEmpty())
        return html;
    const QStringList columns {QStringLiteral("problem"), QStringLiteral("cause"),
        QStringLiteral("evaluation"), QStringLiteral("remedy"), QStringLiteral("none")};
    html += QStringLiteral("<h3>%1</h3>")
                .arg(esc(ReportDocumentText::tr("Function confusion between coders")));
    html += tableOpen()
        + QStringLiteral("<tr><th>%1</th>").arg(esc(ReportDocumentText::tr("A coder's span")));
    for (const QString &c : columns)
        html += QStringLiteral("<th class=\"num\">%1</th>").arg(esc(c));
    html += QStringLiteral("</tr>");
    for (qsizetype r = 0; r < rows.size(); ++r) {
        const QString function = rows[r].toObject().value(QStringLiteral("function")).toString();
        html += QStringLiteral("<tr><td>%1%2</td>")
                    .arg(chip(QStringLiteral("function-%1").arg(function)), esc(function));
        for (const QString &c : columns) {
            const QString path =
                QStringLiteral("diagnostics.span_matching.confusion.%1.other.%2").arg(r).arg(c);
            const QString cell = fig(first->id, path, QStringLiteral("int"));
            html += QStringLiteral("<td class=\"num\">%1</td>")
                        .arg(c == function ? QStringLiteral("<b>%1</b>").arg(cell) : cell);
        }
        html += QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(esc(ReportDocumentText::tr(
                    "For each coder's span, the function the other coder gave the span "
                    "that overlaps it most (none: nothing there), summed over ordered "
                    "pairs of coders. Off the diagonal are the confusions a codebook "
                    "rule could settle.")));
    return html;
}

QString Builder::framesSection() const
{
    const SavedFrameAnalysis &a = *m_d.frames;
    const QJsonObject settings = a.settings;
    QString html = QStringLiteral("<p>%1</p>\n")
                       .arg(esc(ReportDocumentText::tr(
                           "The newest saved frame analysis, \u201c%1\u201d (saved %2): %3 "
                           "frames of the layer %4 over %5 articles, by Ward's hierarchical "
                           "clustering refined by k-means (Matthes & Kohring 2008). A frame's "
                           "characteristic elements are those with an adjusted residual above "
                           "1.96 (Haberman 1973), with their share in the frame and in all "
                           "articles. The frames are only as good as their elements: beside "
                           "each element variable stands its Krippendorff's alpha (nominal, "
                           "articles as units) over the coders of this report.")
                                    .arg(a.name, a.createdAt.left(10))
                                    .arg(settings.value(QStringLiteral("k")).toInt())
                                    .arg(settings.value(QStringLiteral("layer")).toString())
                                    .arg(settings.value(QStringLiteral("articles")).toInt())));
    // Which frames each element characterises, for the second table.
    QHash<QString, QStringList> characterises;
    html += tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th><th "
                           "class=\"num\">%4</th><th>%5</th></tr>\n")
                .arg(esc(ReportDocumentText::tr("Frame")), esc(ReportDocumentText::tr("Name")),
                    esc(ReportDocumentText::tr("Articles")), esc(ReportDocumentText::tr("Share")),
                    esc(ReportDocumentText::tr("Characteristic elements")));
    for (const SavedFrame &f : a.frames) {
        const QString label = ReportDocumentText::tr("F%1").arg(f.cluster + 1);
        QStringList elements;
        for (const QJsonValue &e : f.profile.value(QStringLiteral("elements")).toArray()) {
            const QJsonObject o = e.toObject();
            if (o.value(QStringLiteral("residual")).toDouble(0) <= 1.96)
                continue;
            const QString variable = o.value(QStringLiteral("variable")).toString();
            characterises[variable] << label;
            elements << ReportDocumentText::tr("%1 (%2% / %3%)")
                            .arg(variable)
                            .arg(o.value(QStringLiteral("share")).toDouble() * 100, 0, 'f', 0)
                            .arg(o.value(QStringLiteral("overall")).toDouble() * 100, 0, 'f', 0);
        }
        html += QStringLiteral("<tr><td>%1</td><td>%2</td><td class=\"num\">%3</td><td "
                               "class=\"num\">%4%</td><td>%5</td></tr>\n")
                    .arg(esc(label), esc(f.name),
                        QString::number(f.profile.value(QStringLiteral("size")).toInt()),
                        QString::number(
                            f.profile.value(QStringLiteral("share")).toDouble() * 100, 'f', 1),
                        esc(elements.isEmpty() ? ReportDocumentText::tr("none stands out")
                                               : elements.join(QStringLiteral("; "))));
    }
    html += QStringLiteral("</table>\n");
    html += tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">α</th><th class=\"num\">%2</th>"
                           "<th>%3</th></tr>\n")
                .arg(esc(ReportDocumentText::tr("Element variable")),
                    esc(ReportDocumentText::tr("Pairable articles")),
                    esc(ReportDocumentText::tr("Characterises")));
    for (const ElementAlpha &e : m_d.elementAlphas)
        html += QStringLiteral("<tr><td>%1</td><td class=\"num\">%2</td><td class=\"num\">%3"
                               "</td><td>%4</td></tr>\n")
                    .arg(esc(e.variable),
                        e.alpha ? QString::number(*e.alpha, 'f', 3)
                                : esc(ReportDocumentText::tr("undefined")),
                        QString::number(e.pairableUnits),
                        esc(characterises.value(e.variable).join(QStringLiteral(", "))));
    html += QStringLiteral("</table>\n");
    return html;
}

QString Builder::reproduce() const
{
    QString html =
        QStringLiteral("<p>%1</p>")
            .arg(esc(ReportDocumentText::tr("Every figure above is what these commands print (add "
                                            "--json for all digits):")));
    QStringList lines;
    for (const ReportAnalysis &a : m_d.analyses)
        lines << QStringLiteral("fourfold-cli agree PROJECT %1")
                     .arg(a.agreeArguments.join(QLatin1Char(' ')));
    for (QString &line : lines)
        line = esc(line);
    if (m_flavour == ReportFlavour::Print)
        html +=
            QStringLiteral("<p class=\"commands\">%1</p>").arg(lines.join(QStringLiteral("<br>")));
    else
        html += QStringLiteral("<pre>%1</pre>").arg(lines.join(QLatin1Char('\n')));
    return html;
}

QString Builder::references() const
{
    const QStringList refs {
        QStringLiteral("Bennett, E. M., Alpert, R., & Goldstein, A. C. (1954). Communications "
                       "through limited response questioning. Public Opinion Quarterly, 18(3), "
                       "303–308."),
        QStringLiteral("Bloch, D. A., & Kraemer, H. C. (1989). 2 × 2 kappa coefficients: "
                       "Measures of agreement or association. Biometrics, 45(1), 269–287."),
        QStringLiteral("Cohen, J. (1960). A coefficient of agreement for nominal scales. "
                       "Educational and Psychological Measurement, 20(1), 37–46."),
        QStringLiteral("Entman, R. M. (1993). Framing: Toward clarification of a fractured "
                       "paradigm. Journal of Communication, 43(4), 51–58."),
        QStringLiteral("Fleiss, J. L. (1971). Measuring nominal scale agreement among many "
                       "raters. Psychological Bulletin, 76(5), 378–382."),
        QStringLiteral("Fleiss, J. L., Cohen, J., & Everitt, B. S. (1969). Large sample standard "
                       "errors of kappa and weighted kappa. Psychological Bulletin, 72(5), "
                       "323–327."),
        QStringLiteral("Hayes, A. F., & Krippendorff, K. (2007). Answering the call for a standard "
                       "reliability measure for coding data. Communication Methods and Measures, "
                       "1(1), 77–89."),
        QStringLiteral("Krippendorff, K. (2004). Content analysis: An introduction to its "
                       "methodology (2nd ed.). Sage."),
        QStringLiteral("Krippendorff, K. (2004). Measuring the reliability of qualitative text "
                       "analysis data. Quality & Quantity, 38, 787–800."),
        QStringLiteral("Light, R. J. (1971). Measures of response agreement for qualitative data. "
                       "Psychological Bulletin, 76(5), 365–377."),
        QStringLiteral("Lombard, M., Snyder-Duch, J., & Bracken, C. C. (2002). Content analysis in "
                       "mass communication: Assessment and reporting of intercoder reliability. "
                       "Human Communication Research, 28(4), 587–604."),
        QStringLiteral("Passonneau, R. (2006). Measuring agreement on set-valued items (MASI) for "
                       "semantic and pragmatic annotation. Proceedings of LREC 2006."),
        QStringLiteral("Scott, W. A. (1955). Reliability of content analysis: The case of nominal "
                       "scale coding. Public Opinion Quarterly, 19(3), 321–325."),
    };
    QString html = QStringLiteral("<ol class=\"refs\">");
    for (const QString &r : refs)
        html += QStringLiteral("<li>%1</li>").arg(esc(r));
    return html + QStringLiteral("</ol>");
}

QString Builder::build() const
{
    const bool print = m_flavour == ReportFlavour::Print;
    //: The report's language as a BCP 47 tag for <html lang>: nl, de.
    const QString lang = ReportDocumentText::tr("en");
    QString html = QStringLiteral("<!DOCTYPE html>\n<html lang=\"%1\"><head><meta "
                                  "charset=\"utf-8\">\n<meta name=\"viewport\" "
                                  "content=\"width=device-width, initial-scale=1\">\n")
                       .arg(esc(lang));
    html += QStringLiteral("<meta name=\"generator\" content=\"%1\">\n").arg(esc(m_d.program));
    html += QStringLiteral("<title>%1</title>\n<style>%2</style>\n</head>\n<body><main>\n")
                .arg(esc(m_d.title), QString::fromUtf8(print ? kPrintCss : kCss));
    html += header();
    auto section = [&](const QString &id, const QString &title, const QString &body,
                       bool newPage = false) {
        html += QStringLiteral("<section id=\"%1\"><h2%2>%3</h2>\n%4</section>\n")
                    .arg(id,
                        print && newPage ? QStringLiteral(" style=\"page-break-before: always\"")
                                         : QString(),
                        esc(title), body);
    };
    section(QStringLiteral("method"), ReportDocumentText::tr("Method text"), methodText());
    section(QStringLiteral("checklist"),
        ReportDocumentText::tr("Reporting checklist (Lombard, Snyder-Duch & Bracken, 2002)"),
        checklist());
    section(QStringLiteral("variables"), ReportDocumentText::tr("Reliability per variable"),
        variableTable() + alphaChart());
    section(QStringLiteral("sample-size"), ReportDocumentText::tr("Is the sample large enough?"),
        sampleSize());
    section(QStringLiteral("coders"), ReportDocumentText::tr("Coders and the amount each coded"),
        coderTable());
    section(QStringLiteral("pairs"), ReportDocumentText::tr("Coder pairs"), pairSection());
    section(QStringLiteral("coefficients"), ReportDocumentText::tr("Other coefficients"),
        otherCoefficients());
    section(QStringLiteral("continuum"), ReportDocumentText::tr("Span boundaries: unitizing alpha"),
        continuumSection());
    const QString diagnostics = diagnosticsSection();
    if (!diagnostics.isEmpty())
        section(QStringLiteral("diagnostics"), ReportDocumentText::tr("Where reliability is lost"),
            diagnostics);
    if (m_d.frames)
        section(QStringLiteral("frames"), ReportDocumentText::tr("Frames"), framesSection());
    section(QStringLiteral("reproduce"), ReportDocumentText::tr("Reproducing the figures"),
        reproduce());
    section(QStringLiteral("references"), ReportDocumentText::tr("References"), references());
    if (!print) {
        // The figures in machine-readable form. In JSON a "<" can only stand inside a string,
        // where \u003c means the same: so no pseudonym or title ("<!--<script", "</script>") can
        // end the element early or switch the HTML parser's script state.
        QString json =
            QString::fromUtf8(QJsonDocument(m_reportJson).toJson(QJsonDocument::Compact));
        json.replace(QLatin1Char('<'), QStringLiteral("\\u003c"));
        html += QStringLiteral("<script type=\"application/json\" id=\"fourfold-figures\">%1"
                               "</script>\n")
                    .arg(json);
    }
    html += QStringLiteral("</main></body></html>\n");
    return html;
}

} // namespace

QJsonValue figureValue(const QJsonObject &object, const QString &path)
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
        } else if (v.isObject()) {
            const QJsonObject o = v.toObject();
            if (!o.contains(step))
                return QJsonValue(QJsonValue::Undefined);
            v = o.value(step);
        } else {
            return QJsonValue(QJsonValue::Undefined);
        }
    }
    return v;
}

QString formatFigure(const QJsonValue &value, const QString &format)
{
    if (format == QLatin1String("text"))
        return value.isString() ? value.toString() : ReportDocumentText::tr("undefined");
    if (!value.isDouble())
        return ReportDocumentText::tr("undefined");
    const double v = value.toDouble();
    if (format == QLatin1String("pct"))
        return QString::number(v * 100.0, 'f', 1) + QLatin1Char('%');
    if (format == QLatin1String("int"))
        return QString::number(std::llround(v));
    if (format == QLatin1String("g3"))
        return QString::number(v, 'g', 3);
    return QString::number(v, 'f', 3);
}

std::vector<AlphaChartRow> alphaChartRows(const ReportData &data)
{
    std::vector<AlphaChartRow> rows;
    for (const ReportAnalysis &a : data.analyses) {
        if (a.kind == QLatin1String("continuum") || !a.error.isEmpty())
            continue;
        AlphaChartRow row;
        row.label = a.shortLabel;
        row.colour = functionColour(a.id);
        row.alpha = number(figureValue(a.result, QStringLiteral("alpha.value")));
        row.pairLow = number(figureValue(a.result, QStringLiteral("bootstrap.ci95.0")));
        row.pairHigh = number(figureValue(a.result, QStringLiteral("bootstrap.ci95.1")));
        row.unitLow = number(figureValue(a.result, QStringLiteral("bootstrap_units.ci95.0")));
        row.unitHigh = number(figureValue(a.result, QStringLiteral("bootstrap_units.ci95.1")));
        rows.push_back(row);
    }
    return rows;
}

KappaGrid kappaGrid(const ReportData &data)
{
    KappaGrid grid;
    std::vector<const ReportAnalysis *> functions;
    for (const ReportAnalysis &a : data.analyses)
        if (a.kind == QLatin1String("function")) {
            functions.push_back(&a);
            grid.columns << a.id.section(QLatin1Char('-'), 1);
        }
    if (functions.empty())
        return grid;
    const QJsonArray pairs = functions.front()->result.value(QStringLiteral("pairs")).toArray();
    for (qsizetype i = 0; i < pairs.size(); ++i) {
        const QJsonArray names = pairs[i].toObject().value(QStringLiteral("coders")).toArray();
        grid.rows << QStringLiteral("%1 × %2").arg(names.at(0).toString(), names.at(1).toString());
        for (const ReportAnalysis *a : functions)
            grid.cells.push_back(number(
                figureValue(a->result, QStringLiteral("pairs.%1.cohen_kappa.value").arg(i))));
    }
    return grid;
}

QString reportHtml(const ReportData &data, ReportFlavour flavour)
{
    return Builder(data, flavour).build();
}

} // namespace fourfold
