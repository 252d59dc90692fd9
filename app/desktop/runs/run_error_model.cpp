#include "app/desktop/runs/run_error_model.h"

#include "app/desktop/function_style.h"

#include <QColor>

namespace fourfold {

RunErrorModel::RunErrorModel(QObject *parent)
    : QAbstractTableModel(parent)
{ }

void RunErrorModel::setErrors(std::optional<RunErrors> errors)
{
    beginResetModel();
    m_errors = std::move(errors);
    refilter();
    endResetModel();
}

void RunErrorModel::setFilter(
    std::optional<FramingFunction> function, std::optional<RunErrorKind> kind, const QString &text)
{
    beginResetModel();
    m_function = function;
    m_kind = kind;
    m_text = text.trimmed();
    refilter();
    endResetModel();
}

void RunErrorModel::refilter()
{
    m_rows.clear();
    if (!m_errors)
        return;
    for (size_t i = 0; i < m_errors->outcomes.size(); ++i) {
        const RunSpanOutcome &o = m_errors->outcomes[i];
        if (!o.isError() || (m_kind && o.kind != *m_kind))
            continue;
        // A wrong function is an error of both functions: it is found under either.
        if (m_function && o.function() != *m_function
            && !(o.predicted && o.predicted->function == *m_function))
            continue;
        if (!m_text.isEmpty() && !o.externalId.contains(m_text, Qt::CaseInsensitive)
            && !o.referenceQuote.contains(m_text, Qt::CaseInsensitive)
            && !o.predictedQuote.contains(m_text, Qt::CaseInsensitive))
            continue;
        m_rows.push_back(int(i));
    }
}

const RunSpanOutcome *RunErrorModel::outcome(int row) const
{
    if (row < 0 || size_t(row) >= m_rows.size())
        return nullptr;
    return &m_errors->outcomes[size_t(m_rows[size_t(row)])];
}

int RunErrorModel::outcomeIndex(int row) const
{
    return row < 0 || size_t(row) >= m_rows.size() ? -1 : m_rows[size_t(row)];
}

int RunErrorModel::rowOf(int index) const
{
    auto it = std::ranges::find(m_rows, index);
    return it == m_rows.end() ? -1 : int(it - m_rows.begin());
}

QString RunErrorModel::kindName(RunErrorKind kind)
{
    switch (kind) {
    case RunErrorKind::Correct:
        return tr("Correct");
    case RunErrorKind::FalsePositive:
        return tr("False positive");
    case RunErrorKind::Miss:
        return tr("Miss");
    case RunErrorKind::WrongFunction:
        return tr("Wrong function");
    case RunErrorKind::Boundary:
        return tr("Boundary");
    }
    return {};
}

int RunErrorModel::rowCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : int(m_rows.size());
}

int RunErrorModel::columnCount(const QModelIndex &parent) const
{
    return parent.isValid() ? 0 : Columns;
}

QVariant RunErrorModel::data(const QModelIndex &index, int role) const
{
    const RunSpanOutcome *o = index.isValid() ? outcome(index.row()) : nullptr;
    if (!o)
        return {};
    auto span = [](const std::optional<LayerSpan> &s, const QString &quote) {
        if (!s)
            return QString();
        return tr("%1 [%2, %3) “%4”")
            .arg(QString(functionStyle(s->function).letter))
            .arg(s->range.start)
            .arg(s->range.end)
            .arg(quote.simplified());
    };
    switch (role) {
    case Qt::DisplayRole:
        switch (index.column()) {
        case FunctionColumn:
            if (o->kind == RunErrorKind::WrongFunction)
                return tr("%1 → %2").arg(
                    functionName(o->reference->function), functionName(o->predicted->function));
            return functionName(o->function());
        case KindColumn:
            return kindName(o->kind);
        case ArticleColumn:
            return o->externalId;
        case ReferenceColumn:
            return o->reference ? span(o->reference, o->referenceQuote) : tr("—");
        case RunColumn:
            return o->predicted ? span(o->predicted, o->predictedQuote) : tr("—");
        }
        break;
    case Qt::DecorationRole:
        if (index.column() == FunctionColumn)
            return functionStyle(o->function()).colour;
        break;
    case Qt::ToolTipRole:
        if (index.column() == ReferenceColumn && o->reference)
            return o->referenceQuote;
        if (index.column() == RunColumn && o->predicted)
            return o->predictedQuote;
        break;
    default:
        break;
    }
    return {};
}

QVariant RunErrorModel::headerData(int section, Qt::Orientation o, int role) const
{
    if (o != Qt::Horizontal || role != Qt::DisplayRole)
        return {};
    switch (section) {
    case FunctionColumn:
        return tr("Function");
    case KindColumn:
        return tr("Kind");
    case ArticleColumn:
        return tr("Article");
    case ReferenceColumn:
        if (m_errors && m_errors->against.kind == LayerKind::Coder)
            return tr("Span of %1").arg(m_errors->against.name);
        return tr("Gold span");
    case RunColumn:
        return tr("Run span");
    }
    return {};
}

} // namespace fourfold
