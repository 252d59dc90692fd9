#include "core/project/annotation_edits.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "project_fixture.h"

#include <QFile>
#include <QProcess>

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
    // The attribute schema: polarity, actor, explicit/implicit, and a closed category list per
    // function for the frame elements (Matthes & Kohring 2008: problem, the responsible actor's
    // kind, what is evaluated, the kind of remedy); one article item.
    REQUIRE(book->definition(FramingFunction::Evaluation).attributes.size() == 2);
    CHECK(book->definition(FramingFunction::Evaluation).attributes[1].key
        == QStringLiteral("object"));
    CHECK(book->definition(FramingFunction::Problem).attributes[0].key == QStringLiteral("issue"));
    CHECK(book->definition(FramingFunction::Cause).attributes[1].key
        == QStringLiteral("actor_category"));
    CHECK(
        book->definition(FramingFunction::Cause).attributes[1].type == AttributeSpec::Type::Choice);
    CHECK(book->definition(FramingFunction::Remedy).attributes[1].key
        == QStringLiteral("remedy_type"));
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
        f.project.addCoder(QStringLiteral("Someone else"), QStringLiteral("C01"), CoderRole::Coder);
    REQUIRE_FALSE(dup);
    CHECK(dup.error().code == ErrorCode::Duplicate);
    auto empty = f.project.addCoder(QStringLiteral(" "), QStringLiteral("C02"), CoderRole::Coder);
    REQUIRE_FALSE(empty);
    CHECK(empty.error().code == ErrorCode::InvalidArgument);
}

namespace {

// Another process (Python's sqlite3 module, outside Fourfold) that takes the project's write
// lock, says "locked", holds it for `seconds` and commits.
struct LockHolder {
    QProcess process;
    LockHolder(const QString &path, double seconds)
    {
        process.start(QStringLiteral("/usr/bin/python3"),
            {QStringLiteral("-c"),
                QStringLiteral("import sqlite3, sys, time\n"
                               "c = sqlite3.connect(sys.argv[1], isolation_level=None)\n"
                               "c.execute('BEGIN IMMEDIATE')\n"
                               "print('locked', flush=True)\n"
                               "time.sleep(float(sys.argv[2]))\n"
                               "c.execute('COMMIT')\n"),
                path, QString::number(seconds)});
        REQUIRE(process.waitForStarted(10000));
        REQUIRE(process.waitForReadyRead(10000));
        REQUIRE(process.readLine().trimmed() == "locked");
    }
    ~LockHolder() { process.waitForFinished(20000); }
};

} // namespace

TEST_CASE("an edit waits for another process's write and then lands")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    const ArticleId f1 = f.articleId(QStringLiteral("f1"));
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    LockHolder other(f.project.path(), 1.0);
    // The other writer holds the lock for a second; the busy timeout is five.
    AddAnnotationEdit edit(
        f1, c1, AnnotationContent {FramingFunction::Problem, {0, 9}, {}, {}, {}});
    const Status applied = f.project.apply(edit);
    INFO((applied ? QString() : applied.error().toString()).toStdString());
    REQUIRE(applied);
    auto spans = f.project.annotations(f1);
    REQUIRE(spans);
    CHECK(spans->size() == 1);
}

TEST_CASE("an edit that cannot get the write lock in time fails once and writes nothing")
{
    ProjectFixture f;
    f.importJsonl(kTwoArticles);
    const ArticleId f1 = f.articleId(QStringLiteral("f1"));
    const CoderId c1 = f.addCoder(QStringLiteral("C01"));
    databaseForTesting(f.project).setBusyTimeout(100);
    LockHolder other(f.project.path(), 2.0);
    AddAnnotationEdit edit(
        f1, c1, AnnotationContent {FramingFunction::Problem, {0, 9}, {}, {}, {}});
    const Status applied = f.project.apply(edit);
    REQUIRE_FALSE(applied);
    CHECK(applied.error().code == ErrorCode::Busy);
    other.process.waitForFinished(20000);
    auto spans = f.project.annotations(f1);
    REQUIRE(spans);
    CHECK(spans->empty());
    // Once the other writer is done, the same edit lands.
    REQUIRE(f.project.apply(edit));
}

TEST_CASE("the default codebook speaks Dutch and German wherever it speaks English")
{
    // Every text of the default codebook (name, labels, definitions, each rule and example,
    // attribute labels, the item's question) has a Dutch and a German version, rule for rule.
    ProjectFixture f;
    auto book = f.project.codebook();
    REQUIRE(book);
    for (const QString &language : {QStringLiteral("nl"), QStringLiteral("de")}) {
        INFO(language.toStdString());
        REQUIRE(book->translations.contains(language));
        const CodebookTexts &t = book->translations.value(language);
        CHECK_FALSE(t.name.isEmpty());
        for (const FunctionDefinition &def : book->functions) {
            INFO(functionKey(def.function).toStdString());
            REQUIRE(t.functions.contains(def.function));
            const FunctionTexts &ft = t.functions.value(def.function);
            CHECK_FALSE(ft.label.isEmpty());
            CHECK_FALSE(ft.definition.isEmpty());
            CHECK(ft.rules.size() == def.rules.size());
            CHECK(ft.examples.size() == def.examples.size());
            for (const AttributeSpec &a : def.attributes)
                CHECK(ft.attributeLabels.contains(a.key));
            CHECK(ft.definition != def.definition);
        }
        for (const ArticleItem &item : book->items)
            CHECK(t.questions.contains(item.key));
    }
}
