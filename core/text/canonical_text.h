#pragma once
// Canonical article text (design.md §3): NFC (ICU Normalizer2), LF line ends, no BOM, and the
// SHA-256 of its UTF-8 encoding. Stored once per article and never changed afterwards.

#include "core/model/error.h"

#include <QByteArray>
#include <QByteArrayView>
#include <QString>

namespace fourfold {

// Decodes UTF-8 strictly (Unicode 15.0 §3.9 Table 3-7). On invalid UTF-8 (overlong forms,
// surrogates, code points above U+10FFFF, truncated sequences, stray continuation bytes, bytes
// 0xC0/0xC1/0xF5..0xFF) returns ErrorCode::InvalidInput naming `sourceName`, the 1-based line
// and the 1-based column of the first byte of the first ill-formed sequence, its value and
// what is wrong. Lines end at LF, CRLF or a lone CR; the column counts characters (code points)
// from the line start, as the JSON and CSV readers do (a BOM does not count). A leading BOM is
// accepted and dropped. NUL bytes are refused as well (they mark a binary file). Line ends are kept
// as they are: see canonicalText().
Result<QString> decodeUtf8Strict(const QByteArray &bytes, const QString &sourceName);
// The same check for a piece of a longer input that begins at the start of line `firstLine`,
// for readers that decode a file a line or a record at a time: errors count lines from
// `firstLine`, and a leading BOM is kept (only the first bytes of the whole input can be one).
Result<QString> decodeUtf8Strict(QByteArrayView bytes, const QString &sourceName, qint64 firstLine);

// Returns the canonical form of `text`: leading BOMs (U+FEFF) removed, CRLF and lone CR turned
// into LF, Unicode NFC (UAX #15). Never fails; unpaired surrogates are replaced by U+FFFD.
// Idempotent: canonicalText(canonicalText(x)) == canonicalText(x).
QString canonicalText(const QString &text);

// True if `text` is already canonical (canonicalText(text) == text), without copying it.
bool isCanonicalText(const QString &text);

// Lower-case hex SHA-256 of the UTF-8 encoding of `text` (64 characters).
QString textSha256(const QString &text);

} // namespace fourfold
