// Writes the README's screenshots of the Frames window (Lead → Frames…) from the sample project,
// offscreen:
//   fourfold_frames_screenshots SAMPLE_PROJECT OUT_DIR
// On a temporary copy: the lead's gold with the k the k-choice indices point at and 200 stability
// replicates, each frame named after its most characteristic element; the Choosing k page, the
// Frames page and the frames by outlet.

#include "app/desktop/coding_session.h"
#include "app/desktop/frames/frames_window.h"
#include "core/project/project.h"
#include "tools/screenshots/screenshot_support.h"

#include <QEventLoop>
#include <QTabWidget>
#include <QTableWidget>

#include <map>

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
    request.layer = QStringLiteral("gold");
    request.k = 0;
    request.bootstrap = 200;
    w.setRequest(request);
    QEventLoop loop;
    QObject::connect(&w, &FramesWindow::computed, &loop, &QEventLoop::quit);
    w.compute();
    loop.exec();
    if (!w.outcome())
        return 1;
    // The names the lead would type, by the element with the largest adjusted residual: the
    // elements of the frames the sample's production articles were written around
    // (sample-project/README.md); a frame led by another element holds the many-sided reports.
    const QString costs = QStringLiteral("What it costs");
    const QString lifeline = QStringLiteral("A lifeline for residents");
    const QString safety = QStringLiteral("Safety and the environment");
    const QString decides = QStringLiteral("Who decides");
    const std::map<QString, QString> names {{QStringLiteral("problem:issue=costs"), costs},
        {QStringLiteral("cause:actor_category=government"), costs},
        {QStringLiteral("evaluation:object=measure"), costs},
        {QStringLiteral("remedy:remedy_type=withdrawal"), costs},
        {QStringLiteral("problem:issue=service"), lifeline},
        {QStringLiteral("evaluation:object=residents"), lifeline},
        {QStringLiteral("remedy:remedy_type=funding"), lifeline},
        {QStringLiteral("problem:issue=safety"), safety},
        {QStringLiteral("problem:issue=environment"), safety},
        {QStringLiteral("cause:actor_category=circumstances"), safety},
        {QStringLiteral("evaluation:object=situation"), safety},
        {QStringLiteral("remedy:remedy_type=regulation"), safety},
        {QStringLiteral("problem:issue=fairness"), decides},
        {QStringLiteral("cause:actor_category=business"), decides},
        {QStringLiteral("remedy:remedy_type=consultation"), decides}};
    const FramesOutcome &outcome = *w.outcome();
    for (int f = 0; f < w.framesTable()->rowCount() && f < int(outcome.analysis.profiles.size());
         ++f) {
        const auto &variables = outcome.analysis.profiles[size_t(f)].variables;
        QString leading;
        double best = 0;
        for (size_t v = 0; v < variables.size(); ++v)
            if (variables[v].residual && *variables[v].residual > best) {
                best = *variables[v].residual;
                leading = outcome.input.variables.value(qsizetype(v));
            }
        const auto found = names.find(leading);
        w.framesTable()->item(f, 0)->setText(
            found != names.end() ? found->second : QStringLiteral("Many-sided reports"));
    }
    bool ok = saveGrab(w, app.outDir(), "frames-choosing-k.png");
    w.tabs()->setCurrentIndex(1);
    ok &= saveGrab(w, app.outDir(), "frames.png");
    w.tabs()->setCurrentIndex(2);
    ok &= saveGrab(w, app.outDir(), "frames-by-outlet.png");
    return ok ? 0 : 1;
}
