#include "core/reliability/span_scores.h"

#include <algorithm>
#include <cstddef>
#include <numeric>
#include <string>
#include <tuple>
#include <vector>

namespace fourfold::reliability {
namespace {

std::string validate(const std::vector<LabelledSpan> &spans, const char *list, int categories)
{
    for (std::size_t k = 0; k < spans.size(); ++k) {
        const LabelledSpan &s = spans[k];
        const std::string name = std::string(list) + " span " + std::to_string(k) + " (document "
            + std::to_string(s.document) + ", category " + std::to_string(s.category) + ", ["
            + std::to_string(s.begin) + ", " + std::to_string(s.end) + "))";
        if (s.category < 0 || s.category >= categories)
            return name + ": category must be in 0.." + std::to_string(categories - 1);
        if (s.end <= s.begin)
            return name + ": the span is empty (end must be after begin)";
    }
    return {};
}

// Canonical order: document, begin, end, category, then input index; makes the matching
// independent of the order of the input except among identical spans, which are interchangeable.
std::vector<std::size_t> canonicalOrder(const std::vector<LabelledSpan> &spans)
{
    std::vector<std::size_t> order(spans.size());
    std::iota(order.begin(), order.end(), std::size_t(0));
    std::sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) {
        const LabelledSpan &x = spans[a], &y = spans[b];
        return std::tie(x.document, x.begin, x.end, x.category, a)
            < std::tie(y.document, y.begin, y.end, y.category, b);
    });
    return order;
}

struct Candidate {
    int tier = 0;
    std::int64_t overlap = 0;
    std::int64_t boundaryShift = 0;
    std::size_t referenceRank = 0; // position in canonical order
    std::size_t predictedRank = 0;
};

int tier(const LabelledSpan &r, const LabelledSpan &p, MatchMode mode)
{
    const bool sameBoundaries = r.begin == p.begin && r.end == p.end;
    const bool sameCategory = r.category == p.category;
    if (sameBoundaries && sameCategory)
        return 0;
    if (mode == MatchMode::Type)
        return sameCategory ? 1 : sameBoundaries ? 2 : 3;
    return sameBoundaries ? 1 : sameCategory ? 2 : 3;
}

// The outcome of a matched pair (SemEval-2013 Task 9.1 evaluation scheme, after the MUC
// categories of Chinchor & Sundheim 1993).
SpanOutcome matchedOutcome(const LabelledSpan &r, const LabelledSpan &p, MatchMode mode)
{
    const bool sameBoundaries = r.begin == p.begin && r.end == p.end;
    const bool sameCategory = r.category == p.category;
    switch (mode) {
    case MatchMode::Strict:
        return sameBoundaries && sameCategory ? SpanOutcome::Correct : SpanOutcome::Incorrect;
    case MatchMode::Exact:
        return sameBoundaries ? SpanOutcome::Correct : SpanOutcome::Incorrect;
    case MatchMode::Partial:
        return sameBoundaries ? SpanOutcome::Correct : SpanOutcome::Partial;
    case MatchMode::Type:
        return sameCategory ? SpanOutcome::Correct : SpanOutcome::Incorrect;
    }
    return SpanOutcome::Incorrect;
}

void add(SpanCounts &c, SpanOutcome outcome)
{
    switch (outcome) {
    case SpanOutcome::Correct:
        c.correct += 1;
        break;
    case SpanOutcome::Incorrect:
        c.incorrect += 1;
        break;
    case SpanOutcome::Partial:
        c.partial += 1;
        break;
    case SpanOutcome::Missing:
        c.missing += 1;
        break;
    case SpanOutcome::Spurious:
        c.spurious += 1;
        break;
    }
}

// SemEval-2013 Task 9.1: P = (COR + 0.5·PAR) / ACT, R = (COR + 0.5·PAR) / POS. F1 in the form
// 2·(COR + 0.5·PAR) / (POS + ACT), which equals 2PR / (P + R) when both are defined and is the
// positive specific agreement 2a / (2a + b + c) of Hripcsak & Rothschild (2005, JAMIA 12).
void score(SpanCounts &c)
{
    const double credit = c.correct + 0.5 * c.partial;
    const double pos = c.possible();
    const double act = c.actual();
    c.precision = act > 0 ? std::optional<double>(credit / act) : std::nullopt;
    c.recall = pos > 0 ? std::optional<double>(credit / pos) : std::nullopt;
    c.f1 = pos + act > 0 ? std::optional<double>(2 * credit / (pos + act)) : std::nullopt;
}

std::optional<double> meanOfDefined(
    const std::vector<SpanCounts> &perCategory, std::optional<double> SpanCounts::*member)
{
    double sum = 0;
    int n = 0;
    for (const SpanCounts &c : perCategory) {
        if ((c.*member).has_value()) {
            sum += *(c.*member);
            ++n;
        }
    }
    return n > 0 ? std::optional<double>(sum / n) : std::nullopt;
}

} // namespace

SpanScores scoreSpans(const std::vector<LabelledSpan> &reference,
    const std::vector<LabelledSpan> &predicted, int categories, MatchMode mode)
{
    SpanScores result;
    if (categories < 0) {
        result.inputError =
            "the number of categories is negative (" + std::to_string(categories) + ")";
        return result;
    }
    result.inputError = validate(reference, "reference", categories);
    if (result.inputError.empty())
        result.inputError = validate(predicted, "predicted", categories);
    if (!result.inputError.empty())
        return result;

    const std::vector<std::size_t> refOrder = canonicalOrder(reference);
    const std::vector<std::size_t> predOrder = canonicalOrder(predicted);

    // Candidates: overlapping pairs within one document. Both lists are sorted by document and
    // begin, so the predictions that can overlap a reference span start at a moving lower bound.
    std::vector<Candidate> candidates;
    std::size_t first = 0;
    for (std::size_t ri = 0; ri < refOrder.size(); ++ri) {
        const LabelledSpan &r = reference[refOrder[ri]];
        while (first < predOrder.size() && predicted[predOrder[first]].document < r.document)
            ++first;
        for (std::size_t pi = first; pi < predOrder.size(); ++pi) {
            const LabelledSpan &p = predicted[predOrder[pi]];
            if (p.document != r.document || p.begin >= r.end)
                break;
            const std::int64_t overlap = std::min(r.end, p.end) - std::max(r.begin, p.begin);
            if (overlap <= 0)
                continue;
            const std::int64_t shift = (r.begin > p.begin ? r.begin - p.begin : p.begin - r.begin)
                + (r.end > p.end ? r.end - p.end : p.end - r.end);
            candidates.push_back({tier(r, p, mode), overlap, shift, ri, pi});
        }
    }
    std::sort(candidates.begin(), candidates.end(), [](const Candidate &a, const Candidate &b) {
        return std::tie(a.tier, b.overlap, a.boundaryShift, a.referenceRank, a.predictedRank)
            < std::tie(b.tier, a.overlap, b.boundaryShift, b.referenceRank, b.predictedRank);
    });

    std::vector<int> partnerOfReference(reference.size(), -1);
    std::vector<int> partnerOfPredicted(predicted.size(), -1);
    for (const Candidate &c : candidates) {
        const std::size_t r = refOrder[c.referenceRank];
        const std::size_t p = predOrder[c.predictedRank];
        if (partnerOfReference[r] >= 0 || partnerOfPredicted[p] >= 0)
            continue;
        partnerOfReference[r] = int(p);
        partnerOfPredicted[p] = int(r);
    }

    result.perCategory.assign(static_cast<std::size_t>(categories), SpanCounts {});
    for (std::size_t r = 0; r < reference.size(); ++r) {
        SpanMatch m;
        m.reference = int(r);
        m.predicted = partnerOfReference[r];
        m.outcome = m.predicted < 0
            ? SpanOutcome::Missing
            : matchedOutcome(reference[r], predicted[std::size_t(m.predicted)], mode);
        add(result.perCategory[std::size_t(reference[r].category)], m.outcome);
        result.matches.push_back(m);
    }
    for (std::size_t p = 0; p < predicted.size(); ++p) {
        if (partnerOfPredicted[p] >= 0)
            continue;
        add(result.perCategory[std::size_t(predicted[p].category)], SpanOutcome::Spurious);
        result.matches.push_back({-1, int(p), SpanOutcome::Spurious});
    }

    for (SpanCounts &c : result.perCategory) {
        score(c);
        result.micro.correct += c.correct;
        result.micro.incorrect += c.incorrect;
        result.micro.partial += c.partial;
        result.micro.missing += c.missing;
        result.micro.spurious += c.spurious;
    }
    score(result.micro);
    result.macroPrecision = meanOfDefined(result.perCategory, &SpanCounts::precision);
    result.macroRecall = meanOfDefined(result.perCategory, &SpanCounts::recall);
    result.macroF1 = meanOfDefined(result.perCategory, &SpanCounts::f1);
    return result;
}

} // namespace fourfold::reliability
