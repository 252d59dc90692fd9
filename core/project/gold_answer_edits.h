#pragma once
// Adjudication of answers to article-level items: a lead decides the gold answer of an article's
// item (a value of the item's value set, with an optional rationale), replacing the gold answer
// decided before, or withdraws it. The coders' own answers are never changed. Lead-only.

#include "core/model/gold_judgement.h"
#include "core/project/edit.h"

#include <optional>

namespace fourfold {

// Decides the gold answer of `itemKey` on `article`; a live gold answer of the same article and
// item is tombstoned in the same step (undo brings it back). apply() fails with InvalidArgument
// if `lead` is not a lead, NotFound for an item the current codebook lacks or an unknown article,
// InvalidInput for a value outside the item's value set; nothing is written then.
class AdjudicateAnswerEdit : public Edit
{
public:
    AdjudicateAnswerEdit(
        ArticleId article, CoderId lead, QString itemKey, QString value, QString rationale);
    QString text() const override;
    QString action() const override { return QStringLiteral("gold_answer.set"); }
    QString objectType() const override { return QStringLiteral("gold_judgement"); }
    QString objectUuid() const override { return m_row.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    // The new gold answer after a successful apply().
    GoldJudgementId goldAnswerId() const { return m_row.id; }
    // The gold answer it replaced, if there was one.
    std::optional<GoldJudgementId> replaced() const { return m_replaced; }

private:
    GoldJudgement m_row;
    std::optional<GoldJudgementId> m_replaced;
};

// Withdraws a live gold answer (a tombstone). apply() fails with InvalidArgument if `lead` is not
// a lead, NotFound if there is no such gold answer or it was withdrawn already.
class WithdrawGoldAnswerEdit : public Edit
{
public:
    WithdrawGoldAnswerEdit(GoldJudgementId id, CoderId lead);
    QString text() const override;
    QString action() const override { return QStringLiteral("gold_answer.withdraw"); }
    QString objectType() const override { return QStringLiteral("gold_judgement"); }
    QString objectUuid() const override { return m_row.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    GoldJudgementId m_id;
    GoldJudgement m_row; // as it was before apply()
};

} // namespace fourfold
