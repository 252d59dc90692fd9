#pragma once
// A new codebook version as an undoable edit (made and checked by CodebookVersions::addEdit, see
// core/project/codebook_versions.h). It holds the codebook, its note and the uuid of the version
// row, made once, so a redo writes the same row.

#include "core/model/codebook.h"
#include "core/project/edit.h"

#include <QJsonObject>
#include <QString>

namespace fourfold {

// Stores `codebook` as version `number`, logged as "codebook.version" with `detail` (the diff
// against the version before and the note). apply() fails with Conflict when the current version
// is no longer number − 1 (another version came meanwhile), and with InvalidInput when a live
// span or answer carries a value the new version neither lists nor recodes. Revert removes the
// version again; it fails with NotAllowed while spans or answers made under it exist (undo them
// first).
class AddCodebookVersionEdit : public Edit
{
public:
    AddCodebookVersionEdit(
        CoderId actor, Codebook codebook, QString note, int number, QJsonObject detail);

    QString text() const override;
    QString action() const override { return QStringLiteral("codebook.version"); }
    QString objectType() const override { return QStringLiteral("codebook"); }
    QString objectUuid() const override { return m_uuid; }
    QJsonObject detail() const override { return m_detail; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    int number() const { return m_number; }

    // InvalidInput naming the first value that a live coder's or gold span (or answer) carries
    // and `next` neither lists nor recodes, where `current` counted it; for apply() and addEdit.
    static Status checkValuesInUse(
        const Database &db, const Codebook &current, const Codebook &next);

private:
    Codebook m_codebook;
    QString m_note;
    int m_number = 0;
    QJsonObject m_detail;
    QString m_uuid;
};

} // namespace fourfold
