#pragma once
// The lead's reliability window: choose the unit, functions, coders and phase; see alpha with
// its bootstrap interval, the kappa family, the verdict and the sample-size warning as a table;
// see where reliability is lost (leave one coder / article out, function confusion, boundary
// habits); and charts: alpha per function, a coder-pair map, the confusion matrix and alpha
// over time. The computation runs off the GUI thread with a progress bar and can be cancelled.

#include "app/desktop/reliability/reliability_job.h"

#include <QFutureWatcher>
#include <QWidget>

#include <atomic>
#include <memory>
#include <optional>

class QCheckBox;
class QComboBox;
class QLabel;
class QListWidget;
class QProgressBar;
class QPushButton;
class QSpinBox;
class QTabWidget;
class QTableWidget;
class QChartView;

namespace fourfold {

class MatrixView;
class Project;

class ReliabilityWindow : public QWidget
{
    Q_OBJECT
public:
    // Reads the project's coders, codebook and path; the computation opens its own connection
    // to the same file, so `project` is only used on the GUI thread. The window is a top-level
    // window unless `parent` embeds it.
    explicit ReliabilityWindow(Project &project, QWidget *parent = nullptr);
    ~ReliabilityWindow() override;

    // The request the controls describe.
    ReliabilityRequest request() const;
    // Sets the controls (coders not in the project are ignored).
    void setRequest(const ReliabilityRequest &request);

    // Starts the computation (cancelling one that runs); results replace the old ones.
    void compute();
    // Asks a running computation to stop after its current step.
    void cancel();
    bool isRunning() const;
    // The last successful result, if any.
    const std::optional<ReliabilityOutcome> &outcome() const { return m_outcome; }
    // The last failure's message (empty after a success).
    QString errorMessage() const { return m_error; }

    // Tabs, for tests and screenshots: 0 table, 1 diagnostics, 2 alpha per function, 3 coder
    // pairs, 4 function confusion, 5 alpha over time.
    QTabWidget *tabs() const { return m_tabs; }
    QTableWidget *summaryTable() const { return m_summary; }
    QTableWidget *coderCostTable() const { return m_coderCosts; }
    QTableWidget *articleCostTable() const { return m_articleCosts; }
    QTableWidget *boundaryTable() const { return m_boundaries; }
    MatrixView *pairMap() const { return m_pairs; }
    MatrixView *confusionMap() const { return m_confusion; }
    QChartView *functionChart() const { return m_functionChart; }
    QChartView *driftChart() const { return m_driftChart; }

Q_SIGNALS:
    // After every computation: ok = results shown; false = failed or cancelled (see
    // errorMessage()).
    void computed(bool ok);

private:
    void buildControls(QWidget *panel);
    void updateControls();
    void showProgress(int done, int total);
    void finish();
    void showOutcome();
    void showSummary();
    void showContinuumSummary();
    void showDiagnostics();
    void showFunctionChart();
    void showPairs();
    void showConfusion();
    void showDrift();
    QString columnTitle(const ReliabilityColumn &column) const;

    Project &m_project;
    QString m_projectPath;
    QHash<QString, QString> m_articleTitles; // external id → title

    QComboBox *m_unit = nullptr;
    QComboBox *m_item = nullptr;
    QCheckBox *m_functions[4] = {};
    QListWidget *m_coders = nullptr;
    QComboBox *m_phase = nullptr;
    QCheckBox *m_gold = nullptr;
    QCheckBox *m_unfinished = nullptr;
    QSpinBox *m_replicates = nullptr;
    QComboBox *m_period = nullptr;
    QSpinBox *m_batchSize = nullptr;
    QPushButton *m_compute = nullptr;
    QPushButton *m_cancel = nullptr;
    QProgressBar *m_progress = nullptr;
    QLabel *m_message = nullptr;
    QLabel *m_articleCostsHeading = nullptr;
    QLabel *m_warning = nullptr;

    QTabWidget *m_tabs = nullptr;
    QTableWidget *m_summary = nullptr;
    QTableWidget *m_coderCosts = nullptr;
    QTableWidget *m_articleCosts = nullptr;
    QTableWidget *m_boundaries = nullptr;
    MatrixView *m_pairs = nullptr;
    MatrixView *m_confusion = nullptr;
    QChartView *m_functionChart = nullptr;
    QChartView *m_driftChart = nullptr;

    QFutureWatcher<Result<ReliabilityOutcome>> m_watcher;
    std::shared_ptr<std::atomic<bool>> m_cancelFlag;
    ReliabilityRequest m_running;
    std::optional<ReliabilityOutcome> m_outcome;
    QString m_error;
};

} // namespace fourfold
