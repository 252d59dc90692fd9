#pragma once
// Figures of a project for `fourfold-cli info` and the status bar.

#include "core/model/coder.h"

#include <array>
#include <vector>

namespace fourfold {

struct CoderCounts {
    Coder coder;
    qint64 annotations = 0;
    std::array<qint64, 4> perFunction {}; // indexed by FramingFunction
};

struct ProjectCounts {
    qint64 articles = 0;
    qint64 paragraphs = 0;
    qint64 sentences = 0;
    qint64 tokens = 0;
    qint64 codePoints = 0;
    qint64 coders = 0;
    qint64 assignments = 0;
    qint64 annotations = 0;
    std::array<qint64, 4> perFunction {};
    std::vector<CoderCounts> perCoder;
    qint64 links = 0;
    qint64 judgements = 0;
    qint64 goldAnnotations = 0;
    qint64 extractorRuns = 0;
    qint64 codebookVersion = 0; // the current version's number
    qint64 events = 0;
};

} // namespace fourfold
