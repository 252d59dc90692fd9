// Study design: the reliability draw (reproducible, stratified), dealing the rest, the phase of
// new codings, codebook versions and diffs, training feedback and the progress board.
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/study_design.h"
#include "core/project/testing/project_database.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <QJsonArray>
#include <QJsonDocument>

#include <map>
#include <random>
#include <set>

using namespace fourfold;
using namespace fourfold::test;

namespace {

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
    auto a = StudyDesign::planDraw(f.project, request(5, 20261202));
    REQUIRE(a);
    StudyFixture g;
    auto b = StudyDesign::planDraw(g.project, request(5, 20261202));
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

    auto c = StudyDesign::planDraw(f.project, request(5, 7));
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
    auto d = StudyDesign::planDraw(f.project, r);
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
    d = StudyDesign::planDraw(f.project, r);
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
    d = StudyDesign::planDraw(f.project, r);
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
    auto d = StudyDesign::planDraw(f.project, request(4, 3));
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
    auto d = StudyDesign::planDraw(f.project, request(5, 11));
    REQUIRE(d);
    REQUIRE(StudyDesign::commitDraw(f.project, *d));
    CHECK_FALSE(d->drawnAt.isEmpty());
    auto rows = StudyDesign::assignmentRows(f.project, Phase::Reliability);
    REQUIRE(rows);
    CHECK(rows->size() == 15);
    auto recorded = StudyDesign::recordedDraw(f.project, Phase::Reliability);
    REQUIRE(recorded);
    REQUIRE(recorded->has_value());
    CHECK((*recorded)->articles == d->articles);
    CHECK((*recorded)->seed == 11);
    CHECK((*recorded)->coders == d->coders);
    CHECK((*recorded)->advice.minimumValues == 139);

    const auto before = dumpDatabase(databaseForTesting(f.project));
    auto again = StudyDesign::planDraw(f.project, request(5, 12));
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
    CHECK(StudyDesign::commitDraw(f.project, *d).error().code == ErrorCode::Duplicate);

    DrawRequest bad = request(5, 1);
    bad.phase = Phase::Pilot;
    bad.coders << QStringLiteral("C99");
    auto unknown = StudyDesign::planDraw(f.project, bad);
    REQUIRE_FALSE(unknown);
    CHECK(unknown.error().code == ErrorCode::NotFound);
    CHECK(unknown.error().message.contains(QStringLiteral("C99")));
    bad = request(30, 1);
    bad.phase = Phase::Pilot;
    CHECK(StudyDesign::planDraw(f.project, bad).error().code == ErrorCode::InvalidArgument);
    bad = request(std::nullopt, 1);
    bad.phase = Phase::Pilot;
    CHECK(StudyDesign::planDraw(f.project, bad).error().code == ErrorCode::InvalidArgument);
    bad = request(3, 1);
    bad.phase = Phase::Production;
    CHECK(StudyDesign::planDraw(f.project, bad).error().code == ErrorCode::InvalidArgument);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);

    // A failing plan writes nothing: the second row is a duplicate of the first.
    AssignmentPlan plan {{{QStringLiteral("a20"), QStringLiteral("C04"), Phase::Production},
        {QStringLiteral("a20"), QStringLiteral("C04"), Phase::Production}}};
    CHECK(StudyDesign::commitPlan(f.project, plan).error().code == ErrorCode::Duplicate);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}

TEST_CASE("training and pilot articles stay out of the reliability frame")
{
    StudyFixture f;
    auto training = StudyDesign::planArticles(f.project, Phase::Training,
        {QStringLiteral("a01"), QStringLiteral("a02")}, {QStringLiteral("C01")});
    REQUIRE(training);
    REQUIRE(StudyDesign::commitPlan(f.project, *training));
    auto pilot = StudyDesign::planArticles(
        f.project, Phase::Pilot, {QStringLiteral("a03")}, {QStringLiteral("C02")});
    REQUIRE(pilot);
    REQUIRE(StudyDesign::commitPlan(f.project, *pilot));
    auto d = StudyDesign::planDraw(f.project, request(17, 5));
    REQUIRE(d);
    CHECK(d->frameArticles == 17);
    for (const char *id : {"a01", "a02", "a03"})
        CHECK_FALSE(d->articles.contains(QString::fromLatin1(id)));
    // A pilot drawn after the reliability subsample leaves the reliability articles out too.
    REQUIRE(StudyDesign::commitDraw(f.project, *d));
    DrawRequest pilotRequest = request(3, 5);
    pilotRequest.phase = Phase::Pilot;
    CHECK(StudyDesign::planDraw(f.project, pilotRequest).error().code
        == ErrorCode::InvalidArgument); // 3 articles from an empty frame
    // Planning the same articles again plans nothing new.
    auto repeat = StudyDesign::planArticles(f.project, Phase::Training,
        {QStringLiteral("a01"), QStringLiteral("a02")}, {QStringLiteral("C01")});
    REQUIRE(repeat);
    CHECK(repeat->rows.empty());
    CHECK(StudyDesign::planArticles(
              f.project, Phase::Training, {QStringLiteral("zz")}, {QStringLiteral("C01")})
              .error()
              .code
        == ErrorCode::NotFound);
}

TEST_CASE("the rest is dealt evenly, single- or double-coded with rotating pairs")
{
    StudyFixture f;
    auto d = StudyDesign::planDraw(f.project, request(8, 1));
    REQUIRE(d);
    REQUIRE(StudyDesign::commitDraw(f.project, *d));

    RestRequest single {RestCoding::Single,
        {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03"),
            QStringLiteral("C04")},
        42};
    auto plan = StudyDesign::planRest(f.project, single);
    REQUIRE(plan);
    CHECK(plan->rows.size() == 12); // 20 − 8 drawn, once each
    std::map<QString, int> load;
    std::set<QString> articles;
    for (const PlannedAssignment &r : plan->rows) {
        ++load[r.coder];
        articles.insert(r.article);
        CHECK_FALSE(d->articles.contains(r.article));
        CHECK(r.phase == Phase::Production);
    }
    CHECK(articles.size() == 12);
    for (const auto &[coder, n] : load)
        CHECK(n == 3);
    auto again = StudyDesign::planRest(f.project, single);
    REQUIRE(again);
    for (std::size_t i = 0; i < plan->rows.size(); ++i)
        CHECK(again->rows[i].article == plan->rows[i].article); // reproducible from the seed

    RestRequest twice = single;
    twice.coding = RestCoding::Double;
    plan = StudyDesign::planRest(f.project, twice);
    REQUIRE(plan);
    REQUIRE(plan->rows.size() == 24);
    load.clear();
    std::map<std::pair<QString, QString>, int> pairs;
    for (std::size_t i = 0; i < plan->rows.size(); i += 2) {
        CHECK(plan->rows[i].article == plan->rows[i + 1].article);
        CHECK(plan->rows[i].coder != plan->rows[i + 1].coder);
        ++load[plan->rows[i].coder];
        ++load[plan->rows[i + 1].coder];
        ++pairs[{plan->rows[i].coder, plan->rows[i + 1].coder}];
    }
    // 12 articles over the 6 pairs of 4 coders: each pair twice, each coder 6 articles.
    CHECK(pairs.size() == 6);
    for (const auto &[pair, n] : pairs)
        CHECK(n == 2);
    for (const auto &[coder, n] : load)
        CHECK(n == 6);
    REQUIRE(StudyDesign::commitPlan(f.project, *plan));
    auto none = StudyDesign::planRest(f.project, twice);
    REQUIRE(none);
    CHECK(none->rows.empty());

    twice.coders = {QStringLiteral("C01")};
    CHECK(StudyDesign::planRest(f.project, twice).error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("new annotations and answers take the phase of the coder's assignment")
{
    StudyFixture f;
    const CoderId c1 = f.coder("C01");
    auto plan = StudyDesign::planArticles(
        f.project, Phase::Reliability, {QStringLiteral("a01")}, {QStringLiteral("C01")});
    REQUIRE(plan);
    REQUIRE(StudyDesign::commitPlan(f.project, *plan));
    const ArticleId a1 = f.articleId(QStringLiteral("a01"));
    AddAnnotationEdit add(a1, c1, AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(add));
    auto stored = f.project.annotation(add.annotationId());
    REQUIRE(stored);
    CHECK(stored->phase == Phase::Reliability);
    auto book = f.project.codebook();
    REQUIRE(book);
    CHECK(stored->codebookVersion == book->versionId);

    // No assignment: the phase asked for.
    const ArticleId a2 = f.articleId(QStringLiteral("a02"));
    AddAnnotationEdit unassigned(
        a2, c1, AnnotationContent {FramingFunction::Cause, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(unassigned));
    CHECK(f.project.annotation(unassigned.annotationId())->phase == Phase::Production);

    // Training done, production open: new spans belong to production, even when the front end
    // asks for training; once everything is done, a phase the coder was assigned is kept, any
    // other becomes the last finished one.
    const ArticleId a3 = f.articleId(QStringLiteral("a03"));
    REQUIRE(f.project.assign(a3, c1, Phase::Training));
    SetArticleStatusEdit done(a3, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(done));
    REQUIRE(f.project.assign(a3, c1, Phase::Production));
    const auto phaseOfNew = [&](Phase requested, int start) {
        AddAnnotationEdit e(a3, c1,
            AnnotationContent {FramingFunction::Remedy, {start, start + 3}, {}, {}, {}}, requested);
        REQUIRE(f.project.apply(e));
        return f.project.annotation(e.annotationId())->phase;
    };
    CHECK(phaseOfNew(Phase::Production, 0) == Phase::Production);
    CHECK(phaseOfNew(Phase::Training, 4) == Phase::Production);
    SetArticleStatusEdit allDone(a3, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(allDone));
    CHECK(phaseOfNew(Phase::Training, 8) == Phase::Training);
    CHECK(phaseOfNew(Phase::Pilot, 12) == Phase::Production);

    SetJudgementEdit answer(a1, c1, QStringLiteral("dominant_function"), QStringLiteral("problem"));
    REQUIRE(f.project.apply(answer));
    auto answers = f.project.judgements(a1);
    REQUIRE(answers);
    REQUIRE(answers->size() == 1);
    CHECK(answers->front().phase == Phase::Reliability);
}

TEST_CASE("a new codebook version has a readable diff; older annotations are flagged")
{
    StudyFixture f;
    const CoderId c1 = f.coder("C01");
    const ArticleId a1 = f.articleId(QStringLiteral("a01"));
    AddAnnotationEdit problem(
        a1, c1, AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(problem));
    AddAnnotationEdit remedy(
        a1, c1, AnnotationContent {FramingFunction::Remedy, {6, 9}, {}, {}, {}});
    REQUIRE(f.project.apply(remedy));

    auto v1 = f.project.codebook();
    REQUIRE(v1);
    CHECK(v1->number == 1);
    Codebook v2 = *v1;
    FunctionDefinition &def = v2.functions[size_t(FramingFunction::Problem)];
    const QString oldDefinition = def.definition;
    def.definition = QStringLiteral("What the text presents as the issue that needs attention.");
    def.rules << QStringLiteral("A headline counts as text.");
    FunctionDefinition &evaluation = v2.functions[size_t(FramingFunction::Evaluation)];
    REQUIRE_FALSE(evaluation.attributes.empty());
    const QString attributeKey = evaluation.attributes.front().key;
    evaluation.attributes.front().values << QStringLiteral("mixed");
    evaluation.attributes.push_back(AttributeSpec {QStringLiteral("target"),
        QStringLiteral("Target"), AttributeSpec::Type::Text, {}, MeasurementLevel::Nominal, {}});

    const QString path =
        writeFile(f.dir, QStringLiteral("v2.json"), QJsonDocument(v2.toJson()).toJson());
    auto added = StudyDesign::addCodebookVersionFromFile(
        f.project, path, QStringLiteral("Sharper problem definition"), f.lead);
    REQUIRE(added);
    CHECK(added->number == 2);
    CHECK(added->createdBy == QStringLiteral("L01"));
    CHECK(added->note == QStringLiteral("Sharper problem definition"));

    auto diff = StudyDesign::codebookDiff(f.project, 1, 2);
    REQUIRE(diff);
    REQUIRE(diff->changes.size() == 4);
    CHECK(diff->changes[0].path == QStringLiteral("problem.definition"));
    CHECK(diff->changes[0].kind == CodebookChange::Kind::Changed);
    CHECK(diff->changes[0].before == oldDefinition);
    CHECK(diff->changes[1].path == QStringLiteral("problem.rules"));
    CHECK(diff->changes[1].after.endsWith(QStringLiteral("; A headline counts as text.")));
    CHECK(diff->changes[2].path
        == QStringLiteral("evaluation.attributes.%1.values").arg(attributeKey));
    CHECK(diff->changes[2].after.endsWith(QStringLiteral("; mixed")));
    CHECK(diff->changes[3].path == QStringLiteral("evaluation.attributes.target"));
    CHECK(diff->changes[3].kind == CodebookChange::Kind::Added);
    CHECK(diff->changedFunctions()
        == std::vector<FramingFunction> {FramingFunction::Problem, FramingFunction::Evaluation});
    const QString text = StudyDesign::codebookDiffText(*diff);
    CHECK(text.startsWith(QStringLiteral("Codebook version 1 → 2\n~ problem.definition: «")));
    CHECK(text.contains(QStringLiteral("\n+ evaluation.attributes.target: «Target (text)»")));
    auto back = StudyDesign::codebookDiff(f.project, 2, 1);
    REQUIRE(back);
    CHECK(back->changes[3].kind == CodebookChange::Kind::Removed);

    // Annotations keep their version; the lead sees which are older and which to re-check.
    auto outdated = StudyDesign::outdatedAnnotations(f.project);
    REQUIRE(outdated);
    REQUIRE(outdated->size() == 2);
    CHECK(outdated->at(0).function == FramingFunction::Problem);
    CHECK(outdated->at(0).version == 1);
    CHECK(outdated->at(0).functionChanged);
    CHECK(outdated->at(1).function == FramingFunction::Remedy);
    CHECK_FALSE(outdated->at(1).functionChanged);
    AddAnnotationEdit fresh(a1, c1, AnnotationContent {FramingFunction::Cause, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(fresh));
    CHECK(f.project.annotation(fresh.annotationId())->codebookVersion == added->id);
    CHECK(StudyDesign::outdatedAnnotations(f.project)->size() == 2);

    // Nothing to record, no note, a malformed file: refused, nothing written.
    const auto before = dumpDatabase(databaseForTesting(f.project));
    CHECK(StudyDesign::addCodebookVersionFromFile(f.project, path, QStringLiteral("again"), f.lead)
              .error()
              .code
        == ErrorCode::InvalidArgument);
    CHECK(StudyDesign::addCodebookVersion(f.project, *v1, QStringLiteral(" "), f.lead).error().code
        == ErrorCode::InvalidArgument);
    const QString broken = writeFile(f.dir, QStringLiteral("broken.json"), "{\"functions\": 3}");
    auto bad =
        StudyDesign::addCodebookVersionFromFile(f.project, broken, QStringLiteral("x"), f.lead);
    REQUIRE_FALSE(bad);
    CHECK(bad.error().code == ErrorCode::InvalidInput);
    CHECK(bad.error().toString().contains(QStringLiteral("broken.json")));
    CHECK(StudyDesign::codebookDiff(f.project, 1, 9).error().code == ErrorCode::NotFound);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}

TEST_CASE("training feedback: agreement with the master per function, hand-computed")
{
    TenFixture f;
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    const CoderId l1 = f.addCoder(QStringLiteral("L01"), CoderRole::Lead);
    REQUIRE(f.project.assign(f.article, c1, Phase::Training));
    REQUIRE(f.project.assign(f.article, l1, Phase::Training));
    f.codeBoth(c1, l1, Phase::Production); // the assignment turns them into training codings

    TrainingRequest r {QStringLiteral("C01"), QString(), UnitKind::Sentence};
    auto open = StudyDesign::trainingFeedback(f.project, r);
    REQUIRE(open);
    CHECK(open->master == QStringLiteral("L01"));
    CHECK(open->articles.isEmpty()); // feedback only after the coder submits the article
    CHECK(open->openArticles == 1);
    CHECK_FALSE(open->trainingComplete);
    CHECK(open->functions[0].units == 0);

    SetArticleStatusEdit done(f.article, c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(done));
    auto fb = StudyDesign::trainingFeedback(f.project, r);
    REQUIRE(fb);
    CHECK(fb->articles == QStringList {QStringLiteral("t1")});
    CHECK(fb->trainingComplete);
    // Krippendorff's alpha, nominal, two coders, no missing values (Krippendorff 2011,
    // "Computing Krippendorff's Alpha-Reliability", §C), computed by hand:
    // problem: units 1,2 present/present, 3 and 4 differ, 5–10 absent/absent: o_pp = 4,
    // o_pa = o_ap = 2, o_aa = 12, n = 20, n_p = 6, n_a = 14; D_o = 4/20, D_e = 2·6·14/(20·19);
    // alpha = 1 − 1520/3360 = 23/42.
    const FunctionAgreement &problem = fb->functions[0];
    CHECK(problem.units == 10);
    CHECK(problem.agreeingUnits == 8);
    CHECK(problem.percentAgreement == Approx(0.8));
    CHECK(problem.coderUnits == 3);
    CHECK(problem.masterUnits == 3);
    REQUIRE(problem.alpha);
    CHECK(*problem.alpha == Approx(23.0 / 42.0).epsilon(1e-12));
    // cause: one unit differs, n_p = 1, n_a = 19: D_o = 2/20 = D_e = 2·19/380: alpha = 0.
    REQUIRE(fb->functions[1].alpha);
    CHECK(*fb->functions[1].alpha == Approx(0.0).margin(1e-12));
    CHECK(fb->functions[1].percentAgreement == Approx(0.9));
    // evaluation: identical codings: alpha = 1.
    REQUIRE(fb->functions[2].alpha);
    CHECK(*fb->functions[2].alpha == Approx(1.0));
    // remedy: nobody marked anything, only one value occurs: alpha undefined, agreement 100 %.
    CHECK_FALSE(fb->functions[3].alpha);
    CHECK_FALSE(fb->functions[3].alphaUndefinedReason.isEmpty());
    CHECK(fb->functions[3].percentAgreement == Approx(1.0));

    const QJsonObject json = StudyDesign::trainingFeedbackJson(*fb);
    CHECK(json.value(QStringLiteral("functions"))
              .toArray()
              .at(0)
              .toObject()
              .value(QStringLiteral("alpha"))
              .toDouble()
        == Approx(23.0 / 42.0));
    CHECK(json.value(QStringLiteral("functions"))
              .toArray()
              .at(3)
              .toObject()
              .value(QStringLiteral("alpha"))
              .isNull());

    r.coder = QStringLiteral("C77");
    CHECK(StudyDesign::trainingFeedback(f.project, r).error().code == ErrorCode::NotFound);
    r.coder = QStringLiteral("C01");
    r.unit = UnitKind::Continuum;
    CHECK(StudyDesign::trainingFeedback(f.project, r).error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("progress board: counts, effort in aggregate unless turned on, agreement so far")
{
    TenFixture f;
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    const CoderId c2 = f.addCoder(QStringLiteral("C02"));
    f.importJsonl("{\"id\":\"t2\",\"title\":\"Other\",\"text\":\"Short one. Short two.\"}\n",
        QStringLiteral("b.jsonl"));
    const ArticleId t2 = f.articleId(QStringLiteral("t2"));
    for (CoderId c : {c1, c2}) {
        REQUIRE(f.project.assign(f.article, c, Phase::Reliability));
        REQUIRE(f.project.assign(t2, c, Phase::Reliability));
    }
    f.codeBoth(c1, c2, Phase::Reliability);
    SetArticleStatusEdit d1(f.article, c1, QStringLiteral("done"));
    SetArticleStatusEdit d2(f.article, c2, QStringLiteral("done"));
    SetArticleStatusEdit s1(t2, c1, QStringLiteral("started"));
    REQUIRE(f.project.apply(d1));
    REQUIRE(f.project.apply(d2));
    REQUIRE(f.project.apply(s1));
    REQUIRE(f.project.addCodingTime(f.article, c1, 600));
    REQUIRE(f.project.addCodingTime(t2, c1, 120));
    REQUIRE(f.project.addCodingTime(f.article, c2, 900));

    auto board = StudyDesign::progressBoard(f.project);
    REQUIRE(board);
    CHECK_FALSE(board->effortPerCoder); // off by default
    REQUIRE(board->rows.size() == 2);
    const ProgressRow &r1 = board->rows[0];
    CHECK(r1.coder == QStringLiteral("C01"));
    CHECK(r1.phase == Phase::Reliability);
    CHECK(r1.assigned == 2);
    CHECK(r1.started == 1);
    CHECK(r1.done == 1);
    CHECK_FALSE(r1.activeSeconds);
    CHECK(r1.comparedArticles == 1);
    // Pooled over 10 sentences × 4 functions (hand-computed as in the training test): agreeing
    // present units 3 (o_pp = 6), differing units 3 (o_pa = o_ap = 3), agreeing absent units 34
    // (o_aa = 68); n = 80, n_p = 9, n_a = 71; alpha = 1 − (6/80) / (2·9·71/(80·79)) = 134/213.
    REQUIRE(r1.agreement);
    CHECK(*r1.agreement == Approx(134.0 / 213.0).epsilon(1e-12));
    REQUIRE(board->rows[1].agreement);
    CHECK(*board->rows[1].agreement == Approx(134.0 / 213.0).epsilon(1e-12));
    REQUIRE(board->effort.size() == 1);
    CHECK(board->effort[0].doneArticles == 2);
    CHECK(board->effort[0].activeSeconds == 1620);
    REQUIRE(board->effort[0].meanSecondsPerDoneArticle);
    CHECK(*board->effort[0].meanSecondsPerDoneArticle == Approx(810.0));
    CHECK_FALSE(StudyDesign::progressBoardJson(*board)
                    .value(QStringLiteral("rows"))
                    .toArray()
                    .at(0)
                    .toObject()
                    .contains(QStringLiteral("active_seconds")));

    REQUIRE(StudyDesign::setEffortPerCoderVisible(f.project, true, CoderId {}));
    board = StudyDesign::progressBoard(f.project);
    REQUIRE(board);
    CHECK(board->effortPerCoder);
    REQUIRE(board->rows[0].activeSeconds);
    CHECK(*board->rows[0].activeSeconds == 720);
    CHECK(*board->rows[1].activeSeconds == 900);

    // Filtered by phase: nothing in training.
    board = StudyDesign::progressBoard(f.project, Phase::Training);
    REQUIRE(board);
    CHECK(board->rows.empty());
    CHECK(board->effort.empty());
}
