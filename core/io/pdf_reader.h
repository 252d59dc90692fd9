#pragma once
// PDF documents (.pdf) for readArticles through poppler's C++ interface: one article per file;
// the rules are described in article_reader.h.

#include "core/io/imported_article.h"
#include "core/model/error.h"

#include <QByteArray>
#include <QString>

namespace fourfold {

// Reads the one article of a PDF file's `bytes`. `file` is the path whose name gives the id (and
// the title when the document has none). Fails with InvalidInput naming `file`: no "%PDF-"
// header, a file poppler cannot read (damaged), a PDF encrypted with a password, a PDF without
// a text layer (a scan: OCR it first), a document whose text is all running headers, footers and
// page numbers.
Result<ImportedArticle> readPdfArticle(const QByteArray &bytes, const QString &file);

} // namespace fourfold
