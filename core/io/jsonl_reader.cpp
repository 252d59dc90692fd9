#include "core/io/jsonl_reader.h"

#include "core/io/article_reader.h"
#include "core/io/json_type_name.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QJsonParseError>
#include <QJsonValue>
#include <QStringList>

#include <algorithm>
#include <array>

namespace fourfold {

namespace {

constexpr std::array<QLatin1StringView, 7> knownFields {
    QLatin1StringView("id"),
    QLatin1StringView("title"),
    QLatin1StringView("text"),
    QLatin1StringView("outlet"),
    QLatin1StringView("published"),
    QLatin1StringView("language"),
    QLatin1StringView("meta"),
};

// The 1-based column, in code points, of byte `offset` of the UTF-8 `bytes`.
qint64 columnOfByte(const QByteArray &bytes, qsizetype offset)
{
    offset = std::clamp<qsizetype>(offset, 0, bytes.size());
    qint64 column = 1;
    for (qsizetype i = 0; i < offset; ++i) {
        if ((static_cast<unsigned char>(bytes.at(i)) & 0xC0) != 0x80)
            ++column;
    }
    return column;
}

// Refuses lines longer than maxJsonLineSize before anything is decoded, so that a huge line
// costs one scan of the bytes and no parsing.
Status checkLineLengths(const QByteArray &bytes, const QString &file)
{
    qint64 line = 1;
    qsizetype start = 0;
    while (start <= bytes.size()) {
        qsizetype end = bytes.indexOf('\n', start);
        if (end < 0)
            end = bytes.size();
        qsizetype length = end - start;
        if (length > 0 && bytes.at(end - 1) == '\r')
            --length;
        if (length > maxJsonLineSize) {
            return failAt(ErrorCode::InvalidInput, file, line, 0,
                QCoreApplication::translate("ArticleReader",
                    "the line is %1 MiB long; a line may be at "
                    "most %2 MiB")
                    .arg(double(length) / double(1 << 20), 0, 'f', 1)
                    .arg(maxJsonLineSize >> 20));
        }
        start = end + 1;
        ++line;
    }
    return {};
}

// The JSON type of a line that is a single value but not an object or array (Qt's parser
// takes only those two at the top level), or an empty string if the line is not valid JSON.
QString scalarTypeOf(const QByteArray &utf8)
{
    QJsonParseError error;
    const QJsonDocument wrapped = QJsonDocument::fromJson('[' + utf8 + ']', &error);
    if (error.error != QJsonParseError::NoError || !wrapped.isArray()
        || wrapped.array().size() != 1)
        return {};
    return jsonTypeName(wrapped.array().at(0));
}

// `sentence` is marked with QT_TRANSLATE_NOOP("ArticleReader", ...) where it is written.
QString fieldSentence(const char *sentence, const QString &field)
{
    return QCoreApplication::translate("ArticleReader", sentence).arg(field);
}

// Reads one object into `article`; returns the sentence that says what is wrong, or an empty
// string if nothing is.
QString articleFromObject(const QJsonObject &object, ImportedArticle &article)
{
    QStringList unknown;
    for (auto it = object.begin(); it != object.end(); ++it) {
        if (std::ranges::find(knownFields, it.key()) == knownFields.end())
            unknown.append(QStringLiteral("\"%1\"").arg(it.key()));
    }
    if (unknown.size() == 1) {
        return QCoreApplication::translate("ArticleReader",
            "unknown field %1; the fields are \"id\", \"title\", \"text\", \"outlet\", "
            "\"published\", \"language\" and \"meta\" (put further data inside \"meta\")")
            .arg(unknown.front());
    }
    if (unknown.size() > 1) {
        return QCoreApplication::translate("ArticleReader",
            "unknown fields %1; the fields are \"id\", \"title\", \"text\", \"outlet\", "
            "\"published\", \"language\" and \"meta\" (put further data inside \"meta\")")
            .arg(unknown.join(QStringLiteral(", ")));
    }

    struct StringField {
        const char *name;
        bool required;
        QString ImportedArticle::*member;
    };
    static constexpr std::array<StringField, 6> stringFields {{
        {"id", true, &ImportedArticle::externalId},
        {"title", true, &ImportedArticle::title},
        {"text", true, &ImportedArticle::text},
        {"outlet", false, &ImportedArticle::outlet},
        {"published", false, &ImportedArticle::published},
        {"language", false, &ImportedArticle::language},
    }};
    for (const StringField &field : stringFields) {
        const QString name = QString::fromLatin1(field.name);
        const QJsonValue value = object.value(name);
        if (value.isUndefined() && field.required)
            return fieldSentence(
                QT_TRANSLATE_NOOP("ArticleReader", "missing required field \"%1\""), name);
        if (value.isUndefined() || (value.isNull() && !field.required))
            continue;
        if (!value.isString()) {
            return (field.required
                    ? fieldSentence(
                        QT_TRANSLATE_NOOP("ArticleReader", "field \"%1\" must be a string, got %2"),
                        name)
                    : fieldSentence(QT_TRANSLATE_NOOP("ArticleReader",
                                        "field \"%1\" must be a string or null, got %2"),
                        name))
                .arg(jsonTypeName(value));
        }
        QString string = value.toString();
        // RFC 8259 §8.2: an escaped lone surrogate such as "\ud800" is valid JSON syntax but
        // no character; it cannot be stored as UTF-8.
        if (!string.isValidUtf16()) {
            return fieldSentence(QT_TRANSLATE_NOOP("ArticleReader",
                                     "field \"%1\" holds an unpaired surrogate escape (such as "
                                     "\\ud800), which is not a character (RFC 8259, section 8.2)"),
                name);
        }
        article.*field.member = std::move(string);
    }

    const QJsonValue meta = object.value(QLatin1StringView("meta"));
    if (meta.isObject())
        article.meta = meta.toObject();
    else if (!meta.isUndefined() && !meta.isNull())
        return fieldSentence(
            QT_TRANSLATE_NOOP("ArticleReader", "field \"%1\" must be an object or null, got %2"),
            QStringLiteral("meta"))
            .arg(jsonTypeName(meta));
    return {};
}

} // namespace

Result<std::vector<ImportedArticle>> readJsonLinesArticles(
    const QByteArray &bytes, const QString &file)
{
    if (Status lengths = checkLineLengths(bytes, file); !lengths)
        return std::unexpected(lengths.error());
    Result<QString> decoded = decodeUtf8Strict(bytes, file);
    if (!decoded)
        return std::unexpected(decoded.error());
    const QString &text = *decoded;
    const bool endsWithNewline = text.endsWith(u'\n');

    std::vector<ImportedArticle> articles;
    qint64 lineNumber = 0;
    qsizetype start = 0;
    while (start < text.size()) {
        ++lineNumber;
        qsizetype end = text.indexOf(u'\n', start);
        const bool lastLine = end < 0 || end + 1 == text.size();
        if (end < 0)
            end = text.size();
        QStringView line = QStringView(text).mid(start, end - start);
        start = end + 1;
        if (line.endsWith(u'\r'))
            line.chop(1);
        if (line.trimmed().isEmpty())
            continue;

        const QByteArray utf8 = line.toUtf8();
        QJsonParseError parseError;
        const QJsonDocument document = QJsonDocument::fromJson(utf8, &parseError);
        if (parseError.error != QJsonParseError::NoError) {
            const qint64 column = columnOfByte(utf8, parseError.offset);
            const bool ranOut = parseError.error == QJsonParseError::UnterminatedObject
                || parseError.error == QJsonParseError::UnterminatedArray
                || parseError.error == QJsonParseError::UnterminatedString
                || parseError.offset >= utf8.size();
            if (lastLine && !endsWithNewline && ranOut) {
                return failAt(ErrorCode::InvalidInput, file, lineNumber, column,
                    QCoreApplication::translate("ArticleReader",
                        "the last line is truncated: the JSON ends before the object "
                        "is complete (%1) and the file does not end with a line break")
                        .arg(parseError.errorString()));
            }
            const QString scalar = scalarTypeOf(utf8);
            if (!scalar.isEmpty()) {
                return failAt(ErrorCode::InvalidInput, file, lineNumber, 0,
                    QCoreApplication::translate("ArticleReader", "expected a JSON object, got %1")
                        .arg(scalar));
            }
            return failAt(ErrorCode::InvalidInput, file, lineNumber, column,
                QCoreApplication::translate("ArticleReader", "invalid JSON: %1")
                    .arg(parseError.errorString()));
        }
        if (!document.isObject()) {
            return failAt(ErrorCode::InvalidInput, file, lineNumber, 0,
                QCoreApplication::translate("ArticleReader", "expected a JSON object, got %1")
                    .arg(QStringLiteral("array")));
        }

        ImportedArticle article;
        if (const QString problem = articleFromObject(document.object(), article);
            !problem.isEmpty())
            return failAt(ErrorCode::InvalidInput, file, lineNumber, 0, problem);
        article.sourceLine = lineNumber;
        articles.push_back(std::move(article));
    }
    return articles;
}

} // namespace fourfold
