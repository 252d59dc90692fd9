// Who may be a lead, on the desk: "Who is coding?" asks a lead's passphrase and refuses a wrong
// one, only a lead adds people, and a coder copy never opens as a lead (rules of
// core/project/people.h, driven through the real dialogs offscreen).
#include "app/desktop/coder_dialog.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/main_window.h"
#include "core/project/coder_copies.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"
#include "core/project/testing/older_lead.h"
#include "tests/support/test_support.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QMenu>
#include <QMenuBar>
#include <QPushButton>
#include <QTest>
#include <QTimer>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kLeadPass = QStringLiteral("brakwater ferry lead");

// A project with the lead L01 (passphrase kLeadPass), the coder C01 and one article assigned to
// C01 and to the lead L02 (no passphrase yet, as in a file from before passphrases).
struct PeopleFixture {
    QTemporaryDir dir;
    QString path = dir.filePath(QStringLiteral("people.fourfold"));
    PeopleFixture()
    {
        auto p = Project::create(path);
        REQUIRE(p);
        auto first = People::add(*p, nullptr,
            {QStringLiteral("Lena Lead"), QStringLiteral("L01"), CoderRole::Lead, kLeadPass});
        REQUIRE(first);
        REQUIRE(p->apply(**first));
        auto c01 =
            p->addCoder(QStringLiteral("Cas Coder"), QStringLiteral("C01"), CoderRole::Coder);
        REQUIRE(c01);
        auto l02 = addOlderLeadForTesting(*p, QStringLiteral("Lou Lead"), QStringLiteral("L02"));
        REQUIRE(l02);
        const QString jsonl = writeFile(dir, QStringLiteral("a.jsonl"),
            "{\"id\":\"f1\",\"title\":\"Ferry\",\"language\":\"en\",\"text\":\"The ferry to "
            "Brakwater will stop in May.\"}\n");
        REQUIRE(p->importFile(jsonl, ImportOptions {}));
        auto article = p->articleByExternalId(QStringLiteral("f1"));
        REQUIRE(article);
        REQUIRE(p->assign(**article, *c01, Phase::Production));
        REQUIRE(p->assign(**article, *l02, Phase::Production));
    }
    Project open()
    {
        auto p = Project::open(path);
        REQUIRE(p);
        return std::move(*p);
    }
};

QMenu *leadMenu(MainWindow &w)
{
    for (QAction *a : w.menuBar()->actions())
        if (a->menu() && a->text().remove(QLatin1Char('&')) == QLatin1String("Lead"))
            return a->menu();
    return nullptr;
}

// Fills the "Add a person" form when it opens, presses OK, records the form's message and what
// the lead combo offered, then closes the form (it stays open after a refusal).
struct FormRun {
    QString message;
    QStringList leads;
    bool accepted = false;
};

FormRun addThroughForm(CoderDialog &dialog, const QString &name, const QString &pseudonym,
    bool lead, const QString &passphrase, const QString &byLead, const QString &byPassphrase)
{
    FormRun run;
    QObject::connect(&dialog, &CoderDialog::personFormOpened, &dialog, [&](QDialog *form) {
        QTimer::singleShot(0, form, [&, form] {
            form->findChild<QLineEdit *>(QStringLiteral("name"))->setText(name);
            form->findChild<QLineEdit *>(QStringLiteral("pseudonym"))->setText(pseudonym);
            form->findChild<QComboBox *>(QStringLiteral("role"))->setCurrentIndex(lead ? 1 : 0);
            form->findChild<QLineEdit *>(QStringLiteral("passphrase"))->setText(passphrase);
            form->findChild<QLineEdit *>(QStringLiteral("repeat"))->setText(passphrase);
            auto *leads = form->findChild<QComboBox *>(QStringLiteral("lead"));
            for (int i = 0; i < leads->count(); ++i)
                run.leads << leads->itemText(i);
            leads->setCurrentText(byLead);
            form->findChild<QLineEdit *>(QStringLiteral("leadPassphrase"))->setText(byPassphrase);
            form->findChild<QDialogButtonBox *>()->button(QDialogButtonBox::Ok)->click();
            if (!form->isVisible()) {
                run.accepted = true;
                return;
            }
            auto *message = form->findChild<QLabel *>(QStringLiteral("message"));
            run.message = message->isVisible() ? message->text() : QString();
            // The message is sized to show every line of it, not clipped.
            CHECK(message->height() >= message->heightForWidth(message->width()));
            // Filling a field again clears it: it spoke of what was there before.
            form->findChild<QLineEdit *>(QStringLiteral("name"))->setText(name + QLatin1Char(' '));
            CHECK(message->text().isEmpty());
            CHECK_FALSE(message->isVisible());
            form->reject();
        });
    });
    dialog.addPerson();
    QObject::disconnect(&dialog, &CoderDialog::personFormOpened, nullptr, nullptr);
    return run;
}

} // namespace

TEST_CASE("Who is coding refuses a wrong passphrase and opens the desk with the right one")
{
    PeopleFixture f;
    Project p = f.open();
    CoderDialog dialog(p);
    dialog.show();
    REQUIRE(dialog.select(QStringLiteral("C01")));
    CHECK_FALSE(dialog.passphraseField()->isVisible()); // a coder gives none
    REQUIRE(dialog.select(QStringLiteral("L01")));
    CHECK(dialog.passphraseField()->isVisible());
    CHECK_FALSE(dialog.repeatField()->isVisible());

    dialog.passphraseField()->setText(QStringLiteral("brakwater ferry"));
    dialog.tryAccept();
    CHECK(dialog.isVisible());
    CHECK_FALSE(dialog.chosen());
    CHECK(dialog.messageLabel()->text() == QStringLiteral("That is not the passphrase of L01."));
    CHECK(dialog.passphraseField()->text().isEmpty());
    // Typing again clears the refusal.
    QTest::keyClicks(dialog.passphraseField(), kLeadPass);
    CHECK_FALSE(dialog.messageLabel()->isVisible());
    dialog.tryAccept();
    REQUIRE(dialog.chosen());
    CHECK(dialog.chosen()->isLead());
    CHECK(dialog.result() == QDialog::Accepted);

    // Opening by pseudonym: a wrong passphrase opens nothing.
    MainWindow w;
    auto refused = w.openProject(f.path, QStringLiteral("L01"), QStringLiteral("not it at all"));
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::NotAllowed);
    CHECK(w.session() == nullptr);
    REQUIRE(w.openProject(f.path, QStringLiteral("L01"), kLeadPass));
    CHECK(w.session()->isLead());
    REQUIRE(w.session()->signedIn());
    CHECK(w.session()->signedIn()->person().pseudonym == QStringLiteral("L01"));
}

TEST_CASE("A lead without a passphrase sets one when first chosen and must repeat it")
{
    PeopleFixture f;
    Project p = f.open();
    CoderDialog dialog(p);
    dialog.show();
    REQUIRE(dialog.select(QStringLiteral("L02")));
    CHECK(dialog.repeatField()->isVisible());
    dialog.passphraseField()->setText(QStringLiteral("lou's new passphrase"));
    dialog.repeatField()->setText(QStringLiteral("lou's new passphrasE"));
    dialog.tryAccept();
    CHECK_FALSE(dialog.chosen());
    CHECK(dialog.messageLabel()->text().contains(QStringLiteral("differ")));
    dialog.passphraseField()->setText(QStringLiteral("lou's new passphrase"));
    dialog.repeatField()->setText(QStringLiteral("lou's new passphrase"));
    dialog.tryAccept();
    REQUIRE(dialog.chosen());
    CHECK(People::passphraseState(p, QStringLiteral("L02")).value() == PassphraseState::Set);
}

TEST_CASE("Only a lead adds people from Who is coding and a coder cannot add a lead")
{
    PeopleFixture f;
    Project p = f.open();
    CoderDialog dialog(p);
    dialog.show();

    // The form offers only leads as the one who adds; a wrong lead passphrase adds nobody.
    FormRun wrong = addThroughForm(dialog, QStringLiteral("Mallory"), QStringLiteral("L09"), true,
        QStringLiteral("mallory's passphrase"), QStringLiteral("L01"), QStringLiteral("guess"));
    CHECK(wrong.leads == QStringList {QStringLiteral("L01"), QStringLiteral("L02")});
    CHECK_FALSE(wrong.accepted);
    CHECK(wrong.message == QStringLiteral("That is not the passphrase of L01."));
    CHECK_FALSE(p.coderByPseudonym(QStringLiteral("L09")).value());

    // A coder is not among those who may add: naming C01 is refused as well.
    FormRun asCoder = addThroughForm(dialog, QStringLiteral("Mallory"), QStringLiteral("L09"), true,
        QStringLiteral("mallory's passphrase"), QStringLiteral("C01"), QString());
    CHECK_FALSE(asCoder.accepted);
    CHECK_FALSE(asCoder.message.isEmpty());
    CHECK_FALSE(p.coderByPseudonym(QStringLiteral("L09")).value());

    // A too-short passphrase for a new lead is refused with the rule.
    FormRun tooShort = addThroughForm(dialog, QStringLiteral("Nina"), QStringLiteral("L03"), true,
        QStringLiteral("short"), QStringLiteral("L01"), kLeadPass);
    CHECK_FALSE(tooShort.accepted);
    CHECK(tooShort.message.contains(QStringLiteral("at least 8 characters")));

    // The lead adds a new lead; they are listed and selected, and sign in with their passphrase.
    FormRun ok = addThroughForm(dialog, QStringLiteral("Nina New"), QStringLiteral("L03"), true,
        QStringLiteral("nina's passphrase"), QStringLiteral("L01"), kLeadPass);
    CHECK(ok.accepted);
    REQUIRE(p.coderByPseudonym(QStringLiteral("L03")).value());
    CHECK(dialog.list()->currentItem()->text().startsWith(QStringLiteral("L03")));
    dialog.passphraseField()->setText(QStringLiteral("nina's passphrase"));
    dialog.tryAccept();
    REQUIRE(dialog.chosen());
    CHECK(dialog.chosen()->isLead());

    // On the desk a coder has no lead menu.
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    CHECK_FALSE(w.session()->isLead());
    CHECK_FALSE(leadMenu(w)->menuAction()->isVisible());
}

TEST_CASE("A coder copy of a lead opens as a coder and takes no new lead")
{
    PeopleFixture f;
    const QString copyPath = f.dir.filePath(QStringLiteral("l01-copy.fourfold"));
    {
        Project p = f.open();
        auto article = p.articleByExternalId(QStringLiteral("f1"));
        REQUIRE(p.assign(
            **article, p.coderByPseudonym(QStringLiteral("L01")).value()->id, Phase::Production));
        REQUIRE(CoderCopies::handout(p, QStringLiteral("L01"), copyPath));
    }
    // The lead's own passphrase does not make the copy a lead's desk.
    MainWindow w;
    REQUIRE(w.openProject(copyPath, QStringLiteral("L01"), kLeadPass));
    CHECK_FALSE(w.session()->isLead());
    CHECK_FALSE(w.session()->showsAllCoders());
    CHECK_FALSE(leadMenu(w)->menuAction()->isVisible());

    auto copy = Project::open(copyPath);
    REQUIRE(copy);
    CoderDialog dialog(*copy);
    dialog.show();
    REQUIRE(dialog.select(QStringLiteral("L01")));
    CHECK_FALSE(dialog.passphraseField()->isVisible());
    // Only the copy's own person is offered, and as what they are here: a coder.
    auto *people = dialog.findChild<QListWidget *>();
    REQUIRE(people);
    REQUIRE(people->count() == 1);
    CHECK(people->item(0)->text() == QStringLiteral("L01 — Lena Lead (coder)"));
    CHECK_FALSE(dialog.select(QStringLiteral("C01")));
    FormRun run = addThroughForm(dialog, QStringLiteral("Mallory"), QStringLiteral("L09"), true,
        QStringLiteral("mallory's passphrase"), QStringLiteral("L01"), kLeadPass);
    CHECK_FALSE(run.accepted);
    CHECK(run.message.contains(QStringLiteral("coder copy")));
    CHECK_FALSE(copy->coderByPseudonym(QStringLiteral("L09")).value());
}
