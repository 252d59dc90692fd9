#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QCryptographicHash>
#include <QStringDecoder>

#include <unicode/normalizer2.h>
#include <unicode/unistr.h>

namespace fourfold {

namespace {

constexpr char16_t kByteOrderMark = 0xFEFF;
constexpr char16_t kReplacementCharacter = 0xFFFD;

// The sentences of this file, under a context that lupdate collects.
struct CanonicalText {
    Q_DECLARE_TR_FUNCTIONS(CanonicalText)
};

// Why a UTF-8 sequence is ill-formed; see the Unicode Standard 15.0, §3.9, Table 3-7
// "Well-Formed UTF-8 Byte Sequences" (and RFC 3629, §4).
enum class Utf8Fault { LoneContinuation, NeverValid, Overlong, Truncated, Surrogate, TooHigh };

std::unexpected<Error> utf8Error(
    const QString &sourceName, qint64 line, qint64 column, unsigned char byte, Utf8Fault fault)
{
    QString what;
    switch (fault) {
    case Utf8Fault::LoneContinuation:
        what = CanonicalText::tr(
            "invalid UTF-8 (byte 0x%1): a continuation byte without a lead byte.");
        break;
    case Utf8Fault::NeverValid:
        what = CanonicalText::tr("invalid UTF-8 (byte 0x%1): this byte never occurs in UTF-8.");
        break;
    case Utf8Fault::Overlong:
        what = CanonicalText::tr(
            "invalid UTF-8 (byte 0x%1): an overlong encoding, which UTF-8 forbids.");
        break;
    case Utf8Fault::Truncated:
        what = CanonicalText::tr(
            "invalid UTF-8 (byte 0x%1): the multi-byte sequence it starts is cut short.");
        break;
    case Utf8Fault::Surrogate:
        what = CanonicalText::tr(
            "invalid UTF-8 (byte 0x%1): it encodes a UTF-16 surrogate (U+D800..U+DFFF), "
            "which UTF-8 forbids.");
        break;
    case Utf8Fault::TooHigh:
        what =
            CanonicalText::tr("invalid UTF-8 (byte 0x%1): it encodes a code point above U+10FFFF.");
        break;
    }
    what = what.arg(QString::number(byte, 16).rightJustified(2, QLatin1Char('0')).toUpper());
    what += QLatin1Char(' ') + CanonicalText::tr("Save the file as UTF-8 and import it again.");
    return failAt(ErrorCode::InvalidInput, sourceName, line, column, what);
}

// True if `text` needs the BOM, line-end or surrogate repair of canonicalText().
bool needsRepair(const char16_t *s, qsizetype n)
{
    if (n > 0 && s[0] == kByteOrderMark)
        return true;
    for (qsizetype i = 0; i < n; ++i) {
        const char16_t c = s[i];
        if (c == u'\r')
            return true;
        if (QChar::isHighSurrogate(c)) {
            if (i + 1 == n || !QChar::isLowSurrogate(s[i + 1]))
                return true;
            ++i;
        } else if (QChar::isLowSurrogate(c)) {
            return true;
        }
    }
    return false;
}

// Drops every leading BOM (so that the result is a fixed point), turns CRLF and lone CR into LF
// and unpaired surrogates into U+FFFD.
QString repair(const char16_t *s, qsizetype n)
{
    // The result is never longer than the input; write into a buffer and cut it to size.
    QString out(n, Qt::Uninitialized);
    auto *o = reinterpret_cast<char16_t *>(out.data());
    qsizetype length = 0;
    qsizetype i = 0;
    while (i < n && s[i] == kByteOrderMark)
        ++i;
    for (; i < n; ++i) {
        const char16_t c = s[i];
        if (c == u'\r') {
            o[length++] = u'\n';
            if (i + 1 < n && s[i + 1] == u'\n')
                ++i;
        } else if (QChar::isHighSurrogate(c) && i + 1 < n && QChar::isLowSurrogate(s[i + 1])) {
            o[length++] = c;
            o[length++] = s[++i];
        } else if (QChar::isSurrogate(c)) {
            o[length++] = kReplacementCharacter;
        } else {
            o[length++] = c;
        }
    }
    out.truncate(length);
    return out;
}

const char16_t *utf16Data(const QString &text)
{
    return reinterpret_cast<const char16_t *>(text.utf16());
}

} // namespace

namespace {

Result<QString> decodeStrict(
    QByteArrayView bytes, const QString &sourceName, qint64 firstLine, bool dropBom)
{
    const auto *p = reinterpret_cast<const unsigned char *>(bytes.data());
    const qsizetype n = bytes.size();
    const qsizetype bom =
        (dropBom && n >= 3 && p[0] == 0xEF && p[1] == 0xBB && p[2] == 0xBF) ? 3 : 0;
    qint64 line = firstLine;
    qsizetype lineStart = bom;
    for (qsizetype i = bom; i < n;) {
        const unsigned char b = p[i];
        // The column counts characters (code points), like the JSON and CSV readers' columns; the
        // bytes before `i` on this line are valid UTF-8, so their lead bytes are the characters.
        const auto column = [&] {
            qint64 characters = 0;
            for (qsizetype k = lineStart; k < i; ++k)
                characters += (p[k] & 0xC0) != 0x80 ? 1 : 0;
            return characters + 1;
        };
        if (b < 0x80) {
            if (b == 0) {
                return failAt(ErrorCode::InvalidInput, sourceName, line, column(),
                    CanonicalText::tr("NUL byte (0x00): the file looks binary, not like text. "
                                      "Import a UTF-8 text file."));
            }
            // CRLF, LF and a lone CR each end one line, as canonicalText() counts them.
            if (b == '\n' || (b == '\r' && (i + 1 == n || p[i + 1] != '\n'))) {
                ++line;
                lineStart = i + 1;
            }
            ++i;
            continue;
        }
        // Unicode 15.0 §3.9 Table 3-7: the lead byte fixes the length and the range allowed
        // for the second byte; every later byte is 0x80..0xBF.
        int length = 0;
        unsigned char low = 0x80;
        unsigned char high = 0xBF;
        if (b < 0xC0)
            return utf8Error(sourceName, line, column(), b, Utf8Fault::LoneContinuation);
        if (b < 0xC2)
            return utf8Error(sourceName, line, column(), b, Utf8Fault::Overlong);
        if (b < 0xE0) {
            length = 2;
        } else if (b < 0xF0) {
            length = 3;
            if (b == 0xE0)
                low = 0xA0;
            else if (b == 0xED)
                high = 0x9F;
        } else if (b < 0xF5) {
            length = 4;
            if (b == 0xF0)
                low = 0x90;
            else if (b == 0xF4)
                high = 0x8F;
        } else {
            return utf8Error(sourceName, line, column(), b, Utf8Fault::NeverValid);
        }
        for (int k = 1; k < length; ++k) {
            if (i + k >= n || (p[i + k] & 0xC0) != 0x80)
                return utf8Error(sourceName, line, column(), b, Utf8Fault::Truncated);
        }
        const unsigned char second = p[i + 1];
        if (second < low)
            return utf8Error(sourceName, line, column(), b, Utf8Fault::Overlong);
        if (second > high) {
            return utf8Error(sourceName, line, column(), b,
                b == 0xED ? Utf8Fault::Surrogate : Utf8Fault::TooHigh);
        }
        i += length;
    }
    if (dropBom)
        return QString::fromUtf8(bytes.data() + bom, n - bom);
    // QString::fromUtf8 would drop a leading BOM; in a piece from inside a file it is text.
    QStringDecoder decoder(QStringConverter::Utf8,
        QStringConverter::Flag::Stateless | QStringConverter::Flag::ConvertInitialBom);
    return decoder.decode(bytes);
}

} // namespace

Result<QString> decodeUtf8Strict(const QByteArray &bytes, const QString &sourceName)
{
    return decodeStrict(bytes, sourceName, 1, true);
}

Result<QString> decodeUtf8Strict(QByteArrayView bytes, const QString &sourceName, qint64 firstLine)
{
    return decodeStrict(bytes, sourceName, firstLine, false);
}

QString canonicalText(const QString &text)
{
    QString repaired =
        needsRepair(utf16Data(text), text.size()) ? repair(utf16Data(text), text.size()) : text;

    UErrorCode status = U_ZERO_ERROR;
    const icu::Normalizer2 *nfc = icu::Normalizer2::getNFCInstance(status);
    // ICU compiles the NFC data into libicuuc, so this cannot fail in practice; if it did, the
    // repaired text is the best we can return without throwing.
    if (U_FAILURE(status))
        return repaired;

    // Read-only alias: no copy for the common case of text that is already NFC.
    const icu::UnicodeString source(
        false, utf16Data(repaired), static_cast<int32_t>(repaired.size()));
    const int32_t normalPrefix = nfc->spanQuickCheckYes(source, status);
    if (U_FAILURE(status) || normalPrefix == source.length())
        return repaired;

    // The idiom from ICU's Normalizer2 documentation: keep the prefix that passed the quick
    // check and normalise only the rest.
    icu::UnicodeString normalized(source, 0, normalPrefix);
    nfc->normalizeSecondAndAppend(normalized, source.tempSubString(normalPrefix), status);
    if (U_FAILURE(status))
        return repaired;
    return QString(reinterpret_cast<const QChar *>(normalized.getBuffer()), normalized.length());
}

bool isCanonicalText(const QString &text)
{
    if (needsRepair(utf16Data(text), text.size()))
        return false;
    UErrorCode status = U_ZERO_ERROR;
    const icu::Normalizer2 *nfc = icu::Normalizer2::getNFCInstance(status);
    if (U_FAILURE(status))
        return false;
    const icu::UnicodeString source(false, utf16Data(text), static_cast<int32_t>(text.size()));
    const bool normalized = nfc->isNormalized(source, status);
    return U_SUCCESS(status) && normalized;
}

QString textSha256(const QString &text)
{
    return QString::fromLatin1(
        QCryptographicHash::hash(text.toUtf8(), QCryptographicHash::Sha256).toHex());
}

} // namespace fourfold
