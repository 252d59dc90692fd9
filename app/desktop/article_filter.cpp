#include "app/desktop/article_filter.h"

#include "app/desktop/article_list_model.h"

namespace fourfold {

ArticleFilter::ArticleFilter(QObject *parent)
    : QSortFilterProxyModel(parent)
{ }

void ArticleFilter::setStatus(const QString &status)
{
    m_status = status;
    invalidateFilter();
}

void ArticleFilter::setMatches(std::optional<QSet<qint64>> ids)
{
    m_matches = std::move(ids);
    invalidateFilter();
}

bool ArticleFilter::filterAcceptsRow(int sourceRow, const QModelIndex &sourceParent) const
{
    const QModelIndex index = sourceModel()->index(sourceRow, 0, sourceParent);
    if (!m_status.isEmpty() && index.data(ArticleListModel::StatusRole).toString() != m_status)
        return false;
    if (m_matches && !m_matches->contains(index.data(ArticleListModel::ArticleIdRole).toLongLong()))
        return false;
    return true;
}

} // namespace fourfold
