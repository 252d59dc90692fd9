// The lead's menu in the workbench window: present for leads only, each window opened once, and
// every window closed before the project it shows goes away.
#include "app/desktop/codebook/codebook_editor.h"
#include "app/desktop/codebook_panel.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/lead_windows.h"
#include "app/desktop/main_window.h"
#include "tests/support/test_support.h"

#include <QAction>
#include <QFile>
#include <QMenu>
#include <QMenuBar>
#include <QPlainTextEdit>
#include <QPointer>
#include <QTemporaryDir>
#include <QTextBrowser>
#include <QUndoStack>

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

TEST_CASE("a codebook version saved in the lead's editor reaches the desk at once and leaves with "
          "the desk's undo")
{
    SampleCopy f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    auto *panel = w.findChild<CodebookPanel *>();
    REQUIRE(panel);
    panel->showFunction(FramingFunction::Problem);
    auto *text = panel->findChild<QTextBrowser *>();
    REQUIRE(text);
    const QString sharper = QStringLiteral("What the text presents as the costly issue at stake.");
    REQUIRE_FALSE(text->toPlainText().contains(sharper));
    const int before = w.session()->codebook().number;

    w.leadWindows()->openCodebook();
    auto *editor = qobject_cast<CodebookEditor *>(w.leadWindows()->codebook());
    REQUIRE(editor);
    auto *definition = qobject_cast<QPlainTextEdit *>(
        editor->fieldWidget(QStringLiteral("functions[0].definition")));
    REQUIRE(definition);
    definition->setPlainText(sharper);
    REQUIRE(editor->saveAsNewVersion(QStringLiteral("problem names the cost")));
    // The desk's session and its codebook panel show the new version without reopening.
    CHECK(w.session()->codebook().number == before + 1);
    CHECK(text->toPlainText().contains(sharper));

    w.session()->undoStack()->undo();
    CHECK(w.session()->codebook().number == before);
    CHECK_FALSE(text->toPlainText().contains(sharper));
    CHECK(editor->stored().number == before);
    w.leadWindows()->closeAll();
}
