// The position baseline on constructed articles. The rule (opening paragraph = problem, closing
// paragraph = remedy) is common practice of news writing, not a published model; the offsets
// below are code points, counted as Python's str counts them.
#include "core/extract/position_baseline.h"
#include "tests/extract/extract_fixture.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct Expected {
    FramingFunction function;
    TextRange range;
};

void checkSpans(const std::vector<ExtractedSpan> &spans, ArticleId article,
    const std::vector<Expected> &expected)
{
    REQUIRE(spans.size() == expected.size());
    for (size_t i = 0; i < spans.size(); ++i) {
        INFO("span " << i);
        CHECK(spans[i].article == article);
        CHECK(spans[i].function == expected[i].function);
        CHECK(spans[i].range == expected[i].range);
        CHECK_FALSE(spans[i].score.has_value());
        CHECK(spans[i].attributes.isEmpty());
    }
}

} // namespace

TEST_CASE("position baseline: the opening paragraph is the problem, the closing one the remedy")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle);
    const Article article = loadArticle(f, QStringLiteral("ferry"));
    auto baseline = PositionBaseline::create();
    REQUIRE(baseline);
    auto spans = baseline->extract({article});
    REQUIRE(spans);
    // [0, 37) ends after the emoji's paragraph; in UTF-16 it would be [0, 38).
    checkSpans(*spans, article.summary.id,
        {{FramingFunction::Problem, {0, 37}}, {FramingFunction::Remedy, {85, 126}}});
    CHECK(baseline->parameters()
        == QJsonObject {{QStringLiteral("intro"), QStringLiteral("problem")},
            {QStringLiteral("body"), QStringLiteral("none")},
            {QStringLiteral("conclusion"), QStringLiteral("remedy")},
            {QStringLiteral("unit"), QStringLiteral("paragraph")}});
}

TEST_CASE("position baseline: tuned by parameters")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle);
    const Article article = loadArticle(f, QStringLiteral("ferry"));

    SECTION("body paragraphs as cause, one span per sentence")
    {
        auto baseline = PositionBaseline::create({{QStringLiteral("body"), QStringLiteral("cause")},
            {QStringLiteral("unit"), QStringLiteral("sentence")}});
        REQUIRE(baseline);
        auto spans = baseline->extract({article});
        REQUIRE(spans);
        checkSpans(*spans, article.summary.id,
            {{FramingFunction::Problem, {0, 37}}, {FramingFunction::Cause, {39, 83}},
                {FramingFunction::Remedy, {85, 117}}, {FramingFunction::Remedy, {118, 126}}});
    }
    SECTION("a role mapped to none gives no span; function names ignore case")
    {
        auto baseline = PositionBaseline::create({{QStringLiteral("intro"), QStringLiteral("none")},
            {QStringLiteral("conclusion"), QStringLiteral("Evaluation")}});
        REQUIRE(baseline);
        CHECK(baseline->parameters().value(QStringLiteral("conclusion")).toString()
            == QStringLiteral("evaluation"));
        auto spans = baseline->extract({article});
        REQUIRE(spans);
        checkSpans(*spans, article.summary.id, {{FramingFunction::Evaluation, {85, 126}}});
    }
}

TEST_CASE("position baseline: follows the stored paragraph roles, not the position")
{
    ProjectFixture f;
    f.importJsonl(kFerryArticle + kDykeArticle);
    Article ferry = loadArticle(f, QStringLiteral("ferry"));
    // A lead has marked the middle paragraph as the conclusion too.
    ferry.paragraphs[1].role = ParagraphRole::Conclusion;
    const Article dyke = loadArticle(f, QStringLiteral("dyke"));
    REQUIRE(dyke.paragraphs.size() == 1);
    CHECK(dyke.paragraphs[0].role == ParagraphRole::Intro);

    auto baseline = PositionBaseline::create();
    REQUIRE(baseline);
    auto spans = baseline->extract({ferry, dyke});
    REQUIRE(spans);
    REQUIRE(spans->size() == 4);
    checkSpans({spans->begin(), spans->begin() + 3}, ferry.summary.id,
        {{FramingFunction::Problem, {0, 37}}, {FramingFunction::Remedy, {39, 83}},
            {FramingFunction::Remedy, {85, 126}}});
    // A one-paragraph article has only an intro: the problem, nothing else.
    checkSpans(
        {spans->begin() + 3, spans->end()}, dyke.summary.id, {{FramingFunction::Problem, {0, 27}}});
}

TEST_CASE("position baseline: bad parameters are refused with the parameter named")
{
    struct Row {
        QJsonObject parameters;
        const char *message;
    };
    const std::vector<Row> rows {
        {{{QStringLiteral("intro"), QStringLiteral("frame")}},
            "parameter \"intro\" of the position extractor must be problem, cause, evaluation, "
            "remedy or none, got \"frame\"."},
        {{{QStringLiteral("unit"), QStringLiteral("word")}},
            "parameter \"unit\" of the position extractor must be paragraph or sentence, got "
            "\"word\"."},
        {{{QStringLiteral("unit"), 3}},
            "parameter \"unit\" of the position extractor must be a string, got a number."},
        {{{QStringLiteral("lead"), QStringLiteral("problem")}},
            "the position extractor has no parameter \"lead\"; its parameters are body, "
            "conclusion, intro, unit."},
    };
    for (const Row &row : rows) {
        auto baseline = PositionBaseline::create(row.parameters);
        REQUIRE_FALSE(baseline);
        CHECK(baseline.error().code == ErrorCode::InvalidArgument);
        CHECK(baseline.error().message == QString::fromUtf8(row.message));
    }
}
