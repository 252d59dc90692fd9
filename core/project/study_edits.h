#pragma once
// The study design's writes as undoable edits (made and checked by StudyDesign: assignEdit,
// drawEdit, effortEdit; see core/project/study_design.h). Each holds resolved ids and copied
// values; the CLI applies it through Project::apply, the desktop pushes it on its undo stack.

#include "core/model/annotation.h"
#include "core/project/edit.h"

#include <QJsonObject>
#include <QString>

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
// rows and the setting again.
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
