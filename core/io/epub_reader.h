#pragma once
// EPUB 3 publications (.epub) for readArticles: each chapter an article, or the whole book one;
// the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/io/zip_archive.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Hands the articles of an EPUB file's `bytes` to `take`: one per chapter (the spine's linear
// XHTML documents that hold text, in reading order) or, with `wholeBook`, one for the whole
// book. `file` is the path whose name gives the ids. Fails with InvalidInput naming `file` (and
// the part and line inside the archive where known): the zip archive's own faults (see
// ZipArchive), a mimetype other than application/epub+zip, no META-INF/container.xml or no
// package document it names, a spine item missing from the manifest or the archive, a spine
// document that is encrypted (DRM), a book without text.
Status readEpubArticles(const QByteArray &bytes, const QString &file, const ZipLimits &limits,
    bool wholeBook, const ImportedArticleSink &take);

} // namespace fourfold
