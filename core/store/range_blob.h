#pragma once
// Compact storage of many code-point ranges: little-endian int32 (start, end) pairs.

#include "core/model/error.h"
#include "core/model/text_range.h"

#include <QByteArray>

#include <vector>

namespace fourfold {

QByteArray encodeRanges(const std::vector<TextRange> &ranges);
// Fails with Corrupt if the blob's size is not a multiple of 8.
Result<std::vector<TextRange>> decodeRanges(const QByteArray &blob);

} // namespace fourfold
