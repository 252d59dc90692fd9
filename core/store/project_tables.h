#pragma once
// Project-wide queries: settings, assignments, counts for `info`, and every stored span for
// the integrity check.

#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/project_counts.h"

#include <QString>

#include <array>
#include <optional>
#include <vector>

namespace fourfold {
class Database;
namespace store {

Result<std::optional<QString>> setting(const Database &db, const QString &key);
Status setSetting(Database &db, const QString &key, const QString &value);
// Removes the setting `key` (nothing if there is none): the undo of setting it first.
Status removeSetting(Database &db, const QString &key);

// Assigns `article` to `coder` in `phase` with `uuid` (made here when empty). A tombstone of the
// same assignment (a withdrawn draw's) comes alive again as a new one: `uuid`, not started, no
// time. Constraint if the assignment is live already or the article or coder does not exist.
Status insertAssignment(
    Database &db, ArticleId article, CoderId coder, Phase phase, const QString &uuid = {});

// Every live assignment (of one article when `article` is valid: one indexed query), ordered by
// article and coder.
Result<std::vector<Assignment>> assignments(const Database &db, ArticleId article = {});
// One (article, coder, phase) that has at least one live span or answer.
struct CodedTriple {
    ArticleId article;
    CoderId coder;
    Phase phase = Phase::Production;
};
// Every (coder, phase) with at least one live span, once (one query, no text decoded).
Result<std::vector<std::pair<CoderId, Phase>>> spanCoderPhases(const Database &db);
// Every such triple (of one article when `article` is valid: indexed), once, ordered by
// article, coder and phase (one query).
Result<std::vector<CodedTriple>> codedTriples(const Database &db, ArticleId article = {});
// Sets the status of every live assignment of `coder` on `article`; returns how many rows
// changed.
Result<qint64> setAssignmentStatus(
    Database &db, ArticleId article, CoderId coder, Phase phase, const QString &status);
// Adds active coding time to the coder's assignment of the article in `phase`.
Status addAssignmentSeconds(
    Database &db, ArticleId article, CoderId coder, Phase phase, qint64 seconds);
// Removes an assignment row for good (only to revert the edit that created it).
Status removeAssignment(Database &db, ArticleId article, CoderId coder, Phase phase);

// One assignment row as stored, tombstone or not, with the work on it: the coder's live spans
// and answers on the article in the assignment's phase.
struct AssignmentRecord {
    QString uuid;
    QString status;
    QString createdAt;
    bool deleted = false;
    qint64 activeSeconds = 0;
    qint64 spans = 0;
    qint64 answers = 0;
    // Whether anyone started coding it: spans, answers, coding time, or started / done.
    bool hasWork() const
    {
        return spans > 0 || answers > 0 || activeSeconds > 0 || status != QLatin1String("assigned");
    }
};
// The row of (article, coder, phase), if there is one (one indexed query).
Result<std::optional<AssignmentRecord>> assignmentRecord(
    const Database &db, ArticleId article, CoderId coder, Phase phase);
// Writes the stored columns of `record` (uuid, status, created_at, deleted, active_seconds) back
// to the row of (article, coder, phase): a withdrawal and its undo. NotFound without a row.
Status writeAssignmentRecord(
    Database &db, ArticleId article, CoderId coder, Phase phase, const AssignmentRecord &record);

// The figures of `fourfold-cli info`: live rows only; every live coder appears in perCoder,
// also those with no annotations.
Result<ProjectCounts> projectCounts(const Database &db);

// One stored span of any layer, for checking.
struct StoredSpan {
    QString layer; // "annotation", "gold", "extracted"
    qint64 rowId = 0;
    ArticleId article;
    TextRange range;
    std::optional<QString> quote; // extracted spans store no quote
};
Result<std::vector<StoredSpan>> allStoredSpans(const Database &db);

// The raw fields of every article row that the integrity check recomputes.
struct StoredArticle {
    ArticleId id;
    QString externalId;
    QString text;
    qint64 length = 0;
    QString sha256;
};
Result<std::vector<StoredArticle>> allStoredArticles(const Database &db);

// SQLite's own checks: PRAGMA integrity_check, PRAGMA foreign_key_check and the FTS5
// index check. Returns the problems found (empty when all is well).
Result<QStringList> sqliteChecks(const Database &db);

// SQLite's quick check (PRAGMA quick_check: every page and b-tree, without comparing indexes to
// their tables; sqlite.org/pragma.html#pragma_quick_check) before a command writes many rows into
// the file. Fails with ErrorCode::Corrupt naming the file and the first problem: nothing should
// be added to a damaged file (an import would succeed on many kinds of damage, and exports would
// then carry it on).
Status quickCheck(const Database &db);

} // namespace store
} // namespace fourfold
