#include "app/report/report_markup.h"

#include "app/report/report_text.h"
#include "core/agreement/agreement_report.h"

#include <QCoreApplication>

#include <algorithm>

namespace fourfold {

QColor reportFunctionColour(const QString &analysisId)
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

ReportMarkup::ReportMarkup(const ReportData &data, ReportFlavour flavour)
    : m_d(data)
    , m_flavour(flavour)
{ }

namespace {

QString markedFigure(
    const QString &analysis, const QString &path, const QString &format, const QString &text)
{
    return QStringLiteral("<span class=\"fig\" data-figure=\"%1:%2\" data-format=\"%3\">%4</span>")
        .arg(htmlEscaped(analysis), htmlEscaped(path), format, htmlEscaped(text));
}

} // namespace

QString ReportMarkup::fig(const QString &analysis, const QString &path,
    const std::optional<double> &value, FigureFormat format)
{
    return markedFigure(analysis, path, figureFormatKey(format), formatFigure(value, format));
}

QString ReportMarkup::figText(
    const QString &analysis, const QString &path, const std::optional<QString> &text)
{
    return markedFigure(
        analysis, path, QStringLiteral("text"), text ? *text : ReportDocumentText::tr("undefined"));
}

QString ReportMarkup::interval(const QString &analysis, const QString &key,
    const std::optional<double> &low, const std::optional<double> &high)
{
    if (!low || !high)
        return QStringLiteral("–");
    return QStringLiteral("[%1, %2]")
        .arg(fig(analysis, key + QStringLiteral(".ci95.0"), low, FigureFormat::Fixed3),
            fig(analysis, key + QStringLiteral(".ci95.1"), high, FigureFormat::Fixed3));
}

QString ReportMarkup::interval(const QString &analysis, const QString &key,
    const std::optional<reliability::BootstrapResult> &bootstrap)
{
    return bootstrap ? interval(analysis, key, bootstrap->ciLow, bootstrap->ciHigh)
                     : QStringLiteral("–");
}

QString ReportMarkup::verdictClass(const std::optional<double> &alpha)
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

QString ReportMarkup::shortVerdict(const std::optional<double> &alpha)
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

QString ReportMarkup::chip(const QString &analysisId) const
{
    if (print())
        return QStringLiteral("<span style=\"color:%1\">■</span> ")
            .arg(reportFunctionColour(analysisId).name());
    return QStringLiteral("<span class=\"chip\" style=\"background:%1\"></span>")
        .arg(reportFunctionColour(analysisId).name());
}

QString ReportMarkup::tableOpen() const
{
    return print() ? QStringLiteral("<table width=\"100%\" border=\"0\" cellspacing=\"0\" "
                                    "cellpadding=\"3\" style=\"border-collapse:collapse\">")
                   : QStringLiteral("<table>");
}

QString ReportMarkup::fillIn(const QString &text)
{
    return QStringLiteral("<span class=\"fill\">[%1]</span>").arg(htmlEscaped(text));
}

std::vector<const ReportAnalysis *> ReportMarkup::ofKind(const QString &kind) const
{
    std::vector<const ReportAnalysis *> out;
    for (const ReportAnalysis &a : m_d.analyses)
        if (a.kind == kind)
            out.push_back(&a);
    return out;
}

QString ReportMarkup::unitWord(int n) const
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

QString ReportMarkup::chart(const QString &name, const QSizeF &size, const QString &title,
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
    html += QStringLiteral("<figcaption class=\"note\">%1</figcaption></figure>")
                .arg(htmlEscaped(description));
    return html;
}

} // namespace fourfold
