#include "core/project/annotation_edits.h"
#include "core/project/testing/project_database.h"
#include "project_fixture.h"

#include <QCryptographicHash>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct CheckFixture : ProjectFixture {
    CheckFixture()
    {
        importJsonl(kTwoArticles);
        const CoderId c = addCoder(QStringLiteral("C01"));
        AddAnnotationEdit edit(articleId(QStringLiteral("f1")), c,
            AnnotationContent {FramingFunction::Problem, {0, 40}, {}, {}, {}});
        REQUIRE(project.apply(edit));
    }
    IntegrityReport check()
    {
        auto r = project.check();
        REQUIRE(r);
        return *r;
    }
};

} // namespace

TEST_CASE("a healthy project passes every check")
{
    CheckFixture f;
    const IntegrityReport r = f.check();
    CHECK(r.isClean());
    CHECK(r.articlesChecked == 2);
    CHECK(r.spansChecked == 1);
}

TEST_CASE("the check finds tampered quotes, spans, texts and hashes")
{
    CheckFixture f;
    Database &db = databaseForTesting(f.project);
    SECTION("a quote that differs from the text")
    {
        REQUIRE(db.exec(QStringLiteral(
            "UPDATE annotation SET quote = 'The ferry to Brakwater will stop in June'")));
        const IntegrityReport r = f.check();
        REQUIRE(r.problems.size() == 1);
        CHECK(r.problems[0].contains(QStringLiteral("quote differs")));
        CHECK(r.problems[0].contains(QStringLiteral("\"f1\"")));
    }
    SECTION("a span past the end of its text")
    {
        REQUIRE(db.exec(QStringLiteral("UPDATE annotation SET end = 4000")));
        const IntegrityReport r = f.check();
        REQUIRE(r.problems.size() == 1);
        CHECK(r.problems[0].contains(QStringLiteral("outside the text")));
    }
    SECTION("a text changed behind the program's back")
    {
        // Dropping the FTS triggers' view of it is not the point here: update both consistently.
        REQUIRE(db.exec(QStringLiteral(
            "UPDATE article SET text = replace(text, 'May', 'Mai') WHERE external_id = 'f1'")));
        const IntegrityReport r = f.check();
        CHECK(r.problems.join(QLatin1Char('\n'))
                  .contains(QStringLiteral("does not match its stored SHA-256")));
    }
    SECTION("a text that is not in NFC")
    {
        REQUIRE(db.exec(QStringLiteral("UPDATE article SET text = 'Cafe' || char(769), length = 5, "
                                       "sha256 = '%1' WHERE external_id = 'f2'")
                            .arg(QString::fromLatin1(QCryptographicHash::hash(
                                QStringLiteral("Cafe\u0301").toUtf8(), QCryptographicHash::Sha256)
                                                         .toHex()))));
        const IntegrityReport r = f.check();
        CHECK(r.problems.join(QLatin1Char('\n')).contains(QStringLiteral("not in canonical form")));
    }
}
