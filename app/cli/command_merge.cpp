#include "app/cli/cli_output.h"
#include "core/project/coder_copies.h"
#include "core/project/project.h"

#include <QCoreApplication>
#include <QHash>
#include <QJsonArray>

namespace fourfold::cli {

namespace {

// One line for a portable row of a conflict, e.g. `evaluation [10, 24) "a disgrace"`.
QString describe(const QString &type, const QJsonObject &row)
{
    if (row.isEmpty())
        return QCoreApplication::translate("cli", "(none)");
    QString text;
    if (type == QLatin1String("annotation"))
        text = QStringLiteral("%1 [%2, %3) \"%4\"")
                   .arg(row.value(QLatin1String("function")).toString())
                   .arg(row.value(QLatin1String("start")).toInteger())
                   .arg(row.value(QLatin1String("end")).toInteger())
                   .arg(row.value(QLatin1String("quote")).toString());
    if (type == QLatin1String("annotation")) {
        const QString attributes = row.value(QLatin1String("attributes")).toString();
        if (attributes != QLatin1String("{}"))
            text += QLatin1Char(' ') + attributes;
        const QString note = row.value(QLatin1String("note")).toString();
        if (!note.isEmpty())
            text += QCoreApplication::translate("cli", " note \"%1\"").arg(note);
        const QJsonValue confidence = row.value(QLatin1String("confidence"));
        if (confidence.isDouble())
            text += QCoreApplication::translate("cli", " confidence %1").arg(confidence.toDouble());
    } else if (type == QLatin1String("judgement"))
        text = QStringLiteral("%1 = %2").arg(row.value(QLatin1String("item")).toString(),
            row.value(QLatin1String("value")).toString());
    else if (type == QLatin1String("link"))
        text = row.value(QLatin1String("type")).toString();
    else
        text = row.value(QLatin1String("status")).toString();
    if (row.value(QLatin1String("deleted")).toInteger() != 0)
        text += QCoreApplication::translate("cli", " (deleted)");
    return text;
}

QString pseudonymOf(const QHash<QString, QString> &pseudonyms, const QJsonObject &row)
{
    return pseudonyms.value(row.value(QLatin1String("coder")).toString());
}

} // namespace

int runMerge(const QStringList &arguments)
{
    QCommandLineParser parser;
    const QCommandLineOption conflicts(QStringLiteral("conflicts"),
        QCoreApplication::translate("cli", "List the open merge conflicts instead of merging."));
    const QCommandLineOption all(QStringLiteral("all"),
        QCoreApplication::translate("cli", "With --conflicts: list resolved conflicts too."));
    const QCommandLineOption resolve(QStringLiteral("resolve"),
        QCoreApplication::translate(
            "cli", "Resolve the open conflict UUID (the conflict's or the object's uuid)."),
        QStringLiteral("UUID"));
    const QCommandLineOption keep(QStringLiteral("keep"),
        QCoreApplication::translate("cli",
            "With --resolve: keep \"mine\" (the version the project holds) or \"theirs\" (the "
            "version that lost)."),
        QStringLiteral("mine|theirs"));
    const QCommandLineOption json(
        QStringLiteral("json"), QCoreApplication::translate("cli", "Print the result as JSON."));
    for (const QCommandLineOption &o : {conflicts, all, resolve, keep, json})
        parser.addOption(o);
    parser.addPositionalArgument(
        QStringLiteral("PROJECT"), QCoreApplication::translate("cli", "The project file."));
    parser.addPositionalArgument(QStringLiteral("FILE..."),
        QCoreApplication::translate("cli", "Coder copies to merge, in this order."));
    if (int rc = parseCommandLine(parser, QStringLiteral("merge"),
            QCoreApplication::translate("cli",
                "Merge returned coder copies into the project, all in one transaction: new and "
                "changed annotations, links, answers and statuses are taken by uuid, deletions "
                "as tombstones, coding time is added. Merging a copy again changes nothing. A "
                "copy of another project, with changed article texts or with rows or log entries "
                "it "
                "cannot hold is refused. An object changed differently in the project and a "
                "copy, or in two copies, is a conflict: the later change is kept (in any order "
                "of merging), the other is stored until you resolve it with --resolve UUID "
                "--keep mine|theirs."),
            arguments);
        rc >= 0)
        return rc;
    const QStringList positional = parser.positionalArguments();
    if (positional.isEmpty())
        return usageError(
            QStringLiteral("merge"), QCoreApplication::translate("cli", "name the project file."));
    const bool listing = parser.isSet(conflicts);
    const bool resolving = parser.isSet(resolve);
    if (listing && resolving)
        return usageError(QStringLiteral("merge"),
            QCoreApplication::translate("cli", "use either --conflicts or --resolve."));
    if ((listing || resolving) && positional.size() != 1)
        return usageError(QStringLiteral("merge"),
            QCoreApplication::translate(
                "cli", "--conflicts and --resolve take the project file only, no copies."));
    if (!listing && !resolving && positional.size() < 2)
        return usageError(QStringLiteral("merge"),
            QCoreApplication::translate("cli", "name at least one coder copy to merge."));
    if (resolving != parser.isSet(keep))
        return usageError(QStringLiteral("merge"),
            QCoreApplication::translate("cli", "--resolve UUID needs --keep mine|theirs."));
    if (parser.isSet(keep) && parser.value(keep) != QLatin1String("mine")
        && parser.value(keep) != QLatin1String("theirs"))
        return usageError(QStringLiteral("merge"),
            QCoreApplication::translate("cli", "--keep takes \"mine\" or \"theirs\"."));
    if (parser.isSet(all) && !listing)
        return usageError(QStringLiteral("merge"),
            QCoreApplication::translate("cli", "--all goes with --conflicts."));

    auto project = Project::open(positional.first());
    if (!project)
        return report(project.error());

    if (resolving) {
        if (auto st = CoderCopies::resolve(*project, parser.value(resolve), parser.value(keep));
            !st)
            return report(st.error());
        if (parser.isSet(json))
            printJson(QJsonObject {{QStringLiteral("resolved"), parser.value(resolve)},
                {QStringLiteral("keep"), parser.value(keep)}});
        else
            out(QCoreApplication::translate("cli", "Resolved %1: kept %2.")
                    .arg(parser.value(resolve), parser.value(keep)));
        return ExitOk;
    }

    if (listing) {
        auto list = CoderCopies::conflicts(*project, parser.isSet(all));
        if (!list)
            return report(list.error());
        auto coders = project->coders();
        if (!coders)
            return report(coders.error());
        QHash<QString, QString> pseudonyms;
        for (const Coder &c : *coders)
            pseudonyms.insert(c.uuid, c.pseudonym);
        auto articles = project->articles();
        if (!articles)
            return report(articles.error());
        QHash<QString, QString> externalIds;
        for (const ArticleSummary &a : *articles)
            externalIds.insert(a.uuid, a.externalId);
        // Links name annotations, not articles: the article is shown for the other objects.
        auto articleOf = [&](const MergeConflict &c) {
            return externalIds.value(c.theirs.value(QLatin1String("article")).toString());
        };
        if (parser.isSet(json)) {
            QJsonArray items;
            for (const MergeConflict &c : *list)
                items.append(QJsonObject {{QStringLiteral("conflict"), c.uuid},
                    {QStringLiteral("type"), c.objectType},
                    {QStringLiteral("object"), c.objectUuid}, {QStringLiteral("copy"), c.copyUuid},
                    {QStringLiteral("coder"), pseudonymOf(pseudonyms, c.theirs)},
                    {QStringLiteral("article"), articleOf(c)}, {QStringLiteral("mine"), c.mine},
                    {QStringLiteral("theirs"), c.theirs},
                    {QStringLiteral("detectedAt"), c.detectedAt},
                    {QStringLiteral("resolution"), c.resolution},
                    {QStringLiteral("resolvedAt"), c.resolvedAt}});
            printJson(QJsonObject {{QStringLiteral("conflicts"), items}});
            return ExitOk;
        }
        if (list->empty()) {
            out(QCoreApplication::translate("cli", "No open merge conflicts."));
            return ExitOk;
        }
        for (const MergeConflict &c : *list) {
            const QString article = articleOf(c);
            out(QCoreApplication::translate("cli", "%1  %2 %3 of %4%5%6")
                    .arg(c.uuid, c.objectType, c.objectUuid, pseudonymOf(pseudonyms, c.theirs),
                        article.isEmpty()
                            ? QString()
                            : QCoreApplication::translate("cli", " on article %1").arg(article),
                        c.resolution.isEmpty()
                            ? QString()
                            : QCoreApplication::translate("cli", " (resolved: kept %1)")
                                  .arg(c.resolution)));
            out(QCoreApplication::translate("cli", "    mine (kept):   %1")
                    .arg(describe(c.objectType, c.mine)));
            out(QCoreApplication::translate("cli", "    theirs (lost): %1")
                    .arg(describe(c.objectType, c.theirs)));
            if (CoderCopies::isWithdrawnAssignment(c))
                out(QCoreApplication::translate("cli",
                    "    the assignment was withdrawn in the project while %1 coded the article "
                    "in a copy: keep mine to leave it withdrawn, theirs to assign it again.")
                        .arg(pseudonymOf(pseudonyms, c.theirs)));
        }
        return ExitOk;
    }

    auto reports = CoderCopies::merge(*project, positional.mid(1));
    if (!reports)
        return report(reports.error());
    auto open = CoderCopies::conflicts(*project, false);
    if (!open)
        return report(open.error());
    if (parser.isSet(json)) {
        QJsonArray items;
        for (const MergeReport &r : *reports)
            items.append(QJsonObject {{QStringLiteral("file"), r.path},
                {QStringLiteral("copy"), r.copyUuid}, {QStringLiteral("coder"), r.coderPseudonym},
                {QStringLiteral("alreadyMerged"), r.alreadyMerged},
                {QStringLiteral("added"), r.added}, {QStringLiteral("changed"), r.changed},
                {QStringLiteral("deleted"), r.deleted}, {QStringLiteral("conflicts"), r.conflicts},
                {QStringLiteral("seconds"), r.seconds},
                {QStringLiteral("withdrawn"), [&] {
                     QJsonArray withdrawn;
                     for (const WithdrawnWork &w : r.withdrawn)
                         withdrawn.append(QJsonObject {{QStringLiteral("article"), w.article},
                             {QStringLiteral("phase"), w.phase}});
                     return withdrawn;
                 }()}});
        printJson(QJsonObject {{QStringLiteral("merged"), items},
            {QStringLiteral("openConflicts"), qint64(open->size())}});
        return ExitOk;
    }
    for (const MergeReport &r : *reports) {
        if (r.alreadyMerged)
            out(QCoreApplication::translate("cli", "%1 (%2): nothing new; it was merged before.")
                    .arg(r.path, r.coderPseudonym));
        else
            out(QCoreApplication::translate("cli",
                "%1 (%2): added %3, changed %4 (of which deleted %5), conflicts %6, coding time "
                "%7 s.")
                    .arg(r.path, r.coderPseudonym)
                    .arg(r.added)
                    .arg(r.changed)
                    .arg(r.deleted)
                    .arg(r.conflicts)
                    .arg(r.seconds));
        if (const QString notice = CoderCopies::withdrawnNotice(r); !notice.isEmpty())
            out(notice);
    }
    if (!open->empty())
        out(QCoreApplication::translate("cli",
            "Open conflicts waiting for your decision: %1 (see fourfold-cli merge %2 "
            "--conflicts).")
                .arg(open->size())
                .arg(positional.first()));
    return ExitOk;
}

} // namespace fourfold::cli
