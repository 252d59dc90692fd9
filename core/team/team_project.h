#pragma once
// Team projects on a PostgreSQL server (design.md §9): the facade the front ends use. The
// server's schema, roles and rows are in the server_store_* files; the project file is read
// through core/store. No password is ever written into a project file: people log in with
// libpq's password files.

#include "core/model/error.h"

#include <QMap>
#include <QString>

#include <functional>
#include <vector>

namespace fourfold {

class Project;
struct NewPerson;
struct SignedIn;

// One person's login on the server, as publish made it.
struct TeamLogin {
    QString pseudonym;
    QString role; // the PostgreSQL login role
    bool lead = false;
    QString passwordFile; // libpq password file (pgpass format, mode 0600) with the password
};

struct PublishReport {
    QString server; // "user@host:port/database" of the publishing login
    int schemaVersion = 0; // the server schema version written
    QString credentialsDir;
    qint64 lastChange = 0; // the highest change number of the published rows
    std::vector<TeamLogin> logins; // by pseudonym
    qint64 people = 0;
    qint64 articles = 0;
    qint64 codebookVersions = 0;
    qint64 assignments = 0;
    qint64 annotations = 0;
    qint64 links = 0;
    qint64 judgements = 0;
    qint64 gold = 0; // gold spans, answers and rejections
    qint64 events = 0;
    qint64 lastEvent = 0; // the row id of the last event sent
};

struct JoinReport {
    QString path;
    QString server; // "role@host:port/database"
    QString pseudonym;
    bool lead = false;
    qint64 lastChange = 0; // the highest change number the file holds (a later pull starts after)
    qint64 people = 0;
    qint64 articles = 0;
    qint64 assignments = 0;
    qint64 annotations = 0;
    qint64 links = 0;
    qint64 judgements = 0;
    qint64 gold = 0; // gold spans, answers and rejections
};

// The points a sync passes, in order, for a caller that shows where it is (and for tests that
// stop a sync there).
enum class SyncStage {
    Read, // both sides read; nothing written yet
    ServerWritten, // everything sent, the server's transaction not yet committed
    ServerCommitted, // the server committed; the file's transaction not yet
};

struct SyncReport {
    QString server;
    qint64 pushed = 0; // objects sent to the server (new or changed here, or coding time)
    qint64 pulled = 0; // objects written into the file from the server
    qint64 conflicts = 0; // objects changed both here and there: the later kept, both recorded
    qint64 events = 0; // events of this file's log sent
    qint64 lastChange = 0;
};

// What an upgrade of a team project's server schema did.
struct ServerUpgrade {
    QString server; // "role@host:port/database"
    int from = 0; // the server schema version before
    int to = 0; // after: the version this build writes
};

// A working file's state, read from the file alone (it works without the server).
struct TeamStatus {
    QString server; // the connection string the file records (no password)
    QString pseudonym; // whose working file it is
    bool lead = false;
    qint64 lastChange = 0; // the highest server change number the file holds
    QString lastSync; // ISO 8601 UTC of the last sync that completed; empty if none yet
    // Objects the next sync would send: changed here since they were last synced, or new, or
    // with coding time not yet sent; by type ("annotation", "assignment", … and in a lead's
    // file "person", "codebook_version", "article", "gold_annotation", "gold_source",
    // "gold_judgement", "gold_rejection").
    qint64 waiting = 0;
    QMap<QString, qint64> waitingByType;
    qint64 openConflicts = 0; // conflicts found by syncs that the lead has not decided
};

// A person's login on a running team project, as addPerson or setPersonDisabled left it.
struct TeamPersonReport {
    QString pseudonym;
    QString role; // the PostgreSQL login role
    bool lead = false;
    bool loginAllowed = true;
    QString passwordFile; // a new person's password file (empty when disabling or enabling)
};

class TeamProject
{
public:
    TeamProject() = delete;

    // The project file's settings keys for its team project: the server's connection string
    // (without any password) and the pseudonym of the person whose working file it is.
    static QString serverSettingKey() { return QStringLiteral("team.server"); }
    static QString pseudonymSettingKey() { return QStringLiteral("team.pseudonym"); }
    // The highest server change number a working file holds (set by publish and join).
    static QString lastChangeSettingKey() { return QStringLiteral("team.last_change"); }
    // The oldest server transaction running at the last pull: the next pull reads again what
    // such transactions wrote (they may hold change numbers below the last one).
    static QString lastXminSettingKey() { return QStringLiteral("team.last_xmin"); }
    // When the last sync completed (ISO 8601 UTC).
    static QString lastSyncSettingKey() { return QStringLiteral("team.last_sync"); }
    // The row id of the last event of this file's log sent to the server.
    static QString lastEventSettingKey() { return QStringLiteral("team.last_event"); }
    // What marks this file's events on the server (empty for the published file; a uuid for
    // a joined one), so events of several files never take each other's place.
    static QString fileSettingKey() { return QStringLiteral("team.file"); }

    // Creates the team project of `project` on the empty database `server` (a libpq connection
    // string; the login must own the database and may create roles): the schema, a group role
    // and one login role per live person with a random password, the row-level security
    // policies, and every shared row of the file. All of it in one transaction: on any failure
    // the server is left as it was. Each person's password goes into "<pseudonym>.pgpass" in
    // `credentialsDir` (created with mode 0700; it must be new or empty; the files are 0600).
    // `project` then records the server, `leadPseudonym` (its lead; the only lead when empty)
    // and the last change number in its settings and becomes the lead's working file.
    // Fails with: Unsupported for a coder copy; InvalidArgument for an unknown lead or several
    // leads without one named, or a project without people; Duplicate when the database holds
    // a team project already, a role exists, two pseudonyms make the same role name, or
    // `credentialsDir` is not empty; Io when the folder cannot be written or the server cannot
    // be reached; NotAllowed when the login may not create roles or schemas; the server's error
    // otherwise.
    static Result<PublishReport> publish(Project &project, const QString &server,
        const QString &credentialsDir, const QString &leadPseudonym = {});

    // Writes the new project file `outPath`: a person's working file of the team project on
    // `server` (a libpq connection string naming the person's login role; the password from
    // libpq's conventions), holding exactly what that role may read there, from one snapshot:
    // for a coder the codebook, the coder alone, the articles assigned to them and their own
    // assignments, spans, links and answers; for a lead everything but the event log. The file
    // records the server (without a password), the pseudonym and the last change number.
    // Fails with: Duplicate if `outPath` exists; NotFound when the database holds no team
    // project; NewerSchema for a newer server; NotAllowed when the login is not a person of the
    // team; InvalidArgument when the login is another person than `pseudonym`; Io, or the
    // store's or server's error (no file is left behind).
    static Result<JoinReport> join(
        const QString &server, const QString &pseudonym, const QString &outPath);

    // Pushes and pulls the coders' objects (assignments with their status and coding time,
    // spans, links, answers) of the working file `project` once, by the rules of coder copies:
    // each object is compared with its last synced version; changed only here → sent, changed
    // only on the server → written here, changed on both → the version modified later is kept
    // (ties by the higher digest) on both sides and both versions are recorded as a conflict in
    // this file for the lead; coding time adds up. A coder's file sends only the coder's own
    // objects (the server refuses anything else). The shared rows (people, codebook versions,
    // articles, gold) come into every file as far as its person may read them, and a lead's
    // file sends those it changed (team_shared_sync.h: the rule for a row changed in two
    // leads' files); each file's new events go to the server's log. One transaction on each
    // side: on failure nothing is kept.
    // Fails with InvalidArgument for a file that is not a team working file, or as join.
    // `observer`, when given, is called at each SyncStage.
    static Result<SyncReport> sync(
        Project &project, const std::function<void(SyncStage)> &observer = {});

    // Adds `person` to the team project of the lead's working file `project`, as the signed-in
    // lead `by` (People::add, logged): in the file, on the server, and as a login role with a
    // random password, written to a new password file in `credentialsDir` (created with mode
    // 0700 when new; the folder publish wrote may be used again). `admin` is a connection
    // string of a login that may create roles — the administrator who published (empty: the
    // file's server). The file's change commits only after the server's: on any failure
    // neither changed and no password file is left. Fails as People::add; NotAllowed (saying
    // so) when the login may not create roles; Duplicate when the role or the password file
    // exists; InvalidArgument for a file that is not a team working file; the server's error.
    static Result<TeamPersonReport> addPerson(Project &project, const SignedIn &by,
        const NewPerson &person, const QString &credentialsDir, const QString &admin = {});

    // Disables the person `pseudonym` (or enables them again) in the file and on the server,
    // and takes their login role's right to log in away (or gives it back): their codings
    // stay, they take no new assignments and cannot reach the server. As addPerson: both or
    // neither; fails as People::setDisabled, NotFound for a person without a login, NotAllowed
    // when the login may not change roles.
    static Result<TeamPersonReport> setPersonDisabled(Project &project, const SignedIn &by,
        const QString &pseudonym, bool disabled, const QString &admin = {});

    // Brings the team project on `server` (a libpq connection string of the login that owns
    // its schema: the administrator who published it) to the server schema version this build
    // writes, in one transaction: every migration after the server's version. A server already
    // there is left alone (from == to). Fails with NotFound when the database holds no team
    // project, NewerSchema for a newer server, and the server's error (naming the version that
    // failed; nothing is kept) when the login may not change the schema. Syncs and joins of a
    // project on an older server are refused until it is upgraded.
    static Result<ServerUpgrade> upgradeServer(const QString &server);

    // Makes the working file `project` sync through the login `server` (a libpq connection
    // string; recorded without any password): e.g. the published file through the lead's own
    // login rather than the administrator's. InvalidArgument for a file that is not a team
    // working file or a malformed connection string.
    static Status setServer(Project &project, const QString &server);

    // What `project`, a working file, holds of its team project and what its next sync would
    // send (the objects sync compares with their last synced version, counted the same way).
    // Reads only the file: it answers offline too. Fails with InvalidArgument for a file that is
    // not a team working file, or the store's error.
    static Result<TeamStatus> status(const Project &project);
};

} // namespace fourfold
