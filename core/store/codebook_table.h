#pragma once
// Codebook versions: each version is one JSON document; the highest number is current.

#include "core/model/codebook.h"
#include "core/model/error.h"

#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {
class Database;
namespace store {

// Stores `codebook` as the next version (number = current + 1), made by `author` (invalid =
// unknown), under `uuid` (empty: a new one), and returns its row id.
Result<CodebookVersionId> insertCodebookVersion(Database &db, const Codebook &codebook,
    const QString &note, CoderId author = {}, const QString &uuid = {});
// How many spans and answers (live or not) refer to the version `uuid`.
Result<qint64> codebookVersionUses(const Database &db, const QString &uuid);
// Removes the version `uuid` (nothing may refer to it: codebookVersionUses).
Status deleteCodebookVersion(Database &db, const QString &uuid);
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

// A value that live rows carry, and how many carry it.
struct ValueInUse {
    QString value;
    qint64 count = 0;
};
// The values of the attribute `key` on the live coders' and gold spans of `function`, in
// order of value.
Result<std::vector<ValueInUse>> attributeValuesInUse(
    const Database &db, FramingFunction function, const QString &key);
// The distinct string values of the attribute `key` on live spans of any function, most used first
// (ties by value): of `coder`'s spans only when given, else of every coder's and gold spans.
Result<QStringList> attributeTextValues(
    const Database &db, const QString &key, std::optional<CoderId> coder);
// The answers to the item `key` in live coders' and gold judgements, in order of value.
Result<std::vector<ValueInUse>> itemValuesInUse(const Database &db, const QString &key);

} // namespace store
} // namespace fourfold
