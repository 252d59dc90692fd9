#pragma once
// Filters the article list by coding status and by a full-text search's hits.

#include "core/model/ids.h"

#include <QSet>
#include <QSortFilterProxyModel>

#include <optional>

namespace fourfold {

class ArticleFilter : public QSortFilterProxyModel
{
    Q_OBJECT
public:
    explicit ArticleFilter(QObject *parent = nullptr);
    // Only articles with this status ("assigned", "started", "done"); empty = any.
    void setStatus(const QString &status);
    // Only these articles (the hits of a search); nothing = no search.
    void setMatches(std::optional<QSet<qint64>> ids);

protected:
    bool filterAcceptsRow(int sourceRow, const QModelIndex &sourceParent) const override;

private:
    QString m_status;
    std::optional<QSet<qint64>> m_matches;
};

} // namespace fourfold
