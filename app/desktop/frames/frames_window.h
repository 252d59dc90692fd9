#pragma once
// Lead → Frames…: the frames of the debate as clusters of articles by their frame elements
// (Matthes & Kohring 2008; core/frames). The lead picks a layer (gold, the consensus, a coder,
// an extractor run) and k; the window shows the k-choice chart (fusion-coefficient elbow, mean
// silhouette, Calinski–Harabasz for k = 2..10), the top of Ward's tree, each frame's size,
// stability and characteristic elements with the profile heat map (share in the frame against
// the share in all articles), frames by outlet and by month with chi-square and Cramér's V, and
// the articles of each frame (double-click opens one on the desk). The lead names the frames and
// saves the analysis in the project (an undoable step on the desk's undo stack); saved analyses
// are listed, opened again and deleted. The computation runs on a worker thread with progress
// and Cancel.

#include "app/desktop/frames/frames_job.h"

#include <QFutureWatcher>
#include <QWidget>

#include <atomic>
#include <memory>
#include <optional>

class QChartView;
class QComboBox;
class QLabel;
class QLineEdit;
class QProgressBar;
class QPushButton;
class QSpinBox;
class QStackedWidget;
class QTabWidget;
class QTableWidget;

namespace fourfold {

class CodingSession;
class DendrogramView;
class MessageBar;

class FramesWindow : public QWidget
{
    Q_OBJECT
public:
    explicit FramesWindow(CodingSession *session, QWidget *parent = nullptr);
    ~FramesWindow() override;

    // The request the controls make.
    FramesRequest request() const;
    // Sets the controls (an unknown layer leaves the layer as it is).
    void setRequest(const FramesRequest &request);
    // Starts the computation of request() on the worker thread (cancelling one running).
    void compute();
    void cancel();
    bool isRunning() const;
    // The last finished computation, if any.
    const std::optional<FramesOutcome> &outcome() const { return m_outcome; }
    // Saves the shown frames, named as in the frames table, as analysis `name` (an undoable step
    // on the desk's undo stack); tells the result in the message bar and returns it.
    Status save(const QString &name);
    // Opens the saved analysis `name`: its settings into the controls, computed again, its frame
    // names into the frames table once computed.
    Status openSaved(const QString &name);
    // Deletes the saved analysis `name` (undoable).
    Status deleteSaved(const QString &name);
    // Reads the list of saved analyses again (also after an undo or redo on the desk).
    void reloadSaved();

    // For tests and the screenshot.
    MessageBar *messageBar() const { return m_messages; }
    QTabWidget *tabs() const { return m_tabs; }
    QTableWidget *framesTable() const { return m_frames; }
    QTableWidget *profileTable() const { return m_profile; }
    QTableWidget *outletTable() const { return m_outlets; }
    QTableWidget *monthTable() const { return m_months; }
    QTableWidget *articleTable() const { return m_articles; }
    QComboBox *frameChoice() const { return m_frameChoice; }
    QComboBox *savedChoice() const { return m_saved; }
    DendrogramView *dendrogram() const { return m_dendrogram; }
    QChartView *kChart() const { return m_kChart; }
    QLabel *emptyState() const { return m_empty; }
    bool showsEmptyState() const;

signals:
    // A computation ended (ok: it gave results).
    void computed(bool ok);
    // The lead double-clicked an article of a frame: open it on the desk.
    void articleRequested(ArticleId article);

private:
    void finish();
    void showProgress(int done, int total);
    void showOutcome();
    void showKChoice();
    void showFrames();
    void showGroups(QTableWidget *table, QLabel *test, const QString &name);
    void showArticles();
    void showEmpty(const QString &why);
    void updateControls();
    QStringList frameNames() const;

    CodingSession *m_session;
    MessageBar *m_messages = nullptr;
    QComboBox *m_layer = nullptr;
    QSpinBox *m_k = nullptr;
    QSpinBox *m_maxK = nullptr;
    QSpinBox *m_bootstrap = nullptr;
    QSpinBox *m_seed = nullptr;
    QPushButton *m_compute = nullptr;
    QPushButton *m_cancel = nullptr;
    QProgressBar *m_progress = nullptr;
    QStackedWidget *m_stack = nullptr;
    QLabel *m_empty = nullptr;
    QTabWidget *m_tabs = nullptr;
    QChartView *m_kChart = nullptr;
    QLabel *m_kSummary = nullptr;
    DendrogramView *m_dendrogram = nullptr;
    QTableWidget *m_frames = nullptr;
    QTableWidget *m_profile = nullptr;
    QTableWidget *m_outlets = nullptr;
    QLabel *m_outletTest = nullptr;
    QTableWidget *m_months = nullptr;
    QLabel *m_monthTest = nullptr;
    QComboBox *m_frameChoice = nullptr;
    QTableWidget *m_articles = nullptr;
    QLineEdit *m_saveName = nullptr;
    QPushButton *m_save = nullptr;
    QComboBox *m_saved = nullptr;
    QPushButton *m_open = nullptr;
    QPushButton *m_delete = nullptr;

    QFutureWatcher<Result<FramesOutcome>> m_watcher;
    std::shared_ptr<std::atomic<bool>> m_cancelFlag;
    std::optional<FramesOutcome> m_outcome;
    QStringList m_pendingNames; // names of an opened saved analysis, for the next outcome
};

} // namespace fourfold
