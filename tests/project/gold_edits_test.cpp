#include "core/project/annotation_edits.h"
#include "core/project/gold_edits.h"
#include "core/project/testing/project_database.h"
#include "project_fixture.h"
#include "tests/support/db_dump.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct GoldFixture : ProjectFixture {
    ArticleId f1, f2;
    CoderId c1, lead;
    AnnotationId span;
    GoldFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        f2 = articleId(QStringLiteral("f2"));
        c1 = addCoder(QStringLiteral("C01"));
        auto l =
            addOlderLeadForTesting(project, QStringLiteral("Test lead"), QStringLiteral("L01"));
        REQUIRE(l);
        lead = *l;
        AddAnnotationEdit add(
            f1, c1, AnnotationContent {FramingFunction::Cause, {41, 73}, {}, {}, {}});
        REQUIRE(project.apply(add));
        span = add.annotationId();
    }
};

} // namespace

TEST_CASE("a lead's gold span keeps its provenance and leaves the raw coding untouched")
{
    GoldFixture f;
    const QString rawBefore = dumpDatabase(databaseForTesting(f.project),
        {QStringLiteral("event_log"), QStringLiteral("gold_annotation"),
            QStringLiteral("gold_source")});
    const QString before = dumpDatabase(databaseForTesting(f.project));
    // Merged boundaries: the lead narrows the coder's sentence to the attribution itself.
    AdjudicateSpanEdit edit(f.f1, f.lead,
        AnnotationContent {FramingFunction::Cause, {55, 72},
            {{QStringLiteral("actor"), QStringLiteral("budget")}}, {}, {}},
        {f.span}, QStringLiteral("Only the attribution, not who says it."));
    REQUIRE(f.project.apply(edit));
    auto gold = f.project.goldAnnotations(f.f1);
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    const GoldAnnotation &g = (*gold)[0];
    CHECK(g.quote == QStringLiteral("blames the budget"));
    CHECK(g.decidedBy == f.lead);
    CHECK(g.sources == std::vector<AnnotationId> {f.span});
    CHECK(g.rationale == QStringLiteral("Only the attribution, not who says it."));
    // The coder's own annotation is exactly as it was.
    CHECK(dumpDatabase(databaseForTesting(f.project),
              {QStringLiteral("event_log"), QStringLiteral("gold_annotation"),
                  QStringLiteral("gold_source")})
        == rawBefore);

    WithdrawGoldEdit withdraw(g.id, f.lead);
    REQUIRE(f.project.apply(withdraw));
    CHECK(f.project.goldAnnotations(f.f1)->empty());
    REQUIRE(f.project.revert(withdraw));
    CHECK(f.project.goldAnnotations(f.f1)->size() == 1);
    REQUIRE(f.project.revert(edit));
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}

TEST_CASE("gold is decided by leads only, from spans of the same article")
{
    GoldFixture f;
    AdjudicateSpanEdit byCoder(
        f.f1, f.c1, AnnotationContent {FramingFunction::Cause, {41, 73}, {}, {}, {}}, {f.span}, {});
    auto st = f.project.apply(byCoder);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
    AdjudicateSpanEdit otherArticle(
        f.f2, f.lead, AnnotationContent {FramingFunction::Cause, {0, 5}, {}, {}, {}}, {f.span}, {});
    st = f.project.apply(otherArticle);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
    CHECK(f.project.goldAnnotations()->empty());
}
