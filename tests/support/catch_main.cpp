// The one Catch2 main of every test program: creates the QCoreApplication that Qt's file,
// JSON and locale code expect, and defaults to the offscreen platform for GUI tests.
#define CATCH_CONFIG_RUNNER
#include <QCoreApplication>

#include <catch2/catch.hpp>

int main(int argc, char *argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QCoreApplication app(argc, argv);
    return Catch::Session().run(argc, argv);
}
