#include "core/io/reliability_table_reader.h"

#include "core/io/csv_reader.h"
#include "core/io/input_file.h"
#include "core/io/reliability_table_bytes.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>

#include <algorithm>
#include <bit>
#include <string_view>
#include <vector>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ReliabilityTableReaderText {
    Q_DECLARE_TR_FUNCTIONS(ReliabilityTableReaderText)
};

// The units read so far, for finding a repeated unit id without a second string per unit: an
// open-addressing set of positions in the table with their ids' hashes, so that a probe compares
// ids only when the hashes agree.
class UnitIndex
{
public:
    // `expected`: how many units will come (the table grows past it if need be).
    UnitIndex(const ReliabilityTable &table, qsizetype expected)
        : m_table(table)
    {
        resize(std::bit_ceil(size_t(std::max<qsizetype>(32, 2 * expected))));
    }

    // Adds the last unit of the list. Returns the position of an earlier unit with the same
    // id (the last one is then not added), or -1.
    qsizetype insertLast()
    {
        if (2 * (m_count + 1) > m_slots.size())
            resize(2 * m_slots.size());
        const quint32 position = quint32(m_table.unitCount() - 1);
        const QStringView unit = m_table.ownId(position);
        const quint32 hash = quint32(qHash(unit));
        for (size_t at = hash & m_mask;; at = (at + 1) & m_mask) {
            Slot &slot = m_slots[at];
            if (slot.position == 0) {
                slot = Slot {hash, position + 1};
                ++m_count;
                return -1;
            }
            if (slot.hash == hash && m_table.ownId(slot.position - 1) == unit)
                return slot.position - 1;
        }
    }

private:
    struct Slot {
        quint32 hash = 0;
        quint32 position = 0; // in the table, plus one; 0 for an empty slot
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

    const ReliabilityTable &m_table;
    std::vector<Slot> m_slots; // a power of two, at most half full
    size_t m_mask = 0;
    size_t m_count = 0;
};

} // namespace

Result<ReliabilityTable> readReliabilityTable(const QString &path)
{
    const auto file = WholeFile::open(path, maxWholeFileSize);
    if (!file)
        return std::unexpected(file.error());
    if (auto table = readReliabilityTableBytes(file->bytes(), path))
        return std::move(*table);
    return readReliabilityTableDecoded(file->rawData(), path);
}

Result<ReliabilityTable> readReliabilityTableDecoded(const QByteArray &bytes, const QString &path)
{
    auto text = decodeUtf8Strict(bytes, path);
    if (!text)
        return std::unexpected(text.error());

    ReliabilityTable table;
    table.source = path;
    qsizetype columns = 0; // of the header; 0 until it is read
    qint64 headerLine = 0;
    // One row per line at most: the table grows once.
    const qsizetype lines = text->count(QLatin1Char('\n')) + 1;
    UnitIndex seen(table, lines);
    std::vector<qint32> cells;
    const auto readRecord = [&](const std::vector<QStringView> &fields, qint64 line) -> Status {
        if (columns == 0) {
            headerLine = line;
            columns = qsizetype(fields.size());
            if (fields[0].trimmed().compare(QLatin1String("unit"), Qt::CaseInsensitive) != 0)
                return failAt(ErrorCode::InvalidInput, path, line, 1,
                    ReliabilityTableReaderText::tr(
                        "the first column of the header must be \"unit\", found \"%1\".")
                        .arg(fields[0]));
            for (qsizetype i = 1; i < columns; ++i) {
                const QString coder = fields[size_t(i)].trimmed().toString();
                if (coder.isEmpty())
                    return failAt(ErrorCode::InvalidInput, path, line, 0,
                        ReliabilityTableReaderText::tr("column %1 of the header has no coder name.")
                            .arg(i + 1));
                if (table.coders.contains(coder))
                    return failAt(ErrorCode::InvalidInput, path, line, 0,
                        ReliabilityTableReaderText::tr(
                            "the coder \"%1\" appears twice in the header.")
                            .arg(coder));
                table.coders << coder;
            }
            if (table.coders.size() < 2)
                return failAt(ErrorCode::InvalidInput, path, line, 0,
                    ReliabilityTableReaderText::tr(
                        "reliability needs at least two coders; the header names %n.", nullptr,
                        int(table.coders.size())));
            table.reserve(size_t(lines));
            return {};
        }
        if (qsizetype(fields.size()) != columns)
            return failAt(ErrorCode::InvalidInput, path, line, 0,
                ReliabilityTableReaderText::tr("this row has %1 fields but the header has %2.")
                    .arg(fields.size())
                    .arg(columns));
        const QStringView unit = fields[0].trimmed();
        if (unit.isEmpty())
            return failAt(ErrorCode::InvalidInput, path, line, 1,
                ReliabilityTableReaderText::tr("the unit id is empty."));
        cells.clear();
        for (qsizetype c = 1; c < columns; ++c) {
            const QStringView cell = fields[size_t(c)].trimmed();
            cells.push_back(cell.isEmpty() ? ReliabilityTable::kMissing : table.labelIndex(cell));
        }
        table.appendUnit(unit, cells, line);
        if (const qsizetype first = seen.insertLast(); first >= 0)
            return failAt(ErrorCode::InvalidInput, path, line, 1,
                ReliabilityTableReaderText::tr("the unit \"%1\" appears twice (first on line %2).")
                    .arg(unit)
                    .arg(table.unitLine(size_t(first))));
        return {};
    };
    FOURFOLD_TRY_STATUS(forEachCsvRecord(*text, path, readRecord));
    if (columns == 0)
        return failAt(ErrorCode::InvalidInput, path, 1, 0,
            ReliabilityTableReaderText::tr(
                "the file is empty; expected a header row \"unit,<coder>,<coder>,...\"."));
    if (table.isEmpty())
        return failAt(ErrorCode::InvalidInput, path, headerLine, 0,
            ReliabilityTableReaderText::tr("the file has a header but no units."));
    return table;
}

} // namespace fourfold
