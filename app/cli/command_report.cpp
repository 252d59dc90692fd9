// report: the reliability report of a project as a self-contained HTML file and/or a PDF.

#include "app/cli/cli_output.h"

#include <QCoreApplication>

#ifdef FOURFOLD_HAVE_REPORT
#include "app/i18n/translations.h"
#include "app/report/report_writer.h"
#include "core/project/project.h"

#include <QFile>
#include <QFileInfo>
#endif

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CliText {
    Q_DECLARE_TR_FUNCTIONS(cli)
};

} // namespace

#ifdef FOURFOLD_HAVE_REPORT

int runReport(const QStringList &arguments)
{
    const QString command = QStringLiteral("report");
    QCommandLineParser parser;
    const QCommandLineOption outFile(QStringLiteral("out"),
        CliText::tr(
            "The report file: FILE.html (self-contained) or FILE.pdf; give --out twice for both."),
        QStringLiteral("FILE"));
    const QCommandLineOption unit(QStringLiteral("unit"),
        CliText::tr(
            "The unit of the four function variables: paragraph, sentence (default) or token."),
        QStringLiteral("UNIT"), QStringLiteral("sentence"));
    const QCommandLineOption phase(QStringLiteral("phase"),
        CliText::tr("Only this phase (training, pilot, reliability, production); default all."),
        QStringLiteral("PHASE"));
    const QCommandLineOption coders(QStringLiteral("coders"),
        CliText::tr("The coders' pseudonyms (default: everyone who coded)."),
        QStringLiteral("A,B,..."));
    const QCommandLineOption bootstrap(QStringLiteral("bootstrap"),
        CliText::tr("Bootstrap replicates for alpha's 95% intervals (default 1000; 0 = none)."),
        QStringLiteral("N"), QStringLiteral("1000"));
    const QCommandLineOption seed(QStringLiteral("seed"),
        CliText::tr("Seed of the bootstrap (default 1)."), QStringLiteral("S"),
        QStringLiteral("1"));
    const QCommandLineOption title(
        QStringLiteral("title"), CliText::tr("The report's title."), QStringLiteral("TEXT"));
    const QCommandLineOption json(
        QStringLiteral("json"), CliText::tr("Also print the report's figures as JSON on stdout."));
    const QCommandLineOption force(
        QStringLiteral("force"), CliText::tr("Replace report files that exist already."));
    const QCommandLineOption language(QStringLiteral("language"),
        CliText::tr("The report's language: en, nl or de (default: the language of the messages, "
                    "from LANGUAGE or LANG)."),
        QStringLiteral("LANG"));
    const QCommandLineOption includeUnfinished(QStringLiteral("include-unfinished"),
        CliText::tr(
            "Also count articles that coders started but did not mark done (left out and listed "
            "by default)."));
    parser.addOptions({outFile, unit, phase, coders, includeUnfinished, bootstrap, seed, title,
        json, force, language});
    parser.addPositionalArgument(QStringLiteral("PROJECT"), CliText::tr("The project file."));
    if (int rc = parseCommandLine(parser, command,
            CliText::tr(
                "Write the reliability report: method text with the items of Lombard, "
                "Snyder-Duch & Bracken (2002), Krippendorff's alpha per variable with bootstrap "
                "intervals, coders and pairs, charts. Every figure equals what \"fourfold-cli "
                "agree\" prints for the same selection."),
            arguments);
        rc >= 0)
        return rc;
    if (parser.positionalArguments().size() != 1)
        return usageError(command, CliText::tr("expected one project file."));
    const QStringList outputs = parser.values(outFile);
    if (outputs.isEmpty())
        return usageError(
            command, CliText::tr("say where to write the report: --out FILE.html|FILE.pdf."));
    for (const QString &o : outputs) {
        const QString suffix = QFileInfo(o).suffix().toLower();
        if (suffix != QLatin1String("html") && suffix != QLatin1String("htm")
            && suffix != QLatin1String("pdf"))
            return usageError(
                command, CliText::tr("the report file \"%1\" must end in .html or .pdf.").arg(o));
        // A report is written beside its name and moved into place (QSaveFile); it never writes
        // through a link to somewhere else, nor replaces a file unasked.
        const QFileInfo target(o);
        if (target.isSymLink())
            return report(Error {ErrorCode::Io,
                CliText::tr("The report file %1 is a symbolic link; name a real file.").arg(o), {},
                o, 0, 0});
        if (target.exists() && !target.isFile())
            return report(Error {
                ErrorCode::Io, CliText::tr("%1 exists and is not a file.").arg(o), {}, o, 0, 0});
        if (target.exists() && !parser.isSet(force))
            return report(Error {ErrorCode::Duplicate,
                CliText::tr("%1 exists already; choose another name or replace it with --force.")
                    .arg(o),
                {}, o, 0, 0});
    }

    if (parser.isSet(language)) {
        const QString tag = parser.value(language);
        if (tag != QLatin1String("en") && tag != QLatin1String("nl") && tag != QLatin1String("de"))
            return usageError(
                command, CliText::tr("--language takes en, nl or de, not \"%1\".").arg(tag));
        // The method text, tables and charts are written in it (and the messages that follow).
        useLanguage(QLocale(tag));
    }

    ReportOptions options;
    // The codebook's texts follow the report's language where the codebook has them.
    options.language = currentLanguage();
    const auto unitKind = unitKindFromKey(parser.value(unit));
    if (!unitKind
        || (*unitKind != UnitKind::Paragraph && *unitKind != UnitKind::Sentence
            && *unitKind != UnitKind::Token))
        return usageError(command,
            CliText::tr("unknown unit \"%1\" (expected paragraph, sentence or token).")
                .arg(parser.value(unit)));
    options.unit = *unitKind;
    if (parser.isSet(phase)) {
        options.phase = phaseFromKey(parser.value(phase));
        if (!options.phase)
            return usageError(
                command, CliText::tr("unknown phase \"%1\".").arg(parser.value(phase)));
    }
    if (parser.isSet(coders))
        options.coders = parser.value(coders).split(QLatin1Char(','), Qt::SkipEmptyParts);
    bool ok = false;
    options.bootstrapReplicates = parser.value(bootstrap).toInt(&ok);
    if (!ok || options.bootstrapReplicates < 0 || options.bootstrapReplicates > 1000000)
        return usageError(
            command, CliText::tr("--bootstrap expects a number of replicates from 0 to 1000000."));
    options.seed = parser.value(seed).toULongLong(&ok);
    if (!ok)
        return usageError(command, CliText::tr("--seed expects a non-negative whole number."));
    options.title = parser.value(title);
    options.includeUnfinished = parser.isSet(includeUnfinished);

    auto project = Project::openForReading(parser.positionalArguments().first());
    if (!project)
        return report(project.error());
    auto data = gatherReportData(*project, options);
    if (!data)
        return report(data.error());
    // Both files or neither: a report file this run made goes again when a later one fails.
    QStringList made;
    for (const QString &o : outputs) {
        const bool pdf =
            QFileInfo(o).suffix().compare(QLatin1String("pdf"), Qt::CaseInsensitive) == 0;
        const bool existed = QFileInfo::exists(o);
        auto written = pdf ? writeReportPdf(*data, o) : writeReportHtml(*data, o);
        if (!written) {
            for (const QString &m : made)
                QFile::remove(m);
            return report(written.error());
        }
        if (!existed)
            made << o;
        if (!parser.isSet(json))
            out(CliText::tr("Wrote %1").arg(o));
    }
    if (parser.isSet(json))
        printJson(data->toJson());
    return ExitOk;
}

#else

int runReport(const QStringList &arguments)
{
    QCommandLineParser parser;
    if (int rc = parseCommandLine(parser, QStringLiteral("report"),
            CliText::tr(
                "Write the reliability report (needs a build with FOURFOLD_BUILD_DESKTOP=ON)."),
            arguments);
        rc >= 0)
        return rc;
    return report(Error {ErrorCode::Unsupported,
        CliText::tr(
            "This fourfold-cli was built without the graphical libraries, so it cannot write "
            "reports; rebuild with FOURFOLD_BUILD_DESKTOP=ON."),
        {}, {}, 0, 0});
}

#endif

} // namespace fourfold::cli
