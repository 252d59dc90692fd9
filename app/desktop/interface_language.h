#pragma once
// The language the program speaks to its user ("de", "nl"; empty for English), as main() chose
// it from Settings or the system (app/i18n). The desk shows the codebook's texts in it where the
// codebook has them (Codebook::inLanguage).

#include <QString>

namespace fourfold {

QString interfaceLanguage();
void setInterfaceLanguage(const QString &language);

} // namespace fourfold
