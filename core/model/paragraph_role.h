#pragma once
// The role of a paragraph in an article's structure: set from position at import (first
// paragraph intro, last conclusion, the rest body), changeable by the lead.

#include <QString>

#include <optional>

namespace fourfold {

enum class ParagraphRole { Intro = 0, Body = 1, Conclusion = 2 };

// "intro", "body", "conclusion".
QString paragraphRoleKey(ParagraphRole role);
std::optional<ParagraphRole> paragraphRoleFromKey(const QString &key);
// The default role of paragraph `index` among `count` paragraphs: one paragraph is intro; two
// are intro and conclusion; more have body paragraphs between them.
ParagraphRole defaultParagraphRole(qsizetype index, qsizetype count);

} // namespace fourfold
