// fourfold-cli codebook: list the codebook's versions, add one from a JSON file, print the diff
// between two versions, and list annotations made under an older version (issue 7).

#include "app/cli/cli_output.h"
#include "core/project/codebook_versions.h"
#include "core/project/outdated_annotations.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

const QString kCommand = QStringLiteral("codebook");

std::optional<int> versionNumber(const QString &text)
{
    bool ok = false;
    const int n = text.trimmed().toInt(&ok);
    return ok && n >= 1 ? std::optional<int> {n} : std::nullopt;
}

} // namespace

int runCodebook(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption diff(QStringLiteral("diff"),
        CliText::tr(
            "Print what changed from version A to version B (\"--diff A B\" or \"--diff A,B\"; B "
            "defaults to the current version)."),
        QStringLiteral("A"));
    const QCommandLineOption update(QStringLiteral("update"),
        CliText::tr("Add the codebook in this JSON file as a new version (needs --note)."),
        QStringLiteral("FILE"));
    const QCommandLineOption note(QStringLiteral("note"),
        CliText::tr("With --update: what changed and why."), QStringLiteral("TEXT"));
    const QCommandLineOption by(QStringLiteral("by"),
        CliText::tr("With --update: the lead's pseudonym, recorded as the author."),
        QStringLiteral("LEAD"));
    const QCommandLineOption show(QStringLiteral("show"),
        CliText::tr("Print version N as JSON (the form --update reads)."), QStringLiteral("N"));
    const QCommandLineOption outdated(QStringLiteral("outdated"),
        CliText::tr("List the annotations made under an older version than the current one."));
    const QCommandLineOption json(QStringLiteral("json"), CliText::tr("Print the result as JSON."));
    parser.addOptions({diff, update, note, by, show, outdated, json});
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    if (int rc = parseCommandLine(parser, kCommand,
            CliText::tr(
                "Codebook versions: without options, list them; editing definitions, decision "
                "rules or attributes is recorded as a new version with --update."),
            arguments);
        rc >= 0)
        return rc;
    const QStringList positional = parser.positionalArguments();
    const int actions = (parser.isSet(diff) ? 1 : 0) + (parser.isSet(update) ? 1 : 0)
        + (parser.isSet(show) ? 1 : 0) + (parser.isSet(outdated) ? 1 : 0);
    if (actions > 1)
        return usageError(
            kCommand, CliText::tr("give at most one of --diff, --update, --show, --outdated."));
    // "--diff 1 2": the parser leaves the second number as a positional argument.
    const qsizetype expected = parser.isSet(diff) && positional.size() == 2 ? 2 : 1;
    if (positional.size() != expected)
        return usageError(kCommand, CliText::tr("expected exactly one project file."));

    std::optional<int> from;
    std::optional<int> to;
    if (parser.isSet(diff)) {
        QStringList parts = parser.value(diff).split(QLatin1Char(','));
        if (expected == 2)
            parts << positional[1];
        if (parts.size() > 2)
            return usageError(kCommand, CliText::tr("--diff takes two version numbers."));
        from = versionNumber(parts[0]);
        if (parts.size() == 2)
            to = versionNumber(parts[1]);
        if (!from || (parts.size() == 2 && !to))
            return usageError(kCommand,
                CliText::tr("--diff takes version numbers (1, 2, ...), not \"%1\".")
                    .arg(parts.join(QLatin1Char(' '))));
    }
    std::optional<int> showNumber;
    if (parser.isSet(show)) {
        showNumber = versionNumber(parser.value(show));
        if (!showNumber)
            return usageError(kCommand,
                CliText::tr("--show takes a version number (1, 2, ...), not \"%1\".")
                    .arg(parser.value(show)));
    }
    if (parser.isSet(update) && parser.value(note).trimmed().isEmpty())
        return usageError(
            kCommand, CliText::tr("--update needs --note saying what changed and why."));

    auto project = Project::open(positional.first());
    if (!project)
        return report(project.error());
    const bool asJson = parser.isSet(json);

    if (parser.isSet(update)) {
        CoderId author;
        if (parser.isSet(by)) {
            auto lead = project->coderByPseudonym(parser.value(by));
            if (!lead)
                return report(lead.error());
            if (!*lead)
                return report(Error {ErrorCode::NotFound,
                    CliText::tr("There is no coder \"%1\" in the project.").arg(parser.value(by)),
                    {}, {}, 0, 0});
            author = (*lead)->id;
        }
        auto before = project->codebook();
        if (!before)
            return report(before.error());
        auto added = CodebookVersions::addFromFile(
            *project, parser.value(update), parser.value(note), author);
        if (!added)
            return report(added.error());
        auto d = CodebookVersions::diffBetween(*project, before->number, added->number);
        if (!d)
            return report(d.error());
        if (asJson) {
            QJsonObject o = CodebookVersions::diffJson(*d);
            o.insert(QStringLiteral("version"), added->number);
            printJson(o);
        } else {
            out(CliText::tr("Codebook version %1 added.").arg(added->number));
            out(CodebookVersions::diffText(*d));
        }
        return ExitOk;
    }

    if (from) {
        if (!to) {
            auto current = project->codebook();
            if (!current)
                return report(current.error());
            to = current->number;
        }
        auto d = CodebookVersions::diffBetween(*project, *from, *to);
        if (!d)
            return report(d.error());
        if (asJson)
            printJson(CodebookVersions::diffJson(*d));
        else
            out(CodebookVersions::diffText(*d));
        return ExitOk;
    }

    if (showNumber) {
        auto book = CodebookVersions::version(*project, *showNumber);
        if (!book)
            return report(book.error());
        printJson(book->toJson());
        return ExitOk;
    }

    if (parser.isSet(outdated)) {
        auto list = OutdatedAnnotations::list(*project);
        if (!list)
            return report(list.error());
        if (asJson) {
            QJsonArray rows;
            for (const OutdatedAnnotation &a : *list)
                rows.append(QJsonObject {{QStringLiteral("annotation"), a.id.value},
                    {QStringLiteral("article"), a.article}, {QStringLiteral("coder"), a.coder},
                    {QStringLiteral("function"), functionKey(a.function)},
                    {QStringLiteral("phase"), phaseKey(a.phase)},
                    {QStringLiteral("version"), a.version},
                    {QStringLiteral("function_changed"), a.functionChanged}});
            printJson(QJsonObject {{QStringLiteral("outdated"), rows}});
            return ExitOk;
        }
        out(CliText::tr("%1 annotations were made under an older codebook version.")
                .arg(list->size()));
        for (const OutdatedAnnotation &a : *list)
            out(CliText::tr("  #%1  %2  %3  %4  version %5%6")
                    .arg(a.id.value)
                    .arg(a.article, -12)
                    .arg(a.coder, -6)
                    .arg(functionKey(a.function), -10)
                    .arg(a.version)
                    .arg(a.functionChanged ? CliText::tr("  (its function changed since: re-check)")
                                           : QString()));
        return ExitOk;
    }

    auto versions = CodebookVersions::list(*project);
    if (!versions)
        return report(versions.error());
    if (asJson) {
        QJsonArray rows;
        for (const CodebookVersionInfo &v : *versions)
            rows.append(QJsonObject {{QStringLiteral("number"), v.number},
                {QStringLiteral("created_at"), v.createdAt},
                {QStringLiteral("created_by"), v.createdBy}, {QStringLiteral("note"), v.note}});
        printJson(QJsonObject {{QStringLiteral("versions"), rows}});
        return ExitOk;
    }
    for (const CodebookVersionInfo &v : *versions)
        out(QStringLiteral("%1  %2  %3  %4")
                .arg(v.number, 3)
                .arg(v.createdAt)
                .arg(v.createdBy.isEmpty() ? QStringLiteral("—") : v.createdBy, -5)
                .arg(v.note));
    return ExitOk;
}

} // namespace fourfold::cli
