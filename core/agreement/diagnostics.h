#pragma once
// Reliability diagnostics: where a study loses reliability (issue 5).
//
// - Leave one coder out / leave one article out: alpha recomputed without that coder's column or
//   without the units of that article. A common practice for finding a coder or an item that
//   pulls agreement down (common practice; Krippendorff 2004, Content Analysis 2nd ed., §11.4
//   discusses dropping unreliable coders only after the fact, so these are diagnostics, not a
//   licence to report the better figure).
// - Function confusion: for every pair of coders, each span of one coder against the other
//   coder's span that overlaps it most (any function): which function the other gave the same
//   passage, or "none" when the other marked nothing there.
// - Boundary habits: for spans matched with the same function, how much longer (in code points)
//   a coder's span is than the other coder's, and how its start and end differ.
// - Alpha per period: alpha on the units of the articles coded in each week (or batch of
//   articles in the order they were first coded), to show coder drift.
//
// Alpha is Krippendorff's alpha in the coincidence form (Krippendorff 2011, "Computing
// Krippendorff's Alpha-Reliability"), computed by core/reliability.

#include "core/agreement/project_units.h"
#include "core/agreement/value_encoding.h"
#include "core/reliability/krippendorff_alpha.h"

#include <QJsonObject>
#include <QStringList>

#include <cstdint>
#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

// Called after each step with the steps done and the total; returning false cancels the
// computation, which then fails with ErrorCode::Cancelled. May be empty. Called on the thread
// that runs the computation.
using DiagnosticsProgress = std::function<bool(int done, int total)>;

struct LeaveOneOut {
    QString name; // coder pseudonym or article id
    std::optional<double> alpha; // alpha without it; nothing when undefined (see reason)
    reliability::UndefinedReason reason;
    double pairableValues = 0; // of the data without it
    // alpha without it − alpha with everything; nothing when either is undefined. Positive:
    // leaving it out raises alpha, so it costs reliability.
    std::optional<double> change;
    int units = 0; // article: its units in the table; coder: the units they coded
};

// Alpha without each coder in turn, sorted with the coder whose absence raises alpha most first
// (undefined changes last, then by name). `coders` names the columns of `encoded.data`. Needs at
// least three coders for any value (two remain); with two every entry is undefined with a
// reason. Fails with InvalidArgument when `coders` does not match the data, Cancelled when
// `progress` returns false.
Result<std::vector<LeaveOneOut>> leaveOneCoderOut(const EncodedData &encoded,
    const QStringList &coders, const DiagnosticsProgress &progress = {});

// Alpha without the units of each article in turn (the article of a unit from
// ReliabilityTable::unitArticles()), sorted as above: the article that costs most first. `table`
// is the table `encoded` was encoded from. Fails with InvalidArgument when the table does not
// match the data, Cancelled when `progress` returns false.
Result<std::vector<LeaveOneOut>> leaveOneArticleOut(const EncodedData &encoded,
    const ReliabilityTable &table, const DiagnosticsProgress &progress = {});
// Cells copied by leaveOneArticleOut() on this thread so far. Each article's own units are
// copied once, to subtract their coincidences from the totals, so one call copies every cell
// of the data once whatever the number of articles (tests count this instead of timing it).
std::uint64_t leaveOneOutCellsCopied();

// Counts of (a coder's function, the other coder's function at the best-overlapping span),
// summed over ordered pairs of coders. Index 0..3 the functions (FramingFunction order), 4 =
// "none": the other coder has no span overlapping it. counts[row * 5 + column]; row 4 stays 0.
struct FunctionConfusion {
    static constexpr int kSize = 5;
    std::vector<double> counts = std::vector<double>(kSize * kSize, 0.0);
    double at(int row, int column) const { return counts[size_t(row * kSize + column)]; }
    double matched() const; // spans whose best-overlapping span has any function
    double sameFunction() const; // the diagonal over the four functions
};

struct BoundaryHabit {
    QString coder;
    int matches = 0; // spans matched with a span of the same function of another coder
    // Means over the matches of (this coder's − the other coder's), in code points.
    double meanLengthDifference = 0;
    double meanStartDifference = 0; // negative: starts earlier
    double meanEndDifference = 0; // positive: ends later
    // Standard error of the mean length difference (sample SD / √matches; 0 below 2 matches).
    double standardError = 0;
    double shareLonger = 0; // share of matches where this coder's span is longer
    double shareShorter = 0;
    // |mean| > 2 standard errors with at least 5 matches (common practice: a rough two-sided
    // 5% screen, not a test corrected for the number of coders).
    bool systematic = false;
};

struct SpanMatching {
    QStringList coders;
    FunctionConfusion confusion;
    // One entry per coder with at least one match, the largest |meanLengthDifference| first.
    std::vector<BoundaryHabit> boundaries;
    int pairsCompared = 0; // coder pairs with at least one article both coded
};

// Matches the spans of every pair of the selected coders (all four functions, whatever
// selection.function says) on the articles both coded, in the selected phase and articles.
// Fails with NotFound / InvalidArgument as unitTable() does for an unknown coder or article or
// fewer than two coders, Cancelled when `progress` returns false.
// The "diagnostics" object of `agree --diagnostics --json` (keys in the README): the two
// leave-one-out lists, costliest first, and for a project the span matching (confusion and
// boundary habits).
QJsonObject diagnosticsJson(const std::vector<LeaveOneOut> &coders,
    const std::vector<LeaveOneOut> &articles, const SpanMatching *matching);

Result<SpanMatching> matchSpans(const Project &project, const UnitSelection &selection,
    const DiagnosticsProgress &progress = {});
// The same on codings already read by countedCodings() for the selection (gold is ignored).
Result<SpanMatching> matchSpans(const CountedCodings &codings, const UnitSelection &selection,
    const DiagnosticsProgress &progress = {});

enum class PeriodKind { Week, Batch };

struct PeriodAlpha {
    QString label; // "2026-W48" or "1–3" (batch: positions of its articles in coding order)
    QStringList articles;
    reliability::AlphaResult alpha;
};

// Alpha per period on the units of `table` (built by unitTable(); encoded with `encoding`).
// Week: the ISO week (UTC) of the first annotation or answer on each article by a selected
// coder. Batch: the articles in the order of that first coding (ties by id), in batches of
// `batchSize` (the last may be smaller). Articles nobody coded are left out. Fails with
// InvalidArgument for batchSize < 1, InvalidInput (from encodeTable) on a bad label, Cancelled
// when `progress` returns false.
Result<std::vector<PeriodAlpha>> alphaByPeriod(const Project &project,
    const UnitSelection &selection, const ReliabilityTable &table, const EncodingOptions &encoding,
    PeriodKind kind, int batchSize = 3, const DiagnosticsProgress &progress = {});
// The same on codings already read for the table's selection (gold's codings are skipped) and
// the table already encoded: `table` names the units (its cells are not read), `encoded` holds
// them. A period's alpha is that of its rows of `encoded`, which equals alpha of those rows
// encoded anew (values no row of the period holds add nothing to the coincidences).
Result<std::vector<PeriodAlpha>> alphaByPeriod(const CountedCodings &codings,
    const ReliabilityTable &table, const EncodedData &encoded, PeriodKind kind, int batchSize = 3,
    const DiagnosticsProgress &progress = {});

} // namespace fourfold
