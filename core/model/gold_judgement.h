#pragma once
// A gold answer: the adjudicated answer to an article-level item of the codebook.

#include "core/model/ids.h"

#include <QString>

namespace fourfold {

using GoldJudgementId = Id<struct GoldJudgementTag>;

// The gold standard's answer to an article-level item: who decided it, when and why. At most one
// live gold answer per article and item; a new decision tombstones the one before. The coders'
// own answers (Judgement) are never changed by adjudication.
struct GoldJudgement {
    GoldJudgementId id;
    QString uuid;
    ArticleId article;
    QString itemKey;
    QString value;
    CoderId decidedBy;
    QString decidedAt; // ISO 8601 UTC
    QString rationale;
    bool deleted = false;
};

} // namespace fourfold
