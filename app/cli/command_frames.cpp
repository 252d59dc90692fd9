// frames: the frames of a debate as clusters of articles by their frame elements (Matthes &
// Kohring 2008: Ward's method, then k-means from Ward's centroids), from a project's layer or a
// raw articles × variables matrix (--data), with the indices for choosing k, bootstrap stability,
// frames by outlet, month and language, and the comparison of two layers' frames.

#include "app/cli/cli_output.h"
#include "core/frames/adjusted_rand.h"
#include "core/frames/chi_square.h"
#include "core/frames/cluster_stability.h"
#include "core/frames/frame_analysis.h"
#include "core/io/numeric_matrix_reader.h"
#include "core/project/frame_analysis_edits.h"
#include "core/project/project.h"
#include "core/project/saved_frames.h"
#include "core/scoring/frame_input.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QHash>
#include <QJsonArray>
#include <QSaveFile>

#include <unistd.h>

#include <algorithm>
#include <cstdio>
#include <map>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

using frames::FrameAnalysis;

QJsonValue optionalJson(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

// A k an index points at, or "–" when the index is undefined for every k (0).
QString kText(int k)
{
    return k > 0 ? QString::number(k) : QStringLiteral("–");
}

QString number(const std::optional<double> &v, int decimals)
{
    return v ? QString::number(*v, 'f', decimals) : QStringLiteral("–");
}

QJsonObject chiSquareJson(const frames::ChiSquareResult &t)
{
    QJsonObject o {{QStringLiteral("chi_square"), optionalJson(t.statistic)},
        {QStringLiteral("df"), t.degreesOfFreedom}, {QStringLiteral("p"), optionalJson(t.pValue)},
        {QStringLiteral("cramers_v"), optionalJson(t.cramersV)},
        {QStringLiteral("cells_expected_below_5"), t.smallExpected}};
    if (!t.reason.empty())
        o.insert(QStringLiteral("reason"), QString::fromStdString(t.reason));
    return o;
}

QString chiSquareText(const frames::ChiSquareResult &t)
{
    if (!t.statistic)
        return CliText::tr("chi-square undefined: %1").arg(QString::fromStdString(t.reason));
    return CliText::tr("X² = %1, df = %2, p = %3, Cramér's V = %4%5")
        .arg(*t.statistic, 0, 'f', 2)
        .arg(t.degreesOfFreedom)
        .arg(*t.pValue < 0.001 ? QStringLiteral("< 0.001") : QString::number(*t.pValue, 'f', 3))
        .arg(*t.cramersV, 0, 'f', 3)
        .arg(t.smallExpected > 0
                ? CliText::tr("; %n cell(s) expect fewer than 5", nullptr, t.smallExpected)
                : QString());
}

// Writes `article,frame` rows (frames counted from 1), replacing the file whole.
Status writeAssignments(const QString &path, const FrameInput &input, const frames::Partition &p)
{
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly))
        return fail(
            ErrorCode::Io, CliText::tr("%1 could not be written.").arg(path), file.errorString());
    QByteArray bytes = "article,frame\n";
    for (size_t i = 0; i < p.labels.size(); ++i) {
        QString id = input.ids[qsizetype(i)];
        // RFC 4180: a field with a comma, quote or line break is quoted, quotes doubled.
        if (id.contains(QLatin1Char(',')) || id.contains(QLatin1Char('"'))
            || id.contains(QLatin1Char('\n')) || id.contains(QLatin1Char('\r')))
            id = QLatin1Char('"') + id.replace(QLatin1String("\""), QLatin1String("\"\""))
                + QLatin1Char('"');
        bytes += id.toUtf8() + ',' + QByteArray::number(p.labels[i] + 1) + '\n';
    }
    if (file.write(bytes) != bytes.size() || !file.commit())
        return fail(
            ErrorCode::Io, CliText::tr("%1 could not be written.").arg(path), file.errorString());
    return {};
}

// Reports the failure `failure` (made by fail()) and returns ExitFailure.
int reportFailure(const std::unexpected<Error> &failure)
{
    return report(failure.error());
}

// Lists the saved frame analyses of the project at `path` (--saved).
int listSaved(const QString &path, bool asJson)
{
    auto project = Project::openForReading(path);
    if (!project)
        return report(project.error());
    auto analyses = SavedFrames::list(*project);
    if (!analyses)
        return report(analyses.error());
    if (asJson) {
        QJsonArray list;
        for (const SavedFrameAnalysis &a : *analyses) {
            QJsonArray framesJson;
            for (const SavedFrame &f : a.frames)
                framesJson.append(QJsonObject {{QStringLiteral("frame"), f.cluster + 1},
                    {QStringLiteral("name"), f.name},
                    {QStringLiteral("size"), f.profile.value(QStringLiteral("size")).toInt()}});
            list.append(QJsonObject {{QStringLiteral("name"), a.name},
                {QStringLiteral("uuid"), a.uuid}, {QStringLiteral("created_at"), a.createdAt},
                {QStringLiteral("settings"), a.settings},
                {QStringLiteral("articles"), a.memberCount},
                {QStringLiteral("frames"), framesJson}});
        }
        printJson(QJsonObject {{QStringLiteral("analyses"), list}});
        return ExitOk;
    }
    if (analyses->empty()) {
        out(CliText::tr(
            "%1 holds no saved frame analysis (save one with frames PROJECT --save NAME).")
                .arg(path));
        return ExitOk;
    }
    QStringList lines;
    for (const SavedFrameAnalysis &a : *analyses) {
        lines << CliText::tr(
            "%1  (%2; layer %3, k = %4, %n article(s))", nullptr, int(a.memberCount))
                     .arg(a.name, a.createdAt.left(16).replace(QLatin1Char('T'), QLatin1Char(' ')),
                         a.settings.value(QStringLiteral("layer")).toString())
                     .arg(a.settings.value(QStringLiteral("k")).toInt());
        for (const SavedFrame &f : a.frames)
            lines << CliText::tr("  F%1  %2  %n article(s)", nullptr,
                f.profile.value(QStringLiteral("size")).toInt())
                         .arg(f.cluster + 1)
                         .arg(f.name.isEmpty() ? CliText::tr("(no name)") : f.name);
    }
    out(lines.join(QLatin1Char('\n')));
    return ExitOk;
}

// Deletes the saved analysis `name` of the project at `path` (--delete-saved).
int deleteSavedAnalysis(const QString &path, const QString &name)
{
    auto project = Project::open(path);
    if (!project)
        return report(project.error());
    auto analysis = SavedFrames::load(*project, name);
    if (!analysis)
        return report(analysis.error());
    DeleteFrameAnalysisEdit edit(analysis->uuid, analysis->name, CoderId {});
    if (auto deleted = project->apply(edit); !deleted)
        return report(deleted.error());
    out(CliText::tr("Deleted the saved frame analysis \"%1\".").arg(name));
    return ExitOk;
}

} // namespace

int runFrames(const QStringList &arguments)
{
    const QString command = QStringLiteral("frames");
    QCommandLineParser parser;
    const QCommandLineOption data(QStringLiteral("data"),
        CliText::tr(
            "An articles × variables matrix: CSV with a header row <id>,<variable>,... and one "
            "row per article, its id first; every cell a number (0/1 for element indicators)."),
        QStringLiteral("FILE"));
    const QCommandLineOption layer(QStringLiteral("layer"),
        CliText::tr(
            "With a project: whose codings give the element variables: gold (default), "
            "consensus (an element counts when at least half of the article's coders coded it), "
            "coder:PSEUDONYM or run:NAME."),
        QStringLiteral("LAYER"), QStringLiteral("gold"));
    const QCommandLineOption k(QStringLiteral("k"),
        CliText::tr("The number of frames (default: the one most k-choice indices point at)."),
        QStringLiteral("K"));
    const QCommandLineOption maxK(QStringLiteral("max-k"),
        CliText::tr("Compute the k-choice indices for k = 2..K (default 10)."), QStringLiteral("K"),
        QStringLiteral("10"));
    const QCommandLineOption bootstrap(QStringLiteral("bootstrap"),
        CliText::tr(
            "Bootstrap replicates for each frame's stability (Hennig 2007; default 0: none)."),
        QStringLiteral("N"), QStringLiteral("0"));
    const QCommandLineOption seed(QStringLiteral("seed"),
        CliText::tr("Seed of the bootstrap (default 1)."), QStringLiteral("S"),
        QStringLiteral("1"));
    const QCommandLineOption compare(QStringLiteral("compare"),
        CliText::tr(
            "With a project: also cluster this layer on the articles both layers hold, with the "
            "same k, and compare the frames (adjusted Rand index, matched cross-table)."),
        QStringLiteral("LAYER"));
    const QCommandLineOption json(
        QStringLiteral("json"), CliText::tr("Print the figures as JSON."));
    const QCommandLineOption outFile(QStringLiteral("out"),
        CliText::tr(
            "Write each article's frame as CSV rows article,frame (frames counted from 1)."),
        QStringLiteral("FILE"));
    const QCommandLineOption force(
        QStringLiteral("force"), CliText::tr("Replace the --out file if it exists."));
    const QCommandLineOption save(QStringLiteral("save"),
        CliText::tr(
            "With a project: save the analysis in the project under this name (its settings, each "
            "frame's profile and name, each article's frame)."),
        QStringLiteral("NAME"));
    const QCommandLineOption frameName(QStringLiteral("frame-name"),
        CliText::tr(
            "With --save: the name of the next frame (give it once per frame, largest first)."),
        QStringLiteral("NAME"));
    const QCommandLineOption saved(
        QStringLiteral("saved"), CliText::tr("List the frame analyses saved in the project."));
    const QCommandLineOption deleteSaved(QStringLiteral("delete-saved"),
        CliText::tr("Delete the saved frame analysis of this name from the project."),
        QStringLiteral("NAME"));
    parser.addOptions({data, layer, k, maxK, bootstrap, seed, compare, json, outFile, force, save,
        frameName, saved, deleteSaved});
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), CliText::tr("The project file (unless --data is given)."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "Frames as clusters of articles by their frame elements: Ward's method, then "
                "k-means from Ward's centroids (Matthes & Kohring 2008); k-choice indices "
                "(silhouette, Calinski–Harabasz, fusion-coefficient elbow), bootstrap stability, "
                "frames by outlet, month and language."),
            arguments);
        rc >= 0)
        return rc;

    if (parser.isSet(saved) || parser.isSet(deleteSaved)) {
        if (parser.isSet(data) || parser.positionalArguments().size() != 1)
            return usageError(
                command, CliText::tr("--saved and --delete-saved expect a project file."));
        return parser.isSet(saved)
            ? listSaved(parser.positionalArguments().first(), parser.isSet(json))
            : deleteSavedAnalysis(parser.positionalArguments().first(), parser.value(deleteSaved));
    }
    if (parser.isSet(save) && parser.isSet(data))
        return usageError(command, CliText::tr("--save is for a project, not --data."));
    if (parser.isSet(frameName) && !parser.isSet(save))
        return usageError(command, CliText::tr("--frame-name goes with --save."));

    bool ok = false;
    frames::FrameAnalysisOptions options;
    if (parser.isSet(k)) {
        options.k = parser.value(k).toInt(&ok);
        if (!ok || options.k < 1)
            return usageError(
                command, CliText::tr("--k expects a whole number of frames from 1 up."));
    }
    options.maxK = parser.value(maxK).toInt(&ok);
    if (!ok || options.maxK < 2 || options.maxK > 100)
        return usageError(command, CliText::tr("--max-k expects a whole number from 2 to 100."));
    const int replicates = parser.value(bootstrap).toInt(&ok);
    if (!ok || replicates < 0 || replicates > 100000)
        return usageError(
            command, CliText::tr("--bootstrap expects a number of replicates from 0 to 100000."));
    const quint64 seedValue = parser.value(seed).toULongLong(&ok);
    if (!ok)
        return usageError(command, CliText::tr("--seed expects a non-negative whole number."));
    if (parser.isSet(outFile) && QFileInfo::exists(parser.value(outFile)) && !parser.isSet(force))
        return reportFailure(fail(ErrorCode::Duplicate,
            CliText::tr("%1 exists already; choose another name or replace it with --force.")
                .arg(parser.value(outFile))));

    FrameInput input;
    std::optional<FrameInput> other;
    std::optional<Project> project;
    if (parser.isSet(data)) {
        if (!parser.positionalArguments().isEmpty())
            return usageError(
                command, CliText::tr("give either --data FILE or a project, not both."));
        if (parser.isSet(compare) || parser.isSet(layer))
            return usageError(
                command, CliText::tr("--layer and --compare are for a project, not --data."));
        auto read = readNumericMatrix(parser.value(data));
        if (!read)
            return report(read.error());
        input.source = read->source;
        input.variables = read->variables;
        input.ids = read->rows;
        input.matrix.rows = size_t(read->rows.size());
        input.matrix.columns = size_t(read->variables.size());
        input.matrix.values = std::move(read->values);
    } else {
        if (parser.positionalArguments().size() != 1)
            return usageError(command, CliText::tr("expected a project file, or --data FILE."));
        const QString path = parser.positionalArguments().first();
        // Saving writes; everything else only reads the file.
        auto opened = parser.isSet(save) ? Project::open(path) : Project::openForReading(path);
        if (!opened)
            return report(opened.error());
        project.emplace(std::move(*opened));
        auto first = frameInput(*project, parser.value(layer));
        if (!first)
            return report(first.error());
        input = std::move(*first);
        if (parser.isSet(compare)) {
            auto second = frameInput(*project, parser.value(compare));
            if (!second)
                return report(second.error());
            other = std::move(*second);
        }
    }
    if (input.matrix.rows < 3)
        return reportFailure(fail(ErrorCode::InvalidInput,
            CliText::tr(
                "%1 holds %n article(s); frames need at least 3.", nullptr, int(input.matrix.rows))
                .arg(input.source)));

    auto analysed = frames::analyseFrames(input.matrix, options);
    if (!analysed)
        return reportFailure(fail(ErrorCode::InvalidInput,
            CliText::tr("%1: %2").arg(input.source, QString::fromStdString(analysed.error()))));
    const FrameAnalysis &analysis = *analysed;
    const frames::Partition &partition = analysis.frames.partition;

    std::vector<frames::ClusterStability> stability;
    if (replicates > 0) {
        frames::StabilityOptions stabilityOptions;
        stabilityOptions.replicates = replicates;
        stabilityOptions.seed = seedValue;
        // Progress on a terminal only (a script reading stderr sees errors alone); Ctrl-C stops.
        const bool terminal = ::isatty(STDERR_FILENO) == 1;
        if (terminal)
            stabilityOptions.progress = [replicates](int done) {
                std::fprintf(stderr, "\rstability: replicate %d of %d", done, replicates);
                if (done == replicates)
                    std::fputc('\n', stderr);
            };
        auto computed = frames::clusterStability(
            input.matrix, partition, twoStepMethod(analysis.k), stabilityOptions);
        if (!computed)
            return reportFailure(
                fail(ErrorCode::InvalidInput, QString::fromStdString(computed.error())));
        stability = std::move(*computed);
    }

    const std::vector<FrameGroupTable> tables = frameGroupTables(input, partition);

    // The comparison: both layers clustered on the articles they share, with the same k.
    QJsonObject comparison;
    QStringList comparisonText;
    if (other) {
        QSet<qint64> inFirst;
        for (const ArticleSummary &a : input.articles)
            inFirst.insert(a.id.value);
        QSet<qint64> common;
        for (const ArticleSummary &a : other->articles)
            if (inFirst.contains(a.id.value))
                common.insert(a.id.value);
        const FrameInput a = restrictedFrameInput(input, common);
        const FrameInput b = restrictedFrameInput(*other, common);
        if (a.matrix.rows < std::max<size_t>(3, size_t(analysis.k)))
            return reportFailure(fail(ErrorCode::InvalidInput,
                CliText::tr("%1 and %2 share %n article(s); comparing %3 frames needs more.",
                    nullptr, int(a.matrix.rows))
                    .arg(input.source, other->source)
                    .arg(analysis.k)));
        frames::FrameAnalysisOptions same = options;
        same.k = analysis.k;
        same.maxK = 2;
        auto first = frames::analyseFrames(a.matrix, same);
        auto second = frames::analyseFrames(b.matrix, same);
        if (!first || !second)
            return reportFailure(fail(ErrorCode::InvalidInput,
                QString::fromStdString(!first ? first.error() : second.error())));
        const auto table = frames::crossTable(first->frames.partition, second->frames.partition);
        if (!table)
            return reportFailure(fail(ErrorCode::Internal, QString::fromStdString(table.error())));
        const double ari = frames::adjustedRandIndex(*table);
        const std::vector<int> match = frames::bestMatching(*table);
        long long matched = 0;
        QJsonArray rows;
        QJsonArray matching;
        for (int r = 0; r < table->rows; ++r) {
            QJsonArray row;
            for (int c = 0; c < table->columns; ++c)
                row.append(double(table->at(r, c)));
            rows.append(row);
            const int m = match[size_t(r)];
            matching.append(m >= 0 ? QJsonValue(m + 1) : QJsonValue(QJsonValue::Null));
            if (m >= 0)
                matched += table->at(r, m);
        }
        const double agreement = double(matched) / double(a.matrix.rows);
        comparison = QJsonObject {{QStringLiteral("layer"), parser.value(compare)},
            {QStringLiteral("articles"), int(a.matrix.rows)}, {QStringLiteral("k"), analysis.k},
            {QStringLiteral("adjusted_rand_index"), ari}, {QStringLiteral("cross_table"), rows},
            {QStringLiteral("matching"), matching}, {QStringLiteral("matched_share"), agreement}};
        comparisonText << CliText::tr(
            "Frames of %1 against %2 on the %n article(s) both hold (k = %3 "
            "for both)",
            nullptr, int(a.matrix.rows))
                              .arg(input.source, other->source)
                              .arg(analysis.k);
        comparisonText
            << CliText::tr("  Adjusted Rand index (Hubert & Arabie 1985)  %1").arg(ari, 0, 'f', 3);
        comparisonText << CliText::tr("  Articles on matched frames                   %1%")
                              .arg(agreement * 100, 0, 'f', 1);
        QString header = QStringLiteral("  %1").arg(QString(), -10);
        for (int c = 0; c < table->columns; ++c)
            header += QStringLiteral("%1").arg(CliText::tr("F%1").arg(c + 1), 8);
        comparisonText << header
                + CliText::tr("   (rows: %1; columns: %2; * matched)")
                      .arg(parser.value(layer), parser.value(compare));
        for (int r = 0; r < table->rows; ++r) {
            QString line = QStringLiteral("  %1").arg(CliText::tr("F%1").arg(r + 1), -10);
            for (int c = 0; c < table->columns; ++c)
                line += QStringLiteral("%1").arg(
                    QString::number(table->at(r, c)) + (match[size_t(r)] == c ? u"*"_qs : u" "_qs),
                    8);
            comparisonText << line;
        }
    }

    if (parser.isSet(save)) {
        const QStringList names = parser.values(frameName);
        if (names.size() > partition.clusters)
            return usageError(command,
                CliText::tr("%n --frame-name given for %1 frame(s).", nullptr, int(names.size()))
                    .arg(partition.clusters));
        FrameRunSettings settings;
        settings.maxK = options.maxK;
        settings.bootstrap = replicates;
        settings.seed = seedValue;
        SaveFrameAnalysisEdit edit(
            frameAnalysisRecord(input, analysis, stability, settings, parser.value(save), names),
            CoderId {});
        if (auto stored = project->apply(edit); !stored)
            return report(stored.error());
        err(CliText::tr("Saved the frames as \"%1\" in %2.")
                .arg(edit.analysis().name, project->path()));
    }

    if (parser.isSet(outFile)) {
        if (auto written = writeAssignments(parser.value(outFile), input, partition); !written)
            return report(written.error());
    }

    const size_t n = input.matrix.rows;
    if (parser.isSet(json)) {
        QJsonArray kChoice;
        for (const frames::KChoice &row : analysis.kChoice)
            kChoice.append(QJsonObject {{QStringLiteral("k"), row.k},
                {QStringLiteral("silhouette"), optionalJson(row.silhouette.value)},
                {QStringLiteral("calinski_harabasz"), optionalJson(row.calinskiHarabasz.value)},
                {QStringLiteral("fusion_jump"), optionalJson(row.fusionJump.value)}});
        QJsonArray schedule;
        for (const frames::WardMerge &m : analysis.schedule)
            schedule.append(QJsonArray {m.first, m.second, m.height, m.size});
        QJsonArray framesJson;
        for (size_t f = 0; f < analysis.profiles.size(); ++f) {
            const frames::FrameProfile &profile = analysis.profiles[f];
            QJsonArray elements;
            for (qsizetype v = 0; v < input.variables.size(); ++v) {
                const frames::VariableProfile &vp = profile.variables[size_t(v)];
                QJsonObject element {{QStringLiteral("variable"), input.variables[v]},
                    {QStringLiteral("share"), vp.share}, {QStringLiteral("overall"), vp.overall},
                    {QStringLiteral("difference"), vp.difference},
                    {QStringLiteral("residual"), optionalJson(vp.residual)}};
                if (!input.coderShares.empty()) {
                    // Consensus: the mean share of the frame's articles' coders who coded it.
                    double sum = 0;
                    for (size_t i = 0; i < partition.labels.size(); ++i)
                        if (size_t(partition.labels[i]) == f)
                            sum += input.coderShares[i * input.matrix.columns + size_t(v)];
                    element.insert(QStringLiteral("coder_share"),
                        profile.size > 0 ? QJsonValue(sum / profile.size)
                                         : QJsonValue(QJsonValue::Null));
                }
                elements.append(element);
            }
            QJsonArray closest;
            for (size_t row : profile.closest)
                closest.append(input.ids[qsizetype(row)]);
            QJsonObject frame {{QStringLiteral("frame"), int(f) + 1},
                {QStringLiteral("size"), profile.size},
                {QStringLiteral("share"), double(profile.size) / double(n)},
                {QStringLiteral("elements"), elements}, {QStringLiteral("closest"), closest}};
            if (!stability.empty())
                frame.insert(QStringLiteral("stability"),
                    QJsonObject {{QStringLiteral("mean_jaccard"), stability[f].meanJaccard},
                        {QStringLiteral("replicates"), stability[f].replicatesUsed},
                        {QStringLiteral("dissolved"), stability[f].dissolved},
                        {QStringLiteral("recovered"), stability[f].recovered},
                        {QStringLiteral("flagged"), stability[f].flagged}});
            framesJson.append(frame);
        }
        QJsonObject byGroup;
        for (const FrameGroupTable &t : tables) {
            QJsonArray rows;
            for (int f = 0; f < partition.clusters; ++f) {
                QJsonArray row;
                for (qsizetype g = 0; g < t.groups.size(); ++g)
                    row.append(double(t.counts[size_t(f) * size_t(t.groups.size()) + size_t(g)]));
                rows.append(row);
            }
            QJsonObject o = chiSquareJson(t.test);
            o.insert(QStringLiteral("groups"), QJsonArray::fromStringList(t.groups));
            o.insert(QStringLiteral("counts"), rows);
            byGroup.insert(t.name, o);
        }
        QJsonObject o {{QStringLiteral("source"), input.source},
            {QStringLiteral("articles"), int(n)},
            {QStringLiteral("variables"), QJsonArray::fromStringList(input.variables)},
            {QStringLiteral("k"), analysis.k}, {QStringLiteral("k_given"), analysis.kGiven},
            {QStringLiteral("k_by"),
                QJsonObject {{QStringLiteral("silhouette"), analysis.kBySilhouette},
                    {QStringLiteral("calinski_harabasz"), analysis.kByCalinskiHarabasz},
                    {QStringLiteral("fusion_elbow"), analysis.kByFusion}}},
            {QStringLiteral("k_choice"), kChoice}, {QStringLiteral("schedule"), schedule},
            {QStringLiteral("inertia"), analysis.frames.inertia},
            {QStringLiteral("kmeans_iterations"), analysis.frames.iterations},
            {QStringLiteral("frames"), framesJson}};
        if (!stability.empty())
            o.insert(QStringLiteral("bootstrap"),
                QJsonObject {{QStringLiteral("replicates"), replicates},
                    {QStringLiteral("seed"), QString::number(seedValue)}});
        if (!byGroup.isEmpty())
            o.insert(QStringLiteral("by"), byGroup);
        if (!comparison.isEmpty())
            o.insert(QStringLiteral("compare"), comparison);
        printJson(o);
        return ExitOk;
    }

    QStringList lines;
    lines << CliText::tr("Frames of %1: %2 articles × %3 variables")
                 .arg(input.source)
                 .arg(n)
                 .arg(input.variables.size());
    if (!input.coderShares.empty()) {
        // How many of the elements present rest on a bare half of the article's coders.
        qsizetype present = 0;
        qsizetype atHalf = 0;
        for (size_t i = 0; i < input.coderShares.size(); ++i)
            if (input.matrix.values[i] == 1) {
                ++present;
                atHalf += input.coderShares[i] == 0.5 ? 1 : 0;
            }
        lines << CliText::tr(
            "Consensus: an element counts when at least half of the article's coders "
            "coded it; %1 of the %2 elements present rest on exactly half.")
                     .arg(atHalf)
                     .arg(present);
    }
    lines << CliText::tr("Choosing k (each k: Ward, then k-means from Ward's centroids)");
    lines << CliText::tr("  %1 %2 %3 %4")
                 .arg(CliText::tr("k"), 3)
                 .arg(CliText::tr("silhouette"), 11)
                 .arg(CliText::tr("Calinski–Harabasz"), 18)
                 .arg(CliText::tr("fusion jump"), 12);
    for (const frames::KChoice &row : analysis.kChoice)
        lines << QStringLiteral("  %1 %2 %3 %4")
                     .arg(row.k, 3)
                     .arg(number(row.silhouette.value, 3), 11)
                     .arg(number(row.calinskiHarabasz.value, 2), 18)
                     .arg(number(row.fusionJump.value, 3), 12);
    lines << CliText::tr(
        "  Largest: silhouette at k = %1, Calinski–Harabasz at k = %2, fusion jump at k "
        "= %3")
                 .arg(kText(analysis.kBySilhouette), kText(analysis.kByCalinskiHarabasz),
                     kText(analysis.kByFusion));
    lines << (analysis.kGiven ? CliText::tr("Frames (k = %1, given)").arg(analysis.k)
            : analysis.indicesAgree()
            ? CliText::tr("Frames (k = %1, where most indices point)").arg(analysis.k)
            : CliText::tr("Frames (k = %1, the largest mean silhouette: the three indices point at "
                          "different k)")
                  .arg(analysis.k));
    for (size_t f = 0; f < analysis.profiles.size(); ++f) {
        const frames::FrameProfile &profile = analysis.profiles[f];
        QString head = CliText::tr("  Frame %1  %n article(s) (%2%)", nullptr, profile.size)
                           .arg(f + 1)
                           .arg(100.0 * profile.size / double(n), 0, 'f', 1);
        if (!stability.empty())
            head += CliText::tr("  stability %1%2")
                        .arg(stability[f].replicatesUsed > 0
                                ? QString::number(stability[f].meanJaccard, 'f', 2)
                                : QStringLiteral("–"))
                        .arg(stability[f].flagged ? CliText::tr(" (dissolves on resampling)")
                                                  : QString());
        lines << head;
        // The elements that characterise the frame: adjusted residual above 1.96, the largest
        // first (for numbers from --data that are not 0/1: the largest differences).
        std::vector<size_t> order(input.variables.size());
        for (size_t v = 0; v < order.size(); ++v)
            order[v] = v;
        auto strength = [&](size_t v) {
            const frames::VariableProfile &vp = profile.variables[v];
            return vp.residual ? *vp.residual : vp.difference;
        };
        std::stable_sort(order.begin(), order.end(),
            [&](size_t x, size_t y) { return strength(x) > strength(y); });
        QStringList shown;
        for (size_t v : order) {
            const frames::VariableProfile &vp = profile.variables[v];
            if (vp.residual ? *vp.residual <= 1.96 : vp.difference <= 0)
                continue;
            shown << CliText::tr("%1 %2 (all %3%4)")
                         .arg(input.variables[qsizetype(v)])
                         .arg(vp.share, 0, 'f', 2)
                         .arg(vp.overall, 0, 'f', 2)
                         .arg(vp.residual ? CliText::tr(", r = %1").arg(*vp.residual, 0, 'f', 1)
                                          : QString());
            if (shown.size() == 6)
                break;
        }
        lines << CliText::tr("    elements: %1")
                     .arg(shown.isEmpty() ? CliText::tr("none stands out")
                                          : shown.join(QStringLiteral("; ")));
        QStringList closest;
        for (size_t row : profile.closest)
            closest << input.ids[qsizetype(row)];
        lines
            << CliText::tr("    closest to the centre: %1").arg(closest.join(QStringLiteral(", ")));
    }
    for (const FrameGroupTable &t : tables) {
        lines << CliText::tr("Frames by %1: %2").arg(t.name, chiSquareText(t.test));
        QString header = QStringLiteral("  %1").arg(QString(), -24);
        for (int f = 0; f < partition.clusters; ++f)
            header += QStringLiteral("%1").arg(CliText::tr("F%1").arg(f + 1), 7);
        lines << header;
        for (qsizetype g = 0; g < t.groups.size(); ++g) {
            QString line = QStringLiteral("  %1").arg(t.groups[g].left(24), -24);
            for (int f = 0; f < partition.clusters; ++f)
                line += QStringLiteral("%1").arg(
                    t.counts[size_t(f) * size_t(t.groups.size()) + size_t(g)], 7);
            lines << line;
        }
    }
    lines << comparisonText;
    out(lines.join(QLatin1Char('\n')));
    return ExitOk;
}

} // namespace fourfold::cli
