#include "core/io/json_item_stream.h"
#include "tests/support/test_support.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

using namespace fourfold;

namespace {

const JsonItemPlace kPageItems = [](const QStringList &keys) {
    return keys == QStringList {QStringLiteral("first"), QStringLiteral("items"), QString()};
};

struct Seen {
    QJsonObject item;
    JsonPlace where;
};

} // namespace

TEST_CASE("a collection's items are handed over one at a time with where each starts")
{
    QTemporaryDir dir;
    // Three items, the second on two lines and after a multi-byte character on its line; an
    // object nested in an item and an object in another array are not items.
    const QByteArray bytes =
        "{\"type\": \"AnnotationCollection\", \"first\": {\"items\": [\n"
        "  {\"id\": 1, \"body\": {\"value\": \"problem\"}},\n"
        "  \"é\", {\"id\": 2,\n"
        "   \"n\": 12345678901234},\n"
        "  {\"id\": 3}\n"
        "], \"type\": \"AnnotationPage\"}, \"other\": [{\"id\": 9}], \"total\": 3}";
    const QString path = test::writeFile(dir, QStringLiteral("c.jsonld"), bytes);
    std::vector<Seen> seen;
    auto rest = streamJsonItems(path, kPageItems, [&](QJsonObject &&item, JsonPlace where) {
        seen.push_back({std::move(item), where});
        return Status {};
    });
    REQUIRE(rest);
    REQUIRE(seen.size() == 3);
    CHECK(seen[0].item.value(QStringLiteral("id")).toInt() == 1);
    CHECK(seen[0].item.value(QStringLiteral("body")).toObject().value(QStringLiteral("value"))
        == QStringLiteral("problem"));
    CHECK(seen[1].item.value(QStringLiteral("n")).toInteger() == 12345678901234);
    CHECK(seen[2].item.value(QStringLiteral("id")).toInt() == 3);
    // Lines from 1, columns in characters: the "{" of each item.
    CHECK((seen[0].where.line == 2 && seen[0].where.column == 3));
    CHECK((seen[1].where.line == 3 && seen[1].where.column == 8));
    CHECK((seen[2].where.line == 5 && seen[2].where.column == 3));
    // The rest of the document stays, without the items; a string among them stays too.
    const QJsonObject root = rest->toObject();
    CHECK(root.value(QStringLiteral("total")).toInt() == 3);
    CHECK(root.value(QStringLiteral("other")).toArray().size() == 1);
    const QJsonArray items =
        root.value(QStringLiteral("first")).toObject().value(QStringLiteral("items")).toArray();
    CHECK(items == QJsonArray {QStringLiteral("é")});
}

TEST_CASE("the elements of a root array are items and a failed visit stops the reading")
{
    QTemporaryDir dir;
    const QString path =
        test::writeFile(dir, QStringLiteral("a.json"), "[{\"id\": 1}, {\"id\": 2}, {\"id\": 3}]");
    int visits = 0;
    const JsonItemPlace rootElements = [](const QStringList &keys) {
        return keys == QStringList {QString()};
    };
    auto r = streamJsonItems(path, rootElements, [&](QJsonObject &&item, JsonPlace) -> Status {
        ++visits;
        if (item.value(QStringLiteral("id")).toInt() == 2)
            return fail(ErrorCode::InvalidInput, QStringLiteral("two is refused"));
        return {};
    });
    REQUIRE_FALSE(r);
    CHECK(r.error().message == QStringLiteral("two is refused"));
    CHECK(visits == 2);
}

TEST_CASE("text that is not JSON fails naming file and line and column")
{
    QTemporaryDir dir;
    const struct {
        QByteArray bytes;
        qint64 line;
        qint64 column;
    } cases[] = {
        {"{\n  \"type\": AnnotationCollection\n}", 2, 11},
        {"[{\"id\": 1},\n {\"id\": 2", 2, 9},
        {"", 1, 1},
    };
    for (const auto &c : cases) {
        INFO(c.bytes.toStdString());
        const QString path = test::writeFile(dir, QStringLiteral("bad.json"), c.bytes);
        auto r = streamJsonItems(
            path, [](const QStringList &) { return true; },
            [](QJsonObject &&, JsonPlace) { return Status {}; });
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::InvalidInput);
        CHECK(r.error().file == path);
        CHECK(r.error().line == c.line);
        CHECK(r.error().column == c.column);
        CHECK(r.error().message.contains(QStringLiteral(": This is not valid JSON")));
        // The parser's own English is the raw cause, never part of the (translated) message.
        CHECK_FALSE(r.error().cause.isEmpty());
        CHECK_FALSE(r.error().message.contains(QStringLiteral("syntax error")));
    }
    auto missing = streamJsonItems(
        dir.filePath(QStringLiteral("none.json")), [](const QStringList &) { return true; },
        [](QJsonObject &&, JsonPlace) { return Status {}; });
    REQUIRE_FALSE(missing);
    CHECK(missing.error().code == ErrorCode::Io);
}
