#pragma once
// The coders' objects between a working file and the server: the portable form coder copies
// merge by (core/store/copy_tables.h) and the server's rows of the same objects (JSON whose keys
// are the server's columns). No SQL here.

#include "core/store/copy_tables.h"
#include "core/team/server_store_rows.h"

#include <QByteArray>

#include <optional>

namespace fourfold {

// The server table holding objects of the portable type `type` ("assignment", "annotation",
// "judgement", "link").
ServerTable serverTableOf(const QString &type);
// A server row of `type` as a portable row (an assignment's active_seconds as its seconds).
store::PortableRow portableFromServer(const QString &type, const QByteArray &json);
// `row` as a server row of the coder `coderUuid`; an assignment carries `seconds` as its
// active_seconds.
QByteArray serverFromPortable(
    const store::PortableRow &row, const QString &coderUuid, qint64 seconds);

// An object's key in a team working file: "TYPE/UUID" (PortableRow::key names an assignment by
// article and phase alone, which is one coder's view; a lead's file holds every coder's).
QString teamObjectKey(const store::PortableRow &row);
// The setting key under which a working file keeps the last synced version of `row`
// ("team.base:" + teamObjectKey), and its value: "DIGEST SECONDS".
QString teamBaseKey(const store::PortableRow &row);
QString teamBaseValue(const store::PortableRow &row);
inline constexpr const char *kTeamBasePrefix = "team.base:";
// The setting under which a working file keeps the total coding time it has sent on an
// assignment: "team.time:" + the assignment's uuid.
inline constexpr const char *kTeamTimePrefix = "team.time:";
// A teamBaseValue read back; none for a malformed value.
struct TeamBase {
    QString digest;
    qint64 seconds = 0;
};
std::optional<TeamBase> parseTeamBase(const QString &value);

} // namespace fourfold
