#include "core/exchange/article_split.h"
#include "tests/support/test_support.h"

#include <map>
#include <set>

using namespace fourfold;

TEST_CASE("split ratios parse", "[exchange][split]")
{
    auto three = SplitRatios::parse(QStringLiteral("80/10/10"));
    REQUIRE(three);
    CHECK(three->names
        == QStringList {QStringLiteral("train"), QStringLiteral("dev"), QStringLiteral("test")});
    CHECK(three->ratios == std::vector<double> {0.8, 0.1, 0.1});
    CHECK(three->text() == QStringLiteral("80/10/10"));
    auto two = SplitRatios::parse(QStringLiteral("90/10"));
    REQUIRE(two);
    CHECK(two->names.size() == 2);
    for (const char *bad : {"80/10", "80/10/5/5", "a/b/c", "100", "-10/100/10", ""}) {
        auto r = SplitRatios::parse(QString::fromUtf8(bad));
        REQUIRE_FALSE(r);
        CHECK(r.error().message.contains(QStringLiteral("summing to 100")));
    }
}

TEST_CASE("splits are by article, stratified, seeded", "[exchange][split]")
{
    // 200 invented articles in 4 strata of 100, 60, 30 and 10.
    std::vector<unsigned> strata;
    QStringList keys;
    for (int i = 0; i < 200; ++i) {
        strata.push_back(i < 100 ? 1u : i < 160 ? 3u : i < 190 ? 8u : 15u);
        keys << QStringLiteral("a%1").arg(i, 3, 10, QLatin1Char('0'));
    }
    const SplitRatios ratios = *SplitRatios::parse(QStringLiteral("80/10/10"));
    const std::vector<int> split = splitArticles(strata, keys, ratios, 42);
    REQUIRE(split.size() == 200);
    // Every article in exactly one split (by construction one index each), and the sizes follow
    // the ratios overall and within each stratum (common practice: stratified sampling).
    std::map<int, int> total;
    std::map<std::pair<unsigned, int>, int> perStratum;
    for (std::size_t i = 0; i < split.size(); ++i) {
        ++total[split[i]];
        ++perStratum[{strata[i], split[i]}];
    }
    CHECK(total[0] == 160);
    CHECK(total[1] == 20);
    CHECK(total[2] == 20);
    CHECK(perStratum[{1u, 0}] == 80);
    CHECK(perStratum[{1u, 1}] == 10);
    CHECK(perStratum[{3u, 0}] == 48);
    CHECK(perStratum[{3u, 2}] == 6);
    CHECK(perStratum[{15u, 0}] == 8);
    CHECK(perStratum[{15u, 1}] == 1);
    CHECK(perStratum[{15u, 2}] == 1);
    // The same seed gives the same split, whatever order the articles come in.
    std::vector<unsigned> reversedStrata(strata.rbegin(), strata.rend());
    QStringList reversedKeys(keys.rbegin(), keys.rend());
    const std::vector<int> again = splitArticles(reversedStrata, reversedKeys, ratios, 42);
    for (std::size_t i = 0; i < split.size(); ++i)
        CHECK(again[split.size() - 1 - i] == split[i]);
    // Another seed gives another split of the same sizes.
    const std::vector<int> other = splitArticles(strata, keys, ratios, 43);
    CHECK(other != split);
    CHECK(std::count(other.begin(), other.end(), 0) == 160);
}

TEST_CASE("small strata still fill every split overall", "[exchange][split]")
{
    // 10 strata of one article each: ⌊0.8⌋ = 0 per stratum, so the leftovers decide: 8/1/1.
    std::vector<unsigned> strata;
    QStringList keys;
    for (unsigned i = 0; i < 10; ++i) {
        strata.push_back(i);
        keys << QString::number(i);
    }
    const std::vector<int> split =
        splitArticles(strata, keys, *SplitRatios::parse(QStringLiteral("80/10/10")), 1);
    CHECK(std::count(split.begin(), split.end(), 0) == 8);
    CHECK(std::count(split.begin(), split.end(), 1) == 1);
    CHECK(std::count(split.begin(), split.end(), 2) == 1);
}
