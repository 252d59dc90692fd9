#pragma once
// Which coder copies the project handed out with given assignments: what a lead withdrawing a
// draw is told (core/project/coder_copies.h), so that the coders can be asked not to code there.

#include "core/model/error.h"

#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {
class Database;
namespace store {

// One hand-out holding some of the assignments asked about.
struct CopyHolding {
    QString copyUuid;
    QString coder; // pseudonym, as recorded at the hand-out
    QString handedOutAt; // ISO 8601 UTC
    QStringList articles; // external ids, sorted
};

// The copies whose recorded base holds an assignment in `phase` of one of the articles
// `articleUuids`, handed out to one of the coders `pseudonyms`; ordered by hand-out time, then copy
// uuid. One query.
Result<std::vector<CopyHolding>> copiesHolding(const Database &db, const QString &phase,
    const QStringList &articleUuids, const QStringList &pseudonyms);

} // namespace store
} // namespace fourfold
