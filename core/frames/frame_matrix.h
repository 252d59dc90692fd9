#pragma once
// The input of the frame kernels: an articles × variables matrix of numbers (element indicators
// are 0/1), row-major, and the result type of kernels that can refuse their input.

#include <cstddef>
#include <expected>
#include <string>
#include <vector>

namespace fourfold::frames {

struct FrameMatrix {
    std::size_t rows = 0; // articles
    std::size_t columns = 0; // variables
    std::vector<double> values; // row-major: values[r * columns + c]

    double at(std::size_t r, std::size_t c) const { return values[r * columns + c]; }
    const double *row(std::size_t r) const { return values.data() + r * columns; }
};

// A kernel's answer, or the sentence saying why there is none ("k must be between 2 and ...").
template<typename T>
using Outcome = std::expected<T, std::string>;

// A partition of the rows: labels[i] is row i's cluster, 0..clusters-1.
struct Partition {
    std::vector<int> labels;
    int clusters = 0;
};

// Squared Euclidean distance between rows `a` and `b` of `columns` values each.
inline double squaredDistance(const double *a, const double *b, std::size_t columns)
{
    double sum = 0;
    for (std::size_t c = 0; c < columns; ++c) {
        const double d = a[c] - b[c];
        sum += d * d;
    }
    return sum;
}

} // namespace fourfold::frames
