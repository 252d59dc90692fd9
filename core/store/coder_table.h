#pragma once
// Coders and leads of a project.

#include "core/model/coder.h"
#include "core/model/error.h"

#include <vector>

namespace fourfold {
class Database;
namespace store {

// Inserts a coder (uuid made if empty; the row id `coder.id` when valid, as a redo needs) with
// the lead's passphrase hash (empty: none). Duplicate if the pseudonym is taken.
Result<CoderId> insertCoder(Database &db, const Coder &coder, const QString &passphraseHash = {});
// Removes the row of a coder nothing refers to (the undo of adding them); Constraint if
// anything does, NotFound if there is no such row.
Status removeCoder(Database &db, CoderId id);
// Live coders ordered by pseudonym, disabled ones included (Coder::disabled).
Result<std::vector<Coder>> coders(const Database &db);
// The stored passphrase hash of a coder ('' when none is set). NotFound for no such coder.
Result<QString> coderPassphraseHash(const Database &db, CoderId id);
// Each fails with NotFound when no live coder has the id.
Status setCoderPassphraseHash(Database &db, CoderId id, const QString &hash);
Status setCoderName(Database &db, CoderId id, const QString &name);
Status setCoderDisabled(Database &db, CoderId id, bool disabled);

} // namespace store
} // namespace fourfold
