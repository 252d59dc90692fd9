#pragma once
// Helpers shared by the core/io tests: write an input into a temporary folder and read it back
// with readArticles, and check an expected failure.

#include "core/io/article_reader.h"
#include "tests/support/test_support.h"

#include <QByteArray>
#include <QString>
#include <QTemporaryDir>

namespace fourfold::test {

// The bytes of a string literal, NUL bytes included (the literal's own terminator left out).
template<std::size_t N>
QByteArray bytesOf(const char (&literal)[N])
{
    return QByteArray(literal, qsizetype(N - 1));
}

// Writes `bytes` as `name` into a fresh temporary folder and reads it with `options`.
inline Result<std::vector<ImportedArticle>> readBytes(
    const QString &name, const QByteArray &bytes, const ImportOptions &options = {})
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    return readArticles(writeFile(dir, name, bytes), options);
}

// One malformed input and the failure it must give.
struct BadInput {
    const char *what; // what the case is about, for the test log
    QByteArray bytes; // the file's content
    ErrorCode code; // expected error code
    qint64 line; // expected line (0 = none)
    qint64 column; // expected column (0 = none)
    const char *fragment; // a part of the message that says what is wrong
};

// Reads `input` from a file named `name` and checks code, line, column and message.
inline void checkBadInput(
    const QString &name, const BadInput &input, const ImportOptions &options = {})
{
    INFO("case: " << input.what);
    const auto result = readBytes(name, input.bytes, options);
    REQUIRE_FALSE(result.has_value());
    const Error &error = result.error();
    CHECK(error.code == input.code);
    CHECK(error.line == input.line);
    CHECK(error.column == input.column);
    CHECK(error.file.endsWith(name));
    CHECK(error.message.contains(QString::fromUtf8(input.fragment)));
    // failAt's prefix: FILE[:LINE[:COLUMN]]: sentence
    QString where = error.file;
    if (input.line > 0)
        where += QStringLiteral(":%1").arg(input.line);
    if (input.line > 0 && input.column > 0)
        where += QStringLiteral(":%1").arg(input.column);
    CHECK(error.message.startsWith(where + QStringLiteral(": ")));
}

} // namespace fourfold::test
