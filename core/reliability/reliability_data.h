#pragma once
// Reliability data (Krippendorff 2004, ch. 11): a units × coders matrix of value codes with
// missing cells. The numeric kernels of core/reliability use only the standard library.

#include <cmath>
#include <cstddef>
#include <string>
#include <vector>

namespace fourfold::reliability {

// A missing cell: the coder did not code the unit.
inline constexpr int kMissing = -1;

struct ReliabilityData {
    int units = 0;
    int coders = 0;
    // Distinct values; cells hold codes 0..values-1 or kMissing.
    int values = 0;
    // Row-major: cells[u * coders + c].
    std::vector<int> cells;

    int at(int unit, int coder) const
    {
        return cells[std::size_t(unit) * std::size_t(coders) + std::size_t(coder)];
    }
};

// The level of measurement that fixes the difference function δ² (Krippendorff 2011, §E).
enum class Level { Nominal, Ordinal, Interval, Ratio };

// How two values differ. For the four levels, `numeric` gives each value code's number
// (interval, ratio) or rank order (ordinal: codes must be numbered in their order; the
// ordinal difference is built from the pairable marginals, not from these numbers). A non-empty
// `custom` matrix (values × values, row-major, symmetric, zero diagonal) replaces the level's
// function, e.g. Jaccard or MASI distances between label sets (Artstein & Poesio 2008, §5).
// For interval and ratio an empty `numeric` means each code's own index (0..values-1) is its
// number; ratio numbers must not be negative. Ordinal ignores `numeric`: the codes' order is the
// rank order.
struct Metric {
    Level level = Level::Nominal;
    std::vector<double> numeric;
    std::vector<double> custom;
};

// Why a statistic has no value ("only one value occurs among the pairable values", ...).
// Empty when the value is defined.
using UndefinedReason = std::string;

// What is wrong with `data` as reliability data: negative sizes, a cell count other than
// units × coders, or a cell that is neither kMissing nor a code 0..values-1 (the first such
// cell is named, units and coders counted from 1). Empty when the data are well-formed.
inline UndefinedReason dataProblem(const ReliabilityData &data)
{
    if (data.units < 0 || data.coders < 0 || data.values < 0)
        return "the numbers of units, coders and values must not be negative";
    if (data.cells.size() != std::size_t(data.units) * std::size_t(data.coders))
        return "the data hold " + std::to_string(data.cells.size())
            + " cells, not units × coders = "
            + std::to_string(std::size_t(data.units) * std::size_t(data.coders));
    for (std::size_t i = 0; i < data.cells.size(); ++i) {
        const int v = data.cells[i];
        if (v != kMissing && (v < 0 || v >= data.values)) {
            const std::size_t coders = std::size_t(data.coders);
            return "unit " + std::to_string(i / coders + 1) + ", coder "
                + std::to_string(i % coders + 1) + " holds the code " + std::to_string(v)
                + ", which is neither missing nor one of 0.." + std::to_string(data.values - 1);
        }
    }
    return {};
}

// What is wrong with `metric` for `values` distinct codes: a `numeric` or `custom` of the wrong
// size, a number that is not finite, a negative ratio number, or a custom matrix that is not
// symmetric, has a non-zero diagonal or a negative entry. Empty when the metric is usable.
inline UndefinedReason metricProblem(const Metric &metric, int values)
{
    const std::size_t v = values > 0 ? std::size_t(values) : 0;
    if (!metric.custom.empty()) {
        if (metric.custom.size() != v * v)
            return "the custom difference matrix has " + std::to_string(metric.custom.size())
                + " entries, not values × values = " + std::to_string(v * v);
        for (std::size_t c = 0; c < v; ++c) {
            for (std::size_t k = 0; k < v; ++k) {
                const double d = metric.custom[c * v + k];
                if (!std::isfinite(d) || d < 0)
                    return "the custom difference between codes " + std::to_string(c) + " and "
                        + std::to_string(k) + " is not a finite non-negative number";
                if (c == k && d != 0)
                    return "the custom difference of code " + std::to_string(c)
                        + " with itself is not 0";
                if (d != metric.custom[k * v + c])
                    return "the custom difference matrix is not symmetric (codes "
                        + std::to_string(c) + " and " + std::to_string(k) + ")";
            }
        }
        return {};
    }
    if (metric.level == Level::Interval || metric.level == Level::Ratio) {
        if (!metric.numeric.empty() && metric.numeric.size() != v)
            return "the metric gives " + std::to_string(metric.numeric.size()) + " numbers for "
                + std::to_string(v) + " values";
        for (std::size_t c = 0; c < metric.numeric.size(); ++c) {
            if (!std::isfinite(metric.numeric[c]))
                return "the number of code " + std::to_string(c) + " is not finite";
            if (metric.level == Level::Ratio && metric.numeric[c] < 0)
                return "the ratio metric needs non-negative numbers; code " + std::to_string(c)
                    + " is negative";
        }
    }
    return {};
}

} // namespace fourfold::reliability
