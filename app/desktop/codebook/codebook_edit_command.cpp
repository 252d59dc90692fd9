#include "app/desktop/codebook/codebook_edit_command.h"

namespace fourfold {

CodebookEditCommand::CodebookEditCommand(
    Show show, Codebook before, Codebook after, QString field, QString text)
    : QUndoCommand(text)
    , m_show(std::move(show))
    , m_before(std::move(before))
    , m_after(std::move(after))
    , m_field(std::move(field))
{ }

void CodebookEditCommand::undo()
{
    m_show(m_before, false);
}

void CodebookEditCommand::redo()
{
    // A step without a field (a row added, a type chosen) lets every widget follow.
    m_show(m_after, m_first && !m_field.isEmpty());
    m_first = false;
}

int CodebookEditCommand::id() const
{
    return m_field.isEmpty() ? -1 : 1;
}

bool CodebookEditCommand::mergeWith(const QUndoCommand *other)
{
    const auto *next = static_cast<const CodebookEditCommand *>(other);
    if (next->m_field != m_field)
        return false;
    m_after = next->m_after;
    return true;
}

} // namespace fourfold
