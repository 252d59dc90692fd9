#include "core/store/schema.h"

#include "core/store/database.h"
#include "core/store/statement.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

#include <algorithm>
#include <array>

namespace fourfold {

namespace {

// Migration 1: the whole data model of design.md §4. Times are ISO 8601 UTC text; JSON columns
// hold objects; rows made by people have a UUID and a `deleted` tombstone flag.
constexpr const char *kMigration1 = R"sql(
CREATE TABLE project_setting (
  key   TEXT PRIMARY KEY,
  value TEXT NOT NULL
) STRICT;

CREATE TABLE coder (
  id         INTEGER PRIMARY KEY,
  uuid       TEXT NOT NULL UNIQUE,
  name       TEXT NOT NULL,
  pseudonym  TEXT NOT NULL UNIQUE,
  role       TEXT NOT NULL CHECK (role IN ('coder', 'lead')),
  created_at TEXT NOT NULL,
  deleted    INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1))
) STRICT;

CREATE TABLE article (
  id          INTEGER PRIMARY KEY,
  uuid        TEXT NOT NULL UNIQUE,
  external_id TEXT NOT NULL UNIQUE,
  title       TEXT NOT NULL,
  outlet      TEXT NOT NULL DEFAULT '',
  published   TEXT NOT NULL DEFAULT '',
  language    TEXT NOT NULL,
  text        TEXT NOT NULL,
  length      INTEGER NOT NULL CHECK (length >= 0),
  sha256      TEXT NOT NULL UNIQUE,
  metadata    TEXT NOT NULL DEFAULT '{}',
  source      TEXT NOT NULL DEFAULT '',
  imported_at TEXT NOT NULL,
  deleted     INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1))
) STRICT;

-- Frozen segmentation: paragraphs as rows (their role can change), sentences and tokens as
-- compact blobs of little-endian int32 (start, end) code-point pairs.
CREATE TABLE paragraph (
  article_id INTEGER NOT NULL REFERENCES article(id),
  idx        INTEGER NOT NULL,
  start      INTEGER NOT NULL,
  end        INTEGER NOT NULL,
  role       TEXT NOT NULL CHECK (role IN ('intro', 'body', 'conclusion')),
  PRIMARY KEY (article_id, idx),
  CHECK (start >= 0 AND end > start)
) STRICT, WITHOUT ROWID;

CREATE TABLE article_units (
  article_id     INTEGER PRIMARY KEY REFERENCES article(id),
  sentence_count INTEGER NOT NULL,
  token_count    INTEGER NOT NULL,
  sentences      BLOB NOT NULL,
  tokens         BLOB NOT NULL
) STRICT;

CREATE TABLE codebook_version (
  id         INTEGER PRIMARY KEY,
  uuid       TEXT NOT NULL UNIQUE,
  number     INTEGER NOT NULL UNIQUE,
  created_at TEXT NOT NULL,
  created_by INTEGER REFERENCES coder(id),
  note       TEXT NOT NULL DEFAULT '',
  content    TEXT NOT NULL            -- the codebook as JSON (functions, attributes, items)
) STRICT;

CREATE TABLE assignment (
  id         INTEGER PRIMARY KEY,
  uuid       TEXT NOT NULL UNIQUE,
  article_id INTEGER NOT NULL REFERENCES article(id),
  coder_id   INTEGER NOT NULL REFERENCES coder(id),
  phase      TEXT NOT NULL CHECK (phase IN ('training', 'pilot', 'reliability', 'production')),
  status     TEXT NOT NULL DEFAULT 'assigned' CHECK (status IN ('assigned', 'started', 'done')),
  created_at TEXT NOT NULL,
  deleted    INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  UNIQUE (article_id, coder_id, phase)
) STRICT;

CREATE TABLE annotation (
  id                  INTEGER PRIMARY KEY,
  uuid                TEXT NOT NULL UNIQUE,
  article_id          INTEGER NOT NULL REFERENCES article(id),
  coder_id            INTEGER NOT NULL REFERENCES coder(id),
  function            TEXT NOT NULL CHECK (function IN ('problem', 'cause', 'evaluation', 'remedy')),
  start               INTEGER NOT NULL,
  end                 INTEGER NOT NULL,
  quote               TEXT NOT NULL,
  attributes          TEXT NOT NULL DEFAULT '{}',
  note                TEXT NOT NULL DEFAULT '',
  confidence          REAL CHECK (confidence IS NULL OR (confidence >= 0 AND confidence <= 1)),
  codebook_version_id INTEGER NOT NULL REFERENCES codebook_version(id),
  phase               TEXT NOT NULL DEFAULT 'production'
                      CHECK (phase IN ('training', 'pilot', 'reliability', 'production')),
  created_at          TEXT NOT NULL,
  modified_at         TEXT NOT NULL,
  deleted             INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  CHECK (start >= 0 AND end > start)
) STRICT;
CREATE INDEX annotation_by_article ON annotation(article_id, coder_id);

CREATE TABLE annotation_link (
  id         INTEGER PRIMARY KEY,
  uuid       TEXT NOT NULL UNIQUE,
  source_id  INTEGER NOT NULL REFERENCES annotation(id),
  target_id  INTEGER NOT NULL REFERENCES annotation(id),
  type       TEXT NOT NULL,
  created_at TEXT NOT NULL,
  deleted    INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  CHECK (source_id <> target_id)
) STRICT;

CREATE TABLE judgement (
  id                  INTEGER PRIMARY KEY,
  uuid                TEXT NOT NULL UNIQUE,
  article_id          INTEGER NOT NULL REFERENCES article(id),
  coder_id            INTEGER NOT NULL REFERENCES coder(id),
  item_key            TEXT NOT NULL,
  value               TEXT NOT NULL,
  codebook_version_id INTEGER NOT NULL REFERENCES codebook_version(id),
  phase               TEXT NOT NULL DEFAULT 'production'
                      CHECK (phase IN ('training', 'pilot', 'reliability', 'production')),
  created_at          TEXT NOT NULL,
  modified_at         TEXT NOT NULL,
  deleted             INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1))
) STRICT;
CREATE UNIQUE INDEX judgement_once ON judgement(article_id, coder_id, item_key, phase)
  WHERE deleted = 0;

-- Gold: adjudicated spans; raw annotations are never overwritten. Provenance in gold_source.
CREATE TABLE gold_annotation (
  id          INTEGER PRIMARY KEY,
  uuid        TEXT NOT NULL UNIQUE,
  article_id  INTEGER NOT NULL REFERENCES article(id),
  function    TEXT NOT NULL CHECK (function IN ('problem', 'cause', 'evaluation', 'remedy')),
  start       INTEGER NOT NULL,
  end         INTEGER NOT NULL,
  quote       TEXT NOT NULL,
  attributes  TEXT NOT NULL DEFAULT '{}',
  decided_by  INTEGER NOT NULL REFERENCES coder(id),
  decided_at  TEXT NOT NULL,
  rationale   TEXT NOT NULL DEFAULT '',
  deleted     INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  CHECK (start >= 0 AND end > start)
) STRICT;

CREATE TABLE gold_source (
  gold_id       INTEGER NOT NULL REFERENCES gold_annotation(id),
  annotation_id INTEGER NOT NULL REFERENCES annotation(id),
  PRIMARY KEY (gold_id, annotation_id)
) STRICT, WITHOUT ROWID;

CREATE TABLE gold_judgement (
  id          INTEGER PRIMARY KEY,
  uuid        TEXT NOT NULL UNIQUE,
  article_id  INTEGER NOT NULL REFERENCES article(id),
  item_key    TEXT NOT NULL,
  value       TEXT NOT NULL,
  decided_by  INTEGER NOT NULL REFERENCES coder(id),
  decided_at  TEXT NOT NULL,
  rationale   TEXT NOT NULL DEFAULT '',
  deleted     INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1))
) STRICT;

CREATE TABLE extractor_run (
  id         INTEGER PRIMARY KEY,
  uuid       TEXT NOT NULL UNIQUE,
  name       TEXT NOT NULL UNIQUE,
  version    TEXT NOT NULL DEFAULT '',
  parameters TEXT NOT NULL DEFAULT '{}',
  created_at TEXT NOT NULL
) STRICT;

CREATE TABLE extracted_span (
  id         INTEGER PRIMARY KEY,
  run_id     INTEGER NOT NULL REFERENCES extractor_run(id) ON DELETE CASCADE,
  article_id INTEGER NOT NULL REFERENCES article(id),
  function   TEXT NOT NULL CHECK (function IN ('problem', 'cause', 'evaluation', 'remedy')),
  start      INTEGER NOT NULL,
  end        INTEGER NOT NULL,
  score      REAL,
  attributes TEXT NOT NULL DEFAULT '{}',
  CHECK (start >= 0 AND end > start)
) STRICT;
CREATE INDEX extracted_span_by_run ON extracted_span(run_id, article_id);

-- Append-only: who did what, when. Triggers refuse updates and deletes.
CREATE TABLE event_log (
  id          INTEGER PRIMARY KEY,
  at          TEXT NOT NULL,
  coder_id    INTEGER REFERENCES coder(id),
  action      TEXT NOT NULL,
  object_type TEXT NOT NULL,
  object_uuid TEXT NOT NULL DEFAULT '',
  detail      TEXT NOT NULL DEFAULT '{}'
) STRICT;
CREATE TRIGGER event_log_no_update BEFORE UPDATE ON event_log
  BEGIN SELECT RAISE(ABORT, 'the event log is append-only'); END;
CREATE TRIGGER event_log_no_delete BEFORE DELETE ON event_log
  BEGIN SELECT RAISE(ABORT, 'the event log is append-only'); END;
)sql";

// Migration 2: full-text search over titles and texts (SQLite FTS5, external content on
// `article`), filled from the articles already in the file.
constexpr const char *kMigration2 = R"sql(
CREATE VIRTUAL TABLE article_fts USING fts5(
  title, text, content='article', content_rowid='id', tokenize='unicode61 remove_diacritics 2');
INSERT INTO article_fts(rowid, title, text) SELECT id, title, text FROM article;
CREATE TRIGGER article_fts_insert AFTER INSERT ON article BEGIN
  INSERT INTO article_fts(rowid, title, text) VALUES (new.id, new.title, new.text);
END;
CREATE TRIGGER article_fts_delete AFTER DELETE ON article BEGIN
  INSERT INTO article_fts(article_fts, rowid, title, text) VALUES ('delete', old.id, old.title, old.text);
END;
CREATE TRIGGER article_fts_update AFTER UPDATE OF title, text ON article BEGIN
  INSERT INTO article_fts(article_fts, rowid, title, text) VALUES ('delete', old.id, old.title, old.text);
  INSERT INTO article_fts(rowid, title, text) VALUES (new.id, new.title, new.text);
END;
)sql";

// Migration 3: active coding time per assignment (seconds; idle time is not counted).
constexpr const char *kMigration3 = R"sql(
ALTER TABLE assignment ADD COLUMN active_seconds INTEGER NOT NULL DEFAULT 0 CHECK (active_seconds >= 0);
)sql";

// Migration 4: coder copies, and adjudication decisions that put nothing into gold.
constexpr const char *kMigration4 = R"sql(
-- The common base of a coder copy and its project: each object's content digest (SHA-256 of
-- its portable form) and, for assignments, the active coding seconds. In a coder copy: as handed
-- out. In the project: as agreed at the last merge of that copy. A merge compares both sides with
-- it to tell the coder's changes from changes made meanwhile in the project.
CREATE TABLE copy_base (
  copy_uuid   TEXT NOT NULL,
  object_type TEXT NOT NULL CHECK (object_type IN ('annotation', 'link', 'judgement', 'assignment')),
  uuid        TEXT NOT NULL,
  digest      TEXT NOT NULL,
  seconds     INTEGER NOT NULL DEFAULT 0,
  PRIMARY KEY (copy_uuid, object_type, uuid)
) STRICT, WITHOUT ROWID;

-- In the main project: every merged copy, and the conflicts left for the lead to decide.
CREATE TABLE copy_merge (
  id        INTEGER PRIMARY KEY,
  copy_uuid TEXT NOT NULL,
  coder_id  INTEGER NOT NULL REFERENCES coder(id),
  merged_at TEXT NOT NULL,
  detail    TEXT NOT NULL DEFAULT '{}'
) STRICT;

-- mine / theirs: the object's portable JSON in the project / in the copy when it was found.
CREATE TABLE merge_conflict (
  id          INTEGER PRIMARY KEY,
  uuid        TEXT NOT NULL UNIQUE,
  object_type TEXT NOT NULL,
  object_uuid TEXT NOT NULL,
  copy_uuid   TEXT NOT NULL,
  mine        TEXT NOT NULL,
  theirs      TEXT NOT NULL,
  detected_at TEXT NOT NULL,
  resolution  TEXT NOT NULL DEFAULT '' CHECK (resolution IN ('', 'mine', 'theirs')),
  resolved_at TEXT NOT NULL DEFAULT ''
) STRICT;

-- A lead's decision that a coder's span does not belong in gold (a rejection), with its reason.
CREATE TABLE gold_rejection (
  id            INTEGER PRIMARY KEY,
  uuid          TEXT NOT NULL UNIQUE,
  annotation_id INTEGER NOT NULL REFERENCES annotation(id),
  decided_by    INTEGER NOT NULL REFERENCES coder(id),
  decided_at    TEXT NOT NULL,
  rationale     TEXT NOT NULL DEFAULT '',
  deleted       INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1))
) STRICT;
)sql";

// Migration 5: indexes for what is looked up per article or per span at study size (gold of an
// article, rejections and links of a span, a coder's assignments).
constexpr const char *kMigration5 = R"sql(
CREATE INDEX gold_annotation_by_article ON gold_annotation(article_id);
CREATE INDEX gold_judgement_by_article ON gold_judgement(article_id);
CREATE INDEX gold_rejection_by_annotation ON gold_rejection(annotation_id);
CREATE INDEX annotation_link_by_source ON annotation_link(source_id);
CREATE INDEX annotation_link_by_target ON annotation_link(target_id);
CREATE INDEX assignment_by_coder ON assignment(coder_id);
)sql";

// Migration 6: who coded what in which phase, answered from the index alone (CodingScope reads it
// for every article when a window opens; the table rows hold quotes and notes).
constexpr const char *kMigration6 = R"sql(
CREATE INDEX annotation_coded ON annotation(article_id, coder_id, phase) WHERE deleted = 0;
CREATE INDEX judgement_coded ON judgement(article_id, coder_id, phase) WHERE deleted = 0;
)sql";

// Migration 7: who may be a lead and who takes part. A lead's passphrase is kept only as a
// libsodium Argon2id string (algorithm, parameters, salt and hash; '' = none set yet: a lead of an
// older file sets one the first time they are chosen). A disabled person keeps their codings and
// takes no new assignments.
constexpr const char *kMigration7 = R"sql(
ALTER TABLE coder ADD COLUMN passphrase_hash TEXT NOT NULL DEFAULT '';
ALTER TABLE coder ADD COLUMN disabled INTEGER NOT NULL DEFAULT 0 CHECK (disabled IN (0, 1));
)sql";

// Migration 8: near copies found at import, and saved frame analyses. An article is a near copy of
// an older one when the MinHash estimate of their word-shingle Jaccard similarity reaches the
// import's threshold (exact copies are never stored twice, so they need no row here). A frame
// analysis keeps its settings (layer, variables, k, the random generator's start) as JSON, each
// cluster's name and profile, and which frame every article of the analysis fell into.
constexpr const char *kMigration8 = R"sql(
CREATE TABLE article_near_copy (
  article_id INTEGER NOT NULL REFERENCES article(id),
  other_id   INTEGER NOT NULL REFERENCES article(id),
  similarity REAL NOT NULL CHECK (similarity >= 0 AND similarity <= 1),
  found_at   TEXT NOT NULL,
  PRIMARY KEY (article_id, other_id),
  CHECK (article_id <> other_id)
) STRICT, WITHOUT ROWID;
CREATE INDEX article_near_copy_by_other ON article_near_copy(other_id);

CREATE TABLE frame_analysis (
  id         INTEGER PRIMARY KEY,
  uuid       TEXT NOT NULL UNIQUE,
  name       TEXT NOT NULL,
  created_at TEXT NOT NULL,
  created_by INTEGER REFERENCES coder(id),
  settings   TEXT NOT NULL DEFAULT '{}',
  deleted    INTEGER NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1))
) STRICT;

CREATE TABLE frame_cluster (
  analysis_id INTEGER NOT NULL REFERENCES frame_analysis(id),
  cluster     INTEGER NOT NULL CHECK (cluster >= 0),
  name        TEXT NOT NULL DEFAULT '',
  profile     TEXT NOT NULL DEFAULT '{}',
  PRIMARY KEY (analysis_id, cluster)
) STRICT, WITHOUT ROWID;

CREATE TABLE frame_member (
  analysis_id INTEGER NOT NULL REFERENCES frame_analysis(id),
  article_id  INTEGER NOT NULL REFERENCES article(id),
  cluster     INTEGER NOT NULL CHECK (cluster >= 0),
  PRIMARY KEY (analysis_id, article_id)
) STRICT, WITHOUT ROWID;
CREATE INDEX frame_member_by_article ON frame_member(article_id);
)sql";

constexpr std::array<const char *, kSchemaVersion> kMigrations {kMigration1, kMigration2,
    kMigration3, kMigration4, kMigration5, kMigration6, kMigration7, kMigration8};
// A migration left out of the list would silently do nothing: every slot must hold one.
static_assert(std::ranges::none_of(kMigrations, [](const char *m) { return m == nullptr; }),
    "kSchemaVersion is higher than the number of migrations in kMigrations");

Result<qint64> pragmaValue(Database &db, const char *pragma)
{
    auto stmt = db.prepare(QStringLiteral("PRAGMA %1").arg(QLatin1String(pragma)));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return *row ? stmt->columnInt(0) : 0;
}

Result<bool> isEmptyFile(Database &db)
{
    auto stmt = db.prepare(QStringLiteral("SELECT count(*) FROM sqlite_schema"));
    if (!stmt)
        return std::unexpected(stmt.error());
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    return stmt->columnInt(0) == 0;
}

// Applies migrations (from, to] in one transaction and sets user_version.
Status migrate(Database &db, int from, int to)
{
    if (auto st = db.exec(QStringLiteral("BEGIN IMMEDIATE")); !st)
        return st;
    for (int v = from + 1; v <= to; ++v) {
        if (auto st = db.exec(QString::fromUtf8(kMigrations[size_t(v - 1)])); !st) {
            (void)db.exec(QStringLiteral("ROLLBACK"));
            Error e = st.error();
            e.message = QCoreApplication::translate(
                "Schema", "Upgrading %1 to schema version %2 failed; the file is unchanged.")
                            .arg(db.path())
                            .arg(v);
            return std::unexpected(e);
        }
    }
    // PRAGMA values cannot be bound; both are integers from this file, never user text.
    if (auto st = db.exec(QStringLiteral("PRAGMA application_id = %1; PRAGMA user_version = %2")
                              .arg(kApplicationId)
                              .arg(to));
        !st) {
        (void)db.exec(QStringLiteral("ROLLBACK"));
        return st;
    }
    return db.exec(QStringLiteral("COMMIT"));
}

// Whether two files hold the same bytes (read a block at a time).
bool sameBytes(const QString &a, const QString &b)
{
    QFile fa(a), fb(b);
    if (!fa.open(QIODevice::ReadOnly) || !fb.open(QIODevice::ReadOnly) || fa.size() != fb.size())
        return false;
    while (!fa.atEnd()) {
        const QByteArray block = fa.read(1 << 20);
        if (block.isEmpty() || block != fb.read(block.size()))
            return false;
    }
    return true;
}

} // namespace

Result<int> schemaVersion(Database &db)
{
    auto v = pragmaValue(db, "user_version");
    if (!v)
        return std::unexpected(v.error());
    return int(*v);
}

Status createSchemaAtVersion(Database &db, int version)
{
    if (version < 1 || version > kSchemaVersion)
        return fail(
            ErrorCode::InvalidArgument, QStringLiteral("no schema version %1").arg(version));
    return migrate(db, 0, version);
}

namespace {

// The file's schema version after checking its identity: -1 for a new, empty file; Corrupt for
// another application's file, NewerSchema for a newer Fourfold's.
Result<int> checkedVersion(Database &db)
{
    auto appId = pragmaValue(db, "application_id");
    if (!appId)
        return std::unexpected(appId.error());
    auto empty = isEmptyFile(db);
    if (!empty)
        return std::unexpected(empty.error());
    if (*appId == 0 && *empty)
        return -1;
    if (*appId != kApplicationId)
        return fail(ErrorCode::Corrupt,
            QCoreApplication::translate(
                "Schema", "%1 is an SQLite file but not a Fourfold project.")
                .arg(db.path()));

    auto version = schemaVersion(db);
    if (!version)
        return std::unexpected(version.error());
    if (*version > kSchemaVersion)
        return fail(ErrorCode::NewerSchema,
            QCoreApplication::translate("Schema",
                "%1 was written by a newer Fourfold (schema version %2; this version reads up to "
                "%3). "
                "Open it with a newer Fourfold; the file was not changed.")
                .arg(db.path())
                .arg(*version)
                .arg(kSchemaVersion));
    return *version;
}

} // namespace

Result<bool> schemaIsCurrent(Database &db)
{
    auto version = checkedVersion(db);
    if (!version)
        return std::unexpected(version.error());
    return *version == kSchemaVersion;
}

Status prepareSchema(Database &db, QString *backupPath)
{
    if (backupPath)
        backupPath->clear();
    auto version = checkedVersion(db);
    if (!version)
        return std::unexpected(version.error());
    if (*version < 0)
        return migrate(db, 0, kSchemaVersion);
    if (*version == kSchemaVersion)
        return {};

    // One backup per version: written under a temporary name and moved into place whole, so a
    // kill never leaves half a backup; an upgrade that failed before left one, which is kept
    // when it holds the same bytes (the file did not change since) and otherwise refused rather
    // than piled up or overwritten.
    const QString backup = QStringLiteral("%1.v%2.bak").arg(db.path()).arg(*version);
    const QString fresh = backup + QStringLiteral(".new");
    QFile::remove(fresh);
    auto stmt = db.prepare(QStringLiteral("VACUUM INTO ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, fresh);
    if (auto st = stmt->run(); !st) {
        QFile::remove(fresh);
        Error e = st.error();
        if (e.message.contains(db.path()))
            return std::unexpected(e); // a full disk, said as such
        e.message = QCoreApplication::translate(
            "Schema", "Could not back up %1 to %2 before upgrading it; the file was not changed.")
                        .arg(db.path(), backup);
        return std::unexpected(e);
    }
    if (QFileInfo::exists(backup) || QFileInfo(backup).isSymLink()) {
        const bool same = sameBytes(backup, fresh) && !QFileInfo(backup).isSymLink();
        QFile::remove(fresh);
        if (!same)
            return fail(ErrorCode::Duplicate,
                QCoreApplication::translate("Schema",
                    "%1 needs upgrading from schema version %2, but its backup %3 from an earlier "
                    "upgrade differs from it; move the backup away and open the file again. The "
                    "file was not changed.")
                    .arg(db.path())
                    .arg(*version)
                    .arg(backup));
    } else if (!QFile::rename(fresh, backup)) {
        QFile::remove(fresh);
        return fail(ErrorCode::Io,
            QCoreApplication::translate("Schema",
                "Could not back up %1 to %2 before upgrading it; the file was not changed.")
                .arg(db.path(), backup));
    }
    if (backupPath)
        *backupPath = backup;
    return migrate(db, *version, kSchemaVersion);
}

} // namespace fourfold
