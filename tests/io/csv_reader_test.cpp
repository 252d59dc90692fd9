// CSV reading. The record grammar is RFC 4180 §2 (Shafranovich 2005, "Common Format and MIME
// Type for Comma-Separated Values (CSV) Files"); each check names the rule of §2 it follows.
// Skipping completely empty lines is common practice (Python's csv.DictReader does it).

#include "core/io/article_reader.h"
#include "core/io/csv_reader.h"
#include "tests/io/reader_test_support.h"

#include <QJsonObject>
#include <QStringList>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// A record as forEachCsvRecord hands it over, its fields copied.
struct CsvRecord {
    QStringList fields;
    qint64 line = 0;
};

Result<std::vector<CsvRecord>> parseCsvRecords(const QString &text, const QString &file)
{
    std::vector<CsvRecord> records;
    FOURFOLD_TRY_STATUS(
        forEachCsvRecord(text, file, [&](const std::vector<QStringView> &fields, qint64 line) {
            CsvRecord record {{}, line};
            for (QStringView field : fields)
                record.fields.append(field.toString());
            records.push_back(std::move(record));
            return Status {};
        }));
    return records;
}

struct GoodRecords {
    const char *what;
    QString text;
    std::vector<QStringList> fields;
    std::vector<qint64> lines;
};

} // namespace

TEST_CASE("CSV records follow RFC 4180 section 2", "[io][csv]")
{
    const auto L = [](std::initializer_list<const char16_t *> fields) {
        QStringList list;
        for (const char16_t *f : fields)
            list.append(QString::fromUtf16(f));
        return list;
    };
    // clang-format off
    const GoodRecords cases[] = {
        {"§2.1: records end with CRLF",
         QStringLiteral("a,b\r\nc,d\r\n"), {L({u"a", u"b"}), L({u"c", u"d"})}, {1, 2}},
        {"§2.2: the last record may end without a line break",
         QStringLiteral("a,b\r\nc,d"), {L({u"a", u"b"}), L({u"c", u"d"})}, {1, 2}},
        {"LF and a lone CR end records as well",
         QStringLiteral("a\nb\rc"), {L({u"a"}), L({u"b"}), L({u"c"})}, {1, 2, 3}},
        {"§2.4: spaces are part of a field; a trailing comma makes an empty last field",
         QStringLiteral(" a , b ,\r\n"), {L({u" a ", u" b ", u""})}, {1}},
        {"§2.4: empty fields",
         QStringLiteral(",,\n"), {L({u"", u"", u""})}, {1}},
        {"§2.5: fields may be enclosed in double quotes",
         QStringLiteral("\"a\",\"b\"\r\n"), {L({u"a", u"b"})}, {1}},
        {"§2.6: line breaks and commas inside quotes; the next record starts on line 3",
         QStringLiteral("\"a\r\nb\",\"c,d\"\r\ne,f\r\n"),
         {L({u"a\r\nb", u"c,d"}), L({u"e", u"f"})}, {1, 3}},
        {"§2.7: a doubled quote inside quotes is one quote",
         QStringLiteral("\"a\"\"b\",\"\"\"\",\"\"\n"), {L({u"a\"b", u"\"", u""})}, {1}},
        {"completely empty lines are skipped; line numbers stay physical",
         QStringLiteral("a\n\n\r\nb\n"), {L({u"a"}), L({u"b"})}, {1, 4}},
        {"non-ASCII text and characters outside the BMP",
         QStringLiteral(u"\u00E9t\u00E9,\U0001F600\n"), {L({u"\u00E9t\u00E9", u"\U0001F600"})}, {1}},
    };
    // clang-format on
    for (const GoodRecords &c : cases) {
        INFO("case: " << c.what);
        const auto records = parseCsvRecords(c.text, QStringLiteral("t.csv"));
        REQUIRE(records.has_value());
        REQUIRE(records->size() == c.fields.size());
        for (std::size_t r = 0; r < c.fields.size(); ++r) {
            CHECK(records->at(r).fields == c.fields[r]);
            CHECK(records->at(r).line == c.lines[r]);
        }
    }
}

TEST_CASE("CSV records: quoting errors name line and column", "[io][csv]")
{
    struct Bad {
        const char *what;
        QString text;
        qint64 line;
        qint64 column;
        const char *fragment;
    };
    // clang-format off
    const Bad cases[] = {
        {"§2.5: a quote inside an unquoted field",
         QStringLiteral("a,b\nc,d\"e\n"), 2, 4, "a double quote inside a field"},
        {"columns count code points: the emoji before the quote is one column",
         QStringLiteral(u"\U0001F600\"\n"), 1, 2, "a double quote inside a field"},
        {"§2.7: a text after the closing quote (an undoubled inner quote)",
         QStringLiteral("x\n\"say \"hi\" now\"\n"), 2, 7, "after the closing double quote"},
        {"a space after the closing quote (§2.4: spaces are field content)",
         QStringLiteral("\"a\" ,b\n"), 1, 4, "after the closing double quote"},
        {"an unterminated quote is reported where it opens, not at the end of the file",
         QStringLiteral("id,text\n1,\"never closed\n2,more\n3,and more\n"), 2, 3,
         "never closed"},
    };
    // clang-format on
    for (const Bad &c : cases) {
        INFO("case: " << c.what);
        const auto records = parseCsvRecords(c.text, QStringLiteral("t.csv"));
        REQUIRE_FALSE(records.has_value());
        CHECK(records.error().code == ErrorCode::InvalidInput);
        CHECK(records.error().line == c.line);
        CHECK(records.error().column == c.column);
        CHECK(records.error().message.contains(QString::fromUtf8(c.fragment)));
    }
}

TEST_CASE("CSV: every field of a valid file", "[io][csv]")
{
    // A BOM (as spreadsheet programs write it), CRLF line ends, a quoted field holding commas,
    // doubled quotes and a blank line, and an extra column that goes into meta.
    const QByteArray bytes = "\xEF\xBB\xBF"
                             "id,title,text,outlet,published,language,section\r\n"
                             "a1,\"Budget, revisited\",\"First para.\r\n\r\nSecond \"\"quoted\"\" "
                             "para.\",Riverton Ledger,2024-03-05,en,local\r\n"
                             "a2,Plain,Body text,,,,\r\n";
    ImportOptions options;
    options.language = QStringLiteral("nl");
    const auto result = readBytes(QStringLiteral("list.csv"), bytes, options);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 2);

    const ImportedArticle &a = result->at(0);
    CHECK(a.externalId == QStringLiteral("a1"));
    CHECK(a.title == QStringLiteral("Budget, revisited"));
    CHECK(a.text == QStringLiteral("First para.\r\n\r\nSecond \"quoted\" para."));
    CHECK(a.outlet == QStringLiteral("Riverton Ledger"));
    CHECK(a.published == QStringLiteral("2024-03-05"));
    CHECK(a.language == QStringLiteral("en"));
    CHECK(a.meta == QJsonObject {{QStringLiteral("section"), QStringLiteral("local")}});
    CHECK(a.sourceLine == 2);

    const ImportedArticle &b = result->at(1);
    CHECK(b.externalId == QStringLiteral("a2"));
    CHECK(b.title == QStringLiteral("Plain"));
    CHECK(b.text == QStringLiteral("Body text"));
    CHECK(b.outlet.isEmpty());
    CHECK(b.published.isEmpty());
    CHECK(b.language == QStringLiteral("nl")); // empty cell: the options' language
    CHECK(b.meta == QJsonObject {{QStringLiteral("section"), QString()}});
    CHECK(b.sourceLine == 5); // a1 spans lines 2 to 4
}

TEST_CASE("CSV: columns are mapped by name", "[io][csv]")
{
    const QByteArray bytes = "uid,body,headline,source,extra\n"
                             "7,The text.,The title,Valley Post,x\n";
    ImportOptions options;
    options.csvColumns = {{QStringLiteral("id"), QStringLiteral("uid")},
        {QStringLiteral("title"), QStringLiteral("headline")},
        {QStringLiteral("text"), QStringLiteral("body")},
        {QStringLiteral("outlet"), QStringLiteral("source")}};
    const auto result = readBytes(QStringLiteral("mapped.csv"), bytes, options);
    REQUIRE(result.has_value());
    REQUIRE(result->size() == 1);
    const ImportedArticle &a = result->front();
    CHECK(a.externalId == QStringLiteral("7"));
    CHECK(a.title == QStringLiteral("The title"));
    CHECK(a.text == QStringLiteral("The text."));
    CHECK(a.outlet == QStringLiteral("Valley Post"));
    CHECK(a.meta == QJsonObject {{QStringLiteral("extra"), QStringLiteral("x")}});
}

TEST_CASE("CSV: malformed files are refused with line and reason", "[io][csv]")
{
    const QByteArray header = "id,title,text\n";
    // clang-format off
    const BadInput cases[] = {
        {"§2.3: a required column is missing; the header found is named",
         "id,headline,text\n1,t,x\n", ErrorCode::InvalidInput, 1, 0,
         "the header has no column \"title\", which is required; it has \"id\", \"headline\", "
         "\"text\""},
        {"a semicolon-separated file gets a hint",
         "id;title;text\n1;t;x\n", ErrorCode::InvalidInput, 1, 0, "separated by \";\""},
        {"a header column without a name",
         "id,,title,text\n1,,t,x\n", ErrorCode::InvalidInput, 1, 0,
         "column 2 of the header has no name"},
        {"a header naming a column twice",
         "id,title,text,title\n1,t,x,u\n", ErrorCode::InvalidInput, 1, 0,
         "names column \"title\" twice (columns 2 and 4)"},
        {"§2.4: a record with too few fields",
         header + "1,t,x\n2,u\n", ErrorCode::InvalidInput, 3, 0,
         "the record has 2 fields but the header has 3"},
        {"a record with too many fields after a record spanning lines 2-3: its first line",
         header + "1,t,\"x\ny\"\n2,u,v,w\n", ErrorCode::InvalidInput, 4, 0,
         "the record has 4 fields but the header has 3"},
        {"§2.6: an unterminated quote names the line where the quoted field began",
         header + "1,t,x\n2,u,\"open\n3,v,w\n", ErrorCode::InvalidInput, 3, 5, "never closed"},
        {"§2.5: a double quote inside an unquoted field",
         header + "1,say \"hi\",x\n", ErrorCode::InvalidInput, 2, 7,
         "a double quote inside a field"},
        {"§2.7: an undoubled quote inside a quoted field",
         header + "1,\"say \"hi\"\",x\n", ErrorCode::InvalidInput, 2, 9,
         "after the closing double quote"},
        {"duplicate ids", header + "1,t,x\n2,u,y\n1,v,z\n", ErrorCode::Duplicate, 4, 0,
         "duplicate id \"1\" (first seen on line 2)"},
        {"blank id", header + " ,t,x\n", ErrorCode::InvalidInput, 2, 0, "has no id"},
        {"empty text", header + "1,t,\n", ErrorCode::InvalidInput, 2, 0, "has no text"},
        {"invalid UTF-8 in a field (0xC3 0x28: a cut-short sequence)",
         header + "1,caf\xC3(,x\n", ErrorCode::InvalidInput, 2, 6, "invalid UTF-8"},
        {"a binary file", bytesOf("id,title,text\n\0\0\0\0"), ErrorCode::InvalidInput, 2, 1,
         "binary"},
        {"empty file", "", ErrorCode::InvalidInput, 0, 0, "contains no articles"},
        {"only a header", header, ErrorCode::InvalidInput, 0, 0, "contains no articles"},
        {"only empty lines", "\r\n\n", ErrorCode::InvalidInput, 0, 0, "contains no articles"},
    };
    // clang-format on
    for (const BadInput &input : cases)
        checkBadInput(QStringLiteral("bad.csv"), input);
}

TEST_CASE("CSV: a bad column mapping is refused", "[io][csv]")
{
    const QByteArray bytes = "id,title,text\n1,t,x\n";
    ImportOptions options;

    options.csvColumns = {{QStringLiteral("title"), QStringLiteral("headline")}};
    checkBadInput(QStringLiteral("map.csv"),
        {"a mapped column that the header lacks", bytes, ErrorCode::InvalidInput, 1, 0,
            "no column \"headline\" (the column for the field \"title\")"},
        options);

    options.csvColumns = {{QStringLiteral("outlet"), QStringLiteral("source")}};
    checkBadInput(QStringLiteral("map.csv"),
        {"a mapped optional column must exist as well", bytes, ErrorCode::InvalidInput, 1, 0,
            "no column \"source\" (the column for the field \"outlet\")"},
        options);

    options.csvColumns = {{QStringLiteral("titel"), QStringLiteral("title")}};
    const auto result = readBytes(QStringLiteral("map.csv"), bytes, options);
    REQUIRE_FALSE(result.has_value());
    CHECK(result.error().code == ErrorCode::InvalidArgument);
    CHECK(result.error().message.contains(QStringLiteral("unknown field \"titel\"")));
}
