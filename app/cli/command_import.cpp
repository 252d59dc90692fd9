#include "app/cli/cli_output.h"
#include "app/cli/terminal_progress.h"
#include "core/exchange/w3c_import.h"
#include "core/io/document_split.h"
#include "core/project/coding_import.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QJsonArray>

namespace fourfold::cli {

namespace {

// Imports codings rather than articles: W3C Web Annotations (as `export --format w3c` writes
// them) or quote-anchored codings. Each file is all-or-nothing.
int importCodings(Project &project, const QStringList &files, bool w3c, Phase phase, bool json)
{
    QJsonArray done;
    for (const QString &file : files) {
        qint64 spans = 0;
        qint64 judgements = 0;
        qint64 gold = 0;
        qint64 articlesDone = 0;
        qint64 skipped = 0;
        QStringList created;
        if (w3c) {
            auto result = importW3cAnnotations(project, file, phase);
            if (!result)
                return report(result.error());
            spans = result->spans;
            created = result->codersCreated;
            articlesDone = result->articlesDone;
            skipped = result->skipped;
        } else {
            auto result = importQuotedCodings(project, file, phase);
            if (!result)
                return report(result.error());
            spans = result->spans;
            judgements = result->judgements;
            gold = result->gold;
            articlesDone = result->articlesDone;
            skipped = result->skipped;
        }
        done.append(QJsonObject {{QStringLiteral("file"), file}, {QStringLiteral("spans"), spans},
            {QStringLiteral("judgements"), judgements}, {QStringLiteral("gold"), gold},
            {QStringLiteral("articles_done"), articlesDone}, {QStringLiteral("skipped"), skipped},
            {QStringLiteral("codersCreated"), QJsonArray::fromStringList(created)}});
        if (!json) {
            out(QCoreApplication::translate("cli", "%1: %2 spans, %3 answers, %4 gold spans added")
                    .arg(file)
                    .arg(spans)
                    .arg(judgements)
                    .arg(gold));
            if (skipped > 0)
                out(QCoreApplication::translate("cli",
                    "  %1 line(s) skipped: already in the project (the same annotation, or the "
                    "same coder, function and range; the same answer; the same gold span)")
                        .arg(skipped));
            if (articlesDone > 0)
                out(QCoreApplication::translate("cli",
                    "  %1 article(s) marked done for their coders (imported codings count as "
                    "finished)")
                        .arg(articlesDone));
            if (!created.isEmpty())
                out(QCoreApplication::translate("cli", "  new coders: %1")
                        .arg(created.join(QStringLiteral(", "))));
        }
    }
    if (json)
        printJson(QJsonObject {
            {QStringLiteral("project"), project.path()}, {QStringLiteral("files"), done}});
    return ExitOk;
}

} // namespace

int runImport(const QStringList &arguments)
{
    const QString command = QStringLiteral("import");
    QCommandLineParser parser;
    const QCommandLineOption format(QStringLiteral("format"),
        QCoreApplication::translate("cli",
            "Read every file as txt, html, jsonl, csv, feed (RSS or Atom), newsxml (NITF or "
            "NewsML-G2), docx, odt, pdf or epub (default: from each file's suffix; .xml and "
            "unknown suffixes from the content)."),
        QStringLiteral("FORMAT"));
    const QCommandLineOption language(QStringLiteral("language"),
        QCoreApplication::translate(
            "cli", "Language (BCP 47 tag) of articles that name none (default: the project's)."),
        QStringLiteral("TAG"));
    const QCommandLineOption column(QStringLiteral("column"),
        QCoreApplication::translate("cli",
            "CSV: take FIELD (id, title, text, outlet, published, language) from the column "
            "HEADER. Repeatable."),
        QStringLiteral("FIELD=HEADER"));
    const QCommandLineOption wholeBook(QStringLiteral("whole-book"),
        QCoreApplication::translate(
            "cli", "EPUB: import each book as one article instead of one article per chapter."));
    const QCommandLineOption splitOn(QStringLiteral("split-on"),
        QCoreApplication::translate("cli",
            "txt, docx, odt, pdf: cut each document into articles at the lines matching REGEX; "
            "named groups (?<title>...), (?<outlet>...), (?<date>...) fill those fields, else "
            "the first line of each part is its title."),
        QStringLiteral("REGEX"));
    const QCommandLineOption nearCopyThreshold(QStringLiteral("near-copy-threshold"),
        QCoreApplication::translate("cli",
            "List and record an added article as a near copy of an article in the project when "
            "the estimated Jaccard similarity of their 5-word shingles is at least J, in (0, 1] "
            "(default 0.8)."),
        QStringLiteral("J"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the report as JSON."));
    const QCommandLineOption w3c(QStringLiteral("w3c"),
        QCoreApplication::translate("cli",
            "The files hold W3C Web Annotations (from \"export --format w3c\"): import them as "
            "codings of the articles already in the project."));
    const QCommandLineOption codings(QStringLiteral("codings"),
        QCoreApplication::translate("cli",
            "The files hold quote-anchored codings (JSON Lines, see sample-project/README.md)."));
    const QCommandLineOption phase(QStringLiteral("phase"),
        QCoreApplication::translate("cli",
            "With --w3c or --codings: the phase of the imported codings (training, pilot, "
            "reliability, production; default production)."),
        QStringLiteral("PHASE"));
    parser.addOptions({format, language, column, wholeBook, splitOn, nearCopyThreshold, json, w3c,
        codings, phase});
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    parser.addPositionalArgument(QStringLiteral("FILE..."),
        QCoreApplication::translate("cli",
            "Files or folders to import. Each file is imported whole or not at all; a folder "
            "(with its subfolders) likewise, as one."));
    if (int rc = parseCommandLine(parser, command,
            QCoreApplication::translate("cli",
                "Import articles into a project (or, with --w3c or --codings, codings of its "
                "articles)."),
            arguments);
        rc >= 0)
        return rc;
    const QStringList positional = parser.positionalArguments();
    if (positional.size() < 2)
        return usageError(command,
            QCoreApplication::translate(
                "cli", "expected a project file and at least one file to import."));

    ImportOptions options;
    if (parser.isSet(format)) {
        options.format = importFormatFromKey(parser.value(format));
        if (!options.format)
            return usageError(command,
                QCoreApplication::translate("cli",
                    "unknown format \"%1\" (expected txt, html, jsonl, csv, feed, newsxml, docx, "
                    "odt, pdf or epub).")
                    .arg(parser.value(format)));
    }
    options.language = parser.value(language);
    options.epubWholeBook = parser.isSet(wholeBook);
    if (parser.isSet(splitOn)) {
        auto pattern = compileSplitPattern(parser.value(splitOn));
        if (!pattern)
            return usageError(command,
                QCoreApplication::translate("cli", "--split-on: %1").arg(pattern.error().message));
        options.splitOn = parser.value(splitOn);
    }
    if (parser.isSet(nearCopyThreshold)) {
        bool ok = false;
        options.nearCopyThreshold = parser.value(nearCopyThreshold).toDouble(&ok);
        if (!ok || !(options.nearCopyThreshold > 0.0 && options.nearCopyThreshold <= 1.0))
            return usageError(command,
                QCoreApplication::translate(
                    "cli", "--near-copy-threshold expects a number in (0, 1], got \"%1\".")
                    .arg(parser.value(nearCopyThreshold)));
    }
    for (const QString &mapping : parser.values(column)) {
        const qsizetype eq = mapping.indexOf(QLatin1Char('='));
        if (eq <= 0 || eq == mapping.size() - 1)
            return usageError(command,
                QCoreApplication::translate("cli", "--column expects FIELD=HEADER, got \"%1\".")
                    .arg(mapping));
        options.csvColumns.insert(mapping.left(eq), mapping.mid(eq + 1));
    }

    if (parser.isSet(w3c) && parser.isSet(codings))
        return usageError(
            command, QCoreApplication::translate("cli", "choose either --w3c or --codings."));
    Phase codingPhase = Phase::Production;
    if (parser.isSet(phase)) {
        const auto chosen = phaseFromKey(parser.value(phase));
        if (!chosen)
            return usageError(command,
                QCoreApplication::translate("cli",
                    "unknown phase \"%1\" (expected training, pilot, reliability or production).")
                    .arg(parser.value(phase)));
        codingPhase = *chosen;
    }

    auto project = Project::open(positional.first());
    if (!project)
        return report(project.error());
    if (!project->backupPath().isEmpty())
        err(QCoreApplication::translate(
            "cli", "Upgraded the project file; the old version is kept as %1.")
                .arg(project->backupPath()));
    if (parser.isSet(w3c) || parser.isSet(codings))
        return importCodings(
            *project, positional.mid(1), parser.isSet(w3c), codingPhase, parser.isSet(json));

    QJsonArray files;
    qint64 added = 0;
    for (const QString &file : positional.mid(1)) {
        // Progress on a terminal; Ctrl+C ends the command before the import's one transaction
        // commits, so nothing of the file is stored.
        TerminalProgress progress(file);
        auto result = project->importFile(file, options, [&](qint64 read, qint64 total) {
            progress.bytes(read, total);
            return true;
        });
        progress.finish();
        if (!result) {
            if (added > 0)
                err(QCoreApplication::translate("cli",
                    "fourfold-cli: the %n article(s) imported before this file stay in the "
                    "project.",
                    nullptr, int(added)));
            return report(result.error());
        }
        added += qint64(result->added.size());
        QJsonArray skipped;
        for (const SkippedArticle &s : result->skipped)
            skipped.append(QJsonObject {{QStringLiteral("id"), s.externalId},
                {QStringLiteral("line"), s.line}, {QStringLiteral("reason"), s.reason}});
        QJsonArray nearCopies;
        for (const NearCopyFound &n : result->nearCopies)
            nearCopies.append(
                QJsonObject {{QStringLiteral("id"), n.externalId}, {QStringLiteral("line"), n.line},
                    {QStringLiteral("near_copy_of"), n.otherExternalId},
                    {QStringLiteral("similarity"), n.similarity}});
        QJsonArray read;
        for (const ImportedFile &f : result->files)
            read.append(QJsonObject {{QStringLiteral("file"), f.path},
                {QStringLiteral("articles"), QJsonArray::fromStringList(f.articles)},
                {QStringLiteral("skipped"), f.skipped},
                {QStringLiteral("passed_over"),
                    f.passedOver ? QJsonValue(f.reason) : QJsonValue()}});
        files.append(QJsonObject {{QStringLiteral("file"), file},
            {QStringLiteral("added"), qint64(result->added.size())},
            {QStringLiteral("skipped"), skipped}, {QStringLiteral("near_copies"), nearCopies},
            {QStringLiteral("files_read"), read}});
        if (!parser.isSet(json)) {
            out(QCoreApplication::translate("cli", "%1: %2 added, %3 skipped")
                    .arg(file)
                    .arg(result->added.size())
                    .arg(result->skipped.size()));
            // A folder: each of its files and the articles it gave.
            if (result->files.size() > 1
                || (result->files.size() == 1 && result->files[0].path != file))
                for (const ImportedFile &f : result->files) {
                    if (f.passedOver) {
                        out(QCoreApplication::translate("cli", "  %1: %2").arg(f.path, f.reason));
                        continue;
                    }
                    QStringList shown = f.articles.mid(0, 10);
                    // The count in a variable: lupdate 6.4 loops or skips on an expression.
                    const int more = int(f.articles.size()) - 10;
                    if (more > 0)
                        shown << QCoreApplication::translate("cli", "… %n more", nullptr, more);
                    out(QCoreApplication::translate("cli", "  %1: %2 added (%3), %4 skipped")
                            .arg(f.path)
                            .arg(f.articles.size())
                            .arg(shown.join(QStringLiteral(", ")))
                            .arg(f.skipped));
                }
            for (const SkippedArticle &s : result->skipped)
                out(QCoreApplication::translate("cli", "  line %1 (%2): skipped, %3")
                        .arg(s.line)
                        .arg(s.externalId, s.reason));
            for (const NearCopyFound &n : result->nearCopies)
                out(QCoreApplication::translate(
                    "cli", "  line %1 (%2): added, a near copy of \"%3\" (similarity %4)")
                        .arg(n.line)
                        .arg(n.externalId, n.otherExternalId)
                        .arg(n.similarity, 0, 'f', 2));
        }
    }
    if (parser.isSet(json))
        printJson(QJsonObject {
            {QStringLiteral("project"), project->path()}, {QStringLiteral("files"), files}});
    return ExitOk;
}

} // namespace fourfold::cli
