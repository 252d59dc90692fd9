#pragma once
// HTML input for readArticles (libxml2's HTML parser); the rules are described in
// article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>
#include <QStringList>

// libxml2's element node (xmlNode), declared here so that users need not include libxml2.
struct _xmlNode;

namespace fourfold {

// Reads the one article of an HTML file's bytes (UTF-8). `file` is the path whose name gives
// the id (and the title when the page has none). Returns the article with sourceLine 1, or
// ErrorCode::InvalidInput naming `file` for invalid UTF-8 (with a hint when the page declares
// another character set), a binary file, or a page without any text outside the dropped
// elements. Safe to call from several threads (libxml2 is initialised once).
Result<ImportedArticle> readHtmlArticle(const QByteArray &bytes, const QString &file);

// The paragraphs of the HTML, XHTML or HTML-like XML (NITF's body) under `root`, by the rules
// of an HTML page's body (article_reader.h): blocks and headings make paragraphs, whitespace is
// collapsed, dropped and hidden elements are left out; elements are matched by their local name.
// Empty when there is no text. Feed and news-item readers use it for the HTML they hold.
QStringList htmlParagraphs(_xmlNode *root);

// Parses `html` (a fragment or a page, e.g. an RSS description) with the HTML reader's parser and
// returns its paragraphs as htmlParagraphs does (empty when it holds no text), or InvalidInput
// naming `file` and `line` (where the fragment stands) if the parser stopped before its end.
Result<QStringList> htmlFragmentParagraphs(const QString &html, const QString &file, qint64 line);
// Plain text (an Atom text construct, a news item's text/plain data) as paragraphs: each run of
// non-blank lines is escaped and read as one HTML paragraph by htmlFragmentParagraphs, so that
// its whitespace is collapsed as in HTML. Fails as htmlFragmentParagraphs does.
Result<QStringList> plainTextParagraphs(const QString &text, const QString &file, qint64 line);
} // namespace fourfold
