#include "core/store/database.h"
#include "core/store/schema.h"
#include "core/store/statement.h"
#include "core/store/store_util.h"
#include "tests/support/test_support.h"

#include <QFile>

using namespace fourfold;

namespace {

Database openNew(const QString &path)
{
    auto db = Database::open(path, Database::OpenMode::ReadWriteCreate);
    REQUIRE(db);
    return std::move(*db);
}

qint64 scalarOf(Database &db, const QString &sql)
{
    auto v = store::scalar(db, sql);
    REQUIRE(v);
    return *v;
}

} // namespace

TEST_CASE("a new file gets Fourfold's application id and the current schema version")
{
    QTemporaryDir dir;
    Database db = openNew(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(prepareSchema(db));
    CHECK(scalarOf(db, QStringLiteral("PRAGMA application_id")) == kApplicationId);
    CHECK(scalarOf(db, QStringLiteral("PRAGMA user_version")) == kSchemaVersion);
    // Every table of design.md §4 exists.
    for (const char *table :
        {"article", "paragraph", "article_units", "codebook_version", "coder", "assignment",
            "annotation", "annotation_link", "judgement", "gold_annotation", "gold_source",
            "gold_judgement", "extractor_run", "extracted_span", "event_log", "article_fts"}) {
        INFO(table);
        CHECK(scalarOf(db,
                  QStringLiteral("SELECT count(*) FROM sqlite_schema WHERE name = '%1'")
                      .arg(QLatin1String(table)))
            == 1);
    }
}

TEST_CASE("a file from a newer Fourfold is refused and left untouched")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("newer.fourfold"));
    {
        Database db = openNew(path);
        REQUIRE(prepareSchema(db));
        REQUIRE(db.exec(QStringLiteral("PRAGMA user_version = %1").arg(kSchemaVersion + 7)));
    }
    const QByteArray before = test::readFile(path);
    Database db = openNew(path);
    auto st = prepareSchema(db);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NewerSchema);
    CHECK(st.error().message.contains(QStringLiteral("newer Fourfold")));
    CHECK(st.error().message.contains(QString::number(kSchemaVersion + 7)));
    CHECK(scalarOf(db, QStringLiteral("PRAGMA user_version")) == kSchemaVersion + 7);
    CHECK(test::readFile(path) == before);
}

TEST_CASE("an SQLite file of another program is refused")
{
    QTemporaryDir dir;
    Database db = openNew(dir.filePath(QStringLiteral("other.db")));
    REQUIRE(db.exec(QStringLiteral("CREATE TABLE notes (x TEXT)")));
    auto st = prepareSchema(db);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::Corrupt);
    CHECK(st.error().message.contains(QStringLiteral("not a Fourfold project")));
}

TEST_CASE("an older file is backed up, then migrated with its data")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("old.fourfold"));
    {
        Database db = openNew(path);
        REQUIRE(createSchemaAtVersion(db, 1));
        auto ins = db.prepare(QStringLiteral("INSERT INTO article (uuid, external_id, title, "
                                             "language, text, length, sha256, imported_at) "
                                             "VALUES ('u1', 'a1', 'Ferry line', 'en', 'The ferry "
                                             "to Brakwater stops in May.', 36, 'h1', 'now')"));
        REQUIRE(ins);
        REQUIRE(ins->run());
    }
    Database db = openNew(path);
    QString backup;
    REQUIRE(prepareSchema(db, &backup));
    CHECK(backup == path + QStringLiteral(".v1.bak"));
    CHECK(QFile::exists(backup));
    CHECK(scalarOf(db, QStringLiteral("PRAGMA user_version")) == kSchemaVersion);
    // Migration 2 built the full-text index from the article already in the file.
    CHECK(
        scalarOf(db,
            QStringLiteral("SELECT count(*) FROM article_fts WHERE article_fts MATCH 'brakwater'"))
        == 1);

    // The backup is the old version, intact.
    Database old = openNew(backup);
    CHECK(scalarOf(old, QStringLiteral("PRAGMA user_version")) == 1);
    CHECK(scalarOf(old, QStringLiteral("SELECT count(*) FROM article")) == 1);
    CHECK(scalarOf(
              old, QStringLiteral("SELECT count(*) FROM sqlite_schema WHERE name = 'article_fts'"))
        == 0);
}

TEST_CASE("the event log refuses updates and deletes")
{
    QTemporaryDir dir;
    Database db = openNew(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(prepareSchema(db));
    REQUIRE(db.exec(
        QStringLiteral("INSERT INTO event_log (at, action, object_type) VALUES ('t', 'a', 'o')")));
    auto upd = db.exec(QStringLiteral("UPDATE event_log SET action = 'b'"));
    REQUIRE_FALSE(upd);
    CHECK(upd.error().cause.contains(QStringLiteral("append-only")));
    CHECK_FALSE(db.exec(QStringLiteral("DELETE FROM event_log")));
    CHECK(scalarOf(db, QStringLiteral("SELECT count(*) FROM event_log")) == 1);
}

TEST_CASE("the schema refuses spans that are empty or reversed")
{
    QTemporaryDir dir;
    Database db = openNew(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(prepareSchema(db));
    auto st = db.exec(
        QStringLiteral("INSERT INTO extractor_run (uuid, name, created_at) VALUES ('r', 'r', 't');"
                       "INSERT INTO article (uuid, external_id, title, language, text, length, "
                       "sha256, imported_at) "
                       "VALUES ('u1', 'a1', 'T', 'en', 'text', 4, 'h', 't');"
                       "INSERT INTO extracted_span (run_id, article_id, function, start, end) "
                       "VALUES (1, 1, 'cause', 3, 3)"));
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::Constraint);
}

TEST_CASE("a version-2 file gains active coding time on its assignments, starting at zero")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("v2.fourfold"));
    {
        Database db = openNew(path);
        REQUIRE(createSchemaAtVersion(db, 2));
        REQUIRE(
            db.exec(QStringLiteral("INSERT INTO coder (uuid, name, pseudonym, role, created_at) "
                                   "VALUES ('c', 'Test person', 'C01', 'coder', 't');"
                                   "INSERT INTO article (uuid, external_id, title, language, text, "
                                   "length, sha256, imported_at) "
                                   "VALUES ('u1', 'a1', 'T', 'en', 'text', 4, 'h', 't');"
                                   "INSERT INTO assignment (uuid, article_id, coder_id, phase, "
                                   "created_at) VALUES ('s', 1, 1, 'pilot', 't');")));
    }
    Database db = openNew(path);
    QString backup;
    REQUIRE(prepareSchema(db, &backup));
    CHECK(backup.endsWith(QStringLiteral(".v2.bak")));
    CHECK(scalarOf(db, QStringLiteral("PRAGMA user_version")) == kSchemaVersion);
    CHECK(scalarOf(db, QStringLiteral("SELECT active_seconds FROM assignment")) == 0);
    CHECK(
        scalarOf(db, QStringLiteral("SELECT count(*) FROM assignment WHERE phase = 'pilot'")) == 1);
}

TEST_CASE("a version-4 file gains the study-size indexes with its rows kept")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("v4.fourfold"));
    {
        Database db = openNew(path);
        REQUIRE(createSchemaAtVersion(db, 4));
        REQUIRE(db.exec(QStringLiteral("INSERT INTO coder (uuid, name, pseudonym, role, "
                                       "created_at) VALUES ('c', 'Test lead', 'L01', 'lead', 't');"
                                       "INSERT INTO article (uuid, external_id, title, language, "
                                       "text, length, sha256, imported_at) "
                                       "VALUES ('u1', 'a1', 'T', 'en', 'text', 4, 'h', 't');"
                                       "INSERT INTO gold_annotation (uuid, article_id, function, "
                                       "start, end, quote, decided_by, decided_at) "
                                       "VALUES ('g', 1, 'cause', 0, 4, 'text', 1, 't');")));
    }
    Database db = openNew(path);
    QString backup;
    REQUIRE(prepareSchema(db, &backup));
    CHECK(backup.endsWith(QStringLiteral(".v4.bak")));
    CHECK(scalarOf(db, QStringLiteral("PRAGMA user_version")) == kSchemaVersion);
    CHECK(scalarOf(db, QStringLiteral("SELECT count(*) FROM gold_annotation WHERE article_id = 1"))
        == 1);
    for (const char *index :
        {"gold_annotation_by_article", "gold_judgement_by_article", "gold_rejection_by_annotation",
            "annotation_link_by_source", "annotation_link_by_target", "assignment_by_coder"}) {
        INFO(index);
        CHECK(scalarOf(db,
                  QStringLiteral(
                      "SELECT count(*) FROM sqlite_schema WHERE type = 'index' AND name = '%1'")
                      .arg(QLatin1String(index)))
            == 1);
    }
    // The article's gold is found through the index, not by scanning the table.
    auto plan = db.prepare(QStringLiteral(
        "EXPLAIN QUERY PLAN SELECT id FROM gold_annotation WHERE deleted = 0 AND article_id = ?1"));
    REQUIRE(plan);
    plan->bind(1, qint64(1));
    QString detail;
    while (true) {
        auto row = plan->step();
        REQUIRE(row);
        if (!*row)
            break;
        detail += plan->columnText(3);
    }
    CHECK(detail.contains(QStringLiteral("USING INDEX gold_annotation_by_article")));
}

TEST_CASE("a version-6 file gains empty passphrase hashes and enabled people")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("v6.fourfold"));
    {
        Database db = openNew(path);
        REQUIRE(createSchemaAtVersion(db, 6));
        REQUIRE(db.exec(QStringLiteral("INSERT INTO coder (uuid, name, pseudonym, role, "
                                       "created_at) VALUES ('l', 'Test lead', 'L01', 'lead', 't'),"
                                       "('c', 'Test coder', 'C01', 'coder', 't');")));
    }
    Database db = openNew(path);
    QString backup;
    REQUIRE(prepareSchema(db, &backup));
    CHECK(backup == path + QStringLiteral(".v6.bak"));
    CHECK(QFile::exists(backup));
    CHECK(scalarOf(db, QStringLiteral("PRAGMA user_version")) == kSchemaVersion);
    // Both people kept, neither with a passphrase yet (a lead sets one when first chosen), both
    // enabled.
    CHECK(scalarOf(db,
              QStringLiteral("SELECT count(*) FROM coder WHERE passphrase_hash = '' AND disabled "
                             "= 0 AND pseudonym IN ('L01', 'C01')"))
        == 2);
    // The flag takes 0 or 1 only.
    auto bad = db.exec(QStringLiteral("UPDATE coder SET disabled = 2 WHERE pseudonym = 'C01'"));
    REQUIRE_FALSE(bad);
    CHECK(bad.error().code == ErrorCode::Constraint);
    // The backup is the version-6 file, without the new columns.
    Database old = openNew(backup);
    CHECK(scalarOf(old, QStringLiteral("PRAGMA user_version")) == 6);
    CHECK(scalarOf(old,
              QStringLiteral(
                  "SELECT count(*) FROM pragma_table_info('coder') WHERE name = 'passphrase_hash'"))
        == 0);
}
