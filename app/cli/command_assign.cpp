// fourfold-cli assign: assignments per phase, the reliability subsample draw, the rest of the
// articles, training feedback, the progress board and the effort setting (issue 7).

#include "app/cli/cli_output.h"
#include "core/project/assignment_plans.h"
#include "core/project/coder_copies.h"
#include "core/project/project.h"
#include "core/project/study_progress.h"
#include "core/project/subsample_draw.h"
#include "core/project/training_feedback.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QRandomGenerator>

#include <map>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

const QString kCommand = QStringLiteral("assign");

QStringList splitList(const QString &value)
{
    QStringList out;
    for (const QString &part : value.split(QLatin1Char(','), Qt::SkipEmptyParts))
        if (!part.trimmed().isEmpty())
            out << part.trimmed();
    return out;
}

QJsonObject planJson(const AssignmentPlan &plan)
{
    QJsonArray rows;
    for (const PlannedAssignment &r : plan.rows)
        rows.append(QJsonObject {{QStringLiteral("article"), r.article},
            {QStringLiteral("coder"), r.coder}, {QStringLiteral("phase"), phaseKey(r.phase)}});
    return QJsonObject {{QStringLiteral("assignments"), rows}};
}

// One line per article: "  hb-01  C01, C02".
void printPlan(const AssignmentPlan &plan)
{
    std::map<QString, QStringList> byArticle;
    for (const PlannedAssignment &r : plan.rows)
        byArticle[phaseKey(r.phase) + QLatin1Char('\t') + r.article] << r.coder;
    for (const auto &[key, coders] : byArticle) {
        const QStringList parts = key.split(QLatin1Char('\t'));
        out(QStringLiteral("  %1  %2  %3")
                .arg(parts[0], -11)
                .arg(parts[1], -12)
                .arg(coders.join(QStringLiteral(", "))));
    }
}

void printDraw(const Draw &d)
{
    out(CliText::tr(
        "%1 subsample: %2%3, seed %4; %5 of %6 articles in the sampling frame; coders %7")
            .arg(phaseKey(d.phase), d.method,
                d.stratify ? CliText::tr(" by %1").arg(stratumKey(*d.stratify)) : QString())
            .arg(d.seed)
            .arg(d.articles.size())
            .arg(d.frameArticles)
            .arg(d.coders.join(QStringLiteral(", "))));
    if (d.nearCopiesLeftOut)
        out(CliText::tr("  near copies left out of the sampling frame"));
    if (!d.drawnAt.isEmpty())
        out(CliText::tr("  drawn at %1").arg(d.drawnAt));
    for (const DrawStratum &s : d.strata)
        out(CliText::tr("  stratum %1: %2 of %3")
                .arg(s.key)
                .arg(s.drawnArticles)
                .arg(s.frameArticles));
    out(CliText::tr("  articles: %1").arg(d.articles.join(QStringLiteral(", "))));
    const SampleAdvice &a = d.advice;
    if (a.minimumValues > 0)
        out(CliText::tr(
            "  Krippendorff's minimum for alpha_min %1 at p = %2 with the rarest value at %3: "
            "%4 values")
                .arg(a.alphaMin, 0, 'f', 3)
                .arg(a.significance)
                .arg(a.rarestProportion)
                .arg(a.minimumValues));
    else
        out(CliText::tr("  Krippendorff's minimum: not defined for these arguments"));
    out(CliText::tr(
        "  this draw delivers %1 article values, %2 paragraph values, %3 sentence values "
        "(units × coders)")
            .arg(a.articleValues)
            .arg(a.paragraphValues)
            .arg(a.sentenceValues));
    out(a.sufficientUnits.isEmpty() ? CliText::tr(
            "  enough for: none of these units; draw more articles or expect a wider interval")
                                    : CliText::tr("  enough for: %1 units")
                                          .arg(a.sufficientUnits.join(QStringLiteral(", "))));
}

QString optionalNumber(const std::optional<double> &v, int decimals = 3)
{
    return v ? QString::number(*v, 'f', decimals) : QStringLiteral("—");
}

int runShow(Project &project, std::optional<Phase> phase, bool json)
{
    auto rows = AssignmentPlans::rows(project, phase);
    if (!rows)
        return report(rows.error());
    std::vector<Draw> draws;
    for (Phase p : {Phase::Pilot, Phase::Reliability}) {
        if (phase && *phase != p)
            continue;
        auto d = SubsampleDraw::recorded(project, p);
        if (!d)
            return report(d.error());
        if (*d)
            draws.push_back(**d);
    }
    if (json) {
        QJsonArray list;
        for (const AssignmentRow &r : *rows)
            list.append(QJsonObject {{QStringLiteral("article"), r.article},
                {QStringLiteral("coder"), r.coder}, {QStringLiteral("phase"), phaseKey(r.phase)},
                {QStringLiteral("status"), r.status}});
        QJsonArray drawList;
        for (const Draw &d : draws)
            drawList.append(SubsampleDraw::toJson(d));
        printJson(QJsonObject {
            {QStringLiteral("assignments"), list}, {QStringLiteral("draws"), drawList}});
        return ExitOk;
    }
    out(CliText::tr("Assignments: %1").arg(rows->size()));
    std::map<QString, QStringList> byArticle;
    for (const AssignmentRow &r : *rows) {
        const QString key = QStringLiteral("%1\t%2").arg(int(r.phase)).arg(r.article);
        byArticle[key] << (r.status == QStringLiteral("assigned")
                ? r.coder
                : QStringLiteral("%1 (%2)").arg(r.coder, r.status));
    }
    for (const auto &[key, coders] : byArticle) {
        const QStringList parts = key.split(QLatin1Char('\t'));
        out(QStringLiteral("  %1  %2  %3")
                .arg(phaseKey(Phase(parts[0].toInt())), -11)
                .arg(parts[1], -12)
                .arg(coders.join(QStringLiteral(", "))));
    }
    for (const Draw &d : draws) {
        out(QString());
        printDraw(d);
    }
    return ExitOk;
}

int runProgress(Project &project, std::optional<Phase> phase, bool json)
{
    auto board = StudyProgress::board(project, phase);
    if (!board)
        return report(board.error());
    if (json) {
        printJson(StudyProgress::boardJson(*board));
        return ExitOk;
    }
    out(CliText::tr("%1  %2  %3  %4  %5  %6  %7")
            .arg(CliText::tr("phase"), -11)
            .arg(CliText::tr("coder"), -6)
            .arg(CliText::tr("assigned"), 8)
            .arg(CliText::tr("started"), 7)
            .arg(CliText::tr("done"), 5)
            .arg(CliText::tr("alpha"), 6)
            .arg(board->effortPerCoder ? CliText::tr("active") : QString()));
    for (const ProgressRow &r : board->rows)
        out(QStringLiteral("%1  %2  %3  %4  %5  %6  %7")
                .arg(phaseKey(r.phase), -11)
                .arg(r.coder, -6)
                .arg(r.assigned, 8)
                .arg(r.started, 7)
                .arg(r.done, 5)
                .arg(optionalNumber(r.agreement), 6)
                .arg(r.activeSeconds
                        ? CliText::tr("%1 min").arg(double(*r.activeSeconds) / 60.0, 0, 'f', 1)
                        : QString()));
    out(QString());
    out(board->effortPerCoder
            ? CliText::tr("Effort (active time; idle time not counted):")
            : CliText::tr("Effort in aggregate (active time per coder is off; see --effort):"));
    for (const PhaseEffort &e : board->effort)
        out(CliText::tr("  %1  %2 articles done, %3 min active, %4 min per done article")
                .arg(phaseKey(e.phase), -11)
                .arg(e.doneArticles)
                .arg(double(e.activeSeconds) / 60.0, 0, 'f', 1)
                .arg(e.meanSecondsPerDoneArticle
                        ? QString::number(*e.meanSecondsPerDoneArticle / 60.0, 'f', 1)
                        : QStringLiteral("—")));
    out(CliText::tr(
        "alpha: Krippendorff's alpha (nominal) on present/absent per sentence and function, "
        "against the lead's master coding in training, else the mean over the coder's "
        "partners; finished articles only."));
    return ExitOk;
}

int runTraining(Project &project, const TrainingRequest &request, bool json)
{
    auto fb = Training::feedback(project, request);
    if (!fb)
        return report(fb.error());
    if (json) {
        printJson(Training::feedbackJson(*fb));
        return ExitOk;
    }
    out(CliText::tr("Training feedback for %1 against the master coding of %2 (%3 units)")
            .arg(fb->coder, fb->master, unitKindKey(fb->unit)));
    out(CliText::tr("Finished training articles compared: %1; still open: %2")
            .arg(fb->articles.isEmpty() ? CliText::tr("none")
                                        : fb->articles.join(QStringLiteral(", ")))
            .arg(fb->openArticles));
    out(CliText::tr("%1  %2  %3  %4  %5")
            .arg(CliText::tr("function"), -10)
            .arg(CliText::tr("units"), 6)
            .arg(CliText::tr("agree %"), 8)
            .arg(CliText::tr("alpha"), 6)
            .arg(CliText::tr("marked (you / master)")));
    for (const FunctionAgreement &f : fb->functions)
        out(QStringLiteral("%1  %2  %3  %4  %5 / %6")
                .arg(functionKey(f.function), -10)
                .arg(f.units, 6)
                .arg(f.units > 0 ? QString::number(100.0 * f.percentAgreement, 'f', 1)
                                 : QStringLiteral("—"),
                    8)
                .arg(optionalNumber(f.alpha), 6)
                .arg(f.coderUnits)
                .arg(f.masterUnits));
    out(fb->trainingComplete
            ? CliText::tr("Training complete: the coder can move on to the real work.")
            : CliText::tr("Training not complete yet."));
    return ExitOk;
}

} // namespace

int runAssign(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption draw(QStringLiteral("draw"),
        CliText::tr(
            "Draw the subsample of this phase (reliability or pilot) that every --coders codes."),
        QStringLiteral("PHASE"));
    const QCommandLineOption withdrawDraw(QStringLiteral("withdraw-draw"),
        CliText::tr("Withdraw the committed subsample of this phase (reliability or pilot) while "
                    "nobody has coded any of its assignments yet."),
        QStringLiteral("PHASE"));
    const QCommandLineOption size(QStringLiteral("size"),
        CliText::tr("With --draw: the number of articles."), QStringLiteral("N"));
    const QCommandLineOption fraction(QStringLiteral("fraction"),
        CliText::tr("With --draw: the share of the sampling frame (0 < F <= 1, rounded up)."),
        QStringLiteral("F"));
    const QCommandLineOption stratify(QStringLiteral("stratify"),
        CliText::tr(
            "With --draw: draw proportionally within outlet, language or topic (metadata key "
            "\"topic\")."),
        QStringLiteral("KEY"));
    const QCommandLineOption leaveOutNearCopies(QStringLiteral("leave-out-near-copies"),
        CliText::tr("With --draw: leave articles found to be near copies of older ones at import "
                    "out of the sampling frame."));
    const QCommandLineOption seed(QStringLiteral("seed"),
        CliText::tr("Seed of the draw or of dealing the rest (default: a random seed, printed and "
                    "recorded)."),
        QStringLiteral("S"));
    const QCommandLineOption alphaMin(QStringLiteral("alpha-min"),
        CliText::tr(
            "With --draw: the smallest acceptable alpha for the sample-size advice (default "
            "0.8)."),
        QStringLiteral("A"), QStringLiteral("0.8"));
    const QCommandLineOption rarest(QStringLiteral("rarest"),
        CliText::tr("With --draw: the expected share of the rarest value (default 0.25)."),
        QStringLiteral("P"), QStringLiteral("0.25"));
    const QCommandLineOption rest(QStringLiteral("rest"),
        CliText::tr(
            "Deal every article without any assignment to --coders for production: single or "
            "double coding."),
        QStringLiteral("MODE"));
    const QCommandLineOption phase(QStringLiteral("phase"),
        CliText::tr(
            "With --articles: assign in this phase (training, pilot, reliability, production); "
            "with --show or --progress: only this phase."),
        QStringLiteral("PHASE"));
    const QCommandLineOption articles(QStringLiteral("articles"),
        CliText::tr("Assign these articles (ids) to every one of --coders in --phase."),
        QStringLiteral("ID,..."));
    const QCommandLineOption coders(QStringLiteral("coders"),
        CliText::tr("The coders' pseudonyms."), QStringLiteral("C01,C02,..."));
    const QCommandLineOption dryRun(QStringLiteral("dry-run"),
        CliText::tr("With --draw, --rest or --articles: show the plan, write nothing."));
    const QCommandLineOption show(QStringLiteral("show"),
        CliText::tr("Show the assignments and the draws with their advice."));
    const QCommandLineOption progress(QStringLiteral("progress"),
        CliText::tr("Show per coder and phase the articles done, agreement so far and effort."));
    const QCommandLineOption training(QStringLiteral("training"),
        CliText::tr(
            "Show this coder's agreement with the master coding on finished training articles."),
        QStringLiteral("CODER"));
    const QCommandLineOption master(QStringLiteral("master"),
        CliText::tr(
            "With --training: the lead whose training coding is the master (default: the one lead "
            "who coded training articles)."),
        QStringLiteral("LEAD"));
    const QCommandLineOption unit(QStringLiteral("unit"),
        CliText::tr("With --training: paragraph, sentence (default) or token."),
        QStringLiteral("UNIT"), QStringLiteral("sentence"));
    const QCommandLineOption effort(QStringLiteral("effort"),
        CliText::tr("Show active time per coder (on) or only in aggregate (off, the default)."),
        QStringLiteral("on|off"));
    const QCommandLineOption json(QStringLiteral("json"), CliText::tr("Print the result as JSON."));
    parser.addOptions({draw, withdrawDraw, size, fraction, stratify, leaveOutNearCopies, seed,
        alphaMin, rarest, rest, phase, articles, coders, dryRun, show, progress, training, master,
        unit, effort, json});
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    if (int rc = parseCommandLine(parser, kCommand,
            CliText::tr(
                "Assign articles to coders per phase (training, pilot, reliability, production), "
                "draw the reliability subsample with a recorded seed, and follow progress. Give "
                "one of --draw, --withdraw-draw, --rest, --articles, --show, --progress, "
                "--training, --effort."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(kCommand, CliText::tr("expected exactly one project file."));

    int actions = 0;
    for (const QCommandLineOption *o :
        {&draw, &withdrawDraw, &rest, &articles, &show, &progress, &training, &effort})
        actions += parser.isSet(*o) ? 1 : 0;
    if (actions != 1)
        return usageError(kCommand,
            CliText::tr("give exactly one of --draw, --withdraw-draw, --rest, --articles, --show, "
                        "--progress, --training, --effort."));

    std::optional<Phase> phaseFilter;
    if (parser.isSet(phase)) {
        phaseFilter = phaseFromKey(parser.value(phase));
        if (!phaseFilter)
            return usageError(
                kCommand, CliText::tr("unknown phase \"%1\".").arg(parser.value(phase)));
    }
    std::uint64_t seedValue = 0;
    bool seedGiven = parser.isSet(seed);
    if (seedGiven) {
        bool ok = false;
        seedValue = parser.value(seed).toULongLong(&ok);
        if (!ok)
            return usageError(kCommand,
                CliText::tr("the seed \"%1\" is not a whole number from 0 to 18446744073709551615.")
                    .arg(parser.value(seed)));
    } else {
        // Kept below 2^53 so that it survives any JSON reader.
        seedValue = QRandomGenerator::system()->generate64() >> 11;
    }
    const QStringList coderList = splitList(parser.value(coders));
    const bool asJson = parser.isSet(json);

    // Check the whole command line before opening (and so before changing) the project.
    DrawRequest drawRequest;
    RestRequest restRequest;
    TrainingRequest trainingRequest;
    if (parser.isSet(draw)) {
        const auto p = phaseFromKey(parser.value(draw));
        if (!p)
            return usageError(
                kCommand, CliText::tr("unknown phase \"%1\".").arg(parser.value(draw)));
        drawRequest.phase = *p;
        if (parser.isSet(size) == parser.isSet(fraction))
            return usageError(kCommand,
                parser.isSet(size) ? CliText::tr("give --size or --fraction, not both.")
                                   : CliText::tr("--draw needs --size or --fraction."));
        bool ok = true;
        if (parser.isSet(size)) {
            const int n = parser.value(size).toInt(&ok);
            if (!ok || n < 1)
                return usageError(kCommand,
                    CliText::tr(
                        "--size must be a whole number of articles, at least 1; \"%1\" given.")
                        .arg(parser.value(size)));
            drawRequest.size = n;
        } else {
            const double f = parser.value(fraction).toDouble(&ok);
            if (!ok || !(f > 0.0 && f <= 1.0))
                return usageError(kCommand,
                    CliText::tr("--fraction must be a number above 0 and at most 1; \"%1\" given.")
                        .arg(parser.value(fraction)));
            drawRequest.fraction = f;
        }
        if (parser.isSet(stratify)) {
            drawRequest.stratify = stratumFromKey(parser.value(stratify));
            if (!drawRequest.stratify)
                return usageError(kCommand,
                    CliText::tr("--stratify takes outlet, language or topic, not \"%1\".")
                        .arg(parser.value(stratify)));
        }
        drawRequest.alphaMin = parser.value(alphaMin).toDouble(&ok);
        if (!ok || !(drawRequest.alphaMin > 0.0 && drawRequest.alphaMin < 1.0))
            return usageError(kCommand,
                CliText::tr("--alpha-min must lie between 0 and 1; \"%1\" given.")
                    .arg(parser.value(alphaMin)));
        drawRequest.rarestProportion = parser.value(rarest).toDouble(&ok);
        if (!ok || !(drawRequest.rarestProportion > 0.0 && drawRequest.rarestProportion <= 0.5))
            return usageError(kCommand,
                CliText::tr("--rarest must lie above 0 and at most 0.5; \"%1\" given.")
                    .arg(parser.value(rarest)));
        drawRequest.seed = seedValue;
        drawRequest.coders = coderList;
        drawRequest.leaveOutNearCopies = parser.isSet(leaveOutNearCopies);
    } else if (parser.isSet(rest)) {
        const QString mode = parser.value(rest);
        if (mode == QStringLiteral("single"))
            restRequest.coding = RestCoding::Single;
        else if (mode == QStringLiteral("double"))
            restRequest.coding = RestCoding::Double;
        else
            return usageError(
                kCommand, CliText::tr("--rest takes single or double, not \"%1\".").arg(mode));
        restRequest.coders = coderList;
        restRequest.seed = seedValue;
    } else if (parser.isSet(articles)) {
        if (!phaseFilter)
            return usageError(kCommand, CliText::tr("--articles needs --phase."));
        if (coderList.isEmpty())
            return usageError(kCommand, CliText::tr("--articles needs --coders."));
    } else if (parser.isSet(training)) {
        trainingRequest.coder = parser.value(training);
        trainingRequest.master = parser.value(master);
        const auto u = unitKindFromKey(parser.value(unit));
        if (!u)
            return usageError(
                kCommand, CliText::tr("unknown unit \"%1\".").arg(parser.value(unit)));
        trainingRequest.unit = *u;
    } else if (parser.isSet(effort)) {
        const QString v = parser.value(effort);
        if (v != QStringLiteral("on") && v != QStringLiteral("off"))
            return usageError(
                kCommand, CliText::tr("--effort takes on or off, not \"%1\".").arg(v));
    }
    if ((parser.isSet(draw) || parser.isSet(rest)) && coderList.isEmpty())
        return usageError(kCommand, CliText::tr("name the coders with --coders."));

    std::optional<Phase> withdrawnPhase;
    if (parser.isSet(withdrawDraw)) {
        withdrawnPhase = phaseFromKey(parser.value(withdrawDraw));
        if (!withdrawnPhase)
            return usageError(
                kCommand, CliText::tr("unknown phase \"%1\".").arg(parser.value(withdrawDraw)));
    }

    auto project = Project::open(parser.positionalArguments().first());
    if (!project)
        return report(project.error());

    if (withdrawnPhase) {
        // The copies holding the draw's assignments, read before they become tombstones: the
        // project file is all the withdrawal can check (core/project/coder_copies.h).
        auto copies = CoderCopies::copiesHoldingDraw(*project, *withdrawnPhase);
        if (!copies)
            return report(copies.error());
        auto withdrawn = SubsampleDraw::withdraw(*project, *withdrawnPhase);
        if (!withdrawn)
            return report(withdrawn.error());
        const int count = int(*withdrawn);
        if (asJson) {
            QJsonArray held;
            for (const CopyOut &c : *copies)
                held.append(QJsonObject {{QStringLiteral("coder"), c.coder},
                    {QStringLiteral("copy"), c.copyUuid},
                    {QStringLiteral("handed_out_at"), c.handedOutAt},
                    {QStringLiteral("articles"), QJsonArray::fromStringList(c.articles)}});
            printJson(QJsonObject {{QStringLiteral("phase"), phaseKey(*withdrawnPhase)},
                {QStringLiteral("withdrawn_assignments"), count},
                {QStringLiteral("copies_out"), held}});
        } else {
            out(CliText::tr(
                "The %1 subsample is withdrawn: %n assignment(s) removed.", nullptr, count)
                    .arg(phaseKey(*withdrawnPhase)));
            for (const CopyOut &c : *copies)
                out(CoderCopies::copyOutNotice(c));
        }
        return ExitOk;
    }

    if (parser.isSet(show))
        return runShow(*project, phaseFilter, asJson);
    if (parser.isSet(progress))
        return runProgress(*project, phaseFilter, asJson);
    if (parser.isSet(training))
        return runTraining(*project, trainingRequest, asJson);
    if (parser.isSet(effort)) {
        const bool on = parser.value(effort) == QStringLiteral("on");
        if (auto st = StudyProgress::setEffortPerCoderVisible(*project, on, CoderId {}); !st)
            return report(st.error());
        if (asJson)
            printJson(QJsonObject {{QStringLiteral("effort_per_coder"), on}});
        else
            out(on ? CliText::tr("Active time is now shown per coder.")
                   : CliText::tr("Active time is now shown in aggregate only."));
        return ExitOk;
    }

    if (parser.isSet(draw)) {
        auto planned = SubsampleDraw::plan(*project, drawRequest);
        if (!planned)
            return report(planned.error());
        if (!parser.isSet(dryRun))
            if (auto st = SubsampleDraw::commit(*project, *planned); !st)
                return report(st.error());
        if (asJson) {
            QJsonObject o = SubsampleDraw::toJson(*planned);
            o.insert(QStringLiteral("written"), !parser.isSet(dryRun));
            printJson(o);
        } else {
            printDraw(*planned);
            out(parser.isSet(dryRun)
                    ? CliText::tr("Dry run: nothing was written.")
                    : CliText::tr("%1 assignments written.").arg(planned->plan.rows.size()));
        }
        return ExitOk;
    }

    Result<AssignmentPlan> plan = parser.isSet(rest)
        ? AssignmentPlans::planRest(*project, restRequest)
        : AssignmentPlans::planArticles(
            *project, *phaseFilter, splitList(parser.value(articles)), coderList);
    if (!plan)
        return report(plan.error());
    QJsonObject record;
    if (parser.isSet(rest))
        record = QJsonObject {{QStringLiteral("rest"), parser.value(rest)},
            {QStringLiteral("seed"), QString::number(seedValue)},
            {QStringLiteral("coders"), QJsonArray::fromStringList(coderList)}};
    if (!parser.isSet(dryRun))
        if (auto st = AssignmentPlans::commit(*project, *plan, record); !st)
            return report(st.error());
    if (asJson) {
        QJsonObject o = planJson(*plan);
        o.insert(QStringLiteral("written"), !parser.isSet(dryRun));
        if (parser.isSet(rest))
            o.insert(QStringLiteral("seed"), QString::number(seedValue));
        printJson(o);
        return ExitOk;
    }
    printPlan(*plan);
    if (parser.isSet(rest))
        out(CliText::tr("Seed %1.").arg(seedValue));
    out(parser.isSet(dryRun) ? CliText::tr("Dry run: nothing was written.")
                             : CliText::tr("%1 assignments written.").arg(plan->rows.size()));
    return ExitOk;
}

} // namespace fourfold::cli
