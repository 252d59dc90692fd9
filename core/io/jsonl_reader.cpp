#include "core/io/jsonl_reader.h"

#include "core/io/article_reader.h"
#include "core/io/chunked_input.h"
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
#include <cstring>

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

// The line is longer than maxJsonLineSize: refused as soon as that is known, without reading
// the rest of it.
Status lineTooLong(const QString &file, qint64 line)
{
    return failAt(ErrorCode::InvalidInput, file, line, 0,
        QCoreApplication::translate(
            "ArticleReader", "the line is longer than %1 MiB; a line may be at most %1 MiB")
            .arg(maxJsonLineSize >> 20));
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

// Reads one line (its bytes without the line break): nothing for a blank line, else the
// article or what is wrong with the line. `unterminated` is a last line without a line break.
Status readLine(QByteArrayView bytes, const QString &file, qint64 lineNumber, bool unterminated,
    const ImportedArticleSink &sink)
{
    Result<QString> decoded = decodeUtf8Strict(bytes, file, lineNumber);
    if (!decoded)
        return std::unexpected(decoded.error());
    if (QStringView(*decoded).trimmed().isEmpty())
        return {};

    const QByteArray utf8 = QByteArray::fromRawData(bytes.data(), bytes.size());
    QJsonParseError parseError;
    const QJsonDocument document = QJsonDocument::fromJson(utf8, &parseError);
    if (parseError.error != QJsonParseError::NoError) {
        const qint64 column = columnOfByte(utf8, parseError.offset);
        const bool ranOut = parseError.error == QJsonParseError::UnterminatedObject
            || parseError.error == QJsonParseError::UnterminatedArray
            || parseError.error == QJsonParseError::UnterminatedString
            || parseError.offset >= utf8.size();
        if (unterminated && ranOut) {
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
                .arg(jsonTypeName(QJsonValue(QJsonArray()))));
    }

    ImportedArticle article;
    if (const QString problem = articleFromObject(document.object(), article); !problem.isEmpty())
        return failAt(ErrorCode::InvalidInput, file, lineNumber, 0, problem);
    article.sourceLine = lineNumber;
    return sink(std::move(article));
}

} // namespace

Status readJsonLinesArticles(ChunkedInput &input, const ImportedArticleSink &sink)
{
    const QString &file = input.path();
    FOURFOLD_TRY_STATUS(input.dropByteOrderMark());
    qint64 lineNumber = 0;
    qsizetype searched = 0; // the pending bytes known to hold no line break
    bool atEnd = false;
    for (;;) {
        const QByteArrayView pending = input.pending();
        const auto *newline = searched < pending.size()
            ? static_cast<const char *>(
                std::memchr(pending.data() + searched, '\n', size_t(pending.size() - searched)))
            : nullptr;
        if (!newline && !atEnd) {
            const qsizetype length = pending.size() - (pending.endsWith('\r') ? 1 : 0);
            if (length > maxJsonLineSize)
                return lineTooLong(file, lineNumber + 1);
            searched = pending.size();
            Result<bool> more = input.readMore();
            if (!more)
                return std::unexpected(more.error());
            atEnd = !*more;
            continue;
        }
        if (!newline && pending.isEmpty())
            return {};
        ++lineNumber;
        const qsizetype end = newline ? newline - pending.data() : pending.size();
        QByteArrayView line = pending.first(end);
        if (line.endsWith('\r'))
            line.chop(1);
        if (line.size() > maxJsonLineSize)
            return lineTooLong(file, lineNumber);
        // Consumed before it is read: the line stays in the buffer until the next readMore(),
        // and the position the sink sees is past this article.
        input.consume(newline ? end + 1 : end);
        searched = 0;
        FOURFOLD_TRY_STATUS(readLine(line, file, lineNumber, !newline, sink));
        if (!newline)
            return {};
    }
}

} // namespace fourfold
