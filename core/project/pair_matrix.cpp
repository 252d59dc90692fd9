#include "core/project/pair_matrix.h"

#include "core/project/project.h"

#include <algorithm>
#include <map>

namespace fourfold::study {

namespace {

// The units of `article` of one kind (paragraph, sentence or token).
std::vector<TextRange> unitsOf(const Article &article, UnitKind kind)
{
    std::vector<TextRange> out;
    if (kind == UnitKind::Paragraph)
        for (const Paragraph &p : article.paragraphs)
            out.push_back(p.range);
    else if (kind == UnitKind::Token)
        out = article.tokens;
    else
        out = article.sentences;
    return out;
}

// Whether any of `spans` of function `f` overlaps `unit` by at least one code point (the rule of
// core/agreement/project_units.h).
bool marks(const std::vector<const Annotation *> &spans, FramingFunction f, const TextRange &unit)
{
    return std::ranges::any_of(spans, [&](const Annotation *a) {
        return a->content.function == f && a->content.range.start < unit.end
            && unit.start < a->content.range.end;
    });
}

} // namespace

UnitCache::UnitCache(const Project &project, UnitKind kind)
    : m_project(project)
    , m_kind(kind)
{ }

Status UnitCache::loadAll()
{
    const SegmentKind segments = m_kind == UnitKind::Paragraph ? SegmentKind::Paragraphs
        : m_kind == UnitKind::Token                            ? SegmentKind::Tokens
                                                               : SegmentKind::Sentences;
    return m_project.forEachSegmentation(
        segments, [&](ArticleId id, std::vector<TextRange> &&units) -> Status {
            m_units.insert_or_assign(id.value, std::move(units));
            return {};
        });
}

Result<const std::vector<TextRange> *> UnitCache::get(ArticleId id)
{
    auto it = m_units.find(id.value);
    if (it == m_units.end()) {
        auto a = m_project.article(id);
        if (!a)
            return std::unexpected(a.error());
        it = m_units.emplace(id.value, unitsOf(*a, m_kind)).first;
    }
    return &it->second;
}

Result<PairMatrix> pairMatrix(UnitCache &cache, const std::vector<ArticleId> &articles,
    const std::vector<FramingFunction> &functions, const std::vector<Annotation> &a,
    const std::vector<Annotation> &b)
{
    PairMatrix m;
    m.data.coders = 2;
    m.data.values = 2;
    // Each coder's spans by article, gathered once rather than filtered per article.
    std::map<qint64, std::vector<const Annotation *>> byArticleA, byArticleB;
    for (const Annotation &x : a)
        byArticleA[x.article.value].push_back(&x);
    for (const Annotation &x : b)
        byArticleB[x.article.value].push_back(&x);
    const std::vector<const Annotation *> none;
    for (ArticleId id : articles) {
        auto units = cache.get(id);
        if (!units)
            return std::unexpected(units.error());
        const auto itA = byArticleA.find(id.value);
        const auto itB = byArticleB.find(id.value);
        const std::vector<const Annotation *> &spansA =
            itA == byArticleA.end() ? none : itA->second;
        const std::vector<const Annotation *> &spansB =
            itB == byArticleB.end() ? none : itB->second;
        for (const TextRange &u : **units) {
            for (FramingFunction f : functions) {
                const bool inA = marks(spansA, f, u);
                const bool inB = marks(spansB, f, u);
                m.data.cells.push_back(inA ? 1 : 0);
                m.data.cells.push_back(inB ? 1 : 0);
                ++m.data.units;
                m.agreeing += inA == inB ? 1 : 0;
                m.aMarked += inA ? 1 : 0;
                m.bMarked += inB ? 1 : 0;
            }
        }
    }
    return m;
}

std::vector<Annotation> spansOf(
    const std::vector<Annotation> &all, CoderId coder, std::optional<Phase> phase)
{
    std::vector<Annotation> out;
    std::ranges::copy_if(all, std::back_inserter(out), [&](const Annotation &x) {
        return x.coder == coder && (!phase || x.phase == *phase) && !x.deleted;
    });
    return out;
}

std::optional<Coder> soleTrainingLead(
    const std::vector<Coder> &coders, const std::vector<Annotation> &all)
{
    std::optional<Coder> found;
    for (const Coder &c : coders) {
        if (c.role != CoderRole::Lead)
            continue;
        const bool coded = std::ranges::any_of(all, [&](const Annotation &a) {
            return a.coder == c.id && a.phase == Phase::Training && !a.deleted;
        });
        if (!coded)
            continue;
        if (found)
            return std::nullopt;
        found = c;
    }
    return found;
}

} // namespace fourfold::study
