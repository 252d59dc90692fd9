#pragma once
// The report's text for a paper: the method paragraphs (the items of Lombard, Snyder-Duch &
// Bracken 2002, with brackets where the project does not record a fact), the reporting
// checklist, the commands that reproduce every figure and the references.

#include "app/report/report_markup.h"

#include <QString>

namespace fourfold {

// The method paragraphs, their figures marked up by `markup`.
QString reportMethodText(const ReportMarkup &markup);
// The reporting items, each filled in from the project or left for the authors.
QString reportChecklist(const ReportMarkup &markup);
// The `fourfold-cli agree` command of every analysis.
QString reportReproduce(const ReportMarkup &markup);
// The works the report cites, APA style.
QString reportReferences();

} // namespace fourfold
