// PLACEHOLDER: replaced by the work that owns this subcommand.
#include "app/cli/cli_output.h"

namespace fourfold::cli {

int runExport(const QStringList &)
{
    return usageError(QStringLiteral("export"), QStringLiteral("not built yet."));
}

} // namespace fourfold::cli
