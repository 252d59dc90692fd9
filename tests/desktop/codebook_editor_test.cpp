// Lead → Codebook…: an edit made in the editor becomes the same version, diff and outdated list
// as `fourfold-cli codebook --update` with the same change written as JSON; a draft that breaks a
// rule of the codebook file is shown at its field and nothing is stored; undo restores the text.
#include "app/desktop/codebook/codebook_editor.h"
#include "app/desktop/lead_windows.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "core/project/codebook_versions.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "tests/desktop/session_on_file.h"
#include "tests/support/cli_run.h"
#include "tests/support/db_dump.h"
#include "tests/support/test_support.h"

#include <QAction>
#include <QComboBox>
#include <QFile>
#include <QJsonArray>
#include <QJsonDocument>
#include <QLabel>
#include <QLineEdit>
#include <QMenu>
#include <QMenuBar>
#include <QPlainTextEdit>
#include <QPointer>
#include <QPushButton>
#include <QTemporaryDir>
#include <QTest>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kCli = QStringLiteral(FOURFOLD_CLI);

struct SampleCopy {
    QTemporaryDir dir;
    QString path;
    explicit SampleCopy(const QString &name = QStringLiteral("demo.fourfold"))
    {
        path = dir.filePath(name);
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    }
};

QPlainTextEdit *textField(CodebookEditor &w, const QString &field)
{
    auto *edit = qobject_cast<QPlainTextEdit *>(w.fieldWidget(field));
    REQUIRE(edit);
    return edit;
}

QLineEdit *lineField(CodebookEditor &w, const QString &field)
{
    auto *edit = qobject_cast<QLineEdit *>(w.fieldWidget(field));
    REQUIRE(edit);
    return edit;
}

// The error line under the widget, as the person sees it.
QString shownError(QWidget *field)
{
    const auto labels = field->parentWidget()->findChildren<QLabel *>(
        QStringLiteral("field-error"), Qt::FindDirectChildrenOnly);
    REQUIRE(labels.size() == 1);
    return labels.front()->isVisibleTo(field->window()) ? labels.front()->text() : QString();
}

// The note under the widget, as the person sees it.
QString shownNote(QWidget *field)
{
    const auto labels = field->parentWidget()->findChildren<QLabel *>(
        QStringLiteral("field-note"), Qt::FindDirectChildrenOnly);
    REQUIRE(labels.size() == 1);
    return labels.front()->isVisibleTo(field->window()) ? labels.front()->text() : QString();
}

// The enabled state of the window's visible button `text` ("&Add attribute" on the page shown).
bool buttonEnabled(CodebookEditor &w, const QString &text)
{
    for (QPushButton *b : w.findChildren<QPushButton *>())
        if (b->text() == text && b->isVisibleTo(&w))
            return b->isEnabled();
    FAIL("no visible button " << text.toStdString());
    return false;
}

const QString kDefinition = QStringLiteral(
    "A condition the article presents as a problem that needs attention, with its costs or "
    "benefits.");

} // namespace

TEST_CASE("a codebook change in the editor gives the version diff and outdated list of codebook "
          "--update")
{
    SampleCopy viaEditor(QStringLiteral("editor.fourfold"));
    SampleCopy viaCli(QStringLiteral("cli.fourfold"));

    // The same change written by hand as the JSON `--update` reads: from `--show` of the
    // current version, a new value "mixed" in evaluation's closed polarity list and problem's
    // definition rewritten.
    auto project = Project::open(viaEditor.path);
    REQUIRE(project);
    auto stored = project->codebook();
    REQUIRE(stored);
    const int from = stored->number;
    const CliRun show = runCli(kCli,
        {QStringLiteral("codebook"), viaCli.path, QStringLiteral("--show"), QString::number(from)});
    REQUIRE(show.exitCode == 0);
    QJsonObject book = QJsonDocument::fromJson(show.out.toUtf8()).object();
    QJsonArray functions = book.value(QStringLiteral("functions")).toArray();
    REQUIRE(functions.size() == 4);
    QJsonObject problem = functions[0].toObject();
    problem.insert(QStringLiteral("definition"), kDefinition);
    functions[0] = problem;
    QJsonObject evaluation = functions[2].toObject();
    QJsonArray attributes = evaluation.value(QStringLiteral("attributes")).toArray();
    QJsonObject polarity = attributes[0].toObject();
    REQUIRE(polarity.value(QStringLiteral("key")).toString() == QStringLiteral("polarity"));
    QJsonArray values = polarity.value(QStringLiteral("values")).toArray();
    values.append(QStringLiteral("mixed"));
    polarity.insert(QStringLiteral("values"), values);
    attributes[0] = polarity;
    evaluation.insert(QStringLiteral("attributes"), attributes);
    functions[2] = evaluation;
    book.insert(QStringLiteral("functions"), functions);
    const QString file = viaCli.dir.filePath(QStringLiteral("codebook.json"));
    {
        QFile out(file);
        REQUIRE(out.open(QIODevice::WriteOnly));
        out.write(QJsonDocument(book).toJson());
    }
    const QString note = QStringLiteral("mixed polarity; problem definition names costs");
    const CliRun update = runCli(kCli,
        {QStringLiteral("codebook"), viaCli.path, QStringLiteral("--update"), file,
            QStringLiteral("--note"), note, QStringLiteral("--by"), QStringLiteral("L01")});
    INFO(update.err.toStdString());
    REQUIRE(update.exitCode == 0);

    // The same change typed into the editor.
    auto session = sessionOnFile(viaEditor.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    w.show();
    textField(w, QStringLiteral("functions[0].definition"))->setPlainText(kDefinition);
    QPlainTextEdit *valuesField = textField(w, QStringLiteral("functions[2].attributes[0].values"));
    valuesField->setPlainText(valuesField->toPlainText() + QStringLiteral("\nmixed"));
    CHECK(w.draft().definition(FramingFunction::Evaluation).attributes[0].values
        == QStringList {QStringLiteral("negative"), QStringLiteral("neutral"),
            QStringLiteral("positive"), QStringLiteral("mixed")});

    const QStringList diffArgs {QStringLiteral("codebook"), QString(), QStringLiteral("--diff"),
        QString::number(from), QString::number(from + 1)};
    QStringList cliDiff = diffArgs;
    cliDiff[1] = viaCli.path;
    const CliRun diffByCli = runCli(kCli, cliDiff);
    REQUIRE(diffByCli.exitCode == 0);
    // What the save shows first is what `codebook --diff` prints afterwards (plus its newline).
    CHECK(w.diffText() + QLatin1Char('\n') == diffByCli.out);
    CHECK(diffByCli.out.contains(QStringLiteral("problem.definition")));
    CHECK(diffByCli.out.contains(QStringLiteral("evaluation.attributes.polarity.values")));

    REQUIRE(w.saveAsNewVersion(note));
    CHECK(w.stored().number == from + 1);
    CHECK(w.undoStack()->count() == 0);
    CHECK(w.messageBar()->kind() == MessageBar::Kind::Success);

    // The stored versions, their diffs and the outdated lists are the same in both copies.
    for (const QStringList &args :
        {QStringList {QStringLiteral("--show"), QString::number(from + 1)},
            QStringList {QStringLiteral("--diff"), QString::number(from), QString::number(from + 1),
                QStringLiteral("--json")},
            QStringList {QStringLiteral("--outdated"), QStringLiteral("--json")}}) {
        const CliRun a =
            runCli(kCli, QStringList {QStringLiteral("codebook"), viaEditor.path} + args);
        const CliRun b = runCli(kCli, QStringList {QStringLiteral("codebook"), viaCli.path} + args);
        INFO(args.join(QLatin1Char(' ')).toStdString());
        REQUIRE(a.exitCode == 0);
        REQUIRE(b.exitCode == 0);
        CHECK(a.out == b.out);
    }
    const QJsonArray outdated =
        cliJson(runCli(kCli,
                    {QStringLiteral("codebook"), viaEditor.path, QStringLiteral("--outdated"),
                        QStringLiteral("--json")}))
            .value(QStringLiteral("outdated"))
            .toArray();
    // The sample's codings were all made under the first version (sample-project/README.md).
    REQUIRE(!outdated.isEmpty());
    qsizetype recheck = 0;
    for (const QJsonValue &row : outdated) {
        const QString function = row.toObject().value(QStringLiteral("function")).toString();
        const bool changed = row.toObject().value(QStringLiteral("function_changed")).toBool();
        CHECK(changed
            == (function == QLatin1String("problem") || function == QLatin1String("evaluation")));
        recheck += changed ? 1 : 0;
    }
    CHECK(w.messageBar()->text().contains(QStringLiteral("%1 annotation").arg(outdated.size())));
    CHECK(w.messageBar()->text().contains(QStringLiteral("; %1 of them").arg(recheck)));

    // A version added elsewhere meanwhile (here the command line) is not overwritten unseen.
    QJsonObject third = book;
    third.insert(QStringLiteral("name"), QStringLiteral("Renamed from the command line"));
    {
        QFile out(file);
        REQUIRE(out.open(QIODevice::WriteOnly | QIODevice::Truncate));
        out.write(QJsonDocument(third).toJson());
    }
    REQUIRE(runCli(kCli,
                {QStringLiteral("codebook"), viaEditor.path, QStringLiteral("--update"), file,
                    QStringLiteral("--note"), QStringLiteral("renamed")})
                .exitCode
        == 0);
    textField(w, QStringLiteral("functions[1].definition"))->setPlainText(kDefinition);
    CHECK_FALSE(w.saveAsNewVersion(QStringLiteral("too late")));
    CHECK(w.messageBar()->kind() == MessageBar::Kind::Warning);
    auto versions = CodebookVersions::list(*project);
    REQUIRE(versions);
    CHECK(versions->back().number == from + 2);
}

TEST_CASE("an invalid codebook draft is shown at its field and nothing is stored")
{
    SampleCopy f;
    auto project = Project::open(f.path);
    REQUIRE(project);
    auto versionsBefore = CodebookVersions::list(*project);
    REQUIRE(versionsBefore);
    auto session = sessionOnFile(f.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    w.show();

    // A choice attribute without values (the file reader's rule: "lists no values").
    const QString valuesPath = QStringLiteral("functions[2].attributes[0].values");
    QPlainTextEdit *values = textField(w, valuesPath);
    values->setPlainText(QString());
    CHECK(w.fieldError(valuesPath)
        == QStringLiteral("A choice list needs at least one value (one per line)."));
    CHECK(shownError(values) == w.fieldError(valuesPath));
    CHECK(values->styleSheet().contains(QStringLiteral("border")));
    CHECK(w.diffText().isEmpty());
    CHECK_FALSE(w.saveAsNewVersion(QStringLiteral("no values")));
    CHECK(w.messageBar()->kind() == MessageBar::Kind::Warning);
    CHECK_FALSE(w.messageBar()->text().contains(QStringLiteral("functions[")));
    w.undoStack()->undo();
    CHECK(w.fieldError(valuesPath).isEmpty());
    CHECK_FALSE(values->styleSheet().contains(QStringLiteral("border")));

    // A third attribute of remedy (after explicitness and the kind of remedy) with the key of
    // the first.
    w.showFunction(FramingFunction::Remedy);
    w.addRow();
    const QString keyPath = QStringLiteral("functions[3].attributes[2].key");
    QLineEdit *key = lineField(w, keyPath);
    textField(w, QStringLiteral("functions[3].attributes[2].values"))
        ->setPlainText(QStringLiteral("yes\nno"));
    CHECK(w.fieldError(keyPath).isEmpty());
    key->setText(QStringLiteral("explicitness"));
    CHECK(w.fieldError(keyPath)
        == QStringLiteral(
            "Another attribute of this function already has the key “explicitness”."));
    CHECK(shownError(key) == w.fieldError(keyPath));
    // Looking at another function and saving turns back to the field.
    w.showFunction(FramingFunction::Problem);
    CHECK_FALSE(w.saveAsNewVersion(QStringLiteral("a repeated key")));
    CHECK(w.fieldWidget(keyPath) == key);
    CHECK(shownError(key) == w.fieldError(keyPath));

    key->setText(QStringLiteral("clarity"));
    CHECK(w.fieldError(keyPath).isEmpty());
    CHECK(shownError(key).isEmpty());

    // A value listed twice in an article-level item names the lines.
    const QString itemValues = QStringLiteral("items[0].values");
    QPlainTextEdit *answers = textField(w, itemValues);
    answers->setPlainText(answers->toPlainText() + QStringLiteral("\nnone"));
    CHECK(w.fieldError(itemValues) == QStringLiteral("“none” is listed twice (lines 5 and 6)."));

    auto versionsAfter = CodebookVersions::list(*project);
    REQUIRE(versionsAfter);
    CHECK(versionsAfter->size() == versionsBefore->size());
    auto stored = project->codebook();
    REQUIRE(stored);
    CHECK(stored->toJson() == w.stored().toJson());
}

TEST_CASE("undo in the codebook editor restores the text and redo brings the edit back")
{
    SampleCopy f;
    auto project = Project::open(f.path);
    REQUIRE(project);
    auto session = sessionOnFile(f.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    w.show();
    QPlainTextEdit *definition = textField(w, QStringLiteral("functions[1].definition"));
    const QString old = definition->toPlainText();
    REQUIRE_FALSE(old.isEmpty());
    // Typed a key at a time: one step for the field.
    definition->setFocus();
    definition->moveCursor(QTextCursor::End);
    QTest::keyClicks(definition, QStringLiteral(" Also"));
    CHECK(definition->toPlainText() == old + QStringLiteral(" Also"));
    CHECK(w.undoStack()->count() == 1);
    QLineEdit *label = lineField(w, QStringLiteral("functions[1].label"));
    label->setText(QStringLiteral("Cause"));
    CHECK(w.undoStack()->count() == 2);

    QTest::keyClick(definition, Qt::Key_Z, Qt::ControlModifier);
    CHECK(label->text() == w.stored().definition(FramingFunction::Cause).label);
    CHECK(definition->toPlainText() == old + QStringLiteral(" Also"));
    QTest::keyClick(definition, Qt::Key_Z, Qt::ControlModifier);
    CHECK(definition->toPlainText() == old);
    CHECK(w.draft().toJson() == w.stored().toJson());
    QTest::keyClick(definition, Qt::Key_Z, Qt::ControlModifier | Qt::ShiftModifier);
    CHECK(definition->toPlainText() == old + QStringLiteral(" Also"));
    CHECK(w.draft().definition(FramingFunction::Cause).definition == old + QStringLiteral(" Also"));
}

TEST_CASE("the lead menu entry Codebook opens the editor once")
{
    SampleCopy f;
    MainWindow desk;
    REQUIRE(
        desk.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    QAction *entry = nullptr;
    for (QAction *menu : desk.menuBar()->actions())
        if (menu->menu() && menu->text().remove(QLatin1Char('&')) == QLatin1String("Lead"))
            for (QAction *a : menu->menu()->actions())
                if (a->text().remove(QLatin1Char('&')) == QStringLiteral("Codebook…"))
                    entry = a;
    REQUIRE(entry);
    entry->trigger();
    QPointer<QWidget> editor = desk.leadWindows()->codebook();
    REQUIRE(qobject_cast<CodebookEditor *>(editor.data()));
    CHECK(editor->isVisible());
    desk.leadWindows()->openCodebook();
    CHECK(desk.leadWindows()->codebook() == editor.data());
    desk.leadWindows()->closeAll();
    CHECK_FALSE(editor);
}

TEST_CASE("a version saved in the editor is one step on the desk's undo stack: undo restores the "
          "full dump and the editor follows")
{
    SampleCopy f;
    auto reader = Project::open(f.path); // a connection of the test's own
    REQUIRE(reader);
    const QString before = dumpDatabase(databaseForTesting(*reader));
    auto session = sessionOnFile(f.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    const int from = w.stored().number;
    textField(w, QStringLiteral("functions[0].definition"))->setPlainText(kDefinition);
    REQUIRE(w.saveAsNewVersion(QStringLiteral("problem definition names costs")));
    QUndoStack *desk = session->undoStack();
    REQUIRE(desk->count() == 1);
    CHECK(desk->undoText() == QStringLiteral("Save codebook version %1").arg(from + 1));
    CHECK(reader->codebook()->number == from + 1);
    // The desk works with the new version at once.
    CHECK(session->codebook().definition(FramingFunction::Problem).definition == kDefinition);

    desk->undo();
    CHECK(dumpDatabase(databaseForTesting(*reader)) == before);
    CHECK(w.stored().number == from);
    CHECK(w.draft().definition(FramingFunction::Problem).definition != kDefinition);
    CHECK(session->codebook().number == from);

    desk->redo();
    CHECK(reader->codebook()->number == from + 1);
    CHECK(reader->codebook()->definition(FramingFunction::Problem).definition == kDefinition);
    CHECK(w.stored().number == from + 1);
}

// The sample's codebook is the default one: English, with Dutch and German texts
// (resources/codebook/default_codebook.json).
TEST_CASE("the German problem definition edited in the editor is stored in the new version's "
          "translations and undone like any field")
{
    SampleCopy f;
    auto reader = Project::open(f.path); // a connection of the test's own
    REQUIRE(reader);
    const QString before = dumpDatabase(databaseForTesting(*reader));
    auto session = sessionOnFile(f.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    w.show();
    CHECK(w.languages() == QStringList {QString(), QStringLiteral("de"), QStringLiteral("nl")});
    auto *languageBox = w.findChild<QComboBox *>(QStringLiteral("codebook-language"));
    REQUIRE(languageBox);
    // The languages by their own names (CLDR, as QLocale gives them).
    CHECK(languageBox->itemText(languageBox->findData(QStringLiteral("de")))
        == QStringLiteral("Deutsch (de)"));
    CHECK(languageBox->itemText(languageBox->findData(QStringLiteral("nl")))
        == QStringLiteral("Nederlands (nl)"));

    const int from = w.stored().number;
    const auto problemIn = [](const Codebook &book, const QString &language) {
        return book.translations.value(language).functions.value(FramingFunction::Problem);
    };
    const QString english = w.stored().definition(FramingFunction::Problem).definition;
    const QString oldGerman = problemIn(w.stored(), QStringLiteral("de")).definition;
    const QString dutch = problemIn(w.stored(), QStringLiteral("nl")).definition;
    REQUIRE(oldGerman.startsWith(QStringLiteral("Eine Textstelle, die sagt, was schiefläuft")));
    const QString newGerman = oldGerman + QStringLiteral(" Auch die Kosten sind gemeint.");

    QPlainTextEdit *definition = textField(w, QStringLiteral("functions[0].definition"));
    CHECK(definition->toPlainText() == english);
    REQUIRE(w.showLanguage(QStringLiteral("de")));
    CHECK(languageBox->currentData().toString() == QStringLiteral("de"));
    CHECK(w.findChild<QLabel *>(QStringLiteral("codebook-language-hint"))->isVisible());
    CHECK(definition->toPlainText() == oldGerman);
    CHECK(definition->placeholderText() == english);

    // Typed a key at a time: one step, named with its language.
    definition->setFocus();
    definition->moveCursor(QTextCursor::End);
    QTest::keyClicks(definition, QStringLiteral(" Auch die Kosten sind gemeint."));
    CHECK(w.undoStack()->count() == 1);
    CHECK(w.undoStack()->undoText() == QStringLiteral("Edit the definition of Problem (de)"));
    CHECK(problemIn(w.draft(), QStringLiteral("de")).definition == newGerman);
    CHECK(w.draft().definition(FramingFunction::Problem).definition == english);
    // What the save shows first names the translation's path, and nothing else changed.
    const QString diff = w.diffText();
    CHECK(diff.contains(QStringLiteral("\n~ translations.de.problem.definition: «%1» → «%2»")
                            .arg(oldGerman, newGerman)));
    CHECK(diff.count(QLatin1Char('\n')) == 1);

    // Undo with the base language shown turns to the language the step was made in.
    REQUIRE(w.showLanguage(QString()));
    CHECK(definition->toPlainText() == english);
    QTest::keyClick(definition, Qt::Key_Z, Qt::ControlModifier);
    CHECK(w.shownLanguage() == QStringLiteral("de"));
    CHECK(definition->toPlainText() == oldGerman);
    CHECK(w.draft().toJson() == w.stored().toJson());
    QTest::keyClick(definition, Qt::Key_Z, Qt::ControlModifier | Qt::ShiftModifier);
    CHECK(definition->toPlainText() == newGerman);

    REQUIRE(w.saveAsNewVersion(QStringLiteral("German problem definition names costs")));
    CHECK(w.undoStack()->count() == 0);
    auto stored = reader->codebook();
    REQUIRE(stored);
    CHECK(stored->number == from + 1);
    CHECK(problemIn(*stored, QStringLiteral("de")).definition == newGerman);
    CHECK(stored->definition(FramingFunction::Problem).definition == english);
    CHECK(problemIn(*stored, QStringLiteral("nl")).definition == dutch);
    // A desk in German (here Austrian German, looked up by its language) reads the new text.
    CHECK(
        stored->inLanguage(QStringLiteral("de_AT")).definition(FramingFunction::Problem).definition
        == newGerman);
    auto changes = CodebookVersions::diffBetween(*reader, from, from + 1);
    REQUIRE(changes);
    REQUIRE(changes->changes.size() == 1);
    CHECK(changes->changes[0].path == QStringLiteral("translations.de.problem.definition"));
    CHECK(w.shownLanguage() == QStringLiteral("de"));
    CHECK(definition->toPlainText() == newGerman);

    // One step on the desk's stack: undo restores the full dump, the editor shows the old text.
    QUndoStack *desk = session->undoStack();
    REQUIRE(desk->count() == 1);
    CHECK(desk->undoText() == QStringLiteral("Save codebook version %1").arg(from + 1));
    desk->undo();
    CHECK(dumpDatabase(databaseForTesting(*reader)) == before);
    CHECK(w.stored().number == from);
    CHECK(definition->toPlainText() == oldGerman);
    desk->redo();
    CHECK(problemIn(*reader->codebook(), QStringLiteral("de")).definition == newGerman);
    CHECK(w.stored().number == from + 1);
    CHECK(definition->toPlainText() == newGerman);
}

TEST_CASE("keys values levels and the lists are read-only while a translation is shown")
{
    SampleCopy f;
    auto session = sessionOnFile(f.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    w.show();
    REQUIRE(w.showLanguage(QStringLiteral("nl")));
    const QString hint = w.findChild<QLabel *>(QStringLiteral("codebook-language-hint"))->text();
    CHECK(hint.contains(QStringLiteral("Nederlands (nl)")));
    CHECK(hint.contains(QStringLiteral("change them in the base language")));
    QLineEdit *key = lineField(w, QStringLiteral("functions[2].attributes[0].key"));
    QPlainTextEdit *values = textField(w, QStringLiteral("functions[2].attributes[0].values"));
    QWidget *type = w.fieldWidget(QStringLiteral("functions[2].attributes[0].type"));
    QWidget *level = w.fieldWidget(QStringLiteral("functions[2].attributes[0].level"));
    CHECK(key->text() == QStringLiteral("polarity"));
    CHECK(key->isReadOnly());
    CHECK(values->isReadOnly());
    CHECK_FALSE(type->isEnabled());
    CHECK_FALSE(level->isEnabled());
    CHECK_FALSE(buttonEnabled(w, QStringLiteral("&Add attribute")));
    CHECK_FALSE(buttonEnabled(w, QStringLiteral("Re&move attribute")));
    key->setFocus();
    QTest::keyClicks(key, QStringLiteral("x"));
    w.addRow();
    w.removeRow();
    CHECK(key->text() == QStringLiteral("polarity"));
    CHECK(w.undoStack()->count() == 0);
    CHECK(w.draft().toJson() == w.stored().toJson());
    w.showItems();
    w.selectRow(0);
    CHECK(lineField(w, QStringLiteral("items[0].key"))->isReadOnly());
    CHECK(textField(w, QStringLiteral("items[0].values"))->isReadOnly());
    CHECK_FALSE(w.fieldWidget(QStringLiteral("items[0].level"))->isEnabled());
    CHECK_FALSE(buttonEnabled(w, QStringLiteral("&Add item")));

    // The attribute's label is a text: edited in Dutch; emptied, the English one stands again.
    QLineEdit *label = lineField(w, QStringLiteral("functions[2].attributes[0].label"));
    CHECK(label->text() == QStringLiteral("Polariteit"));
    CHECK(label->placeholderText() == QStringLiteral("Polarity"));
    label->setText(QStringLiteral("Toon"));
    const auto dutchLabels = [&w] {
        return w.draft()
            .translations.value(QStringLiteral("nl"))
            .functions.value(FramingFunction::Evaluation)
            .attributeLabels;
    };
    CHECK(dutchLabels().value(QStringLiteral("polarity")) == QStringLiteral("Toon"));
    label->clear();
    CHECK_FALSE(dutchLabels().contains(QStringLiteral("polarity")));
    CHECK(w.draft()
              .inLanguage(QStringLiteral("nl"))
              .definition(FramingFunction::Evaluation)
              .attributes[0]
              .label
        == QStringLiteral("Polarity"));
    CHECK(w.undoStack()->count() == 1);
    w.undoStack()->undo();
    CHECK(label->text() == QStringLiteral("Polariteit"));

    // In the base language the shared fields are editable again.
    REQUIRE(w.showLanguage(QString()));
    CHECK_FALSE(w.findChild<QLabel *>(QStringLiteral("codebook-language-hint"))->isVisible());
    key = lineField(w, QStringLiteral("functions[2].attributes[0].key"));
    CHECK_FALSE(key->isReadOnly());
    CHECK(type->isEnabled());
    CHECK(buttonEnabled(w, QStringLiteral("&Add attribute")));
    CHECK(label->text() == QStringLiteral("Polarity"));
    // A key renamed takes its translated labels along.
    key->setText(QStringLiteral("tone"));
    CHECK(dutchLabels().value(QStringLiteral("tone")) == QStringLiteral("Polariteit"));
    CHECK_FALSE(dutchLabels().contains(QStringLiteral("polarity")));

    // A broken rule found on saving while a translation is shown: the editor turns to the base
    // language, where the field can be changed.
    values->setPlainText(QString());
    REQUIRE(w.showLanguage(QStringLiteral("nl")));
    CHECK_FALSE(w.saveAsNewVersion(QStringLiteral("no values")));
    CHECK(w.shownLanguage().isEmpty());
    CHECK_FALSE(values->isReadOnly());
    CHECK(shownError(values)
        == QStringLiteral("A choice list needs at least one value (one per line)."));
}

TEST_CASE("a changed base text names the translations that may need updating and a language can "
          "be added")
{
    SampleCopy f;
    auto session = sessionOnFile(f.path, QStringLiteral("L01"));
    CodebookEditor w(*session);
    w.show();
    const QString field = QStringLiteral("functions[0].definition");
    QPlainTextEdit *definition = textField(w, field);
    CHECK(w.fieldNote(field).isEmpty());
    definition->setPlainText(kDefinition);
    const QString both =
        QStringLiteral("The translation of this text may need updating too: de, nl "
                       "(choose the language under “Texts in”).");
    CHECK(w.fieldNote(field) == both);
    CHECK(shownNote(definition) == both);
    // The translations themselves are left as they were.
    CHECK(w.draft().toJson().value(QStringLiteral("translations"))
        == w.stored().toJson().value(QStringLiteral("translations")));

    // Once the German text is changed too, only Dutch is named.
    REQUIRE(w.showLanguage(QStringLiteral("de")));
    CHECK(shownNote(definition).isEmpty());
    definition->setPlainText(
        QStringLiteral("Eine Textstelle, die sagt, was schiefläuft und was es kostet."));
    REQUIRE(w.showLanguage(QString()));
    CHECK(w.fieldNote(field).contains(QStringLiteral(" updating too: nl (choose")));
    w.undoStack()->undo();
    w.undoStack()->undo();
    CHECK(w.fieldNote(field).isEmpty());
    CHECK(shownNote(definition).isEmpty());

    // A language code as the codebook file takes it (ISO 639, two or three lower-case letters).
    for (const QString &bad : {QStringLiteral("French"), QStringLiteral("FR"), QStringLiteral("f"),
             QStringLiteral("fr-CA")}) {
        INFO(bad.toStdString());
        CHECK_FALSE(w.addLanguage(bad));
        CHECK(w.messageBar()->kind() == MessageBar::Kind::Warning);
        CHECK(w.messageBar()->text().startsWith(
            QStringLiteral("“%1” is not a language code").arg(bad)));
    }
    CHECK(w.shownLanguage().isEmpty());
    REQUIRE(w.addLanguage(QStringLiteral("fr")));
    CHECK(w.shownLanguage() == QStringLiteral("fr"));
    CHECK(w.languages()
        == QStringList {
            QString(), QStringLiteral("de"), QStringLiteral("fr"), QStringLiteral("nl")});
    CHECK(definition->toPlainText().isEmpty());
    CHECK(definition->placeholderText()
        == w.stored().definition(FramingFunction::Problem).definition);
    CHECK_FALSE(w.draft().translations.contains(QStringLiteral("fr")));
    const QString french = QStringLiteral("Un passage qui dit ce qui ne va pas.");
    definition->setPlainText(french);
    CHECK(w.draft()
              .translations.value(QStringLiteral("fr"))
              .functions.value(FramingFunction::Problem)
              .definition
        == french);
    CHECK(w.diffText().contains(
        QStringLiteral("\n+ translations.fr.problem.definition: «%1»").arg(french)));
    // Emptied again, the language gives no text and is not stored; it stays in the list.
    definition->clear();
    CHECK_FALSE(w.draft().translations.contains(QStringLiteral("fr")));
    CHECK(w.draft().toJson() == w.stored().toJson());
    CHECK(w.languages().contains(QStringLiteral("fr")));
}
