#include "core/model/unit_kind.h"

namespace fourfold {

QString unitKindKey(UnitKind kind)
{
    switch (kind) {
    case UnitKind::Article:
        return QStringLiteral("article");
    case UnitKind::Paragraph:
        return QStringLiteral("paragraph");
    case UnitKind::Sentence:
        return QStringLiteral("sentence");
    case UnitKind::Token:
        return QStringLiteral("token");
    case UnitKind::Span:
        return QStringLiteral("span");
    case UnitKind::Continuum:
        return QStringLiteral("continuum");
    }
    return {};
}

std::optional<UnitKind> unitKindFromKey(const QString &key)
{
    for (UnitKind k : {UnitKind::Article, UnitKind::Paragraph, UnitKind::Sentence, UnitKind::Token,
             UnitKind::Span, UnitKind::Continuum})
        if (unitKindKey(k) == key)
            return k;
    return std::nullopt;
}

} // namespace fourfold
