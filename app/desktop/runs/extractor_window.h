#pragma once
// The lead's extractor window (design.md §6): the project's extractor runs side by side (name,
// version, time, parameters, spans), scored against gold or one coder in a chosen match mode —
// precision, recall and F1 per function with bootstrap intervals, micro and macro, and the run's
// alpha with the coders next to the coders' own pairwise band — the run's errors one by one
// (false positive, miss, wrong function, boundary; filterable), and the confusion between
// functions. Double-clicking an error opens its passage with the reference and the run side by
// side. The window only reads the project; the computation runs off the GUI thread.

#include "app/desktop/runs/extractor_job.h"

#include <QFutureWatcher>
#include <QWidget>

#include <optional>

class QComboBox;
class QLabel;
class QLineEdit;
class QProgressBar;
class QTabWidget;
class QTableView;
class QTableWidget;

namespace fourfold {

class Project;
class RunErrorModel;
class RunPassageWindow;

class ExtractorWindow : public QWidget
{
    Q_OBJECT
public:
    // Reads the project's runs and coders; the computation opens its own connection to the same
    // file, so `project` (which must outlive the window) is only used on the GUI thread. The
    // window is a top-level window unless `parent` embeds it. It computes the newest run against
    // gold at once when the project has runs and gold.
    explicit ExtractorWindow(Project &project, QWidget *parent = nullptr);
    ~ExtractorWindow() override;

    // Reads the runs again (after a run was made or deleted elsewhere) and recomputes.
    void reloadRuns();
    // The request the controls describe.
    ExtractorRequest request() const;
    // Selects these runs (unknown names are ignored); the first becomes the current run whose
    // errors and confusion are shown. Recomputes.
    void selectRuns(const QStringList &names);
    // Sets the reference (gold or a coder's pseudonym) and the match mode. Recomputes.
    void setReference(const LayerSpec &reference);
    void setMatchMode(reliability::MatchMode mode);

    // Starts the computation; a request made while one runs is computed after it.
    void compute();
    bool isRunning() const;
    const std::optional<ExtractorOutcome> &outcome() const { return m_outcome; }
    // The run whose errors are shown (the current row of the run table), or nothing.
    const RunOutcome *currentRun() const;
    // The last message of the status line (errors and summaries).
    QString statusMessage() const;

    // Opens the error in `row` of the error list in the passage window; false if there is none.
    bool openError(int row);

    // For tests and screenshots: tabs 0 scores, 1 errors, 2 confusion.
    QTabWidget *tabs() const { return m_tabs; }
    QTableWidget *runTable() const { return m_runs; }
    QTableWidget *scoreTable() const { return m_scores; }
    QTableWidget *errorSummary() const { return m_errorSummary; }
    QTableView *errorView() const { return m_errorView; }
    RunErrorModel *errorModel() const { return m_errorModel; }
    QTableWidget *confusionTable() const { return m_confusion; }
    QComboBox *functionFilter() const { return m_functionFilter; }
    QComboBox *kindFilter() const { return m_kindFilter; }
    RunPassageWindow *passageWindow() const { return m_passage; }

signals:
    // A computation ended (ok = false when it failed as a whole).
    void computed(bool ok);

private:
    QWidget *buildRunPanel();
    QWidget *buildErrorTab();
    void fillReferences();
    void finish();
    void showOutcome();
    void showScores();
    void showCurrentRun();
    void showConfusion(const RunOutcome *run);
    void showErrorSummary(const RunOutcome *run);
    void applyFilter();
    void setStatus(const QString &text);
    void showRunDetails();
    QString referenceName(const LayerSpec &spec) const;

    Project &m_project;
    QTableWidget *m_runs = nullptr;
    QLabel *m_runDetails = nullptr;
    QComboBox *m_reference = nullptr;
    QComboBox *m_mode = nullptr;
    QComboBox *m_unit = nullptr;
    QLabel *m_status = nullptr;
    QProgressBar *m_progress = nullptr;
    QTabWidget *m_tabs = nullptr;
    QTableWidget *m_scores = nullptr;
    QLabel *m_bandNote = nullptr;
    QLabel *m_errorTitle = nullptr;
    QTableWidget *m_errorSummary = nullptr;
    QComboBox *m_functionFilter = nullptr;
    QComboBox *m_kindFilter = nullptr;
    QLineEdit *m_search = nullptr;
    QTableView *m_errorView = nullptr;
    RunErrorModel *m_errorModel = nullptr;
    QLabel *m_confusionTitle = nullptr;
    QTableWidget *m_confusion = nullptr;
    QLabel *m_confusionNote = nullptr;
    RunPassageWindow *m_passage = nullptr;

    QFutureWatcher<Result<ExtractorOutcome>> m_watcher;
    ExtractorRequest m_running;
    bool m_pending = false;
    bool m_busy = false; // a computation started and its result not yet taken
    bool m_filling = false; // controls are being set up: no recomputation yet
    std::optional<ExtractorOutcome> m_outcome;
};

} // namespace fourfold
