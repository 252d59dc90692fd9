#include "app/desktop/team/background_sync.h"

#include "core/team/team_credentials.h"

#include <QThread>

namespace fourfold {

BackgroundSync::BackgroundSync(const QString &path, const TeamStatus &status, QObject *parent)
    : QObject(parent)
    , m_server(status.server)
    , m_thread(new QThread(this))
    , m_worker(new SyncWorker(path))
    , m_status(status)
{
    if (!status.lastSync.isEmpty())
        m_lastSynced = QDateTime::fromString(status.lastSync, Qt::ISODate);
    m_worker->moveToThread(m_thread);
    connect(m_worker, &SyncWorker::finished, this, &BackgroundSync::finish);
    connect(m_worker, &SyncWorker::noticed, this, [this](int count) {
        m_notices += count;
        syncNow();
    });
    m_thread->start();

    m_pushTimer.setSingleShot(true);
    m_pushTimer.setInterval(kPushDelayMs);
    connect(&m_pushTimer, &QTimer::timeout, this, &BackgroundSync::syncNow);
    m_pullTimer.setInterval(kPullIntervalMs);
    connect(&m_pullTimer, &QTimer::timeout, this, &BackgroundSync::syncNow);
    m_pullTimer.start();
    m_clock.setInterval(1000);
    connect(&m_clock, &QTimer::timeout, this, &BackgroundSync::updateStatus);
    m_clock.start();
    updateStatus();
    syncNow();
}

BackgroundSync::~BackgroundSync()
{
    // The worker's project and listener are closed on their own thread, after any sync running.
    QMetaObject::invokeMethod(m_worker, &SyncWorker::stop, Qt::BlockingQueuedConnection);
    m_thread->quit();
    m_thread->wait();
    delete m_worker;
}

void BackgroundSync::localChange()
{
    m_pushTimer.start();
}

void BackgroundSync::syncNow()
{
    m_pushTimer.stop();
    if (m_running) {
        m_again = true;
        return;
    }
    m_running = true;
    QMetaObject::invokeMethod(m_worker, &SyncWorker::sync, Qt::QueuedConnection);
}

void BackgroundSync::setPullInterval(int milliseconds)
{
    m_pullTimer.start(milliseconds);
}

void BackgroundSync::finish(const SyncOutcome &outcome)
{
    m_running = false;
    ++m_finished;
    m_outcome = outcome;
    if (outcome.status)
        m_status = outcome.status;
    if (!outcome.error)
        m_lastSynced = QDateTime::currentDateTimeUtc();
    updateStatus();
    if (outcome.error && TeamCredentials::isMissingPassword(*outcome.error)
        && !std::exchange(m_askedPassword, true))
        emit passwordNeeded(m_server);
    if (!outcome.error && outcome.report.pulled > 0)
        emit pulled();
    emit syncFinished();
    if (std::exchange(m_again, false))
        syncNow();
}

QString BackgroundSync::problem() const
{
    return m_outcome.error ? m_outcome.error->message : QString();
}

QString BackgroundSync::statusText() const
{
    return m_text;
}

void BackgroundSync::updateStatus()
{
    QString text;
    const qint64 waiting = m_status ? m_status->waiting : 0;
    if (m_outcome.error) {
        text = tr("offline — %n change(s) waiting", nullptr, int(waiting));
    } else if (!m_lastSynced.isValid() || m_finished == 0) {
        text = tr("syncing…");
    } else {
        const qint64 seconds =
            std::max<qint64>(0, m_lastSynced.secsTo(QDateTime::currentDateTimeUtc()));
        text = tr("synced %n s ago", nullptr, int(seconds));
        if (m_status && m_status->openConflicts > 0)
            text += QStringLiteral(" · ") + tr("conflict — lead decides");
    }
    if (text != m_text) {
        m_text = text;
        emit statusChanged(m_text);
    }
}

} // namespace fourfold
