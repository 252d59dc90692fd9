#include "app/cli/cli_output.h"
#include "core/project/project.h"

#include <QCoreApplication>

namespace fourfold::cli {

int runNew(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption language(QStringLiteral("language"),
        QCoreApplication::translate(
            "cli", "Default language of articles that name none (BCP 47 tag, default en)."),
        QStringLiteral("TAG"), QStringLiteral("en"));
    const QCommandLineOption name(QStringLiteral("name"),
        QCoreApplication::translate("cli", "The project's name (default: the file name)."),
        QStringLiteral("NAME"));
    parser.addOption(language);
    parser.addOption(name);
    parser.addPositionalArgument(QStringLiteral("PROJECT"),
        QCoreApplication::translate("cli", "The project file to create (*.fourfold)."));
    if (int rc = parseCommandLine(parser, QStringLiteral("new"),
            QCoreApplication::translate(
                "cli", "Create an empty project file with the default codebook."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(QStringLiteral("new"),
            QCoreApplication::translate("cli", "expected exactly one project file."));

    Project::Settings settings;
    settings.name = parser.value(name);
    settings.defaultLanguage = parser.value(language);
    auto project = Project::create(parser.positionalArguments().first(), settings);
    if (!project)
        return report(project.error());
    out(QCoreApplication::translate("cli", "Created %1 (default language %2).")
            .arg(project->path(), project->settings().defaultLanguage));
    return ExitOk;
}

} // namespace fourfold::cli
