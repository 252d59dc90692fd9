#pragma once
// Reading a large JSON document front to back: the objects at chosen places (the items of a
// collection) are handed over one at a time as they are read and then dropped, so a file of any
// size holds about one item in memory. Parsed by nlohmann-json's streaming parser.

#include "core/model/error.h"

#include <QJsonObject>
#include <QJsonValue>
#include <QStringList>

#include <functional>

namespace fourfold {

// Where an item starts in the file: line and column (1-based; columns in characters) of its "{".
struct JsonPlace {
    qint64 line = 0;
    qint64 column = 0;
};

// Whether the object reached through `keys` is an item: one key per level from the root, an
// empty string for an element of an array (e.g. {"first", "items", ""}, or {""} for the
// elements of a root array).
using JsonItemPlace = std::function<bool(const QStringList &keys)>;
// Takes one item; a failure stops the reading and is returned as it is.
using JsonItemVisit = std::function<Status(QJsonObject &&item, JsonPlace where)>;

// Reads `path`, handing each item to `visit` in file order, and returns the rest of the document
// (the items left out). Fails with Io if the file cannot be read, with InvalidInput naming the
// file, line and column for text that is not JSON, or with the first failure of `visit`.
Result<QJsonValue> streamJsonItems(
    const QString &path, const JsonItemPlace &isItem, const JsonItemVisit &visit);

} // namespace fourfold
