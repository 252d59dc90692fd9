#include "app/desktop/article_list_model.h"

#include <QPainter>
#include <QPixmap>

namespace fourfold {

ArticleListModel::ArticleListModel(QObject *parent)
    : QAbstractTableModel(parent)
{ }

void ArticleListModel::setArticles(std::vector<ArticleRow> rows)
{
    beginResetModel();
    m_rows = std::move(rows);
    endResetModel();
}

void ArticleListModel::updateArticle(ArticleId id, const QString &status, qint64 seconds)
{
    const int row = rowOf(id);
    if (row < 0)
        return;
    m_rows[size_t(row)].status = status;
    m_rows[size_t(row)].seconds = seconds;
    emit dataChanged(index(row, Status), index(row, Time));
}

int ArticleListModel::rowOf(ArticleId id) const
{
    for (size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].summary.id == id)
            return int(i);
    return -1;
}

int ArticleListModel::rowCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : int(m_rows.size());
}

int ArticleListModel::columnCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QString ArticleListModel::statusLabel(const QString &status)
{
    if (status == QLatin1String("done"))
        return tr("done");
    if (status == QLatin1String("started"))
        return tr("in progress");
    return tr("not started");
}

namespace {

// The near-copy mark: two small overlapping sheets, drawn once in the palette's text colour.
QPixmap nearCopyMark()
{
    static const QPixmap mark = [] {
        QPixmap pixmap(12, 12);
        pixmap.fill(Qt::transparent);
        QPainter painter(&pixmap);
        painter.setPen(QPen(QColor(90, 90, 90), 1));
        painter.setBrush(Qt::white);
        painter.drawRect(QRectF(0.5, 0.5, 7, 8));
        painter.drawRect(QRectF(3.5, 2.5, 7, 8));
        return pixmap;
    }();
    return mark;
}

} // namespace

QVariant ArticleListModel::data(const QModelIndex &index, int role) const
{
    if (!checkIndex(index, CheckIndexOption::IndexIsValid))
        return {};
    const ArticleRow &r = m_rows[size_t(index.row())];
    if (role == ArticleIdRole)
        return r.summary.id.value;
    if (role == StatusRole)
        return r.status;
    if (role == NearCopyRole)
        return !r.nearCopyOf.isEmpty();
    if (index.column() == Title && !r.nearCopyOf.isEmpty()) {
        if (role == Qt::DecorationRole)
            return nearCopyMark();
        if (role == Qt::ToolTipRole)
            return tr("%1\nNear copy of %2")
                .arg(r.summary.title, r.nearCopyOf.join(QStringLiteral("; ")));
    }
    if (role == Qt::TextAlignmentRole && (index.column() == Length || index.column() == Time))
        return int(Qt::AlignRight | Qt::AlignVCenter);
    if (role != Qt::DisplayRole && role != Qt::ToolTipRole)
        return {};
    switch (index.column()) {
    case Title:
        return r.summary.title;
    case Outlet:
        return r.summary.outlet;
    case Language:
        return r.summary.language;
    case Length:
        return r.summary.length;
    case Status:
        return statusLabel(r.status);
    case Time:
        return r.seconds > 0 ? QStringLiteral("%1:%2")
                                   .arg(r.seconds / 60)
                                   .arg(r.seconds % 60, 2, 10, QLatin1Char('0'))
                             : QString();
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
        return tr("Lang.");
    case Length:
        return tr("Characters");
    case Status:
        return tr("Status");
    case Time:
        return tr("Time");
    }
    return {};
}

} // namespace fourfold
