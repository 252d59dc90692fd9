#include "app/desktop/span_quote.h"

namespace fourfold {

namespace {

enum class MarkKind { None, Double, Single };

// The kind of quotation mark `c` is (Unicode's quotation marks as used in European languages
// and CJK corner brackets; the straight marks count as both opening and closing).
MarkKind markKind(QChar c)
{
    switch (c.unicode()) {
    case u'"':
    case 0x201C: // “
    case 0x201D: // ”
    case 0x201E: // „
    case 0x201F: // ‟
    case 0x00AB: // «
    case 0x00BB: // »
    case 0x300E: // 『
    case 0x300F: // 』
        return MarkKind::Double;
    case u'\'':
    case 0x2018: // ‘
    case 0x2019: // ’
    case 0x201A: // ‚
    case 0x201B: // ‛
    case 0x2039: // ‹
    case 0x203A: // ›
    case 0x300C: // 「
    case 0x300D: // 」
        return MarkKind::Single;
    default:
        return MarkKind::None;
    }
}

// The kind of the marks `locale` puts around a quotation of `style`.
MarkKind kindOf(const QLocale &locale, QLocale::QuotationStyle style)
{
    const QString marks = locale.quoteString(QString(), style);
    return marks.isEmpty() ? MarkKind::None : markKind(marks.front());
}

} // namespace

QString spanQuote(const QString &text, const QLocale &requested)
{
    // The C locale (LANG=C) has straight marks; a reader there gets English typography.
    const QLocale locale =
        requested.language() == QLocale::C ? QLocale(QLocale::English) : requested;
    if (text.isEmpty())
        return locale.quoteString(text);
    const MarkKind first = markKind(text.front());
    const MarkKind last = markKind(text.back());
    // Already a quotation with its own marks. (A closing ’ alone is often an apostrophe, so one
    // mark at one end is not enough.)
    if (text.size() > 1 && first != MarkKind::None && first == last)
        return text;
    const MarkKind standard = kindOf(locale, QLocale::StandardQuotation);
    if (standard == MarkKind::None || (first != standard && last != standard))
        return locale.quoteString(text);
    const MarkKind alternate = kindOf(locale, QLocale::AlternateQuotation);
    if (alternate != standard && first != alternate && last != alternate)
        return locale.quoteString(text, QLocale::AlternateQuotation);
    // The locale's alternate marks are of the same kind (Qt's Dutch data): the marks of the other
    // kind, as English sets them.
    return standard == MarkKind::Double ? QChar(0x2018) + text + QChar(0x2019)
                                        : QChar(0x201C) + text + QChar(0x201D);
}

} // namespace fourfold
