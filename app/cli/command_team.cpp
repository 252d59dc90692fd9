// fourfold-cli team: team projects on a PostgreSQL server (core/team): publish, join, sync.

#include "app/cli/cli_output.h"
#include "core/project/project.h"
#include "core/team/team_project.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QJsonArray>

namespace fourfold::cli {

namespace {

int runTeamPublish(const QStringList &arguments)
{
    const QString command = QStringLiteral("team publish");
    QCommandLineParser parser;
    const QCommandLineOption server(QStringLiteral("server"),
        QCoreApplication::translate("cli",
            "The empty database to publish into, as a libpq connection string or URI "
            "(postgresql://ADMIN@HOST/DATABASE). Its login must own the database and may create "
            "roles; its password comes from ~/.pgpass, PGPASSFILE or PGPASSWORD."),
        QStringLiteral("URL"));
    const QCommandLineOption credentials(QStringLiteral("credentials-out"),
        QCoreApplication::translate("cli",
            "The new (or empty) folder for the people's password files, one "
            "PSEUDONYM.pgpass each (default: PROJECT.credentials beside the project)."),
        QStringLiteral("DIR"));
    const QCommandLineOption as(QStringLiteral("as"),
        QCoreApplication::translate(
            "cli", "The lead whose working file the project becomes (needed with several leads)."),
        QStringLiteral("PSEUDONYM"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOptions({server, credentials, as, json});
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli",
                "Create the team project of PROJECT on a PostgreSQL server: the schema, one "
                "login role per person with a random password (written to a password file per "
                "person), the row-level security that keeps coders blind, and every shared row. "
                "No password is stored in the project file."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(
            command, QCoreApplication::translate("cli", "expected exactly one project file."));
    if (!parser.isSet(server) || parser.value(server).trimmed().isEmpty())
        return usageError(
            command, QCoreApplication::translate("cli", "name the database with --server URL."));
    const QString path = parser.positionalArguments().first();
    const QString dir = parser.isSet(credentials) ? parser.value(credentials)
                                                  : path + QStringLiteral(".credentials");

    auto project = Project::open(path);
    if (!project)
        return report(project.error());
    auto result = TeamProject::publish(*project, parser.value(server), dir, parser.value(as));
    if (!result)
        return report(result.error());

    if (parser.isSet(json)) {
        QJsonArray logins;
        for (const TeamLogin &l : result->logins)
            logins.append(QJsonObject {{QStringLiteral("pseudonym"), l.pseudonym},
                {QStringLiteral("role"), l.role}, {QStringLiteral("lead"), l.lead},
                {QStringLiteral("file"), l.passwordFile}});
        printJson(QJsonObject {{QStringLiteral("server"), result->server},
            {QStringLiteral("schema_version"), result->schemaVersion},
            {QStringLiteral("credentials"), result->credentialsDir},
            {QStringLiteral("logins"), logins}, {QStringLiteral("people"), result->people},
            {QStringLiteral("articles"), result->articles},
            {QStringLiteral("codebook_versions"), result->codebookVersions},
            {QStringLiteral("assignments"), result->assignments},
            {QStringLiteral("annotations"), result->annotations},
            {QStringLiteral("links"), result->links},
            {QStringLiteral("judgements"), result->judgements},
            {QStringLiteral("gold"), result->gold}, {QStringLiteral("events"), result->events}});
        return ExitOk;
    }
    out(QCoreApplication::translate("cli",
        "Published %1 to %2 (server schema version %3): %4 articles, %5 annotations, %6 links, "
        "%7 article judgements, %8 gold decisions, %9 events.")
            .arg(QFileInfo(path).fileName(), result->server)
            .arg(result->schemaVersion)
            .arg(result->articles)
            .arg(result->annotations)
            .arg(result->links)
            .arg(result->judgements)
            .arg(result->gold)
            .arg(result->events));
    out(QCoreApplication::translate("cli",
        "One login per person; hand each person their own password file (mode 0600) and nothing "
        "else:"));
    for (const TeamLogin &l : result->logins)
        out(QStringLiteral("  %1  %2  %3%4")
                .arg(l.pseudonym, -8)
                .arg(l.role, l.passwordFile)
                .arg(l.lead ? QCoreApplication::translate("cli", "  (lead)") : QString()));
    return ExitOk;
}

int runTeamJoin(const QStringList &arguments)
{
    const QString command = QStringLiteral("team join");
    QCommandLineParser parser;
    const QCommandLineOption as(QStringLiteral("as"),
        QCoreApplication::translate("cli", "Your pseudonym in the team project."),
        QStringLiteral("PSEUDONYM"));
    const QCommandLineOption outFile(QStringLiteral("out"),
        QCoreApplication::translate("cli", "The working file to write (a new file)."),
        QStringLiteral("FILE"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOptions({as, outFile, json});
    parser.addPositionalArgument(QStringLiteral("URL"),
        QCoreApplication::translate("cli",
            "The team project's database with your login role, as a libpq connection string or "
            "URI (postgresql://ROLE@HOST/DATABASE); the password from your password file "
            "(PGPASSFILE=PSEUDONYM.pgpass or ~/.pgpass)."));
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli",
                "Write your working file of a team project: what your login role may read on the "
                "server (for a coder: the codebook, your articles and your own codings)."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(
            command, QCoreApplication::translate("cli", "expected exactly one server URL."));
    if (!parser.isSet(as) || parser.value(as).trimmed().isEmpty())
        return usageError(
            command, QCoreApplication::translate("cli", "name yourself with --as PSEUDONYM."));
    if (!parser.isSet(outFile) || parser.value(outFile).isEmpty())
        return usageError(
            command, QCoreApplication::translate("cli", "name the working file with --out FILE."));
    auto result = TeamProject::join(
        parser.positionalArguments().first(), parser.value(as).trimmed(), parser.value(outFile));
    if (!result)
        return report(result.error());
    if (parser.isSet(json)) {
        printJson(QJsonObject {{QStringLiteral("file"), result->path},
            {QStringLiteral("server"), result->server},
            {QStringLiteral("pseudonym"), result->pseudonym},
            {QStringLiteral("lead"), result->lead},
            {QStringLiteral("last_change"), result->lastChange},
            {QStringLiteral("people"), result->people},
            {QStringLiteral("articles"), result->articles},
            {QStringLiteral("assignments"), result->assignments},
            {QStringLiteral("annotations"), result->annotations},
            {QStringLiteral("links"), result->links},
            {QStringLiteral("judgements"), result->judgements},
            {QStringLiteral("gold"), result->gold}});
        return ExitOk;
    }
    out(QCoreApplication::translate("cli",
        "Wrote %1, the working file of %2 from %3: %4 articles, %5 annotations, %6 links, %7 "
        "article judgements (through change %8).")
            .arg(result->path, result->pseudonym, result->server)
            .arg(result->articles)
            .arg(result->annotations)
            .arg(result->links)
            .arg(result->judgements)
            .arg(result->lastChange));
    return ExitOk;
}

int runTeamSync(const QStringList &arguments)
{
    const QString command = QStringLiteral("team sync");
    QCommandLineParser parser;
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOption(json);
    parser.addPositionalArgument(
        QStringLiteral("FILE"), QCoreApplication::translate("cli", "Your team working file."));
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli",
                "Push your changed codings to the team project's server and pull the ones you "
                "may see, once (assignments, spans, links, answers; coding time adds up). An "
                "object changed on both sides keeps the later version and is listed as a "
                "conflict for the lead."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(
            command, QCoreApplication::translate("cli", "expected exactly one working file."));
    auto project = Project::open(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto result = TeamProject::sync(*project);
    if (!result)
        return report(result.error());
    if (parser.isSet(json)) {
        printJson(QJsonObject {{QStringLiteral("server"), result->server},
            {QStringLiteral("pushed"), result->pushed}, {QStringLiteral("pulled"), result->pulled},
            {QStringLiteral("conflicts"), result->conflicts},
            {QStringLiteral("events"), result->events},
            {QStringLiteral("last_change"), result->lastChange}});
        return ExitOk;
    }
    out(QCoreApplication::translate(
        "cli", "Synced with %1: %2 sent, %3 received, %4 conflicts (through change %5).")
            .arg(result->server)
            .arg(result->pushed)
            .arg(result->pulled)
            .arg(result->conflicts)
            .arg(result->lastChange));
    return ExitOk;
}

int runTeamStatus(const QStringList &arguments)
{
    const QString command = QStringLiteral("team status");
    QCommandLineParser parser;
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOption(json);
    parser.addPositionalArgument(
        QStringLiteral("FILE"), QCoreApplication::translate("cli", "Your team working file."));
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli",
                "Show a working file's team project: its server, whose file it is, when it last "
                "synced and what the next sync would send. Reads the file only (works offline)."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(
            command, QCoreApplication::translate("cli", "expected exactly one working file."));
    auto project = Project::openForReading(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto result = TeamProject::status(*project);
    if (!result)
        return report(result.error());
    if (parser.isSet(json)) {
        QJsonObject byType;
        for (auto it = result->waitingByType.cbegin(); it != result->waitingByType.cend(); ++it)
            byType.insert(it.key(), it.value());
        printJson(QJsonObject {{QStringLiteral("server"), result->server},
            {QStringLiteral("pseudonym"), result->pseudonym},
            {QStringLiteral("lead"), result->lead},
            {QStringLiteral("last_change"), result->lastChange},
            {QStringLiteral("last_sync"),
                result->lastSync.isEmpty() ? QJsonValue() : QJsonValue(result->lastSync)},
            {QStringLiteral("waiting"), result->waiting},
            {QStringLiteral("waiting_by_type"), byType},
            {QStringLiteral("open_conflicts"), result->openConflicts}});
        return ExitOk;
    }
    out(QCoreApplication::translate("cli", "Working file of %1 (%2) on %3, through change %4.")
            .arg(result->pseudonym,
                result->lead ? QCoreApplication::translate("cli", "lead")
                             : QCoreApplication::translate("cli", "coder"),
                result->server)
            .arg(result->lastChange));
    out(result->lastSync.isEmpty()
            ? QCoreApplication::translate("cli", "Not synced since it was made.")
            : QCoreApplication::translate("cli", "Last synced %1.").arg(result->lastSync));
    QStringList parts;
    for (auto it = result->waitingByType.cbegin(); it != result->waitingByType.cend(); ++it)
        parts << QStringLiteral("%1 %2").arg(it.value()).arg(it.key());
    out(result->waiting == 0
            ? QCoreApplication::translate("cli", "Nothing waiting to be sent.")
            : QCoreApplication::translate(
                "cli", "%n change(s) waiting to be sent (%1).", nullptr, int(result->waiting))
                  .arg(parts.join(QStringLiteral(", "))));
    if (result->openConflicts > 0)
        out(QCoreApplication::translate("cli", "%n conflict(s) from syncs wait for the lead.",
            nullptr, int(result->openConflicts)));
    return ExitOk;
}

} // namespace

int runTeamUpgrade(const QStringList &arguments)
{
    const QString command = QStringLiteral("team upgrade");
    QCommandLineParser parser;
    const QCommandLineOption server(QStringLiteral("server"),
        QCoreApplication::translate("cli",
            "The login that owns the team project's schema, as a libpq connection string: the "
            "administrator who published it."),
        QStringLiteral("CONNECTION"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    parser.addOptions({server, json});
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli",
                "Bring a team project's server to the schema this version of Fourfold works "
                "with, in one transaction (a project published by an older version: its syncs "
                "and joins are refused until then)."),
            arguments);
        rc >= 0)
        return rc;
    if (!parser.positionalArguments().isEmpty() || !parser.isSet(server))
        return usageError(command,
            QCoreApplication::translate("cli", "expected --server and no other argument."));
    auto result = TeamProject::upgradeServer(parser.value(server));
    if (!result)
        return report(result.error());
    if (parser.isSet(json)) {
        printJson(QJsonObject {{QStringLiteral("server"), result->server},
            {QStringLiteral("from"), result->from}, {QStringLiteral("to"), result->to}});
        return ExitOk;
    }
    out(result->from == result->to
            ? QCoreApplication::translate(
                "cli", "The team project on %1 has server schema version %2 already.")
                  .arg(result->server)
                  .arg(result->to)
            : QCoreApplication::translate(
                "cli", "Upgraded the team project on %1 from server schema version %2 to %3.")
                  .arg(result->server)
                  .arg(result->from)
                  .arg(result->to));
    return ExitOk;
}

int runTeam(const QStringList &arguments)
{
    const QString sub = arguments.size() > 1 ? arguments.at(1) : QString();
    if (sub == QLatin1String("publish"))
        return runTeamPublish(arguments.mid(1));
    if (sub == QLatin1String("join"))
        return runTeamJoin(arguments.mid(1));
    if (sub == QLatin1String("sync"))
        return runTeamSync(arguments.mid(1));
    if (sub == QLatin1String("status"))
        return runTeamStatus(arguments.mid(1));
    if (sub == QLatin1String("people"))
        return runTeamPeople(arguments.mid(1));
    if (sub == QLatin1String("upgrade"))
        return runTeamUpgrade(arguments.mid(1));
    if (sub.isEmpty() || sub == QLatin1String("--help") || sub == QLatin1String("-h")) {
        out(QCoreApplication::translate("cli", "Usage: fourfold-cli team SUBCOMMAND [options]"));
        out(QCoreApplication::translate("cli",
            "  publish   Create the team project of a project file on a PostgreSQL server."));
        out(QCoreApplication::translate(
            "cli", "  join      Write your working file of a team project from its server."));
        out(QCoreApplication::translate(
            "cli", "  sync      Push and pull a working file's codings once."));
        out(QCoreApplication::translate(
            "cli", "  status    What a working file last synced and what waits to be sent."));
        out(QCoreApplication::translate(
            "cli", "  people    Add a person to a running team project, or disable one."));
        out(QCoreApplication::translate(
            "cli", "  upgrade   Bring a team project's server to this version's schema."));
        return sub.isEmpty() ? ExitUsage : ExitOk;
    }
    return usageError(QStringLiteral("team"),
        QCoreApplication::translate("cli", "unknown subcommand \"%1\".").arg(sub));
}

} // namespace fourfold::cli
