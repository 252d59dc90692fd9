#include "core/project/project.h"
#include "project_fixture.h"

#include <QFile>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("a new project holds the default codebook with the four functions")
{
    ProjectFixture f;
    auto book = f.project.codebook();
    REQUIRE(book);
    CHECK(book->number == 1);
    REQUIRE(book->functions.size() == 4);
    CHECK(book->definition(FramingFunction::Cause).label == QStringLiteral("Causal attribution"));
    CHECK_FALSE(book->definition(FramingFunction::Remedy).definition.isEmpty());
    CHECK_FALSE(book->definition(FramingFunction::Problem).rules.isEmpty());
    CHECK_FALSE(book->definition(FramingFunction::Evaluation).examples.isEmpty());
    // The attribute schema of the issue: polarity, actor, explicit/implicit; one article item.
    REQUIRE(book->definition(FramingFunction::Evaluation).attributes.size() == 1);
    CHECK(book->definition(FramingFunction::Evaluation).attributes[0].values
        == QStringList {
            QStringLiteral("negative"), QStringLiteral("neutral"), QStringLiteral("positive")});
    CHECK(book->definition(FramingFunction::Evaluation).attributes[0].level
        == MeasurementLevel::Ordinal);
    CHECK(book->definition(FramingFunction::Cause).attributes[0].key == QStringLiteral("actor"));
    CHECK(book->definition(FramingFunction::Remedy).attributes[0].values
        == QStringList {QStringLiteral("explicit"), QStringLiteral("implicit")});
    REQUIRE(book->item(QStringLiteral("dominant_function")));
    CHECK(book->validateJudgement(QStringLiteral("dominant_function"), QStringLiteral("remedy")));
    CHECK_FALSE(
        book->validateJudgement(QStringLiteral("dominant_function"), QStringLiteral("solution")));
}

TEST_CASE("creating over an existing file is refused")
{
    ProjectFixture f;
    auto again = Project::create(f.project.path());
    REQUIRE_FALSE(again);
    CHECK(again.error().code == ErrorCode::Duplicate);
}

TEST_CASE("opening a missing project names the file")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("missing.fourfold"));
    auto p = Project::open(path);
    REQUIRE_FALSE(p);
    CHECK(p.error().code == ErrorCode::NotFound);
    CHECK(p.error().message.contains(path));
}

TEST_CASE("a project reopens with its settings, coders and articles")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("p.fourfold"));
    {
        auto p = Project::create(
            path, Project::Settings {QStringLiteral("Ferry study"), QStringLiteral("nl")});
        REQUIRE(p);
        REQUIRE(
            p->addCoder(QStringLiteral("Test person"), QStringLiteral("C01"), CoderRole::Coder));
        REQUIRE(p->importFile(
            writeFile(dir, QStringLiteral("a.jsonl"), kTwoArticles), ImportOptions {}));
    }
    auto p = Project::open(path);
    REQUIRE(p);
    CHECK(p->settings().name == QStringLiteral("Ferry study"));
    CHECK(p->settings().defaultLanguage == QStringLiteral("nl"));
    CHECK(p->backupPath().isEmpty());
    auto coders = p->coders();
    REQUIRE(coders);
    REQUIRE(coders->size() == 1);
    CHECK((*coders)[0].pseudonym == QStringLiteral("C01"));
    auto articles = p->articles();
    REQUIRE(articles);
    CHECK(articles->size() == 2);
}

TEST_CASE("coders need a name and a unique pseudonym")
{
    ProjectFixture f;
    f.addCoder(QStringLiteral("C01"));
    auto dup =
        f.project.addCoder(QStringLiteral("Someone else"), QStringLiteral("C01"), CoderRole::Lead);
    REQUIRE_FALSE(dup);
    CHECK(dup.error().code == ErrorCode::Duplicate);
    auto empty = f.project.addCoder(QStringLiteral(" "), QStringLiteral("C02"), CoderRole::Coder);
    REQUIRE_FALSE(empty);
    CHECK(empty.error().code == ErrorCode::InvalidArgument);
}
