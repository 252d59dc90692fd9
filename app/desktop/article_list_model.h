#pragma once
// The article list: a thin, read-only adapter over the articles this person may open, with
// their coding status and time spent.

#include "core/model/article.h"

#include <QAbstractTableModel>

#include <vector>

namespace fourfold {

struct ArticleRow {
    ArticleSummary summary;
    QString status; // "assigned", "started", "done"
    qint64 seconds = 0;
    // The older articles this one is a near copy of (found at import), each as
    // "“title” (id), similarity 0.93"; the title shows a mark and its tooltip lists them.
    QStringList nearCopyOf;
};

class ArticleListModel : public QAbstractTableModel
{
    Q_OBJECT
public:
    enum Column { Title, Outlet, Language, Length, Status, Time, ColumnCount };
    static constexpr int ArticleIdRole = Qt::UserRole + 1;
    static constexpr int StatusRole = Qt::UserRole + 2;
    // True for an article that is a near copy of an older one.
    static constexpr int NearCopyRole = Qt::UserRole + 3;

    explicit ArticleListModel(QObject *parent = nullptr);

    // Replaces the rows (bracketed as a model reset).
    void setArticles(std::vector<ArticleRow> rows);
    // Updates one article's status and time (bracketed as a data change).
    void updateArticle(ArticleId id, const QString &status, qint64 seconds);
    // The row of `id`, or -1.
    int rowOf(ArticleId id) const;

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    QVariant headerData(
        int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    // "not started", "in progress", "done" (translated).
    static QString statusLabel(const QString &status);

private:
    std::vector<ArticleRow> m_rows;
};

} // namespace fourfold
