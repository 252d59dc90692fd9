#pragma once
// A project with the two invented test articles, coders, and helpers to add codings, gold and
// extractor runs, for the scoring and exchange tests.

#include "core/extract/extractor_runs.h"
#include "core/project/annotation_edits.h"
#include "core/project/gold_edits.h"
#include "tests/project/project_fixture.h"

namespace fourfold::test {

struct ScoringFixture : ProjectFixture {
    ArticleId f1, f2;
    CoderId lead;

    ScoringFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        f2 = articleId(QStringLiteral("f2"));
        auto l =
            addOlderLeadForTesting(project, QStringLiteral("Test lead"), QStringLiteral("L01"));
        REQUIRE(l);
        lead = *l;
    }

    AnnotationId code(ArticleId article, CoderId coder, FramingFunction f, qint64 start, qint64 end,
        QJsonObject attributes = {})
    {
        AnnotationContent c;
        c.function = f;
        c.range = TextRange {start, end};
        c.attributes = attributes;
        AddAnnotationEdit edit(article, coder, c);
        auto applied = project.apply(edit);
        INFO((applied ? QString() : applied.error().toString()).toStdString());
        REQUIRE(applied);
        // The coder has finished the article, so the span counts.
        markDone(project, article, coder);
        return edit.annotationId();
    }

    void gold(ArticleId article, FramingFunction f, qint64 start, qint64 end)
    {
        AnnotationContent c;
        c.function = f;
        c.range = TextRange {start, end};
        AdjudicateSpanEdit edit(article, lead, c, {}, QStringLiteral("test"));
        auto applied = project.apply(edit);
        INFO((applied ? QString() : applied.error().toString()).toStdString());
        REQUIRE(applied);
    }

    struct RunSpan {
        ArticleId article;
        FramingFunction function;
        qint64 start, end;
    };
    void storeRun(const QString &name, const std::vector<RunSpan> &spans)
    {
        ExtractorRun run;
        run.name = name;
        run.version = QStringLiteral("test");
        std::vector<ExtractedSpan> extracted;
        for (const RunSpan &s : spans) {
            ExtractedSpan e;
            e.article = s.article;
            e.function = s.function;
            e.range = TextRange {s.start, s.end};
            e.score = 0.5;
            extracted.push_back(e);
        }
        auto stored = ExtractorRuns::storeRun(project, run, extracted);
        REQUIRE(stored);
    }
};

} // namespace fourfold::test
