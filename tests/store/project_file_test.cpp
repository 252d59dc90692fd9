// Issue 20, item 10: how the project file is opened, backed up and written when the disk is
// full, read-only or an upgrade fails.

#include "core/store/database.h"
#include "core/store/schema.h"
#include "core/store/store_util.h"
#include "tests/support/test_support.h"

#include <QDir>
#include <QFile>

#include <sqlite3.h>

using namespace fourfold;

namespace {

// Sets Database's open fault hook for one scope.
struct OpenFault {
    explicit OpenFault(Database::OpenFaultHook hook)
    {
        Database::setOpenFaultHook(std::move(hook));
    }
    ~OpenFault() { Database::setOpenFaultHook({}); }
};

QStringList entries(const QTemporaryDir &dir)
{
    return QDir(dir.path())
        .entryList(QDir::Files | QDir::Hidden | QDir::NoDotAndDotDot, QDir::Name);
}

} // namespace

TEST_CASE("issue 20 item 10: a new project file on a full disk says so and leaves no file",
    "[store][files]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("new.fourfold"));
    // SQLite reports a full disk (ENOSPC) as SQLITE_FULL; injected where opening first writes.
    OpenFault fault([](const QString &stage) {
        return stage == QLatin1String("journal") ? SQLITE_FULL : SQLITE_OK;
    });
    auto db = Database::open(path, Database::OpenMode::ReadWriteCreate);
    REQUIRE_FALSE(db);
    CHECK(db.error().code == ErrorCode::Io);
    CHECK(db.error().message.contains(QStringLiteral("is full")));
    CHECK(db.error().message.contains(path));
    CHECK_FALSE(db.error().message.contains(QStringLiteral("damaged")));
    CHECK(entries(dir).isEmpty());
}

TEST_CASE("issue 20 item 10: a full disk on opening is not called damage", "[store][files]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("p.fourfold"));
    {
        auto db = Database::open(path, Database::OpenMode::ReadWriteCreate);
        REQUIRE(db);
        REQUIRE(prepareSchema(*db));
    }
    const QStringList before = entries(dir);
    struct Case {
        int rc;
        ErrorCode code;
        const char *says;
    };
    for (const Case c : {Case {SQLITE_FULL, ErrorCode::Io, "is full"},
             Case {SQLITE_IOERR_READ, ErrorCode::Io, "could not be read"},
             Case {SQLITE_BUSY, ErrorCode::Busy, "locked"},
             Case {
                 SQLITE_NOTADB, ErrorCode::Corrupt, "not a Fourfold project file or is damaged"}}) {
        OpenFault fault([&](const QString &stage) {
            return stage == QLatin1String("read") ? c.rc : SQLITE_OK;
        });
        auto db = Database::open(path, Database::OpenMode::ReadWrite);
        INFO(c.says);
        REQUIRE_FALSE(db);
        CHECK(db.error().code == c.code);
        CHECK(db.error().message.contains(QString::fromUtf8(c.says)));
        CHECK(db.error().message.contains(path));
        CHECK(entries(dir) == before); // an existing file is never removed
    }
}

TEST_CASE("issue 20 item 10: a write that fills the disk says the disk is full", "[store][files]")
{
    QTemporaryDir dir;
    auto db = Database::open(
        dir.filePath(QStringLiteral("p.fourfold")), Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    REQUIRE(prepareSchema(*db));
    // PRAGMA max_page_count stands in for a full disk: SQLite then fails writes with SQLITE_FULL.
    REQUIRE(db->exec(QStringLiteral("CREATE TABLE filler (x BLOB)")));
    auto pages = store::scalar(*db, QStringLiteral("PRAGMA page_count"));
    REQUIRE(pages);
    REQUIRE(db->exec(QStringLiteral("PRAGMA max_page_count = %1").arg(*pages)));
    auto st = db->exec(QStringLiteral("INSERT INTO filler VALUES (zeroblob(1000000))"));
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::Io);
    CHECK(st.error().message.contains(QStringLiteral("is full")));
    CHECK(st.error().message.contains(db->path()));
}

TEST_CASE("issue 20 item 10: failed upgrades keep one backup per version", "[store][files]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("v4.fourfold"));
    {
        auto db = Database::open(path, Database::OpenMode::ReadWriteCreate);
        REQUIRE(db);
        REQUIRE(createSchemaAtVersion(*db, 4));
        REQUIRE(
            db->exec(QStringLiteral("INSERT INTO coder (uuid, name, pseudonym, role, created_at) "
                                    "VALUES ('c', 'Test person', 'C01', 'coder', 't')")));
    }
    const QString backup = path + QStringLiteral(".v4.bak");
    // Another connection holds the write lock: the backup is made, the upgrade itself fails.
    auto holder = Database::open(path, Database::OpenMode::ReadWrite);
    REQUIRE(holder);
    REQUIRE(holder->exec(QStringLiteral("BEGIN IMMEDIATE")));
    QByteArray first;
    for (int attempt = 1; attempt <= 3; ++attempt) {
        auto db = Database::open(path, Database::OpenMode::ReadWrite);
        REQUIRE(db);
        db->setBusyTimeout(0);
        auto st = prepareSchema(*db);
        INFO("attempt " << attempt);
        REQUIRE_FALSE(st);
        CHECK(st.error().code == ErrorCode::Busy);
        CHECK(store::scalar(*db, QStringLiteral("PRAGMA user_version")).value_or(-1) == 4);
        QStringList backups = entries(dir).filter(QStringLiteral(".bak"));
        CHECK(backups == QStringList {QStringLiteral("v4.fourfold.v4.bak")});
        if (attempt == 1)
            first = test::readFile(backup);
        else
            CHECK(test::readFile(backup) == first);
    }
    REQUIRE(holder->exec(QStringLiteral("ROLLBACK")));

    // A backup that no longer matches the file is neither replaced nor joined by a second one.
    {
        QFile f(backup);
        REQUIRE(f.open(QIODevice::Append));
        REQUIRE(f.write("x", 1) == 1);
    }
    const QByteArray changed = test::readFile(backup);
    {
        auto db = Database::open(path, Database::OpenMode::ReadWrite);
        REQUIRE(db);
        auto st = prepareSchema(*db);
        REQUIRE_FALSE(st);
        CHECK(st.error().code == ErrorCode::Duplicate);
        CHECK(st.error().message.contains(backup));
        CHECK(store::scalar(*db, QStringLiteral("PRAGMA user_version")).value_or(-1) == 4);
    }
    CHECK(test::readFile(backup) == changed);
    CHECK(entries(dir).filter(QStringLiteral(".bak")).size() == 1);
    CHECK(entries(dir).filter(QStringLiteral(".new")).isEmpty());

    // Moved away, the next open backs up and upgrades.
    REQUIRE(QFile::remove(backup));
    auto db = Database::open(path, Database::OpenMode::ReadWrite);
    REQUIRE(db);
    QString made;
    REQUIRE(prepareSchema(*db, &made));
    CHECK(made == backup);
    CHECK(store::scalar(*db, QStringLiteral("PRAGMA user_version")).value_or(-1) == kSchemaVersion);
    CHECK(entries(dir).filter(QStringLiteral(".bak"))
        == QStringList {QStringLiteral("v4.fourfold.v4.bak")});
}
