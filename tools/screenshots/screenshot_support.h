#pragma once
// What the screenshot programs share: an offscreen application with a private copy of the sample
// project, and saving a widget's grab as a PNG.

#include <QApplication>
#include <QString>
#include <QTemporaryDir>

#include <expected>

class QWidget;

namespace fourfold::screenshots {

// The application of a screenshot program run as `PROGRAM SAMPLE_PROJECT OUT_DIR`: offscreen
// (unless QT_QPA_PLATFORM is set), QStandardPaths in test mode with organisation
// "FourfoldScreenshots" and its settings cleared (no recent projects from earlier runs); the
// project copied to a temporary folder (owner read/write) and OUT_DIR created.
class ScreenshotApp
{
public:
    // `argc` must outlive the object (QApplication keeps a reference to it).
    ScreenshotApp(int &argc, char **argv);

    // 0 when the files are ready; otherwise the exit code (2 for a wrong command line, 1 when
    // the project cannot be copied or OUT_DIR made), the message already printed on stderr.
    int failure() const;
    // The private copy of the project; empty after a failure.
    QString project() const;
    // The folder the pictures go to; empty after a failure.
    QString outDir() const;

private:
    struct Paths {
        QString project;
        QString outDir;
    };
    static bool prepareOffscreen();
    std::expected<Paths, int> preparePaths(int argc, char **argv) const;

    bool m_offscreen; // set up before m_app is constructed
    QApplication m_app;
    QTemporaryDir m_temp;
    std::expected<Paths, int> m_paths;
};

// Lets layouts settle, then saves `w`'s grab as `dir/name` and prints "wrote PATH" (or
// "FAILED PATH"). Returns whether the file was written.
bool saveGrab(QWidget &w, const QString &dir, const char *name);

} // namespace fourfold::screenshots
