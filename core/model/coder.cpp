#include "core/model/coder.h"

namespace fourfold {

QString coderRoleKey(CoderRole role)
{
    return role == CoderRole::Lead ? QStringLiteral("lead") : QStringLiteral("coder");
}

std::optional<CoderRole> coderRoleFromKey(const QString &key)
{
    if (key == QLatin1String("coder"))
        return CoderRole::Coder;
    if (key == QLatin1String("lead"))
        return CoderRole::Lead;
    return std::nullopt;
}

} // namespace fourfold
