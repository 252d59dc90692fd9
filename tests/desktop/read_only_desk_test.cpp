// Issue 20, item 10: a project file this process may not write opens on the desk read-only —
// the title and the message bar say so, an edit is refused before it is tried (no "Not saved …
// Retry", which could never help) and the file is left as it was. The file sits on a read-only
// bind mount in a user and mount namespace of the test's own (unshare -rm), so the test means
// the same for root, whom file permissions do not stop: the outer case starts this test program
// again in that namespace to run the hidden inner case.

#include "app/desktop/coding_session.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "core/project/project.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QCoreApplication>
#include <QCryptographicHash>
#include <QDir>
#include <QFile>

using namespace fourfold;

namespace {

QByteArray sha256Of(const QString &path)
{
    QFile file(path);
    REQUIRE(file.open(QIODevice::ReadOnly));
    return QCryptographicHash::hash(file.readAll(), QCryptographicHash::Sha256).toHex();
}

} // namespace

TEST_CASE("issue 20 item 10: the desk opens a read-only project read-only and changes nothing",
    "[desktop][files]")
{
    QTemporaryDir dir;
    const QString folder = dir.filePath(QStringLiteral("ro"));
    REQUIRE(QDir().mkpath(folder));
    const QString path = QDir(folder).filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
    QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    const QByteArray before = sha256Of(path);

    qputenv("FOURFOLD_READ_ONLY_PROJECT", path.toUtf8());
    const test::CliRun r = test::runCli(QStringLiteral("/usr/bin/unshare"),
        {QStringLiteral("-rm"), QStringLiteral("sh"), QStringLiteral("-c"),
            QStringLiteral("mount --bind -o ro \"$1\" \"$1\" && exec \"$2\" \"$3\""),
            QStringLiteral("sh"), folder, QCoreApplication::applicationFilePath(),
            QStringLiteral("[.read-only-inner]")});
    qunsetenv("FOURFOLD_READ_ONLY_PROJECT");
    INFO(r.out.toStdString() + r.err.toStdString());
    CHECK(r.exitCode == 0);
    CHECK(r.out.contains(QStringLiteral("All tests passed")));
    CHECK(sha256Of(path) == before);
    QStringList left = QDir(folder).entryList(QDir::Files);
    CHECK(left == QStringList {QStringLiteral("demo.fourfold")}); // no -wal, -shm or journal
}

TEST_CASE("read-only desk, inside the namespace", "[.read-only-inner]")
{
    const QString path = qEnvironmentVariable("FOURFOLD_READ_ONLY_PROJECT");
    REQUIRE_FALSE(path.isEmpty());
    MainWindow w;
    REQUIRE(w.openProject(path, QStringLiteral("C01")));
    CodingSession *session = w.session();
    REQUIRE(session);
    CHECK(session->isReadOnly());
    CHECK(w.windowTitle().contains(QStringLiteral("read-only")));
    CHECK(w.messageBar()->kind() == MessageBar::Kind::Warning);
    CHECK(w.messageBar()->text().contains(QStringLiteral("is read-only")));

    auto articles = session->project().articles();
    REQUIRE(articles);
    REQUIRE_FALSE(articles->empty());
    const ArticleId article = articles->front().id;
    w.openArticle(article);
    const Status added = session->addSpan(article, FramingFunction::Cause, TextRange {0, 4});
    REQUIRE_FALSE(added);
    CHECK(added.error().code == ErrorCode::NotAllowed);
    CHECK_FALSE(session->hasUnsavedEdit());
    CHECK(session->undoStack()->count() == 0);
    CHECK(w.messageBar()->text().contains(QStringLiteral("is read-only")));
}
