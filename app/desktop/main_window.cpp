#include "app/desktop/main_window.h"

#include "app/desktop/activity_clock.h"
#include "app/desktop/article_filter.h"
#include "app/desktop/article_list_model.h"
#include "app/desktop/codebook_panel.h"
#include "app/desktop/coder_dialog.h"
#include "app/desktop/coder_legend.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/frame_card.h"
#include "app/desktop/function_style.h"
#include "app/desktop/import_dialog.h"
#include "app/desktop/import_options_dialog.h"
#include "app/desktop/item_form.h"
#include "app/desktop/lead_windows.h"
#include "app/desktop/message_bar.h"
#include "app/desktop/reading_view.h"
#include "app/desktop/shortcut_table.h"
#include "app/desktop/span_editor.h"
#include "app/desktop/study/training_feedback_dialog.h"
#include "app/desktop/team/background_sync.h"
#include "app/desktop/team/join_team_dialog.h"
#include "app/desktop/window_placement.h"
#include "core/team/team_credentials.h"

#include <QActionGroup>
#include <QApplication>
#include <QCloseEvent>
#include <QComboBox>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QInputDialog>
#include <QKeySequence>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QMenu>
#include <QMenuBar>
#include <QMessageBox>
#include <QPushButton>
#include <QSettings>
#include <QSplitter>
#include <QStackedWidget>
#include <QStatusBar>
#include <QTabWidget>
#include <QTableView>
#include <QTimer>
#include <QToolButton>
#include <QUndoStack>
#include <QVBoxLayout>

namespace fourfold {

namespace {

QString samplePath()
{
    // In the build tree the sample project sits beside app/: build/sample-project/demo.fourfold.
    const QDir bin(QCoreApplication::applicationDirPath());
    for (const QString &candidate : {QStringLiteral("../../sample-project/demo.fourfold"),
             QStringLiteral("../sample-project/demo.fourfold")})
        if (QFileInfo::exists(bin.filePath(candidate)))
            return QFileInfo(bin.filePath(candidate)).canonicalFilePath();
    return {};
}

} // namespace

MainWindow::MainWindow(QWidget *parent)
    : QMainWindow(parent)
    , m_clock(new ActivityClock(this))
    , m_messages(new MessageBar(this))
    , m_lead(new LeadWindows(this, m_messages))
{
    m_pages = new QStackedWidget(this);
    m_pages->addWidget(buildStartPage());
    m_pages->addWidget(buildDesk());
    auto *central = new QWidget(this);
    auto *centralColumn = new QVBoxLayout(central);
    centralColumn->setContentsMargins(0, 0, 0, 0);
    centralColumn->setSpacing(0);
    centralColumn->addWidget(m_messages);
    centralColumn->addWidget(m_pages, 1);
    setCentralWidget(central);
    buildMenus();
    m_who = new QLabel(this);
    m_syncStatus = new QLabel(this);
    m_syncStatus->setContentsMargins(0, 0, 16, 0); // apart from who is coding
    m_syncStatus->hide();
    statusBar()->addPermanentWidget(m_syncStatus);
    statusBar()->addPermanentWidget(m_who);
    updateTitle();
    placeWindow(this, QStringLiteral("MainWindow"), QSize(1500, 920));

    // Hand active time to the project every half minute, so a crash loses little of it.
    auto *flush = new QTimer(this);
    connect(flush, &QTimer::timeout, this, &MainWindow::flushTime);
    flush->start(30 * 1000);
}

MainWindow::~MainWindow()
{
    // The lead's windows refer to the session's project: close them before it goes.
    m_lead->closeAll();
}

QWidget *MainWindow::buildStartPage()
{
    auto *page = new QWidget(this);
    auto *outer = new QVBoxLayout(page);
    outer->addStretch(2);
    auto *title =
        new QLabel(tr("<h1>Fourfold</h1><p>Manual frame analysis of news and opinion articles: "
                      "problem, cause, evaluation, remedy.</p>"),
            page);
    title->setAlignment(Qt::AlignCenter);
    outer->addWidget(title);
    m_startButtons = new QWidget(page);
    auto *buttons = new QHBoxLayout(m_startButtons);
    buttons->addStretch();
    auto *create = new QPushButton(tr("New project…"), page);
    create->setToolTip(tr("Start a study: a new project file, then import its articles."));
    connect(create, &QPushButton::clicked, this, &MainWindow::createProject);
    buttons->addWidget(create);
    auto *open = new QPushButton(tr("Open a project…"), page);
    connect(open, &QPushButton::clicked, this, &MainWindow::chooseProject);
    buttons->addWidget(open);
    auto *sample = new QPushButton(tr("Open the sample project"), page);
    sample->setEnabled(!samplePath().isEmpty());
    sample->setToolTip(tr("Invented demo data: three local controversies, three coders."));
    connect(sample, &QPushButton::clicked, this, &MainWindow::openSample);
    buttons->addWidget(sample);
    buttons->addStretch();
    outer->addWidget(m_startButtons);
    auto *recent = new QListWidget(page);
    recent->setAccessibleName(tr("Recent projects"));
    recent->setMaximumWidth(640);
    for (const QString &p : QSettings().value(QStringLiteral("recentProjects")).toStringList())
        if (QFileInfo::exists(p)) // moved or deleted projects are not offered
            recent->addItem(p);
    connect(recent, &QListWidget::itemActivated, this, [this](QListWidgetItem *item) {
        if (auto st = openProject(item->text()); !st && st.error().code != ErrorCode::Cancelled)
            QMessageBox::warning(this, tr("Cannot open project"), st.error().toString());
    });
    auto *recentRow = new QHBoxLayout;
    recentRow->addStretch();
    recentRow->addWidget(recent);
    recentRow->addStretch();
    auto *recentLabel = new QLabel(tr("Recent projects"), page);
    recentLabel->setVisible(recent->count() > 0);
    recent->setVisible(recent->count() > 0);
    outer->addSpacing(16);
    outer->addWidget(recentLabel, 0, Qt::AlignHCenter);
    outer->addLayout(recentRow);
    outer->addStretch(3);
    return page;
}

QWidget *MainWindow::buildDesk()
{
    auto *splitter = new QSplitter(this);

    // Left: the article list with search and a status filter.
    auto *left = new QWidget(splitter);
    auto *leftLayout = new QVBoxLayout(left);
    leftLayout->setContentsMargins(0, 0, 0, 0);
    m_search = new QLineEdit(left);
    m_search->setPlaceholderText(tr("Search the texts…"));
    m_search->setClearButtonEnabled(true);
    m_search->setAccessibleName(tr("Search articles"));
    connect(m_search, &QLineEdit::returnPressed, this, [this] { search(m_search->text()); });
    connect(m_search, &QLineEdit::textChanged, this, [this](const QString &t) {
        if (t.isEmpty())
            search(QString());
    });
    m_statusFilter = new QComboBox(left);
    m_statusFilter->setAccessibleName(tr("Status filter"));
    m_statusFilter->addItem(tr("All articles"), QString());
    m_statusFilter->addItem(tr("Not started"), QStringLiteral("assigned"));
    m_statusFilter->addItem(tr("In progress"), QStringLiteral("started"));
    m_statusFilter->addItem(tr("Done"), QStringLiteral("done"));
    auto *filters = new QHBoxLayout;
    filters->addWidget(m_search, 3);
    filters->addWidget(m_statusFilter, 1);
    leftLayout->addLayout(filters);
    m_articles = new ArticleListModel(this);
    m_filter = new ArticleFilter(this);
    m_filter->setSourceModel(m_articles);
    connect(m_statusFilter, &QComboBox::currentIndexChanged, this,
        [this] { m_filter->setStatus(m_statusFilter->currentData().toString()); });
    m_list = new QTableView(left);
    m_list->setModel(m_filter);
    m_list->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_list->setSelectionMode(QAbstractItemView::SingleSelection);
    m_list->verticalHeader()->hide();
    m_list->setWordWrap(false);
    m_list->setAccessibleName(tr("Articles"));
    m_list->horizontalHeader()->setSectionResizeMode(ArticleListModel::Title, QHeaderView::Stretch);
    leftLayout->addWidget(m_list);
    // Right-click on the header shows or hides columns (outlet and length start hidden).
    m_list->horizontalHeader()->setContextMenuPolicy(Qt::CustomContextMenu);
    connect(m_list->horizontalHeader(), &QWidget::customContextMenuRequested, this,
        [this](const QPoint &pos) {
            QMenu menu(this);
            for (int c = 0; c < ArticleListModel::ColumnCount; ++c) {
                if (c == ArticleListModel::Title)
                    continue;
                QAction *a = menu.addAction(m_articles->headerData(c, Qt::Horizontal).toString());
                a->setCheckable(true);
                a->setChecked(!m_list->isColumnHidden(c));
                connect(a, &QAction::toggled, this,
                    [this, c](bool on) { m_list->setColumnHidden(c, !on); });
            }
            menu.exec(m_list->horizontalHeader()->mapToGlobal(pos));
        });
    connect(m_list->selectionModel(), &QItemSelectionModel::currentRowChanged, this,
        [this](const QModelIndex &current) {
            if (current.isValid())
                openArticle(ArticleId {current.data(ArticleListModel::ArticleIdRole).toLongLong()});
        });

    // Middle: the function buttons above the article.
    auto *middle = new QWidget(splitter);
    auto *middleLayout = new QVBoxLayout(middle);
    middleLayout->setContentsMargins(0, 0, 0, 0);
    auto *bar = new QHBoxLayout;
    m_articleHeader = new QLabel(middle);
    m_articleHeader->setTextFormat(Qt::RichText);
    m_articleHeader->setWordWrap(true);
    middleLayout->addWidget(m_articleHeader);
    m_reading = new ReadingView(middle);
    for (FramingFunction f : kFramingFunctions) {
        const FunctionStyle style = functionStyle(f);
        auto *button = new QToolButton(middle);
        button->setText(QStringLiteral("%1  %2  ·  %3")
                            .arg(style.letter)
                            .arg(functionName(f))
                            .arg(functionShortcutKey(f)));
        button->setToolTip(tr("Mark the selected text as %1 (key %2)")
                               .arg(functionName(f))
                               .arg(functionShortcutKey(f)));
        button->setAccessibleName(functionName(f));
        button->setStyleSheet(
            QStringLiteral("QToolButton { border-bottom: 3px solid %1; padding: 3px 8px; }")
                .arg(style.colour.name()));
        connect(button, &QToolButton::clicked, this, [this, f] { m_reading->requestFunction(f); });
        bar->addWidget(button);
    }
    bar->addStretch();
    auto *done = new QPushButton(tr("Mark as done"), middle);
    done->setToolTip(tr("Mark this article as done and open the next one (%1)")
                         .arg(DeskKeys::markDone().toString(QKeySequence::NativeText)));
    connect(done, &QPushButton::clicked, this, &MainWindow::markDone);
    bar->addWidget(done);
    middleLayout->addLayout(bar);
    m_legend = new CoderLegend(middle);
    middleLayout->addWidget(m_legend);
    middleLayout->addWidget(m_reading, 1);
    m_middlePages = new QStackedWidget(splitter);
    auto *empty = new QWidget(m_middlePages);
    auto *emptyLayout = new QVBoxLayout(empty);
    emptyLayout->addStretch(2);
    m_emptyText = new QLabel(empty);
    m_emptyText->setTextFormat(Qt::RichText);
    m_emptyText->setWordWrap(true);
    m_emptyText->setAlignment(Qt::AlignCenter);
    m_emptyText->setMinimumWidth(360);
    m_emptyText->setMaximumWidth(560);
    // In a row with stretches rather than aligned: an aligned label gets no height for its width
    // and its wrapped lines are cut off.
    auto *emptyRow = new QHBoxLayout;
    emptyRow->addStretch(1);
    emptyRow->addWidget(m_emptyText, 4);
    emptyRow->addStretch(1);
    emptyLayout->addLayout(emptyRow);
    m_emptyAction = new QPushButton(tr("Import articles…"), empty);
    connect(m_emptyAction, &QPushButton::clicked, this, &MainWindow::importArticles);
    emptyLayout->addWidget(m_emptyAction, 0, Qt::AlignHCenter);
    emptyLayout->addStretch(3);
    m_middlePages->addWidget(empty);
    m_middlePages->addWidget(middle);

    // Right: the frame card, the items under it, then the span editor and the codebook.
    auto *right = new QSplitter(Qt::Vertical, splitter);
    m_card = new FrameCard(right); // scrolls by itself when an article has many spans
    m_items = nullptr; // made once a session exists (it needs one)
    m_tabs = new QTabWidget(right);
    right->addWidget(m_card);
    right->addWidget(m_tabs);
    right->setStretchFactor(0, 3);
    right->setStretchFactor(1, 2);

    splitter->addWidget(left);
    splitter->addWidget(m_middlePages);
    splitter->addWidget(right);
    splitter->setStretchFactor(0, 2);
    splitter->setStretchFactor(1, 5);
    splitter->setStretchFactor(2, 3);
    splitter->setSizes({360, 760, 420});

    connect(m_reading, &ReadingView::createSpanRequested, this,
        [this](FramingFunction f, TextRange range) {
            if (!m_session || !m_article.isValid())
                return;
            if (m_session->addSpan(m_article, f, range))
                selectSpan(m_session->lastAddedSpan());
        });
    connect(m_reading, &ReadingView::relabelSpanRequested, this,
        [this](AnnotationId id, FramingFunction f) {
            if (const auto span = m_session->document().span(id)) {
                AnnotationContent content = span->content;
                if (content.function != f)
                    content.attributes = {}; // attributes belong to the old function's schema
                content.function = f;
                (void)m_session->changeSpan(id, content);
            }
        });
    connect(m_reading, &ReadingView::resizeSpanRequested, this,
        [this](AnnotationId id, TextRange range) {
            if (const auto span = m_session->document().span(id)) {
                AnnotationContent content = span->content;
                content.range = range;
                (void)m_session->changeSpan(id, content);
            }
        });
    connect(m_reading, &ReadingView::deleteSpanRequested, this, [this](AnnotationId id) {
        if (m_session->deleteSpan(id))
            selectSpan(AnnotationId {});
    });
    // The context menu also removes the selected span's links and withdraws answers.
    connect(m_reading, &ReadingView::contextMenuAboutToShow, this, [this](QMenu *menu) {
        if (m_spanEditor)
            m_spanEditor->addLinkActions(menu);
        if (m_items)
            m_items->addAnswerActions(menu);
    });
    connect(m_reading, &ReadingView::spanActivated, this, &MainWindow::selectSpan);
    // A new text selection clears the view's span selection: the panels follow.
    connect(m_reading, &ReadingView::selectedSpanChanged, this, [this](AnnotationId id) {
        if (id != m_selected)
            selectSpan(id);
    });
    connect(m_card, &FrameCard::spanActivated, this, [this](AnnotationId id) {
        selectSpan(id);
        m_reading->scrollToSpan(id);
    });
    return splitter;
}

void MainWindow::buildMenus()
{
    QMenu *project = menuBar()->addMenu(tr("&Project"));
    project->addAction(tr("&New project…"), QKeySequence::New, this, &MainWindow::createProject);
    project->addAction(tr("&Open…"), QKeySequence::Open, this, &MainWindow::chooseProject);
    m_import = project->addAction(tr("&Import articles…"), this, &MainWindow::importArticles);
    m_import->setEnabled(false);
    QAction *importFolder = project->addAction(tr("Import a &folder…"), this, [this] {
        const QString folder = QFileDialog::getExistingDirectory(this, tr("Import a folder"));
        if (!folder.isEmpty())
            importPaths(QStringList {folder});
    });
    importFolder->setEnabled(false);
    connect(m_import, &QAction::enabledChanged, importFolder, &QAction::setEnabled);
    project->addAction(tr("Open the &sample project"), this, &MainWindow::openSample);
    project->addAction(tr("Join a &team project…"), this, &MainWindow::joinTeam);
    project->addSeparator();
    project->addAction(tr("&Quit"), QKeySequence::Quit, this, &QWidget::close);

    QMenu *edit = menuBar()->addMenu(tr("&Edit"));
    m_undo = edit->addAction(tr("&Undo"));
    m_undo->setShortcut(QKeySequence::Undo);
    m_undo->setEnabled(false);
    m_redo = edit->addAction(tr("&Redo"));
    m_redo->setShortcut(QKeySequence::Redo);
    m_redo->setEnabled(false);

    QMenu *code = menuBar()->addMenu(tr("&Code"));
    for (FramingFunction f : kFramingFunctions) {
        // The keys 1–4 are handled by the reading desk itself; the menu shows them.
        QAction *a =
            code->addAction(tr("Mark as %1\t%2").arg(functionName(f)).arg(functionShortcutKey(f)));
        connect(a, &QAction::triggered, this, [this, f] { m_reading->requestFunction(f); });
    }
    code->addSeparator();
    code->addAction(tr("Mark article as &done"), DeskKeys::markDone(), this, &MainWindow::markDone);
    code->addAction(tr("&Next article"), DeskKeys::nextArticle(), this, &MainWindow::nextArticle);
    code->addAction(
        tr("&Find in texts"), QKeySequence::Find, this, [this] { m_search->setFocus(); });
    code->addAction(tr("&Training feedback…"), this, [this] {
        if (!m_session)
            return;
        TrainingFeedbackDialog feedback(m_session->project(), m_session->coder().id, this);
        feedback.exec();
    });

    QMenu *view = menuBar()->addMenu(tr("&View"));
    QAction *exact = view->addAction(tr("E&xact selection (no snapping to words)"));
    exact->setCheckable(true);
    exact->setShortcut(DeskKeys::exactSelection());
    exact->setChecked(QSettings().value(QStringLiteral("desk/exactSelection"), false).toBool());
    m_reading->setExactSelection(exact->isChecked());
    connect(exact, &QAction::toggled, this, [this](bool on) {
        m_reading->setExactSelection(on);
        QSettings().setValue(QStringLiteral("desk/exactSelection"), on);
        statusBar()->showMessage(on ? tr("Exact selection: spans take the text as selected.")
                                    : tr("Spans snap to whole words again."),
            4000);
    });
    view->addSeparator();
    m_showAll = view->addAction(tr("Show &every coder's spans (leads only)"));
    m_showAll->setCheckable(true);
    m_showAll->setEnabled(false);
    connect(m_showAll, &QAction::toggled, this, [this](bool on) {
        if (m_session)
            m_session->setShowAllCoders(on);
        refreshArticle();
    });

    // The lead's work beside the desk; the menu is there for leads only.
    m_leadMenu = menuBar()->addMenu(tr("&Lead"));
    m_leadMenu->addAction(
        tr("&Compare and adjudicate…"), DeskKeys::compare(), m_lead, &LeadWindows::openComparison);
    m_leadMenu->addAction(
        tr("&Reliability…"), DeskKeys::reliability(), m_lead, &LeadWindows::openReliability);
    m_leadMenu->addAction(tr("&Frames…"), m_lead, &LeadWindows::openFrames);
    m_leadMenu->addAction(tr("Write the reliability &report…"), m_lead, &LeadWindows::writeReport);
    m_leadMenu->addSeparator();
    m_leadMenu->addAction(tr("&Study design…"), m_lead, &LeadWindows::openStudyDesign);
    m_leadMenu->addAction(tr("C&odebook…"), m_lead, &LeadWindows::openCodebook);
    m_leadMenu->addAction(tr("&Progress…"), m_lead, &LeadWindows::openProgress);
    m_leadMenu->addAction(tr("P&eople…"), m_lead, &LeadWindows::openPeople);
    m_leadMenu->addAction(tr("&Hand out a coder copy…"), m_lead, &LeadWindows::handOutCopy);
    m_leadMenu->addAction(tr("&Merge returned coder copies…"), m_lead, &LeadWindows::mergeCopies);
    m_leadMenu->addAction(tr("Merge co&nflicts…"), m_lead, &LeadWindows::openConflicts);
    m_leadMenu->addSeparator();
    m_leadMenu->addAction(tr("&Extractor runs…"), m_lead, &LeadWindows::openExtractors);
    m_leadMenu->menuAction()->setVisible(false);
    connect(m_lead, &LeadWindows::projectChanged, this, &MainWindow::refreshList);
    connect(m_lead, &LeadWindows::articleRequested, this, [this](ArticleId article) {
        openArticle(article);
        activateWindow();
    });

    QMenu *settings = menuBar()->addMenu(tr("&Settings"));
    QMenu *language = settings->addMenu(tr("&Language"));
    auto *group = new QActionGroup(this);
    const QString current =
        QSettings().value(QStringLiteral("language"), QStringLiteral("system")).toString();
    for (const auto &[languageCode, name] :
        {std::pair {QStringLiteral("system"), tr("System language")},
            std::pair {QStringLiteral("en"), QStringLiteral("English")},
            std::pair {QStringLiteral("nl"), QStringLiteral("Nederlands")},
            std::pair {QStringLiteral("de"), QStringLiteral("Deutsch")}}) {
        QAction *a = language->addAction(name);
        a->setCheckable(true);
        a->setChecked(languageCode == current);
        group->addAction(a);
        connect(a, &QAction::triggered, this, [this, c = languageCode] { setLanguage(c); });
    }

    QMenu *help = menuBar()->addMenu(tr("&Help"));
    help->addAction(
        tr("&Keyboard shortcuts"), DeskKeys::shortcuts(), this, &MainWindow::showShortcuts);
}

Status MainWindow::openProject(
    const QString &path, const QString &pseudonym, const std::optional<QString> &passphrase)
{
    // A file this process may not write opens read-only (the window says so) rather than not
    // at all.
    auto project = Project::openForReading(path);
    if (!project)
        return std::unexpected(project.error());
    std::optional<SignedIn> who;
    if (!pseudonym.isEmpty()) {
        auto state = People::passphraseState(*project, pseudonym);
        if (!state) {
            if (state.error().code == ErrorCode::NotFound)
                return fail(
                    ErrorCode::NotFound, tr("The project has no coder \"%1\".").arg(pseudonym));
            return std::unexpected(state.error());
        }
        if (*state == PassphraseState::NotNeeded || passphrase) {
            auto in = People::signIn(*project, pseudonym, passphrase.value_or(QString()));
            if (!in)
                return std::unexpected(in.error());
            who = *in;
        }
    }
    if (!who) {
        // Nobody named, or a lead named without a passphrase: the dialog asks.
        CoderDialog dialog(*project, this, pseudonym);
        if (dialog.exec() != QDialog::Accepted || !dialog.chosen())
            return fail(ErrorCode::Cancelled, tr("Nobody was chosen to code."));
        who = dialog.chosen();
    }

    flushTime();
    m_sync.reset();
    m_syncStatus->hide();
    m_lead->setSession(nullptr);
    if (m_items) {
        delete m_items;
        m_items = nullptr;
    }
    m_tabs->clear();
    delete m_spanEditor;
    delete m_codebook;
    m_session = std::make_unique<CodingSession>(std::move(*project), who->person());
    m_session->setSignedIn(*who);
    m_article = ArticleId {};
    m_selected = AnnotationId {};

    m_items = new ItemForm(m_session.get(), this);
    if (auto *right = qobject_cast<QSplitter *>(m_tabs->parentWidget()))
        right->insertWidget(1, m_items);
    m_spanEditor = new SpanEditor(m_session.get(), m_tabs);
    m_spanEditor->setCodebook(m_session->codebook());
    m_items->setCodebook(m_session->codebook());
    m_codebook = new CodebookPanel(m_tabs);
    m_codebook->setCodebook(m_session->codebook());
    m_codebookShown = m_session->codebook().versionId;
    m_tabs->addTab(m_spanEditor, tr("Span"));
    m_tabs->addTab(m_codebook, tr("Codebook"));

    QUndoStack *stack = m_session->undoStack();
    // A note still being typed is committed first, so that undo takes back the latest change.
    disconnect(m_undo, &QAction::triggered, nullptr, nullptr);
    disconnect(m_redo, &QAction::triggered, nullptr, nullptr);
    connect(m_undo, &QAction::triggered, this, [this] {
        m_spanEditor->commitPendingEdits();
        m_session->undoStack()->undo();
    });
    connect(m_redo, &QAction::triggered, this, [this] {
        m_spanEditor->commitPendingEdits();
        m_session->undoStack()->redo();
    });
    connect(stack, &QUndoStack::canUndoChanged, m_undo, &QAction::setEnabled);
    connect(stack, &QUndoStack::canRedoChanged, m_redo, &QAction::setEnabled);
    connect(stack, &QUndoStack::undoTextChanged, this, [this](const QString &t) {
        m_undo->setText(t.isEmpty() ? tr("&Undo") : tr("&Undo %1").arg(t));
    });
    connect(stack, &QUndoStack::redoTextChanged, this, [this](const QString &t) {
        m_redo->setText(t.isEmpty() ? tr("&Redo") : tr("&Redo %1").arg(t));
    });
    connect(m_session.get(), &CodingSession::articleChanged, this, [this](ArticleId id) {
        if (!id.isValid()) { // a sync or a project edit: the list and the article again
            if (m_session->codebook().versionId != m_codebookShown) { // a version added or undone
                m_codebookShown = m_session->codebook().versionId;
                m_spanEditor->setCodebook(m_session->codebook());
                m_items->setCodebook(m_session->codebook());
                m_codebook->setCodebook(m_session->codebook());
            }
            refreshList();
            const int row =
                m_filter->mapFromSource(m_articles->index(m_articles->rowOf(m_article), 0)).row();
            if (row >= 0)
                m_list->selectRow(row);
            refreshArticle();
            return;
        }
        if (id == m_article)
            refreshArticle();
        m_articles->updateArticle(id, m_session->articleStatus(id), m_session->secondsSpent(id));
    });
    connect(m_session.get(), &CodingSession::errorOccurred, this, &MainWindow::showError);
    connect(m_session.get(), &CodingSession::editNotSaved, this, &MainWindow::showUnsavedEdit);
    m_legend->setSession(m_session.get());
    m_showAll->setEnabled(m_session->isLead());
    m_import->setEnabled(m_session->isLead());
    m_leadMenu->menuAction()->setVisible(m_session->isLead());
    if (m_session->isLead())
        m_lead->setSession(m_session.get());
    m_showAll->setChecked(false);

    QSettings settings;
    QStringList recent = settings.value(QStringLiteral("recentProjects")).toStringList();
    recent.removeAll(path);
    recent.prepend(QFileInfo(path).absoluteFilePath());
    settings.setValue(QStringLiteral("recentProjects"), recent.mid(0, 8));

    m_pages->setCurrentIndex(1);
    refreshList();
    updateTitle();
    if (m_filter->rowCount() > 0)
        m_list->selectRow(0);
    updateEmptyState();
    if (m_session->isReadOnly())
        m_messages->showMessage(MessageBar::Kind::Warning, m_session->readOnlyMessage());
    startTeamSync(path);
    return {};
}

void MainWindow::startTeamSync(const QString &path)
{
    auto team = TeamProject::status(m_session->project());
    if (!team || m_session->isReadOnly())
        return; // not a team working file (or one this process may not write)
    m_sync = std::make_unique<BackgroundSync>(path, *team);
    m_syncStatus->setText(m_sync->statusText());
    m_syncStatus->show();
    connect(m_sync.get(), &BackgroundSync::statusChanged, m_syncStatus, [this](const QString &t) {
        m_syncStatus->setText(t);
        m_syncStatus->setToolTip(m_sync->problem());
    });
    connect(
        m_sync.get(), &BackgroundSync::pulled, m_session.get(), &CodingSession::reloadAfterSync);
    connect(m_sync.get(), &BackgroundSync::passwordNeeded, this, [this](const QString &server) {
        m_messages->showMessage(MessageBar::Kind::Warning,
            tr("The team server asks for your password to sync. Your work stays in this file "
               "until it can be sent."),
            {{tr("Enter &password…"), [this, server] { askTeamPassword(server); }}});
    });
    // Every change made on the desk or in the lead's windows goes on the undo stack.
    connect(m_session->undoStack(), &QUndoStack::indexChanged, m_sync.get(),
        &BackgroundSync::localChange);
}

void MainWindow::askTeamPassword(const QString &server)
{
    if (!m_sync || !m_session)
        return;
    bool ok = false;
    const QString password = QInputDialog::getText(this, tr("Team server password"),
        tr("Password of %1 on the team server:").arg(m_session->coder().pseudonym),
        QLineEdit::Password, QString(), &ok);
    if (!ok || password.isEmpty())
        return;
    if (auto st = TeamCredentials::rememberPassword(server, password); !st) {
        showError(st.error().message);
        return;
    }
    m_sync->syncNow();
}

void MainWindow::joinTeam()
{
    JoinTeamDialog dialog(this);
    if (dialog.exec() != QDialog::Accepted)
        return;
    if (auto st = openProject(dialog.workingFile(), dialog.pseudonym());
        !st && st.error().code != ErrorCode::Cancelled)
        QMessageBox::warning(this, tr("Cannot open project"), st.error().toString());
}

void MainWindow::refreshList()
{
    m_articles->setArticles(m_session->articleRows());
    // The list is narrow: title, language, status and time; outlet and length are in the header
    // above the article.
    if (!std::exchange(m_columnsChosen, true)) { // hide them once; later the person's choice stands
        m_list->setColumnHidden(ArticleListModel::Outlet, true);
        m_list->setColumnHidden(ArticleListModel::Length, true);
    }
    m_list->resizeColumnsToContents();
    m_list->horizontalHeader()->setSectionResizeMode(ArticleListModel::Title, QHeaderView::Stretch);
}

void MainWindow::openArticle(ArticleId id)
{
    if (!m_session || id == m_article)
        return;
    flushTime();
    if (auto st = m_session->openDocument(id); !st) {
        showError(st.error().toString());
        return;
    }
    const Article *article = &m_session->document().article();
    m_article = id;
    m_selected = AnnotationId {};
    m_articleHeader->setText(
        QStringLiteral("<b>%1</b><br><span style='color:palette(mid)'>%2 · %3 · %4</span>")
            .arg(article->summary.title.toHtmlEscaped(), article->summary.outlet.toHtmlEscaped(),
                article->summary.published.toHtmlEscaped(),
                article->summary.language.toHtmlEscaped()));
    m_reading->setArticle(*article);
    if (!m_search->text().trimmed().isEmpty())
        m_reading->setSearchHighlight(m_search->text());
    refreshArticle();
    updateEmptyState();
    const int row = m_filter->mapFromSource(m_articles->index(m_articles->rowOf(id), 0)).row();
    if (row >= 0 && m_list->currentIndex().row() != row)
        m_list->selectRow(row);
}

void MainWindow::refreshArticle()
{
    if (!m_session || !m_article.isValid() || !m_session->document().isOpen())
        return;
    const ArticleDocument &doc = m_session->document();
    const std::vector<Annotation> &spans = doc.spans();
    // Every coder's spans carry their coder's pseudonym, in the text and on the frame card.
    const QHash<qint64, QString> owners =
        m_session->showsAllCoders() ? m_session->pseudonyms() : QHash<qint64, QString> {};
    m_reading->setSpanOwners(owners);
    m_reading->setSpans(spans);
    m_legend->refresh();
    m_card->setSpanOwners(owners);
    m_card->setSpans(doc.article().text, spans);
    m_items->setArticle(m_article, doc.answers());
    if (std::none_of(
            spans.begin(), spans.end(), [this](const Annotation &a) { return a.id == m_selected; }))
        m_selected = AnnotationId {};
    selectSpan(m_selected);
}

void MainWindow::selectSpan(AnnotationId id)
{
    m_selected = id;
    m_reading->setSelectedSpan(id);
    m_card->setSelectedSpan(id);
    if (!m_session || !m_article.isValid() || !m_session->document().isOpen())
        return;
    const ArticleDocument &doc = m_session->document();
    const std::optional<Annotation> span = doc.span(id);
    m_spanEditor->setSpan(span, doc.spans(), doc.links());
    if (span)
        m_codebook->showFunction(span->content.function);
}

void MainWindow::flushTime()
{
    const qint64 seconds = m_clock->takeSeconds();
    if (m_session && m_article.isValid() && seconds > 0) {
        m_session->addCodingTime(m_article, seconds);
        m_articles->updateArticle(
            m_article, m_session->articleStatus(m_article), m_session->secondsSpent(m_article));
    }
}

void MainWindow::markDone()
{
    if (!m_session || !m_article.isValid())
        return;
    flushTime();
    const bool training = m_session->phaseOf(m_article) == Phase::Training;
    if (!m_session->markDone(m_article))
        return;
    // After the last training article: the coder's agreement with the master coding, once.
    if (training && TrainingFeedbackDialog::isDue(m_session->project(), m_session->coder().id)) {
        TrainingFeedbackDialog feedback(m_session->project(), m_session->coder().id, this);
        feedback.exec();
        refreshList();
    }
    nextArticle();
}

void MainWindow::nextArticle()
{
    // The next article in the list that is not done yet, wrapping around.
    const int rows = m_filter->rowCount();
    const int current = m_list->currentIndex().row();
    for (int step = 1; step <= rows; ++step) {
        const QModelIndex index = m_filter->index((current + step) % rows, 0);
        if (index.data(ArticleListModel::StatusRole).toString() != QLatin1String("done")) {
            m_list->selectRow(index.row());
            return;
        }
    }
    m_messages->showMessage(
        MessageBar::Kind::Information, tr("Every article in the list is done."), {}, {}, 8);
}

void MainWindow::search(const QString &query)
{
    if (!m_session)
        return;
    m_reading->setSearchHighlight(query);
    if (query.trimmed().isEmpty()) {
        m_filter->setMatches(std::nullopt);
        return;
    }
    auto hits = m_session->project().searchArticles(query);
    if (!hits) {
        m_messages->showMessage(MessageBar::Kind::Warning, hits.error().message);
        return;
    }
    QSet<qint64> ids;
    for (ArticleId id : *hits)
        ids.insert(id.value);
    m_filter->setMatches(ids);
    statusBar()->showMessage(
        tr("%n article(s) contain \"%1\".", nullptr, int(ids.size())).arg(query), 6000);
}

void MainWindow::createProject()
{
    QString path = QFileDialog::getSaveFileName(
        this, tr("New project"), QString(), tr("Fourfold projects (*.fourfold)"));
    if (path.isEmpty())
        return;
    if (!path.endsWith(QLatin1String(".fourfold")))
        path += QLatin1String(".fourfold");
    {
        // Created and closed at once; opening asks who codes, where a new project first gets
        // its first person.
        auto project = Project::create(path);
        if (!project) {
            QMessageBox::warning(this, tr("Cannot create project"), project.error().toString());
            return;
        }
    }
    if (auto st = openProject(path); !st && st.error().code != ErrorCode::Cancelled)
        QMessageBox::warning(this, tr("Cannot open project"), st.error().toString());
}

void MainWindow::importArticles()
{
    if (!m_session)
        return;
    const QStringList files = QFileDialog::getOpenFileNames(this, tr("Import articles"), QString(),
        tr("Articles (*.txt *.text *.html *.htm *.jsonl *.ndjson *.csv *.rss *.atom *.nitf "
           "*.newsml *.xml *.docx *.odt *.pdf *.epub)"));
    if (files.isEmpty())
        return;
    importPaths(files);
}

void MainWindow::importPaths(const QStringList &files)
{
    if (!m_session)
        return;
    const auto options = ImportOptionsDialog::ask(files, this);
    if (!options)
        return;
    const ImportOutcome outcome = importWithProgress(m_session->project(), files, this, *options);
    refreshList();
    if (!m_article.isValid() && m_filter->rowCount() > 0)
        m_list->selectRow(0);
    updateEmptyState();
    showImportReport(outcome, this);
}

QString MainWindow::emptyStateText() const
{
    return m_middlePages && m_middlePages->currentIndex() == 0 ? m_emptyText->text() : QString();
}

QPushButton *MainWindow::startPageButton(int index) const
{
    const auto buttons = m_startButtons->findChildren<QPushButton *>();
    return index >= 0 && index < buttons.size() ? buttons[index] : nullptr;
}

void MainWindow::updateEmptyState()
{
    if (!m_session)
        return;
    if (m_article.isValid() && m_session->document().isOpen()) {
        m_middlePages->setCurrentIndex(1);
        return;
    }
    const bool lead = m_session->isLead();
    const bool listed = m_articles->rowCount() > 0;
    QString text;
    bool canImport = false;
    if (listed) {
        text = tr("<h3>Choose an article</h3><p>Pick an article in the list on the left to "
                  "start coding it.</p>");
    } else if (lead) {
        text = tr("<h3>No articles yet</h3><p>Import the articles of the study: plain text, "
                  "HTML, JSON Lines, CSV, DOCX, ODT, PDF, EPUB, RSS or Atom feeds, NITF or "
                  "NewsML-G2. Then assign them to coders in Lead → Study design.</p>");
        canImport = !m_session->isReadOnly();
    } else {
        text = tr("<h3>Nothing to code yet</h3><p>No articles are assigned to you in this "
                  "project. Your lead assigns them; when they have, open the project again, or "
                  "open the coder copy they send you.</p>");
    }
    m_emptyText->setText(text);
    m_emptyAction->setVisible(canImport);
    m_middlePages->setCurrentIndex(0);
}

void MainWindow::chooseProject()
{
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Open project"), QString(), tr("Fourfold projects (*.fourfold)"));
    if (path.isEmpty())
        return;
    if (auto st = openProject(path); !st && st.error().code != ErrorCode::Cancelled)
        QMessageBox::warning(this, tr("Cannot open project"), st.error().toString());
}

void MainWindow::openSample()
{
    const QString path = samplePath();
    if (path.isEmpty())
        return;
    if (auto st = openProject(path); !st && st.error().code != ErrorCode::Cancelled)
        QMessageBox::warning(this, tr("Cannot open project"), st.error().toString());
}

void MainWindow::setLanguage(const QString &code)
{
    QSettings().setValue(QStringLiteral("language"), code);
    m_messages->showMessage(MessageBar::Kind::Information,
        tr("The language changes when Fourfold starts again."), {}, {}, 10);
}

void MainWindow::showError(const QString &message)
{
    // Not modal: the change simply did not happen; the reason stays until closed or replaced.
    m_messages->showMessage(MessageBar::Kind::Error, message);
}

void MainWindow::showUnsavedEdit(const QString &editText, const QString &message)
{
    // The change is kept by the session until it is written or given up: it stays on screen
    // until one of the two, never a status line that passes.
    m_messages->showMessage(MessageBar::Kind::Error, tr("Not saved: %1. %2").arg(editText, message),
        {{tr("&Retry"),
             [this] {
                 // Failing again shows this message anew (editNotSaved).
                 if (m_session)
                     (void)m_session->retryUnsavedEdit();
             }},
            {tr("&Discard"), [this] {
                 if (m_session)
                     m_session->discardUnsavedEdit();
             }}});
}

void MainWindow::updateTitle()
{
    if (!m_session) {
        setWindowTitle(tr("Fourfold"));
        m_who->setText(tr("No project open"));
        return;
    }
    const Coder &c = m_session->coder();
    const QString role = m_session->isLead() ? tr("lead") : tr("coder");
    setWindowTitle(m_session->isReadOnly()
            ? tr("%1 — read-only, as %2 (%3) — Fourfold")
                  .arg(m_session->project().settings().name, c.pseudonym, role)
            : tr("%1 — coding as %2 (%3) — Fourfold")
                  .arg(m_session->project().settings().name, c.pseudonym, role));
    if (m_session->isReadOnly())
        m_who->setText(
            tr("Reading as %1 · %2 · read-only file: nothing is saved").arg(c.pseudonym, c.name));
    else
        m_who->setText(m_session->isLead()
                ? tr("Coding as %1 · %2 · lead: every article").arg(c.pseudonym, c.name)
                : tr("Coding as %1 · %2 · blind: only your own spans").arg(c.pseudonym, c.name));
}

void MainWindow::showShortcuts()
{
    QString text = shortcutTableHtml(deskShortcuts());
    if (m_session && m_session->isLead())
        text += QStringLiteral("<p>%1</p>")
                    .arg(tr("The comparison window lists its own keys with %1.")
                             .arg(DeskKeys::shortcuts().toString(QKeySequence::NativeText))
                             .toHtmlEscaped());
    QMessageBox box(this);
    box.setWindowTitle(tr("Keyboard shortcuts"));
    box.setTextFormat(Qt::RichText);
    box.setText(text);
    box.exec();
}

void MainWindow::closeEvent(QCloseEvent *event)
{
    if (m_spanEditor)
        m_spanEditor->commitPendingEdits();
    flushTime();
    m_lead->closeAll();
    QMainWindow::closeEvent(event);
}

} // namespace fourfold
