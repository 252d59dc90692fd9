#pragma once
// Office Open XML word-processing documents (.docx, ISO/IEC 29500) for readArticles: one
// article per file; the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/io/zip_archive.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Reads the one article of a DOCX file's `bytes`. `file` is the path whose name gives the id
// (and the title when the document has none). Fails with InvalidInput naming `file` (and the
// part and line inside the archive where known): not a zip archive or a damaged one, an
// encrypted entry, an entry beyond `limits` (a zip bomb), no main document part, a part that is
// not well-formed XML, a main part that is not WordprocessingML, a note referred to but missing,
// a document without text.
Result<ImportedArticle> readDocxArticle(
    const QByteArray &bytes, const QString &file, const ZipLimits &limits);

} // namespace fourfold
