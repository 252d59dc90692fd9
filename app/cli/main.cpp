// fourfold-cli: Fourfold's jobs without a window, for scripts and pipelines.

#include "app/cli/cli_output.h"
#include "app/i18n/translations.h"
#include "core/model/heap_tuning.h"

#include <QCoreApplication>
#ifdef FOURFOLD_HAVE_REPORT
#include <QDir>
#include <QGuiApplication>

#include <sys/stat.h>
#include <unistd.h>

#include <cerrno>
#endif

#include <functional>
#include <map>
#include <memory>

using namespace fourfold::cli;

namespace {

struct Command {
    const char *summary;
    std::function<int(const QStringList &)> run;
};

const std::map<QString, Command> &commands()
{
    static const std::map<QString, Command> table {
        {QStringLiteral("new"),
            {QT_TRANSLATE_NOOP("cli", "Create an empty project file with the default codebook."),
                runNew}},
        {QStringLiteral("import"),
            {QT_TRANSLATE_NOOP("cli", "Import articles from text, HTML, JSON Lines or CSV files."),
                runImport}},
        {QStringLiteral("info"),
            {QT_TRANSLATE_NOOP(
                 "cli", "Show what a project holds: articles, units, coders, annotations."),
                runInfo}},
        {QStringLiteral("check"),
            {QT_TRANSLATE_NOOP("cli", "Check a project file's integrity."), runCheck}},
        {QStringLiteral("agree"),
            {QT_TRANSLATE_NOOP(
                 "cli", "Inter-coder reliability of a matrix file or of a project's codings."),
                runAgree}},
        {QStringLiteral("frames"),
            {QT_TRANSLATE_NOOP("cli",
                 "Frames as clusters of articles by their frame elements (Ward, then k-means)."),
                runFrames}},
        {QStringLiteral("extract"),
            {QT_TRANSLATE_NOOP("cli",
                 "Run an extractor (built-in baseline or external command) over a project's "
                 "articles."),
                runExtract}},
        {QStringLiteral("score"),
            {QT_TRANSLATE_NOOP("cli", "Score an extractor run against gold or a coder."),
                runScore}},
        {QStringLiteral("export"),
            {QT_TRANSLATE_NOOP("cli",
                 "Export gold, codings or a run as JSON Lines, W3C Web Annotation, IOB2 or CSV."),
                runExport}},
        {QStringLiteral("report"),
            {QT_TRANSLATE_NOOP("cli", "Write the reliability report (HTML or PDF)."), runReport}},
        {QStringLiteral("assign"),
            {QT_TRANSLATE_NOOP(
                 "cli", "Assign articles to coders and draw the reliability subsample."),
                runAssign}},
        {QStringLiteral("codebook"),
            {QT_TRANSLATE_NOOP(
                 "cli", "List codebook versions, add one from a JSON file, and show what changed."),
                runCodebook}},
        {QStringLiteral("handout"),
            {QT_TRANSLATE_NOOP(
                 "cli", "Write a coder copy holding only that coder's articles and annotations."),
                runHandout}},
        {QStringLiteral("merge"),
            {QT_TRANSLATE_NOOP("cli", "Merge returned coder copies into the project."), runMerge}},
        {QStringLiteral("team"),
            {QT_TRANSLATE_NOOP("cli",
                 "Team projects on a PostgreSQL server: publish a project, join one (team publish, "
                 "team join)."),
                runTeam}},
        {QStringLiteral("people"),
            {QT_TRANSLATE_NOOP("cli",
                 "List, add, rename, disable and enable the people of a project (by pseudonym)."),
                runPeople}},
        {QStringLiteral("build-sample"),
            {QT_TRANSLATE_NOOP("cli", "Build the demo project from its source files."),
                runBuildSample}},
    };
    return table;
}

void printUsage()
{
    out(QCoreApplication::translate("cli", "Usage: fourfold-cli COMMAND [options] [arguments]"));
    out(QString());
    out(QCoreApplication::translate("cli", "Commands:"));
    for (const auto &[name, command] : commands())
        out(QStringLiteral("  %1  %2")
                .arg(name, -13)
                .arg(QCoreApplication::translate("cli", command.summary)));
    out(QString());
    out(QCoreApplication::translate(
        "cli", "Run \"fourfold-cli COMMAND --help\" for a command's options."));
}

} // namespace

int main(int argc, char *argv[])
{
    fourfold::keepFreedHeapMemory();
    // `report` paints (QTextDocument, QPdfWriter) and needs a QGuiApplication; without a display
    // it uses the offscreen platform. Every other command stays on QCoreApplication.
    std::unique_ptr<QCoreApplication> application;
#ifdef FOURFOLD_HAVE_REPORT
    if (argc > 1 && qstrcmp(argv[1], "report") == 0) {
        if (!qEnvironmentVariableIsSet("QT_QPA_PLATFORM"))
            qputenv("QT_QPA_PLATFORM", "offscreen");
        // Qt's platform code wants a private runtime folder and warns on stderr without one
        // (as in a login-less shell or CI); give it one so the report's output stays clean.
        if (!qEnvironmentVariableIsSet("XDG_RUNTIME_DIR")) {
            const QByteArray dir =
                QDir::temp()
                    .filePath(
                        QStringLiteral("fourfold-runtime-%1").arg(QString::number(::getuid())))
                    .toLocal8Bit();
            if (::mkdir(dir.constData(), 0700) == 0 || errno == EEXIST)
                qputenv("XDG_RUNTIME_DIR", dir);
        }
        application = std::make_unique<QGuiApplication>(argc, argv);
    }
#endif
    if (!application)
        application = std::make_unique<QCoreApplication>(argc, argv);
    QCoreApplication &app = *application;
    QCoreApplication::setApplicationName(QStringLiteral("fourfold-cli"));
    QCoreApplication::setApplicationVersion(QStringLiteral(FOURFOLD_VERSION));
    // Messages in the language of LANGUAGE, LC_ALL, LC_MESSAGES or LANG, as other tools do.
    fourfold::useLanguage(QLocale());

    const QStringList args = app.arguments();
    if (args.size() < 2) {
        printUsage();
        return ExitUsage;
    }
    const QString name = args.at(1);
    if (name == QLatin1String("--help") || name == QLatin1String("-h")
        || name == QLatin1String("help")) {
        printUsage();
        return ExitOk;
    }
    if (name == QLatin1String("--version")) {
        out(QStringLiteral("fourfold-cli %1").arg(QCoreApplication::applicationVersion()));
        return ExitOk;
    }
    const auto it = commands().find(name);
    if (it == commands().end()) {
        err(QCoreApplication::translate("cli", "fourfold-cli: unknown command \"%1\".").arg(name));
        err(QCoreApplication::translate(
            "cli", "Run \"fourfold-cli --help\" for the list of commands."));
        return ExitUsage;
    }
    return it->second.run(args.mid(1));
}
