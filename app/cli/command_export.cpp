// export: a span layer (gold, coders, coder:PSEUDONYM, run:NAME) as JSON Lines, W3C Web
// Annotations, IOB2 tokens or CSV, optionally split by article, with a manifest.

#include "app/cli/cli_output.h"
#include "core/exchange/layer_export.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QDir>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

// A split that got no article (too few articles for its share) is written empty; say so on
// stderr, so that a pipeline does not train or test on nothing unawares.
void warnEmptySplits(const QJsonObject &manifest, const ExportOptions &options)
{
    if (!options.split)
        return;
    const QJsonObject splits = manifest.value(QStringLiteral("splits")).toObject();
    qint64 total = 0;
    for (const QString &name : options.split->names)
        total += splits.value(name).toObject().value(QStringLiteral("articles")).toInteger();
    for (const QString &name : options.split->names)
        if (splits.value(name).toObject().value(QStringLiteral("articles")).toInteger() == 0)
            err(CliText::tr(
                "fourfold-cli: note: the %1 split is empty; %2 article(s) are too few for "
                "these shares.")
                    .arg(name)
                    .arg(total));
}

} // namespace

int runExport(const QStringList &arguments)
{
    const QString command = QStringLiteral("export");
    QCommandLineParser parser;
    const QCommandLineOption layer(QStringLiteral("layer"),
        CliText::tr("What to export: gold, coders, coder:PSEUDONYM or run:NAME."),
        QStringLiteral("LAYER"));
    const QCommandLineOption format(QStringLiteral("format"),
        CliText::tr(
            "jsonl (spans and articles), w3c (Web Annotation JSON-LD), bio (IOB2 tokens, one "
            "column per function) or csv (article × variable)."),
        QStringLiteral("FORMAT"));
    const QCommandLineOption outDir(QStringLiteral("out"),
        CliText::tr(
            "The output directory: new or empty (created if needed); the export appears in it "
            "whole or not at all."),
        QStringLiteral("DIR"));
    const QCommandLineOption force(QStringLiteral("force"),
        CliText::tr(
            "Replace an earlier export in --out DIR (a folder holding only export files)."));
    const QCommandLineOption split(QStringLiteral("split"),
        CliText::tr(
            "Split by article, stratified by function presence: train/dev/test or train/test "
            "percentages, e.g. 80/10/10."),
        QStringLiteral("A/B/C"));
    const QCommandLineOption seed(QStringLiteral("seed"),
        CliText::tr("Seed of the split (default 1)."), QStringLiteral("S"), QStringLiteral("1"));
    const QCommandLineOption noText(QStringLiteral("no-text"),
        CliText::tr("Write offsets and hashes only: no texts, quotes, tokens or titles."));
    const QCommandLineOption json(
        QStringLiteral("json"), CliText::tr("Print the manifest as JSON."));
    parser.addOptions({layer, format, outDir, force, split, seed, noText, json});
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "Exports gold, codings or a run's spans for data teams and statistics packages; "
                "coders appear only by pseudonym."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(command, CliText::tr("expected one project file."));
    if (!parser.isSet(layer))
        return usageError(command,
            CliText::tr("say what to export: --layer gold|coders|coder:PSEUDONYM|run:NAME."));
    if (!parser.isSet(format))
        return usageError(command, CliText::tr("say which format: --format jsonl|w3c|bio|csv."));
    if (!parser.isSet(outDir) || parser.value(outDir).isEmpty())
        return usageError(command, CliText::tr("say where to write: --out DIR."));
    ExportOptions options;
    auto spec = LayerSpec::parse(parser.value(layer));
    if (!spec)
        return usageError(command, spec.error().message);
    options.layer = *spec;
    const auto formatValue = exportFormatFromKey(parser.value(format));
    if (!formatValue)
        return usageError(command,
            CliText::tr("unknown format \"%1\" (expected jsonl, w3c, bio or csv).")
                .arg(parser.value(format)));
    options.format = *formatValue;
    options.outDir = parser.value(outDir);
    if (parser.isSet(split)) {
        auto ratios = SplitRatios::parse(parser.value(split));
        if (!ratios)
            return usageError(command, ratios.error().message);
        options.split = *ratios;
    }
    bool ok = false;
    options.seed = parser.value(seed).toULongLong(&ok);
    if (!ok)
        return usageError(command, CliText::tr("--seed expects a non-negative whole number."));
    options.withText = !parser.isSet(noText);
    options.version = QCoreApplication::applicationVersion();
    options.replace = parser.isSet(force);

    auto project = Project::openForReading(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto exported = exportLayer(*project, options);
    if (!exported)
        return report(exported.error());
    if (parser.isSet(json)) {
        printJson(exported->manifest);
        warnEmptySplits(exported->manifest, options);
        return ExitOk;
    }
    out(CliText::tr("Exported %1 as %2 into %3:")
            .arg(options.layer.key(), exportFormatKey(options.format),
                QDir::toNativeSeparators(options.outDir)));
    const QJsonObject splits = exported->manifest.value(QStringLiteral("splits")).toObject();
    const QStringList names =
        options.split ? options.split->names : QStringList {QStringLiteral("all")};
    for (const QString &name : names) {
        const QJsonObject s = splits.value(name).toObject();
        out(CliText::tr("  %1: %2 articles, %3 spans")
                .arg(name)
                .arg(s.value(QStringLiteral("articles")).toInteger())
                .arg(s.value(QStringLiteral("spans")).toInteger()));
    }
    for (const ExportedFile &f : exported->files)
        out(QStringLiteral("  %1  %2").arg(f.sha256, f.name));
    out(QStringLiteral("  manifest.json"));
    warnEmptySplits(exported->manifest, options);
    return ExitOk;
}

} // namespace fourfold::cli
