#include "core/agreement/agreement_report.h"
#include "core/agreement/project_units.h"
#include "core/project/annotation_edits.h"
#include "core/project/gold_answer_edits.h"
#include "core/project/gold_edits.h"
#include "tests/project/project_fixture.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

// f1: "The ferry to Brakwater will stop in May. Dr. Ilse Varn blames the budget.\n\n
//      The council must find the money. It is a disgrace."
// Sentences: [0,40) [41,73) [75,107) [108,125).
struct UnitsFixture : ProjectFixture {
    ArticleId f1, f2;
    CoderId c1, c2, c3;
    UnitsFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        f2 = articleId(QStringLiteral("f2"));
        c1 = addCoder(QStringLiteral("C01"));
        c2 = addCoder(QStringLiteral("C02"));
        c3 = addCoder(QStringLiteral("C03"));
        REQUIRE(project.assign(f1, c1, Phase::Reliability));
        REQUIRE(project.assign(f1, c2, Phase::Reliability));
        REQUIRE(project.assign(f2, c3, Phase::Reliability));
        add(f1, c1, FramingFunction::Problem, {0, 40});
        add(f1, c1, FramingFunction::Cause, {55, 72});
        add(f1, c2, FramingFunction::Problem, {4, 22}); // inside sentence 1
        add(f1, c2, FramingFunction::Remedy, {75, 107});
        add(f1, c2, FramingFunction::Evaluation, {100, 115}); // crosses sentences 3 and 4
        add(f2, c3, FramingFunction::Evaluation, {0, 10});
        markDone(project, f1, c1);
        markDone(project, f1, c2);
        markDone(project, f2, c3);
    }
    void add(ArticleId a, CoderId c, FramingFunction f, TextRange r)
    {
        AddAnnotationEdit edit(a, c, AnnotationContent {f, r, {}, {}, {}}, Phase::Reliability);
        REQUIRE(project.apply(edit));
    }
};

} // namespace

TEST_CASE("sentence units: presence of one function, and missing where a coder did not code")
{
    UnitsFixture f;
    UnitSelection s;
    s.unit = UnitKind::Sentence;
    s.function = FramingFunction::Problem;
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    CHECK(t->coders
        == QStringList {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")});
    // f1 has 4 sentences; f2 (3 sentences, "bijv." does not end one) was coded by C03 alone:
    // nothing pairs there, so it gives no units.
    REQUIRE(t->unitCount() == 4);
    CHECK(t->unitId(0) == QStringLiteral("f1#s1"));
    CHECK(t->rowText(0)
        == QStringList {QStringLiteral("present"), QStringLiteral("present"), QString()});
    CHECK(t->rowText(1)
        == QStringList {QStringLiteral("absent"), QStringLiteral("absent"), QString()});
    // C03 did not code f1: missing there, never "absent".
    CHECK(t->rowText(3)
        == QStringList {QStringLiteral("absent"), QStringLiteral("absent"), QString()});
}

TEST_CASE("sentence units with all functions hold the set of functions")
{
    UnitsFixture f;
    UnitSelection s;
    s.unit = UnitKind::Sentence;
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    CHECK(t->rowText(1) == QStringList {QStringLiteral("cause"), QStringLiteral("{}"), QString()});
    CHECK(t->rowText(2)
        == QStringList {QStringLiteral("{}"), QStringLiteral("evaluation|remedy"), QString()});
    CHECK(t->rowText(3)
        == QStringList {QStringLiteral("{}"), QStringLiteral("evaluation"), QString()});
    CHECK(t->unitCount() == 4); // f2, coded by C03 alone, gives none
}

TEST_CASE("paragraph and token units; coders can be chosen")
{
    UnitsFixture f;
    UnitSelection s;
    s.unit = UnitKind::Paragraph;
    s.function = FramingFunction::Remedy;
    s.coders = {QStringLiteral("C02"), QStringLiteral("C01")};
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    CHECK(t->coders == QStringList {QStringLiteral("C02"), QStringLiteral("C01")});
    // f1's two paragraphs (f2 was coded by neither C01 nor C02, so it has no units).
    REQUIRE(t->unitIds() == QStringList {QStringLiteral("f1#p1"), QStringLiteral("f1#p2")});
    CHECK(t->rowText(1) == QStringList {QStringLiteral("present"), QStringLiteral("absent")});

    s.unit = UnitKind::Token;
    s.function = FramingFunction::Problem;
    auto tokens = unitTable(f.project, s);
    REQUIRE(tokens);
    // Tokens "The ferry to Brakwater will stop in May ." — C02's span [4,22) covers
    // ferry..Brakwater.
    CHECK(tokens->rowText(0) == QStringList {QStringLiteral("absent"), QStringLiteral("present")});
    CHECK(tokens->rowText(1) == QStringList {QStringLiteral("present"), QStringLiteral("present")});
    CHECK(tokens->rowText(4) == QStringList {QStringLiteral("absent"), QStringLiteral("present")});
}

TEST_CASE("article units carry the answers to an item")
{
    UnitsFixture f;
    SetJudgementEdit a(f.f1, f.c1, QStringLiteral("dominant_function"), QStringLiteral("problem"),
        Phase::Reliability);
    SetJudgementEdit b(f.f1, f.c2, QStringLiteral("dominant_function"), QStringLiteral("remedy"),
        Phase::Reliability);
    REQUIRE(f.project.apply(a));
    REQUIRE(f.project.apply(b));
    UnitSelection s;
    s.unit = UnitKind::Article;
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    // f2, which C03 alone finished, has nothing to pair.
    REQUIRE(t->unitIds() == QStringList {QStringLiteral("f1")});
    CHECK(t->rowText(0)
        == QStringList {QStringLiteral("problem"), QStringLiteral("remedy"), QString()});
}

TEST_CASE("the continuum holds the articles every coder coded, with merged spans")
{
    UnitsFixture f;
    f.add(f.f1, f.c1, FramingFunction::Problem, {30, 50}); // overlaps C01's [0,40): merged
    UnitSelection s;
    s.unit = UnitKind::Continuum;
    s.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    auto c = continuumData(f.project, s);
    REQUIRE(c);
    CHECK(c->articles == QStringList {QStringLiteral("f1")});
    CHECK(c->length == 125);
    int problemUnitsOfC01 = 0;
    for (const auto &u : c->units)
        if (u.coder == 0 && u.category == int(FramingFunction::Problem)) {
            ++problemUnitsOfC01;
            CHECK(u.begin == 0);
            CHECK(u.end == 50);
        }
    CHECK(problemUnitsOfC01 == 1);

    s.coders.clear();
    auto none = continuumData(f.project, s); // C03 coded only f2, the others only f1
    REQUIRE_FALSE(none);
    CHECK(none.error().code == ErrorCode::NotFound);
}

TEST_CASE("fewer than two coders or an unknown coder are refused")
{
    UnitsFixture f;
    UnitSelection s;
    s.coders = {QStringLiteral("C01")};
    auto one = unitTable(f.project, s);
    REQUIRE_FALSE(one);
    CHECK(one.error().code == ErrorCode::InvalidArgument);
    s.coders = {QStringLiteral("C01"), QStringLiteral("C99")};
    auto unknown = unitTable(f.project, s);
    REQUIRE_FALSE(unknown);
    CHECK(unknown.error().code == ErrorCode::NotFound);
}

TEST_CASE("span units compare an attribute on passages matched across coders")
{
    UnitsFixture f;
    auto add = [&](CoderId c, TextRange r, const char *polarity) {
        AnnotationContent content {FramingFunction::Evaluation, r, {}, {}, {}};
        if (polarity)
            content.attributes.insert(QStringLiteral("polarity"), QString::fromLatin1(polarity));
        AddAnnotationEdit edit(f.f1, c, content, Phase::Reliability);
        REQUIRE(f.project.apply(edit));
    };
    // The fixture's C02 evaluation [100,115) has no polarity. Passage 1: C01 [0,30) negative and
    // C02 [10,40) neutral overlap; passage 2 is C01's [41,50) alone; passage 3 joins C01's
    // [108,125) positive with C02's [100,115), whose empty polarity is missing.
    add(f.c1, {0, 30}, "negative");
    add(f.c2, {10, 40}, "neutral");
    add(f.c1, {108, 125}, "positive");
    add(f.c1, {41, 50}, "negative");
    UnitSelection s;
    s.unit = UnitKind::Span;
    s.function = FramingFunction::Evaluation;
    s.attribute = QStringLiteral("polarity");
    s.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    REQUIRE(t->unitIds()
        == QStringList {QStringLiteral("f1#a1"), QStringLiteral("f1#a2"), QStringLiteral("f1#a3")});
    CHECK(t->rowText(0) == QStringList {QStringLiteral("negative"), QStringLiteral("neutral")});
    CHECK(t->rowText(1) == QStringList {QStringLiteral("negative"), QString()});
    CHECK(t->rowText(2) == QStringList {QStringLiteral("positive"), QString()});

    s.attribute.clear();
    auto refused = unitTable(f.project, s);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("the gold standard can join as one more coder")
{
    UnitsFixture f;
    auto lead =
        addOlderLeadForTesting(f.project, QStringLiteral("Test lead"), QStringLiteral("L01"));
    REQUIRE(lead);
    AdjudicateSpanEdit gold(
        f.f1, *lead, AnnotationContent {FramingFunction::Problem, {0, 40}, {}, {}, {}}, {}, {});
    REQUIRE(f.project.apply(gold));
    UnitSelection s;
    s.unit = UnitKind::Sentence;
    s.function = FramingFunction::Problem;
    s.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
    s.includeGold = true;
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    CHECK(t->coders
        == QStringList {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("gold")});
    CHECK(t->rowText(0)
        == QStringList {
            QStringLiteral("present"), QStringLiteral("present"), QStringLiteral("present")});
    CHECK(t->rowText(1)
        == QStringList {
            QStringLiteral("absent"), QStringLiteral("absent"), QStringLiteral("absent")});
}

TEST_CASE("one verdict for alpha: Krippendorff's 0.800 and 0.667")
{
    // Krippendorff (2004), Content Analysis 2nd ed., §12.2: rely on alpha ≥ 0.800, tentative
    // conclusions from 0.667; the bands include their lower bounds.
    CHECK(alphaBand(std::nullopt) == AlphaBand::Undefined);
    CHECK(alphaBand(1.0) == AlphaBand::Reliable);
    CHECK(alphaBand(0.800) == AlphaBand::Reliable);
    CHECK(alphaBand(0.7999) == AlphaBand::Tentative);
    CHECK(alphaBand(0.667) == AlphaBand::Tentative);
    CHECK(alphaBand(0.6669) == AlphaBand::Unreliable);
    CHECK(alphaBand(-0.2) == AlphaBand::Unreliable);
    CHECK(alphaVerdict(0.75) == QStringLiteral("tentative conclusions only (0.667–0.800)"));
}

TEST_CASE("gold answers join article units as gold's answers and leave the text's units alone")
{
    UnitsFixture f;
    auto lead =
        addOlderLeadForTesting(f.project, QStringLiteral("Test lead"), QStringLiteral("L01"));
    REQUIRE(lead);
    const QString item = QStringLiteral("dominant_function");
    for (auto [coder, value] : {std::pair {f.c1, "problem"}, std::pair {f.c2, "cause"}}) {
        SetJudgementEdit answer(f.f1, coder, item, QString::fromLatin1(value), Phase::Reliability);
        REQUIRE(f.project.apply(answer));
    }
    SetJudgementEdit third(f.f2, f.c3, item, QStringLiteral("remedy"), Phase::Reliability);
    REQUIRE(f.project.apply(third));
    // Gold answers on both articles; the one on f1 replaces an earlier decision.
    AdjudicateAnswerEdit earlier(f.f1, *lead, item, QStringLiteral("problem"), {});
    REQUIRE(f.project.apply(earlier));
    AdjudicateAnswerEdit onF1(f.f1, *lead, item, QStringLiteral("cause"), {});
    REQUIRE(f.project.apply(onF1));
    AdjudicateAnswerEdit onF2(f.f2, *lead, item, QStringLiteral("remedy"), {});
    REQUIRE(f.project.apply(onF2));

    UnitSelection s;
    s.unit = UnitKind::Article;
    s.includeGold = true;
    auto t = unitTable(f.project, s);
    REQUIRE(t);
    CHECK(t->coders
        == QStringList {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03"),
            QStringLiteral("gold")});
    REQUIRE(t->unitIds() == QStringList {QStringLiteral("f1"), QStringLiteral("f2")});
    // The live gold answer only (the withdrawn-by-replacement "problem" is not gold's).
    CHECK(t->rowText(0)
        == QStringList {QStringLiteral("problem"), QStringLiteral("cause"), QString(),
            QStringLiteral("cause")});
    CHECK(t->rowText(1)
        == QStringList {QString(), QString(), QStringLiteral("remedy"), QStringLiteral("remedy")});
    // Without --with-gold there is no gold column.
    s.includeGold = false;
    t = unitTable(f.project, s);
    REQUIRE(t);
    CHECK(t->coders.size() == 3);

    // Sentence units: gold has no span anywhere, so its answers do not make it a coder of the
    // text ("absent" everywhere would be a claim gold never made); its column stays empty.
    s.unit = UnitKind::Sentence;
    s.function = FramingFunction::Problem;
    s.includeGold = true;
    t = unitTable(f.project, s);
    REQUIRE(t);
    REQUIRE(t->coders.last() == QStringLiteral("gold"));
    for (size_t u = 0; u < t->unitCount(); ++u)
        CHECK(t->rowText(u).last().isEmpty());
}
