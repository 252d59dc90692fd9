// The reliability subsample draw (core/project/subsample_draw): reproducible from its seed,
// stratified by largest remainder, with the minimum-sample advice; the sampling frame.
#include "core/project/annotation_edits.h"
#include "core/project/subsample_draw.h"
#include "core/project/testing/project_database.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <map>
#include <random>
#include <set>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QString outletOf(int index)
{
    return index <= 10 ? QStringLiteral("A")
        : index <= 16  ? QStringLiteral("B")
                       : QStringLiteral("C");
}

int indexOf(const QString &externalId)
{
    return externalId.mid(1).toInt();
}

// A deliberately plain re-implementation of the documented draw: Fisher–Yates (Durstenfeld's
// form, Knuth TAOCP vol. 2 §3.4.2 Algorithm P) driven by mt19937_64 with rejection sampling.
std::vector<int> referenceShuffle(std::vector<int> items, std::mt19937_64 &engine)
{
    for (std::size_t i = items.size(); i > 1; --i) {
        const std::uint64_t n = i;
        const std::uint64_t limit = (~std::uint64_t(0) - n + 1) % n;
        std::uint64_t r = engine();
        while (r < limit)
            r = engine();
        std::swap(items[i - 1], items[std::size_t(r % n)]);
    }
    return items;
}

DrawRequest request(std::optional<int> size, std::uint64_t seed)
{
    DrawRequest r;
    r.size = size;
    r.seed = seed;
    r.coders = {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")};
    return r;
}

} // namespace

TEST_CASE("mt19937_64, the draw's generator, is the one the C++ standard specifies")
{
    // C++ standard [rand.predef]: the 10000th consecutive invocation of a default-constructed
    // mt19937_64 produces 9981545732273789042.
    std::mt19937_64 engine;
    engine.discard(9999);
    CHECK(engine() == 9981545732273789042ULL);
}

TEST_CASE("a random draw is reproducible from its seed and matches the documented algorithm")
{
    StudyFixture f;
    auto a = SubsampleDraw::plan(f.project, request(5, 20261202));
    REQUIRE(a);
    StudyFixture g;
    auto b = SubsampleDraw::plan(g.project, request(5, 20261202));
    REQUIRE(b);
    CHECK(a->articles == b->articles); // same seed, another project file: the same sample
    CHECK(a->articles.size() == 5);
    CHECK(a->frameArticles == 20);
    CHECK(a->method == QStringLiteral("random"));

    std::mt19937_64 engine(20261202);
    std::vector<int> frame(20);
    for (int i = 0; i < 20; ++i)
        frame[size_t(i)] = i + 1;
    const std::vector<int> shuffled = referenceShuffle(frame, engine);
    std::set<int> expected(shuffled.begin(), shuffled.begin() + 5);
    std::set<int> got;
    for (const QString &id : a->articles)
        got.insert(indexOf(id));
    CHECK(got == expected);

    auto c = SubsampleDraw::plan(f.project, request(5, 7));
    REQUIRE(c);
    CHECK(c->articles != a->articles);

    // Every coder codes every drawn article.
    CHECK(a->plan.rows.size() == 15);
    for (const PlannedAssignment &row : a->plan.rows)
        CHECK(row.phase == Phase::Reliability);
}

TEST_CASE("a stratified draw allocates proportionally by largest remainder")
{
    StudyFixture f;
    DrawRequest r = request(5, 99);
    r.stratify = Stratum::Outlet;
    auto d = SubsampleDraw::plan(f.project, r);
    REQUIRE(d);
    // Hand-computed (Hamilton's method): 5 × 10/20 = 2.5, 5 × 6/20 = 1.5, 5 × 4/20 = 1.0; floors
    // 2 + 1 + 1 = 4, the one left goes to the largest remainder, tie 0.5 / 0.5 to the first key.
    REQUIRE(d->strata.size() == 3);
    CHECK(d->strata[0].key == QStringLiteral("A"));
    CHECK(d->strata[0].frameArticles == 10);
    CHECK(d->strata[0].drawnArticles == 3);
    CHECK(d->strata[1].drawnArticles == 1);
    CHECK(d->strata[2].drawnArticles == 1);
    std::map<QString, int> perOutlet;
    for (const QString &id : d->articles)
        ++perOutlet[outletOf(indexOf(id))];
    CHECK(perOutlet[QStringLiteral("A")] == 3);
    CHECK(perOutlet[QStringLiteral("B")] == 1);
    CHECK(perOutlet[QStringLiteral("C")] == 1);

    // Fraction: ceil(0.5 × 20) = 10 → 5, 3, 2 exactly proportional.
    r.size.reset();
    r.fraction = 0.5;
    r.stratify = Stratum::Language;
    d = SubsampleDraw::plan(f.project, r);
    REQUIRE(d);
    CHECK(d->articles.size() == 10);
    REQUIRE(d->strata.size() == 2);
    CHECK(d->strata[0].key == QStringLiteral("en"));
    CHECK(d->strata[0].frameArticles == 12);
    CHECK(d->strata[0].drawnArticles == 6);
    CHECK(d->strata[1].drawnArticles == 4);

    // Topic from the metadata; articles without one form "(none)". 8 × (4, 9, 7)/20 = 1.6, 3.6,
    // 2.8 → floors 1, 3, 2 = 6; remainders .6, .6, .8 → wind, then "(none)" (tie, key order).
    r.fraction.reset();
    r.size = 8;
    r.stratify = Stratum::Topic;
    d = SubsampleDraw::plan(f.project, r);
    REQUIRE(d);
    REQUIRE(d->strata.size() == 3);
    CHECK(d->strata[0].key == QStringLiteral("(none)"));
    CHECK(d->strata[0].drawnArticles == 2);
    CHECK(d->strata[1].key == QStringLiteral("ferry"));
    CHECK(d->strata[1].drawnArticles == 3);
    CHECK(d->strata[2].key == QStringLiteral("wind"));
    CHECK(d->strata[2].drawnArticles == 3);
    int none = 0;
    for (const QString &id : d->articles)
        none += indexOf(id) > 16 ? 1 : 0;
    CHECK(none == 2);
}

TEST_CASE("the draw shows Krippendorff's minimum next to what it delivers")
{
    StudyFixture f;
    auto d = SubsampleDraw::plan(f.project, request(4, 3));
    REQUIRE(d);
    // Krippendorff (2004, §11.4; his table): alpha_min .800, p = .05, four equally frequent
    // values (pc = .25) need 139 values.
    CHECK(d->advice.minimumValues == 139);
    // Every fixture article has 2 paragraphs and 3 sentences; 4 articles × 3 coders.
    CHECK(d->advice.articleValues == 12);
    CHECK(d->advice.paragraphValues == 24);
    CHECK(d->advice.sentenceValues == 36);
    CHECK(d->advice.sufficientUnits.isEmpty());
}

TEST_CASE("committing a draw records it; a second draw and bad requests change nothing")
{
    StudyFixture f;
    auto d = SubsampleDraw::plan(f.project, request(5, 11));
    REQUIRE(d);
    REQUIRE(SubsampleDraw::commit(f.project, *d));
    CHECK_FALSE(d->drawnAt.isEmpty());
    auto rows = AssignmentPlans::rows(f.project, Phase::Reliability);
    REQUIRE(rows);
    CHECK(rows->size() == 15);
    auto recorded = SubsampleDraw::recorded(f.project, Phase::Reliability);
    REQUIRE(recorded);
    REQUIRE(recorded->has_value());
    CHECK((*recorded)->articles == d->articles);
    CHECK((*recorded)->seed == 11);
    CHECK((*recorded)->coders == d->coders);
    CHECK((*recorded)->advice.minimumValues == 139);

    const auto before = dumpDatabase(databaseForTesting(f.project));
    auto again = SubsampleDraw::plan(f.project, request(5, 12));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
    CHECK(SubsampleDraw::commit(f.project, *d).error().code == ErrorCode::Duplicate);

    DrawRequest bad = request(5, 1);
    bad.phase = Phase::Pilot;
    bad.coders << QStringLiteral("C99");
    auto unknown = SubsampleDraw::plan(f.project, bad);
    REQUIRE_FALSE(unknown);
    CHECK(unknown.error().code == ErrorCode::NotFound);
    CHECK(unknown.error().message.contains(QStringLiteral("C99")));
    bad = request(30, 1);
    bad.phase = Phase::Pilot;
    CHECK(SubsampleDraw::plan(f.project, bad).error().code == ErrorCode::InvalidArgument);
    bad = request(std::nullopt, 1);
    bad.phase = Phase::Pilot;
    CHECK(SubsampleDraw::plan(f.project, bad).error().code == ErrorCode::InvalidArgument);
    bad = request(3, 1);
    bad.phase = Phase::Production;
    CHECK(SubsampleDraw::plan(f.project, bad).error().code == ErrorCode::InvalidArgument);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);

    // A failing plan writes nothing: the second row is a duplicate of the first.
    AssignmentPlan plan {{{QStringLiteral("a20"), QStringLiteral("C04"), Phase::Production},
        {QStringLiteral("a20"), QStringLiteral("C04"), Phase::Production}}};
    CHECK(AssignmentPlans::commit(f.project, plan).error().code == ErrorCode::Duplicate);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}

TEST_CASE("training and pilot articles stay out of the reliability frame")
{
    StudyFixture f;
    auto training = AssignmentPlans::planArticles(f.project, Phase::Training,
        {QStringLiteral("a01"), QStringLiteral("a02")}, {QStringLiteral("C01")});
    REQUIRE(training);
    REQUIRE(AssignmentPlans::commit(f.project, *training));
    auto pilot = AssignmentPlans::planArticles(
        f.project, Phase::Pilot, {QStringLiteral("a03")}, {QStringLiteral("C02")});
    REQUIRE(pilot);
    REQUIRE(AssignmentPlans::commit(f.project, *pilot));
    auto d = SubsampleDraw::plan(f.project, request(17, 5));
    REQUIRE(d);
    CHECK(d->frameArticles == 17);
    for (const char *id : {"a01", "a02", "a03"})
        CHECK_FALSE(d->articles.contains(QString::fromLatin1(id)));
    // A pilot drawn after the reliability subsample leaves the reliability articles out too.
    REQUIRE(SubsampleDraw::commit(f.project, *d));
    DrawRequest pilotRequest = request(3, 5);
    pilotRequest.phase = Phase::Pilot;
    CHECK(SubsampleDraw::plan(f.project, pilotRequest).error().code
        == ErrorCode::InvalidArgument); // 3 articles from an empty frame
    // Planning the same articles again plans nothing new.
    auto repeat = AssignmentPlans::planArticles(f.project, Phase::Training,
        {QStringLiteral("a01"), QStringLiteral("a02")}, {QStringLiteral("C01")});
    REQUIRE(repeat);
    CHECK(repeat->rows.empty());
    CHECK(AssignmentPlans::planArticles(
              f.project, Phase::Training, {QStringLiteral("zz")}, {QStringLiteral("C01")})
              .error()
              .code
        == ErrorCode::NotFound);
}
