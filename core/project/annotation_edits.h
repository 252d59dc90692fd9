#pragma once
// Edits of annotations: add, change, delete (tombstone), link two annotations, and answer an
// article-level item. Each validates against the article text and the current codebook.

#include "core/model/annotation.h"
#include "core/project/edit.h"

#include <optional>

namespace fourfold {

// Checks a span's content against its article and the current codebook: the range must be a
// non-empty range inside the text (InvalidArgument), the attributes must fit the function's
// schema (InvalidInput), a confidence must lie in [0, 1]. On success sets the quote at the
// range and the current codebook version.
Status validateSpanContent(const Database &db, ArticleId article, const AnnotationContent &content,
    QString *quote, CodebookVersionId *version);

// Adds a span. The quote is taken from the text; the codebook version is the current one.
// apply() fails with InvalidArgument if the range is empty or outside the text, InvalidInput if
// the attributes do not fit the codebook, NotFound for an unknown article or coder.
class AddAnnotationEdit : public Edit
{
public:
    AddAnnotationEdit(ArticleId article, CoderId coder, AnnotationContent content,
        Phase phase = Phase::Production);
    QString text() const override;
    QString action() const override { return QStringLiteral("annotation.add"); }
    QString objectType() const override { return QStringLiteral("annotation"); }
    QString objectUuid() const override { return m_row.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    // The new annotation's id after a successful apply().
    AnnotationId annotationId() const { return m_row.id; }

private:
    Annotation m_row;
};

// Replaces the content (function, range, attributes, note, confidence) of a live annotation.
class ChangeAnnotationEdit : public Edit
{
public:
    ChangeAnnotationEdit(AnnotationId id, AnnotationContent content, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("annotation.change"); }
    QString objectType() const override { return QStringLiteral("annotation"); }
    QString objectUuid() const override { return m_before ? m_before->uuid : QString(); }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    AnnotationId m_id;
    AnnotationContent m_content;
    std::optional<Annotation> m_before;
};

// Deletes a live annotation by marking it as a tombstone.
class DeleteAnnotationEdit : public Edit
{
public:
    DeleteAnnotationEdit(AnnotationId id, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("annotation.delete"); }
    QString objectType() const override { return QStringLiteral("annotation"); }
    QString objectUuid() const override { return m_before ? m_before->uuid : QString(); }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    AnnotationId m_id;
    std::optional<Annotation> m_before;
};

// Links two live annotations of the same article with a typed, directed relation, e.g. an
// evaluation "judges" a cause. InvalidArgument for a self-link or annotations of two articles.
class LinkAnnotationsEdit : public Edit
{
public:
    LinkAnnotationsEdit(AnnotationId source, AnnotationId target, QString type, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("link.add"); }
    QString objectType() const override { return QStringLiteral("link"); }
    QString objectUuid() const override { return m_row.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

    LinkId linkId() const { return m_row.id; }

private:
    AnnotationLink m_row;
};

// Removes a live link (a tombstone, as for annotations); undo brings it back. NotFound if there
// is no such link or it was removed already.
class UnlinkAnnotationsEdit : public Edit
{
public:
    UnlinkAnnotationsEdit(LinkId id, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("link.remove"); }
    QString objectType() const override { return QStringLiteral("link"); }
    QString objectUuid() const override { return m_before ? m_before->uuid : QString(); }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    LinkId m_id;
    std::optional<AnnotationLink> m_before;
};

// Sets a coder's answer to an article-level item (replacing an earlier answer in that phase).
class SetJudgementEdit : public Edit
{
public:
    SetJudgementEdit(ArticleId article, CoderId coder, QString itemKey, QString value,
        Phase phase = Phase::Production);
    QString text() const override;
    QString action() const override { return QStringLiteral("judgement.set"); }
    QString objectType() const override { return QStringLiteral("judgement"); }
    QString objectUuid() const override { return m_after.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    Judgement m_after;
    std::optional<Judgement> m_before;
};

// Withdraws a coder's answer to an article-level item (a tombstone, as for annotations): the item
// is unanswered again, and undo brings the answer back. NotFound if the coder has no live answer
// to the item on the article in `phase`.
class WithdrawJudgementEdit : public Edit
{
public:
    WithdrawJudgementEdit(
        ArticleId article, CoderId coder, QString itemKey, Phase phase = Phase::Production);
    QString text() const override;
    QString action() const override { return QStringLiteral("judgement.withdraw"); }
    QString objectType() const override { return QStringLiteral("judgement"); }
    QString objectUuid() const override { return m_before ? m_before->uuid : QString(); }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    ArticleId m_article;
    CoderId m_coder;
    QString m_itemKey;
    Phase m_phase;
    std::optional<Judgement> m_before;
};

} // namespace fourfold
