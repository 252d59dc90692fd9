// People and who may lead (core/project/people.h): passphrases as Argon2id hashes, sign-in,
// the lead-only changes, disabled people and coder copies.

#include "core/project/assignment_plans.h"
#include "core/project/coder_copies.h"
#include "core/project/edit.h"
#include "core/project/passphrase.h"
#include "core/project/people.h"
#include "core/project/testing/older_lead.h"
#include "core/project/testing/project_database.h"
#include "core/store/schema.h"
#include "core/store/statement.h"
#include "tests/project/project_fixture.h"
#include "tests/support/db_dump.h"

#include <QProcess>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kPass = QStringLiteral("ferry budget 2026");

// The stored hash of a person, read back through the file (for the checks that look at it).
QString storedHash(Project &p, const QString &pseudonym)
{
    auto db = databaseForTesting(p).prepare(
        QStringLiteral("SELECT passphrase_hash FROM coder WHERE pseudonym = ?1"));
    REQUIRE(db);
    db->bind(1, pseudonym);
    auto row = db->step();
    REQUIRE(row);
    REQUIRE(*row);
    return db->columnText(0);
}

// Runs /usr/bin/python3 with argon2-cffi (Debian's python3-argon2, on the reference Argon2
// library libargon2): prints its stdout, trimmed.
QString python(const QString &script)
{
    QProcess proc;
    proc.start(QStringLiteral("/usr/bin/python3"), {QStringLiteral("-c"), script});
    REQUIRE(proc.waitForFinished(60000));
    INFO(proc.readAllStandardError().toStdString());
    REQUIRE(proc.exitCode() == 0);
    return QString::fromUtf8(proc.readAllStandardOutput()).trimmed();
}

SignedIn signInLead(Project &p, const QString &pseudonym = QStringLiteral("L01"))
{
    auto lead = People::signIn(p, pseudonym, kPass);
    REQUIRE(lead);
    return *lead;
}

void applyEdit(Project &p, Result<std::unique_ptr<Edit>> edit)
{
    REQUIRE(edit);
    REQUIRE(p.apply(**edit));
}

} // namespace

TEST_CASE("A passphrase is stored as an Argon2id string that the reference library verifies",
    "[people][passphrase]")
{
    auto hash = hashPassphrase(kPass);
    REQUIRE(hash);
    // PHC string format of Argon2 (RFC 9106; the $argon2id$v=19$ prefix of the reference
    // implementation): libsodium's INTERACTIVE limits are 2 passes over 64 MiB, one lane.
    CHECK(hash->startsWith(QStringLiteral("$argon2id$v=19$m=65536,t=2,p=1$")));
    CHECK_FALSE(hash->contains(kPass));
    // A fresh salt each time: the same passphrase gives another string.
    auto again = hashPassphrase(kPass);
    REQUIRE(again);
    CHECK(*again != *hash);
    CHECK(passphraseMatches(*hash, kPass));
    CHECK(passphraseMatches(*again, kPass));
    CHECK_FALSE(passphraseMatches(*hash, QStringLiteral("ferry budget 2027")));
    CHECK_FALSE(passphraseMatches(QString(), kPass));
    CHECK_FALSE(passphraseMatches(QStringLiteral("$argon2id$garbage"), kPass));

    // Cross-check with argon2-cffi on libargon2 (the reference implementation, not libsodium):
    // it verifies our string and reads the same parameters...
    const QString verified = python(QStringLiteral(
        "import argon2\n"
        "h = '%1'\n"
        "print(argon2.PasswordHasher().verify(h, '%2'))\n"
        "p = argon2.extract_parameters(h)\n"
        "print(p.type.name, p.version, p.memory_cost, p.time_cost, p.parallelism, p.salt_len)\n")
                                        .arg(*hash, kPass));
    CHECK(verified == QStringLiteral("True\nID 19 65536 2 1 16"));
    // ... and a string it made (Argon2id, 32-byte hash) verifies here; a wrong passphrase does
    // not.
    const QString theirs = python(
        QStringLiteral("import argon2\n"
                       "print(argon2.PasswordHasher(time_cost=2, memory_cost=65536, parallelism=1, "
                       "hash_len=32, type=argon2.Type.ID).hash('%1'))\n")
            .arg(kPass));
    CHECK(theirs.startsWith(QStringLiteral("$argon2id$")));
    CHECK(passphraseMatches(theirs, kPass));
    CHECK_FALSE(passphraseMatches(theirs, kPass + QLatin1Char('!')));
}

TEST_CASE(
    "A passphrase is compared after Unicode NFC and needs eight characters", "[people][passphrase]")
{
    // "é" precomposed (U+00E9) and decomposed (e + U+0301) are the same text (Unicode NFC).
    const QString precomposed = QStringLiteral("caf\u00e9 au lait");
    const QString decomposed = QStringLiteral("cafe\u0301 au lait");
    auto hash = hashPassphrase(precomposed);
    REQUIRE(hash);
    CHECK(passphraseMatches(*hash, decomposed));
    // NIST SP 800-63B §5.1.1.1: at least 8 characters (from memory).
    CHECK(checkNewPassphrase(QStringLiteral("1234567")).error().code == ErrorCode::InvalidArgument);
    CHECK(checkNewPassphrase(QStringLiteral("12345678")));
}

TEST_CASE("A lead is added with a passphrase and chosen only with it", "[people]")
{
    ProjectFixture f;
    // A new project has no lead: its first lead is added with nobody signed in.
    REQUIRE(People::mayAddWithoutLead(f.project).value());
    auto shortPass = People::add(f.project, nullptr,
        {QStringLiteral("Ada Lead"), QStringLiteral("L01"), CoderRole::Lead,
            QStringLiteral("short")});
    REQUIRE_FALSE(shortPass);
    CHECK(shortPass.error().code == ErrorCode::InvalidArgument);
    applyEdit(f.project,
        People::add(f.project, nullptr,
            {QStringLiteral("Ada Lead"), QStringLiteral("L01"), CoderRole::Lead, kPass}));
    CHECK(storedHash(f.project, QStringLiteral("L01")).startsWith(QStringLiteral("$argon2id$")));
    CHECK_FALSE(People::mayAddWithoutLead(f.project).value());
    CHECK(
        People::passphraseState(f.project, QStringLiteral("L01")).value() == PassphraseState::Set);

    // Wrong passphrase refused; the right one signs in as the lead.
    auto wrong = People::signIn(f.project, QStringLiteral("L01"), QStringLiteral("ferry budget"));
    REQUIRE_FALSE(wrong);
    CHECK(wrong.error().code == ErrorCode::NotAllowed);
    auto empty = People::signIn(f.project, QStringLiteral("L01"));
    REQUIRE_FALSE(empty);
    CHECK(empty.error().code == ErrorCode::NotAllowed);
    SignedIn lead = signInLead(f.project);
    CHECK(lead.isLead());
    CHECK(lead.person().pseudonym == QStringLiteral("L01"));

    // Now only a lead adds people: nobody and a coder are refused.
    auto anonymous = People::add(
        f.project, nullptr, {QStringLiteral("Eve"), QStringLiteral("L02"), CoderRole::Lead, kPass});
    REQUIRE_FALSE(anonymous);
    CHECK(anonymous.error().code == ErrorCode::NotAllowed);
    applyEdit(f.project,
        People::add(f.project, &lead,
            {QStringLiteral("Cas Coder"), QStringLiteral("C01"), CoderRole::Coder, QString()}));
    CHECK(People::passphraseState(f.project, QStringLiteral("C01")).value()
        == PassphraseState::NotNeeded);
    auto coder = People::signIn(f.project, QStringLiteral("C01"));
    REQUIRE(coder);
    CHECK_FALSE(coder->isLead());
    auto byCoder = People::add(
        f.project, &*coder, {QStringLiteral("Eve"), QStringLiteral("L02"), CoderRole::Lead, kPass});
    REQUIRE_FALSE(byCoder);
    CHECK(byCoder.error().code == ErrorCode::NotAllowed);
    auto renameByCoder =
        People::rename(f.project, *coder, QStringLiteral("C01"), QStringLiteral("X"));
    REQUIRE_FALSE(renameByCoder);
    CHECK(renameByCoder.error().code == ErrorCode::NotAllowed);

    // Pseudonyms are unique.
    auto dup = People::add(f.project, &lead,
        {QStringLiteral("Other"), QStringLiteral("C01"), CoderRole::Coder, QString()});
    REQUIRE_FALSE(dup);
    CHECK(dup.error().code == ErrorCode::Duplicate);
}

TEST_CASE("A lead of an older file sets a passphrase the first time they are chosen", "[people]")
{
    ProjectFixture f;
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead); // as an upgraded file holds them
    CHECK(storedHash(f.project, QStringLiteral("L01")).isEmpty());
    CHECK(People::passphraseState(f.project, QStringLiteral("L01")).value()
        == PassphraseState::NotSetYet);
    auto tooShort = People::signIn(f.project, QStringLiteral("L01"), QStringLiteral("abc"));
    REQUIRE_FALSE(tooShort);
    CHECK(tooShort.error().code == ErrorCode::InvalidArgument);
    CHECK(storedHash(f.project, QStringLiteral("L01")).isEmpty());

    REQUIRE(People::signIn(f.project, QStringLiteral("L01"), kPass));
    CHECK(
        People::passphraseState(f.project, QStringLiteral("L01")).value() == PassphraseState::Set);
    // From then on the passphrase is checked.
    CHECK(
        People::signIn(f.project, QStringLiteral("L01"), QStringLiteral("another one")).error().code
        == ErrorCode::NotAllowed);
    CHECK(People::signIn(f.project, QStringLiteral("L01"), kPass));
}

TEST_CASE("Rename disable and enable are undoable edits logged without the name", "[people]")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    f.addCoder(QStringLiteral("C02"));
    SignedIn lead = signInLead(f.project);

    auto rename = People::rename(
        f.project, lead, QStringLiteral("C01"), QStringLiteral("  Wilma Secretname "));
    REQUIRE(rename);
    REQUIRE(f.project.apply(**rename));
    auto c = f.project.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(c);
    CHECK((*c)->name == QStringLiteral("Wilma Secretname"));
    REQUIRE(f.project.revert(**rename));
    c = f.project.coderByPseudonym(QStringLiteral("C01"));
    CHECK((*c)->name == QStringLiteral("Test person C01"));
    REQUIRE(f.project.apply(**rename)); // redo

    // A disabled person keeps their codings and takes no new assignments.
    const ArticleId f1 = f.articleId(QStringLiteral("f1"));
    REQUIRE(f.project.assign(f1, c1, Phase::Production));
    auto disable = People::setDisabled(f.project, lead, QStringLiteral("C01"), true);
    REQUIRE(disable);
    REQUIRE(f.project.apply(**disable));
    c = f.project.coderByPseudonym(QStringLiteral("C01"));
    CHECK((*c)->disabled);
    auto kept = f.project.assignments();
    REQUIRE(kept);
    CHECK(kept->size() == 1);
    const ArticleId f2 = f.articleId(QStringLiteral("f2"));
    auto refused = f.project.assign(f2, c1, Phase::Production);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::InvalidArgument);
    CHECK(refused.error().message.contains(QStringLiteral("C01")));
    auto plan = AssignmentPlans::planArticles(f.project, Phase::Production,
        QStringList {QStringLiteral("f2")}, QStringList {QStringLiteral("C01")});
    REQUIRE_FALSE(plan);
    CHECK(plan.error().message.contains(QStringLiteral("disabled")));
    // A disabled person cannot be chosen; disabling twice is refused.
    CHECK(People::signIn(f.project, QStringLiteral("C01")).error().code == ErrorCode::NotAllowed);
    CHECK(People::setDisabled(f.project, lead, QStringLiteral("C01"), true).error().code
        == ErrorCode::InvalidArgument);
    // The only enabled lead cannot be disabled.
    CHECK(People::setDisabled(f.project, lead, QStringLiteral("L01"), true).error().code
        == ErrorCode::NotAllowed);

    auto enable = People::setDisabled(f.project, lead, QStringLiteral("C01"), false);
    REQUIRE(enable);
    REQUIRE(f.project.apply(**enable));
    REQUIRE(f.project.assign(f2, c1, Phase::Production));

    // The event log names the changes by action and uuid, never by name.
    auto log = databaseForTesting(f.project).prepare(QStringLiteral(
        "SELECT group_concat(action || ' ' || detail, ';') FROM event_log WHERE object_type = "
        "'coder'"));
    REQUIRE(log);
    REQUIRE(log->step().value());
    const QString entries = log->columnText(0);
    CHECK(entries.contains(QStringLiteral("coder.rename")));
    CHECK(entries.contains(QStringLiteral("undo:coder.rename")));
    CHECK(entries.contains(QStringLiteral("coder.disable")));
    CHECK(entries.contains(QStringLiteral("coder.enable")));
    CHECK_FALSE(entries.contains(QStringLiteral("Wilma")));
}

TEST_CASE("Undoing an added person restores the whole file", "[people]")
{
    ProjectFixture f;
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    SignedIn lead = signInLead(f.project);
    auto add = People::add(f.project, &lead,
        {QStringLiteral("Nina New"), QStringLiteral("L02"), CoderRole::Lead, kPass});
    REQUIRE(add);
    // The event log is left out: an undo is logged, not unwritten.
    auto tables = [&] { return dumpDatabase(databaseForTesting(f.project)); };
    const auto before = tables();
    REQUIRE(f.project.apply(**add));
    CHECK(tables() != before);
    REQUIRE(f.project.revert(**add));
    CHECK(tables() == before);
    REQUIRE(f.project.apply(**add)); // redo: the same person again, passphrase included
    CHECK(People::signIn(f.project, QStringLiteral("L02"), kPass));
}

TEST_CASE("A coder copy is never opened as a lead and takes no new people", "[people][copies]")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    const CoderId lead = f.addCoder(QStringLiteral("L02"), CoderRole::Lead);
    REQUIRE(f.project.assign(f.articleId(QStringLiteral("f1")), lead, Phase::Production));
    const QString copyPath = f.dir.filePath(QStringLiteral("l02.fourfold"));
    REQUIRE(CoderCopies::handout(f.project, QStringLiteral("L02"), copyPath));

    auto copy = Project::open(copyPath);
    REQUIRE(copy);
    // The copy holds its person only, with the role the project gave them, but no hash.
    CHECK(storedHash(*copy, QStringLiteral("L02")).isEmpty());
    CHECK(People::passphraseState(*copy, QStringLiteral("L02")).value()
        == PassphraseState::NotNeeded);
    auto in = People::signIn(*copy, QStringLiteral("L02"), kPass);
    REQUIRE(in);
    CHECK_FALSE(in->isLead());
    CHECK(in->person().role == CoderRole::Coder);
    CHECK(storedHash(*copy, QStringLiteral("L02")).isEmpty()); // nothing set in the copy
    CHECK_FALSE(People::mayAddWithoutLead(*copy).value());
    auto add = People::add(
        *copy, nullptr, {QStringLiteral("Mallory"), QStringLiteral("L09"), CoderRole::Lead, kPass});
    REQUIRE_FALSE(add);
    CHECK(add.error().code == ErrorCode::NotAllowed);
    auto addByIt = People::add(
        *copy, &*in, {QStringLiteral("Mallory"), QStringLiteral("L09"), CoderRole::Lead, kPass});
    REQUIRE_FALSE(addByIt);
    CHECK(addByIt.error().code == ErrorCode::NotAllowed);
}

TEST_CASE("Verifying a passphrase costs one Argon2id computation", "[people][passphrase]")
{
    ProjectFixture f;
    f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    f.addCoder(QStringLiteral("C01"));
    const qint64 start = passphraseHashesComputed();
    REQUIRE(People::signIn(f.project, QStringLiteral("L01"), kPass)); // sets it: one hash
    CHECK(passphraseHashesComputed() - start == 1);
    REQUIRE(People::signIn(f.project, QStringLiteral("L01"), kPass)); // one verification
    CHECK(passphraseHashesComputed() - start == 2);
    REQUIRE(People::signIn(f.project, QStringLiteral("C01"))); // a coder: none
    CHECK(passphraseHashesComputed() - start == 2);
}

TEST_CASE("An upgraded version-6 project asks its lead to set a passphrase", "[people][schema]")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("v6.fourfold"));
    {
        auto p = Project::create(path);
        REQUIRE(p);
        REQUIRE(addOlderLeadForTesting(*p, QStringLiteral("Test lead"), QStringLiteral("L01")));
    }
    {
        // Back to version 6 as an older Fourfold left it: without the columns of version 7
        // and the tables of version 8.
        auto db = Database::open(path, Database::OpenMode::ReadWrite);
        REQUIRE(db);
        REQUIRE(db->exec(QStringLiteral("ALTER TABLE coder DROP COLUMN passphrase_hash;"
                                        "ALTER TABLE coder DROP COLUMN disabled;"
                                        "DROP TABLE frame_member; DROP TABLE frame_cluster;"
                                        "DROP TABLE frame_analysis; DROP TABLE article_near_copy;"
                                        "PRAGMA user_version = 6;")));
    }
    auto p = Project::open(path);
    REQUIRE(p);
    CHECK(p->backupPath().endsWith(QStringLiteral(".v6.bak")));
    CHECK(People::passphraseState(*p, QStringLiteral("L01")).value() == PassphraseState::NotSetYet);
    REQUIRE(People::signIn(*p, QStringLiteral("L01"), kPass));
    CHECK(People::signIn(*p, QStringLiteral("L01"), QStringLiteral("wrong passphrase")).error().code
        == ErrorCode::NotAllowed);
}

TEST_CASE("Project::addCoder never adds a lead", "[people]")
{
    ProjectFixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project));
    auto lead =
        f.project.addCoder(QStringLiteral("Mallory"), QStringLiteral("L09"), CoderRole::Lead);
    REQUIRE_FALSE(lead);
    CHECK(lead.error().code == ErrorCode::NotAllowed);
    CHECK(lead.error().message.contains(QStringLiteral("L09")));
    // Nothing written: no person, no event.
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
    // A coder it adds as before.
    CHECK(f.project.addCoder(QStringLiteral("Cas"), QStringLiteral("C09"), CoderRole::Coder));
}

TEST_CASE("A lead without a passphrase only as the first lead of a new project", "[people]")
{
    ProjectFixture f;
    f.addCoder(QStringLiteral("C01"));
    // A new project without a lead: the first may come without a passphrase (build-sample's
    // demo lead); whoever chooses them first sets it.
    auto first = People::addLeadWithoutPassphrase(
        f.project, QStringLiteral("Demo lead"), QStringLiteral("L01"));
    REQUIRE(first);
    REQUIRE(f.project.apply(**first));
    CHECK(People::passphraseState(f.project, QStringLiteral("L01")).value()
        == PassphraseState::NotSetYet);
    // Once there is a lead, none is added without a passphrase, nor is the passphrase-less one
    // a way around it after they have set theirs.
    auto second = People::addLeadWithoutPassphrase(
        f.project, QStringLiteral("Mallory"), QStringLiteral("L09"));
    REQUIRE_FALSE(second);
    CHECK(second.error().code == ErrorCode::NotAllowed);
    REQUIRE(People::signIn(f.project, QStringLiteral("L01"), kPass));
    auto third = People::addLeadWithoutPassphrase(
        f.project, QStringLiteral("Mallory"), QStringLiteral("L09"));
    REQUIRE_FALSE(third);
    CHECK(third.error().code == ErrorCode::NotAllowed);
    auto nobody = f.project.coderByPseudonym(QStringLiteral("L09"));
    REQUIRE(nobody);
    CHECK_FALSE(nobody->has_value());
}
