#pragma once
// Study design (field.md §1.1–1.2, §5.3–5.5): phases, assignments, the reliability subsample
// draw, codebook versions with diffs, training feedback against the lead's master coding, the
// progress board and the effort setting. Static functions over a Project, beside it like
// ExtractorRuns; no SQL here (it lives in core/store/study_tables and codebook_table).
//
// Coders are named by pseudonym and articles by external id in every value below, so the front
// ends can show them and write them to JSON without looking anything up.
//
// Writes are undoable edits (core/project/study_edits.h): the *Edit functions check and resolve
// a write and return it for Project::apply or the desktop's undo stack; commitPlan, commitDraw
// and setEffortPerCoderVisible apply it at once (the CLI). Reading functions never write.

#include "core/model/annotation.h"
#include "core/model/codebook.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/unit_kind.h"
#include "core/project/study_edits.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <array>
#include <cstdint>
#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Database;
class Project;

// What a stratified draw groups articles by. Topic is the article metadata key "topic" (a
// string; from the "meta" object of a JSON Lines record); articles without it form the stratum
// "(none)".
enum class Stratum { Outlet, Language, Topic };
QString stratumKey(Stratum stratum); // "outlet", "language", "topic"
std::optional<Stratum> stratumFromKey(const QString &key);

// --- assignments --------------------------------------------------------------------------------

// One planned or stored assignment.
struct PlannedAssignment {
    QString article; // external id
    QString coder; // pseudonym
    Phase phase = Phase::Production;
};

// Assignments to write; made by the plan* functions, written by commitPlan. A plan holds no
// assignment that already exists.
struct AssignmentPlan {
    std::vector<PlannedAssignment> rows;
};

// --- the reliability subsample draw -------------------------------------------------------------

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
// the event log, as JSON: see drawJson).
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

enum class RestCoding { Single, Double };

struct RestRequest {
    RestCoding coding = RestCoding::Single;
    QStringList coders; // pseudonyms; at least one (two for double coding)
    std::uint64_t seed = 1; // the articles are shuffled with it before they are dealt
};

// One live assignment, named by external id and pseudonym.
struct AssignmentRow {
    QString article;
    QString coder;
    Phase phase = Phase::Production;
    QString status; // "assigned", "started", "done"
};

// --- codebook versions ----------------------------------------------------------------------

struct CodebookVersionInfo {
    CodebookVersionId id;
    int number = 0;
    QString createdAt; // ISO 8601 UTC
    QString createdBy; // pseudonym, empty if unknown
    QString note;
};

struct CodebookChange {
    enum class Kind { Added, Removed, Changed };
    Kind kind = Kind::Changed;
    // Where: "name", "problem.definition", "problem.rules", "evaluation.attributes.polarity",
    // "evaluation.attributes.polarity.values", "items.dominant_function.question", ...
    QString path;
    std::optional<FramingFunction> function; // the function the change belongs to, if any
    QString before; // readable old value (lists joined with "; "), empty when added
    QString after; // readable new value, empty when removed
};

struct CodebookDiff {
    int from = 0;
    int to = 0;
    std::vector<CodebookChange> changes; // in codebook order
    // The functions whose definition, rules, examples or attributes changed.
    std::vector<FramingFunction> changedFunctions() const;
};

// A live annotation made under a version older than the current one.
struct OutdatedAnnotation {
    AnnotationId id;
    QString article; // external id
    QString coder; // pseudonym
    FramingFunction function = FramingFunction::Problem;
    Phase phase = Phase::Production;
    int version = 0; // the version number it was made under
    // True if its function's definition, rules, examples or attributes changed since then
    // (those are the ones to re-check, field.md §5.5).
    bool functionChanged = false;
};

// --- training feedback ----------------------------------------------------------------------

struct TrainingRequest {
    QString coder; // pseudonym of the trainee
    QString master; // pseudonym of the lead whose training coding is the master; empty = the one
                    // lead who coded training articles
    UnitKind unit = UnitKind::Sentence; // Paragraph, Sentence or Token
};

struct FunctionAgreement {
    FramingFunction function = FramingFunction::Problem;
    int units = 0; // units of the compared articles
    int agreeingUnits = 0; // units where coder and master agree on present/absent
    double percentAgreement = 0; // agreeingUnits / units; 0 if no units
    std::optional<double> alpha; // Krippendorff's alpha, nominal, two coders; none = undefined
    QString alphaUndefinedReason;
    int coderUnits = 0; // units where the coder marked the function
    int masterUnits = 0; // units where the master marked it
};

struct TrainingFeedback {
    QString coder;
    QString master;
    UnitKind unit = UnitKind::Sentence;
    QStringList articles; // training articles the coder finished (status done) and the master
                          // coded; only these are compared: feedback comes after submission
    int openArticles = 0; // the coder's training articles not yet done
    std::array<FunctionAgreement, 4> functions {}; // in kFramingFunctions order
    // True when the coder has training assignments and all are done: the real work may begin.
    bool trainingComplete = false;
};

// --- progress board and effort --------------------------------------------------------------

struct ProgressRow {
    QString coder; // pseudonym
    Phase phase = Phase::Production;
    int assigned = 0; // live assignments in the phase
    int started = 0;
    int done = 0;
    // Active seconds over the coder's assignments of the phase; only when effort per coder is
    // visible (nullopt otherwise).
    std::optional<qint64> activeSeconds;
    // Agreement so far, on the phase's annotations of articles the coder finished: in training,
    // Krippendorff's alpha with the master (all four functions, present/absent per sentence and
    // function pooled as one nominal variable); in other phases, the mean of that alpha over
    // every other coder who finished articles in common. None when undefined or nothing to
    // compare.
    std::optional<double> agreement;
    int comparedArticles = 0; // articles behind `agreement` (summed over partners)
};

// Effort in aggregate, always shown: per phase over all coders.
struct PhaseEffort {
    Phase phase = Phase::Production;
    int doneArticles = 0;
    qint64 activeSeconds = 0;
    std::optional<double> meanSecondsPerDoneArticle; // none if no article is done
};

struct ProgressBoard {
    bool effortPerCoder = false; // the setting in force
    std::vector<ProgressRow> rows; // by phase (study order), then pseudonym
    std::vector<PhaseEffort> effort; // phases with assignments, in study order
};

// The study-design functions: static, over a Project (a friend of Project, like ExtractorRuns).
class StudyDesign
{
public:
    // --- the reliability subsample draw ---------------------------------------------------

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
    static Result<Draw> planDraw(const Project &project, const DrawRequest &request);
    // The draw's assignments and its record (setting study.draw.<phase>, logged with the
    // "assignment.plan" event) as one edit; sets draw.drawnAt (now). Fails as assignEdit, or
    // with Duplicate if the phase has a recorded draw (apply() checks again).
    static Result<std::unique_ptr<AssignEdit>> drawEdit(
        const Project &project, Draw &draw, CoderId actor);
    // Applies drawEdit(project, draw, no actor); nothing is written on failure.
    static Status commitDraw(Project &project, Draw &draw);
    // Withdraws the recorded draw of `phase` (see WithdrawDrawEdit, which apply() checks again):
    // its assignments become tombstones, its record goes, and the phase can be drawn anew.
    // NotFound when the phase has no draw, NotAllowed (naming how many) when coding started on
    // any of its assignments, Corrupt when its record cannot be read.
    static Result<std::unique_ptr<WithdrawDrawEdit>> withdrawDrawEdit(
        const Project &project, Phase phase, CoderId actor);
    // Applies withdrawDrawEdit(project, phase, no actor); returns how many assignments were
    // withdrawn. Nothing is written on failure.
    static Result<qsizetype> withdrawDraw(Project &project, Phase phase);
    // The recorded draw of `phase`, if any. Fails with Corrupt if the record cannot be read.
    static Result<std::optional<Draw>> recordedDraw(const Project &project, Phase phase);
    // The draw as JSON (keys: phase, method, stratify, seed (string, to keep all 64 bits), coders,
    // frame_articles, near_copies_left_out, articles, strata [{key, frame, drawn}], advice
    // {alpha_min, significance, rarest_proportion, minimum_values, article_values,
    // paragraph_values, sentence_values, sufficient_units}, drawn_at). drawFromJson reads it back
    // (Corrupt on a malformed record).
    static QJsonObject drawJson(const Draw &draw);
    static Result<Draw> drawFromJson(const QJsonObject &json);

    // Plans production assignments for "the rest": every live article with no assignment in any
    // phase. Single: dealt round-robin, so loads differ by at most one. Double: each article goes
    // to one pair of coders, the pairs taken in turn from all pairs (coder pairs rotate, so no pair
    // codes everything together: common practice, field.md §1.1). Fails with InvalidArgument for
    // too few coders, NotFound for an unknown coder. An empty plan when there is no rest.
    static Result<AssignmentPlan> planRest(const Project &project, const RestRequest &request);

    // Plans assigning `articles` (external ids) to every one of `coders` in `phase`, leaving out
    // pairs already assigned in that phase. NotFound naming the first unknown article or coder;
    // InvalidArgument if either list is empty.
    static Result<AssignmentPlan> planArticles(const Project &project, Phase phase,
        const QStringList &articles, const QStringList &coders);

    // A plan as one edit: one "assignment.add" event per row, the edit logged as
    // "assignment.plan" holding `record` (may be empty); `text` names it in an undo menu (empty:
    // "Assign N articles"). Duplicate if a row exists already, NotFound for an unknown article or
    // coder, InvalidArgument for a disabled coder.
    static Result<std::unique_ptr<AssignEdit>> assignEdit(const Project &project,
        const AssignmentPlan &plan, const QJsonObject &record = {}, CoderId actor = {},
        const QString &text = {});
    // Applies assignEdit(project, plan, record); nothing is written on failure.
    static Status commitPlan(
        Project &project, const AssignmentPlan &plan, const QJsonObject &record = {});

    // Every live assignment, ordered by phase (study order), article, coder; `phase` filters.
    static Result<std::vector<AssignmentRow>> assignmentRows(
        const Project &project, std::optional<Phase> phase = std::nullopt);

    // The phase a new annotation or answer of `coder` on `article` gets, from the coder's
    // assignments of the article: `requested` if that assignment is not done; else the
    // unfinished one that comes first in study order (training, pilot, reliability,
    // production); else `requested` if assigned in it; else the last finished one. `requested`
    // if there is no assignment at all. Used by AddAnnotationEdit and SetJudgementEdit, so a
    // front end may pass any phase.
    static Result<Phase> phaseForNewCoding(
        const Database &db, ArticleId article, CoderId coder, Phase requested);

    // --- codebook versions ------------------------------------------------------------------

    // Every version, oldest first.
    static Result<std::vector<CodebookVersionInfo>> codebookVersions(const Project &project);
    // Version `number`. NotFound if there is none.
    static Result<Codebook> codebookVersion(const Project &project, int number);
    // Stores `codebook` as the next version (its versionId and number are ignored) with `note`,
    // made by `author` (may be invalid). Fails with InvalidArgument if it equals the current
    // version (nothing to record) or the note is empty, and with InvalidInput naming the value
    // when a live coder's or gold span (or answer) carries a value of a choice attribute (or
    // item) that the new version neither lists nor recodes; the new version on success.
    static Result<CodebookVersionInfo> addCodebookVersion(
        Project &project, const Codebook &codebook, const QString &note, CoderId author);
    // Reads a codebook JSON file (Codebook::fromJson, every rule) and adds it as above;
    // InvalidInput naming the file, line and key for a malformed one, Io if it cannot be read or
    // is not a regular file.
    static Result<CodebookVersionInfo> addCodebookVersionFromFile(
        Project &project, const QString &path, const QString &note, CoderId author);

    // Compares two codebooks field by field (attributes and items matched by key).
    static CodebookDiff diffCodebooks(const Codebook &from, const Codebook &to);
    // The diff between stored versions; NotFound for a missing version.
    static Result<CodebookDiff> codebookDiff(const Project &project, int from, int to);
    // "~ problem.definition: «old» → «new»", "+ path: «new»", "- path: «old»", one per line, after
    // a heading "Codebook version 1 → 2"; "no changes" when empty.
    static QString codebookDiffText(const CodebookDiff &diff);
    static QJsonObject codebookDiffJson(
        const CodebookDiff &diff); // {from, to, changes:[{kind,path,...}]}

    // Every live annotation made under an older version, ordered by article, coder, start.
    static Result<std::vector<OutdatedAnnotation>> outdatedAnnotations(const Project &project);

    // --- training feedback ------------------------------------------------------------------

    // The trainee's agreement with the master coding per function, on the training-phase
    // annotations of the finished training articles (present/absent of the function per unit).
    // Fails with NotFound for an unknown coder or master, InvalidArgument if no master is named and
    // there is not exactly one lead with training annotations, or for the article/continuum/span
    // unit kinds.
    static Result<TrainingFeedback> trainingFeedback(
        const Project &project, const TrainingRequest &request);
    static QJsonObject trainingFeedbackJson(const TrainingFeedback &feedback);

    // --- progress board and effort ----------------------------------------------------------

    // Project setting "study.effort_per_coder": whether active time is shown per coder (off by
    // default; monitoring coders can be regulated at work, so a lead turns it on deliberately).
    static Result<bool> effortPerCoderVisible(const Project &project);
    // Setting it as one edit, logged as "setting.effort_per_coder" by `lead` (may be invalid).
    static std::unique_ptr<Edit> effortEdit(bool visible, CoderId lead);
    // Applies effortEdit(visible, lead).
    static Status setEffortPerCoderVisible(Project &project, bool visible, CoderId lead);

    // The progress board; `phase` filters. The master for training agreement is the one lead with
    // training annotations (agreement is left out if there is none or several).
    static Result<ProgressBoard> progressBoard(
        const Project &project, std::optional<Phase> phase = std::nullopt);
    static QJsonObject progressBoardJson(const ProgressBoard &board);
};

} // namespace fourfold
