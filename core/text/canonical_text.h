#pragma once
// Canonical article text (design.md §3): NFC (ICU Normalizer2), LF line ends, no BOM, and the
// SHA-256 of its UTF-8 encoding. Stored once per article and never changed afterwards.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Decodes UTF-8 strictly. On invalid UTF-8 (overlong forms, surrogates, truncated sequences,
// bytes 0xC0/0xC1/0xF5..0xFF) returns ErrorCode::InvalidInput naming `sourceName`, the 1-based
// line and the 1-based byte column of the first bad byte. A leading BOM is accepted and dropped.
// NUL bytes are refused as well (they mark a binary file).
Result<QString> decodeUtf8Strict(const QByteArray &bytes, const QString &sourceName);

// Returns the canonical form of `text`: BOM removed, CRLF and lone CR turned into LF, Unicode
// NFC. Never fails for valid UTF-16 input; unpaired surrogates are replaced by U+FFFD.
QString canonicalText(const QString &text);

// True if `text` is already canonical (canonicalText(text) == text).
bool isCanonicalText(const QString &text);

// Lower-case hex SHA-256 of the UTF-8 encoding of `text` (64 characters).
QString textSha256(const QString &text);

} // namespace fourfold
