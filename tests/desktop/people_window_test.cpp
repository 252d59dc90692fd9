// Lead → People…: the list, and add, rename, disable and enable through People's checked edits,
// each an undoable step on the desk's stack, told in the window's message bar.
#include "app/desktop/coding_session.h"
#include "app/desktop/lead_windows.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "app/desktop/people/people_window.h"
#include "tests/support/test_support.h"

#include <QFile>
#include <QPushButton>
#include <QTableWidget>
#include <QTemporaryDir>
#include <QUndoStack>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct SampleProject {
    QTemporaryDir dir;
    QString path = dir.filePath(QStringLiteral("demo.fourfold"));
    SampleProject()
    {
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    }
};

// The table's cell of the person `pseudonym` in `column`.
QString cell(const PeopleWindow &w, const QString &pseudonym, int column)
{
    for (int row = 0; row < w.table()->rowCount(); ++row)
        if (w.table()->item(row, 0)->text() == pseudonym)
            return w.table()->item(row, column)->text();
    return QStringLiteral("(none)");
}

} // namespace

TEST_CASE("the People window adds renames disables and enables with undo")
{
    SampleProject f;
    MainWindow desk;
    // The demo lead has no passphrase yet: this one becomes theirs.
    REQUIRE(
        desk.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    desk.leadWindows()->openPeople();
    auto *w = qobject_cast<PeopleWindow *>(desk.leadWindows()->people());
    REQUIRE(w);
    CHECK(w->isVisible());
    // The sample's three coders and its lead (sample-project/study.json).
    REQUIRE(w->table()->rowCount() == 4);
    CHECK(cell(*w, QStringLiteral("C02"), 1) == QStringLiteral("Sam Whitfield"));
    CHECK(cell(*w, QStringLiteral("L01"), 2) == QStringLiteral("lead"));

    REQUIRE(w->addPerson(
        {QStringLiteral("Nina New"), QStringLiteral("C04"), CoderRole::Coder, QString()}));
    CHECK(w->messageBar()->kind() == MessageBar::Kind::Success);
    CHECK(w->messageBar()->text() == QStringLiteral("Added C04. Undo takes it back."));
    CHECK(w->table()->rowCount() == 5);
    auto dup =
        w->addPerson({QStringLiteral("Other"), QStringLiteral("C04"), CoderRole::Coder, QString()});
    REQUIRE_FALSE(dup);
    CHECK(w->messageBar()->kind() == MessageBar::Kind::Error);
    CHECK(w->messageBar()->text() == QStringLiteral("The pseudonym \"C04\" is already taken."));

    REQUIRE(w->rename(QStringLiteral("C01"), QStringLiteral("Noor Renamed")));
    CHECK(cell(*w, QStringLiteral("C01"), 1) == QStringLiteral("Noor Renamed"));
    REQUIRE(w->setDisabled(QStringLiteral("C03"), true));
    CHECK(cell(*w, QStringLiteral("C03"), 3) == QStringLiteral("disabled"));
    CHECK(w->messageBar()->text().startsWith(QStringLiteral("Disabled C03")));

    // Each change is one step of the desk's undo stack; the window follows undo and redo.
    QUndoStack *undo = desk.session()->undoStack();
    CHECK(undo->undoText() == QStringLiteral("Disable C03"));
    undo->undo();
    CHECK(cell(*w, QStringLiteral("C03"), 3) == QStringLiteral("enabled"));
    undo->undo();
    CHECK(cell(*w, QStringLiteral("C01"), 1) == QStringLiteral("Noor Bakker"));
    undo->undo();
    CHECK(w->table()->rowCount() == 4);
    undo->redo();
    CHECK(cell(*w, QStringLiteral("C04"), 1) == QStringLiteral("Nina New"));

    // The only lead cannot be disabled; the refusal is told, nothing changes.
    REQUIRE_FALSE(w->setDisabled(QStringLiteral("L01"), true));
    CHECK(w->messageBar()->text().contains(QStringLiteral("only enabled lead")));
    CHECK(cell(*w, QStringLiteral("L01"), 3) == QStringLiteral("enabled"));

    // A look at the window (tests run offscreen: the grab is the widget as drawn).
    w->resize(620, 420);
    const QString shot = qEnvironmentVariable("FOURFOLD_PEOPLE_SHOT");
    if (!shot.isEmpty())
        CHECK(w->grab().save(shot));
}

TEST_CASE("the People window changes nothing for a coder")
{
    SampleProject f;
    MainWindow desk;
    REQUIRE(desk.openProject(f.path, QStringLiteral("C01")));
    PeopleWindow w(desk.session());
    CHECK(w.messageBar()->kind() == MessageBar::Kind::Warning);
    for (QPushButton *b : w.findChildren<QPushButton *>())
        if (b->text().contains(QStringLiteral("Add"))
            || b->text().contains(QStringLiteral("Rename")))
            CHECK_FALSE(b->isEnabled());
    auto add = w.addPerson(
        {QStringLiteral("Mallory"), QStringLiteral("L09"), CoderRole::Lead, QStringLiteral("x")});
    REQUIRE_FALSE(add);
    CHECK(add.error().code == ErrorCode::NotAllowed);
    auto off = w.setDisabled(QStringLiteral("C02"), true);
    REQUIRE_FALSE(off);
    CHECK(off.error().code == ErrorCode::NotAllowed);
    CHECK(w.table()->rowCount() == 4);
}
