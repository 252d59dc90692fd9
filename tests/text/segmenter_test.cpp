#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"
#include "core/text/segmenter.h"
#include "tests/support/test_support.h"

#include <QList>

#include <unicode/locid.h>
#include <unicode/uchar.h>

#include <random>
#include <vector>

using namespace fourfold;

namespace {

using Ranges = std::vector<TextRange>;

Segmentation segment(const QString &text, const QString &language)
{
    Result<Segmentation> result = segmentText(text, language);
    REQUIRE(result.has_value());
    return *result;
}

// The texts of `ranges`, for readable failure messages next to the exact ranges.
QStringList texts(const QString &text, const Ranges &ranges)
{
    QStringList out;
    for (const TextRange &r : ranges)
        out << OffsetMap::slice(text, r);
    return out;
}

} // namespace

TEST_CASE("sentences, tokens and paragraphs of a known English text")
{
    // Word boundaries per UAX #29: "." followed by a space is its own segment (WB999), a run
    // of letters is one word (WB5). Sentence boundaries per UAX #29 SB11; "Dr." is suppressed.
    const QString text = QStringLiteral("Dr. Smith arrived. He sat.");
    const Segmentation s = segment(text, QStringLiteral("en"));
    CHECK(s.paragraphs == Ranges {{0, 26}});
    CHECK(s.sentences == Ranges {{0, 18}, {19, 26}});
    CHECK(s.tokens
        == Ranges {{0, 2}, {2, 3}, {4, 9}, {10, 17}, {17, 18}, {19, 21}, {22, 25}, {25, 26}});
    CHECK(texts(text, s.tokens)
        == QStringList {"Dr", ".", "Smith", "arrived", ".", "He", "sat", "."});
}

TEST_CASE("abbreviations do not end sentences, per language")
{
    // The abbreviation lists are common practice (core/text/abbreviations.cpp) plus ICU's CLDR
    // suppressions; the boundaries without them follow UAX #29 SB11 (a full stop, spaces and
    // an upper-case letter).
    struct Case {
        const char *name;
        const char *language;
        QString text;
        Ranges sentences;
    };
    const Case cases[] = {
        {"German z.B. before lower case; ICU's CLDR \"Test.\" is removed (a noun)", "de",
            QStringLiteral("Das ist z.B. ein Test. Zweiter Satz."), {{0, 22}, {23, 36}}},
        {"German z.B. before a capital", "de", QStringLiteral("Er kam z.B. Montag. Dann ging er."),
            {{0, 19}, {20, 33}}},
        {"German ordinal day before a month name (German orthography: \"am 1. September\")", "de",
            QStringLiteral("Ab dem 1. September gilt es. Am 9. Juni. Er wurde 3. Er ging."),
            {{0, 28}, {29, 40}, {41, 52}, {53, 61}}},
        {"German spaced z. B.", "de", QStringLiteral("Er kam z. B. Montag. Dann ging er."),
            {{0, 20}, {21, 34}}},
        {"German d. h. and usw.", "de",
            QStringLiteral("Wir bleiben, d. h. Peter und Anna usw. Alle kommen."), {{0, 51}}},
        {"Austrian German uses the German list", "de-AT",
            QStringLiteral("Er kam z.B. Montag. Dann ging er."), {{0, 19}, {20, 33}}},
        {"English has no z.B.: whole-word match, not the ICU list's \"B.\"", "en",
            QStringLiteral("Er kam z.B. Montag. Dann ging er."), {{0, 11}, {12, 19}, {20, 33}}},
        {"Dutch bijv.", "nl",
            QStringLiteral("Neem bijv. Amsterdam als voorbeeld. Dat is duidelijk."),
            {{0, 35}, {36, 53}}},
        {"English has no bijv.", "en",
            QStringLiteral("Neem bijv. Amsterdam als voorbeeld. Dat is duidelijk."),
            {{0, 10}, {11, 35}, {36, 53}}},
        {"Dutch ca. does not match the end of Rica.", "nl",
            QStringLiteral("Ze woont in Costa Rica. Daarna vertrok ze."), {{0, 23}, {24, 42}}},
        {"Dutch capitalised Dhr. at sentence start", "nl",
            QStringLiteral("Dhr. Jansen kwam. Hij ging zitten."), {{0, 17}, {18, 34}}},
        {"Dutch d.w.z. and o.a.", "nl",
            QStringLiteral("Er waren o.a. Piet en Klaas, d.w.z. Twee man. Klaar."),
            {{0, 45}, {46, 52}}},
        {"English Dr. after an opening bracket", "en",
            QStringLiteral("(Dr. Smith arrived.) He sat."), {{0, 20}, {21, 28}}},
        {"English Dr. followed by two spaces", "en", QStringLiteral("Dr.  Smith arrived."),
            {{0, 19}}},
        {"English e.g. and Mrs.", "en",
            QStringLiteral("Some came, e.g. Mrs. Jones. Others did not."), {{0, 27}, {28, 43}}},
        {"empty tag means English", "", QStringLiteral("Dr. Smith arrived. He sat."),
            {{0, 18}, {19, 26}}},
        {"German: ICU's \"Max.\" removed, it is a name", "de",
            QStringLiteral("Er heißt Max. Er ist hier."), {{0, 13}, {14, 26}}},
        {"German: ICU-only entry zzgl. still applies", "de",
            QStringLiteral("Das kostet zzgl. Steuern viel. Gut."), {{0, 30}, {31, 35}}},
        {"English: ICU's \"Joe.\" removed, it is a name", "en",
            QStringLiteral("I met Joe. He left."), {{0, 10}, {11, 19}}},
        {"English: ICU's \"OK.\" removed", "en", QStringLiteral("It's OK. Then we left."),
            {{0, 8}, {9, 22}}},
        {"English: ICU's \"I.\" removed (roman numeral)", "en",
            QStringLiteral("World War I. Then peace came."), {{0, 12}, {13, 29}}},
        {"English: ICU-only entry Capt. still applies", "en",
            QStringLiteral("Capt. Smith came. He sat."), {{0, 17}, {18, 25}}},
        {"question and exclamation marks always end a sentence", "en",
            QStringLiteral("Is it Dr? Yes! Fine."), {{0, 9}, {10, 14}, {15, 20}}},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        const Segmentation s = segment(c.text, QString::fromLatin1(c.language));
        CAPTURE(texts(c.text, s.sentences));
        CHECK(s.sentences == c.sentences);
    }
}

TEST_CASE("abbreviation lists do not depend on the process locale")
{
    // ICU's own filter builder would load the default locale's list for a language ICU has
    // none for; German "z.B." must not leak into Polish because the process runs in German.
    UErrorCode status = U_ZERO_ERROR;
    const icu::Locale previous = icu::Locale::getDefault();
    icu::Locale::setDefault(icu::Locale("de_DE"), status);
    REQUIRE(U_SUCCESS(status));
    const QString text = QStringLiteral("Er kam z.B. Montag. Dann ging er.");
    const Result<Segmentation> polish = segmentText(text, QStringLiteral("pl"));
    icu::Locale::setDefault(previous, status);
    REQUIRE(polish.has_value());
    CHECK(polish->sentences == Ranges {{0, 11}, {12, 19}, {20, 33}});
}

TEST_CASE("paragraphs are blocks between blank lines, trimmed; sentences stay inside them")
{
    // "  First para.\n\n \t \nSecond one\nstill second.  \n\n\n  Third.\n"
    //  0 2         13   15  19        29            43   46   50     56
    const QString text =
        QStringLiteral("  First para.\n\n \t \nSecond one\nstill second.  \n\n\n  Third.\n");
    const Segmentation s = segment(text, QStringLiteral("en"));
    CHECK(s.paragraphs == Ranges {{2, 13}, {19, 43}, {50, 56}});
    // A single LF inside a paragraph reads as a space: one sentence across the line break.
    CHECK(s.sentences == Ranges {{2, 13}, {19, 43}, {50, 56}});

    const QString noStop = QStringLiteral("No full stop here\n\nNext para.");
    const Segmentation t = segment(noStop, QStringLiteral("en"));
    CHECK(t.paragraphs == Ranges {{0, 17}, {19, 29}});
    CHECK(t.sentences == Ranges {{0, 17}, {19, 29}});

    // Hard-wrapped text: the LF after "Dr." does not end the sentence (UAX #29 SB4 would).
    const QString wrapped = QStringLiteral("He met Dr.\nSmith today.\nThen he left.");
    const Segmentation w = segment(wrapped, QStringLiteral("en"));
    CHECK(w.paragraphs == Ranges {{0, 37}});
    CHECK(w.sentences == Ranges {{0, 23}, {24, 37}});

    CHECK(segment(QString(), QStringLiteral("en")).paragraphs.empty());
    const Segmentation blank = segment(QStringLiteral(" \n\n\t\n"), QStringLiteral("en"));
    CHECK(blank.paragraphs.empty());
    CHECK(blank.sentences.empty());
    CHECK(blank.tokens.empty());
}

TEST_CASE("tokens of emoji, flags, ZWJ sequences and scripts, in code points")
{
    // UAX #29: WB4 keeps Extend (VS16) with its base, WB3c keeps ZWJ + pictographic together
    // (family emoji), WB15/WB16 pair regional indicators (flags), WB6/WB7 join letters across
    // an apostrophe, WB11/WB12 join digits across a full stop.
    struct Case {
        const char *name;
        const char *language;
        QString text;
        Ranges sentences;
        QStringList tokens;
        Ranges tokenRanges; // empty: not checked
    };
    const Case cases[] = {
        {"emoji", "en", QStringLiteral("I ❤\uFE0F 👨‍👩‍👧 🇳🇱."), {{0, 14}},
            {QStringLiteral("I"), QStringLiteral("❤\uFE0F"), QStringLiteral("👨‍👩‍👧"),
                QStringLiteral("🇳🇱"), QStringLiteral(".")},
            {{0, 1}, {2, 4}, {5, 10}, {11, 13}, {13, 14}}},
        {"emoji before sentences: code points, not UTF-16", "en", QStringLiteral("😀 Hi. 😀 Yo."),
            {{0, 5}, {6, 11}}, {QStringLiteral("😀"), "Hi", ".", QStringLiteral("😀"), "Yo", "."},
            {{0, 1}, {2, 4}, {4, 5}, {6, 7}, {8, 10}, {10, 11}}},
        {"Hebrew", "he", QStringLiteral("שלום עולם. מה שלומך?"), {{0, 10}, {11, 20}},
            {QStringLiteral("שלום"), QStringLiteral("עולם"), ".", QStringLiteral("מה"),
                QStringLiteral("שלומך"), "?"},
            {{0, 4}, {5, 9}, {9, 10}, {11, 13}, {14, 19}, {19, 20}}},
        {"Arabic with ARABIC QUESTION MARK", "ar", QStringLiteral("مرحبا بالعالم. كيف حالك؟"),
            {{0, 14}, {15, 24}},
            {QStringLiteral("مرحبا"), QStringLiteral("بالعالم"), ".", QStringLiteral("كيف"),
                QStringLiteral("حالك"), QStringLiteral("؟")},
            {{0, 5}, {6, 13}, {13, 14}, {15, 18}, {19, 23}, {23, 24}}},
        {"apostrophe, decimal number, hyphen", "en", QStringLiteral("It's 3.5 million, e-mail."),
            {{0, 25}}, {"It's", "3.5", "million", ",", "e", "-", "mail", "."},
            {{0, 4}, {5, 8}, {9, 16}, {16, 17}, {18, 19}, {19, 20}, {20, 24}, {24, 25}}},
        {"German z.B is one word, its last full stop a token", "de",
            QStringLiteral("Das ist z.B. ein Test. Zweiter Satz."), {{0, 22}, {23, 36}},
            {"Das", "ist", "z.B", ".", "ein", "Test", ".", "Zweiter", "Satz", "."}, {}},
        {"zero width space is not a token", "en", QStringLiteral("a\u200Bb c"), {{0, 5}},
            {"a", "b", "c"}, {{0, 1}, {2, 3}, {4, 5}}},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        const Segmentation s = segment(c.text, QString::fromLatin1(c.language));
        CHECK(s.sentences == c.sentences);
        CHECK(texts(c.text, s.tokens) == c.tokens);
        if (!c.tokenRanges.empty())
            CHECK(s.tokens == c.tokenRanges);
    }
}

TEST_CASE("segmentation of canonicalised NFD text counts composed characters")
{
    // UAX #15: "Cafe" + U+0301 is "Café" (4 code points) in NFC.
    const QString text = canonicalText(QStringLiteral("Cafe\u0301 au lait.\r\nBon."));
    REQUIRE(text == QStringLiteral("Café au lait.\nBon."));
    const Segmentation s = segment(text, QStringLiteral("fr"));
    CHECK(s.tokens.front() == TextRange {0, 4});
    CHECK(s.sentences == Ranges {{0, 13}, {14, 18}});
}

TEST_CASE("segmentText refuses a malformed language tag")
{
    for (const char *tag : {"en_US", "!!", "en-", "toolonglanguage", "en US"}) {
        CAPTURE(tag);
        const Result<Segmentation> s =
            segmentText(QStringLiteral("Hello."), QString::fromLatin1(tag));
        REQUIRE_FALSE(s.has_value());
        CHECK(s.error().code == ErrorCode::InvalidArgument);
        CHECK(s.error().message.contains(QString::fromLatin1(tag)));
    }
    // Well-formed tags ICU has no data for segment with the root rules.
    CHECK(segmentText(QStringLiteral("Hi. Yo."), QStringLiteral("zz")).value().sentences
        == Ranges {{0, 3}, {4, 7}});
    CHECK(segmentText(QStringLiteral("Hi. Yo."), QStringLiteral("EN-gb")).has_value());
}

TEST_CASE("grapheme boundaries follow UAX #29 extended grapheme clusters")
{
    // GB9: Extend (U+0301) stays with its base; GB11: emoji ZWJ emoji is one cluster;
    // GB12/GB13: regional indicators pair up; GB3: CR LF is one cluster.
    struct Case {
        const char *name;
        QString text;
        std::vector<qint64> boundaries;
    };
    const Case cases[] = {
        {"empty", QString(), {0}},
        {"mixed", QStringLiteral("ax\u0301👨‍👩‍👧🇳🇱🇩🇪b"),
            {0, 1, 3, 8, 10, 12, 13}},
        {"CR LF", QStringLiteral("a\r\nb"), {0, 1, 3, 4}},
        {"skin tone modifier", QStringLiteral("👍🏽!"), {0, 2, 3}},
        {"Hangul syllable + Hebrew with point", QStringLiteral("\uAC01\u05D1\u05BC"), {0, 1, 3}},
    };
    for (const Case &c : cases) {
        CAPTURE(c.name);
        CHECK(graphemeBoundaries(c.text) == c.boundaries);
    }

    const QString text = QStringLiteral("ax\u0301👨‍👩‍👧🇳🇱🇩🇪b");
    CHECK(snapToGraphemes(text, {4, 5}) == TextRange {3, 8});
    CHECK(snapToGraphemes(text, {2, 2}) == TextRange {1, 3});
    CHECK(snapToGraphemes(text, {9, 11}) == TextRange {8, 12});
    CHECK(snapToGraphemes(text, {3, 8}) == TextRange {3, 8});
    CHECK(snapToGraphemes(text, {0, 13}) == TextRange {0, 13});
    CHECK(snapToGraphemes(text, {5, 20}) == TextRange {-1, -1});
    CHECK(snapToGraphemes(text, {3, 2}) == TextRange {-1, -1});
}

TEST_CASE("snapToWords widens to whole tokens and trims whitespace")
{
    const QString text = QStringLiteral("Dr. Smith arrived. He sat.");
    const Segmentation s = segment(text, QStringLiteral("en"));
    CHECK(snapToWords(text, s, {5, 7}) == TextRange {4, 9}); // inside "Smith"
    CHECK(snapToWords(text, s, {3, 12}) == TextRange {4, 17}); // " Smith ar"
    CHECK(snapToWords(text, s, {8, 20}) == TextRange {4, 21}); // "th arrived. He"
    CHECK(snapToWords(text, s, {2, 3}) == TextRange {2, 3}); // "."
    CHECK(snapToWords(text, s, {3, 4}) == TextRange {3, 4}); // a space: no token touched
    CHECK(snapToWords(text, s, {6, 6}) == TextRange {4, 9}); // caret inside "Smith"
    CHECK(snapToWords(text, s, {3, 3}) == TextRange {3, 3}); // caret on a space
    CHECK(snapToWords(text, s, {0, 26}) == TextRange {0, 26});
    CHECK(snapToWords(text, s, {-1, 2}) == TextRange {-1, -1});
    CHECK(snapToWords(text, s, {20, 27}) == TextRange {-1, -1});

    const QString emoji = QStringLiteral("Hi 👨‍👩‍👧 there");
    const Segmentation e = segment(emoji, QStringLiteral("en"));
    CHECK(e.tokens == Ranges {{0, 2}, {3, 8}, {9, 14}});
    CHECK(snapToWords(emoji, e, {4, 5}) == TextRange {3, 8});
    CHECK(snapToWords(emoji, e, {1, 4}) == TextRange {0, 8});
}

TEST_CASE("segmentation invariants hold on random texts")
{
    // Properties from the contract: paragraphs, sentences and tokens are sorted, disjoint,
    // non-empty and trimmed; each sentence lies in one paragraph and each token in one
    // sentence; every visible code point is in a token; token ends are grapheme boundaries
    // (UAX #29 §6.2: word boundaries never split a grapheme cluster).
    const QString pool[] = {"Dr.", "Mr.", "z.B.", "z.", "B.", "bijv.", "ca.", "Rica.", "word",
        "Word", "3.5", "it's", "e-mail", ",", ".", "!", "?", "(", ")", "\"", "...", " ", " ", " ",
        " ", "\n", "\n\n", "\n \n", "  ", "\t", "😀", "👨‍👩‍👧", "🇳🇱", "❤\uFE0F", "שלום",
        "مرحبا", "Café", "x\u0301", "中文", "U.S.", "Nr.", "usw.", "e.g.", "Sen."};
    const char *languages[] = {"en", "de", "nl", "fr", "he"};
    std::mt19937 rng(2024);
    std::uniform_int_distribution<size_t> pick(0, std::size(pool) - 1);
    std::uniform_int_distribution<size_t> pickLanguage(0, std::size(languages) - 1);
    std::uniform_int_distribution<int> length(0, 60);

    auto isSpace = [](const QString &text, qint64 cp, const OffsetMap &map) {
        return u_isUWhiteSpace(text.at(map.utf16FromCodePoint(cp)).unicode());
    };
    auto checkSortedTrimmed = [&](const Ranges &ranges, const QString &text, const OffsetMap &map) {
        for (size_t i = 0; i < ranges.size(); ++i) {
            CHECK(ranges[i].start < ranges[i].end);
            CHECK(ranges[i].end <= map.codePointCount());
            if (i > 0)
                CHECK(ranges[i - 1].end <= ranges[i].start);
        }
        for (const TextRange &r : ranges) {
            CHECK_FALSE(isSpace(text, r.start, map));
            CHECK_FALSE(isSpace(text, r.end - 1, map));
        }
    };
    auto inOne = [](const TextRange &r, const Ranges &outer) {
        return std::count_if(outer.begin(), outer.end(), [&](const TextRange &o) {
            return o.contains(r);
        }) == 1;
    };

    for (int round = 0; round < 400; ++round) {
        QString text;
        for (int i = length(rng); i > 0; --i)
            text += pool[pick(rng)];
        text = canonicalText(text);
        const QString language = QString::fromLatin1(languages[pickLanguage(rng)]);
        CAPTURE(text, language);
        const Segmentation s = segment(text, language);
        const OffsetMap map(text);

        checkSortedTrimmed(s.paragraphs, text, map);
        checkSortedTrimmed(s.sentences, text, map);
        for (const TextRange &sentence : s.sentences)
            CHECK(inOne(sentence, s.paragraphs));
        for (const TextRange &token : s.tokens)
            CHECK(inOne(token, s.sentences));
        for (size_t i = 1; i < s.tokens.size(); ++i)
            CHECK(s.tokens[i - 1].end <= s.tokens[i].start);

        // Between two paragraphs there is a blank line; inside one there is none.
        for (size_t i = 1; i < s.paragraphs.size(); ++i) {
            const QString gap =
                OffsetMap::slice(text, {s.paragraphs[i - 1].end, s.paragraphs[i].start});
            CHECK(gap.trimmed().isEmpty());
            CHECK(gap.count(QLatin1Char('\n')) >= 2);
        }
        for (const TextRange &p : s.paragraphs) {
            const QStringList lines = OffsetMap::slice(text, p).split(QLatin1Char('\n'));
            for (const QString &line : lines)
                CHECK_FALSE(line.trimmed().isEmpty());
        }

        // Coverage: outside tokens there is only whitespace.
        std::vector<bool> covered(size_t(map.codePointCount()), false);
        for (const TextRange &token : s.tokens)
            for (qint64 cp = token.start; cp < token.end; ++cp)
                covered[size_t(cp)] = true;
        for (qint64 cp = 0; cp < map.codePointCount(); ++cp) {
            if (!covered[size_t(cp)])
                CHECK(isSpace(text, cp, map));
        }

        const std::vector<qint64> graphemes = graphemeBoundaries(text);
        for (const TextRange &token : s.tokens) {
            CHECK(std::binary_search(graphemes.begin(), graphemes.end(), token.start));
            CHECK(std::binary_search(graphemes.begin(), graphemes.end(), token.end));
        }

        // Deterministic: the cached iterators give the same result again.
        const Segmentation again = segment(text, language);
        CHECK(again.paragraphs == s.paragraphs);
        CHECK(again.sentences == s.sentences);
        CHECK(again.tokens == s.tokens);
    }
}
