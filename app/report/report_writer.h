#pragma once
// Writes the reliability report: a self-contained HTML file (no external files, fonts or
// scripts; charts inline as SVG; the figures also embedded as JSON) or a PDF (A4, via
// QTextDocument and QPdfWriter). Needs a QGuiApplication (the offscreen platform will do).

#include "app/report/report_data.h"
#include "core/model/error.h"

#include <QString>

namespace fourfold {

class Project;

// Gathers the figures of `project` (see gatherReportData) and writes the report to `path`: PDF
// when the name ends in ".pdf", HTML for ".html" or ".htm". Fails with InvalidArgument for
// another suffix, with the errors of gatherReportData, or with Io naming the file when it cannot
// be written; a failed write leaves no partial file behind.
Status writeReport(const Project &project, const ReportOptions &options, const QString &path);

// The same for figures already gathered (the desktop gathers once and writes both files).
Status writeReportHtml(const ReportData &data, const QString &path);
Status writeReportPdf(const ReportData &data, const QString &path);

} // namespace fourfold
