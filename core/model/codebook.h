#pragma once
// The codebook: for each framing function a definition, decision rules, examples and an
// attribute schema; plus article-level items. Stored as JSON, one row per version.

#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/ids.h"

#include <QJsonObject>
#include <QMap>
#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

// Level of measurement of an attribute or item (Krippendorff 2004, ch. 11).
enum class MeasurementLevel { Nominal, Ordinal, Interval, Ratio };
QString measurementLevelKey(MeasurementLevel level);
std::optional<MeasurementLevel> measurementLevelFromKey(const QString &key);

struct AttributeSpec {
    enum class Type { Choice, Text };
    QString key; // e.g. "polarity"
    QString label; // e.g. "Polarity"
    Type type = Type::Choice;
    QStringList values; // for Choice, in order (the order matters for ordinal levels)
    MeasurementLevel level = MeasurementLevel::Nominal;
    // For Choice: values of earlier versions that are no longer in `values`, each with the value
    // of `values` it now counts as (e.g. "neutral" → "negative" when neutral was merged).
    QMap<QString, QString> recode;
};

struct FunctionDefinition {
    FramingFunction function = FramingFunction::Problem;
    QString label; // e.g. "Problem definition"
    QString definition;
    QStringList rules; // decision rules for hard cases
    QStringList examples; // example sentences
    std::vector<AttributeSpec> attributes;
};

// A question answered once per article, e.g. the dominant function.
struct ArticleItem {
    QString key;
    QString question;
    QStringList values;
    MeasurementLevel level = MeasurementLevel::Nominal;
    // Answers of earlier versions that are no longer in `values`, each with the value it now
    // counts as.
    QMap<QString, QString> recode;
};

// A codebook's texts in another language, for coders who read that language better: the desk
// shows them in place of the codebook's own where they are given. Keys, values, levels and
// recodings stay the codebook's own, so answers given in any language are compared as one.
struct FunctionTexts {
    QString label;
    QString definition;
    QStringList rules;
    QStringList examples;
    QMap<QString, QString> attributeLabels; // by attribute key
};
struct CodebookTexts {
    QString name;
    QMap<FramingFunction, FunctionTexts> functions;
    QMap<QString, QString> questions; // by item key
};

// What `value`, given under any version, counts as under a version with `values` and `recode`:
// itself when `values` holds it, its recoding, or nothing (a value this version does not know).
std::optional<QString> countedValue(
    const QStringList &values, const QMap<QString, QString> &recode, const QString &value);

// How strictly Codebook::fromJson reads: a file to become a new version is read with every rule;
// a version already stored is read with the schema's keys and types only, so that a project whose
// codebook was stored under looser rules still opens.
enum class CodebookCheck { File, Stored };

struct Codebook {
    CodebookVersionId versionId; // row of this version in the project (0 before it is stored)
    int number = 0; // 1, 2, ... in order of creation
    QString name;
    std::vector<FunctionDefinition> functions; // exactly four, in kFramingFunctions order
    std::vector<ArticleItem> items;
    // The texts in other languages, by ISO 639 language code ("nl", "de").
    QMap<QString, CodebookTexts> translations;

    // This codebook with the texts of `language` (an ISO 639 code, or a locale name such as
    // "de_AT" whose language is looked up) wherever it gives one, its own texts elsewhere; the
    // codebook itself when it has no texts in that language.
    Codebook inLanguage(const QString &language) const;

    // Parses the JSON form (its schema is in the README, "Codebook versions"). Fails with
    // InvalidInput made by failAt: `source`, the line where the JSON text has one, and what is
    // wrong, naming the key ("functions[2].definition" must be a string, an unknown key, a fifth
    // or repeated function, a choice attribute without values, a control character...).
    static Result<Codebook> fromJson(
        const QByteArray &json, const QString &source, CodebookCheck check = CodebookCheck::File);
    QJsonObject toJson() const;

    const FunctionDefinition &definition(FramingFunction f) const;
    // The item with `key`, or nullptr.
    const ArticleItem *item(const QString &key) const;

    // What `value` of the attribute `attribute` of `f`, given under any version, counts as under
    // this one (countedValue): `value` itself for a text attribute or one this version lacks.
    std::optional<QString> countedAttributeValue(
        FramingFunction f, const QString &attribute, const QString &value) const;
    // The same for an answer to the item `key`.
    std::optional<QString> countedAnswer(const QString &key, const QString &value) const;

    // Checks `attributes` of a span with function `f` against the schema: every key must be
    // declared for `f`; Choice values must be in the value set; Text values must be strings.
    // Fails with InvalidInput naming the key and the allowed values.
    Status validateAttributes(FramingFunction f, const QJsonObject &attributes) const;
    // Checks an answer to item `key`. Fails with NotFound for an unknown item, InvalidInput for a
    // value outside its value set.
    Status validateJudgement(const QString &key, const QString &value) const;
};

} // namespace fourfold
