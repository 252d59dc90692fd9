#include "core/project/paragraph_role_edit.h"

#include "core/store/article_table.h"

#include <QCoreApplication>

namespace fourfold {

SetParagraphRoleEdit::SetParagraphRoleEdit(
    ArticleId article, qsizetype index, ParagraphRole role, CoderId actor)
    : Edit(actor)
    , m_article(article)
    , m_index(index)
    , m_role(role)
{ }

QString SetParagraphRoleEdit::text() const
{
    return QCoreApplication::translate("ParagraphRoleEdit", "Mark paragraph %1 as %2")
        .arg(m_index + 1)
        .arg(paragraphRoleKey(m_role));
}

Status SetParagraphRoleEdit::apply(Database &db)
{
    auto article = store::article(db, m_article);
    if (!article)
        return std::unexpected(article.error());
    if (m_index < 0 || m_index >= qsizetype(article->paragraphs.size()))
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ParagraphRoleEdit", "Article \"%1\" has no paragraph %2.")
                .arg(article->summary.externalId)
                .arg(m_index + 1));
    const ParagraphRole before = article->paragraphs[size_t(m_index)].role;
    FOURFOLD_TRY_STATUS(store::setParagraphRole(db, m_article, m_index, m_role));
    m_before = before;
    m_articleUuid = article->summary.uuid;
    return {};
}

Status SetParagraphRoleEdit::revert(Database &db)
{
    if (!m_before)
        return fail(ErrorCode::Internal,
            QCoreApplication::translate(
                "ParagraphRoleEdit", "An edit that was never applied cannot be undone."));
    return store::setParagraphRole(db, m_article, m_index, *m_before);
}

} // namespace fourfold
