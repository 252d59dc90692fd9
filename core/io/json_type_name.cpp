#include "core/io/json_type_name.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct JsonTypeNameText {
    Q_DECLARE_TR_FUNCTIONS(JsonTypeNameText)
};

} // namespace

QString jsonTypeName(const QJsonValue &value)
{
    // Translated like the sentence they go into, so that a German message does not name the
    // type in English ("JSON-Objekt erwartet, erhalten: Zeichenkette").
    switch (value.type()) {
    case QJsonValue::Null:
        return JsonTypeNameText::tr("null", "a JSON value's type");
    case QJsonValue::Bool:
        return JsonTypeNameText::tr("boolean", "a JSON value's type");
    case QJsonValue::Double:
        return JsonTypeNameText::tr("number", "a JSON value's type");
    case QJsonValue::String:
        return JsonTypeNameText::tr("string", "a JSON value's type");
    case QJsonValue::Array:
        return JsonTypeNameText::tr("array", "a JSON value's type");
    case QJsonValue::Object:
        return JsonTypeNameText::tr("object", "a JSON value's type");
    case QJsonValue::Undefined:
        break;
    }
    return JsonTypeNameText::tr("undefined", "a JSON value's type");
}

} // namespace fourfold
