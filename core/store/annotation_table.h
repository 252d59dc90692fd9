#pragma once
// Annotation rows, links between annotations and article-level judgements. These functions
// write exactly what they are given (uuids, times), so that an edit can redo itself identically.

#include "core/model/annotation.h"
#include "core/model/error.h"

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {
class Database;
namespace store {

// Inserts `a` with its uuid, times and deleted flag; `a.id` is ignored. Constraint if the
// article, coder or codebook version does not exist or the range is invalid.
Result<AnnotationId> insertAnnotation(Database &db, const Annotation &a);
// Overwrites every column of the row `a.id` with `a`'s values. NotFound if there is no row.
Status updateAnnotation(Database &db, const Annotation &a);
// Removes the row for good (only to revert the edit that created it). NotFound if none.
Status removeAnnotationRow(Database &db, AnnotationId id);
// One annotation, live or tombstoned. NotFound if there is no row.
Result<Annotation> annotation(const Database &db, AnnotationId id);
// Live annotations of an article (of one coder if given), ordered by start, end, id.
Result<std::vector<Annotation>> annotations(
    const Database &db, ArticleId article, std::optional<CoderId> coder = std::nullopt);
// Every live annotation of the project, ordered by article, coder, start.
Result<std::vector<Annotation>> allAnnotations(const Database &db);
// The same annotations in the same order, handed to `visit` one at a time (one statement).
Status forEachAnnotation(const Database &db, const std::function<Status(Annotation &&)> &visit);
// The same annotations as outlines: id, article, coder, function, range, attributes, phase and
// creation time only (no uuid, quote, note, confidence or other times), for views and
// computations that compare spans in bulk.
Status forEachAnnotationOutline(
    const Database &db, const std::function<Status(Annotation &&)> &visit);

Result<LinkId> insertLink(Database &db, const AnnotationLink &link);
Status updateLinkDeleted(Database &db, LinkId id, bool deleted);
Status removeLinkRow(Database &db, LinkId id);
Result<AnnotationLink> link(const Database &db, LinkId id);
// Live links between live annotations of `article`.
Result<std::vector<AnnotationLink>> links(const Database &db, ArticleId article);

// The live judgement of (article, coder, item, phase), if any.
Result<std::optional<Judgement>> judgement(
    const Database &db, ArticleId article, CoderId coder, const QString &itemKey, Phase phase);
Result<std::vector<Judgement>> judgements(const Database &db, ArticleId article);
// Every live judgement of the project, ordered by article, coder, item.
Result<std::vector<Judgement>> allJudgements(const Database &db);
Result<JudgementId> insertJudgement(Database &db, const Judgement &j);
Status updateJudgement(Database &db, const Judgement &j);
Status removeJudgementRow(Database &db, JudgementId id);

} // namespace store
} // namespace fourfold
