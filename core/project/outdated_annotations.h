#pragma once
// Annotations made under an older codebook version than the current one, with whether their
// function changed since (those are the ones to re-check, field.md §5.5). A static function over a
// Project, beside it like ExtractorRuns.

#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"

#include <QString>

#include <vector>

namespace fourfold {

class Project;

// A live annotation made under a version older than the current one.
struct OutdatedAnnotation {
    AnnotationId id;
    QString article; // external id
    QString coder; // pseudonym
    FramingFunction function = FramingFunction::Problem;
    Phase phase = Phase::Production;
    int version = 0; // the version number it was made under
    // True if its function's definition, rules, examples or attributes changed since then.
    bool functionChanged = false;
};

class OutdatedAnnotations
{
public:
    // Every live annotation made under an older version, ordered by article, coder, start.
    static Result<std::vector<OutdatedAnnotation>> list(const Project &project);
};

} // namespace fourfold
