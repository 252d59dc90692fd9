// A feed imported into a project through Project::importFile: all of it or nothing, and the
// same feed twice adds nothing the second time (the project's rule for texts already there).

#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QByteArray feed = R"(<?xml version="1.0" encoding="UTF-8"?>
<feed xmlns="http://www.w3.org/2005/Atom">
  <title>Ellisford Gazette</title>
  <id>urn:uuid:7d1c0a52-0000-4000-8000-000000000001</id>
  <updated>2025-06-11T09:00:00Z</updated>
  <entry>
    <id>urn:uuid:7d1c0a52-0000-4000-8000-000000000002</id>
    <title>Pier reopens</title>
    <updated>2025-06-11T08:00:00Z</updated>
    <content type="html">&lt;p&gt;The pier is open again.&lt;/p&gt;</content>
  </entry>
  <entry>
    <id>urn:uuid:7d1c0a52-0000-4000-8000-000000000003</id>
    <title>Tide tables</title>
    <updated>2025-06-11T09:00:00Z</updated>
    <summary>New tide tables are out.</summary>
  </entry>
</feed>
)";

} // namespace

TEST_CASE("Feed import: the same feed twice adds nothing the second time", "[io][feed][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    const QString path = writeFile(dir, QStringLiteral("gazette.xml"), feed);

    auto first = project->importFile(path, ImportOptions {});
    REQUIRE(first);
    CHECK(first->added.size() == 2);
    CHECK(first->skipped.empty());
    auto articles = project->articles();
    REQUIRE(articles);
    REQUIRE(articles->size() == 2);

    auto again = project->importFile(path, ImportOptions {});
    REQUIRE(again);
    CHECK(again->added.empty());
    REQUIRE(again->skipped.size() == 2);
    CHECK(again->skipped[0].externalId
        == QStringLiteral("urn:uuid:7d1c0a52-0000-4000-8000-000000000002"));
    CHECK(again->skipped[0].line == 6);
    CHECK(project->articles()->size() == 2);
}

TEST_CASE(
    "Feed import: a broken entry at the end leaves the project unchanged", "[io][feed][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    QByteArray broken = feed;
    broken.replace(
        "<summary>New tide tables are out.</summary>", "<summary type=\"bad\">x</summary>");
    const QString path = writeFile(dir, QStringLiteral("gazette.atom"), broken);

    auto result = project->importFile(path, ImportOptions {});
    REQUIRE_FALSE(result);
    CHECK(result.error().line == 16);
    CHECK(result.error().message.contains(QStringLiteral("has the type \"bad\"")));
    CHECK(project->articles()->empty());
}
