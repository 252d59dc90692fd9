#pragma once
// How reliable each frame element variable is: Krippendorff's alpha (nominal; Krippendorff 2011,
// "Computing Krippendorff's alpha-reliability") of the 0/1 indicator with articles as units and
// coders as coders, each coder's indicators from their counted codings (element_indicators.h,
// layer coder:P). A coder who did not code an article is missing for it, never "absent". Frames
// are only as good as their elements (Matthes & Kohring 2008), so the report shows this beside
// the saved frames.

#include "core/model/error.h"

#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

class Project;

struct ElementAlpha {
    QString variable;
    std::optional<double> alpha; // nothing when undefined (see reason)
    int pairableUnits = 0; // articles coded by at least two of the coders
    QString reason; // why alpha is undefined (e.g. every value the same)
};

// Alpha of each element variable of the current codebook (in its order) over `pseudonyms` (their
// counted codings). Fails as elementIndicators does (NotFound for an unknown coder).
Result<std::vector<ElementAlpha>> elementAlphas(
    const Project &project, const QStringList &pseudonyms);

} // namespace fourfold
