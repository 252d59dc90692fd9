#include "core/project/gold_edits.h"

#include "core/project/annotation_edits.h"
#include "core/store/annotation_table.h"
#include "core/store/coder_table.h"
#include "core/store/gold_table.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

#include <algorithm>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("GoldEdits", text);
}

Status requireLead(const Database &db, CoderId id)
{
    auto all = store::coders(db);
    if (!all)
        return std::unexpected(all.error());
    const auto it = std::ranges::find(*all, id, &Coder::id);
    if (it == all->end() || it->role != CoderRole::Lead)
        return fail(ErrorCode::InvalidArgument, tr("Only a lead can decide the gold standard."));
    return {};
}

} // namespace

AdjudicateSpanEdit::AdjudicateSpanEdit(ArticleId article, CoderId lead, AnnotationContent content,
    std::vector<AnnotationId> sources, QString rationale)
    : Edit(lead)
{
    m_row.uuid = store::newUuid();
    m_row.article = article;
    m_row.content = std::move(content);
    m_row.content.note.clear();
    m_row.content.confidence.reset();
    m_row.decidedBy = lead;
    m_row.decidedAt = store::now();
    m_row.rationale = std::move(rationale);
    m_row.sources = std::move(sources);
}

QString AdjudicateSpanEdit::text() const
{
    return tr("Decide gold %1 span").arg(functionKey(m_row.content.function));
}

Status AdjudicateSpanEdit::apply(Database &db)
{
    FOURFOLD_TRY_STATUS(requireLead(db, m_row.decidedBy));
    for (AnnotationId source : m_row.sources) {
        auto a = store::annotation(db, source);
        if (!a)
            return std::unexpected(a.error());
        if (a->deleted || a->article != m_row.article)
            return fail(ErrorCode::InvalidArgument,
                tr("A gold span can only come from live spans of the same article."));
    }
    GoldAnnotation row = m_row;
    CodebookVersionId version;
    FOURFOLD_TRY_STATUS(validateSpanContent(db, row.article, row.content, &row.quote, &version));
    auto id = store::insertGold(db, row);
    if (!id)
        return std::unexpected(id.error());
    row.id = *id;
    m_row = row;
    return {};
}

Status AdjudicateSpanEdit::revert(Database &db)
{
    return store::removeGold(db, m_row.id);
}

WithdrawGoldEdit::WithdrawGoldEdit(GoldId id, CoderId lead)
    : Edit(lead)
    , m_id(id)
{ }

QString WithdrawGoldEdit::text() const
{
    return tr("Withdraw gold span");
}

Status WithdrawGoldEdit::apply(Database &db)
{
    FOURFOLD_TRY_STATUS(requireLead(db, actor()));
    auto g = store::gold(db, m_id);
    if (!g)
        return std::unexpected(g.error());
    if (g->deleted)
        return fail(ErrorCode::NotFound, tr("This gold span has already been withdrawn."));
    FOURFOLD_TRY_STATUS(store::setGoldDeleted(db, m_id, true));
    m_uuid = g->uuid;
    return {};
}

Status WithdrawGoldEdit::revert(Database &db)
{
    return store::setGoldDeleted(db, m_id, false);
}

} // namespace fourfold
