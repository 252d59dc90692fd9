#include "core/project/gold_answer_edits.h"

#include "core/project/gold_edits.h"
#include "core/store/codebook_table.h"
#include "core/store/gold_judgement_table.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct GoldAnswerEditsText {
    Q_DECLARE_TR_FUNCTIONS(GoldAnswerEditsText)
};

} // namespace

AdjudicateAnswerEdit::AdjudicateAnswerEdit(
    ArticleId article, CoderId lead, QString itemKey, QString value, QString rationale)
    : Edit(lead)
{
    m_row.uuid = store::newUuid();
    m_row.article = article;
    m_row.itemKey = std::move(itemKey);
    m_row.value = std::move(value);
    m_row.decidedBy = lead;
    m_row.decidedAt = store::now();
    m_row.rationale = std::move(rationale);
}

QString AdjudicateAnswerEdit::text() const
{
    return GoldAnswerEditsText::tr("Decide gold answer \"%1\"").arg(m_row.value);
}

Status AdjudicateAnswerEdit::apply(Database &db)
{
    FOURFOLD_TRY_STATUS(requireLead(db, m_row.decidedBy));
    auto book = store::currentCodebook(db);
    if (!book)
        return std::unexpected(book.error());
    FOURFOLD_TRY_STATUS(book->validateJudgement(m_row.itemKey, m_row.value));
    auto before = store::liveGoldJudgement(db, m_row.article, m_row.itemKey);
    if (!before)
        return std::unexpected(before.error());
    if (*before)
        FOURFOLD_TRY_STATUS(store::setGoldJudgementDeleted(db, (*before)->id, true));
    auto id = store::insertGoldJudgement(db, m_row);
    if (!id) {
        Error e = id.error();
        if (e.code == ErrorCode::Constraint) {
            e.code = ErrorCode::NotFound;
            e.message = GoldAnswerEditsText::tr("The gold answer could not be stored: there is no "
                                                "article #%1 in the project.")
                            .arg(m_row.article.value);
        }
        return std::unexpected(e);
    }
    m_row.id = *id;
    m_replaced = *before ? std::optional((*before)->id) : std::nullopt;
    return {};
}

Status AdjudicateAnswerEdit::revert(Database &db)
{
    FOURFOLD_TRY_STATUS(store::removeGoldJudgement(db, m_row.id));
    if (m_replaced)
        FOURFOLD_TRY_STATUS(store::setGoldJudgementDeleted(db, *m_replaced, false));
    return {};
}

WithdrawGoldAnswerEdit::WithdrawGoldAnswerEdit(GoldJudgementId id, CoderId lead)
    : Edit(lead)
    , m_id(id)
{ }

QString WithdrawGoldAnswerEdit::text() const
{
    return GoldAnswerEditsText::tr("Withdraw gold answer \"%1\"").arg(m_row.value);
}

Status WithdrawGoldAnswerEdit::apply(Database &db)
{
    FOURFOLD_TRY_STATUS(requireLead(db, actor()));
    auto row = store::goldJudgement(db, m_id);
    if (!row)
        return std::unexpected(row.error());
    if (row->deleted)
        return fail(ErrorCode::NotFound,
            GoldAnswerEditsText::tr("This gold answer has already been withdrawn."));
    FOURFOLD_TRY_STATUS(store::setGoldJudgementDeleted(db, m_id, true));
    m_row = *row;
    return {};
}

Status WithdrawGoldAnswerEdit::revert(Database &db)
{
    return store::setGoldJudgementDeleted(db, m_id, false);
}

} // namespace fourfold
