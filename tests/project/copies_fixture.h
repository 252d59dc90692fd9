#pragma once
// A main project with three coders and a lead, assignments, annotations, a link, answers and a
// gold span, for the coder-copy tests. Invented demo-style data.

#include "core/project/annotation_edits.h"
#include "core/project/coder_copies.h"
#include "core/project/gold_edits.h"
#include "core/project/project.h"
#include "core/project/testing/older_lead.h"
#include "core/store/database.h"
#include "core/store/statement.h"
#include "tests/support/test_support.h"

#include <QFile>

#include <optional>

namespace fourfold::test {

inline const QByteArray kThreeArticles =
    "{\"id\":\"f1\",\"title\":\"Ferry to stop\",\"language\":\"en\",\"outlet\":\"Test Gazette\","
    "\"text\":\"The ferry to Brakwater will stop in May. Dr. Ilse Varn blames the budget.\\n\\n"
    "The council must find the money. It is a disgrace.\"}\n"
    "{\"id\":\"f2\",\"title\":\"Windpark\",\"language\":\"nl\","
    "\"text\":\"Het windpark komt er, bijv. op de dijk. Bewoners zijn boos.\\n\\nDe gemeente moet "
    "praten.\"}\n"
    "{\"id\":\"f3\",\"title\":\"Market square\",\"language\":\"en\","
    "\"text\":\"The market square in Oudmolen goes car-free in June. Shopkeepers fear the loss "
    "of trade.\\n\\nThe town should run a trial first. Closing it outright is reckless.\"}\n";

// The code-point range of the first occurrence of `quote` in `text` (ASCII texts only).
inline TextRange rangeOf(const QString &text, const QString &quote)
{
    const qsizetype at = text.indexOf(quote);
    REQUIRE(at >= 0);
    return TextRange {at, at + quote.size()};
}

inline AnnotationContent span(
    FramingFunction function, const QString &text, const QString &quote, QJsonObject attrs = {})
{
    return AnnotationContent {function, rangeOf(text, quote), std::move(attrs), {}, {}};
}

// Every annotation uuid of the coder `pseudonym`, live or not, straight from the file.
inline QStringList annotationUuidsOf(const Database &db, const QString &pseudonym)
{
    auto stmt = db.prepare(QStringLiteral("SELECT a.uuid FROM annotation a JOIN coder c ON "
                                          "c.id = a.coder_id WHERE c.pseudonym = ?1"));
    REQUIRE(stmt);
    stmt->bind(1, pseudonym);
    QStringList out;
    while (*stmt->step())
        out << stmt->columnText(0);
    return out;
}

struct CopiesFixture {
    QTemporaryDir dir;
    QString mainPath = dir.filePath(QStringLiteral("main.fourfold"));
    std::optional<Project> main;
    QString text1, text2, text3;
    ArticleId f1, f2, f3;
    CoderId c1, c2, c3, lead;

    CopiesFixture()
    {
        auto p = Project::create(mainPath);
        REQUIRE(p);
        main.emplace(std::move(*p));
        REQUIRE(main->importFile(
            writeFile(dir, QStringLiteral("a.jsonl"), kThreeArticles), ImportOptions {}));
        f1 = article(QStringLiteral("f1"), &text1);
        f2 = article(QStringLiteral("f2"), &text2);
        f3 = article(QStringLiteral("f3"), &text3);
        c1 = coder(QStringLiteral("Noor Testperson"), QStringLiteral("C01"), CoderRole::Coder);
        c2 = coder(QStringLiteral("Sam Testperson"), QStringLiteral("C02"), CoderRole::Coder);
        c3 = coder(QStringLiteral("Lena Testperson"), QStringLiteral("C03"), CoderRole::Coder);
        lead = coder(QStringLiteral("Mira Testlead"), QStringLiteral("L01"), CoderRole::Lead);
        // C01: f1, f2; C02: f1, f3; C03: f2, f3 (common practice: overlapping pairs).
        for (auto [a, c] : {std::pair {f1, c1}, {f2, c1}, {f1, c2}, {f3, c2}, {f2, c3}, {f3, c3}})
            REQUIRE(main->assign(a, c, Phase::Reliability));
        // Every coder starts with some work in the main project.
        add(f1, c1,
            span(FramingFunction::Problem, text1,
                QStringLiteral("The ferry to Brakwater will stop in May.")));
        add(f1, c1,
            span(FramingFunction::Cause, text1, QStringLiteral("blames the budget"),
                {{QStringLiteral("actor"), QStringLiteral("council")}}));
        add(f2, c1,
            span(FramingFunction::Evaluation, text2, QStringLiteral("Bewoners zijn boos."),
                {{QStringLiteral("polarity"), QStringLiteral("negative")}}));
        const AnnotationId c2Problem = add(f1, c2,
            span(FramingFunction::Problem, text1, QStringLiteral("The ferry to Brakwater")));
        const AnnotationId c2Remedy = add(f1, c2,
            span(FramingFunction::Remedy, text1,
                QStringLiteral("The council must find the money.")));
        add(f3, c2,
            span(FramingFunction::Evaluation, text3,
                QStringLiteral("Closing it outright is reckless.")));
        add(f2, c3, span(FramingFunction::Problem, text2, QStringLiteral("Het windpark komt er")));
        add(f3, c3,
            span(FramingFunction::Remedy, text3,
                QStringLiteral("The town should run a trial first.")));
        LinkAnnotationsEdit link(c2Remedy, c2Problem, QStringLiteral("addresses"), c2);
        REQUIRE(main->apply(link));
        SetJudgementEdit j2(f1, c2, QStringLiteral("dominant_function"), QStringLiteral("problem"),
            Phase::Reliability);
        REQUIRE(main->apply(j2));
        SetJudgementEdit j3(f3, c3, QStringLiteral("dominant_function"), QStringLiteral("remedy"),
            Phase::Reliability);
        REQUIRE(main->apply(j3));
        // Gold taken from C02's span: the copies of other coders must not see it.
        AdjudicateSpanEdit gold(f1, lead,
            span(FramingFunction::Problem, text1, QStringLiteral("The ferry to Brakwater")),
            {c2Problem}, QStringLiteral("C02's boundary is right."));
        REQUIRE(main->apply(gold));
    }

    ArticleId article(const QString &externalId, QString *text)
    {
        auto id = main->articleByExternalId(externalId);
        REQUIRE(id);
        REQUIRE(id->has_value());
        auto a = main->article(**id);
        REQUIRE(a);
        *text = a->text;
        return **id;
    }

    CoderId coder(const QString &name, const QString &pseudonym, CoderRole role)
    {
        auto id = role == CoderRole::Lead ? addOlderLeadForTesting(*main, name, pseudonym)
                                          : main->addCoder(name, pseudonym, role);
        REQUIRE(id);
        return *id;
    }

    AnnotationId add(ArticleId a, CoderId c, AnnotationContent content)
    {
        AddAnnotationEdit edit(a, c, std::move(content), Phase::Reliability);
        REQUIRE(main->apply(edit));
        return edit.annotationId();
    }

    // Hands out a copy for `pseudonym` to dir/NAME and returns its path.
    QString handout(const QString &pseudonym, const QString &name)
    {
        const QString path = dir.filePath(name);
        auto r = CoderCopies::handout(*main, pseudonym, path);
        INFO((r ? QString() : r.error().toString()).toStdString());
        REQUIRE(r);
        return path;
    }

    // Closes the main project (so that its file is complete without the WAL) and copies it.
    QString snapshot(const QString &name)
    {
        main.reset();
        const QString path = dir.filePath(name);
        QFile::remove(path);
        REQUIRE(QFile::copy(mainPath, path));
        auto p = Project::open(mainPath);
        REQUIRE(p);
        main.emplace(std::move(*p));
        return path;
    }
};

} // namespace fourfold::test
