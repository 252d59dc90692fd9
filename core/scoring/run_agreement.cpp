#include "core/scoring/run_agreement.h"

#include "core/agreement/value_encoding.h"
#include "core/project/project.h"
#include "core/scoring/span_layer.h"

#include <QCoreApplication>
#include <QHash>

#include <algorithm>
#include <map>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct RunAgreementText {
    Q_DECLARE_TR_FUNCTIONS(RunAgreementText)
};

// Nominal alpha of the columns `columns` of `table` (Krippendorff 2011, §B).
PairAlpha alphaOf(const ReliabilityTable &table, const std::vector<qsizetype> &columns)
{
    const ReliabilityTable sub = table.columns(columns);
    PairAlpha out;
    out.first = sub.coders.value(0);
    out.second = sub.coders.value(1);
    auto encoded = encodeTable(sub, EncodingOptions {});
    if (!encoded) {
        out.reason = encoded.error().message;
        return out;
    }
    const reliability::AlphaResult alpha =
        reliability::krippendorffAlpha(encoded->data, encoded->metric);
    out.alpha = alpha.value;
    out.reason = QString::fromStdString(alpha.reason);
    return out;
}

} // namespace

QString bandPosition(
    std::optional<double> runMean, std::optional<double> low, std::optional<double> high)
{
    if (!runMean || !low || !high)
        return QStringLiteral("undefined");
    if (*runMean < *low)
        return QStringLiteral("below");
    if (*runMean > *high)
        return QStringLiteral("above");
    return QStringLiteral("inside");
}

Result<RunAgreement> runAgreement(
    const Project &project, const QString &run, const RunAgreementOptions &options)
{
    if (options.unit != UnitKind::Paragraph && options.unit != UnitKind::Sentence
        && options.unit != UnitKind::Token)
        return fail(ErrorCode::InvalidArgument,
            RunAgreementText::tr(
                "The run joins the humans on paragraph, sentence or token units."));
    auto runLayer = resolveLayer(project, LayerSpec {LayerKind::Run, run});
    if (!runLayer)
        return std::unexpected(runLayer.error());
    const QString runName = runLayer->sources.value(0);
    auto summaries = project.articles();
    if (!summaries)
        return std::unexpected(summaries.error());
    QHash<QString, ArticleId> byExternalId;
    for (const ArticleSummary &a : *summaries)
        byExternalId.insert(a.externalId, a.id);
    // The run's spans per (article, function).
    std::map<std::pair<qint64, int>, std::vector<TextRange>> runSpans;
    for (const LayerSpan &s : runLayer->spans)
        runSpans[{s.article.value, int(s.function)}].push_back(s.range);
    std::map<qint64, std::vector<TextRange>> unitCache;

    // The humans' codings that count, read once for the four functions.
    UnitSelection selection;
    selection.unit = options.unit;
    selection.coders = options.coders;
    selection.phase = options.phase;
    auto counted = countedCodings(project, selection);
    if (!counted)
        return std::unexpected(counted.error());

    RunAgreement out;
    out.run = run;
    out.unit = options.unit;
    for (FramingFunction f : kFramingFunctions) {
        selection.function = f;
        auto table = unitTable(project, *counted, selection);
        if (!table)
            return std::unexpected(table.error());
        if (out.coders.isEmpty()) {
            out.coders = table->coders;
            out.units = int(table->unitCount());
        }
        // The run's column: unit ids are "<external id>#<kind letter><1-based index>".
        const qsizetype humans = table->coders.size();
        const qint32 presentLabel = table->labelIndex(QStringLiteral("present"));
        const qint32 absentLabel = table->labelIndex(QStringLiteral("absent"));
        std::vector<qint32> runColumn(table->unitCount());
        for (size_t u = 0; u < table->unitCount(); ++u) {
            const QString unitId = table->unitId(u);
            const qsizetype hash = unitId.lastIndexOf(QLatin1Char('#'));
            const ArticleId article = byExternalId.value(unitId.left(hash));
            const qsizetype index = unitId.mid(hash + 2).toLongLong() - 1;
            auto cached = unitCache.find(article.value);
            if (cached == unitCache.end()) {
                auto a = project.article(article);
                if (!a)
                    return std::unexpected(a.error());
                std::vector<TextRange> units;
                if (options.unit == UnitKind::Paragraph)
                    for (const Paragraph &p : a->paragraphs)
                        units.push_back(p.range);
                else
                    units = options.unit == UnitKind::Sentence ? a->sentences : a->tokens;
                cached = unitCache.emplace(article.value, std::move(units)).first;
            }
            bool present = false;
            if (index >= 0 && std::size_t(index) < cached->second.size())
                if (auto it = runSpans.find({article.value, int(f)}); it != runSpans.end())
                    present =
                        std::any_of(it->second.begin(), it->second.end(), [&](const TextRange &r) {
                            return r.overlaps(cached->second[std::size_t(index)]);
                        });
            runColumn[u] = present ? presentLabel : absentLabel;
        }
        table->appendColumn(runName, runColumn);

        FunctionBand &band = out.functions[std::size_t(f)];
        band.function = f;
        std::vector<qsizetype> all;
        for (qsizetype c = 0; c < humans; ++c)
            all.push_back(c);
        band.humansAlpha = alphaOf(*table, all).alpha;
        all.push_back(humans);
        band.humansWithRunAlpha = alphaOf(*table, all).alpha;
        double sum = 0;
        int defined = 0;
        for (qsizetype a = 0; a < humans; ++a) {
            for (qsizetype b = a + 1; b < humans; ++b) {
                PairAlpha p = alphaOf(*table, {a, b});
                if (p.alpha) {
                    band.bandLow = std::min(band.bandLow.value_or(*p.alpha), *p.alpha);
                    band.bandHigh = std::max(band.bandHigh.value_or(*p.alpha), *p.alpha);
                }
                band.humanPairs.push_back(p);
            }
            PairAlpha p = alphaOf(*table, {a, humans});
            if (p.alpha) {
                sum += *p.alpha;
                ++defined;
            }
            band.runPairs.push_back(p);
        }
        if (defined)
            band.runMean = sum / defined;
        band.position = bandPosition(band.runMean, band.bandLow, band.bandHigh);
    }
    return out;
}

} // namespace fourfold
