#include "core/agreement/disagreements.h"

#include "core/project/coding_scope.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QHash>
#include <QSet>

#include <algorithm>
#include <limits>
#include <set>
#include <unordered_map>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct DisagreementsText {
    Q_DECLARE_TR_FUNCTIONS(DisagreementsText)
};

// An attribute left empty is no value: {"polarity": ""} and {} say the same.
QJsonObject normalised(const QJsonObject &attributes)
{
    QJsonObject out;
    for (auto it = attributes.begin(); it != attributes.end(); ++it) {
        if (it->isNull() || it->isUndefined())
            continue;
        if (it->isString() && it->toString().trimmed().isEmpty())
            continue;
        out.insert(it.key(), *it);
    }
    return out;
}

bool sameContent(const Annotation &a, const Annotation &b)
{
    return a.content.function == b.content.function && a.content.range == b.content.range
        && normalised(a.content.attributes) == normalised(b.content.attributes);
}

// The kinds of disagreement among the spans of one passage (see the header).
unsigned classify(const std::vector<Annotation> &spans, const std::vector<CoderId> &present,
    const std::vector<CoderId> &missing)
{
    unsigned kinds = 0;
    auto set = [&](DisagreementKind k) { kinds |= 1u << unsigned(k); };
    if (!missing.empty())
        set(DisagreementKind::Presence);
    if (present.size() < 2)
        return kinds;
    auto spansOf = [&](CoderId c, std::optional<FramingFunction> f) {
        std::vector<const Annotation *> out;
        for (const Annotation &a : spans)
            if (a.coder == c && (!f || a.content.function == *f))
                out.push_back(&a);
        return out;
    };
    auto functionsOf = [&](CoderId c) {
        unsigned m = 0;
        for (const Annotation *a : spansOf(c, std::nullopt))
            m |= 1u << unsigned(a->content.function);
        return m;
    };
    const unsigned first = functionsOf(present.front());
    unsigned shared = first;
    for (CoderId c : present) {
        const unsigned m = functionsOf(c);
        if (m != first)
            set(DisagreementKind::Function);
        shared &= m;
    }
    for (FramingFunction f : kFramingFunctions) {
        if (!(shared & (1u << unsigned(f))))
            continue;
        auto rangesOf = [&](CoderId c) {
            std::set<TextRange> r;
            for (const Annotation *a : spansOf(c, f))
                r.insert(a->content.range);
            return r;
        };
        const std::set<TextRange> base = rangesOf(present.front());
        std::set<TextRange> common = base;
        for (CoderId c : present) {
            const std::set<TextRange> r = rangesOf(c);
            if (r != base)
                set(DisagreementKind::Boundary);
            std::set<TextRange> keep;
            std::ranges::set_intersection(common, r, std::inserter(keep, keep.begin()));
            common = std::move(keep);
        }
        // Attributes are compared where the coders marked the same range with the same function.
        for (const TextRange &range : common) {
            std::optional<QJsonObject> seen;
            for (CoderId c : present)
                for (const Annotation *a : spansOf(c, f))
                    if (a->content.range == range) {
                        const QJsonObject attrs = normalised(a->content.attributes);
                        if (seen && *seen != attrs)
                            set(DisagreementKind::Attributes);
                        seen = attrs;
                    }
        }
    }
    return kinds;
}

bool touches(const Passage &p, const ComparisonFilter &filter)
{
    return !filter.function || (p.functions() & (1u << unsigned(*filter.function)));
}

} // namespace

bool Passage::isResolved() const
{
    return !gold.empty() || (!rejected.empty() && std::ranges::all_of(rejected, std::identity {}));
}

unsigned Passage::functions() const
{
    unsigned m = 0;
    for (const Annotation &a : spans)
        m |= 1u << unsigned(a.content.function);
    return m;
}

std::vector<Passage> comparePassages(const std::vector<Annotation> &allSpans,
    const std::vector<CoderId> &coders, const std::vector<GoldAnnotation> &gold,
    const std::vector<AnnotationId> &rejectedSpans)
{
    std::vector<Annotation> spans;
    for (const Annotation &a : allSpans)
        if (!a.deleted && std::ranges::find(coders, a.coder) != coders.end())
            spans.push_back(a);
    std::ranges::sort(spans, [&](const Annotation &a, const Annotation &b) {
        const auto ca = std::ranges::find(coders, a.coder) - coders.begin();
        const auto cb = std::ranges::find(coders, b.coder) - coders.begin();
        return std::tie(a.content.range.start, a.content.range.end, ca, a.id.value)
            < std::tie(b.content.range.start, b.content.range.end, cb, b.id.value);
    });
    // Sorted by start, spans overlap the current component exactly when they start before its
    // end: a sweep finds the connected components of the overlap graph.
    std::vector<Passage> out;
    for (const Annotation &a : spans) {
        if (out.empty() || a.content.range.start >= out.back().range.end) {
            Passage p;
            p.range = a.content.range;
            out.push_back(std::move(p));
        }
        Passage &p = out.back();
        p.range.end = std::max(p.range.end, a.content.range.end);
        p.spans.push_back(a);
        p.rejected.push_back(std::ranges::find(rejectedSpans, a.id) != rejectedSpans.end());
    }
    for (Passage &p : out) {
        for (CoderId c : coders) {
            const bool has =
                std::ranges::any_of(p.spans, [&](const Annotation &a) { return a.coder == c; });
            (has ? p.coders : p.missing).push_back(c);
        }
        p.kinds = classify(p.spans, p.coders, p.missing);
        for (const GoldAnnotation &g : gold)
            if (!g.deleted && g.content.range.overlaps(p.range))
                p.gold.push_back(g);
    }
    return out;
}

namespace {

// The coders of `coders` whose coding of `article` counts, in pseudonym order.
std::vector<Coder> countingCoders(
    const std::vector<Coder> &coders, const CodingScope &scope, ArticleId article)
{
    std::vector<Coder> out;
    for (const Coder &c : coders)
        if (scope.counts(article, c.id))
            out.push_back(c);
    std::ranges::sort(out, {}, &Coder::pseudonym);
    return out;
}

} // namespace

ArticleDisagreement disagreementRow(const ArticleSummary &summary, const Comparison &comparison)
{
    ArticleDisagreement row;
    row.article = summary;
    row.coders = comparison.coders;
    for (const Passage &p : comparison.passages) {
        ++row.passages;
        if (p.isAgreed()) {
            row.agreedOpen += p.isResolved() ? 0 : 1;
            continue;
        }
        ++row.disagreements;
        row.unresolved += p.isResolved() ? 0 : 1;
        for (DisagreementKind k : kDisagreementKinds)
            row.byKind[size_t(k)] += p.has(k) ? 1 : 0;
    }
    return row;
}

Result<std::vector<Coder>> articleCoders(
    const Project &project, ArticleId article, bool includeUnfinished)
{
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    auto scope =
        CodingScope::loadArticle(project, article, CodingScopeOptions {includeUnfinished, {}});
    if (!scope)
        return std::unexpected(scope.error());
    return countingCoders(*coders, *scope, article);
}

Result<Comparison> compareArticle(
    const Project &project, ArticleId article, const ComparisonFilter &filter)
{
    auto coded = articleCoders(project, article, filter.includeUnfinished);
    if (!coded)
        return std::unexpected(coded.error());
    auto summary = project.article(article);
    if (!summary)
        return std::unexpected(summary.error());
    ArticleCodings codings;
    auto spans = project.annotations(article);
    if (!spans)
        return std::unexpected(spans.error());
    codings.spans = std::move(*spans);
    auto gold = project.goldAnnotations(article);
    if (!gold)
        return std::unexpected(gold.error());
    codings.gold = std::move(*gold);
    auto rejections = project.goldRejections(article);
    if (!rejections)
        return std::unexpected(rejections.error());
    for (const GoldRejection &r : *rejections)
        codings.rejected.push_back(r.annotation);
    return compareCodings(article, summary->summary.title, *coded, codings, filter);
}

Result<Comparison> compareCodings(ArticleId article, const QString &title,
    const std::vector<Coder> &coded, const ArticleCodings &codings, const ComparisonFilter &filter)
{
    Comparison out;
    out.article = article;
    if (filter.coderPair) {
        for (CoderId c : {filter.coderPair->first, filter.coderPair->second}) {
            if (std::ranges::find(coded, c, &Coder::id) == coded.end())
                return fail(ErrorCode::InvalidArgument,
                    DisagreementsText::tr(
                        "Both coders of the pair must have marked the article \"%1\" done.")
                        .arg(title));
            out.coders.push_back(c);
        }
    } else {
        for (const Coder &c : coded)
            out.coders.push_back(c.id);
    }
    for (Passage &p : comparePassages(codings.spans, out.coders, codings.gold, codings.rejected))
        if (touches(p, filter))
            out.passages.push_back(std::move(p));
    return out;
}

GoldCandidate acceptCandidate(const Passage &passage, const Annotation &span)
{
    GoldCandidate c;
    c.content = span.content;
    c.content.note.clear();
    c.content.confidence.reset();
    for (const Annotation &a : passage.spans)
        if (sameContent(a, span))
            c.sources.push_back(a.id);
    if (std::ranges::find(c.sources, span.id) == c.sources.end())
        c.sources.push_back(span.id);
    return c;
}

Result<GoldCandidate> mergeCandidate(const std::vector<Annotation> &spans)
{
    if (spans.empty())
        return fail(ErrorCode::InvalidArgument,
            DisagreementsText::tr("Choose the spans whose boundaries to merge."));
    GoldCandidate c;
    c.content = spans.front().content;
    c.content.note.clear();
    c.content.confidence.reset();
    for (const Annotation &a : spans) {
        if (a.content.function != c.content.function)
            return fail(ErrorCode::InvalidArgument,
                DisagreementsText::tr(
                    "Only spans of one function can be merged; accept one of them instead."));
        c.content.range.start = std::min(c.content.range.start, a.content.range.start);
        c.content.range.end = std::max(c.content.range.end, a.content.range.end);
        c.sources.push_back(a.id);
    }
    return c;
}

std::vector<GoldCandidate> agreedCandidates(const Comparison &comparison)
{
    std::vector<GoldCandidate> out;
    for (const Passage &p : comparison.passages) {
        if (!p.isAgreed() || p.isResolved())
            continue;
        std::vector<bool> used(p.spans.size(), false);
        for (size_t i = 0; i < p.spans.size(); ++i) {
            if (used[i])
                continue;
            GoldCandidate c = acceptCandidate(p, p.spans[i]);
            for (size_t j = i; j < p.spans.size(); ++j)
                if (sameContent(p.spans[i], p.spans[j]))
                    used[j] = true;
            out.push_back(std::move(c));
        }
    }
    return out;
}

Result<std::vector<ArticleDisagreement>> disagreementQueue(
    const Project &project, const ComparisonFilter &filter)
{
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    auto scope = CodingScope::load(project, CodingScopeOptions {filter.includeUnfinished, {}});
    if (!scope)
        return std::unexpected(scope.error());
    // Everything the comparisons need, read once: the queue costs the same few queries whatever
    // the number of articles. Gold (on some articles) and the rejected spans' ids (few) are held;
    // the spans stream by article, each article compared once its spans are in, so memory holds
    // one article's spans, not the study's.
    std::unordered_map<qint64, std::vector<GoldAnnotation>> goldOf;
    auto gold = project.goldAnnotations();
    if (!gold)
        return std::unexpected(gold.error());
    for (GoldAnnotation &g : *gold)
        goldOf[g.article.value].push_back(std::move(g));
    gold->clear();
    QSet<qint64> rejectedIds;
    auto rejections = project.goldRejections();
    if (!rejections)
        return std::unexpected(rejections.error());
    for (const GoldRejection &r : *rejections)
        rejectedIds.insert(r.annotation.value);

    std::vector<ArticleDisagreement> out;
    std::size_t next = 0; // the first article not yet compared (project order, by id)
    ArticleCodings current; // the spans of `currentArticle` read so far
    qint64 currentArticle = 0;
    // Compares every article before `limit`; the current article takes its spans along.
    const auto compareBefore = [&](qint64 limit) -> Status {
        for (; next < articles->size() && (*articles)[next].id.value < limit; ++next) {
            const ArticleSummary &summary = (*articles)[next];
            const std::vector<Coder> coded = countingCoders(*coders, *scope, summary.id);
            if (coded.size() < 2)
                continue;
            if (filter.coderPair
                && (std::ranges::find(coded, filter.coderPair->first, &Coder::id) == coded.end()
                    || std::ranges::find(coded, filter.coderPair->second, &Coder::id)
                        == coded.end()))
                continue;
            ArticleCodings codings;
            if (summary.id.value == currentArticle)
                codings = std::move(current);
            if (auto g = goldOf.find(summary.id.value); g != goldOf.end())
                codings.gold = std::move(g->second);
            auto comparison = compareCodings(summary.id, summary.title, coded, codings, filter);
            if (!comparison)
                return std::unexpected(comparison.error());
            out.push_back(disagreementRow(summary, *comparison));
        }
        return {};
    };
    // Outlines (the queue counts passages; quotes and notes are read when an article is opened).
    FOURFOLD_TRY_STATUS(project.forEachAnnotationOutline([&](Annotation &&a) -> Status {
        if (a.article.value != currentArticle) {
            FOURFOLD_TRY_STATUS(compareBefore(a.article.value));
            current = ArticleCodings {}; // spans of an article not in the list go
            currentArticle = a.article.value;
        }
        if (rejectedIds.contains(a.id.value))
            current.rejected.push_back(a.id);
        current.spans.push_back(std::move(a));
        return {};
    }));
    FOURFOLD_TRY_STATUS(compareBefore(std::numeric_limits<qint64>::max()));
    std::ranges::stable_sort(out, [](const ArticleDisagreement &a, const ArticleDisagreement &b) {
        return std::tuple(-a.unresolved, -a.disagreements, a.article.title)
            < std::tuple(-b.unresolved, -b.disagreements, b.article.title);
    });
    return out;
}

Result<ArticleDisagreement> articleDisagreement(
    const Project &project, const ArticleDisagreement &row, const ComparisonFilter &filter)
{
    // The article's own rows only (indexed by article): a decision changes gold and rejections,
    // never which coders count, so the row keeps its coders.
    ArticleCodings codings;
    auto spans = project.annotations(row.article.id);
    if (!spans)
        return std::unexpected(spans.error());
    codings.spans = std::move(*spans);
    auto gold = project.goldAnnotations(row.article.id);
    if (!gold)
        return std::unexpected(gold.error());
    codings.gold = std::move(*gold);
    auto rejections = project.goldRejections(row.article.id);
    if (!rejections)
        return std::unexpected(rejections.error());
    for (const GoldRejection &r : *rejections)
        codings.rejected.push_back(r.annotation);
    std::vector<Coder> coders;
    for (CoderId id : row.coders) {
        Coder c;
        c.id = id;
        coders.push_back(c);
    }
    ComparisonFilter all = filter;
    all.coderPair.reset(); // the row's coders already are the pair when one is chosen
    auto comparison = compareCodings(row.article.id, row.article.title, coders, codings, all);
    if (!comparison)
        return std::unexpected(comparison.error());
    return disagreementRow(row.article, *comparison);
}

} // namespace fourfold
