// A folder imported through Project::importFile: every file of it and its subfolders (hidden
// ones left out), all or nothing; the report lists every file with its articles, or why it was
// passed over or refused; importing it twice adds nothing.

#include "core/project/project.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QDir>
#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QString put(const QTemporaryDir &dir, const QString &relative, const QByteArray &bytes)
{
    const QString path = dir.filePath(relative);
    REQUIRE(QDir().mkpath(QFileInfo(path).path()));
    QFile f(path);
    REQUIRE(f.open(QIODevice::WriteOnly));
    REQUIRE(f.write(bytes) == bytes.size());
    return path;
}

// A folder of three formats in two levels, a note that is no article and a hidden folder.
QString makeFolder(const QTemporaryDir &dir)
{
    put(dir, QStringLiteral("in/ferry.txt"),
        "Ferry fares rise\n\nThe ferry company raises fares.\n");
    put(dir, QStringLiteral("in/wire/batch.jsonl"),
        "{\"id\": \"w1\", \"title\": \"Dyke plan\", \"text\": \"The council plans a dyke.\"}\n"
        "{\"id\": \"w2\", \"title\": \"Market\", \"text\": \"Traders return to the square.\"}\n");
    put(dir, QStringLiteral("in/wire/web/page.html"),
        "<html><head><title>Harbour lights</title></head><body><p>New lights on the "
        "pier.</p></body></html>");
    put(dir, QStringLiteral("in/notes.md"), "# notes\nnot an article\n");
    put(dir, QStringLiteral("in/.cache/old.txt"), "Old\n\nA hidden file.\n");
    return dir.filePath(QStringLiteral("in"));
}

} // namespace

TEST_CASE("A folder imports recursively and its report lists every file and its articles",
    "[io][folder][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString folder = makeFolder(dir);
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    auto report = project->importFile(folder, ImportOptions {});
    REQUIRE(report);
    CHECK(report->added.size() == 4);
    REQUIRE(report->files.size() == 4); // the hidden folder is left out
    const QDir base(folder);
    CHECK(base.relativeFilePath(report->files[0].path) == QStringLiteral("ferry.txt"));
    CHECK(report->files[0].articles == QStringList {QStringLiteral("ferry")});
    CHECK(base.relativeFilePath(report->files[1].path) == QStringLiteral("notes.md"));
    CHECK(report->files[1].passedOver);
    CHECK(report->files[1].reason.contains(QStringLiteral("not a format")));
    CHECK(base.relativeFilePath(report->files[2].path) == QStringLiteral("wire/batch.jsonl"));
    CHECK(report->files[2].articles == QStringList {QStringLiteral("w1"), QStringLiteral("w2")});
    CHECK(base.relativeFilePath(report->files[3].path) == QStringLiteral("wire/web/page.html"));
    CHECK(report->files[3].articles == QStringList {QStringLiteral("page")});
    auto articles = project->articles();
    REQUIRE(articles);
    CHECK(articles->size() == 4);

    // Twice: nothing added, every article skipped and counted at its file.
    auto again = project->importFile(folder, ImportOptions {});
    REQUIRE(again);
    CHECK(again->added.empty());
    CHECK(again->skipped.size() == 4);
    CHECK(again->files[2].skipped == 2);
    CHECK(project->articles()->size() == 4);
}

TEST_CASE(
    "A folder with one bad file adds nothing and says what each file held", "[io][folder][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString folder = makeFolder(dir);
    put(dir, QStringLiteral("in/wire/broken.jsonl"),
        "{\"id\": \"b1\", \"title\": \"B\", \"text\": \"fine\"}\n{\"id\": \"b2\", \"title\": 3}\n");
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    auto failed = project->importFile(folder, ImportOptions {});
    REQUIRE_FALSE(failed);
    CHECK(failed.error().code == ErrorCode::InvalidInput);
    const QString message = failed.error().message;
    CHECK(message.contains(QStringLiteral("1 of its files could not be read")));
    CHECK(message.contains(QStringLiteral("\nferry.txt: 1 article(s)")));
    CHECK(message.contains(QStringLiteral("\nwire/batch.jsonl: 2 article(s)")));
    // The refused file with its line.
    CHECK(message.contains(QStringLiteral("\nwire/broken.jsonl: ")));
    CHECK(message.contains(QStringLiteral("broken.jsonl:2")));
    CHECK(project->articles()->empty());

    // The command line prints the same and exits with a failure; the project stays empty.
    const CliRun run =
        runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("import"), project->path(), folder});
    CHECK(run.exitCode == 1);
    CHECK(run.err.contains(QStringLiteral("wire/broken.jsonl: ")));
    CHECK(project->articles()->empty());
}

TEST_CASE("fourfold-cli import of a folder lists its files", "[io][folder][cli]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString folder = makeFolder(dir);
    const QString project = dir.filePath(QStringLiteral("p.fourfold"));
    REQUIRE(runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("new"), project}).exitCode == 0);
    const CliRun run =
        runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("import"), project, folder});
    REQUIRE(run.exitCode == 0);
    CHECK(run.out.contains(QStringLiteral("%1: 4 added, 0 skipped").arg(folder)));
    CHECK(run.out.contains(QStringLiteral("/wire/batch.jsonl: 2 added (w1, w2), 0 skipped")));
    CHECK(run.out.contains(QStringLiteral("/notes.md: passed over")));
}

TEST_CASE("A project kept in the folder it imports is passed over with its journal files",
    "[io][folder][project]")
{
    // Found by the import benchmark: an empty write-ahead log beside the project (SQLite's
    // -wal file, sqlite.org "Write-Ahead Logging") failed the whole folder as an empty file.
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString folder = makeFolder(dir);
    auto project = Project::create(QDir(folder).filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    put(dir, QStringLiteral("in/p.fourfold-wal"), "");
    put(dir, QStringLiteral("in/old/other.fourfold-journal"), "");
    auto report = project->importFile(folder, ImportOptions {});
    INFO((report ? QString() : report.error().toString()).toStdString());
    REQUIRE(report);
    CHECK(report->added.size() == 4);
    QStringList passedOver;
    for (const ImportedFile &f : report->files)
        if (f.passedOver && f.reason == QStringLiteral("passed over: a Fourfold project file"))
            passedOver << QDir(folder).relativeFilePath(f.path);
    passedOver.sort();
    CHECK(passedOver.contains(QStringLiteral("p.fourfold")));
    CHECK(passedOver.contains(QStringLiteral("p.fourfold-wal")));
    CHECK(passedOver.contains(QStringLiteral("old/other.fourfold-journal")));
}
