#pragma once
// Invented articles and fixtures shared by the study-design tests.

#include "core/project/annotation_edits.h"
#include "tests/project/project_fixture.h"

namespace fourfold::test {

// 20 invented articles: outlets A (10), B (6), C (4); languages en (12), nl (8); topics ferry
// (9), wind (7), none (4). Ids a01..a20, so the frame order is the id order.
inline QByteArray twentyArticles()
{
    QByteArray out;
    for (int i = 1; i <= 20; ++i) {
        const char *outlet = i <= 10 ? "A" : i <= 16 ? "B" : "C";
        const char *language = i % 5 < 3 ? "en" : "nl";
        const QByteArray topic = i <= 9 ? "\"meta\":{\"topic\":\"ferry\"},"
            : i <= 16                   ? "\"meta\":{\"topic\":\"wind\"},"
                                        : "";
        out += QStringLiteral("{\"id\":\"a%1\",\"title\":\"Story %2\",\"outlet\":\"%3\","
                              "\"language\":\"%4\",")
                   .arg(i, 2, 10, QLatin1Char('0'))
                   .arg(i)
                   .arg(QLatin1String(outlet), QLatin1String(language))
                   .toUtf8()
            + topic
            + QStringLiteral("\"text\":\"Story %1 begins here. It has a second sentence.\\n\\nA "
                             "new paragraph ends it.\"}\n")
                  .arg(i)
                  .toUtf8();
    }
    return out;
}

// The twenty articles, four coders C01–C04 and a lead L01.
struct StudyFixture : ProjectFixture {
    StudyFixture()
    {
        importJsonl(twentyArticles());
        for (const char *p : {"C01", "C02", "C03", "C04"})
            addCoder(QString::fromLatin1(p));
        lead = addCoder(QStringLiteral("L01"), CoderRole::Lead);
    }
    CoderId coder(const char *pseudonym)
    {
        auto c = project.coderByPseudonym(QString::fromLatin1(pseudonym));
        REQUIRE(c);
        REQUIRE(c->has_value());
        return (*c)->id;
    }
    CoderId lead;
};

// One invented article of exactly ten sentences in one paragraph.
inline const QByteArray kTenSentences =
    "{\"id\":\"t1\",\"title\":\"Ten\",\"language\":\"en\",\"text\":\"Alpha is the first. Bravo "
    "is the second. Charlie is the third. Delta is the fourth. Echo is the fifth. Foxtrot is the "
    "sixth. Golf is the seventh. Hotel is the eighth. India is the ninth. Juliet is the "
    "tenth.\"}\n";

struct TenFixture : ProjectFixture {
    TenFixture()
    {
        importJsonl(kTenSentences);
        article = articleId(QStringLiteral("t1"));
        auto a = project.article(article);
        REQUIRE(a);
        sentences = a->sentences;
        REQUIRE(sentences.size() == 10);
    }
    // Marks sentences (1-based) with function `f` for `coder`.
    void mark(CoderId coder, FramingFunction f, std::initializer_list<int> which, Phase phase)
    {
        for (int s : which) {
            AddAnnotationEdit e(
                article, coder, AnnotationContent {f, sentences[size_t(s - 1)], {}, {}, {}}, phase);
            REQUIRE(project.apply(e));
        }
    }
    // Coder: problem 1,2,4; cause 6; evaluation 5. Master: problem 1,2,3; evaluation 5.
    void codeBoth(CoderId coder, CoderId master, Phase phase)
    {
        mark(coder, FramingFunction::Problem, {1, 2, 4}, phase);
        mark(coder, FramingFunction::Cause, {6}, phase);
        mark(coder, FramingFunction::Evaluation, {5}, phase);
        mark(master, FramingFunction::Problem, {1, 2, 3}, phase);
        mark(master, FramingFunction::Evaluation, {5}, phase);
    }
    ArticleId article;
    std::vector<TextRange> sentences;
};

} // namespace fourfold::test
