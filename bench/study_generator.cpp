#include "bench/study_generator.h"

#include <QDir>
#include <QFile>
#include <QJsonDocument>
#include <QJsonObject>

#include <array>
#include <cstdio>
#include <cstdlib>
#include <random>
#include <vector>

namespace fourfold::bench {

namespace {

// Invented vocabulary; towns and issues of no real place.
constexpr std::array kNouns {"ferry", "council", "budget", "harbour", "levy", "dyke", "turbine",
    "market", "square", "library", "tram", "landfill", "orchard", "quay", "depot", "grant"};
constexpr std::array kTowns {"Brakwater", "Tillney", "Quendstadt", "Marrevoort", "Oslade",
    "Vennick", "Harrowmere", "Zelden"};
constexpr std::array kVerbs {
    "threatens", "costs", "blocks", "delays", "saves", "harms", "divides", "changes"};
constexpr std::array kFunctions {"problem", "cause", "evaluation", "remedy"};
constexpr std::array kPolarity {"negative", "neutral", "positive"};

QByteArray line(const QJsonObject &o)
{
    return QJsonDocument(o).toJson(QJsonDocument::Compact) + '\n';
}

} // namespace

StudyFiles writeStudy(const StudySpec &spec, const QString &dir)
{
    StudyFiles out;
    out.articles = QDir(dir).filePath(QStringLiteral("articles.jsonl"));
    out.codings = QDir(dir).filePath(QStringLiteral("codings.jsonl"));
    QFile articles(out.articles);
    QFile codings(out.codings);
    if (!articles.open(QIODevice::WriteOnly) || !codings.open(QIODevice::WriteOnly))
        return {};
    std::mt19937_64 rng(spec.seed);
    const auto pick = [&](auto &list) { return list[rng() % list.size()]; };
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    QByteArray gold;

    for (int a = 0; a < spec.articles; ++a) {
        const QString id = QStringLiteral("g%1").arg(a + 1, 6, 10, QLatin1Char('0'));
        // Sentences carry their number, so every sentence is a unique quote.
        QStringList sentences;
        QString text;
        for (int s = 0; s < spec.sentencesPerArticle; ++s) {
            const QString sentence =
                QStringLiteral("In %1 the %2 %3 the %4 of residents, says report %5-%6, and the "
                               "%7 near the %8 is debated again by the town of %9.")
                    .arg(QLatin1String(pick(kTowns)), QLatin1String(pick(kNouns)),
                        QLatin1String(pick(kVerbs)), QLatin1String(pick(kNouns)), id,
                        QString::number(s + 1), QLatin1String(pick(kNouns)),
                        QLatin1String(pick(kNouns)), QLatin1String(pick(kTowns)));
            sentences << sentence;
            if (!text.isEmpty())
                text += s % 5 == 0 ? QStringLiteral("\n\n") : QStringLiteral(" ");
            text += sentence;
        }
        articles.write(line(QJsonObject {{QStringLiteral("id"), id},
            {QStringLiteral("title"), QStringLiteral("Generated piece %1").arg(a + 1)},
            {QStringLiteral("language"), QStringLiteral("en")},
            {QStringLiteral("outlet"), QStringLiteral("Outlet %1").arg(a % 7 + 1)},
            {QStringLiteral("text"), text}}));

        // Two coders per article; the pairs rotate over the coders.
        const int first = a % spec.coders;
        const int second = (a + 1 + (a / spec.coders) % std::max(1, spec.coders - 1)) % spec.coders;
        const std::array pair {first, second == first ? (first + 1) % spec.coders : second};
        std::vector<int> reference(size_t(spec.sentencesPerArticle), -1);
        for (int s = 0; s < spec.sentencesPerArticle; ++s)
            if (unit(rng) < spec.markedShare)
                reference[size_t(s)] = int(rng() % kFunctions.size());
        for (size_t k = 0; k < pair.size(); ++k) {
            const QString coder = QStringLiteral("C%1").arg(pair[k] + 1, 2, 10, QLatin1Char('0'));
            for (int s = 0; s < spec.sentencesPerArticle; ++s) {
                int f = reference[size_t(s)];
                if (k == 1 && unit(rng) < spec.disagreement)
                    f = unit(rng) < 0.5 ? -1 : int(rng() % kFunctions.size());
                if (f < 0)
                    continue;
                QJsonObject span {{QStringLiteral("article"), id}, {QStringLiteral("coder"), coder},
                    {QStringLiteral("function"), QLatin1String(kFunctions[size_t(f)])},
                    {QStringLiteral("quote"), sentences[s]}};
                if (f == 2)
                    span.insert(QStringLiteral("attributes"),
                        QJsonObject {{QStringLiteral("polarity"),
                            QLatin1String(kPolarity[rng() % kPolarity.size()])}});
                codings.write(line(span));
                ++out.spans;
            }
            codings.write(line(QJsonObject {{QStringLiteral("article"), id},
                {QStringLiteral("coder"), coder},
                {QStringLiteral("item"), QStringLiteral("dominant_function")},
                {QStringLiteral("value"), QLatin1String(kFunctions[rng() % kFunctions.size()])}}));
            ++out.answers;
        }
        if (a % 10 == 0)
            for (int s = 0; s < spec.sentencesPerArticle; ++s)
                if (reference[size_t(s)] >= 0) {
                    gold += line(QJsonObject {{QStringLiteral("article"), id},
                        {QStringLiteral("coder"), QStringLiteral("L01")},
                        {QStringLiteral("gold"), true},
                        {QStringLiteral("function"),
                            QLatin1String(kFunctions[size_t(reference[size_t(s)])])},
                        {QStringLiteral("quote"), sentences[s]},
                        {QStringLiteral("rationale"), QStringLiteral("generated")}});
                    ++out.goldSpans;
                }
    }
    // Gold lines name the coders' overlapping spans as sources, so they come last.
    codings.write(gold);
    if (articles.error() != QFile::NoError || codings.error() != QFile::NoError)
        return {};
    return out;
}

StudyFiles writeStudyOrExit(const StudySpec &spec, const QString &dir)
{
    StudyFiles files = writeStudy(spec, dir);
    if (files.articles.isEmpty()) {
        std::fprintf(stderr, "cannot write the study into %s\n", qPrintable(dir));
        std::exit(1);
    }
    return files;
}

} // namespace fourfold::bench
