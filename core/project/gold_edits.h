#pragma once
// Adjudication: a lead decides a gold span — taken from coders' spans, merged from them, or
// drawn anew — with provenance and an optional rationale; or withdraws one. Coders' own
// annotations are never changed by either.

#include "core/model/annotation.h"
#include "core/project/edit.h"

#include <vector>

namespace fourfold {

// Adds a gold span. apply() fails with InvalidArgument if `lead` is not a lead, if a source is
// not a live annotation of the same article, or the range is not inside the text; InvalidInput
// if the attributes do not fit the codebook.
class AdjudicateSpanEdit : public Edit
{
public:
    AdjudicateSpanEdit(ArticleId article, CoderId lead, AnnotationContent content,
        std::vector<AnnotationId> sources, QString rationale);
    QString text() const override;
    QString action() const override { return QStringLiteral("gold.add"); }
    QString objectType() const override { return QStringLiteral("gold"); }
    QString objectUuid() const override { return m_row.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    GoldId goldId() const { return m_row.id; }

private:
    GoldAnnotation m_row;
};

// Withdraws a live gold span (a tombstone; its provenance stays).
class WithdrawGoldEdit : public Edit
{
public:
    WithdrawGoldEdit(GoldId id, CoderId lead);
    QString text() const override;
    QString action() const override { return QStringLiteral("gold.withdraw"); }
    QString objectType() const override { return QStringLiteral("gold"); }
    QString objectUuid() const override { return m_uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    GoldId m_id;
    QString m_uuid;
};

} // namespace fourfold
