#pragma once
// Reading articles from files: plain text (a file or a folder of files), HTML, JSON Lines, CSV,
// RSS and Atom feeds, NITF and NewsML-G2 news items, DOCX and ODT documents, PDF and EPUB. Each
// file is read all-or-nothing: the first problem makes the whole file fail with an Error naming
// file, line (and column where known) and what is wrong.
//
// Common rules (every format)
// - Input must be UTF-8; a leading BOM is dropped. Invalid UTF-8 and NUL bytes (binary files)
//   are refused with the line and column of the first bad byte (decodeUtf8Strict).
// - Plain text and HTML files are read whole and may be at most maxImportFileSize bytes; larger
//   ones are refused before reading. JSON Lines and CSV files are read a chunk at a time
//   (ImportOptions::readChunkSize) and hold one line or record at a time, so their size has no
//   limit; a JSON line may be at most maxJsonLineSize bytes and a CSV record maxCsvRecordSize.
//   Problems are found in file order: the first line (JSON Lines) or record (CSV) with a
//   syntax problem is the one reported; within it, invalid UTF-8 comes first.
// - Every article needs a non-blank id without control characters (one line of printable text)
//   and a non-blank text; ids are unique within a file (and within a folder of text files); a
//   repeated id is reported with the line of its first use (only the ids and their lines are
//   kept, not the articles). Titles may be empty. Syntax and type errors are reported before
//   these checks, so the first syntax error wins over an earlier duplicate id: after a failed
//   check the rest of the file is still read for one.
// - An empty file, or one without a single article, is an error ("contains no articles").
// - ImportOptions::language fills in records that name no language.
// - The format is forced (ImportOptions::format) or told from the suffix; a file named .xml, or
//   with a suffix that names no format, is read as XML when its first character (after a BOM
//   and whitespace) is "<", and is a feed or a news item by its root element (<rss>, Atom's
//   <feed>; <nitf>, NewsML-G2's <newsItem> or <newsMessage>); any other root is Unsupported.
//   A file of unknown suffix that starts with "%PDF-" is read as PDF, and one that starts with a
//   zip signature ("PK\3\4") as EPUB or ODT by its mimetype entry, else as DOCX when it holds
//   word/document.xml (any other zip archive is Unsupported).
// - Error codes: InvalidInput for malformed content, Duplicate for a repeated id, Io for a file
//   that cannot be read, Unsupported for an unknown format, InvalidArgument for a bad
//   ImportOptions::csvColumns.
//
// Plain text (.txt, .text): one article per file; id = the file name without its last suffix.
// Paragraphs are runs of non-blank lines; blank (or whitespace-only) lines separate them and
// the body joins paragraphs with exactly one blank line ("\n\n"); line ends become LF; the
// lines themselves are kept as they are. Title: the first paragraph is the title when it is a
// single line of at most maxTextTitleLength characters and another paragraph follows;
// otherwise the title is the file name without its last suffix and every paragraph is body.
//
// HTML (.html, .htm), parsed with libxml2's error-tolerant HTML parser; the file must be UTF-8
// (a <meta charset> declaring anything else is ignored). Body: every heading (h1-h6) and block
// (p, li, blockquote, pre, td, th, dd, dt, figcaption, div and other block elements) becomes
// its own paragraph, with ASCII whitespace collapsed to one space and entities decoded; <br>
// is a line break and two or more in a row a paragraph break; inside <pre> line breaks are
// kept. Dropped with their content: head, script, style, noscript, template, nav, footer,
// aside, form, iframe, svg, math, object, embed, canvas, audio, video, button, select,
// textarea, elements with aria-hidden="true", and a <header> that is the page's banner (not
// inside article, main or section: the HTML-AAM mapping of header to the banner role); a
// <header> inside an article keeps its headline and standfirst. Elements that are not rendered
// (the `hidden` attribute, or display: none in the style attribute) are dropped too, without
// ending the paragraph around them. A DOCTYPE's internal subset ("[ <!ENTITY ...> ]") is
// ignored; a CDATA section ("<![CDATA[...]]>") is read as the text it holds.
// Title: <meta property="og:title">, else <title>, else the first <h1>, else the file name
// without its last suffix; the first heading of the body is left out of the body when its
// text equals the title, so the headline is not there twice. Outlet: og:site_name. Published:
// article:published_time, else the datetime of the first <time> in the body. Language: the
// lang attribute of <html>. Meta tags are matched on their property or name attribute.
//
// XML (feeds and news items): parsed with libxml2, nothing fetched from outside the file (no
// network, no DTD, no external entity: a declared external entity or a reference to an entity
// that is not declared is an error); an entity-expansion bomb is refused by libxml2's limits.
// The file must be well-formed (libxml2's first error, with its line) and may declare no
// encoding but UTF-8. Element text is read with internal entities expanded; HTML held in an
// element is read by the HTML body rules above (htmlParagraphs / htmlFragmentParagraphs).
//
// The line of an element (an article's sourceLine, an error's line) is the line where its start
// tag ends, as libxml2 records it.
//
// Feeds (.rss, .atom; format key "feed"): one article per item or entry, sourceLine its line.
// RSS 2.0 (RSS Advisory Board's specification; <rss version="2.0">, exactly one channel): the
// body is the item's content:encoded (RSS content module) or else its description, read as
// HTML; title: <title>; id: <guid>, else <link>; published: <pubDate> (RFC 822) as ISO 8601;
// outlet: the item's <source>, else the channel's <title>; language: the channel's <language>;
// meta: link, author, comments, enclosure (its url), categories (an array), and each element of
// an extension namespace under its prefixed name (its text). An element without a namespace
// that RSS 2.0 does not define, in an item or channel, is an error. Atom 1.0 (RFC 4287): the body
// is the entry's content (text, html, xhtml or text/*; content given by src is not fetched and
// the summary stands for it), else its summary; title: <title> (a Text construct); id: <id>;
// published: <published>, else <updated> (RFC 3339, kept as given); outlet: the entry's
// <source> title, else the feed's title; language: xml:lang in scope; meta: link (rel
// alternate), link:REL for other links, author, contributor, rights, categories (terms), and
// foreign elements under their prefixed name. An Atom element the RFC does not define in an
// entry or feed is an error. A feed without items or entries is an error.
//
// News items (.nitf, .newsml; format key "newsxml"). NITF 3.x (<nitf>, no namespace or an IPTC
// NITF one): one article; body: <body.content> by the HTML rules (p, hl2, block, table, lists);
// title: hedline/hl1, else head/title; id: docdata/doc-id/@id-string, else the file name without
// its last suffix; published: docdata/date.issue/@norm, else the dateline's story.date/@norm;
// outlet: pubdata/@name; meta: byline, dateline, provider (distributor, else doc-id/@regsrc),
// abstract, subjects (tobject.subject: {code: refnum, name: matter or type}), keywords
// (key-list). NewsML-G2 (namespace http://iptc.org/std/nar/2006-10-01/): a <newsItem> is one
// article, a <newsMessage> one per newsItem of its itemSet (any other item is an error); id:
// @guid; title: contentMeta/headline; published: contentCreated, else firstCreated, else
// versionCreated; language: xml:lang; body: the first inlineXML (NITF or XHTML) or inlineData
// (text/plain) of the contentSet (remote content is not fetched: an item without inline text is
// an error); meta: version, byline (by), dateline, slugline, provider (name, literal or qcode),
// subjects ({code: qcode or uri, name}). Other metadata of these standards is not read.
//
// Word-processing documents (.docx, ISO/IEC 29500; .odt, OASIS ODF 1.2): one article per file,
// read whole; id = the file name without its last suffix, sourceLine 1. The file is a zip
// archive (libzip) whose parts are parsed by the XML rules above. At most ZipLimits::entry bytes
// (64 MiB) are unpacked from one entry and ZipLimits::total (256 MiB) from the whole archive,
// counted as they come out (a zip bomb is refused whatever sizes the archive states); an
// encrypted entry, a password-protected document (DOCX: an OLE compound file; ODT: encryption
// data in META-INF/manifest.xml), a file that is not a zip archive or is damaged or cut off, a
// missing main part (DOCX: the officeDocument relationship of _rels/.rels, else
// word/document.xml; ODT: content.xml) and a package of another kind (ODT: its mimetype; DOCX:
// a main part that is not <w:document>) are errors naming the file, and the part and its line
// where the fault is in one. Body: each paragraph (w:p; text:p, text:h) is a paragraph, its
// whitespace collapsed (tabs are spaces) and line breaks (w:br, w:cr; text:line-break) kept;
// headings (DOCX: the paragraph style "heading N" or an outline level, followed through the
// styles it is based on; ODT: text:h) are paragraphs too; lists and sections are read through;
// tables row by row, each cell's paragraphs as paragraphs (as the HTML reader reads td);
// text boxes follow the paragraph they are anchored in. Left out: deleted text of tracked
// changes (w:del, w:moveFrom; text:tracked-changes), field instructions, comments
// (office:annotation; DOCX comments live in a part that is not read), the fallback of
// mc:AlternateContent, page headers and footers (parts that are not read), list numbers and
// bullets (not part of the text), images. Footnotes and endnotes: the marker "[n]" (n = 1, 2, …
// in the order of reference) stands where the note is referred to and each note follows the
// body as a paragraph "[n] text"; a reference to a note the document does not hold is an error.
// Title: dc:title of the metadata (docProps/core.xml; meta.xml), else the first paragraph in the
// Title style (or one based on it), else the first heading of level 1, else the file name; the
// first title or heading paragraph is left out of the body when it equals the title. Published:
// dcterms:created (DOCX) or meta:creation-date (ODT), as written. Language: dc:language. Meta:
// author (DOCX dc:creator; ODT meta:initial-creator, else dc:creator), subject, description,
// keywords, modified. A document without text is an error.
//
// PDF (.pdf, through poppler's C++ interface): one article per file, read whole; id = the file
// name without its last suffix, sourceLine 1. The file must have a "%PDF-" header in its first
// 1024 bytes. Text: poppler's text layer in its reading order; lines found from the words'
// boxes; running headers and footers (a line among the first or last two of a page whose text,
// digits made alike, is there on more than half of the pages and on two at least) and page
// numbers near the top or bottom edge are dropped; paragraphs are rebuilt from the line spacing
// (a step of more than 1.3 times the usual spacing, the lower quartile of the steps), first-line
// indents, and at a page or column change from the length of the last line (shorter than 85% of its
// page's widest line ends the paragraph); a word hyphenated at a line end is joined when the next
// line starts with a small letter, and a soft hyphen at a line end is dropped. Title: the Title of
// the document information dictionary (the first paragraph is left out when it equals it), else a
// first paragraph of at most maxTextTitleLength characters followed by more, else the file name.
// Published: CreationDate as ISO 8601 in UTC. Meta: author (Author), pages. Errors: a file that
// poppler cannot open (damaged), a PDF encrypted with a user password, a PDF without a text layer
// on any page ("it looks scanned": OCR it first), no text besides headers, footers and numbers.
//
// EPUB 3 (.epub; format key "epub"): a zip archive (the limits and refusals of DOCX and ODT
// apply) with the mimetype application/epub+zip; META-INF/container.xml names the package
// document (OPF), whose spine gives the chapters in reading order: each linear XHTML document of
// the spine, read by the HTML rules above, that holds text (a cover or a page of images is
// passed over; linear="no" items and SVG pages are left out). One article per chapter: id =
// the file name without its last suffix, "#" and the manifest item's id; title, text and
// language as the HTML reader finds them in the chapter; sourceLine = the chapter's place in
// the spine (1-based); meta: chapter (that place), href (the entry), book (dc:title), author
// (the dc:creators joined by ", "). With ImportOptions::epubWholeBook one article for the book:
// id = the file name without its last suffix, title = dc:title (else the file name), text = the
// chapters' headlines and texts in order. Both: outlet = dc:publisher, published = dc:date (as
// written), language = dc:language. Errors: a mimetype of another kind, no container.xml or no
// package document, a spine item the manifest or the archive does not hold, a spine document
// listed as encrypted in META-INF/encryption.xml (DRM; font obfuscation is no obstacle), a book
// without text.
//
// JSON Lines (.jsonl, .ndjson; https://jsonlines.org): one JSON object per line (LF or CRLF);
// whitespace-only lines are skipped. Fields: "id", "title", "text" (required strings),
// "outlet", "published", "language" (optional strings; null = absent) and "meta" (optional
// object; null = absent). Any other top-level field is an error naming it, so that a typo
// ("titel") cannot silently drop data; put further data inside "meta". Syntax errors give
// the line and the 1-based column in characters (code points). A last line that is cut off
// (no final newline and the JSON ends early) is reported as truncated. Strings must be valid
// Unicode (no unpaired surrogate escapes, RFC 8259 §8.2). A line may be at most
// maxJsonLineSize bytes of UTF-8. Duplicate keys inside one object: the last one wins (Qt's
// parser keeps it).
//
// CSV (.csv; RFC 4180): comma-separated, fields optionally enclosed in double quotes, a
// double quote inside a quoted field written twice, quoted fields may hold commas and line
// breaks; records end with CRLF, LF or a lone CR; the last record may end without one. A
// double quote inside an unquoted field, or anything but a comma or line break after a
// closing quote, is an error. Completely empty lines are skipped. The first record is the
// header (names trimmed; each must be non-empty and unique); every record must have as many
// fields as the header. Columns are found by name (see ImportOptions::csvColumns); required
// columns: id, title, text; optional: outlet, published, language; every other column goes
// into meta as a string, keyed by its header name. Line numbers are physical lines of the
// file: a record that spans lines is reported at its first line; an unterminated quoted field
// is reported where its opening quote is. A record, with the line breaks inside its quoted
// fields, may be at most maxCsvRecordSize bytes of UTF-8; a quoted field left open that runs
// past the limit is reported where its quote opens.

#include "core/io/chunked_input.h"
#include "core/io/imported_article.h"
#include "core/io/zip_archive.h"
#include "core/model/error.h"

#include <QHash>
#include <QString>

#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

enum class ImportFormat { Text, Html, JsonLines, Csv, Feed, NewsXml, Docx, Odt, Pdf, Epub };

// The largest plain text or HTML file (read whole), in bytes (1 GiB).
inline constexpr qint64 maxImportFileSize = qint64(1) << 30;
// The longest line of a JSON Lines file, in bytes of UTF-8 without the line break (64 MiB).
inline constexpr qint64 maxJsonLineSize = qint64(64) << 20;
// The longest record of a CSV file, in bytes of UTF-8 with its line breaks (64 MiB).
inline constexpr qint64 maxCsvRecordSize = qint64(64) << 20;
// The longest first line of a text file that can be its title, in UTF-16 code units.
inline constexpr qsizetype maxTextTitleLength = 200;

// "txt", "html", "jsonl", "csv", "feed", "newsxml", "docx", "odt", "pdf", "epub".
QString importFormatKey(ImportFormat format);
// The format for a key: the keys above and the aliases "text", "htm", "ndjson", "rss", "atom",
// "nitf", "newsml" (any letter case); nothing for any other key.
std::optional<ImportFormat> importFormatFromKey(const QString &key);
// From the file name's suffix (.txt/.text, .html/.htm, .jsonl/.ndjson, .csv, .rss/.atom,
// .nitf/.newsml, .docx, .odt, .pdf, .epub: any suffix that is a key; any letter case); nothing
// otherwise
// (.xml included: such files are told from their content).
std::optional<ImportFormat> importFormatFromPath(const QString &path);

struct ImportOptions {
    // Forced format; if unset, taken from each file's suffix (or an XML file's root element).
    std::optional<ImportFormat> format;
    // Language for records that name none (txt, html, CSV without a language column); empty =
    // leave empty, the project fills in its default.
    QString language;
    // CSV: maps Fourfold's field names (id, title, text, outlet, published, language) to the
    // CSV header names that hold them; a field not in the map is looked up under its own name.
    // A mapped column must exist in the header; a key that is not one of these field names
    // is an ErrorCode::InvalidArgument error.
    QHash<QString, QString> csvColumns;
    // How many bytes a JSON Lines or CSV file is read in at a time (tests make it small).
    qsizetype readChunkSize = defaultReadChunkSize;
    // DOCX, ODT and EPUB: the most bytes unpacked from one entry of the archive and from all of
    // them (tests make them small).
    ZipLimits zipLimits;
    // EPUB: the whole book as one article instead of one article per chapter.
    bool epubWholeBook = false;
    // Plain text, DOCX, ODT and PDF: cut each document into articles at the lines that match this
    // regular expression (core/io/document_split.h); empty = one article per document. Another
    // format, or a file whose format is told from its content, is Unsupported with a pattern.
    QString splitOn;
    // Project::importFile: an added article whose estimated word-shingle Jaccard similarity to
    // an article of the project reaches this (in (0, 1]) is recorded as its near copy.
    double nearCopyThreshold = 0.8;
};

// How far a reading has come, for a progress bar: the bytes of input read up to the end of the
// article just handed over, of all there are (a folder: the sum of its .txt files).
struct ReadProgress {
    qint64 bytesRead = 0;
    qint64 totalBytes = 0;
};
// Takes one article that has passed the checks; a failure stops the reading and is returned.
using ArticleVisit = std::function<Status(ImportedArticle &&article, ReadProgress progress)>;

// Reads the articles of `path`, a file or for plain text a folder of *.txt files (sorted by
// name, not recursive), handing each to `visit` in file order as soon as it is read and has
// passed the checks; a JSON Lines or CSV file holds one article at a time. The rules of each
// format are described at the top of this file. Returns the first error: then `visit` may
// already have taken articles before it, which a caller that must be all-or-nothing undoes (as
// Project::importFile does, in one transaction); a failure of `visit` stops the reading at once
// and is returned as it is. Duplicate ids inside one file are an error (ErrorCode::Duplicate,
// naming both lines). An empty file is an error. A missing or unreadable path is
// ErrorCode::Io; a file whose format is neither forced nor known from its suffix nor XML with a
// known root element, or a folder with a forced format other than Text, is
// ErrorCode::Unsupported.
Status forEachArticle(const QString &path, const ImportOptions &options, const ArticleVisit &visit);

// The same, collecting every article: returns them in file order, or the first error (nothing
// is returned for a file with any error; a folder fails as a whole). Holds the whole file's
// articles; Project::importFile uses forEachArticle instead.
Result<std::vector<ImportedArticle>> readArticles(
    const QString &path, const ImportOptions &options);

} // namespace fourfold
