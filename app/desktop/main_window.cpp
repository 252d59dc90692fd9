#include "app/desktop/main_window.h"

#include "app/desktop/article_list_model.h"

#include <QApplication>
#include <QFileDialog>
#include <QHeaderView>
#include <QKeySequence>
#include <QLabel>
#include <QMenuBar>
#include <QMessageBox>
#include <QSplitter>
#include <QStatusBar>
#include <QTableView>
#include <QTextBrowser>

namespace fourfold {

namespace {

QString roleLabel(ParagraphRole role)
{
    switch (role) {
    case ParagraphRole::Intro:
        return MainWindow::tr("intro");
    case ParagraphRole::Body:
        return MainWindow::tr("body");
    case ParagraphRole::Conclusion:
        return MainWindow::tr("conclusion");
    }
    return {};
}

} // namespace

MainWindow::MainWindow(QWidget *parent)
    : QMainWindow(parent)
    , m_articles(new ArticleListModel(this))
{
    setWindowTitle(tr("Fourfold"));
    auto *splitter = new QSplitter(this);
    m_list = new QTableView(splitter);
    m_list->setModel(m_articles);
    m_list->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_list->setSelectionMode(QAbstractItemView::SingleSelection);
    m_list->verticalHeader()->hide();
    m_list->horizontalHeader()->setSectionResizeMode(ArticleListModel::Title, QHeaderView::Stretch);
    m_list->setAccessibleName(tr("Articles"));
    m_reader = new QTextBrowser(splitter);
    m_reader->setAccessibleName(tr("Article text"));
    m_reader->setOpenLinks(false);
    splitter->addWidget(m_list);
    splitter->addWidget(m_reader);
    splitter->setStretchFactor(0, 2);
    splitter->setStretchFactor(1, 3);
    setCentralWidget(splitter);

    QMenu *file = menuBar()->addMenu(tr("&Project"));
    file->addAction(tr("&Open…"), QKeySequence::Open, this, &MainWindow::openDialog);
    file->addSeparator();
    file->addAction(tr("&Quit"), QKeySequence::Quit, qApp, &QApplication::quit);

    m_status = new QLabel(this);
    statusBar()->addWidget(m_status);
    m_status->setText(tr("No project open."));

    connect(m_list->selectionModel(), &QItemSelectionModel::currentRowChanged, this,
        [this](const QModelIndex &current) {
            if (current.isValid())
                showArticle(ArticleId {current.data(ArticleListModel::ArticleIdRole).toLongLong()});
        });
    resize(1280, 800);
}

Status MainWindow::openProject(const QString &path)
{
    auto project = Project::open(path);
    if (!project)
        return std::unexpected(project.error());
    auto articles = project->articles();
    if (!articles)
        return std::unexpected(articles.error());
    auto counts = project->counts();
    m_project.emplace(std::move(*project));
    m_articles->setArticles(std::move(*articles));
    m_list->resizeColumnsToContents();
    m_list->horizontalHeader()->setSectionResizeMode(ArticleListModel::Title, QHeaderView::Stretch);
    setWindowTitle(tr("%1 — Fourfold").arg(m_project->settings().name));
    if (counts)
        m_status->setText(tr("%1 articles · %2 coders · %3 annotations")
                              .arg(counts->articles)
                              .arg(counts->coders)
                              .arg(counts->annotations));
    if (m_articles->rowCount() > 0)
        m_list->selectRow(0);
    return {};
}

void MainWindow::showArticle(ArticleId id)
{
    if (!m_project)
        return;
    auto article = m_project->article(id);
    if (!article) {
        statusBar()->showMessage(article.error().message, 8000);
        return;
    }
    QString html =
        QStringLiteral("<h2>%1</h2><p style='color:palette(mid)'>%2 · %3 · %4</p>")
            .arg(article->summary.title.toHtmlEscaped(), article->summary.outlet.toHtmlEscaped(),
                article->summary.published.toHtmlEscaped(),
                article->summary.language.toHtmlEscaped());
    const QList<uint> ucs4 = article->text.toUcs4();
    for (const Paragraph &p : article->paragraphs) {
        const QString paragraph =
            QString::fromUcs4(reinterpret_cast<const char32_t *>(ucs4.constData() + p.range.start),
                qsizetype(p.range.length()));
        html += QStringLiteral("<p><small style='color:gray'>[%1]</small> %2</p>")
                    .arg(roleLabel(p.role), paragraph.toHtmlEscaped());
    }
    m_reader->setHtml(html);
}

void MainWindow::openDialog()
{
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Open project"), QString(), tr("Fourfold projects (*.fourfold)"));
    if (path.isEmpty())
        return;
    if (auto st = openProject(path); !st)
        QMessageBox::warning(this, tr("Cannot open project"), st.error().toString());
}

} // namespace fourfold
