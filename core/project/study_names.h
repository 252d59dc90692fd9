#pragma once
// What the study-design units share inside core/project (assignment_plans, subsample_draw,
// codebook_versions, outdated_annotations, training_feedback, study_progress): the project's
// coders and articles looked up by pseudonym and external id, the study order of the phases, and
// the one context their sentences are translated under. Not for the front ends.

#include "core/model/annotation.h"
#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/store/study_tables.h"

#include <QCoreApplication>
#include <QHash>
#include <QStringList>

#include <array>
#include <vector>

namespace fourfold {

class Database;
class Project;

// The sentences of the study-design units, under a context that lupdate collects.
struct StudyDesignText {
    Q_DECLARE_TR_FUNCTIONS(StudyDesignText)
};

namespace study {

// Study order: training, pilot, reliability, production.
constexpr int phaseRank(Phase phase)
{
    return int(phase);
}

constexpr std::array<Phase, 4> kPhases {
    Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production};

// Coders and articles of a project, looked up by pseudonym / external id and by row id.
struct Names {
    std::vector<Coder> coders;
    QHash<QString, Coder> coderByPseudonym;
    QHash<qint64, QString> pseudonymById;
    std::vector<store::FrameArticle> articles; // live, by external id
    QHash<QString, qsizetype> articleIndex; // external id → index in articles
    QHash<qint64, QString> externalIdById;
};

Result<Names> loadNames(const Database &db, const Project &project);

// The coders named by `pseudonyms`: NotFound for an unknown one, InvalidArgument for one named
// twice or a disabled one.
Result<std::vector<Coder>> resolveCoders(const Names &names, const QStringList &pseudonyms);

// The pseudonym of `id`, or "#<id>" for a person not in `names`.
QString coderLabel(const Names &names, CoderId id);

} // namespace study
} // namespace fourfold
