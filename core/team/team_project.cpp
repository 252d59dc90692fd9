#include "core/team/team_project.h"

#include "core/project/coder_copies.h"
#include "core/project/project.h"
#include "core/store/coder_table.h"
#include "core/store/copy_tables.h"
#include "core/store/database.h"
#include "core/store/project_tables.h"
#include "core/store/shared_rows.h"
#include "core/store/store_util.h"
#include "core/team/server_store_connection.h"
#include "core/team/server_store_roles.h"
#include "core/team/server_store_rows.h"
#include "core/team/server_store_schema.h"
#include "core/team/team_password_files.h"
#include "core/team/team_rows.h"
#include "core/team/team_shared_sync.h"

#include <QCoreApplication>
#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QHash>
#include <QSaveFile>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct TeamProjectText {
    Q_DECLARE_TR_FUNCTIONS(TeamProjectText)
};

// Rows go to the server in batches: one statement per table and about a megabyte of JSON.
class RowBatch
{
public:
    explicit RowBatch(ServerConnection &conn)
        : m_conn(conn)
    { }

    Status add(ServerTable table, QByteArray json)
    {
        if (!m_rows.isEmpty() && table != m_table)
            FOURFOLD_TRY_STATUS(flush());
        m_table = table;
        m_bytes += json.size();
        m_rows.push_back(std::move(json));
        if (m_bytes > (1 << 20) || m_rows.size() >= 2000)
            return flush();
        return {};
    }

    Status flush()
    {
        if (m_rows.isEmpty())
            return {};
        auto st = insertServerRows(m_conn, m_table, m_rows);
        m_rows.clear();
        m_bytes = 0;
        return st;
    }

private:
    ServerConnection &m_conn;
    ServerTable m_table = ServerTable::Person;
    QByteArrayList m_rows;
    qint64 m_bytes = 0;
};

struct PlannedLogin {
    Coder person;
    QString role;
    QString password;
    QString file;
};

} // namespace

Result<PublishReport> TeamProject::publish(Project &project, const QString &server,
    const QString &credentialsDir, const QString &leadPseudonym)
{
    auto copy = CoderCopies::copyInfo(project);
    if (!copy)
        return std::unexpected(copy.error());
    if (*copy)
        return fail(ErrorCode::Unsupported,
            TeamProjectText::tr("%1 is a coder copy; publish the main project.")
                .arg(project.path()));
    auto people = store::coders(project.db());
    if (!people)
        return std::unexpected(people.error());
    if (people->empty())
        return fail(ErrorCode::InvalidArgument,
            TeamProjectText::tr(
                "%1 has no people; add the lead and the coders before publishing it.")
                .arg(project.path()));
    QStringList leads;
    for (const Coder &c : *people)
        if (c.role == CoderRole::Lead)
            leads << c.pseudonym;
    QString lead = leadPseudonym;
    if (lead.isEmpty() && leads.size() == 1)
        lead = leads.first();
    if (!leads.contains(lead))
        return fail(ErrorCode::InvalidArgument,
            lead.isEmpty()
                ? TeamProjectText::tr("%1 has several leads (%2); name the one publishing it.")
                      .arg(project.path(), leads.join(QStringLiteral(", ")))
                : TeamProjectText::tr("%1 has no lead with the pseudonym %2 (leads: %3).")
                      .arg(project.path(), lead,
                          leads.isEmpty() ? TeamProjectText::tr("none")
                                          : leads.join(QStringLiteral(", "))));
    auto recordable = ServerConnection::withoutPassword(server);
    if (!recordable)
        return std::unexpected(recordable.error());

    auto conn = ServerConnection::open(server);
    if (!conn)
        return std::unexpected(conn.error());
    PublishReport report;
    report.server = conn->describe();
    report.schemaVersion = kServerSchemaVersion;
    report.credentialsDir = QFileInfo(credentialsDir).absoluteFilePath();

    // One login role per live person; two pseudonyms must not make the same role name.
    std::vector<PlannedLogin> logins;
    QHash<QString, QString> pseudonymOfRole;
    for (const Coder &c : *people) {
        const QString role = personRole(conn->database(), c.pseudonym);
        if (pseudonymOfRole.contains(role))
            return fail(ErrorCode::Duplicate,
                TeamProjectText::tr(
                    "The pseudonyms %1 and %2 make the same login role %3; rename one of them.")
                    .arg(pseudonymOfRole.value(role), c.pseudonym, role));
        pseudonymOfRole.insert(role, c.pseudonym);
        logins.push_back({c, role, newPassword(),
            QDir(report.credentialsDir).filePath(passwordFileName(c.pseudonym, role))});
    }

    bool createdDir = false;
    FOURFOLD_TRY_STATUS(prepareCredentialsDir(report.credentialsDir, &createdDir));
    auto undoFiles = [&] {
        for (const PlannedLogin &l : logins)
            QFile::remove(l.file);
        if (createdDir)
            QDir().rmdir(report.credentialsDir);
    };
    auto abandon = [&](const Error &e) -> Result<PublishReport> {
        (void)conn->exec(QStringLiteral("ROLLBACK"));
        undoFiles();
        return std::unexpected(e);
    };

    if (auto st = conn->exec(QStringLiteral("BEGIN")); !st)
        return abandon(st.error());
    auto version = serverSchemaVersion(*conn);
    if (!version)
        return abandon(version.error());
    if (*version != 0)
        return abandon(fail(ErrorCode::Duplicate,
            TeamProjectText::tr(
                "The database %1 holds a team project already; publish into an empty database.")
                .arg(report.server))
                           .error());
    if (auto st = prepareServerSchema(*conn); !st)
        return abandon(st.error());
    const QString group = teamGroupRole(conn->database());
    if (auto st = createTeamGroup(*conn, group); !st)
        return abandon(st.error());

    // The shared rows, references first.
    RowBatch batch(*conn);
    const Database &db = project.db();
    auto sendKind = [&](store::SharedKind kind, ServerTable table, qint64 *count) {
        return store::forEachSharedRow(db, kind, [&](const QByteArray &json) {
            if (count)
                ++*count;
            return batch.add(table, json);
        });
    };
    qint64 goldSources = 0;
    std::vector<std::pair<QString, QString>> bases; // each object's synced version, for sync
    Status sent = sendKind(store::SharedKind::Person, ServerTable::Person, &report.people);
    if (sent)
        sent = sendKind(store::SharedKind::CodebookVersion, ServerTable::CodebookVersion,
            &report.codebookVersions);
    if (sent)
        sent = sendKind(store::SharedKind::Article, ServerTable::Article, &report.articles);
    // Each person's own objects in the portable form coder copies merge by.
    for (const PlannedLogin &l : logins) {
        if (!sent)
            break;
        auto rows = store::portableRows(db, l.person.uuid);
        if (!rows) {
            sent = std::unexpected(rows.error());
            break;
        }
        for (const store::PortableRow &row : *rows) {
            const ServerTable table = serverTableOf(row.type);
            ++(table == ServerTable::Assignment       ? report.assignments
                    : table == ServerTable::Judgement ? report.judgements
                    : table == ServerTable::Link      ? report.links
                                                      : report.annotations);
            bases.emplace_back(teamBaseKey(row), teamBaseValue(row));
            sent = batch.add(table, serverFromPortable(row, l.person.uuid, row.seconds));
            if (!sent)
                break;
        }
    }
    if (sent)
        sent =
            sendKind(store::SharedKind::GoldAnnotation, ServerTable::GoldAnnotation, &report.gold);
    if (sent)
        sent = sendKind(store::SharedKind::GoldSource, ServerTable::GoldSource, &goldSources);
    if (sent)
        sent = sendKind(store::SharedKind::GoldJudgement, ServerTable::GoldJudgement, &report.gold);
    if (sent)
        sent = sendKind(store::SharedKind::GoldRejection, ServerTable::GoldRejection, &report.gold);
    if (sent)
        sent = store::forEachEventAfter(db, 0, [&](qint64 id, const QByteArray &json) {
            ++report.events;
            report.lastEvent = std::max(report.lastEvent, id);
            return batch.add(ServerTable::Event, json);
        });
    if (sent)
        sent = batch.flush();
    if (!sent)
        return abandon(sent.error());

    // Logins last: each password is written to its file before the server takes its verifier,
    // and the files go again if the transaction does not commit.
    for (const PlannedLogin &l : logins) {
        const QString line =
            QStringLiteral("%1:%2:%3:%4:%5\n")
                .arg(pgpassField(conn->host()), pgpassField(conn->port()),
                    pgpassField(conn->database()), pgpassField(l.role), pgpassField(l.password));
        if (auto st = writePrivateFile(l.file, line.toUtf8()); !st)
            return abandon(st.error());
        auto verifier = conn->passwordVerifier(l.role, l.password);
        if (!verifier)
            return abandon(verifier.error());
        if (auto st = createPersonLogin(
                *conn, l.role, *verifier, group, l.person.uuid, l.person.role == CoderRole::Lead);
            !st)
            return abandon(st.error());
        report.logins.push_back(
            {l.person.pseudonym, l.role, l.person.role == CoderRole::Lead, l.file});
    }
    // The highest change number of the published rows (nothing else writes before COMMIT).
    auto last = conn->query(QStringLiteral("SELECT last_value FROM fourfold.change_number"));
    if (!last)
        return abandon(last.error());
    report.lastChange = last->integer(0, 0);
    if (auto st = conn->exec(QStringLiteral("COMMIT")); !st)
        return abandon(st.error());
    // Taken after the commit, so the first pull does not read the published rows again (a
    // snapshot inside the publishing transaction would name that transaction as still running).
    auto xmin = serverSnapshotXmin(*conn);
    if (!xmin)
        return std::unexpected(xmin.error());

    // The server holds the project now; the file records where, and whose working file it is.
    if (auto st = store::setSetting(project.db(), serverSettingKey(), *recordable); !st) {
        Error e = st.error();
        e.message = TeamProjectText::tr("The team project is on %1, but %2 could not record it: %3")
                        .arg(report.server, project.path(), e.message);
        return std::unexpected(e);
    }
    if (auto st = store::setSetting(project.db(), pseudonymSettingKey(), lead); !st)
        return std::unexpected(st.error());
    auto recorded = project.batch([&]() -> Status {
        FOURFOLD_TRY_STATUS(store::setSetting(
            project.db(), lastChangeSettingKey(), QString::number(report.lastChange)));
        FOURFOLD_TRY_STATUS(store::setSetting(project.db(), lastXminSettingKey(), *xmin));
        for (const auto &[key, value] : bases)
            FOURFOLD_TRY_STATUS(store::setSetting(project.db(), key, value));
        FOURFOLD_TRY_STATUS(recordSharedBases(project.db()));
        // Publish sent the whole event log, unmarked.
        FOURFOLD_TRY_STATUS(store::setSetting(project.db(), fileSettingKey(), QString()));
        FOURFOLD_TRY_STATUS(store::setSetting(
            project.db(), lastEventSettingKey(), QString::number(report.lastEvent)));
        return {};
    });
    if (!recorded)
        return std::unexpected(recorded.error());
    return report;
}

Status TeamProject::setServer(Project &project, const QString &server)
{
    auto recorded = store::setting(project.db(), serverSettingKey());
    if (!recorded)
        return std::unexpected(recorded.error());
    if (!recorded->has_value())
        return fail(ErrorCode::InvalidArgument,
            TeamProjectText::tr(
                "%1 is not a team working file (made by team publish or team join).")
                .arg(project.path()));
    auto recordable = ServerConnection::withoutPassword(server);
    if (!recordable)
        return std::unexpected(recordable.error());
    return store::setSetting(project.db(), serverSettingKey(), *recordable);
}

} // namespace fourfold
