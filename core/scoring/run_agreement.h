#pragma once
// An extractor run taken as one more coder: its Krippendorff's alpha with the human coders next
// to the humans' pairwise range ("is it inside the human band?").
//
// How the run joins: the units are the articles' stored sentences (or paragraphs or tokens);
// for one framing function, a coder's value for a unit is "present" when one of their spans of
// that function overlaps the unit by at least one code point, else "absent" (the unitizer of
// core/agreement/project_units.h). The run covers every article, so its value is never missing;
// a human is missing on the articles they did not code. Alpha is nominal (Krippendorff 2011, §B).
//
// Per function: alpha of every pair of humans (the human band runs from the lowest to the
// highest pairwise alpha), alpha of the run with each human, and the mean of those. The run's
// position: "below" the band when its mean pairwise alpha is under the lowest human pair,
// "above" when over the highest, else "inside"; "undefined" when the band or the run's mean has
// no value (e.g. fewer than two humans, or a function nobody marked). Alpha over all humans, and
// over the humans plus the run, is reported as well.

#include "core/agreement/project_units.h"
#include "core/model/error.h"
#include "core/reliability/krippendorff_alpha.h"

#include <QString>
#include <QStringList>

#include <array>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

struct RunAgreementOptions {
    UnitKind unit = UnitKind::Sentence; // paragraph, sentence or token
    QStringList coders; // pseudonyms; empty = every coder who coded
    std::optional<Phase> phase;
};

struct PairAlpha {
    QString first, second; // pseudonyms; the run is named "run:NAME"
    std::optional<double> alpha;
    QString reason; // why alpha is undefined
};

struct FunctionBand {
    FramingFunction function = FramingFunction::Problem;
    std::vector<PairAlpha> humanPairs;
    std::vector<PairAlpha> runPairs; // (human, run)
    std::optional<double> bandLow, bandHigh; // min and max of the humans' pairwise alphas
    std::optional<double> runMean; // mean of the run's defined pairwise alphas
    std::optional<double> humansAlpha, humansWithRunAlpha; // alpha over all humans (+ run)
    QString position; // "below", "inside", "above", "undefined"
};

struct RunAgreement {
    QString run;
    UnitKind unit = UnitKind::Sentence;
    QStringList coders; // the humans
    int units = 0; // units of the first function's table (the same for every function)
    std::array<FunctionBand, 4> functions;
};

// Computes the band for the run `run`. Fails with NotFound for an unknown run or coder,
// InvalidArgument for a unit kind other than paragraph, sentence or token or when fewer than two
// humans coded, or with the store's error.
Result<RunAgreement> runAgreement(
    const Project &project, const QString &run, const RunAgreementOptions &options);

// Where `runMean` lies relative to [low, high]: "below", "inside", "above", or "undefined"
// when any of them has no value.
QString bandPosition(
    std::optional<double> runMean, std::optional<double> low, std::optional<double> high);

} // namespace fourfold
