#include "core/io/csv_reader.h"

#include "core/io/chunked_input.h"
#include "core/io/csv_record_stream.h"

#include <QCoreApplication>
#include <QJsonObject>
#include <QSet>
#include <QStringList>

#include <algorithm>
#include <array>
#include <optional>

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

namespace {

// The header of a CSV file of articles: which column holds which field, and the columns that go
// into meta.
struct CsvHeader {
    QStringList names; // trimmed
    std::array<qsizetype, fieldColumns.size()> index {}; // per field; -1 = no such column
    std::vector<qsizetype> metaColumns;
};

Result<CsvHeader> readHeader(const std::vector<QStringView> &fields, qint64 line,
    const QString &file, const QHash<QString, QString> &columns)
{
    CsvHeader header;
    for (QStringView name : fields)
        header.names.append(name.trimmed().toString());
    const QStringList &names = header.names;
    for (qsizetype c = 0; c < names.size(); ++c) {
        if (names.at(c).isEmpty()) {
            return failAt(ErrorCode::InvalidInput, file, line, 0,
                QCoreApplication::translate("ArticleReader", "column %1 of the header has no name")
                    .arg(c + 1));
        }
        const qsizetype first = names.indexOf(names.at(c));
        if (first != c) {
            return failAt(ErrorCode::InvalidInput, file, line, 0,
                QCoreApplication::translate("ArticleReader",
                    "the header names column \"%1\" twice (columns "
                    "%2 and %3)")
                    .arg(names.at(c))
                    .arg(first + 1)
                    .arg(c + 1));
        }
    }

    QSet<qsizetype> used;
    for (std::size_t f = 0; f < fieldColumns.size(); ++f) {
        const QString fieldName = QString::fromLatin1(fieldColumns[f].field);
        const bool mapped = columns.contains(fieldName);
        const QString columnName = columns.value(fieldName, fieldName);
        header.index[f] = names.indexOf(columnName);
        if (header.index[f] >= 0) {
            used.insert(header.index[f]);
            continue;
        }
        if (!fieldColumns[f].required && !mapped)
            continue;
        QString sentence = mapped ? QCoreApplication::translate("ArticleReader",
                               "the header has no column \"%1\" (the column "
                               "for the field \"%2\"); it has %3")
                                        .arg(columnName, fieldName, quotedList(names))
                                  : QCoreApplication::translate("ArticleReader",
                                      "the header has no column \"%1\", which is "
                                      "required; it has %2")
                                        .arg(columnName, quotedList(names));
        if (names.size() == 1) {
            for (const QChar separator : {u';', u'\t', u'|'}) {
                if (names.front().contains(separator)) {
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
        return failAt(ErrorCode::InvalidInput, file, line, 0, sentence);
    }
    for (qsizetype c = 0; c < names.size(); ++c) {
        if (!used.contains(c))
            header.metaColumns.push_back(c);
    }
    return header;
}

} // namespace

Status readCsvArticles(
    ChunkedInput &input, const QHash<QString, QString> &columns, const ImportedArticleSink &sink)
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

    const QString &file = input.path();
    std::optional<CsvHeader> header; // the first record
    return forEachCsvRecordIn(
        input, [&](const std::vector<QStringView> &fields, qint64 line) -> Status {
            if (!header) {
                Result<CsvHeader> read = readHeader(fields, line, file, columns);
                if (!read)
                    return std::unexpected(read.error());
                header = std::move(*read);
                return {};
            }
            if (qsizetype(fields.size()) != header->names.size()) {
                return failAt(ErrorCode::InvalidInput, file, line, 0,
                    QCoreApplication::translate(
                        "ArticleReader", "the record has %1 fields but the header has %2")
                        .arg(fields.size())
                        .arg(header->names.size()));
            }
            const auto value = [&](std::size_t f) {
                return header->index[f] >= 0 ? fields[std::size_t(header->index[f])].toString()
                                             : QString();
            };
            ImportedArticle article;
            article.externalId = value(0);
            article.title = value(1);
            article.text = value(2);
            article.outlet = value(3);
            article.published = value(4);
            article.language = value(5);
            for (const qsizetype c : header->metaColumns)
                article.meta.insert(header->names.at(c), fields[std::size_t(c)].toString());
            article.sourceLine = line;
            return sink(std::move(article));
        });
}

} // namespace fourfold
