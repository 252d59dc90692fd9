#pragma once
// A merge conflict: an object that a coder copy (or a team sync) changed one way while the
// project, or another copy merged before, changed it another. The versions are the objects'
// portable form (references as uuids); see core/project/coder_copies.h.

#include <QJsonObject>
#include <QString>

namespace fourfold {

struct MergeConflict {
    QString uuid;
    QString objectType; // "annotation", "link", "judgement", "assignment"
    QString objectUuid;
    QString copyUuid; // the copy that brought the losing version ("" if the project's own)
    QJsonObject mine; // the version the project keeps (portable row; {} if none)
    QJsonObject theirs; // the version that lost (portable row)
    QString detectedAt; // ISO 8601 UTC
    QString resolution; // "" (open), "mine" or "theirs"
    QString resolvedAt;
};

} // namespace fourfold
