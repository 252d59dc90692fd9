#pragma once
// The position baseline: maps each paragraph's role to a framing function. By default the
// opening (intro) paragraph is the problem, the closing (conclusion) paragraph the remedy and the
// body carries nothing — a rule of thumb of news writing (common practice: the lead states what
// is wrong, the close says what should happen), not a model of framing. It is a baseline that
// any real extractor should beat.
//
// Parameters (all stored with the run):
//   intro, body, conclusion  the function for paragraphs of that role, or "none"
//                            (defaults "problem", "none", "remedy")
//   unit                     "paragraph": one span per paragraph (default); "sentence": one
//                            span per sentence of the paragraph
// Spans carry no score. Paragraph roles are the stored ones (set from position at import,
// changeable by the lead).

#include "core/extract/extractor.h"

#include <array>
#include <optional>

namespace fourfold {

class PositionBaseline final : public Extractor
{
public:
    // The defaults of every parameter.
    static QJsonObject defaultParameters();
    // A baseline tuned by `parameters` (laid over the defaults). InvalidArgument naming the
    // parameter for an unknown key, a wrong type or a value that is not a function / unit.
    static Result<PositionBaseline> create(const QJsonObject &parameters = {});

    QString kind() const override { return QStringLiteral("position"); }
    QString version() const override { return QStringLiteral("1"); }
    QJsonObject parameters() const override { return m_parameters; }
    // Never fails.
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) override;
    bool readsArticlesAlone() const override { return true; }

private:
    PositionBaseline() = default;

    QJsonObject m_parameters;
    std::array<std::optional<FramingFunction>, 3> m_functionOfRole; // by ParagraphRole
    bool m_perSentence = false;
};

} // namespace fourfold
