#include "core/extract/extractor_parameters.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ExtractorParametersText {
    Q_DECLARE_TR_FUNCTIONS(ExtractorParametersText)
};

} // namespace

Result<std::pair<QString, QJsonValue>> parseParameter(const QString &keyValue)
{
    const qsizetype eq = keyValue.indexOf(u'=');
    if (eq < 0)
        return fail(ErrorCode::InvalidArgument,
            ExtractorParametersText::tr("parameter \"%1\" is not of the form KEY=VALUE.")
                .arg(keyValue));
    const QString key = keyValue.left(eq).trimmed();
    const QString text = keyValue.mid(eq + 1).trimmed();
    if (key.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            ExtractorParametersText::tr("parameter \"%1\" has no key before '='.").arg(keyValue));
    if (text == QLatin1String("true") || text == QLatin1String("false"))
        return std::pair {key, QJsonValue(text == QLatin1String("true"))};
    bool isNumber = false;
    const double number = text.toDouble(&isNumber);
    if (isNumber)
        return std::pair {key, QJsonValue(number)};
    return std::pair {key, QJsonValue(text)};
}

Result<QJsonObject> mergeParameters(
    const QString &kind, const QJsonObject &defaults, const QJsonObject &given)
{
    QJsonObject merged = defaults;
    for (auto it = given.begin(); it != given.end(); ++it) {
        if (!defaults.contains(it.key()))
            return fail(ErrorCode::InvalidArgument,
                ExtractorParametersText::tr(
                    "the %1 extractor has no parameter \"%2\"; its parameters are %3.")
                    .arg(kind, it.key(), defaults.keys().join(QStringLiteral(", "))));
        const QJsonValue expected = defaults.value(it.key());
        if (expected.type() != it.value().type())
            return fail(ErrorCode::InvalidArgument,
                ExtractorParametersText::tr(
                    "parameter \"%1\" of the %2 extractor must be a %3, got a %4.")
                    .arg(it.key(), kind, jsonTypeName(expected), jsonTypeName(it.value())));
        merged.insert(it.key(), it.value());
    }
    return merged;
}

} // namespace fourfold
