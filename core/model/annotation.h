#pragma once
// A coder's span carrying one framing function, and typed links between spans.

#include "core/model/framing_function.h"
#include "core/model/ids.h"
#include "core/model/text_range.h"

#include <QJsonObject>
#include <QString>

#include <optional>
#include <vector>

namespace fourfold {

// Study phases (field.md §1.1): every assignment and annotation knows its phase.
enum class Phase { Training, Pilot, Reliability, Production };
QString phaseKey(Phase phase); // "training", "pilot", "reliability", "production"
std::optional<Phase> phaseFromKey(const QString &key);

// The values a coder gives a span; what an edit writes.
struct AnnotationContent {
    FramingFunction function = FramingFunction::Problem;
    TextRange range; // code points into the article's canonical text
    QJsonObject attributes; // keys from the codebook's attribute schema
    QString note;
    std::optional<double> confidence; // 0..1, or none
};

struct Annotation {
    AnnotationId id;
    QString uuid;
    ArticleId article;
    CoderId coder;
    AnnotationContent content;
    QString quote; // the canonical text at content.range, stored for checking and export
    CodebookVersionId codebookVersion;
    Phase phase = Phase::Production;
    QString createdAt; // ISO 8601 UTC
    QString modifiedAt; // ISO 8601 UTC
    bool deleted = false; // a tombstone: kept so that copies of a project merge without loss
};

struct AnnotationLink {
    LinkId id;
    QString uuid;
    AnnotationId source;
    AnnotationId target;
    QString type; // e.g. "judges" (evaluation → cause), "addresses" (remedy → problem)
    QString createdAt;
    bool deleted = false;
};

// An adjudicated span of the gold standard, with its provenance: the coders' annotations it was
// taken from, who decided, when and why. Raw annotations are never changed by adjudication.
struct GoldAnnotation {
    GoldId id;
    QString uuid;
    ArticleId article;
    AnnotationContent content; // note and confidence are not used for gold
    QString quote;
    CoderId decidedBy;
    QString decidedAt;
    QString rationale;
    std::vector<AnnotationId> sources;
    bool deleted = false;
};

// A lead's decision that a coder's span does not belong in gold, with its reason. The span
// itself is not changed.
struct GoldRejection {
    qint64 id = 0;
    QString uuid;
    AnnotationId annotation;
    CoderId decidedBy;
    QString decidedAt; // ISO 8601 UTC
    QString rationale;
    bool deleted = false;
};

// Which coder codes which article in which phase.
struct Assignment {
    ArticleId article;
    CoderId coder;
    Phase phase = Phase::Production;
    QString status; // "assigned", "started", "done"
    qint64 activeSeconds = 0;
};

// A coder's answer to an article-level item of the codebook.
struct Judgement {
    JudgementId id;
    QString uuid;
    ArticleId article;
    CoderId coder;
    QString itemKey;
    QString value;
    CodebookVersionId codebookVersion;
    Phase phase = Phase::Production;
    QString createdAt;
    QString modifiedAt;
    bool deleted = false;
};

} // namespace fourfold
