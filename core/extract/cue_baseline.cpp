#include "core/extract/cue_baseline.h"

#include "core/extract/extractor_parameters.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QJsonArray>

#include <algorithm>
#include <cmath>
#include <map>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CueBaselineText {
    Q_DECLARE_TR_FUNCTIONS(CueBaselineText)
};

bool isWordToken(const QString &token)
{
    return std::ranges::any_of(token, [](QChar c) { return c.isLetterOrNumber(); });
}

// Ties between functions go to the first in this order (remedy, cause, evaluation, problem).
int tieRank(FramingFunction f)
{
    switch (f) {
    case FramingFunction::Remedy:
        return 0;
    case FramingFunction::Cause:
        return 1;
    case FramingFunction::Evaluation:
        return 2;
    case FramingFunction::Problem:
        return 3;
    }
    return 4;
}

} // namespace

QJsonObject CueBaseline::defaultParameters()
{
    QJsonObject p {
        {QStringLiteral("minWeight"), 1.0},
        {QStringLiteral("multiple"), false},
        {QStringLiteral("otherLanguages"), QStringLiteral("error")},
    };
    for (const QString &name : CueList::builtInCategoryNames())
        p.insert(QStringLiteral("weight.") + name, 1.0);
    return p;
}

Result<CueBaseline> CueBaseline::create(const QJsonObject &parameters)
{
    auto merged = mergeParameters(QStringLiteral("cues"), defaultParameters(), parameters);
    if (!merged)
        return std::unexpected(merged.error());
    CueBaseline baseline;
    baseline.m_parameters = *merged;
    for (const QString &name : CueList::builtInCategoryNames()) {
        const QString key = QStringLiteral("weight.") + name;
        const double w = merged->value(key).toDouble();
        if (!std::isfinite(w) || w < 0)
            return fail(ErrorCode::InvalidArgument,
                CueBaselineText::tr(
                    "parameter \"%1\" of the cues extractor must be a number of at least 0, got "
                    "%2.")
                    .arg(key)
                    .arg(w));
        baseline.m_weights.insert(name, w);
    }
    baseline.m_minWeight = merged->value(QLatin1String("minWeight")).toDouble();
    if (!std::isfinite(baseline.m_minWeight) || baseline.m_minWeight <= 0)
        return fail(ErrorCode::InvalidArgument,
            CueBaselineText::tr(
                "parameter \"minWeight\" of the cues extractor must be a number above 0, got %1.")
                .arg(baseline.m_minWeight));
    baseline.m_multiple = merged->value(QLatin1String("multiple")).toBool();
    const QString other = merged->value(QLatin1String("otherLanguages")).toString();
    if (other != QLatin1String("error") && other != QLatin1String("skip"))
        return fail(ErrorCode::InvalidArgument,
            CueBaselineText::tr(
                "parameter \"otherLanguages\" of the cues extractor must be error or skip, got "
                "\"%1\".")
                .arg(other));
    baseline.m_skipOtherLanguages = other == QLatin1String("skip");
    return baseline;
}

std::vector<ExtractedSpan> CueBaseline::sentenceSpans(
    const CueList &cues, const Article &article, const TextRange &sentence) const
{
    // Tokens are sliced through one map's UTF-16 positions rather than by walking the text
    // from its start for every token.
    const OffsetMap map(article.text);
    QStringList words;
    const auto first = std::ranges::lower_bound(
        article.tokens, sentence.start, {}, [](const TextRange &t) { return t.start; });
    for (auto it = first; it != article.tokens.end() && it->start < sentence.end; ++it) {
        if (!sentence.contains(*it))
            continue;
        const Utf16Range utf16 = map.utf16Range(*it);
        const QString token = article.text.mid(utf16.start, utf16.length());
        if (isWordToken(token))
            words.append(token);
    }

    struct Tally {
        double weight = 0;
        QStringList cues;
        std::map<qsizetype, double> perCategory;
    };
    std::map<FramingFunction, Tally> tallies;
    for (const CueList::Hit &hit : cues.match(words)) {
        const CueList::Category &category = cues.categories()[size_t(hit.category)];
        const double w = m_weights.value(category.name, 1.0);
        if (w <= 0)
            continue;
        Tally &t = tallies[category.function];
        t.weight += w;
        t.perCategory[hit.category] += w;
        const QString cueText = category.cues[size_t(hit.cue)].text;
        if (!t.cues.contains(cueText))
            t.cues.append(cueText);
    }

    std::vector<std::pair<FramingFunction, const Tally *>> candidates;
    for (const auto &[function, tally] : tallies)
        if (tally.weight >= m_minWeight)
            candidates.emplace_back(function, &tally);
    std::ranges::sort(candidates, [](const auto &a, const auto &b) {
        if (a.second->weight != b.second->weight)
            return a.second->weight > b.second->weight;
        return tieRank(a.first) < tieRank(b.first);
    });
    if (!m_multiple && candidates.size() > 1)
        candidates.resize(1);

    std::vector<ExtractedSpan> spans;
    for (const auto &[function, tally] : candidates) {
        ExtractedSpan span;
        span.function = function;
        span.range = sentence;
        // A confidence that grows with the cue weight and stays below 1 (our own choice for a
        // baseline; it orders spans, it is not calibrated).
        span.score = 1.0 - std::pow(2.0, -tally->weight);
        qsizetype heaviest = tally->perCategory.begin()->first;
        for (const auto &[category, weight] : tally->perCategory)
            if (weight > tally->perCategory.at(heaviest))
                heaviest = category;
        span.attributes = cues.categories()[size_t(heaviest)].attributes;
        span.attributes.insert(QStringLiteral("cues"), QJsonArray::fromStringList(tally->cues));
        spans.push_back(std::move(span));
    }
    std::ranges::sort(spans, {}, [](const ExtractedSpan &s) { return int(s.function); });
    return spans;
}

Result<std::vector<ExtractedSpan>> CueBaseline::extract(const std::vector<Article> &articles)
{
    QHash<QString, CueList> lists;
    std::vector<ExtractedSpan> spans;
    for (const Article &article : articles) {
        const QString language = article.summary.language;
        if (!lists.contains(language)) {
            auto list = CueList::builtIn(language);
            if (!list) {
                if (m_skipOtherLanguages && list.error().code == ErrorCode::NotFound)
                    continue;
                Error e = list.error();
                if (e.code == ErrorCode::NotFound)
                    e.message = CueBaselineText::tr(
                        "Article %1 is in language \"%2\", which has no cue list (the "
                        "cue baseline knows %3); pass otherLanguages=skip to leave "
                        "such articles out.")
                                    .arg(article.summary.externalId, language,
                                        CueList::builtInLanguages().join(QStringLiteral(", ")));
                return std::unexpected(e);
            }
            lists.insert(language, std::move(*list));
        }
        const CueList &list = lists[language];
        for (const TextRange &sentence : article.sentences) {
            for (ExtractedSpan &span : sentenceSpans(list, article, sentence)) {
                span.article = article.summary.id;
                spans.push_back(std::move(span));
            }
        }
    }
    return spans;
}

} // namespace fourfold
