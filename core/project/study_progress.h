#pragma once
// The study's progress (field.md §5.3–5.4): the progress board (assignments per coder and phase,
// agreement so far, effort) and the effort setting that decides whether active time is shown per
// coder. Static functions over a Project, beside it like ExtractorRuns.

#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/project/edit.h"

#include <QJsonObject>
#include <QString>

#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

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

class StudyProgress
{
public:
    // The progress board; `phase` filters. The master for training agreement is the one lead with
    // training annotations (agreement is left out if there is none or several).
    static Result<ProgressBoard> board(
        const Project &project, std::optional<Phase> phase = std::nullopt);
    static QJsonObject boardJson(const ProgressBoard &board);

    // Project setting "study.effort_per_coder": whether active time is shown per coder (off by
    // default; monitoring coders can be regulated at work, so a lead turns it on deliberately).
    static Result<bool> effortPerCoderVisible(const Project &project);
    // Setting it as one edit, logged as "setting.effort_per_coder" by `lead` (may be invalid).
    static std::unique_ptr<Edit> effortEdit(bool visible, CoderId lead);
    // Applies effortEdit(visible, lead).
    static Status setEffortPerCoderVisible(Project &project, bool visible, CoderId lead);
};

} // namespace fourfold
