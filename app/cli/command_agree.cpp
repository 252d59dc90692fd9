// agree: inter-coder reliability of a raw matrix (--data FILE.csv) or of a project's codings.

#include "app/cli/cli_output.h"
#include "core/agreement/agreement_run.h"
#include "core/io/reliability_table_reader.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>

#include <algorithm>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

int runContinuum(const AgreementRun &run, const UnitSelection &selection, bool json)
{
    auto continuum = run.continuum(selection.function);
    if (!continuum)
        return report(continuum.error());
    const QStringList &names = continuum->categories;
    const ContinuumData &data = continuum->data;
    const reliability::UnitizingResult &result = continuum->unitizing;
    if (json) {
        QJsonObject o = continuumJson(*continuum);
        o.insert(QStringLiteral("left_out"), leftOutJson(run.codings().leftOut));
        printJson(o);
        return ExitOk;
    }
    for (const QString &l : leftOutLines(run.codings().leftOut))
        out(CliText::tr("Left out      %1").arg(l));
    out(CliText::tr("Coders        %1 (%2)")
            .arg(data.coders.size())
            .arg(data.coders.join(QStringLiteral(", "))));
    out(CliText::tr("Continuum     %1 articles coded by all, %2 characters")
            .arg(data.articles.size())
            .arg(data.length));
    auto line = [](const QString &name, const reliability::UnitizingCategoryResult &r) {
        return QStringLiteral("  %1 %2  %3")
            .arg(name, -12)
            .arg(r.value ? QString::number(*r.value, 'f', 3) : CliText::tr("undefined"), 9)
            .arg(r.value ? alphaVerdict(r.value) : QString::fromStdString(r.reason));
    };
    out(CliText::tr("Unitizing alpha (Krippendorff 2004)"));
    for (qsizetype i = 0; i < names.size() && size_t(i) < result.perCategory.size(); ++i)
        out(line(names[i], result.perCategory[size_t(i)]));
    if (names.size() > 1)
        out(line(CliText::tr("all"), result.overall));
    out(CliText::tr(
        "Positive specific agreement per pair (span F1: same boundaries / any overlap)"));
    for (const PairSpanAgreement &p : continuum->pairs) {
        QStringList parts;
        for (qsizetype i = 0; i < names.size(); ++i)
            parts << QStringLiteral("%1 %2/%3")
                         .arg(names[i])
                         .arg(p.strict[size_t(i)] ? QString::number(*p.strict[size_t(i)], 'f', 2)
                                                  : QStringLiteral("–"))
                         .arg(p.overlap[size_t(i)] ? QString::number(*p.overlap[size_t(i)], 'f', 2)
                                                   : QStringLiteral("–"));
        out(QStringLiteral("  %1 × %2  %3")
                .arg(data.coders[p.coderA], data.coders[p.coderB],
                    parts.join(QStringLiteral("  "))));
    }
    return ExitOk;
}

QString functionLabel(int index)
{
    return index < 4 ? functionKey(kFramingFunctions[size_t(index)]) : QStringLiteral("none");
}

QStringList leaveOneOutText(const std::vector<LeaveOneOut> &entries)
{
    QStringList lines;
    for (const LeaveOneOut &e : entries)
        lines << QStringLiteral("  %1 %2  %3  units %4")
                     .arg(e.name, -14)
                     .arg(e.alpha ? QString::number(*e.alpha, 'f', 3) : CliText::tr("undefined"), 9)
                     .arg(e.change ? QString::asprintf("%+.3f", *e.change) : QStringLiteral("–"), 7)
                     .arg(e.units);
    return lines;
}

QStringList matchingText(const SpanMatching &m)
{
    QStringList lines;
    lines << CliText::tr(
        "Function confusion on matched spans (rows: a coder's function; columns: the "
        "other coder's at the best-overlapping span)");
    QString header = QStringLiteral("  %1").arg(QString(), -11);
    for (int c = 0; c < FunctionConfusion::kSize; ++c)
        header += QStringLiteral("%1").arg(functionLabel(c), 11);
    lines << header;
    for (int r = 0; r < 4; ++r) {
        QString line = QStringLiteral("  %1").arg(functionLabel(r), -11);
        for (int c = 0; c < FunctionConfusion::kSize; ++c)
            line += QStringLiteral("%1").arg(m.confusion.at(r, c), 11, 'f', 0);
        lines << line;
    }
    lines << CliText::tr(
        "Boundary habits (this coder's span − the other's, code points, same function)");
    for (const BoundaryHabit &b : m.boundaries)
        lines << QStringLiteral("  %1 length %2 ± %3  start %4  end %5  longer %6%  %7 matches%8")
                     .arg(b.coder, -8)
                     .arg(QString::asprintf("%+.1f", b.meanLengthDifference), 7)
                     .arg(b.standardError, 0, 'f', 1)
                     .arg(QString::asprintf("%+.1f", b.meanStartDifference))
                     .arg(QString::asprintf("%+.1f", b.meanEndDifference))
                     .arg(b.shareLonger * 100.0, 0, 'f', 0)
                     .arg(b.matches)
                     .arg(b.systematic ? CliText::tr("  systematic") : QString());
    return lines;
}

// Prints one analysed table: the agreement report, what was left out (for a project) and, with
// `diagnostics`, where reliability is lost (span matching only for a project).
int printAgreement(const AnalysisResult &analysed, const AgreementRun *run,
    const std::vector<CountedCodings::LeftOut> *leftOut, bool json, bool diagnostics)
{
    const AgreementReport &result = analysed.report;
    const auto withLeftOut = [&](QJsonObject o) {
        if (leftOut)
            o.insert(QStringLiteral("left_out"), leftOutJson(*leftOut));
        return o;
    };
    const QString leftOutText =
        leftOut ? leftOutLines(*leftOut).join(QLatin1Char('\n')) : QString();
    if (!diagnostics) {
        if (json)
            printJson(withLeftOut(agreementJson(result)));
        else
            out(leftOutText.isEmpty() ? agreementText(result)
                                      : agreementText(result) + QLatin1Char('\n') + leftOutText);
        return ExitOk;
    }
    auto costs = leaveOneOutCosts(analysed);
    if (!costs)
        return report(costs.error());
    std::optional<SpanMatching> matching;
    if (run) {
        auto matched = run->matching();
        if (!matched)
            return report(matched.error());
        matching = std::move(*matched);
    }
    if (json) {
        QJsonObject o = withLeftOut(agreementJson(result));
        o.insert(QStringLiteral("diagnostics"),
            diagnosticsJson(costs->coders, costs->articles, matching ? &*matching : nullptr));
        printJson(o);
        return ExitOk;
    }
    QStringList lines {agreementText(result)};
    if (!leftOutText.isEmpty())
        lines << leftOutText;
    lines << CliText::tr("Alpha without each coder (costliest first; change = without − with all)");
    lines << leaveOneOutText(costs->coders);
    // The costliest articles; a raw matrix of a million rows (each its own article) would
    // print a million lines. --json lists every one.
    constexpr size_t kArticleLines = 20;
    const size_t shown = std::min(costs->articles.size(), kArticleLines);
    lines << CliText::tr("Alpha without each article (costliest first)");
    lines << leaveOneOutText({costs->articles.begin(), costs->articles.begin() + qsizetype(shown)});
    if (shown < costs->articles.size())
        lines << CliText::tr("  … and %n more (--json lists every one)", nullptr,
            int(costs->articles.size() - shown));
    if (matching)
        lines << matchingText(*matching);
    out(lines.join(QLatin1Char('\n')));
    return ExitOk;
}

} // namespace

int runAgree(const QStringList &arguments)
{
    const QString command = QStringLiteral("agree");
    QCommandLineParser parser;
    const QCommandLineOption data(QStringLiteral("data"),
        CliText::tr(
            "A raw reliability matrix: CSV with the header unit,<coder>,<coder>,...; an empty cell "
            "is missing."),
        QStringLiteral("FILE"));
    const QCommandLineOption level(QStringLiteral("level"),
        CliText::tr("Level of measurement: nominal (default), ordinal, interval or ratio."),
        QStringLiteral("LEVEL"), QStringLiteral("nominal"));
    const QCommandLineOption order(QStringLiteral("order"),
        CliText::tr("Ordinal labels from lowest to highest, e.g. negative,neutral,positive."),
        QStringLiteral("A,B,C"));
    const QCommandLineOption distance(QStringLiteral("distance"),
        CliText::tr(
            "Cells are sets of labels separated by | (braces allowed; {} = empty set), compared "
            "with jaccard or "
            "masi."),
        QStringLiteral("NAME"));
    const QCommandLineOption unit(QStringLiteral("unit"),
        CliText::tr(
            "With a project: article, paragraph, sentence, token, span (an attribute on matched "
            "passages) or continuum."),
        QStringLiteral("UNIT"));
    const QCommandLineOption function(QStringLiteral("function"),
        CliText::tr("With a project: problem, cause, evaluation, remedy or all (default all)."),
        QStringLiteral("FUNCTION"), QStringLiteral("all"));
    const QCommandLineOption coders(QStringLiteral("coders"),
        CliText::tr("With a project: the coders' pseudonyms (default: everyone who coded)."),
        QStringLiteral("A,B,..."));
    const QCommandLineOption phase(QStringLiteral("phase"),
        CliText::tr("With a project: only this phase (training, pilot, reliability, production)."),
        QStringLiteral("PHASE"));
    const QCommandLineOption attribute(QStringLiteral("attribute"),
        CliText::tr(
            "With --unit span: the attribute compared on passages matched across coders, e.g. "
            "polarity (with --function evaluation)."),
        QStringLiteral("KEY"));
    const QCommandLineOption withGold(QStringLiteral("with-gold"),
        CliText::tr(
            "With a project: add the adjudicated gold standard as one more coder, \"gold\"."));
    const QCommandLineOption articles(QStringLiteral("articles"),
        CliText::tr("With a project: only these articles (ids)."), QStringLiteral("ID,..."));
    const QCommandLineOption includeUnfinished(QStringLiteral("include-unfinished"),
        CliText::tr("With a project: also count articles that coders started but did not mark done "
                    "(left out and listed by default)."));
    const QCommandLineOption item(QStringLiteral("item"),
        CliText::tr("With --unit article: the article-level item (default dominant_function)."),
        QStringLiteral("KEY"), QStringLiteral("dominant_function"));
    const QCommandLineOption bootstrap(QStringLiteral("bootstrap"),
        CliText::tr("Bootstrap replicates for alpha's 95% interval (both methods, labelled)."),
        QStringLiteral("N"), QStringLiteral("0"));
    const QCommandLineOption seed(QStringLiteral("seed"),
        CliText::tr("Seed of the bootstrap (default 1)."), QStringLiteral("S"),
        QStringLiteral("1"));
    const QCommandLineOption weights(QStringLiteral("weights"),
        CliText::tr(
            "Cohen's kappa with disagreement weights by the values' order (Cohen 1968): none "
            "(default), linear or quadratic. For ordered values: an ordinal item, --order, or "
            "numbers."),
        QStringLiteral("W"), QStringLiteral("none"));
    const QCommandLineOption json(
        QStringLiteral("json"), CliText::tr("Print the figures as JSON."));
    const QCommandLineOption diagnostics(QStringLiteral("diagnostics"),
        CliText::tr(
            "Also show where reliability is lost: alpha without each coder and without each "
            "article (the costliest first), and with a project the function confusion on matched "
            "spans and the coders' boundary habits."));
    parser.addOptions({data, level, order, distance, unit, function, coders, phase, articles, item,
        attribute, withGold, includeUnfinished, bootstrap, seed, weights, json, diagnostics});
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), CliText::tr("The project file (unless --data is given)."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "Inter-coder reliability: Krippendorff's alpha (with bootstrap intervals), percent "
                "agreement, Cohen's, "
                "Fleiss' and Light's kappa, Scott's pi, Bennett's S; unitizing alpha on the "
                "continuum."),
            arguments);
        rc >= 0)
        return rc;

    AgreementOptions agreementOptions;
    bool ok = false;
    agreementOptions.bootstrapReplicates = parser.value(bootstrap).toInt(&ok);
    if (!ok || agreementOptions.bootstrapReplicates < 0
        || agreementOptions.bootstrapReplicates > 1000000)
        return usageError(
            command, CliText::tr("--bootstrap expects a number of replicates from 0 to 1000000."));
    agreementOptions.seed = parser.value(seed).toULongLong(&ok);
    if (!ok)
        return usageError(command, CliText::tr("--seed expects a non-negative whole number."));

    bool weightsKnown = false;
    for (const auto w : {reliability::KappaWeights::None, reliability::KappaWeights::Linear,
             reliability::KappaWeights::Quadratic})
        if (parser.value(weights) == QLatin1String(reliability::kappaWeightsKey(w))) {
            agreementOptions.kappaWeights = w;
            weightsKnown = true;
        }
    if (!weightsKnown)
        return usageError(command,
            CliText::tr("unknown weights \"%1\" (expected none, linear or quadratic).")
                .arg(parser.value(weights)));

    EncodingOptions encoding;
    const auto levelValue = levelFromKey(parser.value(level));
    if (!levelValue)
        return usageError(command,
            CliText::tr("unknown level \"%1\" (expected nominal, ordinal, interval or ratio).")
                .arg(parser.value(level)));
    encoding.level = *levelValue;
    if (parser.isSet(order)) {
        encoding.order = parser.value(order).split(QLatin1Char(','));
        for (QString &o : encoding.order)
            o = o.trimmed();
        if (encoding.level != reliability::Level::Ordinal)
            return usageError(
                command, CliText::tr("--order is for the ordinal level; add --level ordinal."));
    }
    if (parser.isSet(distance)) {
        encoding.distance = setDistanceFromKey(parser.value(distance));
        if (!encoding.distance)
            return usageError(command,
                CliText::tr("unknown distance \"%1\" (expected jaccard or masi).")
                    .arg(parser.value(distance)));
    }
    const bool encodingGiven = parser.isSet(level) || parser.isSet(order) || parser.isSet(distance);

    // A raw matrix from a file: its table is compared as it stands.
    if (parser.isSet(data)) {
        if (!parser.positionalArguments().isEmpty())
            return usageError(
                command, CliText::tr("give either --data FILE or a project, not both."));
        if (parser.isSet(includeUnfinished))
            return usageError(
                command, CliText::tr("--include-unfinished is for a project, not --data."));
        auto read = readReliabilityTable(parser.value(data));
        if (!read)
            return report(read.error());
        auto analysed = analyseTable(std::move(*read), encoding, agreementOptions);
        if (!analysed)
            return report(analysed.error());
        return printAgreement(
            *analysed, nullptr, nullptr, parser.isSet(json), parser.isSet(diagnostics));
    }

    if (parser.positionalArguments().size() != 1)
        return usageError(command, CliText::tr("expected a project file, or --data FILE."));
    if (!parser.isSet(unit))
        return usageError(command,
            CliText::tr("with a project, say which units to compare: --unit "
                        "article|paragraph|sentence|token|span|continuum."));
    const auto kind = unitKindFromKey(parser.value(unit));
    if (!kind)
        return usageError(command, CliText::tr("unknown unit \"%1\".").arg(parser.value(unit)));
    UnitSelection selection;
    AnalysisRequest request;
    request.unit = *kind;
    if (parser.value(function) != QLatin1String("all")) {
        request.function = functionFromKey(parser.value(function));
        if (!request.function)
            return usageError(command,
                CliText::tr(
                    "unknown function \"%1\" (expected problem, cause, evaluation, remedy or "
                    "all).")
                    .arg(parser.value(function)));
    }
    if (parser.isSet(coders))
        selection.coders = parser.value(coders).split(QLatin1Char(','), Qt::SkipEmptyParts);
    if (parser.isSet(phase)) {
        selection.phase = phaseFromKey(parser.value(phase));
        if (!selection.phase)
            return usageError(
                command, CliText::tr("unknown phase \"%1\".").arg(parser.value(phase)));
    }
    request.item = parser.value(item);
    request.attribute = parser.value(attribute);
    // Span attributes and article items take their level and value order from the codebook
    // unless the command line gives an encoding.
    if (encodingGiven)
        request.encoding = encoding;
    selection.includeGold = parser.isSet(withGold);
    selection.includeUnfinished = parser.isSet(includeUnfinished);
    if (parser.isSet(articles))
        selection.articles = parser.value(articles).split(QLatin1Char(','), Qt::SkipEmptyParts);
    auto project = Project::openForReading(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto run = AgreementRun::load(*project, selection);
    if (!run)
        return report(run.error());
    if (request.unit == UnitKind::Continuum) {
        selection.function = request.function;
        return runContinuum(*run, selection, parser.isSet(json));
    }
    if (!encodingGiven)
        if (auto checked = encodingFor(run->codebook(), request); !checked)
            return usageError(command, checked.error().message);
    auto analysed = run->analyse(request, agreementOptions);
    if (!analysed)
        return report(analysed.error());
    return printAgreement(
        *analysed, &*run, &run->codings().leftOut, parser.isSet(json), parser.isSet(diagnostics));
}

} // namespace fourfold::cli
