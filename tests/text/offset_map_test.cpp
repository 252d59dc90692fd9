#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"
#include "tests/support/test_support.h"

#include <QList>

#include <random>
#include <type_traits>
#include <vector>

using namespace fourfold;

namespace {

QString fromUcs4(const std::vector<char32_t> &cps, size_t from = 0, size_t count = size_t(-1))
{
    count = std::min(count, cps.size() - from);
    return QString::fromUcs4(cps.data() + from, static_cast<qsizetype>(count));
}

} // namespace

// UTF-16 positions (Qt's, ICU's) and code points are distinct types: neither converts to the
// other, so a UTF-16 range handed where a code-point range is meant does not compile.
static_assert(!std::is_convertible_v<Utf16Range, TextRange>);
static_assert(!std::is_convertible_v<TextRange, Utf16Range>);
static_assert(std::is_invocable_v<decltype(&OffsetMap::codePointRange), const OffsetMap &,
    const Utf16Range &>);
static_assert(!std::is_invocable_v<decltype(&OffsetMap::codePointRange), const OffsetMap &,
              const TextRange &>);
static_assert(
    !std::is_invocable_v<decltype(&OffsetMap::utf16Range), const OffsetMap &, const Utf16Range &>);

TEST_CASE("OffsetMap gives exact positions for known strings")
{
    // UTF-16 lengths from the Unicode Standard §3.9 (D91: supplementary code points take a
    // surrogate pair); UTF-8 lengths from RFC 3629 §3 (1 byte below U+0080, 2 below U+0800,
    // 3 below U+10000, else 4).
    struct Case {
        const char *name;
        QString text;
        std::vector<qint64> utf16AtCodePoint; // codePointCount()+1 entries
        std::vector<qint64> utf8AtCodePoint;
    };
    const Case cases[] = {
        {"empty", QString(), {0}, {0}},
        {"ASCII", QStringLiteral("abc"), {0, 1, 2, 3}, {0, 1, 2, 3}},
        {"emoji between letters (surrogate pair)", QStringLiteral("a😀b"), {0, 1, 3, 4},
            {0, 1, 5, 6}},
        {"mixed widths: a é € 😀", QStringLiteral("aé€😀"), {0, 1, 2, 3, 5}, {0, 1, 3, 6, 10}},
        {"family emoji: 3 people, 2 ZWJ (U+1F468 U+200D U+1F469 U+200D U+1F467)",
            QStringLiteral("👨‍👩‍👧"), {0, 2, 3, 5, 6, 8}, {0, 4, 7, 11, 14, 18}},
        {"flag NL: two regional indicators", QStringLiteral("🇳🇱"), {0, 2, 4}, {0, 4, 8}},
        {"heart with VS16", QStringLiteral("❤\uFE0F"), {0, 1, 2}, {0, 3, 6}},
        {"combining acute after x", QStringLiteral("x\u0301"), {0, 1, 2}, {0, 1, 3}},
        {"Hebrew", QStringLiteral("שלום"), {0, 1, 2, 3, 4}, {0, 2, 4, 6, 8}},
        {"Arabic", QStringLiteral("مرحبا"), {0, 1, 2, 3, 4, 5}, {0, 2, 4, 6, 8, 10}},
        {"UTF-8 length boundaries U+007F U+0080 U+07FF U+0800 U+FFFF U+10000",
            QString::fromUcs4(U"\u007F\u0080\u07FF\u0800\uFFFF\U00010000", 6),
            {0, 1, 2, 3, 4, 5, 7}, {0, 1, 3, 5, 8, 11, 15}},
        {"CJK and U+10FFFF", QStringLiteral("中") + QString::fromUcs4(U"\U0010FFFF", 1), {0, 1, 3},
            {0, 3, 7}},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        const OffsetMap map(c.text);
        const auto count = static_cast<qint64>(c.utf16AtCodePoint.size()) - 1;
        REQUIRE(map.codePointCount() == count);
        CHECK(map.utf16Length() == c.text.size());
        CHECK(map.utf8Length() == c.text.toUtf8().size());
        CHECK(map.utf8Length() == c.utf8AtCodePoint.back());
        for (qint64 cp = 0; cp <= count; ++cp) {
            CAPTURE(cp);
            CHECK(map.utf16FromCodePoint(cp) == c.utf16AtCodePoint[size_t(cp)]);
            CHECK(map.utf8FromCodePoint(cp) == c.utf8AtCodePoint[size_t(cp)]);
            CHECK(map.codePointFromUtf16(c.utf16AtCodePoint[size_t(cp)]) == cp);
            CHECK(map.codePointFromUtf8(c.utf8AtCodePoint[size_t(cp)]) == cp);
        }
        CHECK(map.utf16FromCodePoint(-1) == -1);
        CHECK(map.utf16FromCodePoint(count + 1) == -1);
        CHECK(map.utf8FromCodePoint(count + 1) == -1);
        CHECK(map.codePointFromUtf16(-1) == -1);
        CHECK(map.codePointFromUtf16(map.utf16Length() + 1) == -1);
        CHECK(map.codePointFromUtf8(map.utf8Length() + 1) == -1);
    }
}

TEST_CASE("OffsetMap rounds positions inside a code point down, range ends up")
{
    const QString text = QStringLiteral("a😀b"); // UTF-16: a=0, 😀=1..2, b=3; UTF-8: a=0, 😀=1..4, b=5
    const OffsetMap map(text);
    CHECK(map.codePointFromUtf16(2) == 1); // between the two surrogates
    for (qint64 byte = 1; byte <= 4; ++byte)
        CHECK(map.codePointFromUtf8(byte) == 1);
    CHECK(map.codePointFromUtf8(5) == 2);

    CHECK(map.utf16Range(TextRange {1, 2}) == Utf16Range {1, 3});
    CHECK(map.utf16Range(TextRange {0, 3}) == Utf16Range {0, 4});
    CHECK(map.codePointRange(Utf16Range {2, 3}) == TextRange {1, 2}); // start rounds down
    CHECK(map.codePointRange(Utf16Range {1, 2}) == TextRange {1, 2}); // end rounds up
    CHECK(map.codePointRange(Utf16Range {2, 2}) == TextRange {1, 2});
    CHECK(map.codePointRange(Utf16Range {3, 3}) == TextRange {2, 2});
    CHECK(map.codePointRange(Utf16Range {0, 4}) == TextRange {0, 3});

    CHECK(map.utf16Range(TextRange {2, 1}) == Utf16Range {-1, -1});
    CHECK(map.utf16Range(TextRange {0, 4}) == Utf16Range {-1, -1});
    CHECK(map.utf16Range(TextRange {-1, 1}) == Utf16Range {-1, -1});
    CHECK(map.codePointRange(Utf16Range {3, 2}) == TextRange {-1, -1});
    CHECK(map.codePointRange(Utf16Range {0, 5}) == TextRange {-1, -1});
    CHECK(map.codePointRange(Utf16Range {-1, 1}) == TextRange {-1, -1});

    CHECK(OffsetMap::slice(text, TextRange {1, 2}) == QStringLiteral("😀"));
    CHECK(OffsetMap::slice(text, TextRange {2, 3}) == QStringLiteral("b"));
    CHECK(OffsetMap::slice(text, TextRange {0, 3}) == text);
    CHECK(OffsetMap::slice(text, TextRange {3, 3}).isEmpty());
    CHECK(OffsetMap::slice(text, TextRange {2, 4}).isEmpty());
    CHECK(OffsetMap::slice(text, TextRange {2, 1}).isEmpty());
}

TEST_CASE("OffsetMap counts an unpaired surrogate as one code point, like Qt")
{
    // Never in canonical text, but the map must stay consistent with QString::toUcs4() and
    // QString::toUtf8() (which writes '?').
    const QString text = QStringLiteral("a") + QChar(0xD800) + QStringLiteral("b");
    const OffsetMap map(text);
    CHECK(map.codePointCount() == text.toUcs4().size());
    CHECK(map.utf8Length() == text.toUtf8().size());
}

TEST_CASE("OffsetMap lengths before and after canonicalisation")
{
    // NFD "e" + U+0301 is one code point "é" after NFC (UAX #15); CRLF becomes LF.
    struct Case {
        const char *name;
        QString raw;
        qint64 rawCodePoints, rawUtf8;
        qint64 canonicalCodePoints, canonicalUtf8;
    };
    const Case cases[] = {
        {"NFD e + acute", QStringLiteral("e\u0301"), 2, 3, 1, 2},
        {"NFD word with CRLF", QStringLiteral("Cafe\u0301\r\n"), 7, 8, 5, 6},
        {"CRLF only", QStringLiteral("a\r\nb\r\n"), 6, 6, 4, 4},
        {"Hangul jamo", QStringLiteral("\u1100\u1161"), 2, 6, 1, 3},
        {"already NFC emoji", QStringLiteral("👨‍👩‍👧"), 5, 18, 5, 18},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        const OffsetMap before(c.raw);
        CHECK(before.codePointCount() == c.rawCodePoints);
        CHECK(before.utf8Length() == c.rawUtf8);
        const QString canonical = canonicalText(c.raw);
        const OffsetMap after(canonical);
        CHECK(after.codePointCount() == c.canonicalCodePoints);
        CHECK(after.utf8Length() == c.canonicalUtf8);
        CHECK(after.codePointCount() == canonical.toUcs4().size());
    }
}

TEST_CASE("OffsetMap round-trips and agrees with Qt's encoders on random strings")
{
    // Oracle: QString::toUcs4() and QString::toUtf8() over prefixes, an encoder independent of
    // OffsetMap. The pool mixes 1-, 2-, 3- and 4-byte characters (with the first and last code
    // point of each UTF-8 length, RFC 3629 §3), combining marks, ZWJ, regional indicators,
    // variation selectors and right-to-left letters.
    const char32_t pool[] = {U'a', U'Z', U' ', U'\n', U'.', 0x00E9, 0x0301, 0x0308, 0x05D0, 0x05E9,
        0x0627, 0x0645, 0x20AC, 0x4E2D, 0xFE0F, 0x200D, 0x2764, 0x1F600, 0x1F468, 0x1F469, 0x1F467,
        0x1F1F3, 0x1F1F1, 0x1F3FD, 0x10000, 0x10FFFF, 0x7F, 0x80, 0x7FF, 0x800, 0xFFFD, 0xFFFF};
    std::mt19937 rng(7);
    std::uniform_int_distribution<size_t> pick(0, std::size(pool) - 1);
    std::uniform_int_distribution<int> length(0, 40);
    for (int round = 0; round < 2000; ++round) {
        std::vector<char32_t> cps;
        for (int i = length(rng); i > 0; --i)
            cps.push_back(pool[pick(rng)]);
        const QString text = fromUcs4(cps);
        CAPTURE(text);
        const OffsetMap map(text);
        const QByteArray utf8 = text.toUtf8();

        REQUIRE(map.codePointCount() == text.toUcs4().size());
        REQUIRE(map.codePointCount() == static_cast<qint64>(cps.size()));
        CHECK(map.utf16Length() == text.size());
        CHECK(map.utf8Length() == utf8.size());

        for (qint64 cp = 0; cp <= map.codePointCount(); ++cp) {
            const QString prefix = fromUcs4(cps, 0, size_t(cp));
            const qint64 u16 = map.utf16FromCodePoint(cp);
            const qint64 u8 = map.utf8FromCodePoint(cp);
            CHECK(u16 == prefix.size());
            CHECK(u8 == prefix.toUtf8().size());
            CHECK(map.codePointFromUtf16(u16) == cp);
            CHECK(map.codePointFromUtf8(u8) == cp);
        }
        // Every UTF-16 position, including those inside a surrogate pair.
        for (qint64 u = 0; u <= text.size(); ++u) {
            const bool splitsPair = u > 0 && u < text.size() && text.at(u - 1).isHighSurrogate()
                && text.at(u).isLowSurrogate();
            const qint64 expected = text.left(splitsPair ? u - 1 : u).toUcs4().size();
            CHECK(map.codePointFromUtf16(u) == expected);
        }
        // Every UTF-8 position: code points whose first byte lies before it, minus the one it
        // splits (RFC 3629 §3: continuation bytes are 10xxxxxx).
        qint64 leadBytes = 0;
        for (qint64 b = 0; b <= utf8.size(); ++b) {
            const bool splits = b < utf8.size() && (uchar(utf8[b]) & 0xC0) == 0x80;
            CHECK(map.codePointFromUtf8(b) == leadBytes - (splits ? 1 : 0));
            if (b < utf8.size() && (uchar(utf8[b]) & 0xC0) != 0x80)
                ++leadBytes;
        }
        // Ranges and slices.
        if (!cps.empty()) {
            std::uniform_int_distribution<size_t> at(0, cps.size());
            size_t a = at(rng);
            size_t b = at(rng);
            if (a > b)
                std::swap(a, b);
            const TextRange range {qint64(a), qint64(b)};
            const Utf16Range range16 = map.utf16Range(range);
            CHECK(range16.length() == fromUcs4(cps, a, b - a).size());
            CHECK(map.codePointRange(range16) == range);
            CHECK(OffsetMap::slice(text, range) == fromUcs4(cps, a, b - a));
            CHECK(text.mid(range16.start, range16.length()) == fromUcs4(cps, a, b - a));
        }
    }
}
