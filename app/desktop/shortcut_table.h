#pragma once
// Every key of the desk and of the comparison window in one table. The desk's menus take their
// key sequences from DeskKeys and the comparison window's actions theirs from CompareKeys; F1
// lists deskShortcuts() and comparisonShortcuts(), so the help names every key either window has
// (GUI tests check each shortcut against the table). The reading view's own keys are described in
// reading_view.h.

#include <QKeySequence>
#include <QList>
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

// The comparison window's keys (leads). Plain letters act on the passage; the article keys are
// Ctrl-based like the desk's, because common Linux window managers take Alt with the arrows.
namespace CompareKeys {
QList<QKeySequence> nextDisagreement(); // N, F8
QList<QKeySequence> previousDisagreement(); // P, Shift+F8
QList<QKeySequence> nextArticle(); // Ctrl+PgDown, Alt+Down
QList<QKeySequence> previousArticle(); // Ctrl+PgUp, Alt+Up
QKeySequence resortQueue(); // F5
QKeySequence accept(); // A
QKeySequence merge(); // M
QKeySequence edit(); // E
QKeySequence reject(); // R
QKeySequence withdraw(); // W
QKeySequence acceptAgreed(); // Ctrl+Shift+A
QKeySequence rationale(); // Ctrl+L
} // namespace CompareKeys

struct ShortcutRow {
    QString keys; // as shown, in the platform's own spelling
    QString what;
};

// The desk's keys in the order F1 lists them: coding keys first, then commands.
std::vector<ShortcutRow> deskShortcuts();
// The comparison window's keys in the order its F1 lists them.
std::vector<ShortcutRow> comparisonShortcuts();
// `rows` as an HTML table for a message box (keys in bold, text escaped).
QString shortcutTableHtml(const std::vector<ShortcutRow> &rows);

} // namespace fourfold
