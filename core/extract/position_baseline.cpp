#include "core/extract/position_baseline.h"

#include "core/extract/extractor_parameters.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct PositionBaselineText {
    Q_DECLARE_TR_FUNCTIONS(PositionBaselineText)
};

} // namespace

QJsonObject PositionBaseline::defaultParameters()
{
    return QJsonObject {
        {QStringLiteral("intro"), QStringLiteral("problem")},
        {QStringLiteral("body"), QStringLiteral("none")},
        {QStringLiteral("conclusion"), QStringLiteral("remedy")},
        {QStringLiteral("unit"), QStringLiteral("paragraph")},
    };
}

Result<PositionBaseline> PositionBaseline::create(const QJsonObject &parameters)
{
    auto merged = mergeParameters(QStringLiteral("position"), defaultParameters(), parameters);
    if (!merged)
        return std::unexpected(merged.error());
    PositionBaseline baseline;
    baseline.m_parameters = *merged;
    for (ParagraphRole role :
        {ParagraphRole::Intro, ParagraphRole::Body, ParagraphRole::Conclusion}) {
        const QString key = paragraphRoleKey(role);
        const QString value = merged->value(key).toString();
        if (value == QLatin1String("none"))
            continue;
        const std::optional<FramingFunction> f = functionFromKey(value);
        if (!f)
            return fail(ErrorCode::InvalidArgument,
                PositionBaselineText::tr(
                    "parameter \"%1\" of the position extractor must be problem, cause, "
                    "evaluation, remedy or none, got \"%2\".")
                    .arg(key, value));
        baseline.m_functionOfRole[size_t(role)] = *f;
        baseline.m_parameters.insert(key, functionKey(*f));
    }
    const QString unit = merged->value(QStringLiteral("unit")).toString();
    if (unit != QLatin1String("paragraph") && unit != QLatin1String("sentence"))
        return fail(ErrorCode::InvalidArgument,
            PositionBaselineText::tr(
                "parameter \"unit\" of the position extractor must be paragraph or sentence, got "
                "\"%1\".")
                .arg(unit));
    baseline.m_perSentence = unit == QLatin1String("sentence");
    return baseline;
}

Result<std::vector<ExtractedSpan>> PositionBaseline::extract(const std::vector<Article> &articles)
{
    std::vector<ExtractedSpan> spans;
    for (const Article &article : articles) {
        for (const Paragraph &paragraph : article.paragraphs) {
            const std::optional<FramingFunction> f = m_functionOfRole[size_t(paragraph.role)];
            if (!f || paragraph.range.isEmpty())
                continue;
            auto add = [&](TextRange range) {
                ExtractedSpan span;
                span.article = article.summary.id;
                span.function = *f;
                span.range = range;
                spans.push_back(std::move(span));
            };
            if (!m_perSentence) {
                add(paragraph.range);
                continue;
            }
            for (const TextRange &sentence : article.sentences)
                if (paragraph.range.contains(sentence) && !sentence.isEmpty())
                    add(sentence);
        }
    }
    return spans;
}

} // namespace fourfold
