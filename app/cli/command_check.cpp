#include "app/cli/cli_output.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>

namespace fourfold::cli {

int runCheck(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOption(json);
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    if (int rc = parseCommandLine(parser, QStringLiteral("check"),
            QCoreApplication::translate("cli",
                "Check a project file: SQLite's integrity and foreign-key checks, the full-text "
                "index, every article's hash, length and canonical form, and every span "
                "and quote against its text. Exits 1 if anything is wrong."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(QStringLiteral("check"),
            QCoreApplication::translate("cli", "expected exactly one project file."));

    auto project = Project::openForReading(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto result = project->check();
    if (!result)
        return report(result.error());

    if (parser.isSet(json)) {
        printJson(QJsonObject {{QStringLiteral("file"), project->path()},
            {QStringLiteral("ok"), result->isClean()},
            {QStringLiteral("articlesChecked"), result->articlesChecked},
            {QStringLiteral("spansChecked"), result->spansChecked},
            {QStringLiteral("problems"), QJsonArray::fromStringList(result->problems)}});
    } else {
        for (const QString &problem : result->problems)
            out(problem);
        if (result->isClean())
            out(QCoreApplication::translate(
                "cli", "OK: %1 articles and %2 spans checked, no problems.")
                    .arg(result->articlesChecked)
                    .arg(result->spansChecked));
    }
    if (!result->isClean()) {
        err(QCoreApplication::translate(
            "cli", "fourfold-cli: %1 has %n problem(s).", nullptr, int(result->problems.size()))
                .arg(project->path()));
        return ExitFailure;
    }
    return ExitOk;
}

} // namespace fourfold::cli
