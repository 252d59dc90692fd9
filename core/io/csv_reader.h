#pragma once
// CSV input (RFC 4180) for readArticles; the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QHash>
#include <QString>
#include <QStringList>

#include <functional>
#include <vector>

namespace fourfold {

// One record of a CSV file: its fields, and the 1-based physical line where it begins.
struct CsvRecord {
    QStringList fields;
    qint64 line = 0;
};

// Splits decoded CSV text into records by RFC 4180 §2 (quoted fields, doubled quotes, commas
// and line breaks inside quotes; CRLF, LF or lone CR between records). Completely empty lines
// are skipped. On malformed quoting returns ErrorCode::InvalidInput naming `file`, the line
// and the column (1-based, in code points) of the fault; an unterminated quoted field is
// reported at its opening quote.
Result<std::vector<CsvRecord>> parseCsvRecords(const QString &text, const QString &file);

// Receives one record: its fields as views (into the text, or for a quoted field holding a
// doubled quote into the reader's buffer; valid only during the call) and the line where it
// begins. An error stops the reading and is returned.
using CsvRecordSink = std::function<Status(const std::vector<QStringView> &fields, qint64 line)>;
// The same reading as parseCsvRecords, one record at a time and without a string per field:
// the records up to the first fault reach `sink`, then the fault is returned as there.
Status forEachCsvRecord(QStringView text, const QString &file, const CsvRecordSink &sink);

// Reads the articles of a CSV file's bytes (UTF-8). `columns` maps Fourfold field names to
// header names (ImportOptions::csvColumns). Returns the articles in record order without
// checking ids or texts (readArticles does that), or the first error naming `file`.
Result<std::vector<ImportedArticle>> readCsvArticles(
    const QByteArray &bytes, const QString &file, const QHash<QString, QString> &columns);

} // namespace fourfold
