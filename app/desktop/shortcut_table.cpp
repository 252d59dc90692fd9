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

} // namespace fourfold
