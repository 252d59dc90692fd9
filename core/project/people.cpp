#include "core/project/people.h"

#include "core/project/coder_copies.h"
#include "core/project/passphrase.h"
#include "core/project/person_edits.h"
#include "core/project/project.h"
#include "core/store/coder_table.h"
#include "core/store/database.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

#include <algorithm>

namespace fourfold {

namespace {

Result<bool> isCoderCopy(const Project &project)
{
    auto info = CoderCopies::copyInfo(project);
    if (!info)
        return std::unexpected(info.error());
    return info->has_value();
}

Result<Coder> findPerson(const std::vector<Coder> &all, const QString &pseudonym)
{
    const auto it = std::ranges::find(all, pseudonym.trimmed(), &Coder::pseudonym);
    if (it == all.end())
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("People", "There is nobody with the pseudonym \"%1\".")
                .arg(pseudonym));
    return *it;
}

bool hasEnabledLead(const std::vector<Coder> &all)
{
    return std::ranges::any_of(
        all, [](const Coder &c) { return c.role == CoderRole::Lead && !c.disabled; });
}

std::unexpected<Error> copyRefusal()
{
    return fail(ErrorCode::NotAllowed,
        QCoreApplication::translate("People",
            "This is a coder copy: it holds its coder only, and nobody leads in it. Add and "
            "change people in the main project."));
}

// Checks that `by` is, in the file as it is now, an enabled lead of a project that is not a
// coder copy (a sign-in can outlive a change made elsewhere).
Status checkLead(const Project &project, const std::vector<Coder> &all, const SignedIn *by)
{
    auto copy = isCoderCopy(project);
    if (!copy)
        return std::unexpected(copy.error());
    if (*copy)
        return copyRefusal();
    if (by == nullptr) {
        if (!hasEnabledLead(all))
            return {};
        return fail(ErrorCode::NotAllowed,
            QCoreApplication::translate(
                "People", "Only a lead can add or change people; choose a lead first."));
    }
    const auto it = std::ranges::find(all, by->person().id, &Coder::id);
    if (it == all.end() || it->role != CoderRole::Lead || it->disabled || !by->isLead())
        return fail(ErrorCode::NotAllowed,
            QCoreApplication::translate("People",
                "Only a lead can add or change people; %1 is "
                "not an enabled lead of this project.")
                .arg(by->person().pseudonym));
    return {};
}

} // namespace

Result<std::vector<Coder>> People::list(const Project &project)
{
    return store::coders(project.db());
}

Result<PassphraseState> People::passphraseState(const Project &project, const QString &pseudonym)
{
    auto all = list(project);
    if (!all)
        return std::unexpected(all.error());
    auto person = findPerson(*all, pseudonym);
    if (!person)
        return std::unexpected(person.error());
    auto copy = isCoderCopy(project);
    if (!copy)
        return std::unexpected(copy.error());
    if (person->role != CoderRole::Lead || *copy)
        return PassphraseState::NotNeeded;
    auto hash = store::coderPassphraseHash(project.db(), person->id);
    if (!hash)
        return std::unexpected(hash.error());
    return hash->isEmpty() ? PassphraseState::NotSetYet : PassphraseState::Set;
}

Result<SignedIn> People::signIn(
    Project &project, const QString &pseudonym, const QString &passphrase)
{
    auto all = list(project);
    if (!all)
        return std::unexpected(all.error());
    auto person = findPerson(*all, pseudonym);
    if (!person)
        return std::unexpected(person.error());
    if (person->disabled)
        return fail(ErrorCode::NotAllowed,
            QCoreApplication::translate(
                "People", "%1 is disabled and cannot be chosen; a lead can enable them again.")
                .arg(person->pseudonym));
    auto copy = isCoderCopy(project);
    if (!copy)
        return std::unexpected(copy.error());
    if (*copy) {
        person->role = CoderRole::Coder; // a coder copy is never opened as a lead
        return SignedIn(*person);
    }
    if (person->role != CoderRole::Lead)
        return SignedIn(*person);
    auto hash = store::coderPassphraseHash(project.db(), person->id);
    if (!hash)
        return std::unexpected(hash.error());
    if (hash->isEmpty()) {
        // A lead of a file from before passphrases: the first passphrase given becomes theirs.
        FOURFOLD_TRY_STATUS(checkNewPassphrase(passphrase));
        auto made = hashPassphrase(passphrase);
        if (!made)
            return std::unexpected(made.error());
        SetPassphraseEdit edit(person->id, *person, QString(), *made);
        FOURFOLD_TRY_STATUS(project.apply(edit));
        return SignedIn(*person);
    }
    if (!passphraseMatches(*hash, passphrase))
        return fail(ErrorCode::NotAllowed,
            QCoreApplication::translate("People", "That is not the passphrase of %1.")
                .arg(person->pseudonym));
    return SignedIn(*person);
}

Result<bool> People::mayAddWithoutLead(const Project &project)
{
    auto all = list(project);
    if (!all)
        return std::unexpected(all.error());
    auto copy = isCoderCopy(project);
    if (!copy)
        return std::unexpected(copy.error());
    return !*copy && !hasEnabledLead(*all);
}

Result<std::unique_ptr<Edit>> People::add(
    const Project &project, const SignedIn *by, const NewPerson &person)
{
    return addPerson(project, by, person, true);
}

Result<std::unique_ptr<Edit>> People::addLeadWithoutPassphrase(
    const Project &project, const QString &name, const QString &pseudonym)
{
    // Nobody signed in: allowed only while the project has no enabled lead (checkLead).
    return addPerson(project, nullptr, {name, pseudonym, CoderRole::Lead, QString()}, false);
}

Result<std::unique_ptr<Edit>> People::addPerson(
    const Project &project, const SignedIn *by, const NewPerson &person, bool withPassphrase)
{
    auto all = list(project);
    if (!all)
        return std::unexpected(all.error());
    FOURFOLD_TRY_STATUS(checkLead(project, *all, by));
    Coder c;
    c.uuid = store::newUuid();
    c.name = person.name.trimmed();
    c.pseudonym = person.pseudonym.trimmed();
    c.role = person.role;
    if (c.name.isEmpty() || c.pseudonym.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            QCoreApplication::translate("People", "A person needs a name and a pseudonym."));
    if (std::ranges::find(*all, c.pseudonym, &Coder::pseudonym) != all->end())
        return fail(ErrorCode::Duplicate,
            QCoreApplication::translate("People", "The pseudonym \"%1\" is already taken.")
                .arg(c.pseudonym));
    QString hash;
    if (c.role == CoderRole::Lead && withPassphrase) {
        FOURFOLD_TRY_STATUS(checkNewPassphrase(person.passphrase));
        auto made = hashPassphrase(person.passphrase);
        if (!made)
            return std::unexpected(made.error());
        hash = *made;
    }
    return std::unique_ptr<Edit>(
        new AddPersonEdit(by ? by->person().id : CoderId {}, std::move(c), std::move(hash)));
}

Result<std::unique_ptr<Edit>> People::rename(
    const Project &project, const SignedIn &by, const QString &pseudonym, const QString &name)
{
    auto all = list(project);
    if (!all)
        return std::unexpected(all.error());
    FOURFOLD_TRY_STATUS(checkLead(project, *all, &by));
    auto person = findPerson(*all, pseudonym);
    if (!person)
        return std::unexpected(person.error());
    if (name.trimmed().isEmpty())
        return fail(ErrorCode::InvalidArgument,
            QCoreApplication::translate("People", "A person needs a name."));
    return std::unique_ptr<Edit>(new RenamePersonEdit(by.person().id, *person, name.trimmed()));
}

Result<std::unique_ptr<Edit>> People::setDisabled(
    const Project &project, const SignedIn &by, const QString &pseudonym, bool disabled)
{
    auto all = list(project);
    if (!all)
        return std::unexpected(all.error());
    FOURFOLD_TRY_STATUS(checkLead(project, *all, &by));
    auto person = findPerson(*all, pseudonym);
    if (!person)
        return std::unexpected(person.error());
    if (person->disabled == disabled)
        return fail(ErrorCode::InvalidArgument,
            disabled ? QCoreApplication::translate("People", "%1 is already disabled.")
                           .arg(person->pseudonym)
                     : QCoreApplication::translate("People", "%1 is already enabled.")
                           .arg(person->pseudonym));
    if (disabled && person->role == CoderRole::Lead) {
        const auto leads = std::ranges::count_if(
            *all, [](const Coder &c) { return c.role == CoderRole::Lead && !c.disabled; });
        if (leads <= 1)
            return fail(ErrorCode::NotAllowed,
                QCoreApplication::translate("People",
                    "%1 is the project's only enabled lead; add or enable another lead first.")
                    .arg(person->pseudonym));
    }
    return std::unique_ptr<Edit>(new SetPersonDisabledEdit(by.person().id, *person, disabled));
}

} // namespace fourfold
