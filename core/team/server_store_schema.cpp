#include "core/team/server_store_schema.h"

#include "core/team/server_store_connection.h"

#include <QCoreApplication>

#include <algorithm>
#include <array>

namespace fourfold {

namespace {

// Migration 1. Row-level security (PostgreSQL 15 documentation, 5.8 "Row Security Policies"):
// every table is FORCEd, so its owner too goes through the policies. Who is who comes from
// `login` (a login role → a person), readable by each role for its own row only.
// - a lead's role and the owner of the schema (the administrator who published the project)
//   read and write everything;
// - a coder's role reads the codebook, its own person row, its own assignments, annotations,
//   links, answers and events, and the articles assigned to it; it inserts and changes only
//   rows carrying its own person (annotations and answers only on its articles), changes only
//   the status and time of its assignments, and reads no gold at all.
// Rows are never deleted (tombstones), so no role has DELETE. uuid, article and person of a row
// never change (a trigger refuses it), so a changed row cannot move to another coder or article.
// Each row's `change` is a number from one sequence, set by a trigger on every insert and
// update: a later pull asks for rows with `change` > N. `change_xact` is the writing
// transaction, so a pull can tell rows whose numbers were taken by transactions still running.
constexpr const char *kServerMigration1 = R"sql(
CREATE SCHEMA fourfold;

CREATE TABLE fourfold.schema_version (version integer NOT NULL);
INSERT INTO fourfold.schema_version VALUES (0);

CREATE SEQUENCE fourfold.change_number;

CREATE TABLE fourfold.login (
  role_name name PRIMARY KEY,
  person    uuid NOT NULL UNIQUE,
  is_lead   boolean NOT NULL
);

-- The administrator who owns the schema.
CREATE FUNCTION fourfold.i_am_owner() RETURNS boolean LANGUAGE sql STABLE AS $$
  SELECT pg_has_role(current_user, n.nspowner, 'MEMBER')
  FROM pg_catalog.pg_namespace n WHERE n.nspname = 'fourfold'
$$;
CREATE FUNCTION fourfold.my_person() RETURNS uuid LANGUAGE sql STABLE AS $$
  SELECT person FROM fourfold.login WHERE role_name = current_user
$$;
CREATE FUNCTION fourfold.i_am_lead() RETURNS boolean LANGUAGE sql STABLE AS $$
  SELECT coalesce((SELECT is_lead FROM fourfold.login WHERE role_name = current_user), false)
         OR fourfold.i_am_owner()
$$;

CREATE FUNCTION fourfold.stamp_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  NEW.change := nextval('fourfold.change_number');
  NEW.change_xact := pg_current_xact_id();
  RETURN NEW;
END
$$;

-- Arguments: the columns an update must leave as they are.
CREATE FUNCTION fourfold.keep_identity() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  k text;
BEGIN
  FOREACH k IN ARRAY TG_ARGV LOOP
    IF to_jsonb(NEW) -> k IS DISTINCT FROM to_jsonb(OLD) -> k THEN
      RAISE EXCEPTION 'the % of a % row cannot change', k, TG_TABLE_NAME
        USING ERRCODE = 'check_violation';
    END IF;
  END LOOP;
  RETURN NEW;
END
$$;

-- Arguments: the columns only a lead may change.
CREATE FUNCTION fourfold.lead_only_columns() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  k text;
BEGIN
  IF fourfold.i_am_lead() THEN
    RETURN NEW;
  END IF;
  FOREACH k IN ARRAY TG_ARGV LOOP
    IF to_jsonb(NEW) -> k IS DISTINCT FROM to_jsonb(OLD) -> k THEN
      RAISE EXCEPTION 'only a lead may change the % of a % row', k, TG_TABLE_NAME
        USING ERRCODE = 'insufficient_privilege';
    END IF;
  END LOOP;
  RETURN NEW;
END
$$;

CREATE FUNCTION fourfold.append_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'the event log is append-only' USING ERRCODE = 'insufficient_privilege';
END
$$;

CREATE TABLE fourfold.person (
  uuid        uuid PRIMARY KEY,
  name        text NOT NULL,
  pseudonym   text NOT NULL UNIQUE,
  role        text NOT NULL CHECK (role IN ('coder', 'lead')),
  created_at  text NOT NULL,
  deleted     smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL
);

CREATE TABLE fourfold.codebook_version (
  uuid        uuid PRIMARY KEY,
  number      integer NOT NULL UNIQUE,
  created_at  text NOT NULL,
  created_by  uuid REFERENCES fourfold.person(uuid),
  note        text NOT NULL DEFAULT '',
  content     jsonb NOT NULL,
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL
);

-- paragraphs: [{start, end, role}] in order; sentences, tokens: little-endian int32 (start, end)
-- code-point pairs, as in the project file.
CREATE TABLE fourfold.article (
  uuid        uuid PRIMARY KEY,
  external_id text NOT NULL UNIQUE,
  title       text NOT NULL,
  outlet      text NOT NULL DEFAULT '',
  published   text NOT NULL DEFAULT '',
  language    text NOT NULL,
  text        text NOT NULL,
  length      integer NOT NULL CHECK (length >= 0),
  sha256      text NOT NULL UNIQUE,
  metadata    jsonb NOT NULL DEFAULT '{}',
  imported_at text NOT NULL,
  deleted     smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  paragraphs  jsonb NOT NULL DEFAULT '[]',
  sentences   bytea NOT NULL DEFAULT '',
  tokens      bytea NOT NULL DEFAULT '',
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL
);

CREATE TABLE fourfold.assignment (
  uuid           uuid PRIMARY KEY,
  article        uuid NOT NULL REFERENCES fourfold.article(uuid),
  coder          uuid NOT NULL REFERENCES fourfold.person(uuid),
  phase          text NOT NULL CHECK (phase IN ('training', 'pilot', 'reliability', 'production')),
  status         text NOT NULL DEFAULT 'assigned' CHECK (status IN ('assigned', 'started', 'done')),
  created_at     text NOT NULL,
  deleted        smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  active_seconds bigint NOT NULL DEFAULT 0 CHECK (active_seconds >= 0),
  change         bigint NOT NULL,
  change_xact    xid8 NOT NULL,
  UNIQUE (article, coder, phase)
);
CREATE INDEX assignment_by_coder ON fourfold.assignment(coder, article);

CREATE TABLE fourfold.annotation (
  uuid             uuid PRIMARY KEY,
  article          uuid NOT NULL REFERENCES fourfold.article(uuid),
  coder            uuid NOT NULL REFERENCES fourfold.person(uuid),
  function         text NOT NULL CHECK (function IN ('problem', 'cause', 'evaluation', 'remedy')),
  start            integer NOT NULL,
  "end"            integer NOT NULL,
  quote            text NOT NULL,
  attributes       text NOT NULL DEFAULT '{}',
  note             text NOT NULL DEFAULT '',
  confidence       double precision CHECK (confidence IS NULL OR (confidence >= 0 AND confidence <= 1)),
  codebook_version uuid NOT NULL REFERENCES fourfold.codebook_version(uuid),
  phase            text NOT NULL CHECK (phase IN ('training', 'pilot', 'reliability', 'production')),
  created_at       text NOT NULL,
  modified_at      text NOT NULL,
  deleted          smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change           bigint NOT NULL,
  change_xact      xid8 NOT NULL,
  UNIQUE (uuid, coder),
  CHECK (start >= 0 AND "end" > start)
);

-- A link belongs to the coder of both its annotations.
CREATE TABLE fourfold.link (
  uuid        uuid PRIMARY KEY,
  source      uuid NOT NULL,
  target      uuid NOT NULL,
  coder       uuid NOT NULL REFERENCES fourfold.person(uuid),
  type        text NOT NULL,
  created_at  text NOT NULL,
  deleted     smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL,
  FOREIGN KEY (source, coder) REFERENCES fourfold.annotation(uuid, coder),
  FOREIGN KEY (target, coder) REFERENCES fourfold.annotation(uuid, coder),
  CHECK (source <> target)
);

-- Answers to the codebook's article-level items.
CREATE TABLE fourfold.judgement (
  uuid             uuid PRIMARY KEY,
  article          uuid NOT NULL REFERENCES fourfold.article(uuid),
  coder            uuid NOT NULL REFERENCES fourfold.person(uuid),
  item             text NOT NULL,
  value            text NOT NULL,
  codebook_version uuid NOT NULL REFERENCES fourfold.codebook_version(uuid),
  phase            text NOT NULL CHECK (phase IN ('training', 'pilot', 'reliability', 'production')),
  created_at       text NOT NULL,
  modified_at      text NOT NULL,
  deleted          smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change           bigint NOT NULL,
  change_xact      xid8 NOT NULL
);

CREATE TABLE fourfold.gold_annotation (
  uuid        uuid PRIMARY KEY,
  article     uuid NOT NULL REFERENCES fourfold.article(uuid),
  function    text NOT NULL CHECK (function IN ('problem', 'cause', 'evaluation', 'remedy')),
  start       integer NOT NULL,
  "end"       integer NOT NULL,
  quote       text NOT NULL,
  attributes  text NOT NULL DEFAULT '{}',
  decided_by  uuid NOT NULL REFERENCES fourfold.person(uuid),
  decided_at  text NOT NULL,
  rationale   text NOT NULL DEFAULT '',
  deleted     smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL,
  CHECK (start >= 0 AND "end" > start)
);

-- Provenance: the coders' spans a gold span was decided from.
CREATE TABLE fourfold.gold_source (
  gold        uuid NOT NULL REFERENCES fourfold.gold_annotation(uuid),
  annotation  uuid NOT NULL REFERENCES fourfold.annotation(uuid),
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL,
  PRIMARY KEY (gold, annotation)
);

CREATE TABLE fourfold.gold_judgement (
  uuid        uuid PRIMARY KEY,
  article     uuid NOT NULL REFERENCES fourfold.article(uuid),
  item        text NOT NULL,
  value       text NOT NULL,
  decided_by  uuid NOT NULL REFERENCES fourfold.person(uuid),
  decided_at  text NOT NULL,
  rationale   text NOT NULL DEFAULT '',
  deleted     smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL
);

CREATE TABLE fourfold.gold_rejection (
  uuid        uuid PRIMARY KEY,
  annotation  uuid NOT NULL REFERENCES fourfold.annotation(uuid),
  decided_by  uuid NOT NULL REFERENCES fourfold.person(uuid),
  decided_at  text NOT NULL,
  rationale   text NOT NULL DEFAULT '',
  deleted     smallint NOT NULL DEFAULT 0 CHECK (deleted IN (0, 1)),
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL
);

-- source: the file an event was first written in ('' for the published project file);
-- source_id: its row id there.
CREATE TABLE fourfold.event (
  id          bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
  source      text NOT NULL DEFAULT '',
  source_id   bigint NOT NULL,
  at          text NOT NULL,
  person      uuid REFERENCES fourfold.person(uuid),
  action      text NOT NULL,
  object_type text NOT NULL,
  object_uuid text NOT NULL DEFAULT '',
  detail      jsonb NOT NULL DEFAULT '{}',
  change      bigint NOT NULL,
  change_xact xid8 NOT NULL,
  UNIQUE (source, source_id)
);

DO $$
DECLARE
  t text;
BEGIN
  FOREACH t IN ARRAY ARRAY['person', 'codebook_version', 'article', 'assignment', 'annotation',
      'link', 'judgement', 'gold_annotation', 'gold_source', 'gold_judgement', 'gold_rejection',
      'event'] LOOP
    EXECUTE format('CREATE TRIGGER stamp_change BEFORE INSERT OR UPDATE ON fourfold.%I '
                   'FOR EACH ROW EXECUTE FUNCTION fourfold.stamp_change()', t);
    EXECUTE format('CREATE INDEX %I ON fourfold.%I (change)', t || '_by_change', t);
    EXECUTE format('ALTER TABLE fourfold.%I ENABLE ROW LEVEL SECURITY', t);
    EXECUTE format('ALTER TABLE fourfold.%I FORCE ROW LEVEL SECURITY', t);
    IF t <> 'event' THEN
      EXECUTE format('CREATE POLICY lead_all ON fourfold.%I USING ((SELECT fourfold.i_am_lead())) '
                     'WITH CHECK ((SELECT fourfold.i_am_lead()))', t);
    END IF;
  END LOOP;
END
$$;

ALTER TABLE fourfold.login ENABLE ROW LEVEL SECURITY;
ALTER TABLE fourfold.login FORCE ROW LEVEL SECURITY;
CREATE POLICY own_login ON fourfold.login
  USING (role_name = current_user OR fourfold.i_am_owner())
  WITH CHECK (fourfold.i_am_owner());

CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.person
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.article
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.assignment
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'article', 'coder', 'phase');
CREATE TRIGGER lead_only_columns BEFORE UPDATE ON fourfold.assignment
  FOR EACH ROW EXECUTE FUNCTION fourfold.lead_only_columns('created_at', 'deleted');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.annotation
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'article', 'coder');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.link
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'source', 'target', 'coder');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.judgement
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'article', 'coder');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.gold_annotation
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'article');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.gold_judgement
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'article');
CREATE TRIGGER keep_identity BEFORE UPDATE ON fourfold.gold_rejection
  FOR EACH ROW EXECUTE FUNCTION fourfold.keep_identity('uuid', 'annotation');
CREATE TRIGGER append_only BEFORE UPDATE OR DELETE ON fourfold.event
  FOR EACH ROW EXECUTE FUNCTION fourfold.append_only();

-- What a coder's role may see and write beyond the lead's policy.
CREATE POLICY coder_self ON fourfold.person FOR SELECT
  USING (uuid = (SELECT fourfold.my_person()));
CREATE POLICY everyone_reads ON fourfold.codebook_version FOR SELECT USING (true);
CREATE POLICY coder_assigned ON fourfold.article FOR SELECT
  USING (EXISTS (SELECT 1 FROM fourfold.assignment s WHERE s.article = article.uuid
                 AND s.coder = (SELECT fourfold.my_person()) AND s.deleted = 0));
CREATE POLICY coder_own_read ON fourfold.assignment FOR SELECT
  USING (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_update ON fourfold.assignment FOR UPDATE
  USING (coder = (SELECT fourfold.my_person()))
  WITH CHECK (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_read ON fourfold.annotation FOR SELECT
  USING (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_insert ON fourfold.annotation FOR INSERT
  WITH CHECK (coder = (SELECT fourfold.my_person())
              AND EXISTS (SELECT 1 FROM fourfold.assignment s WHERE s.article = annotation.article
                          AND s.coder = (SELECT fourfold.my_person()) AND s.deleted = 0));
CREATE POLICY coder_own_update ON fourfold.annotation FOR UPDATE
  USING (coder = (SELECT fourfold.my_person()))
  WITH CHECK (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_read ON fourfold.link FOR SELECT
  USING (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_insert ON fourfold.link FOR INSERT
  WITH CHECK (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_update ON fourfold.link FOR UPDATE
  USING (coder = (SELECT fourfold.my_person()))
  WITH CHECK (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_read ON fourfold.judgement FOR SELECT
  USING (coder = (SELECT fourfold.my_person()));
CREATE POLICY coder_own_insert ON fourfold.judgement FOR INSERT
  WITH CHECK (coder = (SELECT fourfold.my_person())
              AND EXISTS (SELECT 1 FROM fourfold.assignment s WHERE s.article = judgement.article
                          AND s.coder = (SELECT fourfold.my_person()) AND s.deleted = 0));
CREATE POLICY coder_own_update ON fourfold.judgement FOR UPDATE
  USING (coder = (SELECT fourfold.my_person()))
  WITH CHECK (coder = (SELECT fourfold.my_person()));
CREATE POLICY read_events ON fourfold.event FOR SELECT
  USING ((SELECT fourfold.i_am_lead()) OR person = (SELECT fourfold.my_person()));
CREATE POLICY write_events ON fourfold.event FOR INSERT
  WITH CHECK ((SELECT fourfold.i_am_lead()) OR person = (SELECT fourfold.my_person()));
)sql";

// Migration 2. A notice to listening clients when shared rows change, so that a working file
// pulls at once instead of at its next poll: after each insert or update statement on a shared
// table, NOTIFY on the channel "fourfold_change" with an empty payload, which says nothing about
// whose rows, which or how many changed (PostgreSQL 15 documentation, NOTIFY: delivered when the
// transaction commits, and a transaction's identical notices are folded into one). Statement
// triggers, not row triggers: a push of a thousand rows sends one notice.
constexpr const char *kServerMigration2 = R"sql(
CREATE FUNCTION fourfold.notify_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  PERFORM pg_notify('fourfold_change', '');
  RETURN NULL;
END
$$;

DO $$
DECLARE
  t text;
BEGIN
  FOREACH t IN ARRAY ARRAY['person', 'codebook_version', 'article', 'assignment', 'annotation',
      'link', 'judgement', 'gold_annotation', 'gold_source', 'gold_judgement', 'gold_rejection',
      'event'] LOOP
    EXECUTE format('CREATE TRIGGER notify_change AFTER INSERT OR UPDATE ON fourfold.%I '
                   'FOR EACH STATEMENT EXECUTE FUNCTION fourfold.notify_change()', t);
  END LOOP;
END
$$;
)sql";

// Migration 3. A person can be disabled (team people --disable): their rows stay, their login
// role may no longer log in (ALTER ROLE ... NOLOGIN), and every lead's file learns it by sync.
constexpr const char *kServerMigration3 = R"sql(
ALTER TABLE fourfold.person ADD COLUMN disabled smallint NOT NULL DEFAULT 0
  CHECK (disabled IN (0, 1));
)sql";

// Migration 4. Coding time per working file: each file sends the total of its own coding time
// on an assignment (never a difference), kept per file, and a trigger adds what grew to the
// assignment's active_seconds. A sync sent twice — cut off after the server's commit and before
// the file's — so counts its time once. A file's total only grows (GREATEST on conflict).
constexpr const char *kServerMigration4 = R"sql(
CREATE TABLE fourfold.coding_time (
  assignment uuid NOT NULL REFERENCES fourfold.assignment(uuid),
  source     text NOT NULL,
  seconds    bigint NOT NULL CHECK (seconds >= 0),
  PRIMARY KEY (assignment, source)
);

CREATE FUNCTION fourfold.add_coding_time() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE fourfold.assignment
     SET active_seconds = active_seconds + NEW.seconds
         - (CASE WHEN TG_OP = 'UPDATE' THEN OLD.seconds ELSE 0 END)
   WHERE uuid = NEW.assignment;
  RETURN NULL;
END
$$;
CREATE TRIGGER add_coding_time AFTER INSERT OR UPDATE ON fourfold.coding_time
  FOR EACH ROW EXECUTE FUNCTION fourfold.add_coding_time();

ALTER TABLE fourfold.coding_time ENABLE ROW LEVEL SECURITY;
ALTER TABLE fourfold.coding_time FORCE ROW LEVEL SECURITY;
CREATE POLICY lead_all ON fourfold.coding_time USING ((SELECT fourfold.i_am_lead()))
  WITH CHECK ((SELECT fourfold.i_am_lead()));
CREATE POLICY coder_own ON fourfold.coding_time
  USING (EXISTS (SELECT 1 FROM fourfold.assignment a WHERE a.uuid = coding_time.assignment
                 AND a.coder = (SELECT fourfold.my_person())))
  WITH CHECK (EXISTS (SELECT 1 FROM fourfold.assignment a WHERE a.uuid = coding_time.assignment
                      AND a.coder = (SELECT fourfold.my_person())));

-- A team project published before this migration: its group role gets the table too.
DO $$
DECLARE
  g name;
BEGIN
  FOR g IN SELECT DISTINCT grantee FROM information_schema.role_table_grants
           WHERE table_schema = 'fourfold' AND table_name = 'login' AND privilege_type = 'SELECT'
             AND grantee <> current_user LOOP
    EXECUTE format('GRANT SELECT, INSERT, UPDATE ON fourfold.coding_time TO %I', g);
  END LOOP;
END
$$;
)sql";

constexpr std::array<const char *, kServerSchemaVersion> kServerMigrations {
    kServerMigration1, kServerMigration2, kServerMigration3, kServerMigration4};
static_assert(std::ranges::none_of(kServerMigrations, [](const char *m) { return m == nullptr; }),
    "kServerSchemaVersion is higher than the number of migrations in kServerMigrations");

} // namespace

Result<int> serverSchemaVersion(ServerConnection &conn)
{
    auto exists =
        conn.query(QStringLiteral("SELECT to_regclass('fourfold.schema_version') IS NOT NULL"));
    if (!exists)
        return std::unexpected(exists.error());
    if (exists->text(0, 0) != QLatin1String("t"))
        return 0;
    auto version = conn.query(QStringLiteral("SELECT version FROM fourfold.schema_version"));
    if (!version)
        return std::unexpected(version.error());
    return version->rows() == 1 ? int(version->integer(0, 0)) : 0;
}

Status requireCurrentServerSchema(ServerConnection &conn)
{
    auto version = serverSchemaVersion(conn);
    if (!version)
        return std::unexpected(version.error());
    if (*version == 0)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ServerSchema", "The database %1 holds no team project.")
                .arg(conn.describe()));
    if (*version > kServerSchemaVersion)
        return fail(ErrorCode::NewerSchema,
            QCoreApplication::translate("ServerSchema",
                "The team project on %1 was written by a newer Fourfold (server schema version "
                "%2; this version reads up to %3).")
                .arg(conn.describe())
                .arg(*version)
                .arg(kServerSchemaVersion));
    if (*version < kServerSchemaVersion)
        return fail(ErrorCode::Unsupported,
            QCoreApplication::translate("ServerSchema",
                "The team project on %1 has server schema version %2; this Fourfold works with "
                "version %3. The administrator who published it upgrades it first: fourfold-cli "
                "team upgrade --server CONNECTION (nothing was changed).")
                .arg(conn.describe())
                .arg(*version)
                .arg(kServerSchemaVersion));
    return {};
}

Status prepareServerSchema(ServerConnection &conn)
{
    auto version = serverSchemaVersion(conn);
    if (!version)
        return std::unexpected(version.error());
    if (*version > kServerSchemaVersion)
        return fail(ErrorCode::NewerSchema,
            QCoreApplication::translate("ServerSchema",
                "The team project on %1 was written by a newer Fourfold (server schema version "
                "%2; this version reads up to %3); nothing was changed.")
                .arg(conn.describe())
                .arg(*version)
                .arg(kServerSchemaVersion));
    for (int v = *version + 1; v <= kServerSchemaVersion; ++v) {
        if (auto st = conn.exec(QString::fromUtf8(kServerMigrations[size_t(v - 1)])); !st) {
            Error e = st.error();
            e.message = QCoreApplication::translate("ServerSchema",
                "Upgrading the team project on %1 to server schema version %2 failed.")
                            .arg(conn.describe())
                            .arg(v);
            return std::unexpected(e);
        }
    }
    return conn.run(QStringLiteral("UPDATE fourfold.schema_version SET version = $1"),
        {QByteArray::number(kServerSchemaVersion)});
}

} // namespace fourfold
