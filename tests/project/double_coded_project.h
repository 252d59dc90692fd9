#pragma once
// A small study of any size for tests that count work: N articles of three sentences, coders
// C01–C03 and the lead L01; each article coded by two coders (pairs rotate) with two spans each
// and marked done, and gold on every third article. Counting tests build it at two sizes and
// check that a view reads the same number of statements at both.

#include "core/project/annotation_edits.h"
#include "core/project/gold_edits.h"
#include "core/project/testing/project_database.h"
#include "tests/project/project_fixture.h"

#include <array>

namespace fourfold::test {

struct DoubleCodedProject : ProjectFixture {
    std::vector<ArticleId> articles;
    std::array<CoderId, 3> coders {};
    CoderId lead;

    explicit DoubleCodedProject(int n)
    {
        QByteArray jsonl;
        for (int a = 1; a <= n; ++a)
            jsonl += QStringLiteral("{\"id\":\"d%1\",\"title\":\"Piece %1\",\"language\":\"en\","
                                    "\"text\":\"The quay of Oslade %1 is closing. The levy is "
                                    "to blame. The town must act now.\"}\n")
                         .arg(a)
                         .toUtf8();
        importJsonl(jsonl);
        for (int c = 0; c < 3; ++c)
            coders[size_t(c)] = addCoder(QStringLiteral("C0%1").arg(c + 1));
        lead = addCoder(QStringLiteral("L01"), CoderRole::Lead);
        for (int a = 1; a <= n; ++a) {
            const ArticleId id = articleId(QStringLiteral("d%1").arg(a));
            articles.push_back(id);
            const CoderId first = coders[size_t(a % 3)];
            const CoderId second = coders[size_t((a + 1) % 3)];
            for (CoderId c : {first, second}) {
                span(id, c, FramingFunction::Problem, {0, 10});
                span(
                    id, c, c == first ? FramingFunction::Cause : FramingFunction::Remedy, {35, 55});
                markDone(project, id, c);
            }
            if (a % 3 == 0) {
                AdjudicateSpanEdit gold(id, lead,
                    AnnotationContent {FramingFunction::Problem, {0, 10}, {}, {}, {}}, {},
                    QStringLiteral("agreed"));
                REQUIRE(project.apply(gold));
            }
        }
    }

    void span(ArticleId article, CoderId coder, FramingFunction f, TextRange range)
    {
        AddAnnotationEdit edit(article, coder, AnnotationContent {f, range, {}, {}, {}});
        REQUIRE(project.apply(edit));
    }

    // Result rows read on the project's connection while `work` runs.
    template<typename Work>
    qint64 rowsReadBy(Work &&work)
    {
        const qint64 before = databaseForTesting(project).rowsRead();
        work();
        return databaseForTesting(project).rowsRead() - before;
    }

    // Statements run on the project's connection while `work` runs.
    template<typename Work>
    qint64 statementsRunBy(Work &&work)
    {
        const qint64 before = databaseForTesting(project).statementsRun();
        work();
        return databaseForTesting(project).statementsRun() - before;
    }
};

} // namespace fourfold::test
