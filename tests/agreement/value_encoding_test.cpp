#include "core/agreement/value_encoding.h"
#include "tests/support/test_support.h"

#include <algorithm>
#include <random>

using namespace fourfold;
using namespace fourfold::reliability;

namespace {

ReliabilityTable table(std::vector<QStringList> cells)
{
    ReliabilityTable t;
    t.source = QStringLiteral("m.csv");
    t.coders = {QStringLiteral("A"), QStringLiteral("B")};
    for (size_t i = 0; i < cells.size(); ++i)
        t.appendUnit(QStringLiteral("u%1").arg(i + 1), cells[i], qint64(i) + 2);
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

TEST_CASE("encoding that takes the cells over gives the same data and leaves none behind")
{
    ReliabilityTable t = table({{QStringLiteral("b"), QStringLiteral("a")},
        {QString(), QStringLiteral("c")}, {QStringLiteral("a"), QStringLiteral("a")}});
    auto copied = encodeTable(t, EncodingOptions {});
    REQUIRE(copied);
    auto taken = encodeTableCells(t, EncodingOptions {});
    REQUIRE(taken);
    CHECK(taken->data.cells == copied->data.cells);
    CHECK(taken->data.cells == std::vector<int> {1, 0, kMissing, 2, 0, 0});
    CHECK(taken->valueLabels == copied->valueLabels);
    CHECK(t.cells().empty());
    CHECK(t.unitCount() == 3);
    // A refused encoding leaves the table as it was, its cells named in the error.
    ReliabilityTable refused = table({{QStringLiteral("3"), QStringLiteral("three")}});
    EncodingOptions interval;
    interval.level = Level::Interval;
    auto e = encodeTableCells(refused, interval);
    REQUIRE_FALSE(e);
    CHECK(e.error().message.contains(QStringLiteral("m.csv:2")));
    CHECK(refused.cells().size() == 2);
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

TEST_CASE("a set cell may be written in braces")
{
    // "{cause|problem}" is the set {cause, problem}, not the labels "{cause" and "problem}";
    // "{}" stays the empty set (common practice for writing sets). Braced and plain cells give
    // the same encoding.
    EncodingOptions o;
    o.distance = SetDistance::Masi;
    auto braced = encodeTable(table({{QStringLiteral("{cause|problem}"), QStringLiteral("{}")},
                                  {QStringLiteral("{ problem }"), QStringLiteral("{cause}")}}),
        o);
    auto plain = encodeTable(table({{QStringLiteral("cause|problem"), QStringLiteral("{}")},
                                 {QStringLiteral("problem"), QStringLiteral("cause")}}),
        o);
    REQUIRE(braced);
    REQUIRE(plain);
    CHECK(braced->valueLabels == plain->valueLabels);
    CHECK(braced->data.cells == plain->data.cells);
    CHECK(braced->valueLabels.size() == 4);
    CHECK_FALSE(braced->valueLabels.contains(QStringLiteral("{cause")));
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

TEST_CASE("the first cell in unit order that does not fit is the one reported")
{
    EncodingOptions o;
    o.level = Level::Interval;
    // "x" and "y" are both refused; "x" (unit 2, coder A) comes before "y" (unit 2, coder B)
    // although "y" alone would be reported too.
    auto e = encodeTable(table({{QStringLiteral("1"), QStringLiteral("2")},
                             {QStringLiteral("x"), QStringLiteral("y")},
                             {QStringLiteral("y"), QStringLiteral("x")}}),
        o);
    REQUIRE_FALSE(e);
    CHECK(e.error().line == 3);
    CHECK(e.error().message.contains(QStringLiteral("unit \"u2\", coder \"A\": \"x\"")));
}

TEST_CASE("codes match a naive encoding on random tables with shared and unshared cells")
{
    // The reference: distinct labels sorted, each cell's code its label's position (nominal),
    // or distinct numbers sorted (interval); written without any shortcut.
    std::mt19937 rng(11);
    const QStringList pool {QStringLiteral("a"), QStringLiteral("b"), QStringLiteral("ab"),
        QStringLiteral("10"), QStringLiteral("9"), QStringLiteral("1e1"), QStringLiteral("-2")};
    for (int round = 0; round < 200; ++round) {
        const int units = 1 + int(rng() % 40);
        std::vector<QStringList> cells;
        for (int u = 0; u < units; ++u) {
            QStringList row;
            for (int c = 0; c < 2; ++c) {
                const size_t pick = rng() % (size_t(pool.size()) + 1);
                if (pick == size_t(pool.size()))
                    row << QString();
                else if (rng() % 2)
                    row << pool[qsizetype(pick)]; // shares the pool's characters
                else
                    row << QString(pool[qsizetype(pick)].constData(),
                        pool[qsizetype(pick)].size()); // its own copy
            }
            cells.push_back(row);
        }
        for (const Level level : {Level::Nominal, Level::Interval}) {
            EncodingOptions o;
            o.level = level;
            const bool numeric = level == Level::Interval;
            std::vector<QStringList> usable = cells;
            if (numeric)
                for (QStringList &row : usable)
                    for (QString &cell : row)
                        if (!cell.isEmpty()
                            && (cell == QLatin1String("a") || cell == QLatin1String("b")
                                || cell == QLatin1String("ab")))
                            cell.clear();
            auto e = encodeTable(table(usable), o);
            REQUIRE(e);
            std::vector<QString> labels;
            std::vector<double> numbers;
            for (const QStringList &row : usable)
                for (const QString &cell : row)
                    if (!cell.isEmpty()) {
                        labels.push_back(cell);
                        numbers.push_back(cell.toDouble());
                    }
            std::sort(labels.begin(), labels.end());
            labels.erase(std::unique(labels.begin(), labels.end()), labels.end());
            std::sort(numbers.begin(), numbers.end());
            numbers.erase(std::unique(numbers.begin(), numbers.end()), numbers.end());
            std::vector<int> expected;
            for (const QStringList &row : usable)
                for (const QString &cell : row) {
                    if (cell.isEmpty())
                        expected.push_back(kMissing);
                    else if (numeric)
                        expected.push_back(
                            int(std::find(numbers.begin(), numbers.end(), cell.toDouble())
                                - numbers.begin()));
                    else
                        expected.push_back(
                            int(std::find(labels.begin(), labels.end(), cell) - labels.begin()));
                }
            CHECK(e->data.cells == expected);
            CHECK(e->data.values == int(numeric ? numbers.size() : labels.size()));
        }
    }
}
