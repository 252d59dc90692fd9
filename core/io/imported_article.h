#pragma once
// One article as read from an input file, before it is made canonical and segmented.

#include <QJsonObject>
#include <QString>

namespace fourfold {

struct ImportedArticle {
    QString externalId; // the id in the source (JSONL/CSV `id`; file name for txt/html)
    QString title;
    QString outlet; // may be empty
    QString published; // as given (ISO 8601 date expected, not enforced); may be empty
    QString language; // BCP 47 tag; empty = the project's default language
    // The article body as decoded text. Paragraphs are separated by a blank line: exactly
    // "\n\n" from plain text and HTML; JSON Lines and CSV texts are kept as given (CRLF or CR
    // line ends possible). The text is not yet canonical (the project normalises it).
    QString text;
    QJsonObject meta; // any further fields, kept as given
    QString sourceFile; // the file it came from
    qint64 sourceLine = 0; // 1-based line where the record begins (JSONL/CSV), 1 for txt/html
};

} // namespace fourfold
