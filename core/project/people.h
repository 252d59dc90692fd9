#pragma once
// Who takes part in a project and who may lead it. The rules live here, never in a front end:
//
// - Choosing a person (signIn): a coder needs nothing; a lead gives their passphrase, checked
//   against the Argon2id hash kept in the file (core/project/passphrase.h). A lead of an older
//   file who has none yet sets it the first time they are chosen: the passphrase given then
//   becomes theirs (logged). A disabled person cannot be chosen. In a coder copy nobody is a
//   lead: whoever is chosen there codes blind, as a coder.
// - Adding a person, renaming, disabling or enabling one needs a signed-in lead, except for the
//   first lead of a project that has no enabled lead yet. A lead is added with a passphrase;
//   nobody is added to a coder copy. The last enabled lead cannot be disabled.
// - Pseudonyms are unique; a disabled person keeps their codings and takes no new assignments
//   (AssignmentPlans, SubsampleDraw and Project::assign refuse them).
//
// What this protects: the shared desk, against a careless or curious look at other coders'
// spans. Not someone who reads the SQLite file directly (or runs any program on it): for real
// separation give coders their coder copies (CoderCopies) or separate projects.

#include "core/model/coder.h"
#include "core/model/error.h"

#include <QString>

#include <memory>
#include <vector>

namespace fourfold {

class Edit;
class Project;

struct NewPerson {
    QString name;
    QString pseudonym;
    CoderRole role = CoderRole::Coder;
    QString passphrase; // a lead's; ignored for a coder
};

enum class PassphraseState {
    NotNeeded, // a coder, or anyone in a coder copy
    Set, // a lead who has one: enter it
    NotSetYet, // a lead of an older file: set one now
};

// The person chosen and checked by People::signIn: the only proof of who acts that People's
// changes accept. Front ends keep it; they cannot make one.
class SignedIn
{
public:
    const Coder &person() const { return m_person; }
    bool isLead() const { return m_person.role == CoderRole::Lead; }

private:
    friend class People;
    explicit SignedIn(Coder person)
        : m_person(std::move(person))
    { }
    Coder m_person;
};

class People
{
public:
    People() = delete;

    // Everyone, disabled people included, ordered by pseudonym.
    static Result<std::vector<Coder>> list(const Project &project);
    // What choosing `pseudonym` asks for. NotFound for nobody of that pseudonym.
    static Result<PassphraseState> passphraseState(
        const Project &project, const QString &pseudonym);
    // Chooses the person with `pseudonym` (see the rules above). NotFound for nobody of that
    // pseudonym; NotAllowed for a disabled person or a wrong passphrase; InvalidArgument for a
    // first passphrase that is too short. In a coder copy the person is returned as a coder.
    static Result<SignedIn> signIn(
        Project &project, const QString &pseudonym, const QString &passphrase = {});
    // Whether a person may be added with nobody signed in (a project with no enabled lead, not
    // a coder copy).
    static Result<bool> mayAddWithoutLead(const Project &project);

    // Checked edits, not yet applied: apply each with Project::apply (or a desk's undo stack).
    // NotAllowed when `by` is not an enabled lead of this project (`by` may be null only while
    // mayAddWithoutLead()), or in a coder copy; InvalidArgument for an empty name or pseudonym
    // or a lead's passphrase that is too short; Duplicate for a pseudonym in use.
    static Result<std::unique_ptr<Edit>> add(
        const Project &project, const SignedIn *by, const NewPerson &person);
    // The first lead of a project built from files (fourfold-cli build-sample), without a
    // passphrase: as a lead of a file from before passphrases, whoever chooses them first sets
    // it. Allowed only while add() needs nobody signed in (no enabled lead yet, not a coder
    // copy), so it never adds a lead beside one who has a passphrase; else as add().
    static Result<std::unique_ptr<Edit>> addLeadWithoutPassphrase(
        const Project &project, const QString &name, const QString &pseudonym);
    // NotFound for an unknown pseudonym; InvalidArgument for an empty name.
    static Result<std::unique_ptr<Edit>> rename(
        const Project &project, const SignedIn &by, const QString &pseudonym, const QString &name);
    // NotFound for an unknown pseudonym; NotAllowed for the last enabled lead; InvalidArgument
    // when the person already is in that state.
    static Result<std::unique_ptr<Edit>> setDisabled(
        const Project &project, const SignedIn &by, const QString &pseudonym, bool disabled);

private:
    static Result<std::unique_ptr<Edit>> addPerson(
        const Project &project, const SignedIn *by, const NewPerson &person, bool withPassphrase);
};

} // namespace fourfold
