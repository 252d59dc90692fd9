// Codebook::fromJson is strict: every key and type of the codebook's schema is checked, and a
// wrong one is an error naming the file, the line and the key (the README's "Codebook versions"
// describes the schema). Each case edits one valid codebook written out line by line.

#include "core/model/codebook.h"

#include <QJsonDocument>

#include <catch2/catch.hpp>

using namespace fourfold;

namespace {

const QByteArray kValid = R"({
  "name": "Test codebook",
  "functions": [
    {"key": "problem", "label": "Problem", "definition": "What goes wrong.",
     "rules": ["Code the trouble."], "examples": ["The bus was cut."], "attributes": []},
    {"key": "cause", "definition": "Who is to blame.", "attributes": [
      {"key": "actor", "label": "Actor", "type": "text"}]},
    {"key": "evaluation", "definition": "A judgement.\nOn two lines.", "attributes": [
      {"key": "polarity", "type": "choice", "values": ["negative", "positive"],
       "level": "ordinal", "recode": {"neutral": "negative"}}]},
    {"key": "remedy", "definition": "What should be done."}
  ],
  "items": [
    {"key": "dominant_function", "question": "Which function dominates?",
     "values": ["problem", "cause", "evaluation", "remedy", "none"]}
  ]
}
)";

// The line (from 1) of the first occurrence of `needle` in `text`: the test's own oracle for
// the line an error must name.
qint64 lineOf(const QByteArray &text, const QByteArray &needle)
{
    const qsizetype at = text.indexOf(needle);
    REQUIRE(at >= 0);
    return text.left(at).count('\n') + 1;
}

struct BadCodebook {
    const char *what;
    QByteArray from; // replaced in kValid ...
    QByteArray to; // ... by this
    QByteArray lineOfThis; // the error's line is the line of this text in the result
    const char *message; // a key part of the message
};

} // namespace

TEST_CASE("Codebook reads every field of a valid codebook and writes it back", "[model][codebook]")
{
    auto book = Codebook::fromJson(kValid, QStringLiteral("cb.json"));
    REQUIRE(book.has_value());
    CHECK(book->name == QStringLiteral("Test codebook"));
    REQUIRE(book->functions.size() == 4);
    const FunctionDefinition &problem = book->definition(FramingFunction::Problem);
    CHECK(problem.label == QStringLiteral("Problem"));
    CHECK(problem.rules == QStringList {QStringLiteral("Code the trouble.")});
    CHECK(problem.examples == QStringList {QStringLiteral("The bus was cut.")});
    // A missing label is the key; missing rules, examples and attributes are empty.
    CHECK(book->definition(FramingFunction::Remedy).label == QStringLiteral("remedy"));
    CHECK(book->definition(FramingFunction::Remedy).rules.isEmpty());
    const FunctionDefinition &evaluation = book->definition(FramingFunction::Evaluation);
    CHECK(evaluation.definition == QStringLiteral("A judgement.\nOn two lines."));
    REQUIRE(evaluation.attributes.size() == 1);
    const AttributeSpec &polarity = evaluation.attributes.front();
    CHECK(polarity.level == MeasurementLevel::Ordinal);
    CHECK(polarity.recode.value(QStringLiteral("neutral")) == QStringLiteral("negative"));
    CHECK(book->definition(FramingFunction::Cause).attributes.front().type
        == AttributeSpec::Type::Text);
    REQUIRE(book->items.size() == 1);
    CHECK(book->items.front().values.size() == 5);

    // What an annotation of any version counts as now.
    CHECK(book->countedAttributeValue(
              FramingFunction::Evaluation, QStringLiteral("polarity"), QStringLiteral("neutral"))
        == QStringLiteral("negative"));
    CHECK(book->countedAttributeValue(
              FramingFunction::Evaluation, QStringLiteral("polarity"), QStringLiteral("positive"))
        == QStringLiteral("positive"));
    CHECK_FALSE(book->countedAttributeValue(
        FramingFunction::Evaluation, QStringLiteral("polarity"), QStringLiteral("unsure")));
    CHECK(book->countedAnswer(QStringLiteral("dominant_function"), QStringLiteral("none"))
        == QStringLiteral("none"));

    // toJson writes what fromJson reads: the stored form reads back to the same codebook.
    auto again = Codebook::fromJson(
        QJsonDocument(book->toJson()).toJson(), QStringLiteral("stored"), CodebookCheck::Stored);
    REQUIRE(again.has_value());
    CHECK(again->toJson() == book->toJson());
    CHECK(again->definition(FramingFunction::Evaluation).attributes.front().recode
        == polarity.recode);
}

TEST_CASE(
    "Codebook refuses wrong types and unknown keys naming file line and key", "[model][codebook]")
{
    // clang-format off
    const BadCodebook cases[] = {
        {"a number for a definition", "\"definition\": \"What goes wrong.\"",
         "\"definition\": 5", "\"definition\": 5",
         "\"functions[0].definition\" must be a string, not a number"},
        {"a string for rules", "\"definition\": \"Who is to blame.\",",
         "\"definition\": \"Who is to blame.\", \"rules\": \"Blame someone.\",", "Blame someone.",
         "\"functions[1].rules\" must be an array, not a string"},
        {"a number among the rules", "[\"Code the trouble.\"]", "[\"Code the trouble.\", 7]",
         "\"rules\"", "\"functions[0].rules[1]\" must be a string, not a number"},
        {"an object for items",
         "\"items\": [\n    {\"key\": \"dominant_function\", \"question\": \"Which function dominates?\",\n"
         "     \"values\": [\"problem\", \"cause\", \"evaluation\", \"remedy\", \"none\"]}\n  ]",
         "\"items\": {\"dominant_function\": \"Which function dominates?\"}", "\"items\"",
         "\"items\" must be an array, not an object"},
        {"an object for attributes", "\"attributes\": []", "\"attributes\": {}",
         "\"attributes\": {}", "\"functions[0].attributes\" must be an array, not an object"},
        {"a fifth function with a new key",
         "{\"key\": \"remedy\", \"definition\": \"What should be done.\"}",
         "{\"key\": \"remedy\", \"definition\": \"What should be done.\"},\n"
         "    {\"key\": \"frame\", \"definition\": \"Another.\"}",
         "\"frame\"", "\"functions[4].key\" is \"frame\", not one of the four functions"},
        {"a fifth function repeating one",
         "{\"key\": \"remedy\", \"definition\": \"What should be done.\"}",
         "{\"key\": \"remedy\", \"definition\": \"What should be done.\"},\n"
         "    {\"key\": \"cause\", \"definition\": \"Again.\"}",
         "\"Again.\"", "\"functions[4].key\" defines the function \"cause\" a second time"},
        {"a missing function", ",\n    {\"key\": \"remedy\", \"definition\": \"What should be done.\"}",
         "", "\"functions\"", "does not define the function \"remedy\""},
        {"a misspelt key", "\"definition\": \"What should be done.\"",
         "\"defintion\": \"What should be done.\"", "\"defintion\"",
         "unknown key \"functions[3].defintion\""},
        {"an unknown key at the root", "\"name\": \"Test codebook\",",
         "\"name\": \"Test codebook\",\n  \"version\": 2,", "\"version\"",
         "unknown key \"version\" (expected one of: name, functions, items, translations)"},
        {"a definition left out", ", \"definition\": \"What should be done.\"", "",
         "{\"key\": \"remedy\"", "\"functions[3].definition\" is missing"},
        {"a control character in a definition", "What goes wrong.", "What \\u0007goes wrong.",
         "\\u0007", "\"functions[0].definition\" contains the control character U+0007"},
        {"a NUL in a label", "\"label\": \"Problem\"", "\"label\": \"Prob\\u0000lem\"",
         "\\u0000", "\"functions[0].label\" contains the control character U+0000"},
        {"a line break in a value", "[\"negative\", \"positive\"]",
         "[\"negative\", \"posi\\ntive\"]", "posi\\n",
         "\"functions[2].attributes[0].values[1]\" contains the control character U+000A"},
        {"a repeated key", "\"name\": \"Test codebook\",",
         "\"name\": \"Test codebook\",\n  \"name\": \"Other\",", "\"Other\"",
         "the key \"name\" appears twice"},
        {"values of a text attribute", "\"type\": \"text\"}", "\"type\": \"text\", \"values\": [\"a\"]}",
         "\"values\": [\"a\"]", "\"functions[1].attributes[0].values\" is only for choice"},
        {"a choice attribute without values", "\"values\": [\"negative\", \"positive\"],",
         "\"values\": [],", "\"values\": []", "\"functions[2].attributes[0].values\" lists no values"},
        {"a repeated value", "[\"negative\", \"positive\"]", "[\"negative\", \"negative\"]",
         "\"negative\", \"negative\"", "repeats the value \"negative\""},
        {"an unknown level", "\"level\": \"ordinal\"", "\"level\": \"ranked\"", "\"ranked\"",
         "not a level of measurement"},
        {"a recoding to a value that is not there", "{\"neutral\": \"negative\"}",
         "{\"neutral\": \"bad\"}", "\"bad\"",
         "\"functions[2].attributes[0].recode.neutral\" recodes to \"bad\""},
        {"a recoding of a value still listed", "{\"neutral\": \"negative\"}",
         "{\"positive\": \"negative\"}", "{\"positive\"", "which is still one of the values"},
        {"a number as a recoding", "{\"neutral\": \"negative\"}", "{\"neutral\": 1}",
         "{\"neutral\": 1}", "\"functions[2].attributes[0].recode.neutral\" must be a string"},
        {"a repeated attribute", "{\"key\": \"actor\", \"label\": \"Actor\", \"type\": \"text\"}",
         "{\"key\": \"actor\", \"type\": \"text\"},\n      {\"key\": \"actor\", \"type\": \"text\"}",
         "{\"key\": \"actor\", \"type\": \"text\"}]", "repeats the attribute \"actor\" of cause"},
        {"an item without a question", "\"question\": \"Which function dominates?\",", "",
         "{\"key\": \"dominant_function\"", "\"items[0].question\" is missing"},
        {"a number for the name", "\"name\": \"Test codebook\"", "\"name\": 3", "\"name\"",
         "\"name\" must be a string, not a number"},
    };
    // clang-format on
    for (const BadCodebook &c : cases) {
        INFO(c.what);
        QByteArray text = kValid;
        REQUIRE(text.contains(c.from));
        text.replace(c.from, c.to);
        const auto book = Codebook::fromJson(text, QStringLiteral("cb.json"));
        REQUIRE_FALSE(book.has_value());
        INFO(book.error().message.toStdString());
        CHECK(book.error().code == ErrorCode::InvalidInput);
        CHECK(book.error().file == QStringLiteral("cb.json"));
        CHECK(book.error().line == lineOf(text, c.lineOfThis));
        CHECK(book.error().message.startsWith(
            QStringLiteral("cb.json:%1: ").arg(lineOf(text, c.lineOfThis))));
        CHECK(book.error().message.contains(QString::fromUtf8(c.message)));
    }
}

TEST_CASE("Codebook reads JSON that is not an object or not JSON with a line", "[model][codebook]")
{
    auto book = Codebook::fromJson("[1, 2]", QStringLiteral("cb.json"));
    REQUIRE_FALSE(book.has_value());
    CHECK(book.error().message
        == QStringLiteral("cb.json:1: the codebook must be a JSON object, not an array."));
    book = Codebook::fromJson("{\n  \"name\": ,\n}", QStringLiteral("cb.json"));
    REQUIRE_FALSE(book.has_value());
    CHECK(book.error().line == 2);
    CHECK(book.error().message.contains(QStringLiteral("not valid JSON")));
}

TEST_CASE("Codebook keeps reading a stored version with control characters", "[model][codebook]")
{
    // A version stored before the control-character rule still opens; a file is refused.
    QByteArray text = kValid;
    text.replace("What goes wrong.", "What \\u0007goes wrong.");
    auto stored =
        Codebook::fromJson(text, QStringLiteral("codebook version 2"), CodebookCheck::Stored);
    REQUIRE(stored.has_value());
    CHECK(stored->definition(FramingFunction::Problem).definition
        == QStringLiteral("What \u0007goes wrong."));
    // Keys and types are checked for a stored version too.
    text.replace("\"definition\": \"What \\u0007goes wrong.\"", "\"definition\": 5");
    stored = Codebook::fromJson(text, QStringLiteral("codebook version 2"), CodebookCheck::Stored);
    REQUIRE_FALSE(stored.has_value());
    CHECK(stored.error().message
        == QStringLiteral(
            "codebook version 2: \"functions[0].definition\" must be a string, not a number."));
}

TEST_CASE("Codebook texts in another language replace the codebook's own and keep every key",
    "[model][codebook]")
{
    // The translation form of README "The default codebook": what a language gives replaces the
    // codebook's text, what it leaves out stays; keys, values and levels are never translated.
    QByteArray json = kValid;
    json.replace("\n}\n",
        ",\n  \"translations\": {\"nl\": {\"name\": \"Testcodeboek\", \"functions\": [\n"
        "    {\"key\": \"evaluation\", \"label\": \"Evaluatie\", \"rules\": [\"Codeer "
        "oordelen.\"],\n"
        "     \"attributes\": [{\"key\": \"polarity\", \"label\": \"Polariteit\"}]}],\n"
        "    \"items\": [{\"key\": \"dominant_function\", \"question\": \"Welke "
        "functie?\"}]}}\n}\n");
    auto book = Codebook::fromJson(json, QStringLiteral("nl.json"));
    INFO((book ? QString() : book.error().toString()).toStdString());
    REQUIRE(book);
    REQUIRE(book->translations.contains(QStringLiteral("nl")));

    const Codebook dutch = book->inLanguage(QStringLiteral("nl_BE"));
    CHECK(dutch.name == "Testcodeboek");
    const FunctionDefinition &evaluation = dutch.definition(FramingFunction::Evaluation);
    CHECK(evaluation.label == "Evaluatie");
    CHECK(evaluation.definition == "A judgement.\nOn two lines."); // not given: the codebook's
    CHECK(evaluation.rules == QStringList {QStringLiteral("Codeer oordelen.")});
    REQUIRE(evaluation.attributes.size() == 1);
    CHECK(evaluation.attributes[0].label == "Polariteit");
    CHECK(evaluation.attributes[0].key == "polarity");
    CHECK(evaluation.attributes[0].values
        == QStringList {QStringLiteral("negative"), QStringLiteral("positive")});
    CHECK(dutch.items[0].question == "Welke functie?");
    CHECK(dutch.items[0].values == book->items[0].values);
    CHECK(dutch.definition(FramingFunction::Problem).label == "Problem");
    // A language without texts is the codebook itself.
    CHECK(book->inLanguage(QStringLiteral("fr")).definition(FramingFunction::Evaluation).label
        == book->definition(FramingFunction::Evaluation).label);
    // Written back and read again: the same texts.
    auto again = Codebook::fromJson(QJsonDocument(book->toJson()).toJson(), QStringLiteral("x"));
    REQUIRE(again);
    CHECK(again->toJson() == book->toJson());
    CHECK(again->inLanguage(QStringLiteral("nl")).definition(FramingFunction::Evaluation).label
        == "Evaluatie");

    // What a language names must be the codebook's.
    const std::vector<std::pair<QByteArray, const char *>> bad {
        {"\"nl\": {\"functions\": [{\"key\": \"frame\"}]}", "not one of the four functions"},
        {"\"nl\": {\"functions\": [{\"key\": \"cause\", \"attributes\": [{\"key\": \"blame\", "
         "\"label\": \"Schuld\"}]}]}",
            "names the attribute \"blame\", which cause does not have"},
        {"\"nl\": {\"items\": [{\"key\": \"tone\", \"question\": \"Toon?\"}]}",
            "names the item \"tone\", which the codebook does not have"},
        {"\"dutch\": {\"name\": \"x\"}", "is not a language code"},
        {"\"nl\": {\"name\": \"x\", \"values\": []}", "unknown key \"translations.nl.values\""},
        {"\"nl\": {\"functions\": [{\"key\": \"cause\", \"label\": 5}]}", "must be a string"},
    };
    for (const auto &[translations, message] : bad) {
        QByteArray wrong = kValid;
        wrong.replace("\n}\n", ",\n  \"translations\": {" + translations + "}\n}\n");
        auto refused = Codebook::fromJson(wrong, QStringLiteral("bad.json"));
        INFO(translations.toStdString());
        REQUIRE_FALSE(refused);
        CHECK(refused.error().message.contains(QString::fromUtf8(message)));
        CHECK(refused.error().line > 0);
    }
}
