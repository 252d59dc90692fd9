#include "core/model/error.h"

namespace fourfold {

QString Error::toString() const
{
    if (cause.isEmpty() || cause == message)
        return message;
    return QStringLiteral("%1 (%2)").arg(message, cause);
}

namespace {

// failAt's prefix: FILE[:LINE[:COLUMN]]: the sentence follows.
QString placePrefix(const QString &file, qint64 line, qint64 column)
{
    QString where = file;
    if (line > 0)
        where += QStringLiteral(":%1").arg(line);
    if (line > 0 && column > 0)
        where += QStringLiteral(":%1").arg(column);
    return where + QStringLiteral(": ");
}

} // namespace

std::unexpected<Error> failAt(
    ErrorCode code, const QString &file, qint64 line, qint64 column, const QString &what)
{
    Error e;
    e.code = code;
    e.message = placePrefix(file, line, column) + what;
    e.file = file;
    e.line = line;
    e.column = column;
    return std::unexpected<Error>(std::move(e));
}

Error movedDown(Error error, qint64 lines)
{
    const QString prefix = placePrefix(error.file, error.line, error.column);
    if (error.line <= 0 || !error.message.startsWith(prefix))
        return error;
    error.line += lines;
    error.message =
        placePrefix(error.file, error.line, error.column) + error.message.sliced(prefix.size());
    return error;
}

QString errorCodeName(ErrorCode code)
{
    switch (code) {
    case ErrorCode::InvalidArgument:
        return QStringLiteral("invalid-argument");
    case ErrorCode::NotFound:
        return QStringLiteral("not-found");
    case ErrorCode::InvalidInput:
        return QStringLiteral("invalid-input");
    case ErrorCode::Duplicate:
        return QStringLiteral("duplicate");
    case ErrorCode::Io:
        return QStringLiteral("io");
    case ErrorCode::Busy:
        return QStringLiteral("busy");
    case ErrorCode::Constraint:
        return QStringLiteral("constraint");
    case ErrorCode::Corrupt:
        return QStringLiteral("corrupt");
    case ErrorCode::NewerSchema:
        return QStringLiteral("newer-schema");
    case ErrorCode::Unsupported:
        return QStringLiteral("unsupported");
    case ErrorCode::Cancelled:
        return QStringLiteral("cancelled");
    case ErrorCode::NotAllowed:
        return QStringLiteral("not-allowed");
    case ErrorCode::Internal:
        return QStringLiteral("internal");
    }
    return QStringLiteral("internal");
}

} // namespace fourfold
