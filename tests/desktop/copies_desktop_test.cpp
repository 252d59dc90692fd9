// A coder copy in the desktop program's coding session: the same program opens it, the coder
// codes blind (only their articles and spans exist), and the session's undoable edits merge back.
#include "app/desktop/coding_session.h"
#include "tests/project/copies_fixture.h"

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("the coding session opens a coder copy, codes in it and its work merges back")
{
    CopiesFixture f;
    const QString path = f.handout(QStringLiteral("C02"), QStringLiteral("c02.fourfold"));
    {
        auto copy = Project::open(path);
        REQUIRE(copy);
        auto coders = copy->coders();
        REQUIRE(coders);
        REQUIRE(coders->size() == 1); // the only person to choose in the coder dialog
        const Coder me = coders->front();
        CHECK(me.pseudonym == QStringLiteral("C02"));
        CodingSession session(std::move(*copy), me);
        const auto rows = session.articleRows();
        REQUIRE(rows.size() == 2);
        CHECK(rows[0].summary.externalId == QStringLiteral("f1"));
        CHECK(rows[1].summary.externalId == QStringLiteral("f3"));
        const ArticleId f1 = rows[0].summary.id;
        CHECK(session.visibleAnnotations(f1).size() == 2); // C02's own two spans, nobody else's
        REQUIRE(session.addSpan(f1, FramingFunction::Cause,
            rangeOf(f.text1, QStringLiteral("Dr. Ilse Varn blames the budget."))));
        REQUIRE(session.addSpan(f1, FramingFunction::Evaluation,
            rangeOf(f.text1, QStringLiteral("It is a disgrace."))));
        session.undoStack()->undo(); // the evaluation was a slip
        REQUIRE(session.markDone(f1));
        CHECK(session.visibleAnnotations(f1).size() == 3);
    }
    auto reports = CoderCopies::merge(*f.main, {path});
    REQUIRE(reports);
    CHECK(reports->front().added == 1);
    CHECK(reports->front().changed == 1); // the status
    auto spans = f.main->annotations(f.f1, f.c2);
    REQUIRE(spans);
    CHECK(spans->size() == 3);
    CHECK(std::ranges::count_if(*spans, [](const Annotation &a) {
        return a.content.function == FramingFunction::Cause;
    }) == 1);
    auto assignments = f.main->assignments();
    REQUIRE(assignments);
    for (const Assignment &a : *assignments)
        if (a.article == f.f1 && a.coder == f.c2)
            CHECK(a.status == QStringLiteral("done"));
}
