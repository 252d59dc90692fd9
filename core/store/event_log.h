#pragma once
// The append-only event log: who did what, when. Rows are never updated or deleted (the schema's
// triggers refuse it); an undo is logged as its own event.

#include "core/model/error.h"
#include "core/model/ids.h"

#include <QJsonObject>
#include <QString>

namespace fourfold {
class Database;
namespace store {

// Appends one event. `actor` may be invalid (0) for actions of the program itself.
Status appendEvent(Database &db, CoderId actor, const QString &action, const QString &objectType,
    const QString &objectUuid, const QJsonObject &detail = {});

} // namespace store
} // namespace fourfold
