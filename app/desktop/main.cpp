// fourfold: the desktop workbench. `fourfold [PROJECT] [--coder PSEUDONYM]` opens a project
// (asking who codes unless --coder says it; a lead is asked their passphrase).

#include "app/desktop/interface_language.h"
#include "app/desktop/main_window.h"
#include "app/i18n/translations.h"
#include "core/model/heap_tuning.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QLocale>
#include <QMessageBox>
#include <QSettings>

int main(int argc, char *argv[])
{
    fourfold::keepFreedHeapMemory();
    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Fourfold"));
    QApplication::setOrganizationName(QStringLiteral("Fourfold"));

    // The language chosen in Settings, else the system's; Qt's own buttons follow it.
    const QString language =
        QSettings().value(QStringLiteral("language"), QStringLiteral("system")).toString();
    fourfold::setInterfaceLanguage(
        fourfold::useLanguage(language == QLatin1String("system") ? QLocale() : QLocale(language)));

    QCommandLineParser parser;
    parser.setApplicationDescription(QApplication::translate(
        "main", "Fourfold: manual frame analysis of news and opinion articles."));
    parser.addHelpOption();
    const QCommandLineOption coder(QStringLiteral("coder"),
        QApplication::translate("main", "Code as the coder with this pseudonym."),
        QStringLiteral("PSEUDONYM"));
    parser.addOption(coder);
    parser.addPositionalArgument(QStringLiteral("PROJECT"),
        QApplication::translate("main", "A project file to open (*.fourfold)."));
    parser.process(app);

    fourfold::MainWindow window;
    window.show();
    if (!parser.positionalArguments().isEmpty()) {
        const auto st =
            window.openProject(parser.positionalArguments().first(), parser.value(coder));
        if (!st && st.error().code != fourfold::ErrorCode::Cancelled)
            QMessageBox::warning(&window, QApplication::translate("main", "Cannot open project"),
                st.error().toString());
    }
    return app.exec();
}
