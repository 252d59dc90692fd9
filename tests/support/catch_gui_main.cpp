// The Catch2 main of GUI test programs: a QApplication on the offscreen platform, with its own
// settings so that tests never read or write a person's Fourfold settings, nor each other's: every
// test process keeps them in a folder of its own that goes when it ends (window places, recent
// projects and the like would otherwise leak from one run into the next).
#define CATCH_CONFIG_RUNNER
#include <QApplication>
#include <QSettings>
#include <QStandardPaths>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

int main(int argc, char *argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QStandardPaths::setTestModeEnabled(true);
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("FourfoldTests"));
    QApplication::setApplicationName(QStringLiteral("fourfold-tests"));
    QTemporaryDir settings;
    if (!settings.isValid())
        return 2;
    for (auto format : {QSettings::NativeFormat, QSettings::IniFormat})
        QSettings::setPath(format, QSettings::UserScope, settings.path());
    return Catch::Session().run(argc, argv);
}
