#pragma once
// Scores of an extractor run against gold or one coder: per framing function, micro and macro
// precision, recall and F1 after the SemEval-2013 Task 9.1 evaluation (Segura-Bedmar, Martínez &
// Herrero Zazo 2013; categories COR, INC, PAR, MIS, SPU after Chinchor & Sundheim 1993), with
// percentile bootstrap intervals that resample articles.
//
// What is scored: the articles the reference covers (gold: articles with gold spans; a coder:
// the articles they are assigned to or annotated). On each, the reference spans and the run's
// spans are matched by reliability::scoreSpans (one document per article, category = function
// index); run spans on other articles are not counted.
//
// Bootstrap by article (Efron & Tibshirani 1993, ch. 13, percentile interval; resampling the
// article because spans within one article are not independent — common practice in NLP
// evaluation): each replicate draws as many articles as were scored, with replacement, sums
// their counts and recomputes every figure. Replicates where a figure is undefined are left out
// for that figure. Of the K replicates kept, sorted, the interval runs from the k-th smallest to
// the k-th largest, k = max(1, ⌊0.025 K⌋) (as in core/reliability/alpha_bootstrap.h). Replicate r
// draws from std::mt19937_64 seeded with seed + r, bounded by rejection, so figures do not
// depend on the standard library's distributions.

#include "core/model/error.h"
#include "core/model/ids.h"
#include "core/reliability/span_scores.h"
#include "core/scoring/span_layer.h"

#include <QString>

#include <array>
#include <cstdint>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

struct ScoreOptions {
    reliability::MatchMode mode = reliability::MatchMode::Strict;
    int bootstrapReplicates = 1000; // 0 = no intervals
    std::uint64_t seed = 1;
};

// A 95% percentile interval; nothing when no replicate gave a value.
struct Interval {
    std::optional<double> low, high;
};

struct FigureIntervals {
    Interval precision, recall, f1;
};

// One article's counts per function (the bootstrap's resampling unit).
struct ArticleCounts {
    ArticleId article;
    QString externalId;
    std::array<reliability::SpanCounts, 4> perFunction; // counts only; figures not set
};

struct RunScores {
    QString run; // the run's name
    LayerSpec against;
    reliability::MatchMode mode = reliability::MatchMode::Strict;
    int articles = 0; // articles scored
    std::array<reliability::SpanCounts, 4> perFunction; // in kFramingFunctions order
    reliability::SpanCounts micro;
    std::optional<double> macroPrecision, macroRecall, macroF1;
    // Bootstrap intervals (empty when replicates = 0).
    int replicates = 0;
    std::uint64_t seed = 1;
    std::array<FigureIntervals, 4> perFunctionIntervals;
    FigureIntervals microIntervals, macroIntervals;
    std::vector<ArticleCounts> perArticle;
};

// Scores the run called `run` against `against` (LayerKind::Gold or LayerKind::Coder). Fails
// with NotFound for an unknown run or coder, InvalidArgument for another layer kind or when the
// reference covers no article, or with the store's error.
Result<RunScores> scoreRun(const Project &project, const QString &run, const LayerSpec &against,
    const ScoreOptions &options);

// The kernel: scores `predicted` against `reference` (spans of any articles; only the articles
// in `scored` count, in that order), with intervals as above. Never fails; spans with an empty
// or negative range must not be passed (Project data never hold them).
RunScores scoreLayers(const SpanLayer &reference, const SpanLayer &predicted,
    const std::vector<std::pair<ArticleId, QString>> &scored, const ScoreOptions &options);

// "strict", "exact", "partial", "type".
QString matchModeKey(reliability::MatchMode mode);
std::optional<reliability::MatchMode> matchModeFromKey(const QString &key);

} // namespace fourfold
