#include "app/report/report_method_text.h"

#include "app/report/report_text.h"

#include <QCoreApplication>

#include <vector>

namespace fourfold {

QString reportMethodText(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const int coders = int(d.coders.size());
    QStringList pseudonyms, amounts;
    for (size_t i = 0; i < d.coders.size(); ++i) {
        const ReportCoder &c = d.coders[i];
        pseudonyms << htmlEscaped(c.pseudonym);
        const QString base = QStringLiteral("coders.%1.").arg(i);
        amounts << ReportDocumentText::tr("%1 coded %2 articles (%3 spans)")
                       .arg(htmlEscaped(c.pseudonym),
                           m.fig(QStringLiteral("report"), base + QStringLiteral("articles"),
                               c.articles, FigureFormat::Integer),
                           m.fig(QStringLiteral("report"), base + QStringLiteral("spans"), c.spans,
                               FigureFormat::Integer));
    }
    QString html = QStringLiteral("<div class=\"method\">");

    // Sample, coders, amount coded, training (Lombard et al. 2002, items 1–4 and 7).
    QString p = ReportDocumentText::tr(
        "Inter-coder reliability was assessed on a reliability sample of %1 articles "
        "that two or more coders coded independently (%2 of them by all %3 coders), "
        "out of %4 articles in the project. ")
                    .arg(m.fig(QStringLiteral("report"), QStringLiteral("sample.shared_articles"),
                             d.sharedArticles, FigureFormat::Integer),
                        m.fig(QStringLiteral("report"), QStringLiteral("sample.all_coder_articles"),
                            d.allCoderArticles, FigureFormat::Integer),
                        QString::number(coders),
                        m.fig(QStringLiteral("report"), QStringLiteral("sample.project_articles"),
                            d.projectArticles, FigureFormat::Integer));
    p += d.sampleDraw.isEmpty()
        ? ReportDocumentText::tr("The sample was drawn %1. ")
              .arg(ReportMarkup::fillIn(ReportDocumentText::tr(
                  "state how the articles were drawn, e.g. a simple random sample "
                  "of the study's articles, with its size and seed")))
        : htmlEscaped(d.sampleDraw) + QLatin1Char(' ');
    p += ReportDocumentText::tr("%1 coders (%2) took part: %3. ")
             .arg(QString::number(coders), pseudonyms.join(QStringLiteral(", ")),
                 amounts.join(QStringLiteral("; ")));
    if (d.options.includeUnfinished) {
        p += ReportDocumentText::tr(
            "Articles that coders had started but not yet marked as finished were included. ");
    } else {
        p += ReportDocumentText::tr(
            "Only articles that a coder had marked as finished count for that coder. ");
        QStringList left;
        for (const CountedCodings::LeftOut &l : d.leftOut)
            left << ReportDocumentText::tr("%1 (%2)")
                        .arg(htmlEscaped(l.coder))
                        .arg(l.articles.size());
        if (!left.isEmpty())
            p += ReportDocumentText::tr("Articles still in progress were left out: %1. ")
                     .arg(left.join(QStringLiteral(", ")));
    }
    if (d.trainingArticles > 0 || d.pilotArticles > 0)
        p += ReportDocumentText::tr(
            "Before the reliability coding, coders trained on %1 articles and coded a pilot "
            "of %2 articles; %3. ")
                 .arg(m.fig(QStringLiteral("report"), QStringLiteral("sample.training_articles"),
                          d.trainingArticles, FigureFormat::Integer),
                     m.fig(QStringLiteral("report"), QStringLiteral("sample.pilot_articles"),
                         d.pilotArticles, FigureFormat::Integer),
                     ReportMarkup::fillIn(ReportDocumentText::tr("hours of training")));
    else
        p += ReportDocumentText::tr("Coder training: %1. ")
                 .arg(ReportMarkup::fillIn(
                     ReportDocumentText::tr("describe the training and its approximate hours")));
    html += QStringLiteral("<p>%1</p>").arg(p);

    // Index and why, value per variable (items 5 and 6).
    QStringList values;
    for (const ReportAnalysis *a : m.ofKind(QStringLiteral("function"))) {
        if (!a->agreement)
            continue;
        const AgreementReport &r = *a->agreement;
        QString v = ReportDocumentText::tr("%1 α = %2")
                        .arg(htmlEscaped(a->label.toLower()),
                            m.fig(a->id, QStringLiteral("alpha.value"), r.alpha.value,
                                FigureFormat::Fixed3));
        if (r.unitBootstrap)
            v += ReportDocumentText::tr(" (95% CI %1)")
                     .arg(m.interval(a->id, QStringLiteral("bootstrap_units"), r.unitBootstrap));
        values << v;
    }
    const ReportAnalysis *all = d.analysis(QStringLiteral("functions"));
    p = ReportDocumentText::tr(
        "Each of Entman's (1993) four framing functions was coded as a span of text; for "
        "reliability, each function became a binary variable (present or absent) per %1, a "
        "%2 carrying a function when a coder's span of that function overlaps it. ")
            .arg(m.unitWord(1), m.unitWord(1));
    p += htmlEscaped(ReportDocumentText::tr(
        "We report Krippendorff's alpha (Krippendorff, 2004) because it handles any "
        "number of coders, missing data and any level of measurement (Hayes & "
        "Krippendorff, 2007). "));
    p += ReportDocumentText::tr("Alpha was %1").arg(values.join(QStringLiteral("; ")));
    if (all && all->agreement)
        p += ReportDocumentText::tr(
            "; for the set of functions per %1, compared with the MASI distance (Passonneau, "
            "2006), α = %2")
                 .arg(m.unitWord(1),
                     m.fig(all->id, QStringLiteral("alpha.value"), all->agreement->alpha.value,
                         FigureFormat::Fixed3));
    p += QStringLiteral(". ");
    if (d.options.bootstrapReplicates > 0)
        p += htmlEscaped(ReportDocumentText::tr(
            "Intervals are 95% percentile bootstrap intervals from %1 resamples of the "
            "units; the table also gives the interval from resampled pairable values "
            "(Hayes & Krippendorff, 2007), which is narrower than its nominal level when "
            "more than two coders are compared. ")
                             .arg(d.options.bootstrapReplicates));
    p += htmlEscaped(
        ReportDocumentText::tr("Following Krippendorff (2004), variables with α\u00a0≥\u00a0"
                               "0.800 are relied on "
                               "and variables with 0.667\u00a0≤\u00a0α\u00a0<\u00a0"
                               "0.800 support tentative "
                               "conclusions only. "));
    html += QStringLiteral("<p>%1</p>").arg(p);

    QStringList others;
    for (const QString &kind : {QStringLiteral("item"), QStringLiteral("attribute")})
        for (const ReportAnalysis *a : m.ofKind(kind))
            if (a->agreement)
                others << ReportDocumentText::tr("%1 (%2) α = %3")
                              .arg(htmlEscaped(a->label), htmlEscaped(a->agreement->scale),
                                  m.fig(a->id, QStringLiteral("alpha.value"),
                                      a->agreement->alpha.value, FigureFormat::Fixed3));
    if (!others.isEmpty())
        html += QStringLiteral("<p>%1</p>")
                    .arg(ReportDocumentText::tr("For the other variables alpha was: %1.")
                             .arg(others.join(QStringLiteral("; "))));

    // Disagreements (item 8) and the codebook (item 9).
    if (d.goldSpans > 0) {
        p = ReportDocumentText::tr(
            "Disagreements were resolved by adjudication into a separate gold standard: %1 "
            "spans on %2 articles, decided by %3, %4 of them with a written rationale. The "
            "independent codings were kept unchanged; every figure above comes from them. ")
                .arg(m.fig(QStringLiteral("report"), QStringLiteral("gold.spans"), d.goldSpans,
                         FigureFormat::Integer),
                    m.fig(QStringLiteral("report"), QStringLiteral("gold.articles"), d.goldArticles,
                        FigureFormat::Integer),
                    htmlEscaped(d.goldDeciders.join(QStringLiteral(", "))),
                    m.fig(QStringLiteral("report"), QStringLiteral("gold.with_rationale"),
                        d.goldWithRationale, FigureFormat::Integer));
        if (d.goldAnswers > 0)
            p += ReportDocumentText::tr(
                "Answers to article-level items were adjudicated as well: %1 gold answers on %2 "
                "articles, %3 of them with a written rationale. ")
                     .arg(m.fig(QStringLiteral("report"), QStringLiteral("gold.answers"),
                              d.goldAnswers, FigureFormat::Integer),
                         m.fig(QStringLiteral("report"), QStringLiteral("gold.answer_articles"),
                             d.goldAnswerArticles, FigureFormat::Integer),
                         m.fig(QStringLiteral("report"),
                             QStringLiteral("gold.answers_with_rationale"),
                             d.goldAnswersWithRationale, FigureFormat::Integer));
    } else if (d.goldAnswers > 0) {
        p = ReportDocumentText::tr(
            "Disagreements on article-level items were resolved by adjudication into a separate "
            "gold standard: %1 gold answers on %2 articles, decided by %3, %4 of them with a "
            "written rationale. The independent codings were kept unchanged; every figure above "
            "comes from them. ")
                .arg(m.fig(QStringLiteral("report"), QStringLiteral("gold.answers"), d.goldAnswers,
                         FigureFormat::Integer),
                    m.fig(QStringLiteral("report"), QStringLiteral("gold.answer_articles"),
                        d.goldAnswerArticles, FigureFormat::Integer),
                    htmlEscaped(d.goldDeciders.join(QStringLiteral(", "))),
                    m.fig(QStringLiteral("report"), QStringLiteral("gold.answers_with_rationale"),
                        d.goldAnswersWithRationale, FigureFormat::Integer));
    } else {
        p = ReportDocumentText::tr("No adjudication is recorded in the project yet: %1. ")
                .arg(ReportMarkup::fillIn(ReportDocumentText::tr(
                    "say how disagreements were resolved, e.g. by discussion or by "
                    "the lead")));
    }
    p += ReportDocumentText::tr("Coding followed version %1 of the codebook (“%2”)")
             .arg(m.fig(QStringLiteral("report"), QStringLiteral("codebook.version"),
                      d.codebookNumber, FigureFormat::Integer),
                 htmlEscaped(d.codebookName));
    if (d.codingsOtherVersion > 0)
        p += ReportDocumentText::tr("; %1 of %2 codings were made under an earlier version")
                 .arg(m.fig(QStringLiteral("report"),
                          QStringLiteral("codebook.codings_other_version"), d.codingsOtherVersion,
                          FigureFormat::Integer),
                     m.fig(QStringLiteral("report"), QStringLiteral("codebook.codings"),
                         d.codingsTotal, FigureFormat::Integer));
    p += ReportDocumentText::tr(", which is available at %1.")
             .arg(ReportMarkup::fillIn(ReportDocumentText::tr("where readers can obtain it")));
    html += QStringLiteral("<p>%1</p>").arg(p);
    html += QStringLiteral("</div>");
    html += QStringLiteral("<p class=\"note\">%1</p>")
                .arg(htmlEscaped(ReportDocumentText::tr(
                    "Highlighted brackets are for the authors to complete: the project "
                    "does not record these facts.")));
    return html;
}

QString reportChecklist(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    // The reporting items of Lombard, Snyder-Duch & Bracken (2002), Human Communication
    // Research 28(4), in their order (from memory of the paper's list).
    struct Item {
        QString text;
        bool fromProject;
    };
    const bool drawKnown = !d.sampleDraw.isEmpty();
    const bool trainingKnown = false; // hours are never recorded
    const std::vector<Item> items {
        {ReportDocumentText::tr("Size of the reliability sample and how it was selected"),
            drawKnown},
        {ReportDocumentText::tr("Relationship of the reliability sample to the full sample"),
            drawKnown},
        {ReportDocumentText::tr("Number of reliability coders"), true},
        {ReportDocumentText::tr("Amount of coding conducted by each coder"), true},
        {ReportDocumentText::tr("Index or indices selected and why"), true},
        {ReportDocumentText::tr("Reliability for each variable, for each index"), true},
        {ReportDocumentText::tr("Amount of coder training required to reach reliability"),
            trainingKnown},
        {ReportDocumentText::tr("How disagreements were resolved"),
            d.goldSpans > 0 || d.goldAnswers > 0},
        {ReportDocumentText::tr("Where the codebook and coding instructions can be obtained"),
            false},
    };
    QString html = m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th>%3</th></tr>")
                .arg(htmlEscaped(ReportDocumentText::tr("#")),
                    htmlEscaped(ReportDocumentText::tr("Item")),
                    htmlEscaped(ReportDocumentText::tr("In this report")));
    int n = 0;
    for (const Item &i : items)
        html +=
            QStringLiteral("<tr><td class=\"num\">%1</td><td>%2</td><td class=\"%3\">%4</td></tr>")
                .arg(++n)
                .arg(htmlEscaped(i.text),
                    i.fromProject ? QStringLiteral("ok") : QStringLiteral("todo"),
                    htmlEscaped(i.fromProject
                            ? ReportDocumentText::tr("filled in from the project")
                            : ReportDocumentText::tr("partly filled in; complete the bracket")));
    html += QStringLiteral("</table>");
    return html;
}

QString reportReproduce(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    QString html = QStringLiteral("<p>%1</p>")
                       .arg(htmlEscaped(ReportDocumentText::tr(
                           "Every figure above is what these commands print (add "
                           "--json for all digits):")));
    QStringList lines;
    for (const ReportAnalysis &a : d.analyses)
        lines << QStringLiteral("fourfold-cli agree PROJECT %1")
                     .arg(a.agreeArguments.join(QLatin1Char(' ')));
    for (QString &line : lines)
        line = htmlEscaped(line);
    if (m.print())
        html +=
            QStringLiteral("<p class=\"commands\">%1</p>").arg(lines.join(QStringLiteral("<br>")));
    else
        html += QStringLiteral("<pre>%1</pre>").arg(lines.join(QLatin1Char('\n')));
    return html;
}

QString reportReferences()
{
    const QStringList refs {
        QStringLiteral("Bennett, E. M., Alpert, R., & Goldstein, A. C. (1954). Communications "
                       "through limited response questioning. Public Opinion Quarterly, 18(3), "
                       "303–308."),
        QStringLiteral("Bloch, D. A., & Kraemer, H. C. (1989). 2 × 2 kappa coefficients: "
                       "Measures of agreement or association. Biometrics, 45(1), 269–287."),
        QStringLiteral("Cohen, J. (1960). A coefficient of agreement for nominal scales. "
                       "Educational and Psychological Measurement, 20(1), 37–46."),
        QStringLiteral("Entman, R. M. (1993). Framing: Toward clarification of a fractured "
                       "paradigm. Journal of Communication, 43(4), 51–58."),
        QStringLiteral("Fleiss, J. L. (1971). Measuring nominal scale agreement among many "
                       "raters. Psychological Bulletin, 76(5), 378–382."),
        QStringLiteral("Fleiss, J. L., Cohen, J., & Everitt, B. S. (1969). Large sample standard "
                       "errors of kappa and weighted kappa. Psychological Bulletin, 72(5), "
                       "323–327."),
        QStringLiteral("Hayes, A. F., & Krippendorff, K. (2007). Answering the call for a standard "
                       "reliability measure for coding data. Communication Methods and Measures, "
                       "1(1), 77–89."),
        QStringLiteral("Krippendorff, K. (2004). Content analysis: An introduction to its "
                       "methodology (2nd ed.). Sage."),
        QStringLiteral("Krippendorff, K. (2004). Measuring the reliability of qualitative text "
                       "analysis data. Quality & Quantity, 38, 787–800."),
        QStringLiteral("Light, R. J. (1971). Measures of response agreement for qualitative data. "
                       "Psychological Bulletin, 76(5), 365–377."),
        QStringLiteral("Lombard, M., Snyder-Duch, J., & Bracken, C. C. (2002). Content analysis in "
                       "mass communication: Assessment and reporting of intercoder reliability. "
                       "Human Communication Research, 28(4), 587–604."),
        QStringLiteral("Passonneau, R. (2006). Measuring agreement on set-valued items (MASI) for "
                       "semantic and pragmatic annotation. Proceedings of LREC 2006."),
        QStringLiteral("Scott, W. A. (1955). Reliability of content analysis: The case of nominal "
                       "scale coding. Public Opinion Quarterly, 19(3), 321–325."),
    };
    QString html = QStringLiteral("<ol class=\"refs\">");
    for (const QString &r : refs)
        html += QStringLiteral("<li>%1</li>").arg(htmlEscaped(r));
    return html + QStringLiteral("</ol>");
}

} // namespace fourfold
