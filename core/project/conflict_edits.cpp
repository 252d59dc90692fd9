#include "core/project/conflict_edits.h"

#include "core/store/copy_tables.h"
#include "core/store/database.h"

#include <QCoreApplication>

#include <optional>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ConflictEditsText {
    Q_DECLARE_TR_FUNCTIONS(ConflictEditsText)
};

store::PortableRow losingRow(const MergeConflict &c)
{
    return store::PortableRow {c.objectType, c.objectUuid, c.theirs, 0};
}

} // namespace

Status decideConflict(Database &db, const MergeConflict &c, bool keepTheirs)
{
    const store::PortableRow theirs = losingRow(c);
    auto base = c.copyUuid.isEmpty() ? Result<QHash<QString, store::BaseEntry>> {}
                                     : store::copyBase(db, c.copyUuid);
    if (!base)
        return std::unexpected(base.error());
    if (keepTheirs) {
        if (theirs.type == QLatin1String("judgement") && !theirs.isDeleted()) {
            auto other = store::otherLiveJudgement(db, theirs);
            if (!other)
                return std::unexpected(other.error());
            if (*other)
                FOURFOLD_TRY_STATUS(store::tombstoneJudgement(db, **other));
        }
        FOURFOLD_TRY_STATUS(store::writePortableRow(db, theirs));
    }
    // Either way the losing version is now settled: merging its copy again changes nothing.
    // (Merges record it as the copy's base already; conflicts from older merges did not.)
    const auto seen = base->constFind(theirs.key());
    if (!c.copyUuid.isEmpty() && seen != base->cend() && seen->digest != theirs.digest())
        FOURFOLD_TRY_STATUS(store::setCopyBase(
            db, c.copyUuid, theirs, store::BaseEntry {theirs.digest(), seen->seconds}));
    return store::setConflictResolution(
        db, c.uuid, keepTheirs ? QStringLiteral("theirs") : QStringLiteral("mine"));
}

ResolveConflictEdit::ResolveConflictEdit(CoderId actor, QString conflictUuid, bool keepTheirs)
    : Edit(actor)
    , m_conflictUuid(std::move(conflictUuid))
    , m_keepTheirs(keepTheirs)
{ }

QString ResolveConflictEdit::text() const
{
    return m_keepTheirs ? ConflictEditsText::tr("Keep the other version")
                        : ConflictEditsText::tr("Keep the project's version");
}

struct ResolveConflictEdit::Before {
    MergeConflict conflict;
    std::optional<store::PortableRow> object; // the object as it was (none: not in the project)
    std::optional<store::PortableRow> otherAnswer; // an answer set aside for the losing one
    std::optional<store::BaseEntry> base; // the copy's base entry of the losing version
};

ResolveConflictEdit::~ResolveConflictEdit() = default;

Status ResolveConflictEdit::apply(Database &db)
{
    Before before;
    auto open = store::mergeConflicts(db, false);
    if (!open)
        return std::unexpected(open.error());
    const auto it = std::ranges::find(*open, m_conflictUuid, &MergeConflict::uuid);
    if (it == open->end())
        return fail(ErrorCode::NotFound,
            ConflictEditsText::tr("There is no open conflict %1.").arg(m_conflictUuid));
    before.conflict = *it;
    const store::PortableRow theirs = losingRow(*it);
    auto object = store::portableRowOf(db, it->objectType, it->objectUuid);
    if (!object)
        return std::unexpected(object.error());
    before.object = *object;
    if (m_keepTheirs && theirs.type == QLatin1String("judgement") && !theirs.isDeleted()) {
        auto other = store::otherLiveJudgement(db, theirs);
        if (!other)
            return std::unexpected(other.error());
        if (*other) {
            auto row = store::portableRowOf(db, QStringLiteral("judgement"), **other);
            if (!row)
                return std::unexpected(row.error());
            before.otherAnswer = *row;
        }
    }
    if (!it->copyUuid.isEmpty()) {
        auto base = store::copyBase(db, it->copyUuid);
        if (!base)
            return std::unexpected(base.error());
        if (const auto seen = base->constFind(theirs.key()); seen != base->cend())
            before.base = *seen;
    }
    if (m_keepTheirs && !before.object)
        // A conflict is about an object both sides hold; without it there is nothing to undo to.
        return fail(ErrorCode::Internal,
            ConflictEditsText::tr("The object of conflict %1 is missing from the project.")
                .arg(m_conflictUuid));
    FOURFOLD_TRY_STATUS(decideConflict(db, *it, m_keepTheirs));
    m_before = std::make_unique<Before>(std::move(before));
    return {};
}

Status ResolveConflictEdit::revert(Database &db)
{
    if (!m_before)
        return fail(ErrorCode::Internal,
            ConflictEditsText::tr("The decision on conflict %1 was never made.")
                .arg(m_conflictUuid));
    if (m_keepTheirs) {
        FOURFOLD_TRY_STATUS(store::writePortableRow(db, *m_before->object));
        if (m_before->otherAnswer)
            FOURFOLD_TRY_STATUS(store::writePortableRow(db, *m_before->otherAnswer));
    }
    if (m_before->base)
        FOURFOLD_TRY_STATUS(store::setCopyBase(
            db, m_before->conflict.copyUuid, losingRow(m_before->conflict), *m_before->base));
    return store::reopenConflict(db, m_conflictUuid);
}

} // namespace fourfold
