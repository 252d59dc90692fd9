#include "core/project/near_copy_check.h"

#include "core/store/article_table.h"
#include "core/store/near_copy_table.h"

#include <QCoreApplication>

namespace fourfold {

NearCopyCheck::NearCopyCheck(double threshold)
    : m_threshold(threshold)
{ }

bool NearCopyCheck::validThreshold(double threshold)
{
    return threshold > 0.0 && threshold <= 1.0;
}

Status NearCopyCheck::checkThreshold(double threshold)
{
    if (validThreshold(threshold))
        return {};
    return fail(ErrorCode::InvalidArgument,
        QCoreApplication::translate("NearCopyCheck",
            "The near-copy threshold %1 does not lie in (0, 1]: it is the least Jaccard "
            "similarity of two articles' word shingles that makes one a near copy of the other.")
            .arg(threshold));
}

Status NearCopyCheck::load(const Database &db, ArticleId except)
{
    m_index.emplace(m_threshold);
    return store::forEachArticleText(db, [&](ArticleId id, QString &&text) -> Status {
        if (id != except)
            m_index->add(id.value, minHashSignature(text));
        return {};
    });
}

Status NearCopyCheck::check(Database &db, ArticleId id, const QString &externalId, qint64 line,
    const QString &text, std::vector<NearCopyFound> &found)
{
    if (!m_index)
        FOURFOLD_TRY_STATUS(load(db, id));
    const MinHashSignature signature = minHashSignature(text);
    for (const NearCopyMatch &match : m_index->matches(signature)) {
        const ArticleId other {match.id};
        FOURFOLD_TRY_STATUS(store::insertNearCopy(db, id, other, match.similarity));
        auto known = m_externalIds.constFind(match.id);
        if (known == m_externalIds.cend()) {
            auto summary = store::article(db, other);
            if (!summary)
                return std::unexpected(summary.error());
            known = m_externalIds.insert(match.id, summary->summary.externalId);
        }
        found.push_back(NearCopyFound {externalId, line, id, *known, other, match.similarity});
    }
    m_index->add(id.value, signature);
    m_externalIds.insert(id.value, externalId);
    return {};
}

} // namespace fourfold
