#include "core/scoring/element_indicators.h"

#include "core/model/codebook.h"
#include "core/project/project.h"
#include "core/scoring/span_layer.h"

#include <QCoreApplication>
#include <QHash>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ElementIndicatorsText {
    Q_DECLARE_TR_FUNCTIONS(ElementIndicatorsText)
};

// One indicator: a function, and for an attribute value also the attribute's key and the value.
struct Element {
    FramingFunction function = FramingFunction::Problem;
    QString attribute; // empty: the function itself
    QString value;
};

std::vector<Element> elementsOf(const Codebook &codebook)
{
    std::vector<Element> elements;
    for (FramingFunction f : kFramingFunctions) {
        elements.push_back({f, {}, {}});
        for (const AttributeSpec &a : codebook.definition(f).attributes)
            if (a.type == AttributeSpec::Type::Choice)
                for (const QString &v : a.values)
                    elements.push_back({f, a.key, v});
    }
    return elements;
}

QString elementName(const Element &e)
{
    return e.attribute.isEmpty()
        ? functionKey(e.function)
        : QStringLiteral("%1:%2=%3").arg(functionKey(e.function), e.attribute, e.value);
}

} // namespace

QStringList elementVariables(const Project &project)
{
    QStringList names;
    const auto codebook = project.codebook();
    if (!codebook)
        return names;
    for (const Element &e : elementsOf(*codebook))
        names << elementName(e);
    return names;
}

Result<ElementIndicators> elementIndicators(const Project &project, const QString &layer)
{
    const bool consensus = layer == QLatin1String("consensus");
    LayerSpec spec;
    if (consensus) {
        spec.kind = LayerKind::Coders;
    } else {
        auto parsed = LayerSpec::parse(layer);
        if (!parsed || parsed->kind == LayerKind::Coders)
            return fail(ErrorCode::InvalidArgument,
                ElementIndicatorsText::tr(
                    "\"%1\" is not a layer for frames; use gold, consensus, coder:PSEUDONYM or "
                    "run:NAME.")
                    .arg(layer));
        spec = *parsed;
    }
    const auto codebook = project.codebook();
    if (!codebook)
        return std::unexpected(codebook.error());
    const auto summaries = project.articles();
    if (!summaries)
        return std::unexpected(summaries.error());
    QHash<ArticleId, qsizetype> summaryOf;
    for (qsizetype i = 0; i < qsizetype(summaries->size()); ++i)
        summaryOf.insert((*summaries)[size_t(i)].id, i);
    auto reader = LayerReader::open(project, spec);
    if (!reader)
        return std::unexpected(reader.error());

    const std::vector<Element> elements = elementsOf(*codebook);
    const size_t m = elements.size();
    ElementIndicators result;
    result.layer = layer;
    for (const Element &e : elements)
        result.variables << elementName(e);
    std::vector<char> present; // sources × elements of the article at hand
    FOURFOLD_TRY_STATUS(reader->forEachArticle([&](LayerArticle &&article) -> Status {
        const qsizetype sources = std::max<qsizetype>(article.sources.size(), 1);
        present.assign(size_t(sources) * m, 0);
        for (const LayerSpan &span : article.spans) {
            const qsizetype source = std::max<qsizetype>(article.sources.indexOf(span.source), 0);
            char *row = present.data() + size_t(source) * m;
            for (size_t e = 0; e < m; ++e) {
                const Element &element = elements[e];
                if (element.function != span.function)
                    continue;
                if (element.attribute.isEmpty()) {
                    row[e] = 1;
                    continue;
                }
                const QJsonValue given = span.attributes.value(element.attribute);
                if (!given.isString())
                    continue;
                const auto counted = codebook->countedAttributeValue(
                    element.function, element.attribute, given.toString());
                if (counted && *counted == element.value)
                    row[e] = 1;
            }
        }
        result.articles.push_back(summaryOf.contains(article.article)
                ? (*summaries)[size_t(summaryOf.value(article.article))]
                : ArticleSummary {});
        result.sources.push_back(int(sources));
        for (size_t e = 0; e < m; ++e) {
            int count = 0;
            for (qsizetype s = 0; s < sources; ++s)
                count += present[size_t(s) * m + e];
            const double share = double(count) / double(sources);
            result.shares.push_back(share);
            // Consensus: at least half of the article's coders (2 × count ≥ coders).
            result.values.push_back(2 * count >= sources && count > 0 ? 1.0 : 0.0);
        }
        return {};
    }));
    return result;
}

} // namespace fourfold
