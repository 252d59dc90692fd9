#pragma once
// The report as HTML: the method text a paper needs (the items of Lombard, Snyder-Duch &
// Bracken 2002), the tables and the charts, filled from ReportData. Every figure is written as
// <span class="fig" data-figure="ANALYSIS:PATH" data-format="FORMAT">text</span>, where PATH
// is the figure's dotted path in that analysis's agree JSON (or in ReportData::toJson() for
// ANALYSIS "report"), so a reader of the embedded figures finds it there; the text is made from
// the typed result the path names, in FORMAT: f3 (three decimals), pct (percent, one decimal),
// int, g3 (three significant digits), or text.

#include "app/report/report_charts.h"
#include "app/report/report_data.h"

#include <QString>

#include <optional>
#include <vector>

namespace fourfold {

enum class ReportFlavour {
    Html, // the self-contained HTML file: full CSS, inline SVG charts, embedded JSON figures
    Print, // for QTextDocument (the PDF): its HTML subset, charts as <img src="chart:alpha">
};

// The whole document. Never fails: figures that could not be computed say so in words.
QString reportHtml(const ReportData &data, ReportFlavour flavour);

// How a number figure is written (data-format in the HTML, see above).
enum class FigureFormat {
    Fixed3, // "f3"
    Percent, // "pct"
    Integer, // "int"
    Significant3, // "g3"
};
// The key of `format` in data-format.
QString figureFormatKey(FigureFormat format);
// The text of a number in `format`; "undefined" when there is none.
QString formatFigure(const std::optional<double> &value, FigureFormat format);

// The charts' data, taken from the analyses' results.
std::vector<AlphaChartRow> alphaChartRows(const ReportData &data);
KappaGrid kappaGrid(const ReportData &data);

} // namespace fourfold
