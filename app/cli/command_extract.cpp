#include "app/cli/cli_output.h"
#include "core/extract/command_extractor.h"
#include "core/extract/cue_baseline.h"
#include "core/extract/extractor_parameters.h"
#include "core/extract/extractor_runs.h"
#include "core/extract/position_baseline.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QSet>

#include <array>
#include <cmath>
#include <memory>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

QString parametersText(const QJsonObject &parameters)
{
    QStringList parts;
    for (auto it = parameters.begin(); it != parameters.end(); ++it) {
        const QJsonValue v = it.value();
        QString value;
        if (v.isString())
            value = v.toString();
        else if (v.isBool())
            value = v.toBool() ? QStringLiteral("true") : QStringLiteral("false");
        else if (v.isDouble())
            value = QString::number(v.toDouble());
        else
            value = jsonTypeName(v);
        parts << QStringLiteral("%1=%2").arg(it.key(), value);
    }
    return parts.join(QStringLiteral(", "));
}

struct RunSummary {
    qint64 spans = 0;
    qint64 articles = 0;
    std::array<qint64, 4> perFunction {};
};

Result<RunSummary> summarize(const Project &project, const ExtractorRun &run)
{
    auto spans = ExtractorRuns::spans(project, run.id);
    if (!spans)
        return std::unexpected(spans.error());
    RunSummary s;
    QSet<ArticleId> articles;
    for (const ExtractedSpan &span : *spans) {
        ++s.spans;
        ++s.perFunction[size_t(span.function)];
        articles.insert(span.article);
    }
    s.articles = articles.size();
    return s;
}

QJsonObject runJson(const ExtractorRun &run, const RunSummary &s)
{
    QJsonObject perFunction;
    for (FramingFunction f : kFramingFunctions)
        perFunction.insert(functionKey(f), s.perFunction[size_t(f)]);
    return QJsonObject {{QStringLiteral("name"), run.name}, {QStringLiteral("uuid"), run.uuid},
        {QStringLiteral("version"), run.version}, {QStringLiteral("parameters"), run.parameters},
        {QStringLiteral("createdAt"), run.createdAt}, {QStringLiteral("spans"), s.spans},
        {QStringLiteral("articlesWithSpans"), s.articles},
        {QStringLiteral("spansPerFunction"), perFunction}};
}

QString perFunctionText(const RunSummary &s)
{
    QStringList parts;
    for (FramingFunction f : kFramingFunctions)
        parts << QStringLiteral("%1 %2").arg(functionKey(f)).arg(s.perFunction[size_t(f)]);
    return parts.join(QStringLiteral(", "));
}

int listRuns(const Project &project, bool json)
{
    auto runs = ExtractorRuns::runs(project);
    if (!runs)
        return report(runs.error());
    QJsonArray array;
    if (!json && runs->empty())
        out(CliText::tr("No extractor runs."));
    for (const ExtractorRun &run : *runs) {
        auto s = summarize(project, run);
        if (!s)
            return report(s.error());
        if (json) {
            array.append(runJson(run, *s));
            continue;
        }
        out(CliText::tr("%1  (%2, version %3, %4)")
                .arg(run.name, run.parameters.value(QLatin1String("extractor")).toString(),
                    run.version.isEmpty() ? CliText::tr("none") : run.version, run.createdAt));
        out(CliText::tr("    %1 spans in %2 articles (%3)")
                .arg(s->spans)
                .arg(s->articles)
                .arg(perFunctionText(*s)));
        out(CliText::tr("    %1").arg(parametersText(run.parameters)));
    }
    if (json)
        printJson(QJsonObject {{QStringLiteral("runs"), array}});
    return ExitOk;
}

} // namespace

int runExtract(const QStringList &arguments)
{
    const QString command = QStringLiteral("extract");
    QCommandLineParser parser;
    const QCommandLineOption extractorOption(QStringLiteral("extractor"),
        CliText::tr("Run a built-in baseline: position or cues."), QStringLiteral("NAME"));
    const QCommandLineOption commandOption(QStringLiteral("command"),
        CliText::tr(
            "Run an external extractor: a program reading one JSON object per article on stdin "
            "and writing one per article on stdout (see the README)."),
        QStringLiteral("CMD"));
    const QCommandLineOption fromFile(QStringLiteral("from-file"),
        CliText::tr("Import a finished run from a JSON Lines file of spans."),
        QStringLiteral("SPANS"));
    const QCommandLineOption runOption(QStringLiteral("run"),
        CliText::tr("Name of the new run (unique in the project)."), QStringLiteral("NAME"));
    const QCommandLineOption paramOption(QStringLiteral("param"),
        CliText::tr(
            "Set a parameter, stored with the run. Repeatable. position: intro, body, conclusion "
            "(a function or none), unit (paragraph or sentence). cues: weight.modal, "
            "weight.imperative, weight.connective, weight.attribution, weight.negative, "
            "weight.positive (numbers), minWeight (number), multiple (true/false), "
            "otherLanguages (error or skip). --command and --from-file: recorded as given."),
        QStringLiteral("KEY=VALUE"));
    const QCommandLineOption timeoutOption(QStringLiteral("timeout"),
        CliText::tr(
            "--command: stop the program and store nothing when the whole run takes longer than "
            "this many seconds (default: no limit)."),
        QStringLiteral("SECONDS"), QStringLiteral("0"));
    const QCommandLineOption idleOption(QStringLiteral("idle-timeout"),
        CliText::tr(
            "--command: stop the program and store nothing when it writes nothing for this many "
            "seconds (default 120; 0: no limit)."),
        QStringLiteral("SECONDS"), QStringLiteral("120"));
    const QCommandLineOption versionOption(QStringLiteral("version"),
        CliText::tr("--command and --from-file: the extractor's own version, stored with the run."),
        QStringLiteral("VERSION"));
    const QCommandLineOption articlesOption(QStringLiteral("articles"),
        CliText::tr("Only these articles (external ids, comma-separated; default: all)."),
        QStringLiteral("ID,..."));
    const QCommandLineOption listOption(
        QStringLiteral("list"), CliText::tr("List the project's runs instead."));
    const QCommandLineOption deleteOption(QStringLiteral("delete"),
        CliText::tr("Delete the run called NAME and its spans instead."), QStringLiteral("NAME"));
    const QCommandLineOption json(QStringLiteral("json"), CliText::tr("Print the result as JSON."));
    parser.addOptions({extractorOption, commandOption, fromFile, runOption, paramOption,
        timeoutOption, idleOption, versionOption, articlesOption, listOption, deleteOption, json});
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "Run an extractor over a project's articles and store its spans as a named run, "
                "whole or not at all; or import, list or delete runs. Offsets are code points."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(command, CliText::tr("expected exactly one project file."));

    const int sources = int(parser.isSet(extractorOption)) + int(parser.isSet(commandOption))
        + int(parser.isSet(fromFile));
    const int actions =
        int(sources > 0) + int(parser.isSet(listOption)) + int(parser.isSet(deleteOption));
    if (actions == 0)
        return usageError(command,
            CliText::tr("give --extractor, --command or --from-file with --run NAME, or --list, or "
                        "--delete NAME."));
    if (sources > 1 || actions > 1)
        return usageError(command,
            CliText::tr(
                "give only one of --extractor, --command, --from-file, --list and --delete."));

    auto project = Project::open(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    if (!project->backupPath().isEmpty())
        err(CliText::tr("Upgraded the project file; the old version is kept as %1.")
                .arg(project->backupPath()));

    if (parser.isSet(listOption))
        return listRuns(*project, parser.isSet(json));

    if (parser.isSet(deleteOption)) {
        const QString name = parser.value(deleteOption);
        if (Status done = ExtractorRuns::deleteRun(*project, name); !done)
            return report(done.error());
        if (parser.isSet(json))
            printJson(QJsonObject {{QStringLiteral("deleted"), name}});
        else
            out(CliText::tr("Deleted run %1.").arg(name));
        return ExitOk;
    }

    if (!parser.isSet(runOption) || parser.value(runOption).trimmed().isEmpty())
        return usageError(command, CliText::tr("name the new run with --run NAME."));
    const QString runName = parser.value(runOption);

    QJsonObject given;
    for (const QString &keyValue : parser.values(paramOption)) {
        auto parameter = parseParameter(keyValue);
        if (!parameter)
            return usageError(command, parameter.error().message);
        given.insert(parameter->first, parameter->second);
    }
    for (const QString &reserved : {QStringLiteral("extractor"), QStringLiteral("command"),
             QStringLiteral("timeout"), QStringLiteral("file"), QStringLiteral("sha256")})
        if (given.contains(reserved))
            return usageError(command,
                CliText::tr("parameter \"%1\" is set by Fourfold itself; choose another key.")
                    .arg(reserved));
    if (parser.isSet(extractorOption)
        && (parser.isSet(versionOption) || parser.isSet(timeoutOption) || parser.isSet(idleOption)))
        return usageError(command,
            CliText::tr(
                "--version, --timeout and --idle-timeout are for --command and --from-file; a "
                "built-in baseline has its own version."));

    std::vector<ArticleId> articleIds;
    if (parser.isSet(articlesOption)) {
        if (parser.isSet(fromFile))
            return usageError(command, CliText::tr("--articles does not apply to --from-file."));
        for (const QString &externalId :
            parser.value(articlesOption).split(QLatin1Char(','), Qt::SkipEmptyParts)) {
            auto id = project->articleByExternalId(externalId.trimmed());
            if (!id)
                return report(id.error());
            if (!id->has_value())
                return report(fail(ErrorCode::NotFound,
                    CliText::tr("There is no article \"%1\" in the project.")
                        .arg(externalId.trimmed()))
                                  .error());
            articleIds.push_back(**id);
        }
        if (articleIds.empty())
            return usageError(command, CliText::tr("--articles names no article."));
    }

    Result<ExtractorRun> run = std::unexpected(Error {});
    if (parser.isSet(fromFile)) {
        run = ExtractorRuns::importRun(
            *project, runName, parser.value(fromFile), parser.value(versionOption), given);
    } else {
        std::unique_ptr<Extractor> extractor;
        if (parser.isSet(extractorOption)) {
            const QString kind = parser.value(extractorOption);
            if (kind == QLatin1String("position")) {
                auto baseline = PositionBaseline::create(given);
                if (!baseline)
                    return usageError(command, baseline.error().message);
                extractor = std::make_unique<PositionBaseline>(std::move(*baseline));
            } else if (kind == QLatin1String("cues")) {
                auto baseline = CueBaseline::create(given);
                if (!baseline)
                    return usageError(command, baseline.error().message);
                extractor = std::make_unique<CueBaseline>(std::move(*baseline));
            } else {
                return usageError(command,
                    CliText::tr(
                        "unknown extractor \"%1\" (expected position or cues; use --command for "
                        "your own).")
                        .arg(kind));
            }
        } else {
            bool ok = false;
            const double timeout = parser.value(timeoutOption).toDouble(&ok);
            if (!ok || !(timeout >= 0) || !std::isfinite(timeout))
                return usageError(command,
                    CliText::tr(
                        "--timeout expects a number of seconds (0 for no limit), got \"%1\".")
                        .arg(parser.value(timeoutOption)));
            const double idle = parser.value(idleOption).toDouble(&ok);
            if (!ok || !(idle >= 0) || !std::isfinite(idle))
                return usageError(command,
                    CliText::tr(
                        "--idle-timeout expects a number of seconds (0 for no limit), got \"%1\".")
                        .arg(parser.value(idleOption)));
            auto commandExtractor = std::make_unique<CommandExtractor>(
                parser.value(commandOption), timeout, parser.value(versionOption), given);
            commandExtractor->setIdleTimeout(idle);
            extractor = std::move(commandExtractor);
        }
        run = ExtractorRuns::create(*project, *extractor, runName, articleIds);
    }
    if (!run)
        return report(run.error());
    auto summary = summarize(*project, *run);
    if (!summary)
        return report(summary.error());
    if (parser.isSet(json)) {
        printJson(QJsonObject {{QStringLiteral("run"), runJson(*run, *summary)}});
        return ExitOk;
    }
    out(CliText::tr("Run          %1 (%2, version %3)")
            .arg(run->name, run->parameters.value(QLatin1String("extractor")).toString(),
                run->version.isEmpty() ? CliText::tr("none") : run->version));
    out(CliText::tr("Parameters   %1").arg(parametersText(run->parameters)));
    out(CliText::tr("Spans        %1 in %2 articles (%3)")
            .arg(summary->spans)
            .arg(summary->articles)
            .arg(perFunctionText(*summary)));
    return ExitOk;
}

} // namespace fourfold::cli
