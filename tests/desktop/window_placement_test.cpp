// Where windows open: the rule is that every window shows whole on a 1366×768 screen and
// opens where it was left (common practice for desktop programs). The offscreen platform has one
// screen; the checks are stated against its available geometry, whatever its size.
#include "app/desktop/main_window.h"
#include "app/desktop/window_placement.h"

#include <QGuiApplication>
#include <QScreen>
#include <QSettings>
#include <QWidget>

#include <catch2/catch.hpp>

using namespace fourfold;

namespace {

QRect available()
{
    return QGuiApplication::primaryScreen()->availableGeometry();
}

} // namespace

TEST_CASE("A preferred size larger than the screen is shrunk to fit with room for the frame")
{
    const QSize laptop(1366, 768);
    CHECK(fittedSize(QSize(1500, 920), laptop) == QSize(1326, 688));
    CHECK(fittedSize(QSize(900, 600), laptop) == QSize(900, 600));
    CHECK(fittedSize(QSize(1500, 500), laptop) == QSize(1326, 500));
}

TEST_CASE("A window opens inside its screen the first time")
{
    QSettings().remove(QStringLiteral("windows"));
    QWidget window;
    placeWindow(&window, QStringLiteral("first-time"), QSize(4000, 3000));
    const QRect screen = available();
    CHECK(window.width() <= screen.width());
    CHECK(window.height() <= screen.height());
    CHECK(screen.contains(window.geometry().topLeft()));
    CHECK(screen.contains(window.geometry().bottomRight()));
}

TEST_CASE("A window opens again where it was left")
{
    QSettings().remove(QStringLiteral("windows"));
    const QRect screen = available();
    const QRect left(screen.topLeft() + QPoint(30, 40), QSize(320, 210));
    {
        QWidget window;
        placeWindow(&window, QStringLiteral("kept"), QSize(500, 400));
        window.show();
        window.setGeometry(left);
        window.hide(); // writes the place
    }
    CHECK(QSettings().contains(QStringLiteral("windows/kept/geometry")));
    QWidget again;
    placeWindow(&again, QStringLiteral("kept"), QSize(500, 400));
    CHECK(again.size() == left.size());
    CHECK(again.geometry().topLeft() == left.topLeft());

    QWidget other; // another key does not take this window's place
    placeWindow(&other, QStringLiteral("other"), QSize(300, 200));
    CHECK(other.size() == QSize(300, 200));
}

TEST_CASE("A place that lies on no screen any more is not restored")
{
    QSettings().remove(QStringLiteral("windows"));
    const QRect screen = available();
    {
        QWidget window;
        placeWindow(&window, QStringLiteral("gone"), QSize(300, 200));
        window.show();
        window.move(screen.right() + 3000, screen.bottom() + 3000);
        window.hide();
    }
    QWidget again;
    placeWindow(&again, QStringLiteral("gone"), QSize(300, 200));
    CHECK(screen.contains(again.geometry().center()));
    CHECK(again.size() == QSize(300, 200));
}

TEST_CASE("The main window fits the screen it opens on")
{
    QSettings().remove(QStringLiteral("windows"));
    MainWindow window;
    const QRect screen = available();
    CHECK(window.width() <= screen.width());
    CHECK(window.height() <= screen.height());
    CHECK(window.width() > 0);
}
