#include "tools/screenshots/screenshot_support.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QPixmap>
#include <QSettings>
#include <QStandardPaths>
#include <QThread>
#include <QWidget>

#include <cstdio>

namespace fourfold::screenshots {

ScreenshotApp::ScreenshotApp(int &argc, char **argv)
    : m_offscreen(prepareOffscreen())
    , m_app(argc, argv)
{
    QApplication::setOrganizationName(QStringLiteral("FourfoldScreenshots"));
    QSettings().clear();
    m_paths = preparePaths(argc, argv);
}

int ScreenshotApp::failure() const
{
    return m_paths ? 0 : m_paths.error();
}

QString ScreenshotApp::project() const
{
    return m_paths ? m_paths->project : QString();
}

QString ScreenshotApp::outDir() const
{
    return m_paths ? m_paths->outDir : QString();
}

bool ScreenshotApp::prepareOffscreen()
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QStandardPaths::setTestModeEnabled(true);
    return true;
}

std::expected<ScreenshotApp::Paths, int> ScreenshotApp::preparePaths(int argc, char **argv) const
{
    if (argc < 3) {
        const QString program = argc > 0 ? QFileInfo(QString::fromLocal8Bit(argv[0])).fileName()
                                         : QStringLiteral("screenshots");
        std::fprintf(stderr, "usage: %s SAMPLE_PROJECT OUT_DIR\n", qPrintable(program));
        return std::unexpected(2);
    }
    Paths paths {m_temp.filePath(QStringLiteral("demo.fourfold")), QString::fromLocal8Bit(argv[2])};
    const QString sample = QString::fromLocal8Bit(argv[1]);
    if (!m_temp.isValid() || !QFile::copy(sample, paths.project)) {
        std::fprintf(
            stderr, "%s: cannot copy the project to a temporary folder\n", qPrintable(sample));
        return std::unexpected(1);
    }
    QFile::setPermissions(paths.project, QFile::ReadOwner | QFile::WriteOwner);
    if (!QDir().mkpath(paths.outDir)) {
        std::fprintf(stderr, "%s: cannot create the folder\n", qPrintable(paths.outDir));
        return std::unexpected(1);
    }
    return paths;
}

bool saveGrab(QWidget &w, const QString &dir, const char *name)
{
    // Let layouts settle: a rebuilt frame card asks its scroll area for room over several passes.
    for (int i = 0; i < 10; ++i) {
        QApplication::processEvents();
        QThread::msleep(10);
    }
    const QString path = QDir(dir).filePath(QString::fromLatin1(name));
    const bool ok = w.grab().save(path);
    std::printf("%s %s\n", ok ? "wrote" : "FAILED", qPrintable(path));
    return ok;
}

} // namespace fourfold::screenshots
