#include "core/project/annotation_edits.h"

#include "core/model/logging.h"
#include "core/project/assignment_plans.h"
#include "core/store/annotation_table.h"
#include "core/store/article_table.h"
#include "core/store/codebook_table.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct AnnotationEditsText {
    Q_DECLARE_TR_FUNCTIONS(AnnotationEditsText)
};

// The quote at `range` of the article, after checking that the range lies inside its text.
Result<QString> quoteAt(const Database &db, ArticleId article, const TextRange &range)
{
    auto slice = store::articleSlice(db, article, range);
    if (!slice)
        return std::unexpected(slice.error());
    if (!range.isValid() || range.isEmpty() || range.end > slice->length)
        return fail(ErrorCode::InvalidArgument,
            AnnotationEditsText::tr(
                "The span [%1, %2) does not lie inside the article's text of %3 characters.")
                .arg(range.start)
                .arg(range.end)
                .arg(slice->length));
    return slice->text;
}

Result<Annotation> liveAnnotation(const Database &db, AnnotationId id)
{
    auto row = store::annotation(db, id);
    if (!row)
        return std::unexpected(row.error());
    if (row->deleted)
        return fail(ErrorCode::NotFound,
            AnnotationEditsText::tr("Annotation #%1 has been deleted.").arg(id.value));
    return row;
}

} // namespace

Status validateSpanContent(const Database &db, ArticleId article, const AnnotationContent &content,
    QString *quote, CodebookVersionId *version)
{
    auto q = quoteAt(db, article, content.range);
    if (!q)
        return std::unexpected(q.error());
    auto book = store::currentCodebook(db);
    if (!book)
        return std::unexpected(book.error());
    FOURFOLD_TRY_STATUS(book->validateAttributes(content.function, content.attributes));
    if (content.confidence && (*content.confidence < 0.0 || *content.confidence > 1.0))
        return fail(ErrorCode::InvalidArgument,
            AnnotationEditsText::tr("A confidence must lie between 0 and 1."));
    *quote = *q;
    *version = book->versionId;
    return {};
}

AddAnnotationEdit::AddAnnotationEdit(
    ArticleId article, CoderId coder, AnnotationContent content, Phase phase)
    : Edit(coder)
{
    m_row.uuid = store::newUuid();
    m_row.article = article;
    m_row.coder = coder;
    m_row.content = std::move(content);
    m_row.phase = phase;
    m_row.createdAt = store::now();
    m_row.modifiedAt = m_row.createdAt;
}

QString AddAnnotationEdit::text() const
{
    return AnnotationEditsText::tr("Add %1 span").arg(functionKey(m_row.content.function));
}

Status AddAnnotationEdit::apply(Database &db)
{
    Annotation row = m_row;
    FOURFOLD_TRY_STATUS(
        validateSpanContent(db, row.article, row.content, &row.quote, &row.codebookVersion));
    // The phase follows the coder's assignment of the article (issue 7).
    auto phase = AssignmentPlans::phaseForNewCoding(db, row.article, row.coder, row.phase);
    if (!phase)
        return std::unexpected(phase.error());
    row.phase = *phase;
    auto id = store::insertAnnotation(db, row);
    if (!id) {
        Error e = id.error();
        if (e.code == ErrorCode::Constraint)
            e.message = AnnotationEditsText::tr(
                "The span could not be added: its article or coder does not exist.");
        return std::unexpected(e);
    }
    row.id = *id;
    m_row = row;
    return {};
}

Status AddAnnotationEdit::revert(Database &db)
{
    return store::removeAnnotationRow(db, m_row.id);
}

ChangeAnnotationEdit::ChangeAnnotationEdit(
    AnnotationId id, AnnotationContent content, CoderId actor)
    : Edit(actor)
    , m_id(id)
    , m_content(std::move(content))
{ }

QString ChangeAnnotationEdit::text() const
{
    return AnnotationEditsText::tr("Change %1 span").arg(functionKey(m_content.function));
}

Status ChangeAnnotationEdit::apply(Database &db)
{
    auto before = liveAnnotation(db, m_id);
    if (!before)
        return std::unexpected(before.error());
    Annotation after = *before;
    after.content = m_content;
    FOURFOLD_TRY_STATUS(validateSpanContent(
        db, after.article, after.content, &after.quote, &after.codebookVersion));
    after.modifiedAt = store::now();
    FOURFOLD_TRY_STATUS(store::updateAnnotation(db, after));
    m_before = *before;
    return {};
}

Status ChangeAnnotationEdit::revert(Database &db)
{
    if (!FOURFOLD_SOFT_ASSERT(lcProject(), m_before))
        return fail(ErrorCode::Internal,
            AnnotationEditsText::tr("An edit that was never applied cannot be undone."));
    return store::updateAnnotation(db, *m_before);
}

DeleteAnnotationEdit::DeleteAnnotationEdit(AnnotationId id, CoderId actor)
    : Edit(actor)
    , m_id(id)
{ }

QString DeleteAnnotationEdit::text() const
{
    return m_before
        ? AnnotationEditsText::tr("Delete %1 span").arg(functionKey(m_before->content.function))
        : AnnotationEditsText::tr("Delete span");
}

Status DeleteAnnotationEdit::apply(Database &db)
{
    auto before = liveAnnotation(db, m_id);
    if (!before)
        return std::unexpected(before.error());
    Annotation after = *before;
    after.deleted = true;
    after.modifiedAt = store::now();
    FOURFOLD_TRY_STATUS(store::updateAnnotation(db, after));
    m_before = *before;
    return {};
}

Status DeleteAnnotationEdit::revert(Database &db)
{
    if (!FOURFOLD_SOFT_ASSERT(lcProject(), m_before))
        return fail(ErrorCode::Internal,
            AnnotationEditsText::tr("An edit that was never applied cannot be undone."));
    return store::updateAnnotation(db, *m_before);
}

LinkAnnotationsEdit::LinkAnnotationsEdit(
    AnnotationId source, AnnotationId target, QString type, CoderId actor)
    : Edit(actor)
{
    m_row.uuid = store::newUuid();
    m_row.source = source;
    m_row.target = target;
    m_row.type = std::move(type);
    m_row.createdAt = store::now();
}

QString LinkAnnotationsEdit::text() const
{
    return AnnotationEditsText::tr("Link spans (%1)").arg(m_row.type);
}

Status LinkAnnotationsEdit::apply(Database &db)
{
    if (m_row.source == m_row.target)
        return fail(ErrorCode::InvalidArgument,
            AnnotationEditsText::tr("A span cannot be linked to itself."));
    if (m_row.type.trimmed().isEmpty())
        return fail(ErrorCode::InvalidArgument, AnnotationEditsText::tr("A link needs a type."));
    auto source = liveAnnotation(db, m_row.source);
    if (!source)
        return std::unexpected(source.error());
    auto target = liveAnnotation(db, m_row.target);
    if (!target)
        return std::unexpected(target.error());
    if (source->article != target->article)
        return fail(ErrorCode::InvalidArgument,
            AnnotationEditsText::tr("Only spans of the same article can be linked."));
    auto id = store::insertLink(db, m_row);
    if (!id)
        return std::unexpected(id.error());
    m_row.id = *id;
    return {};
}

Status LinkAnnotationsEdit::revert(Database &db)
{
    return store::removeLinkRow(db, m_row.id);
}

UnlinkAnnotationsEdit::UnlinkAnnotationsEdit(LinkId id, CoderId actor)
    : Edit(actor)
    , m_id(id)
{ }

QString UnlinkAnnotationsEdit::text() const
{
    return AnnotationEditsText::tr("Remove link (%1)").arg(m_before ? m_before->type : QString());
}

Status UnlinkAnnotationsEdit::apply(Database &db)
{
    auto row = store::link(db, m_id);
    if (!row)
        return std::unexpected(row.error());
    if (row->deleted)
        return fail(ErrorCode::NotFound, AnnotationEditsText::tr("The link was removed already."));
    m_before = *row;
    return store::updateLinkDeleted(db, m_id, true);
}

Status UnlinkAnnotationsEdit::revert(Database &db)
{
    return store::updateLinkDeleted(db, m_id, false);
}

SetJudgementEdit::SetJudgementEdit(
    ArticleId article, CoderId coder, QString itemKey, QString value, Phase phase)
    : Edit(coder)
{
    m_after.uuid = store::newUuid();
    m_after.article = article;
    m_after.coder = coder;
    m_after.itemKey = std::move(itemKey);
    m_after.value = std::move(value);
    m_after.phase = phase;
    m_after.createdAt = store::now();
    m_after.modifiedAt = m_after.createdAt;
}

QString SetJudgementEdit::text() const
{
    return AnnotationEditsText::tr("Answer \"%1\"").arg(m_after.itemKey);
}

Status SetJudgementEdit::apply(Database &db)
{
    auto book = store::currentCodebook(db);
    if (!book)
        return std::unexpected(book.error());
    FOURFOLD_TRY_STATUS(book->validateJudgement(m_after.itemKey, m_after.value));
    // The phase follows the coder's assignment of the article (issue 7).
    auto phase =
        AssignmentPlans::phaseForNewCoding(db, m_after.article, m_after.coder, m_after.phase);
    if (!phase)
        return std::unexpected(phase.error());
    m_after.phase = *phase;
    auto existing =
        store::judgement(db, m_after.article, m_after.coder, m_after.itemKey, m_after.phase);
    if (!existing)
        return std::unexpected(existing.error());
    Judgement after = m_after;
    after.codebookVersion = book->versionId;
    if (*existing) {
        const Judgement before = **existing;
        after.id = before.id;
        after.uuid = before.uuid;
        after.createdAt = before.createdAt;
        after.modifiedAt = store::now();
        FOURFOLD_TRY_STATUS(store::updateJudgement(db, after));
        m_before = before;
    } else {
        auto id = store::insertJudgement(db, after);
        if (!id) {
            Error e = id.error();
            if (e.code == ErrorCode::Constraint)
                e.message = AnnotationEditsText::tr(
                    "The answer could not be stored: its article or coder does not exist.");
            return std::unexpected(e);
        }
        after.id = *id;
        m_before.reset();
    }
    m_after = after;
    return {};
}

Status SetJudgementEdit::revert(Database &db)
{
    if (m_before)
        return store::updateJudgement(db, *m_before);
    return store::removeJudgementRow(db, m_after.id);
}

WithdrawJudgementEdit::WithdrawJudgementEdit(
    ArticleId article, CoderId coder, QString itemKey, Phase phase)
    : Edit(coder)
    , m_article(article)
    , m_coder(coder)
    , m_itemKey(std::move(itemKey))
    , m_phase(phase)
{ }

QString WithdrawJudgementEdit::text() const
{
    return AnnotationEditsText::tr("Withdraw answer \"%1\"").arg(m_itemKey);
}

Status WithdrawJudgementEdit::apply(Database &db)
{
    // The answer in the phase the coder codes the article in, as SetJudgementEdit stored it.
    auto phase = AssignmentPlans::phaseForNewCoding(db, m_article, m_coder, m_phase);
    if (!phase)
        return std::unexpected(phase.error());
    auto existing = store::judgement(db, m_article, m_coder, m_itemKey, *phase);
    if (!existing)
        return std::unexpected(existing.error());
    if (!*existing)
        return fail(ErrorCode::NotFound,
            AnnotationEditsText::tr("There is no answer to \"%1\" to withdraw.").arg(m_itemKey));
    Judgement after = **existing;
    after.deleted = true;
    after.modifiedAt = store::now();
    FOURFOLD_TRY_STATUS(store::updateJudgement(db, after));
    m_before = **existing;
    return {};
}

Status WithdrawJudgementEdit::revert(Database &db)
{
    if (!FOURFOLD_SOFT_ASSERT(lcProject(), m_before))
        return fail(ErrorCode::Internal,
            AnnotationEditsText::tr("An edit that was never applied cannot be undone."));
    return store::updateJudgement(db, *m_before);
}

} // namespace fourfold
