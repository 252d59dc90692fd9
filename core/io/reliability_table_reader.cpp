#include "core/io/reliability_table_reader.h"

#include "core/io/csv_reader.h"
#include "core/io/input_file.h"
#include "core/io/reliability_table_bytes.h"
#include "core/io/unit_index.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>

#include <string_view>
#include <vector>

namespace fourfold {

namespace {

QString tr(const char *text, const char *disambiguation = nullptr, int n = -1)
{
    return QCoreApplication::translate("ReliabilityTableReader", text, disambiguation, n);
}

} // namespace

Result<ReliabilityTable> readReliabilityTable(const QString &path)
{
    const auto bytes = readWholeFile(path, maxWholeFileSize);
    if (!bytes)
        return std::unexpected(bytes.error());
    if (auto table = readReliabilityTableBytes(
            std::string_view(bytes->constData(), size_t(bytes->size())), path))
        return std::move(*table);
    return readReliabilityTableDecoded(*bytes, path);
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
            table.reserve(size_t(lines));
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
        cells.clear();
        for (qsizetype c = 1; c < columns; ++c) {
            const QStringView cell = fields[size_t(c)].trimmed();
            cells.push_back(cell.isEmpty() ? ReliabilityTable::kMissing : table.labelIndex(cell));
        }
        table.appendUnit(unit, cells, line);
        if (const qsizetype first = seen.insertLast(); first >= 0)
            return failAt(ErrorCode::InvalidInput, path, line, 1,
                tr("the unit \"%1\" appears twice (first on line %2).")
                    .arg(unit)
                    .arg(table.unitLine(size_t(first))));
        return {};
    };
    FOURFOLD_TRY_STATUS(forEachCsvRecord(*text, path, readRecord));
    if (columns == 0)
        return failAt(ErrorCode::InvalidInput, path, 1, 0,
            tr("the file is empty; expected a header row \"unit,<coder>,<coder>,...\"."));
    if (table.isEmpty())
        return failAt(ErrorCode::InvalidInput, path, headerLine, 0,
            tr("the file has a header but no units."));
    return table;
}

} // namespace fourfold
