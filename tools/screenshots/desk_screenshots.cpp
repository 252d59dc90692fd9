// Writes the README's screenshots of the desktop program from the sample project, offscreen:
//   fourfold_screenshots SAMPLE_PROJECT OUT_DIR
// (CMake target `screenshots` runs it into docs/screenshots.) Nothing here is edited by hand.

#include "app/desktop/coder_dialog.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "app/desktop/reading_view.h"
#include "app/desktop/reliability/reliability_window.h"
#include "app/desktop/reliability/report_options_dialog.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "tools/screenshots/screenshot_support.h"

#include <QEventLoop>
#include <QTabWidget>
#include <QTemporaryDir>
#include <QToolButton>

using namespace fourfold;
using fourfold::screenshots::saveGrab;

int main(int argc, char *argv[])
{
    screenshots::ScreenshotApp app(argc, argv);
    if (app.failure())
        return app.failure();
    const QString out = app.outDir();
    const QString project = app.project();
    bool ok = true;

    {
        MainWindow start;
        start.resize(1200, 700);
        start.show();
        ok &= saveGrab(start, out, "start.png");
    }
    {
        // A new project opened by its lead: what to do next instead of a blank desk.
        QTemporaryDir dir;
        const QString fresh = dir.filePath(QStringLiteral("new-study.fourfold"));
        const QString pass = QStringLiteral("screenshot lead passphrase");
        {
            auto p = Project::create(fresh);
            if (!p)
                return 1;
            auto lead = People::add(*p, nullptr,
                {QStringLiteral("Lead of the study"), QStringLiteral("L01"), CoderRole::Lead,
                    pass});
            if (!lead || !p->apply(**lead))
                return 1;
        }
        MainWindow w;
        w.resize(1200, 700);
        if (!w.openProject(fresh, QStringLiteral("L01"), pass))
            return 1;
        w.show();
        ok &= saveGrab(w, out, "desk-empty-lead.png");
    }
    {
        auto p = Project::open(project);
        if (!p)
            return 1;
        CoderDialog dialog(*p);
        dialog.resize(560, 360);
        dialog.show();
        ok &= saveGrab(dialog, out, "coder-dialog.png");
    }
    {
        MainWindow w;
        w.resize(1600, 960);
        if (!w.openProject(project, QStringLiteral("C01")))
            return 1;
        w.show();
        // The first assigned opinion piece, with its first evaluation span selected.
        auto id = w.session()->project().articleByExternalId(QStringLiteral("hb-02"));
        if (id && *id) {
            w.openArticle(**id);
            for (const Annotation &a : w.session()->visibleAnnotations(**id))
                if (a.content.function == FramingFunction::Evaluation) {
                    w.selectSpan(a.id);
                    break;
                }
        }
        ok &= saveGrab(w, out, "desk.png");
        auto nl = w.session()->project().articleByExternalId(QStringLiteral("mv-02"));
        if (nl && *nl) {
            w.openArticle(**nl);
            w.selectSpan(AnnotationId {});
        }
        ok &= saveGrab(w, out, "desk-dutch.png");
    }
    {
        // A lead sees every article; with "every coder's spans" on, all three coders' spans.
        MainWindow w;
        w.resize(1600, 960);
        if (!w.openProject(project, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")))
            return 1;
        w.show();
        w.session()->setShowAllCoders(true);
        auto id = w.session()->project().articleByExternalId(QStringLiteral("qs-01"));
        if (id && *id)
            w.openArticle(**id);
        ok &= saveGrab(w, out, "desk-lead-all-coders.png");
        // A result told in the message bar: merged copies, one conflict, details open.
        w.messageBar()->showMessage(MessageBar::Kind::Warning,
            QStringLiteral("Merged 2 copies; 1 conflict(s): the later change is kept, the other "
                           "waits for you to decide (fourfold-cli merge PROJECT --conflicts lists "
                           "them)."),
            {},
            QStringLiteral("demo-C02.fourfold (C02): 3 new, 1 changed (0 deleted), 1 conflict(s).\n"
                           "demo-C03.fourfold (C03): already merged, nothing new."));
        for (QToolButton *b : w.messageBar()->findChildren<QToolButton *>())
            if (b->text() == QStringLiteral("&Details"))
                b->click();
        ok &= saveGrab(w, out, "message-bar.png");
    }
    {
        // The reliability window: sentences, all four functions, the reliability phase.
        auto p = Project::open(project);
        if (!p)
            return 1;
        ReliabilityWindow w(*p);
        w.resize(1440, 900);
        w.show();
        QEventLoop loop;
        QObject::connect(&w, &ReliabilityWindow::computed, &loop, &QEventLoop::quit);
        w.compute();
        loop.exec();
        const char *names[] = {"reliability.png", "reliability-diagnostics.png",
            "reliability-functions.png", "reliability-pairs.png", "reliability-confusion.png",
            "reliability-drift.png"};
        for (int tab = 0; tab < w.tabs()->count() && tab < 6; ++tab) {
            w.tabs()->setCurrentIndex(tab);
            ok &= saveGrab(w, out, names[tab]);
        }
        // The report's options, started from the window's choices.
        ReportOptionsDialog dialog(*p);
        dialog.setOptions(reportOptionsFor(w.request()));
        dialog.show();
        ok &= saveGrab(dialog, out, "report-options.png");
    }
    return ok ? 0 : 1;
}
