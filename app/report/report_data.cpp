#include "app/report/report_data.h"

#include "core/agreement/agreement_run.h"
#include "core/project/project.h"
#include "core/project/saved_frames.h"
#include "core/project/subsample_draw.h"

#include <QCoreApplication>
#include <QDateTime>
#include <QHash>
#include <QJsonArray>
#include <QSet>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ReportDataText {
    Q_DECLARE_TR_FUNCTIONS(ReportDataText)
};

// The agree options shared by every analysis of the report.
QStringList commonArguments(const ReportOptions &options, bool bootstrap)
{
    QStringList args;
    if (options.phase)
        args << QStringLiteral("--phase") << phaseKey(*options.phase);
    if (!options.coders.isEmpty())
        args << QStringLiteral("--coders") << options.coders.join(QLatin1Char(','));
    if (options.includeUnfinished)
        args << QStringLiteral("--include-unfinished");
    if (bootstrap && options.bootstrapReplicates > 0)
        args << QStringLiteral("--bootstrap") << QString::number(options.bootstrapReplicates)
             << QStringLiteral("--seed") << QString::number(options.seed);
    return args;
}

// One table analysis of the run, as `fourfold-cli agree` computes it; with `diagnostics` also
// alpha without each coder and each article (`agree --diagnostics`). Fails with the run's error.
Status analyseInto(ReportAnalysis &analysis, const AgreementRun &run,
    const AnalysisRequest &request, const ReportOptions &options, bool diagnostics = false)
{
    AgreementOptions agreementOptions;
    agreementOptions.bootstrapReplicates = options.bootstrapReplicates;
    agreementOptions.seed = options.seed;
    auto analysed = run.analyse(request, agreementOptions);
    if (!analysed)
        return std::unexpected(analysed.error());
    if (diagnostics) {
        auto costs = leaveOneOutCosts(*analysed);
        if (!costs)
            return std::unexpected(costs.error());
        analysis.diagnostics = std::move(*costs);
    }
    analysis.agreement = std::move(analysed->report);
    return {};
}

// "The 9 articles were drawn as a simple random sample (seed 7) from 40 articles on 2026-…".
QString drawText(const Draw &draw)
{
    const QString how = draw.method == QLatin1String("stratified") && draw.stratify
        ? ReportDataText::tr("a sample stratified by %1").arg(stratumKey(*draw.stratify))
        : ReportDataText::tr("a simple random sample");
    return ReportDataText::tr(
        "The %1 articles of the %2 phase were drawn as %3 (seed %4) from a frame of %5 "
        "articles not yet assigned to training, pilot or reliability coding, on %6.")
        .arg(QString::number(draw.articles.size()), phaseKey(draw.phase), how,
            QString::number(draw.seed), QString::number(draw.frameArticles), draw.drawnAt.left(10));
}

QString functionLabel(const Codebook &book, FramingFunction f)
{
    const QString label = book.definition(f).label;
    return label.isEmpty() ? functionKey(f) : label;
}

} // namespace

const ReportAnalysis *ReportData::analysis(const QString &id) const
{
    for (const ReportAnalysis &a : analyses)
        if (a.id == id)
            return &a;
    return nullptr;
}

namespace {

// What `fourfold-cli agree --json` prints for `a` (without the "left_out" of the selection, which
// the report's JSON holds once).
QJsonObject agreeJson(const ReportAnalysis &a, const std::optional<SpanMatching> &matching)
{
    if (a.continuum)
        return continuumJson(*a.continuum);
    QJsonObject json = a.agreement ? agreementJson(*a.agreement) : QJsonObject {};
    if (a.diagnostics)
        json.insert(QStringLiteral("diagnostics"),
            diagnosticsJson(
                a.diagnostics->coders, a.diagnostics->articles, matching ? &*matching : nullptr));
    return json;
}

// The saved analysis in the report's JSON (null when there is none).
QJsonValue framesJson(
    const std::optional<SavedFrameAnalysis> &frames, const std::vector<ElementAlpha> &alphas)
{
    if (!frames)
        return QJsonValue(QJsonValue::Null);
    QJsonArray list;
    for (const SavedFrame &f : frames->frames)
        list.append(
            QJsonObject {{QStringLiteral("frame"), f.cluster + 1}, {QStringLiteral("name"), f.name},
                {QStringLiteral("size"), f.profile.value(QStringLiteral("size"))},
                {QStringLiteral("share"), f.profile.value(QStringLiteral("share"))}});
    QJsonArray elements;
    for (const ElementAlpha &a : alphas)
        elements.append(QJsonObject {{QStringLiteral("variable"), a.variable},
            {QStringLiteral("alpha"),
                a.alpha ? QJsonValue(*a.alpha) : QJsonValue(QJsonValue::Null)},
            {QStringLiteral("pairable_units"), a.pairableUnits}});
    return QJsonObject {{QStringLiteral("name"), frames->name},
        {QStringLiteral("created_at"), frames->createdAt},
        {QStringLiteral("settings"), frames->settings}, {QStringLiteral("frames"), list},
        {QStringLiteral("element_alpha"), elements}};
}

} // namespace

QJsonObject ReportData::toJson() const
{
    QJsonArray analysisArray;
    for (const ReportAnalysis &a : analyses) {
        QJsonObject o {{QStringLiteral("id"), a.id}, {QStringLiteral("label"), a.label},
            {QStringLiteral("kind"), a.kind},
            {QStringLiteral("agree_arguments"), QJsonArray::fromStringList(a.agreeArguments)}};
        if (a.error.isEmpty())
            o.insert(QStringLiteral("result"), agreeJson(a, matching));
        else
            o.insert(QStringLiteral("error"), a.error);
        analysisArray.append(o);
    }
    QJsonArray coderArray;
    for (const ReportCoder &c : coders) {
        QJsonObject perFunction;
        for (FramingFunction f : kFramingFunctions)
            perFunction.insert(functionKey(f), c.perFunction[size_t(f)]);
        coderArray.append(QJsonObject {{QStringLiteral("pseudonym"), c.pseudonym},
            {QStringLiteral("role"), c.role}, {QStringLiteral("articles"), c.articles},
            {QStringLiteral("shared_articles"), c.reliabilityArticles},
            {QStringLiteral("spans"), c.spans}, {QStringLiteral("spans_per_function"), perFunction},
            {QStringLiteral("answers"), c.answers}});
    }
    QJsonObject selection {{QStringLiteral("unit"), unitKindKey(options.unit)},
        {QStringLiteral("phase"),
            options.phase ? QJsonValue(phaseKey(*options.phase)) : QJsonValue(QJsonValue::Null)},
        {QStringLiteral("coders"), QJsonArray::fromStringList(options.coders)},
        {QStringLiteral("include_unfinished"), options.includeUnfinished},
        {QStringLiteral("left_out"), leftOutJson(leftOut)},
        {QStringLiteral("bootstrap"), options.bootstrapReplicates},
        {QStringLiteral("seed"), QString::number(options.seed)}};
    return QJsonObject {{QStringLiteral("format"), QStringLiteral("fourfold-reliability-report/1")},
        {QStringLiteral("title"), title}, {QStringLiteral("project"), projectName},
        {QStringLiteral("generated_at"), generatedAt}, {QStringLiteral("program"), program},
        {QStringLiteral("selection"), selection}, {QStringLiteral("analyses"), analysisArray},
        {QStringLiteral("coders"), coderArray},
        {QStringLiteral("sample"),
            QJsonObject {{QStringLiteral("project_articles"), projectArticles},
                {QStringLiteral("coded_articles"), codedArticles},
                {QStringLiteral("shared_articles"), sharedArticles},
                {QStringLiteral("all_coder_articles"), allCoderArticles},
                {QStringLiteral("draw"),
                    sampleDraw.isEmpty() ? QJsonValue(QJsonValue::Null) : QJsonValue(sampleDraw)},
                {QStringLiteral("draw_record"),
                    drawRecord.isEmpty() ? QJsonValue(QJsonValue::Null) : QJsonValue(drawRecord)},
                {QStringLiteral("training_articles"), trainingArticles},
                {QStringLiteral("pilot_articles"), pilotArticles}}},
        {QStringLiteral("gold"),
            QJsonObject {{QStringLiteral("spans"), goldSpans},
                {QStringLiteral("articles"), goldArticles},
                {QStringLiteral("with_rationale"), goldWithRationale},
                {QStringLiteral("answers"), goldAnswers},
                {QStringLiteral("answer_articles"), goldAnswerArticles},
                {QStringLiteral("answers_with_rationale"), goldAnswersWithRationale},
                {QStringLiteral("decided_by"), QJsonArray::fromStringList(goldDeciders)}}},
        {QStringLiteral("frames"), framesJson(frames, elementAlphas)},
        {QStringLiteral("codebook"),
            QJsonObject {{QStringLiteral("version"), codebookNumber},
                {QStringLiteral("name"), codebookName}, {QStringLiteral("codings"), codingsTotal},
                {QStringLiteral("codings_other_version"), codingsOtherVersion}}}};
}

Result<ReportData> gatherReportData(const Project &project, const ReportOptions &options)
{
    if (options.unit != UnitKind::Paragraph && options.unit != UnitKind::Sentence
        && options.unit != UnitKind::Token)
        return fail(ErrorCode::InvalidArgument,
            ReportDataText::tr("The report's unit must be paragraph, sentence or token."));
    ReportData d;
    d.options = options;
    d.projectName = project.settings().name;
    d.title = options.title.isEmpty() ? (d.projectName.isEmpty()
                      ? ReportDataText::tr("Reliability report")
                      : ReportDataText::tr("Reliability report: %1").arg(d.projectName))
                                      : options.title;
    d.generatedAt = QDateTime::currentDateTimeUtc().toString(Qt::ISODate);
    d.program = QStringLiteral("Fourfold %1").arg(QCoreApplication::applicationVersion());

    UnitSelection base;
    base.phase = options.phase;
    base.coders = options.coders;
    base.includeUnfinished = options.includeUnfinished;
    const QStringList common = commonArguments(options, true);
    // One read of the codings that count serves every analysis.
    auto run = AgreementRun::load(project, base);
    if (!run)
        return std::unexpected(run.error());
    const Codebook *book = &run->codebook();
    // Labels and questions in the report's language; the keys are the codebook's own.
    const Codebook texts = book->inLanguage(options.language);
    const CountedCodings *counted = &run->codings();
    d.codebookNumber = book->number;
    d.codebookName = texts.name;

    // Span matching looks at all four functions whatever the selection says: once for all.
    auto matching = run->matching();
    if (!matching)
        return std::unexpected(matching.error());
    d.matching = std::move(*matching);
    // The four functions, one binary variable each, then all four as one set-valued variable.
    for (FramingFunction f : kFramingFunctions) {
        ReportAnalysis a {QStringLiteral("function-%1").arg(functionKey(f)),
            functionLabel(texts, f), functionLabel(texts, f), QStringLiteral("function"),
            QStringList {QStringLiteral("--unit"), unitKindKey(options.unit),
                QStringLiteral("--function"), functionKey(f), QStringLiteral("--diagnostics")}
                + common,
            {}, {}, {}, {}};
        AnalysisRequest r;
        r.unit = options.unit;
        r.function = f;
        FOURFOLD_TRY_STATUS(analyseInto(a, *run, r, options, true));
        d.analyses.push_back(std::move(a));
    }
    {
        ReportAnalysis a {QStringLiteral("functions"),
            ReportDataText::tr("All four functions (MASI)"), ReportDataText::tr("All four (MASI)"),
            QStringLiteral("functions"),
            QStringList {QStringLiteral("--unit"), unitKindKey(options.unit)} + common, {}, {}, {},
            {}};
        AnalysisRequest r;
        r.unit = options.unit;
        FOURFOLD_TRY_STATUS(analyseInto(a, *run, r, options));
        d.analyses.push_back(std::move(a));
    }
    // Article-level items and the spans' choice attributes: their own errors do not stop the
    // report (an attribute nobody filled in has no units).
    for (const ArticleItem &item : texts.items) {
        ReportAnalysis a {QStringLiteral("item-%1").arg(item.key),
            item.question.isEmpty() ? item.key : item.question,
            QString(item.key).replace(QLatin1Char('_'), QLatin1Char(' ')), QStringLiteral("item"),
            QStringList {QStringLiteral("--unit"), QStringLiteral("article"),
                QStringLiteral("--item"), item.key}
                + common,
            {}, {}, {}, {}};
        AnalysisRequest r;
        r.unit = UnitKind::Article;
        r.item = item.key;
        if (Status done = analyseInto(a, *run, r, options); !done)
            a.error = done.error().message;
        d.analyses.push_back(std::move(a));
    }
    for (FramingFunction f : kFramingFunctions)
        for (const AttributeSpec &spec : texts.definition(f).attributes) {
            if (spec.type != AttributeSpec::Type::Choice)
                continue;
            ReportAnalysis a {QStringLiteral("attribute-%1-%2").arg(functionKey(f), spec.key),
                QStringLiteral("%1: %2").arg(
                    functionLabel(texts, f), spec.label.isEmpty() ? spec.key : spec.label),
                QStringLiteral("%1: %2").arg(functionKey(f), spec.key), QStringLiteral("attribute"),
                QStringList {QStringLiteral("--unit"), QStringLiteral("span"),
                    QStringLiteral("--function"), functionKey(f), QStringLiteral("--attribute"),
                    spec.key}
                    + common,
                {}, {}, {}, {}};
            AnalysisRequest r;
            r.unit = UnitKind::Span;
            r.function = f;
            r.attribute = spec.key;
            if (Status done = analyseInto(a, *run, r, options); !done)
                a.error = done.error().message;
            d.analyses.push_back(std::move(a));
        }
    {
        ReportAnalysis a {QStringLiteral("continuum"), ReportDataText::tr("Spans on the continuum"),
            ReportDataText::tr("continuum"), QStringLiteral("continuum"),
            QStringList {QStringLiteral("--unit"), QStringLiteral("continuum")}
                + commonArguments(options, false),
            {}, {}, {}, {}};
        auto continuum = run->continuum(std::nullopt);
        if (continuum)
            a.continuum = std::move(*continuum);
        else
            a.error = continuum.error().message;
        d.analyses.push_back(std::move(a));
    }

    // Who coded how much: the codings that count (the unitizers' rule), for the coders the
    // analyses used.
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    auto gold = project.goldAnnotations();
    if (!gold)
        return std::unexpected(gold.error());
    auto goldAnswers = project.goldJudgements();
    if (!goldAnswers)
        return std::unexpected(goldAnswers.error());
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    d.projectArticles = int(articles->size());
    d.leftOut = counted->leftOut;
    QHash<qint64, int> column; // coder id → index into d.coders
    QHash<qint64, QString> pseudonyms;
    for (const Coder &c : *coders)
        pseudonyms.insert(c.id.value, c.pseudonym);
    for (const Coder &c : counted->coders) {
        column.insert(c.id.value, int(d.coders.size()));
        d.coders.push_back({c.pseudonym, coderRoleKey(c.role), 0, 0, 0, {}, 0});
    }
    QHash<qint64, QSet<qint64>> codedBy; // article → coders
    QSet<qint64> trainingArticles, pilotArticles;
    for (const Assignment &a : *assignments) {
        if (a.phase == Phase::Training)
            trainingArticles.insert(a.article.value);
        if (a.phase == Phase::Pilot)
            pilotArticles.insert(a.article.value);
    }
    d.trainingArticles = int(trainingArticles.size());
    d.pilotArticles = int(pilotArticles.size());
    for (const auto &[article, coder] : counted->counted)
        codedBy[article].insert(coder);
    for (const Annotation &a : counted->annotations) {
        ReportCoder &c = d.coders[size_t(column.value(a.coder.value))];
        ++c.spans;
        ++c.perFunction[size_t(a.content.function)];
        ++d.codingsTotal;
        if (a.codebookVersion != book->versionId)
            ++d.codingsOtherVersion;
    }
    for (const Judgement &j : counted->judgements) {
        ++d.coders[size_t(column.value(j.coder.value))].answers;
        ++d.codingsTotal;
        if (j.codebookVersion != book->versionId)
            ++d.codingsOtherVersion;
    }
    for (auto it = codedBy.cbegin(); it != codedBy.cend(); ++it) {
        ++d.codedArticles;
        const bool shared = it.value().size() >= 2;
        d.sharedArticles += shared ? 1 : 0;
        d.allCoderArticles += it.value().size() == qsizetype(d.coders.size()) ? 1 : 0;
        for (qint64 coder : it.value()) {
            ReportCoder &c = d.coders[size_t(column.value(coder))];
            ++c.articles;
            c.reliabilityArticles += shared ? 1 : 0;
        }
    }
    QSet<qint64> goldArticles;
    QSet<QString> deciders;
    for (const GoldAnnotation &g : *gold) {
        if (!codedBy.contains(g.article.value))
            continue;
        ++d.goldSpans;
        goldArticles.insert(g.article.value);
        d.goldWithRationale += g.rationale.trimmed().isEmpty() ? 0 : 1;
        deciders.insert(pseudonyms.value(g.decidedBy.value));
    }
    d.goldArticles = int(goldArticles.size());
    QSet<qint64> goldAnswerArticles;
    for (const GoldJudgement &g : *goldAnswers) {
        if (!codedBy.contains(g.article.value))
            continue;
        ++d.goldAnswers;
        goldAnswerArticles.insert(g.article.value);
        d.goldAnswersWithRationale += g.rationale.trimmed().isEmpty() ? 0 : 1;
        deciders.insert(pseudonyms.value(g.decidedBy.value));
    }
    d.goldAnswerArticles = int(goldAnswerArticles.size());
    if (!options.phase || *options.phase == Phase::Reliability) {
        auto draw = SubsampleDraw::recorded(project, Phase::Reliability);
        if (!draw)
            return std::unexpected(draw.error());
        if (*draw) {
            d.sampleDraw = drawText(**draw);
            d.drawRecord = SubsampleDraw::toJson(**draw);
        }
    }
    d.goldDeciders = QStringList(deciders.begin(), deciders.end());
    d.goldDeciders.sort();
    // Frames: the newest saved analysis, and how reliable its element variables are.
    auto saved = SavedFrames::list(project);
    if (!saved)
        return std::unexpected(saved.error());
    if (!saved->empty()) {
        d.frames = saved->back();
        QStringList pseudonymsCoded;
        for (const ReportCoder &c : d.coders)
            pseudonymsCoded << c.pseudonym;
        auto alphas = elementAlphas(project, pseudonymsCoded);
        if (!alphas)
            return std::unexpected(alphas.error());
        d.elementAlphas = std::move(*alphas);
    }
    return d;
}

} // namespace fourfold
