// TeamProject::join: a person's working file from the team project's server.

#include "core/store/copy_tables.h"
#include "core/store/database.h"
#include "core/store/project_tables.h"
#include "core/store/schema.h"
#include "core/store/shared_rows.h"
#include "core/store/store_util.h"
#include "core/team/server_store_connection.h"
#include "core/team/server_store_rows.h"
#include "core/team/server_store_schema.h"
#include "core/team/team_project.h"
#include "core/team/team_rows.h"
#include "core/team/team_shared_sync.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>
#include <QUuid>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct TeamProjectText {
    Q_DECLARE_TR_FUNCTIONS(TeamProjectText)
};

void removeFiles(const QString &path)
{
    for (const char *suffix : {"", "-wal", "-shm", "-journal"})
        QFile::remove(path + QLatin1String(suffix));
}

// The server's tables in the order a file must receive them (references first), with the
// kind of row each is in the file.
struct Part {
    ServerTable table;
    const char *objectType; // a coder's own object (portable row), or nullptr
    store::SharedKind kind;
};
constexpr Part kParts[] {
    {ServerTable::Person, nullptr, store::SharedKind::Person},
    {ServerTable::CodebookVersion, nullptr, store::SharedKind::CodebookVersion},
    {ServerTable::Article, nullptr, store::SharedKind::Article},
    {ServerTable::Assignment, "assignment", store::SharedKind::Person},
    {ServerTable::Annotation, "annotation", store::SharedKind::Person},
    {ServerTable::Judgement, "judgement", store::SharedKind::Person},
    {ServerTable::Link, "link", store::SharedKind::Person},
    {ServerTable::GoldAnnotation, nullptr, store::SharedKind::GoldAnnotation},
    {ServerTable::GoldSource, nullptr, store::SharedKind::GoldSource},
    {ServerTable::GoldJudgement, nullptr, store::SharedKind::GoldJudgement},
    {ServerTable::GoldRejection, nullptr, store::SharedKind::GoldRejection},
};

} // namespace

Result<JoinReport> TeamProject::join(
    const QString &server, const QString &pseudonym, const QString &outPath)
{
    if (QFileInfo::exists(outPath) || QFileInfo(outPath).isSymLink())
        return fail(ErrorCode::Duplicate,
            TeamProjectText::tr("%1 already exists; name a new file for the working file.")
                .arg(outPath));
    auto recordable = ServerConnection::withoutPassword(server);
    if (!recordable)
        return std::unexpected(recordable.error());
    auto conn = ServerConnection::open(server);
    if (!conn)
        return std::unexpected(conn.error());
    JoinReport report;
    report.path = outPath;
    report.server = conn->describe();

    // One snapshot of everything this role may see.
    FOURFOLD_TRY_STATUS(
        conn->exec(QStringLiteral("BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY")));
    FOURFOLD_TRY_STATUS(requireCurrentServerSchema(*conn));
    auto me = conn->query(QStringLiteral(
        "SELECT p.pseudonym, l.is_lead FROM fourfold.login l JOIN fourfold.person p ON p.uuid = "
        "l.person WHERE l.role_name = current_user"));
    if (!me)
        return std::unexpected(me.error());
    if (me->rows() != 1)
        return fail(ErrorCode::NotAllowed,
            TeamProjectText::tr("The login %1 is not a person of the team project.")
                .arg(report.server));
    report.pseudonym = me->text(0, 0);
    report.lead = me->text(0, 1) == QLatin1String("t");
    if (report.pseudonym != pseudonym)
        return fail(ErrorCode::InvalidArgument,
            TeamProjectText::tr("The login %1 is %2, not %3.")
                .arg(report.server, report.pseudonym, pseudonym));

    auto xmin = serverSnapshotXmin(*conn);
    if (!xmin)
        return std::unexpected(xmin.error());
    std::vector<QByteArrayList> parts;
    for (const Part &part : kParts) {
        auto rows = selectServerRows(*conn, part.table, &report.lastChange);
        if (!rows)
            return std::unexpected(rows.error());
        parts.push_back(std::move(*rows));
    }
    (void)conn->exec(QStringLiteral("COMMIT"));

    auto written = [&]() -> Status {
        auto db = Database::open(outPath, Database::OpenMode::ReadWriteCreate);
        if (!db)
            return std::unexpected(db.error());
        FOURFOLD_TRY_STATUS(prepareSchema(*db));
        FOURFOLD_TRY_STATUS(db->exec(QStringLiteral("BEGIN IMMEDIATE")));
        auto body = [&]() -> Status {
            for (size_t i = 0; i < std::size(kParts); ++i) {
                for (const QByteArray &json : parts[i]) {
                    if (kParts[i].objectType) {
                        const store::PortableRow row =
                            portableFromServer(QLatin1String(kParts[i].objectType), json);
                        FOURFOLD_TRY_STATUS(store::writePortableRow(*db, row));
                        FOURFOLD_TRY_STATUS(
                            store::setSetting(*db, teamBaseKey(row), teamBaseValue(row)));
                    } else
                        FOURFOLD_TRY_STATUS(store::writeSharedRow(*db, kParts[i].kind, json));
                }
            }
            FOURFOLD_TRY_STATUS(store::setSetting(*db, QStringLiteral("name"), conn->database()));
            FOURFOLD_TRY_STATUS(store::setSetting(*db, serverSettingKey(), *recordable));
            FOURFOLD_TRY_STATUS(store::setSetting(*db, pseudonymSettingKey(), pseudonym));
            FOURFOLD_TRY_STATUS(
                store::setSetting(*db, lastChangeSettingKey(), QString::number(report.lastChange)));
            FOURFOLD_TRY_STATUS(store::setSetting(*db, lastXminSettingKey(), *xmin));
            FOURFOLD_TRY_STATUS(recordSharedBases(*db));
            FOURFOLD_TRY_STATUS(store::setSetting(
                *db, fileSettingKey(), QUuid::createUuid().toString(QUuid::WithoutBraces)));
            auto lastEvent =
                store::scalar(*db, QStringLiteral("SELECT coalesce(max(id), 0) FROM event_log"));
            if (!lastEvent)
                return std::unexpected(lastEvent.error());
            FOURFOLD_TRY_STATUS(
                store::setSetting(*db, lastEventSettingKey(), QString::number(*lastEvent)));
            auto counts = store::projectCounts(*db);
            if (!counts)
                return std::unexpected(counts.error());
            report.people = counts->coders;
            report.articles = counts->articles;
            report.assignments = counts->assignments;
            report.annotations = counts->annotations;
            report.links = counts->links;
            report.judgements = counts->judgements;
            report.gold = qint64(parts[7].size() + parts[9].size() + parts[10].size());
            return {};
        };
        if (auto st = body(); !st) {
            (void)db->exec(QStringLiteral("ROLLBACK"));
            return st;
        }
        return db->exec(QStringLiteral("COMMIT"));
    }();
    if (!written) {
        removeFiles(outPath);
        return std::unexpected(written.error());
    }
    return report;
}

} // namespace fourfold
