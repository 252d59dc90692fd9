#pragma once
// One undoable user action: a QUndoCommand over one core Edit (style.md §5). redo() applies the
// edit through the project (one savepoint, committed at once); undo() reverts it the same way.

#include "core/model/ids.h"

#include <QUndoCommand>

#include <memory>

namespace fourfold {

class CodingSession;
class Edit;

class EditCommand : public QUndoCommand
{
public:
    EditCommand(CodingSession *session, std::unique_ptr<Edit> edit, ArticleId article);
    ~EditCommand() override;

    void redo() override;
    void undo() override;

    // False if the last redo() or undo() failed; the error went to the session.
    bool succeeded() const { return m_ok; }
    Edit &edit() { return *m_edit; }

private:
    CodingSession *m_session;
    std::unique_ptr<Edit> m_edit;
    ArticleId m_article;
    bool m_ok = true;
};

} // namespace fourfold
