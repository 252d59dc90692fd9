#pragma once
// The edits that change who takes part in a project: adding a person, renaming, disabling or
// enabling one, and setting a lead's passphrase. Only People (core/project/people.h) makes them,
// after it has checked who asks; a front end applies what People hands it (Project::apply or the
// desk's undo stack). Their event-log entries name the person by uuid, never by name.

#include "core/model/coder.h"
#include "core/project/edit.h"

namespace fourfold {

class People;

class AddPersonEdit : public Edit
{
public:
    QString text() const override;
    QString action() const override { return QStringLiteral("coder.add"); }
    QString objectType() const override { return QStringLiteral("coder"); }
    QString objectUuid() const override { return m_person.uuid; }
    Status apply(Database &db) override;
    // Removes the row again (refused while anything refers to the person).
    Status revert(Database &db) override;
    // The new person's row id once applied.
    CoderId personId() const { return m_person.id; }

private:
    friend class People;
    AddPersonEdit(CoderId actor, Coder person, QString passphraseHash);
    Coder m_person; // id filled by the first apply() and kept for redo
    QString m_hash;
};

class RenamePersonEdit : public Edit
{
public:
    QString text() const override;
    QString action() const override { return QStringLiteral("coder.rename"); }
    QString objectType() const override { return QStringLiteral("coder"); }
    QString objectUuid() const override { return m_person.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    friend class People;
    RenamePersonEdit(CoderId actor, Coder person, QString newName);
    Coder m_person; // as before the edit
    QString m_newName;
};

class SetPersonDisabledEdit : public Edit
{
public:
    QString text() const override;
    QString action() const override
    {
        return m_disabled ? QStringLiteral("coder.disable") : QStringLiteral("coder.enable");
    }
    QString objectType() const override { return QStringLiteral("coder"); }
    QString objectUuid() const override { return m_person.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    friend class People;
    SetPersonDisabledEdit(CoderId actor, Coder person, bool disabled);
    Coder m_person;
    bool m_disabled = false;
};

class SetPassphraseEdit : public Edit
{
public:
    QString text() const override;
    QString action() const override { return QStringLiteral("coder.passphrase"); }
    QString objectType() const override { return QStringLiteral("coder"); }
    QString objectUuid() const override { return m_person.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    friend class People;
    SetPassphraseEdit(CoderId actor, Coder person, QString oldHash, QString newHash);
    Coder m_person;
    QString m_oldHash;
    QString m_newHash;
};

} // namespace fourfold
