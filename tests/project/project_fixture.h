#pragma once
// A project in a temporary directory with a few invented articles, for the project tests.

#include "core/project/article_status_edit.h"
#include "core/project/project.h"
#include "core/project/testing/older_lead.h"
#include "tests/support/test_support.h"

#include <set>
#include <tuple>
#include <utility>

namespace fourfold::test {

// Marks `article` done for `coder`, as the coder's "mark as done" on the desk does, so that the
// coder's codings of it count (CodingScope). A new assignment, if one is needed, is in `phase`.
inline void markDone(
    Project &project, ArticleId article, CoderId coder, Phase phase = Phase::Production)
{
    SetArticleStatusEdit edit(article, coder, QStringLiteral("done"), phase);
    REQUIRE(project.apply(edit));
}

// Marks done every article for every coder who holds a live span or answer on it: the state of
// a study whose coders have all finished.
inline void markCodedArticlesDone(Project &project)
{
    std::set<std::tuple<qint64, qint64, Phase>> pairs;
    auto spans = project.allAnnotations();
    REQUIRE(spans);
    for (const Annotation &a : *spans)
        pairs.insert({a.article.value, a.coder.value, a.phase});
    auto answers = project.allJudgements();
    REQUIRE(answers);
    for (const Judgement &j : *answers)
        pairs.insert({j.article.value, j.coder.value, j.phase});
    for (const auto &[article, coder, phase] : pairs)
        markDone(project, ArticleId {article}, CoderId {coder}, phase);
}

struct ProjectFixture {
    QTemporaryDir dir;
    Project project = makeProject();

    Project makeProject()
    {
        auto p = Project::create(dir.filePath(QStringLiteral("t.fourfold")));
        REQUIRE(p);
        return std::move(*p);
    }

    // Imports `jsonl` (written to a file named `name`) and requires success.
    ImportReport importJsonl(
        const QByteArray &jsonl, const QString &name = QStringLiteral("a.jsonl"))
    {
        auto r = project.importFile(writeFile(dir, name, jsonl), ImportOptions {});
        REQUIRE(r);
        return *r;
    }

    ArticleId articleId(const QString &externalId)
    {
        auto id = project.articleByExternalId(externalId);
        REQUIRE(id);
        REQUIRE(id->has_value());
        return **id;
    }

    CoderId addCoder(const QString &pseudonym, CoderRole role = CoderRole::Coder)
    {
        const QString name = QStringLiteral("Test person ") + pseudonym;
        // A lead as a file from before passphrases holds them (people_test sets theirs).
        auto id = role == CoderRole::Lead ? addOlderLeadForTesting(project, name, pseudonym)
                                          : project.addCoder(name, pseudonym, role);
        REQUIRE(id);
        return *id;
    }
};

// Two invented articles (demo-style data), one English, one Dutch.
inline const QByteArray kTwoArticles =
    "{\"id\":\"f1\",\"title\":\"Ferry to stop\",\"language\":\"en\",\"outlet\":\"Test Gazette\","
    "\"text\":\"The ferry to Brakwater will stop in May. Dr. Ilse Varn blames the budget.\\n\\n"
    "The council must find the money. It is a disgrace.\"}\n"
    "{\"id\":\"f2\",\"title\":\"Windpark\",\"language\":\"nl\","
    "\"text\":\"Het windpark komt er, bijv. op de dijk. Bewoners zijn boos.\\n\\nDe gemeente moet "
    "praten.\"}\n";

} // namespace fourfold::test
