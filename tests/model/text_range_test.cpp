#include "core/model/framing_function.h"
#include "core/model/paragraph_role.h"
#include "core/model/text_range.h"
#include "tests/support/test_support.h"

using namespace fourfold;

TEST_CASE("TextRange is half-open")
{
    const TextRange r {2, 5};
    CHECK(r.length() == 3);
    CHECK(r.contains(2));
    CHECK(r.contains(4));
    CHECK_FALSE(r.contains(5));
    CHECK(r.overlaps(TextRange {4, 9}));
    CHECK_FALSE(r.overlaps(TextRange {5, 9})); // touching is not overlapping
    CHECK(r.intersect(TextRange {4, 9}) == TextRange {4, 5});
    CHECK_FALSE(r.intersect(TextRange {0, 2}).has_value());
    CHECK(r.contains(TextRange {2, 5}));
    CHECK_FALSE(r.contains(TextRange {1, 5}));
    CHECK_FALSE(TextRange {3, 2}.isValid());
}

TEST_CASE("framing function keys round-trip")
{
    for (FramingFunction f : kFramingFunctions)
        CHECK(functionFromKey(functionKey(f)) == f);
    CHECK(functionFromKey(QStringLiteral(" Remedy ")) == FramingFunction::Remedy);
    CHECK_FALSE(functionFromKey(QStringLiteral("solution")).has_value());
}

TEST_CASE("default paragraph roles come from position")
{
    CHECK(defaultParagraphRole(0, 1) == ParagraphRole::Intro);
    CHECK(defaultParagraphRole(0, 2) == ParagraphRole::Intro);
    CHECK(defaultParagraphRole(1, 2) == ParagraphRole::Conclusion);
    CHECK(defaultParagraphRole(1, 5) == ParagraphRole::Body);
    CHECK(defaultParagraphRole(4, 5) == ParagraphRole::Conclusion);
    CHECK(paragraphRoleFromKey(QStringLiteral("body")) == ParagraphRole::Body);
}
