// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runExtract(const QStringList &)
{
    return usageError(QStringLiteral("extract"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
