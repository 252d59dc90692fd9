#include "core/project/study_edits.h"

#include "core/store/event_log.h"
#include "core/store/project_tables.h"

#include <QCoreApplication>

#include <ranges>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct StudyEditText {
    Q_DECLARE_TR_FUNCTIONS(StudyEditText)
};

} // namespace

AssignEdit::AssignEdit(CoderId actor, QString text, std::vector<AssignmentToWrite> rows,
    QJsonObject record, QString settingKey, QString settingValue)
    : Edit(actor)
    , m_text(std::move(text))
    , m_rows(std::move(rows))
    , m_record(std::move(record))
    , m_settingKey(std::move(settingKey))
    , m_settingValue(std::move(settingValue))
{ }

Status AssignEdit::apply(Database &db)
{
    if (!m_settingKey.isEmpty()) {
        auto existing = store::setting(db, m_settingKey);
        if (!existing)
            return std::unexpected(existing.error());
        if (*existing)
            return fail(ErrorCode::Duplicate,
                StudyEditText::tr("The project already holds %1.").arg(m_settingKey));
    }
    for (const AssignmentToWrite &row : m_rows) {
        FOURFOLD_TRY_STATUS(
            store::insertAssignment(db, row.article, row.coder, row.phase, row.uuid));
        FOURFOLD_TRY_STATUS(store::appendEvent(db, actor(), QStringLiteral("assignment.add"),
            QStringLiteral("assignment"), row.uuid,
            QJsonObject {{QStringLiteral("article"), row.article.value},
                {QStringLiteral("coder"), row.coder.value},
                {QStringLiteral("phase"), phaseKey(row.phase)}}));
    }
    if (!m_settingKey.isEmpty())
        FOURFOLD_TRY_STATUS(store::setSetting(db, m_settingKey, m_settingValue));
    return {};
}

Status AssignEdit::revert(Database &db)
{
    if (!m_settingKey.isEmpty())
        FOURFOLD_TRY_STATUS(store::removeSetting(db, m_settingKey));
    for (const AssignmentToWrite &row : std::views::reverse(m_rows))
        FOURFOLD_TRY_STATUS(store::removeAssignment(db, row.article, row.coder, row.phase));
    return {};
}

SetProjectSettingEdit::SetProjectSettingEdit(
    CoderId actor, QString text, QString action, QString key, QString value)
    : Edit(actor)
    , m_text(std::move(text))
    , m_action(std::move(action))
    , m_key(std::move(key))
    , m_value(std::move(value))
{ }

QJsonObject SetProjectSettingEdit::detail() const
{
    return QJsonObject {{QStringLiteral("value"), m_value}};
}

Status SetProjectSettingEdit::apply(Database &db)
{
    auto before = store::setting(db, m_key);
    if (!before)
        return std::unexpected(before.error());
    FOURFOLD_TRY_STATUS(store::setSetting(db, m_key, m_value));
    m_before = *before;
    return {};
}

Status SetProjectSettingEdit::revert(Database &db)
{
    if (m_before)
        return store::setSetting(db, m_key, *m_before);
    return store::removeSetting(db, m_key);
}

} // namespace fourfold
