#include "app/report/report_sections.h"

#include "app/report/report_text.h"

#include <QCoreApplication>

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
        const AgreementReport &r = *a.agreement;
        const std::optional<double> alpha = r.alpha.value;
        const QString level = htmlEscaped(r.scale);
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
                    .arg(m.fig(a.id, QStringLiteral("units"), r.units, FigureFormat::Integer),
                        m.fig(a.id, QStringLiteral("pairable_values"), r.alpha.pairableValues,
                            FigureFormat::Integer),
                        m.fig(a.id, QStringLiteral("alpha.value"), alpha, FigureFormat::Fixed3),
                        m.interval(a.id, QStringLiteral("bootstrap_units"), r.unitBootstrap),
                        m.interval(a.id, QStringLiteral("bootstrap"), r.pairBootstrap),
                        m.fig(a.id, QStringLiteral("percent_agreement"), r.percentAgreement.value,
                            FigureFormat::Percent));
        html +=
            QStringLiteral("<td class=\"%1\">%2</td></tr>")
                .arg(ReportMarkup::verdictClass(alpha),
                    print ? htmlEscaped(ReportMarkup::shortVerdict(alpha))
                          : m.figText(a.id, QStringLiteral("alpha.verdict"), alphaVerdict(alpha)));
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
        if (!a.agreement || !a.agreement->minimumValues)
            continue;
        const AgreementReport &r = *a.agreement;
        const double have = r.alpha.pairableValues;
        const int need = *r.minimumValues;
        html += QStringLiteral("<tr><td>%1</td><td class=\"num\">%2</td><td class=\"num\">%3</td>"
                               "<td class=\"num\">%4</td><td class=\"%5\">%6</td></tr>")
                    .arg(htmlEscaped(a.label),
                        m.fig(a.id, QStringLiteral("sample_size.pairable_values"), have,
                            FigureFormat::Integer),
                        m.fig(a.id, QStringLiteral("sample_size.rarest_proportion"),
                            r.rarestProportion, FigureFormat::Percent),
                        m.fig(a.id, QStringLiteral("sample_size.minimum_values"), need,
                            FigureFormat::Integer),
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
        const ReportCoder &c = d.coders[i];
        const QString base = QStringLiteral("coders.%1.").arg(i);
        auto cell = [&](const QString &key, int value) {
            return QStringLiteral("<td class=\"num\">%1</td>")
                .arg(m.fig(QStringLiteral("report"), base + key, value, FigureFormat::Integer));
        };
        html += QStringLiteral("<tr><td><b>%1</b></td><td>%2</td>")
                    .arg(htmlEscaped(c.pseudonym), htmlEscaped(c.role));
        html += cell(QStringLiteral("articles"), c.articles)
            + cell(QStringLiteral("shared_articles"), c.reliabilityArticles)
            + cell(QStringLiteral("spans"), c.spans);
        for (FramingFunction f : kFramingFunctions)
            html += cell(
                QStringLiteral("spans_per_function.") + functionKey(f), c.perFunction[size_t(f)]);
        html += cell(QStringLiteral("answers"), c.answers) + QStringLiteral("</tr>");
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
        if (!a->agreement)
            continue;
        const AgreementReport &r = *a->agreement;
        for (size_t i = 0; i < r.pairs.size(); ++i) {
            const PairAgreement &pair = r.pairs[i];
            const QString base = QStringLiteral("pairs.%1.").arg(i);
            html += QStringLiteral("<tr><td>%1%2</td><td>%3 × %4</td><td class=\"num\">%5</td>"
                                   "<td class=\"num\">%6</td><td class=\"num\">%7</td>"
                                   "<td class=\"num\">%8</td></tr>")
                        .arg(i == 0 ? m.chip(a->id) : QString(),
                            i == 0 ? htmlEscaped(a->label) : QString(),
                            htmlEscaped(r.coders.value(pair.coderA)),
                            htmlEscaped(r.coders.value(pair.coderB)),
                            m.fig(a->id, base + QStringLiteral("units"), pair.units,
                                FigureFormat::Integer),
                            m.fig(a->id, base + QStringLiteral("percent_agreement"),
                                pair.percentAgreement.value, FigureFormat::Percent),
                            m.fig(a->id, base + QStringLiteral("cohen_kappa.value"),
                                pair.cohenKappa.value, FigureFormat::Fixed3),
                            m.interval(a->id, base + QStringLiteral("cohen_kappa"),
                                pair.cohenKappa.ciLow, pair.cohenKappa.ciHigh));
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
    // A coefficient whose assumptions do not hold is left out of agree's JSON: n/a.
    auto cell = [&](const ReportAnalysis &a, const QString &path, bool computed,
                    const std::optional<double> &value) {
        return QStringLiteral("<td class=\"num\">%1</td>")
            .arg(computed ? m.fig(a.id, path, value, FigureFormat::Fixed3)
                          : htmlEscaped(ReportDocumentText::tr("n/a")));
    };
    for (const ReportAnalysis &a : d.analyses) {
        if (a.kind != QLatin1String("function") && a.kind != QLatin1String("item"))
            continue;
        if (!a.agreement)
            continue;
        const AgreementReport &r = *a.agreement;
        html += QStringLiteral("<tr><td>%1</td>").arg(htmlEscaped(a.label));
        html += cell(a, QStringLiteral("fleiss_kappa.value"), r.fleissKappa.has_value(),
                    r.fleissKappa ? r.fleissKappa->value : std::nullopt)
            + cell(a, QStringLiteral("light_kappa"), true, r.lightKappa.value)
            + cell(a, QStringLiteral("cohen_kappa.value"), r.cohenKappa.has_value(),
                r.cohenKappa ? r.cohenKappa->value : std::nullopt)
            + cell(a, QStringLiteral("scott_pi"), r.scottPi.has_value(),
                r.scottPi ? r.scottPi->value : std::nullopt)
            + cell(a, QStringLiteral("bennett_s"), r.bennettS.has_value(),
                r.bennettS ? r.bennettS->value : std::nullopt)
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
    const ContinuumResult &c = *a->continuum;
    QString html = QStringLiteral("<p>%1</p>")
                       .arg(ReportDocumentText::tr(
                           "Unitizing alpha (Krippendorff, 2004) compares where the coders "
                           "put their spans, character by character, on the %1 articles "
                           "that every coder coded (%2 characters laid end to end).")
                                .arg(QString::number(c.data.articles.size()),
                                    m.fig(a->id, QStringLiteral("length"), double(c.data.length),
                                        FigureFormat::Integer)));
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
        // agree names each category by its function key; a function without one has no figures.
        const qsizetype category = c.categories.indexOf(key);
        const reliability::UnitizingCategoryResult *u = key == QLatin1String("overall")
            ? &c.unitizing.overall
            : category >= 0 && size_t(category) < c.unitizing.perCategory.size()
            ? &c.unitizing.perCategory[size_t(category)]
            : nullptr;
        const std::optional<double> alpha = u ? u->value : std::nullopt;
        html +=
            QStringLiteral("<tr><td>%1%2</td><td class=\"num\">%3</td><td class=\"num\">%4</td>"
                           "<td class=\"num\"><b>%5</b></td><td class=\"%6\">%7</td></tr>")
                .arg(key == QLatin1String("overall")
                        ? QString()
                        : m.chip(QStringLiteral("function-%1").arg(key)),
                    htmlEscaped(
                        key == QLatin1String("overall") ? ReportDocumentText::tr("all four") : key),
                    m.fig(a->id, base + QStringLiteral("observed_disagreement"),
                        u ? std::optional(u->observedDisagreement) : std::nullopt,
                        FigureFormat::Significant3),
                    m.fig(a->id, base + QStringLiteral("expected_disagreement"),
                        u ? std::optional(u->expectedDisagreement) : std::nullopt,
                        FigureFormat::Significant3),
                    m.fig(a->id, base + QStringLiteral("value"), alpha, FigureFormat::Fixed3),
                    ReportMarkup::verdictClass(alpha),
                    m.figText(a->id, base + QStringLiteral("verdict"),
                        u ? std::optional(alphaVerdict(alpha)) : std::nullopt));
    }
    html += QStringLiteral("</table>");
    return html;
}

QString reportDiagnosticsSection(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const std::vector<const ReportAnalysis *> functions = m.ofKind(QStringLiteral("function"));
    if (functions.empty() || !functions.front()->diagnostics)
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
            QString cell = QStringLiteral("–");
            if (!a->diagnostics) {
                html += QStringLiteral("<td class=\"num\">%1</td>").arg(cell);
                continue;
            }
            const std::vector<LeaveOneOut> &entries = a->diagnostics->coders;
            for (size_t i = 0; i < entries.size(); ++i)
                if (entries[i].name == c.pseudonym) {
                    const QString base =
                        QStringLiteral("diagnostics.leave_one_coder_out.%1.").arg(i);
                    const std::optional<double> change = entries[i].change;
                    const bool costs = change && *change > 0;
                    cell = QStringLiteral("%1 <span class=\"%2\">(%3%4)</span>")
                               .arg(m.fig(a->id, base + QStringLiteral("alpha_without"),
                                        entries[i].alpha, FigureFormat::Fixed3),
                                   costs ? QStringLiteral("low") : QStringLiteral("note"),
                                   costs ? QStringLiteral("+") : QString(),
                                   m.fig(a->id, base + QStringLiteral("change"), change,
                                       FigureFormat::Fixed3));
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
        // The articles come costliest first: the first one.
        if (!a->diagnostics || a->diagnostics->articles.empty())
            continue;
        const LeaveOneOut &costliest = a->diagnostics->articles.front();
        const QString base = QStringLiteral("diagnostics.leave_one_article_out.0.");
        html += QStringLiteral("<tr><td>%1%2</td><td>%3</td><td class=\"num\">%4</td>"
                               "<td class=\"num\">%5</td></tr>")
                    .arg(m.chip(a->id), htmlEscaped(a->label),
                        m.figText(a->id, base + QStringLiteral("article"), costliest.name),
                        m.fig(a->id, base + QStringLiteral("alpha_without"), costliest.alpha,
                            FigureFormat::Fixed3),
                        m.fig(a->id, base + QStringLiteral("change"), costliest.change,
                            FigureFormat::Fixed3));
    }
    html += QStringLiteral("</table>");

    // Which function the other coder gave the same passage (the span matching is the same for
    // every function; agree writes it into each function's diagnostics).
    if (!d.matching)
        return html;
    const FunctionConfusion &confusion = d.matching->confusion;
    const ReportAnalysis *first = functions.front();
    html += QStringLiteral("<h3>%1</h3>")
                .arg(htmlEscaped(ReportDocumentText::tr("Function confusion between coders")));
    html += m.tableOpen()
        + QStringLiteral("<tr><th>%1</th>")
              .arg(htmlEscaped(ReportDocumentText::tr("A coder's span")));
    // The four functions in their order, then "none": the columns of FunctionConfusion.
    QStringList columns;
    for (FramingFunction f : kFramingFunctions)
        columns << functionKey(f);
    columns << QStringLiteral("none");
    for (const QString &c : columns)
        html += QStringLiteral("<th class=\"num\">%1</th>").arg(htmlEscaped(c));
    html += QStringLiteral("</tr>");
    // Rows: a coder's span of each function (row "none" stays empty and is not shown).
    for (int r = 0; r < int(kFramingFunctions.size()); ++r) {
        const QString function = columns[r];
        html +=
            QStringLiteral("<tr><td>%1%2</td>")
                .arg(m.chip(QStringLiteral("function-%1").arg(function)), htmlEscaped(function));
        for (int c = 0; c < FunctionConfusion::kSize; ++c) {
            const QString path = QStringLiteral("diagnostics.span_matching.confusion.%1.other.%2")
                                     .arg(r)
                                     .arg(columns[c]);
            const QString cell = m.fig(first->id, path, confusion.at(r, c), FigureFormat::Integer);
            html += QStringLiteral("<td class=\"num\">%1</td>")
                        .arg(c == r ? QStringLiteral("<b>%1</b>").arg(cell) : cell);
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
