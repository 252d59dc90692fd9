#include "core/frames/chi_square.h"
#include "tests/frames/python_reference.h"

#include <catch2/catch.hpp>

#include <cmath>
#include <random>

using namespace fourfold;
using namespace fourfold::frames;

TEST_CASE("Chi-square and Cramér's V equal scipy.stats.chi2_contingency")
{
    // Reference: scipy.stats.chi2_contingency(table, correction=False) and
    // scipy.stats.contingency.association(table, method="cramer") (Debian python3-scipy).
    struct Table {
        std::vector<long long> counts;
        int rows, columns;
    };
    std::vector<Table> tables;
    QJsonArray requests;
    for (std::uint64_t seed = 1; seed <= 60; ++seed) {
        std::mt19937_64 generator(seed);
        Table t;
        t.rows = 2 + int(seed % 6);
        t.columns = 2 + int((seed / 6) % 5);
        std::uniform_int_distribution<long long> count(1, seed % 2 ? 12 : 400);
        QJsonArray rows;
        for (int r = 0; r < t.rows; ++r) {
            QJsonArray row;
            for (int c = 0; c < t.columns; ++c) {
                // Seed 3: a strong association, so p is tiny.
                const long long v = count(generator) + (seed == 3 && r == c ? 500 : 0);
                t.counts.push_back(v);
                row.append(double(v));
            }
            rows.append(row);
        }
        requests.append(QJsonObject {{"op", "chi2"}, {"table", rows}});
        tables.push_back(t);
    }
    const QJsonArray reference = test::referenceResults(requests);
    for (std::size_t s = 0; s < tables.size(); ++s) {
        INFO("table " << s);
        const auto result = chiSquare(tables[s].counts, tables[s].rows, tables[s].columns);
        REQUIRE(result);
        const QJsonObject expected = reference[qsizetype(s)].toObject();
        REQUIRE(result->statistic);
        const double statistic = expected.value("statistic").toDouble();
        CHECK(std::abs(*result->statistic - statistic) <= 1e-9 * std::max(1.0, statistic));
        CHECK(result->degreesOfFreedom == expected.value("dof").toInt());
        const double p = expected.value("p").toDouble();
        CHECK(std::abs(*result->pValue - p) <= 1e-9 * std::max(p, 1e-300) + 1e-300);
        CHECK(std::abs(*result->cramersV - expected.value("v").toDouble()) <= 1e-9);
    }
}

TEST_CASE("Chi-square leaves out empty rows and columns and needs two of each")
{
    const auto full = chiSquare({10, 20, 30, 5}, 2, 2);
    const auto padded = chiSquare({10, 0, 20, 0, 0, 0, 30, 0, 5}, 3, 3);
    REQUIRE(full);
    REQUIRE(padded);
    CHECK(*padded->statistic == *full->statistic);
    CHECK(padded->degreesOfFreedom == 1);
    CHECK(padded->rowsUsed == 2);
    const auto single = chiSquare({4, 5, 6}, 1, 3);
    REQUIRE(single);
    CHECK(!single->statistic);
    CHECK(!single->reason.empty());
    CHECK(!chiSquare({1, -1}, 1, 2).has_value());
    // Q(1, x) = e^{−x} (the chi-square survival with 2 degrees of freedom at 2x).
    CHECK(upperRegularizedGamma(1.0, 3.0) == Approx(std::exp(-3.0)).epsilon(1e-14));
    CHECK(upperRegularizedGamma(1.0, 0.5) == Approx(std::exp(-0.5)).epsilon(1e-14));
}
