// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runMerge(const QStringList &)
{
    return usageError(QStringLiteral("merge"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
