#include "app/desktop/shortcut_table.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ShortcutTableText {
    Q_DECLARE_TR_FUNCTIONS(ShortcutTableText)
};

QString native(const QKeySequence &keys)
{
    return keys.toString(QKeySequence::NativeText);
}

// Several sequences of one action, the first one first ("Ctrl+PgDown or Alt+Down").
QString native(const QList<QKeySequence> &keys)
{
    QStringList names;
    for (const QKeySequence &k : keys)
        names << native(k);
    return names.join(ShortcutTableText::tr(" or "));
}

} // namespace

namespace DeskKeys {
QKeySequence markDone()
{
    return QKeySequence(Qt::CTRL | Qt::Key_Return);
}
QKeySequence nextArticle()
{
    return QKeySequence(Qt::CTRL | Qt::Key_PageDown);
}
QKeySequence exactSelection()
{
    return QKeySequence(Qt::CTRL | Qt::Key_E);
}
QKeySequence compare()
{
    return QKeySequence(Qt::CTRL | Qt::Key_K);
}
QKeySequence reliability()
{
    return QKeySequence(Qt::CTRL | Qt::Key_R);
}
QKeySequence shortcuts()
{
    return QKeySequence(Qt::Key_F1);
}
} // namespace DeskKeys

namespace CompareKeys {
QList<QKeySequence> nextDisagreement()
{
    return {QKeySequence(Qt::Key_N), QKeySequence(Qt::Key_F8)};
}
QList<QKeySequence> previousDisagreement()
{
    return {QKeySequence(Qt::Key_P), QKeySequence(Qt::SHIFT | Qt::Key_F8)};
}
QList<QKeySequence> nextArticle()
{
    // Ctrl+PgDown as on the desk; Alt+Down kept for those whose window manager leaves it alone.
    return {QKeySequence(Qt::CTRL | Qt::Key_PageDown), QKeySequence(Qt::ALT | Qt::Key_Down)};
}
QList<QKeySequence> previousArticle()
{
    return {QKeySequence(Qt::CTRL | Qt::Key_PageUp), QKeySequence(Qt::ALT | Qt::Key_Up)};
}
QKeySequence resortQueue()
{
    return QKeySequence(Qt::Key_F5);
}
QKeySequence accept()
{
    return QKeySequence(Qt::Key_A);
}
QKeySequence merge()
{
    return QKeySequence(Qt::Key_M);
}
QKeySequence edit()
{
    return QKeySequence(Qt::Key_E);
}
QKeySequence reject()
{
    return QKeySequence(Qt::Key_R);
}
QKeySequence withdraw()
{
    return QKeySequence(Qt::Key_W);
}
QKeySequence acceptAgreed()
{
    return QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_A);
}
QKeySequence rationale()
{
    return QKeySequence(Qt::CTRL | Qt::Key_L);
}
} // namespace CompareKeys

std::vector<ShortcutRow> deskShortcuts()
{
    const QString ctrl = native(QKeySequence(Qt::CTRL)).remove(QLatin1Char('+'));
    return {
        {QStringLiteral("1 \u2013 4"),
            ShortcutTableText::tr(
                "Mark the selected text as problem, cause, evaluation or remedy, snapped to "
                "whole words; with a span selected: relabel it")},
        {ShortcutTableText::tr("%1+1 \u2013 4 (or Alt+1 \u2013 4)").arg(ctrl),
            ShortcutTableText::tr("Mark exactly the selected text, without snapping to words")},
        {native(DeskKeys::exactSelection()),
            ShortcutTableText::tr(
                "Exact selection on or off (View menu): while on, 1 \u2013 4 and handle drags "
                "take the text exactly as selected")},
        {ShortcutTableText::tr("%1 while dragging a handle (or Alt)").arg(ctrl),
            ShortcutTableText::tr("Resize the selected span to the exact character")},
        {ShortcutTableText::tr("Delete or Backspace"),
            ShortcutTableText::tr("Delete the selected span")},
        {ShortcutTableText::tr("%1+Left / Right (or Alt+Left / Right)").arg(ctrl),
            ShortcutTableText::tr("Move the selected span's start by a word")},
        {ShortcutTableText::tr("%1+Shift+Left / Right (or Alt+Shift+Left / Right)").arg(ctrl),
            ShortcutTableText::tr("Move the selected span's end by a word")},
        {ShortcutTableText::tr("%1+Up / Down (or Alt+Up / Down)").arg(ctrl),
            ShortcutTableText::tr("Select the previous / next span")},
        {ShortcutTableText::tr("Esc"),
            ShortcutTableText::tr(
                "Clear the span selection, then the text selection; cancel a drag")},
        {native(QKeySequence(QKeySequence::Undo)), ShortcutTableText::tr("Undo the last change")},
        {native(QKeySequence(QKeySequence::Redo)), ShortcutTableText::tr("Redo")},
        {native(DeskKeys::markDone()),
            ShortcutTableText::tr("Mark the article as done and open the next")},
        {native(DeskKeys::nextArticle()), ShortcutTableText::tr("Next article that is not done")},
        {native(QKeySequence(QKeySequence::New)), ShortcutTableText::tr("Start a new project")},
        {native(QKeySequence(QKeySequence::Open)), ShortcutTableText::tr("Open a project")},
        {native(QKeySequence(QKeySequence::Find)), ShortcutTableText::tr("Search the texts")},
        {native(DeskKeys::compare()),
            ShortcutTableText::tr("Compare coders and adjudicate (leads)")},
        {native(DeskKeys::reliability()), ShortcutTableText::tr("Reliability (leads)")},
        {native(DeskKeys::shortcuts()), ShortcutTableText::tr("This list of keys")},
    };
}

std::vector<ShortcutRow> comparisonShortcuts()
{
    return {
        {native(CompareKeys::nextDisagreement()),
            ShortcutTableText::tr("Next undecided disagreement")},
        {native(CompareKeys::previousDisagreement()),
            ShortcutTableText::tr("Previous undecided disagreement")},
        {native(CompareKeys::nextArticle()), ShortcutTableText::tr("Next article in the queue")},
        {native(CompareKeys::previousArticle()),
            ShortcutTableText::tr("Previous article in the queue")},
        {native(CompareKeys::resortQueue()),
            ShortcutTableText::tr("Re-sort the queue: most undecided disagreements first (the "
                                  "queue keeps its order while you decide)")},
        {native(CompareKeys::accept()),
            ShortcutTableText::tr("Accept the chosen coder's span into gold")},
        {native(CompareKeys::merge()),
            ShortcutTableText::tr("Put one span covering the chosen spans into gold")},
        {native(CompareKeys::edit()),
            ShortcutTableText::tr("Decide a gold span with a function and boundaries of your own")},
        {native(CompareKeys::reject()),
            ShortcutTableText::tr("Record that the chosen spans do not belong in gold")},
        {native(CompareKeys::withdraw()), ShortcutTableText::tr("Withdraw the chosen gold span")},
        {native(CompareKeys::acceptAgreed()),
            ShortcutTableText::tr("Accept every span all coders of the article agree on")},
        {native(CompareKeys::rationale()),
            ShortcutTableText::tr("Write the rationale kept with the next decision")},
        // The window takes every platform binding of undo and redo (QAction::setShortcuts).
        {native(QKeySequence::keyBindings(QKeySequence::Undo)),
            ShortcutTableText::tr("Undo the last change")},
        {native(QKeySequence::keyBindings(QKeySequence::Redo)), ShortcutTableText::tr("Redo")},
        {native(DeskKeys::shortcuts()), ShortcutTableText::tr("This list of keys")},
    };
}

QString shortcutTableHtml(const std::vector<ShortcutRow> &rows)
{
    QString html;
    for (const ShortcutRow &r : rows)
        html += QStringLiteral("<tr><td style='padding-right:18px'><b>%1</b></td><td>%2</td></tr>")
                    .arg(r.keys.toHtmlEscaped(), r.what.toHtmlEscaped());
    return QStringLiteral("<table>%1</table>").arg(html);
}

} // namespace fourfold
