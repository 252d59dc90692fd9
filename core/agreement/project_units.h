#pragma once
// Unitizers: from a project's annotations to reliability data (design.md §5). A coder who did
// not code an article is missing for its units, never "absent"; an article that only one of the
// compared coders (or gold) counts on gives no units (nothing pairs). Which codings count is
// CodingScope's rule (core/project/coding_scope.h): an article counts for a coder once the coder
// has marked it done; articles in progress are left out (and listed) unless the selection takes
// them in; assigned but untouched articles never count.

#include "core/agreement/value_encoding.h"
#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/model/codebook.h"
#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/reliability_table.h"
#include "core/model/unit_kind.h"
#include "core/reliability/unitizing_alpha.h"

#include <QHash>
#include <QJsonArray>
#include <QPair>
#include <QSet>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

class Project;

struct UnitSelection {
    UnitKind unit = UnitKind::Sentence;
    // One function (present/absent per unit), or all four (the set of functions per unit).
    std::optional<FramingFunction> function;
    // Coders by pseudonym; empty = every coder with at least one article in the selection that
    // counts (see includeUnfinished).
    QStringList coders;
    std::optional<Phase> phase;
    // Takes articles a coder has started but not marked done in as if they were done.
    bool includeUnfinished = false;
    // Articles by external id; empty = all.
    QStringList articles;
    // The article-level item for UnitKind::Article.
    QString item = QStringLiteral("dominant_function");
    // The span attribute for UnitKind::Span (e.g. "polarity" of evaluation spans).
    QString attribute;
    // Adds the gold standard as one more coder, "gold": its spans on the articles that have gold
    // spans, and for article units its answers (gold answers) to the item.
    bool includeGold = false;
};

// The codings a selection compares, read once: the selected coders and articles, the
// (article, coder) pairs that count, their live spans and answers, and what was left out.
struct CountedCodings {
    std::vector<Coder> coders; // in the order asked for (or pseudonym order); gold last
    std::vector<ArticleSummary> articles; // selected, in project order
    QHash<qint64, int> coderIndex; // coder id → column (gold: -1)
    QSet<QPair<qint64, qint64>> counted; // (article id, coder id) whose codings count
    // Live, in phase, of counted pairs, as outlines (Project::forEachAnnotationOutline).
    std::vector<Annotation> annotations;
    std::vector<Judgement> judgements; // likewise; gold answers with gold's id (-1), ids < 0
    // Articles in progress left out per coder (selected coders, or any coder when none were
    // named), in coder then article order; empty when the selection takes them in.
    struct LeftOut {
        QString coder; // pseudonym
        QStringList articles; // external ids
    };
    std::vector<LeftOut> leftOut;

    bool counts(qint64 article, qint64 coder) const { return counted.contains({article, coder}); }
};

// Reads what `selection` compares (a bounded number of queries). Fails with NotFound for an
// unknown coder or article, InvalidArgument for fewer than two coders.
Result<CountedCodings> countedCodings(const Project &project, const UnitSelection &selection);
// "C02: 2 articles in progress left out" per entry of `leftOut`; empty when nothing was.
QStringList leftOutLines(const std::vector<CountedCodings::LeftOut> &leftOut);
// The JSON form: [{"coder": "C02", "articles": ["a7", "a9"]}, ...].
QJsonArray leftOutJson(const std::vector<CountedCodings::LeftOut> &leftOut);

// The units × coders table for article, paragraph, sentence or token units, of the articles
// that at least two selected coders' codings count on (gold: its spans, and for article units
// its answers); an article one coder alone coded gives no units. A unit's value for
// a coder: "present"/"absent" (one function: a span of that function overlaps the unit by at
// least one code point), the set of functions of overlapping spans ("cause|problem", "{}" for
// none), or the answer to the item (article units). Unit ids are "<article id>#p3" (paragraph
// 3, 1-based), "#s12", "#t120", or the article id.
// Span units (attributes on passages matched across coders): the spans of the selected function
// that overlap across coders form one passage (connected components of the overlap graph); a
// coder's value is the attribute of their span in the passage that overlaps the others most
// (missing when they have none there or left the attribute empty). Unit ids "<article>#a3".
// Fails with NotFound for an unknown coder or article, InvalidArgument for the continuum (see
// continuumData), for span units without one function and an attribute, or fewer than two
// coders.
Result<ReliabilityTable> unitTable(const Project &project, const UnitSelection &selection);
// The same on codings already read by countedCodings() for a selection with the same coders,
// phase, articles, gold and includeUnfinished (unit, function, item and attribute may differ).
Result<ReliabilityTable> unitTable(
    const Project &project, const CountedCodings &codings, const UnitSelection &selection);

// The continuum for unitizing alpha: the texts of the articles that every selected coder coded,
// laid end to end as sections, and each coder's spans on it (category = function index; overlapping
// spans of one coder and function are merged into one unit).
struct ContinuumData {
    QStringList coders;
    QStringList articles; // external ids, in continuum order
    std::int64_t length = 0;
    // Where one article ends and the next begins: no gap of unitizing alpha crosses them.
    std::vector<std::int64_t> sectionBreaks;
    std::vector<reliability::ContinuumUnit> units;
    int categories = 4; // 4, or 1 when one function is selected (category 0)
};
Result<ContinuumData> continuumData(const Project &project, const UnitSelection &selection);
// The same on codings already read (see unitTable()); when `selection` names coders, only those
// of the codings' coders (and gold) are laid on the continuum, so one read serves every pair.
Result<ContinuumData> continuumData(const CountedCodings &codings, const UnitSelection &selection);

// Takes the level and value order of the selected span attribute or article item from
// `codebook` into `encoding` (only an ordinal level changes it: its values in order). Fails with
// InvalidArgument if a span selection names an attribute the codebook lacks for its function.
Status applyCodebookLevel(
    const Codebook &codebook, const UnitSelection &selection, EncodingOptions &encoding);

} // namespace fourfold
