// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runHandout(const QStringList &)
{
    return usageError(QStringLiteral("handout"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
