// What the desk shows when there is nothing to code: it says why and what to do next, with the
// button for it where the person can act (the walkthrough found blank panes; the rule
// that an empty state names the next step is common practice in interface design).
#include "app/desktop/main_window.h"
#include "core/project/edit.h"
#include "core/project/people.h"
#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QPushButton>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kLeadPass = QStringLiteral("polder lantern lead");

// A project with the lead L01 and the coder C01; `articles` adds one article assigned to nobody.
QString makeProject(QTemporaryDir &dir, bool articles)
{
    const QString path = dir.filePath(QStringLiteral("empty.fourfold"));
    auto p = Project::create(path);
    REQUIRE(p);
    auto lead = People::add(*p, nullptr,
        {QStringLiteral("Lieke Lead"), QStringLiteral("L01"), CoderRole::Lead, kLeadPass});
    REQUIRE(lead);
    REQUIRE(p->apply(**lead));
    REQUIRE(p->addCoder(QStringLiteral("Cor Coder"), QStringLiteral("C01"), CoderRole::Coder));
    if (articles) {
        const QString jsonl = writeFile(dir, QStringLiteral("a.jsonl"),
            "{\"id\":\"d1\",\"title\":\"Dyke\",\"language\":\"en\",\"text\":\"The dyke at "
            "Polderwijk needs repair before winter.\"}\n");
        REQUIRE(p->importFile(jsonl, ImportOptions {}));
    }
    return path;
}

} // namespace

TEST_CASE("The start page offers a new project beside opening one")
{
    MainWindow window;
    QPushButton *first = window.startPageButton(0);
    REQUIRE(first);
    CHECK(first->text() == QStringLiteral("New project…"));
    REQUIRE(window.startPageButton(1));
    CHECK(window.startPageButton(1)->text() == QStringLiteral("Open a project…"));
}

TEST_CASE("A lead in a project without articles is offered the import")
{
    QTemporaryDir dir;
    const QString path = makeProject(dir, false);
    MainWindow window;
    REQUIRE(window.openProject(path, QStringLiteral("L01"), kLeadPass));
    CHECK(window.emptyStateText().contains(QStringLiteral("No articles yet")));
    CHECK(window.emptyStateText().contains(QStringLiteral("Import")));
    REQUIRE(window.emptyStateButton());
    CHECK(!window.emptyStateButton()->isHidden());
    CHECK(window.emptyStateButton()->text() == QStringLiteral("Import articles…"));
}

TEST_CASE("A coder with nothing assigned is told that the lead assigns articles")
{
    QTemporaryDir dir;
    const QString path = makeProject(dir, true);
    MainWindow window;
    REQUIRE(window.openProject(path, QStringLiteral("C01")));
    CHECK(window.emptyStateText().contains(QStringLiteral("Nothing to code yet")));
    CHECK(window.emptyStateText().contains(QStringLiteral("lead assigns")));
    // A coder cannot import: no button to press.
    CHECK(window.emptyStateButton()->isHidden());
    CHECK(!window.currentArticle().isValid());
}

TEST_CASE("With an article to code the desk shows it and no empty state")
{
    QTemporaryDir dir;
    const QString path = makeProject(dir, true);
    MainWindow window;
    REQUIRE(window.openProject(path, QStringLiteral("L01"), kLeadPass));
    CHECK(window.currentArticle().isValid());
    CHECK(window.emptyStateText().isEmpty());
}
