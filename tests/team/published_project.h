#pragma once
// The coder-copies test project (tests/project/copies_fixture.h: three coders, a lead, six
// assignments, eight spans, a link, two answers, a gold span) published to a new database of the
// test program's throwaway cluster.

#include "core/project/testing/project_database.h"
#include "core/store/copy_tables.h"
#include "core/team/team_project.h"
#include "tests/project/copies_fixture.h"
#include "tests/support/postgres_cluster.h"

#include <catch2/catch.hpp>

namespace fourfold::test {

struct PublishedProject : CopiesFixture {
    PostgresCluster &cluster = PostgresCluster::shared();
    PostgresCluster::TestDatabase db = cluster.newDatabase();
    QString credentials = dir.filePath(QStringLiteral("credentials"));
    PublishReport report;

    PublishedProject()
    {
        auto r = TeamProject::publish(*main, db.adminConninfo, credentials);
        INFO((r ? QString() : r.error().toString()).toStdString());
        REQUIRE(r);
        report = *r;
    }

    // A connection as the person `pseudonym`, with the password file publish wrote.
    QString loginOf(const QString &pseudonym) const
    {
        for (const TeamLogin &l : report.logins)
            if (l.pseudonym == pseudonym)
                return QStringLiteral("host='%1' dbname='%2' user='%3' passfile='%4'")
                    .arg(cluster.socketDir(), db.name, l.role, l.passwordFile);
        FAIL("no login for " << pseudonym.toStdString());
        return {};
    }

    QString uuidOf(const QString &pseudonym)
    {
        auto c = main->coderByPseudonym(pseudonym);
        REQUIRE(c);
        REQUIRE(c->has_value());
        return (*c)->uuid;
    }
};

// The working file of `pseudonym` joined from `p`'s server into p.dir/`fileName` (default
// "PSEUDONYM.fourfold"), opened.
inline Project joinAs(PublishedProject &p, const QString &pseudonym, QString fileName = {})
{
    if (fileName.isEmpty())
        fileName = pseudonym + QStringLiteral(".fourfold");
    const QString file = p.dir.filePath(fileName);
    auto r = TeamProject::join(p.loginOf(pseudonym), pseudonym, file);
    INFO((r ? QString() : r.error().toString()).toStdString());
    REQUIRE(r);
    auto project = Project::open(file);
    REQUIRE(project);
    return std::move(*project);
}

// One sync of `project`, which must succeed.
inline SyncReport synced(Project &project)
{
    auto r = TeamProject::sync(project);
    INFO((r ? QString() : r.error().toString()).toStdString());
    REQUIRE(r);
    return *r;
}

// The coder `coderUuid`'s objects in a file, each as "KEY DIGEST SECONDS", sorted: what two files
// must agree on.
inline QStringList objectsOf(const Database &db, const QString &coderUuid)
{
    auto rows = store::portableRows(db, coderUuid);
    REQUIRE(rows);
    QStringList out;
    for (const store::PortableRow &row : *rows)
        out << QStringLiteral("%1 %2 %3").arg(row.key(), row.digest()).arg(row.seconds);
    out.sort();
    return out;
}

} // namespace fourfold::test
