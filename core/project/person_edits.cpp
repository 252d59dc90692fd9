#include "core/project/person_edits.h"

#include "core/store/coder_table.h"

#include <QCoreApplication>

namespace fourfold {

AddPersonEdit::AddPersonEdit(CoderId actor, Coder person, QString passphraseHash)
    : Edit(actor)
    , m_person(std::move(person))
    , m_hash(std::move(passphraseHash))
{ }

QString AddPersonEdit::text() const
{
    return QCoreApplication::translate("PersonEdits", "Add %1").arg(m_person.pseudonym);
}

Status AddPersonEdit::apply(Database &db)
{
    auto id = store::insertCoder(db, m_person, m_hash);
    if (!id)
        return std::unexpected(id.error());
    m_person.id = *id;
    return {};
}

Status AddPersonEdit::revert(Database &db)
{
    return store::removeCoder(db, m_person.id);
}

RenamePersonEdit::RenamePersonEdit(CoderId actor, Coder person, QString newName)
    : Edit(actor)
    , m_person(std::move(person))
    , m_newName(std::move(newName))
{ }

QString RenamePersonEdit::text() const
{
    return QCoreApplication::translate("PersonEdits", "Rename %1").arg(m_person.pseudonym);
}

Status RenamePersonEdit::apply(Database &db)
{
    return store::setCoderName(db, m_person.id, m_newName);
}

Status RenamePersonEdit::revert(Database &db)
{
    return store::setCoderName(db, m_person.id, m_person.name);
}

SetPersonDisabledEdit::SetPersonDisabledEdit(CoderId actor, Coder person, bool disabled)
    : Edit(actor)
    , m_person(std::move(person))
    , m_disabled(disabled)
{ }

QString SetPersonDisabledEdit::text() const
{
    return m_disabled
        ? QCoreApplication::translate("PersonEdits", "Disable %1").arg(m_person.pseudonym)
        : QCoreApplication::translate("PersonEdits", "Enable %1").arg(m_person.pseudonym);
}

Status SetPersonDisabledEdit::apply(Database &db)
{
    return store::setCoderDisabled(db, m_person.id, m_disabled);
}

Status SetPersonDisabledEdit::revert(Database &db)
{
    return store::setCoderDisabled(db, m_person.id, m_person.disabled);
}

SetPassphraseEdit::SetPassphraseEdit(CoderId actor, Coder person, QString oldHash, QString newHash)
    : Edit(actor)
    , m_person(std::move(person))
    , m_oldHash(std::move(oldHash))
    , m_newHash(std::move(newHash))
{ }

QString SetPassphraseEdit::text() const
{
    return QCoreApplication::translate("PersonEdits", "Set the passphrase of %1")
        .arg(m_person.pseudonym);
}

Status SetPassphraseEdit::apply(Database &db)
{
    return store::setCoderPassphraseHash(db, m_person.id, m_newHash);
}

Status SetPassphraseEdit::revert(Database &db)
{
    return store::setCoderPassphraseHash(db, m_person.id, m_oldHash);
}

} // namespace fourfold
