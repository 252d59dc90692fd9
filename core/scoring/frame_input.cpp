#include "core/scoring/frame_input.h"

#include <QCoreApplication>
#include <QHash>
#include <QJsonArray>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct FrameInputText {
    Q_DECLARE_TR_FUNCTIONS(FrameInputText)
};

QJsonValue optionalJson(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

} // namespace

FrameInput frameInput(ElementIndicators &&indicators)
{
    FrameInput input;
    input.layer = indicators.layer;
    input.source = FrameInputText::tr("layer %1").arg(indicators.layer);
    input.variables = indicators.variables;
    input.matrix.rows = indicators.articles.size();
    input.matrix.columns = size_t(indicators.variables.size());
    input.matrix.values = std::move(indicators.values);
    if (indicators.layer == QLatin1String("consensus"))
        input.coderShares = std::move(indicators.shares);
    QStringList &outlet = input.groups[QStringLiteral("outlet")];
    QStringList &month = input.groups[QStringLiteral("month")];
    QStringList &language = input.groups[QStringLiteral("language")];
    const QString unknown = FrameInputText::tr("(unknown)");
    for (const ArticleSummary &a : indicators.articles) {
        input.ids << (a.externalId.isEmpty() ? a.uuid : a.externalId);
        outlet << (a.outlet.isEmpty() ? unknown : a.outlet);
        // ISO 8601 dates: the month is the first seven characters (YYYY-MM).
        month << (a.published.size() >= 7 && a.published.at(4) == QLatin1Char('-')
                ? a.published.left(7)
                : unknown);
        language << (a.language.isEmpty() ? unknown : a.language);
    }
    input.articles = std::move(indicators.articles);
    return input;
}

Result<FrameInput> frameInput(const Project &project, const QString &layer)
{
    auto indicators = elementIndicators(project, layer);
    if (!indicators)
        return std::unexpected(indicators.error());
    return frameInput(std::move(*indicators));
}

FrameInput restrictedFrameInput(const FrameInput &input, const QSet<qint64> &keep)
{
    FrameInput out;
    out.layer = input.layer;
    out.source = input.source;
    out.variables = input.variables;
    out.matrix.columns = input.matrix.columns;
    for (size_t r = 0; r < input.matrix.rows; ++r) {
        if (!keep.contains(input.articles[r].id.value))
            continue;
        out.articles.push_back(input.articles[r]);
        out.ids << input.ids[qsizetype(r)];
        for (const auto &[name, groupOf] : input.groups)
            out.groups[name] << groupOf[qsizetype(r)];
        out.matrix.values.insert(out.matrix.values.end(), input.matrix.row(r),
            input.matrix.row(r) + input.matrix.columns);
        if (!input.coderShares.empty())
            out.coderShares.insert(out.coderShares.end(),
                input.coderShares.begin() + qsizetype(r * input.matrix.columns),
                input.coderShares.begin() + qsizetype((r + 1) * input.matrix.columns));
        ++out.matrix.rows;
    }
    return out;
}

FrameGroupTable frameGroupTable(
    const QString &name, const QStringList &groupOf, const frames::Partition &partition)
{
    FrameGroupTable table;
    table.name = name;
    QStringList groups = groupOf;
    groups.sort();
    groups.removeDuplicates();
    table.groups = groups;
    QHash<QString, int> column;
    for (qsizetype g = 0; g < groups.size(); ++g)
        column.insert(groups[g], int(g));
    table.counts.assign(size_t(partition.clusters) * size_t(groups.size()), 0);
    for (size_t i = 0; i < partition.labels.size(); ++i)
        ++table.counts[size_t(partition.labels[i]) * size_t(groups.size())
            + size_t(column.value(groupOf[qsizetype(i)]))];
    if (auto test = frames::chiSquare(table.counts, partition.clusters, int(groups.size())))
        table.test = *test;
    return table;
}

std::vector<FrameGroupTable> frameGroupTables(
    const FrameInput &input, const frames::Partition &partition)
{
    std::vector<FrameGroupTable> tables;
    for (const auto &[name, groupOf] : input.groups)
        tables.push_back(frameGroupTable(name, groupOf, partition));
    return tables;
}

frames::ClusterMethod twoStepMethod(int k)
{
    return [k](const frames::FrameMatrix &sample) -> frames::Outcome<frames::Partition> {
        frames::WardOptions options;
        options.threads = 1;
        const auto schedule = frames::wardLinkage(sample, options);
        if (!schedule)
            return std::unexpected(schedule.error());
        auto clusters = frames::twoStepClusters(sample, *schedule, k, 1);
        if (!clusters)
            return std::unexpected(clusters.error());
        return clusters->partition;
    };
}

SavedFrameAnalysis frameAnalysisRecord(const FrameInput &input,
    const frames::FrameAnalysis &analysis, const std::vector<frames::ClusterStability> &stability,
    const FrameRunSettings &settings, const QString &name, const QStringList &names)
{
    SavedFrameAnalysis record;
    record.name = name;
    const size_t n = input.matrix.rows;
    record.settings = QJsonObject {{QStringLiteral("layer"), input.layer},
        {QStringLiteral("k"), analysis.k}, {QStringLiteral("k_given"), analysis.kGiven},
        {QStringLiteral("max_k"), settings.maxK},
        {QStringLiteral("variables"), QJsonArray::fromStringList(input.variables)},
        {QStringLiteral("articles"), qint64(n)}, {QStringLiteral("bootstrap"), settings.bootstrap},
        // A string: JSON numbers lose integers above 2^53.
        {QStringLiteral("seed"), QString::number(settings.seed)}};
    const frames::Partition &partition = analysis.frames.partition;
    for (size_t f = 0; f < analysis.profiles.size(); ++f) {
        const frames::FrameProfile &profile = analysis.profiles[f];
        QJsonArray elements;
        for (qsizetype v = 0; v < input.variables.size(); ++v) {
            const frames::VariableProfile &vp = profile.variables[size_t(v)];
            elements.append(QJsonObject {{QStringLiteral("variable"), input.variables[v]},
                {QStringLiteral("share"), vp.share}, {QStringLiteral("overall"), vp.overall},
                {QStringLiteral("difference"), vp.difference},
                {QStringLiteral("residual"), optionalJson(vp.residual)}});
        }
        QJsonArray closest;
        for (size_t row : profile.closest)
            closest.append(input.ids[qsizetype(row)]);
        QJsonObject json {{QStringLiteral("size"), profile.size},
            {QStringLiteral("share"), n > 0 ? double(profile.size) / double(n) : 0.0},
            {QStringLiteral("elements"), elements}, {QStringLiteral("closest"), closest}};
        if (f < stability.size())
            json.insert(QStringLiteral("stability"),
                QJsonObject {{QStringLiteral("mean_jaccard"), stability[f].meanJaccard},
                    {QStringLiteral("replicates"), stability[f].replicatesUsed},
                    {QStringLiteral("dissolved"), stability[f].dissolved},
                    {QStringLiteral("recovered"), stability[f].recovered},
                    {QStringLiteral("flagged"), stability[f].flagged}});
        record.frames.push_back(SavedFrame {
            int(f), qsizetype(f) < names.size() ? names[qsizetype(f)].trimmed() : QString(), json});
    }
    for (size_t i = 0; i < partition.labels.size() && i < input.articles.size(); ++i)
        record.members.emplace_back(input.articles[i].id, partition.labels[i]);
    std::sort(record.members.begin(), record.members.end());
    record.memberCount = qint64(record.members.size());
    return record;
}

} // namespace fourfold
