#include "core/reliability/span_scores.h"

#include <catch2/catch.hpp>

#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <map>
#include <random>
#include <tuple>
#include <vector>

using namespace fourfold::reliability;
using Catch::Matchers::Contains;
using Catch::Matchers::WithinAbs;

namespace {

// A hand-made example with every kind of outcome (scenarios of the SemEval-2013 Task 9.1
// evaluation: same boundaries and category; same boundaries, wrong category; overlap, same
// category; overlap, wrong category; missed; spurious), plus two spans at the same place in
// different documents, which must not match.
const std::vector<LabelledSpan> kReference = {
    {0, 0, 0, 10}, // R0: predicted exactly (P0)
    {0, 1, 20, 30}, // R1: same boundaries, predicted as category 0 (P1)
    {0, 0, 40, 50}, // R2: overlapped by P2 [45, 55), same category
    {0, 1, 60, 70}, // R3: overlapped by P3 [62, 75), predicted as category 0
    {0, 1, 80, 90}, // R4: nothing predicted
    {1, 0, 0, 10}, // R5: only a prediction in document 2
};
const std::vector<LabelledSpan> kPredicted = {
    {0, 0, 0, 10}, // P0
    {0, 0, 20, 30}, // P1
    {0, 0, 45, 55}, // P2
    {0, 0, 62, 75}, // P3
    {0, 1, 100, 110}, // P4: spurious
    {2, 0, 0, 10}, // P5: spurious (document 2)
    {0, 0, 120, 125}, // P6: spurious
};

void checkCounts(const SpanCounts &c, double cor, double inc, double par, double mis, double spu)
{
    CHECK(c.correct == cor);
    CHECK(c.incorrect == inc);
    CHECK(c.partial == par);
    CHECK(c.missing == mis);
    CHECK(c.spurious == spu);
}

void checkScores(const SpanCounts &c, double p, double r, double f1)
{
    REQUIRE(c.precision);
    REQUIRE(c.recall);
    REQUIRE(c.f1);
    CHECK_THAT(*c.precision, WithinAbs(p, 1e-12));
    CHECK_THAT(*c.recall, WithinAbs(r, 1e-12));
    CHECK_THAT(*c.f1, WithinAbs(f1, 1e-12));
}

// Positive specific agreement of two coders (Hripcsak & Rothschild 2005, JAMIA 12): a = spans
// both marked identically (as multisets), b and c = the spans only one of them marked.
double positiveSpecificAgreement(
    const std::vector<LabelledSpan> &one, const std::vector<LabelledSpan> &two)
{
    using Key = std::tuple<int, int, std::int64_t, std::int64_t>;
    std::map<Key, int> countOne, countTwo;
    for (const LabelledSpan &s : one)
        ++countOne[{s.document, s.category, s.begin, s.end}];
    for (const LabelledSpan &s : two)
        ++countTwo[{s.document, s.category, s.begin, s.end}];
    double a = 0;
    for (const auto &[key, n] : countOne) {
        const auto it = countTwo.find(key);
        if (it != countTwo.end())
            a += std::min(n, it->second);
    }
    const double b = double(one.size()) - a;
    const double c = double(two.size()) - a;
    return 2 * a / (2 * a + b + c);
}

std::vector<LabelledSpan> randomSpans(std::mt19937 &rng, int count, int documents, int categories)
{
    std::uniform_int_distribution<int> doc(0, documents - 1), cat(0, categories - 1), start(0, 30),
        length(1, 8);
    std::vector<LabelledSpan> spans;
    for (int k = 0; k < count; ++k) {
        const std::int64_t b = start(rng);
        spans.push_back({doc(rng), cat(rng), b, b + length(rng)});
    }
    return spans;
}

using SpanKey = std::tuple<int, int, std::int64_t, std::int64_t>;

std::map<SpanKey, std::vector<SpanOutcome>> outcomesBySpan(
    const std::vector<LabelledSpan> &ref, const SpanScores &s)
{
    std::map<SpanKey, std::vector<SpanOutcome>> out;
    for (const SpanMatch &m : s.matches) {
        if (m.reference < 0)
            continue;
        const LabelledSpan &r = ref[std::size_t(m.reference)];
        out[{r.document, r.category, r.begin, r.end}].push_back(m.outcome);
    }
    for (auto &[key, list] : out)
        std::sort(list.begin(), list.end());
    return out;
}

} // namespace

TEST_CASE("span scores, strict: every outcome counted by hand")
{
    // Strict (SemEval-2013 Task 9.1): COR only for same boundaries and category, any other
    // matched overlap INC. R0 COR; R1, R2, R3 INC; R4, R5 MIS; P4, P5, P6 SPU.
    const SpanScores s = scoreSpans(kReference, kPredicted, 3, MatchMode::Strict);
    REQUIRE(s.inputError.empty());
    checkCounts(s.micro, 1, 3, 0, 2, 3);
    CHECK(s.micro.possible() == 6);
    CHECK(s.micro.actual() == 7);
    // P = COR/ACT, R = COR/POS (Chinchor & Sundheim 1993), F1 = 2PR/(P + R).
    checkScores(s.micro, 1.0 / 7, 1.0 / 6, 2.0 / 13);

    // Per category: COR/INC/MIS under the reference span's category, SPU under the predicted
    // span's. Category 0: R0 COR, R2 INC, R5 MIS, P5 and P6 SPU. Category 1: R1 and R3 INC (they
    // were predicted as category 0), R4 MIS, P4 SPU. Category 2: nothing.
    REQUIRE(s.perCategory.size() == 3);
    checkCounts(s.perCategory[0], 1, 1, 0, 1, 2);
    checkScores(s.perCategory[0], 1.0 / 4, 1.0 / 3, 2.0 / 7);
    checkCounts(s.perCategory[1], 0, 2, 0, 1, 1);
    checkScores(s.perCategory[1], 0, 0, 0);
    checkCounts(s.perCategory[2], 0, 0, 0, 0, 0);
    CHECK_FALSE(s.perCategory[2].precision);
    CHECK_FALSE(s.perCategory[2].recall);
    CHECK_FALSE(s.perCategory[2].f1);
    // Macro: the mean over the categories with a defined value (0 and 1; 2 has none).
    REQUIRE(s.macroPrecision);
    REQUIRE(s.macroRecall);
    REQUIRE(s.macroF1);
    CHECK_THAT(*s.macroPrecision, WithinAbs((1.0 / 4 + 0) / 2, 1e-12));
    CHECK_THAT(*s.macroRecall, WithinAbs((1.0 / 3 + 0) / 2, 1e-12));
    CHECK_THAT(*s.macroF1, WithinAbs((2.0 / 7 + 0) / 2, 1e-12));

    // The matching itself: one entry per reference span, then the unmatched predictions.
    const std::vector<std::tuple<int, int, SpanOutcome>> expected = {
        {0, 0, SpanOutcome::Correct},
        {1, 1, SpanOutcome::Incorrect},
        {2, 2, SpanOutcome::Incorrect},
        {3, 3, SpanOutcome::Incorrect},
        {4, -1, SpanOutcome::Missing},
        {5, -1, SpanOutcome::Missing},
        {-1, 4, SpanOutcome::Spurious},
        {-1, 5, SpanOutcome::Spurious},
        {-1, 6, SpanOutcome::Spurious},
    };
    REQUIRE(s.matches.size() == expected.size());
    for (std::size_t k = 0; k < expected.size(); ++k) {
        CHECK(s.matches[k].reference == std::get<0>(expected[k]));
        CHECK(s.matches[k].predicted == std::get<1>(expected[k]));
        CHECK(s.matches[k].outcome == std::get<2>(expected[k]));
    }
}

TEST_CASE("span scores, exact, partial and type: every outcome counted by hand")
{
    SECTION("exact: same boundaries are COR whatever the category")
    {
        // R0, R1 COR; R2, R3 INC; 2 MIS; 3 SPU (SemEval-2013 Task 9.1, "exact").
        const SpanScores s = scoreSpans(kReference, kPredicted, 3, MatchMode::Exact);
        checkCounts(s.micro, 2, 2, 0, 2, 3);
        checkScores(s.micro, 2.0 / 7, 2.0 / 6, 4.0 / 13);
        checkCounts(s.perCategory[0], 1, 1, 0, 1, 2);
        checkScores(s.perCategory[0], 1.0 / 4, 1.0 / 3, 2.0 / 7);
        checkCounts(s.perCategory[1], 1, 1, 0, 1, 1);
        checkScores(s.perCategory[1], 1.0 / 3, 1.0 / 3, 1.0 / 3);
    }
    SECTION("partial: overlaps are PAR and count half")
    {
        // R0, R1 COR; R2, R3 PAR; P = (COR + 0.5·PAR)/ACT = 3/7, R = 3/6 (SemEval-2013 Task 9.1).
        const SpanScores s = scoreSpans(kReference, kPredicted, 3, MatchMode::Partial);
        checkCounts(s.micro, 2, 0, 2, 2, 3);
        checkScores(s.micro, 3.0 / 7, 3.0 / 6, 6.0 / 13);
        checkCounts(s.perCategory[0], 1, 0, 1, 1, 2);
        checkScores(s.perCategory[0], 1.5 / 4, 1.5 / 3, 3.0 / 7);
        checkCounts(s.perCategory[1], 1, 0, 1, 1, 1);
        checkScores(s.perCategory[1], 1.5 / 3, 1.5 / 3, 1.5 / 3);
        REQUIRE(s.macroF1);
        CHECK_THAT(*s.macroF1, WithinAbs((3.0 / 7 + 0.5) / 2, 1e-12));
    }
    SECTION("type: any overlap with the same category is COR, with another INC")
    {
        // R0, R2 COR; R1, R3 INC.
        const SpanScores s = scoreSpans(kReference, kPredicted, 3, MatchMode::Type);
        checkCounts(s.micro, 2, 2, 0, 2, 3);
        checkScores(s.micro, 2.0 / 7, 2.0 / 6, 4.0 / 13);
        checkCounts(s.perCategory[0], 2, 0, 0, 1, 2);
        checkScores(s.perCategory[0], 2.0 / 4, 2.0 / 3, 4.0 / 7);
        checkCounts(s.perCategory[1], 0, 2, 0, 1, 1);
        checkScores(s.perCategory[1], 0, 0, 0);
    }
}

TEST_CASE("span matching is one-to-one with the documented preferences")
{
    SECTION("identical boundaries are preferred, except in type mode where category comes first")
    {
        const std::vector<LabelledSpan> ref = {{0, 0, 0, 10}};
        const std::vector<LabelledSpan> pred = {{0, 0, 0, 9}, {0, 1, 0, 10}};
        const SpanScores strict = scoreSpans(ref, pred, 2, MatchMode::Strict);
        CHECK(strict.matches[0].predicted == 1);
        checkCounts(strict.micro, 0, 1, 0, 0, 1);
        const SpanScores partial = scoreSpans(ref, pred, 2, MatchMode::Partial);
        CHECK(partial.matches[0].predicted == 1);
        checkCounts(partial.micro, 1, 0, 0, 0, 1);
        const SpanScores type = scoreSpans(ref, pred, 2, MatchMode::Type);
        CHECK(type.matches[0].predicted == 0);
        checkCounts(type.micro, 1, 0, 0, 0, 1);
    }
    SECTION("then the largest overlap")
    {
        const std::vector<LabelledSpan> ref = {{0, 0, 0, 10}};
        const std::vector<LabelledSpan> pred = {{0, 0, 8, 20}, {0, 0, 3, 12}};
        const SpanScores s = scoreSpans(ref, pred, 1, MatchMode::Partial);
        CHECK(s.matches[0].predicted == 1);
        checkCounts(s.micro, 0, 0, 1, 0, 1);
    }
    SECTION("then the smaller boundary shift")
    {
        // Both overlap [10, 20) by 5; [15, 20) is off by 5 positions, [5, 15) by 10.
        const std::vector<LabelledSpan> ref = {{0, 0, 10, 20}};
        const std::vector<LabelledSpan> pred = {{0, 0, 5, 15}, {0, 0, 15, 20}};
        const SpanScores s = scoreSpans(ref, pred, 1, MatchMode::Partial);
        CHECK(s.matches[0].predicted == 1);
    }
    SECTION("a prediction over two reference spans matches only one of them")
    {
        const std::vector<LabelledSpan> ref = {{0, 0, 0, 10}, {0, 0, 12, 20}};
        const std::vector<LabelledSpan> pred = {{0, 0, 5, 15}};
        const SpanScores s = scoreSpans(ref, pred, 1, MatchMode::Partial);
        CHECK(s.matches[0].predicted == 0);
        CHECK(s.matches[1].outcome == SpanOutcome::Missing);
        checkCounts(s.micro, 0, 0, 1, 1, 0);
    }
    SECTION("two predictions of one reference span: the second is spurious")
    {
        const std::vector<LabelledSpan> ref = {{0, 0, 0, 10}};
        const std::vector<LabelledSpan> pred = {{0, 0, 0, 10}, {0, 0, 0, 10}};
        const SpanScores s = scoreSpans(ref, pred, 1, MatchMode::Strict);
        checkCounts(s.micro, 1, 0, 0, 0, 1);
    }
    SECTION("touching spans do not overlap")
    {
        const std::vector<LabelledSpan> ref = {{0, 0, 10, 20}};
        const std::vector<LabelledSpan> pred = {{0, 0, 0, 10}, {0, 0, 20, 30}};
        const SpanScores s = scoreSpans(ref, pred, 1, MatchMode::Partial);
        checkCounts(s.micro, 0, 0, 0, 1, 2);
    }
}

TEST_CASE("span scores do not depend on the order of the input")
{
    // Property of the deterministic matching (canonical order before the greedy assignment).
    std::mt19937 rng(31337);
    for (int trial = 0; trial < 300; ++trial) {
        const std::vector<LabelledSpan> ref = randomSpans(rng, 12, 2, 3);
        const std::vector<LabelledSpan> pred = randomSpans(rng, 12, 2, 3);
        std::vector<std::size_t> refPerm(ref.size()), predPerm(pred.size());
        for (std::size_t k = 0; k < refPerm.size(); ++k)
            refPerm[k] = k;
        for (std::size_t k = 0; k < predPerm.size(); ++k)
            predPerm[k] = k;
        std::shuffle(refPerm.begin(), refPerm.end(), rng);
        std::shuffle(predPerm.begin(), predPerm.end(), rng);
        std::vector<LabelledSpan> ref2, pred2;
        for (std::size_t k : refPerm)
            ref2.push_back(ref[k]);
        for (std::size_t k : predPerm)
            pred2.push_back(pred[k]);
        for (MatchMode mode :
            {MatchMode::Strict, MatchMode::Exact, MatchMode::Partial, MatchMode::Type}) {
            const SpanScores a = scoreSpans(ref, pred, 3, mode);
            const SpanScores b = scoreSpans(ref2, pred2, 3, mode);
            for (std::size_t c = 0; c < 3; ++c) {
                const SpanCounts &x = a.perCategory[c], &y = b.perCategory[c];
                CHECK(std::tie(x.correct, x.incorrect, x.partial, x.missing, x.spurious)
                    == std::tie(y.correct, y.incorrect, y.partial, y.missing, y.spurious));
            }
            // Every reference span gets the same outcome wherever it stands in the input, up to
            // swapping identical spans (compared as multisets of outcomes per span).
            CHECK(outcomesBySpan(ref, a) == outcomesBySpan(ref2, b));
        }
    }
}

TEST_CASE("strict span F1 between two coders is positive specific agreement")
{
    // Hripcsak & Rothschild (2005), JAMIA 12: with either coder as the reference, F1 equals the
    // positive specific agreement 2a / (2a + b + c), so it is symmetric in the two coders. Here
    // pooled over categories (micro); per category as well when there is a single category (with
    // several, a cross-category INC counts under the reference span's category, see
    // span_scores.h, so per-category values need not be symmetric).
    std::mt19937 rng(2005);
    for (int trial = 0; trial < 1000; ++trial) {
        const int categories = std::uniform_int_distribution<int>(1, 3)(rng);
        const int documents = std::uniform_int_distribution<int>(1, 3)(rng);
        const std::vector<LabelledSpan> one =
            randomSpans(rng, std::uniform_int_distribution<int>(1, 25)(rng), documents, categories);
        const std::vector<LabelledSpan> two =
            randomSpans(rng, std::uniform_int_distribution<int>(1, 25)(rng), documents, categories);
        const double psa = positiveSpecificAgreement(one, two);

        const SpanScores ab = scoreSpans(one, two, categories, MatchMode::Strict);
        const SpanScores ba = scoreSpans(two, one, categories, MatchMode::Strict);
        REQUIRE(ab.micro.f1);
        REQUIRE(ba.micro.f1);
        CHECK_THAT(*ab.micro.f1, WithinAbs(psa, 1e-12));
        CHECK_THAT(*ba.micro.f1, WithinAbs(psa, 1e-12));
        // Precision with one coder as reference is recall with the other.
        CHECK_THAT(*ab.micro.precision, WithinAbs(*ba.micro.recall, 1e-12));
        CHECK_THAT(*ab.micro.recall, WithinAbs(*ba.micro.precision, 1e-12));
        // POS and ACT are the numbers of spans (one-to-one matching).
        CHECK(ab.micro.possible() == double(one.size()));
        CHECK(ab.micro.actual() == double(two.size()));
        if (categories == 1) {
            REQUIRE(ab.perCategory[0].f1);
            CHECK_THAT(*ab.perCategory[0].f1, WithinAbs(psa, 1e-12));
        }
    }
}

TEST_CASE("span scores at the extremes")
{
    const std::vector<MatchMode> modes = {
        MatchMode::Strict, MatchMode::Exact, MatchMode::Partial, MatchMode::Type};
    SECTION("perfect prediction gives 1 everywhere")
    {
        for (MatchMode mode : modes) {
            const SpanScores s = scoreSpans(kReference, kReference, 2, mode);
            checkScores(s.micro, 1, 1, 1);
            checkScores(s.perCategory[0], 1, 1, 1);
            checkScores(s.perCategory[1], 1, 1, 1);
            REQUIRE(s.macroF1);
            CHECK(*s.macroF1 == 1.0);
        }
    }
    SECTION("no prediction: recall 0, precision undefined, F1 0")
    {
        for (MatchMode mode : modes) {
            const SpanScores s = scoreSpans(kReference, {}, 2, mode);
            checkCounts(s.micro, 0, 0, 0, 6, 0);
            REQUIRE(s.micro.recall);
            CHECK(*s.micro.recall == 0.0);
            CHECK_FALSE(s.micro.precision);
            // F1 = 2·COR / (POS + ACT), positive specific agreement (Hripcsak & Rothschild
            // 2005): 0 when one side is empty.
            REQUIRE(s.micro.f1);
            CHECK(*s.micro.f1 == 0.0);
            CHECK_FALSE(s.macroPrecision);
            REQUIRE(s.macroRecall);
            CHECK(*s.macroRecall == 0.0);
        }
    }
    SECTION("no reference spans: precision 0, recall undefined")
    {
        const SpanScores s = scoreSpans({}, kPredicted, 2, MatchMode::Strict);
        checkCounts(s.micro, 0, 0, 0, 0, 7);
        REQUIRE(s.micro.precision);
        CHECK(*s.micro.precision == 0.0);
        CHECK_FALSE(s.micro.recall);
    }
    SECTION("nothing at all: every score undefined")
    {
        const SpanScores s = scoreSpans({}, {}, 2, MatchMode::Strict);
        REQUIRE(s.inputError.empty());
        REQUIRE(s.perCategory.size() == 2);
        CHECK_FALSE(s.micro.precision);
        CHECK_FALSE(s.micro.recall);
        CHECK_FALSE(s.micro.f1);
        CHECK_FALSE(s.macroPrecision);
        CHECK_FALSE(s.macroRecall);
        CHECK_FALSE(s.macroF1);
    }
}

TEST_CASE("span scores reject invalid spans, naming the span")
{
    SECTION("category out of range")
    {
        const SpanScores s = scoreSpans({{0, 0, 0, 5}, {0, 2, 3, 9}}, {}, 2, MatchMode::Strict);
        CHECK_THAT(s.inputError,
            Contains("reference span 1 (document 0, category 2, [3, 9)): "
                     "category must be in 0..1"));
        CHECK(s.perCategory.empty());
        CHECK_FALSE(s.micro.f1);
    }
    SECTION("empty or reversed span")
    {
        const SpanScores s = scoreSpans({}, {{4, 0, 7, 7}}, 2, MatchMode::Partial);
        CHECK_THAT(s.inputError,
            Contains("predicted span 0 (document 4, category 0, [7, 7)): the span is empty"));
        const SpanScores r = scoreSpans({{0, 0, 9, 3}}, {}, 2, MatchMode::Partial);
        CHECK_THAT(r.inputError, Contains("reference span 0"));
    }
}
