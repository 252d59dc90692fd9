// What gathering a report's figures and the progress board read: a bounded number of statements
// whatever the size of the study (the report's figures themselves are checked against
// `fourfold-cli agree` in report_writer_test.cpp, the board's in tests/study).
#include "app/report/report_data.h"
#include "core/project/study_progress.h"
#include "tests/project/double_coded_project.h"

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("a report reads the same number of statements for 8 and for 40 articles")
{
    DoubleCodedProject small(8), large(40);
    ReportOptions options;
    options.bootstrapReplicates = 0;
    options.coders = QStringList {QStringLiteral("C01"), QStringLiteral("C02")};
    qint64 atSmall = 0, atLarge = 0;
    atSmall = small.statementsRunBy([&] { REQUIRE(gatherReportData(small.project, options)); });
    atLarge = large.statementsRunBy([&] { REQUIRE(gatherReportData(large.project, options)); });
    CHECK(atSmall == atLarge);
    // Far below the 310 statements one report used to prepare.
    CHECK(atLarge < 25);
}

TEST_CASE("the progress board reads the same number of statements for 8 and for 40 articles")
{
    // It read every article with a statement of its own before (8 and 40 more).
    DoubleCodedProject small(8), large(40);
    qint64 atSmall = 0, atLarge = 0;
    std::optional<double> agreement;
    atSmall = small.statementsRunBy([&] {
        auto board = StudyProgress::board(small.project);
        REQUIRE(board);
        REQUIRE_FALSE(board->rows.empty());
        agreement = board->rows.front().agreement;
    });
    atLarge = large.statementsRunBy([&] { REQUIRE(StudyProgress::board(large.project)); });
    CHECK(atSmall == atLarge);
    CHECK(atLarge < 20);
    // The coders' agreement was computed (the board compares finished articles).
    CHECK(agreement.has_value());
}
