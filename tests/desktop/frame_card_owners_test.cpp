// Whose quotes the frame card lists: in a lead's view of every coder's spans each quote carries
// its coder's pseudonym (never a name); in a coder's own view nothing of the kind. Driven through
// the desk offscreen on a copy of the sample project (three coders C01..C03 on hb-01, lead L01;
// sample-project/README.md).
#include "app/desktop/coding_session.h"
#include "app/desktop/frame_card.h"
#include "app/desktop/main_window.h"
#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QAbstractButton>
#include <QAction>
#include <QCoreApplication>
#include <QFile>
#include <QTemporaryDir>
#include <QTest>

#include <map>

using namespace fourfold;
using namespace fourfold::test;

namespace {

struct SampleCopy {
    QTemporaryDir dir;
    QString path;
    SampleCopy()
    {
        path = dir.filePath(QStringLiteral("demo.fourfold"));
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    }
};

ArticleId articleId(MainWindow &w, const QString &externalId)
{
    auto id = w.session()->project().articleByExternalId(externalId);
    REQUIRE(id);
    REQUIRE(id->has_value());
    return **id;
}

// The quotes on the card (those a rebuild replaced are hidden, new ones shown by the event loop).
std::vector<QAbstractButton *> quotes(const FrameCard &card)
{
    QCoreApplication::processEvents();
    std::vector<QAbstractButton *> out;
    for (QAbstractButton *b : card.findChildren<QAbstractButton *>())
        if (b->isVisibleTo(&card))
            out.push_back(b);
    return out;
}

} // namespace

TEST_CASE("the frame card names each quote's coder by pseudonym in the lead's all-coders view")
{
    SampleCopy copy;
    MainWindow w;
    REQUIRE(
        w.openProject(copy.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    w.resize(1400, 900);
    w.show();
    const ArticleId article = articleId(w, QStringLiteral("hb-01"));
    w.openArticle(article);
    QAction *showAll = nullptr;
    for (QAction *a : w.findChildren<QAction *>())
        if (a->text().startsWith(QStringLiteral("Show &every coder")))
            showAll = a;
    REQUIRE(showAll);
    showAll->trigger();

    Project &project = w.session()->project();
    auto coders = project.coders();
    REQUIRE(coders);
    std::map<qint64, Coder> byId;
    for (const Coder &c : *coders)
        byId[c.id.value] = c;
    auto every = project.annotations(article);
    REQUIRE(every);
    REQUIRE(every->size() >= 3);
    FrameCard *card = w.frameCard();
    // Every span of every coder is on the card with its coder's pseudonym.
    for (const Annotation &a : *every)
        CHECK(card->spanOwner(a.id) == byId.at(a.coder.value).pseudonym);
    const std::vector<QAbstractButton *> shown = quotes(*card);
    REQUIRE(shown.size() == every->size());
    std::map<QString, int> perPseudonym;
    for (QAbstractButton *b : shown) {
        // The tooltip starts with the pseudonym; the accessible name says who coded it.
        const QString tip = b->toolTip();
        QString owner;
        for (const auto &[id, c] : byId)
            if (tip.startsWith(QStringLiteral("<p>%1 \u00B7 ").arg(c.pseudonym)))
                owner = c.pseudonym;
        CHECK_FALSE(owner.isEmpty());
        CHECK(b->accessibleName().contains(QStringLiteral(", coded by %1: ").arg(owner)));
        ++perPseudonym[owner];
        for (const Coder &c : *coders) {
            CHECK_FALSE(tip.contains(c.name));
            CHECK_FALSE(b->accessibleName().contains(c.name));
        }
    }
    // As many quotes per pseudonym as the project holds spans of that coder on the article.
    for (const auto &[pseudonym, n] : perPseudonym) {
        const auto coder = std::ranges::find(*coders, pseudonym, &Coder::pseudonym);
        REQUIRE(coder != coders->end());
        CHECK(qsizetype(n) == qsizetype(project.annotations(article, coder->id)->size()));
    }
    CHECK(perPseudonym.size() == 3); // C01, C02 and C03 coded hb-01

    // A look at the card (tests run offscreen: the grab is as drawn).
    const QString shot = qEnvironmentVariable("FOURFOLD_FRAME_CARD_SHOT");
    if (!shot.isEmpty()) {
        QTest::qWait(50); // the layout takes in the new quotes
        CHECK(card->grab().save(shot));
    }

    // Back to the lead's own spans: no pseudonyms on the card.
    showAll->trigger();
    for (QAbstractButton *b : quotes(*card)) {
        CHECK_FALSE(b->accessibleName().contains(QStringLiteral("coded by")));
        CHECK(b->toolTip().count(QChar(0x00B7)) == 0);
    }
}

TEST_CASE("the frame card of a coder's own view names nobody")
{
    SampleCopy copy;
    MainWindow w;
    REQUIRE(w.openProject(copy.path, QStringLiteral("C02")));
    w.resize(1400, 900);
    w.show();
    const ArticleId article = articleId(w, QStringLiteral("hb-01"));
    w.openArticle(article);
    const CoderId c02 = w.session()->coder().id;
    auto own = w.session()->project().annotations(article, c02);
    REQUIRE(own);
    REQUIRE_FALSE(own->empty());
    FrameCard *card = w.frameCard();
    const std::vector<QAbstractButton *> shown = quotes(*card);
    REQUIRE(shown.size() == own->size());
    for (const Annotation &a : *own)
        CHECK(card->spanOwner(a.id).isEmpty());
    for (QAbstractButton *b : shown) {
        CHECK_FALSE(b->toolTip().contains(QStringLiteral("C02")));
        CHECK_FALSE(b->accessibleName().contains(QStringLiteral("coded by")));
    }
    const QString shot = qEnvironmentVariable("FOURFOLD_FRAME_CARD_CODER_SHOT");
    if (!shot.isEmpty()) {
        QTest::qWait(50);
        CHECK(card->grab().save(shot));
    }
}
