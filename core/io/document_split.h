#pragma once
// Many articles in one document: a text-like document (plain text, DOCX, ODT, PDF) read as one
// article is cut at the lines that match a pattern (ImportOptions::splitOn, the CLI's
// --split-on).
//
// Rules. The document's text is taken line by line (its paragraphs and the line breaks inside
// them; blank lines only separate). A line matches when the pattern (a Perl-compatible regular
// expression, QRegularExpression) is found anywhere in it: anchor it with ^ and $ to match whole
// lines. Each matching line begins a part and is not part of any text; the text before the
// first matching line is a part of its own when it holds more than one non-blank line (a lone
// line there is the document's heading and is left out; the readers' title of the document,
// taken from its first line, is put back before the cut). The pattern
// may name the groups title, outlet and date (?<title>…), (?<outlet>…), (?<date>…): what they
// capture in the part's line becomes its title, outlet and published date. Without a title from
// the pattern the part's first line is its title (and is left out of its text). A part is an
// article: id = the document's id, "#" and the part's number (1-based); sourceLine = the line of
// the document's text as read (paragraphs one blank line apart) where the part begins (its
// matching line); language and meta are the
// document's, meta "part" its number. Errors (naming the file and line): a pattern that is not a
// valid regular expression (with the place of the fault) or names another group, a pattern that
// matches no line of the document, a part without text.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QRegularExpression>
#include <QString>

namespace fourfold {

// The pattern compiled, or InvalidArgument naming the pattern, what is wrong and where (a
// 1-based character position), or a named group other than title, outlet and date.
Result<QRegularExpression> compileSplitPattern(const QString &pattern);

// Cuts `document` at the lines matching `pattern` (from compileSplitPattern) and hands each part
// to `sink` in order; the first failure of `sink` is returned as it is.
Status splitDocument(const ImportedArticle &document, const QRegularExpression &pattern,
    const ImportedArticleSink &sink);

} // namespace fourfold
