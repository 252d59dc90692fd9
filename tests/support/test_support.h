#pragma once
// Helpers shared by the test programs: temporary directories, reading and writing test files,
// and Catch2 printing of Fourfold's value types.

#include "core/model/error.h"
#include "core/model/text_range.h"

#include <QByteArray>
#include <QString>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

#include <ostream>

namespace fourfold::test {

// Writes `bytes` to `dir/name` and returns the file's path; fails the test if it cannot.
QString writeFile(const QTemporaryDir &dir, const QString &name, const QByteArray &bytes);
QByteArray readFile(const QString &path);
// Path of a file under tests/data.
QString dataPath(const QString &name);

} // namespace fourfold::test

QT_BEGIN_NAMESPACE
inline std::ostream &operator<<(std::ostream &os, const QString &s)
{
    return os << '"' << s.toStdString() << '"';
}
QT_END_NAMESPACE

namespace fourfold {
inline std::ostream &operator<<(std::ostream &os, const TextRange &r)
{
    return os << '[' << r.start << ", " << r.end << ')';
}
inline std::ostream &operator<<(std::ostream &os, const Error &e)
{
    return os << errorCodeName(e.code).toStdString() << ": " << e.toString().toStdString();
}
} // namespace fourfold
