#pragma once
// Progress of a long command on one line of stderr, rewritten in place ("\r"), when stderr is a
// terminal; a script reading stderr sees errors alone (nothing is written otherwise).

#include <QElapsedTimer>
#include <QString>

namespace fourfold::cli {

class TerminalProgress
{
public:
    // `label` starts the line ("articles.jsonl").
    explicit TerminalProgress(QString label);
    // Clears the line if anything was shown.
    ~TerminalProgress();
    TerminalProgress(const TerminalProgress &) = delete;
    TerminalProgress &operator=(const TerminalProgress &) = delete;

    bool active() const { return m_active; }
    // Shows `done` of `total` bytes (total 0: unknown), at most five times a second.
    void bytes(qint64 done, qint64 total);
    // Clears the line.
    void finish();

private:
    QString m_label;
    bool m_active = false;
    bool m_shown = false;
    QElapsedTimer m_since;
};

} // namespace fourfold::cli
