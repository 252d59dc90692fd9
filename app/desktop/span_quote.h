#pragma once
// A span's text shown as a quote on the frame card, in the span editor and in the comparison
// window. The text is never changed (it is the article's own wording); only the marks put around
// it are chosen so that they never sit doubled beside the text's own quotation marks.

#include <QLocale>
#include <QString>

namespace fourfold {

// `text` between quotation marks of `locale`:
// - a text that already is a quotation (it opens with a quotation mark and closes with one of the
//   same kind, as when a coder marks a quoted sentence with its marks) is shown as it is;
// - a text that opens or closes with a mark of the kind the locale's quotation marks are (double
//   or single) gets the locale's alternate marks, or marks of the other kind where those are of
//   the same kind, so “the council had “run it down”” reads ‘the council had “run it down”’;
// - any other text gets the locale's quotation marks.
QString spanQuote(const QString &text, const QLocale &locale = QLocale());

} // namespace fourfold
