#include "app/desktop/compare/disagreement_queue_model.h"

namespace fourfold {

DisagreementQueueModel::DisagreementQueueModel(QObject *parent)
    : QAbstractTableModel(parent)
{ }

void DisagreementQueueModel::setRows(
    std::vector<ArticleDisagreement> rows, const QHash<qint64, QString> &coderNames)
{
    beginResetModel();
    m_rows = std::move(rows);
    m_coderNames = coderNames;
    endResetModel();
}

bool DisagreementQueueModel::updateRow(ArticleDisagreement row)
{
    const int at = rowOf(row.article.id);
    if (at < 0)
        return false;
    m_rows[size_t(at)] = std::move(row);
    emit dataChanged(index(at, 0), index(at, ColumnCount - 1));
    return true;
}

int DisagreementQueueModel::rowOf(ArticleId article) const
{
    for (size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].article.id == article)
            return int(i);
    return -1;
}

int DisagreementQueueModel::rowCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : int(m_rows.size());
}

int DisagreementQueueModel::columnCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QVariant DisagreementQueueModel::data(const QModelIndex &index, int role) const
{
    if (!checkIndex(index, CheckIndexOption::IndexIsValid))
        return {};
    const ArticleDisagreement &row = m_rows[size_t(index.row())];
    if (role == Qt::DisplayRole) {
        switch (index.column()) {
        case Title:
            return row.article.title;
        case Open:
            return row.unresolved;
        case Disagreements:
            return row.disagreements;
        case Agreed:
            return row.agreedOpen;
        case Coders: {
            QStringList names;
            for (CoderId c : row.coders)
                names << m_coderNames.value(c.value);
            return names.join(QStringLiteral(", "));
        }
        default:
            return {};
        }
    }
    if (role == Qt::TextAlignmentRole && index.column() != Title && index.column() != Coders)
        return int(Qt::AlignRight | Qt::AlignVCenter);
    if (role == Qt::ToolTipRole)
        return tr("%1 passages: %2 with a disagreement (%3 undecided), %4 agreed and not yet in "
                  "gold. Only one coder or not all: %5; function: %6; boundaries: %7; "
                  "attributes: %8.")
            .arg(row.passages)
            .arg(row.disagreements)
            .arg(row.unresolved)
            .arg(row.agreedOpen)
            .arg(row.byKind[size_t(DisagreementKind::Presence)])
            .arg(row.byKind[size_t(DisagreementKind::Function)])
            .arg(row.byKind[size_t(DisagreementKind::Boundary)])
            .arg(row.byKind[size_t(DisagreementKind::Attributes)]);
    return {};
}

QVariant DisagreementQueueModel::headerData(
    int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal)
        return {};
    if (role == Qt::ToolTipRole) {
        switch (section) {
        case Open:
            return tr("Passages with a disagreement not yet decided");
        case Disagreements:
            return tr("Passages with a disagreement, decided or not");
        case Agreed:
            return tr("Passages all coders agree on that are not yet in gold");
        default:
            return {};
        }
    }
    if (role != Qt::DisplayRole)
        return {};
    switch (section) {
    case Title:
        return tr("Article");
    case Open:
        return tr("Open");
    case Disagreements:
        return tr("All");
    case Agreed:
        return tr("Agreed");
    case Coders:
        return tr("Coders");
    default:
        return {};
    }
}

} // namespace fourfold
