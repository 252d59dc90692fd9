// The extractor window driven through its widgets, offscreen, on a copy of the sample project
// (gold on hb-01, mv-01 and qs-01; three coders on the reliability articles) with a run planted
// by hand: one gold span of hb-01 found exactly, one missed, and one span where gold has none.
#include "app/desktop/compare/comparison_view.h"
#include "app/desktop/runs/extractor_window.h"
#include "app/desktop/runs/run_error_model.h"
#include "app/desktop/runs/run_passage_window.h"
#include "core/extract/extractor_runs.h"
#include "core/project/project.h"
#include "tests/support/test_support.h"

#include <QAbstractItemModelTester>
#include <QComboBox>
#include <QDir>
#include <QFile>
#include <QPushButton>
#include <QTabWidget>
#include <QTableView>
#include <QTableWidget>
#include <QTest>

using namespace fourfold;

namespace {

struct PlantedRun {
    QTemporaryDir dir;
    std::optional<Project> project;
    ArticleId article;
    GoldAnnotation kept, missed;
    TextRange falsePositive;
    int goldSpans = 0; // live gold spans in the whole project

    PlantedRun()
    {
        const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
        REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
        QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
        auto p = Project::open(path);
        REQUIRE(p);
        project.emplace(std::move(*p));
        auto id = project->articleByExternalId(QStringLiteral("hb-01"));
        REQUIRE(id);
        REQUIRE(id->has_value());
        article = **id;
        auto all = project->goldAnnotations();
        REQUIRE(all);
        std::vector<GoldAnnotation> here;
        for (const GoldAnnotation &g : *all) {
            if (g.deleted)
                continue;
            ++goldSpans;
            if (g.article == article)
                here.push_back(g);
        }
        REQUIRE(here.size() >= 2);
        kept = here[0];
        missed = here[1];
        // The false positive: the first sentence of hb-01 that no gold span touches.
        auto text = project->article(article);
        REQUIRE(text);
        bool found = false;
        for (const TextRange &s : text->sentences)
            if (std::ranges::none_of(
                    here, [&](const GoldAnnotation &g) { return g.content.range.overlaps(s); })) {
                falsePositive = s;
                found = true;
                break;
            }
        REQUIRE(found);

        ExtractorRun run;
        run.name = QStringLiteral("planted");
        run.version = QStringLiteral("test");
        ExtractedSpan hit;
        hit.article = article;
        hit.function = kept.content.function;
        hit.range = kept.content.range;
        ExtractedSpan wrong;
        wrong.article = article;
        wrong.function = FramingFunction::Problem;
        wrong.range = falsePositive;
        auto stored = ExtractorRuns::storeRun(*project, run, {hit, wrong});
        INFO((stored ? QString() : stored.error().toString()).toStdString());
        REQUIRE(stored);
    }
};

void waitFor(ExtractorWindow &w)
{
    QTest::qWait(1);
    // A change of the controls while a computation runs queues another one: wait for the last.
    for (int i = 0; i < 600 && (w.isRunning() || !w.outcome()); ++i)
        QTest::qWait(50);
    REQUIRE_FALSE(w.isRunning());
    REQUIRE(w.outcome());
}

void activate(QWidget &w)
{
    w.resize(1400, 900);
    w.show();
    w.activateWindow();
    REQUIRE(QTest::qWaitForWindowActive(&w));
}

// The sample project may carry runs of its own: look at the planted one.
void openPlanted(ExtractorWindow &w)
{
    waitFor(w);
    w.selectRuns({QStringLiteral("planted")});
    waitFor(w);
    REQUIRE(w.currentRun());
    REQUIRE(w.currentRun()->run == QStringLiteral("planted"));
}

QString text(QTableWidget *t, int row, int column)
{
    auto *item = t->item(row, column);
    return item ? item->text() : QString();
}

} // namespace

TEST_CASE("the error list holds the planted false positive and miss", "[runsgui]")
{
    PlantedRun f;
    ExtractorWindow w(*f.project);
    QAbstractItemModelTester tester(
        w.errorModel(), QAbstractItemModelTester::FailureReportingMode::Fatal);
    openPlanted(w);

    // The run table lists the run with its span count.
    int plantedRow = -1;
    for (int row = 0; row < w.runTable()->rowCount(); ++row)
        if (text(w.runTable(), row, 0) == QStringLiteral("planted"))
            plantedRow = row;
    REQUIRE(plantedRow >= 0);
    CHECK(text(w.runTable(), plantedRow, 4) == QStringLiteral("2"));
    CHECK(w.runTable()->currentRow() == plantedRow);

    const RunOutcome *run = w.currentRun();
    REQUIRE(run);
    REQUIRE(run->errors);
    // Every gold span but the one found is missed, plus the one false positive (strict).
    RunErrorModel *model = w.errorModel();
    REQUIRE(model->rowCount() == f.goldSpans - 1 + 1);
    int falsePositives = 0, misses = 0;
    bool plantedMiss = false, plantedFalsePositive = false;
    for (int row = 0; row < model->rowCount(); ++row) {
        const RunSpanOutcome *o = model->outcome(row);
        REQUIRE(o);
        if (o->kind == RunErrorKind::FalsePositive) {
            ++falsePositives;
            plantedFalsePositive =
                o->article == f.article && o->predicted && o->predicted->range == f.falsePositive;
        }
        if (o->kind == RunErrorKind::Miss) {
            ++misses;
            plantedMiss = plantedMiss
                || (o->article == f.article && o->reference->range == f.missed.content.range
                    && o->reference->function == f.missed.content.function);
        }
        // The span found exactly is no error.
        CHECK_FALSE((o->reference && o->reference->range == f.kept.content.range
            && o->reference->function == f.kept.content.function && o->article == f.article));
    }
    CHECK(falsePositives == 1);
    CHECK(misses == f.goldSpans - 1);
    CHECK(plantedFalsePositive);
    CHECK(plantedMiss);

    // The scores agree: micro SPU 1, MIS every gold span but one, COR 1.
    QTableWidget *scores = w.scoreTable();
    int micro = -1;
    for (int row = 0; row < scores->rowCount(); ++row)
        if (text(scores, row, 0) == QStringLiteral("Micro"))
            micro = row;
    REQUIRE(micro >= 0);
    CHECK(text(scores, micro, 5) == QStringLiteral("1"));
    CHECK(text(scores, micro, 8) == QString::number(f.goldSpans - 1));
    CHECK(text(scores, micro, 9) == QStringLiteral("1"));

    // The confusion table: the false positive in (none, problem), the hit on the diagonal.
    CHECK(text(w.confusionTable(), kNoFunction, int(FramingFunction::Problem))
        == QStringLiteral("1"));
    const int k = int(f.kept.content.function);
    CHECK(text(w.confusionTable(), k, k) == QStringLiteral("1"));
}

TEST_CASE("the filters narrow the error list", "[runsgui]")
{
    PlantedRun f;
    ExtractorWindow w(*f.project);
    openPlanted(w);
    RunErrorModel *model = w.errorModel();
    w.kindFilter()->setCurrentIndex(w.kindFilter()->findData(int(RunErrorKind::FalsePositive)));
    REQUIRE(model->rowCount() == 1);
    CHECK(model->outcome(0)->predicted->range == f.falsePositive);
    w.kindFilter()->setCurrentIndex(w.kindFilter()->findData(int(RunErrorKind::Miss)));
    CHECK(model->rowCount() == f.goldSpans - 1);
    const FramingFunction missedFunction = f.missed.content.function;
    w.functionFilter()->setCurrentIndex(w.functionFilter()->findData(int(missedFunction)));
    REQUIRE(model->rowCount() >= 1);
    for (int row = 0; row < model->rowCount(); ++row) {
        CHECK(model->outcome(row)->kind == RunErrorKind::Miss);
        CHECK(model->outcome(row)->function() == missedFunction);
    }
    // The summary table's count is what the filter shows.
    CHECK(w.errorSummary()->item(int(missedFunction), 4)->text()
        == QString::number(model->rowCount()));
}

TEST_CASE("double-clicking an error opens its passage with gold and the run", "[runsgui]")
{
    PlantedRun f;
    ExtractorWindow w(*f.project);
    activate(w);
    openPlanted(w);
    w.tabs()->setCurrentIndex(1);
    w.kindFilter()->setCurrentIndex(w.kindFilter()->findData(int(RunErrorKind::FalsePositive)));
    REQUIRE(w.errorModel()->rowCount() == 1);
    QTableView *view = w.errorView();
    const QRect cellRect = view->visualRect(w.errorModel()->index(0, RunErrorModel::KindColumn));
    REQUIRE(cellRect.isValid());
    // A real double-click: press and release, then the double-click event (QTest sends only
    // the latter, and the view opens only the item that was pressed).
    QTest::mouseClick(view->viewport(), Qt::LeftButton, {}, cellRect.center());
    QTest::mouseDClick(view->viewport(), Qt::LeftButton, {}, cellRect.center());

    RunPassageWindow *passage = w.passageWindow();
    REQUIRE(passage->isVisible());
    CHECK(passage->currentOutcome() == w.errorModel()->outcomeIndex(0));
    CHECK(passage->summary().contains(QStringLiteral("False positive")));
    // The passage banded is the false positive's; every error of hb-01 is marked.
    const auto &marked = passage->markedOutcomes();
    REQUIRE(passage->view()->currentPassage() >= 0);
    const RunErrors &errors = *w.errorModel()->errors();
    const int expected = int(std::ranges::count_if(errors.outcomes,
        [&](const RunSpanOutcome &o) { return o.article == f.article && o.isError(); }));
    CHECK(int(marked.size()) == expected);
    CHECK(errors.outcomes[std::size_t(marked[std::size_t(passage->view()->currentPassage())])]
              .predicted->range
        == f.falsePositive);
    CHECK(passage->windowTitle().contains(QStringLiteral("hb-01")));

    // Next / Previous error steps through the article's errors and selects each in the list.
    if (marked.size() > 1) {
        const int before = passage->view()->currentPassage();
        const int next = before + 1 < int(marked.size()) ? before + 1 : before - 1;
        w.kindFilter()->setCurrentIndex(0);
        auto *button = passage->findChild<QPushButton *>(
            next > before ? QStringLiteral("nextError") : QStringLiteral("previousError"));
        REQUIRE(button);
        REQUIRE(button->isEnabled());
        QTest::mouseClick(button, Qt::LeftButton);
        CHECK(passage->view()->currentPassage() == next);
        const QModelIndexList rows = view->selectionModel()->selectedRows();
        REQUIRE(rows.size() == 1);
        CHECK(w.errorModel()->outcomeIndex(rows.front().row()) == marked[std::size_t(next)]);
    }
}

TEST_CASE("a coder as reference and another match mode recompute the errors", "[runsgui]")
{
    PlantedRun f;
    ExtractorWindow w(*f.project);
    openPlanted(w);
    w.setReference(LayerSpec {LayerKind::Coder, QStringLiteral("C01")});
    QTest::qWait(10);
    waitFor(w);
    REQUIRE(w.currentRun());
    REQUIRE(w.currentRun()->errors);
    CHECK(w.currentRun()->errors->against.key() == QStringLiteral("coder:C01"));
    w.setMatchMode(reliability::MatchMode::Partial);
    QTest::qWait(10);
    waitFor(w);
    CHECK(w.currentRun()->errors->mode == reliability::MatchMode::Partial);
    CHECK(w.currentRun()->scores->mode == reliability::MatchMode::Partial);
}

// Not a check: writes the screenshots of the manual. Run by hand with
//   FOURFOLD_SCREENSHOT_PROJECT=project FOURFOLD_SCREENSHOT_DIR=dir
//   [FOURFOLD_SCREENSHOT_RUNS=position,cues] extractor_window_tests "[.screenshots]"
TEST_CASE("screenshots of the extractor window", "[.screenshots]")
{
    const QString path = qEnvironmentVariable("FOURFOLD_SCREENSHOT_PROJECT");
    const QString out = qEnvironmentVariable("FOURFOLD_SCREENSHOT_DIR");
    REQUIRE_FALSE(path.isEmpty());
    REQUIRE_FALSE(out.isEmpty());
    auto p = Project::open(path);
    REQUIRE(p);
    ExtractorWindow w(*p);
    activate(w);
    w.resize(1400, 820);
    waitFor(w);
    // The runs named in FOURFOLD_SCREENSHOT_RUNS (comma-separated, the first current), or every
    // run side by side with the newest current.
    QStringList runs =
        qEnvironmentVariable("FOURFOLD_SCREENSHOT_RUNS").split(u',', Qt::SkipEmptyParts);
    if (runs.isEmpty())
        for (int row = 0; row < w.runTable()->rowCount(); ++row)
            runs << w.runTable()->item(row, 0)->text();
    w.selectRuns(runs);
    QTest::qWait(10);
    waitFor(w);
    QTest::qWait(100);
    REQUIRE(w.grab().save(QDir(out).filePath(QStringLiteral("extractor-scores.png"))));
    w.tabs()->setCurrentIndex(1);
    QTest::qWait(100);
    REQUIRE(w.grab().save(QDir(out).filePath(QStringLiteral("extractor-errors.png"))));
    w.tabs()->setCurrentIndex(2);
    QTest::qWait(100);
    REQUIRE(w.grab().save(QDir(out).filePath(QStringLiteral("extractor-confusion.png"))));
    w.tabs()->setCurrentIndex(1);
    int row = 0;
    for (int r = 0; r < w.errorModel()->rowCount(); ++r)
        if (w.errorModel()->outcome(r)->kind == RunErrorKind::WrongFunction
            || w.errorModel()->outcome(r)->kind == RunErrorKind::Boundary) {
            row = r;
            break;
        }
    REQUIRE(w.openError(row));
    w.passageWindow()->resize(1100, 700);
    QTest::qWait(200);
    REQUIRE(w.passageWindow()->grab().save(
        QDir(out).filePath(QStringLiteral("extractor-passage.png"))));
}
