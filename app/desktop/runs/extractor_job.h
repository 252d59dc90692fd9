#pragma once
// The computation behind the extractor window, with no widgets: it runs on a worker thread
// (QtConcurrent) with its own connection to the project file. For each chosen run it scores the
// run against the reference (run_scores.h), lists its errors span by span (run_errors.h) and
// places it among the human coders (run_agreement.h).

#include "core/scoring/run_agreement.h"
#include "core/scoring/run_errors.h"
#include "core/scoring/run_scores.h"

#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

struct ExtractorRequest {
    QString projectPath;
    QStringList runs; // run names, at least one
    LayerSpec against; // gold or one coder
    reliability::MatchMode mode = reliability::MatchMode::Strict;
    int bootstrapReplicates = 1000;
    std::uint64_t seed = 1;
    UnitKind agreementUnit = UnitKind::Sentence;
};

// The results of one run; each part on its own, so that a run without human coders still shows
// its scores.
struct RunOutcome {
    QString run;
    std::optional<RunScores> scores;
    std::optional<RunErrors> errors;
    QString scoreError; // why scores and errors are missing
    std::optional<RunAgreement> agreement;
    QString agreementError; // why the band is missing (e.g. fewer than two coders)
};

struct ExtractorOutcome {
    std::vector<RunOutcome> runs; // in request order
};

// Computes everything the window shows. Fails only when the project cannot be opened or no run
// is asked for (InvalidArgument); a run's own failures are kept in its RunOutcome.
Result<ExtractorOutcome> runExtractorJob(const ExtractorRequest &request);

} // namespace fourfold
