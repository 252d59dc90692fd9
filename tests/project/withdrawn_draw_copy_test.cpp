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

#include <QFile>
#include <QThread>

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
    std::unique_ptr<AssignEdit> drawEdit; // the draw, as an edit that can be undone

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
        auto edit = SubsampleDraw::edit(*main, *d, CoderId {});
        REQUIRE(edit);
        drawEdit = std::move(*edit);
        REQUIRE(main->apply(*drawEdit));
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

    // Commits a reliability draw of `size` articles from `seed` as an edit and returns it.
    std::unique_ptr<AssignEdit> drawAgain(int size, std::uint64_t seed)
    {
        auto d = SubsampleDraw::plan(*main, request(size, seed));
        REQUIRE(d);
        auto edit = SubsampleDraw::edit(*main, *d, CoderId {});
        REQUIRE(edit);
        REQUIRE(main->apply(**edit));
        return std::move(*edit);
    }

    // C01 codes the drawn article in the copy: a span, an answer, done, two minutes.
    void codeInCopy() const
    {
        codeIn(
            copyPath, QStringLiteral("C01"), FramingFunction::Problem, QStringLiteral("done"), 120);
    }

    // The coder `pseudonym` codes the drawn article in the copy `path`: a span of `function` on
    // the first sentence, the answer `function`, the status `status`, `seconds` of coding.
    void codeIn(const QString &path, const QString &pseudonym, FramingFunction function,
        const QString &status, qint64 seconds) const
    {
        Project p = openProject(path);
        const CoderId me = coderIn(p, pseudonym);
        const ArticleId a = articleIn(p, drawn);
        const QString text = textOf(p, a);
        // The first sentence of each fixture article, up to its first full stop.
        const QString quote = text.left(text.indexOf(QLatin1Char('.')));
        AddAnnotationEdit add(a, me, AnnotationContent {function, rangeOf(text, quote), {}, {}, {}},
            Phase::Reliability);
        REQUIRE(p.apply(add));
        SetJudgementEdit answer(
            a, me, QStringLiteral("dominant_function"), functionKey(function), Phase::Reliability);
        REQUIRE(p.apply(answer));
        SetArticleStatusEdit mark(a, me, status);
        REQUIRE(p.apply(mark));
        REQUIRE(p.addCodingTime(a, me, seconds));
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

TEST_CASE("undoing the withdrawal after the merge keeps the coder's time and work")
{
    WithdrawnFixture f;
    auto withdraw = SubsampleDraw::withdrawEdit(*f.main, Phase::Reliability, CoderId {});
    REQUIRE(withdraw);
    REQUIRE(f.main->apply(**withdraw));
    f.codeInCopy();
    REQUIRE(CoderCopies::merge(*f.main, {f.copyPath}));
    REQUIRE(f.record(f.drawn, f.c1).activeSeconds == 120);

    // The draw is back as it was, with the 120 s the merge brought (time only adds up).
    REQUIRE(f.main->revert(**withdraw));
    const store::AssignmentRecord back = f.record(f.drawn, f.c1);
    CHECK_FALSE(back.deleted);
    CHECK(back.status == QStringLiteral("assigned"));
    CHECK(back.activeSeconds == 120);
    CHECK(f.liveSpansOfC01() == 1);
    auto draw = SubsampleDraw::recorded(*f.main, Phase::Reliability);
    REQUIRE(draw);
    CHECK(draw->has_value());
    // Now the draw has work on it: it cannot be withdrawn again, and the refusal says so.
    auto again = SubsampleDraw::withdraw(*f.main, Phase::Reliability);
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::NotAllowed);
    CHECK(again.error().message.contains(QStringLiteral("coding has started on 1 of its 2")));
}

TEST_CASE("a draw drawn again after the merge gives the coder's time to the new assignment")
{
    WithdrawnFixture f;
    REQUIRE(SubsampleDraw::withdraw(*f.main, Phase::Reliability));
    f.codeInCopy();
    REQUIRE(CoderCopies::merge(*f.main, {f.copyPath}));
    const QString merged = f.dump();

    auto redraw = f.drawAgain(3, 3); // every article of the frame, the coded one too
    const store::AssignmentRecord fresh = f.record(f.drawn, f.c1);
    CHECK_FALSE(fresh.deleted);
    CHECK(fresh.status == QStringLiteral("assigned"));
    CHECK(fresh.activeSeconds == 120);
    CHECK(f.record(f.drawn, f.c2).activeSeconds == 0);
    // Undoing the new draw leaves the project as the merge left it.
    REQUIRE(f.main->revert(*redraw));
    CHECK(f.dump() == merged);
}

TEST_CASE("work on a draw undone after the hand-out comes back as a withdrawn assignment")
{
    WithdrawnFixture f;
    REQUIRE(f.main->revert(*f.drawEdit)); // the draw's rows are gone for good
    auto gone = store::assignmentRecord(
        databaseForTesting(*f.main), f.article(f.drawn), f.c1, Phase::Reliability);
    REQUIRE(gone);
    REQUIRE_FALSE(gone->has_value());
    f.codeInCopy();

    auto merged = CoderCopies::merge(*f.main, {f.copyPath});
    INFO((merged ? QString() : merged.error().message).toStdString());
    REQUIRE(merged);
    const MergeReport &r = merged->front();
    REQUIRE(r.withdrawn.size() == 1);
    CHECK(r.withdrawn.front().article == f.drawn);
    CHECK(r.seconds == 120);
    CHECK(r.conflicts == 1);
    const store::AssignmentRecord a = f.record(f.drawn, f.c1);
    CHECK(a.deleted);
    CHECK(a.status == QStringLiteral("assigned"));
    CHECK(a.activeSeconds == 120);
    CHECK(f.liveSpansOfC01() == 1);
    CHECK(f.scopeOfC01() == CodingState::InProgress);

    const MergeConflict c = f.onlyConflict();
    CHECK(c.objectUuid == a.uuid);
    CHECK(CoderCopies::isWithdrawnAssignment(c));
    const QString after = f.dump();
    auto again = CoderCopies::merge(*f.main, {f.copyPath});
    REQUIRE(again);
    CHECK(again->front().alreadyMerged);
    CHECK(f.dump() == after);
    ResolveConflictEdit take(f.c2, c.uuid, true);
    REQUIRE(f.main->apply(take));
    CHECK_FALSE(f.record(f.drawn, f.c1).deleted);
    CHECK(f.record(f.drawn, f.c1).status == QStringLiteral("done"));
    REQUIRE(f.main->revert(take));
    CHECK(f.dump() == after);
}

TEST_CASE("copies with work on a withdrawn draw merge to the same project in any order")
{
    WithdrawnFixture f;
    // A second copy for C01 and one for C02, all handed out while the draw stood.
    const QString a2 = f.dir.filePath(QStringLiteral("c01-second.fourfold"));
    const QString b = f.dir.filePath(QStringLiteral("c02.fourfold"));
    REQUIRE(CoderCopies::handout(*f.main, QStringLiteral("C01"), a2));
    REQUIRE(CoderCopies::handout(*f.main, QStringLiteral("C02"), b));
    REQUIRE(SubsampleDraw::withdraw(*f.main, Phase::Reliability));
    f.codeIn(
        f.copyPath, QStringLiteral("C01"), FramingFunction::Problem, QStringLiteral("done"), 120);
    QThread::msleep(20); // later edits get later times
    f.codeIn(a2, QStringLiteral("C01"), FramingFunction::Cause, QStringLiteral("started"), 40);
    f.codeIn(b, QStringLiteral("C02"), FramingFunction::Remedy, QStringLiteral("done"), 60);
    f.main.reset();
    const QString start = f.dir.filePath(QStringLiteral("start.fourfold"));
    REQUIRE(QFile::copy(f.mainPath, start));

    const std::vector<std::pair<const char *, std::vector<QStringList>>> orders {
        {"A A2 B in one call", {{f.copyPath, a2, b}}},
        {"B A2 A in one call", {{b, a2, f.copyPath}}},
        {"A2 A B one by one", {{a2}, {f.copyPath}, {b}}},
        {"B A A2 one by one", {{b}, {f.copyPath}, {a2}}},
    };
    QString firstRows;
    QString firstConflicts;
    for (const auto &[name, calls] : orders) {
        INFO(name);
        const QString path = f.dir.filePath(QString::fromLatin1(name) + ".fourfold");
        REQUIRE(QFile::copy(start, path));
        Project p = openProject(path);
        QStringList named;
        for (const QStringList &call : calls)
            for (const MergeReport &r : mergeInto(p, call))
                for (const WithdrawnWork &w : r.withdrawn)
                    named << r.coderPseudonym + QLatin1Char(':') + w.article;
        named.sort();
        CHECK(named
            == QStringList {QStringLiteral("C01:") + f.drawn, QStringLiteral("C01:") + f.drawn,
                QStringLiteral("C02:") + f.drawn});
        const QString rows = uuidDump(
            databaseForTesting(p), kOrderFree + QStringList {QStringLiteral("merge_conflict")});
        const QString conflicts = conflictDump(path);
        if (firstRows.isEmpty()) {
            firstRows = rows;
            firstConflicts = conflicts;
        } else {
            CHECK(rows == firstRows);
            CHECK(conflicts == firstConflicts);
        }
        // Both coders' assignments stay withdrawn; every copy's version waits for the lead.
        for (const char *coder : {"C01", "C02"})
            CHECK(count(path,
                      QStringLiteral("SELECT s.deleted FROM assignment s JOIN coder c ON c.id = "
                                     "s.coder_id JOIN article a ON a.id = s.article_id WHERE "
                                     "c.pseudonym = '%1' AND a.external_id = '%2'")
                          .arg(QLatin1String(coder), f.drawn)
                          .toUtf8()
                          .constData())
                == 1);
        auto open = CoderCopies::conflicts(p, false);
        REQUIRE(open);
        // C01's two answers to one item compete as well (the later, A2's, stays live).
        CHECK(open->size() == 4);
        CHECK(std::ranges::count_if(*open, &CoderCopies::isWithdrawnAssignment) == 3);
        CHECK(std::ranges::count_if(*open, [](const MergeConflict &c) {
            return c.objectType == QLatin1String("judgement");
        }) == 1);
        // The time of all three copies is kept.
        CHECK(count(path, "SELECT sum(active_seconds) FROM assignment") == 220);
    }
}

TEST_CASE("the copies holding a draw's assignments are named before it is withdrawn")
{
    WithdrawnFixture f;
    // C01's copy holds the draw's one article; C02 has none; a copy for C01 handed out before
    // the draw holds nothing of it.
    auto held = CoderCopies::copiesHoldingDraw(*f.main, Phase::Reliability);
    REQUIRE(held);
    REQUIRE(held->size() == 1);
    CHECK(held->front().coder == QStringLiteral("C01"));
    CHECK(held->front().articles == QStringList {f.drawn});
    auto info = [&] {
        Project copy = openProject(f.copyPath);
        auto i = CoderCopies::copyInfo(copy);
        REQUIRE(i);
        REQUIRE(i->has_value());
        return **i;
    }();
    CHECK(held->front().copyUuid == info.copyUuid);
    CHECK_FALSE(held->front().handedOutAt.isEmpty());
    const QString notice = CoderCopies::copyOutNotice(held->front());
    CHECK(notice.startsWith(QStringLiteral("C01's coder copy, handed out ")));
    CHECK(notice.contains(QStringLiteral("(") + f.drawn + QStringLiteral(")")));

    // A second copy for C02 is named too, after C01's (hand-out order).
    const QString b = f.dir.filePath(QStringLiteral("c02.fourfold"));
    REQUIRE(CoderCopies::handout(*f.main, QStringLiteral("C02"), b));
    held = CoderCopies::copiesHoldingDraw(*f.main, Phase::Reliability);
    REQUIRE(held);
    REQUIRE(held->size() == 2);
    CHECK(held->back().coder == QStringLiteral("C02"));
    CHECK(held->back().articles == QStringList {f.drawn});

    // The pilot phase has no draw: no copies to name.
    auto none = CoderCopies::copiesHoldingDraw(*f.main, Phase::Pilot);
    REQUIRE(none);
    CHECK(none->empty());
}
