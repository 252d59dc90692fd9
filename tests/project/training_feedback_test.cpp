// Training feedback (core/project/training_feedback): agreement with the master per function.
#include "core/project/article_status_edit.h"
#include "core/project/assignment_plans.h"
#include "core/project/testing/project_database.h"
#include "core/project/training_feedback.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <QJsonArray>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("training feedback: agreement with the master per function, hand-computed")
{
    TenFixture f;
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    const CoderId l1 = f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    REQUIRE(f.project.assign(f.article, c1, Phase::Training));
    REQUIRE(f.project.assign(f.article, l1, Phase::Training));
    f.codeBoth(c1, l1, Phase::Production); // the assignment turns them into training codings

    TrainingRequest r {QStringLiteral("C01"), QString(), UnitKind::Sentence};
    auto open = Training::feedback(f.project, r);
    REQUIRE(open);
    CHECK(open->master == QStringLiteral("L01"));
    CHECK(open->articles.isEmpty()); // feedback only after the coder submits the article
    CHECK(open->openArticles == 1);
    CHECK_FALSE(open->trainingComplete);
    CHECK(open->functions[0].units == 0);

    SetArticleStatusEdit done(f.article, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(done));
    auto fb = Training::feedback(f.project, r);
    REQUIRE(fb);
    CHECK(fb->articles == QStringList {QStringLiteral("t1")});
    CHECK(fb->trainingComplete);
    // Krippendorff's alpha, nominal, two coders, no missing values (Krippendorff 2011,
    // "Computing Krippendorff's Alpha-Reliability", §C), computed by hand:
    // problem: units 1,2 present/present, 3 and 4 differ, 5–10 absent/absent: o_pp = 4,
    // o_pa = o_ap = 2, o_aa = 12, n = 20, n_p = 6, n_a = 14; D_o = 4/20, D_e = 2·6·14/(20·19);
    // alpha = 1 − 1520/3360 = 23/42.
    const FunctionAgreement &problem = fb->functions[0];
    CHECK(problem.units == 10);
    CHECK(problem.agreeingUnits == 8);
    CHECK(problem.percentAgreement == Approx(0.8));
    CHECK(problem.coderUnits == 3);
    CHECK(problem.masterUnits == 3);
    REQUIRE(problem.alpha);
    CHECK(*problem.alpha == Approx(23.0 / 42.0).epsilon(1e-12));
    // cause: one unit differs, n_p = 1, n_a = 19: D_o = 2/20 = D_e = 2·19/380: alpha = 0.
    REQUIRE(fb->functions[1].alpha);
    CHECK(*fb->functions[1].alpha == Approx(0.0).margin(1e-12));
    CHECK(fb->functions[1].percentAgreement == Approx(0.9));
    // evaluation: identical codings: alpha = 1.
    REQUIRE(fb->functions[2].alpha);
    CHECK(*fb->functions[2].alpha == Approx(1.0));
    // remedy: nobody marked anything, only one value occurs: alpha undefined, agreement 100 %.
    CHECK_FALSE(fb->functions[3].alpha);
    CHECK_FALSE(fb->functions[3].alphaUndefinedReason.isEmpty());
    CHECK(fb->functions[3].percentAgreement == Approx(1.0));

    const QJsonObject json = Training::feedbackJson(*fb);
    CHECK(json.value(QStringLiteral("functions"))
              .toArray()
              .at(0)
              .toObject()
              .value(QStringLiteral("alpha"))
              .toDouble()
        == Approx(23.0 / 42.0));
    CHECK(json.value(QStringLiteral("functions"))
              .toArray()
              .at(3)
              .toObject()
              .value(QStringLiteral("alpha"))
              .isNull());

    r.coder = QStringLiteral("C77");
    CHECK(Training::feedback(f.project, r).error().code == ErrorCode::NotFound);
    r.coder = QStringLiteral("C01");
    r.unit = UnitKind::Continuum;
    CHECK(Training::feedback(f.project, r).error().code == ErrorCode::InvalidArgument);
}
