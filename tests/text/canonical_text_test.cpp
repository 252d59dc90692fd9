#include "core/text/canonical_text.h"
#include "tests/support/test_support.h"

#include <QList>
#include <QRegularExpression>

#include <unicode/utf8.h>

#include <random>
#include <string_view>
#include <vector>

using namespace fourfold;
using namespace std::string_view_literals;

namespace {

QByteArray bytes(std::string_view s)
{
    return QByteArray(s.data(), static_cast<qsizetype>(s.size()));
}

QString fromUcs4(std::initializer_list<char32_t> cps)
{
    return QString::fromUcs4(cps.begin(), static_cast<qsizetype>(cps.size()));
}

} // namespace

TEST_CASE("decodeUtf8Strict accepts well-formed UTF-8 at every boundary of Table 3-7")
{
    // Unicode 15.0 §3.9 Table 3-7 "Well-Formed UTF-8 Byte Sequences": the first and last code
    // point of each row.
    struct Case {
        std::string_view utf8;
        char32_t codePoint;
    };
    const Case cases[] = {
        {"\x7F"sv, 0x7F},
        {"\xC2\x80"sv, 0x80},
        {"\xDF\xBF"sv, 0x7FF},
        {"\xE0\xA0\x80"sv, 0x800},
        {"\xE1\x80\x80"sv, 0x1000},
        {"\xED\x9F\xBF"sv, 0xD7FF},
        {"\xEE\x80\x80"sv, 0xE000},
        {"\xEF\xBF\xBF"sv, 0xFFFF},
        {"\xF0\x90\x80\x80"sv, 0x10000},
        {"\xF0\x9F\x98\x80"sv, 0x1F600},
        {"\xF3\xBF\xBF\xBF"sv, 0xFFFFF},
        {"\xF4\x8F\xBF\xBF"sv, 0x10FFFF},
    };
    for (const Case &c : cases) {
        CAPTURE(QByteArray(bytes(c.utf8)).toHex().toStdString());
        const Result<QString> text = decodeUtf8Strict(bytes(c.utf8), QStringLiteral("x.txt"));
        REQUIRE(text.has_value());
        const QList<uint> ucs4 = text->toUcs4();
        REQUIRE(ucs4.size() == 1);
        CHECK(ucs4[0] == c.codePoint);
    }
}

TEST_CASE("decodeUtf8Strict drops a leading BOM and keeps everything else")
{
    CHECK(decodeUtf8Strict(bytes("\xEF\xBB\xBF"
                                 "abc"sv),
              {})
              .value()
        == QStringLiteral("abc"));
    CHECK(decodeUtf8Strict(bytes("\xEF\xBB\xBF"sv), {}).value().isEmpty());
    CHECK(decodeUtf8Strict(QByteArray(), {}).value().isEmpty());
    // Only a leading BOM is a BOM; later U+FEFF is text (ZERO WIDTH NO-BREAK SPACE).
    CHECK(decodeUtf8Strict(bytes("a\xEF\xBB\xBF"sv), {}).value() == QStringLiteral("a\uFEFF"));
    // Line ends are canonicalText()'s business, not the decoder's.
    CHECK(decodeUtf8Strict(bytes("a\r\nb\rc"sv), {}).value() == QStringLiteral("a\r\nb\rc"));
    CHECK(decodeUtf8Strict(bytes("caf\xC3\xA9"sv), {}).value() == QStringLiteral("café"));
}

TEST_CASE("decodeUtf8Strict on a piece of a file counts lines from where the piece begins")
{
    // The piece "ab\r\ncd\xFF" taken from line 41 of a file: the bad byte is on line 42,
    // column 3, as the whole file would report it.
    const Result<QString> bad =
        decodeUtf8Strict(QByteArrayView("ab\r\ncd\xFF"), QStringLiteral("big.csv"), 41);
    REQUIRE_FALSE(bad);
    CHECK(bad.error().line == 42);
    CHECK(bad.error().column == 3);
    CHECK(bad.error().message.startsWith(QStringLiteral("big.csv:42:3: invalid UTF-8")));
    // A piece from inside a file has no BOM: U+FEFF at its start is text.
    CHECK(decodeUtf8Strict(QByteArrayView("\xEF\xBB\xBF"
                                          "a"),
              QStringLiteral("x"), 7)
              .value()
        == QStringLiteral("\uFEFFa"));
}

TEST_CASE("decodeUtf8Strict names the line, column and fault of the first bad byte")
{
    // Ill-formed sequences from Unicode 15.0 §3.9 (Table 3-7, and the examples of maximal
    // subparts in "U+FFFD Substitution of Maximal Subparts"). Lines end at LF, CRLF or CR;
    // columns count characters (code points) from the line start.
    struct Case {
        const char *name;
        std::string_view input;
        qint64 line;
        qint64 column;
        const char *what;
    };
    const Case cases[] = {
        {"overlong C0 AF", "ab\ncd\nefgh\xC0\xAF"sv, 3, 5,
            "invalid UTF-8 (byte 0xC0): an overlong encoding"},
        {"overlong C1 BF", "\xC1\xBF"sv, 1, 1, "invalid UTF-8 (byte 0xC1): an overlong encoding"},
        {"overlong E0 80 AF", "x\xE0\x80\xAF"sv, 1, 2,
            "invalid UTF-8 (byte 0xE0): an overlong encoding"},
        {"overlong F0 80 80 AF", "\n\n\xF0\x80\x80\xAF"sv, 3, 1,
            "invalid UTF-8 (byte 0xF0): an overlong encoding"},
        {"lone continuation 80", "x\x80"sv, 1, 2,
            "invalid UTF-8 (byte 0x80): a continuation byte without a lead byte"},
        {"continuation after a complete sequence", "\xC3\xA9\xA9"sv, 1, 2,
            "invalid UTF-8 (byte 0xA9): a continuation byte without a lead byte"},
        {"truncated E2 82 at the end", "ab\xE2\x82"sv, 1, 3,
            "invalid UTF-8 (byte 0xE2): the multi-byte sequence it starts is cut short"},
        {"truncated E2 82 before ASCII", "line\nab\xE2\x82z"sv, 2, 3,
            "invalid UTF-8 (byte 0xE2): the multi-byte sequence it starts is cut short"},
        {"truncated F0 9F 98", "\xF0\x9F\x98"sv, 1, 1,
            "invalid UTF-8 (byte 0xF0): the multi-byte sequence it starts is cut short"},
        {"C3 before ASCII", "a\xC3("sv, 1, 2,
            "invalid UTF-8 (byte 0xC3): the multi-byte sequence it starts is cut short"},
        {"surrogate ED A0 80 after CRLF", "\r\n\xED\xA0\x80"sv, 2, 1,
            "invalid UTF-8 (byte 0xED): it encodes a UTF-16 surrogate"},
        {"surrogate ED BF BF", "ok \xED\xBF\xBF"sv, 1, 4,
            "invalid UTF-8 (byte 0xED): it encodes a UTF-16 surrogate"},
        {"above U+10FFFF", "\xF4\x90\x80\x80"sv, 1, 1,
            "invalid UTF-8 (byte 0xF4): it encodes a code point above U+10FFFF"},
        {"F5 after lone CR", "a\rb\xF5"sv, 2, 2,
            "invalid UTF-8 (byte 0xF5): this byte never occurs in UTF-8"},
        {"five-byte form F8", "\xF8\x88\x80\x80\x80"sv, 1, 1,
            "invalid UTF-8 (byte 0xF8): this byte never occurs in UTF-8"},
        {"FF", "\r\r\xFF"sv, 3, 1, "invalid UTF-8 (byte 0xFF): this byte never occurs in UTF-8"},
        {"a BOM is not a character of line 1", "\xEF\xBB\xBF\x80"sv, 1, 1,
            "invalid UTF-8 (byte 0x80): a continuation byte without a lead byte"},
        {"NUL byte", "abc\0def"sv, 1, 4, "NUL byte (0x00): the file looks binary"},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        const Result<QString> text = decodeUtf8Strict(bytes(c.input), QStringLiteral("in.txt"));
        REQUIRE_FALSE(text.has_value());
        CHECK(text.error().code == ErrorCode::InvalidInput);
        CHECK(text.error().file == QStringLiteral("in.txt"));
        CHECK(text.error().line == c.line);
        CHECK(text.error().column == c.column);
        const QString prefix = QStringLiteral("in.txt:%1:%2: ").arg(c.line).arg(c.column);
        CHECK(text.error().message.startsWith(prefix + QString::fromUtf8(c.what)));
    }
}

TEST_CASE("decodeUtf8Strict error text is one clear sentence with advice")
{
    const Result<QString> text =
        decodeUtf8Strict(bytes("ab\ncd\nefgh\xC0\xAF"sv), QStringLiteral("articles/a1.txt"));
    REQUIRE_FALSE(text.has_value());
    CHECK(text.error().message
        == QStringLiteral("articles/a1.txt:3:5: invalid UTF-8 (byte 0xC0): an overlong encoding, "
                          "which UTF-8 forbids. Save the file as UTF-8 and import it again."));
}

TEST_CASE("decodeUtf8Strict agrees with ICU's strict decoder on random byte strings")
{
    // Oracle: ICU's U8_NEXT (utf8.h), which follows Unicode 15.0 Table 3-7 and returns a
    // negative code point at the start of each ill-formed subsequence.
    const unsigned char pool[] = {'a', 'Z', ' ', '\n', '\r', 0x7F, 0x80, 0x8F, 0x90, 0x9F, 0xA0,
        0xBF, 0xC0, 0xC1, 0xC2, 0xC3, 0xDF, 0xE0, 0xE1, 0xE2, 0xED, 0xEE, 0xEF, 0xBB, 0xF0, 0xF3,
        0xF4, 0xF5, 0xFF};
    std::mt19937 rng(20240607);
    std::uniform_int_distribution<size_t> pick(0, std::size(pool) - 1);
    std::uniform_int_distribution<int> length(0, 10);
    int valid = 0;
    int invalid = 0;
    for (int round = 0; round < 20000; ++round) {
        QByteArray input;
        for (int i = length(rng); i > 0; --i)
            input.append(static_cast<char>(pool[pick(rng)]));
        CAPTURE(input.toHex().toStdString());

        const auto *s = reinterpret_cast<const uint8_t *>(input.constData());
        const auto n = static_cast<int32_t>(input.size());
        int32_t i = (n >= 3 && s[0] == 0xEF && s[1] == 0xBB && s[2] == 0xBF) ? 3 : 0;
        std::vector<char32_t> expected;
        qint64 line = 1;
        size_t lineFirstChar = 0; // index into `expected` of the line's first character
        qint64 badColumn = 0;
        while (i < n) {
            UChar32 c = 0;
            U8_NEXT(s, i, n, c);
            if (c < 0) {
                badColumn = qint64(expected.size() - lineFirstChar) + 1;
                break;
            }
            if (c == '\n' || (c == '\r' && (i == n || s[i] != '\n'))) {
                ++line;
                lineFirstChar = expected.size() + 1;
            }
            expected.push_back(static_cast<char32_t>(c));
        }

        const Result<QString> text = decodeUtf8Strict(input, QStringLiteral("r.txt"));
        if (badColumn == 0) {
            ++valid;
            REQUIRE(text.has_value());
            CHECK(*text
                == QString::fromUcs4(expected.data(), static_cast<qsizetype>(expected.size())));
        } else {
            ++invalid;
            REQUIRE_FALSE(text.has_value());
            CHECK(text.error().line == line);
            CHECK(text.error().column == badColumn);
        }
    }
    // The pool must exercise both outcomes, or the property proves little.
    CHECK(valid > 1000);
    CHECK(invalid > 1000);
}

TEST_CASE("canonicalText applies NFC, LF line ends and drops the BOM")
{
    // NFC examples from UAX #15 (Unicode Normalization Forms): composition, singletons,
    // canonical reordering, Hangul, and compatibility characters that NFC leaves alone.
    struct Case {
        const char *name;
        QString input;
        QString expected;
    };
    const Case cases[] = {
        {"e + combining acute composes (UAX #15)", QStringLiteral("e\u0301"),
            QStringLiteral("\u00E9")},
        {"A + ring composes", QStringLiteral("A\u030A"), QStringLiteral("\u00C5")},
        {"ANGSTROM SIGN is a singleton (UAX #15 Figure 3)", QStringLiteral("\u212B"),
            QStringLiteral("\u00C5")},
        {"d-dot-above + dot-below reorders (UAX #15)", QStringLiteral("\u1E0B\u0323"),
            QStringLiteral("\u1E0D\u0307")},
        {"q + dot-above + dot-below is reordered only", QStringLiteral("q\u0307\u0323"),
            QStringLiteral("q\u0323\u0307")},
        {"Hangul jamo L V T compose (Unicode §3.12)", QStringLiteral("\u1100\u1161\u11A8"),
            QStringLiteral("\uAC01")},
        {"fi ligature is compatibility-only (UAX #15 Figure 6)", QStringLiteral("\uFB01"),
            QStringLiteral("\uFB01")},
        {"x + acute has no precomposed form", QStringLiteral("x\u0301"), QStringLiteral("x\u0301")},
        {"emoji and ZWJ sequences are untouched", QStringLiteral("👨‍👩‍👧 🇳🇱"),
            QStringLiteral("👨‍👩‍👧 🇳🇱")},
        {"CRLF and lone CR become LF", QStringLiteral("a\r\nb\rc\nd"),
            QStringLiteral("a\nb\nc\nd")},
        {"CR CR LF is two line ends", QStringLiteral("\r\r\n"), QStringLiteral("\n\n")},
        {"leading BOM dropped", QStringLiteral("\uFEFFabc"), QStringLiteral("abc")},
        {"all leading BOMs dropped (fixed point)", QStringLiteral("\uFEFF\uFEFFx"),
            QStringLiteral("x")},
        {"inner U+FEFF kept", QStringLiteral("a\uFEFFb"), QStringLiteral("a\uFEFFb")},
        {"unpaired high surrogate replaced",
            QStringLiteral("a") + QChar(0xD800) + QStringLiteral("b"), QStringLiteral("a\uFFFDb")},
        {"unpaired low surrogate at the end replaced", QStringLiteral("a") + QChar(0xDC00),
            QStringLiteral("a\uFFFD")},
        {"empty", QString(), QString()},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        const QString canonical = canonicalText(c.input);
        CHECK(canonical == c.expected);
        CHECK(isCanonicalText(canonical));
        CHECK(isCanonicalText(c.input) == (c.input == c.expected));
        CHECK(canonicalText(canonical) == canonical);
    }
}

TEST_CASE("canonicalText agrees with Qt's own NFC on random strings")
{
    // Oracle: Qt's QString::normalized(), an implementation independent of ICU. The pool keeps
    // to characters both Unicode versions (Qt 6.4, ICU 72) know.
    const char32_t pool[] = {U'a', U'e', U'A', U'o', U' ', U'\n', U'\r', 0x00E9, 0x00C5, 0x0301,
        0x0308, 0x0323, 0x0307, 0x030A, 0x0327, 0x1E0B, 0x212B, 0x1100, 0x1161, 0x11A8, 0xAC00,
        0x05D0, 0x05B8, 0x0627, 0x0653, 0x0915, 0x093C, 0x1F600, 0x1F468, 0x200D, 0xFB01, 0x2126,
        0x0344, 0x0F73, 0xFEFF};
    std::mt19937 rng(42);
    std::uniform_int_distribution<size_t> pick(0, std::size(pool) - 1);
    std::uniform_int_distribution<int> length(0, 16);
    for (int round = 0; round < 5000; ++round) {
        std::vector<char32_t> cps;
        for (int i = length(rng); i > 0; --i)
            cps.push_back(pool[pick(rng)]);
        const QString input = QString::fromUcs4(cps.data(), static_cast<qsizetype>(cps.size()));
        CAPTURE(input);

        QString expected = input;
        expected.replace(QStringLiteral("\r\n"), QStringLiteral("\n"));
        expected.replace(QLatin1Char('\r'), QLatin1Char('\n'));
        while (expected.startsWith(QChar(0xFEFF)))
            expected.remove(0, 1);
        expected = expected.normalized(QString::NormalizationForm_C);

        const QString canonical = canonicalText(input);
        CHECK(canonical == expected);
        CHECK(isCanonicalText(canonical));
        CHECK(isCanonicalText(input) == (canonical == input));
    }
}

TEST_CASE("textSha256 hashes the UTF-8 encoding, lower-case hex")
{
    // FIPS 180-4 / NIST CSRC example values for "" and "abc"; the others computed with
    // coreutils sha256sum over the UTF-8 bytes (printf '\xc3\xa9' | sha256sum).
    CHECK(textSha256(QString())
        == QStringLiteral("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855"));
    CHECK(textSha256(QStringLiteral("abc"))
        == QStringLiteral("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"));
    CHECK(textSha256(QStringLiteral("é"))
        == QStringLiteral("4a99557e4033c3539de2eb65472017cad5f9557f7a0625a09f1c3f6e2ba69c4c"));
    // Canonical equivalents hash alike once canonical: NFD input, CRLF line ends.
    CHECK(textSha256(canonicalText(QStringLiteral("cafe\u0301\r\nnai\u0308ve\r\n")))
        == QStringLiteral("a8f5e1e50e4050fb234a80ee7bfbd812d600477ea2ec80b34dd52375939bd245"));
    CHECK(QRegularExpression(QStringLiteral("^[0-9a-f]{64}$"))
              .match(textSha256(fromUcs4({0x1F600, 0x05D0})))
              .hasMatch());
}
