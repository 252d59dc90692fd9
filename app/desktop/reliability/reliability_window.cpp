#include "app/desktop/reliability/reliability_window.h"

#include "app/colour/colour.h"
#include "app/desktop/function_style.h"
#include "app/desktop/reliability/matrix_view.h"
#include "core/project/project.h"

#include <QCheckBox>
#include <QComboBox>
#include <QFormLayout>
#include <QHeaderView>
#include <QLabel>
#include <QListWidget>
#include <QProgressBar>
#include <QPushButton>
#include <QScrollArea>
#include <QSpinBox>
#include <QSplitter>
#include <QTabWidget>
#include <QTableWidget>
#include <QVBoxLayout>
#include <QtCharts/QCategoryAxis>
#include <QtCharts/QChart>
#include <QtCharts/QChartView>
#include <QtCharts/QLegend>
#include <QtCharts/QLegendMarker>
#include <QtCharts/QLineSeries>
#include <QtCharts/QScatterSeries>
#include <QtCharts/QValueAxis>
#include <QtConcurrent/QtConcurrentRun>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

const QColor kSetsColour(0x44, 0x44, 0x44);
const QColor kWarningColour(0xA3, 0x4A, 0x00);

QString fixed(const std::optional<double> &v, int decimals = 3)
{
    return v ? QString::number(*v, 'f', decimals) : QStringLiteral("–");
}

QString signedFixed(const std::optional<double> &v)
{
    return v ? QString::asprintf("%+.3f", *v) : QStringLiteral("–");
}

QTableWidgetItem *item(const QString &text, Qt::Alignment align = Qt::AlignLeft | Qt::AlignVCenter)
{
    auto *i = new QTableWidgetItem(text);
    i->setFlags(Qt::ItemIsEnabled | Qt::ItemIsSelectable);
    i->setTextAlignment(align);
    return i;
}

QTableWidgetItem *number(const QString &text)
{
    return item(text, Qt::AlignRight | Qt::AlignVCenter);
}

// The most rows of the table of articles' leave-one-out costs.
constexpr std::size_t kArticleCostRows = 200;

QTableWidget *makeTable(QWidget *parent)
{
    auto *t = new QTableWidget(parent);
    t->verticalHeader()->setVisible(false);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->setSelectionBehavior(QAbstractItemView::SelectRows);
    t->setAlternatingRowColors(true);
    t->horizontalHeader()->setStretchLastSection(true);
    return t;
}

QLabel *note(const QString &text, QWidget *parent)
{
    auto *l = new QLabel(text, parent);
    l->setWordWrap(true);
    QFont f = l->font();
    f.setPointSizeF(f.pointSizeF() * 0.9);
    l->setFont(f);
    l->setForegroundRole(QPalette::PlaceholderText);
    return l;
}

QScatterSeries::MarkerShape markerShape(const std::optional<FramingFunction> &f)
{
    // Shape as well as colour, so the chart reads without colour.
    if (!f)
        return QScatterSeries::MarkerShapeRotatedRectangle;
    switch (*f) {
    case FramingFunction::Problem:
        return QScatterSeries::MarkerShapeCircle;
    case FramingFunction::Cause:
        return QScatterSeries::MarkerShapeRectangle;
    case FramingFunction::Evaluation:
        return QScatterSeries::MarkerShapeTriangle;
    case FramingFunction::Remedy:
        return QScatterSeries::MarkerShapeStar;
    }
    return QScatterSeries::MarkerShapeCircle;
}

// The property that marks a reference line among a chart's series (its alpha).
constexpr const char *kThresholdProperty = "fourfoldThreshold";

// Horizontal reference lines at 0.800 and 0.667 across [from, to], named for the legend. Each has
// a colour of its own (violet and grey, apart from the functions' colours and the dark grey of
// the four as sets) and a line pattern of its own, so that its legend marker, drawn with the
// line's pen, tells the two apart on screen and in print.
void addThresholds(QChart *chart, double from, double to, QAbstractAxis *x, QAbstractAxis *y)
{
    const struct {
        double value;
        QString name;
        QColor colour;
        Qt::PenStyle style;
    } lines[] = {
        {kAlphaReliable, ReliabilityWindow::tr("0.800: rely on the variable"),
            QColor(0x5A, 0x3A, 0x8C), Qt::SolidLine},
        {kAlphaTentative, ReliabilityWindow::tr("0.667: tentative conclusions only"),
            QColor(0x85, 0x8B, 0x94), Qt::DashLine},
    };
    for (const auto &l : lines) {
        auto *s = new QLineSeries(chart);
        s->setName(l.name);
        s->setProperty(kThresholdProperty, l.value);
        s->append(from, l.value);
        s->append(to, l.value);
        QPen pen(l.colour);
        pen.setWidthF(2);
        pen.setStyle(l.style);
        s->setPen(pen);
        chart->addSeries(s);
        s->attachAxis(x);
        s->attachAxis(y);
    }
}

// Hides the legend entries of every series but the reference lines, whose markers show their
// own line.
void legendForThresholdsOnly(QChart *chart)
{
    for (QLegendMarker *m : chart->legend()->markers()) {
        const bool threshold = m->series()->property(kThresholdProperty).isValid();
        m->setVisible(threshold);
        // The marker is drawn with its line's own pen: colour and pattern.
        if (auto *line = qobject_cast<QLineSeries *>(m->series()); line && threshold)
            m->setPen(line->pen());
    }
    chart->legend()->setMarkerShape(QLegend::MarkerShapeFromSeries);
    chart->legend()->setAlignment(Qt::AlignBottom);
}

// The alpha axis from a tenth below the lowest figure (at most 0.6, so the two reference lines
// always show) to 1, with a labelled tick every 0.1.
void setAlphaRange(QValueAxis *y, double lowest)
{
    const double bottom = std::floor(std::min(0.6, lowest - 0.05) * 10.0) / 10.0;
    y->setRange(bottom, 1.0);
    y->setTickCount(int(std::lround((1.0 - bottom) * 10.0)) + 1);
    y->setLabelFormat(QStringLiteral("%.1f"));
}

// A short verdict for the table (Krippendorff 2004, §12.2).
QString shortVerdict(const std::optional<double> &alpha)
{
    switch (alphaBand(alpha)) {
    case AlphaBand::Undefined:
        return ReliabilityWindow::tr("undefined");
    case AlphaBand::Reliable:
        return ReliabilityWindow::tr("reliable (≥ 0.800)");
    case AlphaBand::Tentative:
        return ReliabilityWindow::tr("tentative (≥ 0.667)");
    case AlphaBand::Unreliable:
        break;
    }
    return ReliabilityWindow::tr("unreliable (< 0.667)");
}

} // namespace

ReliabilityWindow::ReliabilityWindow(Project &project, QWidget *parent)
    : QWidget(parent, parent ? Qt::Widget : Qt::Window)
    , m_project(project)
    , m_projectPath(project.path())
{
    setWindowTitle(tr("Reliability — %1").arg(project.settings().name));
    if (auto articles = project.articles())
        for (const ArticleSummary &a : *articles)
            m_articleTitles.insert(a.externalId, a.title);

    auto *splitter = new QSplitter(Qt::Horizontal, this);
    auto *panel = new QWidget(splitter);
    buildControls(panel);

    auto *right = new QWidget(splitter);
    auto *rightLayout = new QVBoxLayout(right);
    rightLayout->setContentsMargins(0, 0, 0, 0);
    m_warning = new QLabel(right);
    m_warning->setWordWrap(true);
    m_warning->setVisible(false);
    m_warning->setStyleSheet(QStringLiteral(
        "QLabel { background: #FFF4E5; border-left: 4px solid #A34A00; padding: 6px; }"));
    rightLayout->addWidget(m_warning);
    m_tabs = new QTabWidget(right);
    rightLayout->addWidget(m_tabs, 1);

    // 0: the table.
    auto *tablePage = new QWidget(m_tabs);
    auto *tableLayout = new QVBoxLayout(tablePage);
    m_summary = makeTable(tablePage);
    m_summary->setSelectionBehavior(QAbstractItemView::SelectItems);
    tableLayout->addWidget(m_summary, 1);
    tableLayout->addWidget(note(tr("Alpha: Krippendorff's alpha, coincidence form (Krippendorff "
                                   "2011). Interval: 95% bootstrap, units resampled "
                                   "(percentile; the pair interval of Hayes & Krippendorff 2007 "
                                   "is in the report, and it is too narrow with more than two "
                                   "coders); q(α < 0.800): share of replicates below 0.800. "
                                   "Verdict: Krippendorff (2004, §12.2). "
                                   "Minimum values: Krippendorff (2004, §11.4) after Bloch & "
                                   "Kraemer (1989), for the rarest value at p = 0.05. Cohen's "
                                   "kappa per pair over the units both coded (Cohen 1960); "
                                   "Fleiss' kappa (Fleiss 1971) needs every coder on every unit."),
        tablePage));
    m_tabs->addTab(tablePage, tr("Table"));

    // 1: diagnostics.
    auto *diagScroll = new QScrollArea(m_tabs);
    diagScroll->setWidgetResizable(true);
    auto *diagPage = new QWidget(diagScroll);
    auto *diag = new QVBoxLayout(diagPage);
    auto heading = [&](const QString &text) {
        auto *l = new QLabel(text, diagPage);
        QFont f = l->font();
        f.setBold(true);
        l->setFont(f);
        diag->addWidget(l);
    };
    heading(tr("Alpha without each coder"));
    m_coderCosts = makeTable(diagPage);
    diag->addWidget(m_coderCosts);
    heading(tr("Alpha without each article (the costliest first)"));
    m_articleCostsHeading = qobject_cast<QLabel *>(diag->itemAt(diag->count() - 1)->widget());
    m_articleCosts = makeTable(diagPage);
    diag->addWidget(m_articleCosts);
    diag->addWidget(note(tr("Change = alpha without it − alpha with everything: positive means "
                            "leaving it out raises alpha, so it costs reliability (leave-one-out, "
                            "common practice). A diagnostic for training and codebook work, not "
                            "a licence to report the higher figure."),
        diagPage));
    heading(tr("Boundary habits on matched spans"));
    m_boundaries = makeTable(diagPage);
    diag->addWidget(m_boundaries);
    diag->addWidget(note(tr("Each span against the other coder's span of the same function that "
                            "overlaps it most; differences are this coder's minus the other's, "
                            "in characters (code points). Systematic: the mean differs from 0 by "
                            "more than two standard errors over at least 5 matches (a rough "
                            "screen, common practice)."),
        diagPage));
    diagScroll->setWidget(diagPage);
    m_tabs->addTab(diagScroll, tr("Diagnostics"));

    // 2–5: charts.
    m_functionChart = new QChartView(new QChart(), m_tabs);
    m_functionChart->setRenderHint(QPainter::Antialiasing);
    m_tabs->addTab(m_functionChart, tr("Alpha per function"));
    m_pairs = new MatrixView(m_tabs);
    m_tabs->addTab(m_pairs, tr("Coder pairs"));
    m_confusion = new MatrixView(m_tabs);
    m_tabs->addTab(m_confusion, tr("Function confusion"));
    m_driftChart = new QChartView(new QChart(), m_tabs);
    m_driftChart->setRenderHint(QPainter::Antialiasing);
    m_tabs->addTab(m_driftChart, tr("Alpha over time"));

    splitter->setStretchFactor(0, 0);
    splitter->setStretchFactor(1, 1);
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(6, 6, 6, 6);
    layout->addWidget(splitter);
    resize(1280, 820);

    connect(&m_watcher, &QFutureWatcherBase::finished, this, &ReliabilityWindow::finish);
    updateControls();
}

ReliabilityWindow::~ReliabilityWindow()
{
    if (m_cancelFlag)
        m_cancelFlag->store(true);
    m_watcher.waitForFinished();
}

void ReliabilityWindow::buildControls(QWidget *panel)
{
    auto *form = new QFormLayout;
    m_unit = new QComboBox(panel);
    const std::pair<UnitKind, QString> units[] = {
        {UnitKind::Article, tr("Article item")},
        {UnitKind::Paragraph, tr("Paragraph")},
        {UnitKind::Sentence, tr("Sentence")},
        {UnitKind::Token, tr("Token (word)")},
        {UnitKind::Continuum, tr("Continuum (spans, unitizing alpha)")},
    };
    for (const auto &[kind, name] : units)
        m_unit->addItem(name, unitKindKey(kind));
    m_unit->setCurrentIndex(2);
    form->addRow(tr("&Unit"), m_unit);

    m_item = new QComboBox(panel);
    if (auto book = m_project.codebook())
        for (const ArticleItem &i : book->items)
            m_item->addItem(i.key, i.key);
    form->addRow(tr("&Item"), m_item);

    auto *functions = new QWidget(panel);
    auto *functionLayout = new QVBoxLayout(functions);
    functionLayout->setContentsMargins(0, 0, 0, 0);
    for (FramingFunction f : kFramingFunctions) {
        const FunctionStyle style = functionStyle(f);
        auto *box = new QCheckBox(
            QStringLiteral("%1  %2").arg(style.letter).arg(functionName(f)), functions);
        box->setChecked(true);
        QPalette pal = box->palette();
        pal.setColor(QPalette::WindowText, style.colour.darker(130));
        box->setPalette(pal);
        functionLayout->addWidget(box);
        m_functions[int(f)] = box;
    }
    form->addRow(tr("Functions"), functions);

    m_coders = new QListWidget(panel);
    m_coders->setMaximumHeight(120);
    QSet<qint64> active;
    bool anyReliability = false;
    if (auto coded = m_project.spanCoderPhases())
        for (const auto &[coder, phase] : *coded) {
            active.insert(coder.value);
            anyReliability = anyReliability || phase == Phase::Reliability;
        }
    if (auto coders = m_project.coders())
        for (const Coder &c : *coders) {
            auto *i =
                new QListWidgetItem(QStringLiteral("%1  %2").arg(c.pseudonym, c.name), m_coders);
            i->setData(Qt::UserRole, c.pseudonym);
            i->setFlags(Qt::ItemIsEnabled | Qt::ItemIsUserCheckable);
            i->setCheckState(active.contains(c.id.value) ? Qt::Checked : Qt::Unchecked);
        }
    form->addRow(tr("&Coders"), m_coders);

    m_phase = new QComboBox(panel);
    m_phase->addItem(tr("All phases"), QString());
    for (Phase p : {Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production})
        m_phase->addItem(phaseKey(p), phaseKey(p));
    m_phase->setCurrentIndex(anyReliability ? m_phase->findData(phaseKey(Phase::Reliability)) : 0);
    form->addRow(tr("&Phase"), m_phase);

    m_gold = new QCheckBox(tr("Gold joins as a coder"), panel);
    form->addRow(QString(), m_gold);
    m_unfinished = new QCheckBox(tr("Count articles in progress"), panel);
    m_unfinished->setToolTip(tr("By default a coder's article counts only once the coder has "
                                "marked it done; tick to count articles still in progress too."));
    form->addRow(QString(), m_unfinished);

    m_replicates = new QSpinBox(panel);
    m_replicates->setRange(0, 100000);
    m_replicates->setSingleStep(1000);
    m_replicates->setValue(2000);
    m_replicates->setSpecialValueText(tr("none"));
    form->addRow(tr("&Bootstrap"), m_replicates);

    m_period = new QComboBox(panel);
    m_period->addItem(tr("Batches of articles"), int(PeriodKind::Batch));
    m_period->addItem(tr("Weeks"), int(PeriodKind::Week));
    form->addRow(tr("&Drift by"), m_period);
    m_batchSize = new QSpinBox(panel);
    m_batchSize->setRange(1, 1000);
    m_batchSize->setValue(3);
    m_batchSize->setSuffix(tr(" articles"));
    form->addRow(tr("Batch &size"), m_batchSize);

    m_compute = new QPushButton(tr("Co&mpute"), panel);
    m_compute->setDefault(true);
    m_cancel = new QPushButton(tr("Cancel"), panel);
    m_progress = new QProgressBar(panel);
    m_progress->setTextVisible(true);
    m_message = new QLabel(panel);
    m_message->setWordWrap(true);
    m_message->setTextFormat(
        Qt::PlainText); // pseudonyms and errors are shown, never read as markup
    m_message->setTextInteractionFlags(Qt::TextSelectableByMouse);

    auto *buttons = new QHBoxLayout;
    buttons->addWidget(m_compute);
    buttons->addWidget(m_cancel);
    auto *layout = new QVBoxLayout(panel);
    layout->addLayout(form);
    layout->addLayout(buttons);
    layout->addWidget(m_progress);
    layout->addWidget(m_message);
    layout->addStretch(1);
    panel->setMinimumWidth(280);
    panel->setMaximumWidth(360);

    connect(m_unit, &QComboBox::currentIndexChanged, this, &ReliabilityWindow::updateControls);
    connect(m_period, &QComboBox::currentIndexChanged, this, &ReliabilityWindow::updateControls);
    connect(m_compute, &QPushButton::clicked, this, &ReliabilityWindow::compute);
    connect(m_cancel, &QPushButton::clicked, this, &ReliabilityWindow::cancel);
}

void ReliabilityWindow::updateControls()
{
    const bool article = m_unit->currentData().toString() == unitKindKey(UnitKind::Article);
    m_item->setEnabled(article && m_item->count() > 0);
    for (QCheckBox *box : m_functions)
        box->setEnabled(!article);
    m_batchSize->setEnabled(m_period->currentData().toInt() == int(PeriodKind::Batch));
    const bool running = isRunning();
    m_compute->setEnabled(!running);
    m_cancel->setEnabled(running);
    m_progress->setVisible(running);
}

ReliabilityRequest ReliabilityWindow::request() const
{
    ReliabilityRequest r;
    r.projectPath = m_projectPath;
    r.unit = unitKindFromKey(m_unit->currentData().toString()).value_or(UnitKind::Sentence);
    for (FramingFunction f : kFramingFunctions)
        if (m_functions[int(f)]->isChecked())
            r.functions.push_back(f);
    for (int i = 0; i < m_coders->count(); ++i)
        if (m_coders->item(i)->checkState() == Qt::Checked)
            r.coders << m_coders->item(i)->data(Qt::UserRole).toString();
    r.phase = phaseFromKey(m_phase->currentData().toString());
    if (m_item->count() > 0)
        r.item = m_item->currentData().toString();
    r.includeGold = m_gold->isChecked();
    r.includeUnfinished = m_unfinished->isChecked();
    r.bootstrapReplicates = m_replicates->value();
    r.period = PeriodKind(m_period->currentData().toInt());
    r.batchSize = m_batchSize->value();
    return r;
}

void ReliabilityWindow::setRequest(const ReliabilityRequest &r)
{
    m_unit->setCurrentIndex(std::max(0, m_unit->findData(unitKindKey(r.unit))));
    for (FramingFunction f : kFramingFunctions)
        m_functions[int(f)]->setChecked(
            std::find(r.functions.begin(), r.functions.end(), f) != r.functions.end());
    for (int i = 0; i < m_coders->count(); ++i) {
        const QString pseudonym = m_coders->item(i)->data(Qt::UserRole).toString();
        if (!r.coders.isEmpty())
            m_coders->item(i)->setCheckState(
                r.coders.contains(pseudonym) ? Qt::Checked : Qt::Unchecked);
    }
    m_phase->setCurrentIndex(
        std::max(0, m_phase->findData(r.phase ? phaseKey(*r.phase) : QString())));
    if (int i = m_item->findData(r.item); i >= 0)
        m_item->setCurrentIndex(i);
    m_gold->setChecked(r.includeGold);
    m_unfinished->setChecked(r.includeUnfinished);
    m_replicates->setValue(r.bootstrapReplicates);
    m_period->setCurrentIndex(std::max(0, m_period->findData(int(r.period))));
    m_batchSize->setValue(r.batchSize);
    updateControls();
}

bool ReliabilityWindow::isRunning() const
{
    return m_watcher.isRunning();
}

void ReliabilityWindow::compute()
{
    if (isRunning()) {
        cancel();
        m_watcher.waitForFinished();
    }
    m_running = request();
    m_cancelFlag = std::make_shared<std::atomic<bool>>(false);
    auto flag = m_cancelFlag;
    // The progress callback runs on the worker thread: it only posts to the window's thread and
    // reads the cancel flag. The destructor waits for the worker, so `this` outlives it.
    JobProgress progress = [this, flag](int done, int total) {
        QMetaObject::invokeMethod(
            this, [this, done, total] { showProgress(done, total); }, Qt::QueuedConnection);
        return !flag->load();
    };
    m_progress->setRange(0, 0);
    m_message->setText(tr("Computing…"));
    m_watcher.setFuture(QtConcurrent::run(
        [request = m_running, progress] { return runReliabilityJob(request, progress); }));
    updateControls();
}

void ReliabilityWindow::cancel()
{
    if (m_cancelFlag)
        m_cancelFlag->store(true);
    m_message->setText(tr("Cancelling after the current step…"));
}

void ReliabilityWindow::showProgress(int done, int total)
{
    if (!isRunning())
        return;
    m_progress->setRange(0, total);
    m_progress->setValue(done);
}

void ReliabilityWindow::finish()
{
    Result<ReliabilityOutcome> result = m_watcher.result();
    if (!result) {
        m_error = result.error().message;
        m_message->setText(result.error().code == ErrorCode::Cancelled
                ? tr("Cancelled; the results shown are from before.")
                : result.error().message);
    } else {
        m_error.clear();
        m_outcome = std::move(*result);
        QStringList lines {tr("%n coder(s) compared.", nullptr, int(m_outcome->coders.size()))};
        lines << leftOutLines(m_outcome->leftOut);
        m_message->setText(lines.join(QLatin1Char('\n')));
        showOutcome();
    }
    updateControls();
    Q_EMIT computed(bool(result));
}

QString ReliabilityWindow::columnTitle(const ReliabilityColumn &column) const
{
    if (column.function)
        return functionName(*column.function);
    if (m_running.unit == UnitKind::Article)
        return m_running.item;
    return tr("Chosen functions (sets)");
}

void ReliabilityWindow::showOutcome()
{
    if (m_outcome->unitizing)
        showContinuumSummary();
    else
        showSummary();
    showDiagnostics();
    showFunctionChart();
    showPairs();
    showConfusion();
    showDrift();
}

void ReliabilityWindow::showSummary()
{
    const ReliabilityOutcome &o = *m_outcome;
    QStringList rows {tr("Alpha"), tr("95% interval (units resampled)"), tr("q(α < 0.800)"),
        tr("Verdict"), tr("Percent agreement"), tr("Fleiss' kappa")};
    const int pairRow = int(rows.size());
    const std::vector<PairAgreement> &pairs = o.columns.front().report.pairs;
    for (const PairAgreement &p : pairs)
        rows << tr("Cohen's kappa %1 × %2").arg(o.coders.value(p.coderA), o.coders.value(p.coderB));
    const int sizeRow = int(rows.size());
    rows << tr("Pairable values") << tr("Pairable units") << tr("Rarest value")
         << tr("Minimum values (α ≥ 0.800)") << tr("Sample");

    m_summary->clear();
    m_summary->setRowCount(int(rows.size()));
    m_summary->setColumnCount(int(o.columns.size()) + 1);
    QStringList headers {tr("Statistic")};
    for (const ReliabilityColumn &c : o.columns)
        headers << columnTitle(c);
    m_summary->setHorizontalHeaderLabels(headers);
    for (int r = 0; r < rows.size(); ++r)
        m_summary->setItem(r, 0, item(rows[r]));

    QStringList tooSmall;
    for (int c = 0; c < int(o.columns.size()); ++c) {
        const ReliabilityColumn &column = o.columns[size_t(c)];
        const AgreementReport &rep = column.report;
        if (column.function)
            m_summary->horizontalHeaderItem(c + 1)->setForeground(
                functionStyle(*column.function).colour.darker(130));
        const int col = c + 1;
        m_summary->setItem(0, col,
            number(rep.alpha.value
                    ? QStringLiteral("%1 (%2)").arg(fixed(rep.alpha.value), rep.scale)
                    : tr("undefined")));
        if (!rep.alpha.value)
            m_summary->item(0, col)->setToolTip(QString::fromStdString(rep.alpha.reason));
        if (rep.unitBootstrap && rep.unitBootstrap->ciLow) {
            const auto &b = *rep.unitBootstrap;
            m_summary->setItem(
                1, col, number(QStringLiteral("[%1, %2]").arg(fixed(b.ciLow), fixed(b.ciHigh))));
            m_summary->item(1, col)->setToolTip(
                tr("%1, %2 replicates, seed %3")
                    .arg(QString::fromLatin1(reliability::bootstrapMethodName(b.method)))
                    .arg(b.replicates)
                    .arg(b.seed));
            for (const auto &[alphaMin, share] : b.qBelow)
                if (qFuzzyCompare(alphaMin, kAlphaReliable))
                    m_summary->setItem(2, col, number(QString::number(share, 'f', 3)));
        } else {
            m_summary->setItem(1, col, number(QStringLiteral("–")));
            m_summary->setItem(2, col, number(QStringLiteral("–")));
        }
        auto *verdict = item(shortVerdict(rep.alpha.value));
        if (rep.alpha.value && *rep.alpha.value < kAlphaTentative)
            verdict->setForeground(kWarningColour);
        m_summary->setItem(3, col, verdict);
        m_summary->setItem(4, col,
            number(rep.percentAgreement.value
                    ? QString::number(*rep.percentAgreement.value * 100.0, 'f', 1)
                        + QLatin1Char('%')
                    : QStringLiteral("–")));
        if (rep.fleissKappa && rep.fleissKappa->value) {
            m_summary->setItem(5, col, number(fixed(rep.fleissKappa->value)));
        } else {
            m_summary->setItem(5, col, number(QStringLiteral("–")));
            m_summary->item(5, col)->setToolTip(rep.fleissKappa
                    ? QString::fromStdString(rep.fleissKappa->reason)
                    : tr("Fleiss' kappa needs every coder on every unit; some cells are missing."));
        }
        for (size_t p = 0; p < rep.pairs.size(); ++p) {
            const PairAgreement &pair = rep.pairs[p];
            m_summary->setItem(pairRow + int(p), col,
                number(QStringLiteral("%1  (%2 units)")
                           .arg(fixed(pair.cohenKappa.value))
                           .arg(pair.units)));
        }
        m_summary->setItem(sizeRow, col, number(QString::number(rep.alpha.pairableValues, 'f', 0)));
        m_summary->setItem(sizeRow + 1, col, number(QString::number(rep.alpha.pairableUnits)));
        m_summary->setItem(sizeRow + 2, col,
            number(rep.rarestProportion
                    ? QString::number(*rep.rarestProportion * 100.0, 'f', 1) + QLatin1Char('%')
                    : QStringLiteral("–")));
        m_summary->setItem(sizeRow + 3, col,
            number(rep.minimumValues ? QString::number(*rep.minimumValues) : QStringLiteral("–")));
        const bool small = rep.minimumValues && rep.alpha.pairableValues < *rep.minimumValues;
        auto *sample = item(small ? tr("below the minimum")
                                  : (rep.minimumValues ? tr("large enough") : QStringLiteral("–")));
        if (small) {
            sample->setForeground(kWarningColour);
            tooSmall << columnTitle(column);
        }
        m_summary->setItem(sizeRow + 4, col, sample);
    }
    m_summary->resizeColumnsToContents();
    // Figures side by side read best in columns of one width.
    int widest = 0;
    for (int c = 1; c < m_summary->columnCount(); ++c)
        widest = std::max(widest, m_summary->columnWidth(c));
    for (int c = 1; c < m_summary->columnCount(); ++c)
        m_summary->setColumnWidth(c, widest);
    m_warning->setVisible(!tooSmall.isEmpty());
    if (!tooSmall.isEmpty())
        m_warning->setText(tr("The sample is smaller than Krippendorff's minimum for the rarest "
                              "value (alpha ≥ 0.800 at p = 0.05) in: %1. Code more units before "
                              "relying on these figures.")
                               .arg(tooSmall.join(QStringLiteral(", "))));
}

void ReliabilityWindow::showContinuumSummary()
{
    const ReliabilityOutcome &o = *m_outcome;
    const reliability::UnitizingResult &u = *o.unitizing;
    std::vector<std::optional<FramingFunction>> columns;
    if (m_running.functions.size() == 1) {
        columns.push_back(m_running.functions.front());
    } else {
        for (FramingFunction f : m_running.functions)
            columns.push_back(f);
        columns.push_back(std::nullopt);
    }
    m_summary->clear();
    const QStringList rows {tr("Unitizing alpha"), tr("Verdict"), tr("Observed disagreement D_o"),
        tr("Expected disagreement D_e"), tr("Continuum")};
    m_summary->setRowCount(int(rows.size()));
    m_summary->setColumnCount(int(columns.size()) + 1);
    QStringList headers {tr("Statistic")};
    for (const auto &f : columns)
        headers << (f ? functionName(*f) : tr("All four, pooled"));
    m_summary->setHorizontalHeaderLabels(headers);
    for (int r = 0; r < rows.size(); ++r)
        m_summary->setItem(r, 0, item(rows[r]));
    for (int c = 0; c < int(columns.size()); ++c) {
        const auto &f = columns[size_t(c)];
        const size_t category = m_running.functions.size() == 1 ? 0 : size_t(f ? int(*f) : 0);
        const reliability::UnitizingCategoryResult &r =
            f && category < u.perCategory.size() ? u.perCategory[category] : u.overall;
        m_summary->setItem(0, c + 1, number(r.value ? fixed(r.value) : tr("undefined")));
        if (!r.value)
            m_summary->item(0, c + 1)->setToolTip(QString::fromStdString(r.reason));
        m_summary->setItem(1, c + 1, item(shortVerdict(r.value)));
        m_summary->setItem(2, c + 1, number(QString::number(r.observedDisagreement, 'g', 4)));
        m_summary->setItem(3, c + 1, number(QString::number(r.expectedDisagreement, 'g', 4)));
        m_summary->setItem(4, c + 1,
            number(
                tr("%1 articles, %2 characters").arg(o.continuumArticles).arg(o.continuumLength)));
    }
    m_summary->resizeColumnsToContents();
    m_warning->setVisible(false);
}

void ReliabilityWindow::showDiagnostics()
{
    const ReliabilityOutcome &o = *m_outcome;
    auto fill = [this](QTableWidget *t, std::vector<LeaveOneOut> entries, bool articles) {
        t->clear();
        // Articles: the costliest ones only (they come costliest first); a study of thousands
        // would fill a table nobody reads, at a cost that grows with every row.
        if (articles) {
            const std::size_t all = entries.size();
            if (all > kArticleCostRows)
                entries.resize(kArticleCostRows);
            m_articleCostsHeading->setText(all > kArticleCostRows
                    ? tr("Alpha without each article: the %1 costliest of %2")
                          .arg(kArticleCostRows)
                          .arg(all)
                    : tr("Alpha without each article (the costliest first)"));
        }
        QStringList headers {articles ? tr("Article") : tr("Coder")};
        if (articles)
            headers << tr("Title");
        headers << tr("Alpha without") << tr("Change") << tr("Units");
        t->setColumnCount(int(headers.size()));
        t->setHorizontalHeaderLabels(headers);
        t->setRowCount(int(entries.size()));
        for (int r = 0; r < int(entries.size()); ++r) {
            const LeaveOneOut &e = entries[size_t(r)];
            int c = 0;
            t->setItem(r, c++, item(e.name));
            if (articles)
                t->setItem(r, c++, item(m_articleTitles.value(e.name)));
            t->setItem(r, c++, number(e.alpha ? fixed(e.alpha) : tr("undefined")));
            if (!e.alpha)
                t->item(r, c - 1)->setToolTip(QString::fromStdString(e.reason));
            auto *change = number(signedFixed(e.change));
            if (e.change && *e.change > 0.005)
                change->setForeground(kWarningColour);
            t->setItem(r, c++, change);
            t->setItem(r, c++, number(QString::number(e.units)));
        }
        t->resizeColumnsToContents();
        t->setMinimumHeight(
            std::min(340, t->horizontalHeader()->height() + 4 + t->verticalHeader()->length()));
    };
    fill(m_coderCosts, o.coderCosts, false);
    fill(m_articleCosts, o.articleCosts, true);

    m_boundaries->clear();
    const QStringList headers {tr("Coder"), tr("Matches"), tr("Length ± SE"), tr("Start"),
        tr("End"), tr("Longer"), tr("Shorter"), tr("Habit")};
    m_boundaries->setColumnCount(int(headers.size()));
    m_boundaries->setHorizontalHeaderLabels(headers);
    const std::vector<BoundaryHabit> none;
    const std::vector<BoundaryHabit> &habits = o.matching ? o.matching->boundaries : none;
    m_boundaries->setRowCount(int(habits.size()));
    for (int r = 0; r < int(habits.size()); ++r) {
        const BoundaryHabit &b = habits[size_t(r)];
        m_boundaries->setItem(r, 0, item(b.coder));
        m_boundaries->setItem(r, 1, number(QString::number(b.matches)));
        m_boundaries->setItem(r, 2,
            number(QStringLiteral("%1 ± %2")
                       .arg(QString::asprintf("%+.1f", b.meanLengthDifference))
                       .arg(b.standardError, 0, 'f', 1)));
        m_boundaries->setItem(r, 3, number(QString::asprintf("%+.1f", b.meanStartDifference)));
        m_boundaries->setItem(r, 4, number(QString::asprintf("%+.1f", b.meanEndDifference)));
        m_boundaries->setItem(
            r, 5, number(QString::number(b.shareLonger * 100.0, 'f', 0) + QLatin1Char('%')));
        m_boundaries->setItem(
            r, 6, number(QString::number(b.shareShorter * 100.0, 'f', 0) + QLatin1Char('%')));
        QString habit;
        if (b.systematic)
            habit = b.meanLengthDifference > 0 ? tr("spans systematically longer")
                                               : tr("spans systematically shorter");
        auto *h = item(habit);
        h->setForeground(kWarningColour);
        m_boundaries->setItem(r, 7, h);
    }
    m_boundaries->resizeColumnsToContents();
    m_boundaries->setMinimumHeight(std::min(240,
        m_boundaries->horizontalHeader()->height() + 4 + m_boundaries->verticalHeader()->length()));
}

void ReliabilityWindow::showFunctionChart()
{
    auto *chart = new QChart();
    chart->setTitle(tr("Alpha per function, with 95% bootstrap intervals"));
    auto *x = new QCategoryAxis(chart);
    x->setLabelsPosition(QCategoryAxis::AxisLabelsPositionOnValue);
    auto *y = new QValueAxis(chart);
    y->setTitleText(tr("Krippendorff's alpha"));
    chart->addAxis(x, Qt::AlignBottom);
    chart->addAxis(y, Qt::AlignLeft);

    struct Point {
        QString label;
        std::optional<FramingFunction> function;
        std::optional<double> alpha, low, high;
    };
    std::vector<Point> points;
    const ReliabilityOutcome &o = *m_outcome;
    if (o.unitizing) {
        const auto &u = *o.unitizing;
        if (m_running.functions.size() == 1) {
            points.push_back(
                {functionName(m_running.functions.front()), m_running.functions.front(),
                    u.perCategory.empty() ? std::nullopt : u.perCategory.front().value, {}, {}});
        } else {
            for (FramingFunction f : m_running.functions)
                points.push_back({functionName(f), f, u.perCategory[size_t(int(f))].value, {}, {}});
            points.push_back({tr("pooled"), std::nullopt, u.overall.value, {}, {}});
        }
    } else {
        for (const ReliabilityColumn &c : o.columns) {
            Point p {columnTitle(c), c.function, c.report.alpha.value, {}, {}};
            if (c.report.unitBootstrap) {
                p.low = c.report.unitBootstrap->ciLow;
                p.high = c.report.unitBootstrap->ciHigh;
            }
            points.push_back(p);
        }
    }
    double lowest = 1.0;
    for (int i = 0; i < int(points.size()); ++i) {
        const Point &p = points[size_t(i)];
        x->append(p.label, i);
        const QColor colour = p.function ? functionStyle(*p.function).colour : kSetsColour;
        if (p.low && p.high) {
            // The whisker and its two caps.
            auto *whisker = new QLineSeries(chart);
            whisker->append(i, *p.low);
            whisker->append(i, *p.high);
            QPen pen(colour);
            pen.setWidthF(2.5);
            whisker->setPen(pen);
            chart->addSeries(whisker);
            whisker->attachAxis(x);
            whisker->attachAxis(y);
            for (double end : {*p.low, *p.high}) {
                auto *cap = new QLineSeries(chart);
                cap->append(i - 0.12, end);
                cap->append(i + 0.12, end);
                cap->setPen(pen);
                chart->addSeries(cap);
                cap->attachAxis(x);
                cap->attachAxis(y);
            }
            lowest = std::min(lowest, *p.low);
        }
        if (p.alpha) {
            auto *dot = new QScatterSeries(chart);
            dot->append(i, *p.alpha);
            dot->setMarkerShape(markerShape(p.function));
            // Triangles and stars fill less of their box than circles and squares.
            const bool sparse = p.function
                && (*p.function == FramingFunction::Evaluation
                    || *p.function == FramingFunction::Remedy);
            dot->setMarkerSize(sparse ? 24 : 16);
            dot->setColor(colour);
            dot->setBorderColor(Qt::white);
            chart->addSeries(dot);
            dot->attachAxis(x);
            dot->attachAxis(y);
            lowest = std::min(lowest, *p.alpha);
        }
    }
    x->setRange(-0.5, std::max(0.5, double(points.size()) - 0.5));
    setAlphaRange(y, lowest);
    addThresholds(chart, -0.5, double(points.size()) - 0.5, x, y);
    legendForThresholdsOnly(chart);
    QChart *old = m_functionChart->chart();
    m_functionChart->setChart(chart);
    delete old;
}

void ReliabilityWindow::showPairs()
{
    const ReliabilityOutcome &o = *m_outcome;
    const int n = int(o.coders.size());
    std::vector<std::optional<double>> shade(size_t(n * n));
    QStringList texts;
    for (int i = 0; i < n * n; ++i)
        texts << QString();
    if (!o.columns.empty()) {
        const AgreementReport &rep = o.columns[size_t(o.mainColumn)].report;
        for (const PairAgreement &p : rep.pairs)
            for (const auto &[r, c] :
                {std::pair(p.coderA, p.coderB), std::pair(p.coderB, p.coderA)}) {
                shade[size_t(r * n + c)] = p.cohenKappa.value;
                texts[r * n + c] = fixed(p.cohenKappa.value, 2);
            }
        for (int i = 0; i < n; ++i)
            texts[i * n + i] = QStringLiteral("—");
        m_pairs->setMatrix(o.coders, o.coders, shade, texts, agreementColour);
        m_pairs->setCaption(tr("Cohen's kappa of each pair of coders over the units both coded "
                               "(%1). Darker: higher agreement; hatched: not defined.")
                                .arg(columnTitle(o.columns[size_t(o.mainColumn)])));
    } else {
        m_pairs->setMatrix(o.coders, o.coders, shade, texts, agreementColour);
        m_pairs->setCaption(tr("Continuum units have no per-pair kappa; see the span agreement "
                               "in the function confusion."));
    }
    m_pairs->setAxisTitles(tr("Coder"), tr("Coder"));
}

void ReliabilityWindow::showConfusion()
{
    const ReliabilityOutcome &o = *m_outcome;
    QStringList rows, columns;
    std::vector<QColor> rowColours, columnColours;
    for (FramingFunction f : kFramingFunctions) {
        rows << functionName(f);
        columns << functionName(f);
        rowColours.push_back(functionStyle(f).colour.darker(130));
        columnColours.push_back(functionStyle(f).colour.darker(130));
    }
    columns << tr("nothing");
    columnColours.push_back(QColor());
    std::vector<std::optional<double>> shade;
    QStringList texts;
    for (int r = 0; r < 4; ++r) {
        double total = 0;
        if (o.matching)
            for (int c = 0; c < FunctionConfusion::kSize; ++c)
                total += o.matching->confusion.at(r, c);
        for (int c = 0; c < FunctionConfusion::kSize; ++c) {
            const double count = o.matching ? o.matching->confusion.at(r, c) : 0;
            shade.push_back(total > 0 ? std::optional<double>(count / total) : std::nullopt);
            texts << QString::number(count, 'f', 0);
        }
    }
    m_confusion->setMatrix(rows, columns, shade, texts, [](double share) {
        return mixColours(QColor(0xF4, 0xF4, 0xF2), QColor(0x5A, 0x3A, 0x8C), share);
    });
    m_confusion->setLabelColours(rowColours, columnColours);
    m_confusion->setAxisTitles(tr("A coder's span"), tr("What another coder gave it"));
    m_confusion->setCaption(tr("Each span of each coder against the best-overlapping span of "
                               "every other coder (both directions of each pair). Darker: a "
                               "larger share of the row. \"nothing\": no overlapping span."));
}

void ReliabilityWindow::showDrift()
{
    const ReliabilityOutcome &o = *m_outcome;
    auto *chart = new QChart();
    const QString analysis =
        o.columns.empty() ? QString() : columnTitle(o.columns[size_t(o.mainColumn)]);
    chart->setTitle(m_running.period == PeriodKind::Week
            ? tr("Alpha by week of first coding — %1").arg(analysis)
            : tr("Alpha by batch of articles, in coding order — %1").arg(analysis));
    auto *x = new QCategoryAxis(chart);
    x->setLabelsPosition(QCategoryAxis::AxisLabelsPositionOnValue);
    auto *y = new QValueAxis(chart);
    y->setTitleText(tr("Krippendorff's alpha"));
    chart->addAxis(x, Qt::AlignBottom);
    chart->addAxis(y, Qt::AlignLeft);
    const QColor colour = !o.columns.empty() && o.columns[size_t(o.mainColumn)].function
        ? functionStyle(*o.columns[size_t(o.mainColumn)].function).colour
        : kSetsColour;
    auto *line = new QLineSeries(chart);
    auto *dots = new QScatterSeries(chart);
    double lowest = 1.0;
    // At most about ten labels on the axis: every period is drawn, every step-th one named.
    const int step = std::max(1, int(std::ceil(double(o.periods.size()) / 10.0)));
    for (int i = 0; i < int(o.periods.size()); ++i) {
        const PeriodAlpha &p = o.periods[size_t(i)];
        if (i % step == 0)
            x->append(p.label, i);
        if (!p.alpha.value)
            continue;
        line->append(i, *p.alpha.value);
        dots->append(i, *p.alpha.value);
        lowest = std::min(lowest, *p.alpha.value);
    }
    QPen pen(colour);
    pen.setWidthF(2);
    line->setPen(pen);
    dots->setColor(colour);
    // A dot per period while they can be told apart; the line alone beyond that.
    dots->setMarkerSize(o.periods.size() <= 60 ? 10 : 0);
    dots->setVisible(o.periods.size() <= 60);
    dots->setBorderColor(Qt::white);
    for (QAbstractSeries *s :
        {static_cast<QAbstractSeries *>(line), static_cast<QAbstractSeries *>(dots)}) {
        chart->addSeries(s);
        s->attachAxis(x);
        s->attachAxis(y);
    }
    const double count = std::max(1.0, double(o.periods.size()));
    x->setRange(-0.5, count - 0.5);
    x->setTitleText(
        m_running.period == PeriodKind::Week ? tr("ISO week") : tr("articles (in coding order)"));
    setAlphaRange(y, lowest);
    addThresholds(chart, -0.5, count - 0.5, x, y);
    legendForThresholdsOnly(chart);
    QChart *old = m_driftChart->chart();
    m_driftChart->setChart(chart);
    delete old;
}

} // namespace fourfold
