#include "app/desktop/activity_clock.h"

#include <QCoreApplication>
#include <QEvent>

namespace fourfold {

namespace {
constexpr int kTickSeconds = 5;
constexpr qint64 kIdleAfterMs = 60 * 1000;
} // namespace

ActivityClock::ActivityClock(QObject *parent)
    : QObject(parent)
{
    m_sinceActivity.start();
    qApp->installEventFilter(this);
    connect(&m_timer, &QTimer::timeout, this, &ActivityClock::tick);
    m_timer.start(kTickSeconds * 1000);
}

qint64 ActivityClock::takeSeconds()
{
    return std::exchange(m_seconds, 0);
}

bool ActivityClock::eventFilter(QObject *watched, QEvent *event)
{
    switch (event->type()) {
    case QEvent::KeyPress:
    case QEvent::MouseButtonPress:
    case QEvent::MouseMove:
    case QEvent::Wheel:
        m_sinceActivity.restart();
        break;
    default:
        break;
    }
    return QObject::eventFilter(watched, event);
}

void ActivityClock::tick()
{
    if (m_sinceActivity.elapsed() < kIdleAfterMs)
        m_seconds += kTickSeconds;
}

} // namespace fourfold
