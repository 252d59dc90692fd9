#pragma once
// An edit: one change a person makes, able to apply and revert itself. Project::apply() and
// Project::revert() run it inside one savepoint and log it, so every edit is committed at once
// or not at all. Edits hold ids and copied values, never pointers into the project, so that an
// undo stack can keep them (style.md §5).

#include "core/model/error.h"
#include "core/model/ids.h"

#include <QJsonObject>
#include <QString>

namespace fourfold {

class Database;

class Edit
{
public:
    virtual ~Edit() = default;

    // A short, translated description for an undo menu ("Add cause span").
    virtual QString text() const = 0;
    // The event-log action ("annotation.add") and the object it touches.
    virtual QString action() const = 0;
    virtual QString objectType() const = 0;
    virtual QString objectUuid() const = 0;
    // What the event log records with the edit's action (empty for most edits: the object
    // names it); e.g. the record of a sampling draw.
    virtual QJsonObject detail() const { return {}; }
    // Who makes the edit (for the event log); may be invalid for program actions.
    CoderId actor() const { return m_actor; }

    // Applies the edit to `db` inside the caller's savepoint. On failure nothing must be
    // assumed written (the caller rolls back). Applying again after revert() redoes the edit
    // with the same uuids.
    virtual Status apply(Database &db) = 0;
    // Undoes a successful apply() inside the caller's savepoint.
    virtual Status revert(Database &db) = 0;

protected:
    explicit Edit(CoderId actor)
        : m_actor(actor)
    { }

private:
    CoderId m_actor;
};

} // namespace fourfold
