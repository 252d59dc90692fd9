// The coding desk driven through its real widgets, offscreen, on a copy of the sample project.
#include "app/desktop/coder_legend.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/frame_card.h"
#include "app/desktop/import_dialog.h"
#include "app/desktop/item_form.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "app/desktop/reading_view.h"
#include "core/project/project.h"
#include "core/project/testing/older_lead.h"
#include "core/project/testing/project_database.h"
#include "core/text/offset_map.h"
#include "tests/support/test_support.h"

#include <QComboBox>
#include <QFile>
#include <QLabel>
#include <QLineEdit>
#include <QMenu>
#include <QSet>
#include <QTableView>
#include <QTest>
#include <QTextCursor>
#include <QUndoStack>

#include <map>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// A copy of the sample project plus one article with emoji and accented letters, assigned to C01.
struct DeskFixture {
    QTemporaryDir dir;
    QString path;
    DeskFixture()
    {
        path = dir.filePath(QStringLiteral("demo.fourfold"));
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
        auto p = Project::open(path);
        REQUIRE(p);
        // "Café 🚢 Brakwater" in NFC, with a surrogate pair (U+1F6A2) and a ZWJ family emoji.
        const QByteArray jsonl =
            "{\"id\":\"emoji-01\",\"title\":\"Caf\\u00e9 ferry\",\"language\":\"en\",\"text\":"
            "\"The caf\\u00e9 \\ud83d\\udea2 at Brakwater is closing. "
            "\\ud83d\\udc68\\u200d\\ud83d\\udc69\\u200d\\ud83d\\udc67 "
            "Families blame the na\\u00efve council.\"}\n";
        REQUIRE(
            p->importFile(writeFile(dir, QStringLiteral("emoji.jsonl"), jsonl), ImportOptions {}));
        auto id = p->articleByExternalId(QStringLiteral("emoji-01"));
        REQUIRE(id);
        auto c01 = p->coderByPseudonym(QStringLiteral("C01"));
        REQUIRE(c01);
        REQUIRE(p->assign(**id, (*c01)->id, Phase::Reliability));
    }
};

ArticleId articleId(MainWindow &w, const char *externalId)
{
    auto id = w.session()->project().articleByExternalId(QString::fromLatin1(externalId));
    REQUIRE(id);
    REQUIRE(id->has_value());
    return **id;
}

// The code-point range of `needle` in the article's text.
TextRange rangeOf(MainWindow &w, ArticleId article, const QString &needle)
{
    auto a = w.session()->project().article(article);
    REQUIRE(a);
    const qsizetype at = a->text.indexOf(needle);
    REQUIRE(at >= 0);
    return OffsetMap(a->text).codePointRange(Utf16Range {at, at + needle.size()});
}

} // namespace

TEST_CASE(
    "a coder selects text, presses 2, and a cause span with exact code-point offsets is stored")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    const ArticleId article = articleId(w, "emoji-01");
    w.openArticle(article);
    REQUIRE(w.currentArticle() == article);

    // "Families blame the naïve council": after 🚢 (2 UTF-16 units, 1 code point) and the family
    // emoji (5 code points, 8 UTF-16 units) the code-point offsets differ from Qt's.
    const TextRange target = rangeOf(w, article, QStringLiteral("blame the na\u00efve council"));
    CHECK(target.start == 51); // counted by hand in code points (W3C TextPositionSelector rule)
    w.readingView()->setTextSelection(target);
    QTest::keyClick(w.readingView(), Qt::Key_2);

    auto spans = w.session()->project().annotations(article, w.session()->coder().id);
    REQUIRE(spans);
    REQUIRE(spans->size() == 1);
    const Annotation span = (*spans)[0];
    CHECK(span.content.function == FramingFunction::Cause);
    CHECK(span.content.range == target);
    CHECK(span.quote == QStringLiteral("blame the na\u00efve council"));

    SECTION("undo and redo")
    {
        w.session()->undoStack()->undo();
        CHECK(w.session()->project().annotations(article)->empty());
        w.session()->undoStack()->redo();
        REQUIRE(w.session()->project().annotations(article)->size() == 1);
        CHECK((*w.session()->project().annotations(article))[0].uuid == span.uuid);
    }
    SECTION("relabel with a key, then delete")
    {
        w.selectSpan(span.id);
        QTest::keyClick(w.readingView(), Qt::Key_3);
        auto relabelled = w.session()->project().annotation(span.id);
        REQUIRE(relabelled);
        CHECK(relabelled->content.function == FramingFunction::Evaluation);
        CHECK(relabelled->content.range == target);
        w.selectSpan(span.id);
        QTest::keyClick(w.readingView(), Qt::Key_Delete);
        CHECK(w.session()->project().annotations(article)->empty());
        CHECK(w.session()->project().annotation(span.id)->deleted);
        w.session()->undoStack()->undo();
        CHECK(w.session()->project().annotations(article)->size() == 1);
    }
    SECTION("link an evaluation to the cause it judges")
    {
        const TextRange closing = rangeOf(w, article, QStringLiteral("is closing"));
        w.readingView()->setTextSelection(closing);
        QTest::keyClick(w.readingView(), Qt::Key_3);
        const AnnotationId evaluation = w.session()->lastAddedSpan();
        REQUIRE(w.session()->linkSpans(evaluation, span.id, QStringLiteral("judges")));
        auto links = w.session()->project().links(article);
        REQUIRE(links);
        REQUIRE(links->size() == 1);
        CHECK((*links)[0].source == evaluation);
        CHECK((*links)[0].target == span.id);
        CHECK((*links)[0].type == QStringLiteral("judges"));
    }
}

TEST_CASE("Alt keeps the exact selection; without it the span snaps to whole words")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    const ArticleId article = articleId(w, "emoji-01");
    w.openArticle(article);
    const TextRange word = rangeOf(w, article, QStringLiteral("Brakwater"));
    const TextRange inside {word.start + 2, word.end - 2};
    w.readingView()->setTextSelection(inside);
    QTest::keyClick(w.readingView(), Qt::Key_1);
    w.readingView()->setTextSelection(inside);
    QTest::keyClick(w.readingView(), Qt::Key_4, Qt::AltModifier);
    auto spans = w.session()->project().annotations(article);
    REQUIRE(spans);
    REQUIRE(spans->size() == 2);
    QSet<qint64> starts;
    for (const Annotation &a : *spans) {
        if (a.content.function == FramingFunction::Problem)
            CHECK(a.content.range == word); // snapped to the word (UAX #29 word boundaries)
        else
            CHECK(a.content.range == inside);
    }
}

TEST_CASE("marking an article as done stores it and opens the next one")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    w.activateWindow();
    REQUIRE(QTest::qWaitForWindowActive(&w));
    const ArticleId first = w.currentArticle();
    REQUIRE(first.isValid());
    QTest::keyClick(&w, Qt::Key_Return, Qt::ControlModifier);
    CHECK(w.session()->articleStatus(first) == QStringLiteral("done"));
    CHECK(w.currentArticle() != first);
    bool done = false;
    const auto assignments = w.session()->project().assignments();
    REQUIRE(assignments);
    for (const Assignment &a : *assignments)
        if (a.article == first && a.coder == w.session()->coder().id)
            done = a.status == QStringLiteral("done");
    CHECK(done);
}

TEST_CASE("a coder sees only their own spans and their assigned articles, anywhere in the window")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C03")));
    w.show();
    Project &p = w.session()->project();
    const CoderId me = w.session()->coder().id;

    // The article list holds exactly C03's assignments.
    QSet<qint64> assigned;
    const auto assignments = p.assignments();
    REQUIRE(assignments);
    for (const Assignment &a : *assignments)
        if (a.coder == me)
            assigned.insert(a.article.value);
    QTableView *list = w.articleList();
    CHECK(list->model()->rowCount() == assigned.size());

    // Quotes that only other coders made must never appear in the frame card.
    for (int row = 0; row < list->model()->rowCount(); ++row) {
        list->selectRow(row);
        const ArticleId article = w.currentArticle();
        CHECK(assigned.contains(article.value));
        QSet<QString> mine, others;
        const auto all = p.annotations(article);
        REQUIRE(all);
        for (const Annotation &a : *all)
            (a.coder == me ? mine : others).insert(a.quote);
        for (const Annotation &a : w.session()->visibleAnnotations(article))
            CHECK(a.coder == me);
        QString shown;
        for (const QLabel *label : w.frameCard()->findChildren<QLabel *>())
            shown += label->text() + QLatin1Char('\n');
        for (const QString &q : others) {
            const bool alsoMine = std::any_of(mine.begin(), mine.end(),
                [&](const QString &m) { return m.left(30) == q.left(30); });
            if (alsoMine)
                continue;
            INFO(q.toStdString());
            // Card quotes are elided, so compare a distinctive opening of each quote.
            CHECK_FALSE(shown.contains(q.left(30).toHtmlEscaped()));
        }
    }
}

TEST_CASE("full-text search narrows the list and marks the hits in the text")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    const int all = w.articleList()->model()->rowCount();
    QTest::keyClicks(w.searchField(), QStringLiteral("dijk"));
    QTest::keyClick(w.searchField(), Qt::Key_Return);
    const int hits = w.articleList()->model()->rowCount();
    CHECK(hits > 0);
    CHECK(hits < all);
    // Every listed article contains the word (checked on the stored text, not through FTS5).
    for (int row = 0; row < hits; ++row) {
        w.articleList()->selectRow(row);
        auto article = w.session()->project().article(w.currentArticle());
        REQUIRE(article);
        CHECK(article->text.contains(QStringLiteral("dijk"), Qt::CaseInsensitive));
        CHECK(w.readingView()->setSearchHighlight(QStringLiteral("dijk"))
            == article->text.count(QStringLiteral("dijk"), Qt::CaseInsensitive));
    }
    w.searchField()->clear();
    CHECK(w.articleList()->model()->rowCount() == all);
}

TEST_CASE("importing from the window reports added, skipped and refused articles with their lines")
{
    QTemporaryDir dir;
    const QString path = dir.filePath(QStringLiteral("new.fourfold"));
    {
        auto p = Project::create(path);
        REQUIRE(p);
        REQUIRE(addOlderLeadForTesting(*p, QStringLiteral("Test lead"), QStringLiteral("L01")));
    }
    MainWindow w;
    REQUIRE(w.openProject(path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    const QString good = writeFile(dir, QStringLiteral("good.jsonl"),
        "{\"id\":\"a\",\"title\":\"A\",\"text\":\"First "
        "text.\"}\n{\"id\":\"b\",\"title\":\"B\",\"text\":\"First text.\"}\n");
    const QString bad = writeFile(dir, QStringLiteral("bad.jsonl"),
        "{\"id\":\"c\",\"title\":\"C\",\"text\":\"Fine.\"}\n{\"id\":\"d\",\"title\":3,\"text\":"
        "\"x\"}\n");
    const ImportOutcome outcome = importWithProgress(w.session()->project(), {good, bad}, &w);
    CHECK(outcome.added == 1);
    CHECK_FALSE(outcome.cancelled);
    const QString report = outcome.lines.join(QLatin1Char('\n'));
    CHECK(report.contains(QStringLiteral("good.jsonl: 1 article(s) added")));
    CHECK(report.contains(QStringLiteral("line 2 (b): skipped")));
    CHECK(report.contains(QStringLiteral("bad.jsonl: not imported")));
    CHECK(report.contains(QStringLiteral("bad.jsonl:2")));
    CHECK(w.session()->project().articles()->size() == 1);
}

// Opens the reading view's context menu (as the menu key does) and triggers the action whose
// text starts with `prefix`; false when the menu holds none.
bool triggerContextAction(MainWindow &w, const QString &prefix)
{
    ReadingView *view = w.readingView();
    const QPoint at = view->viewport()->rect().center();
    QContextMenuEvent event(QContextMenuEvent::Keyboard, at, view->viewport()->mapToGlobal(at));
    QApplication::sendEvent(view, &event);
    QMenu *menu = nullptr;
    for (QMenu *m : view->findChildren<QMenu *>())
        if (m->isVisible())
            menu = m;
    REQUIRE(menu);
    QAction *found = nullptr;
    for (QAction *a : menu->actions())
        if (a->text().startsWith(prefix) && a->isEnabled())
            found = a;
    if (found)
        found->trigger();
    menu->close();
    return found != nullptr;
}

TEST_CASE("a link removed from the desk's context menu comes back with undo")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    const ArticleId article = articleId(w, "emoji-01");
    w.openArticle(article);
    CodingSession *session = w.session();
    REQUIRE(session->addSpan(
        article, FramingFunction::Problem, rangeOf(w, article, QStringLiteral("is closing"))));
    const AnnotationId problem = session->lastAddedSpan();
    REQUIRE(session->addSpan(article, FramingFunction::Remedy,
        rangeOf(w, article, QStringLiteral("blame the na\u00efve council"))));
    const AnnotationId remedy = session->lastAddedSpan();
    REQUIRE(session->linkSpans(remedy, problem, QStringLiteral("addresses")));
    auto liveLinks = [&] {
        auto links = session->project().links(article);
        REQUIRE(links);
        return std::ranges::count_if(*links, [](const AnnotationLink &l) { return !l.deleted; });
    };
    REQUIRE(liveLinks() == 1);
    const int steps = session->undoStack()->count();

    w.selectSpan(remedy);
    // The menu names the link as the span editor lists it ("addresses …").
    REQUIRE(triggerContextAction(w, QStringLiteral("Remove link: addresses")));
    CHECK(liveLinks() == 0); // the stored row is a tombstone now
    CHECK(session->undoStack()->count() == steps + 1);
    CHECK(session->undoStack()->undoText() == QStringLiteral("Remove link (addresses)"));
    CHECK_FALSE(triggerContextAction(w, QStringLiteral("Remove link:"))); // nothing left to remove

    session->undoStack()->undo();
    CHECK(liveLinks() == 1);
    // The restored link is the same row, and the desk shows it again.
    auto links = session->project().links(article);
    REQUIRE(links);
    REQUIRE(links->size() == 1);
    CHECK(links->front().source == remedy);
    CHECK(links->front().target == problem);
    CHECK(session->document().links().size() == 1);
    session->undoStack()->redo();
    CHECK(liveLinks() == 0);
}

TEST_CASE("an answer withdrawn on the desk is unanswered and comes back with undo")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    const ArticleId article = articleId(w, "emoji-01");
    w.openArticle(article);
    CodingSession *session = w.session();
    const QString item = QStringLiteral("dominant_function");
    REQUIRE(session->answerItem(article, item, QStringLiteral("cause")));
    auto storedAnswers = [&] {
        auto all = session->project().judgements(article);
        REQUIRE(all);
        return *all; // live rows only
    };
    REQUIRE(storedAnswers().size() == 1);
    const QString uuid = storedAnswers().front().uuid;
    // The form's one row (rows of an earlier codebook are hidden until they are deleted).
    QComboBox *combo = nullptr;
    for (QComboBox *c : w.itemForm()->findChildren<QComboBox *>())
        if (c->isVisibleTo(w.itemForm()))
            combo = c;
    REQUIRE(combo);
    CHECK(combo->currentData().toString() == QStringLiteral("cause"));

    SECTION("from the context menu")
    {
        REQUIRE(triggerContextAction(w, QStringLiteral("Withdraw answer:")));
    }
    SECTION("in the item form, by choosing not answered")
    {
        combo->setCurrentIndex(0);
        emit combo->activated(0);
    }
    CHECK(storedAnswers().empty());
    CHECK(combo->currentData().toString().isEmpty()); // "not answered"
    CHECK(session->undoStack()->undoText()
        == QStringLiteral("Withdraw answer \"dominant_function\""));

    session->undoStack()->undo();
    REQUIRE(storedAnswers().size() == 1);
    CHECK(storedAnswers().front().value == QStringLiteral("cause"));
    CHECK(storedAnswers().front().uuid == uuid);
    CHECK(combo->currentData().toString() == QStringLiteral("cause"));
    session->undoStack()->redo();
    CHECK(storedAnswers().empty());
}

TEST_CASE("a lead's all-coders view names each span's coder by pseudonym and filters to one coder")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("L01"), QStringLiteral("demo lead passphrase")));
    w.resize(1500, 920);
    w.show();
    const ArticleId article = articleId(w, "hb-01");
    w.openArticle(article);
    CoderLegend *legend = w.coderLegend();
    CHECK_FALSE(legend->isVisible()); // the lead's own spans only, so far
    QAction *showAll = nullptr;
    for (QAction *a : w.findChildren<QAction *>())
        if (a->text().startsWith(QStringLiteral("Show &every coder")))
            showAll = a;
    REQUIRE(showAll);
    showAll->trigger();
    REQUIRE(legend->isVisible());

    // The sample's three coders coded hb-01 (sample-project/README.md).
    Project &project = w.session()->project();
    auto coders = project.coders();
    REQUIRE(coders);
    std::map<qint64, Coder> byId;
    for (const Coder &c : *coders)
        byId[c.id.value] = c;
    auto every = project.annotations(article);
    REQUIRE(every);
    ReadingView *view = w.readingView();
    CHECK(view->spans().size() == every->size());
    for (const QString &pseudonym :
        {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")})
        CHECK(legend->legendText().contains(QStringLiteral("<b>%1</b>").arg(pseudonym)));
    // Each span shown carries its coder's pseudonym, never a name.
    for (const Annotation &a : view->spans())
        CHECK(view->spanOwner(a.id) == byId.at(a.coder.value).pseudonym);
    const auto c02 = std::ranges::find_if(
        *coders, [](const Coder &c) { return c.pseudonym == QStringLiteral("C02"); });
    REQUIRE(c02 != coders->end());
    auto ofC02 = project.annotations(article, c02->id);
    REQUIRE(ofC02);
    REQUIRE_FALSE(ofC02->empty());
    // The tooltip over the text of one of C02's spans names C02 with the span.
    const Annotation &span = ofC02->front();
    const OffsetMap map(view->article().text);
    QTextCursor at(view->document());
    at.setPosition(int(map.utf16Range(span.content.range).start + 1));
    const QString tip = view->toolTipAt(view->cursorRect(at).center());
    CHECK(tip.contains(QStringLiteral("C02 \u00B7 ")));
    for (const Coder &c : *coders) {
        CHECK_FALSE(tip.contains(c.name));
        CHECK_FALSE(legend->legendText().contains(c.name));
    }

    // Filtered to C02: the view is given only C02's spans, as many as the project holds.
    QComboBox *filter = legend->filter();
    const int index = filter->findText(QStringLiteral("C02"));
    REQUIRE(index > 0);
    filter->setCurrentIndex(index);
    emit filter->activated(index);
    CHECK(view->spans().size() == ofC02->size());
    CHECK(std::ranges::all_of(
        view->spans(), [&](const Annotation &a) { return a.coder == c02->id; }));
    CHECK(w.session()->document().spans().size() == ofC02->size());
    // All coders shows everyone again.
    filter->setCurrentIndex(0);
    emit filter->activated(0);
    CHECK(view->spans().size() == every->size());
    // Back to the lead's own spans: no legend, no pseudonyms on the badges.
    showAll->trigger();
    CHECK_FALSE(legend->isVisible());
    for (const Annotation &a : view->spans())
        CHECK(view->spanOwner(a.id).isEmpty());
}

TEST_CASE("a refused change keeps its error and never reaches the undo stack")
{
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    const ArticleId article = articleId(w, "emoji-01");
    auto st = w.session()->addSpan(article, FramingFunction::Problem, TextRange {0, 100000});
    REQUIRE_FALSE(st);
    CHECK(st.error().code == ErrorCode::InvalidArgument); // the range lies outside the text
    CHECK(w.session()->undoStack()->count() == 0);
    CHECK(w.session()->project().annotations(article)->empty());
}

TEST_CASE("a key press and a relabel run a handful of statements")
{
    // The desk keeps the open article in a document and reads again only what an edit touched:
    // a key press costs the edit's own statements (quote, codebook, phase, insert, log) and one
    // read of the spans, whatever else the desk shows and however many spans the article has.
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    const ArticleId article = articleId(w, "emoji-01");
    w.openArticle(article);
    Database &db = databaseForTesting(w.session()->project());
    const TextRange blame = rangeOf(w, article, QStringLiteral("blame the"));
    const TextRange families = rangeOf(w, article, QStringLiteral("Families"));
    const auto statementsOf = [&](const auto &action) {
        const qint64 before = db.statementsRun();
        action();
        return db.statementsRun() - before;
    };

    w.readingView()->setTextSelection(blame);
    const qint64 firstKey = statementsOf([&] { QTest::keyClick(w.readingView(), Qt::Key_2); });
    w.readingView()->setTextSelection(families);
    const qint64 secondKey = statementsOf([&] { QTest::keyClick(w.readingView(), Qt::Key_1); });
    const AnnotationId added = w.session()->lastAddedSpan();
    REQUIRE(w.session()->project().annotations(article, w.session()->coder().id)->size() == 2);
    CHECK(firstKey <= 6);
    CHECK(secondKey == firstKey); // one more span on the article costs nothing more

    w.selectSpan(added);
    const qint64 relabel = statementsOf([&] { QTest::keyClick(w.readingView(), Qt::Key_4); });
    CHECK(w.session()->project().annotation(added)->content.function == FramingFunction::Remedy);
    CHECK(relabel <= 6);
    const qint64 undo = statementsOf([&] { w.session()->undoStack()->undo(); });
    CHECK(w.session()->project().annotation(added)->content.function == FramingFunction::Problem);
    CHECK(undo <= 4);
    // The desk shows what the project holds after all of it.
    const std::vector<Annotation> stored = *w.session()->project().annotations(article);
    const std::vector<Annotation> &shown = w.session()->document().spans();
    REQUIRE(shown.size() == stored.size());
    for (std::size_t i = 0; i < shown.size(); ++i) {
        CHECK(shown[i].id == stored[i].id);
        CHECK(shown[i].content.function == stored[i].content.function);
        CHECK(shown[i].content.range == stored[i].content.range);
    }
    CHECK(w.session()->articleStatus(article) == QStringLiteral("started"));
}

TEST_CASE("a span the file cannot take while another program writes stays unsaved with Retry")
{
    // Another program (the lead's CLI import) holds the project's write lock longer than the desk
    // waits: the key press must not vanish, but be kept and offered again.
    DeskFixture f;
    MainWindow w;
    REQUIRE(w.openProject(f.path, QStringLiteral("C01")));
    w.show();
    const ArticleId article = articleId(w, "emoji-01");
    w.openArticle(article);
    databaseForTesting(w.session()->project()).setBusyTimeout(50);
    auto other = Database::open(f.path, Database::OpenMode::ReadWrite);
    REQUIRE(other);
    REQUIRE(other->exec(QStringLiteral("BEGIN IMMEDIATE")));

    w.readingView()->setTextSelection(rangeOf(w, article, QStringLiteral("blame the")));
    QTest::keyClick(w.readingView(), Qt::Key_2);
    CHECK(w.session()->hasUnsavedEdit());
    CHECK(w.session()->unsavedEditText() == QStringLiteral("Add cause span"));
    CHECK_FALSE(w.session()->undoStack()->canUndo());
    MessageBar *bar = w.findChild<MessageBar *>();
    REQUIRE(bar);
    CHECK(bar->kind() == MessageBar::Kind::Error);
    CHECK(bar->text().startsWith(QStringLiteral("Not saved: Add cause span.")));
    CHECK(bar->actionTexts() == QStringList {QStringLiteral("Retry"), QStringLiteral("Discard")});

    // Still locked: Retry fails again and the edit is still kept, the bar shown anew.
    REQUIRE(bar->trigger(QStringLiteral("Retry")));
    CHECK(w.session()->hasUnsavedEdit());
    CHECK(bar->text().startsWith(QStringLiteral("Not saved: Add cause span.")));

    // The other program is done: Retry writes the span, which joins the undo stack and the desk.
    REQUIRE(other->exec(QStringLiteral("COMMIT")));
    REQUIRE(bar->trigger(QStringLiteral("Retry")));
    CHECK_FALSE(w.session()->hasUnsavedEdit());
    auto spans = w.session()->project().annotations(article, w.session()->coder().id);
    REQUIRE(spans);
    REQUIRE(spans->size() == 1);
    CHECK((*spans)[0].quote == QStringLiteral("blame the"));
    CHECK(w.session()->document().spans().size() == 1);
    CHECK(w.session()->undoStack()->canUndo());
}
