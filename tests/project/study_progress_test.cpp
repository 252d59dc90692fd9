// The progress board and the effort setting (core/project/study_progress).
#include "core/project/article_status_edit.h"
#include "core/project/assignment_plans.h"
#include "core/project/study_progress.h"
#include "core/project/testing/project_database.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <QJsonArray>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("progress board: counts, effort in aggregate unless turned on, agreement so far")
{
    TenFixture f;
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    const CoderId c2 = f.addCoder(QStringLiteral("C02"));
    f.importJsonl("{\"id\":\"t2\",\"title\":\"Other\",\"text\":\"Short one. Short two.\"}\n",
        QStringLiteral("b.jsonl"));
    const ArticleId t2 = f.articleId(QStringLiteral("t2"));
    for (CoderId c : {c1, c2}) {
        REQUIRE(f.project.assign(f.article, c, Phase::Reliability));
        REQUIRE(f.project.assign(t2, c, Phase::Reliability));
    }
    f.codeBoth(c1, c2, Phase::Reliability);
    SetArticleStatusEdit d1(f.article, c1, QStringLiteral("done"));
    SetArticleStatusEdit d2(f.article, c2, QStringLiteral("done"));
    SetArticleStatusEdit s1(t2, c1, QStringLiteral("started"));
    REQUIRE(f.project.apply(d1));
    REQUIRE(f.project.apply(d2));
    REQUIRE(f.project.apply(s1));
    REQUIRE(f.project.addCodingTime(f.article, c1, 600));
    REQUIRE(f.project.addCodingTime(t2, c1, 120));
    REQUIRE(f.project.addCodingTime(f.article, c2, 900));

    auto board = StudyProgress::board(f.project);
    REQUIRE(board);
    CHECK_FALSE(board->effortPerCoder); // off by default
    REQUIRE(board->rows.size() == 2);
    const ProgressRow &r1 = board->rows[0];
    CHECK(r1.coder == QStringLiteral("C01"));
    CHECK(r1.phase == Phase::Reliability);
    CHECK(r1.assigned == 2);
    CHECK(r1.started == 1);
    CHECK(r1.done == 1);
    CHECK_FALSE(r1.activeSeconds);
    CHECK(r1.comparedArticles == 1);
    // Pooled over 10 sentences × 4 functions (hand-computed as in the training test): agreeing
    // present units 3 (o_pp = 6), differing units 3 (o_pa = o_ap = 3), agreeing absent units 34
    // (o_aa = 68); n = 80, n_p = 9, n_a = 71; alpha = 1 − (6/80) / (2·9·71/(80·79)) = 134/213.
    REQUIRE(r1.agreement);
    CHECK(*r1.agreement == Approx(134.0 / 213.0).epsilon(1e-12));
    REQUIRE(board->rows[1].agreement);
    CHECK(*board->rows[1].agreement == Approx(134.0 / 213.0).epsilon(1e-12));
    REQUIRE(board->effort.size() == 1);
    CHECK(board->effort[0].doneArticles == 2);
    CHECK(board->effort[0].activeSeconds == 1620);
    REQUIRE(board->effort[0].meanSecondsPerDoneArticle);
    CHECK(*board->effort[0].meanSecondsPerDoneArticle == Approx(810.0));
    CHECK_FALSE(StudyProgress::boardJson(*board)
                    .value(QStringLiteral("rows"))
                    .toArray()
                    .at(0)
                    .toObject()
                    .contains(QStringLiteral("active_seconds")));

    REQUIRE(StudyProgress::setEffortPerCoderVisible(f.project, true, CoderId {}));
    board = StudyProgress::board(f.project);
    REQUIRE(board);
    CHECK(board->effortPerCoder);
    REQUIRE(board->rows[0].activeSeconds);
    CHECK(*board->rows[0].activeSeconds == 720);
    CHECK(*board->rows[1].activeSeconds == 900);

    // Filtered by phase: nothing in training.
    board = StudyProgress::board(f.project, Phase::Training);
    REQUIRE(board);
    CHECK(board->rows.empty());
    CHECK(board->effort.empty());
}
