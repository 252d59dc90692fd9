#pragma once
// CSV input (RFC 4180) for readArticles; the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QHash>
#include <QString>
#include <QStringView>

#include <functional>
#include <vector>

namespace fourfold {

class ChunkedInput;

// Receives one record: its fields as views (into the text, or for a quoted field holding a
// doubled quote into the reader's buffer; valid only during the call) and the line where it
// begins. An error stops the reading and is returned.
using CsvRecordSink = std::function<Status(const std::vector<QStringView> &fields, qint64 line)>;
// Splits decoded CSV text into records by RFC 4180 §2 (quoted fields, doubled quotes, commas
// and line breaks inside quotes; CRLF, LF or lone CR between records), one record at a time and
// without a string per field: the records up to the first fault reach `sink`. Completely empty
// lines are skipped. On malformed quoting returns ErrorCode::InvalidInput naming `file`, the
// line and the column (1-based, in code points) of the fault; an unterminated quoted field is
// reported at its opening quote.
Status forEachCsvRecord(QStringView text, const QString &file, const CsvRecordSink &sink);

// Reads the articles of a CSV file (UTF-8) one record at a time (forEachCsvRecordIn), handing
// each to `sink` in record order as soon as it is read, without checking ids or texts
// (readArticles does that). `columns` maps Fourfold field names to header names
// (ImportOptions::csvColumns); a key that is no field name is ErrorCode::InvalidArgument.
// Returns the first error naming the file, or the first failure of `sink`, which stops the
// reading.
Status readCsvArticles(
    ChunkedInput &input, const QHash<QString, QString> &columns, const ImportedArticleSink &sink);

} // namespace fourfold
