// Near copies found at import (Broder 1997: 5-word shingles, 128-value MinHash, LSH banding):
// planted copies of an article (5% of the words rewritten, paragraphs reordered, another
// headline) are listed in the report and recorded; other articles on the same topic are not;
// the similarity lies within three standard errors sqrt(J (1 - J) / 128) of the exact Jaccard
// computed here (tests/text/near_copy_texts.h); a draw can leave near copies out of its frame.

#include "core/project/near_copies.h"
#include "core/project/project.h"
#include "core/project/subsample_draw.h"
#include "tests/support/test_support.h"
#include "tests/text/near_copy_texts.h"

#include <QJsonDocument>
#include <QJsonObject>
#include <QTemporaryDir>

#include <cmath>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QByteArray jsonLine(const QString &id, const QString &title, const QString &text)
{
    return QJsonDocument(QJsonObject {{QStringLiteral("id"), id}, {QStringLiteral("title"), title},
                             {QStringLiteral("text"), text}})
               .toJson(QJsonDocument::Compact)
        + '\n';
}

double standardError(double j)
{
    return std::sqrt(j * (1.0 - j) / 128.0);
}

struct Corpus {
    QString original = inventedArticle(1, 101);
    QString edited = withWordsChanged(original, 0.05, 3, 11); // 5% rewritten in three passages
    QString reordered = withParagraphsReordered(original);
    QString sameTopic = inventedArticle(1, 202); // another article on topic 1
    QString otherTopic = inventedArticle(2, 303);
};

} // namespace

TEST_CASE("Import lists and records planted near copies and not other articles on the topic",
    "[io][nearcopy][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    const Corpus c;
    const QString first = writeFile(dir, QStringLiteral("first.jsonl"),
        jsonLine(QStringLiteral("wire"), QStringLiteral("Council votes on harbour"), c.original)
            + jsonLine(QStringLiteral("other-topic"), QStringLiteral("Tides"), c.otherTopic));
    auto one = project->importFile(first, ImportOptions {});
    REQUIRE(one);
    CHECK(one->added.size() == 2);
    CHECK(one->nearCopies.empty());

    // The copies come in a later file: against the project's articles; the same-topic article
    // is in between them.
    const QString second = writeFile(dir, QStringLiteral("second.jsonl"),
        jsonLine(
            QStringLiteral("edited"), QStringLiteral("Harbour vote: council decides"), c.edited)
            + jsonLine(QStringLiteral("same-topic"), QStringLiteral("Council votes on harbour"),
                c.sameTopic)
            + jsonLine(
                QStringLiteral("reordered"), QStringLiteral("A different headline"), c.reordered));
    auto two = project->importFile(second, ImportOptions {});
    REQUIRE(two);
    CHECK(two->added.size() == 3);
    // The edited copy is a near copy of the original; the reordered one of the original and, as
    // it may be, of the edited copy; the article on the same topic of nothing. Each article's
    // most similar match comes first.
    REQUIRE(two->nearCopies.size() >= 2);
    const NearCopyFound &e = two->nearCopies[0];
    CHECK(e.externalId == QStringLiteral("edited"));
    CHECK(e.line == 1);
    CHECK(e.otherExternalId == QStringLiteral("wire"));
    const double exactEdited = exactShingleJaccard(c.original, c.edited);
    CHECK(exactEdited >= 0.8);
    CHECK(std::abs(e.similarity - exactEdited) <= 3.0 * standardError(exactEdited));
    const NearCopyFound &r = two->nearCopies[1];
    CHECK(r.externalId == QStringLiteral("reordered"));
    CHECK(r.line == 3);
    CHECK(r.otherExternalId == QStringLiteral("wire"));
    // Only the five-word shingles across the moved paragraph boundaries change.
    const double exactReordered = exactShingleJaccard(c.original, c.reordered);
    CHECK(std::abs(r.similarity - exactReordered) <= 3.0 * standardError(exactReordered));
    for (const NearCopyFound &n : two->nearCopies) {
        CHECK(n.externalId != QStringLiteral("same-topic"));
        CHECK(n.otherExternalId != QStringLiteral("same-topic"));
        const QString other = n.otherExternalId == QStringLiteral("wire") ? c.original : c.edited;
        const QString self = n.externalId == QStringLiteral("edited") ? c.edited : c.reordered;
        const double exact = exactShingleJaccard(other, self);
        CHECK(std::abs(n.similarity - exact) <= 3.0 * standardError(exact));
    }
    // The same topic shares vocabulary but (almost) no 5-word shingles.
    CHECK(exactShingleJaccard(c.original, c.sameTopic) < 0.05);

    // Recorded in the project, every pair at or above the threshold.
    auto rows = NearCopies::list(*project);
    REQUIRE(rows);
    REQUIRE(rows->size() == two->nearCopies.size());
    for (const NearCopy &row : *rows)
        CHECK(row.similarity >= 0.8);
    CHECK(rows->front().articleExternalId == QStringLiteral("edited"));
    CHECK(rows->front().otherExternalId == QStringLiteral("wire"));
    CHECK(rows->front().otherTitle == QStringLiteral("Council votes on harbour"));
    CHECK(rows->front().similarity == e.similarity);
    auto counts = NearCopies::counts(*project);
    REQUIRE(counts);
    CHECK(counts->articles == 2);
    CHECK(counts->pairs == qint64(rows->size()));

    // Importing the same file again adds nothing: the texts are there (skipped), no new pairs.
    auto again = project->importFile(second, ImportOptions {});
    REQUIRE(again);
    CHECK(again->added.empty());
    CHECK(again->skipped.size() == 3);
    CHECK(again->nearCopies.empty());
    CHECK(NearCopies::list(*project)->size() == rows->size());
}

TEST_CASE("Near copies inside one file are found and a failed file records none",
    "[io][nearcopy][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    const Corpus c;
    // The copy follows its original in the same file; a bad last line undoes everything.
    const QByteArray lines = jsonLine(QStringLiteral("wire"), QStringLiteral("T"), c.original)
        + jsonLine(QStringLiteral("edited"), QStringLiteral("T2"), c.edited);
    const QString bad = writeFile(dir, QStringLiteral("bad.jsonl"), lines + "{\"id\": 3}\n");
    auto failed = project->importFile(bad, ImportOptions {});
    REQUIRE_FALSE(failed);
    CHECK(project->articles()->empty());
    CHECK(NearCopies::list(*project)->empty());

    const QString good = writeFile(dir, QStringLiteral("good.jsonl"), lines);
    auto ok = project->importFile(good, ImportOptions {});
    REQUIRE(ok);
    REQUIRE(ok->nearCopies.size() == 1);
    CHECK(ok->nearCopies[0].externalId == QStringLiteral("edited"));
    CHECK(ok->nearCopies[0].otherExternalId == QStringLiteral("wire"));
}

TEST_CASE("The near-copy threshold is an option and a bad one is refused before reading",
    "[io][nearcopy][project]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    const QString original = inventedArticle(0, 5);
    // 5% of the words changed at scattered places: J about 0.63 with 5-word shingles.
    const QString scattered = withWordsChanged(original, 0.05, 0, 9);
    const double exact = exactShingleJaccard(original, scattered);
    REQUIRE(exact < 0.75);
    const QString path = writeFile(dir, QStringLiteral("a.jsonl"),
        jsonLine(QStringLiteral("a"), QStringLiteral("A"), original)
            + jsonLine(QStringLiteral("b"), QStringLiteral("B"), scattered));

    for (const double bad : {0.0, -0.5, 1.5}) {
        ImportOptions options;
        options.nearCopyThreshold = bad;
        auto refused = project->importFile(path, options);
        REQUIRE_FALSE(refused);
        CHECK(refused.error().code == ErrorCode::InvalidArgument);
        CHECK(refused.error().message.contains(QStringLiteral("near-copy threshold")));
    }
    CHECK(project->articles()->empty());

    ImportOptions lower;
    lower.nearCopyThreshold = 0.5;
    auto found = project->importFile(path, lower);
    REQUIRE(found);
    REQUIRE(found->nearCopies.size() == 1);
    CHECK(std::abs(found->nearCopies[0].similarity - exact) <= 3.0 * standardError(exact));
}

TEST_CASE("A draw can leave near copies out of its sampling frame", "[io][nearcopy][study]")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    QByteArray lines;
    for (int i = 0; i < 6; ++i)
        lines += jsonLine(QStringLiteral("a%1").arg(i), QStringLiteral("A %1").arg(i),
            inventedArticle(i % 3, unsigned(500 + i)));
    lines += jsonLine(QStringLiteral("copy-of-a0"), QStringLiteral("C"),
        withWordsChanged(inventedArticle(0, 500), 0.05, 2, 1));
    lines += jsonLine(QStringLiteral("copy-of-a1"), QStringLiteral("D"),
        withParagraphsReordered(inventedArticle(1, 501)));
    REQUIRE(
        project->importFile(writeFile(dir, QStringLiteral("a.jsonl"), lines), ImportOptions {}));
    REQUIRE(NearCopies::counts(*project)->articles == 2);
    for (const QString &name : {QStringLiteral("ann"), QStringLiteral("bob")})
        REQUIRE(project->addCoder(name, name, CoderRole::Coder));

    DrawRequest request;
    request.fraction = 1.0;
    request.coders = {QStringLiteral("ann"), QStringLiteral("bob")};
    auto all = SubsampleDraw::plan(*project, request);
    REQUIRE(all);
    CHECK(all->frameArticles == 8);
    CHECK_FALSE(all->nearCopiesLeftOut);
    request.leaveOutNearCopies = true;
    auto without = SubsampleDraw::plan(*project, request);
    REQUIRE(without);
    CHECK(without->frameArticles == 6);
    CHECK(without->nearCopiesLeftOut);
    CHECK_FALSE(without->articles.contains(QStringLiteral("copy-of-a0")));
    CHECK_FALSE(without->articles.contains(QStringLiteral("copy-of-a1")));
    CHECK(without->articles.contains(QStringLiteral("a0")));
    // The choice is kept in the draw's record.
    auto back = SubsampleDraw::fromJson(SubsampleDraw::toJson(*without));
    REQUIRE(back);
    CHECK(back->nearCopiesLeftOut);
}
