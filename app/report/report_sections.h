#pragma once
// The report's sections of figures: reliability per variable with the alpha chart, whether the
// sample is large enough, the coders, the coder pairs with the kappa heat map, other
// coefficients, unitizing alpha and where reliability is lost. Each returns the section's body
// for one flavour, its figures marked up by `markup`.

#include "app/report/report_markup.h"

#include <QString>

namespace fourfold {

QString reportVariableTable(const ReportMarkup &markup);
QString reportAlphaChart(const ReportMarkup &markup);
QString reportSampleSize(const ReportMarkup &markup);
QString reportCoderTable(const ReportMarkup &markup);
QString reportPairSection(const ReportMarkup &markup);
QString reportOtherCoefficients(const ReportMarkup &markup);
// Empty when the selection has no continuum analysis.
QString reportContinuumSection(const ReportMarkup &markup);
// Empty when the function analyses carry no diagnostics.
QString reportDiagnosticsSection(const ReportMarkup &markup);

} // namespace fourfold
