// Issue 20, items 4 and 10, through the program: an export killed with SIGKILL leaves no partial
// set, export and report --out refuse links and files they would replace unasked.

#include "tests/project/double_coded_project.h"
#include "tests/support/cli_run.h"

#include <QCryptographicHash>
#include <QDir>
#include <QElapsedTimer>
#include <QFile>
#include <QFileInfo>
#include <QJsonArray>
#include <QJsonDocument>
#include <QProcess>
#include <QThread>

using namespace fourfold;

namespace {

using test::CliRun;

CliRun cli(const QStringList &args)
{
    return test::runCli(QStringLiteral(FOURFOLD_CLI), args);
}

QStringList hiddenAndVisible(const QString &path)
{
    return QDir(path).entryList(
        QDir::AllEntries | QDir::Hidden | QDir::System | QDir::NoDotAndDotDot, QDir::Name);
}

// Whether `out` holds a whole export: a manifest whose every file is there with its SHA-256 and
// nothing else.
bool wholeExport(const QString &out)
{
    const QJsonObject manifest =
        QJsonDocument::fromJson(test::readFile(QDir(out).filePath(QStringLiteral("manifest.json"))))
            .object();
    const QJsonArray files = manifest.value(QStringLiteral("files")).toArray();
    if (files.isEmpty())
        return false;
    QStringList expected {QStringLiteral("manifest.json")};
    for (const QJsonValue &v : files) {
        const QJsonObject f = v.toObject();
        const QString name = f.value(QStringLiteral("name")).toString();
        expected << name;
        const QByteArray bytes = test::readFile(QDir(out).filePath(name));
        if (QString::fromLatin1(QCryptographicHash::hash(bytes, QCryptographicHash::Sha256).toHex())
            != f.value(QStringLiteral("sha256")).toString())
            return false;
    }
    expected.sort();
    return hiddenAndVisible(out) == expected;
}

} // namespace

TEST_CASE("issue 20 item 4: an export killed with SIGKILL leaves no partial set", "[exchange][cli]")
{
    // Enough articles that the export is still writing when it is killed.
    test::DoubleCodedProject p(1500);
    const QString path = p.project.path();
    const QString out = p.dir.filePath(QStringLiteral("bio"));
    const QStringList args {QStringLiteral("export"), path, QStringLiteral("--layer"),
        QStringLiteral("coders"), QStringLiteral("--format"), QStringLiteral("bio"),
        QStringLiteral("--split"), QStringLiteral("80/10/10"), QStringLiteral("--out"), out};
    int killedWhileWriting = 0;
    for (int attempt = 0; attempt < 4; ++attempt) {
        QProcess process;
        process.start(QStringLiteral(FOURFOLD_CLI), args);
        REQUIRE(process.waitForStarted());
        // Wait until the export has begun writing into its hidden folder, then a little more
        // each time, and kill it there.
        bool writing = false;
        QElapsedTimer waited;
        waited.start();
        while (!writing && process.state() == QProcess::Running && waited.elapsed() < 60000) {
            for (const QString &name : hiddenAndVisible(p.dir.path()))
                if (name.startsWith(QLatin1String(".bio.partial-"))
                    && !hiddenAndVisible(p.dir.filePath(name)).isEmpty())
                    writing = true;
            if (!writing)
                QThread::msleep(1);
        }
        QThread::msleep(unsigned(attempt * 15));
        if (process.state() == QProcess::Running) {
            ++killedWhileWriting;
            process.kill(); // SIGKILL: no destructor, no clean-up
        }
        REQUIRE(process.waitForFinished(60000));
        INFO("attempt " << attempt);
        // Either no export at all or a whole one: never some files without the rest.
        CHECK((!QFileInfo::exists(out) || wholeExport(out)));
        QDir(out).removeRecursively();
    }
    CHECK(killedWhileWriting > 0);
    // Unkilled, the same export is whole.
    const CliRun r = cli(args);
    INFO(r.err.toStdString());
    REQUIRE(r.exitCode == 0);
    CHECK(wholeExport(out));
}

TEST_CASE("issue 20 item 10: export and report refuse links and replace only with --force",
    "[exchange][cli]")
{
    test::DoubleCodedProject p(3);
    const QString path = p.project.path();
    const QString out = p.dir.filePath(QStringLiteral("out"));
    const auto exportTo = [&](const QString &dir, bool force) {
        QStringList args {QStringLiteral("export"), path, QStringLiteral("--layer"),
            QStringLiteral("gold"), QStringLiteral("--format"), QStringLiteral("csv"),
            QStringLiteral("--out"), dir};
        if (force)
            args << QStringLiteral("--force");
        return cli(args);
    };
    REQUIRE(exportTo(out, false).exitCode == 0);
    const QByteArray first = test::readFile(QDir(out).filePath(QStringLiteral("all.csv")));
    REQUIRE_FALSE(first.isEmpty());

    // A second export into the same folder is refused, the first one left as it was.
    CliRun again = exportTo(out, false);
    CHECK(again.exitCode == 1);
    CHECK(again.err.contains(out));
    CHECK(again.err.contains(QStringLiteral("--force")));
    CHECK(test::readFile(QDir(out).filePath(QStringLiteral("all.csv"))) == first);

    // With --force it replaces the folder whole: a stale file of the earlier export goes.
    {
        QFile stale(QDir(out).filePath(QStringLiteral("train.csv")));
        REQUIRE(stale.open(QIODevice::WriteOnly));
    }
    const CliRun forced = exportTo(out, true);
    INFO(forced.err.toStdString());
    CHECK(forced.exitCode == 0);
    CHECK(hiddenAndVisible(out)
        == (QStringList {QStringLiteral("all.csv"), QStringLiteral("manifest.json")}));

    // A link as the export folder.
    const QString elsewhere = p.dir.filePath(QStringLiteral("elsewhere"));
    REQUIRE(QDir().mkpath(elsewhere));
    const QString linked = p.dir.filePath(QStringLiteral("linked"));
    REQUIRE(QFile::link(elsewhere, linked));
    const CliRun viaLink = exportTo(linked, true);
    CHECK(viaLink.exitCode == 1);
    CHECK(viaLink.err.contains(linked));
    CHECK(viaLink.err.contains(QStringLiteral("symbolic link")));
    CHECK(hiddenAndVisible(elsewhere).isEmpty());
}
