#include "core/scoring/span_layer.h"

#include "core/extract/extractor_runs.h"
#include "core/project/coding_scope.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QHash>
#include <QSet>

#include <algorithm>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("SpanLayer", text);
}

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
        tr("Unknown layer \"%1\" (expected gold, coders, coder:PSEUDONYM or run:NAME).").arg(text));
}

std::vector<ArticleId> SpanLayer::articles() const
{
    std::vector<ArticleId> out;
    for (const LayerCoverage &c : coverage)
        if (out.empty() || out.back() != c.article)
            out.push_back(c.article);
    return out;
}

Result<SpanLayer> resolveLayer(
    const Project &project, const LayerSpec &spec, bool includeUnfinished)
{
    SpanLayer layer;
    layer.spec = spec;
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    QHash<qint64, QString> pseudonyms;
    for (const Coder &c : *coders)
        pseudonyms.insert(c.id.value, c.pseudonym);

    // (article, source) pairs covered, and the spans, before ordering.
    QSet<QPair<qint64, QString>> covered;
    std::vector<LayerSpan> spans;

    switch (spec.kind) {
    case LayerKind::Gold: {
        layer.sources << QStringLiteral("gold");
        auto gold = project.goldAnnotations();
        if (!gold)
            return std::unexpected(gold.error());
        for (const GoldAnnotation &g : *gold) {
            LayerSpan s;
            s.article = g.article;
            s.function = g.content.function;
            s.range = g.content.range;
            s.attributes = g.content.attributes;
            s.coder = pseudonyms.value(g.decidedBy.value);
            s.source = QStringLiteral("gold");
            s.uuid = g.uuid;
            s.createdAt = g.decidedAt;
            covered.insert({g.article.value, s.source});
            spans.push_back(std::move(s));
        }
        break;
    }
    case LayerKind::Coders:
    case LayerKind::Coder: {
        QSet<qint64> chosen;
        for (const Coder &c : *coders)
            if (spec.kind == LayerKind::Coders || c.pseudonym == spec.name)
                chosen.insert(c.id.value);
        if (spec.kind == LayerKind::Coder && chosen.isEmpty())
            return fail(
                ErrorCode::NotFound, tr("There is no coder \"%1\" in the project.").arg(spec.name));
        // A coder covers the articles whose coding counts (CodingScope): spans of articles in
        // progress are neither scored nor exported unless asked for.
        auto scope = CodingScope::load(project, CodingScopeOptions {includeUnfinished, {}});
        if (!scope)
            return std::unexpected(scope.error());
        for (const ArticleSummary &article : *articles)
            for (const Coder &c : *coders)
                if (chosen.contains(c.id.value) && scope->counts(article.id, c.id))
                    covered.insert({article.id.value, c.pseudonym});
        auto annotations = project.allAnnotations();
        if (!annotations)
            return std::unexpected(annotations.error());
        for (const Annotation &a : *annotations) {
            if (!chosen.contains(a.coder.value) || a.deleted || !scope->counts(a.article, a.coder))
                continue;
            LayerSpan s;
            s.article = a.article;
            s.function = a.content.function;
            s.range = a.content.range;
            s.attributes = a.content.attributes;
            s.coder = s.source = pseudonyms.value(a.coder.value);
            s.uuid = a.uuid;
            s.createdAt = a.createdAt;
            covered.insert({a.article.value, s.source});
            spans.push_back(std::move(s));
        }
        // Every coder of the project for "coders" would list people who coded nothing; only
        // those who coded something are sources (one coder asked for by name always is).
        QSet<QString> active;
        for (const auto &[article, source] : covered)
            active.insert(source);
        QStringList sources;
        for (const Coder &c : *coders)
            if (chosen.contains(c.id.value)
                && (spec.kind == LayerKind::Coder || active.contains(c.pseudonym)))
                sources << c.pseudonym;
        sources.sort();
        layer.sources = sources;
        break;
    }
    case LayerKind::Run: {
        auto run = ExtractorRuns::runByName(project, spec.name);
        if (!run)
            return std::unexpected(run.error());
        if (!*run)
            return fail(ErrorCode::NotFound,
                tr("There is no extractor run \"%1\" in the project.").arg(spec.name));
        const QString source = spec.key();
        layer.sources << source;
        for (const ArticleSummary &a : *articles)
            covered.insert({a.id.value, source});
        auto extracted = ExtractorRuns::spans(project, (*run)->id);
        if (!extracted)
            return std::unexpected(extracted.error());
        for (const ExtractedSpan &e : *extracted) {
            LayerSpan s;
            s.article = e.article;
            s.function = e.function;
            s.range = e.range;
            s.attributes = e.attributes;
            s.score = e.score;
            s.source = source;
            s.createdAt = (*run)->createdAt;
            spans.push_back(std::move(s));
        }
        break;
    }
    }

    QHash<qint64, int> articleOrder;
    for (const ArticleSummary &a : *articles) {
        articleOrder.insert(a.id.value, int(articleOrder.size()));
        for (const QString &source : layer.sources)
            if (covered.contains({a.id.value, source}))
                layer.coverage.push_back(LayerCoverage {a.id, source});
    }
    auto sourceIndex = [&](const QString &s) { return layer.sources.indexOf(s); };
    std::stable_sort(spans.begin(), spans.end(), [&](const LayerSpan &a, const LayerSpan &b) {
        return std::tuple(articleOrder.value(a.article.value), sourceIndex(a.source), a.range.start,
                   a.range.end, int(a.function))
            < std::tuple(articleOrder.value(b.article.value), sourceIndex(b.source), b.range.start,
                b.range.end, int(b.function));
    });
    layer.spans = std::move(spans);
    return layer;
}

} // namespace fourfold
