#pragma once
// A labelled reliability matrix: a row per unit, a column per coder, each cell a label (text) or
// missing (the coder did not code the unit). What a raw CSV matrix (core/io) and a project's
// unitizers (core/agreement/project_units.h) produce and what value encoding turns into the
// numeric kernels' reliability data.
//
// Held compactly for tables of millions of units: each distinct label once and a cell as the
// index of its label (4 bytes); unit ids either as numbered blocks (an article's units
// "<article>#t1" to "#t<n>" cost one entry, not n strings) or, for ids of any form, one string
// holding them all end to end.

#include <QHash>
#include <QString>
#include <QStringList>

#include <functional>
#include <optional>
#include <span>
#include <utility>
#include <vector>

namespace fourfold {

// The article id of a unit id made by the unitizers: "a7#s12" → "a7", "a7#p2", "a7#t3", "a7#a1"
// likewise; any other id (an article unit, a row of a raw matrix) is its own article.
QString unitArticle(QStringView unitId);

class ReliabilityTable
{
public:
    static constexpr qint32 kMissing = -1;

    QStringList coders; // the columns, in order
    QString source; // the file or project the table comes from, for messages

    qsizetype coderCount() const { return coders.size(); }
    size_t unitCount() const { return m_unitCount; }
    bool isEmpty() const { return m_unitCount == 0; }

    // --- labels ---------------------------------------------------------------------------
    // The index of `label` (not empty), added if it is new: labels are numbered in the order
    // they are first added.
    qint32 labelIndex(QStringView label);
    // Every label added, by index (labels of rows since removed stay).
    const QStringList &labels() const { return m_labels; }

    // --- cells ----------------------------------------------------------------------------
    // The label index of a cell, or kMissing.
    qint32 cell(size_t unit, qsizetype coder) const
    {
        return m_cells[unit * size_t(coders.size()) + size_t(coder)];
    }
    // The label of a cell; empty when missing.
    QString cellText(size_t unit, qsizetype coder) const;
    std::span<const qint32> row(size_t unit) const
    {
        return {m_cells.data() + unit * size_t(coders.size()), size_t(coders.size())};
    }
    // A row's labels ("" for missing): for tests and small tables.
    QStringList rowText(size_t unit) const;
    // Every cell, unit by unit (units × coders).
    const std::vector<qint32> &cells() const { return m_cells; }
    // The cells, taken out of the table, which keeps its coders, labels and units (unitCount()
    // stays): for cells that now live elsewhere, e.g. encoded. cell() and row() may not be
    // called afterwards.
    std::vector<qint32> takeCells() { return std::exchange(m_cells, {}); }
    // Replaces every cell's label index l with relabel[l] (a new index into labels(), which
    // `labels` then become); kMissing stays missing.
    void relabel(const std::vector<qint32> &relabel, const QStringList &labels);
    // Replaces every label with what `counted(label)` gives, labels that become equal merging
    // into one; a label it gives nothing for becomes missing in every cell.
    void recodeLabels(const std::function<std::optional<QString>(const QString &)> &counted);

    // --- units ----------------------------------------------------------------------------
    // Makes room for `units` more units (of the coders named so far) with ids of their own,
    // and for `idCharacters` more characters of those ids.
    void reserve(size_t units, size_t idCharacters = 0);
    // Appends a unit with its own id (any text; `line`: where a file's row begins, 0 = none)
    // and one label index per coder.
    void appendUnit(QStringView id, std::span<const qint32> cells, qint64 line = 0);
    // The same with an id of Latin-1 (ASCII) characters, widened as it is stored.
    void appendUnit(QLatin1String id, std::span<const qint32> cells, qint64 line = 0);
    // The same with the cells as labels ("" = missing), interned: for tests and small tables.
    void appendUnit(QStringView id, const QStringList &cells, qint64 line = 0);
    // Appends units "<article><marker>1" … "<article><marker>n", n = cells.size() / coders;
    // `cells` holds their rows one after the other.
    void appendNumberedUnits(
        const QString &article, const QString &marker, std::span<const qint32> cells);
    // Appends a column: one label index per unit.
    void appendColumn(const QString &coder, std::span<const qint32> cells);

    QString unitId(size_t unit) const;
    // Every unit id, in order: for tests and small tables.
    QStringList unitIds() const;
    // The id of a unit appended with its own id, as a view valid until the next append; empty
    // for a numbered unit.
    QStringView ownId(size_t unit) const;
    // The line a unit's row begins on, or 0.
    qint64 unitLine(size_t unit) const;
    // The article of every unit: `articles` gets the distinct articles in the order of their
    // first unit, the result the index in it of each unit's article.
    std::vector<qint32> unitArticles(QStringList &articles) const;

    // The table of the units `units` (in that order), with the same coders and labels.
    ReliabilityTable rows(std::span<const size_t> units) const;
    // The table of the columns `columns` (in that order), with the same units and labels.
    ReliabilityTable columns(std::span<const qsizetype> columns) const;

private:
    // A run of units: numbered ("<article><marker><n>") or with their own ids.
    struct Block {
        size_t first = 0; // the block's first unit
        size_t count = 0;
        bool numbered = false;
        QString article; // numbered
        QString marker; // numbered
        size_t firstNumber = 1; // numbered: the number in the first unit's id
        size_t firstOwn = 0; // with own ids: the index of the first in m_ownEnd
    };
    const Block &blockOf(size_t unit) const;
    // Fills m_labelIndex from m_labels (once there are more than kScannedLabels).
    void indexLabels();
    // Ends the unit whose own id was just added to m_ownText.
    void appendOwnUnit(std::span<const qint32> cells, qint64 line);
    // Records the line of the own id just appended (its index `own`).
    void appendOwnLine(size_t own, qint64 line);
    qint64 ownLine(size_t own) const;
    void appendBlockUnit(const Block &from, size_t unit, const ReliabilityTable &origin);

    static constexpr qsizetype kScannedLabels = 16;
    QStringList m_labels;
    QHash<QString, qint32> m_labelIndex; // once there are more than kScannedLabels
    std::vector<qint32> m_cells;
    size_t m_unitCount = 0;
    std::vector<Block> m_blocks;
    QString m_ownText; // own ids end to end
    std::vector<qsizetype> m_ownEnd; // where each own id ends in m_ownText
    // The line of each own id: while every id so far is on the line after the one before (a
    // matrix file of one row a line), only the first line is kept and m_ownLine stays empty.
    qint64 m_firstOwnLine = 0;
    bool m_ownLinesFollow = true;
    std::vector<qint64> m_ownLine;
};

} // namespace fourfold
