// The codebook's JSON form: Codebook::fromJson and Codebook::toJson.

#include "core/model/codebook.h"
#include "core/model/json_places.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QRegularExpression>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CodebookText {
    Q_DECLARE_TR_FUNCTIONS(CodebookText)
};

QString typeName(const QJsonValue &value)
{
    switch (value.type()) {
    case QJsonValue::Null:
        return CodebookText::tr("null");
    case QJsonValue::Bool:
        return CodebookText::tr("a boolean");
    case QJsonValue::Double:
        return CodebookText::tr("a number");
    case QJsonValue::String:
        return CodebookText::tr("a string");
    case QJsonValue::Array:
        return CodebookText::tr("an array");
    case QJsonValue::Object:
        return CodebookText::tr("an object");
    case QJsonValue::Undefined:
        break;
    }
    return CodebookText::tr("nothing");
}

// A text from the file as a message shows it: control characters as \uXXXX, so that none reaches
// a terminal raw.
QString shown(const QString &text)
{
    QString out;
    for (const QChar c : text) {
        if (c.category() == QChar::Other_Control)
            out += QStringLiteral("\\u%1").arg(c.unicode(), 4, 16, QLatin1Char('0'));
        else
            out += c;
    }
    return out;
}

// "000A" for a line feed.
QString codePoint(QChar c)
{
    return QString::number(c.unicode(), 16).toUpper().rightJustified(4, QLatin1Char('0'));
}

QString member(const QString &path, const QString &key)
{
    return path.isEmpty() ? key : path + QLatin1Char('.') + key;
}

QString element(const QString &path, qsizetype index)
{
    return QStringLiteral("%1[%2]").arg(path).arg(index);
}

// Whether a text may hold line breaks and tabs (definitions, rules, examples, questions) or is
// one line (names, labels, keys, values).
enum class Lines { One, Many };

// Reads the codebook object, checking every key and type; see Codebook::fromJson.
class Reader
{
public:
    Reader(const QByteArray &json, const QString &source, CodebookCheck check)
        : m_source(source)
        , m_check(check)
    {
        if (check == CodebookCheck::File)
            m_places.emplace(json);
    }

    Result<Codebook> read(const QJsonObject &root) const
    {
        if (m_places && !m_places->repeatedKey().isEmpty())
            return failAt(ErrorCode::InvalidInput, m_source, m_places->repeatedKeyLine(), 0,
                CodebookText::tr("the key \"%1\" appears twice.")
                    .arg(shown(m_places->repeatedKey())));
        FOURFOLD_TRY_STATUS(
            onlyKeys(root, QString(), {"name", "functions", "items", "translations"}));
        Codebook book;
        auto name = text(root, QString(), QStringLiteral("name"), QString(), Lines::One);
        if (!name)
            return std::unexpected(name.error());
        book.name = *name;

        auto functions = array(root, QString(), QStringLiteral("functions"), true);
        if (!functions)
            return std::unexpected(functions.error());
        book.functions.resize(kFramingFunctions.size());
        std::vector<bool> defined(kFramingFunctions.size(), false);
        for (qsizetype i = 0; i < functions->size(); ++i) {
            const QString path = element(QStringLiteral("functions"), i);
            auto def = function(functions->at(i), path);
            if (!def)
                return std::unexpected(def.error());
            const size_t at = size_t(def->function);
            if (defined[at])
                return wrong(member(path, QStringLiteral("key")),
                    CodebookText::tr(
                        "\"%1\" defines the function \"%2\" a second time; a codebook defines "
                        "problem, cause, evaluation and remedy once each.")
                        .arg(member(path, QStringLiteral("key")), functionKey(def->function)));
            defined[at] = true;
            book.functions[at] = std::move(*def);
        }
        for (FramingFunction f : kFramingFunctions)
            if (!defined[size_t(f)])
                return wrong(QStringLiteral("functions"),
                    CodebookText::tr("the codebook does not define the function \"%1\".")
                        .arg(functionKey(f)));

        auto items = array(root, QString(), QStringLiteral("items"), false);
        if (!items)
            return std::unexpected(items.error());
        for (qsizetype i = 0; i < items->size(); ++i) {
            const QString path = element(QStringLiteral("items"), i);
            auto item = articleItem(items->at(i), path);
            if (!item)
                return std::unexpected(item.error());
            if (book.item(item->key))
                return wrong(member(path, QStringLiteral("key")),
                    CodebookText::tr("\"%1\" repeats the item \"%2\".")
                        .arg(member(path, QStringLiteral("key")), shown(item->key)));
            book.items.push_back(std::move(*item));
        }

        if (root.contains(QStringLiteral("translations"))) {
            auto all =
                object(root.value(QStringLiteral("translations")), QStringLiteral("translations"));
            if (!all)
                return std::unexpected(all.error());
            for (auto it = all->begin(); it != all->end(); ++it) {
                const QString path = member(QStringLiteral("translations"), it.key());
                static const QRegularExpression code(QStringLiteral("^[a-z]{2,3}$"));
                if (!code.match(it.key()).hasMatch())
                    return wrong(path,
                        CodebookText::tr(
                            "\"%1\" is not a language code (two or three lower-case letters, "
                            "ISO 639, such as \"nl\" or \"de\").")
                            .arg(shown(it.key())));
                auto texts = translation(it.value(), path, book);
                if (!texts)
                    return std::unexpected(texts.error());
                book.translations.insert(it.key(), std::move(*texts));
            }
        }
        return book;
    }

private:
    std::unexpected<Error> wrong(const QString &path, const QString &what) const
    {
        return failAt(
            ErrorCode::InvalidInput, m_source, m_places ? m_places->line(path) : 0, 0, what);
    }

    std::unexpected<Error> wrongType(
        const QString &path, const QJsonValue &value, const QString &expected) const
    {
        return wrong(path,
            CodebookText::tr("\"%1\" must be %2, not %3.")
                .arg(shown(path), expected, typeName(value)));
    }

    Status onlyKeys(const QJsonObject &o, const QString &path,
        std::initializer_list<const char *> allowed) const
    {
        QStringList names;
        for (const char *a : allowed)
            names << QString::fromLatin1(a);
        for (auto it = o.begin(); it != o.end(); ++it)
            if (!names.contains(it.key()))
                return wrong(member(path, it.key()),
                    CodebookText::tr("unknown key \"%1\" (expected one of: %2).")
                        .arg(shown(member(path, it.key())), names.join(QStringLiteral(", "))));
        return {};
    }

    Status checkText(const QString &path, const QString &text, Lines lines) const
    {
        if (m_check == CodebookCheck::Stored)
            return {};
        for (const QChar c : text) {
            if (c.category() != QChar::Other_Control)
                continue;
            if (lines == Lines::Many && (c == u'\n' || c == u'\t'))
                continue;
            return wrong(path,
                lines == Lines::Many
                    ? CodebookText::tr(
                        "\"%1\" contains the control character U+%2; only line breaks and tabs "
                        "may stand in definitions, rules, examples and questions.")
                          .arg(shown(path), codePoint(c))
                    : CodebookText::tr("\"%1\" contains the control character U+%2.")
                          .arg(shown(path), codePoint(c)));
        }
        return {};
    }

    // The string member `key` of `o`; `fallback` when it is absent (nothing: it is required).
    Result<QString> text(const QJsonObject &o, const QString &path, const QString &key,
        const std::optional<QString> &fallback, Lines lines) const
    {
        const QString at = member(path, key);
        if (!o.contains(key)) {
            if (fallback)
                return *fallback;
            return wrong(path, CodebookText::tr("\"%1\" is missing.").arg(shown(at)));
        }
        const QJsonValue v = o.value(key);
        if (!v.isString())
            return wrongType(at, v, CodebookText::tr("a string"));
        FOURFOLD_TRY_STATUS(checkText(at, v.toString(), lines));
        return v.toString();
    }

    // The array member `key` of `o`; empty when it is absent and not `required`.
    Result<QJsonArray> array(
        const QJsonObject &o, const QString &path, const QString &key, bool required) const
    {
        const QString at = member(path, key);
        if (!o.contains(key)) {
            if (!required)
                return QJsonArray();
            return wrong(path, CodebookText::tr("\"%1\" is missing.").arg(shown(at)));
        }
        const QJsonValue v = o.value(key);
        if (!v.isArray())
            return wrongType(at, v, CodebookText::tr("an array"));
        return v.toArray();
    }

    Result<QStringList> texts(const QJsonObject &o, const QString &path, const QString &key,
        bool required, Lines lines) const
    {
        auto a = array(o, path, key, required);
        if (!a)
            return std::unexpected(a.error());
        QStringList out;
        for (qsizetype i = 0; i < a->size(); ++i) {
            const QString at = element(member(path, key), i);
            const QJsonValue v = a->at(i);
            if (!v.isString())
                return wrongType(at, v, CodebookText::tr("a string"));
            FOURFOLD_TRY_STATUS(checkText(at, v.toString(), lines));
            out << v.toString();
        }
        return out;
    }

    // The value set of a choice attribute or an item: at least one value, none empty or twice.
    Result<QStringList> valueSet(const QJsonObject &o, const QString &path) const
    {
        auto out = texts(o, path, QStringLiteral("values"), true, Lines::One);
        if (!out)
            return out;
        const QString at = member(path, QStringLiteral("values"));
        if (out->isEmpty())
            return wrong(at, CodebookText::tr("\"%1\" lists no values.").arg(shown(at)));
        if (m_check == CodebookCheck::Stored)
            return out;
        for (qsizetype i = 0; i < out->size(); ++i) {
            if (out->at(i).trimmed().isEmpty())
                return wrong(element(at, i),
                    CodebookText::tr("\"%1\" is an empty value.").arg(shown(element(at, i))));
            if (out->indexOf(out->at(i)) < i)
                return wrong(element(at, i),
                    CodebookText::tr("\"%1\" repeats the value \"%2\".")
                        .arg(shown(element(at, i)), shown(out->at(i))));
        }
        return out;
    }

    // The "recode" member: an object from values of earlier versions to one of `values`.
    Result<QMap<QString, QString>> recode(
        const QJsonObject &o, const QString &path, const QStringList &values) const
    {
        QMap<QString, QString> out;
        const QString at = member(path, QStringLiteral("recode"));
        if (!o.contains(QStringLiteral("recode")))
            return out;
        const QJsonValue v = o.value(QStringLiteral("recode"));
        if (!v.isObject())
            return wrongType(at, v, CodebookText::tr("an object"));
        const QJsonObject map = v.toObject();
        for (auto it = map.begin(); it != map.end(); ++it) {
            const QString from = member(at, it.key());
            FOURFOLD_TRY_STATUS(checkText(from, it.key(), Lines::One));
            if (!it.value().isString())
                return wrongType(from, it.value(), CodebookText::tr("a string"));
            if (it.key().trimmed().isEmpty())
                return wrong(
                    from, CodebookText::tr("\"%1\" recodes an empty value.").arg(shown(from)));
            if (values.contains(it.key()))
                return wrong(from,
                    CodebookText::tr(
                        "\"%1\" recodes \"%2\", which is still one of the values; recode only "
                        "values that were dropped.")
                        .arg(shown(from), shown(it.key())));
            if (!values.contains(it.value().toString()))
                return wrong(from,
                    CodebookText::tr(
                        "\"%1\" recodes to \"%2\", which is not one of the values (%3).")
                        .arg(shown(from), shown(it.value().toString()),
                            shown(values.join(QStringLiteral(", ")))));
            out.insert(it.key(), it.value().toString());
        }
        return out;
    }

    Result<MeasurementLevel> level(const QJsonObject &o, const QString &path) const
    {
        auto key = text(o, path, QStringLiteral("level"), QStringLiteral("nominal"), Lines::One);
        if (!key)
            return std::unexpected(key.error());
        auto l = measurementLevelFromKey(*key);
        if (!l)
            return wrong(member(path, QStringLiteral("level")),
                CodebookText::tr(
                    "\"%1\" is \"%2\", not a level of measurement (nominal, ordinal, interval or "
                    "ratio).")
                    .arg(member(path, QStringLiteral("level")), shown(*key)));
        return *l;
    }

    Result<QJsonObject> object(const QJsonValue &v, const QString &path) const
    {
        if (!v.isObject())
            return wrongType(path, v, CodebookText::tr("an object"));
        return v.toObject();
    }

    // A key of an attribute or item: a non-empty line.
    Result<QString> keyOf(const QJsonObject &o, const QString &path) const
    {
        auto k = text(o, path, QStringLiteral("key"), std::nullopt, Lines::One);
        if (k && k->trimmed().isEmpty())
            return wrong(member(path, QStringLiteral("key")),
                CodebookText::tr("\"%1\" is empty.").arg(member(path, QStringLiteral("key"))));
        return k;
    }

    Result<FunctionDefinition> function(const QJsonValue &v, const QString &path) const
    {
        auto o = object(v, path);
        if (!o)
            return std::unexpected(o.error());
        FOURFOLD_TRY_STATUS(
            onlyKeys(*o, path, {"key", "label", "definition", "rules", "examples", "attributes"}));
        auto k = text(*o, path, QStringLiteral("key"), std::nullopt, Lines::One);
        if (!k)
            return std::unexpected(k.error());
        const std::optional<FramingFunction> f = functionFromKey(*k);
        if (!f || functionKey(*f) != *k)
            return wrong(member(path, QStringLiteral("key")),
                CodebookText::tr(
                    "\"%1\" is \"%2\", not one of the four functions (problem, cause, evaluation, "
                    "remedy).")
                    .arg(member(path, QStringLiteral("key")), shown(*k)));
        FunctionDefinition def;
        def.function = *f;
        auto label = text(*o, path, QStringLiteral("label"), *k, Lines::One);
        auto definition = text(*o, path, QStringLiteral("definition"), std::nullopt, Lines::Many);
        auto rules = texts(*o, path, QStringLiteral("rules"), false, Lines::Many);
        auto examples = texts(*o, path, QStringLiteral("examples"), false, Lines::Many);
        auto attributes = array(*o, path, QStringLiteral("attributes"), false);
        if (!label)
            return std::unexpected(label.error());
        if (!definition)
            return std::unexpected(definition.error());
        if (!rules)
            return std::unexpected(rules.error());
        if (!examples)
            return std::unexpected(examples.error());
        if (!attributes)
            return std::unexpected(attributes.error());
        def.label = *label;
        def.definition = *definition;
        def.rules = *rules;
        def.examples = *examples;
        for (qsizetype i = 0; i < attributes->size(); ++i) {
            const QString at = element(member(path, QStringLiteral("attributes")), i);
            auto spec = attribute(attributes->at(i), at);
            if (!spec)
                return std::unexpected(spec.error());
            if (std::ranges::find(def.attributes, spec->key, &AttributeSpec::key)
                != def.attributes.end())
                return wrong(member(at, QStringLiteral("key")),
                    CodebookText::tr("\"%1\" repeats the attribute \"%2\" of %3.")
                        .arg(member(at, QStringLiteral("key")), shown(spec->key), *k));
            def.attributes.push_back(std::move(*spec));
        }
        return def;
    }

    Result<AttributeSpec> attribute(const QJsonValue &v, const QString &path) const
    {
        auto o = object(v, path);
        if (!o)
            return std::unexpected(o.error());
        FOURFOLD_TRY_STATUS(
            onlyKeys(*o, path, {"key", "label", "type", "values", "level", "recode"}));
        AttributeSpec spec;
        auto k = keyOf(*o, path);
        if (!k)
            return std::unexpected(k.error());
        spec.key = *k;
        auto label = text(*o, path, QStringLiteral("label"), spec.key, Lines::One);
        if (!label)
            return std::unexpected(label.error());
        spec.label = *label;
        auto type = text(*o, path, QStringLiteral("type"), QStringLiteral("choice"), Lines::One);
        if (!type)
            return std::unexpected(type.error());
        if (*type == QLatin1String("text")) {
            spec.type = AttributeSpec::Type::Text;
            for (const char *only : {"values", "recode"})
                if (o->contains(QLatin1String(only)))
                    return wrong(member(path, QLatin1String(only)),
                        CodebookText::tr(
                            "\"%1\" is only for choice attributes; \"%2\" is a text attribute.")
                            .arg(member(path, QLatin1String(only)), shown(spec.key)));
        } else if (*type == QLatin1String("choice")) {
            spec.type = AttributeSpec::Type::Choice;
            auto values = valueSet(*o, path);
            if (!values)
                return std::unexpected(values.error());
            spec.values = *values;
            auto map = recode(*o, path, spec.values);
            if (!map)
                return std::unexpected(map.error());
            spec.recode = *map;
        } else {
            return wrong(member(path, QStringLiteral("type")),
                CodebookText::tr("\"%1\" is \"%2\", not an attribute type (choice or text).")
                    .arg(member(path, QStringLiteral("type")), shown(*type)));
        }
        auto l = level(*o, path);
        if (!l)
            return std::unexpected(l.error());
        spec.level = *l;
        return spec;
    }

    // The texts of one language (see CodebookTexts): every function, attribute and item they
    // name must be the codebook's; what they leave out stays the codebook's own.
    Result<CodebookTexts> translation(
        const QJsonValue &v, const QString &path, const Codebook &book) const
    {
        auto o = object(v, path);
        if (!o)
            return std::unexpected(o.error());
        FOURFOLD_TRY_STATUS(onlyKeys(*o, path, {"name", "functions", "items"}));
        CodebookTexts out;
        auto name = text(*o, path, QStringLiteral("name"), QString(), Lines::One);
        if (!name)
            return std::unexpected(name.error());
        out.name = *name;
        auto functions = array(*o, path, QStringLiteral("functions"), false);
        if (!functions)
            return std::unexpected(functions.error());
        for (qsizetype i = 0; i < functions->size(); ++i) {
            const QString at = element(member(path, QStringLiteral("functions")), i);
            auto f = object(functions->at(i), at);
            if (!f)
                return std::unexpected(f.error());
            FOURFOLD_TRY_STATUS(onlyKeys(
                *f, at, {"key", "label", "definition", "rules", "examples", "attributes"}));
            auto k = text(*f, at, QStringLiteral("key"), std::nullopt, Lines::One);
            if (!k)
                return std::unexpected(k.error());
            const std::optional<FramingFunction> function = functionFromKey(*k);
            if (!function || functionKey(*function) != *k)
                return wrong(member(at, QStringLiteral("key")),
                    CodebookText::tr(
                        "\"%1\" is \"%2\", not one of the four functions (problem, cause, "
                        "evaluation, remedy).")
                        .arg(member(at, QStringLiteral("key")), shown(*k)));
            if (out.functions.contains(*function))
                return wrong(member(at, QStringLiteral("key")),
                    CodebookText::tr("\"%1\" gives the texts of \"%2\" a second time.")
                        .arg(member(at, QStringLiteral("key")), *k));
            FunctionTexts t;
            auto label = text(*f, at, QStringLiteral("label"), QString(), Lines::One);
            auto definition = text(*f, at, QStringLiteral("definition"), QString(), Lines::Many);
            auto rules = texts(*f, at, QStringLiteral("rules"), false, Lines::Many);
            auto examples = texts(*f, at, QStringLiteral("examples"), false, Lines::Many);
            auto attributes = array(*f, at, QStringLiteral("attributes"), false);
            for (const Status &st : {label ? Status {} : Status(std::unexpected(label.error())),
                     definition ? Status {} : Status(std::unexpected(definition.error())),
                     rules ? Status {} : Status(std::unexpected(rules.error())),
                     examples ? Status {} : Status(std::unexpected(examples.error())),
                     attributes ? Status {} : Status(std::unexpected(attributes.error()))})
                FOURFOLD_TRY_STATUS(st);
            t.label = *label;
            t.definition = *definition;
            t.rules = *rules;
            t.examples = *examples;
            const FunctionDefinition &def = book.definition(*function);
            for (qsizetype j = 0; j < attributes->size(); ++j) {
                const QString aat = element(member(at, QStringLiteral("attributes")), j);
                auto a = object(attributes->at(j), aat);
                if (!a)
                    return std::unexpected(a.error());
                FOURFOLD_TRY_STATUS(onlyKeys(*a, aat, {"key", "label"}));
                auto key = keyOf(*a, aat);
                auto alabel = text(*a, aat, QStringLiteral("label"), std::nullopt, Lines::One);
                if (!key)
                    return std::unexpected(key.error());
                if (!alabel)
                    return std::unexpected(alabel.error());
                if (std::ranges::find(def.attributes, *key, &AttributeSpec::key)
                    == def.attributes.end())
                    return wrong(member(aat, QStringLiteral("key")),
                        CodebookText::tr(
                            "\"%1\" names the attribute \"%2\", which %3 does not have.")
                            .arg(member(aat, QStringLiteral("key")), shown(*key), *k));
                t.attributeLabels.insert(*key, *alabel);
            }
            out.functions.insert(*function, std::move(t));
        }
        auto items = array(*o, path, QStringLiteral("items"), false);
        if (!items)
            return std::unexpected(items.error());
        for (qsizetype i = 0; i < items->size(); ++i) {
            const QString at = element(member(path, QStringLiteral("items")), i);
            auto item = object(items->at(i), at);
            if (!item)
                return std::unexpected(item.error());
            FOURFOLD_TRY_STATUS(onlyKeys(*item, at, {"key", "question"}));
            auto key = keyOf(*item, at);
            auto question = text(*item, at, QStringLiteral("question"), std::nullopt, Lines::Many);
            if (!key)
                return std::unexpected(key.error());
            if (!question)
                return std::unexpected(question.error());
            if (!book.item(*key))
                return wrong(member(at, QStringLiteral("key")),
                    CodebookText::tr(
                        "\"%1\" names the item \"%2\", which the codebook does not have.")
                        .arg(member(at, QStringLiteral("key")), shown(*key)));
            out.questions.insert(*key, *question);
        }
        return out;
    }

    Result<ArticleItem> articleItem(const QJsonValue &v, const QString &path) const
    {
        auto o = object(v, path);
        if (!o)
            return std::unexpected(o.error());
        FOURFOLD_TRY_STATUS(onlyKeys(*o, path, {"key", "question", "values", "level", "recode"}));
        ArticleItem item;
        auto k = keyOf(*o, path);
        if (!k)
            return std::unexpected(k.error());
        item.key = *k;
        auto question = text(*o, path, QStringLiteral("question"), std::nullopt, Lines::Many);
        if (!question)
            return std::unexpected(question.error());
        item.question = *question;
        auto values = valueSet(*o, path);
        if (!values)
            return std::unexpected(values.error());
        item.values = *values;
        auto map = recode(*o, path, item.values);
        if (!map)
            return std::unexpected(map.error());
        item.recode = *map;
        auto l = level(*o, path);
        if (!l)
            return std::unexpected(l.error());
        item.level = *l;
        return item;
    }

    QString m_source;
    CodebookCheck m_check;
    std::optional<JsonPlaces> m_places;
};

QJsonObject recodeJson(const QMap<QString, QString> &recode)
{
    QJsonObject o;
    for (auto it = recode.begin(); it != recode.end(); ++it)
        o.insert(it.key(), it.value());
    return o;
}

} // namespace

Result<Codebook> Codebook::fromJson(
    const QByteArray &json, const QString &source, CodebookCheck check)
{
    QJsonParseError error;
    const QJsonDocument doc = QJsonDocument::fromJson(json, &error);
    if (error.error != QJsonParseError::NoError) {
        const QByteArray before = json.left(error.offset);
        const qsizetype lineStart = before.lastIndexOf('\n') + 1;
        return failAt(ErrorCode::InvalidInput, source, before.count('\n') + 1,
            QString::fromUtf8(before.mid(lineStart)).size() + 1,
            CodebookText::tr("the codebook is not valid JSON: %1.").arg(error.errorString()));
    }
    if (!doc.isObject())
        return failAt(ErrorCode::InvalidInput, source, 1, 0,
            CodebookText::tr("the codebook must be a JSON object, not %1.")
                .arg(typeName(doc.isArray() ? QJsonValue(doc.array()) : QJsonValue())));
    return Reader(json, source, check).read(doc.object());
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
            if (!a.recode.isEmpty())
                ao.insert(QStringLiteral("recode"), recodeJson(a.recode));
            attributes.append(ao);
        }
        functionsJson.append(QJsonObject {{QStringLiteral("key"), functionKey(def.function)},
            {QStringLiteral("label"), def.label}, {QStringLiteral("definition"), def.definition},
            {QStringLiteral("rules"), QJsonArray::fromStringList(def.rules)},
            {QStringLiteral("examples"), QJsonArray::fromStringList(def.examples)},
            {QStringLiteral("attributes"), attributes}});
    }
    QJsonArray itemsJson;
    for (const ArticleItem &item : items) {
        QJsonObject io {{QStringLiteral("key"), item.key},
            {QStringLiteral("question"), item.question},
            {QStringLiteral("values"), QJsonArray::fromStringList(item.values)},
            {QStringLiteral("level"), measurementLevelKey(item.level)}};
        if (!item.recode.isEmpty())
            io.insert(QStringLiteral("recode"), recodeJson(item.recode));
        itemsJson.append(io);
    }
    QJsonObject out {{QStringLiteral("name"), name}, {QStringLiteral("functions"), functionsJson},
        {QStringLiteral("items"), itemsJson}};
    if (translations.isEmpty())
        return out;
    QJsonObject translationsJson;
    for (auto it = translations.cbegin(); it != translations.cend(); ++it) {
        QJsonObject t;
        if (!it->name.isEmpty())
            t.insert(QStringLiteral("name"), it->name);
        QJsonArray fs;
        for (FramingFunction f : kFramingFunctions) {
            const auto ft = it->functions.constFind(f);
            if (ft == it->functions.cend())
                continue;
            QJsonObject fo {{QStringLiteral("key"), functionKey(f)}};
            if (!ft->label.isEmpty())
                fo.insert(QStringLiteral("label"), ft->label);
            if (!ft->definition.isEmpty())
                fo.insert(QStringLiteral("definition"), ft->definition);
            if (!ft->rules.isEmpty())
                fo.insert(QStringLiteral("rules"), QJsonArray::fromStringList(ft->rules));
            if (!ft->examples.isEmpty())
                fo.insert(QStringLiteral("examples"), QJsonArray::fromStringList(ft->examples));
            QJsonArray as;
            for (const AttributeSpec &a : definition(f).attributes)
                if (ft->attributeLabels.contains(a.key))
                    as.append(QJsonObject {{QStringLiteral("key"), a.key},
                        {QStringLiteral("label"), ft->attributeLabels.value(a.key)}});
            if (!as.isEmpty())
                fo.insert(QStringLiteral("attributes"), as);
            fs.append(fo);
        }
        if (!fs.isEmpty())
            t.insert(QStringLiteral("functions"), fs);
        QJsonArray is;
        for (const ArticleItem &item : items)
            if (it->questions.contains(item.key))
                is.append(QJsonObject {{QStringLiteral("key"), item.key},
                    {QStringLiteral("question"), it->questions.value(item.key)}});
        if (!is.isEmpty())
            t.insert(QStringLiteral("items"), is);
        translationsJson.insert(it.key(), t);
    }
    out.insert(QStringLiteral("translations"), translationsJson);
    return out;
}

} // namespace fourfold
