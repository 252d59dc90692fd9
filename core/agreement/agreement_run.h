#pragma once
// One agreement run: the codings a selection compares, read once (CodingScope's rule of which
// codings count is applied there, in countedCodings()), and every figure a front end shows of
// them — the agreement report of a table of units, the diagnostics, unitizing alpha on the
// continuum with span agreement per pair of coders, span matching, alpha per period. The CLI's
// `agree`, the Reliability window and the report call it; none of them wires the steps itself.

#include "core/agreement/agreement_report.h"
#include "core/agreement/diagnostics.h"
#include "core/agreement/project_units.h"
#include "core/agreement/value_encoding.h"
#include "core/model/codebook.h"
#include "core/reliability/unitizing_alpha.h"

#include <QJsonObject>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

class Project;

// What one analysis compares. The coders, phase, articles, gold and includeUnfinished are the
// run's (AgreementRun::load); the unit and what is compared on it are the analysis's.
struct AnalysisRequest {
    UnitKind unit = UnitKind::Sentence; // article, paragraph, sentence, token or span
    // One function (present/absent per unit); none: the set of functions per unit.
    std::optional<FramingFunction> function;
    // Set units: only these functions stay in the sets (empty = all four).
    std::vector<FramingFunction> setFunctions;
    QString item = QStringLiteral("dominant_function"); // article units
    QString attribute; // span units
    // Replaces the encoding the codebook implies (the CLI's --level, --order, --distance).
    std::optional<EncodingOptions> encoding;
};

// A table of units, as encoded and compared.
struct AnalysisResult {
    // The units and coders compared; its cells were released once encoded (see encoded).
    ReliabilityTable table;
    EncodingOptions encoding;
    EncodedData encoded;
    AgreementReport report;
};

// Where reliability is lost: alpha without each coder and without each article, costliest first.
struct LeaveOneOutCosts {
    std::vector<LeaveOneOut> coders;
    std::vector<LeaveOneOut> articles;
};

// Positive specific agreement of one pair of coders per category: strict span F1 (same
// boundaries) and overlap F1 (any overlap); both are symmetric in the pair (Hripcsak &
// Rothschild 2005, "Agreement, the F-measure, and reliability in information retrieval").
struct PairSpanAgreement {
    int coderA = 0;
    int coderB = 0;
    std::vector<std::optional<double>> strict; // per category
    std::vector<std::optional<double>> overlap;
};

struct ContinuumResult {
    ContinuumData data;
    QStringList categories; // function keys, in category order
    reliability::UnitizingResult unitizing;
    std::vector<PairSpanAgreement> pairs;
};

// The encoding of a request: the given one, else the level and value order of the codebook's
// attribute or item; set units are compared with MASI unless the request names a distance.
// Fails with InvalidArgument when a span request names an attribute the codebook lacks.
Result<EncodingOptions> encodingFor(const Codebook &codebook, const AnalysisRequest &request);

// Encodes a table and computes its agreement report: the one way a table becomes figures, for a
// project's units and for a raw matrix read from a file alike.
Result<AnalysisResult> analyseTable(
    ReliabilityTable table, const EncodingOptions &encoding, const AgreementOptions &options);
// Alpha without each coder and without each article of an analysed table.
Result<LeaveOneOutCosts> leaveOneOutCosts(
    const AnalysisResult &analysis, const DiagnosticsProgress &progress = {});

class AgreementRun
{
public:
    // Reads the codings `selection` compares and the current codebook (a bounded number of
    // queries). The selection's unit, function, item and attribute are ignored: each analysis
    // names its own. Fails as countedCodings() does. The run reads article texts from `project`
    // later on, so the project must outlive the run.
    static Result<AgreementRun> load(const Project &project, const UnitSelection &selection);

    const CountedCodings &codings() const { return m_codings; }
    const Codebook &codebook() const { return m_codebook; }

    // The table of units of `request`, encoded and compared. Fails with InvalidArgument for a
    // continuum request (see continuum()), an attribute the codebook lacks or fewer than two
    // coders; with InvalidInput for a value outside its scale.
    Result<AnalysisResult> analyse(
        const AnalysisRequest &request, const AgreementOptions &options) const;
    // Unitizing alpha on the continuum of the articles every coder coded (one function or all
    // four), and span agreement per pair of coders.
    Result<ContinuumResult> continuum(std::optional<FramingFunction> function) const;
    // Span matching over all four functions (function confusion, boundary habits).
    Result<SpanMatching> matching(const DiagnosticsProgress &progress = {}) const;
    // Alpha per week or batch of articles on an analysed table.
    Result<std::vector<PeriodAlpha>> periods(const AnalysisResult &analysis, PeriodKind kind,
        int batchSize, const DiagnosticsProgress &progress = {}) const;

private:
    AgreementRun(const Project &project, UnitSelection selection)
        : m_project(&project)
        , m_selection(std::move(selection))
    { }
    UnitSelection selectionFor(const AnalysisRequest &request) const;

    const Project *m_project;
    UnitSelection m_selection;
    CountedCodings m_codings;
    Codebook m_codebook;
};

// `agree --unit continuum --json` without "left_out": unit, coders, articles, length,
// unitizing_alpha (per function and overall) and span_agreement per pair.
QJsonObject continuumJson(const ContinuumResult &result);

} // namespace fourfold
