#pragma once
// The login roles of a team project: one group role holding the privileges on the schema, and
// one login role per person in it, mapped to the person in `fourfold.login` (which the policies
// of server_store_schema.cpp read). Roles belong to the whole PostgreSQL cluster, so their names
// start with the database's name.

#include "core/model/error.h"

#include <QString>

namespace fourfold {

class ServerConnection;

// The group role of the team project in `database`: "<database>_team" (lower case, letters,
// digits and _; at most 63 bytes, PostgreSQL's NAMEDATALEN - 1).
QString teamGroupRole(const QString &database);
// The login role of the person with `pseudonym`: "<database>_<pseudonym>" made the same way.
QString personRole(const QString &database, const QString &pseudonym);

// Inside the caller's transaction: creates the group role, gives it the privileges on the schema
// (no DELETE anywhere; the event log is insert-only) and lets only it connect to the database.
// Fails with Duplicate if the role exists already, or with the server's error.
Status createTeamGroup(ServerConnection &conn, const QString &groupRole);

// Inside the caller's transaction: creates the login role `role` in `groupRole` with the
// password whose SCRAM verifier is `verifier`, and maps it to the person `personUuid` (a lead
// when `isLead`). Fails with Duplicate if the role exists already, or with the server's error.
Status createPersonLogin(ServerConnection &conn, const QString &role, const QString &verifier,
    const QString &groupRole, const QString &personUuid, bool isLead);

// The login role of the person `personUuid` (fourfold.login). NotFound when there is none.
Result<QString> loginRoleOf(ServerConnection &conn, const QString &personUuid);

// Lets the login role `role` log in, or not (its rows and rights stay). Needs a login that may
// change roles (the administrator's); NotAllowed otherwise.
Status setLoginAllowed(ServerConnection &conn, const QString &role, bool allowed);

} // namespace fourfold
