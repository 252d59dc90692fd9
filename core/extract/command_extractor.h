#pragma once
// An external extractor: any program that reads one JSON object per article on stdin and writes
// one JSON object per article with its spans on stdout (the protocol is in extractor_protocol.h;
// offsets are code points). Fourfold writes every article, closes stdin, and waits for the
// program to finish within the timeout. The program's stderr is kept for error messages.

#include "core/extract/extractor.h"

namespace fourfold {

class CommandExtractor final : public Extractor
{
public:
    // `command` is split into program and arguments like a shell would for plain words and
    // quotes (QProcess::splitCommand); no shell is involved. `timeoutSeconds` bounds the whole
    // run. `version` is the program's own version, stored with the run; `recorded` are further
    // parameters stored with the run as given (the program's own settings, for the record).
    CommandExtractor(
        QString command, double timeoutSeconds, QString version = {}, QJsonObject recorded = {});

    QString kind() const override { return QStringLiteral("command"); }
    QString version() const override { return m_version; }
    // The recorded parameters plus "command" and "timeout" (seconds).
    QJsonObject parameters() const override;
    // Fails with InvalidArgument for an empty command; Io when the program cannot start, does
    // not finish within the timeout (it is killed), crashes or exits with a non-zero code (the
    // last lines of its stderr in the message); InvalidInput with the output line for malformed
    // output, an unknown or repeated article or an article without answer.
    Result<std::vector<ExtractedSpan>> extract(const std::vector<Article> &articles) override;

private:
    QString m_command;
    double m_timeoutSeconds = 0;
    QString m_version;
    QJsonObject m_recorded;
};

} // namespace fourfold
