// TeamProject::addPerson and setPersonDisabled: people of a running team project, in the lead's
// working file and on the server at once.

#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"
#include "core/store/project_tables.h"
#include "core/store/shared_rows.h"
#include "core/team/server_store_connection.h"
#include "core/team/server_store_roles.h"
#include "core/team/server_store_rows.h"
#include "core/team/team_password_files.h"
#include "core/team/team_project.h"
#include "core/team/team_shared_sync.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct TeamPeopleText {
    Q_DECLARE_TR_FUNCTIONS(TeamPeopleText)
};

// The working file's server, or `admin` when given.
Result<QString> serverOf(const Database &db, const QString &path, const QString &admin)
{
    auto server = store::setting(db, TeamProject::serverSettingKey());
    if (!server)
        return std::unexpected(server.error());
    if (!server->has_value())
        return fail(ErrorCode::InvalidArgument,
            TeamPeopleText::tr("%1 is not a team working file (made by team publish or team join).")
                .arg(path));
    return admin.isEmpty() ? **server : admin;
}

// A refusal to change roles said in the terms of the task.
Error asRoleRefusal(Error e, const ServerConnection &conn)
{
    if (e.code == ErrorCode::NotAllowed)
        e.message = TeamPeopleText::tr(
            "The login %1 may not create or change login roles. Adding or disabling a person "
            "needs the administrator's login that published the team project (give it with "
            "--server).")
                        .arg(conn.describe());
    return e;
}

// Sends the person row of `uuid` as the file holds it and records it as synced.
Status sendPerson(Database &db, ServerConnection &conn, const QString &uuid)
{
    auto rows = store::sharedRowsOf(db, store::SharedKind::Person, {uuid});
    if (!rows)
        return std::unexpected(rows.error());
    FOURFOLD_TRY_STATUS(upsertServerObjects(conn, ServerTable::Person, *rows));
    return recordSharedBase(db, store::SharedKind::Person, uuid);
}

} // namespace

Result<TeamPersonReport> TeamProject::addPerson(Project &project, const SignedIn &by,
    const NewPerson &person, const QString &credentialsDir, const QString &admin)
{
    auto server = serverOf(project.db(), project.path(), admin);
    if (!server)
        return std::unexpected(server.error());
    auto edit = People::add(project, &by, person);
    if (!edit)
        return std::unexpected(edit.error());
    auto conn = ServerConnection::open(*server);
    if (!conn)
        return std::unexpected(conn.error());

    TeamPersonReport report;
    report.pseudonym = person.pseudonym;
    report.role = personRole(conn->database(), person.pseudonym);
    report.lead = person.role == CoderRole::Lead;
    const QString dir = QFileInfo(credentialsDir).absoluteFilePath();
    report.passwordFile = QDir(dir).filePath(passwordFileName(person.pseudonym, report.role));
    if (QFileInfo::exists(report.passwordFile) || QFileInfo(report.passwordFile).isSymLink())
        return fail(ErrorCode::Duplicate,
            TeamPeopleText::tr("%1 exists already; a new person's password file needs a new name.")
                .arg(report.passwordFile));
    bool createdDir = false;
    FOURFOLD_TRY_STATUS(prepareCredentialsDir(dir, &createdDir, true));
    bool wroteFile = false;
    auto undoFiles = [&] {
        if (wroteFile)
            QFile::remove(report.passwordFile);
        if (createdDir)
            QDir().rmdir(dir);
    };

    // The file and the server in one go: the file's transaction commits only after the server's.
    const Status done = project.batch([&]() -> Status {
        FOURFOLD_TRY_STATUS(project.applyInBatch(**edit));
        auto added = project.coderByPseudonym(person.pseudonym);
        if (!added)
            return std::unexpected(added.error());
        if (!added->has_value())
            return fail(ErrorCode::Internal, QStringLiteral("the new person is not in the file"));
        FOURFOLD_TRY_STATUS(conn->exec(QStringLiteral("BEGIN")));
        auto onServer = [&]() -> Status {
            FOURFOLD_TRY_STATUS(sendPerson(project.db(), *conn, (*added)->uuid));
            const QString password = newPassword();
            const QString line = QStringLiteral("%1:%2:%3:%4:%5\n")
                                     .arg(pgpassField(conn->host()), pgpassField(conn->port()),
                                         pgpassField(conn->database()), pgpassField(report.role),
                                         pgpassField(password));
            FOURFOLD_TRY_STATUS(writePrivateFile(report.passwordFile, line.toUtf8()));
            wroteFile = true;
            auto verifier = conn->passwordVerifier(report.role, password);
            if (!verifier)
                return std::unexpected(verifier.error());
            if (auto st = createPersonLogin(*conn, report.role, *verifier,
                    teamGroupRole(conn->database()), (*added)->uuid, report.lead);
                !st)
                return std::unexpected(asRoleRefusal(st.error(), *conn));
            return conn->exec(QStringLiteral("COMMIT"));
        };
        if (auto st = onServer(); !st) {
            (void)conn->exec(QStringLiteral("ROLLBACK"));
            return st;
        }
        return {};
    });
    if (!done) {
        undoFiles();
        return std::unexpected(done.error());
    }
    return report;
}

Result<TeamPersonReport> TeamProject::setPersonDisabled(Project &project, const SignedIn &by,
    const QString &pseudonym, bool disabled, const QString &admin)
{
    auto server = serverOf(project.db(), project.path(), admin);
    if (!server)
        return std::unexpected(server.error());
    auto edit = People::setDisabled(project, by, pseudonym, disabled);
    if (!edit)
        return std::unexpected(edit.error());
    auto person = project.coderByPseudonym(pseudonym);
    if (!person)
        return std::unexpected(person.error());
    auto conn = ServerConnection::open(*server);
    if (!conn)
        return std::unexpected(conn.error());
    TeamPersonReport report;
    report.pseudonym = pseudonym;
    report.lead = (*person)->role == CoderRole::Lead;
    report.loginAllowed = !disabled;

    const Status done = project.batch([&]() -> Status {
        FOURFOLD_TRY_STATUS(project.applyInBatch(**edit));
        FOURFOLD_TRY_STATUS(conn->exec(QStringLiteral("BEGIN")));
        auto onServer = [&]() -> Status {
            FOURFOLD_TRY_STATUS(sendPerson(project.db(), *conn, (*person)->uuid));
            auto role = loginRoleOf(*conn, (*person)->uuid);
            if (!role)
                return std::unexpected(role.error());
            report.role = *role;
            if (auto st = setLoginAllowed(*conn, *role, !disabled); !st)
                return std::unexpected(asRoleRefusal(st.error(), *conn));
            return conn->exec(QStringLiteral("COMMIT"));
        };
        if (auto st = onServer(); !st) {
            (void)conn->exec(QStringLiteral("ROLLBACK"));
            return st;
        }
        return {};
    });
    if (!done)
        return std::unexpected(done.error());
    return report;
}

} // namespace fourfold
