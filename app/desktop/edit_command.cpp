#include "app/desktop/edit_command.h"

#include "app/desktop/coding_session.h"
#include "core/project/edit.h"

#include <utility>

namespace fourfold {

EditCommand::EditCommand(CodingSession *session, std::unique_ptr<Edit> edit, ArticleId article,
    ArticleDocument::Parts touched)
    : m_session(session)
    , m_edit(std::move(edit))
    , m_article(article)
    , m_touched(touched)
{
    setText(m_edit->text());
}

EditCommand::~EditCommand() = default;

void EditCommand::redo()
{
    if (!std::exchange(m_pushed, true))
        return; // the first redo() is the push of an edit the session already applied
    if (auto st = m_session->project().apply(*m_edit); !st) {
        emit m_session->errorOccurred(st.error().toString());
        return;
    }
    m_session->changed(m_article, m_touched);
}

void EditCommand::undo()
{
    auto st = m_session->project().revert(*m_edit);
    if (!st) {
        emit m_session->errorOccurred(st.error().toString());
        return;
    }
    m_session->changed(m_article, m_touched);
}

} // namespace fourfold
