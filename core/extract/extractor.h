#pragma once
// The extractor interface (design.md §2, core/extract): an automatic frame-element extractor
// reads articles — canonical text, language, paragraphs with roles, sentences, tokens — and
// returns spans, each with a framing function, optional attributes and an optional score.
// Built in are two baselines (PositionBaseline, CueBaseline); CommandExtractor runs any external
// program that speaks the JSON Lines protocol described in command_extractor.h.

#include "core/model/article.h"
#include "core/model/error.h"
#include "core/model/extractor_run.h"

#include <QJsonObject>
#include <QString>

#include <vector>

namespace fourfold {

class Extractor
{
public:
    virtual ~Extractor() = default;

    // The extractor's kind, stored with the run as parameters["extractor"]: "position", "cues",
    // "command".
    virtual QString kind() const = 0;
    // The extractor's own version string, stored with the run.
    virtual QString version() const = 0;
    // Every parameter the run used, defaults included, so that the run can be repeated.
    virtual QJsonObject parameters() const = 0;

    // The spans found in `articles`. Each span's `article` is the id of the article it belongs
    // to and its range is in code points of that article's canonical text; `run` is left
    // unset. Fails (and returns no spans at all) when the extractor cannot do its work, with a
    // sentence that names the article or the output line at fault.
    virtual Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) = 0;
    // Whether the spans it finds in an article depend on that article alone: the articles of a
    // run are then handed over a batch at a time (ExtractorRuns::kArticlesPerBatch) rather than
    // all at once, so a run over a whole study holds one batch of texts.
    virtual bool readsArticlesAlone() const { return false; }

protected:
    Extractor() = default;
    Extractor(const Extractor &) = default;
    Extractor &operator=(const Extractor &) = default;
};

} // namespace fourfold
