#include "app/desktop/study/training_feedback_dialog.h"

#include "app/desktop/function_style.h"
#include "app/desktop/study/study_text.h"
#include "core/agreement/agreement_report.h"
#include "core/project/project.h"

#include <QComboBox>
#include <QDialogButtonBox>
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

} // namespace

TrainingFeedbackDialog::TrainingFeedbackDialog(Project &project, CoderId coder, QWidget *parent)
    : QDialog(parent)
    , m_project(project)
{
    if (auto coders = project.coders())
        for (const Coder &c : *coders)
            if (c.id == coder)
                m_pseudonym = c.pseudonym;
    setWindowTitle(tr("Training feedback — %1").arg(m_pseudonym));
    auto *layout = new QVBoxLayout(this);
    m_heading = new QLabel(this);
    m_heading->setObjectName(QStringLiteral("training-heading"));
    m_heading->setWordWrap(true);
    layout->addWidget(m_heading);

    auto *unitRow = new QHBoxLayout;
    unitRow->addWidget(new QLabel(tr("Compared per:"), this));
    m_unit = new QComboBox(this);
    m_unit->setObjectName(QStringLiteral("training-unit"));
    m_unit->setAccessibleName(tr("Unit"));
    m_unit->addItem(tr("sentence"), int(UnitKind::Sentence));
    m_unit->addItem(tr("paragraph"), int(UnitKind::Paragraph));
    m_unit->addItem(tr("word"), int(UnitKind::Token));
    unitRow->addWidget(m_unit);
    unitRow->addStretch();
    layout->addLayout(unitRow);

    m_table = new QTableWidget(0, 5, this);
    m_table->setObjectName(QStringLiteral("training-table"));
    m_table->setAccessibleName(tr("Agreement per function"));
    m_table->setHorizontalHeaderLabels({tr("Function"), tr("Same as the master"), tr("α"),
        tr("You marked / master marked"), tr("What it suggests")});
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->verticalHeader()->setVisible(false);
    m_table->verticalHeader()->setDefaultSectionSize(m_table->fontMetrics().height() + 12);
    m_table->horizontalHeader()->setStretchLastSection(true);
    m_table->setSelectionMode(QAbstractItemView::NoSelection);
    layout->addWidget(m_table, 1);

    auto *note = new QLabel(
        tr("Most units carry no function, so \"same as the master\" is high even when your spans "
           "differ; α corrects for that agreement by chance (Krippendorff). Aim for α of 0.800 or "
           "more."),
        this);
    note->setWordWrap(true);
    note->setStyleSheet(QStringLiteral("color: palette(mid)"));
    layout->addWidget(note);

    m_next = new QLabel(this);
    m_next->setObjectName(QStringLiteral("training-next"));
    m_next->setWordWrap(true);
    layout->addWidget(m_next);

    auto *buttons = new QDialogButtonBox(this);
    m_continue = buttons->addButton(tr("On to the real work"), QDialogButtonBox::AcceptRole);
    m_continue->setObjectName(QStringLiteral("training-continue"));
    buttons->addButton(QDialogButtonBox::Close);
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    layout->addWidget(buttons);

    connect(m_unit, &QComboBox::currentIndexChanged, this, &TrainingFeedbackDialog::refresh);
    resize(760, 380);
    refresh();
}

bool TrainingFeedbackDialog::isDue(const Project &project, CoderId coder)
{
    auto rows = project.assignments();
    if (!rows)
        return false;
    bool any = false;
    for (const Assignment &a : *rows) {
        if (a.coder != coder || a.phase != Phase::Training)
            continue;
        any = true;
        if (a.status != QLatin1String("done"))
            return false;
    }
    return any;
}

void TrainingFeedbackDialog::refresh()
{
    TrainingRequest request;
    request.coder = m_pseudonym;
    request.unit = UnitKind(m_unit->currentData().toInt());
    auto feedback = Training::feedback(m_project, request);
    m_table->setRowCount(0);
    if (!feedback) {
        m_feedback.reset();
        m_heading->setText(
            tr("<b>No feedback yet.</b> %1").arg(feedback.error().message.toHtmlEscaped()));
        m_next->clear();
        m_continue->setEnabled(false);
        return;
    }
    m_feedback = *feedback;
    const QString unit = m_unit->currentText();
    if (feedback->articles.isEmpty())
        m_heading->setText(tr("<b>No finished training article to compare yet.</b> Feedback "
                              "comes once you mark a training article as done."));
    else
        m_heading->setText(
            tr("<b>%1, your coding of %n training article(s) compared with the master coding "
               "of %2</b>, %3 by %3: in how many did you and the master agree on whether the "
               "function is there?",
                nullptr, int(feedback->articles.size()))
                .arg(feedback->coder.toHtmlEscaped(), feedback->master.toHtmlEscaped(), unit));

    for (const FunctionAgreement &f : feedback->functions) {
        const int r = m_table->rowCount();
        m_table->insertRow(r);
        const FunctionStyle style = functionStyle(f.function);
        auto *name = cell(QStringLiteral("%1  %2").arg(style.letter).arg(functionName(f.function)));
        name->setForeground(style.colour.darker(125));
        QFont bold = name->font();
        bold.setBold(true);
        name->setFont(bold);
        m_table->setItem(r, 0, name);

        auto *share = cell(QString::number(f.percentAgreement * 100, 'f', 0), Qt::AlignRight);
        share->setData(Qt::UserRole, f.percentAgreement);
        m_table->setItem(r, 1, share);
        auto *bar = new QProgressBar(m_table);
        bar->setRange(0, std::max(1, f.units));
        bar->setValue(f.agreeingUnits);
        bar->setFormat(tr("%1 % (%2 of %3)")
                           .arg(f.percentAgreement * 100, 0, 'f', 0)
                           .arg(f.agreeingUnits)
                           .arg(f.units));
        bar->setStyleSheet(
            QStringLiteral("QProgressBar { border: 1px solid palette(mid); border-radius: 2px; "
                           "background: palette(base); color: palette(text); text-align: center; "
                           "margin: 3px; } QProgressBar::chunk { background: %1; }")
                .arg(studyPale(style.colour).name()));
        m_table->setCellWidget(r, 1, bar);

        auto *alpha = cell(studyCoefficient(f.alpha), Qt::AlignRight);
        if (!f.alpha)
            alpha->setToolTip(f.alphaUndefinedReason);
        m_table->setItem(r, 2, alpha);
        m_table->setItem(
            r, 3, cell(tr("%1 / %2").arg(f.coderUnits).arg(f.masterUnits), Qt::AlignCenter));

        // The direction of the difference is what a trainee can act on: marking the function
        // where the master did not, or missing it (common practice in coder training).
        QString advice;
        if (f.units == 0)
            advice = tr("nothing to compare");
        else if (alphaBand(f.alpha) == AlphaBand::Reliable)
            advice = tr("close to the master");
        else if (f.coderUnits > f.masterUnits)
            advice = tr("you mark it more often than the master: re-read the exclusion rules");
        else if (f.coderUnits < f.masterUnits)
            advice = tr("you miss some: re-read the definition and examples");
        else
            advice = tr("as often, but in other places: compare your spans with the lead's");
        m_table->setItem(r, 4, cell(advice));
    }
    m_table->resizeColumnsToContents();
    m_table->setColumnWidth(1, std::max(m_table->columnWidth(1), 170));

    if (feedback->openArticles > 0) {
        m_next->setText(tr("You have %n training article(s) still open. Finish them before the "
                           "real work starts.",
            nullptr, feedback->openArticles));
        m_continue->setEnabled(false);
    } else {
        m_next->setText(feedback->trainingComplete
                ? tr("Training is complete. Talk over the functions with low agreement with your "
                     "lead, then go on to your assigned articles.")
                : QString());
        m_continue->setEnabled(feedback->trainingComplete);
    }
}

} // namespace fourfold
