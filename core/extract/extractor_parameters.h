#pragma once
// Tuning parameters of the built-in extractors: typed defaults, values given as text on a
// command line ("key=value"), and one check that refuses unknown keys and wrong types, so that a
// mistyped parameter never passes silently.

#include "core/io/json_type_name.h"
#include "core/model/error.h"

#include <QJsonObject>
#include <QJsonValue>
#include <QString>
#include <QStringList>

namespace fourfold {

// Reads "key=value" as given after --param. The value becomes a JSON number if it parses as
// one, true/false for "true"/"false", otherwise a string. InvalidArgument for text without '='
// or with an empty key.
Result<std::pair<QString, QJsonValue>> parseParameter(const QString &keyValue);

// `given` laid over `defaults`: every key of `given` must be a key of `defaults` and have the
// same JSON type (a number where a number is expected, a string where a string is...).
// InvalidArgument naming the key, the extractor `kind` and the keys it knows otherwise.
Result<QJsonObject> mergeParameters(
    const QString &kind, const QJsonObject &defaults, const QJsonObject &given);

} // namespace fourfold
