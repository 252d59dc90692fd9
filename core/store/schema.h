#pragma once
// The project file's schema: identity (PRAGMA application_id), version (PRAGMA user_version)
// and the ordered migrations that bring any older file up to kSchemaVersion.

#include "core/model/error.h"

#include <QString>

namespace fourfold {

class Database;

// 'FFLD': marks an SQLite file as a Fourfold project.
inline constexpr qint64 kApplicationId = 0x46464C44;
// The schema version this build writes. Migration n takes a file from version n-1 to n.
inline constexpr int kSchemaVersion = 8;

// The file's schema version (PRAGMA user_version).
Result<int> schemaVersion(Database &db);

// Prepares an open database for use:
// - a new, empty file gets application_id and every migration;
// - a file with another application_id (or a non-empty file without one) fails with Corrupt;
// - a newer schema fails with NewerSchema, naming both versions, and the file is untouched;
// - an older schema is first copied to "<path>.v<old>.bak" (VACUUM INTO; an existing backup is
//   reused when it holds the same bytes, otherwise the upgrade is refused with Duplicate: one
//   backup per version, never more), then migrated in one transaction.
// `backupPath`, if given, receives the backup's path (empty when none was made).
Status prepareSchema(Database &db, QString *backupPath = nullptr);

// Whether an open database (read-only or not) is a Fourfold project at this build's schema
// version, writing nothing: false for an older schema or an empty file (prepareSchema would
// change them); fails with Corrupt or NewerSchema as prepareSchema does.
Result<bool> schemaIsCurrent(Database &db);

// Applies migrations up to `version` on a new file only (tests build older files with it).
Status createSchemaAtVersion(Database &db, int version);

} // namespace fourfold
