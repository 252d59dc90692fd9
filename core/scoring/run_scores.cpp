#include "core/scoring/run_scores.h"

#include "core/project/project.h"

#include <QCoreApplication>
#include <QHash>

#include <algorithm>
#include <random>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct RunScoresText {
    Q_DECLARE_TR_FUNCTIONS(RunScoresText)
};

using reliability::SpanCounts;

// The figures of SemEval-2013 Task 9.1 from counts, as reliability::scoreSpans computes them:
// P = (COR + ½·PAR) / ACT, R = (COR + ½·PAR) / POS, F1 = 2·(COR + ½·PAR) / (POS + ACT).
void setFigures(SpanCounts &c)
{
    const double hit = c.correct + 0.5 * c.partial;
    c.precision = c.actual() > 0 ? std::optional(hit / c.actual()) : std::nullopt;
    c.recall = c.possible() > 0 ? std::optional(hit / c.possible()) : std::nullopt;
    const double both = c.possible() + c.actual();
    c.f1 = both > 0 ? std::optional(2 * hit / both) : std::nullopt;
}

void addCounts(SpanCounts &to, const SpanCounts &from, double times = 1)
{
    to.correct += times * from.correct;
    to.incorrect += times * from.incorrect;
    to.partial += times * from.partial;
    to.missing += times * from.missing;
    to.spurious += times * from.spurious;
}

std::optional<double> meanOfDefined(
    const std::array<SpanCounts, 4> &c, std::optional<double> SpanCounts::*figure)
{
    double sum = 0;
    int n = 0;
    for (const SpanCounts &x : c)
        if (x.*figure) {
            sum += *(x.*figure);
            ++n;
        }
    return n ? std::optional(sum / n) : std::nullopt;
}

// An unbiased draw from 0..n-1 by rejection (the standard distributions are not portable).
std::uint64_t draw(std::mt19937_64 &rng, std::uint64_t n)
{
    const std::uint64_t limit = std::mt19937_64::max() - std::mt19937_64::max() % n;
    for (;;) {
        const std::uint64_t x = rng();
        if (x < limit)
            return x % n;
    }
}

// The percentile interval of alpha_bootstrap.h: the k-th smallest and k-th largest kept value.
Interval percentile(std::vector<double> values)
{
    if (values.empty())
        return {};
    std::sort(values.begin(), values.end());
    const std::size_t k = std::max<std::size_t>(1, std::size_t(0.025 * double(values.size())));
    return Interval {values[k - 1], values[values.size() - k]};
}

struct Figures {
    std::vector<double> p, r, f;
    void add(const SpanCounts &c)
    {
        if (c.precision)
            p.push_back(*c.precision);
        if (c.recall)
            r.push_back(*c.recall);
        if (c.f1)
            f.push_back(*c.f1);
    }
    FigureIntervals intervals() const { return {percentile(p), percentile(r), percentile(f)}; }
};

} // namespace

QString matchModeKey(reliability::MatchMode mode)
{
    switch (mode) {
    case reliability::MatchMode::Strict:
        return QStringLiteral("strict");
    case reliability::MatchMode::Exact:
        return QStringLiteral("exact");
    case reliability::MatchMode::Partial:
        return QStringLiteral("partial");
    case reliability::MatchMode::Type:
        return QStringLiteral("type");
    }
    return {};
}

std::optional<reliability::MatchMode> matchModeFromKey(const QString &key)
{
    for (auto m : {reliability::MatchMode::Strict, reliability::MatchMode::Exact,
             reliability::MatchMode::Partial, reliability::MatchMode::Type})
        if (matchModeKey(m) == key)
            return m;
    return std::nullopt;
}

RunScores scoreLayers(const SpanLayer &reference, const SpanLayer &predicted,
    const std::vector<std::pair<ArticleId, QString>> &scored, const ScoreOptions &options)
{
    RunScores out;
    out.against = reference.spec;
    out.mode = options.mode;
    out.seed = options.seed;
    out.articles = int(scored.size());

    QHash<qint64, int> document;
    for (const auto &[article, externalId] : scored)
        document.insert(article.value, int(document.size()));
    auto collect = [&](const SpanLayer &layer) {
        std::vector<std::vector<reliability::LabelledSpan>> perDocument(scored.size());
        for (const LayerSpan &s : layer.spans)
            if (auto it = document.constFind(s.article.value); it != document.constEnd())
                perDocument[std::size_t(*it)].push_back(
                    reliability::LabelledSpan {*it, int(s.function), s.range.start, s.range.end});
        return perDocument;
    };
    const auto ref = collect(reference);
    const auto pred = collect(predicted);

    for (std::size_t d = 0; d < scored.size(); ++d) {
        const reliability::SpanScores s = reliability::scoreSpans(ref[d], pred[d], 4, options.mode);
        ArticleCounts a;
        a.article = scored[d].first;
        a.externalId = scored[d].second;
        for (std::size_t f = 0; f < 4 && f < s.perCategory.size(); ++f) {
            addCounts(a.perFunction[f], s.perCategory[f]);
            addCounts(out.perFunction[f], s.perCategory[f]);
        }
        out.perArticle.push_back(a);
    }
    for (SpanCounts &c : out.perFunction) {
        setFigures(c);
        addCounts(out.micro, c);
    }
    setFigures(out.micro);
    out.macroPrecision = meanOfDefined(out.perFunction, &SpanCounts::precision);
    out.macroRecall = meanOfDefined(out.perFunction, &SpanCounts::recall);
    out.macroF1 = meanOfDefined(out.perFunction, &SpanCounts::f1);

    if (options.bootstrapReplicates <= 0 || scored.empty())
        return out;
    out.replicates = options.bootstrapReplicates;
    std::array<Figures, 4> perFunction;
    Figures micro, macroP, macroR, macroF;
    const std::size_t n = scored.size();
    std::vector<int> times(n);
    for (int r = 0; r < options.bootstrapReplicates; ++r) {
        std::mt19937_64 rng(options.seed + std::uint64_t(r));
        std::fill(times.begin(), times.end(), 0);
        for (std::size_t i = 0; i < n; ++i)
            ++times[draw(rng, n)];
        std::array<SpanCounts, 4> c {};
        SpanCounts pooled;
        for (std::size_t d = 0; d < n; ++d)
            if (times[d])
                for (std::size_t f = 0; f < 4; ++f)
                    addCounts(c[f], out.perArticle[d].perFunction[f], times[d]);
        for (std::size_t f = 0; f < 4; ++f) {
            setFigures(c[f]);
            perFunction[f].add(c[f]);
            addCounts(pooled, c[f]);
        }
        setFigures(pooled);
        micro.add(pooled);
        if (auto m = meanOfDefined(c, &SpanCounts::precision))
            macroP.p.push_back(*m);
        if (auto m = meanOfDefined(c, &SpanCounts::recall))
            macroR.r.push_back(*m);
        if (auto m = meanOfDefined(c, &SpanCounts::f1))
            macroF.f.push_back(*m);
    }
    for (std::size_t f = 0; f < 4; ++f)
        out.perFunctionIntervals[f] = perFunction[f].intervals();
    out.microIntervals = micro.intervals();
    out.macroIntervals =
        FigureIntervals {percentile(macroP.p), percentile(macroR.r), percentile(macroF.f)};
    return out;
}

Result<RunScores> scoreRun(const Project &project, const QString &run, const LayerSpec &against,
    const ScoreOptions &options)
{
    if (against.kind != LayerKind::Gold && against.kind != LayerKind::Coder)
        return fail(ErrorCode::InvalidArgument,
            RunScoresText::tr("A run is scored against the gold standard or one coder, not \"%1\".")
                .arg(against.key()));
    auto reference = resolveLayer(project, against);
    if (!reference)
        return std::unexpected(reference.error());
    auto predicted = resolveLayer(project, LayerSpec {LayerKind::Run, run});
    if (!predicted)
        return std::unexpected(predicted.error());
    auto articles = project.articles();
    if (!articles)
        return std::unexpected(articles.error());
    QHash<qint64, QString> externalIds;
    for (const ArticleSummary &a : *articles)
        externalIds.insert(a.id.value, a.externalId);
    std::vector<std::pair<ArticleId, QString>> scored;
    for (ArticleId a : reference->articles())
        scored.emplace_back(a, externalIds.value(a.value));
    if (scored.empty())
        return fail(ErrorCode::InvalidArgument,
            against.kind == LayerKind::Gold
                ? RunScoresText::tr(
                    "The project has no gold spans yet, so there is nothing to score against.")
                : RunScoresText::tr(
                    "Coder \"%1\" has coded no article, so there is nothing to score against.")
                      .arg(against.name));
    RunScores out = scoreLayers(*reference, *predicted, scored, options);
    out.run = run;
    return out;
}

} // namespace fourfold
