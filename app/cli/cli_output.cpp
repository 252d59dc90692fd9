#include "app/cli/cli_output.h"

#include <QCoreApplication>
#include <QJsonDocument>

#include <cstdio>

namespace fourfold::cli {

void out(const QString &text)
{
    const QByteArray utf8 = text.toUtf8();
    std::fwrite(utf8.constData(), 1, size_t(utf8.size()), stdout);
    std::fputc('\n', stdout);
}

QString printable(const QString &text)
{
    QString shown;
    shown.reserve(text.size());
    for (const QChar c : text) {
        const char16_t u = c.unicode();
        // C0 controls but line feed and tab, DEL and the C1 controls: a terminal would act on
        // them (colours, the window title, the cursor), so they are written as \xHH.
        const bool control = (u < 0x20 && u != '\n' && u != '\t') || (u >= 0x7F && u <= 0x9F);
        if (control)
            shown += QStringLiteral("\\x")
                + QString::number(int(u), 16).rightJustified(2, QLatin1Char('0')).toUpper();
        else
            shown += c;
    }
    return shown;
}

void err(const QString &text)
{
    const QByteArray utf8 = printable(text).toUtf8();
    std::fwrite(utf8.constData(), 1, size_t(utf8.size()), stderr);
    std::fputc('\n', stderr);
}

int report(const Error &error)
{
    // One line: newlines inside a parser's message would break scripts that read stderr.
    QString line = error.toString();
    line.replace(QLatin1Char('\n'), QLatin1Char(' '));
    err(QStringLiteral("fourfold-cli: %1").arg(line));
    return ExitFailure;
}

int usageError(const QString &command, const QString &message)
{
    err(QStringLiteral("fourfold-cli %1: %2").arg(command, message));
    err(QCoreApplication::translate("cli", "Run \"fourfold-cli %1 --help\" for its options.")
            .arg(command));
    return ExitUsage;
}

void printJson(const QJsonObject &object)
{
    const QByteArray json = QJsonDocument(object).toJson(QJsonDocument::Indented);
    std::fwrite(json.constData(), 1, size_t(json.size()), stdout);
}

int parseCommandLine(QCommandLineParser &parser, const QString &command, const QString &description,
    const QStringList &arguments)
{
    parser.setApplicationDescription(description);
    const QCommandLineOption help({QStringLiteral("h"), QStringLiteral("help")},
        QCoreApplication::translate("cli", "Show this help."));
    parser.addOption(help);
    QStringList args = arguments;
    args[0] = QStringLiteral("fourfold-cli %1").arg(command);
    if (!parser.parse(args))
        return usageError(command, parser.errorText());
    if (parser.isSet(help)) {
        // Qt names the executable's path in the usage line; scripts and people know the
        // subcommand by "fourfold-cli COMMAND".
        QString text = parser.helpText();
        const qsizetype options = text.indexOf(QLatin1String(" [options]"));
        const qsizetype lineEnd = text.indexOf(QLatin1Char('\n'));
        if (options > 0 && options < lineEnd)
            text.replace(0, options, QStringLiteral("Usage: fourfold-cli %1").arg(command));
        std::fputs(text.toUtf8().constData(), stdout);
        return ExitOk;
    }
    return -1;
}

} // namespace fourfold::cli
