#include "core/scoring/span_layer.h"

#include "core/extract/extractor_runs.h"
#include "core/project/coding_scope.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QHash>
#include <QSet>

#include <algorithm>
#include <iterator>
#include <limits>
#include <tuple>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct SpanLayerText {
    Q_DECLARE_TR_FUNCTIONS(SpanLayerText)
};

} // namespace

QString LayerSpec::key() const
{
    switch (kind) {
    case LayerKind::Gold:
        return QStringLiteral("gold");
    case LayerKind::Coders:
        return QStringLiteral("coders");
    case LayerKind::Coder:
        return QStringLiteral("coder:") + name;
    case LayerKind::Run:
        return QStringLiteral("run:") + name;
    }
    return {};
}

Result<LayerSpec> LayerSpec::parse(const QString &text)
{
    const QString t = text.trimmed();
    if (t == QLatin1String("gold"))
        return LayerSpec {LayerKind::Gold, {}};
    if (t == QLatin1String("coders"))
        return LayerSpec {LayerKind::Coders, {}};
    if (t.startsWith(QLatin1String("coder:")) && t.size() > 6)
        return LayerSpec {LayerKind::Coder, t.mid(6)};
    if (t.startsWith(QLatin1String("run:")) && t.size() > 4)
        return LayerSpec {LayerKind::Run, t.mid(4)};
    return fail(ErrorCode::InvalidArgument,
        SpanLayerText::tr(
            "Unknown layer \"%1\" (expected gold, coders, coder:PSEUDONYM or run:NAME).")
            .arg(text));
}

std::vector<ArticleId> SpanLayer::articles() const
{
    std::vector<ArticleId> out;
    for (const LayerCoverage &c : coverage)
        if (out.empty() || out.back() != c.article)
            out.push_back(c.article);
    return out;
}

LayerReader::LayerReader(const Project &project, LayerSpec spec)
    : m_project(&project)
    , m_spec(std::move(spec))
{ }

Result<LayerReader> LayerReader::open(
    const Project &project, const LayerSpec &spec, bool includeUnfinished)
{
    LayerReader reader(project, spec);
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());

    switch (spec.kind) {
    case LayerKind::Gold: {
        reader.m_sources << QStringLiteral("gold");
        for (const Coder &c : *coders)
            reader.m_pseudonyms.insert(c.id.value, c.pseudonym);
        // Gold covers the articles holding a gold span: their ids, nothing else, are kept.
        QSet<qint64> withGold;
        FOURFOLD_TRY_STATUS(project.forEachGoldAnnotation([&](GoldAnnotation &&g) -> Status {
            withGold.insert(g.article.value);
            return {};
        }));
        for (const ArticleSummary &a : *articles)
            if (withGold.contains(a.id.value))
                reader.m_coverage.emplace_back(a.id, 0);
        break;
    }
    case LayerKind::Coders:
    case LayerKind::Coder: {
        std::vector<const Coder *> chosen;
        for (const Coder &c : *coders)
            if (spec.kind == LayerKind::Coders || c.pseudonym == spec.name)
                chosen.push_back(&c);
        if (spec.kind == LayerKind::Coder && chosen.empty())
            return fail(ErrorCode::NotFound,
                SpanLayerText::tr("There is no coder \"%1\" in the project.").arg(spec.name));
        // A coder covers the articles whose coding counts (CodingScope): spans of articles in
        // progress are neither scored nor exported unless asked for.
        auto scope = CodingScope::load(project, CodingScopeOptions {includeUnfinished, {}});
        if (!scope)
            return std::unexpected(scope.error());
        std::vector<std::pair<ArticleId, const Coder *>> covered;
        QSet<qint64> active;
        for (const ArticleSummary &article : *articles)
            for (const Coder *c : chosen)
                if (scope->counts(article.id, c->id)) {
                    covered.emplace_back(article.id, c);
                    active.insert(c->id.value);
                }
        // Every coder of the project for "coders" would list people who coded nothing; only
        // those whose coding counts somewhere are sources (one coder asked for by name always is).
        std::vector<const Coder *> sources;
        for (const Coder *c : chosen)
            if (spec.kind == LayerKind::Coder || active.contains(c->id.value))
                sources.push_back(c);
        std::sort(sources.begin(), sources.end(),
            [](const Coder *a, const Coder *b) { return a->pseudonym < b->pseudonym; });
        for (const Coder *c : sources) {
            reader.m_coderSource.insert(c->id.value, int(reader.m_sources.size()));
            reader.m_sources << c->pseudonym;
        }
        for (const auto &[article, coder] : covered)
            reader.m_coverage.emplace_back(article, reader.m_coderSource.value(coder->id.value));
        // Articles come in project order (by id); within one, by source order.
        std::sort(
            reader.m_coverage.begin(), reader.m_coverage.end(), [](const auto &a, const auto &b) {
                return std::pair(a.first.value, a.second) < std::pair(b.first.value, b.second);
            });
        break;
    }
    case LayerKind::Run: {
        auto run = ExtractorRuns::runByName(project, spec.name);
        if (!run)
            return std::unexpected(run.error());
        if (!*run)
            return fail(ErrorCode::NotFound,
                SpanLayerText::tr("There is no extractor run \"%1\" in the project.")
                    .arg(spec.name));
        reader.m_sources << spec.key();
        reader.m_run = (*run)->id;
        reader.m_runCreatedAt = (*run)->createdAt;
        // A run covers every article of the project.
        for (const ArticleSummary &a : *articles)
            reader.m_coverage.emplace_back(a.id, 0);
        break;
    }
    }
    return reader;
}

std::vector<ArticleId> LayerReader::articles() const
{
    std::vector<ArticleId> out;
    for (const auto &[article, source] : m_coverage)
        if (out.empty() || out.back() != article)
            out.push_back(article);
    return out;
}

Status LayerReader::forEachArticle(const std::function<Status(LayerArticle &&)> &visit) const
{
    m_mostHeld = 0;
    std::size_t next = 0; // the first coverage entry not yet handed over
    std::vector<LayerSpan> held; // the spans of `heldArticle`
    qint64 heldArticle = 0;
    // Hands over every covered article before `limit`, the held spans with theirs.
    const auto handOverBefore = [&](qint64 limit) -> Status {
        while (next < m_coverage.size() && m_coverage[next].first.value < limit) {
            LayerArticle a;
            a.article = m_coverage[next].first;
            for (; next < m_coverage.size() && m_coverage[next].first == a.article; ++next)
                a.sources << m_sources[m_coverage[next].second];
            if (a.article.value == heldArticle) {
                std::stable_sort(
                    held.begin(), held.end(), [&](const LayerSpan &x, const LayerSpan &y) {
                        return std::tuple(m_sources.indexOf(x.source), x.range.start, x.range.end,
                                   int(x.function))
                            < std::tuple(m_sources.indexOf(y.source), y.range.start, y.range.end,
                                int(y.function));
                    });
                a.spans = std::move(held);
                held.clear();
            }
            FOURFOLD_TRY_STATUS(visit(std::move(a)));
        }
        return {};
    };
    // Takes a span of `article` from `source` if that source covers the article.
    const auto take = [&](ArticleId article, int source, LayerSpan &&span) -> Status {
        if (article.value != heldArticle) {
            FOURFOLD_TRY_STATUS(handOverBefore(article.value));
            held.clear(); // spans of an article no source covers (a deleted one) go
            heldArticle = article.value;
        }
        for (std::size_t k = next; k < m_coverage.size() && m_coverage[k].first == article; ++k)
            if (m_coverage[k].second == source) {
                span.article = article;
                span.source = m_sources[source];
                held.push_back(std::move(span));
                m_mostHeld = std::max(m_mostHeld, held.size());
                break;
            }
        return {};
    };

    switch (m_spec.kind) {
    case LayerKind::Gold:
        FOURFOLD_TRY_STATUS(m_project->forEachGoldAnnotation([&](GoldAnnotation &&g) -> Status {
            LayerSpan s;
            s.function = g.content.function;
            s.range = g.content.range;
            s.attributes = std::move(g.content.attributes);
            s.coder = m_pseudonyms.value(g.decidedBy.value);
            s.uuid = std::move(g.uuid);
            s.createdAt = std::move(g.decidedAt);
            return take(g.article, 0, std::move(s));
        }));
        break;
    case LayerKind::Coders:
    case LayerKind::Coder:
        FOURFOLD_TRY_STATUS(m_project->forEachAnnotation([&](Annotation &&a) -> Status {
            const int source = sourceOfCoder(a.coder.value);
            if (source < 0 || a.deleted)
                return {};
            LayerSpan s;
            s.function = a.content.function;
            s.range = a.content.range;
            s.attributes = std::move(a.content.attributes);
            s.coder = m_sources[source];
            s.uuid = std::move(a.uuid);
            s.createdAt = std::move(a.createdAt);
            return take(a.article, source, std::move(s));
        }));
        break;
    case LayerKind::Run:
        FOURFOLD_TRY_STATUS(
            ExtractorRuns::forEachSpan(*m_project, m_run, [&](ExtractedSpan &&e) -> Status {
                LayerSpan s;
                s.function = e.function;
                s.range = e.range;
                s.attributes = std::move(e.attributes);
                s.score = e.score;
                s.createdAt = m_runCreatedAt;
                return take(e.article, 0, std::move(s));
            }));
        break;
    }
    return handOverBefore(std::numeric_limits<qint64>::max());
}

Result<SpanLayer> resolveLayer(
    const Project &project, const LayerSpec &spec, bool includeUnfinished)
{
    auto reader = LayerReader::open(project, spec, includeUnfinished);
    if (!reader)
        return std::unexpected(reader.error());
    SpanLayer layer;
    layer.spec = spec;
    layer.sources = reader->sources();
    FOURFOLD_TRY_STATUS(reader->forEachArticle([&](LayerArticle &&a) -> Status {
        for (const QString &source : a.sources)
            layer.coverage.push_back(LayerCoverage {a.article, source});
        std::move(a.spans.begin(), a.spans.end(), std::back_inserter(layer.spans));
        return {};
    }));
    return layer;
}

} // namespace fourfold
