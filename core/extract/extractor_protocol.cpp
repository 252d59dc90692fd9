#include "core/extract/extractor_protocol.h"

#include "core/extract/extractor_parameters.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonParseError>
#include <QSet>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ExtractorProtocolText {
    Q_DECLARE_TR_FUNCTIONS(ExtractorProtocolText)
};

QJsonArray rangesJson(const std::vector<TextRange> &ranges)
{
    QJsonArray a;
    for (const TextRange &r : ranges)
        a.append(QJsonArray {r.start, r.end});
    return a;
}

// The 1-based column, in code points, of byte `offset` of the UTF-8 `bytes`.
qint64 columnOfByte(const QByteArray &bytes, qsizetype offset)
{
    offset = std::clamp<qsizetype>(offset, 0, bytes.size());
    qint64 column = 1;
    for (qsizetype i = 0; i < offset; ++i)
        if ((static_cast<unsigned char>(bytes.at(i)) & 0xC0) != 0x80)
            ++column;
    return column;
}

// An integer offset held in a JSON number; -1 with `what` set otherwise.
qint64 offsetValue(const QJsonObject &o, const QString &key, QString &what)
{
    const QJsonValue v = o.value(key);
    if (v.isUndefined()) {
        what = ExtractorProtocolText::tr("missing field \"%1\"").arg(key);
        return -1;
    }
    const double d = v.toDouble(std::nan(""));
    if (!v.isDouble() || !std::isfinite(d) || d != std::floor(d) || d < 0 || d > 9.0e15) {
        what = ExtractorProtocolText::tr(
            "field \"%1\" must be a whole number of code points of at least 0, got %2")
                   .arg(key, v.isDouble() ? QString::number(d) : jsonTypeName(v));
        return -1;
    }
    return qint64(d);
}

struct Line {
    qint64 number = 0;
    QByteArray bytes;
};

// The non-blank lines of `bytes` (LF or CRLF ends).
std::vector<Line> nonBlankLines(const QByteArray &bytes)
{
    std::vector<Line> lines;
    qint64 number = 0;
    // A leading byte-order mark is accepted, as decodeUtf8Strict accepts it.
    const QByteArray body = bytes.startsWith("\xEF\xBB\xBF") ? bytes.mid(3) : bytes;
    for (QByteArray line : body.split('\n')) {
        ++number;
        if (line.endsWith('\r'))
            line.chop(1);
        if (!line.trimmed().isEmpty())
            lines.push_back(Line {number, line});
    }
    return lines;
}

// Parses one line into an object, or fails naming `file`, the line and the column.
Result<QJsonObject> objectOfLine(const Line &line, const QString &file)
{
    QJsonParseError error;
    const QJsonDocument doc = QJsonDocument::fromJson(line.bytes, &error);
    if (error.error != QJsonParseError::NoError)
        return failAt(ErrorCode::InvalidInput, file, line.number,
            columnOfByte(line.bytes, error.offset),
            ExtractorProtocolText::tr("not valid JSON (%1)").arg(error.errorString()));
    if (!doc.isObject())
        return failAt(ErrorCode::InvalidInput, file, line.number, 0,
            ExtractorProtocolText::tr("expected a JSON object, got an array"));
    return doc.object();
}

} // namespace

QByteArray articleProtocolLine(const Article &article)
{
    QJsonArray paragraphs;
    for (const Paragraph &p : article.paragraphs)
        paragraphs.append(QJsonObject {{QStringLiteral("start"), p.range.start},
            {QStringLiteral("end"), p.range.end},
            {QStringLiteral("role"), paragraphRoleKey(p.role)}});
    const QJsonObject o {
        {QStringLiteral("id"), article.summary.externalId},
        {QStringLiteral("title"), article.summary.title},
        {QStringLiteral("language"), article.summary.language},
        {QStringLiteral("text"), article.text},
        {QStringLiteral("paragraphs"), paragraphs},
        {QStringLiteral("sentences"), rangesJson(article.sentences)},
        {QStringLiteral("tokens"), rangesJson(article.tokens)},
    };
    return QJsonDocument(o).toJson(QJsonDocument::Compact) + '\n';
}

std::expected<ExtractedSpan, QString> spanFromJson(
    const QJsonObject &object, qint64 length, const QStringList &extraFields)
{
    static const QStringList known {QStringLiteral("function"), QStringLiteral("start"),
        QStringLiteral("end"), QStringLiteral("score"), QStringLiteral("attributes")};
    for (auto it = object.begin(); it != object.end(); ++it)
        if (!known.contains(it.key()) && !extraFields.contains(it.key()))
            return std::unexpected(
                ExtractorProtocolText::tr(
                    "unknown field \"%1\"; a span has the fields %2 (put further data inside "
                    "\"attributes\")")
                    .arg(it.key(), (extraFields + known).join(QStringLiteral(", "))));
    ExtractedSpan span;
    const QJsonValue function = object.value(QLatin1String("function"));
    if (function.isUndefined())
        return std::unexpected(ExtractorProtocolText::tr("missing field \"function\""));
    const auto f = function.isString() ? functionFromKey(function.toString()) : std::nullopt;
    if (!f)
        return std::unexpected(
            ExtractorProtocolText::tr("field \"function\" must be problem, cause, evaluation or "
                                      "remedy, got %1")
                .arg(function.isString() ? QStringLiteral("\"%1\"").arg(function.toString())
                                         : jsonTypeName(function)));
    span.function = *f;
    QString what;
    span.range.start = offsetValue(object, QStringLiteral("start"), what);
    if (!what.isEmpty())
        return std::unexpected(what);
    span.range.end = offsetValue(object, QStringLiteral("end"), what);
    if (!what.isEmpty())
        return std::unexpected(what);
    if (span.range.end <= span.range.start)
        return std::unexpected(
            ExtractorProtocolText::tr("the span [%1, %2) is empty: \"end\" must be greater than "
                                      "\"start\"")
                .arg(span.range.start)
                .arg(span.range.end));
    if (span.range.end > length)
        return std::unexpected(
            ExtractorProtocolText::tr("the span [%1, %2) ends past the end of the article, which "
                                      "has %3 code points")
                .arg(span.range.start)
                .arg(span.range.end)
                .arg(length));
    const QJsonValue score = object.value(QLatin1String("score"));
    if (score.isDouble() && std::isfinite(score.toDouble()))
        span.score = score.toDouble();
    else if (!score.isUndefined() && !score.isNull())
        return std::unexpected(
            ExtractorProtocolText::tr("field \"score\" must be a number or null, got %1")
                .arg(jsonTypeName(score)));
    const QJsonValue attributes = object.value(QLatin1String("attributes"));
    if (attributes.isObject())
        span.attributes = attributes.toObject();
    else if (!attributes.isUndefined() && !attributes.isNull())
        return std::unexpected(
            ExtractorProtocolText::tr("field \"attributes\" must be an object or null, got %1")
                .arg(jsonTypeName(attributes)));
    return span;
}

Result<std::vector<ExtractedSpan>> readExtractorOutput(
    const QByteArray &output, const QString &file, const QHash<QString, SpanTarget> &articles)
{
    // Invalid UTF-8 is named by line and column before any JSON is parsed.
    FOURFOLD_TRY_STATUS(decodeUtf8Strict(output, file));
    std::vector<ExtractedSpan> spans;
    QHash<QString, qint64> answeredOn;
    for (const Line &line : nonBlankLines(output)) {
        auto object = objectOfLine(line, file);
        if (!object)
            return std::unexpected(object.error());
        auto lineError = [&](const QString &what) {
            return failAt(ErrorCode::InvalidInput, file, line.number, 0, what);
        };
        for (auto it = object->begin(); it != object->end(); ++it)
            if (it.key() != QLatin1String("id") && it.key() != QLatin1String("spans"))
                return lineError(ExtractorProtocolText::tr(
                    "unknown field \"%1\"; an answer has the fields \"id\" and "
                    "\"spans\"")
                                     .arg(it.key()));
        const QJsonValue id = object->value(QLatin1String("id"));
        if (!id.isString())
            return lineError(id.isUndefined()
                    ? ExtractorProtocolText::tr("missing field \"id\"")
                    : ExtractorProtocolText::tr("field \"id\" must be a string, got %1")
                          .arg(jsonTypeName(id)));
        const auto target = articles.constFind(id.toString());
        if (target == articles.constEnd())
            return lineError(
                ExtractorProtocolText::tr("article \"%1\" was not sent to the extractor")
                    .arg(id.toString()));
        if (answeredOn.contains(id.toString()))
            return lineError(
                ExtractorProtocolText::tr("article \"%1\" was already answered on line %2")
                    .arg(id.toString())
                    .arg(answeredOn.value(id.toString())));
        answeredOn.insert(id.toString(), line.number);
        const QJsonValue list = object->value(QLatin1String("spans"));
        if (!list.isArray())
            return lineError(list.isUndefined()
                    ? ExtractorProtocolText::tr("missing field \"spans\"")
                    : ExtractorProtocolText::tr("field \"spans\" must be an array, got %1")
                          .arg(jsonTypeName(list)));
        const QJsonArray array = list.toArray();
        for (qsizetype i = 0; i < array.size(); ++i) {
            if (!array.at(i).isObject())
                return lineError(
                    ExtractorProtocolText::tr("span %1 of article \"%2\" must be an object, got %3")
                        .arg(i + 1)
                        .arg(id.toString(), jsonTypeName(array.at(i))));
            auto span = spanFromJson(array.at(i).toObject(), target->length);
            if (!span)
                return lineError(ExtractorProtocolText::tr("span %1 of article \"%2\": %3")
                                     .arg(i + 1)
                                     .arg(id.toString(), span.error()));
            span->article = target->id;
            spans.push_back(std::move(*span));
        }
    }
    if (answeredOn.size() != articles.size()) {
        QStringList missing;
        for (auto it = articles.cbegin(); it != articles.cend(); ++it)
            if (!answeredOn.contains(it.key()))
                missing.append(QStringLiteral("\"%1\"").arg(it.key()));
        missing.sort();
        const qsizetype shown = std::min<qsizetype>(missing.size(), 5);
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ExtractorProtocolText::tr(
                "%n article(s) got no answer: %1%2", nullptr, int(missing.size()))
                .arg(QStringList(missing.mid(0, shown)).join(QStringLiteral(", ")),
                    missing.size() > shown ? QStringLiteral(", …") : QString()));
    }
    return spans;
}

Result<std::vector<ExtractedSpan>> readSpanFile(
    const QByteArray &bytes, const QString &file, const QHash<QString, SpanTarget> &articles)
{
    FOURFOLD_TRY_STATUS(decodeUtf8Strict(bytes, file));
    std::vector<ExtractedSpan> spans;
    const std::vector<Line> lines = nonBlankLines(bytes);
    if (lines.empty())
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            ExtractorProtocolText::tr("the file holds no spans"));
    for (const Line &line : lines) {
        auto object = objectOfLine(line, file);
        if (!object)
            return std::unexpected(object.error());
        const QJsonValue id = object->value(QLatin1String("article"));
        if (!id.isString())
            return failAt(ErrorCode::InvalidInput, file, line.number, 0,
                id.isUndefined()
                    ? ExtractorProtocolText::tr("missing field \"article\"")
                    : ExtractorProtocolText::tr("field \"article\" must be a string, got %1")
                          .arg(jsonTypeName(id)));
        const auto target = articles.constFind(id.toString());
        if (target == articles.constEnd())
            return failAt(ErrorCode::InvalidInput, file, line.number, 0,
                ExtractorProtocolText::tr("there is no article \"%1\" in the project")
                    .arg(id.toString()));
        auto span = spanFromJson(*object, target->length, {QStringLiteral("article")});
        if (!span)
            return failAt(ErrorCode::InvalidInput, file, line.number, 0, span.error());
        span->article = target->id;
        spans.push_back(std::move(*span));
    }
    return spans;
}

} // namespace fourfold
