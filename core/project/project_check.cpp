// Project::check: SQLite's own checks, then a recomputation of everything that can be
// recomputed from the stored texts (hash, length, canonical form, spans and quotes).
#include "core/project/project.h"
#include "core/store/database.h"
#include "core/store/project_tables.h"
#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QHash>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ProjectCheckText {
    Q_DECLARE_TR_FUNCTIONS(ProjectCheckText)
};

} // namespace

Status Project::checkBeforeImport() const
{
    return store::quickCheck(db());
}

Result<IntegrityReport> Project::check() const
{
    IntegrityReport report;
    auto sqliteProblems = store::sqliteChecks(db());
    if (!sqliteProblems)
        return std::unexpected(sqliteProblems.error());
    report.problems << *sqliteProblems;

    auto articles = store::allStoredArticles(db());
    if (!articles)
        return std::unexpected(articles.error());
    struct Known {
        QString text;
        QString externalId;
        OffsetMap map;
    };
    QHash<qint64, std::shared_ptr<Known>> byId;
    for (const store::StoredArticle &a : *articles) {
        ++report.articlesChecked;
        auto known = std::make_shared<Known>(Known {a.text, a.externalId, OffsetMap(a.text)});
        if (textSha256(a.text) != a.sha256)
            report.problems << ProjectCheckText::tr(
                "Article \"%1\": its text does not match its stored SHA-256.")
                                   .arg(a.externalId);
        if (known->map.codePointCount() != a.length)
            report.problems << ProjectCheckText::tr(
                "Article \"%1\": stored length %2 but the text has %3 characters.")
                                   .arg(a.externalId)
                                   .arg(a.length)
                                   .arg(known->map.codePointCount());
        if (!isCanonicalText(a.text))
            report.problems << ProjectCheckText::tr(
                "Article \"%1\": the text is not in canonical form (NFC, LF line ends).")
                                   .arg(a.externalId);
        byId.insert(a.id.value, known);
    }

    auto spans = store::allStoredSpans(db());
    if (!spans)
        return std::unexpected(spans.error());
    for (const store::StoredSpan &s : *spans) {
        ++report.spansChecked;
        const auto known = byId.value(s.article.value);
        if (!known) {
            report.problems << ProjectCheckText::tr("%1 #%2 refers to a missing article #%3.")
                                   .arg(s.layer)
                                   .arg(s.rowId)
                                   .arg(s.article.value);
            continue;
        }
        if (!s.range.isValid() || s.range.isEmpty() || s.range.end > known->map.codePointCount()) {
            report.problems << ProjectCheckText::tr(
                "%1 #%2 in article \"%3\": [%4, %5) lies outside the text of %6 characters.")
                                   .arg(s.layer)
                                   .arg(s.rowId)
                                   .arg(known->externalId)
                                   .arg(s.range.start)
                                   .arg(s.range.end)
                                   .arg(known->map.codePointCount());
            continue;
        }
        if (s.quote && *s.quote != OffsetMap::slice(known->text, s.range))
            report.problems << ProjectCheckText::tr(
                "%1 #%2 in article \"%3\": the stored quote differs from the text at [%4, %5).")
                                   .arg(s.layer)
                                   .arg(s.rowId)
                                   .arg(known->externalId)
                                   .arg(s.range.start)
                                   .arg(s.range.end);
    }
    return report;
}

} // namespace fourfold
