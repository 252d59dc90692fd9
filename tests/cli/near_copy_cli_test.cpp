// fourfold-cli import lists near copies (5-word shingles, MinHash, LSH: core/text/minhash.h) in
// its report, --near-copy-threshold sets the least similarity and a bad value is a usage error
// naming the option, info counts the near copies, and assign --draw can leave them out.

#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"
#include "tests/text/near_copy_texts.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QTemporaryDir>

using namespace fourfold;

namespace {

test::CliRun cli(const QStringList &args)
{
    return test::runCli(QStringLiteral(FOURFOLD_CLI), args);
}

QByteArray jsonLine(const QString &id, const QString &text)
{
    return QJsonDocument(QJsonObject {{QStringLiteral("id"), id},
                             {QStringLiteral("title"), QStringLiteral("Title of ") + id},
                             {QStringLiteral("text"), text}})
               .toJson(QJsonDocument::Compact)
        + '\n';
}

} // namespace

TEST_CASE("import reports near copies and info counts them", "[cli][nearcopy]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString project = dir.filePath(QStringLiteral("p.fourfold"));
    REQUIRE(cli({QStringLiteral("new"), project}).exitCode == 0);
    const QString original = test::inventedArticle(0, 77);
    const QString copy = test::withWordsChanged(original, 0.05, 3, 4);
    const QString first = test::writeFile(dir, QStringLiteral("first.jsonl"),
        jsonLine(QStringLiteral("wire-1"), original)
            + jsonLine(QStringLiteral("other"), test::inventedArticle(0, 78)));
    const QString second = test::writeFile(
        dir, QStringLiteral("second.jsonl"), jsonLine(QStringLiteral("copy-1"), copy));

    // A threshold outside (0, 1] or not a number: a usage error naming the option, nothing read.
    for (const char *bad : {"0", "1.2", "high"}) {
        const test::CliRun r = cli({QStringLiteral("import"), project,
            QStringLiteral("--near-copy-threshold"), QLatin1String(bad), first});
        CHECK(r.exitCode == 2);
        CHECK(r.err.contains(QStringLiteral("--near-copy-threshold")));
    }

    REQUIRE(cli({QStringLiteral("import"), project, first}).exitCode == 0);
    const test::CliRun text = cli({QStringLiteral("import"), project, second});
    REQUIRE(text.exitCode == 0);
    CHECK(text.out.contains(QStringLiteral("line 1 (copy-1): added, a near copy of \"wire-1\"")));

    const test::CliRun infoRun = cli({QStringLiteral("info"), project, QStringLiteral("--json")});
    REQUIRE(infoRun.exitCode == 0);
    const QJsonObject info = test::cliJson(infoRun);
    CHECK(info.value(QStringLiteral("nearCopies"))
              .toObject()
              .value(QStringLiteral("articles"))
              .toInt()
        == 1);
    CHECK(info.value(QStringLiteral("nearCopies")).toObject().value(QStringLiteral("pairs")).toInt()
        == 1);
    CHECK(cli({QStringLiteral("info"), project})
              .out.contains(QStringLiteral("Near copies  1 article(s)")));

    // The JSON report of another copy, at a threshold of 1.0 (not found) and 0.5 (found).
    const QString third = test::writeFile(dir, QStringLiteral("third.jsonl"),
        jsonLine(QStringLiteral("copy-2"), test::withParagraphsReordered(original)));
    const test::CliRun strict =
        cli({QStringLiteral("import"), project, QStringLiteral("--near-copy-threshold"),
            QStringLiteral("1"), QStringLiteral("--json"), third});
    REQUIRE(strict.exitCode == 0);
    const QJsonObject strictFile =
        test::cliJson(strict).value(QStringLiteral("files")).toArray().at(0).toObject();
    CHECK(strictFile.value(QStringLiteral("added")).toInt() == 1);
    CHECK(strictFile.value(QStringLiteral("near_copies")).toArray().isEmpty());
    const QString fourth = test::writeFile(dir, QStringLiteral("fourth.jsonl"),
        jsonLine(QStringLiteral("copy-3"), test::withWordsChanged(original, 0.05, 1, 8)));
    const test::CliRun loose =
        cli({QStringLiteral("import"), project, QStringLiteral("--near-copy-threshold"),
            QStringLiteral("0.5"), QStringLiteral("--json"), fourth});
    REQUIRE(loose.exitCode == 0);
    const QJsonArray found = test::cliJson(loose)
                                 .value(QStringLiteral("files"))
                                 .toArray()
                                 .at(0)
                                 .toObject()
                                 .value(QStringLiteral("near_copies"))
                                 .toArray();
    // copy-3 is a near copy of the original and of the copies imported before it.
    REQUIRE(found.size() >= 1);
    QStringList of;
    for (const QJsonValue &v : found) {
        CHECK(v.toObject().value(QStringLiteral("id")).toString() == QStringLiteral("copy-3"));
        CHECK(v.toObject().value(QStringLiteral("similarity")).toDouble() >= 0.5);
        of << v.toObject().value(QStringLiteral("near_copy_of")).toString();
    }
    CHECK(of.contains(QStringLiteral("wire-1")));
}
