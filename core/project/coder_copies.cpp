#include "core/project/coder_copies.h"

#include "core/project/conflict_edits.h"
#include "core/project/copy_validation.h"
#include "core/project/project.h"
#include "core/project/subsample_draw.h"
#include "core/store/coder_table.h"
#include "core/store/copy_holders.h"
#include "core/store/copy_tables.h"
#include "core/store/database.h"
#include "core/store/event_log.h"
#include "core/store/project_tables.h"
#include "core/store/savepoint.h"
#include "core/store/schema.h"
#include "core/store/store_util.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>
#include <QJsonArray>
#include <QSet>

#include <algorithm>
#include <limits>
#include <tuple>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CoderCopiesText {
    Q_DECLARE_TR_FUNCTIONS(CoderCopiesText)
};

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
            CoderCopiesText::tr("Several coders are called \"%1\"; name the coder by pseudonym.")
                .arg(nameOrPseudonym));
    if (byName.empty())
        return fail(ErrorCode::NotFound,
            CoderCopiesText::tr(
                "There is no coder with the pseudonym or name \"%1\" in the project.")
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
            CoderCopiesText::tr("%1 (copy for %2)")
                .arg(name->value_or(QString()), coder.pseudonym)));
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

// Records in the project the hand-out of copy `copyUuid` with the objects `rows`: their base
// entries and the "copy.handout" event (whose time is the hand-out time), all or nothing.
Status recordHandout(Database &mainDb, const QString &copyUuid, const Coder &coder,
    const std::vector<store::PortableRow> &rows)
{
    auto sp = Savepoint::begin(mainDb);
    if (!sp)
        return std::unexpected(sp.error());
    for (const store::PortableRow &row : rows)
        FOURFOLD_TRY_STATUS(store::setCopyBase(
            mainDb, copyUuid, row, store::BaseEntry {row.digest(), row.seconds}));
    FOURFOLD_TRY_STATUS(store::appendEvent(mainDb, CoderId {}, QStringLiteral("copy.handout"),
        QStringLiteral("copy"), copyUuid,
        QJsonObject {{QStringLiteral("coder"), coder.pseudonym}}));
    return sp->commit();
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
            CoderCopiesText::tr("%1 is not a Fourfold project file; it was not merged.").arg(path));
    if (*version > kSchemaVersion)
        return fail(ErrorCode::NewerSchema,
            CoderCopiesText::tr(
                "%1 was written by a newer Fourfold (schema version %2); it was not merged.")
                .arg(path)
                .arg(*version));
    auto info = *version >= 4 ? readCopyInfo(copyDb) : std::optional<CopyInfo> {};
    if (!info)
        return std::unexpected(info.error());
    if (!*info)
        return fail(ErrorCode::InvalidInput,
            CoderCopiesText::tr("%1 is a project file but not a coder copy; it was not merged.")
                .arg(path));
    const CopyInfo copy = **info;
    if (mainUuid.isEmpty() || copy.originProjectUuid != mainUuid)
        return fail(ErrorCode::InvalidInput,
            CoderCopiesText::tr(
                "%1 is a coder copy of another project (%2), not of this one (%3); it was not "
                "merged.")
                .arg(path, copy.originProjectUuid, mainUuid));
    auto coder = coderByUuid(mainDb, copy.coderUuid);
    if (!coder)
        return std::unexpected(coder.error());
    if (!*coder)
        return fail(ErrorCode::InvalidInput,
            CoderCopiesText::tr("The coder of %1 is no longer in the project; it was not merged.")
                .arg(path));

    auto articles = store::articleFingerprints(copyDb);
    if (!articles)
        return std::unexpected(articles.error());
    for (const store::ArticleFingerprint &a : *articles) {
        auto mainSha = store::articleSha256(mainDb, a.uuid);
        if (!mainSha)
            return std::unexpected(mainSha.error());
        if (!*mainSha)
            return fail(ErrorCode::InvalidInput,
                CoderCopiesText::tr(
                    "%1 holds article \"%2\", which is not in the project; it was not merged.")
                    .arg(path, a.externalId));
        const QString copySha = textSha256(a.text);
        if (copySha != **mainSha || a.sha256 != **mainSha)
            return fail(ErrorCode::InvalidInput,
                CoderCopiesText::tr(
                    "The text of article \"%1\" in %2 differs from the project's (SHA-256 %3 "
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
                CoderCopiesText::tr(
                    "%1 holds a codebook version (%2) that is not in the project; it was not "
                    "merged.")
                    .arg(path, book));
    auto others = store::rowsOfOtherCoders(copyDb, copy.coderUuid);
    if (!others)
        return std::unexpected(others.error());
    if (*others > 0)
        return fail(ErrorCode::InvalidInput,
            CoderCopiesText::tr(
                "%1 holds %2 annotations, answers or assignments of people other than its coder "
                "%3; it was not merged.")
                .arg(path)
                .arg(*others)
                .arg((*coder)->pseudonym));
    return std::pair {copy, **coder};
}

// One version of an object competing for its place in the project, and the copy that brought it
// ("" for the project's own).
struct Version {
    store::PortableRow row;
    QString copy;
    bool inProject = false;
};

// The deterministic order of versions in conflict: the later modification time wins, then the
// higher digest (objects without a modification time, links and statuses, by digest alone).
bool laterThan(const store::PortableRow &a, const store::PortableRow &b)
{
    const QString at = a.content.value(QLatin1String("modified_at")).toString();
    const QString bt = b.content.value(QLatin1String("modified_at")).toString();
    if (at != bt)
        return at > bt;
    return a.digest() > b.digest();
}

// Adds `v` to `versions` unless a version with the same content is there; of two such, the one
// modified later stays (so the same change made in two copies leaves the same row in any order).
void addVersion(std::vector<Version> &versions, Version v)
{
    const QString digest = v.row.digest();
    for (Version &old : versions)
        if (old.row.digest() == digest) {
            if (laterThan(v.row, old.row))
                old = std::move(v);
            return;
        }
    versions.push_back(std::move(v));
}

// Makes the open conflicts of `object` exactly the `losers`, each kept against `winner`:
// conflicts whose version is no longer a loser (superseded by a copy built on it, or now the
// winner) are removed, the others updated, new losers added. Counts new conflicts in `added`.
Status reconcileConflicts(Database &db, const store::PortableRow &object,
    const std::vector<Version> &losers, const QJsonObject &winner, qint64 &added, qint64 &writes)
{
    auto open = store::openConflictsOf(db, object.type, object.uuid);
    if (!open)
        return std::unexpected(open.error());
    std::vector<bool> matched(losers.size(), false);
    for (const MergeConflict &c : *open) {
        const QString digest = store::PortableRow {object.type, object.uuid, c.theirs, 0}.digest();
        const auto hit = std::ranges::find_if(
            losers, [&](const Version &v) { return v.row.digest() == digest; });
        if (hit == losers.end()) {
            FOURFOLD_TRY_STATUS(store::removeConflict(db, c.uuid));
            ++writes;
            continue;
        }
        matched[std::size_t(hit - losers.begin())] = true;
        if (c.theirs != hit->row.content || c.mine != winner) {
            FOURFOLD_TRY_STATUS(store::updateConflict(db, c.uuid, winner, hit->row.content));
            ++writes;
        }
    }
    for (std::size_t i = 0; i < losers.size(); ++i) {
        if (matched[i])
            continue;
        MergeConflict c;
        c.objectType = object.type;
        c.objectUuid = object.uuid;
        c.copyUuid = losers[i].copy;
        c.mine = winner;
        c.theirs = losers[i].row.content;
        FOURFOLD_TRY_STATUS(store::insertConflict(db, c));
        ++added;
        ++writes;
    }
    return {};
}

// The copy a version of the project came from: the copy, other than `exceptCopy`, whose agreed
// base it is (the copy whose merge brought it, or one handed out with it); "" if none.
Result<QString> broughtBy(
    const Database &db, const store::PortableRow &row, const QString &exceptCopy)
{
    return store::copyWithBase(db, row, row.digest(), exceptCopy);
}

// Writes the live answer `winner`, which may meet another live answer to the same item (made
// independently in another copy): the later one is written live, the other set aside as a
// tombstone (its modification time kept) and kept as a conflict. True if `winner` was set aside
// (its conflict is then the open conflict of its object).
Result<bool> writeAnswer(Database &db, const Version &winner,
    const QHash<QString, store::PortableRow> &mainRows, qint64 &conflicts, qint64 &writes)
{
    auto other = store::otherLiveJudgement(db, winner.row);
    if (!other)
        return std::unexpected(other.error());
    if (!*other) {
        FOURFOLD_TRY_STATUS(store::writePortableRow(db, winner.row));
        return false;
    }
    const store::PortableRow rival = mainRows.value(QStringLiteral("judgement/") + **other);
    if (laterThan(winner.row, rival)) {
        auto by = broughtBy(db, rival, QString());
        if (!by)
            return std::unexpected(by.error());
        FOURFOLD_TRY_STATUS(store::setAsideJudgement(db, rival.uuid));
        FOURFOLD_TRY_STATUS(store::writePortableRow(db, winner.row));
        FOURFOLD_TRY_STATUS(reconcileConflicts(
            db, rival, {Version {rival, *by, true}}, winner.row.content, conflicts, writes));
        return false;
    }
    store::PortableRow setAside = winner.row;
    setAside.content.insert(QStringLiteral("deleted"), 1);
    FOURFOLD_TRY_STATUS(store::writePortableRow(db, setAside));
    FOURFOLD_TRY_STATUS(
        reconcileConflicts(db, winner.row, {winner}, rival.content, conflicts, writes));
    return true;
}

// The project's record of the copy: when it was handed out and the base of every object.
Result<CopyHandout> handoutRecord(const Database &mainDb, const Database &copyDb,
    const CopyInfo &info, const Coder &coder, const QString &path)
{
    CopyHandout h;
    h.copyUuid = info.copyUuid;
    h.coder = coder;
    auto at = store::handoutTime(mainDb, info.copyUuid);
    if (!at)
        return std::unexpected(at.error());
    if (!*at)
        return fail(ErrorCode::InvalidInput,
            CoderCopiesText::tr(
                "%1 names a copy (%2) that this project never handed out; it was not merged.")
                .arg(path, info.copyUuid));
    h.handedOutAt = parseStoredTime(**at);
    auto base = store::copyBase(mainDb, info.copyUuid);
    if (!base)
        return std::unexpected(base.error());
    if (base->isEmpty()) {
        // Copies handed out before the project kept their base: the copy's own record.
        base = store::copyBase(copyDb, info.copyUuid);
        if (!base)
            return std::unexpected(base.error());
    }
    h.base = std::move(*base);
    h.collectArticles();
    return h;
}

// The keys of the copy's live assignments that the project withdrew after the copy's base (no
// row any more, a tombstone, or a row made anew by another draw, with another uuid) and that the
// coder worked on in the copy: the assignment changed (its status, or its coding time), or a span
// or answer on its article and phase new or changed.
QSet<QString> workOnWithdrawn(const std::vector<store::PortableRow> &rows,
    const QHash<QString, store::PortableRow> &mainRows,
    const QHash<QString, store::BaseEntry> &base)
{
    const auto changed = [&](const store::PortableRow &row) {
        const auto b = base.constFind(row.key());
        return b == base.cend() || b->digest != row.digest()
            || (row.type == QLatin1String("assignment") && row.seconds > b->seconds);
    };
    const auto placeOf = [](const store::PortableRow &row) {
        return QStringLiteral("assignment/")
            + row.content.value(QLatin1String("article")).toString() + QLatin1Char('/')
            + row.content.value(QLatin1String("phase")).toString();
    };
    QSet<QString> candidates;
    for (const store::PortableRow &row : rows) {
        if (row.type != QLatin1String("assignment") || row.isDeleted() || !base.contains(row.key()))
            continue;
        const auto mine = mainRows.constFind(row.key());
        if (mine == mainRows.cend() || mine->isDeleted() || mine->uuid != row.uuid)
            candidates.insert(row.key());
    }
    QSet<QString> worked;
    for (const store::PortableRow &row : rows)
        if ((row.type == QLatin1String("assignment") || row.type == QLatin1String("annotation")
                || row.type == QLatin1String("judgement"))
            && candidates.contains(placeOf(row)) && changed(row))
            worked.insert(placeOf(row));
    return worked;
}

Result<MergeReport> mergeOne(Database &mainDb, const QString &mainUuid, const QString &path)
{
    if (!QFileInfo::exists(path))
        return fail(
            ErrorCode::NotFound, CoderCopiesText::tr("There is no coder copy %1.").arg(path));
    auto copyDb = Database::open(path, Database::OpenMode::ReadOnly);
    if (!copyDb)
        return std::unexpected(copyDb.error());
    auto checked = checkCopy(*copyDb, mainDb, mainUuid, path);
    if (!checked)
        return std::unexpected(checked.error());
    const auto &[info, coder] = *checked;
    auto handout = handoutRecord(mainDb, *copyDb, info, coder, path);
    if (!handout)
        return std::unexpected(handout.error());
    const QDateTime now = QDateTime::currentDateTimeUtc();

    MergeReport report;
    report.path = path;
    report.copyUuid = info.copyUuid;
    report.coderPseudonym = coder.pseudonym;

    auto rows = store::portableRows(*copyDb, info.coderUuid);
    if (!rows)
        return std::unexpected(rows.error());
    auto texts = store::articleFingerprints(*copyDb);
    if (!texts)
        return std::unexpected(texts.error());
    QHash<QString, QString> textByUuid;
    QHash<QString, QString> externalIds;
    for (const store::ArticleFingerprint &a : *texts) {
        textByUuid.insert(a.uuid, a.text);
        externalIds.insert(a.uuid, a.externalId);
    }
    FOURFOLD_TRY_STATUS(
        validateCopyRows(mainDb, *rows, *handout, textByUuid, externalIds, path, now));
    auto lastEvent = store::lastMergedCopyEvent(mainDb, info.copyUuid);
    if (!lastEvent)
        return std::unexpected(lastEvent.error());
    auto events = store::copyEvents(*copyDb, *lastEvent);
    if (!events)
        return std::unexpected(events.error());
    FOURFOLD_TRY_STATUS(validateCopyEvents(mainDb, *events, *handout, path, now));

    auto mainRowList = store::portableRows(mainDb, info.coderUuid);
    if (!mainRowList)
        return std::unexpected(mainRowList.error());
    QHash<QString, store::PortableRow> mainRows;
    for (const store::PortableRow &r : *mainRowList)
        mainRows.insert(r.key(), r);
    auto recordedBase = store::copyBase(mainDb, info.copyUuid);
    if (!recordedBase)
        return std::unexpected(recordedBase.error());

    const QSet<QString> withdrawn = workOnWithdrawn(*rows, mainRows, handout->base);

    auto sp = Savepoint::begin(mainDb);
    if (!sp)
        return std::unexpected(sp.error());
    qint64 writes = 0;
    for (const store::PortableRow &row : *rows) {
        const QString key = row.key();
        const QString theirs = row.digest();
        const auto base = handout->base.constFind(key);
        const bool hasBase = base != handout->base.cend();
        const auto mine = mainRows.constFind(key);
        const bool inProject = mine != mainRows.cend();

        if (withdrawn.contains(key)) {
            // The coder worked on an assignment the project withdrew meanwhile (see the header):
            // the project's row stands and the copy's version waits for the lead as a conflict.
            store::PortableRow object = row;
            QJsonObject kept;
            if (inProject) {
                object.uuid = mine->uuid;
                kept = mine->content;
            } else {
                // No row at all (the draw was undone): the project gets the assignment as a
                // tombstone, as a withdrawal leaves it, which keeps the coder's time and gives
                // the conflict an object to decide on.
                store::PortableRow tombstone = row;
                tombstone.content.insert(QStringLiteral("status"), QStringLiteral("assigned"));
                tombstone.content.insert(QStringLiteral("deleted"), 1);
                FOURFOLD_TRY_STATUS(store::writePortableRow(mainDb, tombstone));
                ++writes;
                report.seconds += row.seconds - base->seconds;
                kept = tombstone.content;
            }
            auto open = store::openConflictsOf(mainDb, row.type, object.uuid);
            if (!open)
                return std::unexpected(open.error());
            std::vector<Version> versions;
            for (const MergeConflict &c : *open)
                addVersion(versions,
                    Version {store::PortableRow {row.type, object.uuid, c.theirs, 0}, c.copyUuid});
            const QString keptDigest = store::PortableRow {row.type, object.uuid, kept, 0}.digest();
            std::erase_if(versions, [&](const Version &v) {
                return v.row.digest() == base->digest || v.row.digest() == keptDigest;
            });
            object.content = row.content;
            addVersion(versions, Version {object, info.copyUuid});
            FOURFOLD_TRY_STATUS(
                reconcileConflicts(mainDb, object, versions, kept, report.conflicts, writes));
            report.withdrawn.push_back(WithdrawnWork {
                externalIds.value(row.content.value(QLatin1String("article")).toString()),
                row.content.value(QLatin1String("phase")).toString()});
        } else if (!hasBase || base->digest != theirs) {
            // Changed (or made) in the copy. The competing versions: the project's, the losers
            // of earlier conflicts, and the copy's, which supersedes the version it was made
            // from. The latest wins; the others stay open for the lead.
            auto open = store::openConflictsOf(mainDb, row.type, row.uuid);
            if (!open)
                return std::unexpected(open.error());
            std::vector<Version> versions;
            if (inProject)
                addVersion(versions, Version {*mine, QString(), true});
            for (const MergeConflict &c : *open)
                addVersion(versions,
                    Version {store::PortableRow {row.type, row.uuid, c.theirs, 0}, c.copyUuid});
            if (hasBase)
                std::erase_if(
                    versions, [&](const Version &v) { return v.row.digest() == base->digest; });
            addVersion(versions, Version {row, info.copyUuid});
            const auto winner = std::ranges::max_element(versions,
                [](const Version &a, const Version &b) { return laterThan(b.row, a.row); });
            const Version won = *winner;
            std::vector<Version> losers;
            for (Version &v : versions) {
                if (v.row.digest() == won.row.digest())
                    continue;
                if (v.inProject) {
                    auto by = broughtBy(mainDb, v.row, info.copyUuid);
                    if (!by)
                        return std::unexpected(by.error());
                    v.copy = *by;
                }
                losers.push_back(v);
            }
            bool setAside = false;
            if (!inProject || mine->content != won.row.content) {
                if (won.row.type == QLatin1String("judgement") && !won.row.isDeleted()) {
                    auto aside = writeAnswer(mainDb, won, mainRows, report.conflicts, writes);
                    if (!aside)
                        return std::unexpected(aside.error());
                    setAside = *aside;
                } else {
                    FOURFOLD_TRY_STATUS(store::writePortableRow(mainDb, won.row));
                }
                ++writes;
                if (!inProject) {
                    ++report.added;
                } else if (mine->digest() != won.row.digest()) {
                    ++report.changed;
                    if (won.row.isDeleted() && !mine->isDeleted())
                        ++report.deleted;
                }
            }
            if (!setAside)
                FOURFOLD_TRY_STATUS(reconcileConflicts(
                    mainDb, row, losers, won.row.content, report.conflicts, writes));
        }

        qint64 seconds = 0;
        if (row.type == QLatin1String("assignment")) {
            seconds = row.seconds;
            // validateCopyRows bounds the delta by the time since the hand-out.
            const qint64 delta = row.seconds - (hasBase ? base->seconds : 0);
            if (delta > 0 && inProject) {
                if (mine->seconds > std::numeric_limits<qint64>::max() - delta)
                    return fail(ErrorCode::InvalidInput,
                        CoderCopiesText::tr(
                            "The coding time in %1 would overflow the project's; it was not "
                            "merged.")
                            .arg(path));
                FOURFOLD_TRY_STATUS(store::addPortableSeconds(mainDb, row, delta));
                report.seconds += delta;
                ++writes;
            }
        }
        // The base is the copy's version as last seen: whichever version won, merging this copy
        // again changes nothing.
        const store::BaseEntry next {theirs, seconds};
        const auto recorded = recordedBase->constFind(key);
        if (recorded == recordedBase->cend() || recorded->digest != next.digest
            || recorded->seconds != next.seconds) {
            FOURFOLD_TRY_STATUS(store::setCopyBase(mainDb, info.copyUuid, row, next));
            ++writes;
        }
    }
    std::ranges::sort(report.withdrawn, [](const WithdrawnWork &a, const WithdrawnWork &b) {
        return std::tie(a.phase, a.article) < std::tie(b.phase, b.article);
    });
    // The coder's own log of the copy joins the project's, once.
    if (writes == 0 && events->empty()) {
        report.alreadyMerged = true;
        return report; // the savepoint rolls back: nothing was written
    }
    for (const store::CopyEvent &e : *events)
        FOURFOLD_TRY_STATUS(store::appendCopyEvent(mainDb, e, coder.id, info.copyUuid));
    QJsonObject detail {{QStringLiteral("file"), QFileInfo(path).fileName()},
        {QStringLiteral("coder"), coder.pseudonym}, {QStringLiteral("added"), report.added},
        {QStringLiteral("changed"), report.changed}, {QStringLiteral("deleted"), report.deleted},
        {QStringLiteral("conflicts"), report.conflicts},
        {QStringLiteral("seconds"), report.seconds}};
    QJsonObject record = detail;
    if (!report.withdrawn.empty()) {
        QJsonArray articles;
        for (const WithdrawnWork &w : report.withdrawn)
            articles.append(QJsonObject {
                {QStringLiteral("article"), w.article}, {QStringLiteral("phase"), w.phase}});
        detail.insert(QStringLiteral("withdrawn"), articles);
        record.insert(QStringLiteral("withdrawn"), articles);
    }
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
    return readCopyInfo(project.db());
}

Result<HandoutReport> CoderCopies::handout(
    Project &project, const QString &coderName, const QString &outPath)
{
    auto own = readCopyInfo(project.db());
    if (!own)
        return std::unexpected(own.error());
    if (*own)
        return fail(ErrorCode::Unsupported,
            CoderCopiesText::tr("%1 is itself a coder copy; hand out copies from the main project.")
                .arg(project.path()));
    auto coder = findCoder(project.db(), coderName);
    if (!coder)
        return std::unexpected(coder.error());
    if (QFileInfo::exists(outPath))
        return fail(ErrorCode::Duplicate,
            CoderCopiesText::tr("%1 already exists; choose another name for the coder copy.")
                .arg(outPath));
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    if (std::ranges::none_of(
            *assignments, [&](const Assignment &a) { return a.coder == coder->id; }))
        return fail(ErrorCode::NotFound,
            CoderCopiesText::tr(
                "Coder %1 has no assigned articles; assign some before handing out a copy.")
                .arg(coder->pseudonym));

    auto origin = store::setting(project.db(), kProjectUuidKey);
    if (!origin)
        return std::unexpected(origin.error());
    QString originUuid = origin->value_or(QString());
    if (originUuid.isEmpty()) {
        // Files made before projects had an identity get one now; their copies refer to it.
        originUuid = store::newUuid();
        FOURFOLD_TRY_STATUS(store::setSetting(project.db(), kProjectUuidKey, originUuid));
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
        // The project keeps its own record of what was handed out: a merge checks the copy
        // against it, never against the copy's record of itself.
        auto handedOut = written
            ? store::portableRows(*copyDb, coder->uuid)
            : Result<std::vector<store::PortableRow>>(std::unexpected(written.error()));
        if (handedOut)
            written = recordHandout(project.db(), copyUuid, *coder, *handedOut);
        else
            written = std::unexpected(handedOut.error());
        if (!written) {
            *copyDb = Database();
            removeFiles(outPath);
            return std::unexpected(written.error());
        }
    }
    report.path = outPath;
    report.copyUuid = copyUuid;
    report.coder = *coder;
    return report;
}

Result<std::vector<MergeReport>> CoderCopies::merge(Project &project, const QStringList &paths)
{
    auto own = readCopyInfo(project.db());
    if (!own)
        return std::unexpected(own.error());
    if (*own)
        return fail(ErrorCode::Unsupported,
            CoderCopiesText::tr("%1 is itself a coder copy; merge copies into the main project.")
                .arg(project.path()));
    auto mainUuid = store::setting(project.db(), kProjectUuidKey);
    if (!mainUuid)
        return std::unexpected(mainUuid.error());
    auto sp = Savepoint::begin(project.db());
    if (!sp)
        return std::unexpected(sp.error());
    std::vector<MergeReport> reports;
    for (const QString &path : paths) {
        auto one = mergeOne(project.db(), mainUuid->value_or(QString()), path);
        if (!one)
            return std::unexpected(one.error());
        reports.push_back(*one);
    }
    FOURFOLD_TRY_STATUS(sp->commit());
    return reports;
}

Result<std::vector<CopyOut>> CoderCopies::copiesHoldingDraw(const Project &project, Phase phase)
{
    auto draw = SubsampleDraw::recorded(project, phase);
    if (!draw)
        return std::unexpected(draw.error());
    if (!*draw)
        return std::vector<CopyOut> {};
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    QStringList uuids;
    for (const ArticleSummary &a : *articles)
        if ((*draw)->articles.contains(a.externalId))
            uuids << a.uuid;
    auto held = store::copiesHolding(project.db(), phaseKey(phase), uuids, (*draw)->coders);
    if (!held)
        return std::unexpected(held.error());
    std::vector<CopyOut> out;
    for (store::CopyHolding &h : *held)
        out.push_back(CopyOut {h.coder, h.copyUuid, h.handedOutAt, std::move(h.articles)});
    return out;
}

QString CoderCopies::copyOutNotice(const CopyOut &copy)
{
    const int count = int(copy.articles.size());
    return CoderCopiesText::tr(
        "%1's coder copy, handed out %2, holds %n of the withdrawn assignments (%3): what %1 "
        "codes there still comes back at the merge, named, for you to decide.",
        nullptr, count)
        .arg(copy.coder, copy.handedOutAt.left(16).replace(QLatin1Char('T'), QLatin1Char(' ')),
            copy.articles.join(QStringLiteral(", ")));
}

QString CoderCopies::withdrawnNotice(const MergeReport &report)
{
    if (report.withdrawn.empty())
        return {};
    const int count = int(report.withdrawn.size());
    QStringList articles;
    for (const WithdrawnWork &w : report.withdrawn)
        articles << QStringLiteral("%1 (%2)").arg(w.article, w.phase);
    return CoderCopiesText::tr(
        "%1 coded %n article(s) in the copy after the assignment was withdrawn in the project "
        "(a withdrawn draw): %2. The codings were merged; the assignments stay withdrawn and do "
        "not count. Decide each in the merge conflicts: keep the withdrawal, or take %1's "
        "version to assign the article again.",
        nullptr, count)
        .arg(report.coderPseudonym, articles.join(QStringLiteral(", ")));
}

bool CoderCopies::isWithdrawnAssignment(const MergeConflict &conflict)
{
    if (conflict.objectType != QLatin1String("assignment")
        || conflict.theirs.value(QLatin1String("deleted")).toInteger() != 0)
        return false;
    return conflict.mine.isEmpty() || conflict.mine.value(QLatin1String("deleted")).toInteger() != 0
        || conflict.mine.value(QLatin1String("created_at"))
        != conflict.theirs.value(QLatin1String("created_at"));
}

Result<std::vector<MergeConflict>> CoderCopies::conflicts(const Project &project, bool all)
{
    return store::mergeConflicts(project.db(), all);
}

Status CoderCopies::resolve(Project &project, const QString &uuid, const QString &keep)
{
    if (keep != QLatin1String("mine") && keep != QLatin1String("theirs"))
        return fail(ErrorCode::InvalidArgument,
            CoderCopiesText::tr(
                "Keep \"mine\" (the version the project holds) or \"theirs\" (the version that "
                "lost), not \"%1\".")
                .arg(keep));
    auto open = store::mergeConflicts(project.db(), false);
    if (!open)
        return std::unexpected(open.error());
    std::vector<MergeConflict> matches;
    for (const MergeConflict &c : *open)
        if (c.uuid == uuid)
            matches = {c};
    if (matches.empty())
        for (const MergeConflict &c : *open)
            if (c.objectUuid == uuid)
                matches.push_back(c);
    if (matches.empty())
        return fail(
            ErrorCode::NotFound, CoderCopiesText::tr("There is no open conflict %1.").arg(uuid));
    if (matches.size() > 1)
        return fail(ErrorCode::InvalidArgument,
            CoderCopiesText::tr(
                "%1 has %2 open conflicts (from several copies); name the conflict's uuid.")
                .arg(uuid)
                .arg(matches.size()));
    const MergeConflict &c = matches.front();

    auto sp = Savepoint::begin(project.db());
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(decideConflict(project.db(), c, keep == QLatin1String("theirs")));
    FOURFOLD_TRY_STATUS(store::appendEvent(project.db(), CoderId {},
        QStringLiteral("conflict.resolve"), c.objectType, c.objectUuid,
        QJsonObject {{QStringLiteral("keep"), keep}, {QStringLiteral("conflict"), c.uuid}}));
    return sp->commit();
}

} // namespace fourfold
