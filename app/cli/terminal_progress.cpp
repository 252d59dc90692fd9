#include "app/cli/terminal_progress.h"

#include "app/cli/cli_output.h"

#include <QCoreApplication>

#include <unistd.h>

#include <cstdio>
#include <utility>

namespace fourfold::cli {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ProgressText {
    Q_DECLARE_TR_FUNCTIONS(ProgressText)
};

QString megabytes(qint64 bytes)
{
    return QString::number(double(bytes) / 1e6, 'f', 1);
}

} // namespace

TerminalProgress::TerminalProgress(QString label)
    : m_label(std::move(label))
    , m_active(::isatty(STDERR_FILENO) == 1)
{ }

TerminalProgress::~TerminalProgress()
{
    finish();
}

void TerminalProgress::bytes(qint64 done, qint64 total)
{
    if (!m_active)
        return;
    if (m_shown && m_since.elapsed() < 200)
        return;
    m_since.start();
    const QString line = total > 0
        ? ProgressText::tr("%1: %2% (%3 of %4 MB)")
              .arg(printable(m_label))
              .arg(int(100 * done / total))
              .arg(megabytes(done), megabytes(total))
        : ProgressText::tr("%1: %2 MB").arg(printable(m_label), megabytes(done));
    // "\r" returns to the line's start and ESC [K clears what a longer line left (ECMA-48 EL).
    std::fputs(("\r" + line + "\x1b[K").toUtf8().constData(), stderr);
    std::fflush(stderr);
    m_shown = true;
}

void TerminalProgress::finish()
{
    if (!m_shown)
        return;
    std::fputs("\r\x1b[K", stderr);
    std::fflush(stderr);
    m_shown = false;
}

} // namespace fourfold::cli
