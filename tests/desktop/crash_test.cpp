// Killing the program while it codes loses at most the edit in flight (design.md §7).
#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QFile>
#include <QProcess>

using namespace fourfold;

TEST_CASE("a process killed while coding leaves every committed span in the project file")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
    QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    qint64 before = 0;
    {
        auto p = Project::open(path);
        REQUIRE(p);
        before = p->counts()->annotations;
    }

    QProcess helper;
    helper.start(QStringLiteral(FOURFOLD_CRASH_HELPER), {path, QStringLiteral("C01")});
    REQUIRE(helper.waitForStarted());
    qint64 committed = 0;
    while (committed < 5 && helper.waitForReadyRead(20000)) {
        while (helper.canReadLine()) {
            const QByteArray line = helper.readLine().trimmed();
            if (line.startsWith("committed "))
                committed = line.mid(10).toLongLong();
        }
    }
    REQUIRE(committed >= 5);
    helper.kill(); // SIGKILL: no destructor, no clean close of SQLite
    REQUIRE(helper.waitForFinished());

    auto p = Project::open(path);
    REQUIRE(p);
    const qint64 after = p->counts()->annotations;
    // Every span the helper reported as committed is there; at most the one in flight more.
    CHECK(after >= before + committed);
    CHECK(after <= before + committed + 1);
    auto check = p->check();
    REQUIRE(check);
    CHECK(check->isClean());
}
