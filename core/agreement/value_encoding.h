#pragma once
// From a labelled reliability table (cells as text) to the numeric kernels' reliability data:
// value codes, and the metric for the chosen level of measurement or set distance.

#include "core/model/error.h"
#include "core/model/reliability_table.h"
#include "core/reliability/reliability_data.h"
#include "core/reliability/set_distance.h"

#include <QStringList>

#include <optional>

namespace fourfold {

struct EncodingOptions {
    reliability::Level level = reliability::Level::Nominal;
    // Set-valued cells ("a|b"; "{}" is the empty set) compared with this distance.
    std::optional<reliability::SetDistance> distance;
    // Ordinal labels in their order (lowest first); empty = cells are numbers.
    QStringList order;
};

struct EncodedData {
    reliability::ReliabilityData data;
    reliability::Metric metric;
    QStringList valueLabels; // the label of each value code
};

// Encodes `table`. Nominal: every distinct label is a value (codes in sorted order). Ordinal:
// labels ranked by `order`, or numbers ranked by size. Interval and ratio: numbers (ratio: not
// negative). With a distance: each distinct set of labels is a value. Fails with InvalidInput
// naming the file, line and cell for a label outside `order`, a non-number, or a negative
// ratio value; InvalidArgument for a distance combined with a level other than nominal.
Result<EncodedData> encodeTable(const ReliabilityTable &table, const EncodingOptions &options);
// The same, taking the table's cells over instead of copying them (one copy of the unit matrix
// is held, not two): on success the table keeps its coders, labels and units but no cells
// (ReliabilityTable::takeCells); on failure it is left as it was.
Result<EncodedData> encodeTableCells(ReliabilityTable &table, const EncodingOptions &options);

// "nominal", "ordinal", "interval", "ratio".
QString levelKey(reliability::Level level);
std::optional<reliability::Level> levelFromKey(const QString &key);
// "jaccard", "masi".
QString setDistanceKey(reliability::SetDistance distance);
std::optional<reliability::SetDistance> setDistanceFromKey(const QString &key);

} // namespace fourfold
