#include "core/io/reliability_table_reader.h"

#include "core/io/csv_reader.h"
#include "core/io/input_file.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>

#include <algorithm>
#include <bit>
#include <vector>

namespace fourfold {

namespace {

QString tr(const char *text, const char *disambiguation = nullptr, int n = -1)
{
    return QCoreApplication::translate("ReliabilityTableReader", text, disambiguation, n);
}

// Cell values, interned: every cell holding the same label shares one string, so the table
// holds a string per distinct label rather than per cell.
class LabelTable
{
public:
    const QString &intern(QStringView cell)
    {
        // A study has a handful of labels: comparing with each is cheaper than hashing.
        if (m_byText.isEmpty()) {
            for (const QString &label : m_labels)
                if (label.size() == cell.size() && QStringView(label) == cell)
                    return label;
            m_labels.push_back(cell.toString());
            if (m_labels.size() > kScanned)
                for (const QString &label : m_labels)
                    m_byText.insert(QStringView(label), label);
            return m_labels.back();
        }
        auto found = m_byText.constFind(cell);
        if (found == m_byText.constEnd()) {
            const QString label = cell.toString();
            // The key views the characters of the string it maps to, which that string keeps.
            found = m_byText.insert(QStringView(label), label);
        }
        return *found;
    }

private:
    static constexpr size_t kScanned = 16;
    std::vector<QString> m_labels; // while there are at most kScanned
    QHash<QStringView, QString> m_byText; // once there are more
};

// The units read so far, for finding a repeated unit id without a second string per unit: an
// open-addressing set of positions in `units` with their ids' hashes, so that a probe compares
// ids only when the hashes agree.
class UnitIndex
{
public:
    // `expected`: how many units will come (the table grows past it if need be).
    UnitIndex(const QStringList &units, qsizetype expected)
        : m_units(units)
    {
        resize(std::bit_ceil(size_t(std::max<qsizetype>(32, 2 * expected))));
    }

    // Adds the last unit of the list. Returns the position of an earlier unit with the same
    // id (the last one is then not added), or -1.
    qsizetype insertLast()
    {
        if (2 * (m_count + 1) > m_slots.size())
            resize(2 * m_slots.size());
        const quint32 position = quint32(m_units.size() - 1);
        const QString &unit = m_units[position];
        const quint32 hash = quint32(qHash(unit));
        for (size_t at = hash & m_mask;; at = (at + 1) & m_mask) {
            Slot &slot = m_slots[at];
            if (slot.position == 0) {
                slot = Slot {hash, position + 1};
                ++m_count;
                return -1;
            }
            if (slot.hash == hash && m_units[slot.position - 1] == unit)
                return slot.position - 1;
        }
    }

private:
    struct Slot {
        quint32 hash = 0;
        quint32 position = 0; // in `units`, plus one; 0 for an empty slot
    };

    void resize(size_t size)
    {
        std::vector<Slot> previous(size);
        previous.swap(m_slots);
        m_mask = size - 1;
        for (const Slot &slot : previous)
            if (slot.position != 0) {
                size_t at = slot.hash & m_mask;
                while (m_slots[at].position != 0)
                    at = (at + 1) & m_mask;
                m_slots[at] = slot;
            }
    }

    const QStringList &m_units;
    std::vector<Slot> m_slots; // a power of two, at most half full
    size_t m_mask = 0;
    size_t m_count = 0;
};

} // namespace

Result<ReliabilityTable> readReliabilityTable(const QString &path)
{
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Io, tr("Cannot read %1: %2").arg(path, file.errorString()));
    auto text = decodeUtf8Strict(file.readAll(), path);
    if (!text)
        return std::unexpected(text.error());

    ReliabilityTable table;
    table.source = path;
    qsizetype columns = 0; // of the header; 0 until it is read
    qint64 headerLine = 0;
    // One row per line at most: the table grows once.
    const qsizetype lines = text->count(QLatin1Char('\n')) + 1;
    LabelTable labels;
    UnitIndex seen(table.units, lines);
    table.units.reserve(lines);
    table.cells.reserve(size_t(lines));
    table.lines.reserve(size_t(lines));
    const auto readRecord = [&](const std::vector<QStringView> &fields, qint64 line) -> Status {
        if (columns == 0) {
            headerLine = line;
            columns = qsizetype(fields.size());
            if (fields[0].trimmed().compare(QLatin1String("unit"), Qt::CaseInsensitive) != 0)
                return failAt(ErrorCode::InvalidInput, path, line, 1,
                    tr("the first column of the header must be \"unit\", found \"%1\".")
                        .arg(fields[0]));
            for (qsizetype i = 1; i < columns; ++i) {
                const QString coder = fields[size_t(i)].trimmed().toString();
                if (coder.isEmpty())
                    return failAt(ErrorCode::InvalidInput, path, line, 0,
                        tr("column %1 of the header has no coder name.").arg(i + 1));
                if (table.coders.contains(coder))
                    return failAt(ErrorCode::InvalidInput, path, line, 0,
                        tr("the coder \"%1\" appears twice in the header.").arg(coder));
                table.coders << coder;
            }
            if (table.coders.size() < 2)
                return failAt(ErrorCode::InvalidInput, path, line, 0,
                    tr("reliability needs at least two coders; the header names %n.", nullptr,
                        int(table.coders.size())));
            return {};
        }
        if (qsizetype(fields.size()) != columns)
            return failAt(ErrorCode::InvalidInput, path, line, 0,
                tr("this row has %1 fields but the header has %2.")
                    .arg(fields.size())
                    .arg(columns));
        const QStringView unit = fields[0].trimmed();
        if (unit.isEmpty())
            return failAt(ErrorCode::InvalidInput, path, line, 1, tr("the unit id is empty."));
        // The id refers into the file's text, which the table keeps: no string per unit.
        table.units << QString::fromRawData(unit.data(), unit.size());
        table.lines.push_back(line);
        if (const qsizetype first = seen.insertLast(); first >= 0) {
            const qint64 firstLine = table.lines[size_t(first)];
            table.units.removeLast();
            table.lines.pop_back();
            return failAt(ErrorCode::InvalidInput, path, line, 1,
                tr("the unit \"%1\" appears twice (first on line %2).").arg(unit).arg(firstLine));
        }
        QStringList cells;
        cells.reserve(columns - 1);
        for (qsizetype c = 1; c < columns; ++c) {
            const QStringView cell = fields[size_t(c)].trimmed();
            if (cell.isEmpty()) {
                cells << QString();
                continue;
            }
            cells << labels.intern(cell);
        }
        table.cells.push_back(std::move(cells));
        return {};
    };
    table.storage = std::move(*text);
    FOURFOLD_TRY_STATUS(forEachCsvRecord(table.storage, path, readRecord));
    if (columns == 0)
        return failAt(ErrorCode::InvalidInput, path, 1, 0,
            tr("the file is empty; expected a header row \"unit,<coder>,<coder>,...\"."));
    if (table.units.isEmpty())
        return failAt(ErrorCode::InvalidInput, path, headerLine, 0,
            tr("the file has a header but no units."));
    return table;
}

} // namespace fourfold
