#include "core/model/logging.h"

namespace fourfold {

// Debug and info messages are off unless QT_LOGGING_RULES turns them on; warnings and worse
// are always written.
Q_LOGGING_CATEGORY(lcModel, "fourfold.model", QtWarningMsg)
Q_LOGGING_CATEGORY(lcText, "fourfold.text", QtWarningMsg)
Q_LOGGING_CATEGORY(lcStore, "fourfold.store", QtWarningMsg)
Q_LOGGING_CATEGORY(lcIo, "fourfold.io", QtWarningMsg)
Q_LOGGING_CATEGORY(lcProject, "fourfold.project", QtWarningMsg)
Q_LOGGING_CATEGORY(lcAgreement, "fourfold.agreement", QtWarningMsg)
Q_LOGGING_CATEGORY(lcExtract, "fourfold.extract", QtWarningMsg)
Q_LOGGING_CATEGORY(lcScoring, "fourfold.scoring", QtWarningMsg)
Q_LOGGING_CATEGORY(lcExchange, "fourfold.exchange", QtWarningMsg)
Q_LOGGING_CATEGORY(lcDesktop, "fourfold.desktop", QtWarningMsg)
Q_LOGGING_CATEGORY(lcReport, "fourfold.report", QtWarningMsg)
Q_LOGGING_CATEGORY(lcCli, "fourfold.cli", QtWarningMsg)

void logError(const QLoggingCategory &category, const Error &error)
{
    if (!category.isWarningEnabled())
        return;
    QString where;
    if (!error.file.isEmpty())
        where = QStringLiteral(" at %1:%2:%3").arg(error.file).arg(error.line).arg(error.column);
    QMessageLogger(nullptr, 0, nullptr, category.categoryName()).warning()
        << errorCodeName(error.code) << error.message
        << (error.cause.isEmpty() ? QStringLiteral("(no cause)")
                                  : QStringLiteral("cause: %1").arg(error.cause))
        << where;
}

bool softAssert(bool holds, const QLoggingCategory &category, const char *expression,
    const char *file, int line)
{
    if (!holds && category.isCriticalEnabled())
        QMessageLogger(file, line, nullptr, category.categoryName()).critical().noquote()
            << "soft assertion failed:" << expression
            << QStringLiteral("(%1:%2)").arg(QString::fromUtf8(file)).arg(line);
    return holds;
}

} // namespace fourfold
