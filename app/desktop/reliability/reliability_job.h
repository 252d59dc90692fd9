#pragma once
// The computation behind the reliability window, with no widgets: it runs on a worker thread
// (QtConcurrent), opens its own connection to the project file, and reports progress through a
// callback that can cancel it between steps.

#include "core/agreement/agreement_run.h"

#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

struct ReliabilityRequest {
    QString projectPath;
    UnitKind unit = UnitKind::Sentence;
    std::vector<FramingFunction> functions; // at least one
    QStringList coders; // pseudonyms; empty = everyone who coded
    std::optional<Phase> phase;
    QString item = QStringLiteral("dominant_function"); // article units
    bool includeGold = false;
    // Takes articles coders started but did not mark done in (CodingScope).
    bool includeUnfinished = false;
    int bootstrapReplicates = 1000;
    std::uint64_t seed = 1;
    PeriodKind period = PeriodKind::Batch;
    int batchSize = 3;
};

// One column of the results: one function (present/absent per unit), the selected functions as
// sets (MASI distance), or the article item.
struct ReliabilityColumn {
    QString title;
    std::optional<FramingFunction> function; // nothing for the sets or the item
    AgreementReport report;
};

struct ReliabilityOutcome {
    QStringList coders;
    // Articles in progress left out, per coder (empty when taken in).
    std::vector<CountedCodings::LeftOut> leftOut;
    std::vector<ReliabilityColumn> columns;
    // The column the diagnostics and the pair heat map are computed on: the sets column when
    // several functions are chosen, else the only one.
    int mainColumn = 0;
    std::vector<LeaveOneOut> coderCosts;
    std::vector<LeaveOneOut> articleCosts;
    std::optional<SpanMatching> matching;
    std::vector<PeriodAlpha> periods;
    // Continuum units: unitizing alpha per chosen function and pooled.
    std::optional<reliability::UnitizingResult> unitizing;
    int continuumArticles = 0;
    std::int64_t continuumLength = 0;
};

// Steps done / total; false cancels (the job then fails with ErrorCode::Cancelled).
using JobProgress = DiagnosticsProgress;

// Computes everything the window shows. Fails with the project's or the unitizer's error, or
// Cancelled.
Result<ReliabilityOutcome> runReliabilityJob(
    const ReliabilityRequest &request, const JobProgress &progress = {});

} // namespace fourfold
