// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runReport(const QStringList &)
{
    return usageError(QStringLiteral("report"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
