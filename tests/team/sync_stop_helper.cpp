// For the team tests: syncs the working file FILE and, on reaching the stage STAGE (read,
// server-written or server-committed), prints the stage's name on standard output and waits to
// be killed; exits 0 after a whole sync, 1 with the error on standard error otherwise.

#include "core/project/project.h"
#include "core/team/team_project.h"

#include <QCoreApplication>

#include <unistd.h>

#include <cstdio>

using namespace fourfold;

int main(int argc, char **argv)
{
    QCoreApplication app(argc, argv);
    if (argc != 3) {
        std::fprintf(stderr, "usage: sync_stop_helper FILE STAGE\n");
        return 2;
    }
    const QString stage = QString::fromLocal8Bit(argv[2]);
    auto project = Project::open(QString::fromLocal8Bit(argv[1]));
    if (!project) {
        std::fprintf(stderr, "%s\n", qPrintable(project.error().toString()));
        return 1;
    }
    auto synced = TeamProject::sync(*project, [&](SyncStage reached) {
        const char *name = reached == SyncStage::Read ? "read"
            : reached == SyncStage::ServerWritten     ? "server-written"
                                                      : "server-committed";
        if (stage == QLatin1String(name)) {
            std::printf("%s\n", name);
            std::fflush(stdout);
            for (;;)
                pause();
        }
    });
    if (!synced) {
        std::fprintf(stderr, "%s\n", qPrintable(synced.error().toString()));
        return 1;
    }
    return 0;
}
