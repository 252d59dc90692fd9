#include "core/scoring/element_reliability.h"

#include "core/reliability/krippendorff_alpha.h"
#include "core/scoring/element_indicators.h"

#include <QHash>

namespace fourfold {

Result<std::vector<ElementAlpha>> elementAlphas(
    const Project &project, const QStringList &pseudonyms)
{
    std::vector<ElementIndicators> layers;
    QHash<qint64, int> unitOf; // article id -> unit, in the order the coders' articles come
    for (const QString &p : pseudonyms) {
        auto indicators = elementIndicators(project, QStringLiteral("coder:") + p);
        if (!indicators)
            return std::unexpected(indicators.error());
        for (const ArticleSummary &a : indicators->articles)
            if (!unitOf.contains(a.id.value))
                unitOf.insert(a.id.value, int(unitOf.size()));
        layers.push_back(std::move(*indicators));
    }
    const QStringList variables = elementVariables(project);
    const int units = int(unitOf.size());
    const int coders = int(layers.size());
    std::vector<ElementAlpha> out;
    for (qsizetype v = 0; v < variables.size(); ++v) {
        reliability::ReliabilityData data;
        data.units = units;
        data.coders = coders;
        data.values = 2;
        data.cells.assign(size_t(units) * size_t(coders), reliability::kMissing);
        for (int c = 0; c < coders; ++c) {
            const ElementIndicators &layer = layers[size_t(c)];
            const qsizetype column = layer.variables.indexOf(variables[v]);
            if (column < 0)
                continue;
            for (size_t r = 0; r < layer.articles.size(); ++r)
                data.cells[size_t(unitOf.value(layer.articles[r].id.value)) * size_t(coders)
                    + size_t(c)] =
                    layer.values[r * size_t(layer.variables.size()) + size_t(column)] != 0 ? 1 : 0;
        }
        const reliability::AlphaResult alpha =
            reliability::krippendorffAlpha(data, reliability::Metric {});
        out.push_back(ElementAlpha {
            variables[v], alpha.value, alpha.pairableUnits, QString::fromStdString(alpha.reason)});
    }
    return out;
}

} // namespace fourfold
