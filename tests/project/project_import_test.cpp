#include "core/project/coding_import.h"
#include "core/project/testing/project_database.h"
#include "core/store/statement.h"
#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"
#include "project_fixture.h"
#include "tests/support/db_dump.h"

#include <QCryptographicHash>
#include <QFile>

#include <sqlite3.h>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("import stores canonical text, its hash and frozen units")
{
    ProjectFixture f;
    // NFD input ("e" + combining acute) and CRLF line ends become NFC and LF (UAX #15).
    const QByteArray jsonl = "{\"id\":\"n1\",\"title\":\"Cafe\\u0301 "
                             "closes\",\"text\":\"Cafe\\u0301 closes.\\r\\n\\r\\nIt is sad.\"}\n";
    auto report = f.importJsonl(jsonl);
    REQUIRE(report.added.size() == 1);
    auto article = f.project.article(report.added[0]);
    REQUIRE(article);
    CHECK(article->text == QStringLiteral("Caf\u00E9 closes.\n\nIt is sad."));
    CHECK(article->summary.title == QStringLiteral("Caf\u00E9 closes"));
    CHECK(article->summary.length == 24);
    CHECK(article->summary.sha256 == textSha256(article->text));
    // SHA-256 of the UTF-8 bytes, computed independently with Qt (FIPS 180-4).
    CHECK(article->summary.sha256
        == QString::fromLatin1(
            QCryptographicHash::hash(article->text.toUtf8(), QCryptographicHash::Sha256).toHex()));
    CHECK(article->summary.language == QStringLiteral("en")); // the project default
    REQUIRE(article->paragraphs.size() == 2);
    CHECK(article->paragraphs[0].range == TextRange {0, 12});
    CHECK(article->paragraphs[0].role == ParagraphRole::Intro);
    CHECK(article->paragraphs[1].range == TextRange {14, 24});
    CHECK(article->paragraphs[1].role == ParagraphRole::Conclusion);
    CHECK(article->sentences.size() == 2);
    // Tokens: Café, closes, ., It, is, sad, .
    CHECK(article->tokens.size() == 7);
}

TEST_CASE("paragraph roles follow position: intro, body, conclusion")
{
    ProjectFixture f;
    auto report = f.importJsonl(
        "{\"id\":\"r\",\"title\":\"T\",\"text\":\"One.\\n\\nTwo.\\n\\nThree.\\n\\nFour.\"}\n");
    auto article = f.project.article(report.added[0]);
    REQUIRE(article);
    REQUIRE(article->paragraphs.size() == 4);
    CHECK(article->paragraphs[0].role == ParagraphRole::Intro);
    CHECK(article->paragraphs[1].role == ParagraphRole::Body);
    CHECK(article->paragraphs[2].role == ParagraphRole::Body);
    CHECK(article->paragraphs[3].role == ParagraphRole::Conclusion);
}

TEST_CASE("duplicate texts are reported and skipped, within a file and across imports")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    const QByteArray second =
        "{\"id\":\"g1\",\"title\":\"Copy\",\"text\":\"Het windpark komt er, bijv. op de dijk. "
        "Bewoners zijn boos.\\n\\nDe gemeente moet praten.\"}\n"
        "{\"id\":\"g2\",\"title\":\"New\",\"text\":\"A new text.\"}\n"
        "{\"id\":\"g3\",\"title\":\"New again\",\"text\":\"A new text.\"}\n";
    auto report = f.importJsonl(second, QStringLiteral("b.jsonl"));
    CHECK(report.added.size() == 1);
    REQUIRE(report.skipped.size() == 2);
    CHECK(report.skipped[0].externalId == QStringLiteral("g1"));
    CHECK(report.skipped[0].line == 1);
    CHECK(report.skipped[0].reason.contains(QStringLiteral("f2")));
    CHECK(report.skipped[1].externalId == QStringLiteral("g3"));
    CHECK(report.skipped[1].line == 3);
    CHECK(report.skipped[1].reason.contains(QStringLiteral("g2")));
}

TEST_CASE("an import that fails leaves the project exactly as it was")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    const QString before = dumpDatabase(databaseForTesting(f.project), {});

    SECTION("an id already used by another text")
    {
        auto r = f.project.importFile(
            writeFile(f.dir, QStringLiteral("c.jsonl"),
                "{\"id\":\"x1\",\"title\":\"Fine\",\"text\":\"Fine text.\"}\n"
                "{\"id\":\"f1\",\"title\":\"Clash\",\"text\":\"Other text.\"}\n"),
            ImportOptions {});
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::Duplicate);
        CHECK(r.error().line == 2);
        CHECK(r.error().message.contains(QStringLiteral("c.jsonl:2")));
    }
    SECTION("an unknown language tag")
    {
        auto r =
            f.project.importFile(writeFile(f.dir, QStringLiteral("d.jsonl"),
                                     "{\"id\":\"x1\",\"title\":\"Fine\",\"text\":\"Fine text.\"}\n"
                                     "{\"id\":\"x2\",\"title\":\"Odd\",\"language\":\"!!not a "
                                     "tag\",\"text\":\"Text.\"}\n"),
                ImportOptions {});
        REQUIRE_FALSE(r);
        CHECK(r.error().line == 2);
    }
    SECTION("a malformed line")
    {
        auto r = f.project.importFile(
            writeFile(f.dir, QStringLiteral("e.jsonl"),
                "{\"id\":\"x1\",\"title\":\"Fine\",\"text\":\"Fine text.\"}\n{oops\n"),
            ImportOptions {});
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidInput);
    }
    SECTION("a cancelled import")
    {
        // Cancelled after its second article, the last one: the first is undone as well.
        int calls = 0;
        auto r = f.project.importFile(writeFile(f.dir, QStringLiteral("f.jsonl"),
                                          "{\"id\":\"x1\",\"title\":\"A\",\"text\":\"First.\"}\n"
                                          "{\"id\":\"x2\",\"title\":\"B\",\"text\":\"Second.\"}\n"),
            ImportOptions {}, [&](qint64, qint64) { return ++calls < 2; });
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::Cancelled);
        CHECK(calls == 2);
    }
    CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
}

TEST_CASE("fault injection: a failure at any step of an import writes nothing")
{
    // After SQLite's own test practice: fail the Nth step and prove nothing was written.
    ProjectFixture f;
    const QString path = writeFile(f.dir, QStringLiteral("a.jsonl"), kTwoArticles);
    const QString before = dumpDatabase(databaseForTesting(f.project), {});
    int failures = 0;
    for (int n = 1; n < 200; ++n) {
        int steps = 0;
        databaseForTesting(f.project).setFaultHook(
            [&] { return ++steps == n ? SQLITE_IOERR : SQLITE_OK; });
        auto r = f.project.importFile(path, ImportOptions {});
        databaseForTesting(f.project).setFaultHook({});
        if (r) {
            // The first n that no longer fails: the import needed fewer than n steps.
            CHECK(r->added.size() == 2);
            break;
        }
        ++failures;
        CHECK(r.error().code == ErrorCode::Io);
        REQUIRE(dumpDatabase(databaseForTesting(f.project), {}) == before);
    }
    CHECK(failures > 10);
}

TEST_CASE("full-text search finds articles by words of their text")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    auto hits = f.project.searchArticles(QStringLiteral("dijk"));
    REQUIRE(hits);
    REQUIRE(hits->size() == 1);
    CHECK((*hits)[0] == f.articleId(QStringLiteral("f2")));
    auto none = f.project.searchArticles(QStringLiteral("zeppelin"));
    REQUIRE(none);
    CHECK(none->empty());
    auto bad = f.project.searchArticles(QStringLiteral("\"unclosed"));
    REQUIRE_FALSE(bad);
    CHECK(bad.error().code == ErrorCode::InvalidArgument);
}

namespace {

// `count` articles a0, a1, ... with distinct short texts, as JSON Lines or as CSV with a header.
QByteArray manyArticles(int count, bool csv)
{
    QByteArray bytes = csv ? "id,title,text\r\n" : "";
    for (int i = 0; i < count; ++i) {
        bytes += (csv ? QStringLiteral("a%1,Title %1,\"Text number %1.\nIts second line.\"\r\n")
                      : QStringLiteral("{\"id\":\"a%1\",\"title\":\"Title %1\",\"text\":\"Text "
                                       "number %1.\\nIts second line.\"}\n"))
                     .arg(i)
                     .toUtf8();
    }
    return bytes;
}

} // namespace

TEST_CASE("a large import adds its articles one at a time as the file is read")
{
    for (const bool csv : {false, true}) {
        INFO((csv ? "CSV" : "JSON Lines"));
        ProjectFixture f;
        const QByteArray bytes = manyArticles(3000, csv);
        const QString path = writeFile(
            f.dir, csv ? QStringLiteral("many.csv") : QStringLiteral("many.jsonl"), bytes);
        ImportOptions options;
        options.readChunkSize = 4096;
        // ImportedArticleCount counts the articles read and not yet dropped: one at a time.
        const qsizetype before = ImportedArticleCount::alive();
        ImportedArticleCount::resetMost();
        qint64 lastRead = 0;
        qint64 lastTotal = 0;
        int calls = 0;
        auto report = f.project.importFile(path, options, [&](qint64 read, qint64 total) {
            CHECK(read > lastRead);
            lastRead = read;
            lastTotal = total;
            ++calls;
            return true;
        });
        REQUIRE(report);
        CHECK(report->added.size() == 3000);
        CHECK(ImportedArticleCount::most() - before == 1);
        CHECK(calls == 3000);
        CHECK(lastRead == bytes.size());
        CHECK(lastTotal == bytes.size());
        auto stored = f.project.article(f.articleId(QStringLiteral("a2999")));
        REQUIRE(stored);
        CHECK(stored->text == QStringLiteral("Text number 2999.\nIts second line."));
        CHECK(stored->summary.title == QStringLiteral("Title 2999"));

        // The same file again: every text is there already, so nothing is added.
        auto again = f.project.importFile(path, options);
        REQUIRE(again);
        CHECK(again->added.empty());
        CHECK(again->skipped.size() == 3000);
        CHECK(f.project.articles()->size() == 3000);
    }
}

TEST_CASE("an error on the last line of a large file leaves the project unchanged")
{
    for (const bool csv : {false, true}) {
        INFO((csv ? "CSV" : "JSON Lines"));
        ProjectFixture f;
        f.importJsonl(kTwoArticles);
        const QString before = dumpDatabase(databaseForTesting(f.project), {});
        // 3,000 good articles, then a record with a field too few (CSV) or a line that is no
        // JSON object (JSON Lines), read in small chunks: the articles before it were added
        // (the progress saw each) and are undone.
        const QByteArray bytes = manyArticles(3000, csv) + (csv ? "a3000,Title\r\n" : "[1]\n");
        const QString path =
            writeFile(f.dir, csv ? QStringLiteral("bad.csv") : QStringLiteral("bad.jsonl"), bytes);
        ImportOptions options;
        options.readChunkSize = 4096;
        int calls = 0;
        auto r = f.project.importFile(path, options, [&](qint64, qint64) {
            ++calls;
            return true;
        });
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidInput);
        // CSV: the header, then 3,000 records of two lines each.
        CHECK(r.error().line == (csv ? 6002 : 3001));
        CHECK(calls == 3000);
        CHECK(dumpDatabase(databaseForTesting(f.project), {}) == before);
    }
}

TEST_CASE("issue 20 item 10: an import into a damaged project file is refused and writes nothing")
{
    // A b-tree page of a table the import does not write (codebook_version) gets an invalid page
    // type: SQLite's file format (sqlite.org/fileformat2.html §1.6) allows only 2, 5, 10 and 13
    // as the first byte of a b-tree page. Opening reads only the schema, so the file opens.
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("t.fourfold"));
    {
        auto p = Project::create(path);
        REQUIRE(p);
        REQUIRE(p->importFile(writeFile(dir, QStringLiteral("a.jsonl"), kTwoArticles), {}));
    }
    qint64 page = 0;
    qint64 pageSize = 0;
    {
        sqlite3 *raw = nullptr;
        REQUIRE(
            sqlite3_open_v2(qPrintable(path), &raw, SQLITE_OPEN_READONLY, nullptr) == SQLITE_OK);
        sqlite3_stmt *st = nullptr;
        REQUIRE(sqlite3_prepare_v2(raw,
                    "SELECT rootpage, (SELECT page_size FROM pragma_page_size) FROM sqlite_schema "
                    "WHERE name = 'codebook_version'",
                    -1, &st, nullptr)
            == SQLITE_OK);
        REQUIRE(sqlite3_step(st) == SQLITE_ROW);
        page = sqlite3_column_int64(st, 0);
        pageSize = sqlite3_column_int64(st, 1);
        sqlite3_finalize(st);
        sqlite3_close(raw);
    }
    REQUIRE(page > 1);
    {
        QFile file(path);
        REQUIRE(file.open(QIODevice::ReadWrite));
        REQUIRE(file.seek((page - 1) * pageSize));
        REQUIRE(file.write(QByteArray(1, '\x7f')) == 1);
    }
    auto project = Project::open(path);
    REQUIRE(project);
    const QString before =
        dumpDatabase(databaseForTesting(*project), {QStringLiteral("codebook_version")});
    auto imported =
        project->importFile(writeFile(dir, QStringLiteral("b.jsonl"),
                                "{\"id\":\"n1\",\"title\":\"New\",\"text\":\"A new article.\"}\n"),
            {});
    REQUIRE_FALSE(imported);
    CHECK(imported.error().code == ErrorCode::Corrupt);
    CHECK(imported.error().message.contains(QStringLiteral("is damaged")));
    CHECK(imported.error().message.contains(QStringLiteral("fourfold-cli check")));
    // Codings are refused the same way.
    auto codings = importQuotedCodings(*project,
        writeFile(dir, QStringLiteral("c.jsonl"),
            "{\"article\":\"f1\",\"coder\":\"C01\",\"function\":\"cause\",\"quote\":\"The\"}\n"),
        Phase::Production);
    REQUIRE_FALSE(codings);
    CHECK(codings.error().code == ErrorCode::Corrupt);
    CHECK(
        dumpDatabase(databaseForTesting(*project), {QStringLiteral("codebook_version")}) == before);
}
