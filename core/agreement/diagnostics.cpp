#include "core/agreement/diagnostics.h"

#include "core/project/project.h"

#include <QCoreApplication>
#include <QDateTime>
#include <QHash>
#include <QJsonArray>
#include <QSet>

#include <algorithm>
#include <cmath>
#include <map>

namespace fourfold {

using namespace reliability;

namespace {

// The sentences of this file, under a context that lupdate collects.
struct DiagnosticsText {
    Q_DECLARE_TR_FUNCTIONS(DiagnosticsText)
};

std::unexpected<Error> cancelled()
{
    return fail(ErrorCode::Cancelled, DiagnosticsText::tr("The diagnostics were cancelled."));
}

bool carryOn(const DiagnosticsProgress &progress, int done, int total)
{
    return !progress || progress(done, total);
}

// Sorts the entries that cost most first: the largest rise of alpha when left out; undefined
// changes last; ties by name so that the order is stable.
void sortByCost(std::vector<LeaveOneOut> &entries)
{
    std::sort(entries.begin(), entries.end(), [](const LeaveOneOut &a, const LeaveOneOut &b) {
        if (a.change.has_value() != b.change.has_value())
            return a.change.has_value();
        if (a.change && b.change && *a.change != *b.change)
            return *a.change > *b.change;
        return a.name < b.name;
    });
}

LeaveOneOut entry(
    const QString &name, const AlphaResult &without, const AlphaResult &all, int units)
{
    LeaveOneOut e;
    e.name = name;
    e.alpha = without.value;
    e.reason = without.reason;
    e.pairableValues = without.pairableValues;
    e.units = units;
    if (without.value && all.value)
        e.change = *without.value - *all.value;
    return e;
}

thread_local std::uint64_t cellsCopied = 0;

} // namespace

std::uint64_t leaveOneOutCellsCopied()
{
    return cellsCopied;
}

double FunctionConfusion::matched() const
{
    double n = 0;
    for (int r = 0; r < kSize; ++r)
        for (int c = 0; c < kSize - 1; ++c)
            n += at(r, c);
    return n;
}

double FunctionConfusion::sameFunction() const
{
    double n = 0;
    for (int f = 0; f < kSize - 1; ++f)
        n += at(f, f);
    return n;
}

Result<std::vector<LeaveOneOut>> leaveOneCoderOut(
    const EncodedData &encoded, const QStringList &coders, const DiagnosticsProgress &progress)
{
    const ReliabilityData &data = encoded.data;
    if (coders.size() != data.coders || !dataProblem(data).empty())
        return fail(ErrorCode::InvalidArgument,
            DiagnosticsText::tr(
                "The coders named do not match the columns of the reliability data."));
    const AlphaResult all = krippendorffAlpha(data, encoded.metric);
    std::vector<LeaveOneOut> out;
    for (int left = 0; left < data.coders; ++left) {
        if (!carryOn(progress, left, data.coders))
            return cancelled();
        ReliabilityData rest;
        rest.units = data.units;
        rest.coders = data.coders - 1;
        rest.values = data.values;
        rest.cells.reserve(size_t(rest.units) * size_t(rest.coders));
        int coded = 0;
        for (int u = 0; u < data.units; ++u) {
            for (int c = 0; c < data.coders; ++c)
                if (c != left)
                    rest.cells.push_back(data.at(u, c));
            coded += data.at(u, left) != kMissing ? 1 : 0;
        }
        out.push_back(entry(coders[left], krippendorffAlpha(rest, encoded.metric), all, coded));
    }
    if (!carryOn(progress, data.coders, data.coders))
        return cancelled();
    sortByCost(out);
    return out;
}

Result<std::vector<LeaveOneOut>> leaveOneArticleOut(
    const EncodedData &encoded, const ReliabilityTable &table, const DiagnosticsProgress &progress)
{
    const ReliabilityData &data = encoded.data;
    if (table.unitCount() != size_t(data.units) || !dataProblem(data).empty())
        return fail(ErrorCode::InvalidArgument,
            DiagnosticsText::tr("The units named do not match the rows of the reliability data."));
    const AlphaResult all = krippendorffAlpha(data, encoded.metric);
    // Articles in the order of their first unit.
    QStringList articles;
    const std::vector<qint32> articleOf = table.unitArticles(articles);
    // Alpha without an article from the coincidences of everything minus the article's own
    // coincidences: coincidences add over units (Krippendorff 2011, §C), so leaving an article
    // out costs its own units, not a rebuild of all the others.
    const int total = int(articles.size());
    std::vector<std::vector<int>> unitsOf {static_cast<size_t>(total)};
    for (int u = 0; u < data.units; ++u)
        unitsOf[size_t(articleOf[size_t(u)])].push_back(u);
    const CoincidenceMatrix everything = coincidences(data);
    std::vector<LeaveOneOut> out;
    for (int left = 0; left < total; ++left) {
        if (!carryOn(progress, left, total))
            return cancelled();
        ReliabilityData own;
        own.coders = data.coders;
        own.values = data.values;
        own.units = int(unitsOf[size_t(left)].size());
        own.cells.reserve(unitsOf[size_t(left)].size() * size_t(data.coders));
        for (int u : unitsOf[size_t(left)])
            for (int c = 0; c < data.coders; ++c)
                own.cells.push_back(data.at(u, c));
        cellsCopied += own.cells.size();
        const CoincidenceMatrix part = coincidences(own);
        const CoincidenceMatrix rest = withoutPart(everything, part);
        out.push_back(
            entry(articles[left], krippendorffAlpha(rest, encoded.metric), all, own.units));
    }
    if (!carryOn(progress, total, total))
        return cancelled();
    sortByCost(out);
    return out;
}

namespace {

struct HabitSums {
    int n = 0;
    double length = 0, lengthSquares = 0, start = 0, end = 0;
    int longer = 0, shorter = 0;
};

// One direction of a pair: each unit of `from` against the unit of `to` that overlaps it most
// (ties: the earlier one). Units are sorted by begin within a coder.
void matchDirection(const std::vector<ContinuumUnit> &from, const std::vector<ContinuumUnit> &to,
    FunctionConfusion &confusion, HabitSums &habit)
{
    // `from` and `to` are sorted by begin, so the units of `to` that end before the current
    // unit of `from` begins end before every later one too: skip that prefix once.
    size_t first = 0;
    for (const ContinuumUnit &a : from) {
        while (first < to.size() && to[first].end <= a.begin)
            ++first;
        const ContinuumUnit *best = nullptr;
        std::int64_t bestOverlap = 0;
        for (size_t i = first; i < to.size(); ++i) {
            const ContinuumUnit &b = to[i];
            if (b.begin >= a.end)
                break;
            const std::int64_t overlap = std::min(a.end, b.end) - std::max(a.begin, b.begin);
            if (overlap > bestOverlap) {
                bestOverlap = overlap;
                best = &b;
            }
        }
        const int row = a.category;
        const int column = best ? best->category : FunctionConfusion::kSize - 1;
        confusion.counts[size_t(row * FunctionConfusion::kSize + column)] += 1;
        if (best && best->category == a.category) {
            const double d = double((a.end - a.begin) - (best->end - best->begin));
            ++habit.n;
            habit.length += d;
            habit.lengthSquares += d * d;
            habit.start += double(a.begin - best->begin);
            habit.end += double(a.end - best->end);
            habit.longer += d > 0 ? 1 : 0;
            habit.shorter += d < 0 ? 1 : 0;
        }
    }
}

} // namespace

Result<SpanMatching> matchSpans(
    const Project &project, const UnitSelection &selection, const DiagnosticsProgress &progress)
{
    UnitSelection base = selection;
    base.includeGold = false;
    auto counted = countedCodings(project, base);
    if (!counted)
        return std::unexpected(counted.error());
    return matchSpans(*counted, base, progress);
}

Result<SpanMatching> matchSpans(const CountedCodings &codings, const UnitSelection &selection,
    const DiagnosticsProgress &progress)
{
    UnitSelection base = selection;
    base.includeGold = false;
    const CountedCodings *counted = &codings;
    QStringList pseudonyms;
    for (const Coder &c : counted->coders)
        if (c.id.value >= 0) // not gold
            pseudonyms << c.pseudonym;
    if (pseudonyms.size() < 2)
        return fail(ErrorCode::InvalidArgument,
            DiagnosticsText::tr("Reliability needs at least two coders; the selection has %n.",
                nullptr, int(pseudonyms.size())));
    const QStringList *coders = &pseudonyms;
    SpanMatching out;
    out.coders = *coders;
    std::vector<HabitSums> habits(size_t(coders->size()));
    const int n = int(coders->size());
    const int total = n * (n - 1) / 2;
    int done = 0;
    for (int a = 0; a < n; ++a)
        for (int b = a + 1; b < n; ++b) {
            if (!carryOn(progress, done++, total))
                return cancelled();
            UnitSelection pair = base;
            pair.unit = UnitKind::Continuum;
            pair.function.reset();
            pair.coders = QStringList {(*coders)[a], (*coders)[b]};
            auto continuum = continuumData(*counted, pair);
            if (!continuum) {
                // Coders and articles were checked above, so NotFound means the pair coded no
                // article in common: nothing to compare.
                if (continuum.error().code == ErrorCode::NotFound)
                    continue;
                return std::unexpected(continuum.error());
            }
            ++out.pairsCompared;
            std::vector<ContinuumUnit> first, second;
            for (const ContinuumUnit &u : continuum->units)
                (u.coder == 0 ? first : second).push_back(u);
            auto byBegin = [](const ContinuumUnit &x, const ContinuumUnit &y) {
                return std::pair(x.begin, x.end) < std::pair(y.begin, y.end);
            };
            std::sort(first.begin(), first.end(), byBegin);
            std::sort(second.begin(), second.end(), byBegin);
            matchDirection(first, second, out.confusion, habits[size_t(a)]);
            matchDirection(second, first, out.confusion, habits[size_t(b)]);
        }
    if (!carryOn(progress, total, total))
        return cancelled();
    for (int c = 0; c < n; ++c) {
        const HabitSums &h = habits[size_t(c)];
        if (h.n == 0)
            continue;
        BoundaryHabit b;
        b.coder = (*coders)[c];
        b.matches = h.n;
        b.meanLengthDifference = h.length / h.n;
        b.meanStartDifference = h.start / h.n;
        b.meanEndDifference = h.end / h.n;
        b.shareLonger = double(h.longer) / h.n;
        b.shareShorter = double(h.shorter) / h.n;
        if (h.n >= 2) {
            const double variance = std::max(0.0,
                (h.lengthSquares - h.n * b.meanLengthDifference * b.meanLengthDifference)
                    / (h.n - 1));
            b.standardError = std::sqrt(variance / h.n);
        }
        b.systematic = h.n >= 5 && std::abs(b.meanLengthDifference) > 2 * b.standardError;
        out.boundaries.push_back(b);
    }
    std::sort(out.boundaries.begin(), out.boundaries.end(),
        [](const BoundaryHabit &x, const BoundaryHabit &y) {
            const double ax = std::abs(x.meanLengthDifference);
            const double ay = std::abs(y.meanLengthDifference);
            return ax != ay ? ax > ay : x.coder < y.coder;
        });
    return out;
}

Result<std::vector<PeriodAlpha>> alphaByPeriod(const Project &project,
    const UnitSelection &selection, const ReliabilityTable &table, const EncodingOptions &encoding,
    PeriodKind kind, int batchSize, const DiagnosticsProgress &progress)
{
    // The codings that count, as the table was built from them.
    UnitSelection counting = selection;
    counting.coders = table.coders;
    counting.coders.removeAll(QStringLiteral("gold"));
    counting.includeGold = false;
    auto counted = countedCodings(project, counting);
    if (!counted)
        return std::unexpected(counted.error());
    auto encoded = encodeTable(table, encoding);
    if (!encoded)
        return std::unexpected(encoded.error());
    return alphaByPeriod(*counted, table, *encoded, kind, batchSize, progress);
}

Result<std::vector<PeriodAlpha>> alphaByPeriod(const CountedCodings &counted,
    const ReliabilityTable &table, const EncodedData &encoded, PeriodKind kind, int batchSize,
    const DiagnosticsProgress &progress)
{
    const ReliabilityData &data = encoded.data;
    if (table.unitCount() != size_t(data.units))
        return fail(ErrorCode::InvalidArgument,
            DiagnosticsText::tr("The units named do not match the rows of the reliability data."));
    if (batchSize < 1)
        return fail(
            ErrorCode::InvalidArgument, DiagnosticsText::tr("A batch holds at least one article."));
    QHash<qint64, QString> externalId;
    for (const ArticleSummary &a : counted.articles)
        externalId.insert(a.id.value, a.externalId);

    // The first coding of each article: (time, row id) so that equal times keep a stable order.
    std::map<QString, std::pair<QString, qint64>> first;
    auto note = [&](qint64 article, const QString &at, qint64 rowId) {
        const QString id = externalId.value(article);
        const std::pair<QString, qint64> key {at, rowId};
        auto it = first.find(id);
        if (it == first.end() || key < it->second)
            first[id] = key;
    };
    // Gold (a negative coder id) is no coder's first coding.
    for (const Annotation &a : counted.annotations)
        if (a.coder.value >= 0)
            note(a.article.value, a.createdAt, a.id.value);
    for (const Judgement &j : counted.judgements)
        if (j.coder.value >= 0)
            note(j.article.value, j.createdAt, j.id.value);

    // Articles of the table with a pairable unit (two coders' values), in coding order: an
    // article only one coder has finished adds nothing a period could compare.
    QStringList tableArticles;
    std::vector<qint32> articleOfUnit = table.unitArticles(tableArticles);
    QSet<QString> inTable;
    for (size_t u = 0; u < table.unitCount(); ++u) {
        int values = 0;
        for (int c = 0; c < data.coders; ++c)
            values += data.at(int(u), c) != kMissing ? 1 : 0;
        if (values >= 2)
            inTable.insert(tableArticles[articleOfUnit[u]]);
    }
    std::vector<std::pair<std::pair<QString, qint64>, QString>> ordered;
    for (const auto &[id, key] : first)
        if (inTable.contains(id))
            ordered.push_back({key, id});
    std::sort(ordered.begin(), ordered.end());

    std::vector<PeriodAlpha> periods;
    QHash<QString, int> periodOf;
    for (size_t i = 0; i < ordered.size(); ++i) {
        QString label;
        if (kind == PeriodKind::Week) {
            const QDateTime at = QDateTime::fromString(ordered[i].first.first, Qt::ISODateWithMs);
            int year = 0;
            const int week = at.isValid() ? at.toUTC().date().weekNumber(&year) : 0;
            label = at.isValid()
                ? QStringLiteral("%1-W%2").arg(year).arg(week, 2, 10, QLatin1Char('0'))
                : DiagnosticsText::tr("no date");
        } else {
            const size_t from = i - i % size_t(batchSize);
            const size_t to = std::min(ordered.size(), from + size_t(batchSize));
            label = from + 1 == to ? QString::number(from + 1)
                                   : QStringLiteral("%1–%2").arg(from + 1).arg(to);
        }
        if (periods.empty() || periods.back().label != label) {
            periods.push_back(PeriodAlpha {label, {}, {}});
        }
        periods.back().articles << ordered[i].second;
        periodOf.insert(ordered[i].second, int(periods.size()) - 1);
    }
    // Each period's units, found in one pass over the table.
    std::vector<int> periodOfArticle(size_t(tableArticles.size()), -1);
    for (qsizetype a = 0; a < tableArticles.size(); ++a)
        periodOfArticle[size_t(a)] = periodOf.value(tableArticles[a], -1);
    std::vector<std::vector<size_t>> unitsOf(periods.size());
    for (size_t u = 0; u < table.unitCount(); ++u)
        if (const int p = periodOfArticle[size_t(articleOfUnit[u])]; p >= 0)
            unitsOf[std::size_t(p)].push_back(u);
    articleOfUnit = {};
    for (size_t p = 0; p < periods.size(); ++p) {
        if (!carryOn(progress, int(p), int(periods.size())))
            return cancelled();
        ReliabilityData part;
        part.coders = data.coders;
        part.values = data.values;
        part.units = int(unitsOf[p].size());
        part.cells.reserve(unitsOf[p].size() * size_t(data.coders));
        for (const size_t u : unitsOf[p])
            for (int c = 0; c < data.coders; ++c)
                part.cells.push_back(data.at(int(u), c));
        periods[p].alpha = krippendorffAlpha(part, encoded.metric);
    }
    if (!carryOn(progress, int(periods.size()), int(periods.size())))
        return cancelled();
    return periods;
}

namespace {

QJsonValue optionalNumber(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

QJsonArray leaveOneOutJson(const std::vector<LeaveOneOut> &entries, const QString &nameKey)
{
    QJsonArray a;
    for (const LeaveOneOut &e : entries) {
        QJsonObject o {{nameKey, e.name},
            {QStringLiteral("alpha_without"), optionalNumber(e.alpha)},
            {QStringLiteral("change"), optionalNumber(e.change)},
            {QStringLiteral("pairable_values_without"), e.pairableValues},
            {QStringLiteral("units"), e.units}};
        if (!e.alpha)
            o.insert(QStringLiteral("reason"), QString::fromStdString(e.reason));
        a.append(o);
    }
    return a;
}

QString confusionLabel(int index)
{
    return index < 4 ? functionKey(kFramingFunctions[size_t(index)]) : QStringLiteral("none");
}

QJsonObject matchingJson(const SpanMatching &m)
{
    QJsonArray rows;
    for (int r = 0; r < 4; ++r) {
        QJsonObject row;
        for (int c = 0; c < FunctionConfusion::kSize; ++c)
            row.insert(confusionLabel(c), m.confusion.at(r, c));
        rows.append(QJsonObject {
            {QStringLiteral("function"), confusionLabel(r)}, {QStringLiteral("other"), row}});
    }
    QJsonArray habits;
    for (const BoundaryHabit &b : m.boundaries)
        habits.append(
            QJsonObject {{QStringLiteral("coder"), b.coder}, {QStringLiteral("matches"), b.matches},
                {QStringLiteral("mean_length_difference"), b.meanLengthDifference},
                {QStringLiteral("standard_error"), b.standardError},
                {QStringLiteral("mean_start_difference"), b.meanStartDifference},
                {QStringLiteral("mean_end_difference"), b.meanEndDifference},
                {QStringLiteral("share_longer"), b.shareLonger},
                {QStringLiteral("share_shorter"), b.shareShorter},
                {QStringLiteral("systematic"), b.systematic}});
    return QJsonObject {{QStringLiteral("coders"), QJsonArray::fromStringList(m.coders)},
        {QStringLiteral("pairs_compared"), m.pairsCompared}, {QStringLiteral("confusion"), rows},
        {QStringLiteral("boundaries"), habits}};
}

} // namespace

QJsonObject diagnosticsJson(const std::vector<LeaveOneOut> &coders,
    const std::vector<LeaveOneOut> &articles, const SpanMatching *matching)
{
    QJsonObject d {
        {QStringLiteral("leave_one_coder_out"), leaveOneOutJson(coders, QStringLiteral("coder"))},
        {QStringLiteral("leave_one_article_out"),
            leaveOneOutJson(articles, QStringLiteral("article"))}};
    if (matching)
        d.insert(QStringLiteral("span_matching"), matchingJson(*matching));
    return d;
}

} // namespace fourfold
