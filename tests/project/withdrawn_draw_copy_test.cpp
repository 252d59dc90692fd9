// A draw withdrawn in the project while a coder copy holding its assignments was out, and the
// coder's work on it merged back (core/project/coder_copies.h): the codings arrive, the
// assignment stays withdrawn (or as a new draw made it), and the lead decides each such article
// as a conflict. Expected values follow from the edits each test makes (three-way merge against
// a common base, common practice in version control, e.g. diff3); the draws are the project's
// own (core/project/subsample_draw.h).
#include "core/project/article_status_edit.h"
#include "core/project/coding_scope.h"
#include "core/project/conflict_edits.h"
#include "core/project/subsample_draw.h"
#include "core/project/testing/project_database.h"
#include "core/store/project_tables.h"
#include "tests/project/copies_fixture.h"
#include "tests/project/copy_files.h"
#include "tests/support/db_dump.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Three articles, two coders, a reliability draw of one article for both, and a copy for C01
// handed out while the draw stood.
struct WithdrawnFixture {
    QTemporaryDir dir;
    QString mainPath = dir.filePath(QStringLiteral("main.fourfold"));
    std::optional<Project> main;
    CoderId c1, c2;
    QString drawn; // external id of the drawn article
    QString copyPath = dir.filePath(QStringLiteral("c01.fourfold"));

    WithdrawnFixture()
    {
        auto p = Project::create(mainPath);
        REQUIRE(p);
        main.emplace(std::move(*p));
        REQUIRE(main->importFile(
            writeFile(dir, QStringLiteral("a.jsonl"), kThreeArticles), ImportOptions {}));
        auto a = main->addCoder(
            QStringLiteral("Noor Testperson"), QStringLiteral("C01"), CoderRole::Coder);
        auto b = main->addCoder(
            QStringLiteral("Sam Testperson"), QStringLiteral("C02"), CoderRole::Coder);
        REQUIRE(a);
        REQUIRE(b);
        c1 = *a;
        c2 = *b;
        auto d = SubsampleDraw::plan(*main, request(1, 7));
        REQUIRE(d);
        REQUIRE(SubsampleDraw::commit(*main, *d));
        REQUIRE(d->articles.size() == 1);
        drawn = d->articles.front();
        auto r = CoderCopies::handout(*main, QStringLiteral("C01"), copyPath);
        REQUIRE(r);
        CHECK(r->assignments == 1);
    }

    static DrawRequest request(int size, std::uint64_t seed)
    {
        DrawRequest r;
        r.size = size;
        r.seed = seed;
        r.coders = {QStringLiteral("C01"), QStringLiteral("C02")};
        return r;
    }

    QString dump() { return dumpDatabase(databaseForTesting(*main)); }

    ArticleId article(const QString &externalId) const { return articleIn(*main, externalId); }

    store::AssignmentRecord record(const QString &externalId, CoderId coder)
    {
        auto r = store::assignmentRecord(
            databaseForTesting(*main), article(externalId), coder, Phase::Reliability);
        REQUIRE(r);
        REQUIRE(r->has_value());
        return **r;
    }

    // C01 codes the drawn article in the copy: a span, an answer, done, two minutes.
    void codeInCopy() const
    {
        Project p = openProject(copyPath);
        const CoderId me = coderIn(p, QStringLiteral("C01"));
        const ArticleId a = articleIn(p, drawn);
        const QString text = textOf(p, a);
        // The first sentence of each fixture article, up to its first full stop.
        const QString quote = text.left(text.indexOf(QLatin1Char('.')));
        AddAnnotationEdit add(a, me,
            AnnotationContent {FramingFunction::Problem, rangeOf(text, quote), {}, {}, {}},
            Phase::Reliability);
        REQUIRE(p.apply(add));
        SetJudgementEdit answer(a, me, QStringLiteral("dominant_function"),
            QStringLiteral("problem"), Phase::Reliability);
        REQUIRE(p.apply(answer));
        SetArticleStatusEdit done(a, me, QStringLiteral("done"));
        REQUIRE(p.apply(done));
        REQUIRE(p.addCodingTime(a, me, 120));
    }

    qsizetype liveSpansOfC01() const
    {
        auto list = main->annotations(article(drawn));
        REQUIRE(list);
        return std::ranges::count_if(*list, [&](const Annotation &x) { return x.coder == c1; });
    }

    CodingState scopeOfC01() const
    {
        auto scope = CodingScope::load(*main, CodingScopeOptions {false, Phase::Reliability});
        REQUIRE(scope);
        CHECK_FALSE(scope->counts(article(drawn), c1));
        return scope->state(article(drawn), c1);
    }

    MergeConflict onlyConflict() const
    {
        auto open = CoderCopies::conflicts(*main, false);
        REQUIRE(open);
        REQUIRE(open->size() == 1);
        return open->front();
    }
};

} // namespace

TEST_CASE("work on a withdrawn draw in a copy is merged without bringing the draw back")
{
    WithdrawnFixture f;
    auto withdrawn = SubsampleDraw::withdraw(*f.main, Phase::Reliability);
    REQUIRE(withdrawn);
    CHECK(*withdrawn == 2); // C01 and C02 on the one drawn article
    f.codeInCopy();

    auto merged = CoderCopies::merge(*f.main, {f.copyPath});
    INFO((merged ? QString() : merged.error().message).toStdString());
    REQUIRE(merged);
    REQUIRE(merged->size() == 1);
    const MergeReport &r = merged->front();
    // The span and the answer are new to the project; the assignment is not taken.
    CHECK(r.added == 2);
    CHECK(r.changed == 0);
    CHECK(r.conflicts == 1);
    CHECK(r.seconds == 120);
    REQUIRE(r.withdrawn.size() == 1);
    CHECK(r.withdrawn.front().article == f.drawn);
    CHECK(r.withdrawn.front().phase == QStringLiteral("reliability"));
    const QString notice = CoderCopies::withdrawnNotice(r);
    CHECK(notice.contains(QStringLiteral("C01 coded")));
    CHECK(notice.contains(f.drawn + QStringLiteral(" (reliability)")));

    // The coder's work is there; the assignment stays withdrawn and the draw stays gone.
    CHECK(f.liveSpansOfC01() == 1);
    const store::AssignmentRecord a = f.record(f.drawn, f.c1);
    CHECK(a.deleted);
    CHECK(a.status == QStringLiteral("assigned"));
    CHECK(a.activeSeconds == 120); // the coding time is kept with it
    CHECK(a.answers == 1);
    auto draw = SubsampleDraw::recorded(*f.main, Phase::Reliability);
    REQUIRE(draw);
    CHECK_FALSE(draw->has_value());
    // Not done by a live assignment: the work does not count for reliability by itself.
    CHECK(f.scopeOfC01() == CodingState::InProgress);

    // The lead decides it as a conflict on the assignment.
    const MergeConflict c = f.onlyConflict();
    CHECK(c.objectType == QStringLiteral("assignment"));
    CHECK(c.objectUuid == a.uuid);
    CHECK(CoderCopies::isWithdrawnAssignment(c));
    CHECK(c.mine.value(QLatin1String("deleted")).toInteger() == 1);
    CHECK(c.theirs.value(QLatin1String("status")).toString() == QStringLiteral("done"));

    // Merging the copy again changes nothing.
    const QString after = f.dump();
    auto again = CoderCopies::merge(*f.main, {f.copyPath});
    REQUIRE(again);
    CHECK(again->front().alreadyMerged);
    CHECK(again->front().withdrawn.empty());
    CHECK(f.dump() == after);

    // Taking C01's version assigns the article again, done: now it counts. Undo restores all.
    ResolveConflictEdit take(f.c2, c.uuid, true);
    REQUIRE(f.main->apply(take));
    CHECK_FALSE(f.record(f.drawn, f.c1).deleted);
    CHECK(f.record(f.drawn, f.c1).status == QStringLiteral("done"));
    auto scope = CodingScope::load(*f.main, CodingScopeOptions {false, Phase::Reliability});
    REQUIRE(scope);
    CHECK(scope->counts(f.article(f.drawn), f.c1));
    REQUIRE(f.main->revert(take));
    CHECK(f.dump() == after);
}

TEST_CASE("a copy coded after the draw was withdrawn and drawn again leaves the new draw as drawn")
{
    WithdrawnFixture f;
    REQUIRE(SubsampleDraw::withdraw(*f.main, Phase::Reliability));
    // The new draw takes every article of the frame, so the coded one is in it again.
    auto d = SubsampleDraw::plan(*f.main, WithdrawnFixture::request(3, 3));
    REQUIRE(d);
    REQUIRE(d->articles.contains(f.drawn));
    REQUIRE(SubsampleDraw::commit(*f.main, *d));
    const store::AssignmentRecord fresh = f.record(f.drawn, f.c1);
    f.codeInCopy();

    auto merged = CoderCopies::merge(*f.main, {f.copyPath});
    INFO((merged ? QString() : merged.error().message).toStdString());
    REQUIRE(merged);
    const MergeReport &r = merged->front();
    REQUIRE(r.withdrawn.size() == 1);
    CHECK(r.withdrawn.front().article == f.drawn);
    CHECK(r.conflicts == 1);
    // The new draw's assignment is as the draw made it (its uuid, not done), with the time added.
    const store::AssignmentRecord now = f.record(f.drawn, f.c1);
    CHECK_FALSE(now.deleted);
    CHECK(now.uuid == fresh.uuid);
    CHECK(now.status == QStringLiteral("assigned"));
    CHECK(now.createdAt == fresh.createdAt);
    CHECK(now.activeSeconds == 120);
    CHECK(f.liveSpansOfC01() == 1);
    CHECK(f.scopeOfC01() == CodingState::InProgress);
    auto draw = SubsampleDraw::recorded(*f.main, Phase::Reliability);
    REQUIRE(draw);
    REQUIRE(draw->has_value());
    CHECK((*draw)->articles == d->articles);

    const MergeConflict c = f.onlyConflict();
    CHECK(c.objectUuid == fresh.uuid); // on the row the project holds, so it can be decided
    CHECK(CoderCopies::isWithdrawnAssignment(c));
    const QString after = f.dump();
    ResolveConflictEdit take(f.c2, c.uuid, true);
    REQUIRE(f.main->apply(take));
    CHECK(f.record(f.drawn, f.c1).status == QStringLiteral("done"));
    REQUIRE(f.main->revert(take));
    CHECK(f.dump() == after);
}

TEST_CASE("a copy coded after the draw was withdrawn and other articles drawn keeps both apart")
{
    WithdrawnFixture f;
    REQUIRE(SubsampleDraw::withdraw(*f.main, Phase::Reliability));
    // The first seed from 1 whose one-article draw misses the coded article.
    std::optional<Draw> other;
    for (std::uint64_t seed = 1; seed < 50 && !other; ++seed) {
        auto d = SubsampleDraw::plan(*f.main, WithdrawnFixture::request(1, seed));
        REQUIRE(d);
        if (!d->articles.contains(f.drawn))
            other = *d;
    }
    REQUIRE(other);
    REQUIRE(SubsampleDraw::commit(*f.main, *other));
    const QString newArticle = other->articles.front();
    f.codeInCopy();

    auto merged = CoderCopies::merge(*f.main, {f.copyPath});
    REQUIRE(merged);
    REQUIRE(merged->front().withdrawn.size() == 1);
    CHECK(merged->front().withdrawn.front().article == f.drawn);
    CHECK(f.record(f.drawn, f.c1).deleted);
    CHECK(f.liveSpansOfC01() == 1);
    // The new draw's article is untouched by the copy, for both coders.
    for (CoderId c : {f.c1, f.c2}) {
        const store::AssignmentRecord n = f.record(newArticle, c);
        CHECK_FALSE(n.deleted);
        CHECK(n.status == QStringLiteral("assigned"));
        CHECK_FALSE(n.hasWork());
    }
    CHECK(CoderCopies::isWithdrawnAssignment(f.onlyConflict()));
}

TEST_CASE("a copy not coded on the withdrawn draw merges without a word about it")
{
    WithdrawnFixture f;
    REQUIRE(SubsampleDraw::withdraw(*f.main, Phase::Reliability));
    auto merged = CoderCopies::merge(*f.main, {f.copyPath});
    REQUIRE(merged);
    CHECK(merged->front().added == 0);
    CHECK(merged->front().conflicts == 0);
    CHECK(merged->front().withdrawn.empty());
    CHECK(CoderCopies::withdrawnNotice(merged->front()).isEmpty());
    CHECK(f.record(f.drawn, f.c1).deleted);
    auto open = CoderCopies::conflicts(*f.main, false);
    REQUIRE(open);
    CHECK(open->empty());
}

TEST_CASE("a merge of work on a withdrawn draw refused for another copy writes nothing")
{
    WithdrawnFixture f;
    REQUIRE(SubsampleDraw::withdraw(*f.main, Phase::Reliability));
    f.codeInCopy();
    // A plain project file beside the copy: the whole merge is refused.
    const QString plain = f.dir.filePath(QStringLiteral("plain.fourfold"));
    REQUIRE(Project::create(plain));
    const QString before = f.dump();
    auto merged = CoderCopies::merge(*f.main, {f.copyPath, plain});
    REQUIRE_FALSE(merged);
    CHECK(merged.error().code == ErrorCode::InvalidInput);
    CHECK(merged.error().message.contains(plain));
    CHECK(f.dump() == before);
    CHECK(f.liveSpansOfC01() == 0);
}
