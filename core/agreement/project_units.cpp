#include "core/agreement/project_units.h"

#include "core/project/coding_scope.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QHash>
#include <QJsonObject>
#include <QSet>

#include <algorithm>
#include <array>
#include <map>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ProjectUnitsText {
    Q_DECLARE_TR_FUNCTIONS(ProjectUnitsText)
};

bool inPhase(const std::optional<Phase> &phase, Phase p)
{
    return !phase || *phase == p;
}

} // namespace

Result<CountedCodings> countedCodings(const Project &project, const UnitSelection &sel)
{
    CountedCodings s;
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    auto scope = CodingScope::load(project, CodingScopeOptions {sel.includeUnfinished, sel.phase});
    if (!scope)
        return std::unexpected(scope.error());

    if (sel.articles.isEmpty()) {
        s.articles = *articles;
    } else {
        QHash<QString, const ArticleSummary *> byId;
        for (const ArticleSummary &a : *articles)
            byId.insert(a.externalId, &a);
        for (const QString &id : sel.articles) {
            const ArticleSummary *a = byId.value(id);
            if (!a)
                return fail(ErrorCode::NotFound,
                    ProjectUnitsText::tr("There is no article \"%1\" in the project.").arg(id));
            s.articles.push_back(*a);
        }
    }

    std::vector<Coder> candidates;
    if (sel.coders.isEmpty()) {
        candidates = *coders;
    } else {
        for (const QString &pseudonym : sel.coders) {
            auto it = std::find_if(coders->begin(), coders->end(),
                [&](const Coder &c) { return c.pseudonym == pseudonym; });
            if (it == coders->end())
                return fail(ErrorCode::NotFound,
                    ProjectUnitsText::tr("There is no coder \"%1\" in the project.")
                        .arg(pseudonym));
            candidates.push_back(*it);
        }
    }
    for (const Coder &c : candidates) {
        CountedCodings::LeftOut left {c.pseudonym, {}};
        bool any = false;
        for (const ArticleSummary &a : s.articles) {
            if (scope->counts(a.id, c.id)) {
                any = true;
                s.counted.insert({a.id.value, c.id.value});
            } else if (scope->leftOut(a.id, c.id)) {
                left.articles << a.externalId;
            }
        }
        if (!left.articles.isEmpty())
            s.leftOut.push_back(std::move(left));
        // Without a list of coders, a coder is compared when something of theirs counts.
        if (any || !sel.coders.isEmpty())
            s.coders.push_back(c);
    }
    if (s.coders.size() < 2)
        return fail(ErrorCode::InvalidArgument,
            ProjectUnitsText::tr("Reliability needs at least two coders; the selection has %n.",
                nullptr, int(s.coders.size())));
    QSet<qint64> articleIds;
    for (const ArticleSummary &a : s.articles)
        articleIds.insert(a.id.value);
    // The gold standard joins as one more coder; its id -1 cannot clash with a row id.
    constexpr qint64 kGold = -1;
    if (sel.includeGold) {
        Coder gold;
        gold.id = CoderId {kGold};
        gold.name = gold.pseudonym = QStringLiteral("gold");
        s.coders.push_back(gold);
    }
    for (size_t i = 0; i < s.coders.size(); ++i)
        s.coderIndex.insert(s.coders[i].id.value, int(i));
    if (sel.includeGold) {
        // Gold counts on the articles it covers.
        auto golds = project.goldAnnotations();
        if (!golds)
            return std::unexpected(golds.error());
        for (const GoldAnnotation &g : *golds) {
            if (!articleIds.contains(g.article.value))
                continue;
            Annotation a;
            a.id = AnnotationId {-g.id.value};
            a.article = g.article;
            a.coder = CoderId {kGold};
            a.content = g.content;
            a.quote = g.quote;
            s.counted.insert({g.article.value, kGold});
            s.annotations.push_back(a);
        }
    }

    // Outlines, one row at a time: only the spans that count are kept.
    FOURFOLD_TRY_STATUS(project.forEachAnnotationOutline([&](Annotation &&a) -> Status {
        if (inPhase(sel.phase, a.phase) && s.counts(a.article.value, a.coder.value)
            && s.coderIndex.contains(a.coder.value))
            s.annotations.push_back(std::move(a));
        return {};
    }));
    auto judgements = project.allJudgements();
    if (!judgements)
        return std::unexpected(judgements.error());
    for (Judgement &j : *judgements)
        if (inPhase(sel.phase, j.phase) && s.counts(j.article.value, j.coder.value)
            && s.coderIndex.contains(j.coder.value))
            s.judgements.push_back(std::move(j));
    if (sel.includeGold) {
        // Gold answers are gold's answers to the article-level items. They do not make gold count
        // on an article for the units of the text: there only gold spans do.
        auto golds = project.goldJudgements();
        if (!golds)
            return std::unexpected(golds.error());
        for (const GoldJudgement &g : *golds) {
            if (!articleIds.contains(g.article.value))
                continue;
            Judgement j;
            j.id = JudgementId {-g.id.value};
            j.uuid = g.uuid;
            j.article = g.article;
            j.coder = CoderId {kGold};
            j.itemKey = g.itemKey;
            j.value = g.value;
            j.createdAt = j.modifiedAt = g.decidedAt;
            s.judgements.push_back(std::move(j));
        }
    }
    return s;
}

QStringList leftOutLines(const std::vector<CountedCodings::LeftOut> &leftOut)
{
    QStringList out;
    for (const CountedCodings::LeftOut &l : leftOut)
        out << (l.articles.size() == 1
                ? ProjectUnitsText::tr("%1: 1 article in progress left out").arg(l.coder)
                : ProjectUnitsText::tr("%1: %2 articles in progress left out")
                      .arg(l.coder)
                      .arg(l.articles.size()));
    return out;
}

QJsonArray leftOutJson(const std::vector<CountedCodings::LeftOut> &leftOut)
{
    QJsonArray out;
    for (const CountedCodings::LeftOut &l : leftOut)
        out.append(QJsonObject {{QStringLiteral("coder"), l.coder},
            {QStringLiteral("articles"), QJsonArray::fromStringList(l.articles)}});
    return out;
}

namespace {

// Span units of one article: passages of overlapping spans (union-find over the overlap graph)
// and each coder's attribute value in each passage.
void addSpanUnits(ReliabilityTable &table, const QString &articleId,
    const std::vector<const Annotation *> &spans, const QHash<qint64, int> &coderIndex,
    const QString &attribute, qsizetype coders)
{
    const size_t n = spans.size();
    std::vector<size_t> parent(n);
    for (size_t i = 0; i < n; ++i)
        parent[i] = i;
    auto find = [&](size_t i) {
        while (parent[i] != i)
            i = parent[i] = parent[parent[i]];
        return i;
    };
    for (size_t i = 0; i < n; ++i)
        for (size_t j = i + 1; j < n; ++j)
            if (spans[i]->coder != spans[j]->coder
                && spans[i]->content.range.overlaps(spans[j]->content.range))
                parent[find(i)] = find(j);
    // Components in order of their first span's start (spans come sorted by start).
    std::vector<size_t> order;
    std::map<size_t, std::vector<size_t>> members;
    for (size_t i = 0; i < n; ++i) {
        const size_t root = find(i);
        if (!members.count(root))
            order.push_back(root);
        members[root].push_back(i);
    }
    std::vector<qint32> cells; // the passages' rows, one after the other
    cells.reserve(order.size() * size_t(coders));
    for (size_t root : order) {
        const std::vector<size_t> &m = members[root];
        // Coders without a span in the passage are missing: an attribute of nothing is not a value.
        const size_t row = cells.size();
        cells.resize(row + size_t(coders), ReliabilityTable::kMissing);
        std::vector<qint64> bestOverlap(size_t(coders), -1);
        for (size_t i : m) {
            qint64 overlap = 0;
            for (size_t j : m)
                if (spans[j]->coder != spans[i]->coder)
                    if (auto x = spans[i]->content.range.intersect(spans[j]->content.range))
                        overlap += x->length();
            const int c = coderIndex.value(spans[i]->coder.value);
            if (overlap > bestOverlap[size_t(c)]) {
                bestOverlap[size_t(c)] = overlap;
                const QString value =
                    spans[i]->content.attributes.value(attribute).toString().trimmed();
                cells[row + size_t(c)] =
                    value.isEmpty() ? ReliabilityTable::kMissing : table.labelIndex(value);
            }
        }
    }
    table.appendNumberedUnits(articleId, QStringLiteral("#a"), cells);
}

// The label of a set of functions ("cause|problem", "{}" for none), made once for the 16 sets.
const QString &setLabel(unsigned mask)
{
    static const std::array<QString, 16> labels = [] {
        std::array<QString, 16> out;
        for (unsigned m = 0; m < 16; ++m) {
            QStringList keys;
            for (FramingFunction f : kFramingFunctions)
                if (m & (1u << unsigned(f)))
                    keys << functionKey(f);
            out[m] = keys.isEmpty() ? QStringLiteral("{}") : keys.join(QLatin1Char('|'));
        }
        return out;
    }();
    return labels[mask & 15u];
}

// Units of one article's segmentation: per unit and coder, "present"/"absent" for one function
// or the set of functions of the spans that overlap it; missing where the coder's coding of the
// article does not count.
void addSegmentUnits(ReliabilityTable &table, const ArticleSummary &summary,
    const std::vector<TextRange> &units,
    const std::map<std::pair<qint64, int>, std::vector<const Annotation *>> &spans,
    const CountedCodings &s, const UnitSelection &sel, const QString &prefix)
{
    const qint64 articleId = summary.id.value;
    const qsizetype coders = table.coders.size();
    // masks[unit * coders + coder]: bit f set when a span of function f overlaps the unit.
    std::vector<unsigned> masks(units.size() * size_t(coders), 0);
    for (qsizetype c = 0; c < coders; ++c) {
        auto it = spans.find({articleId, int(c)});
        if (it == spans.end())
            continue;
        for (const Annotation *a : it->second) {
            const TextRange r = a->content.range;
            // Units are sorted and disjoint: find the first that ends after the span starts.
            auto first = std::partition_point(
                units.begin(), units.end(), [&](const TextRange &u) { return u.end <= r.start; });
            for (auto u = first; u != units.end() && u->start < r.end; ++u)
                masks[size_t(u - units.begin()) * size_t(coders) + size_t(c)] |= 1u
                    << unsigned(a->content.function);
        }
    }
    std::vector<bool> counted(size_t(coders), false);
    for (qsizetype c = 0; c < coders; ++c)
        counted[size_t(c)] = s.counts(articleId, s.coders[size_t(c)].id.value);
    // The label of each value a cell can take (a function mask, or present/absent), looked up
    // once per table rather than per cell.
    std::array<qint32, 16> labelOf {};
    for (unsigned m = 0; m < 16; ++m)
        labelOf[m] = sel.function
            ? table.labelIndex(m ? QStringLiteral("present") : QStringLiteral("absent"))
            : table.labelIndex(setLabel(m));
    std::vector<qint32> cells(masks.size());
    for (size_t u = 0; u < units.size(); ++u)
        for (qsizetype c = 0; c < coders; ++c) {
            const size_t at = u * size_t(coders) + size_t(c);
            cells[at] = counted[size_t(c)] ? labelOf[masks[at] & 15u] : ReliabilityTable::kMissing;
        }
    table.appendNumberedUnits(summary.externalId, prefix, cells);
}

} // namespace

Result<ReliabilityTable> unitTable(const Project &project, const UnitSelection &sel)
{
    auto counted = countedCodings(project, sel);
    if (!counted)
        return std::unexpected(counted.error());
    return unitTable(project, *counted, sel);
}

Result<ReliabilityTable> unitTable(
    const Project &project, const CountedCodings &s, const UnitSelection &sel)
{
    if (sel.unit == UnitKind::Continuum)
        return fail(ErrorCode::InvalidArgument,
            ProjectUnitsText::tr(
                "Continuum units are compared with unitizing alpha, not as a table."));
    if (sel.unit == UnitKind::Span && (!sel.function || sel.attribute.isEmpty()))
        return fail(ErrorCode::InvalidArgument,
            ProjectUnitsText::tr(
                "Span units compare an attribute: name one function and one of its attributes."));
    ReliabilityTable table;
    table.source = project.path();
    for (const Coder &c : s.coders)
        table.coders << c.pseudonym;
    const qsizetype coders = table.coders.size();

    // Annotations per (article, coder), sorted by start.
    std::map<std::pair<qint64, int>, std::vector<const Annotation *>> spans;
    for (const Annotation &a : s.annotations)
        if (!sel.function || a.content.function == *sel.function)
            spans[{a.article.value, s.coderIndex.value(a.coder.value)}].push_back(&a);

    // The selected articles that the codings of at least two selected coders count on (for
    // article units gold's answers make gold one of them), in project (id) order. An article
    // that one coder alone coded has nothing to pair: it would only add units without pairable
    // values (a study's once-coded production articles).
    QSet<qint64> goldAnswered;
    if (sel.unit == UnitKind::Article)
        for (const Judgement &j : s.judgements)
            if (j.coder.value < 0 && j.itemKey == sel.item) // gold's id is negative
                goldAnswered.insert(j.article.value);
    std::vector<const ArticleSummary *> coded;
    for (const ArticleSummary &summary : s.articles) {
        int sources = 0;
        for (const Coder &c : s.coders)
            if (s.counts(summary.id.value, c.id.value)
                || (c.id.value < 0 && goldAnswered.contains(summary.id.value)))
                ++sources;
        if (sources >= 2)
            coded.push_back(&summary);
    }

    if (sel.unit == UnitKind::Span) {
        for (const ArticleSummary *summary : coded) {
            std::vector<const Annotation *> articleSpans;
            for (qsizetype c = 0; c < coders; ++c)
                if (auto it = spans.find({summary->id.value, int(c)}); it != spans.end())
                    articleSpans.insert(articleSpans.end(), it->second.begin(), it->second.end());
            std::sort(articleSpans.begin(), articleSpans.end(),
                [](const Annotation *a, const Annotation *b) {
                    return std::pair(a->content.range.start, a->id.value)
                        < std::pair(b->content.range.start, b->id.value);
                });
            addSpanUnits(
                table, summary->externalId, articleSpans, s.coderIndex, sel.attribute, coders);
        }
    } else if (sel.unit == UnitKind::Article) {
        // article → one answer per coder
        const std::vector<qint32> none(size_t(coders), ReliabilityTable::kMissing);
        QHash<qint64, std::vector<qint32>> answers;
        for (const Judgement &j : s.judgements)
            if (j.itemKey == sel.item) {
                auto it = answers.find(j.article.value);
                if (it == answers.end())
                    it = answers.insert(j.article.value, none);
                (*it)[size_t(s.coderIndex.value(j.coder.value))] =
                    j.value.isEmpty() ? ReliabilityTable::kMissing : table.labelIndex(j.value);
            }
        for (const ArticleSummary *summary : coded) {
            auto it = answers.constFind(summary->id.value);
            table.appendUnit(summary->externalId, it == answers.constEnd() ? none : *it);
        }
    } else {
        // Paragraphs, sentences or tokens: the segmentation of every article streamed from one
        // statement in id order, the order of `coded`.
        QHash<qint64, const ArticleSummary *> wanted;
        for (const ArticleSummary *summary : coded)
            wanted.insert(summary->id.value, summary);
        const SegmentKind kind = sel.unit == UnitKind::Paragraph ? SegmentKind::Paragraphs
            : sel.unit == UnitKind::Sentence                     ? SegmentKind::Sentences
                                                                 : SegmentKind::Tokens;
        const QString prefix = sel.unit == UnitKind::Paragraph ? QStringLiteral("#p")
            : sel.unit == UnitKind::Sentence                   ? QStringLiteral("#s")
                                                               : QStringLiteral("#t");
        FOURFOLD_TRY_STATUS(project.forEachSegmentation(
            kind, [&](ArticleId id, std::vector<TextRange> &&units) -> Status {
                const ArticleSummary *summary = wanted.value(id.value);
                if (!summary)
                    return {};
                addSegmentUnits(table, *summary, units, spans, s, sel, prefix);
                return {};
            }));
    }
    if (table.isEmpty())
        return fail(ErrorCode::NotFound,
            ProjectUnitsText::tr(
                "None of the selected coders has marked any of the selected articles done."));
    return table;
}

Result<ContinuumData> continuumData(const Project &project, const UnitSelection &sel)
{
    auto counted = countedCodings(project, sel);
    if (!counted)
        return std::unexpected(counted.error());
    return continuumData(*counted, sel);
}

Result<ContinuumData> continuumData(const CountedCodings &s, const UnitSelection &sel)
{
    // The coders on the continuum: those of the selection that were read, else all read.
    std::vector<const Coder *> coders;
    for (const Coder &c : s.coders)
        if (sel.coders.isEmpty() || sel.coders.contains(c.pseudonym)
            || (sel.includeGold && c.id.value < 0))
            coders.push_back(&c);
    if (coders.size() < 2)
        return fail(ErrorCode::InvalidArgument,
            ProjectUnitsText::tr("Reliability needs at least two coders; the selection has %n.",
                nullptr, int(coders.size())));
    QHash<qint64, int> column;
    ContinuumData out;
    out.categories = sel.function ? 1 : 4;
    for (const Coder *c : coders) {
        column.insert(c->id.value, int(out.coders.size()));
        out.coders << c->pseudonym;
    }

    // Per (article, coder, category): the spans, to be merged where they overlap.
    std::map<std::tuple<qint64, int, int>, std::vector<TextRange>> spans;
    for (const Annotation &a : s.annotations) {
        if (sel.function && a.content.function != *sel.function)
            continue;
        auto c = column.constFind(a.coder.value);
        if (c == column.cend())
            continue;
        const int category = sel.function ? 0 : int(a.content.function);
        spans[{a.article.value, c.value(), category}].push_back(a.content.range);
    }
    for (const ArticleSummary &summary : s.articles) {
        const bool all = std::all_of(coders.begin(), coders.end(),
            [&](const Coder *c) { return s.counts(summary.id.value, c->id.value); });
        if (!all)
            continue;
        const std::int64_t offset = out.length;
        if (offset > 0 && summary.length > 0
            && (out.sectionBreaks.empty() || out.sectionBreaks.back() < offset))
            out.sectionBreaks.push_back(offset);
        out.articles << summary.externalId;
        out.length += summary.length;
        for (int c = 0; c < int(coders.size()); ++c)
            for (int category = 0; category < out.categories; ++category) {
                auto it = spans.find({summary.id.value, c, category});
                if (it == spans.end())
                    continue;
                std::vector<TextRange> ranges = it->second;
                std::sort(ranges.begin(), ranges.end());
                std::vector<TextRange> merged;
                for (const TextRange &r : ranges) {
                    if (!merged.empty() && r.start < merged.back().end)
                        merged.back().end = std::max(merged.back().end, r.end);
                    else
                        merged.push_back(r);
                }
                for (const TextRange &r : merged)
                    out.units.push_back(
                        reliability::ContinuumUnit {c, category, offset + r.start, offset + r.end});
            }
    }
    if (out.articles.isEmpty())
        return fail(ErrorCode::NotFound,
            ProjectUnitsText::tr(
                "No article was marked done by all of the selected coders, so there is no common "
                "continuum."));
    return out;
}

Status applyCodebookLevel(
    const Codebook &codebook, const UnitSelection &selection, EncodingOptions &encoding)
{
    std::optional<MeasurementLevel> level;
    QStringList values;
    if (selection.unit == UnitKind::Span && selection.function) {
        for (const AttributeSpec &a : codebook.definition(*selection.function).attributes)
            if (a.key == selection.attribute) {
                level = a.level;
                values = a.values;
            }
        if (!level)
            return fail(ErrorCode::InvalidArgument,
                ProjectUnitsText::tr("the codebook has no attribute \"%1\" for %2.")
                    .arg(selection.attribute, functionKey(*selection.function)));
    } else if (selection.unit == UnitKind::Article) {
        if (const ArticleItem *i = codebook.item(selection.item)) {
            level = i->level;
            values = i->values;
        }
    }
    if (level == MeasurementLevel::Ordinal) {
        encoding.level = reliability::Level::Ordinal;
        encoding.order = values;
    }
    return {};
}

} // namespace fourfold
