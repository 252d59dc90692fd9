#include "app/cli/cli_output.h"
#include "core/project/coder_copies.h"
#include "core/project/project.h"

#include <QCoreApplication>

namespace fourfold::cli {

int runHandout(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption coder(QStringLiteral("coder"),
        QCoreApplication::translate(
            "cli", "The coder the copy is for: pseudonym (preferred) or name."),
        QStringLiteral("NAME"));
    const QCommandLineOption outFile(QStringLiteral("out"),
        QCoreApplication::translate("cli", "The coder copy to write (a new file)."),
        QStringLiteral("FILE"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOption(coder);
    parser.addOption(outFile);
    parser.addOption(json);
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    if (int rc = parseCommandLine(parser, QStringLiteral("handout"),
            QCoreApplication::translate("cli",
                "Write a coder copy: a project file holding only the articles assigned to the "
                "coder, the codebook and the coder's own annotations, links and answers, never "
                "another coder's. The coder codes in it with the same program; merge it back "
                "with \"fourfold-cli merge\"."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(QStringLiteral("handout"),
            QCoreApplication::translate("cli", "expected exactly one project file."));
    if (!parser.isSet(coder) || parser.value(coder).trimmed().isEmpty())
        return usageError(QStringLiteral("handout"),
            QCoreApplication::translate("cli", "name the coder with --coder NAME."));
    if (!parser.isSet(outFile) || parser.value(outFile).isEmpty())
        return usageError(QStringLiteral("handout"),
            QCoreApplication::translate("cli", "name the copy to write with --out FILE."));

    auto project = Project::open(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto result =
        CoderCopies::handout(*project, parser.value(coder).trimmed(), parser.value(outFile));
    if (!result)
        return report(result.error());

    if (parser.isSet(json)) {
        printJson(QJsonObject {{QStringLiteral("file"), result->path},
            {QStringLiteral("copy"), result->copyUuid},
            {QStringLiteral("coder"), result->coder.pseudonym},
            {QStringLiteral("articles"), result->articles},
            {QStringLiteral("assignments"), result->assignments},
            {QStringLiteral("annotations"), result->annotations},
            {QStringLiteral("links"), result->links},
            {QStringLiteral("judgements"), result->judgements}});
        return ExitOk;
    }
    out(QCoreApplication::translate("cli", "Wrote the coder copy %1 for %2 (copy %3).")
            .arg(result->path, result->coder.pseudonym, result->copyUuid));
    out(QCoreApplication::translate(
        "cli", "It holds %1 articles, %2 annotations, %3 links and %4 article judgements.")
            .arg(result->articles)
            .arg(result->annotations)
            .arg(result->links)
            .arg(result->judgements));
    return ExitOk;
}

} // namespace fourfold::cli
