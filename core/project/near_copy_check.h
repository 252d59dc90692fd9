#pragma once
// The near-copy check of an import: the MinHash signatures of the project's live articles are
// computed once when the import adds its first article (one pass over their texts), held in an
// LSH index (core/text/near_copy_index.h), and every added article is looked up in it and then
// added to it, so an import of m articles into a project of n costs O(n + m) signatures and
// look-ups, never a comparison of all pairs.

#include "core/model/error.h"
#include "core/model/ids.h"
#include "core/project/import_report.h"
#include "core/text/near_copy_index.h"

#include <QHash>
#include <QString>

#include <optional>
#include <vector>

namespace fourfold {

class Database;

class NearCopyCheck
{
public:
    // `threshold` must lie in (0, 1] (see checkThreshold).
    explicit NearCopyCheck(double threshold);

    // True for a threshold in (0, 1].
    static bool validThreshold(double threshold);
    // InvalidArgument naming the threshold unless it is valid.
    static Status checkThreshold(double threshold);

    // Looks up the just-inserted article `id` (its canonical `text`) among the project's
    // articles and those added before it, records each match at or above the threshold in
    // article_near_copy and in `found`, then holds the article for the articles after it.
    // The first call reads the signatures of the project's articles (those inserted so far).
    Status check(Database &db, ArticleId id, const QString &externalId, qint64 line,
        const QString &text, std::vector<NearCopyFound> &found);

    // How many articles are held (the project's and those checked since).
    qsizetype articlesHeld() const { return m_index ? m_index->size() : 0; }

private:
    Status load(const Database &db, ArticleId except);

    double m_threshold;
    std::optional<NearCopyIndex> m_index;
    QHash<qint64, QString> m_externalIds; // of articles that matched, read when first needed
};

} // namespace fourfold
