#pragma once
// What every part of the report shares to write its text: one translation context for all its
// sentences (so a sentence moved from one part to another keeps its translation) and HTML
// escaping.

#include <QCoreApplication>
#include <QString>

namespace fourfold {

// The sentences of the report, under a context that lupdate collects.
struct ReportDocumentText {
    Q_DECLARE_TR_FUNCTIONS(ReportDocumentText)
};

// `text` escaped for HTML text and attribute values.
inline QString htmlEscaped(const QString &text)
{
    return text.toHtmlEscaped();
}

} // namespace fourfold
