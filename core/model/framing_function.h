#pragma once
// Entman's (1993, p. 52) four framing functions, with Fourfold's short labels.

#include <QString>

#include <array>
#include <optional>

namespace fourfold {

enum class FramingFunction { Problem = 0, Cause = 1, Evaluation = 2, Remedy = 3 };

inline constexpr std::array<FramingFunction, 4> kFramingFunctions {FramingFunction::Problem,
    FramingFunction::Cause, FramingFunction::Evaluation, FramingFunction::Remedy};

// The short label used in files and the CLI: "problem", "cause", "evaluation", "remedy".
QString functionKey(FramingFunction f);
// Parses a short label (case-insensitive); nothing for anything else.
std::optional<FramingFunction> functionFromKey(const QString &key);

} // namespace fourfold
