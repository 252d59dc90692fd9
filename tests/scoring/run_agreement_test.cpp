#include "core/scoring/run_agreement.h"
#include "tests/scoring/scoring_fixture.h"

using namespace fourfold;
using Catch::Matchers::WithinAbs;

namespace {
using F = FramingFunction;
} // namespace

TEST_CASE("the run's position against the human band", "[scoring]")
{
    CHECK(bandPosition(0.5, 0.6, 0.8) == QStringLiteral("below"));
    CHECK(bandPosition(0.6, 0.6, 0.8) == QStringLiteral("inside"));
    CHECK(bandPosition(0.7, 0.6, 0.8) == QStringLiteral("inside"));
    CHECK(bandPosition(0.81, 0.6, 0.8) == QStringLiteral("above"));
    CHECK(bandPosition(std::nullopt, 0.6, 0.8) == QStringLiteral("undefined"));
    CHECK(bandPosition(0.7, std::nullopt, std::nullopt) == QStringLiteral("undefined"));
}

TEST_CASE_METHOD(
    test::ScoringFixture, "a run that copies one coder joins the humans as that coder", "[scoring]")
{
    const CoderId c1 = addCoder(QStringLiteral("C01"));
    const CoderId c2 = addCoder(QStringLiteral("C02"));
    // Both coders code both articles; they agree on some sentences and not on others.
    code(f1, c1, F::Problem, 0, 40);
    code(f1, c1, F::Remedy, 75, 107);
    code(f2, c1, F::Problem, 0, 39);
    code(f1, c2, F::Problem, 0, 40);
    code(f1, c2, F::Problem, 108, 125);
    code(f2, c2, F::Remedy, 62, 85);
    code(f1, c2, F::Remedy, 75, 107);
    storeRun(QStringLiteral("copy"),
        {{f1, F::Problem, 0, 40}, {f1, F::Remedy, 75, 107}, {f2, F::Problem, 0, 39}});
    auto a = runAgreement(project, QStringLiteral("copy"), RunAgreementOptions {});
    REQUIRE(a);
    CHECK(a->coders == QStringList {QStringLiteral("C01"), QStringLiteral("C02")});
    const FunctionBand &problem = a->functions[std::size_t(F::Problem)];
    REQUIRE(problem.humanPairs.size() == 1);
    REQUIRE(problem.runPairs.size() == 2);
    REQUIRE(problem.humanPairs[0].alpha);
    const double humans = *problem.humanPairs[0].alpha;
    CHECK(humans < 1.0);
    // Property: the run's column equals C01's, so alpha(run, C01) = 1 and alpha(run, C02) =
    // alpha(C01, C02); the band is the one human pair, and the run's mean lies above it.
    CHECK_THAT(*problem.runPairs[0].alpha, WithinAbs(1.0, 1e-12));
    CHECK_THAT(*problem.runPairs[1].alpha, WithinAbs(humans, 1e-12));
    CHECK_THAT(*problem.runMean, WithinAbs((1.0 + humans) / 2, 1e-12));
    CHECK(*problem.bandLow == humans);
    CHECK(*problem.bandHigh == humans);
    CHECK(problem.position == QStringLiteral("above"));
    // With two humans, alpha over all humans is their pairwise alpha.
    CHECK(problem.humansAlpha == humans);

    // Remedy: C01 and C02 agree on f1, C02 adds one on f2; the run copies C01.
    const FunctionBand &remedy = a->functions[std::size_t(F::Remedy)];
    REQUIRE(remedy.runPairs[0].alpha);
    CHECK_THAT(*remedy.runPairs[0].alpha, WithinAbs(1.0, 1e-12));
    // Cause: nobody marked it, so only "absent" occurs and alpha is undefined (never 1).
    const FunctionBand &cause = a->functions[std::size_t(F::Cause)];
    CHECK_FALSE(cause.runMean.has_value());
    CHECK(cause.position == QStringLiteral("undefined"));
}

TEST_CASE_METHOD(test::ScoringFixture, "the band needs two humans and a known run", "[scoring]")
{
    const CoderId c1 = addCoder(QStringLiteral("C01"));
    code(f1, c1, F::Problem, 0, 40);
    storeRun(QStringLiteral("r"), {{f1, F::Problem, 0, 40}});
    auto one = runAgreement(project, QStringLiteral("r"), RunAgreementOptions {});
    REQUIRE_FALSE(one);
    CHECK(one.error().code == ErrorCode::InvalidArgument);
    auto unknown = runAgreement(project, QStringLiteral("nope"), RunAgreementOptions {});
    REQUIRE_FALSE(unknown);
    CHECK(unknown.error().code == ErrorCode::NotFound);
    RunAgreementOptions continuum;
    continuum.unit = UnitKind::Continuum;
    CHECK_FALSE(runAgreement(project, QStringLiteral("r"), continuum));
}
