#pragma once
// An external extractor: any program that reads one JSON object per article on stdin and writes
// one JSON object per article with its spans on stdout (the protocol is in extractor_protocol.h;
// offsets are code points). Fourfold writes the articles as the program reads them (never the
// whole study's lines at once), closes stdin, and waits for the program to finish: it is stopped
// when for the idle timeout (default 120 s) it has neither read input nor written output or,
// if one is set, when the whole run takes longer than the total timeout. The program runs in a
// process group of its own, which is stopped with it, so nothing it starts outlives the run.
// Its stdout is read as it comes and may hold at most kMaxOutputBytes, in lines of at most
// kMaxLineBytes; beyond either the program is stopped and the run refused. Of its stderr only
// the last kStderrTailBytes are kept, for error messages.

#include "core/extract/extractor.h"

namespace fourfold {

class CommandExtractor final : public Extractor
{
public:
    // The most stdout a run may write (512 MiB) and the longest line in it (64 MiB, as a JSON
    // Lines article file); the stderr bytes kept (the last 64 KiB).
    static constexpr qint64 kMaxOutputBytes = qint64(512) << 20;
    static constexpr qint64 kMaxLineBytes = qint64(64) << 20;
    static constexpr qint64 kStderrTailBytes = qint64(64) << 10;
    // How far the articles written to the program's stdin may run ahead of what it has read.
    static constexpr qint64 kInputAheadBytes = qint64(1) << 20;

    // `command` is split into program and arguments like a shell would for plain words and
    // quotes (QProcess::splitCommand); no shell is involved. `timeoutSeconds` bounds the whole
    // run (0: no bound). `version` is the program's own version, stored with the run; `recorded`
    // are further parameters stored with the run as given (the program's own settings, for the
    // record).
    CommandExtractor(
        QString command, double timeoutSeconds, QString version = {}, QJsonObject recorded = {});
    // Seconds the program may write nothing before it is stopped (0: no bound; default 120).
    void setIdleTimeout(double seconds) { m_idleSeconds = seconds; }
    // Lower bounds than kMaxOutputBytes and kMaxLineBytes (bytes), e.g. for tests.
    void setOutputLimits(qint64 maxOutputBytes, qint64 maxLineBytes)
    {
        m_maxOutputBytes = maxOutputBytes;
        m_maxLineBytes = maxLineBytes;
    }
    // The most stderr bytes the last extract() held at once (for tests: at most about
    // kStderrTailBytes plus one read).
    qint64 mostStderrHeld() const { return m_mostStderrHeld; }
    // The most protocol bytes the last extract() held for stdin at once (for tests: at most
    // about kInputAheadBytes plus one article's line, however many articles there are).
    qint64 mostInputHeld() const { return m_mostInputHeld; }

    QString kind() const override { return QStringLiteral("command"); }
    QString version() const override { return m_version; }
    // The recorded parameters plus "command", "timeout" and "idle_timeout" (seconds).
    QJsonObject parameters() const override;
    // Fails with InvalidArgument for an empty command; Io when the program cannot start, does
    // not finish within the timeouts (it is killed), crashes or exits with a non-zero code (the
    // last lines of its stderr in the message); InvalidInput with the output line for malformed
    // output, an unknown or repeated article or an article without answer, and for output beyond
    // the limits (the program is stopped).
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) override;

private:
    QString m_command;
    double m_timeoutSeconds = 0;
    double m_idleSeconds = 120;
    qint64 m_maxOutputBytes = kMaxOutputBytes;
    qint64 m_maxLineBytes = kMaxLineBytes;
    qint64 m_mostStderrHeld = 0;
    qint64 m_mostInputHeld = 0;
    QString m_version;
    QJsonObject m_recorded;
};

} // namespace fourfold
