#pragma once
// Adjudication: a lead decides a gold span — taken from coders' spans, merged from them, or
// drawn anew — with provenance and an optional rationale; or withdraws one. Coders' own
// annotations are never changed by any of them. Every edit here is lead-only.

#include "core/model/annotation.h"
#include "core/project/edit.h"

#include <vector>

namespace fourfold {

// Succeeds when the person `id` is a lead; fails with InvalidArgument ("Only a lead can decide the
// gold standard.") otherwise, and with the store's error when the people cannot be read. Every
// gold decision (spans, rejections, answers) checks it first.
Status requireLead(const Database &db, CoderId id);

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

// Rejects coders' spans: records that they do not belong in gold, with an optional reason, in
// one step. apply() fails with InvalidArgument if `lead` is not a lead, the list is empty, a span
// is not a live annotation, or a span is already rejected.
class RejectSpansEdit : public Edit
{
public:
    RejectSpansEdit(std::vector<AnnotationId> spans, CoderId lead, QString rationale);
    QString text() const override;
    QString action() const override { return QStringLiteral("gold.reject"); }
    QString objectType() const override { return QStringLiteral("gold_rejection"); }
    QString objectUuid() const override;
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    std::vector<GoldRejection> m_rows;
};

// One gold span to decide: its content and the coders' spans it comes from.
struct GoldCandidate {
    AnnotationContent content;
    std::vector<AnnotationId> sources;
};

// Decides several gold spans of one article in one step (e.g. every span the coders agree on),
// all with the same rationale. apply() fails as AdjudicateSpanEdit does for any of them, and with
// InvalidArgument for an empty list; nothing is written then.
class AcceptSpansEdit : public Edit
{
public:
    AcceptSpansEdit(
        ArticleId article, CoderId lead, std::vector<GoldCandidate> spans, QString rationale);
    QString text() const override;
    QString action() const override { return QStringLiteral("gold.add_many"); }
    QString objectType() const override { return QStringLiteral("gold"); }
    QString objectUuid() const override;
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    // The gold spans written by the last successful apply(), in the order given.
    std::vector<GoldId> goldIds() const;

private:
    std::vector<AdjudicateSpanEdit> m_spans;
};

} // namespace fourfold
