// JsonPlaces: the line of each member and element of a JSON document (RFC 8259 syntax), and the
// first key repeated within one object.

#include "core/model/json_places.h"

#include <catch2/catch.hpp>

using namespace fourfold;

TEST_CASE("JsonPlaces gives the line where each member and element begins", "[model][json]")
{
    const QByteArray json = "{\n"
                            "  \"name\": \"a [tricky] {string} with \\\" and ,\",\n"
                            "  \"functions\": [\n"
                            "    {\"key\": \"problem\",\n"
                            "     \"rules\": [\"one\",\n"
                            "               \"two\"]},\n"
                            "    {\"key\": \"cause\", \"n\": -1.5e3, \"t\": true, \"z\": null}\n"
                            "  ],\n"
                            "  \"caf\\u00e9\": {\"inner\": [[1], [2,\n"
                            "3]]}\n"
                            "}\n";
    const JsonPlaces places(json);
    CHECK(places.line(QStringLiteral("name")) == 2);
    CHECK(places.line(QStringLiteral("functions")) == 3);
    CHECK(places.line(QStringLiteral("functions[0]")) == 4);
    CHECK(places.line(QStringLiteral("functions[0].key")) == 4);
    CHECK(places.line(QStringLiteral("functions[0].rules")) == 5);
    CHECK(places.line(QStringLiteral("functions[0].rules[0]")) == 5);
    CHECK(places.line(QStringLiteral("functions[0].rules[1]")) == 6);
    CHECK(places.line(QStringLiteral("functions[1]")) == 7);
    CHECK(places.line(QStringLiteral("functions[1].z")) == 7);
    // A key with an escape is found by its decoded text.
    CHECK(places.line(QString::fromUtf8("caf\u00e9.inner[1][1]")) == 10);
    CHECK(places.line(QStringLiteral("functions[2]")) == 0);
    CHECK(places.line(QStringLiteral("nothing")) == 0);
    CHECK(places.repeatedKey().isEmpty());
}

TEST_CASE("JsonPlaces finds a key repeated within one object", "[model][json]")
{
    const JsonPlaces places("{\"a\": {\"x\": 1, \"y\": 2},\n \"b\": {\"x\": 3},\n"
                            " \"a\": 4}");
    // "x" in two different objects is no repetition; the second "a" at the root is.
    CHECK(places.repeatedKey() == QStringLiteral("a"));
    CHECK(places.repeatedKeyLine() == 3);
    CHECK(places.line(QStringLiteral("a")) == 1);
}

TEST_CASE("JsonPlaces ends on text that is not JSON", "[model][json]")
{
    // Not its input (the contract asks for accepted JSON), but it must still end.
    for (const char *text : {"[}", "[1 }", "{\"a\": }", "{\"a\"", "[[[", "\"open", "{,,,}"}) {
        INFO(text);
        const JsonPlaces places(text);
        CHECK(places.line(QStringLiteral("[5]")) == 0);
    }
}
