#pragma once
// A coder's progress on an article: "assigned" (not started), "started" or "done", kept on their
// assignments. Marking an article the coder has no assignment for (a lead coding freely, or
// imported codings) creates an assignment in `phaseIfNew` (production unless said), which
// reverting removes again.

#include "core/model/annotation.h"
#include "core/project/edit.h"

#include <utility>
#include <vector>

namespace fourfold {

class SetArticleStatusEdit : public Edit
{
public:
    // `status` is "assigned", "started" or "done"; apply() fails with InvalidArgument otherwise.
    SetArticleStatusEdit(
        ArticleId article, CoderId coder, QString status, Phase phaseIfNew = Phase::Production);
    QString text() const override;
    QString action() const override { return QStringLiteral("article.status"); }
    QString objectType() const override { return QStringLiteral("assignment"); }
    QString objectUuid() const override { return {}; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    ArticleId m_article;
    CoderId m_coder;
    QString m_status;
    Phase m_phaseIfNew = Phase::Production;
    std::vector<std::pair<Phase, QString>> m_before; // each assignment's phase and old status
    bool m_created = false;
    QString m_createdUuid; // of the assignment this edit created, kept for redo
};

} // namespace fourfold
