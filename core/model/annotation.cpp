#include "core/model/annotation.h"

namespace fourfold {

QString phaseKey(Phase phase)
{
    switch (phase) {
    case Phase::Training:
        return QStringLiteral("training");
    case Phase::Pilot:
        return QStringLiteral("pilot");
    case Phase::Reliability:
        return QStringLiteral("reliability");
    case Phase::Production:
        return QStringLiteral("production");
    }
    return {};
}

std::optional<Phase> phaseFromKey(const QString &key)
{
    for (Phase p : {Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production})
        if (phaseKey(p) == key)
            return p;
    return std::nullopt;
}

} // namespace fourfold
