// Passages and disagreement kinds (core/agreement/disagreements.h). The classification rules are
// the comparison view's own (common practice in adjudicating span codings: a span only one coder
// has, different boundaries, a different function, different attributes); the passage is the
// connected component of the span-overlap graph, checked against a naive union-find below.

#include "core/agreement/disagreements.h"
#include "core/project/annotation_edits.h"
#include "core/project/gold_edits.h"
#include "core/project/testing/project_database.h"
#include "tests/project/double_coded_project.h"
#include "tests/project/project_fixture.h"
#include "tests/support/db_dump.h"

#include <random>
#include <set>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const CoderId kA {1};
const CoderId kB {2};
const CoderId kC {3};

Annotation span(qint64 id, CoderId coder, FramingFunction f, qint64 start, qint64 end,
    QJsonObject attributes = {})
{
    Annotation a;
    a.id = AnnotationId {id};
    a.coder = coder;
    a.content.function = f;
    a.content.range = TextRange {start, end};
    a.content.attributes = std::move(attributes);
    return a;
}

unsigned bit(DisagreementKind k)
{
    return 1u << unsigned(k);
}

using F = FramingFunction;
using K = DisagreementKind;

QJsonObject polarity(const char *value)
{
    return QJsonObject {{QStringLiteral("polarity"), QString::fromLatin1(value)}};
}

} // namespace

TEST_CASE("passages are classified by presence, function, boundary and attributes")
{
    const std::vector<Annotation> spans {
        // 1: all three the same → agreed (an empty attribute is no value).
        span(1, kA, F::Problem, 0, 10), span(2, kB, F::Problem, 0, 10, polarity("")),
        span(3, kC, F::Problem, 0, 10),
        // 2: one coder starts later → boundary.
        span(4, kA, F::Cause, 20, 30), span(5, kB, F::Cause, 22, 30), span(6, kC, F::Cause, 20, 30),
        // 3: same range and function, one polarity differs → attributes.
        span(7, kA, F::Evaluation, 40, 50, polarity("negative")),
        span(8, kB, F::Evaluation, 40, 50, polarity("positive")),
        span(9, kC, F::Evaluation, 40, 50, polarity("negative")),
        // 4: B calls it a problem → function.
        span(10, kA, F::Remedy, 60, 70), span(11, kB, F::Problem, 60, 70),
        span(12, kC, F::Remedy, 60, 70),
        // 5: only A → presence.
        span(13, kA, F::Problem, 80, 90),
        // 6: A and B, C has nothing → presence only.
        span(14, kA, F::Problem, 100, 110), span(15, kB, F::Problem, 100, 110),
        // 7: a chain of overlaps is one passage → boundary.
        span(16, kA, F::Problem, 120, 130), span(17, kB, F::Problem, 128, 140),
        span(18, kC, F::Problem, 138, 150),
        // 8 and 9: touching half-open ranges do not overlap → two passages.
        span(19, kA, F::Cause, 160, 170), span(20, kB, F::Cause, 170, 180)};
    const auto passages = comparePassages(spans, {kA, kB, kC});
    REQUIRE(passages.size() == 9);
    CHECK(passages[0].range == TextRange {0, 10});
    CHECK(passages[0].isAgreed());
    CHECK(passages[1].kinds == bit(K::Boundary));
    CHECK(passages[2].kinds == bit(K::Attributes));
    CHECK(passages[3].kinds == bit(K::Function));
    CHECK(passages[4].kinds == bit(K::Presence));
    CHECK(passages[4].coders == std::vector<CoderId> {kA});
    CHECK(passages[4].missing == std::vector<CoderId> {kB, kC});
    CHECK(passages[5].kinds == bit(K::Presence));
    CHECK(passages[5].missing == std::vector<CoderId> {kC});
    CHECK(passages[6].range == TextRange {120, 150});
    CHECK(passages[6].spans.size() == 3);
    CHECK(passages[6].kinds == bit(K::Boundary));
    CHECK(passages[7].range == TextRange {160, 170});
    CHECK(passages[8].range == TextRange {170, 180});
    CHECK(passages[8].kinds == bit(K::Presence));

    // Between A and C only, passage 2 and 3 agree and passage 4 is A's and C's remedy.
    const auto ac = comparePassages(spans, {kA, kC});
    CHECK(ac[1].isAgreed());
    CHECK(ac[2].isAgreed());
    CHECK(ac[3].isAgreed());
    CHECK(ac[5].kinds == bit(K::Presence));
}

TEST_CASE("a passage is resolved by an overlapping gold span or by rejecting all its spans")
{
    const std::vector<Annotation> spans {span(1, kA, F::Problem, 0, 10),
        span(2, kB, F::Problem, 2, 10), span(3, kA, F::Cause, 20, 30)};
    GoldAnnotation g;
    g.content.function = F::Problem;
    g.content.range = TextRange {5, 8};
    auto passages = comparePassages(spans, {kA, kB}, {g}, {AnnotationId {3}});
    REQUIRE(passages.size() == 2);
    CHECK(passages[0].isResolved());
    CHECK(passages[0].gold.size() == 1);
    CHECK(passages[1].isResolved());
    CHECK(passages[1].rejected == std::vector<bool> {true});
    passages = comparePassages(spans, {kA, kB});
    CHECK_FALSE(passages[0].isResolved());
    CHECK_FALSE(passages[1].isResolved());
}

TEST_CASE("passages are the connected components of the overlap graph (naive union-find)")
{
    std::mt19937 rng(20261202);
    for (int round = 0; round < 2000; ++round) {
        std::vector<Annotation> spans;
        const int n = std::uniform_int_distribution<int>(0, 12)(rng);
        for (int i = 0; i < n; ++i) {
            const qint64 start = std::uniform_int_distribution<qint64>(0, 60)(rng);
            const qint64 length = std::uniform_int_distribution<qint64>(1, 15)(rng);
            const CoderId coder {std::uniform_int_distribution<qint64>(1, 3)(rng)};
            const auto f = kFramingFunctions[size_t(std::uniform_int_distribution<int>(0, 3)(rng))];
            spans.push_back(span(i + 1, coder, f, start, start + length));
        }
        std::vector<size_t> parent(spans.size());
        for (size_t i = 0; i < parent.size(); ++i)
            parent[i] = i;
        auto find = [&](size_t i) {
            while (parent[i] != i)
                i = parent[i];
            return i;
        };
        for (size_t i = 0; i < spans.size(); ++i)
            for (size_t j = 0; j < spans.size(); ++j)
                if (spans[i].content.range.overlaps(spans[j].content.range))
                    parent[find(i)] = find(j);
        std::set<size_t> roots;
        for (size_t i = 0; i < spans.size(); ++i)
            roots.insert(find(i));
        const auto passages = comparePassages(spans, {kA, kB, kC});
        REQUIRE(passages.size() == roots.size());
        for (const Passage &p : passages)
            for (const Annotation &a : p.spans)
                for (const Annotation &b : spans)
                    CHECK((find(size_t(a.id.value - 1)) == find(size_t(b.id.value - 1)))
                        == std::ranges::any_of(
                            p.spans, [&](const Annotation &x) { return x.id == b.id; }));
        // Permuting the coders' order changes neither passages nor kinds.
        const auto permuted = comparePassages(spans, {kC, kA, kB});
        REQUIRE(permuted.size() == passages.size());
        for (size_t i = 0; i < passages.size(); ++i) {
            CHECK(permuted[i].range == passages[i].range);
            CHECK(permuted[i].kinds == passages[i].kinds);
        }
    }
}

TEST_CASE("merge and accept candidates carry every coder's span as provenance")
{
    const std::vector<Annotation> spans {span(1, kA, F::Cause, 0, 10, polarity("x")),
        span(2, kB, F::Cause, 0, 10, polarity("x")), span(3, kC, F::Cause, 4, 14)};
    const auto passages = comparePassages(spans, {kA, kB, kC});
    REQUIRE(passages.size() == 1);
    const GoldCandidate accept = acceptCandidate(passages[0], spans[1]);
    CHECK(accept.sources == std::vector<AnnotationId> {AnnotationId {1}, AnnotationId {2}});
    CHECK(accept.content.range == TextRange {0, 10});
    auto merged = mergeCandidate({spans[0], spans[2]});
    REQUIRE(merged);
    CHECK(merged->content.range == TextRange {0, 14});
    CHECK(merged->sources.size() == 2);
    auto mixed = mergeCandidate({spans[0], span(4, kB, F::Remedy, 0, 3)});
    REQUIRE_FALSE(mixed);
    CHECK(mixed.error().code == ErrorCode::InvalidArgument);
    CHECK_FALSE(mergeCandidate({}));
}

namespace {

// kTwoArticles' f1: "The ferry to Brakwater will stop in May. Dr. Ilse Varn blames the budget.\n\n
// The council must find the money. It is a disgrace."
struct CompareFixture : ProjectFixture {
    ArticleId f1;
    CoderId c1, c2, lead;
    CompareFixture()
    {
        importJsonl(kTwoArticles);
        f1 = articleId(QStringLiteral("f1"));
        c1 = addCoder(QStringLiteral("C01"));
        c2 = addCoder(QStringLiteral("C02"));
        auto l =
            addOlderLeadForTesting(project, QStringLiteral("Test lead"), QStringLiteral("L01"));
        REQUIRE(l);
        lead = *l;
        add(c1, F::Problem, 0, 40); // both: agreed
        add(c2, F::Problem, 0, 40);
        add(c1, F::Cause, 41, 73); // boundary
        add(c2, F::Cause, 55, 73);
        add(c1, F::Remedy, 75, 107); // only C01
        markDone(project, f1, c1);
        markDone(project, f1, c2);
    }
    AnnotationId add(CoderId coder, F f, qint64 start, qint64 end)
    {
        AddAnnotationEdit e(f1, coder, AnnotationContent {f, {start, end}, {}, {}, {}});
        REQUIRE(project.apply(e));
        return e.annotationId();
    }
    QString rawDump()
    {
        return dumpDatabase(databaseForTesting(project),
            {QStringLiteral("event_log"), QStringLiteral("gold_annotation"),
                QStringLiteral("gold_source"), QStringLiteral("gold_rejection")});
    }
};

} // namespace

TEST_CASE("an article's comparison, its filters and the queue")
{
    CompareFixture f;
    auto c = compareArticle(f.project, f.f1);
    REQUIRE(c);
    CHECK(c->coders == std::vector<CoderId> {f.c1, f.c2});
    REQUIRE(c->passages.size() == 3);
    CHECK(c->passages[0].isAgreed());
    CHECK(c->passages[1].kinds == bit(K::Boundary));
    CHECK(c->passages[2].kinds == bit(K::Presence));

    auto causeOnly = compareArticle(f.project, f.f1, ComparisonFilter {F::Cause, {}});
    REQUIRE(causeOnly);
    REQUIRE(causeOnly->passages.size() == 1);
    CHECK(causeOnly->passages[0].range == TextRange {41, 73});

    auto pair = compareArticle(f.project, f.f1, ComparisonFilter {{}, std::pair {f.c1, f.lead}});
    REQUIRE_FALSE(pair);
    CHECK(pair.error().code == ErrorCode::InvalidArgument);

    auto queue = disagreementQueue(f.project);
    REQUIRE(queue);
    REQUIRE(queue->size() == 1); // f2 has no coder at all
    CHECK(queue->front().article.externalId == QStringLiteral("f1"));
    CHECK(queue->front().passages == 3);
    CHECK(queue->front().disagreements == 2);
    CHECK(queue->front().unresolved == 2);
    CHECK(queue->front().agreedOpen == 1);
    CHECK(queue->front().byKind[size_t(K::Boundary)] == 1);
    CHECK(queue->front().byKind[size_t(K::Presence)] == 1);
}

TEST_CASE("accepting agreed spans and rejecting spans change gold only, and undo completely")
{
    CompareFixture f;
    const QString raw = f.rawDump();
    const QString before = dumpDatabase(databaseForTesting(f.project));
    auto c = compareArticle(f.project, f.f1);
    REQUIRE(c);
    auto agreed = agreedCandidates(*c);
    REQUIRE(agreed.size() == 1);
    CHECK(agreed[0].sources.size() == 2); // both coders had it
    AcceptSpansEdit accept(f.f1, f.lead, agreed, QStringLiteral("Both coders agree."));
    REQUIRE(f.project.apply(accept));
    auto gold = f.project.goldAnnotations(f.f1);
    REQUIRE(gold);
    REQUIRE(gold->size() == 1);
    CHECK(gold->front().quote == QStringLiteral("The ferry to Brakwater will stop in May."));
    CHECK(gold->front().sources.size() == 2);
    CHECK(gold->front().rationale == QStringLiteral("Both coders agree."));

    // Reject C01's remedy span (only C01 had it).
    const AnnotationId remedy = c->passages[2].spans[0].id;
    RejectSpansEdit reject({remedy}, f.lead, QStringLiteral("Not a recommendation."));
    REQUIRE(f.project.apply(reject));
    auto rejections = f.project.goldRejections(f.f1);
    REQUIRE(rejections);
    REQUIRE(rejections->size() == 1);
    CHECK(rejections->front().annotation == remedy);
    CHECK(rejections->front().rationale == QStringLiteral("Not a recommendation."));
    RejectSpansEdit again({remedy}, f.lead, {});
    CHECK_FALSE(f.project.apply(again));
    RejectSpansEdit byCoder({remedy}, f.c1, {});
    auto st = f.project.apply(byCoder);
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument);

    auto after = compareArticle(f.project, f.f1);
    REQUIRE(after);
    CHECK(after->passages[0].isResolved());
    CHECK_FALSE(after->passages[1].isResolved());
    CHECK(after->passages[2].isResolved());
    CHECK(agreedCandidates(*after).empty());
    auto queue = disagreementQueue(f.project);
    REQUIRE(queue);
    CHECK(queue->front().unresolved == 1);
    CHECK(queue->front().agreedOpen == 0);

    // The coders' own spans never changed.
    CHECK(f.rawDump() == raw);
    REQUIRE(f.project.revert(reject));
    REQUIRE(f.project.revert(accept));
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
    REQUIRE(f.project.apply(accept)); // redo keeps the same gold uuids
    CHECK(f.project.goldAnnotations(f.f1)->size() == 1);
}

TEST_CASE("accepting spans is all-or-nothing")
{
    CompareFixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project));
    std::vector<GoldCandidate> spans {
        GoldCandidate {AnnotationContent {F::Problem, {0, 40}, {}, {}, {}}, {}},
        GoldCandidate {AnnotationContent {F::Problem, {0, 4000}, {}, {}, {}}, {}}};
    AcceptSpansEdit accept(f.f1, f.lead, spans, {});
    REQUIRE_FALSE(f.project.apply(accept));
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
    AcceptSpansEdit none(f.f1, f.lead, {}, {});
    CHECK_FALSE(f.project.apply(none));
}

TEST_CASE("the comparison queue reads the same few statements for 6 and for 18 articles")
{
    qint64 counts[2] = {};
    int i = 0;
    for (int n : {6, 18}) {
        DoubleCodedProject p(n);
        qint64 rows = -1;
        counts[i++] = p.statementsRunBy([&] {
            auto queue = disagreementQueue(p.project);
            REQUIRE(queue);
            rows = qint64(queue->size());
        });
        // Every article has two coders who disagree on the second span's function.
        CHECK(rows == n);
    }
    CHECK(counts[0] == counts[1]);
    CHECK(counts[0] > 0);
    CHECK(counts[0] <= 12);
}

TEST_CASE("opening one article to compare reads its own rows only at any size")
{
    // Which coders count on the article comes from its own assignments and codings (indexed),
    // not from a scan of every assignment of the project.
    qint64 rows[2] = {};
    int i = 0;
    for (int n : {6, 30}) {
        DoubleCodedProject p(n);
        const ArticleId article = p.articles[1]; // coded by two coders, no gold
        rows[i++] = p.rowsReadBy([&] {
            auto comparison = compareArticle(p.project, article);
            REQUIRE(comparison);
            CHECK(comparison->coders.size() == 2);
            CHECK(comparison->passages.size() == 2);
        });
    }
    CHECK(rows[0] == rows[1]);
    CHECK(rows[0] > 0);
}

TEST_CASE("a decision recomputes one queue row with the same few statements at any size")
{
    qint64 counts[2] = {};
    int i = 0;
    for (int n : {6, 18}) {
        DoubleCodedProject p(n);
        auto queue = disagreementQueue(p.project);
        REQUIRE(queue);
        REQUIRE_FALSE(queue->empty());
        ArticleDisagreement row = queue->front();
        const int open = row.unresolved;
        REQUIRE(open > 0);
        // The lead rejects every span of the article's disagreeing passages.
        auto comparison = compareArticle(p.project, row.article.id);
        REQUIRE(comparison);
        for (const Passage &passage : comparison->passages)
            if (!passage.isAgreed() && !passage.isResolved()) {
                std::vector<AnnotationId> spans;
                for (const Annotation &a : passage.spans)
                    spans.push_back(a.id);
                RejectSpansEdit reject(spans, p.lead, QStringLiteral("not a frame element"));
                REQUIRE(p.project.apply(reject));
            }
        counts[i++] = p.statementsRunBy([&] {
            auto updated = articleDisagreement(p.project, row);
            REQUIRE(updated);
            CHECK(updated->unresolved == 0);
            CHECK(updated->disagreements == row.disagreements);
            // The same as the full queue computes for that article.
            auto again = disagreementQueue(p.project);
            REQUIRE(again);
            for (const ArticleDisagreement &r : *again)
                if (r.article.id == row.article.id) {
                    CHECK(r.unresolved == updated->unresolved);
                    CHECK(r.passages == updated->passages);
                    CHECK(r.agreedOpen == updated->agreedOpen);
                }
        });
    }
    CHECK(counts[0] == counts[1]);
}
