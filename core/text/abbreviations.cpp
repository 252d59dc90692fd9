#include "core/text/abbreviations.h"

#include <unicode/locid.h>
#include <unicode/udata.h>
#include <unicode/ures.h>

#include <cstring>
#include <span>

namespace fourfold {

namespace {

// Fourfold's own lists, for abbreviations ICU 72's CLDR data lacks (ICU has none for Dutch, and
// its English list lacks "Dr." and lower-case "e.g."/"i.e."). Common practice, compiled from
// memory of Dutch, German and English style guides. Left out on purpose: abbreviations that
// usually end a sentence when they occur ("etc." in English, "Inc.", "a.m.") and short words
// that double as ordinary words.
constexpr const char16_t *kDutch[] = {
    u"bijv.",
    u"bv.",
    u"d.w.z.",
    u"o.a.",
    u"ca.",
    u"dhr.",
    u"mevr.",
    u"mw.",
    u"mr.",
    u"dr.",
    u"Dr.",
    u"drs.",
    u"ir.",
    u"ing.",
    u"prof.",
    u"nl.",
    u"enz.",
    u"e.d.",
    u"m.b.t.",
    u"t.a.v.",
    u"i.p.v.",
    u"i.v.m.",
    u"n.a.v.",
    u"t.o.v.",
    u"m.a.w.",
    u"o.m.",
    u"vgl.",
    u"evt.",
    u"incl.",
    u"excl.",
    u"resp.",
    u"blz.",
    u"nr.",
    u"St.",
    u"zgn.",
    u"jl.",
    u"a.s.",
    u"jan.",
    u"feb.",
    u"mrt.",
    u"apr.",
    u"jun.",
    u"jul.",
    u"aug.",
    u"sep.",
    u"sept.",
    u"okt.",
    u"nov.",
    u"dec.",
};

constexpr const char16_t *kGerman[] = {
    u"z.B.",
    u"u.a.",
    u"d.h.",
    u"bzw.",
    u"ca.",
    u"Dr.",
    u"Nr.",
    u"vgl.",
    u"usw.",
    u"etc.",
    u"Prof.",
    u"Hr.",
    u"Fr.",
    u"Str.",
    u"S.",
    u"Mio.",
    u"Mrd.",
    u"bzgl.",
    u"evtl.",
    u"inkl.",
    u"sog.",
    u"z.T.",
    u"z.Zt.",
    u"o.ä.",
    u"u.ä.",
    u"v.a.",
    u"u.U.",
    u"i.d.R.",
    u"Abs.",
    u"Art.",
    u"St.",
    u"geb.",
    u"Hrsg.",
    u"Jh.",
    u"Jhd.",
    u"Tsd.",
    u"Std.",
    u"Min.",
    u"ggf.",
    u"z.Hd.",
};

constexpr const char16_t *kEnglish[] = {
    u"Dr.",
    u"Mr.",
    u"Mrs.",
    u"Ms.",
    u"Mx.",
    u"e.g.",
    u"i.e.",
    u"vs.",
    u"St.",
    u"No.",
    u"Nos.",
    u"Jr.",
    u"Sr.",
    u"cf.",
    u"approx.",
    u"Gov.",
    u"Sen.",
    u"Gen.",
    u"Lt.",
    u"Vol.",
    u"Fig.",
    u"Rev.",
    u"Prof.",
};

// Entries of ICU 72's CLDR lists that are also ordinary words or names and often end a sentence
// ("Das ist ein Test. Dann ...", "I met Joe. He ...", "It's OK. Then ..."), so suppressing a
// break after them merges real sentences. Common practice, from reading ICU's lists.
constexpr const char16_t *kGermanRemovals[] = {
    u"Test.",
    u"Art.",
    u"Akt.",
    u"App.",
    u"Max.",
    u"Ben.",
    u"Jan.",
    u"PIN.",
    u"Port.",
    u"Alt.",
    u"Best.",
};

constexpr const char16_t *kEnglishRemovals[] = {
    u"Joe.",
    u"Job.",
    u"Is.",
    u"On.",
    u"Go.",
    u"Do.",
    u"Up.",
    u"To.",
    u"As.",
    u"In.",
    u"Or.",
    u"By.",
    u"All.",
    u"Act.",
    u"Long.",
    u"Link.",
    u"Hat.",
    u"Card.",
    u"Pro.",
    u"Cap.",
    u"Id.",
    u"Ok.",
    u"OK.",
    u"Ex.",
    u"Jam.",
    u"Lib.",
    u"Def.",
    u"Diff.",
    u"I.",
    u"AA.",
    u"AB.",
    u"AD.",
    u"DC.",
    u"PC.",
    u"PP.",
};

struct LanguageTable {
    const char *language; // ISO 639 code as ICU spells it
    std::span<const char16_t *const> additions;
    std::span<const char16_t *const> removals;
};

constexpr LanguageTable kTables[] = {
    {"nl", kDutch, {}},
    {"de", kGerman, kGermanRemovals},
    {"en", kEnglish, kEnglishRemovals},
};

void insert(QSet<QString> &set, QString entry)
{
    entry.remove(QLatin1Char(' '));
    if (entry.isEmpty())
        return;
    if (entry.front().isLower()) {
        QString capitalised = entry;
        capitalised[0] = capitalised.front().toUpper();
        set.insert(capitalised);
    }
    set.insert(std::move(entry));
}

// ICU's CLDR suppression list, read from ICU's break-iterator data the way ICU's own
// FilteredBreakIteratorBuilder::createInstance() does, except that a fallback to another
// language (ures_open() falls back to the process's default locale) is refused: segmentation
// must not depend on the machine it runs on.
void insertIcuList(QSet<QString> &set, const icu::Locale &locale)
{
    UErrorCode status = U_ZERO_ERROR;
    UResourceBundle *bundle =
        ures_open(U_ICUDATA_NAME U_TREE_SEPARATOR_STRING "brkitr", locale.getBaseName(), &status);
    if (U_FAILURE(status)) {
        ures_close(bundle);
        return;
    }
    const char *actual = ures_getLocaleByType(bundle, ULOC_ACTUAL_LOCALE, &status);
    const bool sameLanguage = U_SUCCESS(status) && actual != nullptr
        && std::strcmp(icu::Locale(actual).getLanguage(), locale.getLanguage()) == 0;
    UResourceBundle *exceptions = nullptr;
    UResourceBundle *sentenceBreak = nullptr;
    if (sameLanguage) {
        exceptions = ures_getByKey(bundle, "exceptions", nullptr, &status);
        sentenceBreak = ures_getByKey(exceptions, "SentenceBreak", nullptr, &status);
    }
    if (sameLanguage && U_SUCCESS(status)) {
        const int32_t size = ures_getSize(sentenceBreak);
        for (int32_t i = 0; i < size; ++i) {
            UErrorCode itemStatus = U_ZERO_ERROR;
            int32_t length = 0;
            const UChar *item = ures_getStringByIndex(sentenceBreak, i, &length, &itemStatus);
            if (U_SUCCESS(itemStatus))
                insert(set, QString(reinterpret_cast<const QChar *>(item), length));
        }
    }
    ures_close(sentenceBreak);
    ures_close(exceptions);
    ures_close(bundle);
}

} // namespace

QSet<QString> sentenceAbbreviations(const char *icuBaseName)
{
    const icu::Locale locale(icuBaseName);
    QSet<QString> set;
    if (std::strlen(locale.getLanguage()) == 0)
        return set;
    insertIcuList(set, locale);
    for (const LanguageTable &table : kTables) {
        if (std::strcmp(table.language, locale.getLanguage()) != 0)
            continue;
        for (const char16_t *entry : table.additions)
            insert(set, QString::fromUtf16(entry));
        for (const char16_t *entry : table.removals)
            set.remove(QString::fromUtf16(entry));
    }
    return set;
}

QSet<QString> monthsAfterOrdinal(const char *icuBaseName)
{
    const icu::Locale locale(icuBaseName);
    if (std::strcmp(locale.getLanguage(), "de") != 0)
        return {};
    // Full names (with the Austrian "Jänner" and "Feber") and the usual short forms.
    return QSet<QString> {QStringLiteral("Januar"), QStringLiteral("Jänner"),
        QStringLiteral("Februar"), QStringLiteral("Feber"), QStringLiteral("März"),
        QStringLiteral("April"), QStringLiteral("Mai"), QStringLiteral("Juni"),
        QStringLiteral("Juli"), QStringLiteral("August"), QStringLiteral("September"),
        QStringLiteral("Oktober"), QStringLiteral("November"), QStringLiteral("Dezember"),
        QStringLiteral("Jan."), QStringLiteral("Feb."), QStringLiteral("Mrz."),
        QStringLiteral("Apr."), QStringLiteral("Jun."), QStringLiteral("Jul."),
        QStringLiteral("Aug."), QStringLiteral("Sep."), QStringLiteral("Sept."),
        QStringLiteral("Okt."), QStringLiteral("Nov."), QStringLiteral("Dez.")};
}

} // namespace fourfold
