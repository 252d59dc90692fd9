// Word shingles, MinHash and LSH banding (Broder 1997; Leskovec, Rajaraman and Ullman, Mining of
// Massive Datasets §3.4): the estimate against the exact Jaccard similarity of the shingle sets,
// computed here independently (tests/text/near_copy_texts.h), within the standard error the
// README states, sqrt(J (1 - J) / 128).
#include "core/text/minhash.h"
#include "core/text/near_copy_index.h"
#include "tests/support/test_support.h"
#include "tests/text/near_copy_texts.h"

#include <cmath>

using namespace fourfold;
using namespace fourfold::test;

namespace {

double standardError(double jaccard)
{
    return std::sqrt(jaccard * (1.0 - jaccard) / kMinHashPermutations);
}

} // namespace

TEST_CASE("Words are runs of letters and digits case-folded and punctuation only separates them")
{
    // Same words, other case, punctuation and line breaks: one shingle set.
    CHECK(shingleHashes(QStringLiteral("The Minister said: rates rise, again.\n\nToday"))
        == shingleHashes(QStringLiteral("the minister said rates rise again today")));
    CHECK(shingleHashes(QStringLiteral("ÉTÉ in KÖLN 2024"))
        == shingleHashes(QStringLiteral("été in köln 2024")));
    // Seven words give three 5-word shingles; three words one shingle; no word none.
    CHECK(shingleHashes(QStringLiteral("a b c d e f g")).size() == 3);
    CHECK(shingleHashes(QStringLiteral("a b a b a b a")).size() == 2);
    CHECK(shingleHashes(QStringLiteral("one two three")).size() == 1);
    CHECK(shingleHashes(QStringLiteral(" .,;! ")).empty());
    CHECK(minHashSignature(QStringLiteral("—")).empty);
    // Order matters inside a shingle.
    CHECK(shingleHashes(QStringLiteral("a b c d e")) != shingleHashes(QStringLiteral("e d c b a")));
}

TEST_CASE("The MinHash estimate lies within three standard errors of the exact Jaccard")
{
    // 40 pairs over the whole range of similarity: copies with 0% to 60% of their words changed
    // at scattered places or in runs, and reordered paragraphs.
    int pairs = 0;
    double sumSquaredZ = 0.0;
    for (unsigned v = 1; v <= 40; ++v) {
        const QString original = inventedArticle(int(v % 3), v);
        const double fraction = double(v % 13) * 0.05;
        QString copy = withWordsChanged(original, fraction, v % 2 == 0 ? 0 : int(1 + v % 4), v);
        if (v % 5 == 0)
            copy = withParagraphsReordered(copy);
        const double exact = exactShingleJaccard(original, copy);
        const double estimate =
            estimatedJaccard(minHashSignature(original), minHashSignature(copy));
        INFO("pair " << v << ": exact " << exact << ", estimate " << estimate);
        CHECK(std::abs(estimate - exact) <= 3.0 * standardError(exact) + 1e-12);
        if (exact > 0.0 && exact < 1.0) {
            const double z = (estimate - exact) / standardError(exact);
            sumSquaredZ += z * z;
            ++pairs;
        }
    }
    // The errors are as large as the stated standard error says, not much smaller or larger
    // (root mean square of the standardised errors near 1).
    REQUIRE(pairs >= 30);
    const double rms = std::sqrt(sumSquaredZ / pairs);
    CHECK(rms > 0.5);
    CHECK(rms < 1.5);
}

TEST_CASE("Identical shingle sets give similarity 1 and disjoint ones 0")
{
    const QString a = inventedArticle(0, 1);
    CHECK(estimatedJaccard(minHashSignature(a), minHashSignature(a + QStringLiteral("\n"))) == 1.0);
    const QString b = inventedArticle(1, 2);
    CHECK(exactShingleJaccard(a, b) == 0.0);
    CHECK(estimatedJaccard(minHashSignature(a), minHashSignature(b)) < 0.05);
}

TEST_CASE("The LSH index finds planted copies and leaves other articles on the same topic out")
{
    NearCopyIndex index(0.8);
    CHECK(index.rowsPerBand() == 4); // 32 bands: 1 - (1 - 0.7^4)^32 = 0.99985
    // 300 articles on three topics.
    for (unsigned v = 0; v < 300; ++v)
        index.add(v, minHashSignature(inventedArticle(int(v % 3), v)));

    const QString original = inventedArticle(1, 31);
    // 5% of the words changed in three rewritten passages.
    const QString edited = withWordsChanged(original, 0.05, 3, 7);
    const QString reordered = withParagraphsReordered(original);
    for (const QString &copy : {edited, reordered}) {
        const auto found = index.matches(minHashSignature(copy));
        REQUIRE(found.size() == 1);
        CHECK(found.front().id == 31);
        const double exact = exactShingleJaccard(original, copy);
        CHECK(exact >= 0.8);
        CHECK(std::abs(found.front().similarity - exact) <= 3.0 * standardError(exact));
    }
    // A new article on the same topic matches nothing, and it is compared in full with few
    // candidates, not with all 300.
    const qint64 before = index.candidatesCompared();
    CHECK(index.matches(minHashSignature(inventedArticle(1, 9999))).empty());
    CHECK(index.candidatesCompared() - before < 10);
}

TEST_CASE("Words changed at scattered places lower the similarity faster than in runs")
{
    // With 5-word shingles each scattered change breaks five shingles: 5% of the words changed
    // leaves about q = 0.95^5 = 0.77 of the shingles, J = q / (2 - q) = 0.63, below the default
    // threshold; the same share changed in three runs keeps J near 0.9.
    const QString original = inventedArticle(2, 5);
    const double scattered = exactShingleJaccard(original, withWordsChanged(original, 0.05, 0, 3));
    const double inRuns = exactShingleJaccard(original, withWordsChanged(original, 0.05, 3, 3));
    CHECK(scattered > 0.55);
    CHECK(scattered < 0.72);
    CHECK(inRuns > 0.85);
    NearCopyIndex lower(0.55);
    lower.add(1, minHashSignature(original));
    CHECK(lower.matches(minHashSignature(withWordsChanged(original, 0.05, 0, 3))).size() == 1);
}
