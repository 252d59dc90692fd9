#pragma once
// The report as HTML: the method text a paper needs (the items of Lombard, Snyder-Duch &
// Bracken 2002), the tables and the charts, filled from ReportData. Every figure is written as
// <span class="fig" data-figure="ANALYSIS:PATH" data-format="FORMAT">text</span>, where PATH
// is a dotted path into that analysis's agree JSON (or into ReportData::toJson() for ANALYSIS
// "report") and FORMAT says how the text was made from the value: f3 (three decimals), pct
// (percent, one decimal), int, g3 (three significant digits), or text.

#include "app/report/report_charts.h"
#include "app/report/report_data.h"

#include <QJsonValue>
#include <QString>

namespace fourfold {

enum class ReportFlavour {
    Html, // the self-contained HTML file: full CSS, inline SVG charts, embedded JSON figures
    Print, // for QTextDocument (the PDF): its HTML subset, charts as <img src="chart:alpha">
};

// The whole document. Never fails: figures that could not be computed say so in words.
QString reportHtml(const ReportData &data, ReportFlavour flavour);

// The charts' data, taken from the analyses' JSON.
std::vector<AlphaChartRow> alphaChartRows(const ReportData &data);
KappaGrid kappaGrid(const ReportData &data);

// The value at dotted `path` ("alpha.value", "pairs.0.cohen_kappa.ci95.1") in `object`;
// undefined if any step is missing.
QJsonValue figureValue(const QJsonObject &object, const QString &path);
// The text of a figure in `format` (see above); "undefined" for null or missing values.
QString formatFigure(const QJsonValue &value, const QString &format);

} // namespace fourfold
