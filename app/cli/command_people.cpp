// fourfold-cli people: list, add, rename, disable and enable the people of a project, through
// the same core calls as the desk (core/project/people.h). Output names people by pseudonym
// only; their names stay in the project file. Passphrases come from a file or standard input,
// never from the command line (where other users of the machine could read them).

#include "app/cli/cli_output.h"
#include "app/cli/passphrase_input.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

QString stateText(const Coder &c, PassphraseState state)
{
    if (c.role != CoderRole::Lead)
        return QStringLiteral("-");
    return state == PassphraseState::Set      ? QStringLiteral("set")
        : state == PassphraseState::NotSetYet ? QStringLiteral("not-set")
                                              : QStringLiteral("-");
}

} // namespace

int runPeople(const QStringList &arguments)
{
    const QString command = QStringLiteral("people");
    QCommandLineParser parser;
    const QCommandLineOption list(QStringLiteral("list"),
        CliText::tr(
            "List everyone: pseudonym, role, enabled or disabled, and whether a lead's passphrase "
            "is set (names are not printed)."));
    const QCommandLineOption add(QStringLiteral("add"),
        CliText::tr(
            "Add a person with this name (kept in the project, never printed or exported)."),
        QStringLiteral("NAME"));
    const QCommandLineOption pseudonym(QStringLiteral("pseudonym"),
        CliText::tr(
            "The new person's pseudonym, unique in the project (the only name in exports)."),
        QStringLiteral("P"));
    const QCommandLineOption role(QStringLiteral("role"),
        CliText::tr("coder (the default) or lead."), QStringLiteral("ROLE"),
        QStringLiteral("coder"));
    const QCommandLineOption passphraseFile(QStringLiteral("passphrase-file"),
        CliText::tr(
            "A new lead's passphrase: the first line of FILE, or of standard input when FILE is "
            "-."),
        QStringLiteral("FILE"));
    const QCommandLineOption rename(QStringLiteral("rename"),
        CliText::tr("Give the person with pseudonym P the name NAME (the second argument)."),
        QStringLiteral("P"));
    const QCommandLineOption disable(QStringLiteral("disable"),
        CliText::tr("Disable the person with pseudonym P: their codings stay; they take no new "
                    "assignments and cannot be chosen on the desk."),
        QStringLiteral("P"));
    const QCommandLineOption enable(QStringLiteral("enable"),
        CliText::tr("Enable a disabled person again."), QStringLiteral("P"));
    const QCommandLineOption lead(QStringLiteral("lead"),
        CliText::tr("The lead making the change (needed once the project has a lead)."),
        QStringLiteral("L"));
    const QCommandLineOption leadPassphraseFile(QStringLiteral("lead-passphrase-file"),
        CliText::tr(
            "That lead's passphrase: the first line of FILE (- or left out: standard input)."),
        QStringLiteral("FILE"));
    const QCommandLineOption json(
        QStringLiteral("json"), CliText::tr("Print the list or the result as JSON."));
    for (const auto *o : {&list, &add, &pseudonym, &role, &passphraseFile, &rename, &disable,
             &enable, &lead, &leadPassphraseFile, &json})
        parser.addOption(*o);
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    parser.addPositionalArgument(
        QStringLiteral("NAME"), CliText::tr("The new name, with --rename."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "List and change the people of a project. Changes need a lead (--lead and its "
                "passphrase) once the project has one; each is logged. Output names people by "
                "pseudonym only."),
            arguments);
        rc >= 0)
        return rc;

    const int actions = int(parser.isSet(list)) + int(parser.isSet(add)) + int(parser.isSet(rename))
        + int(parser.isSet(disable)) + int(parser.isSet(enable));
    if (actions != 1)
        return usageError(command,
            CliText::tr("give exactly one of --list, --add, --rename, --disable and --enable."));
    const QStringList positional = parser.positionalArguments();
    if (positional.size() != (parser.isSet(rename) ? 2 : 1))
        return usageError(command,
            parser.isSet(rename) ? CliText::tr("expected the project file and the new name.")
                                 : CliText::tr("expected exactly one project file."));
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
    }
    const bool leadFromStdin = parser.isSet(lead)
        && (!parser.isSet(leadPassphraseFile)
            || parser.value(leadPassphraseFile) == QLatin1String("-"));
    if (leadFromStdin && parser.isSet(add) && parser.value(passphraseFile) == QLatin1String("-"))
        return usageError(command,
            CliText::tr(
                "only one passphrase can come from standard input; give the other in a file."));

    auto project = Project::open(positional.first());
    if (!project)
        return report(project.error());

    if (parser.isSet(list)) {
        auto people = People::list(*project);
        if (!people)
            return report(people.error());
        QJsonArray rows;
        for (const Coder &c : *people) {
            auto state = People::passphraseState(*project, c.pseudonym);
            if (!state)
                return report(state.error());
            rows.append(QJsonObject {{QStringLiteral("pseudonym"), c.pseudonym},
                {QStringLiteral("role"), coderRoleKey(c.role)},
                {QStringLiteral("disabled"), c.disabled},
                {QStringLiteral("passphrase"), stateText(c, *state)}});
            if (!parser.isSet(json))
                out(QStringLiteral("%1  %2  %3  %4")
                        .arg(c.pseudonym, -8)
                        .arg(coderRoleKey(c.role), -5)
                        .arg(c.disabled ? CliText::tr("disabled") : CliText::tr("enabled"), -8)
                        .arg(c.role == CoderRole::Lead ? (*state == PassphraseState::Set
                                     ? CliText::tr("passphrase set")
                                     : CliText::tr("no passphrase yet (set when first chosen)"))
                                                       : QString())
                        .trimmed());
        }
        if (parser.isSet(json))
            printJson(QJsonObject {{QStringLiteral("people"), rows}});
        return ExitOk;
    }

    // Who makes the change: a signed-in lead, or nobody while the project has no lead.
    std::optional<SignedIn> by;
    if (parser.isSet(lead)) {
        auto passphrase =
            readPassphrase(parser.isSet(leadPassphraseFile) ? parser.value(leadPassphraseFile)
                                                            : QStringLiteral("-"));
        if (!passphrase)
            return report(passphrase.error());
        auto in = People::signIn(*project, parser.value(lead), *passphrase);
        if (!in)
            return report(in.error());
        by = *in;
    } else {
        auto open = People::mayAddWithoutLead(*project);
        if (!open)
            return report(open.error());
        if (!*open || !parser.isSet(add))
            return usageError(command,
                CliText::tr(
                    "changing people needs a lead: name yourself with --lead L (your passphrase "
                    "on standard input or with --lead-passphrase-file FILE)."));
    }

    Result<std::unique_ptr<Edit>> edit = std::unexpected(Error {});
    QString done;
    QJsonObject result;
    if (parser.isSet(add)) {
        QString passphrase;
        if (*newRole == CoderRole::Lead) {
            auto read = readPassphrase(parser.value(passphraseFile));
            if (!read)
                return report(read.error());
            passphrase = *read;
        }
        const QString p = parser.value(pseudonym).trimmed();
        edit = People::add(
            *project, by ? &*by : nullptr, {parser.value(add), p, *newRole, passphrase});
        done = CliText::tr("Added %1 (%2).").arg(p, coderRoleKey(*newRole));
        result = {{QStringLiteral("added"), p}, {QStringLiteral("role"), coderRoleKey(*newRole)}};
    } else if (parser.isSet(rename)) {
        edit = People::rename(*project, *by, parser.value(rename), positional.at(1));
        done = CliText::tr("Renamed %1.").arg(parser.value(rename).trimmed());
        result = {{QStringLiteral("renamed"), parser.value(rename).trimmed()}};
    } else {
        const bool off = parser.isSet(disable);
        const QString p = (off ? parser.value(disable) : parser.value(enable)).trimmed();
        edit = People::setDisabled(*project, *by, p, off);
        done = off
            ? CliText::tr("Disabled %1: their codings stay; they take no new assignments.").arg(p)
            : CliText::tr("Enabled %1.").arg(p);
        result = {{off ? QStringLiteral("disabled") : QStringLiteral("enabled"), p}};
    }
    if (!edit)
        return report(edit.error());
    if (auto st = project->apply(**edit); !st)
        return report(st.error());
    if (parser.isSet(json))
        printJson(result);
    else
        out(done);
    return ExitOk;
}

} // namespace fourfold::cli
