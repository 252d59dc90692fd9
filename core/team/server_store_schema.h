#pragma once
// The schema of a team project on a PostgreSQL server: the rows people share (people, codebook
// versions, articles with their frozen units, assignments, annotations, links, answers, gold
// with its provenance, the event log), each stamped with a server-assigned change number, and
// the row-level security policies that keep coders blind, and a notice to listening clients
// (NOTIFY fourfold_change, see TeamListener) when shared rows change. Ordered migrations and a
// schema version, as in the project file (core/store/schema.cpp); all of it lives in the schema
// "fourfold" of one database.

#include "core/model/error.h"

namespace fourfold {

class ServerConnection;

// The server schema version this build writes. Migration n takes a server from n-1 to n.
inline constexpr int kServerSchemaVersion = 4;

// The server's schema version: 0 when the database holds no team project.
Result<int> serverSchemaVersion(ServerConnection &conn);

// Whether the server holds a team project of exactly this build's schema version: NotFound
// when it holds none, NewerSchema for a newer one, Unsupported for an older one (saying that the
// administrator who published it upgrades it with `fourfold-cli team upgrade`). What a join or a
// sync asks before it reads or writes rows.
Status requireCurrentServerSchema(ServerConnection &conn);

// Creates or upgrades the schema inside the caller's transaction: every migration after the
// server's version, then the version. Fails with NewerSchema for a newer server, or with the
// server's error (nothing is kept when the caller rolls back).
Status prepareServerSchema(ServerConnection &conn);

} // namespace fourfold
