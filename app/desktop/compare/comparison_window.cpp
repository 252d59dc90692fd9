#include "app/desktop/compare/comparison_window.h"

#include "app/desktop/compare/answer_panel.h"
#include "app/desktop/compare/comparison_view.h"
#include "app/desktop/compare/disagreement_queue_model.h"
#include "app/desktop/compare/gold_span_dialog.h"
#include "app/desktop/function_style.h"
#include "app/desktop/shortcut_table.h"
#include "app/desktop/span_quote.h"
#include "core/project/gold_answer_edits.h"
#include "core/project/gold_edits.h"
#include "core/text/offset_map.h"

#include <QAction>
#include <QCheckBox>
#include <QComboBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QMessageBox>
#include <QPainter>
#include <QSplitter>
#include <QStatusBar>
#include <QTableView>
#include <QToolBar>
#include <QToolButton>
#include <QTreeWidget>
#include <QVBoxLayout>

#include <algorithm>

namespace fourfold {

namespace {

enum SpanListRole { IdRole = Qt::UserRole, IsGoldRole };

QIcon badgeIcon(FramingFunction f)
{
    const FunctionStyle style = functionStyle(f);
    QPixmap pm(16, 16);
    pm.fill(Qt::transparent);
    QPainter p(&pm);
    p.setRenderHint(QPainter::Antialiasing);
    p.setPen(Qt::NoPen);
    p.setBrush(style.colour);
    p.drawRoundedRect(QRectF(1, 1, 14, 14), 3, 3);
    QFont font;
    font.setBold(true);
    font.setPixelSize(10);
    p.setFont(font);
    p.setPen(badgeTextColour(style.colour));
    p.drawText(QRectF(0, 0, 16, 16), Qt::AlignCenter, QString(style.letter));
    return QIcon(pm);
}

QString attributeText(const QJsonObject &attributes)
{
    QStringList parts;
    for (auto it = attributes.begin(); it != attributes.end(); ++it) {
        const QString value = it->isString() ? it->toString() : it->toVariant().toString();
        if (!value.trimmed().isEmpty())
            parts << QStringLiteral("%1: %2").arg(it.key(), value);
    }
    return parts.join(QStringLiteral(", "));
}

QString shortQuote(QString text)
{
    text.replace(QLatin1Char('\n'), QLatin1Char(' '));
    if (text.size() > 90)
        text = text.left(89) + QChar(0x2026);
    return spanQuote(text);
}

// The function, the quote and the attributes of a span, on up to three lines.
QString spanText(const QString &function, const QString &quote, const QJsonObject &attributes)
{
    QString text = function + QLatin1Char(' ') + shortQuote(quote);
    const QString attrs = attributeText(attributes);
    if (!attrs.isEmpty())
        text += QLatin1Char('\n') + attrs;
    return text;
}

} // namespace

ComparisonWindow::ComparisonWindow(CodingSession *session, QWidget *parent)
    : QMainWindow(parent)
    , m_session(session)
    , m_sessionAlive(session)
{
    setWindowTitle(
        tr("Compare coders and decide gold \u2014 %1").arg(session->project().settings().name));
    if (!session->isLead()) {
        auto *label = new QLabel(tr("Only a lead compares coders and decides the gold standard. "
                                    "Open the project as a lead to use this window."),
            this);
        label->setWordWrap(true);
        label->setMargin(24);
        setCentralWidget(label);
        return;
    }
    if (auto coders = session->project().coders())
        m_coders = *coders;
    buildUi();
    buildActions();
    // A decision or its undo changes one article: its row is computed anew where it stands.
    // Anything else (a coder's edit on the desk may bring an article into the queue) reloads it.
    connect(session, &CodingSession::articleChanged, this, [this](ArticleId article) {
        if (!refreshQueueRow(article))
            reloadQueue();
        reloadArticle();
    });
    reloadQueue();
    if (!m_queueModel->rows().empty())
        openArticle(m_queueModel->rows().front().article.id);
    else // an empty queue says why and what fills it, instead of blank panes
        m_passageLabel->setText(
            tr("Nothing to compare yet. An article comes here once at least two coders have "
               "coded it and marked it done (or tick “Articles in progress” above). "
               "Plan double coding in Lead → Study design; the progress board shows who is "
               "done."));
    updateActions();
}

ComparisonWindow::~ComparisonWindow()
{
    // Nothing more to keep up to date (the session may be gone already: it deletes this window
    // later).
    if (m_sessionAlive)
        m_session->closeComparison();
}

bool ComparisonWindow::isArticleOpen() const
{
    const ComparisonDocument &doc = m_session->comparisonDocument();
    return m_article.isValid() && doc.isOpen() && doc.id() == m_article;
}

QString ComparisonWindow::passageText() const
{
    return m_passageLabel ? m_passageLabel->text() : QString();
}

QString ComparisonWindow::coderName(CoderId id) const
{
    const auto it = std::ranges::find(m_coders, id, &Coder::id);
    return it == m_coders.end() ? QStringLiteral("?") : it->pseudonym;
}

void ComparisonWindow::buildUi()
{
    auto *splitter = new QSplitter(Qt::Horizontal, this);

    m_queueModel = new DisagreementQueueModel(this);
    auto *queuePane = new QWidget(splitter);
    auto *queueLayout = new QVBoxLayout(queuePane);
    queueLayout->setContentsMargins(0, 0, 0, 0);
    queueLayout->setSpacing(2);
    auto *queueHeader = new QHBoxLayout;
    queueHeader->setContentsMargins(4, 0, 0, 0);
    m_queueLabel = new QLabel(queuePane);
    m_queueLabel->setWordWrap(true);
    queueHeader->addWidget(m_queueLabel, 1);
    m_resortButton = new QToolButton(queuePane);
    queueHeader->addWidget(m_resortButton);
    queueLayout->addLayout(queueHeader);
    m_queueView = new QTableView(queuePane);
    queueLayout->addWidget(m_queueView, 1);
    m_queueView->setModel(m_queueModel);
    m_queueView->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_queueView->setSelectionMode(QAbstractItemView::SingleSelection);
    m_queueView->verticalHeader()->hide();
    m_queueView->setWordWrap(false);
    m_queueView->setTextElideMode(Qt::ElideRight);
    m_queueView->horizontalHeader()->setSectionResizeMode(
        DisagreementQueueModel::Title, QHeaderView::Stretch);
    for (int c = DisagreementQueueModel::Open; c < DisagreementQueueModel::ColumnCount; ++c)
        m_queueView->horizontalHeader()->setSectionResizeMode(c, QHeaderView::ResizeToContents);
    m_queueView->setColumnHidden(DisagreementQueueModel::Coders, true);
    m_queueView->setAccessibleName(tr("Articles to adjudicate"));
    m_queueView->setToolTip(tr("Articles coded by several coders, most undecided disagreements "
                               "first when sorted; the order is kept while you decide until you "
                               "re-sort. Open: undecided disagreements; Agreed: passages all "
                               "coders agree on that are not yet in gold."));
    connect(m_queueView->selectionModel(), &QItemSelectionModel::currentRowChanged, this,
        [this](const QModelIndex &index) {
            if (index.isValid())
                openArticle(m_queueModel->rows()[size_t(index.row())].article.id);
        });

    auto *middle = new QWidget(splitter);
    auto *middleLayout = new QVBoxLayout(middle);
    middleLayout->setContentsMargins(0, 0, 0, 0);
    middleLayout->setSpacing(2);
    m_view = new ComparisonView(middle);
    middleLayout->addWidget(m_view, 1);
    m_legend = new QLabel(middle);
    m_legend->setWordWrap(true);
    m_legend->setText(tr("Margin: \u2205 a coder has no span here \u00b7 \u2260 different "
                         "functions \u00b7 \u2194 different boundaries \u00b7 \u2248 different "
                         "attributes \u00b7 \u2713 decided. Lanes under each line: problem "
                         "(solid), cause (dashed), evaluation (dotted), remedy (dash-dot). "
                         "Hatched: this coder has no span in the passage."));
    m_legend->setContentsMargins(6, 2, 6, 2);
    QFont small = m_legend->font();
    small.setPointSizeF(small.pointSizeF() * 0.9);
    m_legend->setFont(small);
    middleLayout->addWidget(m_legend);
    connect(m_view, &ComparisonView::passageClicked, this, [this](int index, int column) {
        setCurrentPassage(index);
        // A click in a coder's column chooses that coder's spans of the passage.
        const Passage *p = passage();
        if (!p || column < 0 || size_t(column) >= m_comparison.coders.size())
            return;
        std::vector<AnnotationId> ids;
        for (const Annotation &a : p->spans)
            if (a.coder == m_comparison.coders[size_t(column)])
                ids.push_back(a.id);
        if (!ids.empty())
            selectSpans(ids);
    });

    auto *panel = new QWidget(splitter);
    auto *panelLayout = new QVBoxLayout(panel);
    panelLayout->setContentsMargins(6, 0, 0, 0);
    m_passageLabel = new QLabel(panel);
    m_passageLabel->setWordWrap(true);
    // Names, titles and quotes are shown as they are, never read as markup.
    m_passageLabel->setTextFormat(Qt::PlainText);
    QFont bold = m_passageLabel->font();
    bold.setBold(true);
    m_passageLabel->setFont(bold);
    panelLayout->addWidget(m_passageLabel);
    m_spanList = new QTreeWidget(panel);
    m_spanList->setColumnCount(3);
    m_spanList->setHeaderLabels({tr("Who"), tr("Span"), tr("Decision")});
    m_spanList->setUniformRowHeights(false);
    m_spanList->setRootIsDecorated(false);
    m_spanList->setSelectionMode(QAbstractItemView::ExtendedSelection);
    m_spanList->setWordWrap(true);
    m_spanList->setAccessibleName(tr("Spans of the passage"));
    m_spanList->header()->setSectionResizeMode(0, QHeaderView::ResizeToContents);
    m_spanList->header()->setSectionResizeMode(1, QHeaderView::Stretch);
    m_spanList->header()->setSectionResizeMode(2, QHeaderView::ResizeToContents);
    m_spanList->header()->setStretchLastSection(false);
    panelLayout->addWidget(m_spanList, 1);
    m_detail = new QLabel(panel);
    m_detail->setWordWrap(true);
    m_detail->setTextFormat(Qt::PlainText);
    m_detail->setTextInteractionFlags(Qt::TextSelectableByMouse);
    panelLayout->addWidget(m_detail);
    auto *rationaleLabel = new QLabel(tr("&Rationale (optional, kept with the decision):"), panel);
    m_rationale = new QLineEdit(panel);
    m_rationale->setPlaceholderText(tr("Why this decision, for the method section"));
    rationaleLabel->setBuddy(m_rationale);
    panelLayout->addWidget(rationaleLabel);
    panelLayout->addWidget(m_rationale);
    auto *answersLabel = new QLabel(tr("Answers to article-level items"), panel);
    answersLabel->setFont(bold);
    panelLayout->addSpacing(6);
    panelLayout->addWidget(answersLabel);
    m_answers = new AnswerPanel(panel);
    panelLayout->addWidget(m_answers);
    connect(m_answers, &AnswerPanel::decideRequested, this,
        [this](const QString &item, const QString &value, const QString &rationale) {
            decideAnswer(item, value, rationale);
        });
    connect(m_answers, &AnswerPanel::withdrawRequested, this,
        [this](GoldJudgementId id) { withdrawGoldAnswer(id); });
    const auto key = [](const QKeySequence &k) { return k.toString(QKeySequence::NativeText); };
    auto *keys = new QLabel(
        tr("Keys: N / P next and previous disagreement, %1 / %2 next and "
           "previous article, %3 re-sort the queue; A accept the chosen span, "
           "M merge the chosen spans, E edit, R reject, W withdraw a gold "
           "span; %4 accept all agreed; %5 rationale; %6 undo; %7 every key.")
            .arg(key(CompareKeys::nextArticle().front()),
                key(CompareKeys::previousArticle().front()), key(CompareKeys::resortQueue()),
                key(CompareKeys::acceptAgreed()), key(CompareKeys::rationale()),
                key(QKeySequence(QKeySequence::Undo)), key(DeskKeys::shortcuts())),
        panel);
    keys->setWordWrap(true);
    QFont keysFont = keys->font();
    keysFont.setPointSizeF(keysFont.pointSizeF() * 0.9);
    keys->setFont(keysFont);
    keys->setForegroundRole(QPalette::PlaceholderText);
    panelLayout->addWidget(keys);
    connect(m_spanList, &QTreeWidget::itemSelectionChanged, this, [this] {
        updateActions();
        // Show the chosen spans in the columns too.
        reloadArticle();
    });

    splitter->addWidget(queuePane);
    splitter->addWidget(middle);
    splitter->addWidget(panel);
    splitter->setStretchFactor(0, 0);
    splitter->setStretchFactor(1, 3);
    splitter->setStretchFactor(2, 1);
    splitter->setSizes({330, 900, 420});
    setCentralWidget(splitter);

    m_message = new QLabel(this);
    m_message->setTextFormat(Qt::PlainText);
    statusBar()->addWidget(m_message, 1);
}

void ComparisonWindow::buildActions()
{
    auto *bar = addToolBar(tr("Comparison"));
    bar->setObjectName(QStringLiteral("comparisonToolBar"));
    bar->setMovable(false);
    bar->setToolButtonStyle(Qt::ToolButtonTextOnly);

    auto makeAction = [this](const QString &text, const QList<QKeySequence> &keys,
                          const QString &tip, auto slot) {
        auto *a = new QAction(text, this);
        a->setShortcuts(keys);
        a->setShortcutContext(Qt::WindowShortcut);
        QStringList names;
        for (const QKeySequence &k : keys)
            names << k.toString(QKeySequence::NativeText);
        a->setToolTip(
            names.isEmpty() ? tip : QStringLiteral("%1 (%2)").arg(tip, names.join(tr(", "))));
        connect(a, &QAction::triggered, this, slot);
        addAction(a);
        return a;
    };

    bar->addWidget(new QLabel(tr("Function: "), bar));
    m_functionBox = new QComboBox(bar);
    m_functionBox->addItem(tr("All functions"), -1);
    for (FramingFunction f : kFramingFunctions)
        m_functionBox->addItem(badgeIcon(f), functionName(f), int(f));
    m_functionBox->setAccessibleName(tr("Function filter"));
    bar->addWidget(m_functionBox);
    connect(m_functionBox, &QComboBox::currentIndexChanged, this, [this] {
        reloadQueue();
        reloadArticle();
    });
    bar->addWidget(new QLabel(tr("  Coders: "), bar));
    m_pairBox = new QComboBox(bar);
    m_pairBox->addItem(tr("All coders"), QString());
    std::vector<Coder> coders;
    for (const Coder &c : m_coders)
        if (c.role == CoderRole::Coder)
            coders.push_back(c);
    for (size_t i = 0; i < coders.size(); ++i)
        for (size_t j = i + 1; j < coders.size(); ++j)
            m_pairBox->addItem(tr("%1 and %2").arg(coders[i].pseudonym, coders[j].pseudonym),
                QStringLiteral("%1:%2").arg(coders[i].id.value).arg(coders[j].id.value));
    m_pairBox->setAccessibleName(tr("Coder pair filter"));
    bar->addWidget(m_pairBox);
    connect(m_pairBox, &QComboBox::currentIndexChanged, this, [this] {
        reloadQueue();
        reloadArticle();
    });
    m_showDecided = new QCheckBox(tr("Show decided"), bar);
    m_showDecided->setToolTip(tr("Also step through disagreements already decided"));
    bar->addWidget(m_showDecided);
    connect(m_showDecided, &QCheckBox::toggled, this, [this] { reloadArticle(); });
    m_showUnfinished = new QCheckBox(tr("Articles in progress"), bar);
    m_showUnfinished->setToolTip(tr("Also compare coders on articles they have started but not "
                                    "yet marked done"));
    m_showUnfinished->setAccessibleName(tr("Show articles in progress"));
    bar->addWidget(m_showUnfinished);
    connect(m_showUnfinished, &QCheckBox::toggled, this, [this] {
        reloadQueue();
        reloadArticle();
    });
    bar->addSeparator();

    m_previous = makeAction(tr("Previous"), CompareKeys::previousDisagreement(),
        tr("Previous undecided disagreement"), [this] { previousDisagreement(); });
    m_next = makeAction(tr("Next"), CompareKeys::nextDisagreement(),
        tr("Next undecided disagreement"), [this] { nextDisagreement(); });
    m_previousArticle = makeAction(tr("Previous article"), CompareKeys::previousArticle(),
        tr("Previous article in the queue"), [this] {
            const int row = m_queueModel->rowOf(m_article);
            if (row > 0)
                openArticle(m_queueModel->rows()[size_t(row - 1)].article.id);
        });
    m_nextArticle = makeAction(
        tr("Next article"), CompareKeys::nextArticle(), tr("Next article in the queue"), [this] {
            const int row = m_queueModel->rowOf(m_article);
            if (row + 1 < m_queueModel->rowCount())
                openArticle(m_queueModel->rows()[size_t(row + 1)].article.id);
        });
    m_resort = makeAction(tr("Re-sort queue"), {CompareKeys::resortQueue()},
        tr("Sort the queue again, most undecided disagreements first; until then it keeps its "
           "order while you decide"),
        [this] { resortQueue(); });
    m_resortButton->setDefaultAction(m_resort);
    m_queueView->setContextMenuPolicy(Qt::ActionsContextMenu);
    m_queueView->addAction(m_resort);
    bar->addAction(m_previous);
    bar->addAction(m_next);
    bar->addSeparator();
    m_accept = makeAction(tr("Accept"), {CompareKeys::accept()},
        tr("Accept the chosen coder's span into gold"), [this] { acceptSelected(); });
    m_merge = makeAction(tr("Merge"), {CompareKeys::merge()},
        tr("Put one span covering the chosen spans into gold"), [this] { mergeSelected(); });
    m_edit = makeAction(tr("Edit\u2026"), {CompareKeys::edit()},
        tr("Decide a gold span with a function and boundaries of your own"),
        [this] { editSelected(); });
    m_reject = makeAction(tr("Reject"), {CompareKeys::reject()},
        tr("Record that the chosen spans do not belong in gold"), [this] { rejectSelected(); });
    m_withdraw = makeAction(tr("Withdraw gold"), {CompareKeys::withdraw()},
        tr("Withdraw the chosen gold span"), [this] { withdrawSelectedGold(); });
    m_acceptAgreed = makeAction(tr("Accept all agreed"), {CompareKeys::acceptAgreed()},
        tr("Accept every span all coders of the article agree on"), [this] { acceptAllAgreed(); });
    for (QAction *a : {m_accept, m_merge, m_edit, m_reject, m_withdraw})
        bar->addAction(a);
    bar->addSeparator();
    bar->addAction(m_acceptAgreed);
    bar->addSeparator();
    m_undo = m_session->undoStack()->createUndoAction(this, tr("Undo"));
    m_undo->setShortcuts(QKeySequence::Undo);
    m_redo = m_session->undoStack()->createRedoAction(this, tr("Redo"));
    m_redo->setShortcuts(QKeySequence::Redo);
    addAction(m_undo);
    addAction(m_redo);
    bar->addAction(m_undo);
    bar->addAction(m_redo);
    auto *focusRationale = new QAction(this);
    focusRationale->setShortcut(CompareKeys::rationale());
    connect(focusRationale, &QAction::triggered, this, [this] { m_rationale->setFocus(); });
    addAction(focusRationale);
    auto *help = new QAction(this);
    help->setShortcut(DeskKeys::shortcuts());
    connect(help, &QAction::triggered, this, [this] {
        QMessageBox box(this);
        box.setWindowTitle(tr("Keys of the comparison window"));
        box.setTextFormat(Qt::RichText);
        box.setText(shortcutTableHtml(comparisonShortcuts()));
        box.exec();
    });
    addAction(help);
}

ComparisonFilter ComparisonWindow::filter() const
{
    ComparisonFilter f;
    if (!m_functionBox)
        return f;
    const int function = m_functionBox->currentData().toInt();
    if (function >= 0)
        f.function = FramingFunction(function);
    const QStringList pair = m_pairBox->currentData().toString().split(QLatin1Char(':'));
    if (pair.size() == 2)
        f.coderPair = std::pair {CoderId {pair[0].toLongLong()}, CoderId {pair[1].toLongLong()}};
    f.includeUnfinished = m_showUnfinished->isChecked();
    return f;
}

void ComparisonWindow::setFunctionFilter(std::optional<FramingFunction> function)
{
    m_functionBox->setCurrentIndex(function ? int(*function) + 1 : 0);
}

void ComparisonWindow::setCoderPair(CoderId first, CoderId second)
{
    const int i = m_pairBox->findData(QStringLiteral("%1:%2").arg(first.value).arg(second.value));
    const int j = m_pairBox->findData(QStringLiteral("%1:%2").arg(second.value).arg(first.value));
    m_pairBox->setCurrentIndex(std::max({0, i, j}));
}

void ComparisonWindow::reloadQueue()
{
    auto rows = disagreementQueue(m_session->project(), filter());
    if (!rows) {
        showMessage(rows.error().toString(), true);
        return;
    }
    QHash<qint64, QString> names;
    for (const Coder &c : m_coders)
        names.insert(c.id.value, c.pseudonym);
    const QSignalBlocker block(m_queueView->selectionModel());
    m_queueModel->setRows(std::move(*rows), names);
    const int row = m_queueModel->rowOf(m_article);
    if (row >= 0) {
        m_queueView->selectionModel()->setCurrentIndex(m_queueModel->index(row, 0),
            QItemSelectionModel::ClearAndSelect | QItemSelectionModel::Rows);
        m_queueView->scrollTo(m_queueModel->index(row, 0));
    }
    m_queueLabel->setText(
        tr("%n article(s) to adjudicate", nullptr, int(m_queueModel->rowCount())));
}

void ComparisonWindow::resortQueue()
{
    reloadQueue();
    // The article open stays open; one the queue no longer holds (all of its coders' work
    // withdrawn meanwhile) stays shown until another is chosen.
    showMessage(tr("Queue sorted again: most undecided disagreements first."), false);
}

bool ComparisonWindow::openArticle(ArticleId article)
{
    const int row = m_queueModel->rowOf(article);
    if (row < 0)
        return false;
    // Read whole once; afterwards the session keeps it up to date, edit by edit.
    if (auto st = m_session->openComparison(article); !st) {
        showMessage(st.error().toString(), true);
        return false;
    }
    m_article = article;
    m_current = -1;
    {
        const QSignalBlocker block(m_queueView->selectionModel());
        m_queueView->selectionModel()->setCurrentIndex(m_queueModel->index(row, 0),
            QItemSelectionModel::ClearAndSelect | QItemSelectionModel::Rows);
    }
    reloadArticle();
    m_current = -1;
    if (!nextDisagreement())
        setCurrentPassage(m_comparison.passages.empty() ? -1 : 0);
    return true;
}

bool ComparisonWindow::isOpenDisagreement(const Passage &p) const
{
    return !p.isAgreed() && (m_showDecided->isChecked() || !p.isResolved());
}

void ComparisonWindow::reloadArticle()
{
    if (!isArticleOpen())
        return;
    const ComparisonDocument &doc = m_session->comparisonDocument();
    const qint64 currentStart = passage() ? passage()->range.start : -1;
    const qint64 currentEnd = passage() ? passage()->range.end : -1;
    auto comparison = doc.compare(filter());
    if (!comparison) {
        // The pair did not code this article: show every coder instead.
        comparison = doc.compare({filter().function, {}, filter().includeUnfinished});
        if (!comparison) {
            showMessage(comparison.error().toString(), true);
            return;
        }
    }
    m_comparison = std::move(*comparison);
    // Keep the passage in place across a decision (it may have grown or shrunk).
    if (currentStart >= 0) {
        m_current = -1;
        for (size_t i = 0; i < m_comparison.passages.size(); ++i)
            if (m_comparison.passages[i].range.overlaps(TextRange {currentStart, currentEnd})) {
                m_current = int(i);
                break;
            }
    }
    std::vector<AnnotationId> chosen;
    for (QTreeWidgetItem *item : m_spanList->selectedItems())
        if (!item->data(0, IsGoldRole).toBool())
            chosen.push_back(AnnotationId {item->data(0, IdRole).toLongLong()});

    std::vector<ComparisonView::Column> columns;
    for (CoderId c : m_comparison.coders) {
        ComparisonView::Column column;
        column.title = coderName(c);
        column.coder = c;
        for (const Annotation &a : doc.spans()) {
            if (a.coder != c || a.deleted)
                continue;
            ComparisonView::Mark mark;
            mark.function = a.content.function;
            mark.range = a.content.range;
            mark.selected = std::ranges::find(chosen, a.id) != chosen.end();
            mark.rejected = doc.isRejected(a.id);
            column.marks.push_back(mark);
        }
        columns.push_back(std::move(column));
    }
    const std::vector<GoldAnnotation> &gold = doc.gold();
    ComparisonView::Column goldColumn;
    goldColumn.title = gold.empty() ? tr("Gold") : tr("Gold (%1)").arg(gold.size());
    for (const GoldAnnotation &g : gold)
        goldColumn.marks.push_back({g.content.function, g.content.range, false, false});
    columns.push_back(std::move(goldColumn));
    m_view->setContent(doc.article(), std::move(columns), m_comparison.passages, m_current);
    refreshDecisionList();
    refreshAnswers();
}

void ComparisonWindow::refreshAnswers()
{
    if (!isArticleOpen()) {
        m_answers->clear();
        return;
    }
    const ComparisonDocument &doc = m_session->comparisonDocument();
    // The coders whose columns are shown, by pseudonym only.
    std::vector<Coder> coders;
    for (CoderId id : m_comparison.coders)
        if (const auto it = std::ranges::find(m_coders, id, &Coder::id); it != m_coders.end())
            coders.push_back(*it);
    m_answers->setContent(
        m_session->codebook(), coders, doc.answers(), doc.goldAnswers(), m_coders);
}

const Passage *ComparisonWindow::passage() const
{
    if (m_current < 0 || size_t(m_current) >= m_comparison.passages.size())
        return nullptr;
    return &m_comparison.passages[size_t(m_current)];
}

void ComparisonWindow::setCurrentPassage(int index)
{
    if (index >= int(m_comparison.passages.size()))
        index = -1;
    const bool changed = index != m_current;
    m_current = index;
    m_view->setCurrentPassage(index);
    m_view->ensurePassageVisible(index);
    if (changed) {
        const QSignalBlocker block(m_spanList);
        m_spanList->clearSelection();
    }
    refreshDecisionList();
    if (changed && m_spanList->topLevelItemCount() > 0) {
        // The first coder's span is chosen, so that A accepts it at once.
        m_spanList->setCurrentItem(m_spanList->topLevelItem(0));
    }
}

bool ComparisonWindow::nextDisagreement()
{
    const int n = int(m_comparison.passages.size());
    for (int step = 1; step <= n; ++step) {
        const int i = (std::max(m_current, -1) + step + n) % n;
        if (isOpenDisagreement(m_comparison.passages[size_t(i)])) {
            setCurrentPassage(i);
            return true;
        }
    }
    showMessage(tr("No undecided disagreement left in this article. %1 opens the next article.")
                    .arg(CompareKeys::nextArticle().front().toString(QKeySequence::NativeText)),
        false);
    return false;
}

bool ComparisonWindow::previousDisagreement()
{
    const int n = int(m_comparison.passages.size());
    const int from = m_current < 0 ? 0 : m_current;
    for (int step = 1; step <= n; ++step) {
        const int i = ((from - step) % n + n) % n;
        if (isOpenDisagreement(m_comparison.passages[size_t(i)])) {
            setCurrentPassage(i);
            return true;
        }
    }
    showMessage(tr("No undecided disagreement left in this article."), false);
    return false;
}

void ComparisonWindow::refreshDecisionList()
{
    std::vector<qint64> chosenSpans;
    std::vector<qint64> chosenGold;
    for (QTreeWidgetItem *item : m_spanList->selectedItems())
        (item->data(0, IsGoldRole).toBool() ? chosenGold : chosenSpans)
            .push_back(item->data(0, IdRole).toLongLong());
    const QSignalBlocker block(m_spanList);
    m_spanList->clear();
    const Passage *p = passage();
    if (!p) {
        m_passageLabel->setText(m_comparison.passages.empty()
                ? tr("No spans to compare in this article.")
                : tr("Click a passage or press N for the next disagreement."));
        m_detail->clear();
        updateActions();
        return;
    }
    QStringList kinds;
    if (p->has(DisagreementKind::Presence)) {
        QStringList missing;
        for (CoderId c : p->missing)
            missing << coderName(c);
        kinds << tr("no span by %1").arg(missing.join(tr(", ")));
    }
    if (p->has(DisagreementKind::Function))
        kinds << tr("different functions");
    if (p->has(DisagreementKind::Boundary))
        kinds << tr("different boundaries");
    if (p->has(DisagreementKind::Attributes))
        kinds << tr("different attributes");
    int paragraph = 0;
    if (isArticleOpen()) {
        const std::vector<Paragraph> &paragraphs =
            m_session->comparisonDocument().article().paragraphs;
        for (size_t i = 0; i < paragraphs.size(); ++i)
            if (paragraphs[i].range.overlaps(p->range)) {
                paragraph = int(i) + 1;
                break;
            }
    }
    m_passageLabel->setText(
        tr("Passage %1 of %2 (paragraph %3): %4%5")
            .arg(m_current + 1)
            .arg(m_comparison.passages.size())
            .arg(paragraph)
            .arg(kinds.isEmpty() ? tr("the coders agree") : kinds.join(tr("; ")))
            .arg(p->isResolved() ? tr(" \u2014 decided") : QString()));
    // Rows by coder (in the columns' order), then by position.
    std::vector<size_t> order(p->spans.size());
    for (size_t i = 0; i < order.size(); ++i)
        order[i] = i;
    auto column = [&](CoderId c) {
        return std::ranges::find(m_comparison.coders, c) - m_comparison.coders.begin();
    };
    std::ranges::stable_sort(order, {}, [&](size_t i) { return column(p->spans[i].coder); });
    for (size_t i : order) {
        const Annotation &a = p->spans[i];
        bool inGold = false;
        for (const GoldAnnotation &g : p->gold)
            inGold |= std::ranges::find(g.sources, a.id) != g.sources.end();
        auto *item = new QTreeWidgetItem(m_spanList);
        item->setIcon(0, badgeIcon(a.content.function));
        item->setText(0, coderName(a.coder));
        item->setText(1, spanText(functionName(a.content.function), a.quote, a.content.attributes));
        item->setToolTip(
            1, tr("Characters %1 to %2").arg(a.content.range.start).arg(a.content.range.end));
        item->setText(2, p->rejected[i] ? tr("rejected") : inGold ? tr("in gold") : QString());
        item->setData(0, IdRole, a.id.value);
        item->setData(0, IsGoldRole, false);
        item->setSelected(std::ranges::find(chosenSpans, a.id.value) != chosenSpans.end());
    }
    for (const GoldAnnotation &g : p->gold) {
        auto *item = new QTreeWidgetItem(m_spanList);
        item->setIcon(0, badgeIcon(g.content.function));
        item->setText(0, tr("Gold"));
        item->setText(1, spanText(functionName(g.content.function), g.quote, g.content.attributes));
        QStringList from;
        for (AnnotationId s : g.sources)
            for (const Annotation &a : p->spans)
                if (a.id == s && !from.contains(coderName(a.coder)))
                    from << coderName(a.coder);
        item->setText(
            2, from.isEmpty() ? tr("drawn by the lead") : tr("from %1").arg(from.join(tr(", "))));
        item->setToolTip(2,
            tr("Decided by %1 at %2.%3")
                .arg(coderName(g.decidedBy), g.decidedAt)
                .arg(g.rationale.isEmpty() ? QString() : tr(" Rationale: %1").arg(g.rationale)));
        item->setData(0, IdRole, g.id.value);
        item->setData(0, IsGoldRole, true);
        item->setSelected(std::ranges::find(chosenGold, g.id.value) != chosenGold.end());
    }
    // Provenance of the gold spans of the passage, in words.
    QStringList details;
    for (const GoldAnnotation &g : p->gold)
        details << tr("Gold %1 decided by %2 at %3%4")
                       .arg(functionName(g.content.function), coderName(g.decidedBy),
                           g.decidedAt.left(16).replace(QLatin1Char('T'), QLatin1Char(' ')))
                       .arg(g.rationale.isEmpty()
                               ? QString()
                               : QStringLiteral(": \u201C%1\u201D").arg(g.rationale));
    m_detail->setText(details.join(QLatin1Char('\n')));
    updateActions();
}

std::vector<Annotation> ComparisonWindow::selectedSpans() const
{
    std::vector<Annotation> out;
    const Passage *p = passage();
    if (!p)
        return out;
    for (const Annotation &a : p->spans)
        for (QTreeWidgetItem *item : m_spanList->selectedItems())
            if (!item->data(0, IsGoldRole).toBool()
                && item->data(0, IdRole).toLongLong() == a.id.value)
                out.push_back(a);
    return out;
}

std::vector<GoldId> ComparisonWindow::selectedGold() const
{
    std::vector<GoldId> out;
    for (QTreeWidgetItem *item : m_spanList->selectedItems())
        if (item->data(0, IsGoldRole).toBool())
            out.push_back(GoldId {item->data(0, IdRole).toLongLong()});
    return out;
}

void ComparisonWindow::selectSpans(const std::vector<AnnotationId> &ids)
{
    {
        const QSignalBlocker block(m_spanList);
        for (int i = 0; i < m_spanList->topLevelItemCount(); ++i) {
            QTreeWidgetItem *item = m_spanList->topLevelItem(i);
            item->setSelected(!item->data(0, IsGoldRole).toBool()
                && std::ranges::find(ids, AnnotationId {item->data(0, IdRole).toLongLong()})
                    != ids.end());
        }
    }
    updateActions();
    reloadArticle();
}

void ComparisonWindow::selectGold(const std::vector<GoldId> &ids)
{
    {
        const QSignalBlocker block(m_spanList);
        for (int i = 0; i < m_spanList->topLevelItemCount(); ++i) {
            QTreeWidgetItem *item = m_spanList->topLevelItem(i);
            item->setSelected(item->data(0, IsGoldRole).toBool()
                && std::ranges::find(ids, GoldId {item->data(0, IdRole).toLongLong()})
                    != ids.end());
        }
    }
    updateActions();
    reloadArticle();
}

void ComparisonWindow::setRationale(const QString &text)
{
    m_rationale->setText(text);
}

void ComparisonWindow::updateActions()
{
    if (!m_accept)
        return;
    const auto spans = selectedSpans();
    const Passage *p = passage();
    m_accept->setEnabled(spans.size() == 1);
    m_merge->setEnabled(spans.size() >= 2);
    m_edit->setEnabled(p != nullptr);
    m_reject->setEnabled(!spans.empty());
    m_withdraw->setEnabled(selectedGold().size() == 1);
}

void ComparisonWindow::showMessage(const QString &text, bool error)
{
    m_lastMessage = text;
    if (!m_message)
        return;
    m_message->setText(text);
    m_message->setStyleSheet(error ? QStringLiteral("color: palette(highlighted-text); "
                                                    "background: palette(highlight); padding: 2px")
                                   : QString());
}

bool ComparisonWindow::push(std::unique_ptr<Edit> edit, ArticleDocument::Parts touched)
{
    // A refusal is said here, in the window the lead decides in.
    if (auto st = m_session->project().apply(*edit); !st) {
        showMessage(st.error().toString(), true);
        return false;
    }
    const QString text = edit->text();
    // The session puts it on the undo stack and reads `touched` into the comparison document;
    // its articleChanged then updates the queue's row and the article shown here (as on undo and
    // redo).
    m_session->pushApplied(std::move(edit), m_article, touched);
    m_rationale->clear();
    // The next key (N, A, …) goes to the comparison, not into the rationale just used.
    if (m_rationale->hasFocus())
        m_view->setFocus();
    showMessage(tr("%1. Undo with %2.")
                    .arg(text, QKeySequence(QKeySequence::Undo).toString(QKeySequence::NativeText)),
        false);
    return true;
}

bool ComparisonWindow::refreshQueueRow(ArticleId article)
{
    const int at = m_queueModel->rowOf(article);
    if (at < 0)
        return false;
    const ArticleDisagreement &old = m_queueModel->rows()[size_t(at)];
    // The open article's row from its document, another's (a coder's edit on the desk) read.
    const ComparisonDocument &doc = m_session->comparisonDocument();
    auto row = doc.isOpen() && doc.id() == article
        ? doc.queueRow(old, filter())
        : articleDisagreement(m_session->project(), old, filter());
    if (!row) {
        showMessage(row.error().toString(), true);
        return false;
    }
    return m_queueModel->updateRow(std::move(*row));
}

bool ComparisonWindow::acceptSelected()
{
    const auto spans = selectedSpans();
    if (spans.size() != 1 || !passage()) {
        showMessage(tr("Choose one coder's span to accept (or several to merge)."), true);
        return false;
    }
    const GoldCandidate c = acceptCandidate(*passage(), spans.front());
    return decide(c);
}

bool ComparisonWindow::mergeSelected()
{
    auto c = mergeCandidate(selectedSpans());
    if (!c) {
        showMessage(c.error().toString(), true);
        return false;
    }
    return decide(*c);
}

bool ComparisonWindow::decide(const GoldCandidate &candidate)
{
    return push(std::make_unique<AdjudicateSpanEdit>(m_article, m_session->coder().id,
                    candidate.content, candidate.sources, m_rationale->text().trimmed()),
        ArticleDocument::Part::Gold);
}

bool ComparisonWindow::editSelected()
{
    const Passage *p = passage();
    if (!p || !isArticleOpen()) {
        showMessage(tr("Choose a passage first."), true);
        return false;
    }
    std::vector<Annotation> spans = selectedSpans();
    if (spans.empty())
        spans = p->spans;
    GoldCandidate start;
    start.content = spans.front().content;
    start.content.note.clear();
    start.content.confidence.reset();
    for (const Annotation &a : spans) {
        start.content.range.start = std::min(start.content.range.start, a.content.range.start);
        start.content.range.end = std::max(start.content.range.end, a.content.range.end);
        start.sources.push_back(a.id);
    }
    GoldSpanDialog dialog(
        m_session->comparisonDocument().article(), start.content, m_session->codebook(), this);
    if (dialog.exec() != QDialog::Accepted)
        return false;
    start.content = dialog.content();
    // Provenance: the chosen spans that the decided span overlaps.
    std::erase_if(start.sources, [&](AnnotationId id) {
        const auto it = std::ranges::find(spans, id, &Annotation::id);
        return it == spans.end() || !it->content.range.overlaps(start.content.range);
    });
    return decide(start);
}

bool ComparisonWindow::rejectSelected()
{
    std::vector<AnnotationId> ids;
    const Passage *p = passage();
    for (const Annotation &a : selectedSpans()) {
        const auto i =
            size_t(std::ranges::find(p->spans, a.id, &Annotation::id) - p->spans.begin());
        if (!p->rejected[i])
            ids.push_back(a.id);
    }
    if (ids.empty()) {
        showMessage(tr("Choose the spans to reject (that are not rejected yet)."), true);
        return false;
    }
    return push(std::make_unique<RejectSpansEdit>(
                    ids, m_session->coder().id, m_rationale->text().trimmed()),
        ArticleDocument::Part::Rejections);
}

bool ComparisonWindow::withdrawSelectedGold()
{
    const auto gold = selectedGold();
    if (gold.size() != 1) {
        showMessage(tr("Choose one gold span to withdraw."), true);
        return false;
    }
    return push(std::make_unique<WithdrawGoldEdit>(gold.front(), m_session->coder().id),
        ArticleDocument::Part::Gold);
}

bool ComparisonWindow::decideAnswer(
    const QString &item, const QString &value, const QString &rationale)
{
    if (!m_article.isValid())
        return false;
    // push() clears the spans' rationale field, which this decision did not use.
    const QString spanRationale = m_rationale->text();
    if (!push(std::make_unique<AdjudicateAnswerEdit>(
                  m_article, m_session->coder().id, item, value, rationale.trimmed()),
            ArticleDocument::Part::GoldAnswers))
        return false;
    m_rationale->setText(spanRationale);
    m_answers->setRationale(QString());
    return true;
}

bool ComparisonWindow::withdrawGoldAnswer(GoldJudgementId id)
{
    if (!m_article.isValid() || !id.isValid()) {
        showMessage(tr("Choose an item with a gold answer to withdraw."), true);
        return false;
    }
    return push(std::make_unique<WithdrawGoldAnswerEdit>(id, m_session->coder().id),
        ArticleDocument::Part::GoldAnswers);
}

bool ComparisonWindow::acceptAllAgreed()
{
    if (!isArticleOpen())
        return false;
    // Agreement among every coder of the article whose coding is shown, whatever the function
    // and pair filters say.
    auto all = m_session->comparisonDocument().compare({{}, {}, filter().includeUnfinished});
    if (!all) {
        showMessage(all.error().toString(), true);
        return false;
    }
    auto candidates = agreedCandidates(*all);
    if (candidates.empty()) {
        showMessage(tr("There is no agreed passage left to accept in this article."), false);
        return false;
    }
    return push(std::make_unique<AcceptSpansEdit>(m_article, m_session->coder().id,
                    std::move(candidates), m_rationale->text().trimmed()),
        ArticleDocument::Part::Gold);
}

} // namespace fourfold
