// Deciding a merge conflict as an undoable step (ResolveConflictEdit, what the lead's conflicts
// window pushes): the decision writes what `merge --resolve` writes, undo restores the whole
// project (a full dump but the event log), redo makes the same decision again. The merge rules
// are a three-way merge against a common base (common practice in version control, e.g. diff3).
#include "core/project/conflict_edits.h"
#include "core/project/testing/project_database.h"
#include "tests/project/conflict_fixture.h"
#include "tests/support/db_dump.h"

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("Keeping the other version of a conflict is undone and redone whole")
{
    ConflictFixture f;
    CHECK(
        f.attribute(f.f1, FramingFunction::Cause, "actor") == QStringLiteral("the ferry company"));
    const QString before = f.dump();

    ResolveConflictEdit keep(f.lead, f.causeConflict.uuid, true);
    REQUIRE(f.main->apply(keep));
    CHECK(f.attribute(f.f1, FramingFunction::Cause, "actor") == QStringLiteral("the mayor"));
    auto open = CoderCopies::conflicts(*f.main, false);
    REQUIRE(open);
    CHECK(open->size() == 1);
    const QString decided = f.dump();
    CHECK(decided != before);
    const QStringList apartFromConflicts {
        QStringLiteral("event_log"), QStringLiteral("merge_conflict")};
    const QString decidedRows = dumpDatabase(databaseForTesting(*f.main), apartFromConflicts);

    REQUIRE(f.main->revert(keep));
    CHECK(f.dump() == before);
    CHECK(
        f.attribute(f.f1, FramingFunction::Cause, "actor") == QStringLiteral("the ferry company"));

    REQUIRE(f.main->apply(keep)); // redo: the same decision (only its time differs)
    CHECK(f.attribute(f.f1, FramingFunction::Cause, "actor") == QStringLiteral("the mayor"));
    CHECK(dumpDatabase(databaseForTesting(*f.main), apartFromConflicts) == decidedRows);
}

TEST_CASE("A decided conflict writes what merge --resolve writes and settles the copy")
{
    ConflictFixture byEdit;
    ConflictFixture byCommand;
    const QString beforeDecision = byEdit.dump();
    // The copy's evaluation ("positive") lost; the lead takes it after all, in the window and
    // with the command.
    ResolveConflictEdit keep(byEdit.lead, byEdit.evalConflict.uuid, true);
    REQUIRE(byEdit.main->apply(keep));
    REQUIRE(CoderCopies::resolve(
        *byCommand.main, byCommand.evalConflict.uuid, QStringLiteral("theirs")));
    for (ConflictFixture *f : {&byEdit, &byCommand})
        CHECK(f->attribute(f->f2, FramingFunction::Evaluation, "polarity")
            == QStringLiteral("positive"));
    // Settled: merging the copy again changes nothing.
    const QString settled = byEdit.dump();
    CHECK(mergeInto(*byEdit.main, {byEdit.copy})[0].alreadyMerged);
    CHECK(byEdit.dump() == settled);
    // Undone: the project's "neutral" back, the conflict open again and the copy's base as it
    // was: the whole project as before the decision.
    REQUIRE(byEdit.main->revert(keep));
    CHECK(byEdit.attribute(byEdit.f2, FramingFunction::Evaluation, "polarity")
        == QStringLiteral("neutral"));
    auto open = CoderCopies::conflicts(*byEdit.main, false);
    REQUIRE(open);
    CHECK(open->size() == 2);
    CHECK(byEdit.dump() == beforeDecision);
}

TEST_CASE("Keeping the project's version changes only the conflict and a closed one is refused")
{
    ConflictFixture f;
    const QStringList withoutConflicts {
        QStringLiteral("event_log"), QStringLiteral("merge_conflict")};
    const QString before = f.dump();
    const QString rowsBefore = dumpDatabase(databaseForTesting(*f.main), withoutConflicts);
    ResolveConflictEdit mine(f.lead, f.causeConflict.uuid, false);
    REQUIRE(f.main->apply(mine));
    CHECK(dumpDatabase(databaseForTesting(*f.main), withoutConflicts) == rowsBefore);
    CHECK(f.dump() != before);
    ResolveConflictEdit again(f.lead, f.causeConflict.uuid, true);
    auto refused = f.main->apply(again);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::NotFound);
    REQUIRE(f.main->revert(mine));
    CHECK(f.dump() == before);
}
