#include "core/project/study_names.h"

#include "core/project/project.h"
#include "core/store/study_tables.h"

#include <QSet>

namespace fourfold::study {

Result<Names> loadNames(const Database &db, const Project &project)
{
    Names n;
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    n.coders = *coders;
    for (const Coder &c : n.coders) {
        n.coderByPseudonym.insert(c.pseudonym, c);
        n.pseudonymById.insert(c.id.value, c.pseudonym);
    }
    auto articles = store::frameArticles(db);
    if (!articles)
        return std::unexpected(articles.error());
    n.articles = std::move(*articles);
    for (qsizetype i = 0; i < qsizetype(n.articles.size()); ++i) {
        n.articleIndex.insert(n.articles[size_t(i)].externalId, i);
        n.externalIdById.insert(n.articles[size_t(i)].id.value, n.articles[size_t(i)].externalId);
    }
    return n;
}

// The coders named by `pseudonyms`: NotFound for an unknown one, InvalidArgument for one named
// twice or a disabled one.
Result<std::vector<Coder>> resolveCoders(const Names &names, const QStringList &pseudonyms)
{
    std::vector<Coder> out;
    QSet<QString> seen;
    for (const QString &p : pseudonyms) {
        const auto it = names.coderByPseudonym.constFind(p);
        if (it == names.coderByPseudonym.constEnd())
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no coder \"%1\" in the project.").arg(p));
        if (seen.contains(p))
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr("The coder \"%1\" is named twice.").arg(p));
        if (it->disabled) // keeps their codings, takes no new work
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr(
                    "%1 is disabled and takes no new assignments; enable them first.")
                    .arg(p));
        seen.insert(p);
        out.push_back(*it);
    }
    return out;
}

QString coderLabel(const Names &names, CoderId id)
{
    return names.pseudonymById.value(id.value, QStringLiteral("#%1").arg(id.value));
}

} // namespace fourfold::study
