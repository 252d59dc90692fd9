#include "core/model/codebook.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("Codebook", text);
}

QStringList stringList(const QJsonValue &value)
{
    QStringList out;
    for (const QJsonValue &v : value.toArray())
        out << v.toString();
    return out;
}

Result<MeasurementLevel> parseLevel(
    const QJsonObject &o, const QString &source, const QString &owner)
{
    if (!o.contains(QLatin1String("level")))
        return MeasurementLevel::Nominal;
    auto level = measurementLevelFromKey(o.value(QLatin1String("level")).toString());
    if (!level)
        return fail(ErrorCode::InvalidInput,
            tr("%1: %2 has an unknown level of measurement \"%3\" (expected nominal, ordinal, "
               "interval or ratio).")
                .arg(source, owner, o.value(QLatin1String("level")).toString()));
    return *level;
}

} // namespace

QString measurementLevelKey(MeasurementLevel level)
{
    switch (level) {
    case MeasurementLevel::Nominal:
        return QStringLiteral("nominal");
    case MeasurementLevel::Ordinal:
        return QStringLiteral("ordinal");
    case MeasurementLevel::Interval:
        return QStringLiteral("interval");
    case MeasurementLevel::Ratio:
        return QStringLiteral("ratio");
    }
    return {};
}

std::optional<MeasurementLevel> measurementLevelFromKey(const QString &key)
{
    for (auto l : {MeasurementLevel::Nominal, MeasurementLevel::Ordinal, MeasurementLevel::Interval,
             MeasurementLevel::Ratio})
        if (measurementLevelKey(l) == key)
            return l;
    return std::nullopt;
}

Result<Codebook> Codebook::fromJson(const QByteArray &json, const QString &source)
{
    QJsonParseError error;
    const QJsonDocument doc = QJsonDocument::fromJson(json, &error);
    if (error.error != QJsonParseError::NoError || !doc.isObject())
        return fail(ErrorCode::InvalidInput,
            tr("%1: the codebook is not a JSON object.").arg(source), error.errorString());
    const QJsonObject root = doc.object();
    Codebook book;
    book.name = root.value(QLatin1String("name")).toString();

    const QJsonArray functions = root.value(QLatin1String("functions")).toArray();
    for (FramingFunction f : kFramingFunctions) {
        const QString key = functionKey(f);
        auto it = std::find_if(functions.begin(), functions.end(), [&](const QJsonValue &v) {
            return v.toObject().value(QLatin1String("key")).toString() == key;
        });
        if (it == functions.end())
            return fail(ErrorCode::InvalidInput,
                tr("%1: the codebook does not define the function \"%2\".").arg(source, key));
        const QJsonObject o = it->toObject();
        FunctionDefinition def;
        def.function = f;
        def.label = o.value(QLatin1String("label")).toString(key);
        def.definition = o.value(QLatin1String("definition")).toString();
        def.rules = stringList(o.value(QLatin1String("rules")));
        def.examples = stringList(o.value(QLatin1String("examples")));
        for (const QJsonValue &av : o.value(QLatin1String("attributes")).toArray()) {
            const QJsonObject a = av.toObject();
            AttributeSpec spec;
            spec.key = a.value(QLatin1String("key")).toString();
            spec.label = a.value(QLatin1String("label")).toString(spec.key);
            const QString type = a.value(QLatin1String("type")).toString(QStringLiteral("choice"));
            if (spec.key.isEmpty())
                return fail(ErrorCode::InvalidInput,
                    tr("%1: an attribute of \"%2\" has no key.").arg(source, key));
            if (type == QLatin1String("text")) {
                spec.type = AttributeSpec::Type::Text;
            } else if (type == QLatin1String("choice")) {
                spec.type = AttributeSpec::Type::Choice;
                spec.values = stringList(a.value(QLatin1String("values")));
                if (spec.values.isEmpty())
                    return fail(ErrorCode::InvalidInput,
                        tr("%1: the choice attribute \"%2\" of \"%3\" lists no values.")
                            .arg(source, spec.key, key));
            } else {
                return fail(ErrorCode::InvalidInput,
                    tr("%1: the attribute \"%2\" has an unknown type \"%3\" (expected choice or "
                       "text).")
                        .arg(source, spec.key, type));
            }
            auto level = parseLevel(a, source, spec.key);
            if (!level)
                return std::unexpected(level.error());
            spec.level = *level;
            def.attributes.push_back(spec);
        }
        book.functions.push_back(def);
    }
    for (const QJsonValue &iv : root.value(QLatin1String("items")).toArray()) {
        const QJsonObject o = iv.toObject();
        ArticleItem item;
        item.key = o.value(QLatin1String("key")).toString();
        item.question = o.value(QLatin1String("question")).toString();
        item.values = stringList(o.value(QLatin1String("values")));
        if (item.key.isEmpty() || item.values.isEmpty())
            return fail(ErrorCode::InvalidInput,
                tr("%1: an article-level item needs a key and values.").arg(source));
        auto level = parseLevel(o, source, item.key);
        if (!level)
            return std::unexpected(level.error());
        item.level = *level;
        book.items.push_back(item);
    }
    return book;
}

QJsonObject Codebook::toJson() const
{
    QJsonArray functionsJson;
    for (const FunctionDefinition &def : functions) {
        QJsonArray attributes;
        for (const AttributeSpec &a : def.attributes) {
            QJsonObject ao {{QStringLiteral("key"), a.key}, {QStringLiteral("label"), a.label},
                {QStringLiteral("type"),
                    a.type == AttributeSpec::Type::Text ? QStringLiteral("text")
                                                        : QStringLiteral("choice")},
                {QStringLiteral("level"), measurementLevelKey(a.level)}};
            if (a.type == AttributeSpec::Type::Choice)
                ao.insert(QStringLiteral("values"), QJsonArray::fromStringList(a.values));
            attributes.append(ao);
        }
        functionsJson.append(QJsonObject {{QStringLiteral("key"), functionKey(def.function)},
            {QStringLiteral("label"), def.label}, {QStringLiteral("definition"), def.definition},
            {QStringLiteral("rules"), QJsonArray::fromStringList(def.rules)},
            {QStringLiteral("examples"), QJsonArray::fromStringList(def.examples)},
            {QStringLiteral("attributes"), attributes}});
    }
    QJsonArray itemsJson;
    for (const ArticleItem &item : items)
        itemsJson.append(QJsonObject {{QStringLiteral("key"), item.key},
            {QStringLiteral("question"), item.question},
            {QStringLiteral("values"), QJsonArray::fromStringList(item.values)},
            {QStringLiteral("level"), measurementLevelKey(item.level)}});
    return QJsonObject {{QStringLiteral("name"), name},
        {QStringLiteral("functions"), functionsJson}, {QStringLiteral("items"), itemsJson}};
}

const FunctionDefinition &Codebook::definition(FramingFunction f) const
{
    return functions.at(size_t(f));
}

const ArticleItem *Codebook::item(const QString &key) const
{
    for (const ArticleItem &i : items)
        if (i.key == key)
            return &i;
    return nullptr;
}

Status Codebook::validateAttributes(FramingFunction f, const QJsonObject &attributes) const
{
    const FunctionDefinition &def = definition(f);
    for (auto it = attributes.begin(); it != attributes.end(); ++it) {
        auto spec = std::find_if(def.attributes.begin(), def.attributes.end(),
            [&](const AttributeSpec &a) { return a.key == it.key(); });
        if (spec == def.attributes.end()) {
            QStringList keys;
            for (const AttributeSpec &a : def.attributes)
                keys << a.key;
            return fail(ErrorCode::InvalidInput,
                tr("The codebook has no attribute \"%1\" for %2 (it has: %3).")
                    .arg(it.key(), functionKey(f),
                        keys.isEmpty() ? tr("none") : keys.join(QStringLiteral(", "))));
        }
        if (!it.value().isString())
            return fail(
                ErrorCode::InvalidInput, tr("The attribute \"%1\" must be text.").arg(it.key()));
        if (spec->type == AttributeSpec::Type::Choice
            && !spec->values.contains(it.value().toString()))
            return fail(ErrorCode::InvalidInput,
                tr("\"%1\" is not a value of the attribute \"%2\" (allowed: %3).")
                    .arg(it.value().toString(), it.key(), spec->values.join(QStringLiteral(", "))));
    }
    return {};
}

Status Codebook::validateJudgement(const QString &key, const QString &value) const
{
    const ArticleItem *i = item(key);
    if (!i)
        return fail(
            ErrorCode::NotFound, tr("The codebook has no article-level item \"%1\".").arg(key));
    if (!i->values.contains(value))
        return fail(ErrorCode::InvalidInput,
            tr("\"%1\" is not an answer to \"%2\" (allowed: %3).")
                .arg(value, key, i->values.join(QStringLiteral(", "))));
    return {};
}

} // namespace fourfold
