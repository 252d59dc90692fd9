#include "core/io/reliability_table_reader.h"

#include "core/io/csv_reader.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>

namespace fourfold {

namespace {

QString tr(const char *text, const char *disambiguation = nullptr, int n = -1)
{
    return QCoreApplication::translate("ReliabilityTableReader", text, disambiguation, n);
}

} // namespace

Result<ReliabilityTable> readReliabilityTable(const QString &path)
{
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Io, tr("Cannot read %1: %2").arg(path, file.errorString()));
    auto text = decodeUtf8Strict(file.readAll(), path);
    if (!text)
        return std::unexpected(text.error());
    auto records = parseCsvRecords(*text, path);
    if (!records)
        return std::unexpected(records.error());
    if (records->empty())
        return failAt(ErrorCode::InvalidInput, path, 1, 0,
            tr("the file is empty; expected a header row \"unit,<coder>,<coder>,...\"."));

    ReliabilityTable table;
    table.source = path;
    const CsvRecord &header = records->front();
    if (header.fields.value(0).trimmed().compare(QLatin1String("unit"), Qt::CaseInsensitive) != 0)
        return failAt(ErrorCode::InvalidInput, path, header.line, 1,
            tr("the first column of the header must be \"unit\", found \"%1\".")
                .arg(header.fields.value(0)));
    for (qsizetype i = 1; i < header.fields.size(); ++i) {
        const QString coder = header.fields[i].trimmed();
        if (coder.isEmpty())
            return failAt(ErrorCode::InvalidInput, path, header.line, 0,
                tr("column %1 of the header has no coder name.").arg(i + 1));
        if (table.coders.contains(coder))
            return failAt(ErrorCode::InvalidInput, path, header.line, 0,
                tr("the coder \"%1\" appears twice in the header.").arg(coder));
        table.coders << coder;
    }
    if (table.coders.size() < 2)
        return failAt(ErrorCode::InvalidInput, path, header.line, 0,
            tr("reliability needs at least two coders; the header names %n.", nullptr,
                int(table.coders.size())));

    QHash<QString, qint64> seen;
    for (size_t r = 1; r < records->size(); ++r) {
        const CsvRecord &row = (*records)[r];
        if (row.fields.size() != header.fields.size())
            return failAt(ErrorCode::InvalidInput, path, row.line, 0,
                tr("this row has %1 fields but the header has %2.")
                    .arg(row.fields.size())
                    .arg(header.fields.size()));
        const QString unit = row.fields[0].trimmed();
        if (unit.isEmpty())
            return failAt(ErrorCode::InvalidInput, path, row.line, 1, tr("the unit id is empty."));
        if (seen.contains(unit))
            return failAt(ErrorCode::InvalidInput, path, row.line, 1,
                tr("the unit \"%1\" appears twice (first on line %2).")
                    .arg(unit)
                    .arg(seen.value(unit)));
        seen.insert(unit, row.line);
        QStringList cells;
        for (qsizetype c = 1; c < row.fields.size(); ++c)
            cells << row.fields[c].trimmed();
        table.units << unit;
        table.cells.push_back(cells);
        table.lines.push_back(row.line);
    }
    if (table.units.isEmpty())
        return failAt(ErrorCode::InvalidInput, path, header.line, 0,
            tr("the file has a header but no units."));
    return table;
}

} // namespace fourfold
