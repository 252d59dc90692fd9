#include "core/extract/command_extractor.h"

#include "core/extract/extractor_protocol.h"

#include <QCoreApplication>
#include <QDeadlineTimer>
#include <QProcess>

#include <algorithm>
#include <cmath>
#include <limits>

namespace fourfold {

namespace {

QString tr(const char *text)
{
    return QCoreApplication::translate("CommandExtractor", text);
}

// The last few lines of the program's stderr, for the error's cause.
QString stderrTail(const QByteArray &bytes)
{
    QStringList lines = QString::fromUtf8(bytes).trimmed().split(u'\n');
    if (lines.size() > 5)
        lines = lines.mid(lines.size() - 5);
    QString tail = lines.join(QStringLiteral(" | ")).trimmed();
    if (tail.size() > 600)
        tail = QStringLiteral("…") + tail.right(600);
    return tail.isEmpty() ? QString() : tr("stderr: %1").arg(tail);
}

// Milliseconds left before `deadline`, as the int QProcess takes (at least 1).
int msLeft(const QDeadlineTimer &deadline)
{
    return int(std::clamp<qint64>(deadline.remainingTime(), 1, std::numeric_limits<int>::max()));
}

} // namespace

CommandExtractor::CommandExtractor(
    QString command, double timeoutSeconds, QString version, QJsonObject recorded)
    : m_command(std::move(command))
    , m_timeoutSeconds(timeoutSeconds)
    , m_version(std::move(version))
    , m_recorded(std::move(recorded))
{ }

QJsonObject CommandExtractor::parameters() const
{
    QJsonObject p = m_recorded;
    p.insert(QStringLiteral("command"), m_command);
    p.insert(QStringLiteral("timeout"), m_timeoutSeconds);
    return p;
}

Result<std::vector<ExtractedSpan>> CommandExtractor::extract(const std::vector<Article> &articles)
{
    const QStringList words = QProcess::splitCommand(m_command);
    if (words.isEmpty())
        return fail(ErrorCode::InvalidArgument, tr("The extractor command is empty."));
    if (!(m_timeoutSeconds > 0) || !std::isfinite(m_timeoutSeconds))
        return fail(
            ErrorCode::InvalidArgument, tr("The timeout must be a positive number of seconds."));

    QByteArray input;
    QHash<QString, SpanTarget> targets;
    for (const Article &a : articles) {
        input += articleProtocolLine(a);
        targets.insert(a.summary.externalId, SpanTarget {a.summary.id, a.summary.length});
    }

    QProcess process;
    process.setProgram(words.front());
    process.setArguments(words.mid(1));
    const QDeadlineTimer deadline(qint64(std::ceil(std::min(m_timeoutSeconds, 1.0e9) * 1000.0)));
    process.start();
    if (!process.waitForStarted(msLeft(deadline)))
        return fail(ErrorCode::Io, tr("The extractor \"%1\" could not be started.").arg(m_command),
            process.errorString());
    process.write(input);
    process.closeWriteChannel();
    // waitForFinished services stdin, stdout and stderr together, so a program that answers
    // while it reads cannot block on a full pipe.
    const bool finished = process.waitForFinished(msLeft(deadline));
    if (!finished) {
        process.kill();
        process.waitForFinished(5000);
        return fail(ErrorCode::Io,
            tr("The extractor \"%1\" did not finish within %2 s and was stopped; nothing was "
               "stored.")
                .arg(m_command)
                .arg(m_timeoutSeconds),
            stderrTail(process.readAllStandardError()));
    }
    const QByteArray errors = process.readAllStandardError();
    if (process.exitStatus() == QProcess::CrashExit)
        return fail(ErrorCode::Io,
            tr("The extractor \"%1\" crashed; nothing was stored.").arg(m_command),
            stderrTail(errors));
    if (process.exitCode() != 0)
        return fail(ErrorCode::Io,
            tr("The extractor \"%1\" exited with code %2; nothing was stored.")
                .arg(m_command)
                .arg(process.exitCode()),
            stderrTail(errors));
    return readExtractorOutput(
        process.readAllStandardOutput(), tr("output of \"%1\"").arg(m_command), targets);
}

} // namespace fourfold
