#pragma once
// The report's Frames section: the newest saved frame analysis with each frame's size, share and
// characteristic elements, and the alpha of each element variable over the report's coders.

#include "app/report/report_markup.h"

#include <QString>

namespace fourfold {

// Needs ReportData::frames (the section is left out without a saved analysis).
QString reportFramesSection(const ReportMarkup &markup);

} // namespace fourfold
