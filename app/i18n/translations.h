#pragma once

#include <QLocale>

namespace fourfold {

// Installs Fourfold's translation for the first of the locale's UI languages that has one
// (translations/fourfold_<lang>.ts, embedded under :/i18n) and Qt's own for that language
// (qtbase_<lang>.qm from Qt's translations folder, for "Close", "Cancel" and the like), in place
// of those installed before. English (or a language without a translation) installs none.
// Returns the language installed ("de", "nl"), or an empty string for English.
QString useLanguage(const QLocale &locale);
// What the last useLanguage installed ("de", "nl"; empty for English or before any call).
QString currentLanguage();

} // namespace fourfold
