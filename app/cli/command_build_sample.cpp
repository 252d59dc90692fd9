// build-sample: makes the demo project file from the plain source files in sample-project/
// (study.json, articles.jsonl, codings.jsonl, gold.jsonl), so that no binary project is committed.

#include "app/cli/cli_output.h"
#include "core/extract/cue_baseline.h"
#include "core/extract/extractor_runs.h"
#include "core/extract/position_baseline.h"
#include "core/project/article_status_edit.h"
#include "core/project/coding_import.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QJsonArray>
#include <QJsonDocument>
#include <QSet>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

Result<QJsonObject> readStudy(const QString &path)
{
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Io, CliText::tr("Cannot read %1: %2").arg(path, file.errorString()));
    QJsonParseError error;
    const QJsonDocument doc = QJsonDocument::fromJson(file.readAll(), &error);
    if (error.error != QJsonParseError::NoError || !doc.isObject())
        return fail(ErrorCode::InvalidInput,
            CliText::tr("%1: not a JSON object (%2).").arg(path, error.errorString()));
    return doc.object();
}

// Builds the whole project at `target`, to be renamed `finalName`; the caller removes it on
// failure.
Status build(const QString &sourceDir, const QString &target, const QString &finalName)
{
    const QDir dir(sourceDir);
    const QString studyPath = dir.filePath(QStringLiteral("study.json"));
    auto study = readStudy(studyPath);
    if (!study)
        return std::unexpected(study.error());

    Project::Settings settings;
    settings.name = study->value(QLatin1String("name")).toString();
    settings.defaultLanguage =
        study->value(QLatin1String("language")).toString(QStringLiteral("en"));
    auto project = Project::create(target, settings);
    if (!project)
        return std::unexpected(project.error());

    std::vector<CoderId> reliabilityCoders;
    for (const QJsonValue &v : study->value(QLatin1String("coders")).toArray()) {
        const QJsonObject c = v.toObject();
        const auto role =
            coderRoleFromKey(c.value(QLatin1String("role")).toString(QStringLiteral("coder")));
        if (!role)
            return fail(ErrorCode::InvalidInput,
                CliText::tr("%1: a coder's role must be \"coder\" or \"lead\".").arg(studyPath));
        const QString name = c.value(QLatin1String("name")).toString();
        const QString pseudonym = c.value(QLatin1String("pseudonym")).toString();
        if (*role == CoderRole::Lead) {
            // The demo's lead has no passphrase: whoever first chooses them sets it, as for a
            // lead of a project from before passphrases (People allows this for the first lead
            // of a new project only).
            auto add = People::addLeadWithoutPassphrase(*project, name, pseudonym);
            if (!add)
                return std::unexpected(add.error());
            FOURFOLD_TRY_STATUS(project->apply(**add));
            continue;
        }
        auto id = project->addCoder(name, pseudonym, *role);
        if (!id)
            return std::unexpected(id.error());
        reliabilityCoders.push_back(*id);
    }

    ImportOptions options;
    auto imported = project->importFile(dir.filePath(QStringLiteral("articles.jsonl")), options);
    if (!imported)
        return std::unexpected(imported.error());

    // Each loop of writes is one transaction (a commit per assignment took most of the time).
    QSet<QString> reliabilityArticles;
    FOURFOLD_TRY_STATUS(project->batch([&]() -> Status {
        for (const QJsonValue &v : study->value(QLatin1String("reliabilityArticles")).toArray()) {
            reliabilityArticles.insert(v.toString());
            auto article = project->articleByExternalId(v.toString());
            if (!article)
                return std::unexpected(article.error());
            if (!*article)
                return fail(ErrorCode::InvalidInput,
                    CliText::tr("%1: the reliability article \"%2\" is not in articles.jsonl.")
                        .arg(studyPath, v.toString()));
            for (CoderId coder : reliabilityCoders)
                FOURFOLD_TRY_STATUS(project->assign(**article, coder, Phase::Reliability));
        }
        return {};
    }));

    // The codings of the reliability articles are the reliability phase's; one coder's codings
    // of any other article are production work (assigned to that coder when marked done).
    const auto phaseOf = [&reliabilityArticles](const QString &article) {
        return reliabilityArticles.contains(article) ? Phase::Reliability : Phase::Production;
    };
    auto codings =
        importQuotedCodings(*project, dir.filePath(QStringLiteral("codings.jsonl")), phaseOf);
    if (!codings)
        return std::unexpected(codings.error());
    // The lead's adjudicated gold for some of the reliability articles (the rest are left for
    // trying out the comparison) and for the production articles.
    auto gold = importQuotedCodings(*project, dir.filePath(QStringLiteral("gold.jsonl")), phaseOf);
    if (!gold)
        return std::unexpected(gold.error());
    // The demo coders have finished their articles (so progress shows agreement).
    auto assignments = project->assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    FOURFOLD_TRY_STATUS(project->batch([&]() -> Status {
        for (const Assignment &a : *assignments) {
            SetArticleStatusEdit done(a.article, a.coder, QStringLiteral("done"));
            FOURFOLD_TRY_STATUS(project->applyInBatch(done));
        }
        return {};
    }));

    // Both built-in baselines, run with their default parameters, for the extractor window.
    auto position = PositionBaseline::create();
    if (!position)
        return std::unexpected(position.error());
    if (auto run = ExtractorRuns::create(*project, *position, QStringLiteral("position")); !run)
        return std::unexpected(run.error());
    auto cues = CueBaseline::create();
    if (!cues)
        return std::unexpected(cues.error());
    if (auto run = ExtractorRuns::create(*project, *cues, QStringLiteral("cues")); !run)
        return std::unexpected(run.error());

    out(CliText::tr(
        "Built %1: %2 articles, %3 coders, %4 spans, %5 article judgements, %6 gold spans, "
        "2 baseline runs.")
            .arg(finalName)
            .arg(imported->added.size())
            .arg(study->value(QLatin1String("coders")).toArray().size())
            .arg(codings->spans)
            .arg(codings->judgements)
            .arg(gold->gold));
    return {};
}

void removeProjectFiles(const QString &path)
{
    for (const char *suffix : {"", "-wal", "-shm"})
        QFile::remove(path + QLatin1String(suffix));
}

} // namespace

int runBuildSample(const QStringList &arguments)
{
    const QString command = QStringLiteral("build-sample");
    QCommandLineParser parser;
    const QCommandLineOption force(
        QStringLiteral("force"), CliText::tr("Replace OUT if it exists."));
    parser.addOption(force);
    parser.addPositionalArgument(QStringLiteral("SOURCE"),
        CliText::tr("The folder with study.json, articles.jsonl, codings.jsonl and gold.jsonl."));
    parser.addPositionalArgument(
        QStringLiteral("OUT"), CliText::tr("The project file to write (*.fourfold)."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr("Build the demo project (invented data) from its source files."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 2)
        return usageError(command, CliText::tr("expected a source folder and an output file."));
    const QString source = parser.positionalArguments().at(0);
    const QString target = parser.positionalArguments().at(1);
    if (QFileInfo::exists(target) && !parser.isSet(force))
        return report(Error {ErrorCode::Duplicate,
            CliText::tr("%1 already exists; add --force to replace it.").arg(target), {}, {}, 0,
            0});

    // Built beside the target and renamed at the end, so a failed build leaves no half project.
    const QString temporary = target + QStringLiteral(".building");
    removeProjectFiles(temporary);
    if (auto st = build(source, temporary, target); !st) {
        removeProjectFiles(temporary);
        return report(st.error());
    }
    removeProjectFiles(target);
    if (!QFile::rename(temporary, target)) {
        removeProjectFiles(temporary);
        return report(Error {ErrorCode::Io,
            CliText::tr("Cannot move the new project to %1.").arg(target), {}, {}, 0, 0});
    }
    return ExitOk;
}

} // namespace fourfold::cli
