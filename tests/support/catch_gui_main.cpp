// The Catch2 main of GUI test programs: a QApplication on the offscreen platform, with its own
// settings so that tests never read or write a person's Fourfold settings.
#define CATCH_CONFIG_RUNNER
#include <QApplication>
#include <QStandardPaths>

#include <catch2/catch.hpp>

int main(int argc, char *argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QStandardPaths::setTestModeEnabled(true);
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("FourfoldTests"));
    QApplication::setApplicationName(QStringLiteral("fourfold-tests"));
    return Catch::Session().run(argc, argv);
}
