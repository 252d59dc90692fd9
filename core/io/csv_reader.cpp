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

Result<std::vector<CsvRecord>> parseCsvRecords(const QString &text, const QString &file)
{
    std::vector<CsvRecord> records;
    QStringList fields;
    QString field;
    CsvState state = CsvState::FieldStart;
    bool inRecord = false;
    qint64 line = 1;
    qint64 column = 0; // of the character being read, 1-based in code points
    qint64 recordLine = 0;
    qint64 quoteLine = 0;
    qint64 quoteColumn = 0;

    const auto endField = [&] {
        fields.append(field);
        field.clear();
    };
    const auto endRecord = [&] {
        endField();
        records.push_back(CsvRecord {fields, recordLine});
        fields.clear();
        inRecord = false;
        state = CsvState::FieldStart;
    };
    const auto beginRecordIfNeeded = [&] {
        if (!inRecord) {
            inRecord = true;
            recordLine = line;
        }
    };

    const qsizetype size = text.size();
    qsizetype i = 0;
    while (i < size) {
        const QChar c = text.at(i);
        const bool lineBreak = c == u'\n' || c == u'\r';
        // CRLF is one line break; so are a lone LF and a lone CR.
        const qsizetype width = (c == u'\r' && i + 1 < size && text.at(i + 1) == u'\n') ? 2 : 1;
        if (!c.isLowSurrogate())
            ++column;

        switch (state) {
        case CsvState::FieldStart:
            if (c == u'"') {
                beginRecordIfNeeded();
                state = CsvState::Quoted;
                quoteLine = line;
                quoteColumn = column;
            } else if (c == u',') {
                beginRecordIfNeeded();
                endField();
            } else if (lineBreak) {
                // A record that ends in a comma has an empty last field; an empty line is
                // no record at all (skipped).
                if (inRecord)
                    endRecord();
            } else {
                beginRecordIfNeeded();
                field.append(c);
                state = CsvState::Unquoted;
            }
            break;
        case CsvState::Unquoted:
            if (c == u',') {
                endField();
                state = CsvState::FieldStart;
            } else if (lineBreak) {
                endRecord();
            } else if (c == u'"') {
                // RFC 4180 §2.5: a field that is not enclosed in double quotes may not hold one.
                return failAt(ErrorCode::InvalidInput, file, line, column,
                    QCoreApplication::translate("ArticleReader",
                        "a double quote inside a field that does not begin with one; "
                        "enclose the field in double quotes and write the inner "
                        "quote twice (RFC 4180)"));
            } else {
                field.append(c);
            }
            break;
        case CsvState::Quoted:
            if (c == u'"')
                state = CsvState::QuoteInQuoted;
            else
                field.append(QStringView(text).mid(i, width)); // line breaks kept (§2.6)
            break;
        case CsvState::QuoteInQuoted:
            if (c == u'"') {
                field.append(u'"'); // §2.7: a doubled quote stands for one
                state = CsvState::Quoted;
            } else if (c == u',') {
                endField();
                state = CsvState::FieldStart;
            } else if (lineBreak) {
                endRecord();
            } else {
                return failAt(ErrorCode::InvalidInput, file, line, column,
                    QCoreApplication::translate("ArticleReader",
                        "unexpected character after the closing double quote of a "
                        "field (opened at line %1, column %2); a double quote "
                        "inside a quoted field must be written twice (RFC 4180)")
                        .arg(quoteLine)
                        .arg(quoteColumn));
            }
            break;
        }

        if (lineBreak) {
            ++line;
            column = 0;
        }
        i += width;
    }

    switch (state) {
    case CsvState::FieldStart:
        if (inRecord)
            endRecord();
        break;
    case CsvState::Unquoted:
    case CsvState::QuoteInQuoted:
        endRecord(); // §2.2: the last record need not end with a line break
        break;
    case CsvState::Quoted:
        return failAt(ErrorCode::InvalidInput, file, quoteLine, quoteColumn,
            QCoreApplication::translate("ArticleReader",
                "the quoted field that begins here is never "
                "closed: a closing double quote is missing"));
    }
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
