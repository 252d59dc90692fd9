#pragma once
// Running a program (fourfold-cli, a poppler tool) as a child process from a test, and reading
// its JSON answer: the one way the CLI tests see a program as a script would.

#include <QJsonObject>
#include <QProcessEnvironment>
#include <QString>
#include <QStringList>

namespace fourfold::test {

// What a finished child process left: its exit code and its stdout and stderr as UTF-8 text.
struct CliRun {
    int exitCode = -1;
    QString out;
    QString err;
};

// Runs `program` with `args` and waits at most `timeoutMs` milliseconds; fails the test (REQUIRE)
// if it does not start or finish in time. An empty `env` means this process's environment.
CliRun runCli(const QString &program, const QStringList &args, int timeoutMs = 120000,
    const QProcessEnvironment &env = {});

// The run's stdout parsed as one JSON object; fails the test, printing stdout and stderr, if it
// is not valid JSON.
QJsonObject cliJson(const CliRun &run);

} // namespace fourfold::test
