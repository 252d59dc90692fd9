// Lead → Frames…: the window shows the frames core computes on the sample project (sizes, the
// profile heat map, frames by outlet, the articles of a frame, the top of Ward's tree), saves
// them with the names typed in as an undoable step, opens an article on the desk, and tells what
// to do when a layer holds too few articles.
#include "app/desktop/coding_session.h"
#include "app/desktop/frames/dendrogram_view.h"
#include "app/desktop/frames/frames_window.h"
#include "app/desktop/lead_windows.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "core/project/saved_frames.h"
#include "core/project/testing/older_lead.h"
#include "core/scoring/frame_input.h"
#include "tests/support/test_support.h"

#include <QAction>
#include <QComboBox>
#include <QFile>
#include <QLabel>
#include <QMenu>
#include <QMenuBar>
#include <QPointer>
#include <QSignalSpy>
#include <QTableWidget>
#include <QTemporaryDir>
#include <QUndoStack>

#include <map>
#include <numeric>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct SampleProject {
    QTemporaryDir dir;
    QString path = dir.filePath(QStringLiteral("demo.fourfold"));
    SampleProject()
    {
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    }
};

void computeAndWait(FramesWindow &w)
{
    QSignalSpy done(&w, &FramesWindow::computed);
    w.compute();
    REQUIRE(done.wait(60000));
}

} // namespace

TEST_CASE("the Frames window shows the frames core computes and saves them named")
{
    SampleProject f;
    MainWindow desk;
    REQUIRE(
        desk.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    desk.leadWindows()->openFrames();
    auto *w = qobject_cast<FramesWindow *>(desk.leadWindows()->frames());
    REQUIRE(w);
    // Opening computes the gold layer at once; wait for it, then ask for the consensus, k = 3.
    if (w->isRunning()) {
        QSignalSpy opened(w, &FramesWindow::computed);
        REQUIRE(opened.wait(60000));
    }
    FramesRequest request = w->request();
    CHECK(request.layer == QStringLiteral("gold"));
    request.layer = QStringLiteral("consensus");
    request.k = 3;
    request.maxK = 6;
    w->setRequest(request);
    computeAndWait(*w);
    REQUIRE(w->outcome());
    CHECK_FALSE(w->showsEmptyState());

    // Core's figures on the same file, computed here apart from the window's worker.
    auto project = Project::openForReading(f.path);
    REQUIRE(project);
    auto input = frameInput(*project, QStringLiteral("consensus"));
    REQUIRE(input);
    frames::FrameAnalysisOptions options;
    options.k = 3;
    options.maxK = 6;
    const auto analysis = frames::analyseFrames(input->matrix, options);
    REQUIRE(analysis);
    const int n = int(input->matrix.rows);
    REQUIRE(n >= 9);

    // Frames: one row each with core's size.
    QTableWidget *frames = w->framesTable();
    REQUIRE(frames->rowCount() == 3);
    for (int r = 0; r < 3; ++r)
        CHECK(frames->item(r, 1)->text().toInt() == analysis->profiles[size_t(r)].size);
    // The heat map: an element per row, the frame's share per column, all articles last.
    QTableWidget *heat = w->profileTable();
    REQUIRE(heat->rowCount() == int(input->variables.size()));
    REQUIRE(heat->columnCount() == 4);
    for (int v = 0; v < heat->rowCount(); ++v) {
        for (int c = 0; c < 3; ++c)
            CHECK(heat->item(v, c)->data(Qt::UserRole).toDouble()
                == analysis->profiles[size_t(c)].variables[size_t(v)].share);
        CHECK(heat->item(v, 3)->data(Qt::UserRole).toDouble()
            == analysis->profiles[0].variables[size_t(v)].overall);
    }
    // By outlet: each outlet's row counts its articles (counted here from the input's outlets).
    std::map<QString, int> perOutlet;
    for (const QString &outlet : input->groups.at(QStringLiteral("outlet")))
        ++perOutlet[outlet];
    QTableWidget *outlets = w->outletTable();
    REQUIRE(outlets->rowCount() == int(perOutlet.size()));
    for (int r = 0; r < outlets->rowCount(); ++r)
        CHECK(outlets->item(r, 3)->text().toInt()
            == perOutlet.at(outlets->verticalHeaderItem(r)->text()));
    // The top of Ward's tree: its leaves hold every article.
    const std::vector<int> &leaves = w->dendrogram()->leafSizes();
    CHECK(std::accumulate(leaves.begin(), leaves.end(), 0) == n);
    CHECK(int(leaves.size()) == std::min(n, DendrogramView::kShownMerges + 1));
    // The articles of frame 2: as many rows as the frame has articles.
    w->frameChoice()->setCurrentIndex(1);
    CHECK(w->articleTable()->rowCount() == analysis->profiles[1].size);

    // Double-clicking an article opens it on the desk.
    const ArticleId shown {w->articleTable()->item(0, 0)->data(Qt::UserRole).toLongLong()};
    emit w->articleTable()->itemDoubleClicked(w->articleTable()->item(0, 0));
    CHECK(desk.currentArticle() == shown);

    // Name two frames and save: the rows are in the file, members as computed.
    frames->item(0, 0)->setText(QStringLiteral("Costs"));
    frames->item(1, 0)->setText(QStringLiteral("Blame"));
    CHECK(w->frameChoice()->itemText(1) == QStringLiteral("F2 Blame"));
    REQUIRE(w->save(QStringLiteral("Consensus frames")));
    CHECK(w->messageBar()->kind() == MessageBar::Kind::Success);
    CHECK(w->savedChoice()->count() == 1);
    {
        auto reader = Project::openForReading(f.path);
        REQUIRE(reader);
        auto saved = SavedFrames::load(*reader, QStringLiteral("Consensus frames"));
        REQUIRE(saved);
        CHECK(saved->frames[0].name == QStringLiteral("Costs"));
        CHECK(saved->frames[1].name == QStringLiteral("Blame"));
        CHECK(saved->frames[2].name.isEmpty());
        CHECK(saved->settings.value(QStringLiteral("layer")).toString()
            == QStringLiteral("consensus"));
        REQUIRE(saved->members.size() == size_t(n));
        std::map<qint64, int> frameOf;
        for (int i = 0; i < n; ++i)
            frameOf[input->articles[size_t(i)].id.value] =
                analysis->frames.partition.labels[size_t(i)];
        for (const auto &[article, cluster] : saved->members)
            CHECK(frameOf.at(article.value) == cluster);
    }
    // The same name again is refused and told.
    CHECK_FALSE(w->save(QStringLiteral("Consensus frames")));
    CHECK(w->messageBar()->text().contains(QStringLiteral("already called")));

    // Saving is a step on the desk's undo stack.
    QUndoStack *undo = desk.session()->undoStack();
    undo->undo();
    CHECK(w->savedChoice()->count() == 0);
    CHECK(SavedFrames::list(desk.session()->project())->empty());
    undo->redo();
    CHECK(w->savedChoice()->count() == 1);

    // Opening the saved analysis brings back its layer, k and names.
    request.layer = QStringLiteral("gold");
    request.k = 0;
    w->setRequest(request);
    QSignalSpy reopened(w, &FramesWindow::computed);
    REQUIRE(w->openSaved(QStringLiteral("Consensus frames")));
    REQUIRE(reopened.wait(60000));
    CHECK(w->request().layer == QStringLiteral("consensus"));
    CHECK(w->request().k == 3);
    CHECK(frames->item(1, 0)->text() == QStringLiteral("Blame"));

    // Deleting, and its undo.
    REQUIRE(w->deleteSaved(QStringLiteral("Consensus frames")));
    CHECK(w->savedChoice()->count() == 0);
    undo->undo();
    CHECK(w->savedChoice()->count() == 1);

    const QString shot = qEnvironmentVariable("FOURFOLD_FRAMES_SHOT");
    if (!shot.isEmpty()) {
        w->resize(1200, 700);
        w->tabs()->setCurrentIndex(1);
        CHECK(w->grab().save(shot));
    }
}

TEST_CASE("the Frames window tells what to do when a layer holds too few articles")
{
    QTemporaryDir dir;
    auto project = Project::create(dir.filePath(QStringLiteral("empty.fourfold")));
    REQUIRE(project);
    REQUIRE(addOlderLeadForTesting(*project, QStringLiteral("Lee Lead"), QStringLiteral("L01")));
    auto lead = project->coderByPseudonym(QStringLiteral("L01"));
    REQUIRE(lead);
    REQUIRE(*lead);
    CodingSession session(std::move(*project), **lead);
    FramesWindow w(&session);
    CHECK(w.showsEmptyState()); // before the first computation: how to start
    computeAndWait(w);
    CHECK_FALSE(w.outcome());
    CHECK(w.showsEmptyState());
    CHECK(w.emptyState()->text().contains(QStringLiteral("holds 0 article")));
    CHECK(w.emptyState()->text().contains(QStringLiteral("Compare and adjudicate")));
}

TEST_CASE("Lead menu Frames opens the window once and it closes while computing")
{
    SampleProject f;
    MainWindow desk;
    REQUIRE(
        desk.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    QStringList entries;
    for (QAction *a : desk.menuBar()->actions())
        if (a->menu() && a->text().remove(QLatin1Char('&')) == QStringLiteral("Lead"))
            for (QAction *entry : a->menu()->actions())
                entries << entry->text().remove(QLatin1Char('&'));
    CHECK(entries.contains(QStringLiteral("Frames…")));
    desk.leadWindows()->openFrames();
    QPointer<QWidget> window = desk.leadWindows()->frames();
    REQUIRE(window);
    CHECK(window->isVisible());
    desk.leadWindows()->openFrames(); // asked again: the same window
    CHECK(desk.leadWindows()->frames() == window.data());
    // With a long bootstrap running, opening the project as a coder closes the window: its
    // destructor cancels the worker and waits for it.
    auto *frames = qobject_cast<FramesWindow *>(window.data());
    FramesRequest request = frames->request();
    request.layer = QStringLiteral("consensus");
    request.bootstrap = 10000;
    frames->setRequest(request);
    frames->compute();
    CHECK(frames->isRunning());
    REQUIRE(desk.openProject(f.path, QStringLiteral("C02")));
    CHECK(window.isNull());
    CHECK(desk.leadWindows()->frames() == nullptr);
}
