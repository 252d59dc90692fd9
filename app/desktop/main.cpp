// fourfold: the desktop workbench. `fourfold [PROJECT]` opens the project named on the command
// line.

#include "app/desktop/main_window.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QLibraryInfo>
#include <QLocale>
#include <QMessageBox>
#include <QTranslator>

int main(int argc, char *argv[])
{
    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Fourfold"));
    QApplication::setOrganizationName(QStringLiteral("Fourfold"));

    QTranslator translator;
    if (translator.load(
            QLocale(), QStringLiteral("fourfold"), QStringLiteral("_"), QStringLiteral(":/i18n")))
        QApplication::installTranslator(&translator);

    QCommandLineParser parser;
    parser.setApplicationDescription(QApplication::translate(
        "main", "Fourfold: manual frame analysis of news and opinion articles."));
    parser.addHelpOption();
    parser.addPositionalArgument(QStringLiteral("PROJECT"),
        QApplication::translate("main", "A project file to open (*.fourfold)."));
    parser.process(app);

    fourfold::MainWindow window;
    window.show();
    if (!parser.positionalArguments().isEmpty()) {
        if (auto st = window.openProject(parser.positionalArguments().first()); !st)
            QMessageBox::warning(&window, QApplication::translate("main", "Cannot open project"),
                st.error().toString());
    }
    return app.exec();
}
