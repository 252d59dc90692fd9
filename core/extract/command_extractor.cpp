#include "core/extract/command_extractor.h"

#include "core/extract/extractor_protocol.h"

#include <QCoreApplication>
#include <QDeadlineTimer>
#include <QElapsedTimer>
#include <QProcess>

#include <signal.h>
#include <unistd.h>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CommandExtractorText {
    Q_DECLARE_TR_FUNCTIONS(CommandExtractorText)
};

// The last few lines of the program's stderr, for the error's cause.
QString stderrTail(const QByteArray &bytes)
{
    QStringList lines = QString::fromUtf8(bytes).trimmed().split(u'\n');
    if (lines.size() > 5)
        lines = lines.mid(lines.size() - 5);
    QString tail = lines.join(QStringLiteral(" | ")).trimmed();
    if (tail.size() > 600)
        tail = QStringLiteral("…") + tail.right(600);
    return tail.isEmpty() ? QString() : CommandExtractorText::tr("stderr: %1").arg(tail);
}

// `bytes` in MiB for a message: "512", "0.25".
QString mebibytes(qint64 bytes)
{
    return QString::number(double(bytes) / double(1 << 20), 'g', 4);
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
    p.insert(QStringLiteral("idle_timeout"), m_idleSeconds);
    return p;
}

Result<std::vector<ExtractedSpan>> CommandExtractor::extract(const std::vector<Article> &articles)
{
    const QStringList words = QProcess::splitCommand(m_command);
    if (words.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            CommandExtractorText::tr("The extractor command is empty."));
    if (m_timeoutSeconds < 0 || !std::isfinite(m_timeoutSeconds) || m_idleSeconds < 0
        || !std::isfinite(m_idleSeconds))
        return fail(ErrorCode::InvalidArgument,
            CommandExtractorText::tr(
                "A timeout must be a positive number of seconds (or 0 for none)."));

    QHash<QString, SpanTarget> targets;
    for (const Article &a : articles)
        targets.insert(a.summary.externalId, SpanTarget {a.summary.id, a.summary.length});

    QProcess process;
    process.setProgram(words.front());
    process.setArguments(words.mid(1));
    // The program leads a process group of its own, so that whatever it starts is stopped with
    // it (a helper it leaves behind would otherwise outlive the run).
    process.setChildProcessModifier([] { ::setsid(); });
    const auto stopGroup = [&process] {
        if (const qint64 pid = process.processId(); pid > 0)
            ::kill(-pid_t(pid), SIGKILL);
    };
    const QDeadlineTimer deadline = m_timeoutSeconds > 0
        ? QDeadlineTimer(qint64(std::ceil(std::min(m_timeoutSeconds, 1.0e9) * 1000.0)))
        : QDeadlineTimer(QDeadlineTimer::Forever);
    process.start();
    if (!process.waitForStarted(30000))
        return fail(ErrorCode::Io,
            CommandExtractorText::tr("The extractor \"%1\" could not be started.").arg(m_command),
            process.errorString());
    const qint64 group = process.processId();

    // stdout and stderr are taken as they arrive (the waitFor functions emit readyRead while
    // they wait), so neither piles up in QProcess's buffers: stdout within the limits, of
    // stderr only its tail.
    const QString source = CommandExtractorText::tr("output of \"%1\"").arg(m_command);
    QByteArray output;
    QByteArray errors;
    qint64 lineBytes = 0; // stdout bytes since its last line break
    qint64 lines = 0; // line breaks on stdout so far
    std::optional<Error> overflow; // set once a limit is passed; the program is then stopped
    QElapsedTimer idle;
    idle.start();
    m_mostStderrHeld = 0;
    const auto takeOutput = [&] {
        const QByteArray chunk = process.readAllStandardOutput();
        if (chunk.isEmpty() || overflow)
            return;
        idle.restart();
        for (qsizetype from = 0; from <= chunk.size();) {
            const qsizetype at = chunk.indexOf('\n', from);
            lineBytes += (at < 0 ? chunk.size() : at) - from;
            if (lineBytes > m_maxLineBytes) {
                overflow = failAt(ErrorCode::InvalidInput, source, lines + 1, 0,
                    CommandExtractorText::tr(
                        "a line is longer than %1 MiB, the most one answer may be; the extractor "
                        "was stopped and nothing was stored.")
                        .arg(mebibytes(m_maxLineBytes)))
                               .error();
                break;
            }
            if (at < 0)
                break;
            ++lines;
            lineBytes = 0;
            from = at + 1;
        }
        if (!overflow && output.size() + chunk.size() > m_maxOutputBytes)
            overflow = failAt(ErrorCode::InvalidInput, source, 0, 0,
                CommandExtractorText::tr(
                    "the extractor wrote more than %1 MiB, the most a run may write; it was "
                    "stopped and nothing was stored.")
                    .arg(mebibytes(m_maxOutputBytes)))
                           .error();
        if (overflow) {
            stopGroup();
            output.clear();
            return;
        }
        output += chunk;
    };
    const auto takeErrors = [&] {
        errors += process.readAllStandardError();
        m_mostStderrHeld = std::max(m_mostStderrHeld, qint64(errors.size()));
        if (errors.size() > kStderrTailBytes)
            errors.remove(0, errors.size() - kStderrTailBytes);
    };
    // The articles go to stdin as the program takes them, kInputAheadBytes ahead at most: the
    // protocol lines of a whole study are never held at once (QProcess would copy them into its
    // write buffer too). Taking input counts as activity for the idle timeout.
    size_t next = 0;
    bool allWritten = false;
    m_mostInputHeld = 0;
    const auto feed = [&] {
        while (next < articles.size() && process.bytesToWrite() < kInputAheadBytes)
            process.write(articleProtocolLine(articles[next++]));
        m_mostInputHeld = std::max(m_mostInputHeld, process.bytesToWrite());
        if (next == articles.size() && !allWritten) {
            allWritten = true;
            process.closeWriteChannel(); // once what is buffered has gone
        }
    };
    QObject::connect(&process, &QProcess::readyReadStandardOutput, &process, takeOutput);
    QObject::connect(&process, &QProcess::readyReadStandardError, &process, takeErrors);
    QObject::connect(&process, &QProcess::bytesWritten, &process, [&] {
        idle.restart();
        feed();
    });
    feed();
    // Wait in short steps: waitForFinished services stdin, stdout and stderr together, so a
    // program that answers while it reads cannot block on a full pipe. A program that writes
    // nothing for the idle timeout is stopped; a slow one that keeps answering is not.
    const qint64 idleMs = qint64(std::ceil(std::min(m_idleSeconds, 1.0e9) * 1000.0));
    while (!process.waitForFinished(std::min(200, msLeft(deadline)))) {
        if (process.state() == QProcess::NotRunning || overflow)
            break;
        const bool silent = m_idleSeconds > 0 && idle.elapsed() >= idleMs;
        if (silent || deadline.hasExpired()) {
            stopGroup();
            process.waitForFinished(5000);
            takeErrors();
            return fail(ErrorCode::Io,
                silent ? CommandExtractorText::tr(
                    "The extractor \"%1\" wrote nothing for %2 s and was stopped; nothing "
                    "was stored.")
                             .arg(m_command)
                             .arg(m_idleSeconds)
                       : CommandExtractorText::tr(
                           "The extractor \"%1\" did not finish within %2 s and was stopped; "
                           "nothing was stored.")
                             .arg(m_command)
                             .arg(m_timeoutSeconds),
                stderrTail(errors));
        }
    }
    if (overflow) {
        process.waitForFinished(5000);
        return std::unexpected(std::move(*overflow));
    }
    // The program has ended; anything it started and left running goes with it.
    if (group > 0)
        ::kill(-pid_t(group), SIGKILL);
    takeOutput();
    takeErrors();
    if (overflow)
        return std::unexpected(std::move(*overflow));
    if (process.exitStatus() == QProcess::CrashExit)
        return fail(ErrorCode::Io,
            CommandExtractorText::tr("The extractor \"%1\" crashed; nothing was stored.")
                .arg(m_command),
            stderrTail(errors));
    if (process.exitCode() != 0)
        return fail(ErrorCode::Io,
            CommandExtractorText::tr(
                "The extractor \"%1\" exited with code %2; nothing was stored.")
                .arg(m_command)
                .arg(process.exitCode()),
            stderrTail(errors));
    return readExtractorOutput(output, source, targets);
}

} // namespace fourfold
