#include "core/exchange/w3c_import.h"

#include "core/exchange/w3c_format.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/project.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>
#include <QJsonArray>
#include <QJsonDocument>

#include <map>
#include <optional>
#include <set>
#include <tuple>
#include <utility>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("W3cImport", text);
}

// Line and column (1-based, columns in characters) of byte `offset` of `bytes`.
std::pair<qint64, qint64> position(const QByteArray &bytes, qsizetype offset)
{
    offset = std::clamp<qsizetype>(offset, 0, bytes.size());
    const qsizetype lineStart = bytes.lastIndexOf('\n', offset - 1) + 1;
    return {bytes.left(offset).count('\n') + 1,
        QString::fromUtf8(bytes.mid(lineStart, offset - lineStart)).size() + 1};
}

} // namespace

Result<W3cImportReport> importW3cAnnotations(Project &project, const QString &path, Phase phase)
{
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        return fail(
            ErrorCode::Io, tr("The file %1 could not be read: %2.").arg(path, file.errorString()));
    const QByteArray bytes = file.readAll();
    QJsonParseError parseError;
    const QJsonDocument doc = QJsonDocument::fromJson(bytes, &parseError);
    if (parseError.error != QJsonParseError::NoError) {
        const auto [line, column] = position(bytes, parseError.offset);
        return failAt(ErrorCode::InvalidInput, path, line, column,
            tr("This is not valid JSON: %1.").arg(parseError.errorString()));
    }
    QJsonArray items;
    if (doc.isArray()) {
        items = doc.array();
    } else {
        const QJsonObject root = doc.object();
        const QString type = root.value(QStringLiteral("type")).toString();
        if (type == QLatin1String("AnnotationCollection")) {
            const QJsonValue first = root.value(QStringLiteral("first"));
            if (!first.isObject())
                return failAt(ErrorCode::InvalidInput, path, 1, 1,
                    tr("The collection does not hold its annotations inline (\"first\" must be "
                       "an AnnotationPage object with \"items\")."));
            items = first.toObject().value(QStringLiteral("items")).toArray();
        } else if (type == QLatin1String("Annotation")) {
            items.append(root);
        } else {
            return failAt(ErrorCode::InvalidInput, path, 1, 1,
                tr("The file holds neither an AnnotationCollection, nor an Annotation, nor an "
                   "array of annotations."));
        }
    }

    auto summaries = project.articles();
    if (!summaries)
        return std::unexpected(summaries.error());
    QHash<QString, ArticleId> bySha;
    for (const ArticleSummary &a : *summaries)
        bySha.insert(a.sha256, a.id);
    // The text of the article of the last annotation only (an export lists an article's
    // annotations together), and the articles met, in order.
    std::optional<Article> current;
    std::set<qint64> articles;

    struct Pending {
        ArticleId article;
        QString coder;
        AnnotationContent content;
        qsizetype index = 0;
        QString id;
    };
    std::vector<Pending> pending;
    auto where = [&](qsizetype index, const QString &id, const QString &what) {
        qint64 line = 0, column = 0;
        if (!id.isEmpty()) {
            const qsizetype at = bytes.indexOf(
                QJsonDocument(QJsonArray {id}).toJson(QJsonDocument::Compact).mid(1).chopped(1));
            if (at >= 0)
                std::tie(line, column) = position(bytes, at);
        }
        return failAt(ErrorCode::InvalidInput, path, line, column,
            tr("Annotation %1%2: %3")
                .arg(index + 1)
                .arg(id.isEmpty() ? QString() : QStringLiteral(" (%1)").arg(id), what));
    };
    for (qsizetype i = 0; i < items.size(); ++i) {
        const QJsonObject item = items[i].toObject();
        const QString id = item.value(QStringLiteral("id")).toString();
        auto span = readW3cAnnotation(item);
        if (!span)
            return where(i, id, span.error().message);
        if (span->creatorIsSoftware)
            return where(i, id,
                tr("its creator \"%1\" is software; only coders' annotations can be imported.")
                    .arg(span->creator));
        const auto article = bySha.constFind(span->articleSha256);
        if (article == bySha.constEnd())
            return where(i, id,
                tr("no article of the project has the text with SHA-256 %1.")
                    .arg(span->articleSha256));
        if (!current || current->summary.id != *article) {
            auto loaded = project.article(*article);
            if (!loaded)
                return std::unexpected(loaded.error());
            current = std::move(*loaded);
            articles.insert(article->value);
        }
        const Article &a = *current;
        if (span->range.end > a.summary.length)
            return where(i, id,
                tr("the range [%1, %2) lies outside the article's %3 code points.")
                    .arg(span->range.start)
                    .arg(span->range.end)
                    .arg(a.summary.length));
        if (span->quote && OffsetMap::slice(a.text, span->range) != *span->quote)
            return where(i, id,
                tr("the quote \"%1\" is not the article's text at [%2, %3).")
                    .arg(*span->quote)
                    .arg(span->range.start)
                    .arg(span->range.end));
        Pending p;
        p.article = *article;
        p.coder = span->creator.trimmed();
        p.content.function = span->function;
        p.content.range = span->range;
        p.content.attributes = span->attributes;
        p.index = i;
        p.id = id;
        pending.push_back(std::move(p));
    }

    W3cImportReport report;
    std::set<std::pair<qint64, qint64>> finished; // (article, coder) with imported codings
    // What is already there, per article: annotation uuids and (coder, function, range).
    std::map<qint64, std::set<QString>> uuidsOf;
    std::map<qint64, std::set<std::tuple<qint64, int, qint64, qint64>>> spansOf;
    current.reset();
    for (const qint64 article : articles) {
        auto existing = project.annotations(ArticleId {article});
        if (!existing)
            return std::unexpected(existing.error());
        for (const Annotation &a : *existing) {
            uuidsOf[article].insert(a.uuid);
            spansOf[article].insert({a.coder.value, int(a.content.function), a.content.range.start,
                a.content.range.end});
        }
    }
    auto status = project.batch([&]() -> Status {
        QHash<QString, CoderId> coders;
        for (const Pending &p : pending) {
            auto coder = coders.constFind(p.coder);
            if (coder == coders.constEnd()) {
                auto known = project.coderByPseudonym(p.coder);
                if (!known)
                    return std::unexpected(known.error());
                CoderId id;
                if (*known) {
                    id = (*known)->id;
                } else {
                    auto added = project.addCoder(p.coder, p.coder, CoderRole::Coder);
                    if (!added)
                        return std::unexpected(added.error());
                    id = *added;
                    report.codersCreated << p.coder;
                }
                coder = coders.insert(p.coder, id);
            }
            // The same annotation twice (its id, or the same coder, function and range on the
            // same article) is skipped and reported, never added again.
            const QString uuid =
                p.id.startsWith(QLatin1String("urn:uuid:")) ? p.id.mid(9) : QString();
            const std::tuple key {
                coder->value, int(p.content.function), p.content.range.start, p.content.range.end};
            if ((!uuid.isEmpty() && uuidsOf[p.article.value].contains(uuid))
                || !spansOf[p.article.value].insert(key).second) {
                ++report.skipped;
                report.skippedIds << (p.id.isEmpty() ? QString::number(p.index + 1) : p.id);
                continue;
            }
            if (!uuid.isEmpty())
                uuidsOf[p.article.value].insert(uuid);
            AddAnnotationEdit edit(p.article, *coder, p.content, phase);
            if (auto applied = project.applyInBatch(edit); !applied) {
                if (applied.error().code == ErrorCode::InvalidInput
                    || applied.error().code == ErrorCode::InvalidArgument)
                    return where(p.index, p.id, applied.error().message);
                return applied;
            }
            ++report.spans;
            finished.insert({p.article.value, coder->value});
        }
        // Imported codings are finished work: each article counts for its coder (CodingScope).
        for (const auto &[article, coder] : finished) {
            SetArticleStatusEdit done(
                ArticleId {article}, CoderId {coder}, QStringLiteral("done"), phase);
            FOURFOLD_TRY_STATUS(project.applyInBatch(done));
        }
        report.articlesDone = qint64(finished.size());
        return {};
    });
    if (!status)
        return std::unexpected(status.error());
    return report;
}

} // namespace fourfold
