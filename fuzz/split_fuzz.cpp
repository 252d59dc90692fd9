// --split-on (core/io/document_split.h): the input's first line is the pattern, the rest a plain
// text document, read through forEachArticle as `import --split-on PATTERN` does. Every part
// handed over must be an article the shared checks let through, numbered 1, 2, 3 … after the
// document's id, in the order of its lines; a refusal must say what is wrong (a pattern's fault
// names the pattern, any other the file).

#include "core/io/article_reader.h"
#include "fuzz/fuzz_support.h"

#include <QFileInfo>

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    const QByteArray input = fuzz::bytes(data, size);
    const qsizetype newline = input.indexOf('\n');
    const QByteArray pattern = newline < 0 ? input : input.left(newline);
    if (pattern.isEmpty())
        return 0; // no pattern: a plain import, which fuzz_article_txt covers
    const QString path = fuzz::writeInput(
        QStringLiteral("input.txt"), newline < 0 ? QByteArray() : input.mid(newline + 1));

    ImportOptions options;
    options.format = ImportFormat::Text;
    options.splitOn = QString::fromUtf8(pattern);
    qint64 parts = 0;
    qint64 lastLine = 0;
    const Status read = forEachArticle(path, options, [&](ImportedArticle &&article, ReadProgress) {
        ++parts;
        FOURFOLD_FUZZ_CHECK(article.externalId.endsWith(QStringLiteral("#%1").arg(parts)));
        FOURFOLD_FUZZ_CHECK(article.title.isValidUtf16());
        FOURFOLD_FUZZ_CHECK(article.text.isValidUtf16());
        FOURFOLD_FUZZ_CHECK(!article.text.trimmed().isEmpty());
        FOURFOLD_FUZZ_CHECK(!article.text.contains(QChar(0)));
        FOURFOLD_FUZZ_CHECK(article.sourceLine > lastLine);
        lastLine = article.sourceLine;
        return Status {};
    });
    if (!read) {
        FOURFOLD_FUZZ_CHECK(!read.error().message.isEmpty());
        FOURFOLD_FUZZ_CHECK(read.error().code == ErrorCode::InvalidArgument
            || read.error().file == path
            || read.error().message.contains(QFileInfo(path).fileName()));
    }
    return 0;
}
