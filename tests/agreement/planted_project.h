#pragma once
// A generated project with a planted bad coder, a planted boundary habit and a planted bad
// article, shared by the diagnostics tests and the reliability window tests.

#include "core/project/annotation_edits.h"
#include "tests/project/project_fixture.h"

namespace fourfold::test {

// Six invented articles of six sentences each, coded by four coders in the reliability phase.
// The true coding of a normal article: sentence 1 problem, 3 cause, 5 remedy, each span
// leaving out the last 10 code points of its sentence. Planted:
// - C02 codes the cause sentence as a problem (a function confusion);
// - C04 always takes the whole sentence: 10 code points longer (a boundary habit);
// - article "a5": every coder marks a different sentence as a problem (a bad article).
struct PlantedProject : ProjectFixture {
    std::vector<ArticleId> articles;
    std::vector<CoderId> coders;
    PlantedProject()
    {
        QByteArray jsonl;
        for (int a = 1; a <= 6; ++a) {
            QString text;
            for (int s = 1; s <= 6; ++s)
                text += QStringLiteral("Sentence %1 of the piece %2 talks about the harbour of "
                                       "Brakwater. ")
                            .arg(s)
                            .arg(a);
            jsonl += QStringLiteral("{\"id\":\"a%1\",\"title\":\"Piece %1\",\"language\":\"en\","
                                    "\"text\":\"%2\"}\n")
                         .arg(a)
                         .arg(text.trimmed())
                         .toUtf8();
        }
        importJsonl(jsonl);
        for (int c = 1; c <= 4; ++c)
            coders.push_back(addCoder(QStringLiteral("C0%1").arg(c)));
        for (int a = 1; a <= 6; ++a) {
            const ArticleId id = articleId(QStringLiteral("a%1").arg(a));
            articles.push_back(id);
            auto article = project.article(id);
            REQUIRE(article);
            REQUIRE(article->sentences.size() == 6);
            for (size_t c = 0; c < 4; ++c) {
                REQUIRE(project.assign(id, coders[c], Phase::Reliability));
                markDone(project, id, coders[c]);
                auto span = [&](int sentence, FramingFunction f) {
                    TextRange r = article->sentences[size_t(sentence - 1)];
                    if (c != 3)
                        r.end -= 10;
                    AddAnnotationEdit edit(
                        id, coders[c], AnnotationContent {f, r, {}, {}, {}}, Phase::Reliability);
                    REQUIRE(project.apply(edit));
                };
                if (a == 5) {
                    span(int(c) + 1, FramingFunction::Problem);
                    continue;
                }
                span(1, FramingFunction::Problem);
                span(3, c == 1 ? FramingFunction::Problem : FramingFunction::Cause);
                span(5, FramingFunction::Remedy);
            }
        }
    }
};

} // namespace fourfold::test
