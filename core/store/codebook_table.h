#pragma once
// Codebook versions: each version is one JSON document; the highest number is current.

#include "core/model/codebook.h"
#include "core/model/error.h"

#include <vector>

namespace fourfold {
class Database;
namespace store {

// Stores `codebook` as the next version (number = current + 1), made by `author` (invalid =
// unknown), and returns its row id.
Result<CodebookVersionId> insertCodebookVersion(
    Database &db, const Codebook &codebook, const QString &note, CoderId author = {});
// How many times a stored codebook was parsed in this process (parsed codebooks are kept by
// their version's uuid, so this counts distinct versions read). For tests that count work.
qint64 codebookParses();
// The current (highest-numbered) version. NotFound if the project has no codebook.
Result<Codebook> currentCodebook(const Database &db);
// Version `number`. NotFound if there is none; InvalidInput if its stored JSON is malformed.
Result<Codebook> codebookByNumber(const Database &db, int number);

// One stored version without its content.
struct CodebookVersionRow {
    CodebookVersionId id;
    int number = 0;
    QString createdAt; // ISO 8601 UTC
    QString createdBy; // the author's pseudonym; empty if unknown
    QString note;
};
// Every version, oldest first.
Result<std::vector<CodebookVersionRow>> codebookVersionRows(const Database &db);

} // namespace store
} // namespace fourfold
