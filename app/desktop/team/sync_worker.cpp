#include "app/desktop/team/sync_worker.h"

#include "core/model/logging.h"

#include <QSocketNotifier>

namespace fourfold {

SyncWorker::SyncWorker(QString path)
    : m_path(std::move(path))
{ }

SyncWorker::~SyncWorker()
{
    stop();
}

void SyncWorker::sync()
{
    SyncOutcome outcome;
    if (!m_project) {
        auto project = Project::open(m_path);
        if (!project) {
            outcome.error = project.error();
            emit finished(outcome);
            return;
        }
        m_project.emplace(std::move(*project));
    }
    auto report = TeamProject::sync(*m_project);
    if (report)
        outcome.report = *report;
    else
        outcome.error = report.error();
    if (auto status = TeamProject::status(*m_project))
        outcome.status = *status;
    if (report && !m_listener && outcome.status)
        listen(outcome.status->server);
    emit finished(outcome);
}

void SyncWorker::stop()
{
    stopListening();
    m_project.reset();
}

void SyncWorker::listen(const QString &server)
{
    auto listener = TeamListener::open(server);
    if (!listener) {
        // Polling goes on; a server without notices (schema version 1) ends up here too.
        logError(lcDesktop(), listener.error());
        return;
    }
    m_listener.emplace(std::move(*listener));
    m_notifier = new QSocketNotifier(qintptr(m_listener->socket()), QSocketNotifier::Read, this);
    connect(m_notifier, &QSocketNotifier::activated, this, &SyncWorker::readNotices);
}

void SyncWorker::stopListening()
{
    // The notifier goes before the connection whose socket it watches.
    delete m_notifier;
    m_notifier = nullptr;
    m_listener.reset();
}

void SyncWorker::readNotices()
{
    auto count = m_listener->take();
    if (!count) {
        // The connection is gone (the server stopped): listen again after the next good sync.
        stopListening();
        return;
    }
    if (*count > 0)
        emit noticed(*count);
}

} // namespace fourfold
