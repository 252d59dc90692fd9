#pragma once
// The figures of a reliability report, gathered once from a project: every reliability figure
// is a result of the one agreement run (AgreementRun) that `fourfold-cli agree` makes for the
// same selection, kept as its typed result together with the agree arguments that reproduce it,
// so the report and the CLI can never disagree. ReportData::toJson() writes them as agree's JSON
// (for `report --json` and the figures embedded in the HTML report); the report never reads that
// JSON back.

#include "core/agreement/agreement_run.h"
#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/model/saved_frame_analysis.h"
#include "core/scoring/element_reliability.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <array>
#include <cstdint>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

struct ReportOptions {
    // The unit of the per-function variables: paragraph, sentence or token.
    UnitKind unit = UnitKind::Sentence;
    std::optional<Phase> phase; // none = every phase
    QStringList coders; // pseudonyms; empty = everyone whose coding counts in the selection
    // Takes articles the coders started but did not mark done in (CodingScope).
    bool includeUnfinished = false;
    int bootstrapReplicates = 1000; // 0 = no confidence intervals
    std::uint64_t seed = 1;
    QString title; // empty = "Reliability report: <project name>"
    // The codebook's texts (function labels, questions, attribute labels) in this language where
    // it has them (an ISO 639 code, Codebook::inLanguage); empty: its own.
    QString language;
};

// One call of the agreement engine: its id in the report (e.g. "function-problem"), what it
// measures, the agree arguments after the project file, and its result (or why it failed).
struct ReportAnalysis {
    QString id;
    QString label; // e.g. "Problem definition"
    QString shortLabel; // for charts, e.g. "dominant function", "evaluation: polarity"
    QString kind; // "function", "functions", "item", "attribute", "continuum"
    QStringList agreeArguments;
    // Every kind but "continuum": the agreement of the table of units (AgreementRun::analyse).
    std::optional<AgreementReport> agreement;
    // "function": alpha without each coder and each article (`agree --diagnostics`; the span
    // matching they are shown with is ReportData::matching, the same for every function).
    std::optional<LeaveOneOutCosts> diagnostics;
    // "continuum": unitizing alpha and span agreement per pair (AgreementRun::continuum).
    std::optional<ContinuumResult> continuum;
    QString error; // why it was not computed; the results above are then empty
};

// How much one coder coded in the selection (pseudonym only: names are personal data).
struct ReportCoder {
    QString pseudonym;
    QString role; // "coder", "lead"
    int articles = 0; // articles whose coding counts (marked done; see CodingScope)
    int reliabilityArticles = 0; // of those, articles that count for another selected coder too
    int spans = 0;
    std::array<int, 4> perFunction {}; // spans per FramingFunction
    int answers = 0; // answers to article-level items
};

struct ReportData {
    ReportOptions options;
    QString title;
    QString projectName;
    QString generatedAt; // ISO 8601 UTC
    QString program; // "Fourfold <version>"
    std::vector<ReportAnalysis> analyses;
    // Span matching over all four functions (function confusion), part of each function
    // analysis's diagnostics.
    std::optional<SpanMatching> matching;
    std::vector<ReportCoder> coders;
    int projectArticles = 0; // every article in the project
    int codedArticles = 0; // articles coded by at least one selected coder
    int sharedArticles = 0; // articles coded by two or more selected coders
    int allCoderArticles = 0; // articles coded by every selected coder
    // Articles in progress left out, per coder (empty when taken in or when there are none).
    std::vector<CountedCodings::LeftOut> leftOut;
    QString sampleDraw; // how the reliability sample was drawn, if the project records it
    QJsonObject drawRecord; // the recorded draw (SubsampleDraw::toJson), or empty
    // Gold standard (adjudication) on the selected articles.
    int goldSpans = 0;
    int goldArticles = 0;
    int goldWithRationale = 0;
    // Gold answers to article-level items (gold_answer_edits.h) on the selected articles.
    int goldAnswers = 0;
    int goldAnswerArticles = 0;
    int goldAnswersWithRationale = 0;
    QStringList goldDeciders; // pseudonyms of whoever decided gold spans or answers
    // Codebook: the current version and how many selected codings used another one.
    int codebookNumber = 0;
    QString codebookName;
    int codingsTotal = 0;
    int codingsOtherVersion = 0;
    int trainingArticles = 0; // articles with training-phase assignments (any coder)
    int pilotArticles = 0;

    // The newest saved frame analysis (SavedFrames), if any, and the alpha of each element
    // variable over the coders above (counted codings of any phase, as the frames' layers).
    std::optional<SavedFrameAnalysis> frames;
    std::vector<ElementAlpha> elementAlphas;

    // The analysis with `id`, or nullptr.
    const ReportAnalysis *analysis(const QString &id) const;
    // Everything above as JSON (the machine-readable copy embedded in the HTML report).
    QJsonObject toJson() const;
};

// Gathers the report's figures. Fails with agree's errors for the per-function analyses (e.g.
// InvalidArgument when fewer than two coders coded); analyses of single items or attributes
// that cannot be computed keep their error in ReportAnalysis::error instead.
Result<ReportData> gatherReportData(const Project &project, const ReportOptions &options);

} // namespace fourfold
