#include "core/io/csv_reader.h"

#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QJsonObject>
#include <QSet>

#include <algorithm>
#include <array>

namespace fourfold {

namespace {

// The states of the RFC 4180 §2 grammar, read one character at a time.
enum class CsvState {
    FieldStart, // at the start of a field (after a comma, a line break or the file start)
    Unquoted, // inside a field that did not begin with a double quote
    Quoted, // inside a field enclosed in double quotes
    QuoteInQuoted, // just after a double quote inside a quoted field: closing or doubled
};

struct FieldColumn {
    const char *field;
    bool required;
};

constexpr std::array<FieldColumn, 6> fieldColumns {{
    {"id", true},
    {"title", true},
    {"text", true},
    {"outlet", false},
    {"published", false},
    {"language", false},
}};

QString quotedList(const QStringList &names)
{
    QStringList quoted;
    quoted.reserve(names.size());
    for (const QString &name : names)
        quoted.append(QStringLiteral("\"%1\"").arg(name));
    return quoted.join(QStringLiteral(", "));
}

} // namespace

Status forEachCsvRecord(QStringView text, const QString &file, const CsvRecordSink &sink)
{
    std::vector<QStringView> fields;
    std::vector<QString> unescaped; // quoted fields that held doubled quotes, this record
    CsvState state = CsvState::FieldStart;
    bool inRecord = false;
    bool doubledQuote = false; // in the quoted field being read
    qint64 line = 1;
    qsizetype lineStart = 0; // where the current line begins in `text`
    qint64 recordLine = 0;
    qsizetype fieldStart = 0; // first character of the field (after its opening quote)
    qsizetype quoteEnd = 0; // the closing quote of a quoted field
    qint64 quoteLine = 0;
    qsizetype quoteLineStart = 0;
    qsizetype quoteAt = 0; // the opening quote

    // 1-based column in code points of the character at `at` on the line beginning at `from`.
    const auto columnOf = [&](qsizetype from, qsizetype at) {
        qint64 column = 0;
        for (qsizetype k = from; k <= at; ++k)
            if (!text[k].isLowSurrogate())
                ++column;
        return column;
    };
    const auto endQuotedField = [&] {
        QStringView field = text.sliced(fieldStart, quoteEnd - fieldStart);
        if (doubledQuote) {
            // §2.7: a doubled quote stands for one.
            unescaped.push_back(
                field.toString().replace(QStringLiteral("\"\""), QStringLiteral("\"")));
            field = unescaped.back();
        }
        fields.push_back(field);
    };
    const auto endRecord = [&]() -> Status {
        Status st = sink(fields, recordLine);
        fields.clear();
        unescaped.clear();
        inRecord = false;
        state = CsvState::FieldStart;
        return st;
    };
    const auto beginRecordIfNeeded = [&](qsizetype at) {
        if (!inRecord) {
            inRecord = true;
            recordLine = line;
        }
        fieldStart = at;
    };

    const qsizetype size = text.size();
    qsizetype i = 0;
    while (i < size) {
        const QChar c = text[i];
        const bool lineBreak = c == u'\n' || c == u'\r';
        // CRLF is one line break; so are a lone LF and a lone CR.
        const qsizetype width = (c == u'\r' && i + 1 < size && text[i + 1] == u'\n') ? 2 : 1;

        switch (state) {
        case CsvState::FieldStart:
            if (c == u'"') {
                beginRecordIfNeeded(i + 1);
                state = CsvState::Quoted;
                doubledQuote = false;
                quoteLine = line;
                quoteLineStart = lineStart;
                quoteAt = i;
            } else if (c == u',') {
                beginRecordIfNeeded(i);
                fields.push_back(QStringView());
            } else if (lineBreak) {
                // A record that ends in a comma has an empty last field; an empty line is
                // no record at all (skipped).
                if (inRecord) {
                    fields.push_back(QStringView());
                    FOURFOLD_TRY_STATUS(endRecord());
                }
            } else {
                beginRecordIfNeeded(i);
                state = CsvState::Unquoted;
            }
            break;
        case CsvState::Unquoted:
            if (c == u',') {
                fields.push_back(text.sliced(fieldStart, i - fieldStart));
                state = CsvState::FieldStart;
            } else if (lineBreak) {
                fields.push_back(text.sliced(fieldStart, i - fieldStart));
                FOURFOLD_TRY_STATUS(endRecord());
            } else if (c == u'"') {
                // RFC 4180 §2.5: a field that is not enclosed in double quotes may not hold one.
                return failAt(ErrorCode::InvalidInput, file, line, columnOf(lineStart, i),
                    QCoreApplication::translate("ArticleReader",
                        "a double quote inside a field that does not begin with one; "
                        "enclose the field in double quotes and write the inner "
                        "quote twice (RFC 4180)"));
            }
            break;
        case CsvState::Quoted:
            // Line breaks inside are kept (§2.6).
            if (c == u'"') {
                state = CsvState::QuoteInQuoted;
                quoteEnd = i;
            }
            break;
        case CsvState::QuoteInQuoted:
            if (c == u'"') {
                doubledQuote = true;
                state = CsvState::Quoted;
            } else if (c == u',') {
                endQuotedField();
                state = CsvState::FieldStart;
            } else if (lineBreak) {
                endQuotedField();
                FOURFOLD_TRY_STATUS(endRecord());
            } else {
                return failAt(ErrorCode::InvalidInput, file, line, columnOf(lineStart, i),
                    QCoreApplication::translate("ArticleReader",
                        "unexpected character after the closing double quote of a "
                        "field (opened at line %1, column %2); a double quote "
                        "inside a quoted field must be written twice (RFC 4180)")
                        .arg(quoteLine)
                        .arg(columnOf(quoteLineStart, quoteAt)));
            }
            break;
        }

        i += width;
        if (lineBreak) {
            ++line;
            lineStart = i;
        }
    }

    switch (state) {
    case CsvState::FieldStart:
        if (inRecord) {
            fields.push_back(QStringView());
            FOURFOLD_TRY_STATUS(endRecord());
        }
        break;
    case CsvState::Unquoted:
        // §2.2: the last record need not end with a line break.
        fields.push_back(text.sliced(fieldStart, size - fieldStart));
        FOURFOLD_TRY_STATUS(endRecord());
        break;
    case CsvState::QuoteInQuoted:
        endQuotedField();
        FOURFOLD_TRY_STATUS(endRecord());
        break;
    case CsvState::Quoted:
        return failAt(ErrorCode::InvalidInput, file, quoteLine, columnOf(quoteLineStart, quoteAt),
            QCoreApplication::translate("ArticleReader",
                "the quoted field that begins here is never "
                "closed: a closing double quote is missing"));
    }
    return {};
}

Result<std::vector<CsvRecord>> parseCsvRecords(const QString &text, const QString &file)
{
    std::vector<CsvRecord> records;
    FOURFOLD_TRY_STATUS(
        forEachCsvRecord(text, file, [&](const std::vector<QStringView> &fields, qint64 line) {
            CsvRecord record {{}, line};
            record.fields.reserve(qsizetype(fields.size()));
            for (QStringView field : fields)
                record.fields.append(field.toString());
            records.push_back(std::move(record));
            return Status {};
        }));
    return records;
}

Result<std::vector<ImportedArticle>> readCsvArticles(
    const QByteArray &bytes, const QString &file, const QHash<QString, QString> &columns)
{
    for (auto it = columns.cbegin(); it != columns.cend(); ++it) {
        const bool known = std::ranges::any_of(fieldColumns,
            [&](const FieldColumn &f) { return it.key() == QLatin1StringView(f.field); });
        if (!known) {
            return fail(ErrorCode::InvalidArgument,
                QCoreApplication::translate("ArticleReader",
                    "unknown field \"%1\" in the CSV column mapping; the fields are id, "
                    "title, text, outlet, published and language")
                    .arg(it.key()));
        }
    }

    Result<QString> text = decodeUtf8Strict(bytes, file);
    if (!text)
        return std::unexpected(text.error());
    Result<std::vector<CsvRecord>> parsed = parseCsvRecords(*text, file);
    if (!parsed)
        return std::unexpected(parsed.error());
    const std::vector<CsvRecord> &records = *parsed;
    if (records.empty())
        return std::vector<ImportedArticle> {};

    const CsvRecord &headerRecord = records.front();
    QStringList header;
    for (const QString &name : headerRecord.fields)
        header.append(name.trimmed());
    for (qsizetype c = 0; c < header.size(); ++c) {
        if (header.at(c).isEmpty()) {
            return failAt(ErrorCode::InvalidInput, file, headerRecord.line, 0,
                QCoreApplication::translate("ArticleReader", "column %1 of the header has no name")
                    .arg(c + 1));
        }
        const qsizetype first = header.indexOf(header.at(c));
        if (first != c) {
            return failAt(ErrorCode::InvalidInput, file, headerRecord.line, 0,
                QCoreApplication::translate("ArticleReader",
                    "the header names column \"%1\" twice (columns "
                    "%2 and %3)")
                    .arg(header.at(c))
                    .arg(first + 1)
                    .arg(c + 1));
        }
    }

    // Field index per Fourfold field (-1 = no such column) and the columns that feed meta.
    std::array<qsizetype, fieldColumns.size()> index {};
    QSet<qsizetype> used;
    for (std::size_t f = 0; f < fieldColumns.size(); ++f) {
        const QString fieldName = QString::fromLatin1(fieldColumns[f].field);
        const bool mapped = columns.contains(fieldName);
        const QString columnName = columns.value(fieldName, fieldName);
        index[f] = header.indexOf(columnName);
        if (index[f] >= 0) {
            used.insert(index[f]);
            continue;
        }
        if (!fieldColumns[f].required && !mapped)
            continue;
        QString sentence = mapped ? QCoreApplication::translate("ArticleReader",
                               "the header has no column \"%1\" (the column "
                               "for the field \"%2\"); it has %3")
                                        .arg(columnName, fieldName, quotedList(header))
                                  : QCoreApplication::translate("ArticleReader",
                                      "the header has no column \"%1\", which is "
                                      "required; it has %2")
                                        .arg(columnName, quotedList(header));
        if (header.size() == 1) {
            for (const QChar separator : {u';', u'\t', u'|'}) {
                if (header.front().contains(separator)) {
                    sentence += QLatin1Char(' ')
                        + QCoreApplication::translate("ArticleReader",
                            "The header seems to be separated by "
                            "\"%1\"; only commas separate fields "
                            "(RFC 4180).")
                              .arg(separator == u'\t' ? QStringLiteral("\\t") : QString(separator));
                    break;
                }
            }
        }
        return failAt(ErrorCode::InvalidInput, file, headerRecord.line, 0, sentence);
    }

    const auto value = [&](const CsvRecord &record, std::size_t f) {
        return index[f] >= 0 ? record.fields.at(index[f]) : QString();
    };

    std::vector<ImportedArticle> articles;
    articles.reserve(records.size() - 1);
    for (std::size_t r = 1; r < records.size(); ++r) {
        const CsvRecord &record = records[r];
        if (record.fields.size() != header.size()) {
            return failAt(ErrorCode::InvalidInput, file, record.line, 0,
                QCoreApplication::translate(
                    "ArticleReader", "the record has %1 fields but the header has %2")
                    .arg(record.fields.size())
                    .arg(header.size()));
        }
        ImportedArticle article;
        article.externalId = value(record, 0);
        article.title = value(record, 1);
        article.text = value(record, 2);
        article.outlet = value(record, 3);
        article.published = value(record, 4);
        article.language = value(record, 5);
        for (qsizetype c = 0; c < header.size(); ++c) {
            if (!used.contains(c))
                article.meta.insert(header.at(c), record.fields.at(c));
        }
        article.sourceLine = record.line;
        articles.push_back(std::move(article));
    }
    return articles;
}

} // namespace fourfold
