#pragma once
// The password files a team project's people log in with (libpq's password file format, one
// per person, private to its owner) and the passwords in them. No password goes anywhere else:
// the server receives SCRAM verifiers, project files the server without a password.

#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// A password of 24 letters and digits (about 143 bits) from the system's random source.
QString newPassword();
// A field of a password file: ':' and '\' escaped with '\' (PostgreSQL 15 documentation,
// 34.16 "The Password File").
QString pgpassField(QString value);
// The file name for a person's password file: the pseudonym when it makes a plain file name,
// else the role's name (letters, digits and _ only).
QString passwordFileName(const QString &pseudonym, const QString &role);
// Writes `text` to the new file `path` readable and writable by its owner only (Io if it exists
// or cannot be written; nothing is left behind).
Status writePrivateFile(const QString &path, const QByteArray &text);
// Creates `dir` with mode 0700, or takes an existing empty one (and sets 0700); `*created` tells
// which. Duplicate for a folder that is not empty (unless `mayHoldFiles`), InvalidArgument for a
// symbolic link.
Status prepareCredentialsDir(const QString &dir, bool *created, bool mayHoldFiles = false);

} // namespace fourfold
