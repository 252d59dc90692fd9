// The lead's menu in the workbench window: present for leads only, each window opened once, and
// every window closed before the project it shows goes away.
#include "app/desktop/coding_session.h"
#include "app/desktop/lead_windows.h"
#include "app/desktop/main_window.h"
#include "tests/support/test_support.h"

#include <QAction>
#include <QFile>
#include <QMenu>
#include <QMenuBar>
#include <QPointer>
#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct SampleCopy {
    QTemporaryDir dir;
    QString path;
    SampleCopy()
    {
        path = dir.filePath(QStringLiteral("demo.fourfold"));
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    }
};

QMenu *leadMenu(MainWindow &w)
{
    for (QAction *a : w.menuBar()->actions())
        if (a->menu() && a->text().remove(QLatin1Char('&')) == QLatin1String("Lead"))
            return a->menu();
    return nullptr;
}

} // namespace

TEST_CASE("the lead menu is there for a lead and not for a coder")
{
    SampleCopy f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    QMenu *menu = leadMenu(w);
    REQUIRE(menu);
    CHECK_FALSE(menu->menuAction()->isVisible());
    REQUIRE(w.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    CHECK(menu->menuAction()->isVisible());
    QStringList entries;
    for (QAction *a : menu->actions())
        if (!a->isSeparator())
            entries << a->text().remove(QLatin1Char('&'));
    CHECK(entries.contains(QStringLiteral("Compare and adjudicate…")));
    CHECK(entries.contains(QStringLiteral("Reliability…")));
    CHECK(entries.contains(QStringLiteral("Study design…")));
    CHECK(entries.contains(QStringLiteral("Progress…")));
    CHECK(entries.contains(QStringLiteral("Extractor runs…")));
}

TEST_CASE("each lead window opens once and all close when another project is opened")
{
    SampleCopy f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    LeadWindows *lead = w.leadWindows();
    lead->openComparison();
    lead->openReliability();
    lead->openStudyDesign();
    lead->openProgress();
    lead->openExtractors();
    QPointer<QWidget> windows[] = {lead->comparison(), lead->reliability(), lead->studyDesign(),
        lead->progress(), lead->extractors()};
    for (const auto &window : windows) {
        REQUIRE(window);
        CHECK(window->isVisible());
    }
    // Asked again: the same window is raised, not a second one made.
    lead->openReliability();
    CHECK(lead->reliability() == windows[1].data());

    // Opening the project again (as a coder) closes every lead window first.
    REQUIRE(w.openProject(f.path, QStringLiteral("C02")));
    for (const auto &window : windows)
        CHECK(window.isNull());
    lead->openComparison();
    CHECK(lead->comparison() == nullptr);
}
