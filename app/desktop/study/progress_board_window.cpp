#include "app/desktop/study/progress_board_window.h"

#include "app/desktop/coding_session.h"
#include "app/desktop/function_style.h"
#include "app/desktop/study/study_text.h"
#include "core/agreement/agreement_report.h"
#include "core/project/project.h"
#include "core/project/study_progress.h"

#include <QCheckBox>
#include <QComboBox>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QTableWidget>
#include <QVBoxLayout>

namespace fourfold {

namespace {

QTableWidgetItem *cell(const QString &text, Qt::Alignment align = Qt::AlignLeft)
{
    auto *item = new QTableWidgetItem(text);
    item->setTextAlignment(align | Qt::AlignVCenter);
    return item;
}

QTableWidgetItem *number(qint64 value)
{
    auto *item = cell(QString::number(value), Qt::AlignCenter);
    item->setData(Qt::UserRole, value);
    return item;
}

QTableWidget *makeTable(const QStringList &headers, QWidget *parent, const QString &name)
{
    auto *t = new QTableWidget(0, int(headers.size()), parent);
    t->setHorizontalHeaderLabels(headers);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->setSelectionBehavior(QAbstractItemView::SelectRows);
    t->verticalHeader()->setVisible(false);
    t->verticalHeader()->setDefaultSectionSize(t->fontMetrics().height() + 10);
    t->horizontalHeader()->setStretchLastSection(true);
    t->setAlternatingRowColors(true);
    t->setAccessibleName(name);
    t->setObjectName(name);
    return t;
}

} // namespace

ProgressBoardWindow::ProgressBoardWindow(CodingSession &session, QWidget *parent)
    : QWidget(parent, Qt::Window)
    , m_session(session)
    , m_project(session.project())
    , m_current(session.coder().id)
    , m_isLead(session.isLead())
{
    setWindowTitle(tr("Progress — %1").arg(m_project.settings().name));
    auto *layout = new QVBoxLayout(this);

    auto *top = new QHBoxLayout;
    m_summary = new QLabel(this);
    m_summary->setObjectName(QStringLiteral("progress-summary"));
    m_summary->setWordWrap(true);
    top->addWidget(m_summary, 1);
    m_phase = new QComboBox(this);
    m_phase->setObjectName(QStringLiteral("progress-phase"));
    m_phase->setAccessibleName(tr("Phase"));
    m_phase->addItem(tr("All phases"), -1);
    for (Phase p : {Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production})
        m_phase->addItem(studyPhaseName(p), int(p));
    top->addWidget(new QLabel(tr("Show:"), this));
    top->addWidget(m_phase);
    auto *reload = new QPushButton(tr("Reload"), this);
    top->addWidget(reload);
    layout->addLayout(top);

    m_board = makeTable({tr("Coder"), tr("Phase"), tr("Assigned"), tr("Started"), tr("Done"),
                            tr("Agreement so far (α)"), tr("Compared articles"), tr("Active time")},
        this, QStringLiteral("progress-board"));
    m_board->horizontalHeaderItem(AgreementColumn)
        ->setToolTip(tr("Krippendorff's alpha on the articles the coder finished: in training "
                        "with the lead's master coding, in the other phases the mean over every "
                        "coder who finished the same articles. ✓ at 0.800 or more, ~ from 0.667 "
                        "(tentative), ✗ below."));
    m_board->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    layout->addWidget(m_board, 2);

    auto *effortBox = new QGroupBox(tr("Effort"), this);
    auto *effortLayout = new QVBoxLayout(effortBox);
    m_effort = makeTable({tr("Phase"), tr("Articles done"), tr("Active time, all coders"),
                             tr("Mean per done article")},
        effortBox, QStringLiteral("progress-effort"));
    m_effort->setMaximumHeight(150);
    m_effort->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    effortLayout->addWidget(m_effort);
    m_effortSwitch = new QCheckBox(tr("Show active time per coder"), effortBox);
    m_effortSwitch->setObjectName(QStringLiteral("progress-effort-switch"));
    effortLayout->addWidget(m_effortSwitch);
    auto *why = new QLabel(
        tr("Off by default: time is shown only summed over all coders. Recording and showing "
           "how long each person works can count as monitoring employees, which may need the "
           "coders' agreement or a works council's consent. Turn it on only if your study has "
           "that agreement; the change is written to the project's log. Only a lead can switch "
           "it."),
        effortBox);
    why->setObjectName(QStringLiteral("progress-effort-why"));
    why->setWordWrap(true);
    why->setStyleSheet(QStringLiteral("color: palette(mid)"));
    effortLayout->addWidget(why);
    layout->addWidget(effortBox, 1);

    m_error = new QLabel(this);
    m_error->setObjectName(QStringLiteral("progress-error"));
    m_error->setWordWrap(true);
    m_error->setStyleSheet(
        QStringLiteral("color: %1").arg(functionStyle(FramingFunction::Problem).colour.name()));
    m_error->hide();
    layout->addWidget(m_error);

    m_effortSwitch->setEnabled(m_isLead);
    connect(m_effortSwitch, &QCheckBox::toggled, this, &ProgressBoardWindow::setEffortPerCoder);
    connect(m_phase, &QComboBox::currentIndexChanged, this, &ProgressBoardWindow::refresh);
    connect(reload, &QPushButton::clicked, this, &ProgressBoardWindow::refresh);
    connect(&m_session, &CodingSession::projectEdited, this, &ProgressBoardWindow::refresh);
    refresh();
}

void ProgressBoardWindow::setEffortPerCoder(bool on)
{
    std::unique_ptr<Edit> edit = StudyProgress::effortEdit(on, m_current);
    if (Status st = m_project.apply(*edit); !st) {
        m_error->setText(st.error().message);
        m_error->show();
        const QSignalBlocker block(m_effortSwitch);
        m_effortSwitch->setChecked(!on);
        return;
    }
    m_session.pushApplied(std::move(edit), ArticleId {}, {}); // reads the board again
}

void ProgressBoardWindow::refresh()
{
    m_error->hide();
    const int phaseIndex = m_phase->currentData().toInt();
    const std::optional<Phase> phase =
        phaseIndex < 0 ? std::nullopt : std::optional<Phase>(Phase(phaseIndex));
    auto board = StudyProgress::board(m_project, phase);
    if (!board) {
        m_error->setText(board.error().message);
        m_error->show();
        return;
    }
    {
        const QSignalBlocker block(m_effortSwitch);
        m_effortSwitch->setChecked(board->effortPerCoder);
    }
    m_board->setColumnHidden(EffortColumn, !board->effortPerCoder);

    const QColor good = functionStyle(FramingFunction::Remedy).colour;
    const QColor bad = functionStyle(FramingFunction::Problem).colour;
    m_board->setRowCount(0);
    int assigned = 0;
    int done = 0;
    for (const ProgressRow &row : board->rows) {
        const int r = m_board->rowCount();
        m_board->insertRow(r);
        m_board->setItem(r, CoderColumn, cell(row.coder));
        m_board->setItem(r, PhaseColumn, cell(studyPhaseName(row.phase)));
        m_board->setItem(r, AssignedColumn, number(row.assigned));
        m_board->setItem(r, StartedColumn, number(row.started));
        m_board->setItem(r, DoneColumn, number(row.done));
        auto *bar = new QProgressBar(m_board);
        bar->setRange(0, std::max(1, row.assigned));
        bar->setValue(row.done);
        bar->setFormat(tr("%1 of %2").arg(row.done).arg(row.assigned));
        bar->setAccessibleName(tr("Done"));
        bar->setStyleSheet(
            QStringLiteral("QProgressBar { border: 1px solid palette(mid); border-radius: 2px; "
                           "background: palette(base); color: palette(text); text-align: center; "
                           "margin: 3px; } QProgressBar::chunk { background: %1; }")
                .arg(studyPale(good).name()));
        m_board->setCellWidget(r, DoneColumn, bar);
        // Krippendorff (2004, p. 241): rely on α ≥ .800, draw tentative conclusions from
        // .667 ≤ α < .800; a sign goes with the colour.
        QString text = studyCoefficient(row.agreement);
        auto *agreement = cell(text, Qt::AlignCenter);
        if (row.agreement) {
            const AlphaBand band = alphaBand(row.agreement);
            if (band == AlphaBand::Reliable) {
                agreement->setText(QStringLiteral("✓ ") + text);
                agreement->setForeground(good.darker(130));
            } else if (band == AlphaBand::Tentative) {
                agreement->setText(QStringLiteral("~ ") + text);
            } else {
                agreement->setText(QStringLiteral("✗ ") + text);
                agreement->setForeground(bad);
            }
            agreement->setData(Qt::UserRole, *row.agreement);
        }
        m_board->setItem(r, AgreementColumn, agreement);
        m_board->setItem(r, ComparedColumn, number(row.comparedArticles));
        m_board->setItem(r, EffortColumn,
            cell(row.activeSeconds ? studyDuration(*row.activeSeconds) : QStringLiteral("—"),
                Qt::AlignCenter));
        assigned += row.assigned;
        done += row.done;
    }

    m_effort->setRowCount(0);
    qint64 seconds = 0;
    for (const PhaseEffort &e : board->effort) {
        const int r = m_effort->rowCount();
        m_effort->insertRow(r);
        m_effort->setItem(r, 0, cell(studyPhaseName(e.phase)));
        m_effort->setItem(r, 1, number(e.doneArticles));
        m_effort->setItem(r, 2, cell(studyDuration(e.activeSeconds), Qt::AlignCenter));
        m_effort->setItem(r, 3,
            cell(e.meanSecondsPerDoneArticle ? studyDuration(qint64(*e.meanSecondsPerDoneArticle))
                                             : QStringLiteral("—"),
                Qt::AlignCenter));
        seconds += e.activeSeconds;
    }

    m_summary->setText(board->rows.empty()
            ? tr("<b>No assignments yet.</b> Plan them in the study design window.")
            : tr("<b>%1 of %2 assignments done</b> · %3 of active coding time in all.")
                  .arg(done)
                  .arg(assigned)
                  .arg(studyDuration(seconds)));
}

} // namespace fourfold
