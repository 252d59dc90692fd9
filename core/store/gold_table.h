#pragma once
// Gold rows (adjudicated spans) and their provenance.

#include "core/model/annotation.h"
#include "core/model/error.h"

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

} // namespace store
} // namespace fourfold
