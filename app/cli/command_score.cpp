// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runScore(const QStringList &)
{
    return usageError(QStringLiteral("score"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
