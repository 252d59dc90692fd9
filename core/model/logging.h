#pragma once
// Logging: one category per folder ("fourfold.<folder>"), the full error (with its raw cause)
// for logs and bug reports, and a soft assertion that logs a broken invariant and lets the
// caller recover instead of stopping the program. Enable the details with QT_LOGGING_RULES,
// e.g. QT_LOGGING_RULES="fourfold.*.debug=true".

#include "core/model/error.h"

#include <QLoggingCategory>

namespace fourfold {

Q_DECLARE_LOGGING_CATEGORY(lcModel)
Q_DECLARE_LOGGING_CATEGORY(lcText)
Q_DECLARE_LOGGING_CATEGORY(lcStore)
Q_DECLARE_LOGGING_CATEGORY(lcIo)
Q_DECLARE_LOGGING_CATEGORY(lcProject)
Q_DECLARE_LOGGING_CATEGORY(lcAgreement)
Q_DECLARE_LOGGING_CATEGORY(lcExtract)
Q_DECLARE_LOGGING_CATEGORY(lcScoring)
Q_DECLARE_LOGGING_CATEGORY(lcExchange)
Q_DECLARE_LOGGING_CATEGORY(lcDesktop)
Q_DECLARE_LOGGING_CATEGORY(lcReport)
Q_DECLARE_LOGGING_CATEGORY(lcCli)

// Logs `error` as a warning in `category`: its code, message, raw cause and place in a file.
void logError(const QLoggingCategory &category, const Error &error);

// The soft assertion's work: when `holds` is false, logs "soft assertion failed: EXPR (FILE:LINE)"
// as critical in `category`. Returns `holds`.
bool softAssert(bool holds, const QLoggingCategory &category, const char *expression,
    const char *file, int line);

} // namespace fourfold

// Checks an invariant whose failure the program can survive: logs it when it does not hold and
// yields whether it holds, so the caller recovers, e.g.
//   if (!FOURFOLD_SOFT_ASSERT(lcDesktop(), span.range.end <= length)) continue;
#define FOURFOLD_SOFT_ASSERT(category, condition)                                                  \
    (::fourfold::softAssert(bool(condition), (category), #condition, __FILE__, __LINE__))
