#include "core/store/range_blob.h"
#include "tests/support/test_support.h"

using namespace fourfold;

TEST_CASE("ranges survive the compact blob encoding")
{
    const std::vector<TextRange> ranges {{0, 5}, {6, 6}, {7, 2147483647}};
    const QByteArray blob = encodeRanges(ranges);
    CHECK(blob.size() == 24);
    // Little-endian int32: the end of the first range, 5, is byte 4 (common practice).
    CHECK(blob.at(4) == 5);
    auto back = decodeRanges(blob);
    REQUIRE(back);
    CHECK(*back == ranges);
}

TEST_CASE("a blob of the wrong size is reported as corrupt")
{
    auto r = decodeRanges(QByteArray(12, '\0'));
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::Corrupt);
}
