#include "core/exchange/w3c_format.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QRegularExpression>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct W3cFormatText {
    Q_DECLARE_TR_FUNCTIONS(W3cFormatText)
};

const QString kContext = QStringLiteral("http://www.w3.org/ns/anno.jsonld");
const QString kNiPrefix = QStringLiteral("ni:///sha-256;");
const QString kCoderPrefix = QStringLiteral("urn:fourfold:coder:");
const QString kSoftwarePrefix = QStringLiteral("urn:fourfold:");

// A property that may be a single value or an array of values (Web Annotation Data Model §3.1).
QJsonArray asArray(const QJsonValue &v)
{
    if (v.isArray())
        return v.toArray();
    if (v.isUndefined() || v.isNull())
        return {};
    return QJsonArray {v};
}

} // namespace

QString niUriFromSha256(const QString &hex)
{
    static const QRegularExpression hex64(QStringLiteral("^[0-9a-f]{64}$"));
    if (!hex64.match(hex).hasMatch())
        return {};
    const QByteArray bytes = QByteArray::fromHex(hex.toLatin1());
    return kNiPrefix
        + QString::fromLatin1(
            bytes.toBase64(QByteArray::Base64UrlEncoding | QByteArray::OmitTrailingEquals));
}

std::optional<QString> sha256FromNiUri(const QString &uri)
{
    if (!uri.startsWith(kNiPrefix))
        return std::nullopt;
    const QByteArray b64 = uri.mid(kNiPrefix.size()).toLatin1();
    auto decoded = QByteArray::fromBase64Encoding(
        b64, QByteArray::Base64UrlEncoding | QByteArray::AbortOnBase64DecodingErrors);
    if (!decoded || decoded.decoded.size() != 32)
        return std::nullopt;
    return QString::fromLatin1(decoded.decoded.toHex());
}

QJsonObject w3cAnnotation(const W3cSpan &span, const QString &version)
{
    QJsonObject creator;
    if (span.creatorIsSoftware) {
        creator = QJsonObject {{QStringLiteral("id"), kSoftwarePrefix + span.creator},
            {QStringLiteral("type"), QStringLiteral("Software")},
            {QStringLiteral("name"), span.creator}};
    } else {
        creator = QJsonObject {{QStringLiteral("id"), kCoderPrefix + span.creator},
            {QStringLiteral("type"), QStringLiteral("Person")},
            {QStringLiteral("nickname"), span.creator}};
    }
    QJsonArray body {QJsonObject {{QStringLiteral("type"), QStringLiteral("TextualBody")},
        {QStringLiteral("purpose"), QStringLiteral("classifying")},
        {QStringLiteral("value"), functionKey(span.function)}}};
    if (!span.attributes.isEmpty())
        body.append(QJsonObject {{QStringLiteral("type"), QStringLiteral("TextualBody")},
            {QStringLiteral("purpose"), QStringLiteral("describing")},
            {QStringLiteral("format"), QStringLiteral("application/json")},
            {QStringLiteral("value"),
                QString::fromUtf8(QJsonDocument(span.attributes).toJson(QJsonDocument::Compact))}});
    QJsonArray selectors {
        QJsonObject {{QStringLiteral("type"), QStringLiteral("TextPositionSelector")},
            {QStringLiteral("start"), span.range.start}, {QStringLiteral("end"), span.range.end}}};
    if (span.quote)
        selectors.append(QJsonObject {{QStringLiteral("type"), QStringLiteral("TextQuoteSelector")},
            {QStringLiteral("exact"), *span.quote}, {QStringLiteral("prefix"), span.prefix},
            {QStringLiteral("suffix"), span.suffix}});
    QJsonObject a {{QStringLiteral("@context"), kContext}, {QStringLiteral("id"), span.id},
        {QStringLiteral("type"), QStringLiteral("Annotation")},
        {QStringLiteral("motivation"), QStringLiteral("classifying")},
        {QStringLiteral("creator"), creator},
        {QStringLiteral("generator"),
            QJsonObject {{QStringLiteral("type"), QStringLiteral("Software")},
                {QStringLiteral("name"), QStringLiteral("Fourfold")},
                {QStringLiteral("softwareVersion"), version}}},
        {QStringLiteral("body"), body},
        {QStringLiteral("target"),
            QJsonObject {{QStringLiteral("source"), niUriFromSha256(span.articleSha256)},
                {QStringLiteral("selector"), selectors}}}};
    if (!span.created.isEmpty())
        a.insert(QStringLiteral("created"), span.created);
    return a;
}

QJsonObject w3cCollection(const QString &id, const QString &label, const QJsonArray &items)
{
    return QJsonObject {{QStringLiteral("@context"), kContext}, {QStringLiteral("id"), id},
        {QStringLiteral("type"), QStringLiteral("AnnotationCollection")},
        {QStringLiteral("label"), label}, {QStringLiteral("total"), items.size()},
        {QStringLiteral("first"),
            QJsonObject {{QStringLiteral("id"), id + QStringLiteral("#page1")},
                {QStringLiteral("type"), QStringLiteral("AnnotationPage")},
                {QStringLiteral("startIndex"), 0}, {QStringLiteral("items"), items}}}};
}

Result<W3cSpan> readW3cAnnotation(const QJsonObject &a)
{
    auto bad = [](const QString &what) { return fail(ErrorCode::InvalidInput, what); };
    W3cSpan s;
    if (a.value(QStringLiteral("type")).toString() != QLatin1String("Annotation"))
        return bad(W3cFormatText::tr("its \"type\" is not \"Annotation\"."));
    s.id = a.value(QStringLiteral("id")).toString();
    s.created = a.value(QStringLiteral("created")).toString();
    const QJsonValue targetValue = a.value(QStringLiteral("target"));
    const QJsonArray targets = asArray(targetValue);
    const QJsonObject target = targets.isEmpty() ? QJsonObject {} : targets.first().toObject();
    const QString source = target.value(QStringLiteral("source")).isObject()
        ? target.value(QStringLiteral("source")).toObject().value(QStringLiteral("id")).toString()
        : target.value(QStringLiteral("source")).toString();
    const auto sha = sha256FromNiUri(source);
    if (!sha)
        return bad(
            W3cFormatText::tr("its target has no source of the form \"ni:///sha-256;…\" naming the "
                              "article's text (found \"%1\").")
                .arg(source));
    s.articleSha256 = *sha;
    bool position = false;
    for (const QJsonValue &v : asArray(target.value(QStringLiteral("selector")))) {
        const QJsonObject sel = v.toObject();
        const QString type = sel.value(QStringLiteral("type")).toString();
        if (type == QLatin1String("TextPositionSelector")) {
            const QJsonValue start = sel.value(QStringLiteral("start"));
            const QJsonValue end = sel.value(QStringLiteral("end"));
            if (!start.isDouble() || !end.isDouble()
                || start.toDouble() != double(start.toInteger())
                || end.toDouble() != double(end.toInteger()))
                return bad(W3cFormatText::tr(
                    "its TextPositionSelector needs whole numbers \"start\" and \"end\"."));
            s.range = TextRange {start.toInteger(), end.toInteger()};
            if (s.range.start < 0 || s.range.end <= s.range.start)
                return bad(W3cFormatText::tr(
                    "its TextPositionSelector range [%1, %2) is empty or negative.")
                               .arg(s.range.start)
                               .arg(s.range.end));
            position = true;
        } else if (type == QLatin1String("TextQuoteSelector")) {
            s.quote = sel.value(QStringLiteral("exact")).toString();
            s.prefix = sel.value(QStringLiteral("prefix")).toString();
            s.suffix = sel.value(QStringLiteral("suffix")).toString();
        }
    }
    if (!position)
        return bad(W3cFormatText::tr("its target has no TextPositionSelector."));
    bool function = false;
    for (const QJsonValue &v : asArray(a.value(QStringLiteral("body")))) {
        const QJsonObject body = v.toObject();
        const QString purpose = body.value(QStringLiteral("purpose")).toString();
        const QString value = body.value(QStringLiteral("value")).toString();
        if (purpose == QLatin1String("classifying")) {
            const auto f = functionFromKey(value);
            if (!f)
                return bad(W3cFormatText::tr(
                    "its classifying body \"%1\" is not a framing function (problem, "
                    "cause, evaluation or remedy).")
                               .arg(value));
            s.function = *f;
            function = true;
        } else if (purpose == QLatin1String("describing")
            && body.value(QStringLiteral("format")).toString()
                == QLatin1String("application/json")) {
            QJsonParseError error;
            const QJsonDocument doc = QJsonDocument::fromJson(value.toUtf8(), &error);
            if (error.error != QJsonParseError::NoError || !doc.isObject())
                return bad(
                    W3cFormatText::tr("its describing body is not a JSON object of attributes."));
            s.attributes = doc.object();
        }
    }
    if (!function)
        return bad(W3cFormatText::tr("it has no classifying body naming a framing function."));
    const QJsonObject creator = a.value(QStringLiteral("creator")).toObject();
    const QString type = creator.value(QStringLiteral("type")).toString();
    s.creatorIsSoftware = type == QLatin1String("Software");
    s.creator = s.creatorIsSoftware ? creator.value(QStringLiteral("name")).toString()
                                    : creator.value(QStringLiteral("nickname")).toString();
    if (s.creator.isEmpty() && !s.creatorIsSoftware) {
        const QString id = creator.value(QStringLiteral("id")).toString();
        if (id.startsWith(kCoderPrefix))
            s.creator = id.mid(kCoderPrefix.size());
    }
    if (s.creator.trimmed().isEmpty())
        return bad(W3cFormatText::tr("it has no creator with a pseudonym (\"nickname\")."));
    return s;
}

} // namespace fourfold
