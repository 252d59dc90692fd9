// The reliability window on a generated project with planted problems: the computation runs on
// a worker thread, the table and diagnostics show the planted coder and article first, the
// figures equal those of the core computed directly, and a running computation can be
// cancelled.

#include "app/desktop/reliability/matrix_view.h"
#include "app/desktop/reliability/reliability_window.h"
#include "app/desktop/reliability/report_options_dialog.h"
#include "core/agreement/agreement_report.h"
#include "tests/agreement/planted_project.h"
#include "tests/project/double_coded_project.h"

#include <QCheckBox>
#include <QLabel>
#include <QProgressBar>
#include <QSignalSpy>
#include <QTabWidget>
#include <QTableWidget>
#include <QtCharts/QChart>
#include <QtCharts/QChartView>
#include <QtCharts/QLegend>
#include <QtCharts/QLegendMarker>

#include <algorithm>
#include <set>

using namespace fourfold;
using namespace fourfold::test;

namespace {

ReliabilityRequest plantedRequest()
{
    ReliabilityRequest r;
    r.unit = UnitKind::Sentence;
    r.functions = {kFramingFunctions.begin(), kFramingFunctions.end()};
    r.phase = Phase::Reliability;
    r.bootstrapReplicates = 500;
    r.period = PeriodKind::Batch;
    r.batchSize = 2;
    return r;
}

bool computeAndWait(ReliabilityWindow &w)
{
    QSignalSpy spy(&w, &ReliabilityWindow::computed);
    w.compute();
    REQUIRE(spy.wait(60000));
    return spy.front().front().toBool();
}

QString cell(QTableWidget *t, int row, int column)
{
    const QTableWidgetItem *i = t->item(row, column);
    return i ? i->text() : QString();
}

} // namespace

TEST_CASE("the reliability window shows the planted bad coder, article and habits")
{
    PlantedProject p;
    ReliabilityWindow w(p.project);
    w.setRequest(plantedRequest());
    CHECK(w.request().functions.size() == 4);
    CHECK(w.request().phase == Phase::Reliability);
    REQUIRE(computeAndWait(w));
    REQUIRE(w.outcome());
    CHECK_FALSE(w.isRunning());

    // Table: a column per function and one for the four as sets.
    QTableWidget *t = w.summaryTable();
    REQUIRE(t->columnCount() == 6);
    CHECK(t->horizontalHeaderItem(2)->text() == QStringLiteral("Cause"));
    // Cause alpha, recomputed directly by the core from a unit table of cause spans.
    UnitSelection cause;
    cause.unit = UnitKind::Sentence;
    cause.function = FramingFunction::Cause;
    cause.phase = Phase::Reliability;
    auto table = unitTable(p.project, cause);
    REQUIRE(table);
    auto encoded = encodeTable(*table, EncodingOptions {});
    REQUIRE(encoded);
    const auto alpha = reliability::krippendorffAlpha(encoded->data, encoded->metric);
    REQUIRE(alpha.value);
    CHECK(
        cell(t, 0, 2) == QStringLiteral("%1 (nominal)").arg(QString::number(*alpha.value, 'f', 3)));
    // Krippendorff (2004, §12.2): 0.800 and 0.667.
    CHECK(cell(t, 3, 2)
        == (*alpha.value >= 0.8         ? QStringLiteral("reliable (≥ 0.800)")
                : *alpha.value >= 0.667 ? QStringLiteral("tentative (≥ 0.667)")
                                        : QStringLiteral("unreliable (< 0.667)")));
    // Remedy: everyone agrees on every normal article, and a5 has no remedy: alpha is 1.
    CHECK(cell(t, 0, 4) == QStringLiteral("1.000 (nominal)"));
    // The interval comes from the bootstrap with its q(α < 0.800).
    CHECK(cell(t, 1, 2).startsWith(QLatin1Char('[')));
    CHECK_FALSE(cell(t, 2, 2).isEmpty());
    // Six coder pairs, each with Cohen's kappa.
    CHECK(cell(t, 6, 0) == QStringLiteral("Cohen's kappa C01 × C02"));
    CHECK(cell(t, 11, 0) == QStringLiteral("Cohen's kappa C03 × C04"));

    // Krippendorff's minimum for the rarest value (Krippendorff 2004, §11.4): 36 sentences × 4
    // coders are too few for cause, present in one sentence of six.
    const AgreementReport &causeReport = w.outcome()->columns[1].report;
    REQUIRE(causeReport.minimumValues);
    CHECK(causeReport.alpha.pairableValues == 144);
    CHECK(*causeReport.minimumValues > 144);
    CHECK(cell(t, 12, 0) == QStringLiteral("Pairable values"));
    CHECK(cell(t, 12, 2) == QStringLiteral("144"));
    CHECK(cell(t, 15, 2) == QString::number(*causeReport.minimumValues));
    CHECK(cell(t, 16, 2) == QStringLiteral("below the minimum"));

    // Diagnostics: the planted coder, article and boundary habit come first.
    CHECK(cell(w.coderCostTable(), 0, 0) == QStringLiteral("C02"));
    CHECK(cell(w.articleCostTable(), 0, 0) == QStringLiteral("a5"));
    CHECK(cell(w.articleCostTable(), 0, 1) == QStringLiteral("Piece 5"));
    CHECK(cell(w.articleCostTable(), 0, 4) == QStringLiteral("6"));
    CHECK(cell(w.boundaryTable(), 0, 0) == QStringLiteral("C04"));
    CHECK(cell(w.boundaryTable(), 0, 2) == QStringLiteral("+10.0 ± 0.0"));
    CHECK(cell(w.boundaryTable(), 0, 7) == QStringLiteral("spans systematically longer"));
    // The change shown is the core's leave-one-out figure.
    REQUIRE(w.outcome()->articleCosts.front().change);
    CHECK(cell(w.articleCostTable(), 0, 3)
        == QString::asprintf("%+.3f", *w.outcome()->articleCosts.front().change));

    // Confusion: C02's problem against the others' cause, 15 times (see diagnostics_test).
    REQUIRE(w.confusionMap()->rowCount() == 4);
    CHECK(w.confusionMap()->text(1, 0) == QStringLiteral("15"));
    CHECK(w.confusionMap()->text(0, 4) == QStringLiteral("12"));
    // Coder pairs: Cohen's kappa of the sets column, both halves of the map.
    const AgreementReport &sets = w.outcome()->columns.back().report;
    REQUIRE(sets.pairs.size() == 6);
    REQUIRE(sets.pairs[1].coderB == 2);
    REQUIRE(sets.pairs[1].cohenKappa.value);
    const QString kappa = QString::number(*sets.pairs[1].cohenKappa.value, 'f', 2);
    CHECK(w.pairMap()->text(0, 2) == kappa);
    CHECK(w.pairMap()->text(2, 0) == kappa);
    CHECK(w.pairMap()->text(1, 1) == QStringLiteral("—"));

    // Charts: a point per column plus whiskers; alpha over three batches of two articles.
    CHECK(w.functionChart()->chart()->series().size() >= 6 + 2);
    REQUIRE(w.outcome()->periods.size() == 3);
    CHECK(w.tabs()->count() == 6);

    // Each reference line (Krippendorff 2004, §12.2: 0.800 and 0.667) has a legend marker of its
    // own, drawn from its line and in a colour of its own; no other series is in the legend.
    for (QChartView *view : {w.functionChart(), w.driftChart()}) {
        QChart *chart = view->chart();
        CHECK(chart->legend()->markerShape() == QLegend::MarkerShapeFromSeries);
        std::vector<QLegendMarker *> shown;
        for (QLegendMarker *m : chart->legend()->markers())
            if (m->isVisible())
                shown.push_back(m);
        REQUIRE(shown.size() == 2);
        CHECK(shown[0]->label().startsWith(QStringLiteral("0.800")));
        CHECK(shown[1]->label().startsWith(QStringLiteral("0.667")));
        CHECK(shown[0]->pen().color() != shown[1]->pen().color());
        CHECK(shown[0]->brush().color() != shown[1]->brush().color());
        CHECK(shown[0]->pen().style() != shown[1]->pen().style());
    }
}

TEST_CASE("the reliability window on the continuum gives unitizing alpha")
{
    PlantedProject p;
    ReliabilityWindow w(p.project);
    ReliabilityRequest r = plantedRequest();
    r.unit = UnitKind::Continuum;
    w.setRequest(r);
    REQUIRE(computeAndWait(w));
    QTableWidget *t = w.summaryTable();
    REQUIRE(t->columnCount() == 6);
    CHECK(t->horizontalHeaderItem(5)->text() == QStringLiteral("All four, pooled"));
    UnitSelection all;
    all.unit = UnitKind::Continuum;
    all.phase = Phase::Reliability;
    auto continuum = continuumData(p.project, all);
    REQUIRE(continuum);
    const auto u = reliability::unitizingAlpha(0, continuum->length, int(continuum->coders.size()),
        continuum->categories, continuum->units, continuum->sectionBreaks);
    REQUIRE(u.overall.value);
    CHECK(cell(t, 0, 5) == QString::number(*u.overall.value, 'f', 3));
    CHECK(cell(w.boundaryTable(), 0, 0) == QStringLiteral("C04"));
}

TEST_CASE("a running computation can be cancelled and keeps the earlier results")
{
    PlantedProject p;
    ReliabilityWindow w(p.project);
    ReliabilityRequest r = plantedRequest();
    r.unit = UnitKind::Token;
    r.bootstrapReplicates = 20000;
    w.setRequest(r);
    QSignalSpy spy(&w, &ReliabilityWindow::computed);
    w.compute();
    CHECK(w.isRunning());
    w.cancel();
    REQUIRE(spy.wait(60000));
    CHECK_FALSE(spy.front().front().toBool());
    CHECK_FALSE(w.outcome());
    CHECK(w.errorMessage() == QStringLiteral("The computation was cancelled."));
    CHECK_FALSE(w.isRunning());
}

TEST_CASE("a selection the unitizer refuses is reported, not thrown")
{
    PlantedProject p;
    ReliabilityWindow w(p.project);
    ReliabilityRequest r = plantedRequest();
    r.coders = QStringList {QStringLiteral("C01")};
    w.setRequest(r);
    CHECK(w.request().coders == QStringList {QStringLiteral("C01")});
    QSignalSpy spy(&w, &ReliabilityWindow::computed);
    w.compute();
    REQUIRE(spy.wait(60000));
    CHECK_FALSE(spy.front().front().toBool());
    CHECK(w.errorMessage().contains(QStringLiteral("at least two coders")));
}

TEST_CASE("the reliability window leaves articles in progress out and names them until ticked")
{
    PlantedProject p;
    // C02 takes a6 back up: started again, not done.
    SetArticleStatusEdit reopened(p.articles[5], p.coders[1], QStringLiteral("started"));
    REQUIRE(p.project.apply(reopened));
    ReliabilityWindow w(p.project);
    w.setRequest(plantedRequest());
    CHECK_FALSE(w.request().includeUnfinished);
    REQUIRE(computeAndWait(w));
    REQUIRE(w.outcome());
    REQUIRE(w.outcome()->leftOut.size() == 1);
    CHECK(w.outcome()->leftOut[0].coder == QStringLiteral("C02"));
    CHECK(w.outcome()->leftOut[0].articles == QStringList {QStringLiteral("a6")});
    const double without = w.outcome()->columns.back().report.alpha.pairableValues;
    bool named = false;
    for (QLabel *l : w.findChildren<QLabel *>())
        named = named || l->text().contains(QStringLiteral("C02: 1 article in progress left out"));
    CHECK(named);

    QCheckBox *box = nullptr;
    for (QCheckBox *b : w.findChildren<QCheckBox *>())
        if (b->text() == QStringLiteral("Count articles in progress"))
            box = b;
    REQUIRE(box);
    box->click();
    CHECK(w.request().includeUnfinished);
    REQUIRE(computeAndWait(w));
    CHECK(w.outcome()->leftOut.empty());
    // a6's six sentences now carry C02's value as well.
    CHECK(w.outcome()->columns.back().report.alpha.pairableValues == without + 6);
}

TEST_CASE("the report dialog starts from the reliability window's choices")
{
    PlantedProject p;
    ReliabilityRequest r = plantedRequest();
    r.unit = UnitKind::Paragraph;
    r.coders = {QStringLiteral("C01"), QStringLiteral("C03")};
    r.includeUnfinished = true;
    r.seed = 42;
    const ReportOptions o = reportOptionsFor(r);
    CHECK(o.unit == UnitKind::Paragraph);
    CHECK(o.phase == Phase::Reliability);
    CHECK(o.coders == r.coders);
    CHECK(o.bootstrapReplicates == 500);
    CHECK(o.seed == 42);
    CHECK(o.includeUnfinished);
    // A unit the report does not take falls back to sentences.
    r.unit = UnitKind::Continuum;
    CHECK(reportOptionsFor(r).unit == UnitKind::Sentence);

    ReportOptionsDialog dialog(p.project);
    // Every coder finished something: all ticked, which is the report's default (no list).
    CHECK(dialog.options().coders.isEmpty());
    CHECK_FALSE(dialog.options().includeUnfinished);
    dialog.setOptions(o);
    const ReportOptions back = dialog.options();
    CHECK(back.unit == UnitKind::Paragraph);
    CHECK(back.phase == Phase::Reliability);
    CHECK(back.coders == o.coders);
    CHECK(back.bootstrapReplicates == 500);
    CHECK(back.seed == 42);
    CHECK(back.includeUnfinished);
}

TEST_CASE("the window lists the 200 costliest articles of a larger study and says so")
{
    // 210 double-coded articles: every one has a leave-one-out cost, the table shows the first
    // 200 of the core's list (costliest first) and its heading gives both numbers.
    DoubleCodedProject p(210);
    ReliabilityWindow w(p.project);
    ReliabilityRequest r = w.request();
    r.unit = UnitKind::Sentence;
    r.functions = {FramingFunction::Problem, FramingFunction::Cause, FramingFunction::Remedy};
    r.bootstrapReplicates = 0;
    w.setRequest(r);
    REQUIRE(computeAndWait(w));
    REQUIRE(w.outcome()->articleCosts.size() == 210);
    QTableWidget *t = w.articleCostTable();
    CHECK(t->rowCount() == 200);
    CHECK(cell(t, 0, 0) == w.outcome()->articleCosts.front().name);
    CHECK(cell(t, 199, 0) == w.outcome()->articleCosts[199].name);
    bool headed = false;
    for (const QLabel *l : w.findChildren<QLabel *>())
        headed = headed
            || l->text() == QStringLiteral("Alpha without each article: the 200 costliest of 210");
    CHECK(headed);
}

TEST_CASE("the reliability window's progress bar moves step by step while it computes")
{
    // The job reports each analysis and each diagnostic as a step (ReliabilityJob): the bar
    // takes several values on its way to its maximum, not only "busy" and "done".
    PlantedProject p;
    ReliabilityWindow w(p.project);
    w.setRequest(plantedRequest());
    auto *bar = w.findChild<QProgressBar *>();
    REQUIRE(bar);
    std::vector<int> values;
    QObject::connect(bar, &QProgressBar::valueChanged, [&](int v) {
        if (bar->maximum() > 0)
            values.push_back(v);
    });
    REQUIRE(computeAndWait(w));
    // Five analyses (four functions and the sets) and four diagnostic steps.
    REQUIRE(values.size() >= 3);
    CHECK(std::is_sorted(values.begin(), values.end()));
    CHECK(values.front() < values.back());
    CHECK(std::set<int>(values.begin(), values.end()).size() >= 3);
}
