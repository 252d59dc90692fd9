#include "core/agreement/value_encoding.h"

#include <QCoreApplication>
#include <QHash>
#include <QMap>

#include <algorithm>
#include <cmath>
#include <map>
#include <set>

namespace fourfold {

using namespace reliability;

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("ValueEncoding", text);
}

std::unexpected<Error> cellError(
    const ReliabilityTable &table, size_t unit, qsizetype coder, const QString &what)
{
    const qint64 line = unit < table.lines.size() ? table.lines[unit] : 0;
    return failAt(ErrorCode::InvalidInput, table.source, line, 0,
        tr("unit \"%1\", coder \"%2\": %3")
            .arg(table.units.value(qsizetype(unit)), table.coders.value(coder), what));
}

// Splits a set cell: "a|b" → {a, b}; "{}" → the empty set.
QStringList setMembers(const QString &cell)
{
    if (cell == QLatin1String("{}"))
        return {};
    QStringList parts;
    for (const QString &p : cell.split(QLatin1Char('|')))
        if (!p.trimmed().isEmpty())
            parts << p.trimmed();
    parts.removeDuplicates();
    parts.sort();
    return parts;
}

} // namespace

QString levelKey(Level level)
{
    switch (level) {
    case Level::Nominal:
        return QStringLiteral("nominal");
    case Level::Ordinal:
        return QStringLiteral("ordinal");
    case Level::Interval:
        return QStringLiteral("interval");
    case Level::Ratio:
        return QStringLiteral("ratio");
    }
    return {};
}

std::optional<Level> levelFromKey(const QString &key)
{
    for (Level l : {Level::Nominal, Level::Ordinal, Level::Interval, Level::Ratio})
        if (levelKey(l) == key)
            return l;
    return std::nullopt;
}

QString setDistanceKey(SetDistance distance)
{
    return distance == SetDistance::Jaccard ? QStringLiteral("jaccard") : QStringLiteral("masi");
}

std::optional<SetDistance> setDistanceFromKey(const QString &key)
{
    if (key == QLatin1String("jaccard"))
        return SetDistance::Jaccard;
    if (key == QLatin1String("masi"))
        return SetDistance::Masi;
    return std::nullopt;
}

Result<EncodedData> encodeTable(const ReliabilityTable &table, const EncodingOptions &options)
{
    EncodedData out;
    const size_t units = table.cells.size();
    const qsizetype coders = table.coders.size();
    out.data.units = int(units);
    out.data.coders = int(coders);
    out.data.cells.assign(units * size_t(coders), kMissing);
    out.metric.level = options.level;

    if (options.distance) {
        if (options.level != Level::Nominal)
            return fail(ErrorCode::InvalidArgument,
                tr("A set distance (Jaccard, MASI) cannot be combined with the %1 level.")
                    .arg(levelKey(options.level)));
        // Distinct sets, in sorted order of their canonical "a|b" form.
        std::map<QString, QStringList> sets;
        for (const QStringList &row : table.cells)
            for (const QString &cell : row)
                if (!cell.isEmpty()) {
                    const QStringList members = setMembers(cell);
                    sets.emplace(members.join(QLatin1Char('|')), members);
                }
        QStringList labels; // every label in any set, sorted
        for (const auto &[key, members] : sets)
            labels << members;
        labels.removeDuplicates();
        labels.sort();
        QHash<QString, int> code;
        std::vector<std::vector<int>> memberCodes;
        for (const auto &[key, members] : sets) {
            code.insert(key, int(memberCodes.size()));
            out.valueLabels << (key.isEmpty() ? QStringLiteral("{}") : key);
            std::vector<int> ids;
            for (const QString &m : members)
                ids.push_back(int(labels.indexOf(m)));
            memberCodes.push_back(ids);
        }
        for (size_t u = 0; u < units; ++u)
            for (qsizetype c = 0; c < coders; ++c) {
                const QString &cell = table.cells[u][c];
                if (!cell.isEmpty())
                    out.data.cells[u * size_t(coders) + size_t(c)] =
                        code.value(setMembers(cell).join(QLatin1Char('|')));
            }
        out.data.values = int(memberCodes.size());
        out.metric.custom = setDistanceMatrix(memberCodes, *options.distance);
        return out;
    }

    const bool ranked = options.level == Level::Ordinal && !options.order.isEmpty();
    const bool numeric = !ranked && options.level != Level::Nominal;
    if (ranked) {
        out.valueLabels = options.order;
        for (qsizetype i = 0; i < options.order.size(); ++i)
            out.metric.numeric.push_back(double(i));
    }
    // Collect the distinct values first, so that codes follow the label or number order.
    std::set<QString> labels;
    std::set<double> numbers;
    for (size_t u = 0; u < units; ++u)
        for (qsizetype c = 0; c < coders; ++c) {
            const QString &cell = table.cells[u][c];
            if (cell.isEmpty())
                continue;
            if (ranked) {
                if (!options.order.contains(cell))
                    return cellError(table, u, c,
                        tr("\"%1\" is not one of the ordered values (%2).")
                            .arg(cell, options.order.join(QStringLiteral(", "))));
            } else if (numeric) {
                bool ok = false;
                const double v = cell.toDouble(&ok);
                if (!ok || !std::isfinite(v))
                    return cellError(table, u, c,
                        tr("\"%1\" is not a number, as the %2 level needs.")
                            .arg(cell, levelKey(options.level)));
                if (options.level == Level::Ratio && v < 0)
                    return cellError(
                        table, u, c, tr("%1 is negative; ratio values cannot be.").arg(cell));
                numbers.insert(v);
            } else {
                labels.insert(cell);
            }
        }
    if (numeric) {
        for (double v : numbers) {
            out.metric.numeric.push_back(v);
            out.valueLabels << QString::number(v, 'g', 17);
        }
    } else if (!ranked) {
        for (const QString &l : labels)
            out.valueLabels << l;
    }
    std::map<double, int> numberCode;
    for (double v : numbers)
        numberCode.emplace(v, int(numberCode.size()));
    QHash<QString, int> labelCode;
    for (qsizetype i = 0; i < out.valueLabels.size(); ++i)
        labelCode.insert(out.valueLabels[i], int(i));
    for (size_t u = 0; u < units; ++u)
        for (qsizetype c = 0; c < coders; ++c) {
            const QString &cell = table.cells[u][c];
            if (cell.isEmpty())
                continue;
            int value = 0;
            if (numeric) {
                value = numberCode.at(cell.toDouble());
            } else {
                value = labelCode.value(cell);
            }
            out.data.cells[u * size_t(coders) + size_t(c)] = value;
        }
    out.data.values = int(out.valueLabels.size());
    return out;
}

} // namespace fourfold
