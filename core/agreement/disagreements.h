#pragma once
// Disagreements between coders on one article, for comparison and adjudication. The coders'
// spans are grouped into passages: connected components of the graph whose edges join spans that
// share at least one code point (whatever their coder or function) — the passage unit of the span
// unitizer in project_units.h, over all four functions. Each passage is then classified:
//   presence    a coder of the article has no span in the passage (one coder only, or some);
//   function    the coders with spans there give it different sets of functions;
//   boundary    for a function they all give it, their ranges differ;
//   attributes  on a range and function they all share, the attributes differ.
// A passage with none of these is agreed. A passage is resolved once a live gold span overlaps
// it or every span in it has been rejected by a lead; raw codings are never changed by either.

#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/project/gold_edits.h"

#include <optional>
#include <utility>
#include <vector>

namespace fourfold {

class Project;

enum class DisagreementKind { Presence = 0, Function = 1, Boundary = 2, Attributes = 3 };
inline constexpr std::array<DisagreementKind, 4> kDisagreementKinds {DisagreementKind::Presence,
    DisagreementKind::Function, DisagreementKind::Boundary, DisagreementKind::Attributes};

struct Passage {
    TextRange range; // the union of its spans (a passage is one interval of the text)
    std::vector<Annotation> spans; // the coders' spans, by start, end, coder
    std::vector<bool> rejected; // per span: a lead rejected it
    std::vector<GoldAnnotation> gold; // live gold spans overlapping the passage
    std::vector<CoderId> coders; // the compared coders with a span here, in comparison order
    std::vector<CoderId> missing; // the compared coders with none here
    unsigned kinds = 0; // bit (1 << kind) per DisagreementKind

    bool has(DisagreementKind k) const { return kinds & (1u << unsigned(k)); }
    bool isAgreed() const { return kinds == 0; }
    bool isResolved() const;
    // The functions of its spans, bit (1 << function).
    unsigned functions() const;
};

// What a lead looks at: the passages of one article for the chosen coders.
struct Comparison {
    ArticleId article;
    std::vector<CoderId> coders;
    std::vector<Passage> passages; // by start
};

// Which disagreements to show: those touching one function and/or between two coders.
struct ComparisonFilter {
    std::optional<FramingFunction> function;
    std::optional<std::pair<CoderId, CoderId>> coderPair;
    // Compares coders on articles they started but have not marked done, too (CodingScope).
    bool includeUnfinished = false;
};

// The pure part: passages of `spans` (only those of `coders` are used; the others are ignored)
// with `gold` attached and the spans in `rejectedSpans` marked. `coders` are the coders who coded
// the article: one of them without a span in a passage is a presence disagreement.
std::vector<Passage> comparePassages(const std::vector<Annotation> &spans,
    const std::vector<CoderId> &coders, const std::vector<GoldAnnotation> &gold = {},
    const std::vector<AnnotationId> &rejectedSpans = {});

// The coders whose coding of `article` counts (CodingScope: marked done, or in progress too when
// `includeUnfinished`), in pseudonym order. Fails only if the project cannot be read.
Result<std::vector<Coder>> articleCoders(
    const Project &project, ArticleId article, bool includeUnfinished = false);

// Compares `article` between the coders of `filter.coderPair` (both), or else every coder who
// coded it, and keeps the passages that touch `filter.function` (a span of it) if one is given.
// NotFound for an unknown article; InvalidArgument if a coder of the pair did not code it.
Result<Comparison> compareArticle(
    const Project &project, ArticleId article, const ComparisonFilter &filter = {});

// What one article's comparison needs: every coder's spans, its gold spans and the ids of the
// spans a lead rejected.
struct ArticleCodings {
    std::vector<Annotation> spans;
    std::vector<GoldAnnotation> gold;
    std::vector<AnnotationId> rejected;
};

// compareArticle on codings at hand, without a read: `codings` of the article titled `title`
// between `coded` (the coders whose coding counts, in pseudonym order) under `filter`.
// InvalidArgument if a coder of the pair is not among `coded`.
Result<Comparison> compareCodings(ArticleId article, const QString &title,
    const std::vector<Coder> &coded, const ArticleCodings &codings,
    const ComparisonFilter &filter = {});

// The gold spans a lead can accept at once: for every agreed passage that is not resolved, one
// candidate per distinct (function, range) with the attributes all its coders gave; the sources
// are every coder's span with that content.
std::vector<GoldCandidate> agreedCandidates(const Comparison &comparison);

// The candidate for accepting `span` of `passage` as it is: its content (without note and
// confidence) and, as sources, every span in the passage with the same function, range and
// attributes (so the provenance names every coder who had it).
GoldCandidate acceptCandidate(const Passage &passage, const Annotation &span);

// Merged boundaries: the union of the spans' ranges, the first span's function and attributes,
// all of them as sources. InvalidArgument if `spans` is empty or mixes functions.
Result<GoldCandidate> mergeCandidate(const std::vector<Annotation> &spans);

// One row of the adjudication queue.
struct ArticleDisagreement {
    ArticleSummary article;
    std::vector<CoderId> coders;
    int passages = 0;
    int disagreements = 0; // passages with any disagreement
    int unresolved = 0; // of those, not yet resolved
    int agreedOpen = 0; // agreed passages not yet in gold
    std::array<int, 4> byKind {}; // passages with each DisagreementKind
};

// The queue's row of an article compared as `comparison`.
ArticleDisagreement disagreementRow(const ArticleSummary &summary, const Comparison &comparison);

// Every article whose coding counts for at least two coders (or for both coders of the filter's
// pair), compared
// under `filter`, most unresolved disagreements first (then most disagreements, then title).
// Fails only if the project cannot be read.
Result<std::vector<ArticleDisagreement>> disagreementQueue(
    const Project &project, const ComparisonFilter &filter = {});

// `row` of the queue computed anew for its article and coders (three indexed queries, whatever
// the size of the project): what a decision on that article changes, so that a window updates one
// row instead of recomputing the queue. Fails only if the project cannot be read.
Result<ArticleDisagreement> articleDisagreement(
    const Project &project, const ArticleDisagreement &row, const ComparisonFilter &filter = {});

} // namespace fourfold
