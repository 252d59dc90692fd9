#include "core/project/codebook_version_edit.h"

#include "core/project/study_names.h"
#include "core/store/codebook_table.h"
#include "core/store/store_util.h"

#include <algorithm>

namespace fourfold {

namespace {

// Whether every value that counts under the version before (its values and recodings) still
// counts after it: then no value in use can have lost its place.
bool keepsEveryValue(const QStringList &values, const QMap<QString, QString> &recode,
    const QStringList &nextValues, const QMap<QString, QString> &nextRecode)
{
    const auto counts = [&](const QString &v) {
        return countedValue(nextValues, nextRecode, v).has_value();
    };
    return std::ranges::all_of(values, counts) && std::ranges::all_of(recode.keys(), counts);
}

} // namespace

AddCodebookVersionEdit::AddCodebookVersionEdit(
    CoderId actor, Codebook codebook, QString note, int number, QJsonObject detail)
    : Edit(actor)
    , m_codebook(std::move(codebook))
    , m_note(std::move(note))
    , m_number(number)
    , m_detail(std::move(detail))
    , m_uuid(store::newUuid())
{ }

QString AddCodebookVersionEdit::text() const
{
    return StudyDesignText::tr("Save codebook version %1").arg(m_number);
}

Status AddCodebookVersionEdit::apply(Database &db)
{
    auto current = store::currentCodebook(db);
    if (!current)
        return std::unexpected(current.error());
    if (current->number != m_number - 1)
        return fail(ErrorCode::Duplicate,
            StudyDesignText::tr("The codebook is at version %1 now; this change was made to "
                                "version %2 and is not saved. Make it again on version %1.")
                .arg(current->number)
                .arg(m_number - 1));
    FOURFOLD_TRY_STATUS(checkValuesInUse(db, *current, m_codebook));
    auto id = store::insertCodebookVersion(db, m_codebook, m_note, actor(), m_uuid);
    if (!id)
        return std::unexpected(id.error());
    return {};
}

Status AddCodebookVersionEdit::revert(Database &db)
{
    auto uses = store::codebookVersionUses(db, m_uuid);
    if (!uses)
        return std::unexpected(uses.error());
    if (*uses > 0)
        return fail(ErrorCode::NotAllowed,
            StudyDesignText::tr("%n span(s) or answer(s) were made under codebook version %1; "
                                "undo them before the version.",
                nullptr, int(*uses))
                .arg(m_number));
    return store::deleteCodebookVersion(db, m_uuid);
}

Status AddCodebookVersionEdit::checkValuesInUse(
    const Database &db, const Codebook &current, const Codebook &next)
{
    for (FramingFunction f : kFramingFunctions) {
        for (const AttributeSpec &spec : next.definition(f).attributes) {
            if (spec.type != AttributeSpec::Type::Choice)
                continue;
            const auto &before = current.definition(f).attributes;
            const auto old = std::ranges::find(before, spec.key, &AttributeSpec::key);
            if (old != before.end() && old->type == AttributeSpec::Type::Choice
                && keepsEveryValue(old->values, old->recode, spec.values, spec.recode))
                continue;
            auto used = store::attributeValuesInUse(db, f, spec.key);
            if (!used)
                return std::unexpected(used.error());
            for (const store::ValueInUse &u : *used)
                if (!countedValue(spec.values, spec.recode, u.value))
                    return fail(ErrorCode::InvalidInput,
                        StudyDesignText::tr(
                            "%1 span(s) of %2 carry the value \"%3\" of the attribute \"%4\", "
                            "which the new version neither lists nor recodes; add \"recode\": "
                            "{\"%3\": \"…\"} to the attribute with one of its values (%5).")
                            .arg(u.count)
                            .arg(functionKey(f), u.value, spec.key,
                                spec.values.join(QStringLiteral(", "))));
        }
    }
    for (const ArticleItem &item : next.items) {
        const ArticleItem *old = current.item(item.key);
        if (old && keepsEveryValue(old->values, old->recode, item.values, item.recode))
            continue;
        auto used = store::itemValuesInUse(db, item.key);
        if (!used)
            return std::unexpected(used.error());
        for (const store::ValueInUse &u : *used)
            if (!countedValue(item.values, item.recode, u.value))
                return fail(ErrorCode::InvalidInput,
                    StudyDesignText::tr(
                        "%1 answer(s) to the item \"%2\" are \"%3\", which the new version "
                        "neither lists nor recodes; add \"recode\": {\"%3\": \"…\"} to the item "
                        "with one of its values (%4).")
                        .arg(u.count)
                        .arg(item.key, u.value, item.values.join(QStringLiteral(", "))));
    }
    return {};
}

} // namespace fourfold
