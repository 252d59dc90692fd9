// What gathering a report's figures reads: a bounded number of statements whatever the size of
// the study (the figures themselves are checked against `fourfold-cli agree` in
// report_writer_test.cpp).
#include "app/report/report_data.h"
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
