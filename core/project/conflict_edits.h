#pragma once
// Deciding a merge conflict (core/project/coder_copies.h) as one undoable step: keep the version
// the project holds, or write the version that lost. The lead's conflicts window pushes these;
// `fourfold-cli merge --resolve` decides the same way without undo.

#include "core/model/merge_conflict.h"
#include "core/project/edit.h"

#include <memory>

namespace fourfold {

// The decision itself inside the caller's savepoint: for "theirs" the losing version is written
// (an answer that would stand beside it is set aside first), the copy's base records the losing
// version as settled so that merging that copy again changes nothing, and the conflict is marked
// resolved. NotFound if `conflict` is not open.
Status decideConflict(Database &db, const MergeConflict &conflict, bool keepTheirs);

class ResolveConflictEdit : public Edit
{
public:
    // `conflictUuid` names an open conflict; `keepTheirs` writes the version that lost.
    ResolveConflictEdit(CoderId actor, QString conflictUuid, bool keepTheirs);
    ~ResolveConflictEdit() override;

    QString text() const override;
    QString action() const override { return QStringLiteral("conflict.resolve"); }
    QString objectType() const override { return QStringLiteral("merge_conflict"); }
    QString objectUuid() const override { return m_conflictUuid; }
    Status apply(Database &db) override;
    // Writes back what apply() changed: the object and a set-aside answer as they were, the
    // copy's base entry, and the conflict open again.
    Status revert(Database &db) override;

private:
    QString m_conflictUuid;
    bool m_keepTheirs;
    // Taken by apply(): what revert() restores (the store's rows, defined in the .cpp).
    struct Before;
    std::unique_ptr<Before> m_before;
};

} // namespace fourfold
