#pragma once
// Two merge conflicts on C01's spans of the coder-copies test project (copies_fixture.h), for
// the tests of deciding them (core and window).

#include "core/project/testing/project_database.h"
#include "tests/project/copies_fixture.h"
#include "tests/project/copy_files.h"
#include "tests/support/db_dump.h"

#include <QThread>

#include <catch2/catch.hpp>

namespace fourfold::test {

// Two conflicts on C01's spans: the cause changed in the project, then later in the copy (the
// project's version lost: no copy behind it); the evaluation changed in the copy, then later in
// the project (the copy's version lost).
struct ConflictFixture : CopiesFixture {
    QString copy = handout(QStringLiteral("C01"), QStringLiteral("c01.fourfold"));
    Annotation cause = onlyAnnotation(*main, f1, c1, FramingFunction::Cause);
    Annotation eval = onlyAnnotation(*main, f2, c1, FramingFunction::Evaluation);
    MergeConflict causeConflict, evalConflict;

    ConflictFixture()
    {
        auto withAttribute = [](Annotation a, const char *key, const char *value) {
            a.content.attributes = {{QLatin1String(key), QLatin1String(value)}};
            return a.content;
        };
        {
            Project c = openProject(copy);
            ChangeAnnotationEdit e(eval.id, withAttribute(eval, "polarity", "positive"),
                coderIn(c, QStringLiteral("C01")));
            REQUIRE(c.apply(e));
        }
        QThread::msleep(20); // later edits get later times (milliseconds)
        ChangeAnnotationEdit mayor(cause.id, withAttribute(cause, "actor", "the mayor"), c1);
        REQUIRE(main->apply(mayor));
        ChangeAnnotationEdit neutral(eval.id, withAttribute(eval, "polarity", "neutral"), c1);
        REQUIRE(main->apply(neutral));
        QThread::msleep(20);
        {
            Project c = openProject(copy);
            ChangeAnnotationEdit e(cause.id, withAttribute(cause, "actor", "the ferry company"),
                coderIn(c, QStringLiteral("C01")));
            REQUIRE(c.apply(e));
        }
        REQUIRE(mergeInto(*main, {copy})[0].conflicts == 2);
        auto open = CoderCopies::conflicts(*main, false);
        REQUIRE(open);
        REQUIRE(open->size() == 2);
        for (const MergeConflict &c : *open)
            (c.objectUuid == cause.uuid ? causeConflict : evalConflict) = c;
        REQUIRE(causeConflict.copyUuid.isEmpty());
        REQUIRE_FALSE(evalConflict.copyUuid.isEmpty());
    }

    QString attribute(ArticleId a, FramingFunction f, const char *key)
    {
        return onlyAnnotation(*main, a, c1, f)
            .content.attributes.value(QLatin1String(key))
            .toString();
    }
    QString dump()
    {
        return dumpDatabase(databaseForTesting(*main), {QStringLiteral("event_log")});
    }
};

} // namespace fourfold::test
