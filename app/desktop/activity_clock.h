#pragma once
// Active coding time: counts the seconds in which the person pressed a key or moved the mouse
// in the window within the last minute, so idle time is not counted (common practice for effort
// measures in coding studies), and hands them out in whole seconds.

#include <QElapsedTimer>
#include <QObject>
#include <QTimer>

namespace fourfold {

class ActivityClock : public QObject
{
    Q_OBJECT
public:
    explicit ActivityClock(QObject *parent = nullptr);
    // Takes the active seconds counted since the last call.
    qint64 takeSeconds();

protected:
    bool eventFilter(QObject *watched, QEvent *event) override;

private:
    void tick();

    QTimer m_timer;
    QElapsedTimer m_sinceActivity;
    qint64 m_seconds = 0;
};

} // namespace fourfold
