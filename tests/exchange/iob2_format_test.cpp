#include "core/exchange/iob2_format.h"
#include "tests/support/test_support.h"

using namespace fourfold;

namespace {
using F = FramingFunction;

Iob2Document sample()
{
    Iob2Document d;
    d.externalId = QStringLiteral("f1");
    d.sha256 = QStringLiteral("ab");
    d.source = QStringLiteral("gold");
    // "Ferry stops. Council pays." tokens: Ferry stops . Council pays .
    d.text = QStringLiteral("Ferry stops. Council pays.");
    d.tokens = {{0, 5}, {6, 11}, {11, 12}, {13, 20}, {21, 25}, {25, 26}};
    // A problem over the first sentence, a cause inside it (overlap across functions), a remedy
    // over the second sentence and two adjacent problem chunks that stay two.
    d.spans = {{F::Problem, {0, 12}}, {F::Cause, {6, 11}}, {F::Remedy, {13, 26}},
        {F::Problem, {13, 20}}, {F::Problem, {21, 26}}};
    return d;
}
} // namespace

TEST_CASE("IOB2 files re-assemble the same spans", "[exchange][iob2]")
{
    const Iob2Document d = sample();
    const QByteArray bytes = writeIob2({d}, true);
    // IOB2 (Tjong Kim Sang & Veenstra 1999): every chunk starts with B-, also right after
    // another chunk of the same type.
    CHECK(bytes.contains("Ferry\t0\t5\tB-problem\tO\tO\tO\n"));
    CHECK(bytes.contains("stops\t6\t11\tI-problem\tB-cause\tO\tO\n"));
    CHECK(bytes.contains("Council\t13\t20\tB-problem\tO\tO\tB-remedy\n"));
    CHECK(bytes.contains("pays\t21\t25\tB-problem\tO\tO\tI-remedy\n"));
    auto read = readIob2(bytes, QStringLiteral("x.bio"));
    REQUIRE(read);
    REQUIRE(read->size() == 1);
    const Iob2Document &r = read->front();
    CHECK(r.externalId == QStringLiteral("f1"));
    CHECK(r.sha256 == QStringLiteral("ab"));
    CHECK(r.source == QStringLiteral("gold"));
    CHECK(r.tokens == d.tokens);
    std::vector<Iob2Span> expected = d.spans;
    std::sort(expected.begin(), expected.end(), [](const Iob2Span &a, const Iob2Span &b) {
        return std::pair(int(a.function), a.range) < std::pair(int(b.function), b.range);
    });
    CHECK(r.spans == expected);
}

TEST_CASE("IOB2 without text writes offsets only", "[exchange][iob2]")
{
    const QByteArray bytes = writeIob2({sample()}, false);
    CHECK_FALSE(bytes.contains("Ferry"));
    CHECK(bytes.contains("_\t0\t5\tB-problem"));
    auto read = readIob2(bytes, QStringLiteral("x.bio"));
    REQUIRE(read);
    CHECK(read->front().spans.size() == 5);
}

TEST_CASE(
    "IOB2 spans off token boundaries widen; overlaps within a function merge", "[exchange][iob2]")
{
    Iob2Document d = sample();
    d.spans = {{F::Evaluation, {2, 8}}, {F::Cause, {0, 5}}, {F::Cause, {3, 11}}};
    auto read = readIob2(writeIob2({d}, true), QStringLiteral("x.bio"));
    REQUIRE(read);
    CHECK(read->front().spans
        == std::vector<Iob2Span> {{F::Cause, {0, 11}}, {F::Evaluation, {0, 11}}});
}

TEST_CASE("IOB2 reader rejects malformed files with line and column", "[exchange][iob2]")
{
    struct Case {
        const char *bytes;
        qint64 line, column;
        const char *message;
    };
    const Case cases[] = {
        {"a\t0\t1\tO\tO\tO\tO\n", 1, 1, "before any"},
        {"# article = x\na\t0\t1\tO\tO\tO\n", 2, 1, "7 tab-separated"},
        {"# article = x\na\t0\tz\tO\tO\tO\tO\n", 2, 3, "whole numbers"},
        {"# article = x\na\t0\t1\tO\tI-cause\tO\tO\n", 2, 9, "continues no chunk"},
        {"# article = x\na\t0\t1\tB-cause\tO\tO\tO\n", 2, 7, "is not O, B-problem"},
    };
    for (const Case &c : cases) {
        auto r = readIob2(QByteArray(c.bytes), QStringLiteral("bad.bio"));
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidInput);
        CHECK(r.error().file == QStringLiteral("bad.bio"));
        CHECK(r.error().line == c.line);
        CHECK(r.error().column == c.column);
        CHECK(r.error().message.contains(QString::fromUtf8(c.message)));
    }
}
