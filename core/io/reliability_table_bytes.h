#pragma once
// The common case of a reliability matrix read straight from the file's bytes: labels found by
// their UTF-8 bytes (no string per cell), unit ids widened into one reused buffer. It takes only
// files that the decoded reading (readReliabilityTableDecoded) takes too, and gives the same
// table; anything else (invalid UTF-8, a NUL byte, bad quoting, a header or row that reading
// refuses) gives nothing, and the decoded reading then says what is wrong.

#include "core/model/reliability_table.h"

#include <QString>

#include <optional>
#include <string_view>

namespace fourfold {

std::optional<ReliabilityTable> readReliabilityTableBytes(
    std::string_view bytes, const QString &path);

} // namespace fourfold
