// What the user meets in German: fourfold-cli follows LANGUAGE as other command-line tools do,
// the core's error messages and undo texts come translated, and Qt's own texts follow the same
// language. Expected sentences are read from translations/fourfold_<lang>.ts, never written here.
#include "app/i18n/translations.h"
#include "core/io/json_item_stream.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"
#include "tests/translations/ts_file.h"

#include <QCoreApplication>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QLibraryInfo>
#include <QTranslator>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// This process's environment with the language variables set as a user's shell would.
QProcessEnvironment languageEnvironment(const QString &language)
{
    QProcessEnvironment env = QProcessEnvironment::systemEnvironment();
    env.remove(QStringLiteral("LC_ALL"));
    env.remove(QStringLiteral("LC_MESSAGES"));
    env.insert(QStringLiteral("LANG"), QStringLiteral("C.UTF-8"));
    if (language.isEmpty())
        env.remove(QStringLiteral("LANGUAGE"));
    else
        env.insert(QStringLiteral("LANGUAGE"), language);
    return env;
}

// The error a JSON Lines article without its text gets (core/io/jsonl_reader.cpp).
const char *const kMissingField = "missing required field \"%1\"";

// Imports a JSON Lines file whose one article lacks its text into a new project, with
// LANGUAGE=`language`, and returns what fourfold-cli wrote to stderr.
QString brokenImportError(const QString &language)
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("lang.fourfold"));
    const auto env = languageEnvironment(language);
    REQUIRE(
        runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("new"), project}, 60000, env).exitCode
        == 0);
    const QString broken = writeFile(
        dir, QStringLiteral("broken.jsonl"), "{\"id\":\"a1\",\"title\":\"No text here\"}\n");
    const CliRun run = runCli(
        QStringLiteral(FOURFOLD_CLI), {QStringLiteral("import"), project, broken}, 60000, env);
    CHECK(run.exitCode != 0);
    return run.err;
}

} // namespace

TEST_CASE("With LANGUAGE=de or nl a broken import's error from fourfold-cli is in that language")
{
    const QString english = QString::fromLatin1(kMissingField).arg(QStringLiteral("text"));
    for (const QString &lang : {QStringLiteral("de"), QStringLiteral("nl")}) {
        const QString expected =
            readTsFile(lang)
                .translation(QStringLiteral("ArticleReader"), QString::fromLatin1(kMissingField))
                .arg(QStringLiteral("text"));
        REQUIRE(expected != english);
        const QString err = brokenImportError(lang);
        INFO(lang.toStdString() << " stderr: " << err.toStdString());
        CHECK(err.contains(expected));
        CHECK_FALSE(err.contains(english));
    }
}

TEST_CASE("Without LANGUAGE and with LANG=C fourfold-cli speaks English")
{
    const QString err = brokenImportError(QString());
    INFO(err.toStdString());
    CHECK(err.contains(QString::fromLatin1(kMissingField).arg(QStringLiteral("text"))));
}

TEST_CASE("fourfold-cli's own messages follow LANGUAGE")
{
    const TsFile de = readTsFile(QStringLiteral("de"));
    const CliRun run = runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("no-such-command")},
        60000, languageEnvironment(QStringLiteral("de")));
    CHECK(run.exitCode != 0);
    INFO(run.err.toStdString());
    CHECK(run.err.contains(de.translation(QStringLiteral("cli"),
                                 QStringLiteral("fourfold-cli: unknown command \"%1\"."))
                               .arg(QStringLiteral("no-such-command"))));
}

TEST_CASE("An undo text from the core is German once German is chosen")
{
    QTemporaryDir dir;
    auto project = Project::create(dir.filePath(QStringLiteral("undo.fourfold")));
    REQUIRE(project);
    const TsFile de = readTsFile(QStringLiteral("de"));

    CHECK(useLanguage(QLocale(QLocale::German, QLocale::Germany)) == QStringLiteral("de"));
    auto add = People::add(*project, nullptr,
        {QStringLiteral("Cora Coder"), QStringLiteral("C07"), CoderRole::Coder, QString()});
    REQUIRE(add);
    const QString german =
        de.translation(QStringLiteral("PersonEdits"), QStringLiteral("Add %1")).arg(u"C07");
    CHECK(german != QStringLiteral("Add C07"));
    CHECK((*add)->text() == german);
    // The error of a refused edit is German too (core/project/people.cpp).
    REQUIRE(project->apply(**add));
    auto again = People::add(*project, nullptr,
        {QStringLiteral("Cora Coder"), QStringLiteral("C07"), CoderRole::Coder, QString()});
    REQUIRE_FALSE(again);
    CHECK(again.error().message
        == de.translation(
                 QStringLiteral("People"), QStringLiteral("The pseudonym \"%1\" is already taken."))
               .arg(u"C07"));

    CHECK(useLanguage(QLocale(QLocale::English)).isEmpty());
    CHECK((*add)->text() == QStringLiteral("Add C07"));
}

TEST_CASE("An import's refusal is German throughout once German is chosen")
{
    // The import report puts the core's message on one line: no English word of a JSON type or
    // of the JSON parser may sit in the German sentence.
    const TsFile de = readTsFile(QStringLiteral("de"));
    QTemporaryDir dir;
    auto project = Project::create(dir.filePath(QStringLiteral("import.fourfold")));
    REQUIRE(project);
    const QString scalarFile = writeFile(dir, QStringLiteral("titel.jsonl"), "\"nur ein Titel\"\n");
    const QString listFile = writeFile(dir, QStringLiteral("liste.jsonl"), "[1, 2]\n");
    const QString brokenFile =
        writeFile(dir, QStringLiteral("kaputt.json"), "{\n  \"type\": AnnotationCollection\n}");
    REQUIRE(useLanguage(QLocale(QLocale::German, QLocale::Germany)) == QStringLiteral("de"));
    auto scalar = project->importFile(scalarFile, ImportOptions {});
    auto list = project->importFile(listFile, ImportOptions {});
    auto broken = streamJsonItems(
        brokenFile, [](const QStringList &) { return true; },
        [](QJsonObject &&, JsonPlace) { return Status {}; });
    useLanguage(QLocale(QLocale::English));

    const QString got = de.translation(
        QStringLiteral("ArticleReader"), QStringLiteral("expected a JSON object, got %1"));
    REQUIRE_FALSE(scalar);
    INFO(scalar.error().message.toStdString());
    CHECK(scalar.error().message.contains(
        got.arg(de.translation(QStringLiteral("JsonTypeNameText"), QStringLiteral("string")))));
    CHECK_FALSE(scalar.error().message.contains(QStringLiteral("string")));
    REQUIRE_FALSE(list);
    INFO(list.error().message.toStdString());
    CHECK(list.error().message.contains(
        got.arg(de.translation(QStringLiteral("JsonTypeNameText"), QStringLiteral("array")))));
    CHECK_FALSE(list.error().message.contains(QStringLiteral(" array")));
    REQUIRE_FALSE(broken);
    INFO(broken.error().message.toStdString());
    const QString notJson = de.translation(
        QStringLiteral("JsonItemStreamText"), QStringLiteral("This is not valid JSON at \"%1\"."));
    CHECK(broken.error().message.contains(notJson.left(notJson.indexOf(QStringLiteral("%1")))));
    CHECK_FALSE(broken.error().message.contains(QStringLiteral("syntax error")));
    CHECK_FALSE(broken.error().message.contains(QStringLiteral("last read")));
}

TEST_CASE("Qt's own texts follow the chosen language")
{
    // Qt's buttons ("Cancel") come from qtbase_<lang>.qm in Qt's translations folder (Debian
    // package qt6-translations-l10n); the expected text is read from that file.
    const char *context = "QPlatformTheme";
    const char *source = "Cancel";
    for (const QString &lang : {QStringLiteral("de"), QStringLiteral("nl")}) {
        QTranslator qt;
        REQUIRE(qt.load(
            QStringLiteral("qtbase_") + lang, QLibraryInfo::path(QLibraryInfo::TranslationsPath)));
        const QString expected = qt.translate(context, source);
        REQUIRE_FALSE(expected.isEmpty());
        CHECK(expected != QLatin1String(source));
        CHECK(useLanguage(QLocale(lang)) == lang);
        CHECK(QCoreApplication::translate(context, source) == expected);
    }
    useLanguage(QLocale(QLocale::English));
    CHECK(QCoreApplication::translate(context, source) == QLatin1String(source));
}

#ifdef FOURFOLD_HAVE_REPORT
TEST_CASE("report --language writes the method text and tables in that language")
{
    // The sample project (sample-project/, invented demo data), reported without bootstrap.
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    const auto english = languageEnvironment(QString());
    const CliRun built = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project}, 180000,
        english);
    INFO(built.err.toStdString());
    REQUIRE(built.exitCode == 0);
    const QStringList sources = {QStringLiteral("Inter-coder reliability"),
        QStringLiteral("Method text"), QStringLiteral("Reliability per variable"),
        QStringLiteral("Krippendorff's alpha per variable")};
    for (const QString &lang : {QStringLiteral("de"), QStringLiteral("nl"), QStringLiteral("en")}) {
        const QString html = dir.filePath(lang + QStringLiteral(".html"));
        // The messages stay English (LANGUAGE unset); only --language chooses the report's.
        const CliRun written = runCli(QStringLiteral(FOURFOLD_CLI),
            {QStringLiteral("report"), project, QStringLiteral("--out"), html,
                QStringLiteral("--bootstrap"), QStringLiteral("0"), QStringLiteral("--language"),
                lang},
            180000, english);
        INFO(lang.toStdString() << ": " << written.err.toStdString());
        REQUIRE(written.exitCode == 0);
        const QString text = QString::fromUtf8(readFile(html));
        if (lang == QLatin1String("en")) {
            CHECK(text.contains(QStringLiteral("<html lang=\"en\">")));
            for (const QString &source : sources)
                CHECK(text.contains(source));
            continue;
        }
        const TsFile ts = readTsFile(lang);
        const QString tag =
            ts.translation(QStringLiteral("ReportDocumentText"), QStringLiteral("en"));
        CHECK(tag == lang);
        CHECK(text.contains(QStringLiteral("<html lang=\"%1\">").arg(tag)));
        for (const QString &source : sources) {
            const QString translated = ts.translation(QStringLiteral("ReportDocumentText"), source);
            INFO(source.toStdString() << " -> " << translated.toStdString());
            CHECK(translated != source);
            CHECK(text.contains(translated.toHtmlEscaped()));
        }
        // The variables carry the codebook's own texts in that language (the codebook file's
        // "translations"), not the English labels.
        const QJsonObject codebook = QJsonDocument::fromJson(
            readFile(
                QStringLiteral(FOURFOLD_SOURCE_DIR "/resources/codebook/default_codebook.json")))
                                         .object();
        const QJsonArray functions = codebook.value(QStringLiteral("translations"))
                                         .toObject()
                                         .value(lang)
                                         .toObject()
                                         .value(QStringLiteral("functions"))
                                         .toArray();
        REQUIRE(functions.size() == 4);
        for (const QJsonValue &f : functions) {
            const QString label = f.toObject().value(QStringLiteral("label")).toString();
            INFO(label.toStdString());
            CHECK(text.contains(label.toHtmlEscaped()));
        }
        CHECK_FALSE(text.contains(QStringLiteral("Treatment recommendation")));
    }
    const CliRun refused = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("report"), project, QStringLiteral("--out"),
            dir.filePath(QStringLiteral("fr.html")), QStringLiteral("--language"),
            QStringLiteral("fr")},
        60000, english);
    CHECK(refused.exitCode != 0);
    CHECK(refused.err.contains(QStringLiteral("--language takes en, nl or de, not \"fr\".")));
}
#endif
