#include "core/team/server_store_connection.h"
#include "core/team/server_store_schema.h"
#include "core/team/team_project.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

struct TeamUpgradeText {
    Q_DECLARE_TR_FUNCTIONS(TeamUpgradeText)
};

} // namespace

Result<ServerUpgrade> TeamProject::upgradeServer(const QString &server)
{
    auto conn = ServerConnection::open(server);
    if (!conn)
        return std::unexpected(conn.error());
    ServerUpgrade report;
    report.server = conn->describe();
    FOURFOLD_TRY_STATUS(conn->exec(QStringLiteral("BEGIN")));
    auto abandon = [&](const Error &e) -> Result<ServerUpgrade> {
        (void)conn->exec(QStringLiteral("ROLLBACK"));
        return std::unexpected(e);
    };
    auto version = serverSchemaVersion(*conn);
    if (!version)
        return abandon(version.error());
    if (*version == 0)
        return abandon(fail(ErrorCode::NotFound,
            TeamUpgradeText::tr("The database %1 holds no team project.").arg(report.server))
                           .error());
    report.from = *version;
    if (auto st = prepareServerSchema(*conn); !st)
        return abandon(st.error());
    if (auto st = conn->exec(QStringLiteral("COMMIT")); !st)
        return abandon(st.error());
    report.to = kServerSchemaVersion;
    return report;
}

} // namespace fourfold
