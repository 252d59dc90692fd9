// Codebook versions (core/project/codebook_versions): a new version with its readable diff, and
// adding one as an undoable edit.
#include "core/project/annotation_edits.h"
#include "core/project/codebook_versions.h"
#include "core/project/testing/project_database.h"
#include "tests/project/study_fixture.h"
#include "tests/support/db_dump.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QRegularExpression>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Version 1 with a sharper problem definition.
Codebook sharper(const Codebook &v1)
{
    Codebook v2 = v1;
    v2.functions[size_t(FramingFunction::Problem)].definition =
        QStringLiteral("What the text presents as the issue that needs attention.");
    return v2;
}

} // namespace

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
    auto added = CodebookVersions::addFromFile(
        f.project, path, QStringLiteral("Sharper problem definition"), f.lead);
    REQUIRE(added);
    CHECK(added->number == 2);
    CHECK(added->createdBy == QStringLiteral("L01"));
    CHECK(added->note == QStringLiteral("Sharper problem definition"));

    auto diff = CodebookVersions::diffBetween(f.project, 1, 2);
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
    const QString text = CodebookVersions::diffText(*diff);
    CHECK(text.startsWith(QStringLiteral("Codebook version 1 → 2\n~ problem.definition: «")));
    CHECK(text.contains(QStringLiteral("\n+ evaluation.attributes.target: «Target (text)»")));
    auto back = CodebookVersions::diffBetween(f.project, 2, 1);
    REQUIRE(back);
    CHECK(back->changes[3].kind == CodebookChange::Kind::Removed);

    // New spans are made under the new version.
    AddAnnotationEdit fresh(a1, c1, AnnotationContent {FramingFunction::Cause, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(fresh));
    CHECK(f.project.annotation(fresh.annotationId())->codebookVersion == added->id);

    // Nothing to record, no note, a malformed file: refused, nothing written.
    const auto before = dumpDatabase(databaseForTesting(f.project));
    CHECK(
        CodebookVersions::addFromFile(f.project, path, QStringLiteral("again"), f.lead).error().code
        == ErrorCode::InvalidArgument);
    CHECK(CodebookVersions::add(f.project, *v1, QStringLiteral(" "), f.lead).error().code
        == ErrorCode::InvalidArgument);
    const QString broken = writeFile(f.dir, QStringLiteral("broken.json"), "{\"functions\": 3}");
    auto bad = CodebookVersions::addFromFile(f.project, broken, QStringLiteral("x"), f.lead);
    REQUIRE_FALSE(bad);
    CHECK(bad.error().code == ErrorCode::InvalidInput);
    CHECK(bad.error().toString().contains(QStringLiteral("broken.json")));
    CHECK(CodebookVersions::diffBetween(f.project, 1, 9).error().code == ErrorCode::NotFound);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}

TEST_CASE("a new codebook version is one edit: undo restores the full dump and redo the same row")
{
    StudyFixture f;
    auto v1 = f.project.codebook();
    REQUIRE(v1);
    const QString before = dumpDatabase(databaseForTesting(f.project));
    auto edit =
        CodebookVersions::addEdit(f.project, sharper(*v1), QStringLiteral("Sharper"), f.lead);
    REQUIRE(edit);
    CHECK((*edit)->number() == 2);
    CHECK((*edit)->text() == QStringLiteral("Save codebook version 2"));
    // What the event log records: the diff against version 1 and the note.
    const QJsonObject detail = (*edit)->detail();
    CHECK(detail.value(QStringLiteral("from")).toInt() == 1);
    CHECK(detail.value(QStringLiteral("to")).toInt() == 2);
    CHECK(detail.value(QStringLiteral("note")).toString() == QStringLiteral("Sharper"));
    CHECK(detail.value(QStringLiteral("changes")).toArray().size() == 1);
    REQUIRE(f.project.apply(**edit));
    CHECK(f.project.codebook()->number == 2);
    const QString applied = dumpDatabase(databaseForTesting(f.project));
    CHECK(dumpDatabase(databaseForTesting(f.project), {}).count(QStringLiteral("codebook.version"))
        == 1);

    REQUIRE(f.project.revert(**edit));
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
    CHECK(f.project.codebook()->number == 1);
    REQUIRE(f.project.apply(**edit));
    CHECK(withoutTimes(dumpDatabase(databaseForTesting(f.project))) == withoutTimes(applied));
    CHECK(f.project.codebook()->definition(FramingFunction::Problem).definition
        == sharper(*v1).definition(FramingFunction::Problem).definition);
}

TEST_CASE(
    "a codebook version edit is refused once another version came, and kept while spans use it")
{
    StudyFixture f;
    auto v1 = f.project.codebook();
    REQUIRE(v1);
    auto late = CodebookVersions::addEdit(f.project, sharper(*v1), QStringLiteral("late"), f.lead);
    REQUIRE(late);
    Codebook other = *v1;
    other.functions[size_t(FramingFunction::Cause)].rules << QStringLiteral("Name the actor.");
    REQUIRE(CodebookVersions::add(f.project, other, QStringLiteral("first"), f.lead));
    const QString before = dumpDatabase(databaseForTesting(f.project));
    const Status refused = f.project.apply(**late);
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::Duplicate);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);

    // A span made under version 3 holds it: undoing the version is refused, nothing changes.
    auto third =
        CodebookVersions::addEdit(f.project, sharper(other), QStringLiteral("third"), f.lead);
    REQUIRE(third);
    REQUIRE(f.project.apply(**third));
    AddAnnotationEdit span(f.articleId(QStringLiteral("a01")), f.coder("C01"),
        AnnotationContent {FramingFunction::Problem, {0, 5}, {}, {}, {}});
    REQUIRE(f.project.apply(span));
    const QString withSpan = dumpDatabase(databaseForTesting(f.project));
    const Status kept = f.project.revert(**third);
    REQUIRE_FALSE(kept);
    CHECK(kept.error().code == ErrorCode::NotAllowed);
    CHECK(kept.error().message.contains(QStringLiteral("version 3")));
    CHECK(dumpDatabase(databaseForTesting(f.project)) == withSpan);
    // Once the span is undone, the version goes.
    REQUIRE(f.project.revert(span));
    REQUIRE(f.project.revert(**third));
    CHECK(f.project.codebook()->number == 2);
}

TEST_CASE("the diff names each changed text of a translation under its language")
{
    StudyFixture f;
    auto v1 = f.project.codebook();
    REQUIRE(v1);
    // The default codebook's German and Dutch texts (resources/codebook/default_codebook.json).
    REQUIRE(v1->translations.contains(QStringLiteral("de")));
    REQUIRE(v1->translations.contains(QStringLiteral("nl")));
    Codebook v2 = *v1;
    CodebookTexts &de = v2.translations[QStringLiteral("de")];
    const QString oldGerman = de.functions[FramingFunction::Problem].definition;
    CHECK(oldGerman.startsWith(QStringLiteral("Eine Textstelle, die sagt, was schiefläuft")));
    de.functions[FramingFunction::Problem].definition =
        QStringLiteral("Eine Textstelle, die sagt, was auf dem Spiel steht und was es kostet.");
    de.questions[QStringLiteral("dominant_function")] =
        QStringLiteral("Welche Funktion prägt den Artikel?");
    // The Dutch label of polarity taken out (the English one stands in again), and a French
    // name and remedy label given for the first time.
    v2.translations[QStringLiteral("nl")]
        .functions[FramingFunction::Evaluation]
        .attributeLabels.remove(QStringLiteral("polarity"));
    CodebookTexts &fr = v2.translations[QStringLiteral("fr")];
    fr.name = QStringLiteral("Quatre fonctions");
    fr.functions[FramingFunction::Remedy].label = QStringLiteral("Solution proposée");
    REQUIRE(
        CodebookVersions::add(f.project, v2, QStringLiteral("German and French texts"), f.lead));

    auto diff = CodebookVersions::diffBetween(f.project, 1, 2);
    REQUIRE(diff);
    REQUIRE(diff->changes.size() == 5);
    // Languages in alphabetical order, each in codebook order: name, functions, items.
    const CodebookChange &definition = diff->changes[0];
    CHECK(definition.path == QStringLiteral("translations.de.problem.definition"));
    CHECK(definition.kind == CodebookChange::Kind::Changed);
    CHECK(definition.function == FramingFunction::Problem);
    CHECK(definition.before == oldGerman);
    CHECK(definition.after.endsWith(QStringLiteral("was es kostet.")));
    CHECK(diff->changes[1].path
        == QStringLiteral("translations.de.items.dominant_function.question"));
    CHECK(diff->changes[1].before
        == QStringLiteral("Welche Framing-Funktion dominiert den Artikel als Ganzes?"));
    CHECK_FALSE(diff->changes[1].function);
    CHECK(diff->changes[2].path == QStringLiteral("translations.fr.name"));
    CHECK(diff->changes[2].kind == CodebookChange::Kind::Added);
    CHECK(diff->changes[3].path == QStringLiteral("translations.fr.remedy.label"));
    CHECK(diff->changes[3].kind == CodebookChange::Kind::Added);
    CHECK(diff->changes[4].path
        == QStringLiteral("translations.nl.evaluation.attributes.polarity.label"));
    CHECK(diff->changes[4].kind == CodebookChange::Kind::Removed);
    CHECK(diff->changes[4].before == QStringLiteral("Polariteit"));
    // A function whose text changed in any language is one whose spans need a re-check.
    CHECK(diff->changedFunctions()
        == std::vector<FramingFunction> {
            FramingFunction::Problem, FramingFunction::Evaluation, FramingFunction::Remedy});
    const QString text = CodebookVersions::diffText(*diff);
    CHECK(
        text.contains(QStringLiteral("\n~ translations.de.problem.definition: «Eine Textstelle")));
    CHECK(text.contains(QStringLiteral("\n+ translations.fr.name: «Quatre fonctions»")));
    CHECK(text.contains(
        QStringLiteral("\n- translations.nl.evaluation.attributes.polarity.label: «Polariteit»")));

    // The same texts again: nothing to record.
    CHECK(CodebookVersions::diff(*f.project.codebook(), v2).changes.empty());
}
