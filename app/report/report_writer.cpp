#include "app/report/report_writer.h"

#include "app/report/report_charts.h"
#include "app/report/report_document.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QGuiApplication>
#include <QPageLayout>
#include <QPageSize>
#include <QPainter>
#include <QPdfWriter>
#include <QSaveFile>
#include <QTemporaryFile>
#include <QTextDocument>
#include <QUrl>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ReportWriterText {
    Q_DECLARE_TR_FUNCTIONS(ReportWriterText)
};

Status needsGui()
{
    if (qobject_cast<QGuiApplication *>(QCoreApplication::instance()))
        return {};
    return fail(ErrorCode::Unsupported,
        ReportWriterText::tr(
            "Writing a report needs the graphical libraries; start the program with a "
            "QGuiApplication (the offscreen platform will do)."));
}

Status commit(QSaveFile &file, const QString &path)
{
    if (!file.commit())
        return fail(ErrorCode::Io,
            ReportWriterText::tr("The report could not be written to %1.").arg(path),
            file.errorString());
    return {};
}

} // namespace

Status writeReportHtml(const ReportData &data, const QString &path)
{
    FOURFOLD_TRY_STATUS(needsGui());
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly))
        return fail(ErrorCode::Io,
            ReportWriterText::tr("The report could not be written to %1.").arg(path),
            file.errorString());
    file.write(reportHtml(data, ReportFlavour::Html).toUtf8());
    return commit(file, path);
}

Status writeReportPdf(const ReportData &data, const QString &path)
{
    FOURFOLD_TRY_STATUS(needsGui());
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly))
        return fail(ErrorCode::Io,
            ReportWriterText::tr("The report could not be written to %1.").arg(path),
            file.errorString());
    {
        QPdfWriter writer(&file);
        writer.setTitle(data.title);
        writer.setCreator(data.program);
        writer.setPageLayout(QPageLayout(QPageSize(QPageSize::A4), QPageLayout::Portrait,
            QMarginsF(18, 16, 18, 16), QPageLayout::Millimeter));
        writer.setResolution(300);

        QTextDocument document;
        document.setDefaultFont(QFont(QStringLiteral("DejaVu Sans"), 9));
        // Charts as bitmaps at three times their CSS size: sharp on paper at 300 dpi.
        constexpr double scale = 3.0;
        const std::vector<AlphaChartRow> rows = alphaChartRows(data);
        const KappaGrid grid = kappaGrid(data);
        document.addResource(QTextDocument::ImageResource, QUrl(QStringLiteral("chart:alpha")),
            chartImage(
                alphaChartSize(rows), scale, [&rows](QPainter &p) { paintAlphaChart(p, rows); }));
        document.addResource(QTextDocument::ImageResource, QUrl(QStringLiteral("chart:kappa")),
            chartImage(kappaHeatMapSize(grid), scale,
                [&grid](QPainter &p) { paintKappaHeatMap(p, grid); }));
        document.setHtml(reportHtml(data, ReportFlavour::Print));
        document.print(&writer);
    }
    return commit(file, path);
}

Status writeReport(const Project &project, const ReportOptions &options, const QString &path)
{
    const QString suffix = QFileInfo(path).suffix().toLower();
    const bool pdf = suffix == QLatin1String("pdf");
    if (!pdf && suffix != QLatin1String("html") && suffix != QLatin1String("htm"))
        return fail(ErrorCode::InvalidArgument,
            ReportWriterText::tr("The report file %1 must end in .html or .pdf.").arg(path));
    FOURFOLD_TRY_STATUS(needsGui());
    auto data = gatherReportData(project, options);
    if (!data)
        return std::unexpected(data.error());
    return pdf ? writeReportPdf(*data, path) : writeReportHtml(*data, path);
}

} // namespace fourfold
