#include "app/report/report_sections.h"

#include "app/report/report_text.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonObject>

#include <array>

namespace fourfold {

QString reportVariableTable(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    // On paper the level goes under the variable's name and the verdict is one word, so the
    // table fits the width of an A4 page. QTextDocument breaks a word that does not fit its cell
    // ("Unit s"), so on paper each column is as wide as its longest header word at 8 pt; the HTML
    // file keeps its headers on one line (th.num: nowrap) and takes the widths as hints.
    const bool print = m.print();
    QString html = m.tableOpen();
    html += print ? QStringLiteral("<tr><th width=\"21%\">%1</th>")
                        .arg(htmlEscaped(ReportDocumentText::tr("Variable")))
                  : QStringLiteral("<tr><th>%1</th><th>%2</th>")
                        .arg(htmlEscaped(ReportDocumentText::tr("Variable")),
                            htmlEscaped(ReportDocumentText::tr("Level")));
    const QStringList headers {htmlEscaped(ReportDocumentText::tr("Units")),
        htmlEscaped(ReportDocumentText::tr("Pairable values")), QStringLiteral("α"),
        htmlEscaped(ReportDocumentText::tr("95% CI, units")),
        htmlEscaped(ReportDocumentText::tr("95% CI, pairs")),
        htmlEscaped(ReportDocumentText::tr("Agreement")),
        htmlEscaped(ReportDocumentText::tr("Verdict"))};
    const std::array<int, 7> widths =
        print ? std::array {9, 11, 8, 11, 11, 15, 14} : std::array {7, 9, 8, 13, 13, 9, 17};
    for (qsizetype i = 0; i < headers.size(); ++i)
        html += QStringLiteral("<th%1 width=\"%2%\">%3</th>")
                    .arg(i + 1 < headers.size() ? QStringLiteral(" class=\"num\"") : QString(),
                        QString::number(widths[size_t(i)]), headers[i]);
    html += QStringLiteral("</tr>");
    for (const ReportAnalysis &a : d.analyses) {
        if (a.kind == QLatin1String("continuum"))
            continue;
        if (!a.error.isEmpty()) {
            html +=
                QStringLiteral("<tr><td>%1</td><td colspan=\"%2\" class=\"note\">%3</td></tr>")
                    .arg(htmlEscaped(a.label), print ? QStringLiteral("7") : QStringLiteral("8"),
                        htmlEscaped(ReportDocumentText::tr("not computed: %1").arg(a.error)));
            continue;
        }
        const auto alpha = reportNumber(m.value(a.id, QStringLiteral("alpha.value")));
        const QString level = htmlEscaped(m.value(a.id, QStringLiteral("alpha.level")).toString());
        const QString name =
            (a.kind == QLatin1String("function") || a.kind == QLatin1String("functions")
                    ? m.chip(a.id)
                    : QString())
            + htmlEscaped(a.label);
        html += print
            ? QStringLiteral("<tr><td>%1<br><span class=\"note\">%2</span></td>").arg(name, level)
            : QStringLiteral("<tr><td>%1</td><td>%2</td>").arg(name, level);
        html += QStringLiteral("<td class=\"num\">%1</td><td class=\"num\">%2</td>"
                               "<td class=\"num\"><b>%3</b></td><td class=\"num\">%4</td>"
                               "<td class=\"num\">%5</td><td class=\"num\">%6</td>")
                    .arg(m.fig(a.id, QStringLiteral("units"), QStringLiteral("int")),
                        m.fig(a.id, QStringLiteral("pairable_values"), QStringLiteral("int")),
                        m.fig(a.id, QStringLiteral("alpha.value"), QStringLiteral("f3")),
                        m.interval(a.id, QStringLiteral("bootstrap_units")),
                        m.interval(a.id, QStringLiteral("bootstrap")),
                        m.fig(a.id, QStringLiteral("percent_agreement"), QStringLiteral("pct")));
        html +=
            QStringLiteral("<td class=\"%1\">%2</td></tr>")
                .arg(ReportMarkup::verdictClass(alpha),
                    print ? htmlEscaped(ReportMarkup::shortVerdict(alpha))
                          : m.fig(a.id, QStringLiteral("alpha.verdict"), QStringLiteral("text")));
    }
    html += QStringLiteral("</table>");
    html += QStringLiteral("<p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "Units: %1 (articles for article-level items; passages matched "
                    "across coders for span attributes). Agreement: percent agreement, "
                    "which is not chance-corrected and is never reported alone "
                    "(Lombard et al., 2002). Units: units resampled, percentile "
                    "interval (the interval to report); pairs: pairable values resampled "
                    "with the expected disagreement held fixed (Hayes & Krippendorff, "
                    "2007), too narrow with more than two coders.")
                                     .arg(m.unitWord(2))));
    return html;
}

QString reportAlphaChart(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const std::vector<AlphaChartRow> rows = alphaChartRows(d);
    return m.chart(QStringLiteral("alpha"), alphaChartSize(rows),
        ReportDocumentText::tr("Krippendorff's alpha per variable"),
        ReportDocumentText::tr(
            "Krippendorff's alpha per variable (dots) with 95% bootstrap intervals: whiskers "
            "resample pairable values (Hayes & Krippendorff, 2007), bands resample units. The "
            "lines mark 0.667 and 0.800 (Krippendorff, 2004)."),
        [rows](QPainter &p) { paintAlphaChart(p, rows); });
}

QString reportSampleSize(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    QString html = m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th>%5</th></tr>")
                .arg(htmlEscaped(ReportDocumentText::tr("Variable")),
                    htmlEscaped(ReportDocumentText::tr("Pairable values")),
                    htmlEscaped(ReportDocumentText::tr("Rarest value")),
                    htmlEscaped(ReportDocumentText::tr("Minimum for α ≥ 0.800")),
                    htmlEscaped(ReportDocumentText::tr("Enough?")));
    for (const ReportAnalysis &a : d.analyses) {
        if (!a.result.contains(QStringLiteral("sample_size")))
            continue;
        const int have = m.value(a.id, QStringLiteral("sample_size.pairable_values")).toInt();
        const int need = m.value(a.id, QStringLiteral("sample_size.minimum_values")).toInt();
        html += QStringLiteral("<tr><td>%1</td><td class=\"num\">%2</td><td class=\"num\">%3</td>"
                               "<td class=\"num\">%4</td><td class=\"%5\">%6</td></tr>")
                    .arg(htmlEscaped(a.label),
                        m.fig(a.id, QStringLiteral("sample_size.pairable_values"),
                            QStringLiteral("int")),
                        m.fig(a.id, QStringLiteral("sample_size.rarest_proportion"),
                            QStringLiteral("pct")),
                        m.fig(a.id, QStringLiteral("sample_size.minimum_values"),
                            QStringLiteral("int")),
                        have >= need ? QStringLiteral("ok") : QStringLiteral("low"),
                        htmlEscaped(have >= need ? ReportDocumentText::tr("yes")
                                                 : ReportDocumentText::tr("too few values")));
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "Krippendorff's (2004, §11.4) minimum number of pairable values for "
                    "α ≥ 0.800 at p = 0.05, after Bloch & Kraemer (1989), given the share "
                    "of the rarest value.")));
    return html;
}

QString reportCoderTable(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    QString html = m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th class=\"num\">%5</th>")
                .arg(htmlEscaped(ReportDocumentText::tr("Coder")),
                    htmlEscaped(ReportDocumentText::tr("Role")),
                    htmlEscaped(ReportDocumentText::tr("Articles")),
                    htmlEscaped(ReportDocumentText::tr("Shared articles")),
                    htmlEscaped(ReportDocumentText::tr("Spans")));
    for (FramingFunction f : kFramingFunctions)
        html += QStringLiteral("<th class=\"num\">%1%2</th>")
                    .arg(m.chip(QStringLiteral("function-%1").arg(functionKey(f))),
                        htmlEscaped(functionKey(f)));
    html += QStringLiteral("<th class=\"num\">%1</th></tr>")
                .arg(htmlEscaped(ReportDocumentText::tr("Answers")));
    for (size_t i = 0; i < d.coders.size(); ++i) {
        const QString base = QStringLiteral("coders.%1.").arg(i);
        auto cell = [&](const QString &key) {
            return QStringLiteral("<td class=\"num\">%1</td>")
                .arg(m.fig(QStringLiteral("report"), base + key, QStringLiteral("int")));
        };
        html += QStringLiteral("<tr><td><b>%1</b></td><td>%2</td>")
                    .arg(htmlEscaped(d.coders[i].pseudonym), htmlEscaped(d.coders[i].role));
        html += cell(QStringLiteral("articles")) + cell(QStringLiteral("shared_articles"))
            + cell(QStringLiteral("spans"));
        for (FramingFunction f : kFramingFunctions)
            html += cell(QStringLiteral("spans_per_function.") + functionKey(f));
        html += cell(QStringLiteral("answers")) + QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "Coders appear by pseudonym only. Articles: coded by the coder "
                    "(assigned, or with a span or an answer); shared: also coded by "
                    "another coder in this report.")));
    return html;
}

QString reportPairSection(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const KappaGrid grid = kappaGrid(d);
    QString html = m.chart(QStringLiteral("kappa"), kappaHeatMapSize(grid),
        ReportDocumentText::tr("Cohen's kappa per coder pair"),
        ReportDocumentText::tr(
            "Cohen's kappa (Cohen, 1960) for each pair of coders and each function, on the %1 "
            "both coded. Darker is higher; hatched cells are undefined.")
            .arg(m.unitWord(2)),
        [grid](QPainter &p) { paintKappaHeatMap(p, grid); });
    html += m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th class=\"num\">κ</th>"
                           "<th class=\"num\">%5</th></tr>")
                .arg(htmlEscaped(ReportDocumentText::tr("Variable")),
                    htmlEscaped(ReportDocumentText::tr("Pair")),
                    htmlEscaped(ReportDocumentText::tr("Units")),
                    htmlEscaped(ReportDocumentText::tr("Agreement")),
                    htmlEscaped(ReportDocumentText::tr("95% CI")));
    for (const ReportAnalysis *a : m.ofKind(QStringLiteral("function"))) {
        const QJsonArray pairs = a->result.value(QStringLiteral("pairs")).toArray();
        for (qsizetype i = 0; i < pairs.size(); ++i) {
            const QString base = QStringLiteral("pairs.%1.").arg(i);
            const QJsonArray names = pairs[i].toObject().value(QStringLiteral("coders")).toArray();
            html +=
                QStringLiteral("<tr><td>%1%2</td><td>%3 × %4</td><td class=\"num\">%5</td>"
                               "<td class=\"num\">%6</td><td class=\"num\">%7</td>"
                               "<td class=\"num\">%8</td></tr>")
                    .arg(i == 0 ? m.chip(a->id) : QString(),
                        i == 0 ? htmlEscaped(a->label) : QString(),
                        htmlEscaped(names.at(0).toString()), htmlEscaped(names.at(1).toString()),
                        m.fig(a->id, base + QStringLiteral("units"), QStringLiteral("int")),
                        m.fig(a->id, base + QStringLiteral("percent_agreement"),
                            QStringLiteral("pct")),
                        m.fig(a->id, base + QStringLiteral("cohen_kappa.value"),
                            QStringLiteral("f3")),
                        m.interval(a->id, base + QStringLiteral("cohen_kappa")));
        }
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "95% CI: large-sample interval with the standard error of Fleiss, "
                    "Cohen & Everitt (1969). A coder whose kappa is low with everyone "
                    "else is worth a look before the coders are retrained.")));
    return html;
}

QString reportOtherCoefficients(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    QString html = m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">%4</th><th class=\"num\">%5</th>"
                           "<th class=\"num\">%6</th></tr>")
                .arg(htmlEscaped(ReportDocumentText::tr("Variable")),
                    htmlEscaped(ReportDocumentText::tr("Fleiss' κ")),
                    htmlEscaped(ReportDocumentText::tr("Light's κ")),
                    htmlEscaped(ReportDocumentText::tr("Cohen's κ")),
                    htmlEscaped(ReportDocumentText::tr("Scott's π")),
                    htmlEscaped(ReportDocumentText::tr("Bennett's S")));
    auto cell = [&](const ReportAnalysis &a, const QString &path) {
        return QStringLiteral("<td class=\"num\">%1</td>")
            .arg(a.result.contains(path.section(QLatin1Char('.'), 0, 0))
                    ? m.fig(a.id, path, QStringLiteral("f3"))
                    : htmlEscaped(ReportDocumentText::tr("n/a")));
    };
    for (const ReportAnalysis &a : d.analyses) {
        if (a.kind != QLatin1String("function") && a.kind != QLatin1String("item"))
            continue;
        if (!a.error.isEmpty())
            continue;
        html += QStringLiteral("<tr><td>%1</td>").arg(htmlEscaped(a.label));
        html += cell(a, QStringLiteral("fleiss_kappa.value"))
            + cell(a, QStringLiteral("light_kappa")) + cell(a, QStringLiteral("cohen_kappa.value"))
            + cell(a, QStringLiteral("scott_pi")) + cell(a, QStringLiteral("bennett_s"))
            + QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "For comparison with older studies: Fleiss (1971) and Light (1971) "
                    "for any number of coders, Cohen (1960), Scott (1955) and Bennett, "
                    "Alpert & Goldstein (1954) for two; n/a where their assumptions "
                    "(complete data, two coders) do not hold.")));
    return html;
}

QString reportContinuumSection(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const ReportAnalysis *a = d.analysis(QStringLiteral("continuum"));
    if (!a)
        return {};
    if (!a->error.isEmpty())
        return QStringLiteral("<p class=\"note\">%1</p>")
            .arg(htmlEscaped(ReportDocumentText::tr("Not computed: %1").arg(a->error)));
    QString html =
        QStringLiteral("<p>%1</p>")
            .arg(ReportDocumentText::tr(
                "Unitizing alpha (Krippendorff, 2004) compares where the coders "
                "put their spans, character by character, on the %1 articles "
                "that every coder coded (%2 characters laid end to end).")
                     .arg(QString::number(
                              a->result.value(QStringLiteral("articles")).toArray().size()),
                         m.fig(a->id, QStringLiteral("length"), QStringLiteral("int"))));
    html += m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">%2</th><th class=\"num\">%3</th>"
                           "<th class=\"num\">α<sub>U</sub></th><th>%4</th></tr>")
                .arg(htmlEscaped(ReportDocumentText::tr("Function")),
                    htmlEscaped(ReportDocumentText::tr("Observed disagreement")),
                    htmlEscaped(ReportDocumentText::tr("Expected disagreement")),
                    htmlEscaped(ReportDocumentText::tr("Verdict")));
    QStringList keys;
    for (FramingFunction f : kFramingFunctions)
        keys << functionKey(f);
    keys << QStringLiteral("overall");
    for (const QString &key : keys) {
        const QString base = key == QLatin1String("overall")
            ? QStringLiteral("unitizing_alpha.overall.")
            : QStringLiteral("unitizing_alpha.per_function.%1.").arg(key);
        const auto alpha = reportNumber(m.value(a->id, base + QStringLiteral("value")));
        html +=
            QStringLiteral("<tr><td>%1%2</td><td class=\"num\">%3</td><td class=\"num\">%4</td>"
                           "<td class=\"num\"><b>%5</b></td><td class=\"%6\">%7</td></tr>")
                .arg(key == QLatin1String("overall")
                        ? QString()
                        : m.chip(QStringLiteral("function-%1").arg(key)),
                    htmlEscaped(
                        key == QLatin1String("overall") ? ReportDocumentText::tr("all four") : key),
                    m.fig(a->id, base + QStringLiteral("observed_disagreement"),
                        QStringLiteral("g3")),
                    m.fig(a->id, base + QStringLiteral("expected_disagreement"),
                        QStringLiteral("g3")),
                    m.fig(a->id, base + QStringLiteral("value"), QStringLiteral("f3")),
                    ReportMarkup::verdictClass(alpha),
                    m.fig(a->id, base + QStringLiteral("verdict"), QStringLiteral("text")));
    }
    html += QStringLiteral("</table>");
    return html;
}

QString reportDiagnosticsSection(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const std::vector<const ReportAnalysis *> functions = m.ofKind(QStringLiteral("function"));
    if (functions.empty() || !functions.front()->result.contains(QStringLiteral("diagnostics")))
        return {};
    QString html = QStringLiteral("<h3>%1</h3>")
                       .arg(htmlEscaped(ReportDocumentText::tr("Alpha without each coder")));
    html += m.tableOpen()
        + QStringLiteral("<tr><th>%1</th>").arg(htmlEscaped(ReportDocumentText::tr("Left out")));
    for (const ReportAnalysis *a : functions)
        html += QStringLiteral("<th class=\"num\">%1%2</th>")
                    .arg(m.chip(a->id), htmlEscaped(a->shortLabel));
    html += QStringLiteral("</tr>");
    for (const ReportCoder &c : d.coders) {
        html += QStringLiteral("<tr><td><b>%1</b></td>").arg(htmlEscaped(c.pseudonym));
        for (const ReportAnalysis *a : functions) {
            const QJsonArray entries =
                figureValue(a->result, QStringLiteral("diagnostics.leave_one_coder_out")).toArray();
            QString cell = QStringLiteral("–");
            for (qsizetype i = 0; i < entries.size(); ++i)
                if (entries[i].toObject().value(QStringLiteral("coder")).toString()
                    == c.pseudonym) {
                    const QString base =
                        QStringLiteral("diagnostics.leave_one_coder_out.%1.").arg(i);
                    const double change =
                        entries[i].toObject().value(QStringLiteral("change")).toDouble();
                    cell = QStringLiteral("%1 <span class=\"%2\">(%3%4)</span>")
                               .arg(m.fig(a->id, base + QStringLiteral("alpha_without"),
                                        QStringLiteral("f3")),
                                   change > 0 ? QStringLiteral("low") : QStringLiteral("note"),
                                   change > 0 ? QStringLiteral("+") : QString(),
                                   m.fig(a->id, base + QStringLiteral("change"),
                                       QStringLiteral("f3")));
                }
            html += QStringLiteral("<td class=\"num\">%1</td>").arg(cell);
        }
        html += QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "Alpha recomputed without the coder's codings; in brackets the change "
                    "against all coders (positive: the coder pulls alpha down). A "
                    "diagnostic for retraining, not a licence to report the better "
                    "figure (Krippendorff, 2004).")));

    html += QStringLiteral("<h3>%1</h3>")
                .arg(htmlEscaped(ReportDocumentText::tr("The article that costs most")));
    html += m.tableOpen()
        + QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th>"
                         "<th class=\"num\">%4</th></tr>")
              .arg(htmlEscaped(ReportDocumentText::tr("Variable")),
                  htmlEscaped(ReportDocumentText::tr("Article")),
                  htmlEscaped(ReportDocumentText::tr("α without it")),
                  htmlEscaped(ReportDocumentText::tr("Change")));
    for (const ReportAnalysis *a : functions) {
        const QString base = QStringLiteral("diagnostics.leave_one_article_out.0.");
        if (m.value(a->id, base + QStringLiteral("article")).isUndefined())
            continue;
        html += QStringLiteral("<tr><td>%1%2</td><td>%3</td><td class=\"num\">%4</td>"
                               "<td class=\"num\">%5</td></tr>")
                    .arg(m.chip(a->id), htmlEscaped(a->label),
                        m.fig(a->id, base + QStringLiteral("article"), QStringLiteral("text")),
                        m.fig(a->id, base + QStringLiteral("alpha_without"), QStringLiteral("f3")),
                        m.fig(a->id, base + QStringLiteral("change"), QStringLiteral("f3")));
    }
    html += QStringLiteral("</table>");

    // Which function the other coder gave the same passage.
    const ReportAnalysis *first = functions.front();
    const QJsonArray rows =
        figureValue(first->result, QStringLiteral("diagnostics.span_matching.confusion")).toArray();
    if (rows.isEmpty())
        return html;
    const QStringList columns {QStringLiteral("problem"), QStringLiteral("cause"),
        QStringLiteral("evaluation"), QStringLiteral("remedy"), QStringLiteral("none")};
    html += QStringLiteral("<h3>%1</h3>")
                .arg(htmlEscaped(ReportDocumentText::tr("Function confusion between coders")));
    html += m.tableOpen()
        + QStringLiteral("<tr><th>%1</th>")
              .arg(htmlEscaped(ReportDocumentText::tr("A coder's span")));
    for (const QString &c : columns)
        html += QStringLiteral("<th class=\"num\">%1</th>").arg(htmlEscaped(c));
    html += QStringLiteral("</tr>");
    for (qsizetype r = 0; r < rows.size(); ++r) {
        const QString function = rows[r].toObject().value(QStringLiteral("function")).toString();
        html +=
            QStringLiteral("<tr><td>%1%2</td>")
                .arg(m.chip(QStringLiteral("function-%1").arg(function)), htmlEscaped(function));
        for (const QString &c : columns) {
            const QString path =
                QStringLiteral("diagnostics.span_matching.confusion.%1.other.%2").arg(r).arg(c);
            const QString cell = m.fig(first->id, path, QStringLiteral("int"));
            html += QStringLiteral("<td class=\"num\">%1</td>")
                        .arg(c == function ? QStringLiteral("<b>%1</b>").arg(cell) : cell);
        }
        html += QStringLiteral("</tr>");
    }
    html += QStringLiteral("</table><p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "For each coder's span, the function the other coder gave the span "
                    "that overlaps it most (none: nothing there), summed over ordered "
                    "pairs of coders. Off the diagonal are the confusions a codebook "
                    "rule could settle.")));
    return html;
}

} // namespace fourfold
