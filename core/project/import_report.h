#pragma once
// What an import did: the articles added and those skipped, each with its line and reason, and the
// near copies found among the added ones.

#include "core/model/ids.h"

#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {

struct SkippedArticle {
    QString externalId;
    qint64 line = 0; // in the source file (1 for txt/html)
    QString reason; // a translated sentence
};

// An added article whose word shingles are close to those of an article already in the project
// (or added before it by the same import): see core/text/minhash.h.
struct NearCopyFound {
    QString externalId; // the added article
    qint64 line = 0;
    ArticleId article;
    QString otherExternalId; // the article it is a near copy of
    ArticleId other;
    double similarity = 0.0; // MinHash estimate of the Jaccard similarity
};

// One file of an import (a folder's files each have one), with what it gave.
struct ImportedFile {
    QString path;
    QStringList articles; // the external ids of the articles added from it, in file order
    qint64 skipped = 0; // its articles whose text was already in the project
    QString reason; // why it was refused or passed over; empty when it was read
    bool passedOver = false; // a folder's file of no format Fourfold reads
};

struct ImportReport {
    QString source;
    std::vector<ArticleId> added;
    std::vector<SkippedArticle> skipped;
    std::vector<NearCopyFound> nearCopies; // in the order the articles were added
    std::vector<ImportedFile> files; // every file read (one for a file; a folder's, by path)
};

} // namespace fourfold
