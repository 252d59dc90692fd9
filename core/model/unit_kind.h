#pragma once
// The units reliability is computed on: whole articles, the frozen segmentations of their text,
// passages of spans matched across coders, or the text as one continuum (unitizing alpha).

#include <QString>

#include <optional>

namespace fourfold {

enum class UnitKind { Article, Paragraph, Sentence, Token, Span, Continuum };
// "article", "paragraph", "sentence", "token", "span", "continuum"
QString unitKindKey(UnitKind kind);
std::optional<UnitKind> unitKindFromKey(const QString &key);

} // namespace fourfold
