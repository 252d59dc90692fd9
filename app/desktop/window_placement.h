#pragma once

#include <QSize>
#include <QString>

class QWidget;

namespace fourfold {

// Where a top-level window opens. The first time: at its preferred size, shrunk to the available
// area of its screen (so every window shows whole on a 1366×768 screen) and centred there. Later:
// where the user left it, read from the settings under `key` — unless that place no longer lies on
// any screen (a monitor unplugged), in which case the first-time rule applies again. The geometry
// is written back when the window is hidden or closed.
void placeWindow(QWidget *window, const QString &key, QSize preferred);

// The preferred size shrunk to fit `available` with a margin for the window frame.
QSize fittedSize(QSize preferred, QSize available);

} // namespace fourfold
