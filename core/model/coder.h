#pragma once
// A person who codes or leads. Their name is personal data: exports use the pseudonym only.

#include "core/model/ids.h"

#include <QString>

#include <optional>

namespace fourfold {

enum class CoderRole { Coder, Lead };

QString coderRoleKey(CoderRole role); // "coder", "lead"
std::optional<CoderRole> coderRoleFromKey(const QString &key);

struct Coder {
    CoderId id;
    QString uuid;
    QString name; // display name, shown in the program only
    QString pseudonym; // e.g. "C01": the only identity written to exports
    CoderRole role = CoderRole::Coder;
    bool disabled = false; // keeps their codings; takes no new assignments and cannot sign in
};

} // namespace fourfold
