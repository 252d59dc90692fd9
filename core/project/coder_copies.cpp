#include "core/project/coder_copies.h"

#include "core/project/project.h"
#include "core/store/coder_table.h"
#include "core/store/event_log.h"
#include "core/store/project_tables.h"
#include "core/store/savepoint.h"
#include "core/store/schema.h"
#include "core/store/store_util.h"
#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("CoderCopies", text);
}

const QString kProjectUuidKey = QStringLiteral("project_uuid");
const QString kCopyUuidKey = QStringLiteral("copy_uuid");
const QString kCopyOfKey = QStringLiteral("copy_of");
const QString kCopyCoderKey = QStringLiteral("copy_coder");
const QString kCopyHandedOutKey = QStringLiteral("copy_handed_out_at");

Result<std::optional<CopyInfo>> readCopyInfo(const Database &db)
{
    CopyInfo info;
    const std::pair<const QString *, QString *> keys[] = {{&kCopyUuidKey, &info.copyUuid},
        {&kCopyOfKey, &info.originProjectUuid}, {&kCopyCoderKey, &info.coderUuid},
        {&kCopyHandedOutKey, &info.handedOutAt}};
    for (const auto &[key, target] : keys) {
        auto value = store::setting(db, *key);
        if (!value)
            return std::unexpected(value.error());
        if (!*value)
            return std::optional<CopyInfo> {};
        *target = **value;
    }
    return std::optional<CopyInfo> {info};
}

Result<Coder> findCoder(const Database &db, const QString &nameOrPseudonym)
{
    auto all = store::coders(db);
    if (!all)
        return std::unexpected(all.error());
    for (const Coder &c : *all)
        if (c.pseudonym == nameOrPseudonym)
            return c;
    std::vector<Coder> byName;
    for (const Coder &c : *all)
        if (c.name == nameOrPseudonym)
            byName.push_back(c);
    if (byName.size() > 1)
        return fail(ErrorCode::InvalidArgument,
            tr("Several coders are called \"%1\"; name the coder by pseudonym.")
                .arg(nameOrPseudonym));
    if (byName.empty())
        return fail(ErrorCode::NotFound,
            tr("There is no coder with the pseudonym or name \"%1\" in the project.")
                .arg(nameOrPseudonym));
    return byName.front();
}

Result<std::optional<Coder>> coderByUuid(const Database &db, const QString &uuid)
{
    auto all = store::coders(db);
    if (!all)
        return std::unexpected(all.error());
    for (const Coder &c : *all)
        if (c.uuid == uuid)
            return std::optional<Coder> {c};
    return std::optional<Coder> {};
}

void removeFiles(const QString &path)
{
    for (const char *suffix : {"", "-wal", "-shm", "-journal"})
        QFile::remove(path + QLatin1String(suffix));
}

// Writes the copy's whole content into the fresh file `copyDb`.
Status writeCopy(Database &copyDb, const QString &sourcePath, const Coder &coder,
    const QString &copyUuid, const QString &originUuid)
{
    FOURFOLD_TRY_STATUS(prepareSchema(copyDb));
    FOURFOLD_TRY_STATUS(store::attachSource(copyDb, sourcePath));
    FOURFOLD_TRY_STATUS(copyDb.exec(QStringLiteral("BEGIN IMMEDIATE")));
    auto body = [&]() -> Status {
        FOURFOLD_TRY_STATUS(store::copyHandoutRows(copyDb, coder.uuid));
        auto name = store::setting(copyDb, QStringLiteral("name"));
        if (!name)
            return std::unexpected(name.error());
        FOURFOLD_TRY_STATUS(store::setSetting(copyDb, QStringLiteral("name"),
            tr("%1 (copy for %2)").arg(name->value_or(QString()), coder.pseudonym)));
        FOURFOLD_TRY_STATUS(store::setSetting(copyDb, kProjectUuidKey, copyUuid));
        FOURFOLD_TRY_STATUS(store::setSetting(copyDb, kCopyUuidKey, copyUuid));
        FOURFOLD_TRY_STATUS(store::setSetting(copyDb, kCopyOfKey, originUuid));
        FOURFOLD_TRY_STATUS(store::setSetting(copyDb, kCopyCoderKey, coder.uuid));
        FOURFOLD_TRY_STATUS(store::setSetting(copyDb, kCopyHandedOutKey, store::now()));
        auto rows = store::portableRows(copyDb, coder.uuid);
        if (!rows)
            return std::unexpected(rows.error());
        for (const store::PortableRow &row : *rows)
            FOURFOLD_TRY_STATUS(store::setCopyBase(
                copyDb, copyUuid, row, store::BaseEntry {row.digest(), row.seconds}));
        return store::appendEvent(copyDb, CoderId {}, QStringLiteral("copy.create"),
            QStringLiteral("copy"), copyUuid,
            QJsonObject {{QStringLiteral("copy_of"), originUuid},
                {QStringLiteral("coder"), coder.pseudonym}});
    };
    if (auto st = body(); !st) {
        (void)copyDb.exec(QStringLiteral("ROLLBACK"));
        (void)store::detachSource(copyDb);
        return st;
    }
    FOURFOLD_TRY_STATUS(copyDb.exec(QStringLiteral("COMMIT")));
    return store::detachSource(copyDb);
}

// Checks that `copyDb` is a coder copy of the project `mainDb` (uuid `mainUuid`) that may be
// merged, and returns its settings and coder.
Result<std::pair<CopyInfo, Coder>> checkCopy(
    Database &copyDb, const Database &mainDb, const QString &mainUuid, const QString &path)
{
    auto appId = store::scalar(copyDb, QStringLiteral("PRAGMA application_id"));
    if (!appId)
        return std::unexpected(appId.error());
    auto version = schemaVersion(copyDb);
    if (!version)
        return std::unexpected(version.error());
    if (*appId != kApplicationId)
        return fail(ErrorCode::InvalidInput,
            tr("%1 is not a Fourfold project file; it was not merged.").arg(path));
    if (*version > kSchemaVersion)
        return fail(ErrorCode::NewerSchema,
            tr("%1 was written by a newer Fourfold (schema version %2); it was not merged.")
                .arg(path)
                .arg(*version));
    auto info = *version >= 4 ? readCopyInfo(copyDb) : std::optional<CopyInfo> {};
    if (!info)
        return std::unexpected(info.error());
    if (!*info)
        return fail(ErrorCode::InvalidInput,
            tr("%1 is a project file but not a coder copy; it was not merged.").arg(path));
    const CopyInfo copy = **info;
    if (mainUuid.isEmpty() || copy.originProjectUuid != mainUuid)
        return fail(ErrorCode::InvalidInput,
            tr("%1 is a coder copy of another project (%2), not of this one (%3); it was not "
               "merged.")
                .arg(path, copy.originProjectUuid, mainUuid));
    auto coder = coderByUuid(mainDb, copy.coderUuid);
    if (!coder)
        return std::unexpected(coder.error());
    if (!*coder)
        return fail(ErrorCode::InvalidInput,
            tr("The coder of %1 is no longer in the project; it was not merged.").arg(path));

    auto articles = store::articleFingerprints(copyDb);
    if (!articles)
        return std::unexpected(articles.error());
    for (const store::ArticleFingerprint &a : *articles) {
        auto mainSha = store::articleSha256(mainDb, a.uuid);
        if (!mainSha)
            return std::unexpected(mainSha.error());
        if (!*mainSha)
            return fail(ErrorCode::InvalidInput,
                tr("%1 holds article \"%2\", which is not in the project; it was not merged.")
                    .arg(path, a.externalId));
        const QString copySha = textSha256(a.text);
        if (copySha != **mainSha || a.sha256 != **mainSha)
            return fail(ErrorCode::InvalidInput,
                tr("The text of article \"%1\" in %2 differs from the project's (SHA-256 %3 "
                   "instead of %4): the copy was changed outside Fourfold; it was not merged.")
                    .arg(a.externalId, path, copySha, **mainSha));
    }
    auto copyBooks = store::codebookVersionUuids(copyDb);
    if (!copyBooks)
        return std::unexpected(copyBooks.error());
    auto mainBooks = store::codebookVersionUuids(mainDb);
    if (!mainBooks)
        return std::unexpected(mainBooks.error());
    for (const QString &book : *copyBooks)
        if (!mainBooks->contains(book))
            return fail(ErrorCode::InvalidInput,
                tr("%1 holds a codebook version (%2) that is not in the project; it was not "
                   "merged.")
                    .arg(path, book));
    auto others = store::rowsOfOtherCoders(copyDb, copy.coderUuid);
    if (!others)
        return std::unexpected(others.error());
    if (*others > 0)
        return fail(ErrorCode::InvalidInput,
            tr("%1 holds %2 annotations, answers or assignments of people other than its coder "
               "%3; it was not merged.")
                .arg(path)
                .arg(*others)
                .arg((*coder)->pseudonym));
    return std::pair {copy, **coder};
}

Result<MergeReport> mergeOne(Database &mainDb, const QString &mainUuid, const QString &path)
{
    if (!QFileInfo::exists(path))
        return fail(ErrorCode::NotFound, tr("There is no coder copy %1.").arg(path));
    auto copyDb = Database::open(path, Database::OpenMode::ReadOnly);
    if (!copyDb)
        return std::unexpected(copyDb.error());
    auto checked = checkCopy(*copyDb, mainDb, mainUuid, path);
    if (!checked)
        return std::unexpected(checked.error());
    const auto &[info, coder] = *checked;

    MergeReport report;
    report.path = path;
    report.copyUuid = info.copyUuid;
    report.coderPseudonym = coder.pseudonym;

    auto rows = store::portableRows(*copyDb, info.coderUuid);
    if (!rows)
        return std::unexpected(rows.error());
    // Spans written outside Fourfold must still lie in their text and quote it exactly.
    auto texts = store::articleFingerprints(*copyDb);
    if (!texts)
        return std::unexpected(texts.error());
    QHash<QString, QString> textByUuid;
    for (const store::ArticleFingerprint &a : *texts)
        textByUuid.insert(a.uuid, a.text);
    for (const store::PortableRow &row : *rows) {
        if (row.type != QLatin1String("annotation"))
            continue;
        const QString text =
            textByUuid.value(row.content.value(QLatin1String("article")).toString());
        const TextRange range {row.content.value(QLatin1String("start")).toInteger(),
            row.content.value(QLatin1String("end")).toInteger()};
        const OffsetMap map(text);
        if (!range.isValid() || range.isEmpty() || range.end > map.codePointCount()
            || OffsetMap::slice(text, range)
                != row.content.value(QLatin1String("quote")).toString())
            return fail(ErrorCode::InvalidInput,
                tr("Span %1 in %2 does not quote its article's text at [%3, %4); the copy was "
                   "changed outside Fourfold; it was not merged.")
                    .arg(row.uuid, path)
                    .arg(range.start)
                    .arg(range.end));
    }
    auto mainRowList = store::portableRows(mainDb, info.coderUuid);
    if (!mainRowList)
        return std::unexpected(mainRowList.error());
    QHash<QString, store::PortableRow> mainRows;
    for (const store::PortableRow &r : *mainRowList)
        mainRows.insert(r.key(), r);
    auto copyBase = store::copyBase(*copyDb, info.copyUuid);
    if (!copyBase)
        return std::unexpected(copyBase.error());
    auto mainBase = store::copyBase(mainDb, info.copyUuid);
    if (!mainBase)
        return std::unexpected(mainBase.error());

    auto sp = Savepoint::begin(mainDb);
    if (!sp)
        return std::unexpected(sp.error());
    qint64 writes = 0;
    for (const store::PortableRow &row : *rows) {
        const QString key = row.key();
        const QString theirs = row.digest();
        std::optional<store::BaseEntry> base;
        if (mainBase->contains(key))
            base = mainBase->value(key);
        else if (copyBase->contains(key))
            base = copyBase->value(key);
        const auto mine = mainRows.constFind(key);

        // A live answer of the copy may meet another live answer to the same item in the
        // project (both made independently): that is a conflict, not something to overwrite.
        std::optional<store::PortableRow> rival;
        if (row.type == QLatin1String("judgement") && !row.isDeleted()) {
            auto other = store::otherLiveJudgement(mainDb, row);
            if (!other)
                return std::unexpected(other.error());
            if (*other)
                rival = mainRows.value(QStringLiteral("judgement/") + **other);
        }

        bool conflict = false;
        bool inserted = false;
        if (base && base->digest == theirs) {
            // Unchanged in the copy: whatever the project holds stands.
        } else if (mine != mainRows.cend() && mine->digest() == theirs) {
            // The same change on both sides.
        } else if (rival) {
            conflict = true;
        } else if (mine == mainRows.cend() || (base && mine->digest() == base->digest)) {
            FOURFOLD_TRY_STATUS(store::writePortableRow(mainDb, row));
            ++writes;
            if (mine == mainRows.cend()) {
                inserted = true;
                ++report.added;
            } else {
                ++report.changed;
                if (row.isDeleted() && !mine->isDeleted())
                    ++report.deleted;
            }
        } else {
            conflict = true;
        }
        if (conflict) {
            store::MergeConflict c;
            c.objectType = row.type;
            c.objectUuid = row.uuid;
            c.copyUuid = info.copyUuid;
            c.mine = rival ? rival->content : mine->content;
            c.theirs = row.content;
            auto recorded = store::recordConflict(mainDb, c);
            if (!recorded)
                return std::unexpected(recorded.error());
            if (*recorded) {
                ++report.conflicts;
                ++writes;
            }
        }

        qint64 seconds = 0;
        if (row.type == QLatin1String("assignment")) {
            seconds = row.seconds;
            const qint64 delta = row.seconds - (base ? base->seconds : 0);
            if (!inserted && delta > 0 && mine != mainRows.cend()) {
                FOURFOLD_TRY_STATUS(store::addPortableSeconds(mainDb, row, delta));
                report.seconds += delta;
                ++writes;
            }
        }
        // The base is the copy's version as last agreed: it moves to `theirs` unless the two
        // sides are in conflict, when it stays until the lead decides.
        const store::BaseEntry next {
            conflict ? (base ? base->digest : QString()) : theirs, seconds};
        const auto recordedBase = mainBase->constFind(key);
        if (recordedBase == mainBase->cend() || recordedBase->digest != next.digest
            || recordedBase->seconds != next.seconds) {
            FOURFOLD_TRY_STATUS(store::setCopyBase(mainDb, info.copyUuid, row, next));
            ++writes;
        }
    }
    // The coder's own log of the copy joins the project's, once.
    auto lastEvent = store::lastMergedCopyEvent(mainDb, info.copyUuid);
    if (!lastEvent)
        return std::unexpected(lastEvent.error());
    auto events = store::copyEvents(*copyDb, *lastEvent);
    if (!events)
        return std::unexpected(events.error());
    if (writes == 0 && events->empty()) {
        report.alreadyMerged = true;
        return report; // the savepoint rolls back: nothing was written
    }
    for (const store::CopyEvent &e : *events)
        FOURFOLD_TRY_STATUS(store::appendCopyEvent(mainDb, e, coder.id, info.copyUuid));
    const QJsonObject detail {{QStringLiteral("file"), QFileInfo(path).fileName()},
        {QStringLiteral("coder"), coder.pseudonym}, {QStringLiteral("added"), report.added},
        {QStringLiteral("changed"), report.changed}, {QStringLiteral("deleted"), report.deleted},
        {QStringLiteral("conflicts"), report.conflicts},
        {QStringLiteral("seconds"), report.seconds}};
    QJsonObject record = detail;
    record.insert(
        QStringLiteral("events_through"), events->empty() ? *lastEvent : events->back().id);
    FOURFOLD_TRY_STATUS(store::insertCopyMerge(mainDb, info.copyUuid, coder.id, record));
    FOURFOLD_TRY_STATUS(store::appendEvent(mainDb, CoderId {}, QStringLiteral("copy.merge"),
        QStringLiteral("copy"), info.copyUuid, detail));
    FOURFOLD_TRY_STATUS(sp->commit());
    return report;
}

} // namespace

Result<std::optional<CopyInfo>> CoderCopies::copyInfo(const Project &project)
{
    return readCopyInfo(project.m_db);
}

Result<HandoutReport> CoderCopies::handout(
    Project &project, const QString &coderName, const QString &outPath)
{
    auto own = readCopyInfo(project.m_db);
    if (!own)
        return std::unexpected(own.error());
    if (*own)
        return fail(ErrorCode::Unsupported,
            tr("%1 is itself a coder copy; hand out copies from the main project.")
                .arg(project.path()));
    auto coder = findCoder(project.m_db, coderName);
    if (!coder)
        return std::unexpected(coder.error());
    if (QFileInfo::exists(outPath))
        return fail(ErrorCode::Duplicate,
            tr("%1 already exists; choose another name for the coder copy.").arg(outPath));
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    if (std::ranges::none_of(
            *assignments, [&](const Assignment &a) { return a.coder == coder->id; }))
        return fail(ErrorCode::NotFound,
            tr("Coder %1 has no assigned articles; assign some before handing out a copy.")
                .arg(coder->pseudonym));

    auto origin = store::setting(project.m_db, kProjectUuidKey);
    if (!origin)
        return std::unexpected(origin.error());
    QString originUuid = origin->value_or(QString());
    if (originUuid.isEmpty()) {
        // Files made before projects had an identity get one now; their copies refer to it.
        originUuid = store::newUuid();
        FOURFOLD_TRY_STATUS(store::setSetting(project.m_db, kProjectUuidKey, originUuid));
    }

    const QString copyUuid = store::newUuid();
    HandoutReport report;
    {
        auto copyDb = Database::open(outPath, Database::OpenMode::ReadWriteCreate);
        if (!copyDb)
            return std::unexpected(copyDb.error());
        auto written = writeCopy(*copyDb, project.path(), *coder, copyUuid, originUuid);
        if (written) {
            auto counts = store::projectCounts(*copyDb);
            if (!counts) {
                written = std::unexpected(counts.error());
            } else {
                report.articles = counts->articles;
                report.assignments = counts->assignments;
                report.annotations = counts->annotations;
                report.links = counts->links;
                report.judgements = counts->judgements;
            }
        }
        if (!written) {
            *copyDb = Database();
            removeFiles(outPath);
            return std::unexpected(written.error());
        }
    }
    if (auto st = store::appendEvent(project.m_db, CoderId {}, QStringLiteral("copy.handout"),
            QStringLiteral("copy"), copyUuid,
            QJsonObject {{QStringLiteral("coder"), coder->pseudonym}});
        !st) {
        removeFiles(outPath);
        return std::unexpected(st.error());
    }
    report.path = outPath;
    report.copyUuid = copyUuid;
    report.coder = *coder;
    return report;
}

Result<std::vector<MergeReport>> CoderCopies::merge(Project &project, const QStringList &paths)
{
    auto own = readCopyInfo(project.m_db);
    if (!own)
        return std::unexpected(own.error());
    if (*own)
        return fail(ErrorCode::Unsupported,
            tr("%1 is itself a coder copy; merge copies into the main project.")
                .arg(project.path()));
    auto mainUuid = store::setting(project.m_db, kProjectUuidKey);
    if (!mainUuid)
        return std::unexpected(mainUuid.error());
    auto sp = Savepoint::begin(project.m_db);
    if (!sp)
        return std::unexpected(sp.error());
    std::vector<MergeReport> reports;
    for (const QString &path : paths) {
        auto one = mergeOne(project.m_db, mainUuid->value_or(QString()), path);
        if (!one)
            return std::unexpected(one.error());
        reports.push_back(*one);
    }
    FOURFOLD_TRY_STATUS(sp->commit());
    return reports;
}

Result<std::vector<store::MergeConflict>> CoderCopies::conflicts(const Project &project, bool all)
{
    return store::mergeConflicts(project.m_db, all);
}

Status CoderCopies::resolve(Project &project, const QString &uuid, const QString &keep)
{
    if (keep != QLatin1String("mine") && keep != QLatin1String("theirs"))
        return fail(ErrorCode::InvalidArgument,
            tr("Keep \"mine\" (the project's version) or \"theirs\" (the copy's), not \"%1\".")
                .arg(keep));
    auto open = store::mergeConflicts(project.m_db, false);
    if (!open)
        return std::unexpected(open.error());
    std::vector<store::MergeConflict> matches;
    for (const store::MergeConflict &c : *open)
        if (c.uuid == uuid)
            matches = {c};
    if (matches.empty())
        for (const store::MergeConflict &c : *open)
            if (c.objectUuid == uuid)
                matches.push_back(c);
    if (matches.empty())
        return fail(ErrorCode::NotFound, tr("There is no open conflict %1.").arg(uuid));
    if (matches.size() > 1)
        return fail(ErrorCode::InvalidArgument,
            tr("%1 has %2 open conflicts (from several copies); name the conflict's uuid.")
                .arg(uuid)
                .arg(matches.size()));
    const store::MergeConflict &c = matches.front();
    store::PortableRow theirs {c.objectType, c.objectUuid, c.theirs, 0};

    auto sp = Savepoint::begin(project.m_db);
    if (!sp)
        return std::unexpected(sp.error());
    auto base = store::copyBase(project.m_db, c.copyUuid);
    if (!base)
        return std::unexpected(base.error());
    const store::BaseEntry settled {theirs.digest(), base->value(theirs.key()).seconds};
    if (keep == QLatin1String("theirs")) {
        if (theirs.type == QLatin1String("judgement") && !theirs.isDeleted()) {
            auto other = store::otherLiveJudgement(project.m_db, theirs);
            if (!other)
                return std::unexpected(other.error());
            if (*other)
                FOURFOLD_TRY_STATUS(store::tombstoneJudgement(project.m_db, **other));
        }
        FOURFOLD_TRY_STATUS(store::writePortableRow(project.m_db, theirs));
    }
    // Either way the copy's version is now settled: merging this copy again changes nothing.
    FOURFOLD_TRY_STATUS(store::setCopyBase(project.m_db, c.copyUuid, theirs, settled));
    FOURFOLD_TRY_STATUS(store::setConflictResolution(project.m_db, c.uuid, keep));
    FOURFOLD_TRY_STATUS(store::appendEvent(project.m_db, CoderId {},
        QStringLiteral("conflict.resolve"), c.objectType, c.objectUuid,
        QJsonObject {{QStringLiteral("keep"), keep}, {QStringLiteral("conflict"), c.uuid}}));
    return sp->commit();
}

} // namespace fourfold
