// TeamProject::status: a working file's team state and what its next sync would send, from the
// file alone.

#include "core/project/project.h"
#include "core/store/coder_table.h"
#include "core/store/copy_tables.h"
#include "core/store/database.h"
#include "core/store/project_tables.h"
#include "core/store/shared_rows.h"
#include "core/team/team_project.h"
#include "core/team/team_rows.h"
#include "core/team/team_shared_sync.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct TeamStatusText {
    Q_DECLARE_TR_FUNCTIONS(TeamStatusText)
};

} // namespace

Result<TeamStatus> TeamProject::status(const Project &project)
{
    const Database &db = project.db();
    auto server = store::setting(db, serverSettingKey());
    auto pseudonym = store::setting(db, pseudonymSettingKey());
    auto lastChange = store::setting(db, lastChangeSettingKey());
    auto lastSync = store::setting(db, lastSyncSettingKey());
    for (auto *r : {&server, &pseudonym, &lastChange, &lastSync})
        if (!*r)
            return std::unexpected(r->error());
    if (!server->has_value() || !pseudonym->has_value())
        return fail(ErrorCode::InvalidArgument,
            TeamStatusText::tr("%1 is not a team working file (made by team publish or team join).")
                .arg(project.path()));
    TeamStatus status;
    status.server = **server;
    status.pseudonym = **pseudonym;
    status.lastChange = lastChange->value_or(QString()).toLongLong();
    status.lastSync = lastSync->value_or(QString());

    auto people = store::coders(db);
    if (!people)
        return std::unexpected(people.error());
    const auto me = std::ranges::find(*people, status.pseudonym, &Coder::pseudonym);
    status.lead = me != people->end() && me->role == CoderRole::Lead;
    auto bases = store::settingsWithPrefix(db, QLatin1String(kTeamBasePrefix));
    if (!bases)
        return std::unexpected(bases.error());
    // The same objects sync sends from this file: a lead's file sends every coder's.
    for (const Coder &c : *people) {
        if (!status.lead && c.pseudonym != status.pseudonym)
            continue;
        auto rows = store::portableRows(db, c.uuid);
        if (!rows)
            return std::unexpected(rows.error());
        for (const store::PortableRow &row : *rows) {
            const auto base = parseTeamBase(bases->value(teamBaseKey(row)));
            const bool changed = !base || base->digest != row.digest();
            const bool unsentTime = row.seconds > (base ? base->seconds : 0);
            if (changed || unsentTime) {
                ++status.waiting;
                ++status.waitingByType[row.type];
            }
        }
    }
    // A lead's file also sends the shared rows it changed (people, codebook versions,
    // articles, gold).
    if (status.lead) {
        auto shared = sharedRowsWaiting(db, *bases);
        if (!shared)
            return std::unexpected(shared.error());
        for (auto it = shared->cbegin(); it != shared->cend(); ++it) {
            status.waiting += it.value();
            status.waitingByType[it.key()] += it.value();
        }
    }
    auto conflicts = store::mergeConflicts(db, false);
    if (!conflicts)
        return std::unexpected(conflicts.error());
    status.openConflicts = std::ranges::count(
        *conflicts, QStringLiteral("team"), [](const MergeConflict &c) { return c.copyUuid; });
    return status;
}

} // namespace fourfold
