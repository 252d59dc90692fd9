// fourfold-cli team people: add a person to a running team project, or disable and enable one,
// through the administrator's login that may create roles (core/team: TeamProject::addPerson,
// setPersonDisabled). Output names people by pseudonym only.

#include "app/cli/cli_output.h"
#include "app/cli/passphrase_input.h"
#include "core/project/people.h"
#include "core/project/project.h"
#include "core/team/team_project.h"

#include <QCoreApplication>
#include <QFileInfo>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

} // namespace

int runTeamPeople(const QStringList &arguments)
{
    const QString command = QStringLiteral("team people");
    QCommandLineParser parser;
    const QCommandLineOption add(QStringLiteral("add"),
        CliText::tr("Add a person with this name (kept in the project files, never printed)."),
        QStringLiteral("NAME"));
    const QCommandLineOption pseudonym(QStringLiteral("pseudonym"),
        CliText::tr("The new person's pseudonym, unique in the project."), QStringLiteral("P"));
    const QCommandLineOption role(QStringLiteral("role"),
        CliText::tr("coder (the default) or lead."), QStringLiteral("ROLE"),
        QStringLiteral("coder"));
    const QCommandLineOption passphraseFile(QStringLiteral("passphrase-file"),
        CliText::tr(
            "A new lead's passphrase for the desk: the first line of FILE (- for standard input)."),
        QStringLiteral("FILE"));
    const QCommandLineOption disable(QStringLiteral("disable"),
        CliText::tr("Disable the person with pseudonym P: their codings stay; their login may no "
                    "longer reach the server."),
        QStringLiteral("P"));
    const QCommandLineOption enable(QStringLiteral("enable"),
        CliText::tr("Enable a disabled person again."), QStringLiteral("P"));
    const QCommandLineOption lead(QStringLiteral("lead"),
        CliText::tr("The lead making the change (your pseudonym in the working file)."),
        QStringLiteral("L"));
    const QCommandLineOption leadPassphraseFile(QStringLiteral("lead-passphrase-file"),
        CliText::tr(
            "That lead's passphrase: the first line of FILE (- or left out: standard input)."),
        QStringLiteral("FILE"));
    const QCommandLineOption server(QStringLiteral("server"),
        CliText::tr("The administrator's login that may create roles, as a libpq connection "
                    "string or URI (default: the working file's server); its password comes "
                    "from ~/.pgpass, PGPASSFILE or PGPASSWORD."),
        QStringLiteral("URL"));
    const QCommandLineOption credentials(QStringLiteral("credentials-out"),
        CliText::tr("The folder for a new person's password file (default: FILE.credentials "
                    "beside the working file; created private if new)."),
        QStringLiteral("DIR"));
    const QCommandLineOption json(QStringLiteral("json"), CliText::tr("Print the result as JSON."));
    parser.addOptions({add, pseudonym, role, passphraseFile, disable, enable, lead,
        leadPassphraseFile, server, credentials, json});
    parser.addPositionalArgument(
        QStringLiteral("FILE"), CliText::tr("The lead's working file of the team project."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr("Add a person to a running team project (in the working file, on the "
                        "server and as a login role with its own password file), or disable or "
                        "enable one. Needs a lead of the project and the administrator's login."),
            arguments);
        rc >= 0)
        return rc;

    const int actions =
        int(parser.isSet(add)) + int(parser.isSet(disable)) + int(parser.isSet(enable));
    if (actions != 1)
        return usageError(
            command, CliText::tr("give exactly one of --add, --disable and --enable."));
    if (parser.positionalArguments().size() != 1)
        return usageError(command, CliText::tr("expected exactly one working file."));
    if (!parser.isSet(lead))
        return usageError(command,
            CliText::tr("changing people needs a lead: name yourself with --lead L (your "
                        "passphrase on standard input or with --lead-passphrase-file FILE)."));
    std::optional<CoderRole> newRole;
    if (parser.isSet(add)) {
        newRole = coderRoleFromKey(parser.value(role));
        if (!newRole)
            return usageError(command,
                CliText::tr("--role takes coder or lead, not \"%1\".").arg(parser.value(role)));
        if (!parser.isSet(pseudonym))
            return usageError(
                command, CliText::tr("name the new person's pseudonym with --pseudonym."));
        if (*newRole == CoderRole::Lead && !parser.isSet(passphraseFile))
            return usageError(command,
                CliText::tr("a lead needs a passphrase: give it with --passphrase-file FILE (- for "
                            "standard input)."));
        const bool leadFromStdin = !parser.isSet(leadPassphraseFile)
            || parser.value(leadPassphraseFile) == QLatin1String("-");
        if (leadFromStdin && parser.value(passphraseFile) == QLatin1String("-"))
            return usageError(command,
                CliText::tr(
                    "only one passphrase can come from standard input; give the other in a file."));
    }

    const QString path = parser.positionalArguments().first();
    auto project = Project::open(path);
    if (!project)
        return report(project.error());
    // A file that is no team working file is refused before anyone signs in (signing in
    // sets a first passphrase).
    if (auto team = TeamProject::status(*project); !team)
        return report(team.error());
    auto passphrase = readPassphrase(
        parser.isSet(leadPassphraseFile) ? parser.value(leadPassphraseFile) : QStringLiteral("-"));
    if (!passphrase)
        return report(passphrase.error());
    auto by = People::signIn(*project, parser.value(lead), *passphrase);
    if (!by)
        return report(by.error());

    Result<TeamPersonReport> result = std::unexpected(Error {});
    if (parser.isSet(add)) {
        QString newPassphrase;
        if (*newRole == CoderRole::Lead) {
            auto read = readPassphrase(parser.value(passphraseFile));
            if (!read)
                return report(read.error());
            newPassphrase = *read;
        }
        const QString dir = parser.isSet(credentials)
            ? parser.value(credentials)
            : QFileInfo(path).absoluteFilePath() + QStringLiteral(".credentials");
        result = TeamProject::addPerson(*project, *by,
            {parser.value(add), parser.value(pseudonym).trimmed(), *newRole, newPassphrase}, dir,
            parser.value(server));
    } else {
        const bool disabling = parser.isSet(disable);
        result = TeamProject::setPersonDisabled(*project, *by,
            parser.value(disabling ? disable : enable), disabling, parser.value(server));
    }
    if (!result)
        return report(result.error());

    if (parser.isSet(json)) {
        QJsonObject o {{QStringLiteral("pseudonym"), result->pseudonym},
            {QStringLiteral("login_role"), result->role}, {QStringLiteral("lead"), result->lead},
            {QStringLiteral("login_allowed"), result->loginAllowed}};
        if (!result->passwordFile.isEmpty())
            o.insert(QStringLiteral("password_file"), result->passwordFile);
        printJson(o);
        return ExitOk;
    }
    if (parser.isSet(add))
        out(CliText::tr("Added %1 with the login %2; the password is in %3 (hand it to them "
                        "alone).")
                .arg(result->pseudonym, result->role, result->passwordFile));
    else if (result->loginAllowed)
        out(CliText::tr("Enabled %1: the login %2 may log in again.")
                .arg(result->pseudonym, result->role));
    else
        out(CliText::tr("Disabled %1: the login %2 may no longer log in; their codings stay.")
                .arg(result->pseudonym, result->role));
    return ExitOk;
}

} // namespace fourfold::cli
