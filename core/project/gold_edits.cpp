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

// The sentences of this file, under a context that lupdate collects.
struct GoldEditsText {
    Q_DECLARE_TR_FUNCTIONS(GoldEditsText)
};

} // namespace

Status requireLead(const Database &db, CoderId id)
{
    auto all = store::coders(db);
    if (!all)
        return std::unexpected(all.error());
    const auto it = std::ranges::find(*all, id, &Coder::id);
    if (it == all->end() || it->role != CoderRole::Lead)
        return fail(ErrorCode::InvalidArgument,
            GoldEditsText::tr("Only a lead can decide the gold standard."));
    return {};
}

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
    return GoldEditsText::tr("Decide gold %1 span").arg(functionKey(m_row.content.function));
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
                GoldEditsText::tr(
                    "A gold span can only come from live spans of the same article."));
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
    return GoldEditsText::tr("Withdraw gold span");
}

Status WithdrawGoldEdit::apply(Database &db)
{
    FOURFOLD_TRY_STATUS(requireLead(db, actor()));
    auto g = store::gold(db, m_id);
    if (!g)
        return std::unexpected(g.error());
    if (g->deleted)
        return fail(
            ErrorCode::NotFound, GoldEditsText::tr("This gold span has already been withdrawn."));
    FOURFOLD_TRY_STATUS(store::setGoldDeleted(db, m_id, true));
    m_uuid = g->uuid;
    return {};
}

Status WithdrawGoldEdit::revert(Database &db)
{
    return store::setGoldDeleted(db, m_id, false);
}

RejectSpansEdit::RejectSpansEdit(std::vector<AnnotationId> spans, CoderId lead, QString rationale)
    : Edit(lead)
{
    const QString at = store::now();
    for (AnnotationId span : spans) {
        GoldRejection r;
        r.uuid = store::newUuid();
        r.annotation = span;
        r.decidedBy = lead;
        r.decidedAt = at;
        r.rationale = rationale;
        m_rows.push_back(r);
    }
}

QString RejectSpansEdit::text() const
{
    return GoldEditsText::tr("Reject %n span(s)", nullptr, int(m_rows.size()));
}

QString RejectSpansEdit::objectUuid() const
{
    return m_rows.empty() ? QString() : m_rows.front().uuid;
}

Status RejectSpansEdit::apply(Database &db)
{
    FOURFOLD_TRY_STATUS(requireLead(db, actor()));
    if (m_rows.empty())
        return fail(
            ErrorCode::InvalidArgument, GoldEditsText::tr("Choose at least one span to reject."));
    auto live = store::goldRejections(db, ArticleId {});
    if (!live)
        return std::unexpected(live.error());
    std::vector<GoldRejection> rows = m_rows;
    for (GoldRejection &r : rows) {
        auto a = store::annotation(db, r.annotation);
        if (!a)
            return std::unexpected(a.error());
        if (a->deleted)
            return fail(
                ErrorCode::InvalidArgument, GoldEditsText::tr("Only a live span can be rejected."));
        const bool already = std::ranges::any_of(
            *live, [&](const GoldRejection &x) { return x.annotation == r.annotation; });
        const bool twice = std::ranges::count(rows, r.annotation, &GoldRejection::annotation) > 1;
        if (already || twice)
            return fail(ErrorCode::InvalidArgument,
                GoldEditsText::tr("A span is already rejected: %1").arg(a->quote.left(40)));
        auto id = store::insertRejection(db, r);
        if (!id)
            return std::unexpected(id.error());
        r.id = *id;
    }
    m_rows = std::move(rows);
    return {};
}

Status RejectSpansEdit::revert(Database &db)
{
    for (auto it = m_rows.rbegin(); it != m_rows.rend(); ++it)
        FOURFOLD_TRY_STATUS(store::removeRejection(db, it->id));
    return {};
}

AcceptSpansEdit::AcceptSpansEdit(
    ArticleId article, CoderId lead, std::vector<GoldCandidate> spans, QString rationale)
    : Edit(lead)
{
    for (GoldCandidate &c : spans)
        m_spans.emplace_back(article, lead, std::move(c.content), std::move(c.sources), rationale);
}

QString AcceptSpansEdit::text() const
{
    return GoldEditsText::tr("Accept %n agreed span(s) into gold", nullptr, int(m_spans.size()));
}

QString AcceptSpansEdit::objectUuid() const
{
    return m_spans.empty() ? QString() : m_spans.front().objectUuid();
}

Status AcceptSpansEdit::apply(Database &db)
{
    if (m_spans.empty())
        return fail(ErrorCode::InvalidArgument, GoldEditsText::tr("There are no spans to accept."));
    for (AdjudicateSpanEdit &e : m_spans)
        FOURFOLD_TRY_STATUS(e.apply(db)); // the caller's savepoint undoes the earlier ones
    return {};
}

Status AcceptSpansEdit::revert(Database &db)
{
    for (auto it = m_spans.rbegin(); it != m_spans.rend(); ++it)
        FOURFOLD_TRY_STATUS(it->revert(db));
    return {};
}

std::vector<GoldId> AcceptSpansEdit::goldIds() const
{
    std::vector<GoldId> out;
    for (const AdjudicateSpanEdit &e : m_spans)
        out.push_back(e.goldId());
    return out;
}

} // namespace fourfold
