#pragma once
// Sentence-break suppressions: abbreviations after which a full stop does not end a sentence.
// Private to core/text (used by segmenter.cpp); all per-language lists live in abbreviations.cpp.

#include <QSet>
#include <QString>

namespace fourfold {

// The abbreviations for the ICU locale name `icuBaseName` ("de_AT", "nl", "en_GB"): ICU's own
// CLDR list when ICU has one for that language (never another language's list, whatever the
// process locale is) plus Fourfold's additions for the language, minus the ICU entries Fourfold
// removes because they are ordinary words ("Test.", "Joe."). Entries end with a full stop and are
// stored without spaces ("z.B." stands for "z. B." as well); matching is case-sensitive, and an
// entry that starts with a lower-case letter is also stored capitalised ("bijv." and "Bijv.").
QSet<QString> sentenceAbbreviations(const char *icuBaseName);

// Words after which a full stop that follows a day number ("am 1. September") does not end a
// sentence, for languages that write ordinals with a full stop before a month name (German:
// "1. September", "9. Juni"; common practice of German orthography). Empty for other languages.
QSet<QString> monthsAfterOrdinal(const char *icuBaseName);

} // namespace fourfold
