#include "core/project/training_feedback.h"

#include "core/project/pair_matrix.h"
#include "core/project/project.h"
#include "core/project/study_names.h"
#include "core/reliability/krippendorff_alpha.h"

#include <QJsonArray>
#include <QSet>

#include <algorithm>

namespace fourfold {

using namespace study;

// --- training ---------------------------------------------------------------------------------

Result<TrainingFeedback> Training::feedback(const Project &project, const TrainingRequest &request)
{
    if (request.unit != UnitKind::Paragraph && request.unit != UnitKind::Sentence
        && request.unit != UnitKind::Token)
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "Training feedback is computed on paragraphs, sentences or tokens, not on %1 "
                "units.")
                .arg(unitKindKey(request.unit)));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto coder = resolveCoders(*names, {request.coder});
    if (!coder)
        return std::unexpected(coder.error());
    auto all = project.allAnnotations();
    if (!all)
        return std::unexpected(all.error());
    Coder master;
    if (request.master.isEmpty()) {
        auto lead = soleTrainingLead(names->coders, *all);
        if (!lead)
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr(
                    "Name the lead whose training coding is the master: there is not exactly one "
                    "lead with training annotations."));
        master = *lead;
    } else {
        auto m = resolveCoders(*names, {request.master});
        if (!m)
            return std::unexpected(m.error());
        master = m->front();
    }
    const Coder trainee = coder->front();
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());

    TrainingFeedback fb;
    fb.coder = trainee.pseudonym;
    fb.master = master.pseudonym;
    fb.unit = request.unit;
    const std::vector<Annotation> mine = spansOf(*all, trainee.id, Phase::Training);
    const std::vector<Annotation> theirs = spansOf(*all, master.id, Phase::Training);
    QSet<qint64> masterCoded;
    for (const Annotation &a : theirs)
        masterCoded.insert(a.article.value);
    for (const Assignment &a : *assignments)
        if (a.coder == master.id && a.phase == Phase::Training)
            masterCoded.insert(a.article.value);
    std::vector<ArticleId> compared;
    int trainingAssignments = 0;
    for (const Assignment &a : *assignments) {
        if (a.coder != trainee.id || a.phase != Phase::Training)
            continue;
        ++trainingAssignments;
        if (a.status != QStringLiteral("done"))
            ++fb.openArticles;
        else if (masterCoded.contains(a.article.value))
            compared.push_back(a.article);
    }
    std::ranges::sort(
        compared, {}, [&](ArticleId id) { return names->externalIdById.value(id.value); });
    for (ArticleId id : compared)
        fb.articles << names->externalIdById.value(id.value);
    fb.trainingComplete = trainingAssignments > 0 && fb.openArticles == 0;

    UnitCache cache(project, request.unit);
    for (std::size_t i = 0; i < kFramingFunctions.size(); ++i) {
        const FramingFunction f = kFramingFunctions[i];
        auto m = pairMatrix(cache, compared, {f}, mine, theirs);
        if (!m)
            return std::unexpected(m.error());
        FunctionAgreement &fa = fb.functions[i];
        fa.function = f;
        fa.units = m->data.units;
        fa.agreeingUnits = m->agreeing;
        fa.percentAgreement = fa.units > 0 ? double(fa.agreeingUnits) / fa.units : 0.0;
        fa.coderUnits = m->aMarked;
        fa.masterUnits = m->bMarked;
        const reliability::AlphaResult alpha = reliability::krippendorffAlpha(
            m->data, reliability::Metric {reliability::Level::Nominal, {}, {}});
        fa.alpha = alpha.value;
        fa.alphaUndefinedReason = QString::fromStdString(alpha.reason);
    }
    return fb;
}

QJsonObject Training::feedbackJson(const TrainingFeedback &feedback)
{
    QJsonArray functions;
    for (const FunctionAgreement &f : feedback.functions) {
        QJsonObject o {{QStringLiteral("function"), functionKey(f.function)},
            {QStringLiteral("units"), f.units}, {QStringLiteral("agreeing_units"), f.agreeingUnits},
            {QStringLiteral("percent_agreement"), f.percentAgreement},
            {QStringLiteral("alpha"), f.alpha ? QJsonValue(*f.alpha) : QJsonValue()},
            {QStringLiteral("coder_units"), f.coderUnits},
            {QStringLiteral("master_units"), f.masterUnits}};
        if (!f.alpha)
            o.insert(QStringLiteral("alpha_undefined"), f.alphaUndefinedReason);
        functions.append(o);
    }
    return QJsonObject {{QStringLiteral("coder"), feedback.coder},
        {QStringLiteral("master"), feedback.master},
        {QStringLiteral("unit"), unitKindKey(feedback.unit)},
        {QStringLiteral("articles"), QJsonArray::fromStringList(feedback.articles)},
        {QStringLiteral("open_articles"), feedback.openArticles},
        {QStringLiteral("training_complete"), feedback.trainingComplete},
        {QStringLiteral("functions"), functions}};
}

} // namespace fourfold
