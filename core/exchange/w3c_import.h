#pragma once
// Importing W3C Web Annotations (as written by the W3C export, see w3c_format.h) back into a
// project that holds the same articles: each annotation becomes a coding of the coder named by
// its creator's pseudonym.

#include "core/model/annotation.h"
#include "core/model/error.h"

#include <QString>
#include <QStringList>

namespace fourfold {

class Project;

struct W3cImportReport {
    qint64 spans = 0;
    QStringList codersCreated; // pseudonyms of coders that were added (name = pseudonym)
    qint64 articlesDone = 0; // (article, coder) pairs marked done by the import
    // Annotations already in the project (the same id, or the same coder, function and range on
    // the same article), or twice in the file: skipped, never added again.
    qint64 skipped = 0;
    QStringList skippedIds; // their ids (or positions in the file, from 1)
};

// Reads `path`: an AnnotationCollection whose "first" page holds the annotations inline, a JSON
// array of annotations, or one annotation. The article is found by the SHA-256 in the target's
// ni URI; a creator pseudonym unknown to the project becomes a new coder (role coder, the
// pseudonym as name). Every annotation is added as a coding in `phase`; all-or-nothing. Imported
// codings are finished work: every article they cover is marked done for its coder. An
// annotation that is already in the project is skipped and reported, so importing a file twice
// adds nothing.
// Fails with Io if the file cannot be read, InvalidInput naming the file, the line and column
// (of the JSON error, or of the annotation's id in the file) and what is wrong: bad JSON, an
// annotation the reader refuses (see readW3cAnnotation), an article not in the project, a range
// outside the text, a TextQuoteSelector whose exact text differs from the article's text at the
// range, a software creator (extractor runs are not coders), or attributes the codebook does
// not allow.
Result<W3cImportReport> importW3cAnnotations(
    Project &project, const QString &path, Phase phase = Phase::Production);

} // namespace fourfold
