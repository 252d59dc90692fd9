#include "core/team/server_store_roles.h"

#include "core/team/server_store_connection.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ServerRolesText {
    Q_DECLARE_TR_FUNCTIONS(ServerRolesText)
};

// Lower case ASCII letters, digits and _, at most 63 bytes (NAMEDATALEN - 1).
QString roleName(const QString &raw)
{
    QString out;
    for (QChar c : raw.toLower()) {
        const char16_t u = c.unicode();
        const bool keep = (u >= u'a' && u <= u'z') || (u >= u'0' && u <= u'9') || u == u'_';
        out += keep ? c : QLatin1Char('_');
    }
    return out.left(63);
}

Status refuseExisting(ServerConnection &conn, const QString &role)
{
    auto found =
        conn.query(QStringLiteral("SELECT count(*) FROM pg_catalog.pg_roles WHERE rolname = $1"),
            {role.toUtf8()});
    if (!found)
        return std::unexpected(found.error());
    if (found->integer(0, 0) != 0)
        return fail(ErrorCode::Duplicate,
            ServerRolesText::tr(
                "The server %1 has a role %2 already; a team project needs a new role for each "
                "person (use another database name, or drop the old role).")
                .arg(conn.describe(), role));
    return {};
}

} // namespace

QString teamGroupRole(const QString &database)
{
    return roleName(database + QStringLiteral("_team"));
}

QString personRole(const QString &database, const QString &pseudonym)
{
    return roleName(database + QLatin1Char('_') + pseudonym);
}

Status createTeamGroup(ServerConnection &conn, const QString &groupRole)
{
    FOURFOLD_TRY_STATUS(refuseExisting(conn, groupRole));
    const QString g = conn.quotedIdentifier(groupRole);
    const QString db = conn.quotedIdentifier(conn.database());
    // GRANT and CREATE ROLE take no parameters: names are quoted by libpq (quotedIdentifier).
    return conn.exec(QStringLiteral(
        "CREATE ROLE %1 NOLOGIN;"
        "REVOKE ALL ON DATABASE %2 FROM PUBLIC;"
        "GRANT CONNECT, TEMPORARY ON DATABASE %2 TO %1;"
        "GRANT USAGE ON SCHEMA fourfold TO %1;"
        "GRANT SELECT ON fourfold.schema_version, fourfold.login TO %1;"
        "GRANT SELECT, INSERT, UPDATE ON fourfold.person, fourfold.codebook_version, "
        "fourfold.article, fourfold.assignment, fourfold.annotation, fourfold.link, "
        "fourfold.judgement, fourfold.gold_annotation, fourfold.gold_source, "
        "fourfold.gold_judgement, fourfold.gold_rejection TO %1;"
        "GRANT SELECT, INSERT ON fourfold.event TO %1;"
        "GRANT SELECT, INSERT, UPDATE ON fourfold.coding_time TO %1;"
        "GRANT USAGE ON SEQUENCE fourfold.change_number TO %1;")
                         .arg(g, db));
}

Status createPersonLogin(ServerConnection &conn, const QString &role, const QString &verifier,
    const QString &groupRole, const QString &personUuid, bool isLead)
{
    FOURFOLD_TRY_STATUS(refuseExisting(conn, role));
    FOURFOLD_TRY_STATUS(
        conn.exec(QStringLiteral("CREATE ROLE %1 LOGIN PASSWORD %2 IN ROLE %3")
                      .arg(conn.quotedIdentifier(role), conn.quotedLiteral(verifier),
                          conn.quotedIdentifier(groupRole))));
    return conn.run(
        QStringLiteral(
            "INSERT INTO fourfold.login (role_name, person, is_lead) VALUES ($1, $2::uuid, $3)"),
        {role.toUtf8(), personUuid.toUtf8(), isLead ? QByteArray("true") : QByteArray("false")});
}

Result<QString> loginRoleOf(ServerConnection &conn, const QString &personUuid)
{
    auto r =
        conn.query(QStringLiteral("SELECT role_name FROM fourfold.login WHERE person = $1::uuid"),
            {personUuid.toUtf8()});
    if (!r)
        return std::unexpected(r.error());
    if (r->rows() != 1)
        return fail(ErrorCode::NotFound,
            ServerRolesText::tr("The server %1 has no login for the person %2.")
                .arg(conn.describe(), personUuid));
    return r->text(0, 0);
}

Status setLoginAllowed(ServerConnection &conn, const QString &role, bool allowed)
{
    return conn.exec(QStringLiteral("ALTER ROLE %1 %2")
                         .arg(conn.quotedIdentifier(role),
                             allowed ? QStringLiteral("LOGIN") : QStringLiteral("NOLOGIN")));
}

} // namespace fourfold
