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

struct DistinctLabels {
    QStringList labels; // in the order they first appear (unit by unit, coder by coder)
    std::vector<std::pair<size_t, qsizetype>> first; // (unit, coder) where each first appears
};

// The distinct labels of the table's non-empty cells; `cells` (units × coders) gets each cell's
// label index, or kMissing for an empty cell.
DistinctLabels distinctLabels(const ReliabilityTable &table, std::vector<int> &cells)
{
    const qsizetype coders = table.coders.size();
    cells.assign(table.cells.size() * size_t(coders), kMissing);
    DistinctLabels out;
    QHash<QString, int> index;
    // Cells that share their characters (the reader interns labels, so a label's cells do)
    // are recognised by address and length without hashing the text: within this call the
    // table does not change, so equal address and length mean equal text.
    struct Seen {
        const QChar *data = nullptr;
        qsizetype size = 0;
        int label = 0;
    };
    std::array<Seen, 64> seen {};
    for (size_t u = 0; u < table.cells.size(); ++u)
        for (qsizetype c = 0; c < coders; ++c) {
            const QString &cell = table.cells[u][c];
            if (cell.isEmpty())
                continue;
            Seen &s = seen[(quintptr(cell.constData()) >> 4) % seen.size()];
            if (s.data != cell.constData() || s.size != cell.size()) {
                auto found = index.constFind(cell);
                if (found == index.constEnd()) {
                    found = index.insert(cell, int(out.labels.size()));
                    out.labels << cell;
                    out.first.emplace_back(u, c);
                }
                s = Seen {cell.constData(), cell.size(), *found};
            }
            cells[u * size_t(coders) + size_t(c)] = s.label;
        }
    return out;
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
    out.metric.level = options.level;
    if (options.distance && options.level != Level::Nominal)
        return fail(ErrorCode::InvalidArgument,
            tr("A set distance (Jaccard, MASI) cannot be combined with the %1 level.")
                .arg(levelKey(options.level)));

    // Each distinct label is read once: the cells first hold the index of their label (in the
    // order labels first appear), which the label's code then replaces.
    const DistinctLabels distinct = distinctLabels(table, out.data.cells);
    std::vector<int> codeOf(size_t(distinct.labels.size()), 0);
    const auto labelError = [&](qsizetype label, const QString &what) {
        const auto [u, c] = distinct.first[size_t(label)];
        return cellError(table, u, c, what);
    };

    if (options.distance) {
        // Distinct sets, in sorted order of their canonical "a|b" form.
        std::map<QString, QStringList> sets;
        std::vector<QString> keyOf;
        for (const QString &cell : distinct.labels) {
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
        for (qsizetype l = 0; l < distinct.labels.size(); ++l) {
            const QString &cell = distinct.labels[l];
            if (ranked) {
                if (!options.order.contains(cell))
                    return labelError(l,
                        tr("\"%1\" is not one of the ordered values (%2).")
                            .arg(cell, options.order.join(QStringLiteral(", "))));
            } else if (numeric) {
                bool ok = false;
                const double v = cell.toDouble(&ok);
                if (!ok || !std::isfinite(v))
                    return labelError(l,
                        tr("\"%1\" is not a number, as the %2 level needs.")
                            .arg(cell, levelKey(options.level)));
                if (options.level == Level::Ratio && v < 0)
                    return labelError(l, tr("%1 is negative; ratio values cannot be.").arg(cell));
                numberOf.push_back(v);
            }
        }
        // Codes follow the given order, the size of the numbers or the sorted labels.
        if (ranked) {
            out.valueLabels = options.order;
            for (qsizetype i = 0; i < options.order.size(); ++i)
                out.metric.numeric.push_back(double(i));
            for (qsizetype l = 0; l < distinct.labels.size(); ++l)
                codeOf[size_t(l)] = int(options.order.lastIndexOf(distinct.labels[l]));
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
            std::vector<qsizetype> sorted(size_t(distinct.labels.size()));
            std::iota(sorted.begin(), sorted.end(), 0);
            std::ranges::sort(sorted,
                [&](qsizetype a, qsizetype b) { return distinct.labels[a] < distinct.labels[b]; });
            for (qsizetype l : sorted) {
                codeOf[size_t(l)] = int(out.valueLabels.size());
                out.valueLabels << distinct.labels[l];
            }
        }
        out.data.values = int(out.valueLabels.size());
    }
    for (int &cell : out.data.cells)
        if (cell != kMissing)
            cell = codeOf[size_t(cell)];
    return out;
}

} // namespace fourfold
