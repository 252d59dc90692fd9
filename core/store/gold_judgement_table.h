#pragma once
// Gold answer rows (table gold_judgement): the lead's adjudicated answers to article-level items.

#include "core/model/error.h"
#include "core/model/gold_judgement.h"

#include <optional>
#include <vector>

namespace fourfold {
class Database;

namespace store {

// Inserts `g` (uuid, time, deleted flag as given; `g.id` ignored). Constraint if the article or
// the deciding coder does not exist.
Result<GoldJudgementId> insertGoldJudgement(Database &db, const GoldJudgement &g);
// Sets the tombstone flag. NotFound if there is no such row.
Status setGoldJudgementDeleted(Database &db, GoldJudgementId id, bool deleted);
// Removes the row for good (only to revert the edit that created it). NotFound if there is none.
Status removeGoldJudgement(Database &db, GoldJudgementId id);
// One row, live or tombstoned. NotFound if there is none.
Result<GoldJudgement> goldJudgement(const Database &db, GoldJudgementId id);
// The live gold answer to `itemKey` on `article`, if any (the newest should there be two).
Result<std::optional<GoldJudgement>> liveGoldJudgement(
    const Database &db, ArticleId article, const QString &itemKey);
// The live gold answers of an article (every article when `article` is invalid), by article,
// item and id.
Result<std::vector<GoldJudgement>> goldJudgements(const Database &db, ArticleId article);

} // namespace store
} // namespace fourfold
