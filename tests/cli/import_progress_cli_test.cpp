// fourfold-cli import shows its progress on stderr when stderr is a terminal, and only then: a
// script reading stderr sees errors alone. The terminal is a real pseudo-terminal made by
// script(1) from util-linux (package bsdutils, essential in Debian).

#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QProcess>
#include <QTemporaryDir>

using namespace fourfold;

namespace {

QString articles(const QTemporaryDir &dir)
{
    QByteArray jsonl;
    for (int i = 0; i < 50; ++i)
        jsonl += "{\"id\":\"a" + QByteArray::number(i) + "\",\"title\":\"Piece "
            + QByteArray::number(i) + "\",\"text\":\"The ferry levy of town "
            + QByteArray::number(i) + " is debated again.\"}\n";
    return test::writeFile(dir, QStringLiteral("articles.jsonl"), jsonl);
}

// The shell-quoted command line (arguments are plain paths here, quoted for spaces).
QString quoted(const QStringList &args)
{
    QStringList out;
    for (const QString &a : args)
        out << QLatin1Char('\'') + a + QLatin1Char('\'');
    return out.join(QLatin1Char(' '));
}

} // namespace

TEST_CASE("import shows progress on a terminal and nothing when stderr is not one", "[cli]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString project = dir.filePath(QStringLiteral("p.fourfold"));
    const QString file = articles(dir);
    REQUIRE(
        test::runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("new"), project}).exitCode == 0);

    // Not a terminal (a pipe): the report on stdout, nothing on stderr.
    const test::CliRun piped =
        test::runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("import"), project, file});
    REQUIRE(piped.exitCode == 0);
    CHECK(piped.out.contains(QStringLiteral("50 added")));
    CHECK(piped.err.isEmpty());

    // On a terminal: the progress line, rewritten in place and cleared at the end (ECMA-48 EL).
    const QString again = dir.filePath(QStringLiteral("q.fourfold"));
    REQUIRE(
        test::runCli(QStringLiteral(FOURFOLD_CLI), {QStringLiteral("new"), again}).exitCode == 0);
    const test::CliRun terminal = test::runCli(QStringLiteral("script"),
        {QStringLiteral("-qec"),
            quoted({QStringLiteral(FOURFOLD_CLI), QStringLiteral("import"), again, file}),
            QStringLiteral("/dev/null")});
    INFO(terminal.out.toStdString());
    REQUIRE(terminal.exitCode == 0);
    CHECK(terminal.out.contains(QStringLiteral("\r") + file + QStringLiteral(": ")));
    CHECK(terminal.out.contains(QStringLiteral("% (")));
    CHECK(terminal.out.contains(QStringLiteral("\r\x1b[K")));
    CHECK(terminal.out.contains(QStringLiteral("50 added")));
}
