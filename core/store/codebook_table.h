#pragma once
// Codebook versions: each version is one JSON document; the highest number is current.

#include "core/model/codebook.h"
#include "core/model/error.h"

namespace fourfold {
class Database;
namespace store {

// Stores `codebook` as the next version (number = current + 1) and returns its row id.
Result<CodebookVersionId> insertCodebookVersion(
    Database &db, const Codebook &codebook, const QString &note);
// The current (highest-numbered) version. NotFound if the project has no codebook.
Result<Codebook> currentCodebook(const Database &db);

} // namespace store
} // namespace fourfold
