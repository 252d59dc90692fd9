#pragma once
// The codebook: for each framing function a definition, decision rules, examples and an
// attribute schema; plus article-level items. Stored as JSON, one row per version.

#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/ids.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

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
};

struct Codebook {
    CodebookVersionId versionId; // row of this version in the project (0 before it is stored)
    int number = 0; // 1, 2, ... in order of creation
    QString name;
    std::vector<FunctionDefinition> functions; // exactly four, in kFramingFunctions order
    std::vector<ArticleItem> items;

    // Parses the JSON form. Fails with InvalidInput naming `source` and what is wrong (a missing
    // function, an attribute without values, an unknown level...).
    static Result<Codebook> fromJson(const QByteArray &json, const QString &source);
    QJsonObject toJson() const;

    const FunctionDefinition &definition(FramingFunction f) const;
    // The item with `key`, or nullptr.
    const ArticleItem *item(const QString &key) const;

    // Checks `attributes` of a span with function `f` against the schema: every key must be
    // declared for `f`; Choice values must be in the value set; Text values must be strings.
    // Fails with InvalidInput naming the key and the allowed values.
    Status validateAttributes(FramingFunction f, const QJsonObject &attributes) const;
    // Checks an answer to item `key`. Fails with NotFound for an unknown item, InvalidInput for a
    // value outside its value set.
    Status validateJudgement(const QString &key, const QString &value) const;
};

} // namespace fourfold
