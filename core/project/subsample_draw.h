#pragma once
// The reliability (or pilot) subsample draw (field.md §1.1–1.2): planned without writing,
// reproducible from its seed, simple or stratified, with Krippendorff's minimum sample next to
// what it delivers; committed as one undoable edit that writes its assignments and its record
// (project setting "study.draw.<phase>"), and withdrawn the same way while nobody has coded it.
// Static functions over a Project, beside it like ExtractorRuns.

#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/project/assignment_plans.h"
#include "core/project/study_edits.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <cstdint>
#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

// What a stratified draw groups articles by. Topic is the article metadata key "topic" (a
// string; from the "meta" object of a JSON Lines record); articles without it form the stratum
// "(none)".
enum class Stratum { Outlet, Language, Topic };
QString stratumKey(Stratum stratum); // "outlet", "language", "topic"
std::optional<Stratum> stratumFromKey(const QString &key);

struct DrawRequest {
    Phase phase = Phase::Reliability; // Reliability or Pilot
    // Exactly one of size (articles, ≥ 1) and fraction (0 < f ≤ 1 of the sampling frame; the
    // size is ceil(f × frame)).
    std::optional<int> size;
    std::optional<double> fraction;
    std::optional<Stratum> stratify; // none = simple random sample
    std::uint64_t seed = 1;
    QStringList coders; // pseudonyms, at least two; every one codes every drawn article
    // Leave out of the sampling frame every article recorded as a near copy of an older one
    // (core/project/near_copies.h); the oldest article of each group of near copies stays.
    bool leaveOutNearCopies = false;
    // For the minimum-sample advice (Krippendorff 2004, §11.4): alpha_min, the significance
    // level, and the expected share of the rarest value (0.25 = four equally frequent values).
    double alphaMin = 0.8;
    double significance = 0.05;
    double rarestProportion = 0.25;
};

struct DrawStratum {
    QString key; // outlet name, language tag, topic, or "(none)"
    int frameArticles = 0; // articles of the stratum in the sampling frame
    int drawnArticles = 0;
};

// Krippendorff's minimum number of values next to what the draw delivers. The draw delivers, per
// unit kind, (units in the drawn articles) × (coders) values, all pairable since every coder
// codes every drawn article.
struct SampleAdvice {
    double alphaMin = 0.8;
    double significance = 0.05;
    double rarestProportion = 0.25;
    int minimumValues = 0; // reliability::minimumReliabilityValues; 0 = arguments out of range
    qint64 articleValues = 0; // article-level items: articles × coders
    qint64 paragraphValues = 0;
    qint64 sentenceValues = 0;
    // The unit kinds whose values reach minimumValues ("article", "paragraph", "sentence").
    QStringList sufficientUnits;
};

// A draw as planned and, once committed, as recorded (project setting "study.draw.<phase>" and
// the event log, as JSON: see SubsampleDraw::toJson).
struct Draw {
    Phase phase = Phase::Reliability;
    QString method; // "random" or "stratified"
    std::optional<Stratum> stratify;
    std::uint64_t seed = 1;
    QStringList coders; // pseudonyms
    int frameArticles = 0; // size of the sampling frame
    bool nearCopiesLeftOut = false; // DrawRequest::leaveOutNearCopies
    QStringList articles; // drawn external ids, sorted
    std::vector<DrawStratum> strata; // by key; empty for a random draw
    SampleAdvice advice;
    QString drawnAt; // ISO 8601 UTC; empty until committed
    AssignmentPlan plan; // one row per drawn article and coder
};

class SubsampleDraw
{
public:
    // Plans a draw without writing. The sampling frame is every live article with no assignment in
    // training, pilot or reliability (production assignments do not matter), and with
    // leaveOutNearCopies none recorded as a near copy of an older one, sorted by external id. The
    // sample is reproducible from the seed on every platform: mt19937_64 (fully specified by C++
    // [rand.eng.mers]) driving a Fisher–Yates shuffle with rejection sampling (no std::shuffle or
    // distributions, whose output is implementation-defined). Stratified: proportional allocation
    // by largest remainder (Hamilton), each stratum shuffled with the same generator in stratum-key
    // order. Fails with InvalidArgument for a phase other than Reliability/Pilot, none or both of
    // size and fraction, a size larger than the frame or below 1, fewer than two coders, a fraction
    // outside (0, 1]; NotFound for an unknown coder (naming it); Duplicate if the phase already has
    // a draw.
    static Result<Draw> plan(const Project &project, const DrawRequest &request);
    // The draw's assignments and its record (setting study.draw.<phase>, logged with the
    // "assignment.plan" event) as one edit; sets draw.drawnAt (now). Fails as
    // AssignmentPlans::edit, or with Duplicate if the phase has a recorded draw (apply() checks
    // again).
    static Result<std::unique_ptr<AssignEdit>> edit(
        const Project &project, Draw &draw, CoderId actor);
    // Applies edit(project, draw, no actor); nothing is written on failure.
    static Status commit(Project &project, Draw &draw);
    // Withdraws the recorded draw of `phase` (see WithdrawDrawEdit, which apply() checks again):
    // its assignments become tombstones, its record goes, and the phase can be drawn anew.
    // NotFound when the phase has no draw, NotAllowed (naming how many) when coding started on
    // any of its assignments, Corrupt when its record cannot be read.
    static Result<std::unique_ptr<WithdrawDrawEdit>> withdrawEdit(
        const Project &project, Phase phase, CoderId actor);
    // Applies withdrawEdit(project, phase, no actor); returns how many assignments were
    // withdrawn. Nothing is written on failure.
    static Result<qsizetype> withdraw(Project &project, Phase phase);
    // The recorded draw of `phase`, if any. Fails with Corrupt if the record cannot be read.
    static Result<std::optional<Draw>> recorded(const Project &project, Phase phase);
    // The draw as JSON (keys: phase, method, stratify, seed (string, to keep all 64 bits), coders,
    // frame_articles, near_copies_left_out, articles, strata [{key, frame, drawn}], advice
    // {alpha_min, significance, rarest_proportion, minimum_values, article_values,
    // paragraph_values, sentence_values, sufficient_units}, drawn_at). fromJson reads it back
    // (Corrupt on a malformed record).
    static QJsonObject toJson(const Draw &draw);
    static Result<Draw> fromJson(const QJsonObject &json);
};

} // namespace fourfold
