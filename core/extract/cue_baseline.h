#pragma once
// The cue baseline: labels whole sentences by the cue words they contain, using the per-language
// cue lists of resources/cues/ (English, Dutch, German; written from memory, see the README
// there). Categories and the functions they point to:
//   modal       modal and directive constructions ("should", "must", "it is time to")  remedy
//   imperative  a sentence opening with an imperative ("Stop ...", "Let us ...")         remedy
//   connective  causal connectives ("because", "due to", "as a result of")              cause
//   attribution verbs that attribute responsibility ("blames", "accuses")               cause
//   negative    negative evaluative words ("disgrace", "reckless")                       evaluation
//   positive    positive evaluative words ("sensible", "welcome")                       evaluation
// It is a baseline: no syntax, no negation, no problem definitions (no cue list finds those).
//
// Per sentence, each function's weight is the sum over its cue hits of the category's weight
// (parameters "weight.<category>", default 1). A function whose weight reaches "minWeight"
// (default 1) is a candidate; with "multiple" false (default) only the heaviest candidate is
// kept, ties going to remedy, then cause, then evaluation. The span is the whole sentence; its
// score is 1 − 2^(−weight) (0.5 for one cue, 0.75 for two: a monotone confidence, not a
// probability); its attributes are "cues" (the cues found, as written in the list) and those of
// the function's heaviest category, the first listed on a tie (evaluation "polarity", remedy
// "explicitness").
// "otherLanguages": "error" (default) refuses articles in a language without a cue list;
// "skip" leaves them without spans.

#include "core/extract/cue_list.h"
#include "core/extract/extractor.h"

#include <QHash>

namespace fourfold {

class CueBaseline final : public Extractor
{
public:
    // The defaults of every parameter.
    static QJsonObject defaultParameters();
    // A baseline tuned by `parameters` (laid over the defaults). InvalidArgument naming the
    // parameter for an unknown key, a wrong type or a value out of range.
    static Result<CueBaseline> create(const QJsonObject &parameters = {});

    QString kind() const override { return QStringLiteral("cues"); }
    QString version() const override { return QStringLiteral("1"); }
    QJsonObject parameters() const override { return m_parameters; }
    // Fails with NotFound naming the article when an article's language has no cue list and
    // "otherLanguages" is "error".
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) override;
    bool readsArticlesAlone() const override { return true; }

    // The spans of one sentence of `article` (`sentence` in code points) under `cues`, with
    // `article` left unset; used by extract() and by tests.
    std::vector<ExtractedSpan> sentenceSpans(
        const CueList &cues, const Article &article, const TextRange &sentence) const;

private:
    CueBaseline() = default;

    QJsonObject m_parameters;
    QHash<QString, double> m_weights; // by category name
    double m_minWeight = 1;
    bool m_multiple = false;
    bool m_skipOtherLanguages = false;
};

} // namespace fourfold
