// Annotations made under an older codebook version (core/project/outdated_annotations): flagged,
// with whether their function changed since.
#include "core/project/annotation_edits.h"
#include "core/project/codebook_versions.h"
#include "core/project/outdated_annotations.h"
#include "tests/project/study_fixture.h"

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("annotations under an older version are flagged and those whose function changed marked")
{
    StudyFixture f;
    const CoderId c1 = f.coder("C01");
    const CoderId c2 = f.coder("C02");
    const ArticleId a1 = f.articleId(QStringLiteral("a01"));
    const ArticleId a2 = f.articleId(QStringLiteral("a02"));
    AddAnnotationEdit problem(
        a2, c2, AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(problem));
    AddAnnotationEdit remedy(
        a1, c1, AnnotationContent {FramingFunction::Remedy, {6, 9}, {}, {}, {}});
    REQUIRE(f.project.apply(remedy));
    AddAnnotationEdit early(
        a1, c1, AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(early));
    CHECK(OutdatedAnnotations::list(f.project)->empty()); // all under the current version

    auto v1 = f.project.codebook();
    REQUIRE(v1);
    Codebook v2 = *v1;
    v2.functions[size_t(FramingFunction::Problem)].rules << QStringLiteral("A headline counts.");
    auto added = CodebookVersions::add(f.project, v2, QStringLiteral("Headlines"), f.lead);
    REQUIRE(added);

    // Ordered by article, coder, start; only problem's definition changed.
    auto outdated = OutdatedAnnotations::list(f.project);
    REQUIRE(outdated);
    REQUIRE(outdated->size() == 3);
    CHECK(outdated->at(0).article == QStringLiteral("a01"));
    CHECK(outdated->at(0).function == FramingFunction::Problem);
    CHECK(outdated->at(0).coder == QStringLiteral("C01"));
    CHECK(outdated->at(0).version == 1);
    CHECK(outdated->at(0).functionChanged);
    CHECK(outdated->at(1).article == QStringLiteral("a01"));
    CHECK(outdated->at(1).function == FramingFunction::Remedy);
    CHECK_FALSE(outdated->at(1).functionChanged);
    CHECK(outdated->at(2).article == QStringLiteral("a02"));
    CHECK(outdated->at(2).coder == QStringLiteral("C02"));
    CHECK(outdated->at(2).functionChanged);

    // A span made under version 2 is not outdated; a deleted one drops out.
    AddAnnotationEdit fresh(a1, c1, AnnotationContent {FramingFunction::Cause, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(fresh));
    CHECK(OutdatedAnnotations::list(f.project)->size() == 3);
    DeleteAnnotationEdit gone(early.annotationId(), c1);
    REQUIRE(f.project.apply(gone));
    CHECK(OutdatedAnnotations::list(f.project)->size() == 2);
}
