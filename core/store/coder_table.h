#pragma once
// Coders and leads of a project.

#include "core/model/coder.h"
#include "core/model/error.h"

#include <vector>

namespace fourfold {
class Database;
namespace store {

// Inserts a coder (uuid made if empty). Duplicate if the pseudonym is taken.
Result<CoderId> insertCoder(Database &db, const Coder &coder);
// Live coders ordered by pseudonym.
Result<std::vector<Coder>> coders(const Database &db);

} // namespace store
} // namespace fourfold
