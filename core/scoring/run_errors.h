#pragma once
// The errors of an extractor run, span by span: every reference span and every predicted span
// of the scored articles with its SemEval-2013 Task 9.1 outcome (COR, INC, PAR, MIS, SPU;
// Segura-Bedmar, Martínez & Herrero Zazo 2013) and its matched partner, and the confusion between
// framing functions. The matching is exactly that of run_scores.h (reliability::scoreSpans, one
// document per scored article, category = function index), so the counts here add up to the
// counts of scoreRun for the same run, reference and mode.
//
// The kind of error, for people reading the list (our naming, common practice in error analysis
// of span extractors):
//   correct         COR
//   false positive  SPU: a run span matched to no reference span
//   miss            MIS: a reference span matched to no run span
//   wrong function  INC or PAR whose two spans carry different functions
//   boundary        INC or PAR whose two spans carry the same function (the boundaries differ)
//
// Confusion: a 5 × 5 table of counts, rows the reference span's function, columns the run
// span's function, index 4 = "none". Every matched pair counts once in (reference, run), every
// miss in (reference, none), every false positive in (none, run); (none, none) stays 0.

#include "core/model/error.h"
#include "core/model/ids.h"
#include "core/reliability/span_scores.h"
#include "core/scoring/span_layer.h"

#include <QString>

#include <array>
#include <optional>
#include <utility>
#include <vector>

namespace fourfold {

class Project;

enum class RunErrorKind { Correct, FalsePositive, Miss, WrongFunction, Boundary };

// One outcome of the matching: a reference span, a run span, or a matched pair of both.
struct RunSpanOutcome {
    ArticleId article;
    QString externalId;
    reliability::SpanOutcome outcome = reliability::SpanOutcome::Missing;
    RunErrorKind kind = RunErrorKind::Miss;
    std::optional<LayerSpan> reference; // nothing for a false positive
    std::optional<LayerSpan> predicted; // nothing for a miss
    QString referenceQuote, predictedQuote; // the spans' text; empty when there is no span or
                                            // the article's text was not given

    bool isError() const { return kind != RunErrorKind::Correct; }
    // The function the outcome is filed under: the reference span's, else the run span's
    // (as span_scores.h counts SPU under the predicted category).
    FramingFunction function() const;
    // The union of the two spans' ranges (code points).
    TextRange range() const;
};

inline constexpr int kNoFunction = 4; // the "none" row and column of the confusion table

struct RunErrors {
    QString run;
    LayerSpec against;
    reliability::MatchMode mode = reliability::MatchMode::Strict;
    std::vector<std::pair<ArticleId, QString>> articles; // scored, with their external ids
    // By article (scored order), then the reference spans by (start, end, function), then the
    // false positives by (start, end, function).
    std::vector<RunSpanOutcome> outcomes;
    std::array<std::array<int, 5>, 5> confusion {}; // [reference][run], 4 = none

    // The number of outcomes of `kind` filed under `function` (nothing = all functions).
    int count(RunErrorKind kind, std::optional<FramingFunction> function = std::nullopt) const;
};

// The kernel: matches `predicted` against `reference` on the `scored` articles (others are
// ignored) in `mode`. `texts`, if given, holds each scored article's canonical text in the same
// order, for the quotes. Never fails; spans with an empty range must not be passed.
RunErrors errorsOfLayers(const SpanLayer &reference, const SpanLayer &predicted,
    const std::vector<std::pair<ArticleId, QString>> &scored, reliability::MatchMode mode,
    const std::vector<QString> &texts = {});

// The errors of the run called `run` against `against` (LayerKind::Gold or LayerKind::Coder) on
// the articles the reference covers, with quotes. Fails as scoreRun does: NotFound for an unknown
// run or coder, InvalidArgument for another layer kind or a reference that covers no article, or
// the store's error.
Result<RunErrors> runErrors(const Project &project, const QString &run, const LayerSpec &against,
    reliability::MatchMode mode);

} // namespace fourfold
