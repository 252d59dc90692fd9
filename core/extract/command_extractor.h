#pragma once
// An external extractor: any program that reads one JSON object per article on stdin and writes
// one JSON object per article with its spans on stdout (the protocol is in extractor_protocol.h;
// offsets are code points). Fourfold writes every article, closes stdin, and waits for the
// program to finish: it is stopped when it writes nothing for the idle timeout (default 120 s) or,
// if one is set, when the whole run takes longer than the total timeout. The program runs in a
// process group of its own, which is stopped with it, so nothing it starts outlives the run. The
// program's stderr is kept for error messages.

#include "core/extract/extractor.h"

namespace fourfold {

class CommandExtractor final : public Extractor
{
public:
    // `command` is split into program and arguments like a shell would for plain words and
    // quotes (QProcess::splitCommand); no shell is involved. `timeoutSeconds` bounds the whole
    // run (0: no bound). `version` is the program's own version, stored with the run; `recorded`
    // are further parameters stored with the run as given (the program's own settings, for the
    // record).
    CommandExtractor(
        QString command, double timeoutSeconds, QString version = {}, QJsonObject recorded = {});
    // Seconds the program may write nothing before it is stopped (0: no bound; default 120).
    void setIdleTimeout(double seconds) { m_idleSeconds = seconds; }

    QString kind() const override { return QStringLiteral("command"); }
    QString version() const override { return m_version; }
    // The recorded parameters plus "command", "timeout" and "idle_timeout" (seconds).
    QJsonObject parameters() const override;
    // Fails with InvalidArgument for an empty command; Io when the program cannot start, does
    // not finish within the timeouts (it is killed), crashes or exits with a non-zero code (the
    // last lines of its stderr in the message); InvalidInput with the output line for malformed
    // output, an unknown or repeated article or an article without answer.
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) override;

private:
    QString m_command;
    double m_timeoutSeconds = 0;
    double m_idleSeconds = 120;
    QString m_version;
    QJsonObject m_recorded;
};

} // namespace fourfold
