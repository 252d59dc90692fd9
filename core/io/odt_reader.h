#pragma once
// OpenDocument text documents (.odt, OASIS ODF 1.2) for readArticles: one article per file; the
// rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/io/zip_archive.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Reads the one article of an ODT file's `bytes`. `file` is the path whose name gives the id
// (and the title when the document has none). Fails with InvalidInput naming `file` (and the
// part and line inside the archive where known): not a zip archive or a damaged one, an
// encrypted entry or an encrypted document (its manifest says so), an entry beyond `limits` (a
// zip bomb), a package of another kind (its mimetype), no content.xml, a part that is not
// well-formed XML, a document without text.
Result<ImportedArticle> readOdtArticle(
    const QByteArray &bytes, const QString &file, const ZipLimits &limits);

} // namespace fourfold
