#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/paragraph_role_edit.h"
#include "core/project/testing/project_database.h"
#include "project_fixture.h"
#include "tests/support/db_dump.h"

#include <QRegularExpression>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct EditFixture : ProjectFixture {
    ArticleId f1;
    CoderId c1;
    EditFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        c1 = addCoder(QStringLiteral("C01"));
    }
    QString dump() { return dumpDatabase(databaseForTesting(project)); }

    AnnotationId add(FramingFunction function, TextRange range, QJsonObject attributes = {})
    {
        AddAnnotationEdit edit(f1, c1, AnnotationContent {function, range, attributes, {}, {}});
        REQUIRE(project.apply(edit));
        return edit.annotationId();
    }
};

// "The ferry to Brakwater will stop in May. Dr. Ilse Varn blames the budget.\n\n..."
constexpr TextRange kFirstSentence {0, 40};
constexpr TextRange kBlame {41, 73};

} // namespace

TEST_CASE("an added span stores the quote from the text and the codebook version")
{
    EditFixture f;
    const AnnotationId id = f.add(FramingFunction::Cause, kBlame,
        QJsonObject {{QStringLiteral("actor"), QStringLiteral("budget")}});
    auto a = f.project.annotation(id);
    REQUIRE(a);
    CHECK(a->quote == QStringLiteral("Dr. Ilse Varn blames the budget."));
    CHECK(a->content.function == FramingFunction::Cause);
    CHECK(a->coder == f.c1);
    CHECK(a->codebookVersion.isValid());
    CHECK(a->uuid.size() == 36);
}

TEST_CASE("edits apply and revert to an identical database dump")
{
    EditFixture f;
    const AnnotationId existing = f.add(FramingFunction::Problem, kFirstSentence);
    const AnnotationId other = f.add(FramingFunction::Cause, kBlame);
    QString before = f.dump();

    std::unique_ptr<Edit> edit;
    SECTION("add")
    {
        edit = std::make_unique<AddAnnotationEdit>(f.f1, f.c1,
            AnnotationContent {FramingFunction::Remedy, {75, 107},
                {{QStringLiteral("explicitness"), QStringLiteral("explicit")}},
                QStringLiteral("a note"), 0.5});
    }
    SECTION("change")
    {
        edit = std::make_unique<ChangeAnnotationEdit>(existing,
            AnnotationContent {FramingFunction::Evaluation, {4, 9},
                {{QStringLiteral("polarity"), QStringLiteral("neutral")}}, {}, 1.0},
            f.c1);
    }
    SECTION("delete")
    {
        edit = std::make_unique<DeleteAnnotationEdit>(existing, f.c1);
    }
    SECTION("mark done without an assignment (creates one)")
    {
        edit = std::make_unique<SetArticleStatusEdit>(f.f1, f.c1, QStringLiteral("done"));
    }
    SECTION("mark done with an assignment")
    {
        REQUIRE(f.project.assign(f.f1, f.c1, Phase::Pilot));
        before = f.dump();
        edit = std::make_unique<SetArticleStatusEdit>(f.f1, f.c1, QStringLiteral("done"));
    }
    SECTION("paragraph role")
    {
        edit = std::make_unique<SetParagraphRoleEdit>(f.f1, 1, ParagraphRole::Body, f.c1);
    }
    SECTION("link")
    {
        edit = std::make_unique<LinkAnnotationsEdit>(
            other, existing, QStringLiteral("explains"), f.c1);
    }
    SECTION("unlink")
    {
        LinkAnnotationsEdit link(other, existing, QStringLiteral("judges"), f.c1);
        REQUIRE(f.project.apply(link));
        before = f.dump();
        edit = std::make_unique<UnlinkAnnotationsEdit>(link.linkId(), f.c1);
    }
    SECTION("withdraw an answer")
    {
        SetJudgementEdit answer(
            f.f1, f.c1, QStringLiteral("dominant_function"), QStringLiteral("cause"));
        REQUIRE(f.project.apply(answer));
        before = f.dump();
        edit = std::make_unique<WithdrawJudgementEdit>(
            f.f1, f.c1, QStringLiteral("dominant_function"));
    }
    SECTION("answer an article-level item, first time and again")
    {
        SetJudgementEdit first(
            f.f1, f.c1, QStringLiteral("dominant_function"), QStringLiteral("problem"));
        REQUIRE(f.project.apply(first));
        edit = std::make_unique<SetJudgementEdit>(
            f.f1, f.c1, QStringLiteral("dominant_function"), QStringLiteral("cause"));
        REQUIRE(f.project.apply(*edit));
        auto j = f.project.judgements(f.f1);
        REQUIRE(j);
        REQUIRE(j->size() == 1);
        CHECK((*j)[0].value == QStringLiteral("cause"));
        REQUIRE(f.project.revert(*edit));
        REQUIRE(f.project.revert(first));
        CHECK(f.dump() == before);
        return;
    }
    REQUIRE(f.project.apply(*edit));
    const QString applied = f.dump();
    CHECK(applied != before);
    REQUIRE(f.project.revert(*edit));
    CHECK(f.dump() == before);
    // Redo gives the same state again, with the same uuids (only times may move).
    REQUIRE(f.project.apply(*edit));
    CHECK(withoutTimes(f.dump()) == withoutTimes(applied));
    REQUIRE(f.project.revert(*edit));
    CHECK(f.dump() == before);
}

TEST_CASE("a redone add keeps its uuid")
{
    EditFixture f;
    AddAnnotationEdit edit(
        f.f1, f.c1, AnnotationContent {FramingFunction::Problem, kFirstSentence, {}, {}, {}});
    REQUIRE(f.project.apply(edit));
    const QString uuid = f.project.annotation(edit.annotationId())->uuid;
    REQUIRE(f.project.revert(edit));
    REQUIRE(f.project.apply(edit));
    CHECK(f.project.annotation(edit.annotationId())->uuid == uuid);
}

TEST_CASE("a deleted span is a tombstone, not a lost row")
{
    EditFixture f;
    const AnnotationId id = f.add(FramingFunction::Problem, kFirstSentence);
    DeleteAnnotationEdit del(id, f.c1);
    REQUIRE(f.project.apply(del));
    auto live = f.project.annotations(f.f1);
    REQUIRE(live);
    CHECK(live->empty());
    auto row = f.project.annotation(id);
    REQUIRE(row);
    CHECK(row->deleted);
    // Deleting it again is refused.
    DeleteAnnotationEdit again(id, f.c1);
    auto st = f.project.apply(again);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);
}

TEST_CASE("invalid edits are refused and change nothing")
{
    EditFixture f;
    const AnnotationId a = f.add(FramingFunction::Problem, kFirstSentence);
    const QString before = f.dump();
    struct Case {
        const char *name;
        std::function<std::unique_ptr<Edit>()> make;
        ErrorCode code;
    };
    const Case cases[] = {
        {"range past the end",
            [&] {
                return std::make_unique<AddAnnotationEdit>(f.f1, f.c1,
                    AnnotationContent {FramingFunction::Problem, {100, 500}, {}, {}, {}});
            },
            ErrorCode::InvalidArgument},
        {"empty range",
            [&] {
                return std::make_unique<AddAnnotationEdit>(
                    f.f1, f.c1, AnnotationContent {FramingFunction::Problem, {5, 5}, {}, {}, {}});
            },
            ErrorCode::InvalidArgument},
        {"attribute not in the schema",
            [&] {
                return std::make_unique<AddAnnotationEdit>(f.f1, f.c1,
                    AnnotationContent {FramingFunction::Problem, {0, 5},
                        {{QStringLiteral("polarity"), QStringLiteral("negative")}}, {}, {}});
            },
            ErrorCode::InvalidInput},
        {"value not in the value set",
            [&] {
                return std::make_unique<AddAnnotationEdit>(f.f1, f.c1,
                    AnnotationContent {FramingFunction::Evaluation, {0, 5},
                        {{QStringLiteral("polarity"), QStringLiteral("furious")}}, {}, {}});
            },
            ErrorCode::InvalidInput},
        {"confidence above 1",
            [&] {
                return std::make_unique<AddAnnotationEdit>(
                    f.f1, f.c1, AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, 1.5});
            },
            ErrorCode::InvalidArgument},
        {"unknown coder",
            [&] {
                return std::make_unique<AddAnnotationEdit>(f.f1, CoderId {99},
                    AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
            },
            ErrorCode::Constraint},
        {"unknown article",
            [&] {
                return std::make_unique<AddAnnotationEdit>(ArticleId {99}, f.c1,
                    AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
            },
            ErrorCode::NotFound},
        {"self link",
            [&] {
                return std::make_unique<LinkAnnotationsEdit>(a, a, QStringLiteral("judges"), f.c1);
            },
            ErrorCode::InvalidArgument},
        {"change of a missing span",
            [&] {
                return std::make_unique<ChangeAnnotationEdit>(AnnotationId {99},
                    AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}}, f.c1);
            },
            ErrorCode::NotFound},
        {"unknown item",
            [&] {
                return std::make_unique<SetJudgementEdit>(
                    f.f1, f.c1, QStringLiteral("tone"), QStringLiteral("dark"));
            },
            ErrorCode::NotFound},
    };
    for (const Case &c : cases) {
        INFO(c.name);
        auto edit = c.make();
        auto st = f.project.apply(*edit);
        REQUIRE_FALSE(st);
        CHECK(st.error().code == c.code);
        CHECK(f.dump() == before);
    }
}

TEST_CASE("links between spans of two articles are refused")
{
    EditFixture f;
    const AnnotationId a = f.add(FramingFunction::Problem, kFirstSentence);
    AddAnnotationEdit inOther(f.articleId(QStringLiteral("f2")), f.c1,
        AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(inOther));
    LinkAnnotationsEdit link(a, inOther.annotationId(), QStringLiteral("judges"), f.c1);
    auto st = f.project.apply(link);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("a removed link leaves the article's links and comes back on undo")
{
    EditFixture f;
    const AnnotationId cause = f.add(FramingFunction::Cause, kFirstSentence);
    const AnnotationId evaluation = f.add(FramingFunction::Evaluation, {75, 107},
        {{QStringLiteral("polarity"), QStringLiteral("negative")}});
    LinkAnnotationsEdit link(evaluation, cause, QStringLiteral("judges"), f.c1);
    REQUIRE(f.project.apply(link));
    auto linksNow = [&] {
        auto l = f.project.links(f.f1);
        REQUIRE(l);
        return l->size();
    };
    REQUIRE(linksNow() == 1);
    UnlinkAnnotationsEdit unlink(link.linkId(), f.c1);
    REQUIRE(f.project.apply(unlink));
    CHECK(linksNow() == 0);
    CHECK(unlink.text() == QStringLiteral("Remove link (judges)"));
    // Removing it again is refused: there is nothing left to remove.
    UnlinkAnnotationsEdit again(link.linkId(), f.c1);
    auto st = f.project.apply(again);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);
    REQUIRE(f.project.revert(unlink));
    CHECK(linksNow() == 1);
    UnlinkAnnotationsEdit unknown(LinkId {9999}, f.c1);
    CHECK_FALSE(f.project.apply(unknown));
}

TEST_CASE("a withdrawn answer leaves the item unanswered and comes back on undo")
{
    EditFixture f;
    const QString item = QStringLiteral("dominant_function");
    auto answersNow = [&] {
        auto j = f.project.judgements(f.f1);
        REQUIRE(j);
        return *j;
    };
    SetJudgementEdit answer(f.f1, f.c1, item, QStringLiteral("remedy"));
    REQUIRE(f.project.apply(answer));
    REQUIRE(answersNow().size() == 1);
    const QString uuid = answersNow().front().uuid;

    WithdrawJudgementEdit withdraw(f.f1, f.c1, item);
    REQUIRE(f.project.apply(withdraw));
    CHECK(answersNow().empty());
    CHECK(withdraw.text() == QStringLiteral("Withdraw answer \"dominant_function\""));
    // Withdrawing again is refused: there is no answer left.
    WithdrawJudgementEdit again(f.f1, f.c1, item);
    auto st = f.project.apply(again);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);
    // A new answer after the withdrawal is a row of its own beside the tombstone.
    SetJudgementEdit anew(f.f1, f.c1, item, QStringLiteral("problem"));
    REQUIRE(f.project.apply(anew));
    REQUIRE(answersNow().size() == 1);
    CHECK(answersNow().front().value == QStringLiteral("problem"));
    CHECK(answersNow().front().uuid != uuid);
    REQUIRE(f.project.revert(anew));

    REQUIRE(f.project.revert(withdraw));
    REQUIRE(answersNow().size() == 1);
    CHECK(answersNow().front().value == QStringLiteral("remedy"));
    CHECK(answersNow().front().uuid == uuid);
}

TEST_CASE("every edit and its undo are written to the event log")
{
    EditFixture f;
    auto eventCount = [&] {
        auto c = f.project.counts();
        REQUIRE(c);
        return c->events;
    };
    const qint64 before = eventCount();
    AddAnnotationEdit edit(
        f.f1, f.c1, AnnotationContent {FramingFunction::Problem, kFirstSentence, {}, {}, {}});
    REQUIRE(f.project.apply(edit));
    CHECK(eventCount() == before + 1);
    REQUIRE(f.project.revert(edit));
    CHECK(eventCount() == before + 2);
}

TEST_CASE("a lead can change a paragraph's role; an unknown paragraph is refused")
{
    EditFixture f;
    SetParagraphRoleEdit edit(f.f1, 0, ParagraphRole::Body, f.c1);
    REQUIRE(f.project.apply(edit));
    CHECK(f.project.article(f.f1)->paragraphs[0].role == ParagraphRole::Body);
    REQUIRE(f.project.revert(edit));
    CHECK(f.project.article(f.f1)->paragraphs[0].role == ParagraphRole::Intro);
    SetParagraphRoleEdit missing(f.f1, 7, ParagraphRole::Body, f.c1);
    auto st = f.project.apply(missing);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::NotFound);
}

TEST_CASE("article status lives on the coder's assignments; coding time adds up")
{
    EditFixture f;
    REQUIRE(f.project.assign(f.f1, f.c1, Phase::Reliability));
    SetArticleStatusEdit done(f.f1, f.c1, QStringLiteral("done"));
    REQUIRE(f.project.apply(done));
    REQUIRE(f.project.addCodingTime(f.f1, f.c1, 40));
    REQUIRE(f.project.addCodingTime(f.f1, f.c1, 2));
    auto a = f.project.assignments();
    REQUIRE(a);
    REQUIRE(a->size() == 1);
    CHECK((*a)[0].status == QStringLiteral("done"));
    CHECK((*a)[0].activeSeconds == 42);
    REQUIRE(f.project.revert(done));
    CHECK((*f.project.assignments())[0].status == QStringLiteral("assigned"));
    SetArticleStatusEdit bad(f.f1, f.c1, QStringLiteral("finished"));
    auto st = f.project.apply(bad);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("a span's quote and bounds count code points beyond ASCII and the BMP")
{
    ProjectFixture f;
    // "Café 🚢 Brakwater 渡船 closes." : é is 2 UTF-8 bytes, the ship 4 bytes and 2 UTF-16
    // units, each CJK character 3 bytes; 27 code points in all.
    f.importJsonl("{\"id\":\"w1\",\"title\":\"W\",\"language\":\"en\",\"text\":"
                  "\"Caf\xC3\xA9 \xF0\x9F\x9A\xA2 Brakwater \xE6\xB8\xA1\xE8\x88\xB9 closes.\"}\n");
    const ArticleId w1 = f.articleId(QStringLiteral("w1"));
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    AddAnnotationEdit ship(
        w1, c1, AnnotationContent {FramingFunction::Problem, {5, 16}, {}, {}, {}});
    REQUIRE(f.project.apply(ship));
    CHECK(f.project.annotation(ship.annotationId())->quote
        == QString::fromUtf8("\xF0\x9F\x9A\xA2 Brakwater"));
    AddAnnotationEdit last(
        w1, c1, AnnotationContent {FramingFunction::Cause, {17, 27}, {}, {}, {}});
    REQUIRE(f.project.apply(last));
    CHECK(f.project.annotation(last.annotationId())->quote
        == QString::fromUtf8("\xE6\xB8\xA1\xE8\x88\xB9 closes."));
    AddAnnotationEdit past(
        w1, c1, AnnotationContent {FramingFunction::Cause, {17, 28}, {}, {}, {}});
    const Status refused = f.project.apply(past);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::InvalidArgument);
    CHECK(refused.error().message.contains(QStringLiteral("of 27 characters")));
}

TEST_CASE("an edit that fails inside a batch without its own savepoint fails the whole batch")
{
    EditFixture f;
    const QString before = f.dump();
    AddAnnotationEdit good(
        f.f1, f.c1, AnnotationContent {FramingFunction::Problem, kFirstSentence, {}, {}, {}});
    AddAnnotationEdit bad(
        f.f1, f.c1, AnnotationContent {FramingFunction::Problem, {100, 500}, {}, {}, {}});
    // The work goes on after the failure and reports success; the batch still fails.
    const Status st = f.project.batch([&]() -> Status {
        REQUIRE(f.project.applyInBatch(good));
        CHECK_FALSE(f.project.applyInBatch(bad));
        return {};
    });
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);
    CHECK(f.dump() == before);
    // Outside a batch it is refused.
    const Status alone = f.project.applyInBatch(good);
    REQUIRE_FALSE(alone);
    CHECK(alone.error().code == ErrorCode::Internal);
    CHECK(f.dump() == before);
}
