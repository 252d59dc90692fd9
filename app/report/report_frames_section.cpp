#include "app/report/report_frames_section.h"

#include "app/report/report_text.h"

#include <QCoreApplication>
#include <QHash>
#include <QJsonArray>
#include <QJsonObject>

namespace fourfold {

QString reportFramesSection(const ReportMarkup &m)
{
    const ReportData &d = m.data();
    const SavedFrameAnalysis &a = *d.frames;
    const QJsonObject settings = a.settings;
    QString html =
        QStringLiteral("<p>%1</p>\n")
            .arg(htmlEscaped(ReportDocumentText::tr(
                "The newest saved frame analysis, \u201c%1\u201d (saved %2): %3 "
                "frames of the layer %4 over %5 articles, by Ward's hierarchical "
                "clustering refined by k-means (Matthes & Kohring 2008). A frame's "
                "characteristic elements are those with an adjusted residual above "
                "1.96 (Haberman 1973), with their share in the frame and in all "
                "articles. The frames are only as good as their elements: beside "
                "each element variable stands its Krippendorff's alpha (nominal, "
                "articles as units) over the coders of this report.")
                                 .arg(a.name, a.createdAt.left(10))
                                 .arg(settings.value(QStringLiteral("k")).toInt())
                                 .arg(settings.value(QStringLiteral("layer")).toString())
                                 .arg(settings.value(QStringLiteral("articles")).toInt())));
    // Which frames each element characterises, for the second table.
    QHash<QString, QStringList> characterises;
    html += m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th>%2</th><th class=\"num\">%3</th><th "
                           "class=\"num\">%4</th><th>%5</th></tr>\n")
                .arg(htmlEscaped(ReportDocumentText::tr("Frame")),
                    htmlEscaped(ReportDocumentText::tr("Name")),
                    htmlEscaped(ReportDocumentText::tr("Articles")),
                    htmlEscaped(ReportDocumentText::tr("Share")),
                    htmlEscaped(ReportDocumentText::tr("Characteristic elements")));
    for (const SavedFrame &f : a.frames) {
        const QString label = ReportDocumentText::tr("F%1").arg(f.cluster + 1);
        QStringList elements;
        for (const QJsonValue &e : f.profile.value(QStringLiteral("elements")).toArray()) {
            const QJsonObject o = e.toObject();
            if (o.value(QStringLiteral("residual")).toDouble(0) <= 1.96)
                continue;
            const QString variable = o.value(QStringLiteral("variable")).toString();
            characterises[variable] << label;
            elements << ReportDocumentText::tr("%1 (%2% / %3%)")
                            .arg(variable)
                            .arg(o.value(QStringLiteral("share")).toDouble() * 100, 0, 'f', 0)
                            .arg(o.value(QStringLiteral("overall")).toDouble() * 100, 0, 'f', 0);
        }
        html += QStringLiteral("<tr><td>%1</td><td>%2</td><td class=\"num\">%3</td><td "
                               "class=\"num\">%4%</td><td>%5</td></tr>\n")
                    .arg(htmlEscaped(label), htmlEscaped(f.name),
                        QString::number(f.profile.value(QStringLiteral("size")).toInt()),
                        QString::number(
                            f.profile.value(QStringLiteral("share")).toDouble() * 100, 'f', 1),
                        htmlEscaped(elements.isEmpty() ? ReportDocumentText::tr("none stands out")
                                                       : elements.join(QStringLiteral("; "))));
    }
    html += QStringLiteral("</table>\n");
    html += m.tableOpen();
    html += QStringLiteral("<tr><th>%1</th><th class=\"num\">α</th><th class=\"num\">%2</th>"
                           "<th>%3</th></tr>\n")
                .arg(htmlEscaped(ReportDocumentText::tr("Element variable")),
                    htmlEscaped(ReportDocumentText::tr("Pairable articles")),
                    htmlEscaped(ReportDocumentText::tr("Characterises")));
    for (const ElementAlpha &e : d.elementAlphas)
        html += QStringLiteral("<tr><td>%1</td><td class=\"num\">%2</td><td class=\"num\">%3"
                               "</td><td>%4</td></tr>\n")
                    .arg(htmlEscaped(e.variable),
                        e.alpha ? QString::number(*e.alpha, 'f', 3)
                                : htmlEscaped(ReportDocumentText::tr("undefined")),
                        QString::number(e.pairableUnits),
                        htmlEscaped(characterises.value(e.variable).join(QStringLiteral(", "))));
    html += QStringLiteral("</table>\n");
    return html;
}

} // namespace fourfold
