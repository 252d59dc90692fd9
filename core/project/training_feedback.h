#pragma once
// Training feedback (field.md §1.2): a trainee's agreement with the lead's master coding per
// framing function, on the training articles the trainee finished. A static function over a
// Project, beside it like ExtractorRuns.

#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/unit_kind.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <array>
#include <optional>

namespace fourfold {

class Project;

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

class Training
{
public:
    // The trainee's agreement with the master coding per function, on the training-phase
    // annotations of the finished training articles (present/absent of the function per unit).
    // Fails with NotFound for an unknown coder or master, InvalidArgument if no master is named
    // and there is not exactly one lead with training annotations, or for the
    // article/continuum/span unit kinds.
    static Result<TrainingFeedback> feedback(
        const Project &project, const TrainingRequest &request);
    static QJsonObject feedbackJson(const TrainingFeedback &feedback);
};

} // namespace fourfold
