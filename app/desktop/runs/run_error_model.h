#pragma once
// The error list of the extractor window: one row per error of a run (false positive, miss,
// wrong function, boundary; correct outcomes are left out), filterable by function, kind and a
// text found in the article's id or either quote. A thin adapter over RunErrors.

#include "core/scoring/run_errors.h"

#include <QAbstractTableModel>

#include <optional>
#include <vector>

namespace fourfold {

class RunErrorModel : public QAbstractTableModel
{
    Q_OBJECT
public:
    enum Column { FunctionColumn, KindColumn, ArticleColumn, ReferenceColumn, RunColumn, Columns };

    explicit RunErrorModel(QObject *parent = nullptr);

    // Shows the errors of `errors` (nothing = empty), with the current filter.
    void setErrors(std::optional<RunErrors> errors);
    const std::optional<RunErrors> &errors() const { return m_errors; }
    // Filters: one function (nothing = all), one kind (nothing = every error), and a text that
    // the article's external id or one of the quotes contains (case-insensitive; empty = all).
    void setFilter(std::optional<FramingFunction> function, std::optional<RunErrorKind> kind,
        const QString &text);

    // The outcome shown in `row`, and its index in errors()->outcomes; nothing / -1 if none.
    const RunSpanOutcome *outcome(int row) const;
    int outcomeIndex(int row) const;
    // The row that shows errors()->outcomes[index], or -1 (filtered out or correct).
    int rowOf(int outcomeIndex) const;

    // The translated name of an error kind ("False positive", "Miss", ...).
    static QString kindName(RunErrorKind kind);

    int rowCount(const QModelIndex &parent = {}) const override;
    int columnCount(const QModelIndex &parent = {}) const override;
    QVariant data(const QModelIndex &index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation o, int role = Qt::DisplayRole) const override;

private:
    void refilter();

    std::optional<RunErrors> m_errors;
    std::vector<int> m_rows; // indices into m_errors->outcomes
    std::optional<FramingFunction> m_function;
    std::optional<RunErrorKind> m_kind;
    QString m_text;
};

} // namespace fourfold
