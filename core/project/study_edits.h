#pragma once
// The study design's writes as undoable edits (made and checked by AssignmentPlans::edit,
// SubsampleDraw::edit and withdrawEdit, StudyProgress::effortEdit). Each holds resolved ids and
// copied values; the CLI applies it through Project::apply, the desktop pushes it on its undo
// stack.

#include "core/model/annotation.h"
#include "core/project/edit.h"

#include <QJsonObject>
#include <QString>

#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

// One assignment to write, resolved: the uuid is made once, so a redo writes the same row.
struct AssignmentToWrite {
    ArticleId article;
    CoderId coder;
    Phase phase = Phase::Production;
    QString uuid;
};

// Writes assignments, with one "assignment.add" event each; logged as "assignment.plan" with
// `record` (a draw's record, or what planned the rows). With `settingKey`, also sets that
// project setting to `settingValue` (a draw's record, study.draw.<phase>); apply() fails with
// Duplicate when the setting is there already (a draw recorded meanwhile). Revert removes the
// rows and the setting again (a row that was a tombstone before, of a withdrawn draw, becomes that
// tombstone again); it fails with NotAllowed, naming how many, once coding started on any of them.
// A tombstone that carries coding time (work merged from a coder copy on the withdrawn assignment)
// gives it to the row it becomes, and takes it back on revert; no revert here or in
// WithdrawDrawEdit lowers a row's coding time.
class AssignEdit : public Edit
{
public:
    AssignEdit(CoderId actor, QString text, std::vector<AssignmentToWrite> rows, QJsonObject record,
        QString settingKey = {}, QString settingValue = {});

    QString text() const override { return m_text; }
    QString action() const override { return QStringLiteral("assignment.plan"); }
    QString objectType() const override { return QStringLiteral("assignment"); }
    QString objectUuid() const override { return {}; }
    QJsonObject detail() const override { return m_record; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    const std::vector<AssignmentToWrite> &rows() const { return m_rows; }

private:
    QString m_text;
    std::vector<AssignmentToWrite> m_rows;
    QJsonObject m_record;
    QString m_settingKey;
    QString m_settingValue;
    struct Before; // the tombstones the rows replaced, taken by apply()
    std::shared_ptr<Before> m_before;
};

// Withdraws a committed draw before anyone codes it: each of its live assignments `rows`
// becomes a tombstone (one "assignment.remove" event each) and its record, the setting
// `settingKey`, goes; logged as "draw.withdraw" with the record. apply() fails with NotAllowed
// when coding started on any of them (a span, an answer, coding time, or the status started or
// done), naming how many; NotFound when the draw is not recorded any more. Revert brings the
// rows and the record back as they were.
class WithdrawDrawEdit : public Edit
{
public:
    WithdrawDrawEdit(CoderId actor, QString text, QString phase,
        std::vector<AssignmentToWrite> rows, QJsonObject record, QString settingKey);

    QString text() const override { return m_text; }
    QString action() const override { return QStringLiteral("draw.withdraw"); }
    QString objectType() const override { return QStringLiteral("assignment"); }
    QString objectUuid() const override { return {}; }
    QJsonObject detail() const override { return m_record; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    // The assignments made tombstones by the last apply().
    qsizetype withdrawnAssignments() const;

private:
    QString m_text;
    QString m_phase;
    std::vector<AssignmentToWrite> m_rows;
    QJsonObject m_record;
    QString m_settingKey;
    struct Before; // the rows and the record as apply() found them
    std::shared_ptr<Before> m_before;
};

// Sets the project setting `key` to `value`, logged as `action` with {"value": value}; revert
// puts back the value it had (or removes it when it had none).
class SetProjectSettingEdit : public Edit
{
public:
    SetProjectSettingEdit(CoderId actor, QString text, QString action, QString key, QString value);

    QString text() const override { return m_text; }
    QString action() const override { return m_action; }
    QString objectType() const override { return QStringLiteral("project_setting"); }
    QString objectUuid() const override { return {}; }
    QJsonObject detail() const override;
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    QString m_text;
    QString m_action;
    QString m_key;
    QString m_value;
    std::optional<QString> m_before; // taken by apply()
};

} // namespace fourfold
