// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runAssign(const QStringList &)
{
    return usageError(QStringLiteral("assign"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
