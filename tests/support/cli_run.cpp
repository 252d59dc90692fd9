#include "tests/support/cli_run.h"

#include <QJsonDocument>
#include <QJsonParseError>
#include <QProcess>

#include <catch2/catch.hpp>

namespace fourfold::test {

CliRun runCli(
    const QString &program, const QStringList &args, int timeoutMs, const QProcessEnvironment &env)
{
    QProcess p;
    if (!env.isEmpty())
        p.setProcessEnvironment(env);
    p.start(program, args);
    INFO(program.toStdString());
    REQUIRE(p.waitForFinished(timeoutMs));
    return CliRun {p.exitCode(), QString::fromUtf8(p.readAllStandardOutput()),
        QString::fromUtf8(p.readAllStandardError())};
}

QJsonObject cliJson(const CliRun &run)
{
    QJsonParseError e;
    const QJsonDocument doc = QJsonDocument::fromJson(run.out.toUtf8(), &e);
    INFO("stdout: " << run.out.toStdString());
    INFO("stderr: " << run.err.toStdString());
    REQUIRE(e.error == QJsonParseError::NoError);
    return doc.object();
}

} // namespace fourfold::test
