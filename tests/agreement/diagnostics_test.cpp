// Reliability diagnostics on generated data with a planted bad coder and a planted bad article:
// they must come first, with alpha values that a naive, independent alpha confirms.

#include "core/agreement/diagnostics.h"
#include "tests/agreement/planted_project.h"

#include <cstdint>
#include <random>

using namespace fourfold;
using namespace fourfold::test;
using Catch::Matchers::WithinAbs;

namespace {

// Deliberately naive nominal alpha over a units × coders matrix of labels ("" = missing), from
// the definition in Krippendorff (2011), §B–C: coincidences o_ck = Σ_u Σ_{i≠j} / (m_u − 1),
// D_o = Σ_{c≠k} o_ck / n, D_e = Σ_{c≠k} n_c n_k / (n (n − 1)), alpha = 1 − D_o / D_e.
double naiveNominalAlpha(const std::vector<QStringList> &rows)
{
    std::map<std::pair<QString, QString>, double> o;
    std::map<QString, double> marginal;
    double n = 0;
    for (const QStringList &row : rows) {
        QStringList values;
        for (const QString &v : row)
            if (!v.isEmpty())
                values << v;
        const qsizetype m = values.size();
        if (m < 2)
            continue;
        for (qsizetype i = 0; i < m; ++i)
            for (qsizetype j = 0; j < m; ++j)
                if (i != j) {
                    o[{values[i], values[j]}] += 1.0 / double(m - 1);
                    marginal[values[i]] += 1.0 / double(m - 1);
                    n += 1.0 / double(m - 1);
                }
    }
    double observed = 0, expected = 0;
    for (const auto &[ck, count] : o)
        if (ck.first != ck.second)
            observed += count;
    for (const auto &[c, nc] : marginal)
        for (const auto &[k, nk] : marginal)
            if (c != k)
                expected += nc * nk;
    return 1.0 - (observed / n) / (expected / (n * (n - 1)));
}

// A small fixed generator (64-bit LCG, Knuth's MMIX constants) so the data do not depend on
// the standard library's distributions.
struct Lcg {
    std::uint64_t state;
    unsigned next(unsigned bound)
    {
        state = state * 6364136223846793005ULL + 1442695040888963407ULL;
        return unsigned((state >> 33) % bound);
    }
};

// 10 articles × 20 units × 5 coders, values a–d. Coders copy the true value except for 5% random
// slips; C03 gives a random value half of the time; on article "art07" every coder guesses.
ReliabilityTable plantedTable()
{
    ReliabilityTable t;
    t.coders = QStringList {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03"),
        QStringLiteral("C04"), QStringLiteral("C05")};
    Lcg rng {42};
    const QStringList labels {
        QStringLiteral("a"), QStringLiteral("b"), QStringLiteral("c"), QStringLiteral("d")};
    for (int a = 1; a <= 10; ++a) {
        const QString article = QStringLiteral("art%1").arg(a, 2, 10, QLatin1Char('0'));
        for (int u = 1; u <= 20; ++u) {
            const QString truth = labels[rng.next(4)];
            QStringList row;
            for (int c = 0; c < 5; ++c) {
                const bool guess = a == 7 || (c == 2 && rng.next(2) == 0) || rng.next(20) == 0;
                row << (guess ? labels[rng.next(4)] : truth);
            }
            // One coder did not code this unit: missing data are part of the test.
            if (u % 7 == 0)
                row[(a + u) % 5] = QString();
            t.appendUnit(article + QStringLiteral("#s%1").arg(u), row);
        }
    }
    return t;
}

std::vector<QStringList> rowsOf(const ReliabilityTable &t)
{
    std::vector<QStringList> rows;
    for (size_t u = 0; u < t.unitCount(); ++u)
        rows.push_back(t.rowText(u));
    return rows;
}

std::vector<QStringList> withoutCoder(const ReliabilityTable &t, qsizetype coder)
{
    std::vector<QStringList> rows;
    for (QStringList row : rowsOf(t)) {
        row.removeAt(coder);
        rows.push_back(row);
    }
    return rows;
}

std::vector<QStringList> withoutArticle(const ReliabilityTable &t, const QString &article)
{
    std::vector<QStringList> rows;
    for (size_t u = 0; u < t.unitCount(); ++u)
        if (unitArticle(t.unitId(u)) != article)
            rows.push_back(t.rowText(u));
    return rows;
}

} // namespace

TEST_CASE("leave-one-out finds the planted bad coder and the planted bad article in a table")
{
    const ReliabilityTable t = plantedTable();
    auto encoded = encodeTable(t, EncodingOptions {});
    REQUIRE(encoded);
    const double all = naiveNominalAlpha(rowsOf(t));
    const auto alpha = reliability::krippendorffAlpha(encoded->data, encoded->metric);
    REQUIRE(alpha.value);
    CHECK_THAT(*alpha.value, WithinAbs(all, 1e-12));

    auto coders = leaveOneCoderOut(*encoded, t.coders);
    REQUIRE(coders);
    REQUIRE(coders->size() == 5);
    const LeaveOneOut &worst = coders->front();
    CHECK(worst.name == QStringLiteral("C03"));
    REQUIRE(worst.alpha);
    REQUIRE(worst.change);
    CHECK_THAT(*worst.alpha, WithinAbs(naiveNominalAlpha(withoutCoder(t, 2)), 1e-12));
    CHECK_THAT(*worst.change, WithinAbs(*worst.alpha - all, 1e-12));
    // Leaving the careless coder out raises alpha clearly; leaving a careful one out lowers it.
    CHECK(*worst.change > 0.03);
    for (size_t i = 1; i < coders->size(); ++i) {
        REQUIRE((*coders)[i].change);
        CHECK(*(*coders)[i].change < 0);
        CHECK(*(*coders)[i].change <= *(*coders)[i - 1].change);
    }
    // C03 is the missing one where u % 7 == 0 and (a + u) % 5 == 2: u = 7, a = 5, 10; u = 14,
    // a = 3, 8.
    CHECK(worst.units == 200 - 4);

    auto articles = leaveOneArticleOut(*encoded, t);
    REQUIRE(articles);
    REQUIRE(articles->size() == 10);
    const LeaveOneOut &bad = articles->front();
    CHECK(bad.name == QStringLiteral("art07"));
    CHECK(bad.units == 20);
    REQUIRE(bad.alpha);
    CHECK_THAT(*bad.alpha,
        WithinAbs(naiveNominalAlpha(withoutArticle(t, QStringLiteral("art07"))), 1e-12));
    CHECK(*bad.change > 0.05);
    // No other article costs nearly as much.
    REQUIRE((*articles)[1].change);
    CHECK(*(*articles)[1].change < *bad.change / 3);
    const LeaveOneOut &last = articles->back();
    CHECK_THAT(*last.alpha, WithinAbs(naiveNominalAlpha(withoutArticle(t, last.name)), 1e-12));
}

TEST_CASE("leave-one-coder-out with two coders is undefined, not a number")
{
    ReliabilityTable t;
    t.coders = QStringList {QStringLiteral("A"), QStringLiteral("B")};
    t.appendUnit(u"u1", QStringList {QStringLiteral("x"), QStringLiteral("x")});
    t.appendUnit(u"u2", QStringList {QStringLiteral("y"), QStringLiteral("x")});
    auto encoded = encodeTable(t, EncodingOptions {});
    REQUIRE(encoded);
    auto coders = leaveOneCoderOut(*encoded, t.coders);
    REQUIRE(coders);
    REQUIRE(coders->size() == 2);
    CHECK_FALSE(coders->front().alpha);
    CHECK_FALSE(coders->front().reason.empty());
    CHECK_FALSE(coders->front().change);
    // Names that do not match the data are refused.
    auto wrong = leaveOneCoderOut(*encoded, QStringList {QStringLiteral("A")});
    REQUIRE_FALSE(wrong);
    CHECK(wrong.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("diagnostics can be cancelled through the progress callback")
{
    const ReliabilityTable t = plantedTable();
    auto encoded = encodeTable(t, EncodingOptions {});
    REQUIRE(encoded);
    int calls = 0;
    auto r = leaveOneArticleOut(*encoded, t, [&](int done, int total) {
        CHECK(total == 10);
        ++calls;
        return done < 3;
    });
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::Cancelled);
    CHECK(calls == 4);
}

TEST_CASE("diagnostics on a generated project: bad coder, bad article, confusion, boundaries")
{
    PlantedProject p;
    UnitSelection selection;
    selection.unit = UnitKind::Sentence;
    selection.phase = Phase::Reliability;
    auto table = unitTable(p.project, selection);
    REQUIRE(table);
    REQUIRE(table->unitCount() == 36);
    EncodingOptions encoding;
    encoding.distance = reliability::SetDistance::Masi;
    auto encoded = encodeTable(*table, encoding);
    REQUIRE(encoded);

    SECTION("the coder who confuses cause and problem costs most")
    {
        auto coders = leaveOneCoderOut(*encoded, table->coders);
        REQUIRE(coders);
        REQUIRE(coders->size() == 4);
        CHECK(coders->front().name == QStringLiteral("C02"));
        REQUIRE(coders->front().change);
        CHECK(*coders->front().change > 0);
    }
    SECTION("the article on which everyone marks a different sentence costs most")
    {
        auto articles = leaveOneArticleOut(*encoded, *table);
        REQUIRE(articles);
        REQUIRE(articles->size() == 6);
        CHECK(articles->front().name == QStringLiteral("a5"));
        CHECK(articles->front().units == 6);
        REQUIRE(articles->front().change);
        CHECK(*articles->front().change > 0.05);
        REQUIRE((*articles)[1].change);
        CHECK(*(*articles)[1].change < 0);
        // Without a5 the only disagreement left is C02's: alpha of a table without it.
        ReliabilityTable rest;
        rest.coders = table->coders;
        for (size_t u = 0; u < table->unitCount(); ++u)
            if (unitArticle(table->unitId(u)) != QStringLiteral("a5"))
                rest.appendUnit(table->unitId(u), table->rowText(u));
        auto restEncoded = encodeTable(rest, encoding);
        REQUIRE(restEncoded);
        const auto restAlpha =
            reliability::krippendorffAlpha(restEncoded->data, restEncoded->metric);
        REQUIRE(restAlpha.value);
        CHECK_THAT(*articles->front().alpha, WithinAbs(*restAlpha.value, 1e-12));
    }
    SECTION("the function confusion counts the planted cause/problem swaps exactly")
    {
        auto matching = matchSpans(p.project, selection);
        REQUIRE(matching);
        CHECK(matching->pairsCompared == 6);
        const FunctionConfusion &m = matching->confusion;
        constexpr int P = 0, C = 1, R = 3, None = 4;
        // C02's problem against the three others' cause, in 5 articles, both directions.
        CHECK(m.at(C, P) == 15);
        CHECK(m.at(P, C) == 15);
        // Cause with cause: pairs among C01, C03, C04 (3 pairs × 2 directions × 5 articles).
        CHECK(m.at(C, C) == 30);
        // Remedy always agrees: 6 pairs × 2 directions × 5 articles.
        CHECK(m.at(R, R) == 60);
        // Article a5: each of 4 spans finds nothing in each of the 3 other coders.
        CHECK(m.at(P, None) == 12);
        // Problem with problem: sentence 1 in 5 articles (60) plus C02's second problem span
        // never meets a problem (counted above).
        CHECK(m.at(P, P) == 60);
        CHECK(m.sameFunction() == 150);
        CHECK(m.matched() == 180);
    }
    SECTION("the coder who always takes the whole sentence has the boundary habit")
    {
        auto matching = matchSpans(p.project, selection);
        REQUIRE(matching);
        REQUIRE(matching->boundaries.size() == 4);
        const BoundaryHabit &first = matching->boundaries.front();
        CHECK(first.coder == QStringLiteral("C04"));
        // Against C01 and C03: 3 spans × 5 articles each; against C02: 2 × 5 (cause ≠ problem).
        CHECK(first.matches == 40);
        CHECK_THAT(first.meanLengthDifference, WithinAbs(10.0, 1e-12));
        CHECK_THAT(first.meanStartDifference, WithinAbs(0.0, 1e-12));
        CHECK_THAT(first.meanEndDifference, WithinAbs(10.0, 1e-12));
        CHECK(first.shareLonger == 1.0);
        CHECK(first.systematic);
        // C01: 15 matches with C03 (0), 10 with C02 (0), 15 with C04 (−10): mean −150/40.
        auto c01 = std::find_if(matching->boundaries.begin(), matching->boundaries.end(),
            [](const BoundaryHabit &b) { return b.coder == QStringLiteral("C01"); });
        REQUIRE(c01 != matching->boundaries.end());
        CHECK(c01->matches == 40);
        CHECK_THAT(c01->meanLengthDifference, WithinAbs(-3.75, 1e-12));
    }
    SECTION("alpha per batch shows the batch with the bad article")
    {
        auto periods = alphaByPeriod(p.project, selection, *table, encoding, PeriodKind::Batch, 2);
        REQUIRE(periods);
        REQUIRE(periods->size() == 3);
        CHECK((*periods)[0].label == QStringLiteral("1–2"));
        CHECK((*periods)[2].articles == QStringList {QStringLiteral("a5"), QStringLiteral("a6")});
        REQUIRE((*periods)[0].alpha.value);
        REQUIRE((*periods)[2].alpha.value);
        CHECK(*(*periods)[2].alpha.value < *(*periods)[0].alpha.value - 0.1);
        // The same figure along an independent path: a unit table of those two articles only.
        UnitSelection firstTwo = selection;
        firstTwo.articles = QStringList {QStringLiteral("a1"), QStringLiteral("a2")};
        auto part = unitTable(p.project, firstTwo);
        REQUIRE(part);
        auto partEncoded = encodeTable(*part, encoding);
        REQUIRE(partEncoded);
        const auto partAlpha =
            reliability::krippendorffAlpha(partEncoded->data, partEncoded->metric);
        REQUIRE(partAlpha.value);
        CHECK_THAT(*(*periods)[0].alpha.value, WithinAbs(*partAlpha.value, 1e-12));

        auto weeks = alphaByPeriod(p.project, selection, *table, encoding, PeriodKind::Week);
        REQUIRE(weeks);
        REQUIRE(weeks->size() == 1); // everything was coded just now
        CHECK((*weeks)[0].label.contains(QStringLiteral("-W")));
        CHECK((*weeks)[0].articles.size() == 6);
    }
    SECTION("unknown coders are refused")
    {
        UnitSelection bad = selection;
        bad.coders = QStringList {QStringLiteral("C01"), QStringLiteral("X9")};
        auto matching = matchSpans(p.project, bad);
        REQUIRE_FALSE(matching);
        CHECK(matching.error().code == ErrorCode::NotFound);
    }
}

TEST_CASE("leaving an article out by subtraction equals recomputing without it")
{
    // Random data of 40 articles with 1–6 units each, 3 coders, missing cells, at the nominal,
    // ordinal and interval levels: every article's alpha from the totals minus its own
    // coincidences equals Krippendorff's alpha recomputed on the data without it (the oracle is
    // the kernel checked against Krippendorff 2011 in tests/reliability).
    std::mt19937 engine(7);
    for (reliability::Level level :
        {reliability::Level::Nominal, reliability::Level::Ordinal, reliability::Level::Interval}) {
        EncodedData encoded;
        encoded.metric.level = level;
        encoded.metric.numeric = {0, 1, 2, 3};
        encoded.data.coders = 3;
        encoded.data.values = 4;
        QStringList units;
        ReliabilityTable named; // names the units; the cells are those of `encoded`
        named.coders = {QStringLiteral("A"), QStringLiteral("B"), QStringLiteral("C")};
        const std::vector<qint32> unread(3, ReliabilityTable::kMissing);
        for (int a = 0; a < 40; ++a) {
            const int count = 1 + int(engine() % 6);
            for (int u = 0; u < count; ++u) {
                units << QStringLiteral("art%1#s%2").arg(a).arg(u + 1);
                named.appendUnit(units.back(), unread);
                const int base = int(engine() % 4);
                for (int c = 0; c < 3; ++c)
                    encoded.data.cells.push_back(engine() % 7 == 0 ? reliability::kMissing
                            : engine() % 4 == 0                    ? int(engine() % 4)
                                                                   : base);
                ++encoded.data.units;
            }
        }
        const std::uint64_t copiedBefore = leaveOneOutCellsCopied();
        auto out = leaveOneArticleOut(encoded, named);
        REQUIRE(out);
        REQUIRE(out->size() == 40);
        // Each cell is copied once (its article's turn), not once per article.
        CHECK(leaveOneOutCellsCopied() - copiedBefore == encoded.data.cells.size());
        for (const LeaveOneOut &e : *out) {
            INFO(e.name.toStdString());
            reliability::ReliabilityData rest;
            rest.coders = 3;
            rest.values = 4;
            for (int u = 0; u < encoded.data.units; ++u) {
                if (unitArticle(units[u]) == e.name)
                    continue;
                for (int c = 0; c < 3; ++c)
                    rest.cells.push_back(encoded.data.at(u, c));
                ++rest.units;
            }
            const auto expected = reliability::krippendorffAlpha(rest, encoded.metric);
            REQUIRE(e.alpha.has_value() == expected.value.has_value());
            if (expected.value)
                CHECK_THAT(*e.alpha, WithinAbs(*expected.value, 1e-12));
            CHECK(e.pairableValues == expected.pairableValues);
        }
    }
}
