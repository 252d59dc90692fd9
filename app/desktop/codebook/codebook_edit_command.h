#pragma once
// One undoable step of the codebook editor: the whole draft before and after. Typing in one field
// merges into one step until another field is edited.

#include "core/model/codebook.h"

#include <QUndoCommand>

#include <functional>

namespace fourfold {

class CodebookEditCommand : public QUndoCommand
{
public:
    // `show(book, first)` makes `book` the editor's draft; `first` is true for the redo that
    // QUndoStack::push runs for a
    // step typed in a field, which already shows the new text. `field` names the
    // field typed in (steps of the same field merge); empty for a step that never merges.
    using Show = std::function<void(const Codebook &book, bool first)>;
    CodebookEditCommand(Show show, Codebook before, Codebook after, QString field, QString text);

    void undo() override;
    void redo() override;
    int id() const override;
    bool mergeWith(const QUndoCommand *other) override;

private:
    Show m_show;
    Codebook m_before;
    Codebook m_after;
    QString m_field;
    bool m_first = true;
};

} // namespace fourfold
