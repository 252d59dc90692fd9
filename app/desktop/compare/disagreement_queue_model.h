#pragma once
// The adjudication queue as a table: one row per article coded by two or more coders, most
// undecided disagreements first (disagreementQueue() orders it). A thin adapter: it never
// reads or writes the project itself.

#include "core/agreement/disagreements.h"

#include <QAbstractTableModel>

#include <vector>

namespace fourfold {

class DisagreementQueueModel : public QAbstractTableModel
{
    Q_OBJECT
public:
    enum Column { Title, Open, Disagreements, Agreed, Coders, ColumnCount };

    explicit DisagreementQueueModel(QObject *parent = nullptr);

    // Replaces the rows; `coderNames` gives each coder's pseudonym for the Coders column.
    void setRows(std::vector<ArticleDisagreement> rows, const QHash<qint64, QString> &coderNames);
    const std::vector<ArticleDisagreement> &rows() const { return m_rows; }
    // Replaces the row of `row.article` where it stands (the queue keeps its order while the lead
    // works through it); false when the article has no row.
    bool updateRow(ArticleDisagreement row);
    // The row of `article`, or -1.
    int rowOf(ArticleId article) const;

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role) const override;

private:
    std::vector<ArticleDisagreement> m_rows;
    QHash<qint64, QString> m_coderNames;
};

} // namespace fourfold
