#pragma once
// The lead's study design, one window with four pages: draw the reliability (or pilot) sample,
// deal the rest of the articles to coders, see and give assignments by coder and phase, and
// compare codebook versions with the annotations made under an older one. Everything goes
// through the study-design units of core/project (subsample_draw, assignment_plans,
// codebook_versions, outdated_annotations); the window only presents plans and errors, and
// nothing is written until the lead presses the page's commit button.

#include "core/model/coder.h"
#include "core/project/assignment_plans.h"
#include "core/project/subsample_draw.h"

#include <QWidget>

#include <memory>
#include <optional>
#include <vector>

class QButtonGroup;
class QCheckBox;
class QComboBox;
class QDoubleSpinBox;
class QLabel;
class QLineEdit;
class QListWidget;
class QPushButton;
class QRadioButton;
class QSpinBox;
class QTabWidget;
class QTableWidget;
class QTextBrowser;

namespace fourfold {

class CodingSession;
class Edit;
class Project;

class StudyDesignWindow : public QWidget
{
    Q_OBJECT
public:
    // `session` (a lead's) must outlive the window; its person is named in the event log. Every
    // write is one edit on the session's undo stack, and the window reads its pages again after
    // any edit about no article, the undo and redo of its own among them. The window is a
    // top-level window even with a parent.
    explicit StudyDesignWindow(CodingSession &session, QWidget *parent = nullptr);

    // Reloads every page from the project (after changes made elsewhere).
    void refresh();

    // The page indexes, for tests and screenshots.
    enum Page { DrawPage = 0, RestPage = 1, AssignmentsPage = 2, CodebookPage = 3 };
    void showPage(Page page);

private:
    QWidget *buildDrawPage();
    QWidget *buildRestPage();
    QWidget *buildAssignmentsPage();
    QWidget *buildCodebookPage();

    void loadCoders();
    void fillCoderList(QListWidget *list, bool leadsChecked);
    QStringList checkedCoders(const QListWidget *list) const;
    static void setSeedText(QLineEdit *edit, std::uint64_t seed);
    std::optional<std::uint64_t> seedOf(const QLineEdit *edit, QLabel *error);

    void planDraw();
    void commitDraw();
    // Withdraws the recorded draw of the phase shown (refused once coding started on it).
    void withdrawDraw();
    void clearDrawPlan();
    void showDraw(const Draw &draw, bool recorded);
    void loadRecordedDraw();
    Phase drawPhase() const;

    void planRest();
    void commitRest();
    void clearRestPlan();

    void loadAssignments();
    void giveArticles();

    void loadCodebook();
    void showDiff();
    void addCodebookVersion();

    void showError(QLabel *label, const QString &message);

    // Applies `edit`; on success puts it on the session's undo stack, else shows why in `error`.
    bool push(std::unique_ptr<Edit> edit, QLabel *error);

    CodingSession &m_session;
    Project &m_project;
    CoderId m_current;
    std::vector<Coder> m_coders;
    QTabWidget *m_tabs = nullptr;

    // draw
    QComboBox *m_drawPhase = nullptr;
    QRadioButton *m_bySize = nullptr;
    QSpinBox *m_drawSize = nullptr;
    QDoubleSpinBox *m_drawPercent = nullptr;
    QComboBox *m_stratify = nullptr;
    QCheckBox *m_leaveOutNearCopies = nullptr;
    QLineEdit *m_drawSeed = nullptr;
    QListWidget *m_drawCoders = nullptr;
    QDoubleSpinBox *m_alphaMin = nullptr;
    QComboBox *m_significance = nullptr;
    QDoubleSpinBox *m_rarest = nullptr;
    QPushButton *m_drawButton = nullptr;
    QPushButton *m_commitDraw = nullptr;
    QPushButton *m_withdrawDraw = nullptr;
    QLabel *m_drawState = nullptr;
    QLabel *m_drawError = nullptr;
    QLabel *m_advice = nullptr;
    QTableWidget *m_strata = nullptr;
    QListWidget *m_drawnArticles = nullptr;
    std::optional<Draw> m_plannedDraw;

    // rest
    QRadioButton *m_single = nullptr;
    QListWidget *m_restCoders = nullptr;
    QLineEdit *m_restSeed = nullptr;
    QPushButton *m_planRest = nullptr;
    QPushButton *m_commitRest = nullptr;
    QLabel *m_restError = nullptr;
    QLabel *m_restSummary = nullptr;
    QTableWidget *m_restPlan = nullptr;
    std::optional<AssignmentPlan> m_plannedRest;

    // assignments
    QTableWidget *m_matrix = nullptr;
    QTableWidget *m_rows = nullptr;
    QComboBox *m_givePhase = nullptr;
    QListWidget *m_giveArticles = nullptr;
    QListWidget *m_giveCoders = nullptr;
    QLabel *m_giveError = nullptr;

    // codebook
    QTableWidget *m_versions = nullptr;
    QComboBox *m_diffFrom = nullptr;
    QComboBox *m_diffTo = nullptr;
    QTextBrowser *m_diff = nullptr;
    QLabel *m_outdatedSummary = nullptr;
    QTableWidget *m_outdated = nullptr;
    QLabel *m_codebookError = nullptr;
};

} // namespace fourfold
