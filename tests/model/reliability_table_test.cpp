#include "core/model/reliability_table.h"
#include "tests/support/test_support.h"

#include <vector>

using namespace fourfold;

namespace {

constexpr qint32 kMissing = ReliabilityTable::kMissing;

// Two articles of numbered sentence units and one unit with an id of its own, three coders.
ReliabilityTable mixedTable()
{
    ReliabilityTable t;
    t.coders = {QStringLiteral("A"), QStringLiteral("B"), QStringLiteral("C")};
    const qint32 yes = t.labelIndex(u"present");
    const qint32 no = t.labelIndex(u"absent");
    t.appendNumberedUnits(QStringLiteral("a1"), QStringLiteral("#s"),
        std::vector<qint32> {yes, yes, no, no, no, kMissing});
    t.appendUnit(u"loose", std::vector<qint32> {yes, no, yes}, 7);
    t.appendNumberedUnits(QStringLiteral("a2"), QStringLiteral("#s"),
        std::vector<qint32> {no, no, no, yes, kMissing, yes, yes, yes, yes});
    return t;
}

} // namespace

TEST_CASE("a reliability table names its units and holds a label index per cell")
{
    const ReliabilityTable t = mixedTable();
    REQUIRE(t.unitCount() == 6);
    CHECK(t.unitIds()
        == QStringList {QStringLiteral("a1#s1"), QStringLiteral("a1#s2"), QStringLiteral("loose"),
            QStringLiteral("a2#s1"), QStringLiteral("a2#s2"), QStringLiteral("a2#s3")});
    CHECK(t.labels() == QStringList {QStringLiteral("present"), QStringLiteral("absent")});
    CHECK(t.rowText(1)
        == QStringList {QStringLiteral("absent"), QStringLiteral("absent"), QString()});
    CHECK(t.cell(4, 1) == kMissing);
    CHECK(t.unitLine(2) == 7);
    CHECK(t.unitLine(0) == 0);
    CHECK(t.ownId(2) == QStringLiteral("loose"));
    CHECK(t.ownId(3).isEmpty());
    // The same label added again keeps its index.
    ReliabilityTable copy = t;
    CHECK(copy.labelIndex(u"absent") == 1);
    CHECK(copy.labels().size() == 2);

    QStringList articles;
    const std::vector<qint32> articleOf = t.unitArticles(articles);
    CHECK(articles
        == QStringList {QStringLiteral("a1"), QStringLiteral("loose"), QStringLiteral("a2")});
    CHECK(articleOf == std::vector<qint32> {0, 0, 1, 2, 2, 2});
}

TEST_CASE("rows and columns of a reliability table keep ids, lines and labels")
{
    const ReliabilityTable t = mixedTable();
    const std::vector<size_t> picked {5, 2, 3, 4, 0};
    const ReliabilityTable r = t.rows(picked);
    REQUIRE(r.unitCount() == picked.size());
    for (size_t i = 0; i < picked.size(); ++i) {
        CHECK(r.unitId(i) == t.unitId(picked[i]));
        CHECK(r.rowText(i) == t.rowText(picked[i]));
        CHECK(r.unitLine(i) == t.unitLine(picked[i]));
    }
    QStringList articles;
    CHECK(r.unitArticles(articles) == std::vector<qint32> {0, 1, 0, 0, 2});
    CHECK(articles
        == QStringList {QStringLiteral("a2"), QStringLiteral("loose"), QStringLiteral("a1")});

    const std::vector<qsizetype> kept {2, 0};
    const ReliabilityTable c = t.columns(kept);
    CHECK(c.coders == QStringList {QStringLiteral("C"), QStringLiteral("A")});
    for (size_t u = 0; u < t.unitCount(); ++u) {
        CHECK(c.unitId(u) == t.unitId(u));
        CHECK(c.cell(u, 0) == t.cell(u, 2));
        CHECK(c.cell(u, 1) == t.cell(u, 0));
    }
}

TEST_CASE("a column can be added and labels merged")
{
    ReliabilityTable t = mixedTable();
    const qint32 yes = t.labelIndex(u"present");
    t.appendColumn(QStringLiteral("run"), std::vector<qint32> {yes, kMissing, yes, yes, yes, yes});
    REQUIRE(t.coderCount() == 4);
    CHECK(t.rowText(1)
        == QStringList {QStringLiteral("absent"), QStringLiteral("absent"), QString(), QString()});
    CHECK(t.cellText(0, 3) == QStringLiteral("present"));
    // Both labels become one: every cell that held either holds it.
    t.relabel({0, 0}, QStringList {QStringLiteral("coded")});
    CHECK(t.rowText(4)
        == QStringList {
            QStringLiteral("coded"), QString(), QStringLiteral("coded"), QStringLiteral("coded")});
    CHECK(t.labels() == QStringList {QStringLiteral("coded")});
}

TEST_CASE("unitArticle strips the unit suffix made by the unitizers")
{
    CHECK(unitArticle(u"a7#s12") == QStringLiteral("a7"));
    CHECK(unitArticle(u"a7#p2") == QStringLiteral("a7"));
    CHECK(unitArticle(u"a7#t130") == QStringLiteral("a7"));
    CHECK(unitArticle(u"a7#a1") == QStringLiteral("a7"));
    CHECK(unitArticle(u"a7") == QStringLiteral("a7"));
    CHECK(unitArticle(u"x#y#s3") == QStringLiteral("x#y"));
    // Not a unit suffix: another letter, no digits, or more after the digits.
    CHECK(unitArticle(u"a7#x1") == QStringLiteral("a7#x1"));
    CHECK(unitArticle(u"a7#s") == QStringLiteral("a7#s"));
    CHECK(unitArticle(u"a7#s1b") == QStringLiteral("a7#s1b"));
    CHECK(unitArticle(u"a7#s1#") == QStringLiteral("a7#s1#"));
    CHECK(unitArticle(u"#t4").isEmpty());
}

TEST_CASE("the lines of units with their own ids are kept in a run and off it")
{
    // One row a line (lines 2, 3, 4 …) is held as its first line; a line off the run (a quoted
    // line break, an empty line) writes the lines out; both give every unit its line.
    ReliabilityTable t;
    t.coders = {QStringLiteral("A"), QStringLiteral("B")};
    const std::vector<qint32> row {0, kMissing};
    t.labelIndex(u"x");
    const std::vector<qint64> lines {2, 3, 4, 5, 7, 8, 12};
    for (size_t i = 0; i < lines.size(); ++i) {
        t.appendUnit(QStringLiteral("u%1").arg(i), row, lines[i]);
        for (size_t k = 0; k <= i; ++k)
            CHECK(t.unitLine(k) == lines[k]);
    }
    // Own ids after numbered units go on from the ones before.
    t.appendNumberedUnits(QStringLiteral("a1"), QStringLiteral("#s"), row);
    t.appendUnit(u"later", row, 20);
    t.appendUnit(u"last", row, 21);
    CHECK(t.unitLine(7) == 0);
    CHECK(t.unitLine(8) == 20);
    CHECK(t.unitLine(9) == 21);
    CHECK(t.unitLine(6) == 12);
    // Rows and columns keep them.
    const std::vector<size_t> picked {9, 0, 4};
    const ReliabilityTable r = t.rows(picked);
    CHECK(r.unitLine(0) == 21);
    CHECK(r.unitLine(1) == 2);
    CHECK(r.unitLine(2) == 7);
    const std::vector<qsizetype> kept {1};
    const ReliabilityTable c = t.columns(kept);
    for (size_t u = 0; u < t.unitCount(); ++u)
        CHECK(c.unitLine(u) == t.unitLine(u));
}
