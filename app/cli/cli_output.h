#pragma once
// Conventions shared by every subcommand of fourfold-cli: results on stdout, one-line errors on
// stderr, and exit codes scripts can rely on.

#include "core/model/error.h"

#include <QCommandLineParser>
#include <QJsonObject>
#include <QString>
#include <QStringList>

namespace fourfold::cli {

enum ExitCode {
    ExitOk = 0,
    ExitFailure = 1, // the command ran and failed (bad input, integrity problems, ...)
    ExitUsage = 2, // the command line itself is wrong
};

// `text` with every control character a terminal would act on (C0 but line feed and tab, DEL,
// C1) written as \xHH, so a message quoting hostile input cannot recolour or retitle the
// terminal.
QString printable(const QString &text);
// Writes `text` and a newline to stdout / stderr (UTF-8); stderr through printable().
void out(const QString &text);
void err(const QString &text);
// Writes "fourfold-cli: <message>" for `error` to stderr and returns ExitFailure.
int report(const Error &error);
// Writes a usage error and a hint to run --help; returns ExitUsage.
int usageError(const QString &command, const QString &message);
void printJson(const QJsonObject &object);

// Parses `arguments` (the subcommand's name first) with `parser` after adding --help. Returns
// -1 to go on, or an exit code (help printed: ExitOk; bad options: ExitUsage).
int parseCommandLine(QCommandLineParser &parser, const QString &command, const QString &description,
    const QStringList &arguments);

// Each subcommand takes its arguments with the subcommand's name first.
int runNew(const QStringList &arguments);
int runImport(const QStringList &arguments);
int runInfo(const QStringList &arguments);
int runCheck(const QStringList &arguments);
int runBuildSample(const QStringList &arguments);
int runAgree(const QStringList &arguments);
int runFrames(const QStringList &arguments);
int runExtract(const QStringList &arguments);
int runScore(const QStringList &arguments);
int runExport(const QStringList &arguments);
int runReport(const QStringList &arguments);
int runAssign(const QStringList &arguments);
int runCodebook(const QStringList &arguments);
int runHandout(const QStringList &arguments);
int runMerge(const QStringList &arguments);
int runPeople(const QStringList &arguments);
int runTeam(const QStringList &arguments);
int runTeamPeople(const QStringList &arguments); // `team people`, called by runTeam

} // namespace fourfold::cli
