#include "app/report/report_document.h"

#include "app/report/report_frames_section.h"
#include "app/report/report_markup.h"
#include "app/report/report_method_text.h"
#include "app/report/report_sections.h"
#include "app/report/report_text.h"
#include "core/model/logging.h"

#include <QCoreApplication>
#include <QFile>
#include <QJsonDocument>
#include <QJsonObject>

#include <cmath>

namespace fourfold {

namespace {

// The style sheet of `flavour`, from the resources (app/report/resources, compiled in under
// :/report): the full CSS for the HTML file, QTextDocument's subset for the PDF.
QString styleSheet(ReportFlavour flavour)
{
    const QString path = flavour == ReportFlavour::Print
        ? QStringLiteral(":/report/report_print.css")
        : QStringLiteral(":/report/report.css");
    QFile file(path);
    // The resource is compiled in: only a broken build lacks it, and the report then goes out
    // unstyled.
    if (!FOURFOLD_SOFT_ASSERT(lcReport(), file.open(QIODevice::ReadOnly)))
        return {};
    return QString::fromUtf8(file.readAll());
}

// The masthead: kicker, title, and the project, time, program and selection.
QString header(const ReportData &d)
{
    QStringList selection;
    selection << ReportDocumentText::tr("unit: %1").arg(unitKindKey(d.options.unit));
    selection << ReportDocumentText::tr("phase: %1")
                     .arg(d.options.phase ? phaseKey(*d.options.phase)
                                          : ReportDocumentText::tr("all phases"));
    selection << ReportDocumentText::tr("bootstrap: %1 replicates, seed %2")
                     .arg(d.options.bootstrapReplicates)
                     .arg(d.options.seed);
    QString h = QStringLiteral("<header class=\"masthead\"><div class=\"kicker\">%1</div>")
                    .arg(htmlEscaped(ReportDocumentText::tr("Inter-coder reliability")));
    h += QStringLiteral("<h1>%1</h1>").arg(htmlEscaped(d.title));
    h += QStringLiteral("<p class=\"meta\">%1</p>")
             .arg(htmlEscaped(ReportDocumentText::tr("Project “%1” · written %2 by %3 · %4")
                                  .arg(d.projectName, d.generatedAt, d.program,
                                      selection.join(QStringLiteral(" · ")))));
    h += QStringLiteral("</header>");
    return h;
}

QString build(const ReportData &d, ReportFlavour flavour)
{
    const ReportMarkup m(d, flavour);
    const bool print = m.print();
    //: The report's language as a BCP 47 tag for <html lang>: nl, de.
    const QString lang = ReportDocumentText::tr("en");
    QString html = QStringLiteral("<!DOCTYPE html>\n<html lang=\"%1\"><head><meta "
                                  "charset=\"utf-8\">\n<meta name=\"viewport\" "
                                  "content=\"width=device-width, initial-scale=1\">\n")
                       .arg(htmlEscaped(lang));
    html +=
        QStringLiteral("<meta name=\"generator\" content=\"%1\">\n").arg(htmlEscaped(d.program));
    html += QStringLiteral("<title>%1</title>\n<style>\n%2</style>\n</head>\n<body><main>\n")
                .arg(htmlEscaped(d.title), styleSheet(flavour));
    html += header(d);
    auto section = [&](const QString &id, const QString &title, const QString &body,
                       bool newPage = false) {
        html += QStringLiteral("<section id=\"%1\"><h2%2>%3</h2>\n%4</section>\n")
                    .arg(id,
                        print && newPage ? QStringLiteral(" style=\"page-break-before: always\"")
                                         : QString(),
                        htmlEscaped(title), body);
    };
    section(QStringLiteral("method"), ReportDocumentText::tr("Method text"), reportMethodText(m));
    section(QStringLiteral("checklist"),
        ReportDocumentText::tr("Reporting checklist (Lombard, Snyder-Duch & Bracken, 2002)"),
        reportChecklist(m));
    section(QStringLiteral("variables"), ReportDocumentText::tr("Reliability per variable"),
        reportVariableTable(m) + reportAlphaChart(m));
    section(QStringLiteral("sample-size"), ReportDocumentText::tr("Is the sample large enough?"),
        reportSampleSize(m));
    section(QStringLiteral("coders"), ReportDocumentText::tr("Coders and the amount each coded"),
        reportCoderTable(m));
    section(QStringLiteral("pairs"), ReportDocumentText::tr("Coder pairs"), reportPairSection(m));
    section(QStringLiteral("coefficients"), ReportDocumentText::tr("Other coefficients"),
        reportOtherCoefficients(m));
    section(QStringLiteral("continuum"), ReportDocumentText::tr("Span boundaries: unitizing alpha"),
        reportContinuumSection(m));
    const QString diagnostics = reportDiagnosticsSection(m);
    if (!diagnostics.isEmpty())
        section(QStringLiteral("diagnostics"), ReportDocumentText::tr("Where reliability is lost"),
            diagnostics);
    if (d.frames)
        section(QStringLiteral("frames"), ReportDocumentText::tr("Frames"), reportFramesSection(m));
    section(QStringLiteral("reproduce"), ReportDocumentText::tr("Reproducing the figures"),
        reportReproduce(m));
    section(QStringLiteral("references"), ReportDocumentText::tr("References"), reportReferences());
    if (!print) {
        // The figures in machine-readable form. In JSON a "<" can only stand inside a string,
        // where \u003c means the same: so no pseudonym or title ("<!--<script", "</script>") can
        // end the element early or switch the HTML parser's script state.
        QString json = QString::fromUtf8(QJsonDocument(d.toJson()).toJson(QJsonDocument::Compact));
        json.replace(QLatin1Char('<'), QStringLiteral("\\u003c"));
        html += QStringLiteral("<script type=\"application/json\" id=\"fourfold-figures\">%1"
                               "</script>\n")
                    .arg(json);
    }
    html += QStringLiteral("</main></body></html>\n");
    return html;
}

} // namespace

QString figureFormatKey(FigureFormat format)
{
    switch (format) {
    case FigureFormat::Percent:
        return QStringLiteral("pct");
    case FigureFormat::Integer:
        return QStringLiteral("int");
    case FigureFormat::Significant3:
        return QStringLiteral("g3");
    case FigureFormat::Fixed3:
        break;
    }
    return QStringLiteral("f3");
}

QString formatFigure(const std::optional<double> &value, FigureFormat format)
{
    if (!value)
        return ReportDocumentText::tr("undefined");
    const double v = *value;
    switch (format) {
    case FigureFormat::Percent:
        return QString::number(v * 100.0, 'f', 1) + QLatin1Char('%');
    case FigureFormat::Integer:
        return QString::number(std::llround(v));
    case FigureFormat::Significant3:
        return QString::number(v, 'g', 3);
    case FigureFormat::Fixed3:
        break;
    }
    return QString::number(v, 'f', 3);
}

std::vector<AlphaChartRow> alphaChartRows(const ReportData &data)
{
    std::vector<AlphaChartRow> rows;
    for (const ReportAnalysis &a : data.analyses) {
        if (!a.agreement)
            continue;
        const AgreementReport &r = *a.agreement;
        AlphaChartRow row;
        row.label = a.shortLabel;
        row.colour = reportFunctionColour(a.id);
        row.alpha = r.alpha.value;
        // An interval needs both ends (agree's "ci95" is null otherwise).
        if (r.pairBootstrap && r.pairBootstrap->ciLow && r.pairBootstrap->ciHigh) {
            row.pairLow = r.pairBootstrap->ciLow;
            row.pairHigh = r.pairBootstrap->ciHigh;
        }
        if (r.unitBootstrap && r.unitBootstrap->ciLow && r.unitBootstrap->ciHigh) {
            row.unitLow = r.unitBootstrap->ciLow;
            row.unitHigh = r.unitBootstrap->ciHigh;
        }
        rows.push_back(row);
    }
    return rows;
}

KappaGrid kappaGrid(const ReportData &data)
{
    KappaGrid grid;
    std::vector<const AgreementReport *> functions;
    for (const ReportAnalysis &a : data.analyses)
        if (a.kind == QLatin1String("function") && a.agreement) {
            functions.push_back(&*a.agreement);
            grid.columns << a.id.section(QLatin1Char('-'), 1);
        }
    if (functions.empty())
        return grid;
    const AgreementReport &first = *functions.front();
    for (size_t i = 0; i < first.pairs.size(); ++i) {
        grid.rows << QStringLiteral("%1 × %2").arg(
            first.coders.value(first.pairs[i].coderA), first.coders.value(first.pairs[i].coderB));
        for (const AgreementReport *r : functions)
            grid.cells.push_back(i < r->pairs.size() ? r->pairs[i].cohenKappa.value : std::nullopt);
    }
    return grid;
}

QString reportHtml(const ReportData &data, ReportFlavour flavour)
{
    return build(data, flavour);
}

} // namespace fourfold
