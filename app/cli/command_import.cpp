#include "app/cli/cli_output.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>

namespace fourfold::cli {

int runImport(const QStringList &arguments)
{
    const QString command = QStringLiteral("import");
    QCommandLineParser parser;
    const QCommandLineOption format(QStringLiteral("format"),
        QCoreApplication::translate("cli",
            "Read every file as txt, html, jsonl or csv (default: from each file's suffix)."),
        QStringLiteral("FORMAT"));
    const QCommandLineOption language(QStringLiteral("language"),
        QCoreApplication::translate(
            "cli", "Language (BCP 47 tag) of articles that name none (default: the project's)."),
        QStringLiteral("TAG"));
    const QCommandLineOption column(QStringLiteral("column"),
        QCoreApplication::translate("cli",
            "CSV: take FIELD (id, title, text, outlet, published, language) from the column "
            "HEADER. Repeatable."),
        QStringLiteral("FIELD=HEADER"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the report as JSON."));
    parser.addOptions({format, language, column, json});
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    parser.addPositionalArgument(QStringLiteral("FILE..."),
        QCoreApplication::translate("cli",
            "Files (or, for text, folders) to import. Each file is imported whole or not at all."));
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli", "Import articles into a project."), arguments);
        rc >= 0)
        return rc;
    const QStringList positional = parser.positionalArguments();
    if (positional.size() < 2)
        return usageError(command,
            QCoreApplication::translate(
                "cli", "expected a project file and at least one file to import."));

    ImportOptions options;
    if (parser.isSet(format)) {
        options.format = importFormatFromKey(parser.value(format));
        if (!options.format)
            return usageError(command,
                QCoreApplication::translate(
                    "cli", "unknown format \"%1\" (expected txt, html, jsonl or csv).")
                    .arg(parser.value(format)));
    }
    options.language = parser.value(language);
    for (const QString &mapping : parser.values(column)) {
        const qsizetype eq = mapping.indexOf(QLatin1Char('='));
        if (eq <= 0 || eq == mapping.size() - 1)
            return usageError(command,
                QCoreApplication::translate("cli", "--column expects FIELD=HEADER, got \"%1\".")
                    .arg(mapping));
        options.csvColumns.insert(mapping.left(eq), mapping.mid(eq + 1));
    }

    auto project = Project::open(positional.first());
    if (!project)
        return report(project.error());
    if (!project->backupPath().isEmpty())
        err(QCoreApplication::translate(
            "cli", "Upgraded the project file; the old version is kept as %1.")
                .arg(project->backupPath()));

    QJsonArray files;
    qint64 added = 0;
    for (const QString &file : positional.mid(1)) {
        auto result = project->importFile(file, options);
        if (!result) {
            if (added > 0)
                err(QCoreApplication::translate("cli",
                    "fourfold-cli: the %n article(s) imported before this file stay in the "
                    "project.",
                    nullptr, int(added)));
            return report(result.error());
        }
        added += qint64(result->added.size());
        QJsonArray skipped;
        for (const SkippedArticle &s : result->skipped)
            skipped.append(QJsonObject {{QStringLiteral("id"), s.externalId},
                {QStringLiteral("line"), s.line}, {QStringLiteral("reason"), s.reason}});
        files.append(QJsonObject {{QStringLiteral("file"), file},
            {QStringLiteral("added"), qint64(result->added.size())},
            {QStringLiteral("skipped"), skipped}});
        if (!parser.isSet(json)) {
            out(QCoreApplication::translate("cli", "%1: %2 added, %3 skipped")
                    .arg(file)
                    .arg(result->added.size())
                    .arg(result->skipped.size()));
            for (const SkippedArticle &s : result->skipped)
                out(QCoreApplication::translate("cli", "  line %1 (%2): skipped, %3")
                        .arg(s.line)
                        .arg(s.externalId, s.reason));
        }
    }
    if (parser.isSet(json))
        printJson(QJsonObject {
            {QStringLiteral("project"), project->path()}, {QStringLiteral("files"), files}});
    return ExitOk;
}

} // namespace fourfold::cli
