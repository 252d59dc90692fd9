#include "core/scoring/run_errors.h"

#include "core/project/project.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QHash>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct RunErrorsText {
    Q_DECLARE_TR_FUNCTIONS(RunErrorsText)
};

bool spanLess(const LayerSpan &a, const LayerSpan &b)
{
    return std::tuple(a.range.start, a.range.end, int(a.function))
        < std::tuple(b.range.start, b.range.end, int(b.function));
}

RunErrorKind kindOf(reliability::SpanOutcome outcome, const RunSpanOutcome &o)
{
    switch (outcome) {
    case reliability::SpanOutcome::Correct:
        return RunErrorKind::Correct;
    case reliability::SpanOutcome::Missing:
        return RunErrorKind::Miss;
    case reliability::SpanOutcome::Spurious:
        return RunErrorKind::FalsePositive;
    case reliability::SpanOutcome::Incorrect:
    case reliability::SpanOutcome::Partial:
        break;
    }
    return o.reference->function != o.predicted->function ? RunErrorKind::WrongFunction
                                                          : RunErrorKind::Boundary;
}

QString quoteOf(const OffsetMap &map, const QString &text, const TextRange &range)
{
    const Utf16Range r16 = map.utf16Range(range);
    return text.mid(r16.start, r16.length());
}

} // namespace

FramingFunction RunSpanOutcome::function() const
{
    return reference ? reference->function : predicted->function;
}

TextRange RunSpanOutcome::range() const
{
    if (reference && predicted)
        return TextRange {std::min(reference->range.start, predicted->range.start),
            std::max(reference->range.end, predicted->range.end)};
    return reference ? reference->range : predicted->range;
}

int RunErrors::count(RunErrorKind kind, std::optional<FramingFunction> function) const
{
    return int(std::ranges::count_if(outcomes, [&](const RunSpanOutcome &o) {
        return o.kind == kind && (!function || o.function() == *function);
    }));
}

RunErrors errorsOfLayers(const SpanLayer &reference, const SpanLayer &predicted,
    const std::vector<std::pair<ArticleId, QString>> &scored, reliability::MatchMode mode,
    const std::vector<QString> &texts)
{
    RunErrors out;
    out.against = reference.spec;
    out.mode = mode;
    out.articles = scored;

    QHash<qint64, int> document;
    for (const auto &[article, externalId] : scored)
        document.insert(article.value, int(document.size()));
    auto collect = [&](const SpanLayer &layer) {
        std::vector<std::vector<LayerSpan>> perDocument(scored.size());
        for (const LayerSpan &s : layer.spans)
            if (auto it = document.constFind(s.article.value); it != document.constEnd())
                perDocument[std::size_t(*it)].push_back(s);
        for (auto &spans : perDocument)
            std::ranges::stable_sort(spans, spanLess);
        return perDocument;
    };
    const auto ref = collect(reference);
    const auto pred = collect(predicted);
    auto labelled = [](const std::vector<LayerSpan> &spans) {
        std::vector<reliability::LabelledSpan> list;
        for (const LayerSpan &s : spans)
            list.push_back({0, int(s.function), s.range.start, s.range.end});
        return list;
    };

    for (std::size_t d = 0; d < scored.size(); ++d) {
        const reliability::SpanScores s =
            reliability::scoreSpans(labelled(ref[d]), labelled(pred[d]), 4, mode);
        const bool haveText = d < texts.size();
        const OffsetMap map(haveText ? texts[d] : QString());
        for (const reliability::SpanMatch &m : s.matches) {
            RunSpanOutcome o;
            o.article = scored[d].first;
            o.externalId = scored[d].second;
            o.outcome = m.outcome;
            if (m.reference >= 0)
                o.reference = ref[d][std::size_t(m.reference)];
            if (m.predicted >= 0)
                o.predicted = pred[d][std::size_t(m.predicted)];
            o.kind = kindOf(m.outcome, o);
            if (haveText) {
                if (o.reference)
                    o.referenceQuote = quoteOf(map, texts[d], o.reference->range);
                if (o.predicted)
                    o.predictedQuote = quoteOf(map, texts[d], o.predicted->range);
            }
            const int row = o.reference ? int(o.reference->function) : kNoFunction;
            const int column = o.predicted ? int(o.predicted->function) : kNoFunction;
            ++out.confusion[std::size_t(row)][std::size_t(column)];
            out.outcomes.push_back(std::move(o));
        }
    }
    return out;
}

Result<RunErrors> runErrors(const Project &project, const QString &run, const LayerSpec &against,
    reliability::MatchMode mode)
{
    if (against.kind != LayerKind::Gold && against.kind != LayerKind::Coder)
        return fail(ErrorCode::InvalidArgument,
            RunErrorsText::tr("A run is compared with the gold standard or one coder, not \"%1\".")
                .arg(against.key()));
    auto reference = resolveLayer(project, against);
    if (!reference)
        return std::unexpected(reference.error());
    auto predicted = resolveLayer(project, LayerSpec {LayerKind::Run, run});
    if (!predicted)
        return std::unexpected(predicted.error());
    std::vector<std::pair<ArticleId, QString>> scored;
    std::vector<QString> texts;
    for (ArticleId a : reference->articles()) {
        auto article = project.article(a);
        if (!article)
            return std::unexpected(article.error());
        scored.emplace_back(a, article->summary.externalId);
        texts.push_back(article->text);
    }
    if (scored.empty())
        return fail(ErrorCode::InvalidArgument,
            against.kind == LayerKind::Gold
                ? RunErrorsText::tr(
                    "The project has no gold spans yet, so there is nothing to compare with.")
                : RunErrorsText::tr(
                    "Coder \"%1\" has coded no article, so there is nothing to compare with.")
                      .arg(against.name));
    RunErrors out = errorsOfLayers(*reference, *predicted, scored, mode, texts);
    out.run = run;
    return out;
}

} // namespace fourfold
