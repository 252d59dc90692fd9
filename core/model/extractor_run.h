#pragma once
// An extractor run and the spans it found (design.md §4): what core/extract writes and what
// scoring and export read.

#include "core/model/framing_function.h"
#include "core/model/ids.h"
#include "core/model/text_range.h"

#include <QJsonObject>
#include <QString>

#include <optional>

namespace fourfold {

struct ExtractorRun {
    RunId id;
    QString uuid;
    QString name; // unique in the project; "run:NAME" in the CLI
    QString version; // the extractor's own version string
    QJsonObject parameters; // everything needed to repeat the run (baseline tuning, command)
    QString createdAt; // ISO 8601 UTC
};

struct ExtractedSpan {
    RunId run;
    ArticleId article;
    FramingFunction function = FramingFunction::Problem;
    TextRange range; // code points into the article's canonical text
    std::optional<double> score; // the extractor's confidence, if it gives one
    QJsonObject attributes;
};

} // namespace fourfold
