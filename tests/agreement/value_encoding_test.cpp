#include "core/agreement/value_encoding.h"
#include "tests/support/test_support.h"

using namespace fourfold;
using namespace fourfold::reliability;

namespace {

ReliabilityTable table(std::vector<QStringList> cells)
{
    ReliabilityTable t;
    t.source = QStringLiteral("m.csv");
    t.coders = {QStringLiteral("A"), QStringLiteral("B")};
    for (size_t i = 0; i < cells.size(); ++i) {
        t.units << QStringLiteral("u%1").arg(i + 1);
        t.lines.push_back(qint64(i) + 2);
    }
    t.cells = std::move(cells);
    return t;
}

} // namespace

TEST_CASE("nominal labels become codes in sorted order; empty cells are missing")
{
    auto e = encodeTable(
        table({{QStringLiteral("b"), QStringLiteral("a")}, {QString(), QStringLiteral("c")}}),
        EncodingOptions {});
    REQUIRE(e);
    CHECK(e->valueLabels
        == QStringList {QStringLiteral("a"), QStringLiteral("b"), QStringLiteral("c")});
    CHECK(e->data.values == 3);
    CHECK(e->data.cells == std::vector<int> {1, 0, kMissing, 2});
}

TEST_CASE("ordinal labels follow the given order; numbers follow their size")
{
    EncodingOptions o;
    o.level = Level::Ordinal;
    o.order = {QStringLiteral("negative"), QStringLiteral("neutral"), QStringLiteral("positive")};
    auto e = encodeTable(table({{QStringLiteral("positive"), QStringLiteral("negative")}}), o);
    REQUIRE(e);
    CHECK(e->data.cells == std::vector<int> {2, 0});

    o.order.clear();
    auto n = encodeTable(table({{QStringLiteral("10"), QStringLiteral("9")},
                             {QStringLiteral("2.5"), QStringLiteral("10")}}),
        o);
    REQUIRE(n);
    CHECK(n->metric.numeric == std::vector<double> {2.5, 9, 10});
    CHECK(n->data.cells == std::vector<int> {2, 1, 0, 2});
}

TEST_CASE("set cells become distinct sets with a distance matrix")
{
    EncodingOptions o;
    o.distance = SetDistance::Jaccard;
    auto e = encodeTable(table({{QStringLiteral("cause|problem"), QStringLiteral("problem|cause")},
                             {QStringLiteral("{}"), QStringLiteral("problem")}}),
        o);
    REQUIRE(e);
    CHECK(e->valueLabels
        == QStringList {
            QStringLiteral("{}"), QStringLiteral("cause|problem"), QStringLiteral("problem")});
    CHECK(e->data.cells == std::vector<int> {1, 1, 0, 2});
    REQUIRE(e->metric.custom.size() == 9);
    // Jaccard distance between {cause, problem} and {problem}: 1 − 1/2 (Artstein & Poesio 2008,
    // §5).
    CHECK(e->metric.custom[1 * 3 + 2] == Approx(0.5));
    // The empty-set convention: d(∅, A) = 1.
    CHECK(e->metric.custom[0 * 3 + 2] == Approx(1.0));
}

TEST_CASE("cells that do not fit the level are refused with file, line and cell")
{
    EncodingOptions o;
    o.level = Level::Interval;
    auto e = encodeTable(table({{QStringLiteral("3"), QStringLiteral("three")}}), o);
    REQUIRE_FALSE(e);
    CHECK(e.error().line == 2);
    CHECK(e.error().message.contains(QStringLiteral("m.csv:2")));
    CHECK(e.error().message.contains(QStringLiteral("coder \"B\"")));
    CHECK(e.error().message.contains(QStringLiteral("not a number")));

    o.level = Level::Ratio;
    auto r = encodeTable(table({{QStringLiteral("3"), QStringLiteral("-1")}}), o);
    REQUIRE_FALSE(r);
    CHECK(r.error().message.contains(QStringLiteral("negative")));

    o.level = Level::Ordinal;
    o.order = {QStringLiteral("low"), QStringLiteral("high")};
    auto u = encodeTable(table({{QStringLiteral("low"), QStringLiteral("medium")}}), o);
    REQUIRE_FALSE(u);
    CHECK(
        u.error().message.contains(QStringLiteral("\"medium\" is not one of the ordered values")));
}
