#include "core/agreement/value_encoding.h"

#include <QCoreApplication>
#include <QHash>
#include <QMap>

#include <algorithm>
#include <array>
#include <cmath>
#include <map>
#include <numeric>
#include <set>
#include <type_traits>

namespace fourfold {

using namespace reliability;

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ValueEncodingText {
    Q_DECLARE_TR_FUNCTIONS(ValueEncodingText)
};

std::unexpected<Error> cellError(
    const ReliabilityTable &table, size_t unit, qsizetype coder, const QString &what)
{
    return failAt(ErrorCode::InvalidInput, table.source, table.unitLine(unit), 0,
        ValueEncodingText::tr("unit \"%1\", coder \"%2\": %3")
            .arg(table.unitId(unit), table.coders.value(coder), what));
}

// Splits a set cell: "a|b" or "{a|b}" → {a, b}; "{}" → the empty set.
QStringList setMembers(const QString &cell)
{
    QStringView inner(cell);
    inner = inner.trimmed();
    if (inner.startsWith(QLatin1Char('{')) && inner.endsWith(QLatin1Char('}')))
        inner = inner.mid(1, inner.size() - 2);
    QStringList parts;
    for (QStringView p : inner.split(QLatin1Char('|')))
        if (!p.trimmed().isEmpty())
            parts << p.trimmed().toString();
    parts.removeDuplicates();
    parts.sort();
    return parts;
}

// The labels the table's cells use (a table cut from a larger one may hold labels none of its
// cells has), as indices into table.labels(), in the order they first appear.
std::vector<qint32> usedLabels(const ReliabilityTable &table)
{
    std::vector<char> used(size_t(table.labels().size()), 0);
    std::vector<qint32> out;
    for (const qint32 l : table.cells())
        if (l != ReliabilityTable::kMissing && !used[size_t(l)]) {
            used[size_t(l)] = 1;
            out.push_back(l);
        }
    return out;
}

// The first cell (unit by unit, coder by coder) holding label `l`.
std::pair<size_t, qsizetype> firstCell(const ReliabilityTable &table, qint32 l)
{
    const size_t coders = size_t(table.coderCount());
    const auto &cells = table.cells();
    const size_t at = size_t(std::find(cells.begin(), cells.end(), l) - cells.begin());
    return {at / coders, qsizetype(at % coders)};
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

namespace {

// Everything of the encoding but the cells: `codeOfLabel` gets each label index's value code.
Result<EncodedData> encodeLabels(
    const ReliabilityTable &table, const EncodingOptions &options, std::vector<int> &codeOfLabel)
{
    EncodedData out;
    const size_t units = table.unitCount();
    const qsizetype coders = table.coderCount();
    out.data.units = int(units);
    out.data.coders = int(coders);
    out.metric.level = options.level;
    if (options.distance && options.level != Level::Nominal)
        return fail(ErrorCode::InvalidArgument,
            ValueEncodingText::tr(
                "A set distance (Jaccard, MASI) cannot be combined with the %1 level.")
                .arg(levelKey(options.level)));

    // Each distinct label is read once: codeOf maps a label index of the table to its value
    // code, which then replaces it in every cell.
    const std::vector<qint32> used = usedLabels(table);
    QStringList distinct; // the used labels, in the order they first appear
    for (const qint32 l : used)
        distinct << table.labels()[l];
    std::vector<int> codeOf(size_t(distinct.size()), 0); // by position in `distinct`
    const auto labelError = [&](qsizetype label, const QString &what) {
        const auto [u, c] = firstCell(table, used[size_t(label)]);
        return cellError(table, u, c, what);
    };

    if (options.distance) {
        // Distinct sets, in sorted order of their canonical "a|b" form.
        std::map<QString, QStringList> sets;
        std::vector<QString> keyOf;
        for (const QString &cell : distinct) {
            const QStringList members = setMembers(cell);
            keyOf.push_back(members.join(QLatin1Char('|')));
            sets.emplace(keyOf.back(), members);
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
        for (size_t l = 0; l < keyOf.size(); ++l)
            codeOf[l] = code.value(keyOf[l]);
        out.data.values = int(memberCodes.size());
        out.metric.custom = setDistanceMatrix(memberCodes, *options.distance);
    } else {
        const bool ranked = options.level == Level::Ordinal && !options.order.isEmpty();
        const bool numeric = !ranked && options.level != Level::Nominal;
        std::vector<double> numberOf; // per distinct label, when numeric
        for (qsizetype l = 0; l < distinct.size(); ++l) {
            const QString &cell = distinct[l];
            if (ranked) {
                if (!options.order.contains(cell))
                    return labelError(l,
                        ValueEncodingText::tr("\"%1\" is not one of the ordered values (%2).")
                            .arg(cell, options.order.join(QStringLiteral(", "))));
            } else if (numeric) {
                bool ok = false;
                const double v = cell.toDouble(&ok);
                if (!ok || !std::isfinite(v))
                    return labelError(l,
                        ValueEncodingText::tr("\"%1\" is not a number, as the %2 level needs.")
                            .arg(cell, levelKey(options.level)));
                if (options.level == Level::Ratio && v < 0)
                    return labelError(l,
                        ValueEncodingText::tr("%1 is negative; ratio values cannot be.").arg(cell));
                numberOf.push_back(v);
            }
        }
        // Codes follow the given order, the size of the numbers or the sorted labels.
        if (ranked) {
            out.valueLabels = options.order;
            for (qsizetype i = 0; i < options.order.size(); ++i)
                out.metric.numeric.push_back(double(i));
            for (qsizetype l = 0; l < distinct.size(); ++l)
                codeOf[size_t(l)] = int(options.order.lastIndexOf(distinct[l]));
        } else if (numeric) {
            std::map<double, int> numberCode;
            for (double v : numberOf)
                numberCode.emplace(v, 0);
            for (auto &[v, code] : numberCode) {
                code = int(out.metric.numeric.size());
                out.metric.numeric.push_back(v);
                out.valueLabels << QString::number(v, 'g', 17);
            }
            for (size_t l = 0; l < numberOf.size(); ++l)
                codeOf[l] = numberCode.at(numberOf[l]);
        } else {
            std::vector<qsizetype> sorted(size_t(distinct.size()));
            std::iota(sorted.begin(), sorted.end(), 0);
            std::ranges::sort(
                sorted, [&](qsizetype a, qsizetype b) { return distinct[a] < distinct[b]; });
            for (qsizetype l : sorted) {
                codeOf[size_t(l)] = int(out.valueLabels.size());
                out.valueLabels << distinct[l];
            }
        }
        out.data.values = int(out.valueLabels.size());
    }
    codeOfLabel.assign(size_t(table.labels().size()), kMissing);
    for (size_t i = 0; i < used.size(); ++i)
        codeOfLabel[size_t(used[i])] = codeOf[i];
    return out;
}

} // namespace

Result<EncodedData> encodeTable(const ReliabilityTable &table, const EncodingOptions &options)
{
    std::vector<int> codeOfLabel;
    auto out = encodeLabels(table, options, codeOfLabel);
    if (!out)
        return out;
    out->data.cells.resize(table.cells().size());
    std::transform(
        table.cells().begin(), table.cells().end(), out->data.cells.begin(), [&](qint32 l) {
            return l == ReliabilityTable::kMissing ? kMissing : codeOfLabel[size_t(l)];
        });
    return out;
}

Result<EncodedData> encodeTableCells(ReliabilityTable &table, const EncodingOptions &options)
{
    std::vector<int> codeOfLabel;
    auto out = encodeLabels(table, options, codeOfLabel);
    if (!out)
        return out;
    static_assert(std::is_same_v<qint32, int>, "a table's label indices become value codes");
    out->data.cells = table.takeCells();
    for (int &cell : out->data.cells)
        cell = cell == ReliabilityTable::kMissing ? kMissing : codeOfLabel[size_t(cell)];
    return out;
}

} // namespace fourfold
