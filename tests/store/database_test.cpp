#include "core/store/database.h"
#include "core/store/savepoint.h"
#include "core/store/statement.h"
#include "tests/support/test_support.h"

#include <sqlite3.h>

using namespace fourfold;
using fourfold::test::writeFile;

namespace {

qint64 count(Database &db)
{
    auto s = db.prepare(QStringLiteral("SELECT count(*) FROM t"));
    REQUIRE(s);
    REQUIRE(*s->step());
    return s->columnInt(0);
}

} // namespace

TEST_CASE("a new database has foreign keys on and WAL journaling")
{
    QTemporaryDir dir;
    auto db =
        Database::open(dir.filePath(QStringLiteral("a.db")), Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    auto fk = db->prepare(QStringLiteral("PRAGMA foreign_keys"));
    REQUIRE(fk);
    REQUIRE(*fk->step());
    CHECK(fk->columnInt(0) == 1);
    auto mode = db->prepare(QStringLiteral("PRAGMA journal_mode"));
    REQUIRE(mode);
    REQUIRE(*mode->step());
    CHECK(mode->columnText(0) == QStringLiteral("wal"));
}

TEST_CASE("opening a file that is not SQLite fails with Corrupt")
{
    QTemporaryDir dir;
    const QString path = writeFile(dir, QStringLiteral("x.fourfold"),
        QByteArray("this is a text file, not a database\n").repeated(200));
    auto db = Database::open(path, Database::OpenMode::ReadWrite);
    REQUIRE_FALSE(db);
    CHECK(db.error().code == ErrorCode::Corrupt);
    CHECK(db.error().message.contains(path));
}

TEST_CASE("opening a missing file without create fails with Io")
{
    QTemporaryDir dir;
    auto db = Database::open(
        dir.filePath(QStringLiteral("none.fourfold")), Database::OpenMode::ReadWrite);
    REQUIRE_FALSE(db);
    CHECK(db.error().code == ErrorCode::Io);
}

TEST_CASE("constraint violations map to ErrorCode::Constraint")
{
    QTemporaryDir dir;
    auto db =
        Database::open(dir.filePath(QStringLiteral("a.db")), Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    REQUIRE(db->exec(QStringLiteral("CREATE TABLE t (x INTEGER UNIQUE)")));
    auto ins = db->prepare(QStringLiteral("INSERT INTO t (x) VALUES (?1)"));
    REQUIRE(ins);
    REQUIRE(ins->bind(1, qint64(7)).run());
    auto again = ins->bind(1, qint64(7)).run();
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Constraint);
    CHECK(again.error().cause.contains(QStringLiteral("UNIQUE")));
}

TEST_CASE("bound text round-trips any Unicode without SQL injection")
{
    QTemporaryDir dir;
    auto db =
        Database::open(dir.filePath(QStringLiteral("a.db")), Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    REQUIRE(db->exec(QStringLiteral("CREATE TABLE t (s TEXT)")));
    const QString evil =
        QStringLiteral("'); DROP TABLE t; -- \u05E9\u05DC\u05D5\u05DD 👩‍👩‍👧");
    auto ins = db->prepare(QStringLiteral("INSERT INTO t (s) VALUES (?1)"));
    REQUIRE(ins);
    REQUIRE(ins->bind(1, evil).run());
    auto sel = db->prepare(QStringLiteral("SELECT s FROM t"));
    REQUIRE(sel);
    REQUIRE(*sel->step());
    CHECK(sel->columnText(0) == evil);
}

TEST_CASE("a savepoint rolls back unless committed, and commits when asked")
{
    QTemporaryDir dir;
    auto db =
        Database::open(dir.filePath(QStringLiteral("a.db")), Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    REQUIRE(db->exec(QStringLiteral("CREATE TABLE t (x INTEGER)")));
    {
        auto sp = Savepoint::begin(*db);
        REQUIRE(sp);
        REQUIRE(db->exec(QStringLiteral("INSERT INTO t VALUES (1)")));
        CHECK(count(*db) == 1);
    }
    CHECK(count(*db) == 0);
    {
        auto sp = Savepoint::begin(*db);
        REQUIRE(sp);
        REQUIRE(db->exec(QStringLiteral("INSERT INTO t VALUES (1)")));
        REQUIRE(sp->commit());
    }
    CHECK(count(*db) == 1);
}

TEST_CASE("the fault hook makes the Nth step fail with the injected code")
{
    QTemporaryDir dir;
    auto db =
        Database::open(dir.filePath(QStringLiteral("a.db")), Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    REQUIRE(db->exec(QStringLiteral("CREATE TABLE t (x INTEGER)")));
    int steps = 0;
    db->setFaultHook([&] { return ++steps == 2 ? SQLITE_BUSY : SQLITE_OK; });
    auto ins = db->prepare(QStringLiteral("INSERT INTO t VALUES (1)"));
    REQUIRE(ins);
    CHECK(ins->run());
    auto second = ins->run();
    REQUIRE_FALSE(second);
    CHECK(second.error().code == ErrorCode::Busy);
    db->setFaultHook({});
    CHECK(count(*db) == 1);
}
