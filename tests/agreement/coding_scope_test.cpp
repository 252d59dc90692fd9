// Which codings count (CodingScope) and what the unitizers make of it. The rule is common
// practice in content analysis: a coder who has not finished an article is missing for its
// units, never "absent" (Krippendorff 2004, Content Analysis 2nd ed., §11.3: missing data are
// values a coder did not give). The property test builds random projects and checks that
// assignments without codings never change any reliability table.
#include "core/agreement/disagreements.h"
#include "core/agreement/project_units.h"
#include "core/project/annotation_edits.h"
#include "core/project/coding_scope.h"
#include "core/scoring/span_layer.h"
#include "tests/project/project_fixture.h"

#include <random>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct ScopeFixture : ProjectFixture {
    ArticleId f1, f2;
    CoderId c1, c2, c3;
    ScopeFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        f2 = articleId(QStringLiteral("f2"));
        c1 = addCoder(QStringLiteral("C01"));
        c2 = addCoder(QStringLiteral("C02"));
        c3 = addCoder(QStringLiteral("C03"));
    }
    void add(ArticleId a, CoderId c, FramingFunction f, TextRange r, Phase p = Phase::Reliability)
    {
        AddAnnotationEdit edit(a, c, AnnotationContent {f, r, {}, {}, {}}, p);
        REQUIRE(project.apply(edit));
    }
    CodingScope scope(CodingScopeOptions options = {})
    {
        auto s = CodingScope::load(project, options);
        REQUIRE(s);
        return *s;
    }
};

} // namespace

TEST_CASE("an article counts for a coder once the coder marked it done")
{
    ScopeFixture f;
    REQUIRE(f.project.assign(f.f1, f.c1, Phase::Reliability));
    CHECK(f.scope().state(f.f1, f.c1) == CodingState::Untouched);
    CHECK_FALSE(f.scope().counts(f.f1, f.c1));
    // Untouched never counts, even when unfinished work is taken in.
    CHECK_FALSE(f.scope({true, {}}).counts(f.f1, f.c1));

    f.add(f.f1, f.c1, FramingFunction::Problem, {0, 40});
    CHECK(f.scope().state(f.f1, f.c1) == CodingState::InProgress);
    CHECK_FALSE(f.scope().counts(f.f1, f.c1));
    CHECK(f.scope().leftOut(f.f1, f.c1));
    CHECK(f.scope({true, {}}).counts(f.f1, f.c1));
    CHECK_FALSE(f.scope({true, {}}).leftOut(f.f1, f.c1));

    markDone(f.project, f.f1, f.c1);
    CHECK(f.scope().state(f.f1, f.c1) == CodingState::Done);
    CHECK(f.scope().counts(f.f1, f.c1));
    CHECK_FALSE(f.scope().leftOut(f.f1, f.c1));
    // Nobody else's state moved.
    CHECK(f.scope().state(f.f1, f.c2) == CodingState::Untouched);
    CHECK(f.scope().state(f.f2, f.c1) == CodingState::Untouched);
}

TEST_CASE("an article opened but not coded is in progress; done with no span it counts as read")
{
    ScopeFixture f;
    REQUIRE(f.project.assign(f.f2, f.c2, Phase::Reliability));
    SetArticleStatusEdit started(f.f2, f.c2, QStringLiteral("started"));
    REQUIRE(f.project.apply(started));
    CHECK(f.scope().state(f.f2, f.c2) == CodingState::InProgress);
    markDone(f.project, f.f2, f.c2);
    CHECK(f.scope().counts(f.f2, f.c2));
}

TEST_CASE("the phase decides which assignments and codings make an article the coder's")
{
    ScopeFixture f;
    f.add(f.f1, f.c1, FramingFunction::Problem, {0, 40}, Phase::Training);
    markDone(f.project, f.f1, f.c1, Phase::Training);
    CHECK(f.scope({false, Phase::Training}).counts(f.f1, f.c1));
    CHECK(f.scope({false, std::nullopt}).counts(f.f1, f.c1));
    // Nothing of C01's on f1 is in the reliability phase.
    CHECK(f.scope({false, Phase::Reliability}).state(f.f1, f.c1) == CodingState::Untouched);
}

TEST_CASE("unitizers leave articles in progress out and list them")
{
    ScopeFixture f;
    for (CoderId c : {f.c1, f.c2})
        f.add(f.f1, c, FramingFunction::Problem, {0, 40});
    f.add(f.f2, f.c2, FramingFunction::Cause, {0, 10});
    markDone(f.project, f.f1, f.c1);
    markDone(f.project, f.f1, f.c2);
    markDone(f.project, f.f2, f.c1); // read, nothing to mark
    // C02 started f2 but did not finish it; C03 has an untouched assignment of f2.
    REQUIRE(f.project.assign(f.f2, f.c3, Phase::Reliability));

    UnitSelection s;
    s.unit = UnitKind::Sentence;
    s.function = FramingFunction::Problem;
    auto counted = countedCodings(f.project, s);
    REQUIRE(counted);
    // C03 has nothing that counts and was not named: not a column.
    REQUIRE(counted->coders.size() == 2);
    REQUIRE(counted->leftOut.size() == 1);
    CHECK(counted->leftOut[0].coder == QStringLiteral("C02"));
    CHECK(counted->leftOut[0].articles == QStringList {QStringLiteral("f2")});
    CHECK(leftOutLines(counted->leftOut)
        == QStringList {QStringLiteral("C02: 1 article in progress left out")});
    auto table = unitTable(f.project, *counted, s);
    REQUIRE(table);
    // Only f1's four sentences: f2 counts for C01 alone, so nothing pairs there.
    CHECK(table->unitCount() == 4);
    CHECK(table->unitId(0) == QStringLiteral("f1#s1"));

    s.includeUnfinished = true;
    auto taken = unitTable(f.project, s);
    REQUIRE(taken);
    CHECK(taken->unitCount() == 7);
    // f2's first sentence: C02 "absent" (a cause span, no problem), and C01, who read f2 and
    // marked nothing, "absent".
    CHECK(taken->rowText(4) == QStringList {QStringLiteral("absent"), QStringLiteral("absent")});

    // Named coders are columns even with nothing that counts; the continuum needs all of them.
    UnitSelection named;
    named.unit = UnitKind::Continuum;
    named.coders = {QStringLiteral("C02"), QStringLiteral("C03")};
    auto continuum = continuumData(f.project, named);
    REQUIRE_FALSE(continuum);
    CHECK(continuum.error().code == ErrorCode::NotFound);
}

TEST_CASE("the comparison queue lists an article once two coders are done with it")
{
    ScopeFixture f;
    f.add(f.f1, f.c1, FramingFunction::Problem, {0, 40});
    f.add(f.f1, f.c2, FramingFunction::Problem, {0, 30});
    markDone(f.project, f.f1, f.c1);
    auto queue = disagreementQueue(f.project);
    REQUIRE(queue);
    CHECK(queue->empty());
    ComparisonFilter unfinished;
    unfinished.includeUnfinished = true;
    queue = disagreementQueue(f.project, unfinished);
    REQUIRE(queue);
    REQUIRE(queue->size() == 1);
    CHECK(queue->front().disagreements == 1);
    markDone(f.project, f.f1, f.c2);
    queue = disagreementQueue(f.project);
    REQUIRE(queue);
    CHECK(queue->size() == 1);
}

TEST_CASE("a coder's span layer holds only the articles that count")
{
    ScopeFixture f;
    f.add(f.f1, f.c1, FramingFunction::Problem, {0, 40});
    f.add(f.f2, f.c1, FramingFunction::Cause, {0, 10});
    markDone(f.project, f.f1, f.c1);
    auto layer = resolveLayer(f.project, LayerSpec {LayerKind::Coder, QStringLiteral("C01")});
    REQUIRE(layer);
    CHECK(layer->articles() == std::vector<ArticleId> {f.f1});
    REQUIRE(layer->spans.size() == 1);
    CHECK(layer->spans.front().function == FramingFunction::Problem);
    auto all = resolveLayer(f.project, LayerSpec {LayerKind::Coder, QStringLiteral("C01")}, true);
    REQUIRE(all);
    CHECK(all->spans.size() == 2);
}

TEST_CASE("property: assignments without codings never change a reliability table")
{
    // Random projects: 6 articles, 4 coders, random spans, random done marks; then random
    // assignments of untouched (article, coder) pairs in random phases.
    std::mt19937 engine(20261204);
    const std::vector<FramingFunction> functions(
        kFramingFunctions.begin(), kFramingFunctions.end());
    for (int round = 0; round < 12; ++round) {
        INFO("round " << round);
        ProjectFixture f;
        QByteArray jsonl;
        for (int a = 1; a <= 6; ++a)
            jsonl += QStringLiteral("{\"id\":\"g%1\",\"title\":\"G%1\",\"language\":\"en\","
                                    "\"text\":\"One sentence of piece %1 here. Another one "
                                    "follows it. The third one ends the piece.\"}\n")
                         .arg(a)
                         .toUtf8();
        f.importJsonl(jsonl);
        std::vector<ArticleId> articles;
        for (int a = 1; a <= 6; ++a)
            articles.push_back(f.articleId(QStringLiteral("g%1").arg(a)));
        std::vector<CoderId> coders;
        for (int c = 1; c <= 4; ++c)
            coders.push_back(f.addCoder(QStringLiteral("R%1").arg(c)));
        std::set<std::pair<qint64, qint64>> touched;
        for (ArticleId a : articles)
            for (CoderId c : coders) {
                const int what = int(engine() % 4); // 0 untouched, 1 in progress, 2-3 done
                if (what == 0)
                    continue;
                touched.insert({a.value, c.value});
                const int spans = int(engine() % 3);
                for (int i = 0; i < spans; ++i) {
                    const qint64 start = qint64(engine() % 50); // texts have 83 code points
                    const qint64 end = start + 1 + qint64(engine() % 30);
                    AddAnnotationEdit edit(a, c,
                        AnnotationContent {functions[engine() % 4], {start, end}, {}, {}, {}},
                        Phase::Reliability);
                    REQUIRE(f.project.apply(edit));
                }
                if (what >= 2)
                    markDone(f.project, a, c, Phase::Reliability);
                else if (spans == 0) {
                    SetArticleStatusEdit started(
                        a, c, QStringLiteral("started"), Phase::Reliability);
                    REQUIRE(f.project.apply(started));
                }
            }
        const auto tables = [&] {
            QStringList out;
            for (UnitKind unit : {UnitKind::Paragraph, UnitKind::Sentence, UnitKind::Token})
                for (int fn = -1; fn < 4; ++fn)
                    for (bool unfinished : {false, true}) {
                        UnitSelection s;
                        s.unit = unit;
                        if (fn >= 0)
                            s.function = functions[size_t(fn)];
                        s.includeUnfinished = unfinished;
                        auto t = unitTable(f.project, s);
                        QString text = t ? t->unitIds().join(QLatin1Char(' ')) : t.error().message;
                        if (t)
                            for (size_t u = 0; u < t->unitCount(); ++u)
                                text += QLatin1Char('|') + t->rowText(u).join(QLatin1Char(','));
                        out << text;
                    }
            UnitSelection continuum;
            continuum.unit = UnitKind::Continuum;
            continuum.coders = {QStringLiteral("R1"), QStringLiteral("R2")};
            auto c = continuumData(f.project, continuum);
            out << (c ? c->articles.join(QLatin1Char(' ')) + QString::number(c->units.size())
                      : c.error().message);
            return out;
        };
        const QStringList before = tables();
        // Every untouched pair gets an assignment in some phase; nothing is coded.
        for (ArticleId a : articles)
            for (CoderId c : coders)
                if (!touched.contains({a.value, c.value}) && engine() % 2 == 0)
                    REQUIRE(f.project.assign(a, c, Phase(engine() % 4)));
        CHECK(tables() == before);
    }
}
