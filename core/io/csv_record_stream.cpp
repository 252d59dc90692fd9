#include "core/io/csv_record_stream.h"

#include "core/io/article_reader.h"
#include "core/io/chunked_input.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

// Finds where a record ends in the file's bytes, resuming where it stopped when more bytes
// came. Only the quotes and line breaks count (they are ASCII, so UTF-8 cannot hide them): in a
// file without a fault in its quoting this is where forEachCsvRecord ends the record too.
struct RecordEnd {
    qsizetype at = 0; // the first byte not yet looked at
    bool quoted = false; // inside a quoted field
    qint64 lineBreaks = 0; // in the record so far
    qsizetype lineStart = 0; // where the current line begins
    qsizetype quoteAt = 0; // the quote that opened the current quoted field
    qint64 quoteLine = 0; // lines before it in the record
    qsizetype quoteLineStart = 0;

    static constexpr qsizetype needMore = -1;
    static constexpr qsizetype tooLong = -2;

    // The size of the record at the start of `bytes` with its line break; needMore if `bytes`
    // holds no whole record yet; tooLong once the record has gone past maxCsvRecordSize bytes
    // (the scan then stops there, whatever the chunks were).
    qsizetype find(QByteArrayView bytes, bool atEnd)
    {
        const qsizetype n = bytes.size();
        while (at < n) {
            if (at >= maxCsvRecordSize)
                return tooLong;
            const char c = bytes[at];
            if (c == '"') {
                if (!quoted) {
                    quoteAt = at;
                    quoteLine = lineBreaks;
                    quoteLineStart = lineStart;
                }
                quoted = !quoted;
                ++at;
            } else if (c == '\n' || c == '\r') {
                // CRLF is one line break; so are a lone LF and a lone CR: a CR needs the byte
                // after it.
                if (c == '\r' && at + 1 == n && !atEnd)
                    return needMore;
                at += (c == '\r' && at + 1 < n && bytes[at + 1] == '\n') ? 2 : 1;
                ++lineBreaks;
                lineStart = at;
                if (!quoted)
                    return at;
            } else {
                ++at;
            }
        }
        return needMore;
    }
};

// Decodes one record (its bytes from the start of line `firstLine`) and hands it on.
Status readRecord(
    QByteArrayView bytes, const QString &file, qint64 firstLine, const CsvRecordSink &sink)
{
    Result<QString> text = decodeUtf8Strict(bytes, file, firstLine);
    if (!text)
        return std::unexpected(text.error());
    bool sinkFailed = false;
    Status read = forEachCsvRecord(
        *text, file, [&](const std::vector<QStringView> &fields, qint64 line) -> Status {
            Status taken = sink(fields, firstLine - 1 + line);
            sinkFailed = !taken;
            return taken;
        });
    if (!read && !sinkFailed)
        return std::unexpected(movedDown(read.error(), firstLine - 1));
    return read;
}

// The record that begins at `bytes` has gone past maxCsvRecordSize without ending: names an
// earlier fault if there is one (invalid UTF-8, a misplaced quote), else the quoted field that
// never closes, else the record.
Status recordTooLong(
    QByteArrayView bytes, const RecordEnd &scan, const QString &file, qint64 firstLine)
{
    qsizetype cut = std::min<qsizetype>(bytes.size(), maxCsvRecordSize);
    while (cut > 0 && cut < bytes.size() && (static_cast<unsigned char>(bytes[cut]) & 0xC0) == 0x80)
        --cut; // a whole number of characters
    Result<QString> text = decodeUtf8Strict(bytes.first(cut), file, firstLine);
    if (!text)
        return std::unexpected(text.error());
    const qint64 quoteLine = firstLine + scan.quoteLine;
    qint64 quoteColumn = 0;
    for (qsizetype k = scan.quoteLineStart; k <= scan.quoteAt; ++k)
        quoteColumn += (static_cast<unsigned char>(bytes[k]) & 0xC0) != 0x80 ? 1 : 0;
    // Read as if the file ended at the cut: a fault found there is the real one, unless it is
    // the open quoted field itself, which then shows up as never closed at its opening quote.
    const Status grammar = forEachCsvRecord(
        *text, file, [](const std::vector<QStringView> &, qint64) { return Status {}; });
    if (!grammar) {
        Error fault = movedDown(grammar.error(), firstLine - 1);
        const bool opensField =
            scan.quoteAt == scan.quoteLineStart || bytes[scan.quoteAt - 1] == ',';
        if (!scan.quoted || !opensField || fault.line != quoteLine || fault.column != quoteColumn)
            return std::unexpected(std::move(fault));
    }
    if (!scan.quoted) {
        return failAt(ErrorCode::InvalidInput, file, firstLine, 0,
            ArticleReaderText::tr(
                "the record is longer than %1 MiB; a record may be at most %1 MiB")
                .arg(maxCsvRecordSize >> 20));
    }
    return failAt(ErrorCode::InvalidInput, file, quoteLine, quoteColumn,
        ArticleReaderText::tr(
            "the quoted field that begins here is not closed within %1 MiB, the most a record may "
            "hold: a closing double quote is missing")
            .arg(maxCsvRecordSize >> 20));
}

} // namespace

Status forEachCsvRecordIn(ChunkedInput &input, const CsvRecordSink &sink)
{
    const QString &file = input.path();
    FOURFOLD_TRY_STATUS(input.dropByteOrderMark());
    RecordEnd scan;
    qint64 firstLine = 1; // where the pending record begins
    bool atEnd = false;
    for (;;) {
        const QByteArrayView pending = input.pending();
        qsizetype end = scan.find(pending, atEnd);
        if (end == RecordEnd::tooLong)
            return recordTooLong(pending, scan, file, firstLine);
        if (end == RecordEnd::needMore && !atEnd) {
            Result<bool> more = input.readMore();
            if (!more)
                return std::unexpected(more.error());
            atEnd = !*more;
            continue;
        }
        if (end == RecordEnd::needMore) {
            if (pending.isEmpty())
                return {};
            end = pending.size(); // the last record, without a line break
        }
        // Consumed before it is read: the bytes stay in the buffer until the next readMore(),
        // and the position the sink sees is past this record.
        input.consume(end);
        FOURFOLD_TRY_STATUS(readRecord(pending.first(end), file, firstLine, sink));
        firstLine += scan.lineBreaks;
        scan = {};
    }
}

} // namespace fourfold
