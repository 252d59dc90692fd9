#pragma once
// Two coders' present/absent codings of the framing functions over the units of articles, as
// reliability data: what training feedback and the progress board compute agreement on. Internal
// to core/project. A unit counts as marked with a function when a span of that function overlaps
// it by at least one code point (the rule of core/agreement/project_units.h, which sits above
// core/project and so is not used here).

#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/model/unit_kind.h"
#include "core/reliability/reliability_data.h"

#include <optional>
#include <unordered_map>
#include <vector>

namespace fourfold {

class Project;

namespace study {

// The units of one kind (paragraphs, sentences or tokens) of the articles a reading function
// compares, each read once: article by article as asked for, or every article's with one
// statement (loadAll(), for work across the whole study). Holds the ranges only, not the texts.
class UnitCache
{
public:
    UnitCache(const Project &project, UnitKind kind);

    Status loadAll();
    Result<const std::vector<TextRange> *> get(ArticleId id);

private:
    const Project &m_project;
    UnitKind m_kind;
    std::unordered_map<qint64, std::vector<TextRange>> m_units;
};

// The two-coder matrix: a row per (unit, function), codes 0 = absent, 1 = present.
struct PairMatrix {
    reliability::ReliabilityData data;
    int agreeing = 0;
    int aMarked = 0;
    int bMarked = 0;
};

// The matrix of `functions` over the units of `articles`; `a` and `b` hold each coder's spans.
Result<PairMatrix> pairMatrix(UnitCache &cache, const std::vector<ArticleId> &articles,
    const std::vector<FramingFunction> &functions, const std::vector<Annotation> &a,
    const std::vector<Annotation> &b);

// Live annotations of `coder` in `phase` (every phase when none).
std::vector<Annotation> spansOf(
    const std::vector<Annotation> &all, CoderId coder, std::optional<Phase> phase);

// The one lead among `coders` with training-phase annotations, if there is exactly one.
std::optional<Coder> soleTrainingLead(
    const std::vector<Coder> &coders, const std::vector<Annotation> &all);

} // namespace study
} // namespace fourfold
