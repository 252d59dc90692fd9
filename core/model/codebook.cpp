#include "core/model/codebook.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CodebookText {
    Q_DECLARE_TR_FUNCTIONS(CodebookText)
};

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

std::optional<QString> countedValue(
    const QStringList &values, const QMap<QString, QString> &recode, const QString &value)
{
    if (values.contains(value))
        return value;
    const auto it = recode.constFind(value);
    if (it != recode.constEnd())
        return *it;
    return std::nullopt;
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

std::optional<QString> Codebook::countedAttributeValue(
    FramingFunction f, const QString &attribute, const QString &value) const
{
    for (const AttributeSpec &a : definition(f).attributes)
        if (a.key == attribute && a.type == AttributeSpec::Type::Choice)
            return countedValue(a.values, a.recode, value);
    return value;
}

std::optional<QString> Codebook::countedAnswer(const QString &key, const QString &value) const
{
    const ArticleItem *i = item(key);
    return i ? countedValue(i->values, i->recode, value) : std::optional<QString> {value};
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
                CodebookText::tr("The codebook has no attribute \"%1\" for %2 (it has: %3).")
                    .arg(it.key(), functionKey(f),
                        keys.isEmpty() ? CodebookText::tr("none")
                                       : keys.join(QStringLiteral(", "))));
        }
        if (!it.value().isString())
            return fail(ErrorCode::InvalidInput,
                CodebookText::tr("The attribute \"%1\" must be text.").arg(it.key()));
        if (spec->type == AttributeSpec::Type::Choice
            && !spec->values.contains(it.value().toString()))
            return fail(ErrorCode::InvalidInput,
                CodebookText::tr("\"%1\" is not a value of the attribute \"%2\" (allowed: %3).")
                    .arg(it.value().toString(), it.key(), spec->values.join(QStringLiteral(", "))));
    }
    return {};
}

Status Codebook::validateJudgement(const QString &key, const QString &value) const
{
    const ArticleItem *i = item(key);
    if (!i)
        return fail(ErrorCode::NotFound,
            CodebookText::tr("The codebook has no article-level item \"%1\".").arg(key));
    if (!i->values.contains(value))
        return fail(ErrorCode::InvalidInput,
            CodebookText::tr("\"%1\" is not an answer to \"%2\" (allowed: %3).")
                .arg(value, key, i->values.join(QStringLiteral(", "))));
    return {};
}

Codebook Codebook::inLanguage(const QString &language) const
{
    const QString code = language.section(QLatin1Char('_'), 0, 0).section(QLatin1Char('-'), 0, 0);
    const auto texts = translations.constFind(code.toLower());
    if (texts == translations.cend())
        return *this;
    Codebook out = *this;
    if (!texts->name.isEmpty())
        out.name = texts->name;
    for (FunctionDefinition &def : out.functions) {
        const auto t = texts->functions.constFind(def.function);
        if (t == texts->functions.cend())
            continue;
        if (!t->label.isEmpty())
            def.label = t->label;
        if (!t->definition.isEmpty())
            def.definition = t->definition;
        if (!t->rules.isEmpty())
            def.rules = t->rules;
        if (!t->examples.isEmpty())
            def.examples = t->examples;
        for (AttributeSpec &a : def.attributes)
            a.label = t->attributeLabels.value(a.key, a.label);
    }
    for (ArticleItem &item : out.items)
        item.question = texts->questions.value(item.key, item.question);
    return out;
}

} // namespace fourfold
