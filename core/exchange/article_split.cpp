#include "core/exchange/article_split.h"

#include <QCoreApplication>

#include <algorithm>
#include <cmath>
#include <map>
#include <numeric>
#include <random>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleSplitText {
    Q_DECLARE_TR_FUNCTIONS(ArticleSplitText)
};

std::uint64_t draw(std::mt19937_64 &rng, std::uint64_t n)
{
    const std::uint64_t limit = std::mt19937_64::max() - std::mt19937_64::max() % n;
    for (;;) {
        const std::uint64_t x = rng();
        if (x < limit)
            return x % n;
    }
}

} // namespace

Result<SplitRatios> SplitRatios::parse(const QString &text)
{
    const QStringList parts = text.split(QLatin1Char('/'));
    SplitRatios out;
    if (parts.size() == 3)
        out.names = {QStringLiteral("train"), QStringLiteral("dev"), QStringLiteral("test")};
    else if (parts.size() == 2)
        out.names = {QStringLiteral("train"), QStringLiteral("test")};
    int sum = 0;
    for (const QString &p : parts) {
        bool ok = false;
        const int v = p.trimmed().toInt(&ok);
        if (!ok || v < 0) {
            sum = -1;
            break;
        }
        sum += v;
        out.ratios.push_back(v / 100.0);
    }
    if (out.names.isEmpty() || sum != 100)
        return fail(ErrorCode::InvalidArgument,
            ArticleSplitText::tr(
                "The split \"%1\" is not two or three whole percentages summing to 100 (e.g. "
                "80/10/10).")
                .arg(text));
    return out;
}

QString SplitRatios::text() const
{
    QStringList parts;
    for (double r : ratios)
        parts << QString::number(std::lround(r * 100));
    return parts.join(QLatin1Char('/'));
}

std::vector<int> splitArticles(const std::vector<unsigned> &strata, const QStringList &keys,
    const SplitRatios &ratios, std::uint64_t seed)
{
    const std::size_t splits = ratios.ratios.size();
    std::vector<int> out(strata.size(), 0);
    if (splits == 0)
        return out;
    std::map<unsigned, std::vector<std::size_t>> byStratum;
    for (std::size_t i = 0; i < strata.size(); ++i)
        byStratum[strata[i]].push_back(i);
    std::mt19937_64 rng(seed);
    std::vector<double> assigned(splits, 0);
    double total = 0;
    for (auto &[stratum, members] : byStratum) {
        std::sort(members.begin(), members.end(), [&](std::size_t a, std::size_t b) {
            return keys.value(qsizetype(a)) < keys.value(qsizetype(b));
        });
        for (std::size_t i = members.size(); i > 1; --i)
            std::swap(members[i - 1], members[draw(rng, i)]);
        const std::size_t n = members.size();
        total += double(n);
        std::vector<std::size_t> count(splits);
        std::size_t given = 0;
        for (std::size_t s = 0; s < splits; ++s) {
            count[s] = std::size_t(std::floor(double(n) * ratios.ratios[s] + 1e-9));
            given += count[s];
        }
        for (std::size_t s = 0; s < splits; ++s)
            assigned[s] += double(count[s]);
        for (; given < n; ++given) {
            std::size_t best = 0;
            double bestDeficit = -1e300;
            for (std::size_t s = 0; s < splits; ++s) {
                const double deficit = total * ratios.ratios[s] - assigned[s];
                if (deficit > bestDeficit + 1e-12) {
                    best = s;
                    bestDeficit = deficit;
                }
            }
            ++count[best];
            assigned[best] += 1;
        }
        std::size_t next = 0;
        for (std::size_t s = 0; s < splits; ++s)
            for (std::size_t k = 0; k < count[s]; ++k)
                out[members[next++]] = int(s);
    }
    return out;
}

} // namespace fourfold
