#pragma once
// The article list: a thin, read-only adapter over the project's article summaries.

#include "core/model/article.h"

#include <QAbstractTableModel>

#include <vector>

namespace fourfold {

class ArticleListModel : public QAbstractTableModel
{
    Q_OBJECT
public:
    enum Column { Title, Outlet, Language, Length, ColumnCount };
    static constexpr int ArticleIdRole = Qt::UserRole + 1;

    explicit ArticleListModel(QObject *parent = nullptr);

    // Replaces the rows (bracketed as a model reset).
    void setArticles(std::vector<ArticleSummary> articles);

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    QVariant headerData(
        int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

private:
    std::vector<ArticleSummary> m_articles;
};

} // namespace fourfold
