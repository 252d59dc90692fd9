// The printed report's layout: QTextDocument (the PDF) breaks a word that does not fit its table
// cell, so every header of the table of variables must fit its column whole. Read back with
// poppler's pdftotext -layout; a word cut in two ("Unit s", "Agree ment") is a layout fault
// (common practice: headers are not hyphenated, least of all without a hyphen).
#include "tests/support/cli_run.h"

#include <QRegularExpression>
#include <QStandardPaths>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

#include <algorithm>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("the PDF's table of variables keeps every header word whole")
{
    const QString pdftotext = QStandardPaths::findExecutable(QStringLiteral("pdftotext"));
    INFO("poppler-utils (tools/debian-packages.txt) must be installed");
    REQUIRE(!pdftotext.isEmpty());
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    const QString pdf = dir.filePath(QStringLiteral("report.pdf"));
    const CliRun built = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project});
    INFO(built.err.toStdString());
    REQUIRE(built.exitCode == 0);
    const CliRun written = runCli(QStringLiteral(FOURFOLD_CLI),
        {QStringLiteral("report"), project, QStringLiteral("--out"), pdf,
            QStringLiteral("--bootstrap"), QStringLiteral("0")});
    INFO(written.err.toStdString());
    REQUIRE(written.exitCode == 0);
    const CliRun text = runCli(pdftotext, {QStringLiteral("-layout"), pdf, QStringLiteral("-")});
    REQUIRE(text.exitCode == 0);

    const QStringList lines = text.out.split(QLatin1Char('\n'));
    const auto heading = std::find_if(lines.begin(), lines.end(), [](const QString &line) {
        return line.trimmed() == QLatin1String("Reliability per variable");
    });
    REQUIRE(heading != lines.end());
    REQUIRE(heading + 1 != lines.end());
    const QString header = *(heading + 1);
    INFO(header.toStdString());
    for (const char *word : {"Variable", "Units", "Pairable", "Agreement", "Verdict"})
        CHECK(header.contains(
            QRegularExpression(QStringLiteral("\\b%1\\b").arg(QLatin1String(word)))));
}
