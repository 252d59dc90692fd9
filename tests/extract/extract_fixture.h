#pragma once
// Constructed articles for the extractor tests (invented, demo-style), with offsets counted in
// code points as Python's str counts them.

#include "core/project/project.h"
#include "tests/project/project_fixture.h"

namespace fourfold::test {

// Three paragraphs; the first holds U+2019 and a ship emoji (two UTF-16 units, one code point).
// Paragraphs [0, 37), [39, 83), [85, 126); sentences [0, 37), [39, 83), [85, 117), [118, 126).
inline const QByteArray kFerryArticle =
    "{\"id\":\"ferry\",\"title\":\"Ferry\",\"language\":\"en\",\"text\":\"Brakwater\xe2\x80\x99s "
    "ferry \xf0\x9f\x9a\xa2 will stop in May.\\n\\nThe budget ran out after the council cut "
    "it.\\n\\nThe council must find the money. Act now.\"}\n";
// One paragraph, Dutch, [0, 27).
inline const QByteArray kDykeArticle =
    "{\"id\":\"dyke\",\"title\":\"Dijk\",\"language\":\"nl\",\"text\":\"De dijk is te laag "
    "gebouwd.\"}\n";

inline Article loadArticle(ProjectFixture &f, const QString &externalId)
{
    auto article = f.project.article(f.articleId(externalId));
    REQUIRE(article);
    return std::move(*article);
}

} // namespace fourfold::test
