// F1 lists every key of the desk from one table (shortcut_table.h): every shortcut of every menu
// is in it, spelled as the menu spells it, and the exact-selection toggle reaches the reading
// view and is kept for the next start (common practice: a preference persists).
#include "app/desktop/main_window.h"
#include "app/desktop/reading_view.h"
#include "app/desktop/shortcut_table.h"

#include <QAction>
#include <QMenu>
#include <QMenuBar>
#include <QSet>
#include <QSettings>

#include <catch2/catch.hpp>

using namespace fourfold;

namespace {

void collect(const QList<QAction *> &actions, QList<QAction *> &out)
{
    for (QAction *a : actions) {
        out << a;
        if (a->menu())
            collect(a->menu()->actions(), out);
    }
}

} // namespace

TEST_CASE("Every menu shortcut of the desk is in the table F1 shows")
{
    MainWindow window;
    QList<QAction *> actions;
    collect(window.menuBar()->actions(), actions);
    QStringList listed;
    for (const ShortcutRow &row : deskShortcuts())
        listed << row.keys;
    int withKeys = 0;
    for (QAction *a : actions) {
        if (a->shortcut().isEmpty())
            continue;
        ++withKeys;
        const QString keys = a->shortcut().toString(QKeySequence::NativeText);
        INFO(a->text().toStdString() << " " << keys.toStdString());
        CHECK(listed.contains(keys));
    }
    CHECK(withKeys >= 8); // undo, redo, done, next, find, exact, compare, reliability, F1
    // The table has no row without a description, nor two rows for one key.
    for (const ShortcutRow &row : deskShortcuts())
        CHECK_FALSE(row.what.isEmpty());
    CHECK(QSet<QString>(listed.begin(), listed.end()).size() == listed.size());
}

TEST_CASE("Exact selection is switched in the View menu and kept")
{
    QSettings().remove(QStringLiteral("desk/exactSelection"));
    QAction *exact = nullptr;
    {
        MainWindow window;
        QList<QAction *> actions;
        collect(window.menuBar()->actions(), actions);
        for (QAction *a : actions)
            if (a->shortcut() == DeskKeys::exactSelection())
                exact = a;
        REQUIRE(exact);
        CHECK(exact->isCheckable());
        CHECK_FALSE(window.readingView()->exactSelection());
        exact->setChecked(true);
        CHECK(window.readingView()->exactSelection());
    }
    MainWindow again;
    CHECK(again.readingView()->exactSelection());
    QSettings().remove(QStringLiteral("desk/exactSelection"));
}
