#pragma once
// How the report's parts write HTML for one flavour: figures marked with their source (see
// report_document.h), intervals, verdicts, the functions' colour chips, tables and charts. The
// method text (report_method_text) and the sections (report_sections) both write through it.

#include "app/report/report_charts.h"
#include "app/report/report_data.h"
#include "app/report/report_document.h"

#include <QColor>
#include <QSizeF>
#include <QString>

#include <optional>
#include <vector>

namespace fourfold {

// The colour of an analysis's function (Okabe & Ito's colour-blind-safe palette, as in the
// desktop's function_style), or a neutral for the set-valued variable and the rest.
QColor reportFunctionColour(const QString &analysisId);

class ReportMarkup
{
public:
    ReportMarkup(const ReportData &data, ReportFlavour flavour);

    const ReportData &data() const { return m_d; }
    ReportFlavour flavour() const { return m_flavour; }
    bool print() const { return m_flavour == ReportFlavour::Print; }

    // A figure as marked-up text (see report_document.h): `value` in `format`, marked as the
    // value at `path` of `analysis` ("report": the report's own JSON).
    static QString fig(const QString &analysis, const QString &path,
        const std::optional<double> &value, FigureFormat format);
    // A text figure; "undefined" when there is none.
    static QString figText(
        const QString &analysis, const QString &path, const std::optional<QString> &text);
    // "[low, high]" of a 95% interval, marked as `key`.ci95.0 and .1, or "–" without both ends.
    static QString interval(const QString &analysis, const QString &key,
        const std::optional<double> &low, const std::optional<double> &high);
    // The same for a bootstrap's interval at `key` ("–" without the bootstrap).
    static QString interval(const QString &analysis, const QString &key,
        const std::optional<reliability::BootstrapResult> &bootstrap);
    // The CSS class of alpha's verdict (Krippendorff 2004, §12.2, as alphaBand()).
    static QString verdictClass(const std::optional<double> &alpha);
    // The verdict in one word, for the printed table.
    static QString shortVerdict(const std::optional<double> &alpha);
    // The coloured square before a function's name.
    QString chip(const QString &analysisId) const;
    QString tableOpen() const;
    // A bracket for the authors to complete.
    static QString fillIn(const QString &text);
    // The analyses of `kind` ("function", "item", …), in the report's order.
    std::vector<const ReportAnalysis *> ofKind(const QString &kind) const;
    // "sentence"/"sentences" (or paragraph, token) for the report's unit.
    QString unitWord(int n) const;
    // A chart: inline SVG in HTML, an <img src="chart:NAME"> on paper.
    QString chart(const QString &name, const QSizeF &size, const QString &title,
        const QString &description, const ChartPainter &paint) const;

private:
    const ReportData &m_d;
    ReportFlavour m_flavour;
};

} // namespace fourfold
