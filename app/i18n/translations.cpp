#include "app/i18n/translations.h"

#include <QCoreApplication>
#include <QLibraryInfo>
#include <QTranslator>

#include <memory>
#include <vector>

namespace fourfold {

namespace {

std::vector<std::unique_ptr<QTranslator>> &installed()
{
    static std::vector<std::unique_ptr<QTranslator>> translators;
    return translators;
}

} // namespace

namespace {

QString &installedLanguage()
{
    static QString code;
    return code;
}

} // namespace

QString currentLanguage()
{
    return installedLanguage();
}

QString useLanguage(const QLocale &locale)
{
    installedLanguage().clear();
    for (const auto &t : installed())
        QCoreApplication::removeTranslator(t.get());
    installed().clear();

    auto own = std::make_unique<QTranslator>();
    if (!own->load(
            locale, QStringLiteral("fourfold"), QStringLiteral("_"), QStringLiteral(":/i18n")))
        return {};
    const QLocale language(own->language());
    QCoreApplication::installTranslator(own.get());
    installed().push_back(std::move(own));

    auto qt = std::make_unique<QTranslator>();
    if (qt->load(language, QStringLiteral("qtbase"), QStringLiteral("_"),
            QLibraryInfo::path(QLibraryInfo::TranslationsPath))) {
        QCoreApplication::installTranslator(qt.get());
        installed().push_back(std::move(qt));
    }
    installedLanguage() = QLocale::languageToCode(language.language());
    return installedLanguage();
}

} // namespace fourfold
