// Writes the README's screenshots of the Frames window (Lead → Frames…) from the sample project,
// offscreen:
//   fourfold_frames_screenshots SAMPLE_PROJECT OUT_DIR
// On a temporary copy: the consensus of the coders with k = 3 and 200 stability replicates, the
// frames named; the Choosing k page and the Frames page.

#include "app/desktop/coding_session.h"
#include "app/desktop/frames/frames_window.h"
#include "core/project/project.h"
#include "tools/screenshots/screenshot_support.h"

#include <QEventLoop>
#include <QTabWidget>
#include <QTableWidget>

using namespace fourfold;
using fourfold::screenshots::saveGrab;

int main(int argc, char *argv[])
{
    screenshots::ScreenshotApp app(argc, argv);
    if (app.failure())
        return app.failure();
    auto project = Project::open(app.project());
    if (!project)
        return 1;
    auto lead = project->coderByPseudonym(QStringLiteral("L01"));
    if (!lead || !*lead)
        return 1;
    CodingSession session(std::move(*project), **lead);
    FramesWindow w(&session);
    w.resize(1280, 720); // fits a 1366×768 screen with the desktop's panel
    w.show();
    FramesRequest request = w.request();
    request.layer = QStringLiteral("consensus");
    request.k = 3;
    request.bootstrap = 200;
    w.setRequest(request);
    QEventLoop loop;
    QObject::connect(&w, &FramesWindow::computed, &loop, &QEventLoop::quit);
    w.compute();
    loop.exec();
    if (!w.outcome())
        return 1;
    const QStringList names {QStringLiteral("Costs to the public purse"),
        QStringLiteral("Who is to blame"), QStringLiteral("What should be done")};
    for (int f = 0; f < w.framesTable()->rowCount() && f < names.size(); ++f)
        w.framesTable()->item(f, 0)->setText(names[f]);
    bool ok = saveGrab(w, app.outDir(), "frames-choosing-k.png");
    w.tabs()->setCurrentIndex(1);
    ok &= saveGrab(w, app.outDir(), "frames.png");
    w.tabs()->setCurrentIndex(2);
    ok &= saveGrab(w, app.outDir(), "frames-by-outlet.png");
    return ok ? 0 : 1;
}
