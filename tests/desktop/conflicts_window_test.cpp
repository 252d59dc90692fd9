// Lead → Merge conflicts…, driven offscreen: both versions side by side, a decision taken in the
// window and undone from the desk's undo stack restores the whole project (a full dump but the
// event log), redo decides again; the project's version kept changes only the conflict. The
// expected values follow from the edits of the conflict fixture (tests/project).
#include "app/desktop/coding_session.h"
#include "app/desktop/conflicts/conflicts_window.h"
#include "core/project/article_status_edit.h"
#include "core/project/subsample_draw.h"
#include "tests/project/conflict_fixture.h"

#include <QPushButton>
#include <QTableWidget>
#include <QTextBrowser>
#include <QUndoStack>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QString sideText(ConflictsWindow &w, const QString &name)
{
    for (QTextBrowser *b : w.findChildren<QTextBrowser *>())
        if (b->accessibleName() == name)
            return b->toPlainText();
    FAIL("no pane " << name.toStdString());
    return {};
}

// The lead's session over the fixture's project (the fixture lets go of its connection).
std::unique_ptr<CodingSession> leadSession(ConflictFixture &f)
{
    f.main.reset();
    auto p = Project::open(f.mainPath);
    REQUIRE(p);
    auto lead = p->coderByPseudonym(QStringLiteral("L01"));
    REQUIRE(lead);
    REQUIRE(lead->has_value());
    return std::make_unique<CodingSession>(std::move(*p), **lead);
}

QString dumpOf(CodingSession &s)
{
    return dumpDatabase(databaseForTesting(s.project()), {QStringLiteral("event_log")});
}

} // namespace

TEST_CASE("The conflicts window shows both versions and a decision is undone and redone")
{
    ConflictFixture f;
    const QString causeUuid = f.causeConflict.uuid;
    auto session = leadSession(f);
    ConflictsWindow w(session.get());
    REQUIRE(w.conflicts().size() == 2);
    int causeRow = -1;
    for (int i = 0; i < 2; ++i)
        if (w.conflicts()[size_t(i)].uuid == causeUuid)
            causeRow = i;
    REQUIRE(causeRow >= 0);
    w.setCurrent(causeRow);
    // The project holds the copy's later actor; the other version is the project's own.
    CHECK(sideText(w, QStringLiteral("In the project now"))
              .contains(QStringLiteral("the ferry company")));
    CHECK(sideText(w, QStringLiteral("The other version")).contains(QStringLiteral("the mayor")));

    const QString before = dumpOf(*session);
    REQUIRE(w.takeOtherVersion());
    CHECK(session->undoStack()->count() == 1);
    CHECK(session->undoStack()->undoText() == QStringLiteral("Keep the other version"));
    CHECK(w.conflicts().size() == 1); // the open ones only
    const QString decided = dumpOf(*session);
    CHECK(decided != before);

    session->undoStack()->undo();
    CHECK(dumpOf(*session) == before);
    CHECK(w.conflicts().size() == 2); // the window follows the undo
    session->undoStack()->redo();
    CHECK(w.conflicts().size() == 1);
    CHECK(onlyAnnotation(session->project(), f.f1, f.c1, FramingFunction::Cause)
              .content.attributes.value(QStringLiteral("actor"))
              .toString()
        == QStringLiteral("the mayor"));

    // Decided conflicts are listed on request and cannot be decided again.
    w.setShowDecided(true);
    REQUIRE(w.conflicts().size() == 2);
    for (int i = 0; i < 2; ++i)
        if (w.conflicts()[size_t(i)].uuid == causeUuid)
            w.setCurrent(i);
    CHECK_FALSE(w.keepProjectVersion());
    CHECK(w.message().contains(QStringLiteral("open conflict")));
}

TEST_CASE("Keeping the project's version in the window leaves every coder's row as it is")
{
    ConflictFixture f;
    auto session = leadSession(f);
    ConflictsWindow w(session.get());
    const QStringList rowsOnly {QStringLiteral("event_log"), QStringLiteral("merge_conflict")};
    const QString rows = dumpDatabase(databaseForTesting(session->project()), rowsOnly);
    w.setCurrent(0);
    REQUIRE(w.keepProjectVersion());
    CHECK(dumpDatabase(databaseForTesting(session->project()), rowsOnly) == rows);
    CHECK(w.conflicts().size() == 1);
    REQUIRE(w.keepProjectVersion()); // the next one is current now
    CHECK(w.conflicts().empty());
    CHECK(w.message().contains(QStringLiteral("Keep the project's version")));
}

TEST_CASE("An assignment withdrawn while its coder coded it in a copy says so in the window")
{
    // A reliability draw of one article for C01 and C02, C01's copy handed out, the draw
    // withdrawn, the article marked done in the copy and the copy merged
    // (core/project/coder_copies.h): one conflict on C01's withdrawn assignment.
    QTemporaryDir dir;
    const QString mainPath = dir.filePath(QStringLiteral("main.fourfold"));
    const QString copy = dir.filePath(QStringLiteral("c01.fourfold"));
    QString drawn;
    {
        auto p = Project::create(mainPath);
        REQUIRE(p);
        REQUIRE(p->importFile(
            writeFile(dir, QStringLiteral("a.jsonl"), kThreeArticles), ImportOptions {}));
        REQUIRE(p->addCoder(
            QStringLiteral("Noor Testperson"), QStringLiteral("C01"), CoderRole::Coder));
        REQUIRE(
            p->addCoder(QStringLiteral("Sam Testperson"), QStringLiteral("C02"), CoderRole::Coder));
        REQUIRE(addOlderLeadForTesting(*p, QStringLiteral("Mira Testlead"), QStringLiteral("L01")));
        DrawRequest request;
        request.size = 1;
        request.seed = 7;
        request.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
        auto d = SubsampleDraw::plan(*p, request);
        REQUIRE(d);
        REQUIRE(SubsampleDraw::commit(*p, *d));
        drawn = d->articles.front();
        REQUIRE(CoderCopies::handout(*p, QStringLiteral("C01"), copy));
        REQUIRE(SubsampleDraw::withdraw(*p, Phase::Reliability));
    }
    {
        auto p = Project::open(copy);
        REQUIRE(p);
        auto me = p->coderByPseudonym(QStringLiteral("C01"));
        REQUIRE(me);
        auto a = p->articleByExternalId(drawn);
        REQUIRE(a);
        SetArticleStatusEdit done(**a, (*me)->id, QStringLiteral("done"));
        REQUIRE(p->apply(done));
    }
    auto p = Project::open(mainPath);
    REQUIRE(p);
    REQUIRE(CoderCopies::merge(*p, {copy}));
    auto lead = p->coderByPseudonym(QStringLiteral("L01"));
    REQUIRE(lead);
    CodingSession session(std::move(*p), **lead);
    ConflictsWindow w(&session);
    REQUIRE(w.conflicts().size() == 1);
    w.setCurrent(0);
    auto *table = w.findChild<QTableWidget *>();
    REQUIRE(table);
    bool named = false;
    for (int col = 0; col < table->columnCount(); ++col)
        named = named
            || table->item(0, col)->text()
                == QStringLiteral("withdrawn assignment, coded in a copy");
    CHECK(named);
    CHECK(sideText(w, QStringLiteral("In the project now")).contains(QStringLiteral("Deleted")));
    const QString theirs = sideText(w, QStringLiteral("The other version"));
    CHECK(theirs.contains(QStringLiteral("Status: done")));
    CHECK(theirs.contains(QStringLiteral("The project withdrew this assignment")));
    CHECK(theirs.contains(QStringLiteral("assign the article to C01 again")));
    if (const QByteArray shot = qgetenv("FOURFOLD_SHOT_DIR"); !shot.isEmpty())
        w.grab().save(QString::fromLocal8Bit(shot) + QStringLiteral("/withdrawn_conflict.png"));

    // Taking the coder's version assigns the article again.
    REQUIRE(w.takeOtherVersion());
    CHECK(w.conflicts().empty());
}
