#include "app/desktop/article_list_model.h"

namespace fourfold {

ArticleListModel::ArticleListModel(QObject *parent)
    : QAbstractTableModel(parent)
{ }

void ArticleListModel::setArticles(std::vector<ArticleSummary> articles)
{
    beginResetModel();
    m_articles = std::move(articles);
    endResetModel();
}

int ArticleListModel::rowCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : int(m_articles.size());
}

int ArticleListModel::columnCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QVariant ArticleListModel::data(const QModelIndex &index, int role) const
{
    if (!checkIndex(index, CheckIndexOption::IndexIsValid))
        return {};
    const ArticleSummary &a = m_articles[size_t(index.row())];
    if (role == ArticleIdRole)
        return a.id.value;
    if (role == Qt::TextAlignmentRole && index.column() == Length)
        return int(Qt::AlignRight | Qt::AlignVCenter);
    if (role != Qt::DisplayRole && role != Qt::ToolTipRole)
        return {};
    switch (index.column()) {
    case Title:
        return a.title;
    case Outlet:
        return a.outlet;
    case Language:
        return a.language;
    case Length:
        return a.length;
    }
    return {};
}

QVariant ArticleListModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole)
        return {};
    switch (section) {
    case Title:
        return tr("Title");
    case Outlet:
        return tr("Outlet");
    case Language:
        return tr("Language");
    case Length:
        return tr("Characters");
    }
    return {};
}

} // namespace fourfold
