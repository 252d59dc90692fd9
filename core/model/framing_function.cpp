#include "core/model/framing_function.h"

namespace fourfold {

QString functionKey(FramingFunction f)
{
    switch (f) {
    case FramingFunction::Problem:
        return QStringLiteral("problem");
    case FramingFunction::Cause:
        return QStringLiteral("cause");
    case FramingFunction::Evaluation:
        return QStringLiteral("evaluation");
    case FramingFunction::Remedy:
        return QStringLiteral("remedy");
    }
    return {};
}

std::optional<FramingFunction> functionFromKey(const QString &key)
{
    const QString k = key.trimmed().toLower();
    for (FramingFunction f : kFramingFunctions)
        if (functionKey(f) == k)
            return f;
    return std::nullopt;
}

} // namespace fourfold
