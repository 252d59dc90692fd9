#pragma once
// The lead's correction of a paragraph's role (intro / body / conclusion), which import sets
// from position.

#include "core/model/paragraph_role.h"
#include "core/project/edit.h"

#include <optional>

namespace fourfold {

// Sets the role of paragraph `index` (0-based) of `article`. apply() fails with NotFound for an
// unknown article or paragraph.
class SetParagraphRoleEdit : public Edit
{
public:
    SetParagraphRoleEdit(ArticleId article, qsizetype index, ParagraphRole role, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("paragraph.role"); }
    QString objectType() const override { return QStringLiteral("paragraph"); }
    QString objectUuid() const override { return m_articleUuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    ArticleId m_article;
    qsizetype m_index = 0;
    ParagraphRole m_role;
    std::optional<ParagraphRole> m_before;
    QString m_articleUuid;
};

} // namespace fourfold
