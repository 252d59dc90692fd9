#include "core/text/segmenter.h"

#include "core/text/abbreviations.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QSet>

#include <unicode/brkiter.h>
#include <unicode/locid.h>
#include <unicode/uchar.h>
#include <unicode/utext.h>

#include <algorithm>
#include <array>
#include <limits>
#include <memory>
#include <string>
#include <string_view>
#include <unordered_map>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct SegmenterText {
    Q_DECLARE_TR_FUNCTIONS(SegmenterText)
};

// Unicode White_Space; every such character is in the BMP, so testing UTF-16 units is exact.
bool isSpace(char16_t c)
{
    return u_isUWhiteSpace(c);
}

// Characters that carry no visible text of their own: White_Space and Default_Ignorable_Code_Point
// (ZERO WIDTH SPACE, joiners, variation selectors, BOM).
bool isInvisible(UChar32 c)
{
    return u_isUWhiteSpace(c) || u_hasBinaryProperty(c, UCHAR_DEFAULT_IGNORABLE_CODE_POINT);
}

// Points `iterator` at s[0, length) without copying; the iterator keeps a shallow clone of the
// UText, so `s` must outlive the iteration.
void setText(icu::BreakIterator &iterator, const char16_t *s, qsizetype length, UErrorCode &status)
{
    UText text = UTEXT_INITIALIZER;
    utext_openUChars(&text, s, static_cast<int64_t>(length), &status);
    iterator.setText(&text, status);
    utext_close(&text);
}

// The break iterators and abbreviation list of one language. Built once per thread and language
// (creating ICU iterators costs far more than segmenting a 5 KB article) and used by one thread
// only, so no locking is needed.
struct LanguageSegmenters {
    std::unique_ptr<icu::BreakIterator> sentence;
    std::unique_ptr<icu::BreakIterator> word;
    QSet<QString> abbreviations;
    QSet<QString> monthsAfterOrdinal;
};

LanguageSegmenters *segmentersFor(const icu::Locale &locale, UErrorCode &status)
{
    thread_local std::unordered_map<std::string, std::unique_ptr<LanguageSegmenters>> cache;
    const std::string key = locale.getBaseName();
    if (auto it = cache.find(key); it != cache.end())
        return it->second.get();
    auto entry = std::make_unique<LanguageSegmenters>();
    entry->sentence.reset(icu::BreakIterator::createSentenceInstance(locale, status));
    entry->word.reset(icu::BreakIterator::createWordInstance(locale, status));
    if (U_FAILURE(status) || !entry->sentence || !entry->word)
        return nullptr;
    entry->abbreviations = sentenceAbbreviations(locale.getBaseName());
    entry->monthsAfterOrdinal = monthsAfterOrdinal(locale.getBaseName());
    // A project has a handful of languages; the bound only guards against a caller cycling
    // through many tags.
    if (cache.size() >= 32)
        cache.clear();
    return cache.emplace(key, std::move(entry)).first->second.get();
}

icu::BreakIterator *graphemeIterator()
{
    // Grapheme clusters (UAX #29 §3) do not depend on the language.
    thread_local std::unique_ptr<icu::BreakIterator> iterator = [] {
        UErrorCode status = U_ZERO_ERROR;
        std::unique_ptr<icu::BreakIterator> it(
            icu::BreakIterator::createCharacterInstance(icu::Locale::getRoot(), status));
        if (U_FAILURE(status))
            it.reset();
        return it;
    }();
    return iterator.get();
}

// Whether the break ICU proposes at `at` in paragraph `p` follows an abbreviation. Unlike ICU's
// FilteredBreakIterator this matches whole whitespace-separated words only (so "ca." does not
// match the end of "Costa Rica."), skips any amount of whitespace, and joins up to four words so
// that spaced forms ("z. B.", "v. u. Z.") match their entry "z.B.". The first word may carry
// opening punctuation ("(Dr."); a word after the break may carry trailing punctuation ("B.,").
bool followsAbbreviation(std::u16string_view p, qsizetype at, const QSet<QString> &abbreviations)
{
    const auto n = static_cast<qsizetype>(p.size());
    qsizetype end = at;
    while (end > 0 && isSpace(p[end - 1]))
        --end;
    if (end == 0 || p[end - 1] != u'.')
        return false;

    // Up to three words before the break (before[0] is the nearest) and two after it.
    std::array<std::u16string_view, 3> before;
    int beforeCount = 0;
    while (beforeCount < 3 && end > 0) {
        qsizetype start = end;
        while (start > 0 && !isSpace(p[start - 1]))
            --start;
        before[beforeCount++] = p.substr(start, end - start);
        end = start;
        while (end > 0 && isSpace(p[end - 1]))
            --end;
    }
    std::array<std::u16string_view, 2> after;
    int afterCount = 0;
    for (qsizetype pos = at; afterCount < 2;) {
        while (pos < n && isSpace(p[pos]))
            ++pos;
        if (pos == n)
            break;
        const qsizetype start = pos;
        while (pos < n && !isSpace(p[pos]))
            ++pos;
        after[afterCount++] = p.substr(start, pos - start);
    }

    QString candidate;
    for (int k = 1; k <= beforeCount; ++k) {
        for (int m = 0; m <= afterCount && k + m <= 4; ++m) {
            candidate.clear();
            bool wellFormed = true;
            for (int w = k - 1; w >= 0 && wellFormed; --w) {
                std::u16string_view word = before[w];
                if (w == k - 1) {
                    while (!word.empty() && !u_isalnum(word.front()))
                        word.remove_prefix(1);
                }
                wellFormed = !word.empty() && word.back() == u'.';
                candidate.append(QStringView(word));
            }
            for (int w = 0; w < m && wellFormed; ++w) {
                std::u16string_view word = after[w];
                if (w == m - 1) {
                    const auto lastStop = word.rfind(u'.');
                    word = lastStop == std::u16string_view::npos ? std::u16string_view()
                                                                 : word.substr(0, lastStop + 1);
                }
                wellFormed = !word.empty() && word.back() == u'.';
                candidate.append(QStringView(word));
            }
            if (wellFormed && abbreviations.contains(candidate))
                return true;
        }
    }
    return false;
}

// Whether the break at `at` follows a day number written as an ordinal ("1.", "31.") that a
// month name follows ("am 1. September"): German dates, where the full stop marks the ordinal.
bool followsOrdinalBeforeMonth(std::u16string_view p, qsizetype at, const QSet<QString> &months)
{
    if (months.isEmpty())
        return false;
    const auto n = static_cast<qsizetype>(p.size());
    qsizetype end = at;
    while (end > 0 && isSpace(p[end - 1]))
        --end;
    if (end < 2 || p[end - 1] != u'.')
        return false;
    qsizetype digits = 0;
    while (end - 1 - digits > 0 && u_isdigit(p[end - 2 - digits]))
        ++digits;
    if (digits == 0 || digits > 2)
        return false;
    const qsizetype wordStart = end - 1 - digits;
    if (wordStart > 0 && !isSpace(p[wordStart - 1]) && p[wordStart - 1] != u'(')
        return false;
    qsizetype pos = at;
    while (pos < n && isSpace(p[pos]))
        ++pos;
    qsizetype wordEnd = pos;
    while (wordEnd < n && (u_isalpha(p[wordEnd]) || p[wordEnd] == u'.'))
        ++wordEnd;
    QString next = QStringView(p.substr(pos, wordEnd - pos)).toString();
    if (months.contains(next))
        return true;
    // "September." at a sentence end still names the month.
    if (next.endsWith(QLatin1Char('.')))
        next.chop(1);
    return months.contains(next);
}

// Trims White_Space from both ends of s[start, end); the result is empty if nothing else is left.
std::pair<qsizetype, qsizetype> trimmed(const char16_t *s, qsizetype start, qsizetype end)
{
    while (start < end && isSpace(s[start]))
        ++start;
    while (end > start && isSpace(s[end - 1]))
        --end;
    return {start, end};
}

// Paragraphs in UTF-16: maximal runs of non-blank lines, trimmed.
std::vector<std::pair<qsizetype, qsizetype>> paragraphs16(const char16_t *s, qsizetype n)
{
    std::vector<std::pair<qsizetype, qsizetype>> result;
    qsizetype blockStart = -1;
    qsizetype blockEnd = -1;
    for (qsizetype lineStart = 0; lineStart <= n;) {
        qsizetype lineEnd = lineStart;
        while (lineEnd < n && s[lineEnd] != u'\n')
            ++lineEnd;
        const auto [first, last] = trimmed(s, lineStart, lineEnd);
        if (first < last) {
            if (blockStart < 0)
                blockStart = first;
            blockEnd = last;
        } else if (blockStart >= 0) {
            result.emplace_back(blockStart, blockEnd);
            blockStart = -1;
        }
        lineStart = lineEnd + 1;
    }
    if (blockStart >= 0)
        result.emplace_back(blockStart, blockEnd);
    return result;
}

bool isInvisibleSegment(const char16_t *s, qsizetype start, qsizetype end)
{
    for (qsizetype i = start; i < end;) {
        UChar32 c = s[i++];
        if (U16_IS_LEAD(c) && i < end && U16_IS_TRAIL(s[i]))
            c = U16_GET_SUPPLEMENTARY(c, s[i++]);
        if (!isInvisible(c))
            return false;
    }
    return true;
}

} // namespace

Result<Segmentation> segmentText(const QString &text, const QString &languageTag)
{
    if (text.size() > std::numeric_limits<int32_t>::max()) {
        return fail(ErrorCode::InvalidArgument,
            SegmenterText::tr(
                "The text is too long to segment (more than 2^31 UTF-16 code units)."));
    }
    const QString tag = languageTag.trimmed().isEmpty() ? QStringLiteral("en") : languageTag;
    UErrorCode status = U_ZERO_ERROR;
    const icu::Locale parsed = icu::Locale::forLanguageTag(tag.toStdString(), status);
    if (U_FAILURE(status) || parsed.isBogus()) {
        return fail(ErrorCode::InvalidArgument,
            SegmenterText::tr(
                "\"%1\" is not a valid BCP 47 language tag (for example \"en\", \"nl\" "
                "or \"de-AT\").")
                .arg(languageTag),
            QString::fromLatin1(u_errorName(status)));
    }
    // Only language, script and region: a "-u-ss-" keyword would make ICU apply its own
    // abbreviation filter on top of ours.
    const icu::Locale locale(parsed.getBaseName());
    status = U_ZERO_ERROR;
    LanguageSegmenters *segmenters = segmentersFor(locale, status);
    if (segmenters == nullptr) {
        return fail(ErrorCode::Internal,
            SegmenterText::tr("ICU could not create its break iterators for \"%1\".")
                .arg(languageTag),
            QString::fromLatin1(u_errorName(status)));
    }

    const auto *s = reinterpret_cast<const char16_t *>(text.utf16());
    const qsizetype n = text.size();
    // Sentences and words see a single line break inside a paragraph as a space: hard-wrapped
    // text is one flow, while ICU would end a sentence at every LF (UAX #29 SB4).
    std::u16string flowing(s, static_cast<size_t>(n));
    std::replace(flowing.begin(), flowing.end(), u'\n', u' ');
    const char16_t *f = flowing.data();

    const OffsetMap map(text);
    Segmentation result;
    // Rough sizes of news prose (common practice: ~6 characters a token, ~100 a sentence), to
    // spare most reallocations.
    result.tokens.reserve(static_cast<size_t>(n / 6));
    result.sentences.reserve(static_cast<size_t>(n / 100));
    icu::BreakIterator &sentenceIt = *segmenters->sentence;
    icu::BreakIterator &wordIt = *segmenters->word;

    for (const auto &[paraStart, paraEnd] : paragraphs16(s, n)) {
        result.paragraphs.push_back(map.codePointRange(Utf16Range {paraStart, paraEnd}));

        const std::u16string_view paragraph(
            f + paraStart, static_cast<size_t>(paraEnd - paraStart));
        setText(sentenceIt, paragraph.data(), static_cast<qsizetype>(paragraph.size()), status);
        qsizetype sentenceStart = 0;
        for (int32_t boundary = sentenceIt.next(); boundary != icu::BreakIterator::DONE;
             boundary = sentenceIt.next()) {
            if (boundary < static_cast<qsizetype>(paragraph.size())
                && (followsAbbreviation(paragraph, boundary, segmenters->abbreviations)
                    || followsOrdinalBeforeMonth(
                        paragraph, boundary, segmenters->monthsAfterOrdinal)))
                continue;
            const auto [start, end] = trimmed(f, paraStart + sentenceStart, paraStart + boundary);
            sentenceStart = boundary;
            if (start == end)
                continue;
            result.sentences.push_back(map.codePointRange(Utf16Range {start, end}));

            // Words per sentence, so that no token can cross a sentence boundary.
            setText(wordIt, f + start, end - start, status);
            int32_t wordStart = 0;
            for (int32_t wordEnd = wordIt.next(); wordEnd != icu::BreakIterator::DONE;
                 wordEnd = wordIt.next()) {
                if (!isInvisibleSegment(f, start + wordStart, start + wordEnd)) {
                    result.tokens.push_back(
                        map.codePointRange(Utf16Range {start + wordStart, start + wordEnd}));
                }
                wordStart = wordEnd;
            }
        }
    }
    if (U_FAILURE(status)) {
        return fail(ErrorCode::Internal, SegmenterText::tr("ICU could not segment the text."),
            QString::fromLatin1(u_errorName(status)));
    }
    return result;
}

std::vector<qint64> graphemeBoundaries(const QString &text)
{
    const OffsetMap map(text);
    std::vector<qint64> result;
    icu::BreakIterator *it = graphemeIterator();
    UErrorCode status = U_ZERO_ERROR;
    if (it != nullptr)
        setText(*it, reinterpret_cast<const char16_t *>(text.utf16()), text.size(), status);
    if (it == nullptr || U_FAILURE(status)) {
        // Without ICU's data every code point boundary is the best we can offer.
        for (qint64 cp = 0; cp <= map.codePointCount(); ++cp)
            result.push_back(cp);
        return result;
    }
    result.push_back(0);
    for (int32_t b = it->next(); b != icu::BreakIterator::DONE; b = it->next())
        result.push_back(map.codePointFromUtf16(b));
    if (result.back() != map.codePointCount())
        result.push_back(map.codePointCount());
    return result;
}

TextRange snapToGraphemes(const QString &text, const TextRange &range)
{
    const OffsetMap map(text);
    const Utf16Range range16 = map.utf16Range(range);
    if (range16.start < 0)
        return {-1, -1};
    icu::BreakIterator *it = graphemeIterator();
    UErrorCode status = U_ZERO_ERROR;
    if (it == nullptr)
        return range;
    setText(*it, reinterpret_cast<const char16_t *>(text.utf16()), text.size(), status);
    if (U_FAILURE(status))
        return range;
    auto start = static_cast<int32_t>(range16.start);
    auto end = static_cast<int32_t>(range16.end);
    if (!it->isBoundary(start))
        start = it->preceding(start);
    if (!it->isBoundary(end))
        end = it->following(end);
    return map.codePointRange(Utf16Range {start, end});
}

TextRange snapToWords(const QString &text, const Segmentation &segmentation, const TextRange &range)
{
    const OffsetMap map(text);
    if (!range.isValid() || range.end > map.codePointCount())
        return {-1, -1};
    const std::vector<TextRange> &tokens = segmentation.tokens;
    // First token that ends after range.start; tokens are sorted and do not overlap.
    auto it = std::upper_bound(tokens.begin(), tokens.end(), range.start,
        [](qint64 pos, const TextRange &t) { return pos < t.end; });
    TextRange widened = range;
    bool touched = false;
    for (; it != tokens.end(); ++it) {
        const bool touches = range.isEmpty() ? it->contains(range.start) : it->overlaps(range);
        if (!touches)
            break;
        widened.start = std::min(widened.start, it->start);
        widened.end = std::max(widened.end, it->end);
        touched = true;
    }
    if (!touched)
        return snapToGraphemes(text, range);

    const auto *s = reinterpret_cast<const char16_t *>(text.utf16());
    // Code point boundaries that start with White_Space are BMP characters, so one unit suffices.
    auto spaceAt = [&](qint64 cp) { return isSpace(s[map.utf16FromCodePoint(cp)]); };
    while (widened.start < widened.end && spaceAt(widened.start))
        ++widened.start;
    while (widened.end > widened.start && spaceAt(widened.end - 1))
        --widened.end;
    return snapToGraphemes(text, widened);
}

} // namespace fourfold
