#include "core/exchange/w3c_import.h"

#include "core/exchange/w3c_format.h"
#include "core/io/json_item_stream.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/project.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QHash>
#include <QSet>

#include <optional>
#include <set>
#include <tuple>
#include <utility>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct W3cImportText {
    Q_DECLARE_TR_FUNCTIONS(W3cImportText)
};

// The article being imported into, with what it holds already: annotation uuids and
// (coder, function, start, end). Only one article is held at a time (an export lists an
// article's annotations together); one met again is read again, imported spans included.
struct CurrentArticle {
    Article article;
    std::set<QString> uuids;
    std::set<std::tuple<qint64, int, qint64, qint64>> spans;
};

} // namespace

Result<W3cImportReport> importW3cAnnotations(Project &project, const QString &path, Phase phase)
{
    FOURFOLD_TRY_STATUS(project.checkBeforeImport());
    auto summaries = project.articles();
    if (!summaries)
        return std::unexpected(summaries.error());
    QHash<QString, ArticleId> bySha;
    for (const ArticleSummary &a : *summaries)
        bySha.insert(a.sha256, a.id);
    summaries->clear();

    W3cImportReport report;
    std::optional<CurrentArticle> current;
    // Ids met in the file, per article: an annotation twice in the file is added once.
    QSet<QPair<qint64, QString>> idsMet;
    std::set<std::pair<qint64, qint64>> finished; // (article, coder) with imported codings
    QHash<QString, CoderId> coders;
    qsizetype index = 0; // of the annotation in the file

    // One annotation, checked and added inside the batch: a failure rolls everything back.
    const auto take = [&](const QJsonObject &item, JsonPlace where) -> Status {
        const qsizetype at = index++;
        const QString id = item.value(QStringLiteral("id")).toString();
        const auto bad = [&](const QString &what) {
            return failAt(ErrorCode::InvalidInput, path, where.line, where.column,
                W3cImportText::tr("Annotation %1%2: %3")
                    .arg(at + 1)
                    .arg(id.isEmpty() ? QString() : QStringLiteral(" (%1)").arg(id), what));
        };
        auto span = readW3cAnnotation(item);
        if (!span)
            return bad(span.error().message);
        if (span->creatorIsSoftware)
            return bad(W3cImportText::tr(
                "its creator \"%1\" is software; only coders' annotations can be imported.")
                           .arg(span->creator));
        const auto article = bySha.constFind(span->articleSha256);
        if (article == bySha.constEnd())
            return bad(W3cImportText::tr("no article of the project has the text with SHA-256 %1.")
                           .arg(span->articleSha256));
        if (!current || current->article.summary.id != *article) {
            current.reset();
            auto loaded = project.article(*article);
            if (!loaded)
                return std::unexpected(loaded.error());
            auto existing = project.annotations(*article);
            if (!existing)
                return std::unexpected(existing.error());
            current.emplace();
            current->article = std::move(*loaded);
            for (const Annotation &a : *existing) {
                current->uuids.insert(a.uuid);
                current->spans.insert({a.coder.value, int(a.content.function),
                    a.content.range.start, a.content.range.end});
            }
        }
        const Article &a = current->article;
        if (span->range.end > a.summary.length)
            return bad(
                W3cImportText::tr("the range [%1, %2) lies outside the article's %3 code points.")
                    .arg(span->range.start)
                    .arg(span->range.end)
                    .arg(a.summary.length));
        if (span->quote && OffsetMap::slice(a.text, span->range) != *span->quote)
            return bad(W3cImportText::tr("the quote \"%1\" is not the article's text at [%2, %3).")
                           .arg(*span->quote)
                           .arg(span->range.start)
                           .arg(span->range.end));

        const QString pseudonym = span->creator.trimmed();
        auto coder = coders.constFind(pseudonym);
        if (coder == coders.constEnd()) {
            auto known = project.coderByPseudonym(pseudonym);
            if (!known)
                return std::unexpected(known.error());
            CoderId coderId;
            if (*known) {
                coderId = (*known)->id;
            } else {
                auto added = project.addCoder(pseudonym, pseudonym, CoderRole::Coder);
                if (!added)
                    return std::unexpected(added.error());
                coderId = *added;
                report.codersCreated << pseudonym;
            }
            coder = coders.insert(pseudonym, coderId);
        }
        // The same annotation twice (its id, or the same coder, function and range on the
        // same article) is skipped and reported, never added again.
        const QString uuid = id.startsWith(QLatin1String("urn:uuid:")) ? id.mid(9) : QString();
        const std::tuple key {
            coder->value, int(span->function), span->range.start, span->range.end};
        if ((!uuid.isEmpty()
                && (current->uuids.contains(uuid) || idsMet.contains({article->value, uuid})))
            || !current->spans.insert(key).second) {
            ++report.skipped;
            report.skippedIds << (id.isEmpty() ? QString::number(at + 1) : id);
            return {};
        }
        if (!uuid.isEmpty())
            idsMet.insert({article->value, uuid});
        AnnotationContent content;
        content.function = span->function;
        content.range = span->range;
        content.attributes = span->attributes;
        AddAnnotationEdit edit(*article, *coder, content, phase);
        if (auto applied = project.applyInBatch(edit); !applied) {
            if (applied.error().code == ErrorCode::InvalidInput
                || applied.error().code == ErrorCode::InvalidArgument)
                return bad(applied.error().message);
            return applied;
        }
        ++report.spans;
        finished.insert({article->value, coder->value});
        return {};
    };

    auto status = project.batch([&]() -> Status {
        // The annotations of a collection's first page, or of a root array, are read one at a
        // time; a lone annotation is the document itself.
        const auto isItem = [](const QStringList &keys) {
            return (keys.size() == 1 && keys[0].isEmpty())
                || (keys.size() == 3 && keys[0] == QLatin1String("first")
                    && keys[1] == QLatin1String("items") && keys[2].isEmpty());
        };
        auto rest = streamJsonItems(path, isItem, take);
        if (!rest)
            return std::unexpected(rest.error());
        if (rest->isObject()) {
            const QJsonObject root = rest->toObject();
            const QString type = root.value(QStringLiteral("type")).toString();
            if (type == QLatin1String("AnnotationCollection")) {
                if (!root.value(QStringLiteral("first")).isObject()
                    || !root.value(QStringLiteral("first"))
                            .toObject()
                            .value(QStringLiteral("items"))
                            .isArray())
                    return failAt(ErrorCode::InvalidInput, path, 1, 1,
                        W3cImportText::tr(
                            "The collection does not hold its annotations inline (\"first\" must "
                            "be an AnnotationPage object with \"items\")."));
            } else if (type == QLatin1String("Annotation") && index == 0) {
                FOURFOLD_TRY_STATUS(take(root, JsonPlace {1, 1}));
            } else {
                return failAt(ErrorCode::InvalidInput, path, 1, 1,
                    W3cImportText::tr(
                        "The file holds neither an AnnotationCollection, nor an Annotation, nor "
                        "an array of annotations."));
            }
        } else if (!rest->isArray()) {
            return failAt(ErrorCode::InvalidInput, path, 1, 1,
                W3cImportText::tr(
                    "The file holds neither an AnnotationCollection, nor an Annotation, nor an "
                    "array of annotations."));
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
