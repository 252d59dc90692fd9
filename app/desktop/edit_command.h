#pragma once
// One undoable user action: a QUndoCommand over one core Edit (style.md §5). The session applies
// the edit before pushing the command (so a refused edit never reaches the stack); afterwards
// redo() re-applies it through the project (one savepoint, committed at once) and undo() reverts
// it the same way.

#include "app/desktop/article_document.h"
#include "core/model/ids.h"

#include <QUndoCommand>

#include <memory>

namespace fourfold {

class CodingSession;
class Edit;

class EditCommand : public QUndoCommand
{
public:
    // `edit` has already been applied: the redo() that QUndoStack::push() runs does nothing.
    // `touched`: the parts of the article's document the edit changes.
    EditCommand(CodingSession *session, std::unique_ptr<Edit> edit, ArticleId article,
        ArticleDocument::Parts touched);
    ~EditCommand() override;

    void redo() override;
    void undo() override;

private:
    CodingSession *m_session;
    std::unique_ptr<Edit> m_edit;
    ArticleId m_article;
    ArticleDocument::Parts m_touched;
    bool m_pushed = false;
};

} // namespace fourfold
