#pragma once
// A span layer: one named set of spans of a project, as scoring and export read it.
//   gold            the adjudicated gold standard
//   coders          every coder's annotations
//   coder:PSEUDONYM one coder's annotations
//   run:NAME        the spans of one extractor run (read through ExtractorRuns)
// Coders appear only by their pseudonym: names never leave the project (DEVELOPERS.md).

#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/ids.h"
#include "core/model/text_range.h"

#include <QHash>
#include <QJsonObject>
#include <QString>

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

enum class LayerKind { Gold, Coders, Coder, Run };

struct LayerSpec {
    LayerKind kind = LayerKind::Gold;
    QString name; // the pseudonym (Coder) or the run's name (Run); empty otherwise

    // "gold", "coders", "coder:C01", "run:NAME".
    QString key() const;
    // Parses the forms of key(). Fails with InvalidArgument naming the text for anything else.
    static Result<LayerSpec> parse(const QString &text);
};

// One span of a layer.
struct LayerSpan {
    ArticleId article;
    FramingFunction function = FramingFunction::Problem;
    TextRange range; // code points into the article's canonical text
    QJsonObject attributes;
    std::optional<double> score; // run spans: the extractor's confidence, if any
    // Who made the span: the coder's pseudonym; for gold the pseudonym of the lead who decided;
    // empty for run spans.
    QString coder;
    // The column the span belongs to: the pseudonym (coder layers), "gold", or "run:NAME".
    QString source;
    QString uuid; // of the annotation or gold span; empty for run spans
    QString createdAt; // ISO 8601 UTC; gold: when it was decided; run: the run's time
};

// Which article a source of the layer covers: the coder's coding of it counts (CodingScope:
// marked done, or in progress too when asked for), gold exists for it (at least one gold span), or
// the run saw it (a run covers every article of the project).
struct LayerCoverage {
    ArticleId article;
    QString source;
};

struct SpanLayer {
    LayerSpec spec;
    QStringList sources; // in order: pseudonyms by pseudonym, or "gold", or "run:NAME"
    std::vector<LayerCoverage> coverage; // by article (project order), then source order
    std::vector<LayerSpan> spans; // by article (project order), source, start, end, function
    // The articles covered by any source, in project order.
    std::vector<ArticleId> articles() const;
};

// One covered article of a layer, as LayerReader hands it over.
struct LayerArticle {
    ArticleId article;
    QStringList sources; // the sources covering it, in the layer's source order
    std::vector<LayerSpan> spans; // theirs, by source, start, end, function
};

// A layer read article by article. Opening it reads which sources cover which articles (small:
// ids only); the spans are then streamed in project order with one statement, one article's
// spans held at a time, so an export of any size holds about one article's spans.
class LayerReader
{
public:
    // Coder layers hold the articles whose coding counts (CodingScope), with articles in
    // progress when `includeUnfinished`. Fails with NotFound naming the coder or run that does
    // not exist, or with the store's error.
    static Result<LayerReader> open(
        const Project &project, const LayerSpec &spec, bool includeUnfinished = false);

    const LayerSpec &spec() const { return m_spec; }
    // As SpanLayer::sources.
    const QStringList &sources() const { return m_sources; }
    // The articles covered by any source, in project order.
    std::vector<ArticleId> articles() const;
    // Hands every covered article to `visit` in project order; the first failure ends it.
    Status forEachArticle(const std::function<Status(LayerArticle &&)> &visit) const;
    // The most spans the last forEachArticle held at once: one article's, never the layer's.
    std::size_t mostSpansHeld() const { return m_mostHeld; }

private:
    LayerReader(const Project &project, LayerSpec spec);
    // Which source (index into m_sources) a span of the store belongs to, or -1 to leave it.
    int sourceOfCoder(qint64 coder) const { return m_coderSource.value(coder, -1); }

    const Project *m_project;
    LayerSpec m_spec;
    QStringList m_sources;
    // (article, source index), by article (project order), then source index.
    std::vector<std::pair<ArticleId, int>> m_coverage;
    QHash<qint64, int> m_coderSource; // coder layers: coder id -> source index
    QHash<qint64, QString> m_pseudonyms; // gold: who decided
    RunId m_run;
    QString m_runCreatedAt;
    mutable std::size_t m_mostHeld = 0;
};

// Reads the whole layer `spec` of `project` (LayerReader collected); coder layers hold the articles
// whose coding counts (CodingScope), with articles in progress when `includeUnfinished`. Fails with
// NotFound naming the coder or run that does not exist, or with the store's error.
Result<SpanLayer> resolveLayer(
    const Project &project, const LayerSpec &spec, bool includeUnfinished = false);

} // namespace fourfold
