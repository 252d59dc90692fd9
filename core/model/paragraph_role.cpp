#include "core/model/paragraph_role.h"

namespace fourfold {

QString paragraphRoleKey(ParagraphRole role)
{
    switch (role) {
    case ParagraphRole::Intro:
        return QStringLiteral("intro");
    case ParagraphRole::Body:
        return QStringLiteral("body");
    case ParagraphRole::Conclusion:
        return QStringLiteral("conclusion");
    }
    return {};
}

std::optional<ParagraphRole> paragraphRoleFromKey(const QString &key)
{
    for (ParagraphRole r : {ParagraphRole::Intro, ParagraphRole::Body, ParagraphRole::Conclusion})
        if (paragraphRoleKey(r) == key)
            return r;
    return std::nullopt;
}

ParagraphRole defaultParagraphRole(qsizetype index, qsizetype count)
{
    if (index == 0)
        return ParagraphRole::Intro;
    if (index == count - 1)
        return ParagraphRole::Conclusion;
    return ParagraphRole::Body;
}

} // namespace fourfold
