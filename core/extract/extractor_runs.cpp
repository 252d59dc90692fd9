#include "core/extract/extractor_runs.h"

#include "core/extract/extractor.h"
#include "core/extract/extractor_protocol.h"
#include "core/io/input_file.h"
#include "core/project/project.h"
#include "core/store/database.h"
#include "core/store/event_log.h"
#include "core/store/extractor_run_table.h"
#include "core/store/savepoint.h"
#include "core/store/store_util.h"

#include <QCoreApplication>
#include <QCryptographicHash>
#include <QFile>
#include <QFileInfo>
#include <QHash>
#include <QSet>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ExtractorRunsText {
    Q_DECLARE_TR_FUNCTIONS(ExtractorRunsText)
};

// InvalidArgument for an unusable name, Duplicate for a taken one.
Status checkNewName(const Project &project, const QString &name)
{
    if (name.trimmed().isEmpty() || name != name.trimmed())
        return fail(ErrorCode::InvalidArgument,
            ExtractorRunsText::tr("A run needs a name without leading or trailing spaces."));
    if (std::ranges::any_of(name, [](QChar c) { return c.category() == QChar::Other_Control; }))
        return fail(ErrorCode::InvalidArgument,
            ExtractorRunsText::tr("A run name may not hold control characters."));
    auto existing = ExtractorRuns::runByName(project, name);
    if (!existing)
        return std::unexpected(existing.error());
    if (existing->has_value())
        return fail(ErrorCode::Duplicate,
            ExtractorRunsText::tr(
                "There is already a run called \"%1\"; choose another name or delete it first.")
                .arg(name));
    return {};
}

} // namespace

Result<std::vector<ExtractorRun>> ExtractorRuns::runs(const Project &project)
{
    return store::runs(project.db());
}

Result<std::optional<ExtractorRun>> ExtractorRuns::runByName(
    const Project &project, const QString &name)
{
    return store::runByName(project.db(), name);
}

Result<std::vector<ExtractedSpan>> ExtractorRuns::spans(
    const Project &project, RunId run, ArticleId article)
{
    return store::extractedSpans(project.db(), run, article);
}

Status ExtractorRuns::forEachSpan(
    const Project &project, RunId run, const std::function<Status(ExtractedSpan &&)> &visit)
{
    return store::forEachExtractedSpan(project.db(), run, visit);
}

Result<qint64> ExtractorRuns::spanCount(const Project &project, RunId run)
{
    return store::extractedSpanCount(project.db(), run);
}

Result<ExtractorRun> ExtractorRuns::create(Project &project, Extractor &extractor,
    const QString &name, const std::vector<ArticleId> &articles)
{
    FOURFOLD_TRY_STATUS(checkNewName(project, name));
    std::vector<ArticleId> ids = articles;
    if (ids.empty()) {
        auto summaries = project.articles();
        if (!summaries)
            return std::unexpected(summaries.error());
        for (const ArticleSummary &s : *summaries)
            ids.push_back(s.id);
    }
    // The articles in batches when the extractor reads each alone, else all at once.
    const size_t batch = extractor.readsArticlesAlone() ? kArticlesPerBatch : ids.size();
    std::vector<ExtractedSpan> found;
    std::vector<Article> input;
    for (size_t from = 0; from < ids.size(); from += batch) {
        input.clear();
        for (size_t i = from; i < std::min(ids.size(), from + batch); ++i) {
            auto article = project.article(ids[i]);
            if (!article)
                return std::unexpected(article.error());
            input.push_back(std::move(*article));
        }
        auto spans = extractor.extract(input);
        if (!spans)
            return std::unexpected(spans.error());
        found.insert(found.end(), std::make_move_iterator(spans->begin()),
            std::make_move_iterator(spans->end()));
    }

    ExtractorRun run;
    run.name = name;
    run.version = extractor.version();
    run.parameters = extractor.parameters();
    run.parameters.insert(QStringLiteral("extractor"), extractor.kind());
    return storeRun(project, std::move(run), found);
}

Result<ExtractorRun> ExtractorRuns::importRun(Project &project, const QString &name,
    const QString &path, const QString &version, const QJsonObject &parameters)
{
    FOURFOLD_TRY_STATUS(checkNewName(project, name));
    const auto read = readWholeFile(path, maxWholeFileSize);
    if (!read)
        return std::unexpected(read.error());
    const QByteArray &bytes = *read;

    auto summaries = project.articles();
    if (!summaries)
        return std::unexpected(summaries.error());
    QHash<QString, SpanTarget> targets;
    for (const ArticleSummary &s : *summaries)
        targets.insert(s.externalId, SpanTarget {s.id, s.length});
    auto spans = readSpanFile(bytes, path, targets);
    if (!spans)
        return std::unexpected(spans.error());

    ExtractorRun run;
    run.name = name;
    run.version = version;
    run.parameters = parameters;
    run.parameters.insert(QStringLiteral("extractor"), QStringLiteral("file"));
    run.parameters.insert(QStringLiteral("file"), QFileInfo(path).fileName());
    run.parameters.insert(QStringLiteral("sha256"),
        QString::fromLatin1(QCryptographicHash::hash(bytes, QCryptographicHash::Sha256).toHex()));
    return storeRun(project, std::move(run), *spans);
}

Result<ExtractorRun> ExtractorRuns::storeRun(
    Project &project, ExtractorRun run, const std::vector<ExtractedSpan> &spans)
{
    FOURFOLD_TRY_STATUS(checkNewName(project, run.name));
    auto summaries = project.articles();
    if (!summaries)
        return std::unexpected(summaries.error());
    QHash<ArticleId, const ArticleSummary *> byId;
    for (const ArticleSummary &s : *summaries)
        byId.insert(s.id, &s);
    QSet<ArticleId> articlesWithSpans;
    for (const ExtractedSpan &span : spans) {
        const ArticleSummary *article = byId.value(span.article, nullptr);
        if (!article)
            return fail(ErrorCode::NotFound,
                ExtractorRunsText::tr(
                    "A span of run \"%1\" names article #%2, which is not in the project.")
                    .arg(run.name)
                    .arg(span.article.value));
        if (span.range.start < 0 || span.range.end <= span.range.start
            || span.range.end > article->length)
            return fail(ErrorCode::InvalidInput,
                ExtractorRunsText::tr(
                    "A span of run \"%1\", [%2, %3), does not lie inside article %4 (%5 code "
                    "points) or is empty.")
                    .arg(run.name)
                    .arg(span.range.start)
                    .arg(span.range.end)
                    .arg(article->externalId)
                    .arg(article->length));
        articlesWithSpans.insert(span.article);
    }

    std::vector<ExtractedSpan> sorted = spans;
    std::ranges::stable_sort(sorted, [](const ExtractedSpan &a, const ExtractedSpan &b) {
        return std::tie(a.article, a.range) < std::tie(b.article, b.range);
    });
    run.uuid = store::newUuid();
    run.createdAt = store::now();

    Database &db = project.db();
    auto sp = Savepoint::begin(db);
    if (!sp)
        return std::unexpected(sp.error());
    auto id = store::insertRun(db, run);
    if (!id)
        return std::unexpected(id.error());
    run.id = *id;
    FOURFOLD_TRY_STATUS(store::insertExtractedSpans(db, run.id, sorted));
    FOURFOLD_TRY_STATUS(store::appendEvent(db, CoderId {}, QStringLiteral("extractor_run.add"),
        QStringLiteral("extractor_run"), run.uuid,
        QJsonObject {{QStringLiteral("name"), run.name}, {QStringLiteral("version"), run.version},
            {QStringLiteral("parameters"), run.parameters},
            {QStringLiteral("spans"), qint64(sorted.size())},
            {QStringLiteral("articlesWithSpans"), qint64(articlesWithSpans.size())}}));
    FOURFOLD_TRY_STATUS(sp->commit());
    return run;
}

Status ExtractorRuns::deleteRun(Project &project, const QString &name)
{
    auto run = runByName(project, name);
    if (!run)
        return std::unexpected(run.error());
    if (!run->has_value())
        return fail(
            ErrorCode::NotFound, ExtractorRunsText::tr("There is no run called \"%1\".").arg(name));
    auto count = spanCount(project, (*run)->id);
    if (!count)
        return std::unexpected(count.error());
    Database &db = project.db();
    auto sp = Savepoint::begin(db);
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(store::removeRun(db, (*run)->id));
    FOURFOLD_TRY_STATUS(store::appendEvent(db, CoderId {}, QStringLiteral("extractor_run.delete"),
        QStringLiteral("extractor_run"), (*run)->uuid,
        QJsonObject {{QStringLiteral("name"), name}, {QStringLiteral("spans"), *count}}));
    return sp->commit();
}

} // namespace fourfold
