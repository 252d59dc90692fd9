#include "core/project/article_status_edit.h"

#include "core/store/project_tables.h"
#include "core/store/store_util.h"
#include "core/store/study_tables.h"

#include <QCoreApplication>

namespace fourfold {

SetArticleStatusEdit::SetArticleStatusEdit(
    ArticleId article, CoderId coder, QString status, Phase phaseIfNew)
    : Edit(coder)
    , m_article(article)
    , m_coder(coder)
    , m_status(std::move(status))
    , m_phaseIfNew(phaseIfNew)
{ }

QString SetArticleStatusEdit::text() const
{
    if (m_status == QLatin1String("done"))
        return QCoreApplication::translate("ArticleStatusEdit", "Mark article as done");
    return QCoreApplication::translate("ArticleStatusEdit", "Mark article as %1").arg(m_status);
}

Status SetArticleStatusEdit::apply(Database &db)
{
    if (m_status != QLatin1String("assigned") && m_status != QLatin1String("started")
        && m_status != QLatin1String("done"))
        return fail(ErrorCode::InvalidArgument,
            QCoreApplication::translate(
                "ArticleStatusEdit", "\"%1\" is not a status (assigned, started, done).")
                .arg(m_status));
    auto mine = store::coderAssignments(db, m_article, m_coder);
    if (!mine)
        return std::unexpected(mine.error());
    std::vector<std::pair<Phase, QString>> before;
    for (const Assignment &a : *mine)
        before.emplace_back(a.phase, a.status);
    if (before.empty()) {
        // The same row on redo: the uuid made the first time is kept.
        if (m_createdUuid.isEmpty())
            m_createdUuid = store::newUuid();
        FOURFOLD_TRY_STATUS(
            store::insertAssignment(db, m_article, m_coder, m_phaseIfNew, m_createdUuid));
        FOURFOLD_TRY_STATUS(
            store::setAssignmentStatus(db, m_article, m_coder, m_phaseIfNew, m_status));
        m_created = true;
    } else {
        for (const auto &[phase, status] : before)
            FOURFOLD_TRY_STATUS(
                store::setAssignmentStatus(db, m_article, m_coder, phase, m_status));
        m_created = false;
    }
    m_before = std::move(before);
    return {};
}

Status SetArticleStatusEdit::revert(Database &db)
{
    if (m_created)
        return store::removeAssignment(db, m_article, m_coder, m_phaseIfNew);
    for (const auto &[phase, status] : m_before)
        FOURFOLD_TRY_STATUS(store::setAssignmentStatus(db, m_article, m_coder, phase, status));
    return {};
}

} // namespace fourfold
