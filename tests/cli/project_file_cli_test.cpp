// Issue 20, item 10: a healthy project on a read-only disk is read by the commands that only
// read it, and a command that writes says the file is read-only; `new` on a full disk says so
// and leaves no file. The disks are a read-only bind mount and a 64 KiB tmpfs in a user and
// mount namespace of the test's own (unshare -rm), so the test means the same for root, whom
// file permissions do not stop.

#include "core/project/project.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QDir>
#include <QTemporaryDir>

using namespace fourfold;

namespace {

// Runs fourfold-cli with `args` while `folder` is mounted read-only.
test::CliRun onReadOnlyDisk(const QString &folder, const QStringList &args)
{
    QStringList shell {QStringLiteral("-rm"), QStringLiteral("sh"), QStringLiteral("-c"),
        QStringLiteral("mount --bind -o ro \"$1\" \"$1\" && shift && exec \"$@\""),
        QStringLiteral("sh"), folder, QStringLiteral(FOURFOLD_CLI)};
    shell << args;
    return test::runCli(QStringLiteral("/usr/bin/unshare"), shell);
}

} // namespace

TEST_CASE("issue 20 item 10: check and the other reading commands work on a read-only project",
    "[cli][files]")
{
    QTemporaryDir dir;
    const QString folder = dir.filePath(QStringLiteral("ro"));
    REQUIRE(QDir().mkpath(folder));
    const QString path = QDir(folder).filePath(QStringLiteral("p.fourfold"));
    {
        auto project = Project::create(path);
        REQUIRE(project);
        const QString articles = test::writeFile(dir, QStringLiteral("a.jsonl"),
            "{\"id\":\"a1\",\"title\":\"One\",\"text\":\"The quay is closing. The town must "
            "act.\"}\n");
        REQUIRE(project->importFile(articles, ImportOptions {}));
    }
    const QStringList before = QDir(folder).entryList(QDir::Files | QDir::Hidden);

    const test::CliRun check = onReadOnlyDisk(folder, {QStringLiteral("check"), path});
    INFO(check.err.toStdString());
    CHECK(check.exitCode == 0);
    CHECK(check.out.contains(QStringLiteral("OK: 1 articles")));

    const test::CliRun info = onReadOnlyDisk(folder, {QStringLiteral("info"), path});
    CHECK(info.exitCode == 0);
    CHECK(info.out.contains(QStringLiteral("Articles     1")));

    const test::CliRun import = onReadOnlyDisk(
        folder, {QStringLiteral("import"), path, dir.filePath(QStringLiteral("a.jsonl"))});
    CHECK(import.exitCode == 1);
    CHECK(import.err.contains(path));
    CHECK(import.err.contains(QStringLiteral("is read-only")));

    CHECK(QDir(folder).entryList(QDir::Files | QDir::Hidden) == before);
}

TEST_CASE(
    "issue 20 item 10: new on a full disk says the disk is full and leaves no file", "[cli][files]")
{
    QTemporaryDir dir;
    const QString folder = dir.filePath(QStringLiteral("full"));
    REQUIRE(QDir().mkpath(folder));
    const QString path = QDir(folder).filePath(QStringLiteral("p.fourfold"));
    // A 64 KiB tmpfs filled to the last block, then `new` and a listing of what is left.
    const test::CliRun r = test::runCli(QStringLiteral("/usr/bin/unshare"),
        {QStringLiteral("-rm"), QStringLiteral("sh"), QStringLiteral("-c"),
            QStringLiteral("mount -t tmpfs -o size=64k tmpfs \"$1\" && "
                           "(dd if=/dev/zero of=\"$1/fill\" bs=4k 2>/dev/null; true) && "
                           "\"$2\" new \"$3\"; rc=$?; ls -A \"$1\"; exit $rc"),
            QStringLiteral("sh"), folder, QStringLiteral(FOURFOLD_CLI), path});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("The disk holding %1 is full").arg(path)));
    CHECK_FALSE(r.err.contains(QStringLiteral("damaged")));
    CHECK(r.out.trimmed() == QStringLiteral("fill")); // no project file, no -wal, no -shm
}
