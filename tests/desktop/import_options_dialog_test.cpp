// The import's options dialog: a split pattern with a preview of the cuts read from the chosen
// files before anything is stored; a bad pattern is named at the field and keeps Import off.
// FOURFOLD_IMPORT_OPTIONS_SHOT=FILE.png saves a picture of the dialog with its preview.

#include "app/desktop/import_options_dialog.h"
#include "tests/support/test_support.h"

#include <QDialogButtonBox>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("the import options dialog previews the cuts of a split pattern")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString path = writeFile(dir, QStringLiteral("bundle.txt"),
        "Item 1 | Harbour Courier | 2024-03-01\nFerry fares rise\n\nThe ferry company raises "
        "its fares.\nItem 2 | Dyke Weekly | 2024-03-02\nCouncil plans dyke\n\nThe council "
        "presented plans.\n");
    ImportOptionsDialog dialog({path});
    QPushButton *import = dialog.findChild<QDialogButtonBox *>()->button(QDialogButtonBox::Ok);
    REQUIRE(import);

    dialog.patternField()->setText(QStringLiteral("^Item (\\d+"));
    CHECK_FALSE(import->isEnabled());
    CHECK(dialog.problemLabel()->text().contains(QStringLiteral("not a valid regular expression")));

    dialog.patternField()->setText(
        QStringLiteral("^Item \\d+ \\| (?<outlet>[^|]+) \\| (?<date>[0-9-]+)$"));
    CHECK(import->isEnabled());
    CHECK(dialog.problemLabel()->text().isEmpty());
    dialog.preview();
    QListWidget *list = dialog.previewList();
    REQUIRE(list->count() == 2);
    CHECK(list->item(0)->text()
        == QStringLiteral(
            "bundle#1 (line 1): Ferry fares rise · Harbour Courier · 2024-03-01 (35 characters)"));
    CHECK(list->item(1)->text().startsWith(
        QStringLiteral("bundle#2 (line 5): Council plans dyke · Dyke Weekly · 2024-03-02")));
    CHECK(dialog.options().splitOn == dialog.patternField()->text());

    const QString shot = qEnvironmentVariable("FOURFOLD_IMPORT_OPTIONS_SHOT");
    if (!shot.isEmpty())
        CHECK(dialog.grab().save(shot));

    // A pattern that matches nothing: the preview says so for the file.
    dialog.patternField()->setText(QStringLiteral("^#+$"));
    dialog.preview();
    REQUIRE(list->count() == 1);
    CHECK(list->item(0)->text().contains(QStringLiteral("matches no line")));
}
