#pragma once
// Gold rows (adjudicated spans) and their provenance, and the lead's rejections of coders' spans
// (decisions that put nothing into gold).

#include "core/model/annotation.h"
#include "core/model/error.h"

#include <functional>
#include <vector>

namespace fourfold {
class Database;

namespace store {

// Inserts `g` (uuid, times, deleted flag as given; `g.id` ignored) and one provenance row per
// source annotation. Constraint if the article, the deciding coder or a source does not exist.
Result<GoldId> insertGold(Database &db, const GoldAnnotation &g);
// Sets the tombstone flag. NotFound if there is no such row.
Status setGoldDeleted(Database &db, GoldId id, bool deleted);
// Removes the row and its provenance for good (only to revert the edit that created it).
Status removeGold(Database &db, GoldId id);
// One gold row, live or tombstoned, with its sources. NotFound if there is none.
Result<GoldAnnotation> gold(const Database &db, GoldId id);
// The live gold spans of an article (every article when `article` is invalid), by start.
Result<std::vector<GoldAnnotation>> goldAnnotations(const Database &db, ArticleId article);
// Every live gold span by article, start, end, handed to `visit` one at a time, without its
// sources (`sources` stays empty): one statement.
Status forEachGoldAnnotation(
    const Database &db, const std::function<Status(GoldAnnotation &&)> &visit);

// Inserts a rejection (`r.id` ignored). Constraint if the annotation or the coder does not exist.
Result<qint64> insertRejection(Database &db, const GoldRejection &r);
// Removes a rejection row for good (only to revert the edit that created it). NotFound if none.
Status removeRejection(Database &db, qint64 id);
// The live rejections of the spans of an article (every article when `article` is invalid), by
// annotation id.
Result<std::vector<GoldRejection>> goldRejections(const Database &db, ArticleId article);

} // namespace store
} // namespace fourfold
