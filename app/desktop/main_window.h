#pragma once
// The workbench window: a start page, then the coding desk — the article list on the left, the
// article with its spans in the middle, and on the right the frame card, the article-level
// items, the span editor and the codebook.

#include "core/project/project.h"

#include <QMainWindow>

#include <memory>
#include <optional>

class QAction;
class QComboBox;
class QLabel;
class QLineEdit;
class QMenu;
class QPushButton;
class QStackedWidget;
class QTabWidget;
class QTableView;

namespace fourfold {

class ActivityClock;
class ArticleFilter;
class BackgroundSync;
class ArticleListModel;
class CodebookPanel;
class CoderLegend;
class CodingSession;
class LeadWindows;
class MessageBar;
class FrameCard;
class ItemForm;
class ReadingView;
class SpanEditor;

class MainWindow : public QMainWindow
{
    Q_OBJECT
public:
    explicit MainWindow(QWidget *parent = nullptr);
    ~MainWindow() override;

    // Opens `path` and starts coding as the person with `pseudonym`, or asks who codes when it is
    // empty. A lead gives `passphrase` (People::signIn: wrong → NotAllowed; a lead without one
    // yet sets it); without it the "Who is coding?" dialog asks. Returns the error to present if
    // the project cannot be opened (or nobody is chosen: Cancelled).
    Status openProject(const QString &path, const QString &pseudonym = {},
        const std::optional<QString> &passphrase = std::nullopt);

    // For tests and screenshots.
    LeadWindows *leadWindows() const { return m_lead; }
    // The background sync of a team working file (null for any other project); its line in
    // the status bar.
    BackgroundSync *backgroundSync() const { return m_sync.get(); }
    QLabel *syncStatusLabel() const { return m_syncStatus; }
    // Project → Join a team project…: the dialog, then the new working file opens.
    void joinTeam();
    MessageBar *messageBar() const { return m_messages; }
    CodingSession *session() const { return m_session.get(); }
    ReadingView *readingView() const { return m_reading; }
    CoderLegend *coderLegend() const { return m_legend; }
    FrameCard *frameCard() const { return m_card; }
    SpanEditor *spanEditor() const { return m_spanEditor; }
    ItemForm *itemForm() const { return m_items; }
    QTableView *articleList() const { return m_list; }
    QLineEdit *searchField() const { return m_search; }
    ArticleId currentArticle() const { return m_article; }
    // What the middle of the desk shows when there is no article to code, and its button (hidden
    // when there is nothing to do here); for tests. Empty text: an article is shown.
    QString emptyStateText() const;
    QPushButton *emptyStateButton() const { return m_emptyAction; }
    QPushButton *startPageButton(int index) const;
    void openArticle(ArticleId id);
    void selectSpan(AnnotationId id);
    void showShortcuts();

protected:
    void closeEvent(QCloseEvent *event) override;

private:
    QWidget *buildStartPage();
    QWidget *buildDesk();
    void buildMenus();
    void refreshList();
    void refreshArticle();
    void flushTime();
    void markDone();
    void nextArticle();
    void search(const QString &query);
    void chooseProject();
    void createProject();
    void importArticles();
    // Asks for the import's options (the split pattern, with a preview), imports `paths` (files or
    // a folder) and shows the report.
    void importPaths(const QStringList &paths);
    void openSample();
    void setLanguage(const QString &code);
    void showError(const QString &message);
    void showUnsavedEdit(const QString &editText, const QString &message);
    // Starts the background sync when the open project is a team working file.
    void startTeamSync(const QString &path);
    void askTeamPassword(const QString &server);
    void updateTitle();
    void updateEmptyState();

    std::unique_ptr<CodingSession> m_session;
    std::unique_ptr<BackgroundSync> m_sync; // has its own connection to the file
    ArticleId m_article;
    AnnotationId m_selected;

    QStackedWidget *m_pages = nullptr;
    ArticleListModel *m_articles = nullptr;
    ArticleFilter *m_filter = nullptr;
    QTableView *m_list = nullptr;
    QLineEdit *m_search = nullptr;
    QComboBox *m_statusFilter = nullptr;
    ReadingView *m_reading = nullptr;
    QLabel *m_articleHeader = nullptr;
    QStackedWidget *m_middlePages = nullptr; // 0: what to do next, 1: the open article
    QLabel *m_emptyText = nullptr;
    QPushButton *m_emptyAction = nullptr;
    QWidget *m_startButtons = nullptr;
    FrameCard *m_card = nullptr;
    ItemForm *m_items = nullptr;
    QTabWidget *m_tabs = nullptr;
    SpanEditor *m_spanEditor = nullptr;
    CoderLegend *m_legend = nullptr; // whose spans, while a lead shows every coder's
    CodebookPanel *m_codebook = nullptr;
    // The codebook version the span editor, the item form and the codebook panel show.
    CodebookVersionId m_codebookShown;
    QLabel *m_who = nullptr;
    QLabel *m_syncStatus = nullptr;
    QAction *m_showAll = nullptr;
    QAction *m_import = nullptr;
    QAction *m_undo = nullptr;
    QAction *m_redo = nullptr;
    ActivityClock *m_clock = nullptr;
    MessageBar *m_messages = nullptr;
    LeadWindows *m_lead = nullptr;
    QMenu *m_leadMenu = nullptr;
    bool m_columnsChosen = false;
};

} // namespace fourfold
