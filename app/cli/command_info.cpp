#include "app/cli/cli_output.h"
#include "core/project/near_copies.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QMap>

namespace fourfold::cli {

namespace {

QJsonObject perFunctionJson(const std::array<qint64, 4> &counts)
{
    QJsonObject o;
    for (FramingFunction f : kFramingFunctions)
        o.insert(functionKey(f), counts[size_t(f)]);
    return o;
}

QString perFunctionText(const std::array<qint64, 4> &counts)
{
    QStringList parts;
    for (FramingFunction f : kFramingFunctions)
        parts << QStringLiteral("%1 %2").arg(functionKey(f)).arg(counts[size_t(f)]);
    return parts.join(QStringLiteral(", "));
}

} // namespace

int runInfo(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the figures as JSON."));
    parser.addOption(json);
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    if (int rc = parseCommandLine(parser, QStringLiteral("info"),
            QCoreApplication::translate(
                "cli", "Show what a project holds. Coders appear by pseudonym only."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(QStringLiteral("info"),
            QCoreApplication::translate("cli", "expected exactly one project file."));

    auto project = Project::openForReading(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto counts = project->counts();
    if (!counts)
        return report(counts.error());
    auto articles = project->articles();
    if (!articles)
        return report(articles.error());
    auto nearCopies = NearCopies::counts(*project);
    if (!nearCopies)
        return report(nearCopies.error());
    QMap<QString, qint64> languages;
    for (const ArticleSummary &a : *articles)
        ++languages[a.language];

    if (parser.isSet(json)) {
        QJsonObject languagesJson;
        for (auto it = languages.cbegin(); it != languages.cend(); ++it)
            languagesJson.insert(it.key(), it.value());
        QJsonArray perCoder;
        for (const CoderCounts &c : counts->perCoder)
            perCoder.append(QJsonObject {{QStringLiteral("coder"), c.coder.pseudonym},
                {QStringLiteral("role"), coderRoleKey(c.coder.role)},
                {QStringLiteral("annotations"), c.annotations},
                {QStringLiteral("perFunction"), perFunctionJson(c.perFunction)}});
        printJson(QJsonObject {
            {QStringLiteral("project"), project->settings().name},
            {QStringLiteral("file"), project->path()},
            {QStringLiteral("schemaVersion"), Project::schemaVersion()},
            {QStringLiteral("codebookVersion"), counts->codebookVersion},
            {QStringLiteral("defaultLanguage"), project->settings().defaultLanguage},
            {QStringLiteral("articles"), counts->articles},
            {QStringLiteral("languages"), languagesJson},
            {QStringLiteral("nearCopies"),
                QJsonObject {{QStringLiteral("articles"), nearCopies->articles},
                    {QStringLiteral("pairs"), nearCopies->pairs}}},
            {QStringLiteral("paragraphs"), counts->paragraphs},
            {QStringLiteral("sentences"), counts->sentences},
            {QStringLiteral("tokens"), counts->tokens},
            {QStringLiteral("codePoints"), counts->codePoints},
            {QStringLiteral("coders"), counts->coders},
            {QStringLiteral("assignments"), counts->assignments},
            {QStringLiteral("annotations"), counts->annotations},
            {QStringLiteral("annotationsPerFunction"), perFunctionJson(counts->perFunction)},
            {QStringLiteral("annotationsPerCoder"), perCoder},
            {QStringLiteral("links"), counts->links},
            {QStringLiteral("judgements"), counts->judgements},
            {QStringLiteral("goldAnnotations"), counts->goldAnnotations},
            {QStringLiteral("extractorRuns"), counts->extractorRuns},
        });
        return ExitOk;
    }

    QStringList languageParts;
    for (auto it = languages.cbegin(); it != languages.cend(); ++it)
        languageParts << QStringLiteral("%1 %2").arg(it.key()).arg(it.value());
    out(QCoreApplication::translate("cli", "Project      %1 (%2)")
            .arg(project->settings().name, project->path()));
    out(QCoreApplication::translate(
        "cli", "Schema       version %1; codebook version %2; default language %3")
            .arg(Project::schemaVersion())
            .arg(counts->codebookVersion)
            .arg(project->settings().defaultLanguage));
    out(QCoreApplication::translate("cli", "Articles     %1 (%2)")
            .arg(counts->articles)
            .arg(languageParts.join(QStringLiteral(", "))));
    out(QCoreApplication::translate(
        "cli", "Near copies  %1 article(s) a near copy of an older one (%2 pair(s))")
            .arg(nearCopies->articles)
            .arg(nearCopies->pairs));
    out(QCoreApplication::translate(
        "cli", "Units        %1 paragraphs, %2 sentences, %3 tokens, %4 characters")
            .arg(counts->paragraphs)
            .arg(counts->sentences)
            .arg(counts->tokens)
            .arg(counts->codePoints));
    out(QCoreApplication::translate("cli", "Coders       %1; %2 assignments")
            .arg(counts->coders)
            .arg(counts->assignments));
    out(QCoreApplication::translate("cli", "Annotations  %1 (%2)")
            .arg(counts->annotations)
            .arg(perFunctionText(counts->perFunction)));
    for (const CoderCounts &c : counts->perCoder)
        out(QCoreApplication::translate("cli", "  %1 (%2)  %3 (%4)")
                .arg(c.coder.pseudonym, coderRoleKey(c.coder.role))
                .arg(c.annotations)
                .arg(perFunctionText(c.perFunction)));
    out(QCoreApplication::translate(
        "cli", "Links        %1; article judgements %2; gold spans %3; extractor runs %4")
            .arg(counts->links)
            .arg(counts->judgements)
            .arg(counts->goldAnnotations)
            .arg(counts->extractorRuns));
    return ExitOk;
}

} // namespace fourfold::cli
