#include "app/desktop/interface_language.h"

namespace fourfold {

namespace {

QString &language()
{
    static QString current;
    return current;
}

} // namespace

QString interfaceLanguage()
{
    return language();
}

void setInterfaceLanguage(const QString &code)
{
    language() = code;
}

} // namespace fourfold
