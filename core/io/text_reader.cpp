#include "core/io/text_reader.h"

#include "core/io/article_reader.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFileInfo>
#include <QStringList>

namespace fourfold {

Result<ImportedArticle> readTextArticle(const QByteArray &bytes, const QString &file)
{
    Result<QString> decoded = decodeUtf8Strict(bytes, file);
    if (!decoded)
        return std::unexpected(decoded.error());
    QString text = std::move(*decoded);
    text.replace(QLatin1StringView("\r\n"), QLatin1StringView("\n"));
    text.replace(u'\r', u'\n');

    // Paragraphs are the runs of non-blank lines.
    QList<QStringList> paragraphs;
    bool inParagraph = false;
    for (const QStringView line : QStringView(text).split(u'\n')) {
        if (line.trimmed().isEmpty()) {
            inParagraph = false;
            continue;
        }
        if (!inParagraph)
            paragraphs.append(QStringList());
        paragraphs.back().append(line.toString());
        inParagraph = true;
    }
    if (paragraphs.isEmpty()) {
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            QCoreApplication::translate("ArticleReader",
                "the file contains no articles: it holds no "
                "text"));
    }

    ImportedArticle article;
    const QString baseName = QFileInfo(file).completeBaseName();
    article.externalId = baseName;
    qsizetype firstBody = 0;
    const QString firstLine = paragraphs.front().front().trimmed();
    if (paragraphs.size() > 1 && paragraphs.front().size() == 1
        && firstLine.size() <= maxTextTitleLength) {
        article.title = firstLine;
        firstBody = 1;
    } else {
        article.title = baseName;
    }
    QStringList body;
    for (qsizetype p = firstBody; p < paragraphs.size(); ++p)
        body.append(paragraphs.at(p).join(u'\n'));
    article.text = body.join(QLatin1StringView("\n\n"));
    article.sourceLine = 1;
    return article;
}

} // namespace fourfold
