#pragma once
// Errors are values: every fallible core call returns Result<T> = std::expected<T, Error>.

#include <QString>

#include <expected>

namespace fourfold {

// What kind of failure, so that a front end can branch on it.
enum class ErrorCode {
    InvalidArgument, // the caller passed something that cannot be right (bad range, unknown id)
    NotFound, // a named object does not exist
    InvalidInput, // a file or record is malformed (bad UTF-8, bad JSON, missing field...)
    Duplicate, // an id or text that must be unique is already there
    Io, // a file could not be opened, read or written
    Busy, // the project file is locked by another writer
    Constraint, // the database refused a change (foreign key, unique, check)
    Corrupt, // the project file is damaged or not a Fourfold project
    NewerSchema, // the project file was written by a newer Fourfold
    Unsupported, // a valid request this version cannot serve
    Cancelled, // the user stopped a long operation; nothing was changed
    NotAllowed, // the person may not do this (not a lead, a wrong passphrase, a coder copy)
    Internal, // a bug: an invariant did not hold
};

// One failure: a code, one translated sentence naming the object (file, line, article),
// and the raw cause (SQLite's message, a parser's message) for logs and bug reports.
struct Error {
    ErrorCode code = ErrorCode::Internal;
    QString message;
    QString cause;
    // Where in an input file, when the failure is about one (0 = not known / not applicable).
    QString file;
    qint64 line = 0;
    qint64 column = 0;

    // The sentence and, when present, the raw cause in brackets; for one-line CLI output.
    QString toString() const;
};

template<typename T>
using Result = std::expected<T, Error>;

using Status = std::expected<void, Error>;

// An input-file failure: the message is prefixed "FILE:LINE:COLUMN: " (column and line left out
// when 0), and the location is kept in the fields as well.
std::unexpected<Error> failAt(
    ErrorCode code, const QString &file, qint64 line, qint64 column, const QString &what);

// The same failure `lines` lines further down: for a reader that hands a piece of a file that
// begins on line `lines` + 1 to a function counting the piece's lines from 1. An error made by
// failAt with a line gets the new line in its field and its message; any other is returned as
// it is.
Error movedDown(Error error, qint64 lines);

// Shorthand for `return fail(ErrorCode::X, tr("..."))` inside functions returning Result<T>.
inline std::unexpected<Error> fail(ErrorCode code, QString message, QString cause = {})
{
    Error e;
    e.code = code;
    e.message = std::move(message);
    e.cause = std::move(cause);
    return std::unexpected<Error>(std::move(e));
}

// The stable machine name of a code ("invalid-input"), for JSON output and tests.
QString errorCodeName(ErrorCode code);

} // namespace fourfold

// Returns early from a function returning Result<T> or Status when `expr` (a Result or Status)
// holds an error: FOURFOLD_TRY_STATUS(store::appendEvent(...)). Each use names its result
// apart (__COUNTER__), so that a use inside a lambda within another's `expr` shadows nothing.
#define FOURFOLD_TRY_STATUS(expr) FOURFOLD_TRY_STATUS_NUMBERED(expr, __COUNTER__)
// Two steps, so that __COUNTER__ becomes its number before ## joins it to the name.
#define FOURFOLD_TRY_STATUS_NUMBERED(expr, n) FOURFOLD_TRY_STATUS_NAMED(expr, n)
#define FOURFOLD_TRY_STATUS_NAMED(expr, n) FOURFOLD_TRY_STATUS_AS(expr, fourfoldTryResult##n)
#define FOURFOLD_TRY_STATUS_AS(expr, name)                                                         \
    do {                                                                                           \
        if (auto name = (expr); !name)                                                             \
            return std::unexpected(name.error());                                                  \
    } while (false)
