#include "app/desktop/window_placement.h"

#include <QEvent>
#include <QGuiApplication>
#include <QObject>
#include <QScreen>
#include <QSettings>
#include <QWidget>

namespace fourfold {

namespace {

// Room left for the title bar and frame, which the available geometry does not include.
constexpr int kFrameMargin = 40;

QString settingsKey(const QString &key)
{
    return QStringLiteral("windows/%1/geometry").arg(key);
}

// Writes the window's geometry when it is hidden or closed.
class GeometryKeeper : public QObject
{
public:
    GeometryKeeper(QWidget *window, QString key)
        : QObject(window)
        , m_window(window)
        , m_key(std::move(key))
    {
        window->installEventFilter(this);
    }

    bool eventFilter(QObject *watched, QEvent *event) override
    {
        if (watched == m_window
            && (event->type() == QEvent::Hide || event->type() == QEvent::Close))
            QSettings().setValue(settingsKey(m_key), m_window->saveGeometry());
        return false;
    }

private:
    QWidget *m_window;
    QString m_key;
};

bool onSomeScreen(const QRect &frame)
{
    for (const QScreen *screen : QGuiApplication::screens())
        if (screen->availableGeometry().intersected(frame).width() >= 100
            && screen->availableGeometry().contains(frame.topLeft() + QPoint(10, 10)))
            return true;
    return false;
}

} // namespace

QSize fittedSize(QSize preferred, QSize available)
{
    return preferred.boundedTo(QSize(std::max(available.width() - kFrameMargin, 200),
        std::max(available.height() - 2 * kFrameMargin, 150)));
}

void placeWindow(QWidget *window, const QString &key, QSize preferred)
{
    if (!window->findChild<GeometryKeeper *>(QString(), Qt::FindDirectChildrenOnly))
        new GeometryKeeper(window, key);
    const QByteArray saved = QSettings().value(settingsKey(key)).toByteArray();
    QScreen *screen = window->screen() ? window->screen() : QGuiApplication::primaryScreen();
    if (!screen) {
        window->resize(preferred);
        return;
    }
    const QRect available = screen->availableGeometry();
    if (!saved.isEmpty() && window->restoreGeometry(saved) && onSomeScreen(window->geometry())) {
        // A place from a larger screen keeps its position but not a size that no longer fits.
        window->resize(window->size().boundedTo(fittedSize(window->size(), available.size())));
        return;
    }
    const QSize size = fittedSize(preferred, available.size());
    window->resize(size);
    window->move(available.center() - QPoint(size.width() / 2, size.height() / 2));
}

} // namespace fourfold
