#include "core/text/minhash.h"

#include <QChar>

#include <algorithm>

namespace fourfold {

namespace {

// SplitMix64's output function (Steele, Lea and Flood 2014), a strong 64-bit mixer.
constexpr std::uint64_t mix64(std::uint64_t z)
{
    z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
    z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
    return z ^ (z >> 31);
}

struct HashFunctions {
    std::array<std::uint64_t, kMinHashPermutations> multiplier {};
    std::array<std::uint64_t, kMinHashPermutations> addend {};
};

// The fixed multiply-shift functions: h_i(x) = (a_i x + b_i) >> 32 with odd a_i.
const HashFunctions &hashFunctions()
{
    static const HashFunctions functions = [] {
        HashFunctions f;
        std::uint64_t state = 0x4d696e4861736831ULL; // a fixed start value
        for (int i = 0; i < kMinHashPermutations; ++i) {
            state += 0x9e3779b97f4a7c15ULL;
            f.multiplier[size_t(i)] = mix64(state) | 1U;
            state += 0x9e3779b97f4a7c15ULL;
            f.addend[size_t(i)] = mix64(state);
        }
        return f;
    }();
    return functions;
}

constexpr std::uint64_t kFnvOffset = 0xcbf29ce484222325ULL;
constexpr std::uint64_t kFnvPrime = 0x100000001b3ULL;

bool isWordCodePoint(char32_t c)
{
    return QChar::isLetterOrNumber(c) || QChar::isMark(c);
}

// The hash of each word of `text`, in order.
std::vector<std::uint64_t> wordHashes(const QString &text)
{
    std::vector<std::uint64_t> words;
    std::uint64_t h = kFnvOffset;
    bool inWord = false;
    const qsizetype n = text.size();
    for (qsizetype i = 0; i < n; ++i) {
        char32_t c = text[i].unicode();
        if (QChar::isHighSurrogate(c) && i + 1 < n && text[i + 1].isLowSurrogate()) {
            c = QChar::surrogateToUcs4(text[i], text[i + 1]);
            ++i;
        }
        if (isWordCodePoint(c)) {
            const char32_t folded = QChar::toCaseFolded(c);
            h = (h ^ std::uint64_t(folded)) * kFnvPrime;
            inWord = true;
        } else if (inWord) {
            words.push_back(mix64(h));
            h = kFnvOffset;
            inWord = false;
        }
    }
    if (inWord)
        words.push_back(mix64(h));
    return words;
}

} // namespace

std::vector<std::uint64_t> shingleHashes(const QString &text)
{
    const std::vector<std::uint64_t> words = wordHashes(text);
    std::vector<std::uint64_t> shingles;
    if (words.empty())
        return shingles;
    const size_t width = std::min(words.size(), size_t(kShingleWords));
    shingles.reserve(words.size() - width + 1);
    for (size_t start = 0; start + width <= words.size(); ++start) {
        std::uint64_t h = 0;
        for (size_t k = 0; k < width; ++k)
            h = mix64(h ^ words[start + k]) + k;
        shingles.push_back(mix64(h));
    }
    std::ranges::sort(shingles);
    const auto [first, last] = std::ranges::unique(shingles);
    shingles.erase(first, last);
    return shingles;
}

MinHashSignature minHashSignature(const QString &text)
{
    MinHashSignature signature;
    signature.minima.fill(UINT32_MAX);
    const std::vector<std::uint64_t> shingles = shingleHashes(text);
    if (shingles.empty())
        return signature;
    signature.empty = false;
    const HashFunctions &f = hashFunctions();
    for (const std::uint64_t x : shingles)
        for (int i = 0; i < kMinHashPermutations; ++i) {
            const auto h = std::uint32_t((f.multiplier[size_t(i)] * x + f.addend[size_t(i)]) >> 32);
            signature.minima[size_t(i)] = std::min(signature.minima[size_t(i)], h);
        }
    return signature;
}

double estimatedJaccard(const MinHashSignature &a, const MinHashSignature &b)
{
    if (a.empty || b.empty)
        return 0.0;
    int equal = 0;
    for (int i = 0; i < kMinHashPermutations; ++i)
        equal += a.minima[size_t(i)] == b.minima[size_t(i)] ? 1 : 0;
    return double(equal) / kMinHashPermutations;
}

} // namespace fourfold
