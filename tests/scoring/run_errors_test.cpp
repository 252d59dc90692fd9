#include "core/scoring/run_errors.h"
#include "core/scoring/run_scores.h"
#include "tests/scoring/scoring_fixture.h"

using namespace fourfold;

namespace {

using F = FramingFunction;
using reliability::MatchMode;
using reliability::SpanOutcome;

// Hand-worked example on article f1 (kTwoArticles), with the categories of the SemEval-2013
// Task 9.1 evaluation (Segura-Bedmar, Martínez & Herrero Zazo 2013, §4; COR/INC/PAR/MIS/SPU
// after Chinchor & Sundheim 1993). Text positions (code points, counted by hand):
//   [0,40)   "The ferry to Brakwater will stop in May."   [0,20) "The ferry to Brakwat"
//   [41,73)  "Dr. Ilse Varn blames the budget."           [45,73) "Ilse Varn blames the budget."
//   [75,107) "The council must find the money."           [108,125) "It is a disgrace."
// Gold:  G1 problem [0,40), G2 cause [41,73), G3 remedy [75,107), G4 evaluation [108,125)
// Run:   P1 problem [0,40), P2 cause [45,73), P3 evaluation [75,107), P4 problem [0,20),
//        P5 problem on f2 (no gold there: f2 is not scored)
// Strict matching (span_scores.h tiers): P1/G1 same boundaries and function → COR; P3/G3 same
// boundaries, other function → INC (wrong function); P2/G2 overlap, same function → INC
// (boundary); P4 overlaps only G1, already matched → SPU (false positive); G4 → MIS (miss).
// Partial mode ignores the function and counts identical boundaries whole: P3/G3 → COR,
// P2/G2 → PAR (boundary).
struct HandExample : test::ScoringFixture {
    HandExample()
    {
        gold(f1, F::Problem, 0, 40);
        gold(f1, F::Cause, 41, 73);
        gold(f1, F::Remedy, 75, 107);
        gold(f1, F::Evaluation, 108, 125);
        storeRun(QStringLiteral("hand"),
            {{f1, F::Problem, 0, 40}, {f1, F::Cause, 45, 73}, {f1, F::Evaluation, 75, 107},
                {f1, F::Problem, 0, 20}, {f2, F::Problem, 0, 10}});
    }

    RunErrors errors(MatchMode mode)
    {
        auto e = runErrors(project, QStringLiteral("hand"), LayerSpec {LayerKind::Gold, {}}, mode);
        INFO((e ? QString() : e.error().toString()).toStdString());
        REQUIRE(e);
        return *e;
    }
};

const RunSpanOutcome *find(const RunErrors &e, RunErrorKind kind)
{
    for (const RunSpanOutcome &o : e.outcomes)
        if (o.kind == kind)
            return &o;
    return nullptr;
}

} // namespace

TEST_CASE_METHOD(HandExample, "every span gets its outcome, kind and partner", "[runerrors]")
{
    const RunErrors e = errors(MatchMode::Strict);
    REQUIRE(e.articles.size() == 1); // only f1 has gold
    CHECK(e.articles.front().second == QStringLiteral("f1"));
    // 4 gold spans, then the one unmatched run span of f1 (P5 on f2 is not scored).
    REQUIRE(e.outcomes.size() == 5);

    const RunSpanOutcome &g1 = e.outcomes[0];
    CHECK(g1.kind == RunErrorKind::Correct);
    CHECK(g1.outcome == SpanOutcome::Correct);
    CHECK(g1.referenceQuote == QStringLiteral("The ferry to Brakwater will stop in May."));
    CHECK(g1.predictedQuote == g1.referenceQuote);

    const RunSpanOutcome &g2 = e.outcomes[1];
    CHECK(g2.kind == RunErrorKind::Boundary);
    CHECK(g2.outcome == SpanOutcome::Incorrect);
    REQUIRE(g2.predicted);
    CHECK(g2.predicted->range == TextRange {45, 73});
    CHECK(g2.predictedQuote == QStringLiteral("Ilse Varn blames the budget."));
    CHECK(g2.range() == TextRange {41, 73});

    const RunSpanOutcome &g3 = e.outcomes[2];
    CHECK(g3.kind == RunErrorKind::WrongFunction);
    REQUIRE(g3.predicted);
    CHECK(g3.reference->function == F::Remedy);
    CHECK(g3.predicted->function == F::Evaluation);
    CHECK(g3.function() == F::Remedy);

    const RunSpanOutcome &g4 = e.outcomes[3];
    CHECK(g4.kind == RunErrorKind::Miss);
    CHECK_FALSE(g4.predicted);
    CHECK(g4.referenceQuote == QStringLiteral("It is a disgrace."));
    CHECK(g4.function() == F::Evaluation);

    const RunSpanOutcome &p4 = e.outcomes[4];
    CHECK(p4.kind == RunErrorKind::FalsePositive);
    CHECK(p4.outcome == SpanOutcome::Spurious);
    CHECK_FALSE(p4.reference);
    CHECK(p4.predictedQuote == QStringLiteral("The ferry to Brakwat"));
    CHECK(p4.function() == F::Problem);

    CHECK(e.count(RunErrorKind::FalsePositive) == 1);
    CHECK(e.count(RunErrorKind::FalsePositive, F::Problem) == 1);
    CHECK(e.count(RunErrorKind::FalsePositive, F::Cause) == 0);
    CHECK(e.count(RunErrorKind::Miss, F::Evaluation) == 1);
}

TEST_CASE_METHOD(
    HandExample, "the confusion table counts pairs, misses and false positives", "[runerrors]")
{
    const RunErrors e = errors(MatchMode::Strict);
    const auto P = std::size_t(F::Problem), C = std::size_t(F::Cause),
               E = std::size_t(F::Evaluation), R = std::size_t(F::Remedy),
               none = std::size_t(kNoFunction);
    CHECK(e.confusion[P][P] == 1);
    CHECK(e.confusion[C][C] == 1);
    CHECK(e.confusion[R][E] == 1);
    CHECK(e.confusion[E][none] == 1);
    CHECK(e.confusion[none][P] == 1);
    int total = 0;
    for (const auto &row : e.confusion)
        for (int n : row)
            total += n;
    CHECK(total == 5);
}

TEST_CASE_METHOD(HandExample, "partial mode files boundary errors as PAR and ignores the function",
    "[runerrors]")
{
    const RunErrors e = errors(MatchMode::Partial);
    REQUIRE(e.outcomes.size() == 5);
    CHECK(e.outcomes[1].outcome == SpanOutcome::Partial);
    CHECK(e.outcomes[1].kind == RunErrorKind::Boundary);
    CHECK(e.outcomes[2].outcome == SpanOutcome::Correct);
    CHECK(e.outcomes[2].kind == RunErrorKind::Correct);
    CHECK(find(e, RunErrorKind::WrongFunction) == nullptr);
}

TEST_CASE_METHOD(
    HandExample, "the outcomes add up to the counts of scoreRun in every mode", "[runerrors]")
{
    // An independent path through the same matcher: scoreRun's per-function counts.
    for (MatchMode mode :
        {MatchMode::Strict, MatchMode::Exact, MatchMode::Partial, MatchMode::Type}) {
        INFO(matchModeKey(mode).toStdString());
        const RunErrors e = errors(mode);
        ScoreOptions o;
        o.mode = mode;
        o.bootstrapReplicates = 0;
        auto s = scoreRun(project, QStringLiteral("hand"), LayerSpec {LayerKind::Gold, {}}, o);
        REQUIRE(s);
        for (F f : kFramingFunctions) {
            const auto &c = s->perFunction[std::size_t(f)];
            auto n = [&](SpanOutcome outcome) {
                return double(std::ranges::count_if(e.outcomes, [&](const RunSpanOutcome &x) {
                    return x.outcome == outcome && x.function() == f;
                }));
            };
            CHECK(n(SpanOutcome::Correct) == c.correct);
            CHECK(n(SpanOutcome::Incorrect) == c.incorrect);
            CHECK(n(SpanOutcome::Partial) == c.partial);
            CHECK(n(SpanOutcome::Missing) == c.missing);
            CHECK(n(SpanOutcome::Spurious) == c.spurious);
        }
    }
}

TEST_CASE_METHOD(
    test::ScoringFixture, "the error listing refuses what it cannot compare", "[runerrors]")
{
    addCoder(QStringLiteral("C01"));
    storeRun(QStringLiteral("r"), {{f1, F::Problem, 0, 40}});
    auto noGold =
        runErrors(project, QStringLiteral("r"), LayerSpec {LayerKind::Gold, {}}, MatchMode::Strict);
    REQUIRE_FALSE(noGold);
    CHECK(noGold.error().code == ErrorCode::InvalidArgument);
    CHECK(noGold.error().message.contains(QStringLiteral("no gold spans")));
    auto noRun = runErrors(
        project, QStringLiteral("nope"), LayerSpec {LayerKind::Gold, {}}, MatchMode::Strict);
    REQUIRE_FALSE(noRun);
    CHECK(noRun.error().code == ErrorCode::NotFound);
    auto allCoders = runErrors(
        project, QStringLiteral("r"), LayerSpec {LayerKind::Coders, {}}, MatchMode::Strict);
    REQUIRE_FALSE(allCoders);
    CHECK(allCoders.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE_METHOD(test::ScoringFixture, "a coder can be the reference", "[runerrors]")
{
    const CoderId c1 = addCoder(QStringLiteral("C01"));
    code(f2, c1, F::Cause, 40, 59); // "Bewoners zijn boos."
    storeRun(QStringLiteral("r"), {{f1, F::Problem, 0, 40}});
    auto e = runErrors(project, QStringLiteral("r"),
        LayerSpec {LayerKind::Coder, QStringLiteral("C01")}, MatchMode::Strict);
    REQUIRE(e);
    // C01 covers f2 only: the run's span on f1 is not scored, C01's span is missed.
    REQUIRE(e->outcomes.size() == 1);
    CHECK(e->outcomes[0].kind == RunErrorKind::Miss);
    CHECK(e->outcomes[0].referenceQuote == QStringLiteral("Bewoners zijn boos."));
    CHECK(e->outcomes[0].reference->source == QStringLiteral("C01"));
}
