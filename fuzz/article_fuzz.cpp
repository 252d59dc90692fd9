// One article format, chosen by FOURFOLD_FUZZ_FORMAT (an importFormatKey: "txt", "html",
// "jsonl", "csv", "feed", "newsxml", "docx", "odt", "pdf", "epub"), read through forEachArticle
// as `import --format` does.
// Every article handed over must carry what the shared checks promise; a refusal must name the
// file.

#include "core/io/article_reader.h"
#include "fuzz/fuzz_support.h"

#include <QFileInfo>

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    static const auto format = importFormatFromKey(QStringLiteral(FOURFOLD_FUZZ_FORMAT));
    FOURFOLD_FUZZ_CHECK(format.has_value());
    const QString path =
        fuzz::writeInput(QStringLiteral("input." FOURFOLD_FUZZ_FORMAT), fuzz::bytes(data, size));

    ImportOptions options;
    options.format = format;
    options.readChunkSize = 64; // records across chunk boundaries
    qint64 articles = 0;
    const Status read = forEachArticle(path, options, [&](ImportedArticle &&article, ReadProgress) {
        ++articles;
        FOURFOLD_FUZZ_CHECK(!article.externalId.isEmpty());
        for (const QChar c : article.externalId)
            FOURFOLD_FUZZ_CHECK(c.category() != QChar::Other_Control);
        FOURFOLD_FUZZ_CHECK(article.externalId.isValidUtf16());
        FOURFOLD_FUZZ_CHECK(article.title.isValidUtf16());
        FOURFOLD_FUZZ_CHECK(article.text.isValidUtf16());
        FOURFOLD_FUZZ_CHECK(!article.text.contains(QChar(0)));
        return Status {};
    });
    if (!read) {
        FOURFOLD_FUZZ_CHECK(!read.error().message.isEmpty());
        FOURFOLD_FUZZ_CHECK(
            read.error().file == path || read.error().message.contains(QFileInfo(path).fileName()));
    }
    return 0;
}
