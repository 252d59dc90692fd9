#include "app/desktop/runs/extractor_window.h"

#include "app/desktop/function_style.h"
#include "app/desktop/runs/run_error_model.h"
#include "app/desktop/runs/run_passage_window.h"
#include "core/extract/extractor_runs.h"
#include "core/project/project.h"

#include <QComboBox>
#include <QDateTime>
#include <QFormLayout>
#include <QHeaderView>
#include <QJsonArray>
#include <QJsonDocument>
#include <QLabel>
#include <QLineEdit>
#include <QProgressBar>
#include <QSplitter>
#include <QTabWidget>
#include <QTableView>
#include <QTableWidget>
#include <QVBoxLayout>
#include <QtConcurrent/QtConcurrentRun>

#include <algorithm>

namespace fourfold {

namespace {

enum RunColumn { RunName, RunVersion, RunCreated, RunParameters, RunSpans, RunColumns };

QString figure(std::optional<double> value)
{
    return value ? QString::number(*value, 'f', 3) : QStringLiteral("—");
}

QString interval(const Interval &i)
{
    if (!i.low || !i.high)
        return QStringLiteral("—");
    return QStringLiteral("[%1, %2]").arg(figure(i.low), figure(i.high));
}

QString count(double value)
{
    // PAR counts whole spans; every count is an integer.
    return QString::number(qint64(value));
}

// "position: intro=problem, unit=sentence" — the extractor's kind, then its parameters by key.
QString parameterText(const QJsonObject &parameters)
{
    QStringList parts;
    for (auto it = parameters.begin(); it != parameters.end(); ++it) {
        if (it.key() == QLatin1String("extractor"))
            continue;
        const QJsonValue v = it.value();
        QString value = v.isString() ? v.toString()
            : v.isBool() ? (v.toBool() ? QStringLiteral("true") : QStringLiteral("false"))
            : v.isDouble()
            ? QString::number(v.toDouble())
            : QString::fromUtf8(QJsonDocument(QJsonArray {v}).toJson(QJsonDocument::Compact))
                  .mid(1)
                  .chopped(1);
        parts << QStringLiteral("%1=%2").arg(it.key(), value);
    }
    const QString kind = parameters.value(QLatin1String("extractor")).toString();
    return kind.isEmpty() ? parts.join(QStringLiteral(", "))
                          : QStringLiteral("%1: %2").arg(kind, parts.join(QStringLiteral(", ")));
}

QTableWidgetItem *cell(const QString &text, Qt::Alignment align = Qt::AlignRight | Qt::AlignVCenter)
{
    auto *item = new QTableWidgetItem(text);
    item->setTextAlignment(align);
    item->setFlags(Qt::ItemIsEnabled | Qt::ItemIsSelectable);
    return item;
}

QTableWidget *readOnlyTable(int columns, QWidget *parent)
{
    auto *t = new QTableWidget(0, columns, parent);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->verticalHeader()->setVisible(false);
    t->setAlternatingRowColors(true);
    t->setWordWrap(false);
    return t;
}

} // namespace

ExtractorWindow::ExtractorWindow(Project &project, QWidget *parent)
    : QWidget(parent)
    , m_project(project)
{
    setWindowTitle(tr("Extractor runs"));
    m_filling = true;

    auto *splitter = new QSplitter(Qt::Horizontal, this);
    splitter->addWidget(buildRunPanel());

    m_tabs = new QTabWidget(splitter);
    auto *scoresPage = new QWidget(m_tabs);
    auto *scoresLayout = new QVBoxLayout(scoresPage);
    m_scores = readOnlyTable(13, scoresPage);
    m_scores->setHorizontalHeaderLabels({tr("Function"), tr("Precision"), tr("Recall"), tr("F1"),
        tr("F1 95% CI"), tr("COR"), tr("INC"), tr("PAR"), tr("MIS"), tr("SPU"), tr("α run–coders"),
        tr("Coders' band"), tr("Run vs band")});
    m_scores->horizontalHeaderItem(5)->setToolTip(tr("Correct: the run's span matches"));
    m_scores->horizontalHeaderItem(6)->setToolTip(
        tr("Incorrect: matched, but the boundaries or the function differ (strict/exact/type)"));
    m_scores->horizontalHeaderItem(7)->setToolTip(
        tr("Partial: matched with other boundaries (partial mode; counts half)"));
    m_scores->horizontalHeaderItem(8)->setToolTip(tr("Missing: a reference span the run missed"));
    m_scores->horizontalHeaderItem(9)->setToolTip(
        tr("Spurious: a run span with no reference span (false positive)"));
    m_scores->horizontalHeaderItem(10)->setToolTip(
        tr("Mean Krippendorff's alpha (nominal) of the run with each coder, per unit"));
    m_scores->horizontalHeaderItem(11)->setToolTip(
        tr("Lowest to highest alpha of the pairs of human coders"));
    m_scores->horizontalHeader()->setStretchLastSection(true);
    scoresLayout->addWidget(m_scores, 1);
    m_bandNote = new QLabel(scoresPage);
    m_bandNote->setWordWrap(true);
    scoresLayout->addWidget(m_bandNote);
    m_tabs->addTab(scoresPage, tr("Scores"));

    m_tabs->addTab(buildErrorTab(), tr("Errors"));

    auto *confusionPage = new QWidget(m_tabs);
    auto *confusionLayout = new QVBoxLayout(confusionPage);
    m_confusionTitle = new QLabel(confusionPage);
    m_confusionTitle->setWordWrap(true);
    confusionLayout->addWidget(m_confusionTitle);
    m_confusion = new QTableWidget(5, 5, confusionPage);
    m_confusion->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_confusion->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    m_confusion->verticalHeader()->setSectionResizeMode(QHeaderView::Fixed);
    m_confusion->verticalHeader()->setDefaultSectionSize(
        int(m_confusion->fontMetrics().height() * 2.6));
    m_confusion->setSizeAdjustPolicy(QAbstractScrollArea::AdjustToContents);
    m_confusion->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    m_confusion->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    confusionLayout->addWidget(m_confusion);
    m_confusionNote = new QLabel(confusionPage);
    m_confusionNote->setWordWrap(true);
    confusionLayout->addWidget(m_confusionNote);
    confusionLayout->addStretch(1);
    m_tabs->addTab(confusionPage, tr("Function confusion"));

    splitter->addWidget(m_tabs);
    splitter->setStretchFactor(0, 0);
    splitter->setStretchFactor(1, 1);
    splitter->setSizes({450, 900});
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(6, 6, 6, 6);
    layout->addWidget(splitter);
    resize(1320, 780);

    m_passage = new RunPassageWindow(this);
    connect(m_passage, &RunPassageWindow::outcomeActivated, this, [this](int index) {
        const int row = m_errorModel->rowOf(index);
        if (row >= 0)
            m_errorView->selectRow(row);
    });
    connect(&m_watcher, &QFutureWatcherBase::finished, this, &ExtractorWindow::finish);

    fillReferences();
    m_filling = false;
    reloadRuns();
}

ExtractorWindow::~ExtractorWindow()
{
    m_watcher.waitForFinished();
}

QWidget *ExtractorWindow::buildRunPanel()
{
    auto *panel = new QWidget(this);
    auto *layout = new QVBoxLayout(panel);
    layout->setContentsMargins(0, 0, 0, 0);
    auto *title = new QLabel(tr("<b>Runs</b> — select one or more to compare"), panel);
    layout->addWidget(title);
    m_runs = readOnlyTable(RunColumns, panel);
    m_runs->setHorizontalHeaderLabels(
        {tr("Name"), tr("Version"), tr("Made"), tr("Parameters"), tr("Spans")});
    m_runs->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_runs->setSelectionMode(QAbstractItemView::ExtendedSelection);
    m_runs->horizontalHeader()->setSectionResizeMode(RunParameters, QHeaderView::Stretch);
    title->setBuddy(m_runs);
    layout->addWidget(m_runs, 1);
    m_runDetails = new QLabel(panel);
    m_runDetails->setWordWrap(true);
    m_runDetails->setTextInteractionFlags(Qt::TextSelectableByMouse);
    m_runDetails->setFrameShape(QFrame::StyledPanel);
    m_runDetails->setMargin(6);
    layout->addWidget(m_runDetails);

    auto *form = new QFormLayout;
    m_reference = new QComboBox(panel);
    m_reference->setToolTip(tr("What the runs are scored against: gold or one coder"));
    form->addRow(tr("&Reference"), m_reference);
    m_mode = new QComboBox(panel);
    const std::pair<reliability::MatchMode, QString> modes[] = {
        {reliability::MatchMode::Strict, tr("Strict — same boundaries and function")},
        {reliability::MatchMode::Exact, tr("Exact — same boundaries, any function")},
        {reliability::MatchMode::Partial, tr("Partial — overlap counts half")},
        {reliability::MatchMode::Type, tr("Type — same function, any overlap")},
    };
    for (const auto &[mode, name] : modes)
        m_mode->addItem(name, matchModeKey(mode));
    form->addRow(tr("&Matching"), m_mode);
    m_unit = new QComboBox(panel);
    const std::pair<UnitKind, QString> units[] = {
        {UnitKind::Sentence, tr("Sentence")},
        {UnitKind::Paragraph, tr("Paragraph")},
        {UnitKind::Token, tr("Token (word)")},
    };
    for (const auto &[kind, name] : units)
        m_unit->addItem(name, unitKindKey(kind));
    m_unit->setToolTip(tr("The unit on which the run's alpha with the coders is computed"));
    form->addRow(tr("&Unit for alpha"), m_unit);
    layout->addLayout(form);

    m_progress = new QProgressBar(panel);
    m_progress->setRange(0, 0);
    m_progress->setVisible(false);
    m_progress->setMaximumHeight(8);
    m_progress->setTextVisible(false);
    layout->addWidget(m_progress);
    m_status = new QLabel(panel);
    m_status->setWordWrap(true);
    m_status->setTextInteractionFlags(Qt::TextSelectableByMouse);
    layout->addWidget(m_status);

    connect(m_runs, &QTableWidget::currentCellChanged, this, [this] { showRunDetails(); });
    connect(m_runs, &QTableWidget::itemSelectionChanged, this, [this] {
        if (!m_filling)
            compute();
    });
    auto recompute = [this] {
        if (!m_filling)
            compute();
    };
    connect(m_reference, &QComboBox::currentIndexChanged, this, recompute);
    connect(m_mode, &QComboBox::currentIndexChanged, this, recompute);
    connect(m_unit, &QComboBox::currentIndexChanged, this, recompute);
    return panel;
}

QWidget *ExtractorWindow::buildErrorTab()
{
    auto *page = new QWidget(m_tabs);
    auto *layout = new QVBoxLayout(page);
    m_errorTitle = new QLabel(page);
    m_errorTitle->setWordWrap(true);
    layout->addWidget(m_errorTitle);

    m_errorSummary = readOnlyTable(7, page);
    m_errorSummary->setHorizontalHeaderLabels(
        {tr("Function"), tr("Reference spans"), tr("Run spans"), tr("False positives"),
            tr("Misses"), tr("Wrong function"), tr("Boundary")});
    m_errorSummary->setToolTip(tr("Click a count to list those errors"));
    m_errorSummary->setRowCount(5);
    m_errorSummary->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    m_errorSummary->setSizeAdjustPolicy(QAbstractScrollArea::AdjustToContents);
    m_errorSummary->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    layout->addWidget(m_errorSummary);

    auto *filters = new QHBoxLayout;
    m_functionFilter = new QComboBox(page);
    m_functionFilter->addItem(tr("All functions"), -1);
    for (FramingFunction f : kFramingFunctions)
        m_functionFilter->addItem(
            QStringLiteral("%1  %2").arg(functionStyle(f).letter).arg(functionName(f)), int(f));
    m_kindFilter = new QComboBox(page);
    m_kindFilter->addItem(tr("Every kind of error"), -1);
    for (RunErrorKind k : {RunErrorKind::FalsePositive, RunErrorKind::Miss,
             RunErrorKind::WrongFunction, RunErrorKind::Boundary})
        m_kindFilter->addItem(RunErrorModel::kindName(k), int(k));
    m_search = new QLineEdit(page);
    m_search->setPlaceholderText(tr("Article or text…"));
    m_search->setClearButtonEnabled(true);
    auto *filterLabel = new QLabel(tr("&Show"), page);
    filterLabel->setBuddy(m_functionFilter);
    filters->addWidget(filterLabel);
    filters->addWidget(m_functionFilter);
    filters->addWidget(m_kindFilter);
    filters->addWidget(m_search, 1);
    layout->addLayout(filters);

    m_errorModel = new RunErrorModel(this);
    m_errorView = new QTableView(page);
    m_errorView->setModel(m_errorModel);
    m_errorView->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_errorView->setSelectionMode(QAbstractItemView::SingleSelection);
    m_errorView->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_errorView->verticalHeader()->setVisible(false);
    m_errorView->verticalHeader()->setDefaultSectionSize(
        int(m_errorView->fontMetrics().height() * 1.7));
    m_errorView->setAlternatingRowColors(true);
    m_errorView->setWordWrap(false);
    m_errorView->horizontalHeader()->setSectionResizeMode(
        RunErrorModel::ReferenceColumn, QHeaderView::Stretch);
    m_errorView->horizontalHeader()->setSectionResizeMode(
        RunErrorModel::RunColumn, QHeaderView::Stretch);
    m_errorView->setToolTip(tr("Double-click or press Enter to open the passage"));
    layout->addWidget(m_errorView, 1);

    connect(m_functionFilter, &QComboBox::currentIndexChanged, this, [this] { applyFilter(); });
    connect(m_kindFilter, &QComboBox::currentIndexChanged, this, [this] { applyFilter(); });
    connect(m_search, &QLineEdit::textChanged, this, [this] { applyFilter(); });
    connect(m_errorView, &QTableView::activated, this,
        [this](const QModelIndex &index) { openError(index.row()); });
    connect(m_errorSummary, &QTableWidget::cellClicked, this, [this](int row, int column) {
        // Columns 3..6 are the four kinds of error; row 4 is the total.
        if (column < 3)
            return;
        const RunErrorKind kinds[] = {RunErrorKind::FalsePositive, RunErrorKind::Miss,
            RunErrorKind::WrongFunction, RunErrorKind::Boundary};
        m_kindFilter->setCurrentIndex(m_kindFilter->findData(int(kinds[column - 3])));
        m_functionFilter->setCurrentIndex(row < 4 ? m_functionFilter->findData(row) : 0);
    });
    return page;
}

void ExtractorWindow::fillReferences()
{
    m_reference->clear();
    m_reference->addItem(tr("Gold"), LayerSpec {LayerKind::Gold, {}}.key());
    if (auto coders = m_project.coders()) {
        std::vector<Coder> sorted = *coders;
        std::ranges::sort(sorted, {}, &Coder::pseudonym);
        for (const Coder &c : sorted)
            m_reference->addItem(
                tr("Coder %1").arg(c.pseudonym), LayerSpec {LayerKind::Coder, c.pseudonym}.key());
    }
}

void ExtractorWindow::reloadRuns()
{
    QStringList selected;
    for (const QModelIndex &i : m_runs->selectionModel()->selectedRows())
        selected << m_runs->item(i.row(), RunName)->text();
    m_filling = true;
    m_runs->setRowCount(0);
    auto runs = ExtractorRuns::runs(m_project);
    if (!runs) {
        setStatus(runs.error().message);
        m_filling = false;
        return;
    }
    // Newest first: the run just made is the one a data team looks at.
    std::vector<ExtractorRun> list = *runs;
    std::ranges::reverse(list);
    for (const ExtractorRun &run : list) {
        const int row = m_runs->rowCount();
        m_runs->insertRow(row);
        m_runs->setItem(row, RunName, cell(run.name, Qt::AlignLeft | Qt::AlignVCenter));
        m_runs->setItem(row, RunVersion, cell(run.version, Qt::AlignLeft | Qt::AlignVCenter));
        const QDateTime made = QDateTime::fromString(run.createdAt, Qt::ISODate);
        auto *madeItem =
            cell(made.isValid() ? made.toLocalTime().toString(QStringLiteral("yyyy-MM-dd HH:mm"))
                                : run.createdAt,
                Qt::AlignLeft | Qt::AlignVCenter);
        madeItem->setToolTip(run.createdAt);
        m_runs->setItem(row, RunCreated, madeItem);
        auto *parametersItem =
            cell(parameterText(run.parameters), Qt::AlignLeft | Qt::AlignVCenter);
        parametersItem->setToolTip(
            QString::fromUtf8(QJsonDocument(run.parameters).toJson(QJsonDocument::Indented)));
        m_runs->setItem(row, RunParameters, parametersItem);
        auto spans = ExtractorRuns::spanCount(m_project, run.id);
        m_runs->setItem(row, RunSpans, cell(spans ? QString::number(*spans) : tr("?")));
    }
    m_runs->resizeColumnsToContents();
    m_runs->horizontalHeader()->setSectionResizeMode(RunParameters, QHeaderView::Stretch);
    if (selected.isEmpty() && m_runs->rowCount() > 0)
        selected << m_runs->item(0, RunName)->text();
    m_filling = false;
    if (m_runs->rowCount() == 0) {
        showRunDetails();
        m_outcome.reset();
        showOutcome();
        setStatus(tr("This project has no extractor runs yet. Make one with "
                     "“fourfold-cli extract”, or import an extractor's spans with it."));
        return;
    }
    selectRuns(selected);
}

void ExtractorWindow::selectRuns(const QStringList &names)
{
    m_filling = true;
    m_runs->clearSelection();
    bool first = true;
    for (const QString &name : names)
        for (int row = 0; row < m_runs->rowCount(); ++row) {
            if (m_runs->item(row, RunName)->text() != name)
                continue;
            if (first)
                m_runs->setCurrentCell(
                    row, RunName, QItemSelectionModel::ClearAndSelect | QItemSelectionModel::Rows);
            else
                m_runs->selectionModel()->select(m_runs->model()->index(row, RunName),
                    QItemSelectionModel::Select | QItemSelectionModel::Rows);
            first = false;
        }
    m_filling = false;
    compute();
}

void ExtractorWindow::showRunDetails()
{
    const int row = m_runs->currentRow();
    if (row < 0) {
        m_runDetails->setText(tr("No run selected."));
        return;
    }
    auto text = [&](int column) { return m_runs->item(row, column)->text().toHtmlEscaped(); };
    m_runDetails->setText(tr("<b>%1</b>, version %2, made %3, %4 spans<br>%5")
                              .arg(text(RunName), text(RunVersion), text(RunCreated),
                                  text(RunSpans), text(RunParameters)));
}

void ExtractorWindow::setReference(const LayerSpec &reference)
{
    const int i = m_reference->findData(reference.key());
    if (i >= 0)
        m_reference->setCurrentIndex(i);
}

void ExtractorWindow::setMatchMode(reliability::MatchMode mode)
{
    m_mode->setCurrentIndex(m_mode->findData(matchModeKey(mode)));
}

ExtractorRequest ExtractorWindow::request() const
{
    ExtractorRequest r;
    r.projectPath = m_project.path();
    // The current run first: its errors and confusion are shown.
    const int current = m_runs->currentRow();
    QList<int> rows;
    for (const QModelIndex &i : m_runs->selectionModel()->selectedRows())
        rows << i.row();
    std::ranges::sort(rows);
    if (rows.contains(current)) {
        rows.removeAll(current);
        rows.prepend(current);
    }
    for (int row : rows)
        r.runs << m_runs->item(row, RunName)->text();
    if (auto spec = LayerSpec::parse(m_reference->currentData().toString()))
        r.against = *spec;
    r.mode =
        matchModeFromKey(m_mode->currentData().toString()).value_or(reliability::MatchMode::Strict);
    r.agreementUnit =
        unitKindFromKey(m_unit->currentData().toString()).value_or(UnitKind::Sentence);
    return r;
}

void ExtractorWindow::compute()
{
    if (isRunning()) {
        m_pending = true;
        return;
    }
    m_running = request();
    if (m_running.runs.isEmpty()) {
        m_outcome.reset();
        showOutcome();
        setStatus(tr("Select a run to score."));
        return;
    }
    m_pending = false;
    m_busy = true;
    m_progress->setVisible(true);
    setStatus(tr("Scoring %n run(s)…", nullptr, int(m_running.runs.size())));
    m_watcher.setFuture(
        QtConcurrent::run([request = m_running] { return runExtractorJob(request); }));
}

bool ExtractorWindow::isRunning() const
{
    // Until finish() has taken the result: the future may be done while its signal is queued.
    return m_busy;
}

void ExtractorWindow::finish()
{
    m_progress->setVisible(false);
    m_busy = false;
    Result<ExtractorOutcome> result = m_watcher.result();
    if (m_pending) {
        // The controls changed meanwhile: these results are already out of date.
        compute();
        return;
    }
    if (!result) {
        m_outcome.reset();
        showOutcome();
        setStatus(result.error().message);
        emit computed(false);
        return;
    }
    m_outcome = std::move(*result);
    showOutcome();
    emit computed(true);
}

const RunOutcome *ExtractorWindow::currentRun() const
{
    if (!m_outcome || m_outcome->runs.empty())
        return nullptr;
    return &m_outcome->runs.front();
}

QString ExtractorWindow::statusMessage() const
{
    return m_status->text();
}

void ExtractorWindow::setStatus(const QString &text)
{
    m_status->setText(text);
}

QString ExtractorWindow::referenceName(const LayerSpec &spec) const
{
    return spec.kind == LayerKind::Gold ? tr("gold") : tr("coder %1").arg(spec.name);
}

void ExtractorWindow::showOutcome()
{
    showScores();
    showCurrentRun();
    if (!m_outcome)
        return;
    const RunOutcome *run = currentRun();
    if (run && run->scores)
        setStatus(tr("%n article(s) with %1 scored.", nullptr, run->scores->articles)
                      .arg(referenceName(m_running.against)));
    else if (run)
        setStatus(run->scoreError);
}

void ExtractorWindow::showScores()
{
    m_scores->setRowCount(0);
    m_scores->clearSpans();
    m_bandNote->clear();
    if (!m_outcome)
        return;
    QStringList notes;
    for (const RunOutcome &run : m_outcome->runs) {
        // The run's name heads its block of rows, across the table.
        const int head = m_scores->rowCount();
        m_scores->insertRow(head);
        auto *runName = cell(run.run, Qt::AlignLeft | Qt::AlignVCenter);
        QFont runFont = runName->font();
        runFont.setBold(true);
        runName->setFont(runFont);
        runName->setBackground(palette().color(QPalette::AlternateBase).darker(104));
        m_scores->setItem(head, 0, runName);
        m_scores->setSpan(head, 0, 1, m_scores->columnCount());
        auto addRow = [&](const QString &function, const QColor &colour,
                          const reliability::SpanCounts *counts, std::optional<double> p,
                          std::optional<double> r, std::optional<double> f,
                          const FigureIntervals *intervals, const FunctionBand *band) {
            const int row = m_scores->rowCount();
            m_scores->insertRow(row);
            auto *name = cell(function, Qt::AlignLeft | Qt::AlignVCenter);
            if (colour.isValid())
                name->setData(Qt::DecorationRole, colour);
            else {
                QFont bold = name->font();
                bold.setBold(true);
                name->setFont(bold);
            }
            m_scores->setItem(row, 0, name);
            m_scores->setItem(row, 1, cell(figure(p)));
            m_scores->setItem(row, 2, cell(figure(r)));
            auto *f1 = cell(figure(f));
            QFont bold = f1->font();
            bold.setBold(true);
            f1->setFont(bold);
            if (intervals)
                f1->setToolTip(
                    tr("Precision %1, recall %2 (95% bootstrap intervals)")
                        .arg(interval(intervals->precision), interval(intervals->recall)));
            m_scores->setItem(row, 3, f1);
            m_scores->setItem(row, 4, cell(intervals ? interval(intervals->f1) : QString()));
            if (counts) {
                m_scores->setItem(row, 5, cell(count(counts->correct)));
                m_scores->setItem(row, 6, cell(count(counts->incorrect)));
                m_scores->setItem(row, 7, cell(count(counts->partial)));
                m_scores->setItem(row, 8, cell(count(counts->missing)));
                m_scores->setItem(row, 9, cell(count(counts->spurious)));
            }
            if (band) {
                m_scores->setItem(row, 10, cell(figure(band->runMean)));
                m_scores->setItem(row, 11,
                    cell(band->bandLow && band->bandHigh ? QStringLiteral("%1 … %2").arg(
                             figure(band->bandLow), figure(band->bandHigh))
                                                         : QStringLiteral("—")));
                QString position;
                if (band->position == QLatin1String("below"))
                    position = tr("▼ below");
                else if (band->position == QLatin1String("inside"))
                    position = tr("● inside");
                else if (band->position == QLatin1String("above"))
                    position = tr("▲ above");
                else
                    position = tr("undefined");
                m_scores->setItem(row, 12, cell(position, Qt::AlignLeft | Qt::AlignVCenter));
            }
        };
        if (!run.scores) {
            const int row = m_scores->rowCount();
            m_scores->insertRow(row);
            m_scores->setItem(row, 0, cell(run.scoreError, Qt::AlignLeft | Qt::AlignVCenter));
            m_scores->setSpan(row, 0, 1, m_scores->columnCount());
            continue;
        }
        const RunScores &s = *run.scores;
        for (FramingFunction fn : kFramingFunctions) {
            const auto i = std::size_t(fn);
            const reliability::SpanCounts &c = s.perFunction[i];
            addRow(functionName(fn), functionStyle(fn).colour, &c, c.precision, c.recall, c.f1,
                s.replicates ? &s.perFunctionIntervals[i] : nullptr,
                run.agreement ? &run.agreement->functions[i] : nullptr);
        }
        addRow(tr("Micro"), QColor(), &s.micro, s.micro.precision, s.micro.recall, s.micro.f1,
            s.replicates ? &s.microIntervals : nullptr, nullptr);
        addRow(tr("Macro"), QColor(), nullptr, s.macroPrecision, s.macroRecall, s.macroF1,
            s.replicates ? &s.macroIntervals : nullptr, nullptr);
        if (run.agreement)
            notes << tr(
                "%1: alpha on %n unit(s) (%2) with coders %3.", nullptr, run.agreement->units)
                         .arg(run.run, m_unit->currentText(),
                             run.agreement->coders.join(QStringLiteral(", ")));
        else
            notes << tr("%1: no band with the coders — %2").arg(run.run, run.agreementError);
    }
    m_scores->resizeColumnsToContents();
    notes.prepend(tr("Scored against %1, %2 matching; intervals from %n bootstrap replicate(s) "
                     "over articles.",
        nullptr, m_running.bootstrapReplicates)
                      .arg(referenceName(m_running.against), matchModeKey(m_running.mode)));
    m_bandNote->setText(notes.join(QLatin1Char('\n')));
}

void ExtractorWindow::showCurrentRun()
{
    const RunOutcome *run = currentRun();
    m_errorModel->setErrors(run && run->errors ? run->errors : std::nullopt);
    applyFilter();
    m_errorView->resizeColumnToContents(RunErrorModel::FunctionColumn);
    m_errorView->resizeColumnToContents(RunErrorModel::KindColumn);
    m_errorView->resizeColumnToContents(RunErrorModel::ArticleColumn);
    if (run && run->errors)
        m_errorTitle->setText(
            tr("Errors of run <b>%1</b> against %2 (%3 matching) on %n "
               "article(s). Double-click an error to see its passage.",
                nullptr, int(run->errors->articles.size()))
                .arg(run->run.toHtmlEscaped(), referenceName(run->errors->against),
                    matchModeKey(run->errors->mode)));
    else
        m_errorTitle->setText(run ? run->scoreError : tr("No run scored."));
    showErrorSummary(run);
    showConfusion(run);
    if (m_passage->isVisible())
        m_passage->hide();
}

void ExtractorWindow::showErrorSummary(const RunOutcome *run)
{
    m_errorSummary->clearContents();
    for (int row = 0; row < 5; ++row) {
        std::optional<FramingFunction> fn;
        if (row < 4)
            fn = kFramingFunctions[std::size_t(row)];
        auto *name = cell(fn ? functionName(*fn) : tr("All"), Qt::AlignLeft | Qt::AlignVCenter);
        if (fn)
            name->setData(Qt::DecorationRole, functionStyle(*fn).colour);
        m_errorSummary->setItem(row, 0, name);
        if (!run || !run->errors)
            continue;
        const RunErrors &e = *run->errors;
        int references = 0, predicted = 0;
        for (const RunSpanOutcome &o : e.outcomes) {
            references += o.reference && (!fn || o.reference->function == *fn) ? 1 : 0;
            predicted += o.predicted && (!fn || o.predicted->function == *fn) ? 1 : 0;
        }
        m_errorSummary->setItem(row, 1, cell(QString::number(references)));
        m_errorSummary->setItem(row, 2, cell(QString::number(predicted)));
        const RunErrorKind kinds[] = {RunErrorKind::FalsePositive, RunErrorKind::Miss,
            RunErrorKind::WrongFunction, RunErrorKind::Boundary};
        for (int k = 0; k < 4; ++k)
            m_errorSummary->setItem(row, 3 + k, cell(QString::number(e.count(kinds[k], fn))));
    }
    m_errorSummary->resizeRowsToContents();
    int height =
        m_errorSummary->horizontalHeader()->sizeHint().height() + 2 * m_errorSummary->frameWidth();
    for (int row = 0; row < 5; ++row)
        height += m_errorSummary->rowHeight(row);
    m_errorSummary->setFixedHeight(height);
}

void ExtractorWindow::showConfusion(const RunOutcome *run)
{
    QStringList rows, columns;
    const QString ref = run && run->errors ? referenceName(run->errors->against) : tr("reference");
    for (FramingFunction f : kFramingFunctions) {
        rows << functionName(f);
        columns << functionName(f);
    }
    rows << tr("None (false positive)");
    columns << tr("None (miss)");
    m_confusion->setVerticalHeaderLabels(rows);
    m_confusion->setHorizontalHeaderLabels(columns);
    m_confusion->clearContents();
    m_confusionNote->clear();
    if (!run || !run->errors) {
        m_confusionTitle->setText(tr("No run scored."));
        return;
    }
    const RunErrors &e = *run->errors;
    m_confusionTitle->setText(
        tr("Rows: the function %1 gives a span; columns: the function run <b>%2</b> gives it "
           "(%3 matching). The diagonal is agreement on the function.")
            .arg(ref, run->run.toHtmlEscaped(), matchModeKey(e.mode)));
    int most = 1;
    for (const auto &row : e.confusion)
        for (int n : row)
            most = std::max(most, n);
    const QColor base = palette().color(QPalette::Base);
    const QColor ink = palette().color(QPalette::Text);
    for (int r = 0; r < 5; ++r)
        for (int c = 0; c < 5; ++c) {
            if (r == kNoFunction && c == kNoFunction) {
                m_confusion->setItem(r, c, cell(QString(), Qt::AlignCenter));
                continue;
            }
            const int n = e.confusion[std::size_t(r)][std::size_t(c)];
            auto *item = cell(QString::number(n), Qt::AlignCenter);
            // Agreement in the row function's colour; confusion in the text colour, so that
            // colour is never the only cue (the diagonal is also bold).
            const QColor tone =
                r == c ? functionStyle(kFramingFunctions[std::size_t(r)]).colour : ink;
            const double weight = n == 0 ? 0.0 : 0.10 + 0.45 * double(n) / double(most);
            QColor mixed = base;
            mixed.setRgbF(base.redF() * float(1 - weight) + tone.redF() * float(weight),
                base.greenF() * float(1 - weight) + tone.greenF() * float(weight),
                base.blueF() * float(1 - weight) + tone.blueF() * float(weight));
            item->setBackground(mixed);
            item->setForeground(badgeTextColour(mixed));
            if (r == c) {
                QFont bold = item->font();
                bold.setBold(true);
                item->setFont(bold);
            }
            m_confusion->setItem(r, c, item);
        }

    // In words: the function pairs most often confused, largest first.
    struct Pair {
        int count, reference, predicted;
    };
    std::vector<Pair> pairs;
    for (int r = 0; r < 4; ++r)
        for (int c = 0; c < 4; ++c)
            if (r != c && e.confusion[std::size_t(r)][std::size_t(c)] > 0)
                pairs.push_back({e.confusion[std::size_t(r)][std::size_t(c)], r, c});
    std::ranges::stable_sort(pairs, std::greater {}, &Pair::count);
    QStringList lines;
    for (size_t i = 0; i < pairs.size() && i < 3; ++i)
        lines << tr("%1 %2 → run %3: %4")
                     .arg(ref.left(1).toUpper() + ref.mid(1),
                         functionName(kFramingFunctions[std::size_t(pairs[i].reference)]).toLower(),
                         functionName(kFramingFunctions[std::size_t(pairs[i].predicted)]).toLower(),
                         QString::number(pairs[i].count));
    if (pairs.empty())
        lines << tr("The run gives no matched span another function.");
    m_confusionNote->setText(lines.join(QLatin1Char('\n')));
}

void ExtractorWindow::applyFilter()
{
    std::optional<FramingFunction> function;
    if (const int f = m_functionFilter->currentData().toInt(); f >= 0)
        function = kFramingFunctions[std::size_t(f)];
    std::optional<RunErrorKind> kind;
    if (const int k = m_kindFilter->currentData().toInt(); k >= 0)
        kind = RunErrorKind(k);
    m_errorModel->setFilter(function, kind, m_search->text());
}

bool ExtractorWindow::openError(int row)
{
    const RunSpanOutcome *o = m_errorModel->outcome(row);
    if (!o || !m_errorModel->errors())
        return false;
    auto article = m_project.article(o->article);
    if (!article) {
        setStatus(article.error().message);
        return false;
    }
    m_errorView->selectRow(row);
    m_passage->setContent(*article, *m_errorModel->errors(), m_errorModel->outcomeIndex(row));
    m_passage->show();
    m_passage->raise();
    m_passage->activateWindow();
    return true;
}

} // namespace fourfold
