#include "core/io/reliability_table_reader.h"
#include "tests/support/test_support.h"

using namespace fourfold;
using fourfold::test::writeFile;

TEST_CASE("a reliability matrix reads with missing cells and quoted values")
{
    QTemporaryDir dir;
    const QString path =
        writeFile(dir, QStringLiteral("m.csv"), "unit,A,B,C\nu1,x,,\"y, z\"\r\nu2, x ,x,x\n");
    auto t = readReliabilityTable(path);
    REQUIRE(t);
    CHECK(t->coders == QStringList {QStringLiteral("A"), QStringLiteral("B"), QStringLiteral("C")});
    CHECK(t->unitIds() == QStringList {QStringLiteral("u1"), QStringLiteral("u2")});
    CHECK(t->rowText(0) == QStringList {QStringLiteral("x"), QString(), QStringLiteral("y, z")});
    CHECK(t->rowText(1)
        == QStringList {QStringLiteral("x"), QStringLiteral("x"), QStringLiteral("x")});
    CHECK(t->unitLine(0) == 2);
    CHECK(t->unitLine(1) == 3);
}

TEST_CASE("malformed matrices are refused with the line and what is wrong")
{
    struct Case {
        const char *name;
        QByteArray content;
        qint64 line;
        const char *expected;
    };
    const Case cases[] = {
        {"empty file", "", 1, "the file is empty"},
        {"one coder only", "unit,A\nu1,x\n", 1, "at least two coders"},
        {"header without unit", "id,A,B\nu1,x,y\n", 1, "must be \"unit\""},
        {"ragged row", "unit,A,B\nu1,x,y\nu2,x\n", 3, "has 2 fields but the header has 3"},
        {"repeated unit", "unit,A,B\nu1,x,y\nu1,x,x\n", 3, "appears twice (first on line 2)"},
        {"repeated coder", "unit,A,A\nu1,x,y\n", 1, "appears twice in the header"},
        {"header only", "unit,A,B\n", 1, "no units"},
        {"unterminated quote", "unit,A,B\nu1,\"x,y\n", 2, "quote"},
    };
    for (const Case &c : cases) {
        INFO(c.name);
        QTemporaryDir dir;
        auto t = readReliabilityTable(writeFile(dir, QStringLiteral("m.csv"), c.content));
        REQUIRE_FALSE(t);
        CHECK(t.error().code == ErrorCode::InvalidInput);
        CHECK(t.error().line == c.line);
        CHECK(t.error().message.contains(QString::fromUtf8(c.expected)));
    }
}

TEST_CASE("cells hold an index per distinct label and a late repeated unit is found")
{
    // A label per distinct value, not per cell (the reader interns cell values); the repeated
    // unit check holds thousands of units without a second copy of their ids.
    QByteArray csv = "unit,A,B,C\n";
    for (int u = 1; u <= 5000; ++u)
        csv += "u" + QByteArray::number(u) + (u % 2 ? ",x,y, x \n" : ",y,,\"x\"\n");
    QTemporaryDir dir;
    auto t = readReliabilityTable(writeFile(dir, QStringLiteral("m.csv"), csv));
    REQUIRE(t);
    REQUIRE(t->unitCount() == 5000);
    CHECK(t->labels() == QStringList {QStringLiteral("x"), QStringLiteral("y")});
    for (size_t u = 0; u < t->unitCount(); ++u) {
        const std::vector<qint32> expected = u % 2 == 0
            ? std::vector<qint32> {0, 1, 0}
            : std::vector<qint32> {1, ReliabilityTable::kMissing, 0};
        const auto row = t->row(u);
        CHECK(std::vector<qint32>(row.begin(), row.end()) == expected);
    }
    CHECK(t->rowText(1) == QStringList {QStringLiteral("y"), QString(), QStringLiteral("x")});
    CHECK(t->unitId(4999) == QStringLiteral("u5000"));
    CHECK(t->unitLine(4999) == 5001);

    csv += "u1234,x,x,x\n";
    auto repeated = readReliabilityTable(writeFile(dir, QStringLiteral("r.csv"), csv));
    REQUIRE_FALSE(repeated);
    CHECK(repeated.error().line == 5002);
    CHECK(repeated.error().message.contains(
        QStringLiteral("the unit \"u1234\" appears twice (first on line 1235)")));
}

namespace {

// Everything a table holds that a reader decides: coders, labels in order, every cell, every
// unit's id and line.
QString describe(const ReliabilityTable &t)
{
    QString out = t.coders.join(u'|') + u'\n' + t.labels().join(u'|') + u'\n';
    for (size_t u = 0; u < t.unitCount(); ++u) {
        out += t.unitId(u) + u'@' + QString::number(t.unitLine(u)) + u':';
        for (const qint32 cell : t.row(u))
            out += QString::number(cell) + u',';
        out += u'\n';
    }
    return out;
}

} // namespace

TEST_CASE("the reading from bytes and the decoded reading give the same table")
{
    // readReliabilityTable reads most files straight from their bytes; the decoded reading
    // (RFC 4180 on the decoded text) is the reference. Inputs that exercise every rule of the
    // byte reading: CRLF, lone CR and LF; line breaks, commas and doubled quotes inside quotes;
    // a last record without a line break; a trailing comma; empty lines; a BOM at the start and
    // one inside a label; spaces QChar::isSpace knows beyond ASCII (NBSP, NEL, EM SPACE) at the
    // edges of cells; labels and ids outside ASCII; more than 16 labels.
    const QByteArray inputs[] = {
        "unit,A,B,C\nu1,x,,\"y, z\"\r\nu2, x ,x,x\n",
        "\xEF\xBB\xBFunit,A,B\r\nu1,a,b\ru2,\"a\"\"q\"\"\",\"line\none\"\n\nu3,a,",
        "Unit , A , B \nu1,\xC2\xA0x\xC2\xA0,\xC2\x85x\nu2,\xE2\x80\x83x,\xEF\xBB\xBFx\n"
        "caf\xC3\xA9,\xF0\x9F\x98\x80,\xE6\x97\xA5\n",
        "unit,A,B\n\"u,1\",\"\",\"\"\"\"\n\"u\n2\",\"a\r\nb\",c\nu3,,\n",
    };
    QTemporaryDir dir;
    int n = 0;
    auto compare = [&](const QByteArray &input) {
        const QString path = writeFile(dir, QStringLiteral("m%1.csv").arg(n++), input);
        auto fast = readReliabilityTable(path);
        auto decoded = readReliabilityTableDecoded(input, path);
        REQUIRE(fast.has_value() == decoded.has_value());
        if (fast)
            CHECK(describe(*fast) == describe(*decoded));
        else
            CHECK(fast.error().toString() == decoded.error().toString());
    };
    for (const QByteArray &input : inputs)
        compare(input);

    // Many labels (past the handful compared one by one) and random tables built from pieces
    // that matter to the grammar.
    QByteArray many = "unit,A,B\n";
    for (int u = 0; u < 200; ++u)
        many += "u" + QByteArray::number(u) + ",l" + QByteArray::number(u % 37) + ",l"
            + QByteArray::number(u % 23) + "\n";
    compare(many);
    const char *pieces[] = {
        "a", "b", " ", "\"", ",", "\n", "\r", "\r\n", "\xC2\xA0", "\xC3\xA9", "\"\"", "u", "1"};
    quint64 state = 42;
    for (int round = 0; round < 300; ++round) {
        QByteArray input = "unit,A,B\n";
        const int length = int(state % 40);
        for (int k = 0; k < length; ++k) {
            state = state * 6364136223846793005ULL + 1442695040888963407ULL; // Knuth's MMIX LCG
            input += pieces[(state >> 33) % std::size(pieces)];
        }
        compare(input);
    }
}
