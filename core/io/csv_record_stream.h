#pragma once
// CSV records read from a file one at a time, for readers that must not hold the whole file.

#include "core/io/csv_reader.h"
#include "core/model/error.h"

namespace fourfold {

class ChunkedInput;

// Reads the records of `input` in file order, handing each to `sink` as forEachCsvRecord does
// (the fields are valid only during the call; lines are the file's). A record is first found in
// the bytes — a double quote opens or closes a quoted field, a line break outside quotes ends the
// record, so a quoted field may span lines and chunks — then decoded alone (decodeUtf8Strict, so
// invalid UTF-8 in a record is reported before a quoting fault in it) and read by
// forEachCsvRecord, whose rules and errors apply. Holds one record at a time; a record longer
// than maxCsvRecordSize bytes is refused (an unclosed quoted field is named where it opens).
// A leading BOM is dropped. Returns the first error, or the first failure of `sink`, which
// stops the reading.
Status forEachCsvRecordIn(ChunkedInput &input, const CsvRecordSink &sink);

} // namespace fourfold
