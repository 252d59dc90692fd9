#pragma once
// Every key of the desk in one table. The menus take their key sequences from DeskKeys and F1
// lists deskShortcuts(), so the help names every key the desk has (a GUI test checks each menu
// shortcut against the table). The reading view's own keys are described in reading_view.h.

#include <QKeySequence>
#include <QString>

#include <vector>

namespace fourfold {

namespace DeskKeys {
QKeySequence markDone(); // Ctrl+Return
QKeySequence nextArticle(); // Ctrl+PgDown
QKeySequence exactSelection(); // Ctrl+E: exact selection on or off
QKeySequence compare(); // Ctrl+K (leads)
QKeySequence reliability(); // Ctrl+R (leads)
QKeySequence shortcuts(); // F1
} // namespace DeskKeys

struct ShortcutRow {
    QString keys; // as shown, in the platform's own spelling
    QString what;
};

// The desk's keys in the order F1 lists them: coding keys first, then commands.
std::vector<ShortcutRow> deskShortcuts();

} // namespace fourfold
