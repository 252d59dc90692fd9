#include "core/scoring/run_scores.h"
#include "tests/scoring/scoring_fixture.h"

using namespace fourfold;
using Catch::Matchers::WithinAbs;

namespace {

using F = FramingFunction;
using reliability::MatchMode;

// Hand-worked example on article f1 (kTwoArticles), built on the categories of the SemEval-2013
// Task 9.1 evaluation (Segura-Bedmar, Martínez & Herrero Zazo 2013, §4; COR/INC/PAR/MIS/SPU
// after Chinchor & Sundheim 1993). Text positions (code points):
//   [0,40)   "The ferry to Brakwater will stop in May."
//   [41,54)  "Dr. Ilse Varn"   [55,73) "blames the budget."   [62,73) "the budget."
//   [75,107) "The council must find the money."   [108,125) "It is a disgrace."
// Reference (coder C01, or gold):  G1 problem [0,40), G2 cause [62,73), G3 remedy [75,107),
//                                  G4 evaluation [108,125)
// Run:                             P1 problem [0,40), P2 cause [55,73), P3 evaluation [75,107),
//                                  P4 remedy [41,54)
// Outcomes by mode (worked by hand from the SemEval-2013 definitions):
//          strict  exact  partial  type
//   P1/G1  COR     COR    COR      COR   same boundaries, same function
//   P2/G2  INC     INC    PAR      COR   overlap, other boundaries, same function
//   P3/G3  INC     COR    COR      INC   same boundaries, other function
//   P4     SPU     SPU    SPU      SPU   overlaps no reference span
//   G4     MIS     MIS    MIS      MIS   nothing predicted
// POS = ACT = 4. Precision = (COR + ½PAR)/ACT, recall = (COR + ½PAR)/POS:
//   strict 1/4 = 0.25; exact 2/4 = 0.5; partial 2.5/4 = 0.625; type 2/4 = 0.5.
// Strict per function (INC, PAR, MIS under the reference's function, SPU under the run's):
//   problem COR 1 → P = R = F1 = 1; cause INC 1 → 0, 0, 0; evaluation MIS 1 → P undefined,
//   R 0, F1 0; remedy INC 1 + SPU 1 → ACT 2, P 0, R 0, F1 0.
//   Macro (mean of the defined): P (1 + 0 + 0)/3 = 0.333, R 0.25, F1 0.25.
struct HandExample : test::ScoringFixture {
    CoderId c1 = addCoder(QStringLiteral("C01"));

    HandExample()
    {
        code(f1, c1, F::Problem, 0, 40);
        code(f1, c1, F::Cause, 62, 73);
        code(f1, c1, F::Remedy, 75, 107);
        code(f1, c1, F::Evaluation, 108, 125);
        storeRun(QStringLiteral("hand"),
            {{f1, F::Problem, 0, 40}, {f1, F::Cause, 55, 73}, {f1, F::Evaluation, 75, 107},
                {f1, F::Remedy, 41, 54}, {f2, F::Problem, 0, 10}});
    }

    RunScores score(
        MatchMode mode, const LayerSpec &against = {LayerKind::Coder, QStringLiteral("C01")})
    {
        ScoreOptions o;
        o.mode = mode;
        o.bootstrapReplicates = 200;
        auto s = scoreRun(project, QStringLiteral("hand"), against, o);
        REQUIRE(s);
        return *s;
    }
};

} // namespace

TEST_CASE_METHOD(
    HandExample, "scoring reproduces the hand-worked SemEval-2013 example", "[scoring]")
{
    SECTION("strict")
    {
        const RunScores s = score(MatchMode::Strict);
        // Only f1 is scored: C01 coded nothing on f2, so the run's span there does not count.
        CHECK(s.articles == 1);
        CHECK(s.micro.correct == 1);
        CHECK(s.micro.incorrect == 2);
        CHECK(s.micro.partial == 0);
        CHECK(s.micro.missing == 1);
        CHECK(s.micro.spurious == 1);
        CHECK(s.micro.possible() == 4);
        CHECK(s.micro.actual() == 4);
        CHECK_THAT(*s.micro.precision, WithinAbs(0.25, 1e-12));
        CHECK_THAT(*s.micro.recall, WithinAbs(0.25, 1e-12));
        CHECK_THAT(*s.micro.f1, WithinAbs(0.25, 1e-12));
        const auto &p = s.perFunction[std::size_t(F::Problem)];
        CHECK(*p.precision == 1.0);
        CHECK(*p.recall == 1.0);
        const auto &e = s.perFunction[std::size_t(F::Evaluation)];
        CHECK_FALSE(e.precision.has_value());
        CHECK(*e.recall == 0.0);
        CHECK(*e.f1 == 0.0);
        const auto &r = s.perFunction[std::size_t(F::Remedy)];
        CHECK(r.actual() == 2);
        CHECK(r.spurious == 1);
        CHECK(*r.precision == 0.0);
        CHECK_THAT(*s.macroPrecision, WithinAbs(1.0 / 3.0, 1e-12));
        CHECK_THAT(*s.macroRecall, WithinAbs(0.25, 1e-12));
        CHECK_THAT(*s.macroF1, WithinAbs(0.25, 1e-12));
    }
    SECTION("exact")
    {
        const RunScores s = score(MatchMode::Exact);
        CHECK(s.micro.correct == 2);
        CHECK(s.micro.incorrect == 1);
        CHECK_THAT(*s.micro.f1, WithinAbs(0.5, 1e-12));
    }
    SECTION("partial")
    {
        const RunScores s = score(MatchMode::Partial);
        CHECK(s.micro.correct == 2);
        CHECK(s.micro.partial == 1);
        CHECK_THAT(*s.micro.precision, WithinAbs(0.625, 1e-12));
        CHECK_THAT(*s.micro.recall, WithinAbs(0.625, 1e-12));
    }
    SECTION("type")
    {
        const RunScores s = score(MatchMode::Type);
        CHECK(s.micro.correct == 2);
        CHECK(s.micro.incorrect == 1);
        CHECK_THAT(*s.micro.f1, WithinAbs(0.5, 1e-12));
    }
    SECTION("the same spans as gold give the same figures")
    {
        gold(f1, F::Problem, 0, 40);
        gold(f1, F::Cause, 62, 73);
        gold(f1, F::Remedy, 75, 107);
        gold(f1, F::Evaluation, 108, 125);
        const RunScores s = score(MatchMode::Strict, LayerSpec {LayerKind::Gold, {}});
        CHECK(s.articles == 1);
        CHECK_THAT(*s.micro.f1, WithinAbs(0.25, 1e-12));
        CHECK_THAT(*s.macroPrecision, WithinAbs(1.0 / 3.0, 1e-12));
    }
    SECTION("one article: every bootstrap replicate is that article, so the interval is the point")
    {
        const RunScores s = score(MatchMode::Partial);
        CHECK(s.replicates == 200);
        CHECK_THAT(*s.microIntervals.f1.low, WithinAbs(0.625, 1e-12));
        CHECK_THAT(*s.microIntervals.f1.high, WithinAbs(0.625, 1e-12));
    }
}

TEST_CASE_METHOD(test::ScoringFixture, "bootstrap intervals resample articles", "[scoring]")
{
    const CoderId c1 = addCoder(QStringLiteral("C01"));
    code(f1, c1, F::Problem, 0, 40);
    code(f1, c1, F::Remedy, 75, 107);
    code(f2, c1, F::Problem, 0, 38);
    code(f2, c1, F::Evaluation, 39, 57);
    // Perfect on f1, one hit of two on f2: F1 on f1 = 1, on f2 = 2·1/(2+1) = 2/3.
    storeRun(QStringLiteral("r"),
        {{f1, F::Problem, 0, 40}, {f1, F::Remedy, 75, 107}, {f2, F::Problem, 0, 38}});
    ScoreOptions o;
    o.bootstrapReplicates = 500;
    o.seed = 7;
    auto s = scoreRun(
        project, QStringLiteral("r"), LayerSpec {LayerKind::Coder, QStringLiteral("C01")}, o);
    REQUIRE(s);
    CHECK(s->articles == 2);
    // Pooled: COR 3, MIS 1 → P 1, R 0.75, F1 6/7.
    CHECK_THAT(*s->micro.f1, WithinAbs(6.0 / 7.0, 1e-12));
    // A replicate holds f1 twice (F1 1), f2 twice (F1 2/3) or both (6/7): with 500 replicates
    // each extreme occurs (probability 1/4 each), so the interval runs from 2/3 to 1.
    CHECK_THAT(*s->microIntervals.f1.low, WithinAbs(2.0 / 3.0, 1e-12));
    CHECK_THAT(*s->microIntervals.f1.high, WithinAbs(1.0, 1e-12));
    // Precision is 1 in every replicate.
    CHECK(*s->microIntervals.precision.low == 1.0);
    // Same seed, same figures; the per-article counts add up to the totals.
    auto again = scoreRun(
        project, QStringLiteral("r"), LayerSpec {LayerKind::Coder, QStringLiteral("C01")}, o);
    REQUIRE(again);
    CHECK(*again->macroIntervals.f1.low == *s->macroIntervals.f1.low);
    double cor = 0;
    for (const ArticleCounts &a : s->perArticle)
        for (const auto &c : a.perFunction)
            cor += c.correct;
    CHECK(cor == s->micro.correct);
}

TEST_CASE_METHOD(test::ScoringFixture, "scoring refuses what it cannot score", "[scoring]")
{
    addCoder(QStringLiteral("C01"));
    storeRun(QStringLiteral("r"), {{f1, F::Problem, 0, 40}});
    auto noGold = scoreRun(project, QStringLiteral("r"), LayerSpec {LayerKind::Gold, {}}, {});
    REQUIRE_FALSE(noGold);
    CHECK(noGold.error().code == ErrorCode::InvalidArgument);
    CHECK(noGold.error().message.contains(QStringLiteral("no gold spans")));
    auto noRun = scoreRun(project, QStringLiteral("nope"), LayerSpec {LayerKind::Gold, {}}, {});
    REQUIRE_FALSE(noRun);
    CHECK(noRun.error().code == ErrorCode::NotFound);
    auto noCoder = scoreRun(
        project, QStringLiteral("r"), LayerSpec {LayerKind::Coder, QStringLiteral("C99")}, {});
    REQUIRE_FALSE(noCoder);
    CHECK(noCoder.error().message.contains(QStringLiteral("C99")));
    auto uncoded = scoreRun(
        project, QStringLiteral("r"), LayerSpec {LayerKind::Coder, QStringLiteral("C01")}, {});
    REQUIRE_FALSE(uncoded);
    CHECK(uncoded.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("layer names parse and print", "[scoring]")
{
    for (const char *key : {"gold", "coders", "coder:C01", "run:cues v2"}) {
        auto spec = LayerSpec::parse(QString::fromUtf8(key));
        REQUIRE(spec);
        CHECK(spec->key() == QString::fromUtf8(key));
    }
    for (const char *bad : {"", "run:", "coder:", "golden"}) {
        auto spec = LayerSpec::parse(QString::fromUtf8(bad));
        REQUIRE_FALSE(spec);
        CHECK(spec.error().code == ErrorCode::InvalidArgument);
    }
}
