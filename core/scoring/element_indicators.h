#pragma once
// Frame element variables (Matthes & Kohring 2008): for each article of a layer, binary indicators
// of which elements it holds, built from the codebook:
//   FUNCTION                  at least one span of the function (e.g. "evaluation")
//   FUNCTION:ATTRIBUTE=VALUE  at least one span of the function whose closed-list attribute
//                             counts as VALUE under the current codebook version (recodings
//                             applied), e.g. "evaluation:polarity=negative"
// Free-text attributes give no indicators. The layers:
//   gold            the adjudicated gold standard (articles with gold)
//   consensus       the coders together: an element counts when at least half of the article's
//                   coders (those whose coding of it counts, CodingScope) coded it; the share is
//                   kept beside the indicator
//   coder:PSEUDONYM one coder's counted codings
//   run:NAME        an extractor run (every article)

#include "core/model/article.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"

#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {

class Project;

struct ElementIndicators {
    QString layer; // as given: "gold", "consensus", "coder:C01", "run:NAME"
    QStringList variables; // the indicators' names, in codebook order
    std::vector<ArticleSummary> articles; // the layer's articles, in project order
    std::vector<double> values; // articles × variables, row-major, 0 or 1
    // The share of the article's sources that coded each element (consensus: coders; otherwise
    // 0 or 1, as values), row-major as values.
    std::vector<double> shares;
    std::vector<int> sources; // per article: how many coders (or 1) its row rests on
};

// The element variables of `project`'s current codebook, in order.
QStringList elementVariables(const Project &project);

// Builds the indicators of layer `layer` ("gold", "consensus", "coder:P", "run:NAME"). Fails with
// InvalidArgument for another layer text, NotFound for a coder or run that does not exist, or the
// store's error.
Result<ElementIndicators> elementIndicators(const Project &project, const QString &layer);

} // namespace fourfold
