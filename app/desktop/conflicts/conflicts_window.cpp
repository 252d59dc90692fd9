#include "app/desktop/conflicts/conflicts_window.h"

#include "app/desktop/coding_session.h"
#include "app/desktop/edit_command.h"
#include "app/desktop/function_style.h"
#include "core/project/coder_copies.h"
#include "core/project/conflict_edits.h"
#include "core/project/project.h"

#include <QCheckBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QJsonDocument>
#include <QLabel>
#include <QPushButton>
#include <QSplitter>
#include <QTableWidget>
#include <QTextBrowser>
#include <QUndoStack>
#include <QVBoxLayout>

namespace fourfold {

namespace {

enum Column {
    CoderColumn,
    ArticleColumn,
    ObjectColumn,
    FromColumn,
    FoundColumn,
    DecisionColumn,
    ColumnCount
};

QString esc(const QString &s)
{
    return s.toHtmlEscaped();
}

} // namespace

ConflictsWindow::ConflictsWindow(CodingSession *session, QWidget *parent)
    : QWidget(parent, Qt::Window)
    , m_session(session)
{
    setWindowTitle(tr("Merge conflicts \u2014 %1").arg(session->project().settings().name));
    auto *layout = new QVBoxLayout(this);
    auto *intro = new QLabel(
        tr("A conflict is a coder's span, answer or link that was changed both in the project and "
           "in a coder copy (or on the team server). The later change was kept; the other "
           "version waits here. Keep the project's version or take the other one: each decision "
           "can be undone with Edit \u2192 Undo."),
        this);
    intro->setWordWrap(true);
    layout->addWidget(intro);
    m_showDecided = new QCheckBox(tr("Show decided conflicts"), this);
    layout->addWidget(m_showDecided);

    auto *splitter = new QSplitter(Qt::Vertical, this);
    m_table = new QTableWidget(0, ColumnCount, splitter);
    m_table->setHorizontalHeaderLabels({tr("Coder"), tr("Article"), tr("What"),
        tr("Other version from"), tr("Found"), tr("Decision")});
    m_table->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_table->setSelectionMode(QAbstractItemView::SingleSelection);
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->verticalHeader()->hide();
    m_table->horizontalHeader()->setSectionResizeMode(ArticleColumn, QHeaderView::Stretch);
    m_table->setAccessibleName(tr("Conflicts"));

    auto *sides = new QWidget(splitter);
    auto *sidesLayout = new QHBoxLayout(sides);
    sidesLayout->setContentsMargins(0, 0, 0, 0);
    auto column = [&](const QString &title, QTextBrowser **view, QPushButton **button,
                      const QString &buttonText) {
        auto *box = new QVBoxLayout;
        box->addWidget(new QLabel(QStringLiteral("<b>%1</b>").arg(esc(title)), sides));
        *view = new QTextBrowser(sides);
        (*view)->setAccessibleName(title);
        box->addWidget(*view, 1);
        *button = new QPushButton(buttonText, sides);
        box->addWidget(*button);
        sidesLayout->addLayout(box, 1);
    };
    column(tr("In the project now"), &m_mine, &m_keepMine, tr("&Keep the project's version"));
    column(tr("The other version"), &m_theirs, &m_keepTheirs, tr("&Take the other version"));
    splitter->addWidget(m_table);
    splitter->addWidget(sides);
    splitter->setStretchFactor(0, 2);
    splitter->setStretchFactor(1, 3);
    layout->addWidget(splitter, 1);
    m_message = new QLabel(this);
    m_message->setWordWrap(true);
    m_message->setTextFormat(Qt::PlainText);
    layout->addWidget(m_message);

    connect(m_showDecided, &QCheckBox::toggled, this, &ConflictsWindow::reload);
    connect(m_table, &QTableWidget::currentCellChanged, this, [this] { showCurrent(); });
    connect(m_keepMine, &QPushButton::clicked, this, &ConflictsWindow::keepProjectVersion);
    connect(m_keepTheirs, &QPushButton::clicked, this, &ConflictsWindow::takeOtherVersion);
    // A decision undone or redone from the desk's Edit menu (or a merge) changes the list.
    connect(session, &CodingSession::articleChanged, this, &ConflictsWindow::reload);
    resize(1100, 700);

    const Project &project = session->project();
    if (auto articles = project.articles())
        for (const ArticleSummary &a : *articles) {
            m_articleTitles.insert(a.uuid, a.title);
            m_articleIds.insert(a.uuid, a.id.value);
        }
    if (auto people = project.coders())
        for (const fourfold::Coder &c : *people)
            m_pseudonyms.insert(c.uuid, c.pseudonym);
    reload();
}

void ConflictsWindow::reload()
{
    const int row = m_table->currentRow();
    auto list = CoderCopies::conflicts(m_session->project(), m_showDecided->isChecked());
    if (!list) {
        m_message->setText(list.error().toString());
        return;
    }
    m_conflicts = std::move(*list);
    const QSignalBlocker block(m_table);
    m_table->setRowCount(int(m_conflicts.size()));
    for (int i = 0; i < int(m_conflicts.size()); ++i) {
        const MergeConflict &c = m_conflicts[size_t(i)];
        const QJsonObject &shown = c.mine.isEmpty() ? c.theirs : c.mine;
        QString what = c.objectType;
        if (c.objectType == QLatin1String("annotation"))
            if (auto f = functionFromKey(shown.value(QLatin1String("function")).toString()))
                what = tr("%1 span").arg(functionName(*f));
        if (c.objectType == QLatin1String("judgement"))
            what = tr("answer to %1").arg(shown.value(QLatin1String("item")).toString());
        if (CoderCopies::isWithdrawnAssignment(c))
            what = tr("withdrawn assignment, coded in a copy");
        const QString decision = c.resolution == QLatin1String("mine")
            ? tr("project's version kept")
            : c.resolution == QLatin1String("theirs") ? tr("other version taken")
                                                      : tr("open");
        const QStringList cells {coderOf(c),
            m_articleTitles.value(shown.value(QLatin1String("article")).toString()), what,
            c.copyUuid.isEmpty()                      ? tr("the project")
                : c.copyUuid == QLatin1String("team") ? tr("the team server")
                                                      : tr("copy %1").arg(c.copyUuid.left(8)),
            c.detectedAt.left(16).replace(QLatin1Char('T'), QLatin1Char(' ')), decision};
        for (int col = 0; col < ColumnCount; ++col)
            m_table->setItem(i, col, new QTableWidgetItem(cells[col]));
    }
    m_table->resizeColumnsToContents();
    m_table->horizontalHeader()->setSectionResizeMode(ArticleColumn, QHeaderView::Stretch);
    if (!m_conflicts.empty())
        m_table->setCurrentCell(std::clamp(row, 0, int(m_conflicts.size()) - 1), 0);
    showCurrent();
}

QString ConflictsWindow::coderOf(const MergeConflict &c) const
{
    const QJsonObject &shown = c.mine.isEmpty() ? c.theirs : c.mine;
    return m_pseudonyms.value(shown.value(QLatin1String("coder")).toString(), tr("?"));
}

void ConflictsWindow::setCurrent(int row)
{
    m_table->setCurrentCell(row, 0);
    showCurrent();
}

void ConflictsWindow::setShowDecided(bool on)
{
    m_showDecided->setChecked(on);
}

QString ConflictsWindow::message() const
{
    return m_message->text();
}

QString ConflictsWindow::describe(const QJsonObject &row, const QString &type) const
{
    if (row.isEmpty())
        return tr("<p><i>(none)</i></p>");
    QString html;
    if (row.value(QLatin1String("deleted")).toInteger() != 0)
        html += tr("<p><b>Deleted</b></p>");
    if (type == QLatin1String("annotation")) {
        const auto f = functionFromKey(row.value(QLatin1String("function")).toString());
        html +=
            QStringLiteral("<p><b>%1</b> [%2, %3)</p><p>\u201C%4\u201D</p>")
                .arg(esc(f ? functionName(*f) : row.value(QLatin1String("function")).toString()))
                .arg(row.value(QLatin1String("start")).toInteger())
                .arg(row.value(QLatin1String("end")).toInteger())
                .arg(esc(row.value(QLatin1String("quote")).toString()));
        const QJsonObject attributes =
            QJsonDocument::fromJson(row.value(QLatin1String("attributes")).toString().toUtf8())
                .object();
        for (auto it = attributes.begin(); it != attributes.end(); ++it)
            html += QStringLiteral("<p>%1: <b>%2</b></p>")
                        .arg(esc(it.key()), esc(it.value().toVariant().toString()));
        if (const QString note = row.value(QLatin1String("note")).toString(); !note.isEmpty())
            html += tr("<p>Note: %1</p>").arg(esc(note));
        if (const QJsonValue conf = row.value(QLatin1String("confidence")); conf.isDouble())
            html += tr("<p>Confidence: %1</p>").arg(conf.toDouble());
    } else if (type == QLatin1String("judgement")) {
        html += tr("<p>Answer to %1: <b>%2</b></p>")
                    .arg(esc(row.value(QLatin1String("item")).toString()),
                        esc(row.value(QLatin1String("value")).toString()));
    } else if (type == QLatin1String("assignment")) {
        html +=
            tr("<p>Status: <b>%1</b></p>").arg(esc(row.value(QLatin1String("status")).toString()));
    } else {
        html += tr("<p>Link: <b>%1</b></p>").arg(esc(row.value(QLatin1String("type")).toString()));
    }
    if (const QString modified = row.value(QLatin1String("modified_at")).toString();
        !modified.isEmpty())
        html += tr("<p><small>Changed %1</small></p>")
                    .arg(esc(modified.left(19).replace(QLatin1Char('T'), QLatin1Char(' '))));
    return html;
}

void ConflictsWindow::showCurrent()
{
    const int row = m_table->currentRow();
    const bool has = row >= 0 && row < int(m_conflicts.size());
    const bool open = has && m_conflicts[size_t(row)].resolution.isEmpty();
    m_keepMine->setEnabled(open);
    m_keepTheirs->setEnabled(open);
    if (!has) {
        m_mine->clear();
        m_theirs->clear();
        m_message->setText(m_conflicts.empty()
                ? (m_showDecided->isChecked() ? tr("No merge has found a conflict.")
                                              : tr("No conflicts wait for a decision."))
                : QString());
        return;
    }
    const MergeConflict &c = m_conflicts[size_t(row)];
    m_mine->setHtml(describe(c.mine, c.objectType));
    QString theirs = describe(c.theirs, c.objectType);
    if (CoderCopies::isWithdrawnAssignment(c))
        // The version alone does not say why it matters: the lead decides whether work done on a
        // withdrawn draw counts (core/project/coder_copies.h).
        theirs += tr("<p>The project withdrew this assignment (a withdrawn draw) while %1 coded "
                     "the article in a copy; the codings are in the project, but they do not "
                     "count while the assignment stays withdrawn. Keep the project's version to "
                     "leave it withdrawn, or take this version to assign the article to %1 "
                     "again.</p>")
                      .arg(esc(coderOf(c)));
    m_theirs->setHtml(theirs);
}

bool ConflictsWindow::keepProjectVersion()
{
    return decide(false);
}

bool ConflictsWindow::takeOtherVersion()
{
    return decide(true);
}

bool ConflictsWindow::decide(bool keepTheirs)
{
    const int row = m_table->currentRow();
    if (row < 0 || row >= int(m_conflicts.size())
        || !m_conflicts[size_t(row)].resolution.isEmpty()) {
        m_message->setText(tr("Choose an open conflict first."));
        return false;
    }
    const MergeConflict c = m_conflicts[size_t(row)];
    auto edit = std::make_unique<ResolveConflictEdit>(m_session->coder().id, c.uuid, keepTheirs);
    if (auto st = m_session->project().apply(*edit); !st) {
        m_message->setText(st.error().toString());
        return false;
    }
    const QString text = edit->text();
    const QJsonObject &shown = c.mine.isEmpty() ? c.theirs : c.mine;
    const ArticleId article {m_articleIds.value(shown.value(QLatin1String("article")).toString())};
    // The object may be on the desk's open article: the command reads it again whole.
    m_session->undoStack()->push(
        new EditCommand(m_session, std::move(edit), article, ArticleDocument::Part::Everything));
    reload();
    m_message->setText(tr("%1. Undo with Edit \u2192 Undo.").arg(text));
    return true;
}

} // namespace fourfold
