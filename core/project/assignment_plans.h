#pragma once
// Assignment plans (field.md §1.1): who codes which article in which phase. Plans are made
// without writing (the rest of the study dealt single- or double-coded, or chosen articles to
// chosen coders) and written as one undoable edit (AssignEdit, core/project/study_edits.h);
// also every live assignment as a list, and the phase a new coding takes. Static functions over
// a Project, beside it like ExtractorRuns; no SQL here (it lives in core/store/study_tables).
//
// Coders are named by pseudonym and articles by external id in every value below, so the front
// ends can show them and write them to JSON without looking anything up.

#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/project/study_edits.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <cstdint>
#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Database;
class Project;

// One planned or stored assignment.
struct PlannedAssignment {
    QString article; // external id
    QString coder; // pseudonym
    Phase phase = Phase::Production;
};

// Assignments to write; made by the plan* functions, written by AssignmentPlans::commit. A plan
// holds no assignment that already exists.
struct AssignmentPlan {
    std::vector<PlannedAssignment> rows;
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

class AssignmentPlans
{
public:
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
    static Result<std::unique_ptr<AssignEdit>> edit(const Project &project,
        const AssignmentPlan &plan, const QJsonObject &record = {}, CoderId actor = {},
        const QString &text = {});
    // Applies edit(project, plan, record); nothing is written on failure.
    static Status commit(
        Project &project, const AssignmentPlan &plan, const QJsonObject &record = {});

    // Every live assignment, ordered by phase (study order), article, coder; `phase` filters.
    static Result<std::vector<AssignmentRow>> rows(
        const Project &project, std::optional<Phase> phase = std::nullopt);

    // The phase a new annotation or answer of `coder` on `article` gets, from the coder's
    // assignments of the article: `requested` if that assignment is not done; else the
    // unfinished one that comes first in study order (training, pilot, reliability,
    // production); else `requested` if assigned in it; else the last finished one. `requested`
    // if there is no assignment at all. Used by AddAnnotationEdit and SetJudgementEdit, so a
    // front end may pass any phase.
    static Result<Phase> phaseForNewCoding(
        const Database &db, ArticleId article, CoderId coder, Phase requested);
};

} // namespace fourfold
