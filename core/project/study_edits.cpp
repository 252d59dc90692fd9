#include "core/project/study_edits.h"

#include "core/store/event_log.h"
#include "core/store/project_tables.h"

#include <QCoreApplication>

#include <algorithm>
#include <ranges>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct StudyEditText {
    Q_DECLARE_TR_FUNCTIONS(StudyEditText)
};

// Writes `record` back to the row of `row`, keeping the coding time the row gained since: a merge
// of a coder copy adds the time its coder spent on a withdrawn assignment to the row (see
// core/project/coder_copies.h), and time only ever adds up, so an undo must not take it away.
Status writeBackKeepingTime(
    Database &db, const AssignmentToWrite &row, store::AssignmentRecord record)
{
    auto current = store::assignmentRecord(db, row.article, row.coder, row.phase);
    if (!current)
        return std::unexpected(current.error());
    if (*current)
        record.activeSeconds = std::max(record.activeSeconds, (*current)->activeSeconds);
    return store::writeAssignmentRecord(db, row.article, row.coder, row.phase, record);
}

} // namespace

struct AssignEdit::Before {
    // Per row of m_rows: the tombstone it brought back to life, if it did.
    std::vector<std::optional<store::AssignmentRecord>> tombstones;
};

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
    auto before = std::make_shared<Before>();
    for (const AssignmentToWrite &row : m_rows) {
        auto existing = store::assignmentRecord(db, row.article, row.coder, row.phase);
        if (!existing)
            return std::unexpected(existing.error());
        before->tombstones.push_back(*existing && (*existing)->deleted
                ? *existing
                : std::optional<store::AssignmentRecord> {});
        FOURFOLD_TRY_STATUS(
            store::insertAssignment(db, row.article, row.coder, row.phase, row.uuid));
        // A tombstone carries time only when a coder copy brought work on the withdrawn
        // assignment: the coder's time stays with the coder's assignment of the article.
        if (before->tombstones.back() && before->tombstones.back()->activeSeconds > 0)
            FOURFOLD_TRY_STATUS(store::addAssignmentSeconds(
                db, row.article, row.coder, row.phase, before->tombstones.back()->activeSeconds));
        FOURFOLD_TRY_STATUS(store::appendEvent(db, actor(), QStringLiteral("assignment.add"),
            QStringLiteral("assignment"), row.uuid,
            QJsonObject {{QStringLiteral("article"), row.article.value},
                {QStringLiteral("coder"), row.coder.value},
                {QStringLiteral("phase"), phaseKey(row.phase)}}));
    }
    if (!m_settingKey.isEmpty())
        FOURFOLD_TRY_STATUS(store::setSetting(db, m_settingKey, m_settingValue));
    m_before = std::move(before);
    return {};
}

Status AssignEdit::revert(Database &db)
{
    // Undoing assignments someone has worked on since would orphan that work: refused, as a
    // withdrawal of a draw is (spans, answers, coding time, or a status of started or done). A
    // row that brought a tombstone back counts only with work beyond what the tombstone held,
    // which the undo keeps (a coder's time on a withdrawn draw).
    int withWork = 0;
    for (std::size_t i = 0; i < m_rows.size(); ++i) {
        const AssignmentToWrite &row = m_rows[i];
        auto record = store::assignmentRecord(db, row.article, row.coder, row.phase);
        if (!record)
            return std::unexpected(record.error());
        if (!*record || (*record)->deleted)
            continue;
        const store::AssignmentRecord &now = **record;
        const bool revived = m_before && i < m_before->tombstones.size() && m_before->tombstones[i];
        if (!revived ? now.hasWork()
                     : now.spans > m_before->tombstones[i]->spans
                    || now.answers > m_before->tombstones[i]->answers
                    || now.activeSeconds > m_before->tombstones[i]->activeSeconds
                    || (now.status != QLatin1String("assigned")
                        && now.status != m_before->tombstones[i]->status))
            ++withWork;
    }
    if (withWork > 0)
        return fail(ErrorCode::NotAllowed,
            StudyEditText::tr("\"%1\" cannot be undone: coding has started on %2 of its %3 "
                              "assignments (spans, answers, coding time, or a status of started "
                              "or done).")
                .arg(m_text)
                .arg(withWork)
                .arg(m_rows.size()));
    if (!m_settingKey.isEmpty())
        FOURFOLD_TRY_STATUS(store::removeSetting(db, m_settingKey));
    for (std::size_t i = m_rows.size(); i-- > 0;) {
        const AssignmentToWrite &row = m_rows[i];
        if (m_before && i < m_before->tombstones.size() && m_before->tombstones[i])
            FOURFOLD_TRY_STATUS(writeBackKeepingTime(db, row, *m_before->tombstones[i]));
        else
            FOURFOLD_TRY_STATUS(store::removeAssignment(db, row.article, row.coder, row.phase));
    }
    return {};
}

struct WithdrawDrawEdit::Before {
    // Per row of m_rows: the live row made a tombstone (none where there was no live row).
    std::vector<std::optional<store::AssignmentRecord>> rows;
    QString setting;
};

WithdrawDrawEdit::WithdrawDrawEdit(CoderId actor, QString text, QString phase,
    std::vector<AssignmentToWrite> rows, QJsonObject record, QString settingKey)
    : Edit(actor)
    , m_text(std::move(text))
    , m_phase(std::move(phase))
    , m_rows(std::move(rows))
    , m_record(std::move(record))
    , m_settingKey(std::move(settingKey))
{ }

qsizetype WithdrawDrawEdit::withdrawnAssignments() const
{
    if (!m_before)
        return 0;
    return std::ranges::count_if(m_before->rows, [](const auto &row) { return row.has_value(); });
}

Status WithdrawDrawEdit::apply(Database &db)
{
    auto setting = store::setting(db, m_settingKey);
    if (!setting)
        return std::unexpected(setting.error());
    if (!*setting)
        return fail(ErrorCode::NotFound,
            StudyEditText::tr("The %1 phase has no subsample to withdraw.").arg(m_phase));
    auto before = std::make_shared<Before>();
    before->setting = **setting;
    int withWork = 0;
    int live = 0;
    for (const AssignmentToWrite &row : m_rows) {
        auto record = store::assignmentRecord(db, row.article, row.coder, row.phase);
        if (!record)
            return std::unexpected(record.error());
        if (!*record || (*record)->deleted) {
            before->rows.emplace_back(); // gone already: nothing to withdraw
            continue;
        }
        ++live;
        if ((*record)->hasWork())
            ++withWork;
        before->rows.push_back(*record);
    }
    if (withWork > 0)
        return fail(ErrorCode::NotAllowed,
            StudyEditText::tr(
                "The %1 subsample cannot be withdrawn: coding has started on %2 of its "
                "%3 assignments (spans, answers, coding time, or a status of "
                "started or done). A draw can be withdrawn only before anyone "
                "codes it.")
                .arg(m_phase)
                .arg(withWork)
                .arg(live));
    for (std::size_t i = 0; i < m_rows.size(); ++i) {
        if (!before->rows[i])
            continue;
        const AssignmentToWrite &row = m_rows[i];
        store::AssignmentRecord tombstone = *before->rows[i];
        tombstone.deleted = true;
        FOURFOLD_TRY_STATUS(
            store::writeAssignmentRecord(db, row.article, row.coder, row.phase, tombstone));
        FOURFOLD_TRY_STATUS(store::appendEvent(db, actor(), QStringLiteral("assignment.remove"),
            QStringLiteral("assignment"), tombstone.uuid,
            QJsonObject {{QStringLiteral("article"), row.article.value},
                {QStringLiteral("coder"), row.coder.value},
                {QStringLiteral("phase"), phaseKey(row.phase)}}));
    }
    FOURFOLD_TRY_STATUS(store::removeSetting(db, m_settingKey));
    m_before = std::move(before);
    return {};
}

Status WithdrawDrawEdit::revert(Database &db)
{
    if (!m_before)
        return fail(ErrorCode::Internal,
            StudyEditText::tr("An edit that was never applied cannot be undone."));
    FOURFOLD_TRY_STATUS(store::setSetting(db, m_settingKey, m_before->setting));
    for (std::size_t i = 0; i < m_rows.size() && i < m_before->rows.size(); ++i)
        if (m_before->rows[i])
            FOURFOLD_TRY_STATUS(writeBackKeepingTime(db, m_rows[i], *m_before->rows[i]));
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
