#pragma once
// The JSON type of a value in words, for the messages of every JSON reader.

#include <QJsonValue>
#include <QString>

namespace fourfold {

// "null", "boolean", "number", "string", "array", "object" or "undefined", in the language of
// the messages (translated).
QString jsonTypeName(const QJsonValue &value);

} // namespace fourfold
