// TeamProject::sync: one push and pull of the coders' objects of a team working file.

#include "core/project/project.h"
#include "core/store/coder_table.h"
#include "core/store/copy_tables.h"
#include "core/store/database.h"
#include "core/store/project_tables.h"
#include "core/store/shared_rows.h"
#include "core/store/store_util.h"
#include "core/team/server_connection_pool.h"
#include "core/team/server_store_connection.h"
#include "core/team/server_store_rows.h"
#include "core/team/server_store_schema.h"
#include "core/team/team_project.h"
#include "core/team/team_rows.h"
#include "core/team/team_shared_sync.h"

#include <QCoreApplication>
#include <QDateTime>
#include <QJsonObject>
#include <QUuid>

#include <map>
#include <optional>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct TeamProjectText {
    Q_DECLARE_TR_FUNCTIONS(TeamProjectText)
};

const char *const kTypes[] = {"assignment", "annotation", "judgement", "link"};

// The coder-copy rule for two versions changed on both sides: the later modification wins,
// ties (and objects without a modification time) by the higher digest.
bool serverWins(const store::PortableRow &local, const store::PortableRow &server)
{
    const QString a = local.content.value(QLatin1String("modified_at")).toString();
    const QString b = server.content.value(QLatin1String("modified_at")).toString();
    if (a != b)
        return b > a;
    return server.digest() > local.digest();
}

// One object's versions: here, on the server (pulled), at the last sync.
struct Versions {
    std::optional<store::PortableRow> local;
    std::optional<store::PortableRow> server;
    std::optional<TeamBase> base;
    QString coder; // the coder the object belongs to
};

} // namespace

Result<SyncReport> TeamProject::sync(
    Project &project, const std::function<void(SyncStage)> &observer)
{
    auto reached = [&](SyncStage stage) {
        if (observer)
            observer(stage);
    };
    Database &db = project.db();
    auto server = store::setting(db, serverSettingKey());
    auto pseudonym = store::setting(db, pseudonymSettingKey());
    auto lastChange = store::setting(db, lastChangeSettingKey());
    auto lastXmin = store::setting(db, lastXminSettingKey());
    for (auto *r : {&server, &pseudonym, &lastChange, &lastXmin})
        if (!*r)
            return std::unexpected(r->error());
    if (!server->has_value() || !lastXmin->has_value())
        return fail(ErrorCode::InvalidArgument,
            TeamProjectText::tr(
                "%1 is not a team working file (made by team publish or team join).")
                .arg(project.path()));
    auto conn = ServerConnectionPool::take(**server);
    if (!conn)
        return std::unexpected(conn.error());
    // The connection is kept for the next sync however this one ends (outside any transaction:
    // every path after BEGIN rolls back or commits).
    struct GiveBack {
        const QString &server;
        Result<ServerConnection> &conn;
        ~GiveBack() { ServerConnectionPool::give(server, std::move(*conn)); }
    } giveBack {**server, conn};
    SyncReport report;
    report.server = conn->describe();
    report.lastChange = lastChange->value_or(QString()).toLongLong();
    // An older server (published by an older build) lacks what this build writes: refused
    // before anything is read or written, until its administrator upgrades it.
    FOURFOLD_TRY_STATUS(requireCurrentServerSchema(*conn));

    auto me = conn->query(QStringLiteral(
        "SELECT p.pseudonym, fourfold.i_am_lead() FROM fourfold.person p "
        "WHERE p.uuid = fourfold.my_person() UNION ALL SELECT NULL, fourfold.i_am_lead() "
        "WHERE fourfold.my_person() IS NULL"));
    if (!me)
        return std::unexpected(me.error());
    // The administrator who published has no person but a lead's powers.
    const bool owner = me->rows() == 1 && me->isNull(0, 0);
    if (me->rows() != 1 || (owner && me->text(0, 1) != QLatin1String("t")))
        return fail(ErrorCode::NotAllowed,
            TeamProjectText::tr("The login %1 is not a person of the team project.")
                .arg(report.server));
    if (!owner && me->text(0, 0) != pseudonym->value_or(QString()))
        return fail(ErrorCode::InvalidArgument,
            TeamProjectText::tr("The login %1 is %2, but %3 is the working file of %4.")
                .arg(
                    report.server, me->text(0, 0), project.path(), pseudonym->value_or(QString())));
    const bool lead = owner || me->text(0, 1) == QLatin1String("t");

    auto people = store::coders(db);
    if (!people)
        return std::unexpected(people.error());
    auto bases = store::settingsWithPrefix(db, QLatin1String(kTeamBasePrefix));
    if (!bases)
        return std::unexpected(bases.error());
    auto times = store::settingsWithPrefix(db, QLatin1String(kTeamTimePrefix));
    if (!times)
        return std::unexpected(times.error());
    QString myUuid;
    for (const Coder &c : *people)
        if (c.pseudonym == pseudonym->value_or(QString()))
            myUuid = c.uuid;
    // The events this file sends are marked with the file (a working file made before files
    // were named gets its name now); the published file's are unmarked, as publish sent them.
    auto source = store::setting(db, fileSettingKey());
    auto lastEventSetting = store::setting(db, lastEventSettingKey());
    for (auto *r : {&source, &lastEventSetting})
        if (!*r)
            return std::unexpected(r->error());
    const QString fileSource = source->value_or(QUuid::createUuid().toString(QUuid::WithoutBraces));
    qint64 lastEvent = lastEventSetting->value_or(QString()).toLongLong();

    auto abandon = [&](const Error &e) -> Result<SyncReport> {
        (void)conn->exec(QStringLiteral("ROLLBACK"));
        (void)db.exec(QStringLiteral("ROLLBACK"));
        return std::unexpected(e);
    };
    if (auto st = db.exec(QStringLiteral("BEGIN IMMEDIATE")); !st)
        return std::unexpected(st.error());
    if (auto st = conn->exec(QStringLiteral("BEGIN ISOLATION LEVEL REPEATABLE READ")); !st)
        return abandon(st.error());
    auto xmin = serverSnapshotXmin(*conn);
    if (!xmin)
        return abandon(xmin.error());

    // The shared rows: what the file changed (a lead's) and what the server did.
    const qint64 pulledFrom = report.lastChange;
    SharedRowSync shared(db, *conn, lead, *bases);
    if (auto st = shared.read(pulledFrom, **lastXmin, &report.lastChange); !st)
        return abandon(st.error());

    // Every object's versions, by key, in the order objects must be written (type, then key).
    std::map<std::pair<int, QString>, Versions> objects;
    for (const Coder &c : *people) {
        if (!lead && c.pseudonym != pseudonym->value_or(QString()))
            continue;
        auto rows = store::portableRows(db, c.uuid);
        if (!rows)
            return abandon(rows.error());
        for (store::PortableRow &row : *rows) {
            const int order = int(serverTableOf(row.type));
            Versions &v = objects[{order, teamObjectKey(row)}];
            v.coder = c.uuid;
            v.base = parseTeamBase(bases->value(teamBaseKey(row)));
            v.local = std::move(row);
        }
    }
    QStringList articlesNamed; // by the server's rows of coders' objects
    for (const char *type : kTypes) {
        auto rows = selectServerRowsSince(
            *conn, serverTableOf(QLatin1String(type)), pulledFrom, **lastXmin, &report.lastChange);
        if (!rows)
            return abandon(rows.error());
        for (const QByteArray &json : *rows) {
            store::PortableRow row = portableFromServer(QLatin1String(type), json);
            if (const QString article = row.content.value(QLatin1String("article")).toString();
                !article.isEmpty())
                articlesNamed.push_back(article);
            Versions &v = objects[{int(serverTableOf(row.type)), teamObjectKey(row)}];
            if (v.coder.isEmpty())
                v.coder = row.type == QLatin1String("link")
                    ? store::fromJsonText(QString::fromUtf8(json))
                          .value(QLatin1String("coder"))
                          .toString()
                    : row.content.value(QLatin1String("coder")).toString();
            if (!v.base)
                v.base = parseTeamBase(bases->value(teamBaseKey(row)));
            v.server = std::move(row);
        }
    }

    if (auto st = shared.fetchMissingArticles(articlesNamed); !st)
        return abandon(st.error());
    if (auto st = shared.decide(&report.conflicts); !st)
        return abandon(st.error());

    reached(SyncStage::Read);

    // Decide each object; what goes up is sent per table, what comes down is written here.
    std::map<int, QByteArrayList> push;
    std::vector<store::PortableRow> writeHere;
    QByteArrayList codingTimes;
    std::vector<std::pair<QString, qint64>> newTotals;
    for (auto &[key, v] : objects) {
        const bool changedHere = v.local && (!v.base || v.base->digest != v.local->digest());
        const qint64 secondsHere = v.local ? v.local->seconds - (v.base ? v.base->seconds : 0) : 0;
        std::optional<store::PortableRow> final = v.local;
        bool send = false;
        if (v.server) {
            if (!v.local || (!changedHere && v.server->digest() != v.local->digest())) {
                final = v.server;
                writeHere.push_back(*v.server);
            } else if (changedHere && v.server->digest() != v.local->digest()) {
                const bool theirs = serverWins(*v.local, *v.server);
                MergeConflict conflict;
                conflict.objectType = v.local->type;
                conflict.objectUuid = v.local->uuid;
                conflict.copyUuid = QStringLiteral("team");
                conflict.mine = (theirs ? *v.server : *v.local).content;
                conflict.theirs = (theirs ? *v.local : *v.server).content;
                if (auto st = store::insertConflict(db, conflict); !st)
                    return abandon(st.error());
                ++report.conflicts;
                if (theirs) {
                    final = v.server;
                    writeHere.push_back(*v.server);
                } else {
                    send = true;
                }
            }
        } else {
            send = changedHere;
        }
        // Coding time goes up as this file's new total on the assignment (team.time:UUID), so a
        // sync sent again after its server side committed counts it once.
        if (secondsHere > 0) {
            const qint64 total =
                times->value(QLatin1String(kTeamTimePrefix) + v.local->uuid).toLongLong()
                + secondsHere;
            codingTimes.push_back(store::toJsonText(
                QJsonObject {{QStringLiteral("assignment"), v.local->uuid},
                    {QStringLiteral("source"), fileSource},
                    {QStringLiteral("seconds"),
                        total}}).toUtf8());
            newTotals.emplace_back(QLatin1String(kTeamTimePrefix) + v.local->uuid, total);
        }
        if (send)
            push[key.first].push_back(serverFromPortable(*final, v.coder, 0));
        if (send || secondsHere > 0)
            ++report.pushed;
    }
    // References first on both sides: people, codebook versions and articles, then the coders'
    // objects, then gold (which refers to coders' spans) and the event log.
    if (auto st = shared.push(true, &report.pushed); !st)
        return abandon(st.error());
    for (auto &[table, rows] : push)
        if (auto st = upsertServerObjects(*conn, ServerTable(table), rows); !st)
            return abandon(st.error());
    if (auto st = sendCodingTimes(*conn, codingTimes); !st)
        return abandon(st.error());
    for (const auto &[setting, total] : newTotals)
        if (auto st = store::setSetting(db, setting, QString::number(total)); !st)
            return abandon(st.error());
    if (auto st = shared.push(false, &report.pushed); !st)
        return abandon(st.error());
    if (auto st = pushEvents(
            db, *conn, fileSource, lead ? QString() : myUuid, &lastEvent, &report.events);
        !st)
        return abandon(st.error());
    if (auto st = shared.writeHere(true, &report.pulled); !st)
        return abandon(st.error());
    for (const store::PortableRow &row : writeHere) {
        if (auto st = store::writePortableRow(db, row); !st)
            return abandon(st.error());
        ++report.pulled;
    }
    if (auto st = shared.writeHere(false, &report.pulled); !st)
        return abandon(st.error());
    if (auto st = shared.recordBases(); !st)
        return abandon(st.error());

    // After the push the server holds every changed object as it now is: the new base, and the
    // coding time of each assignment (which adds up on the server).
    for (const char *type : kTypes) {
        auto rows = selectServerRowsSince(*conn, serverTableOf(QLatin1String(type)),
            lastChange->value_or(QString()).toLongLong(), **lastXmin, &report.lastChange);
        if (!rows)
            return abandon(rows.error());
        for (const QByteArray &json : *rows) {
            const store::PortableRow row = portableFromServer(QLatin1String(type), json);
            if (row.type == QLatin1String("assignment")) {
                const auto it = objects.find({int(ServerTable::Assignment), teamObjectKey(row)});
                const qint64 here = it != objects.end() && it->second.local
                    ? it->second.local->seconds
                    : (it != objects.end() && it->second.server ? it->second.server->seconds : 0);
                if (row.seconds != here)
                    if (auto st = store::addPortableSeconds(db, row, row.seconds - here); !st)
                        return abandon(st.error());
            }
            if (auto st = store::setSetting(db, teamBaseKey(row), teamBaseValue(row)); !st)
                return abandon(st.error());
        }
    }
    if (auto st = store::setSetting(db, lastChangeSettingKey(), QString::number(report.lastChange));
        !st)
        return abandon(st.error());
    if (auto st = store::setSetting(db, lastXminSettingKey(), *xmin); !st)
        return abandon(st.error());
    if (auto st = store::setSetting(db, lastEventSettingKey(), QString::number(lastEvent)); !st)
        return abandon(st.error());
    if (auto st = store::setSetting(db, fileSettingKey(), fileSource); !st)
        return abandon(st.error());
    if (auto st = store::setSetting(
            db, lastSyncSettingKey(), QDateTime::currentDateTimeUtc().toString(Qt::ISODate));
        !st)
        return abandon(st.error());
    reached(SyncStage::ServerWritten);
    if (auto st = conn->exec(QStringLiteral("COMMIT")); !st)
        return abandon(st.error());
    // Cut off here, the file keeps its last synced versions and sends again what the server
    // has: an object equal on both sides is not a conflict, coding time goes as a total, gold
    // sources and events are ignored when present, so nothing arrives twice.
    reached(SyncStage::ServerCommitted);
    if (auto st = db.exec(QStringLiteral("COMMIT")); !st) {
        (void)db.exec(QStringLiteral("ROLLBACK"));
        return std::unexpected(st.error());
    }
    return report;
}

} // namespace fourfold
