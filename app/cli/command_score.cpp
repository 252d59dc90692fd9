// score: an extractor run against the gold standard or one coder (precision, recall, F1 per
// function, micro and macro, with article bootstrap intervals), and the run taken as one more
// coder beside the humans' pairwise alpha.

#include "app/cli/cli_output.h"
#include "core/agreement/agreement_report.h"
#include "core/project/project.h"
#include "core/scoring/run_agreement.h"
#include "core/scoring/run_scores.h"

#include <QCoreApplication>
#include <QJsonArray>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

QJsonValue number(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

QString fixed(const std::optional<double> &v, int digits = 3)
{
    return v ? QString::number(*v, 'f', digits) : QStringLiteral("–");
}

QJsonObject intervalJson(const Interval &i)
{
    return QJsonObject {
        {QStringLiteral("low"), number(i.low)}, {QStringLiteral("high"), number(i.high)}};
}

QJsonObject countsJson(const reliability::SpanCounts &c, const FigureIntervals *intervals)
{
    QJsonObject o {{QStringLiteral("cor"), c.correct}, {QStringLiteral("inc"), c.incorrect},
        {QStringLiteral("par"), c.partial}, {QStringLiteral("mis"), c.missing},
        {QStringLiteral("spu"), c.spurious}, {QStringLiteral("pos"), c.possible()},
        {QStringLiteral("act"), c.actual()}, {QStringLiteral("precision"), number(c.precision)},
        {QStringLiteral("recall"), number(c.recall)}, {QStringLiteral("f1"), number(c.f1)}};
    if (intervals) {
        o.insert(QStringLiteral("precision_ci"), intervalJson(intervals->precision));
        o.insert(QStringLiteral("recall_ci"), intervalJson(intervals->recall));
        o.insert(QStringLiteral("f1_ci"), intervalJson(intervals->f1));
    }
    return o;
}

QJsonObject agreementJsonOf(const RunAgreement &a)
{
    QJsonObject perFunction;
    for (const FunctionBand &b : a.functions) {
        QJsonArray humans, run;
        for (const PairAlpha &p : b.humanPairs)
            humans.append(QJsonObject {{QStringLiteral("coders"), QJsonArray {p.first, p.second}},
                {QStringLiteral("alpha"), number(p.alpha)}});
        for (const PairAlpha &p : b.runPairs)
            run.append(QJsonObject {
                {QStringLiteral("coder"), p.first}, {QStringLiteral("alpha"), number(p.alpha)}});
        perFunction.insert(functionKey(b.function),
            QJsonObject {{QStringLiteral("human_pairs"), humans},
                {QStringLiteral("run_with_humans"), run},
                {QStringLiteral("human_band"),
                    QJsonObject {{QStringLiteral("low"), number(b.bandLow)},
                        {QStringLiteral("high"), number(b.bandHigh)}}},
                {QStringLiteral("run_mean"), number(b.runMean)},
                {QStringLiteral("humans_alpha"), number(b.humansAlpha)},
                {QStringLiteral("humans_with_run_alpha"), number(b.humansWithRunAlpha)},
                {QStringLiteral("position"), b.position}});
    }
    return QJsonObject {{QStringLiteral("unit"), unitKindKey(a.unit)},
        {QStringLiteral("units"), a.units},
        {QStringLiteral("coders"), QJsonArray::fromStringList(a.coders)},
        {QStringLiteral("per_function"), perFunction}};
}

QString countsLine(const QString &name, const reliability::SpanCounts &c, const Interval *f1ci)
{
    QString line = QStringLiteral("  %1 %2 %3 %4 %5 %6 %7 %8  %9 %10 %11")
                       .arg(name, -11)
                       .arg(c.possible(), 4)
                       .arg(c.actual(), 4)
                       .arg(c.correct, 4)
                       .arg(c.incorrect, 4)
                       .arg(c.partial, 4)
                       .arg(c.missing, 4)
                       .arg(c.spurious, 4)
                       .arg(fixed(c.precision), 6)
                       .arg(fixed(c.recall), 6)
                       .arg(fixed(c.f1), 6);
    if (f1ci && f1ci->low)
        line += QStringLiteral("  [%1, %2]").arg(fixed(f1ci->low), fixed(f1ci->high));
    return line;
}

} // namespace

int runScore(const QStringList &arguments)
{
    const QString command = QStringLiteral("score");
    QCommandLineParser parser;
    const QCommandLineOption run(QStringLiteral("run"),
        CliText::tr("The extractor run to score (its name)."), QStringLiteral("NAME"));
    const QCommandLineOption against(QStringLiteral("against"),
        CliText::tr("The reference: gold (default) or a coder's pseudonym."),
        QStringLiteral("gold|CODER"), QStringLiteral("gold"));
    const QCommandLineOption match(QStringLiteral("match"),
        CliText::tr("Span matching (SemEval-2013 Task 9.1): strict (same boundaries and function, "
                    "default), exact (same boundaries), partial (overlap counts half), type (same "
                    "function, any overlap)."),
        QStringLiteral("MODE"), QStringLiteral("strict"));
    const QCommandLineOption bootstrap(QStringLiteral("bootstrap"),
        CliText::tr(
            "Bootstrap replicates over articles for the 95% intervals (default 1000; 0 = none)."),
        QStringLiteral("N"), QStringLiteral("1000"));
    const QCommandLineOption seed(QStringLiteral("seed"),
        CliText::tr("Seed of the bootstrap (default 1)."), QStringLiteral("S"),
        QStringLiteral("1"));
    const QCommandLineOption unit(QStringLiteral("unit"),
        CliText::tr(
            "Units on which the run joins the humans for alpha: paragraph, sentence (default) or "
            "token."),
        QStringLiteral("UNIT"), QStringLiteral("sentence"));
    const QCommandLineOption coders(QStringLiteral("coders"),
        CliText::tr("The human coders for alpha (default: everyone who coded)."),
        QStringLiteral("A,B,..."));
    const QCommandLineOption json(
        QStringLiteral("json"), CliText::tr("Print the figures as JSON."));
    parser.addOptions({run, against, match, bootstrap, seed, unit, coders, json});
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "Scores an extractor run against the gold standard or one coder: precision, "
                "recall and F1 per function, micro and macro, with bootstrap intervals over "
                "articles; and the run's alpha with the humans beside their pairwise range."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(command, CliText::tr("expected one project file."));
    if (!parser.isSet(run) || parser.value(run).isEmpty())
        return usageError(command, CliText::tr("say which run to score: --run NAME."));
    const auto mode = matchModeFromKey(parser.value(match));
    if (!mode)
        return usageError(command,
            CliText::tr("unknown match mode \"%1\" (expected strict, exact, partial or type).")
                .arg(parser.value(match)));
    ScoreOptions options;
    options.mode = *mode;
    bool ok = false;
    options.bootstrapReplicates = parser.value(bootstrap).toInt(&ok);
    if (!ok || options.bootstrapReplicates < 0 || options.bootstrapReplicates > 1000000)
        return usageError(
            command, CliText::tr("--bootstrap expects a number of replicates from 0 to 1000000."));
    options.seed = parser.value(seed).toULongLong(&ok);
    if (!ok)
        return usageError(command, CliText::tr("--seed expects a non-negative whole number."));
    RunAgreementOptions agreementOptions;
    const auto unitKind = unitKindFromKey(parser.value(unit));
    if (!unitKind
        || (*unitKind != UnitKind::Paragraph && *unitKind != UnitKind::Sentence
            && *unitKind != UnitKind::Token))
        return usageError(command,
            CliText::tr("unknown unit \"%1\" (expected paragraph, sentence or token).")
                .arg(parser.value(unit)));
    agreementOptions.unit = *unitKind;
    if (parser.isSet(coders))
        agreementOptions.coders = parser.value(coders).split(QLatin1Char(','), Qt::SkipEmptyParts);
    const QString againstText = parser.value(against);
    const LayerSpec reference = againstText == QLatin1String("gold")
        ? LayerSpec {LayerKind::Gold, {}}
        : LayerSpec {LayerKind::Coder, againstText};

    auto project = Project::open(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto scores = scoreRun(*project, parser.value(run), reference, options);
    if (!scores)
        return report(scores.error());
    // The band needs two humans; without them the scores still stand and the reason is shown.
    auto band = runAgreement(*project, parser.value(run), agreementOptions);

    if (parser.isSet(json)) {
        QJsonObject perFunction;
        for (FramingFunction f : kFramingFunctions)
            perFunction.insert(functionKey(f),
                countsJson(scores->perFunction[std::size_t(f)],
                    scores->replicates ? &scores->perFunctionIntervals[std::size_t(f)] : nullptr));
        QJsonObject macro {{QStringLiteral("precision"), number(scores->macroPrecision)},
            {QStringLiteral("recall"), number(scores->macroRecall)},
            {QStringLiteral("f1"), number(scores->macroF1)}};
        if (scores->replicates) {
            macro.insert(
                QStringLiteral("precision_ci"), intervalJson(scores->macroIntervals.precision));
            macro.insert(QStringLiteral("recall_ci"), intervalJson(scores->macroIntervals.recall));
            macro.insert(QStringLiteral("f1_ci"), intervalJson(scores->macroIntervals.f1));
        }
        QJsonArray perArticle;
        for (const ArticleCounts &a : scores->perArticle) {
            QJsonObject counts;
            for (FramingFunction f : kFramingFunctions)
                counts.insert(functionKey(f), countsJson(a.perFunction[std::size_t(f)], nullptr));
            perArticle.append(QJsonObject {{QStringLiteral("article"), a.externalId},
                {QStringLiteral("per_function"), counts}});
        }
        QJsonObject o {{QStringLiteral("run"), scores->run},
            {QStringLiteral("against"),
                scores->against.kind == LayerKind::Gold ? QStringLiteral("gold")
                                                        : scores->against.name},
            {QStringLiteral("match"), matchModeKey(scores->mode)},
            {QStringLiteral("articles"), scores->articles},
            {QStringLiteral("bootstrap"),
                QJsonObject {{QStringLiteral("replicates"), scores->replicates},
                    {QStringLiteral("seed"), QString::number(scores->seed)},
                    {QStringLiteral("resampling"), QStringLiteral("articles")},
                    {QStringLiteral("interval"), QStringLiteral("percentile 95%")}}},
            {QStringLiteral("per_function"), perFunction},
            {QStringLiteral("micro"),
                countsJson(scores->micro, scores->replicates ? &scores->microIntervals : nullptr)},
            {QStringLiteral("macro"), macro}, {QStringLiteral("per_article"), perArticle}};
        if (band)
            o.insert(QStringLiteral("agreement_with_humans"), agreementJsonOf(*band));
        else
            o.insert(QStringLiteral("agreement_with_humans"),
                QJsonObject {{QStringLiteral("error"), band.error().message}});
        printJson(o);
        return ExitOk;
    }

    out(CliText::tr("Run %1 against %2, %3 matching, %4 articles")
            .arg(scores->run,
                scores->against.kind == LayerKind::Gold ? CliText::tr("gold")
                                                        : scores->against.name,
                matchModeKey(scores->mode))
            .arg(scores->articles));
    out(QStringLiteral("  %1 %2 %3 %4 %5 %6 %7 %8  %9 %10 %11%12")
            .arg(CliText::tr("function"), -11)
            .arg(QStringLiteral("POS"), 4)
            .arg(QStringLiteral("ACT"), 4)
            .arg(QStringLiteral("COR"), 4)
            .arg(QStringLiteral("INC"), 4)
            .arg(QStringLiteral("PAR"), 4)
            .arg(QStringLiteral("MIS"), 4)
            .arg(QStringLiteral("SPU"), 4)
            .arg(QStringLiteral("P"), 6)
            .arg(QStringLiteral("R"), 6)
            .arg(QStringLiteral("F1"), 6)
            .arg(scores->replicates ? CliText::tr("  F1 95% interval (articles resampled)")
                                    : QString()));
    for (FramingFunction f : kFramingFunctions)
        out(countsLine(functionKey(f), scores->perFunction[std::size_t(f)],
            scores->replicates ? &scores->perFunctionIntervals[std::size_t(f)].f1 : nullptr));
    out(countsLine(CliText::tr("micro"), scores->micro,
        scores->replicates ? &scores->microIntervals.f1 : nullptr));
    QString macro = QStringLiteral("  %1 %2  %3 %4 %5")
                        .arg(CliText::tr("macro"), -11)
                        .arg(QString(), 34)
                        .arg(fixed(scores->macroPrecision), 6)
                        .arg(fixed(scores->macroRecall), 6)
                        .arg(fixed(scores->macroF1), 6);
    if (scores->replicates && scores->macroIntervals.f1.low)
        macro +=
            QStringLiteral("  [%1, %2]")
                .arg(fixed(scores->macroIntervals.f1.low), fixed(scores->macroIntervals.f1.high));
    out(macro);
    if (scores->replicates)
        out(CliText::tr(
            "Intervals: %1 bootstrap replicates over articles, seed %2, percentile method.")
                .arg(scores->replicates)
                .arg(scores->seed));
    out(QString());
    if (!band) {
        out(CliText::tr("Alpha with the humans: not available (%1)").arg(band.error().message));
        return ExitOk;
    }
    out(CliText::tr("Alpha with the humans (%1 units present/absent, nominal; humans: %2)")
            .arg(unitKindKey(band->unit), band->coders.join(QStringLiteral(", "))));
    out(QStringLiteral("  %1 %2 %3 %4  %5")
            .arg(CliText::tr("function"), -11)
            .arg(CliText::tr("human band"), 16)
            .arg(CliText::tr("run (mean)"), 10)
            .arg(CliText::tr("all+run"), 8)
            .arg(CliText::tr("position")));
    for (const FunctionBand &b : band->functions)
        out(QStringLiteral("  %1 %2 %3 %4  %5")
                .arg(functionKey(b.function), -11)
                .arg(QStringLiteral("%1 – %2").arg(fixed(b.bandLow), fixed(b.bandHigh)), 16)
                .arg(fixed(b.runMean), 10)
                .arg(fixed(b.humansWithRunAlpha), 8)
                .arg(b.position));
    return ExitOk;
}

} // namespace fourfold::cli
