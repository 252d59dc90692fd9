#include "core/frames/adjusted_rand.h"

#include <algorithm>
#include <limits>

namespace fourfold::frames {

namespace {

double pairs(long long count)
{
    return double(count) * double(count - 1) / 2.0;
}

} // namespace

Outcome<CrossTable> crossTable(const Partition &a, const Partition &b)
{
    if (a.labels.size() != b.labels.size())
        return std::unexpected("the partitions cover " + std::to_string(a.labels.size()) + " and "
            + std::to_string(b.labels.size()) + " articles");
    CrossTable table;
    table.rows = a.clusters;
    table.columns = b.clusters;
    table.counts.assign(
        std::size_t(std::max(a.clusters, 0)) * std::size_t(std::max(b.clusters, 0)), 0);
    for (std::size_t i = 0; i < a.labels.size(); ++i) {
        const int r = a.labels[i];
        const int c = b.labels[i];
        if (r < 0 || r >= a.clusters || c < 0 || c >= b.clusters)
            return std::unexpected("article " + std::to_string(i + 1) + " has no cluster");
        ++table.counts[std::size_t(r) * std::size_t(b.clusters) + std::size_t(c)];
    }
    return table;
}

double adjustedRandIndex(const CrossTable &table)
{
    // Hubert & Arabie (1985), eq. (5).
    std::vector<long long> rowSums(std::size_t(table.rows), 0);
    std::vector<long long> columnSums(std::size_t(table.columns), 0);
    double cells = 0;
    long long n = 0;
    for (int r = 0; r < table.rows; ++r)
        for (int c = 0; c < table.columns; ++c) {
            const long long count = table.at(r, c);
            rowSums[std::size_t(r)] += count;
            columnSums[std::size_t(c)] += count;
            cells += pairs(count);
            n += count;
        }
    double rowPairs = 0;
    for (long long s : rowSums)
        rowPairs += pairs(s);
    double columnPairs = 0;
    for (long long s : columnSums)
        columnPairs += pairs(s);
    const double all = pairs(n);
    const double expected = all > 0 ? rowPairs * columnPairs / all : 0.0;
    const double maximum = (rowPairs + columnPairs) / 2.0;
    if (maximum - expected == 0)
        return 1.0;
    return (cells - expected) / (maximum - expected);
}

std::vector<int> bestMatching(const CrossTable &table)
{
    // The Hungarian method (Kuhn 1955; Munkres 1957) in its shortest-augmenting-path form with
    // potentials, on costs −count, over a square matrix padded with zeros.
    const int size = std::max(table.rows, table.columns);
    std::vector<int> matchOfRow(std::size_t(table.rows), -1);
    if (size == 0)
        return matchOfRow;
    const double inf = std::numeric_limits<double>::infinity();
    auto cost = [&](int r, int c) {
        return r < table.rows && c < table.columns ? -double(table.at(r, c)) : 0.0;
    };
    // 1-based arrays: p[c] is the row matched to column c; u, v the potentials.
    std::vector<double> u(std::size_t(size) + 1, 0.0);
    std::vector<double> v(std::size_t(size) + 1, 0.0);
    std::vector<int> p(std::size_t(size) + 1, 0);
    std::vector<int> way(std::size_t(size) + 1, 0);
    for (int i = 1; i <= size; ++i) {
        p[0] = i;
        int j0 = 0;
        std::vector<double> minv(std::size_t(size) + 1, inf);
        std::vector<char> used(std::size_t(size) + 1, 0);
        do {
            used[std::size_t(j0)] = 1;
            const int i0 = p[std::size_t(j0)];
            double delta = inf;
            int j1 = 0;
            for (int j = 1; j <= size; ++j) {
                if (used[std::size_t(j)])
                    continue;
                const double current = cost(i0 - 1, j - 1) - u[std::size_t(i0)] - v[std::size_t(j)];
                if (current < minv[std::size_t(j)]) {
                    minv[std::size_t(j)] = current;
                    way[std::size_t(j)] = j0;
                }
                if (minv[std::size_t(j)] < delta) {
                    delta = minv[std::size_t(j)];
                    j1 = j;
                }
            }
            for (int j = 0; j <= size; ++j) {
                if (used[std::size_t(j)]) {
                    u[std::size_t(p[std::size_t(j)])] += delta;
                    v[std::size_t(j)] -= delta;
                } else {
                    minv[std::size_t(j)] -= delta;
                }
            }
            j0 = j1;
        } while (p[std::size_t(j0)] != 0);
        do {
            const int j1 = way[std::size_t(j0)];
            p[std::size_t(j0)] = p[std::size_t(j1)];
            j0 = j1;
        } while (j0 != 0);
    }
    for (int j = 1; j <= size; ++j) {
        const int r = p[std::size_t(j)] - 1;
        if (r >= 0 && r < table.rows && j - 1 < table.columns)
            matchOfRow[std::size_t(r)] = j - 1;
    }
    return matchOfRow;
}

} // namespace fourfold::frames
