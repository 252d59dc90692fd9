#pragma once
// Everything a lead reports about one reliability matrix: Krippendorff's alpha with its
// bootstrap intervals, percent agreement, the kappa family where its assumptions hold, pairwise
// tables, and sample-size advice; as JSON for scripts and as a readable table.

#include "core/agreement/value_encoding.h"
#include "core/reliability/alpha_bootstrap.h"
#include "core/reliability/kappa.h"
#include "core/reliability/krippendorff_alpha.h"
#include "core/reliability/unitizing_alpha.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <cstdint>
#include <optional>
#include <vector>

namespace fourfold {

struct AgreementOptions {
    int bootstrapReplicates = 0; // 0 = no bootstrap
    std::uint64_t seed = 1;
    int threads = 2;
    // For the verdict and the sample-size advice (Krippendorff 2004, §12.2: rely on 0.800,
    // tentative conclusions from 0.667).
    double alphaMin = 0.8;
    double significance = 0.05;
    // Cohen's kappa of two coders and of each pair: unweighted, or weighted by the positions
    // of the values in their order (Cohen 1968).
    reliability::KappaWeights kappaWeights = reliability::KappaWeights::None;
};

struct PairAgreement {
    int coderA = 0;
    int coderB = 0;
    int units = 0; // units both coded
    reliability::SimpleAgreement percentAgreement;
    reliability::KappaResult cohenKappa;
};

struct AgreementReport {
    QStringList coders;
    int units = 0;
    QString scale; // "nominal", ..., or "masi" / "jaccard" for set-valued values
    bool complete = false; // no missing cell
    reliability::AlphaResult alpha;
    std::optional<reliability::BootstrapResult> pairBootstrap;
    std::optional<reliability::BootstrapResult> unitBootstrap;
    reliability::SimpleAgreement percentAgreement;
    // Two coders, no missing cells: Cohen's kappa (with SE), Scott's pi, Bennett et al.'s S.
    std::optional<reliability::KappaResult> cohenKappa;
    std::optional<reliability::SimpleAgreement> scottPi;
    std::optional<reliability::SimpleAgreement> bennettS;
    // Any number of coders, no missing cells.
    std::optional<reliability::FleissResult> fleissKappa;
    reliability::SimpleAgreement lightKappa;
    std::vector<PairAgreement> pairs;
    QStringList valueLabels;
    // Sample-size advice: the rarest value's share among the pairable values and Krippendorff's
    // minimum number of values for options.alphaMin at options.significance.
    std::optional<double> rarestProportion;
    std::optional<int> minimumValues;
    double alphaMin = 0.8;
};

// Computes the report; never fails (undefined statistics carry their reasons).
AgreementReport computeAgreement(const EncodedData &encoded, const QStringList &coders,
    const QString &scale, const AgreementOptions &options);

// The JSON form (keys are a contract with scripts; see README "fourfold-cli agree").
QJsonObject agreementJson(const AgreementReport &report);
// A readable table with the verdict against 0.800 and 0.667.
QString agreementText(const AgreementReport &report);
// Krippendorff (2004), Content Analysis 2nd ed., §12.2: rely on variables with alpha ≥ 0.800;
// draw tentative conclusions only from 0.667. Every verdict and colour band of the program (CLI,
// windows, report) comes from these two figures and alphaBand().
inline constexpr double kAlphaReliable = 0.800;
inline constexpr double kAlphaTentative = 0.667;
enum class AlphaBand { Undefined, Reliable, Tentative, Unreliable };
AlphaBand alphaBand(const std::optional<double> &alpha);
// "reliable (≥ 0.800)", "tentative only (0.667–0.800)", "unreliable (< 0.667)", or "undefined".
QString alphaVerdict(const std::optional<double> &alpha);
// One unitizing alpha as `agree --unit continuum --json` writes it: value (null with a reason when
// undefined), observed and expected disagreement, verdict.
QJsonObject unitizingJson(const reliability::UnitizingCategoryResult &result);

} // namespace fourfold
