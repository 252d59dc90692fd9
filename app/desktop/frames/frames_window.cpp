#include "app/desktop/frames/frames_window.h"

#include "app/colour/colour.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/frames/dendrogram_view.h"
#include "app/desktop/message_bar.h"
#include "core/extract/extractor_runs.h"
#include "core/project/frame_analysis_edits.h"
#include "core/project/saved_frames.h"

#include <QComboBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QJsonArray>
#include <QLabel>
#include <QLineEdit>
#include <QProgressBar>
#include <QPushButton>
#include <QSpinBox>
#include <QSplitter>
#include <QStackedWidget>
#include <QTabWidget>
#include <QTableWidget>
#include <QVBoxLayout>
#include <QtCharts/QChart>
#include <QtCharts/QChartView>
#include <QtCharts/QLineSeries>
#include <QtCharts/QScatterSeries>
#include <QtCharts/QValueAxis>
#include <QtConcurrent/QtConcurrentRun>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

QTableWidget *readOnlyTable(QWidget *parent, const QString &accessibleName)
{
    auto *table = new QTableWidget(parent);
    table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    table->setSelectionBehavior(QAbstractItemView::SelectRows);
    table->setSelectionMode(QAbstractItemView::SingleSelection);
    table->verticalHeader()->hide();
    table->setAccessibleName(accessibleName);
    return table;
}

QTableWidgetItem *number(double value, const QString &text)
{
    auto *item = new QTableWidgetItem(text);
    item->setData(Qt::UserRole, value);
    item->setTextAlignment(Qt::AlignRight | Qt::AlignVCenter);
    return item;
}

QString percent(double share)
{
    return QStringLiteral("%1%").arg(share * 100, 0, 'f', 0);
}

} // namespace

FramesWindow::FramesWindow(CodingSession *session, QWidget *parent)
    : QWidget(parent, Qt::Window)
    , m_session(session)
{
    setWindowTitle(tr("Frames — %1").arg(session->project().settings().name));
    auto *layout = new QVBoxLayout(this);
    m_messages = new MessageBar(this);
    layout->addWidget(m_messages);

    // What to cluster: the layer, k, the bootstrap.
    auto *controls = new QHBoxLayout;
    m_layer = new QComboBox(this);
    m_layer->addItem(tr("Gold"), QStringLiteral("gold"));
    m_layer->addItem(tr("Consensus of the coders"), QStringLiteral("consensus"));
    if (auto coders = session->project().coders())
        for (const Coder &c : *coders)
            if (c.role == CoderRole::Coder)
                m_layer->addItem(
                    tr("Coder %1").arg(c.pseudonym), QStringLiteral("coder:") + c.pseudonym);
    if (auto runs = ExtractorRuns::runs(session->project()))
        for (const ExtractorRun &r : *runs)
            m_layer->addItem(tr("Extractor run %1").arg(r.name), QStringLiteral("run:") + r.name);
    m_layer->setAccessibleName(tr("Layer"));
    m_k = new QSpinBox(this);
    m_k->setRange(0, 30);
    m_k->setSpecialValueText(tr("where the indices point"));
    m_k->setAccessibleName(tr("Number of frames"));
    m_maxK = new QSpinBox(this);
    m_maxK->setRange(2, 30);
    m_maxK->setValue(10);
    m_maxK->setAccessibleName(tr("Largest k for the indices"));
    m_bootstrap = new QSpinBox(this);
    m_bootstrap->setRange(0, 10000);
    m_bootstrap->setSingleStep(50);
    m_bootstrap->setSpecialValueText(tr("none"));
    m_bootstrap->setAccessibleName(tr("Bootstrap replicates"));
    m_seed = new QSpinBox(this);
    m_seed->setRange(0, 2147483647);
    m_seed->setValue(1);
    m_seed->setAccessibleName(tr("Start value of the bootstrap"));
    m_compute = new QPushButton(tr("&Compute"), this);
    m_cancel = new QPushButton(tr("Cancel"), this);
    m_progress = new QProgressBar(this);
    m_progress->setMaximumWidth(160);
    m_progress->setTextVisible(false);
    m_progress->hide(); // shown while computing
    controls->addWidget(new QLabel(tr("&Layer:"), this));
    qobject_cast<QLabel *>(controls->itemAt(0)->widget())->setBuddy(m_layer);
    controls->addWidget(m_layer);
    auto *kLabel = new QLabel(tr("&Frames (k):"), this);
    kLabel->setBuddy(m_k);
    controls->addWidget(kLabel);
    controls->addWidget(m_k);
    auto *maxLabel = new QLabel(tr("Indices up to k ="), this);
    maxLabel->setBuddy(m_maxK);
    controls->addWidget(maxLabel);
    controls->addWidget(m_maxK);
    auto *bootLabel = new QLabel(tr("&Stability replicates:"), this);
    bootLabel->setBuddy(m_bootstrap);
    controls->addWidget(bootLabel);
    controls->addWidget(m_bootstrap);
    auto *seedLabel = new QLabel(tr("start value:"), this);
    seedLabel->setBuddy(m_seed);
    controls->addWidget(seedLabel);
    controls->addWidget(m_seed);
    controls->addStretch();
    controls->addWidget(m_progress);
    controls->addWidget(m_compute);
    controls->addWidget(m_cancel);
    layout->addLayout(controls);

    m_stack = new QStackedWidget(this);
    m_empty = new QLabel(m_stack);
    m_empty->setWordWrap(true);
    m_empty->setAlignment(Qt::AlignCenter);
    m_empty->setMargin(40);
    m_stack->addWidget(m_empty);
    m_tabs = new QTabWidget(m_stack);
    m_stack->addWidget(m_tabs);
    layout->addWidget(m_stack, 1);

    // Choosing k: the indices and the top of Ward's tree.
    auto *choose = new QWidget(m_tabs);
    auto *chooseLayout = new QVBoxLayout(choose);
    auto *split = new QSplitter(Qt::Horizontal, choose);
    m_kChart = new QChartView(new QChart(), split);
    m_kChart->setRenderHint(QPainter::Antialiasing);
    m_kChart->setMinimumWidth(460);
    auto *treeBox = new QWidget(split);
    auto *treeLayout = new QVBoxLayout(treeBox);
    treeLayout->setContentsMargins(0, 0, 0, 0);
    auto *treeTitle = new QLabel(tr("Ward's tree: the last %1 merges (each leaf: its number of "
                                    "articles; dashed: the cut into the chosen k)")
                                     .arg(DendrogramView::kShownMerges),
        treeBox);
    treeTitle->setWordWrap(true);
    treeLayout->addWidget(treeTitle);
    m_dendrogram = new DendrogramView(treeBox);
    treeLayout->addWidget(m_dendrogram, 1);
    split->addWidget(m_kChart);
    split->addWidget(treeBox);
    split->setStretchFactor(0, 1);
    split->setStretchFactor(1, 1);
    split->setSizes({600, 560});
    chooseLayout->addWidget(split, 1);
    m_kSummary = new QLabel(choose);
    m_kSummary->setWordWrap(true);
    chooseLayout->addWidget(m_kSummary);
    m_tabs->addTab(choose, tr("Choosing &k"));

    // The frames: names, sizes, stability, characteristic elements; the profile heat map.
    auto *framesPage = new QSplitter(Qt::Vertical, m_tabs);
    m_frames = new QTableWidget(framesPage);
    m_frames->verticalHeader()->hide();
    m_frames->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_frames->setSelectionMode(QAbstractItemView::SingleSelection);
    m_frames->setEditTriggers(QAbstractItemView::DoubleClicked | QAbstractItemView::EditKeyPressed
        | QAbstractItemView::AnyKeyPressed);
    m_frames->setAccessibleName(tr("Frames"));
    m_profile = readOnlyTable(framesPage, tr("Element profile of each frame"));
    m_profile->setSelectionMode(QAbstractItemView::NoSelection);
    m_profile->setToolTip(tr("Share of each frame's articles holding the element, beside the "
                             "share in all articles; bold: the element characterises the frame "
                             "(adjusted residual above 1.96)."));
    framesPage->addWidget(m_frames);
    framesPage->addWidget(m_profile);
    framesPage->setStretchFactor(0, 2);
    framesPage->setStretchFactor(1, 3);
    m_tabs->addTab(framesPage, tr("F&rames"));

    // Frames by outlet and by month.
    auto *groups = new QWidget(m_tabs);
    auto *groupsLayout = new QHBoxLayout(groups);
    for (auto [table, test, title] : {std::tuple {&m_outlets, &m_outletTest, tr("By outlet")},
             std::tuple {&m_months, &m_monthTest, tr("By month")}}) {
        auto *box = new QVBoxLayout;
        auto *heading = new QLabel(QStringLiteral("<b>%1</b>").arg(title), groups);
        box->addWidget(heading);
        *table = readOnlyTable(groups, title);
        box->addWidget(*table, 1);
        *test = new QLabel(groups);
        (*test)->setWordWrap(true);
        (*test)->setTextInteractionFlags(Qt::TextSelectableByMouse);
        box->addWidget(*test);
        groupsLayout->addLayout(box);
    }
    m_tabs->addTab(groups, tr("By &outlet and month"));

    // The articles of one frame.
    auto *articles = new QWidget(m_tabs);
    auto *articlesLayout = new QVBoxLayout(articles);
    auto *pick = new QHBoxLayout;
    m_frameChoice = new QComboBox(articles);
    m_frameChoice->setAccessibleName(tr("Frame"));
    auto *pickLabel = new QLabel(tr("Fr&ame:"), articles);
    pickLabel->setBuddy(m_frameChoice);
    pick->addWidget(pickLabel);
    pick->addWidget(m_frameChoice);
    pick->addWidget(new QLabel(tr("Double-click an article to open it on the desk."), articles));
    pick->addStretch();
    articlesLayout->addLayout(pick);
    m_articles = readOnlyTable(articles, tr("Articles of the frame"));
    articlesLayout->addWidget(m_articles, 1);
    m_tabs->addTab(articles, tr("&Articles"));

    // Saving and the saved analyses.
    auto *saving = new QHBoxLayout;
    m_saveName = new QLineEdit(this);
    m_saveName->setPlaceholderText(tr("Name of the analysis"));
    m_saveName->setAccessibleName(tr("Name of the analysis"));
    m_save = new QPushButton(tr("Sa&ve frames"), this);
    m_saved = new QComboBox(this);
    m_saved->setAccessibleName(tr("Saved analyses"));
    m_saved->setMinimumContentsLength(28);
    m_open = new QPushButton(tr("O&pen"), this);
    m_delete = new QPushButton(tr("&Delete"), this);
    auto *saveLabel = new QLabel(tr("Save as:"), this);
    saveLabel->setBuddy(m_saveName);
    saving->addWidget(saveLabel);
    saving->addWidget(m_saveName, 1);
    saving->addWidget(m_save);
    saving->addSpacing(24);
    auto *savedLabel = new QLabel(tr("Saved:"), this);
    savedLabel->setBuddy(m_saved);
    saving->addWidget(savedLabel);
    saving->addWidget(m_saved, 1);
    saving->addWidget(m_open);
    saving->addWidget(m_delete);
    layout->addLayout(saving);

    connect(m_compute, &QPushButton::clicked, this, &FramesWindow::compute);
    connect(m_cancel, &QPushButton::clicked, this, &FramesWindow::cancel);
    connect(&m_watcher, &QFutureWatcherBase::finished, this, &FramesWindow::finish);
    connect(m_frameChoice, &QComboBox::currentIndexChanged, this, &FramesWindow::showArticles);
    connect(m_articles, &QTableWidget::itemDoubleClicked, this, [this](QTableWidgetItem *item) {
        emit articleRequested(ArticleId {item->data(Qt::UserRole).toLongLong()});
    });
    connect(m_frames, &QTableWidget::itemChanged, this, [this](QTableWidgetItem *item) {
        // A new name shows in the heat map's header and the frame list of the Articles tab.
        if (item->column() == 0 && item->row() < m_frameChoice->count()) {
            const QString title = tr("F%1 %2").arg(item->row() + 1).arg(item->text()).trimmed();
            m_frameChoice->setItemText(item->row(), title);
            if (item->row() < m_profile->columnCount())
                m_profile->setHorizontalHeaderItem(item->row(), new QTableWidgetItem(title));
        }
    });
    connect(m_save, &QPushButton::clicked, this, [this] { save(m_saveName->text()); });
    connect(m_open, &QPushButton::clicked, this,
        [this] { openSaved(m_saved->currentData().toString()); });
    connect(m_delete, &QPushButton::clicked, this,
        [this] { deleteSaved(m_saved->currentData().toString()); });
    connect(m_saveName, &QLineEdit::textChanged, this, &FramesWindow::updateControls);
    // An undo or redo on the desk may take back a save or a deletion made here.
    connect(m_session->undoStack(), &QUndoStack::indexChanged, this, &FramesWindow::reloadSaved);

    showEmpty(tr("Choose a layer and the number of frames, then press Compute. Gold is the "
                 "usual layer; the consensus of the coders or one coder serve before gold is "
                 "adjudicated."));
    reloadSaved();
    updateControls();
    resize(1200, 700);
}

FramesWindow::~FramesWindow()
{
    cancel();
    m_watcher.waitForFinished();
}

FramesRequest FramesWindow::request() const
{
    FramesRequest r;
    r.projectPath = m_session->project().path();
    r.layer = m_layer->currentData().toString();
    r.k = m_k->value();
    r.maxK = m_maxK->value();
    r.bootstrap = m_bootstrap->value();
    r.seed = quint64(m_seed->value());
    return r;
}

void FramesWindow::setRequest(const FramesRequest &r)
{
    if (int i = m_layer->findData(r.layer); i >= 0)
        m_layer->setCurrentIndex(i);
    m_k->setValue(r.k);
    m_maxK->setValue(r.maxK);
    m_bootstrap->setValue(r.bootstrap);
    m_seed->setValue(int(std::min<quint64>(r.seed, quint64(m_seed->maximum()))));
}

bool FramesWindow::isRunning() const
{
    return m_watcher.isRunning();
}

bool FramesWindow::showsEmptyState() const
{
    return m_stack->currentWidget() == m_empty;
}

void FramesWindow::compute()
{
    if (isRunning()) {
        cancel();
        m_watcher.waitForFinished();
    }
    m_cancelFlag = std::make_shared<std::atomic<bool>>(false);
    auto flag = m_cancelFlag;
    // The progress callback runs on the worker thread: it only posts to the window's thread and
    // reads the cancel flag. The destructor waits for the worker, so `this` outlives it.
    FramesProgress progress = [this, flag](int done, int total) {
        QMetaObject::invokeMethod(
            this, [this, done, total] { showProgress(done, total); }, Qt::QueuedConnection);
        return !flag->load();
    };
    m_progress->setRange(0, 0);
    m_progress->show();
    m_messages->showMessage(MessageBar::Kind::Information, tr("Computing the frames…"));
    m_watcher.setFuture(QtConcurrent::run(
        [request = request(), progress] { return runFramesJob(request, progress); }));
    updateControls();
}

void FramesWindow::cancel()
{
    if (m_cancelFlag)
        m_cancelFlag->store(true);
}

void FramesWindow::showProgress(int done, int total)
{
    if (!isRunning())
        return;
    m_progress->setRange(0, total);
    m_progress->setValue(done);
}

void FramesWindow::finish()
{
    Result<FramesOutcome> result = m_watcher.result();
    m_progress->hide();
    if (!result) {
        const Error &e = result.error();
        if (e.code == ErrorCode::Cancelled) {
            m_messages->showMessage(MessageBar::Kind::Information,
                m_outcome ? tr("Cancelled; the frames shown are from before.") : tr("Cancelled."));
        } else if (e.code == ErrorCode::InvalidInput) {
            m_outcome.reset();
            m_messages->dismiss();
            showEmpty(tr("%1\n\nAdjudicate more articles into gold (Lead → Compare and "
                         "adjudicate…), or choose the consensus of the coders or one coder as the "
                         "layer above.")
                          .arg(e.message));
        } else {
            m_messages->showMessage(MessageBar::Kind::Error, e.message);
        }
        updateControls();
        emit computed(false);
        return;
    }
    m_outcome = std::move(*result);
    m_messages->dismiss();
    showOutcome();
    updateControls();
    emit computed(true);
}

void FramesWindow::showEmpty(const QString &why)
{
    m_empty->setText(why);
    m_stack->setCurrentWidget(m_empty);
}

void FramesWindow::showOutcome()
{
    m_stack->setCurrentWidget(m_tabs);
    showKChoice();
    showFrames();
    showGroups(m_outlets, m_outletTest, QStringLiteral("outlet"));
    showGroups(m_months, m_monthTest, QStringLiteral("month"));
    m_frameChoice->blockSignals(true);
    m_frameChoice->clear();
    const QStringList names = frameNames();
    for (int f = 0; f < m_outcome->analysis.k; ++f)
        m_frameChoice->addItem(tr("F%1 %2").arg(f + 1).arg(names.value(f)).trimmed());
    m_frameChoice->blockSignals(false);
    showArticles();
}

void FramesWindow::showKChoice()
{
    const frames::FrameAnalysis &a = m_outcome->analysis;
    auto *chart = new QChart();
    chart->setTitle(tr("k-choice indices, each relative to its largest value"));
    auto *x = new QValueAxis(chart);
    x->setTitleText(tr("k (frames)"));
    x->setLabelFormat(QStringLiteral("%d"));
    auto *y = new QValueAxis(chart);
    y->setTitleText(tr("share of the largest value"));
    chart->addAxis(x, Qt::AlignBottom);
    chart->addAxis(y, Qt::AlignLeft);
    double lowest = 0;
    const auto addIndex = [&](const QString &name, auto value) {
        double largest = 0;
        for (const frames::KChoice &row : a.kChoice)
            if (auto v = value(row))
                largest = std::max(largest, std::abs(*v));
        auto *series = new QLineSeries(chart);
        series->setName(name);
        series->setPointsVisible(true);
        for (const frames::KChoice &row : a.kChoice)
            if (auto v = value(row); v && largest > 0) {
                series->append(row.k, *v / largest);
                lowest = std::min(lowest, *v / largest);
            }
        chart->addSeries(series);
        series->attachAxis(x);
        series->attachAxis(y);
    };
    addIndex(tr("mean silhouette"), [](const frames::KChoice &r) { return r.silhouette.value; });
    addIndex(
        tr("Calinski–Harabasz"), [](const frames::KChoice &r) { return r.calinskiHarabasz.value; });
    addIndex(
        tr("fusion jump (elbow)"), [](const frames::KChoice &r) { return r.fusionJump.value; });
    // The k used, as a vertical line.
    auto *chosen = new QLineSeries(chart);
    chosen->setName(tr("chosen k = %1").arg(a.k));
    chosen->append(a.k, lowest);
    chosen->append(a.k, 1.0);
    QPen pen(palette().color(QPalette::Highlight), 1.5, Qt::DashLine);
    chosen->setPen(pen);
    chart->addSeries(chosen);
    chosen->attachAxis(x);
    chosen->attachAxis(y);
    const int lastK = a.kChoice.empty() ? 2 : a.kChoice.back().k;
    x->setRange(2, std::max(3, lastK));
    x->setTickCount(std::max(3, lastK) - 1);
    y->setRange(std::floor(lowest * 10) / 10, 1.05);
    chart->legend()->setAlignment(Qt::AlignBottom);
    QChart *old = m_kChart->chart();
    m_kChart->setChart(chart);
    delete old;

    const auto kText = [this](int k) { return k > 0 ? QString::number(k) : tr("–"); };
    m_kSummary->setText(
        tr("Largest mean silhouette at k = %1, Calinski–Harabasz at k = %2, fusion jump at k = %3. "
           "%4 %5 articles × %6 element variables of %7.")
            .arg(kText(a.kBySilhouette), kText(a.kByCalinskiHarabasz), kText(a.kByFusion),
                a.kGiven ? tr("Frames: k = %1, as chosen.").arg(a.k)
                    : a.indicesAgree()
                    ? tr("Frames: k = %1, where most indices point.").arg(a.k)
                    : tr("Frames: k = %1, the largest mean silhouette; the three "
                         "indices point at different k.")
                          .arg(a.k))
            .arg(m_outcome->input.matrix.rows)
            .arg(m_outcome->input.variables.size())
            .arg(m_outcome->input.source));
    m_dendrogram->setSchedule(a.schedule, int(m_outcome->input.matrix.rows), a.k);
}

void FramesWindow::showFrames()
{
    const FramesOutcome &o = *m_outcome;
    const frames::FrameAnalysis &a = o.analysis;
    const double n = double(o.input.matrix.rows);
    // Names typed before stay with their frame number, unless a saved analysis brings its own.
    QStringList names = m_pendingNames.isEmpty() ? frameNames() : m_pendingNames;
    m_pendingNames.clear();
    const bool stability = !o.stability.empty();
    m_frames->blockSignals(true);
    m_frames->clear();
    m_frames->setColumnCount(5);
    m_frames->setHorizontalHeaderLabels({tr("Name (double-click to edit)"), tr("Articles"),
        tr("Share"), tr("Stability"), tr("Characteristic elements (share in frame, in all)")});
    m_frames->setRowCount(a.k);
    for (int f = 0; f < a.k; ++f) {
        const frames::FrameProfile &p = a.profiles[size_t(f)];
        auto *name = new QTableWidgetItem(names.value(f));
        name->setFlags(name->flags() | Qt::ItemIsEditable);
        m_frames->setItem(f, 0, name);
        for (int c = 1; c < 5; ++c) {
            auto *item = c == 1 ? number(p.size, QString::number(p.size))
                : c == 2        ? number(p.size / n, percent(p.size / n))
                                : new QTableWidgetItem();
            item->setFlags(item->flags() & ~Qt::ItemIsEditable);
            m_frames->setItem(f, c, item);
        }
        if (stability) {
            const frames::ClusterStability &s = o.stability[size_t(f)];
            m_frames->item(f, 3)->setText(s.replicatesUsed > 0
                    ? (s.flagged ? tr("%1 — dissolves on resampling") : QStringLiteral("%1"))
                          .arg(s.meanJaccard, 0, 'f', 2)
                    : tr("–"));
            m_frames->item(f, 3)->setToolTip(
                tr("Mean Jaccard similarity to the best-matching cluster over %1 bootstrap "
                   "replicates (Hennig 2007); %2 dissolved (≤ 0.5), %3 recovered (≥ 0.75).")
                    .arg(s.replicatesUsed)
                    .arg(s.dissolved)
                    .arg(s.recovered));
        } else {
            m_frames->item(f, 3)->setText(tr("not computed"));
        }
        // The characteristic elements: adjusted residual above 1.96, the largest first.
        std::vector<size_t> order(size_t(o.input.variables.size()));
        for (size_t v = 0; v < order.size(); ++v)
            order[v] = v;
        std::stable_sort(order.begin(), order.end(), [&](size_t x, size_t y) {
            return p.variables[x].residual.value_or(p.variables[x].difference)
                > p.variables[y].residual.value_or(p.variables[y].difference);
        });
        QStringList shown;
        for (size_t v : order) {
            const frames::VariableProfile &vp = p.variables[v];
            if (vp.residual ? *vp.residual <= 1.96 : vp.difference <= 0)
                continue;
            shown << tr("%1 (%2, %3)")
                         .arg(o.input.variables[qsizetype(v)], percent(vp.share),
                             percent(vp.overall));
            if (shown.size() == 4)
                break;
        }
        m_frames->item(f, 4)->setText(
            shown.isEmpty() ? tr("none stands out") : shown.join(QStringLiteral("; ")));
    }
    m_frames->blockSignals(false);
    m_frames->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_frames->horizontalHeader()->setStretchLastSection(true);

    // The heat map: elements × frames, the frame's share; the last column all articles.
    const QColor base = palette().color(QPalette::Base);
    const QColor strong = palette().color(QPalette::Highlight);
    m_profile->clear();
    m_profile->setRowCount(int(o.input.variables.size()));
    m_profile->setColumnCount(a.k + 1);
    QStringList headers;
    for (int f = 0; f < a.k; ++f)
        headers << tr("F%1 %2").arg(f + 1).arg(names.value(f)).trimmed();
    headers << tr("All");
    m_profile->setHorizontalHeaderLabels(headers);
    m_profile->setVerticalHeaderLabels(o.input.variables);
    m_profile->verticalHeader()->show();
    for (int v = 0; v < int(o.input.variables.size()); ++v) {
        for (int f = 0; f <= a.k; ++f) {
            const bool all = f == a.k;
            const frames::VariableProfile &vp =
                a.profiles[size_t(all ? 0 : f)].variables[size_t(v)];
            const double share = all ? vp.overall : vp.share;
            auto *item = number(share, percent(share));
            const QColor fill = mixColours(base, strong, share);
            item->setBackground(fill);
            item->setForeground(readableOn(fill));
            if (!all && vp.residual && *vp.residual > 1.96) {
                QFont bold = item->font();
                bold.setBold(true);
                item->setFont(bold);
            }
            item->setToolTip(all
                    ? tr("%1: %2 of all articles").arg(o.input.variables[v], percent(share))
                    : tr("%1 in F%2: %3 of its articles, %4 of all; adjusted residual %5")
                          .arg(o.input.variables[v])
                          .arg(f + 1)
                          .arg(percent(share), percent(vp.overall),
                              vp.residual ? QString::number(*vp.residual, 'f', 2) : tr("–")));
            m_profile->setItem(v, f, item);
        }
    }
    m_profile->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
}

void FramesWindow::showGroups(QTableWidget *table, QLabel *test, const QString &name)
{
    const FramesOutcome &o = *m_outcome;
    const auto found = std::find_if(
        o.tables.begin(), o.tables.end(), [&](const FrameGroupTable &t) { return t.name == name; });
    table->clear();
    if (found == o.tables.end()) {
        table->setRowCount(0);
        test->clear();
        return;
    }
    const FrameGroupTable &t = *found;
    const int k = o.analysis.k;
    table->setRowCount(int(t.groups.size()));
    table->setColumnCount(k + 1);
    QStringList headers;
    for (int f = 0; f < k; ++f)
        headers << tr("F%1").arg(f + 1);
    headers << tr("Total");
    table->setHorizontalHeaderLabels(headers);
    table->setVerticalHeaderLabels(t.groups);
    table->verticalHeader()->show();
    for (qsizetype g = 0; g < t.groups.size(); ++g) {
        long long total = 0;
        for (int f = 0; f < k; ++f)
            total += t.at(f, g);
        for (int f = 0; f < k; ++f) {
            const long long count = t.at(f, g);
            auto *item = number(double(count),
                total > 0 ? tr("%1 (%2)").arg(count).arg(percent(double(count) / double(total)))
                          : QString::number(count));
            table->setItem(int(g), f, item);
        }
        table->setItem(int(g), k, number(double(total), QString::number(total)));
    }
    table->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    const frames::ChiSquareResult &r = t.test;
    if (!r.statistic) {
        test->setText(tr("Chi-square undefined: %1").arg(QString::fromStdString(r.reason)));
        return;
    }
    QString text = tr("Pearson's X² = %1, df = %2, p = %3; Cramér's V = %4.")
                       .arg(*r.statistic, 0, 'f', 2)
                       .arg(r.degreesOfFreedom)
                       .arg(*r.pValue < 0.001 ? tr("< 0.001") : QString::number(*r.pValue, 'f', 3))
                       .arg(*r.cramersV, 0, 'f', 3);
    if (r.smallExpected > 0)
        text += QLatin1Char(' ')
            + tr("%n cell(s) expect fewer than 5 articles: read the test with care.", nullptr,
                r.smallExpected);
    test->setText(text);
}

void FramesWindow::showArticles()
{
    m_articles->clear();
    m_articles->setColumnCount(5);
    m_articles->setHorizontalHeaderLabels(
        {tr("Title"), tr("Outlet"), tr("Date"), tr("Id"), tr("Near the centre")});
    m_articles->setRowCount(0);
    if (!m_outcome)
        return;
    const int frame = m_frameChoice->currentIndex();
    if (frame < 0)
        return;
    const FramesOutcome &o = *m_outcome;
    const std::vector<size_t> &closest = o.analysis.profiles[size_t(frame)].closest;
    const std::vector<int> &labels = o.analysis.frames.partition.labels;
    for (size_t i = 0; i < labels.size(); ++i) {
        if (labels[i] != frame)
            continue;
        const ArticleSummary &a = o.input.articles[i];
        const int row = m_articles->rowCount();
        m_articles->insertRow(row);
        const auto near = std::find(closest.begin(), closest.end(), i);
        const QStringList cells {a.title, a.outlet, a.published, o.input.ids[qsizetype(i)],
            near != closest.end() ? tr("%1.").arg(near - closest.begin() + 1) : QString()};
        for (int c = 0; c < cells.size(); ++c) {
            auto *item = new QTableWidgetItem(cells[c]);
            item->setData(Qt::UserRole, a.id.value);
            m_articles->setItem(row, c, item);
        }
    }
    m_articles->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_articles->horizontalHeader()->setSectionResizeMode(0, QHeaderView::Stretch);
}

QStringList FramesWindow::frameNames() const
{
    QStringList names;
    for (int r = 0; r < m_frames->rowCount(); ++r)
        names << (m_frames->item(r, 0) ? m_frames->item(r, 0)->text().trimmed() : QString());
    return names;
}

void FramesWindow::updateControls()
{
    const bool running = isRunning();
    m_compute->setEnabled(!running);
    m_cancel->setEnabled(running);
    m_save->setEnabled(!running && m_outcome && !m_saveName->text().trimmed().isEmpty());
    m_open->setEnabled(!running && m_saved->count() > 0);
    m_delete->setEnabled(!running && m_saved->count() > 0);
}

Status FramesWindow::save(const QString &name)
{
    if (!m_outcome) {
        m_messages->showMessage(
            MessageBar::Kind::Warning, tr("Compute the frames before saving them."));
        return fail(ErrorCode::InvalidArgument, tr("Compute the frames before saving them."));
    }
    FrameRunSettings settings;
    settings.maxK = m_outcome->request.maxK;
    settings.bootstrap = m_outcome->request.bootstrap;
    settings.seed = m_outcome->request.seed;
    auto edit = std::make_unique<SaveFrameAnalysisEdit>(
        frameAnalysisRecord(m_outcome->input, m_outcome->analysis, m_outcome->stability, settings,
            name, frameNames()),
        m_session->coder().id);
    const Status st = m_session->applyProjectEdit(std::move(edit));
    if (!st) {
        m_messages->showMessage(MessageBar::Kind::Error, st.error().message);
        return st;
    }
    m_messages->showMessage(MessageBar::Kind::Success,
        tr("Saved the %n frame(s) as \"%1\" (Edit → Undo takes it back).", nullptr,
            m_outcome->analysis.k)
            .arg(name.trimmed()),
        {}, {}, 8);
    reloadSaved();
    if (int i = m_saved->findData(name.trimmed()); i >= 0)
        m_saved->setCurrentIndex(i);
    return {};
}

Status FramesWindow::openSaved(const QString &name)
{
    auto saved = SavedFrames::load(m_session->project(), name);
    if (!saved) {
        m_messages->showMessage(MessageBar::Kind::Error, saved.error().message);
        return std::unexpected(saved.error());
    }
    FramesRequest r = request();
    r.layer = saved->settings.value(QStringLiteral("layer")).toString();
    r.k = saved->settings.value(QStringLiteral("k")).toInt();
    r.maxK = saved->settings.value(QStringLiteral("max_k")).toInt(10);
    r.bootstrap = saved->settings.value(QStringLiteral("bootstrap")).toInt();
    r.seed = saved->settings.value(QStringLiteral("seed")).toString().toULongLong();
    if (m_layer->findData(r.layer) < 0) {
        m_messages->showMessage(MessageBar::Kind::Error,
            tr("The layer %1 of \"%2\" is no longer in the project.").arg(r.layer, name));
        return fail(
            ErrorCode::NotFound, tr("The layer %1 is no longer in the project.").arg(r.layer));
    }
    setRequest(r);
    m_pendingNames.clear();
    for (const SavedFrame &f : saved->frames)
        m_pendingNames << f.name;
    m_saveName->setText(saved->name);
    compute();
    return {};
}

Status FramesWindow::deleteSaved(const QString &name)
{
    auto saved = SavedFrames::load(m_session->project(), name);
    if (!saved) {
        m_messages->showMessage(MessageBar::Kind::Error, saved.error().message);
        return std::unexpected(saved.error());
    }
    const Status st = m_session->applyProjectEdit(
        std::make_unique<DeleteFrameAnalysisEdit>(saved->uuid, saved->name, m_session->coder().id));
    if (!st) {
        m_messages->showMessage(MessageBar::Kind::Error, st.error().message);
        return st;
    }
    m_messages->showMessage(MessageBar::Kind::Success,
        tr("Deleted the saved frames \"%1\" (Edit → Undo brings them back).").arg(name), {}, {}, 8);
    reloadSaved();
    return {};
}

void FramesWindow::reloadSaved()
{
    const QString current = m_saved->currentData().toString();
    m_saved->clear();
    auto list = SavedFrames::list(m_session->project());
    if (!list) {
        m_messages->showMessage(MessageBar::Kind::Error, list.error().message);
        return;
    }
    for (const SavedFrameAnalysis &a : *list)
        m_saved->addItem(tr("%1 — %2, k = %3, %n article(s)", nullptr, int(a.memberCount))
                             .arg(a.name, a.settings.value(QStringLiteral("layer")).toString())
                             .arg(a.settings.value(QStringLiteral("k")).toInt()),
            a.name);
    if (int i = m_saved->findData(current); i >= 0)
        m_saved->setCurrentIndex(i);
    updateControls();
}

} // namespace fourfold
