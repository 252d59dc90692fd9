#include "app/desktop/study/study_design_window.h"

#include "app/desktop/coding_session.h"
#include "app/desktop/function_style.h"
#include "app/desktop/study/study_text.h"
#include "core/project/codebook_versions.h"
#include "core/project/coder_copies.h"
#include "core/project/outdated_annotations.h"
#include "core/project/project.h"

#include <QButtonGroup>
#include <QCheckBox>
#include <QComboBox>
#include <QDoubleSpinBox>
#include <QFileDialog>
#include <QFormLayout>
#include <QGridLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QInputDialog>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QLocale>
#include <QMap>
#include <QPushButton>
#include <QRadioButton>
#include <QRandomGenerator>
#include <QSet>
#include <QSpinBox>
#include <QSplitter>
#include <QTabWidget>
#include <QTableWidget>
#include <QTextBrowser>
#include <QVBoxLayout>

#include <algorithm>
#include <array>
#include <iterator>
#include <set>

namespace fourfold {

namespace {

// The colours that say "enough" and "short" on every study screen, taken from the function
// palette (Okabe & Ito 2008) so the window keeps one visual language; a sign always goes with
// the colour.
QColor goodColour()
{
    return functionStyle(FramingFunction::Remedy).colour;
}
QColor shortColour()
{
    return functionStyle(FramingFunction::Problem).colour;
}

QTableWidget *makeTable(const QStringList &headers, QWidget *parent, const QString &name)
{
    auto *t = new QTableWidget(0, int(headers.size()), parent);
    t->setHorizontalHeaderLabels(headers);
    t->setEditTriggers(QAbstractItemView::NoEditTriggers);
    t->setSelectionBehavior(QAbstractItemView::SelectRows);
    t->verticalHeader()->setVisible(false);
    t->verticalHeader()->setDefaultSectionSize(t->fontMetrics().height() + 8);
    t->horizontalHeader()->setStretchLastSection(true);
    t->setAlternatingRowColors(true);
    t->setAccessibleName(name);
    t->setObjectName(name);
    return t;
}

QTableWidgetItem *cell(const QString &text, Qt::Alignment align = Qt::AlignLeft)
{
    auto *item = new QTableWidgetItem(text);
    item->setTextAlignment(align | Qt::AlignVCenter);
    return item;
}

QTableWidgetItem *number(qint64 value)
{
    auto *item = cell(QString::number(value), Qt::AlignRight);
    item->setData(Qt::UserRole, value);
    return item;
}

QLabel *errorLabel(QWidget *parent, const QString &name)
{
    auto *l = new QLabel(parent);
    l->setWordWrap(true);
    l->setObjectName(name);
    l->setTextInteractionFlags(Qt::TextSelectableByMouse);
    l->setStyleSheet(QStringLiteral("color: %1").arg(shortColour().name()));
    l->hide();
    return l;
}

QLabel *hint(const QString &text, QWidget *parent)
{
    auto *l = new QLabel(text, parent);
    l->setWordWrap(true);
    l->setStyleSheet(QStringLiteral("color: palette(mid)"));
    return l;
}

constexpr std::array<Phase, 4> kPhases {
    Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production};

} // namespace

StudyDesignWindow::StudyDesignWindow(CodingSession &session, QWidget *parent)
    : QWidget(parent, Qt::Window)
    , m_session(session)
    , m_project(session.project())
    , m_current(session.coder().id)
{
    setWindowTitle(tr("Study design — %1").arg(m_project.settings().name));
    auto *layout = new QVBoxLayout(this);
    auto *intro = hint(tr("Plan who codes what: draw the reliability sample that every reliability "
                          "coder codes, deal the rest of the articles, and keep the codebook's "
                          "versions in view. Nothing is written until you commit a plan."),
        this);
    layout->addWidget(intro);
    m_tabs = new QTabWidget(this);
    m_tabs->setObjectName(QStringLiteral("study-tabs"));
    layout->addWidget(m_tabs);
    loadCoders();
    m_tabs->addTab(buildDrawPage(), tr("Reliability sample"));
    m_tabs->addTab(buildRestPage(), tr("Assign the rest"));
    m_tabs->addTab(buildAssignmentsPage(), tr("Assignments"));
    m_tabs->addTab(buildCodebookPage(), tr("Codebook versions"));
    refresh();
    connect(&m_session, &CodingSession::projectEdited, this, &StudyDesignWindow::refresh);
}

bool StudyDesignWindow::push(std::unique_ptr<Edit> edit, QLabel *error)
{
    if (Status st = m_project.apply(*edit); !st) {
        showError(error, st.error().message);
        return false;
    }
    m_session.pushApplied(std::move(edit), ArticleId {}, {}); // reads the pages again
    return true;
}

void StudyDesignWindow::showPage(Page page)
{
    m_tabs->setCurrentIndex(int(page));
}

void StudyDesignWindow::refresh()
{
    loadCoders();
    fillCoderList(m_drawCoders, false);
    fillCoderList(m_restCoders, false);
    fillCoderList(m_giveCoders, false);
    loadRecordedDraw();
    clearRestPlan();
    loadAssignments();
    loadCodebook();
}

void StudyDesignWindow::loadCoders()
{
    auto coders = m_project.coders();
    m_coders.clear();
    // A disabled person keeps their codings but takes no new work: they are not offered.
    if (coders)
        std::ranges::copy_if(
            *coders, std::back_inserter(m_coders), [](const Coder &c) { return !c.disabled; });
}

void StudyDesignWindow::fillCoderList(QListWidget *list, bool leadsChecked)
{
    const QStringList before = checkedCoders(list);
    const bool first = list->count() == 0;
    list->clear();
    for (const Coder &c : m_coders) {
        auto *item = new QListWidgetItem(
            QStringLiteral("%1 — %2 (%3)")
                .arg(c.pseudonym, c.name, c.role == CoderRole::Lead ? tr("lead") : tr("coder")),
            list);
        item->setData(Qt::UserRole, c.pseudonym);
        item->setFlags(item->flags() | Qt::ItemIsUserCheckable);
        const bool checked =
            first ? (c.role == CoderRole::Coder || leadsChecked) : before.contains(c.pseudonym);
        item->setCheckState(checked ? Qt::Checked : Qt::Unchecked);
    }
}

QStringList StudyDesignWindow::checkedCoders(const QListWidget *list) const
{
    QStringList pseudonyms;
    for (int i = 0; i < list->count(); ++i)
        if (list->item(i)->checkState() == Qt::Checked)
            pseudonyms << list->item(i)->data(Qt::UserRole).toString();
    return pseudonyms;
}

void StudyDesignWindow::setSeedText(QLineEdit *edit, std::uint64_t seed)
{
    edit->setText(QString::number(seed));
}

std::optional<std::uint64_t> StudyDesignWindow::seedOf(const QLineEdit *edit, QLabel *error)
{
    bool ok = false;
    const qulonglong seed = edit->text().trimmed().toULongLong(&ok);
    if (!ok) {
        showError(error,
            tr("The seed must be a whole number from 0 to 18446744073709551615; \"%1\" is not.")
                .arg(edit->text()));
        return std::nullopt;
    }
    return std::uint64_t(seed);
}

void StudyDesignWindow::showError(QLabel *label, const QString &message)
{
    label->setText(message);
    label->setVisible(!message.isEmpty());
}

// --- the reliability sample ---------------------------------------------------------------

QWidget *StudyDesignWindow::buildDrawPage()
{
    auto *page = new QWidget(this);
    auto *layout = new QHBoxLayout(page);

    auto *form = new QGroupBox(tr("Draw"), page);
    auto *formLayout = new QFormLayout(form);
    m_drawPhase = new QComboBox(form);
    m_drawPhase->setObjectName(QStringLiteral("draw-phase"));
    m_drawPhase->addItem(studyPhaseName(Phase::Reliability), int(Phase::Reliability));
    m_drawPhase->addItem(studyPhaseName(Phase::Pilot), int(Phase::Pilot));
    m_drawPhase->setToolTip(tr("A pilot sample is coded before the codebook is final and is not "
                               "part of the reliability sample."));
    formLayout->addRow(tr("Phase:"), m_drawPhase);

    auto *sizeRow = new QWidget(form);
    auto *sizeLayout = new QGridLayout(sizeRow);
    sizeLayout->setContentsMargins(0, 0, 0, 0);
    m_bySize = new QRadioButton(tr("Articles:"), sizeRow);
    m_bySize->setObjectName(QStringLiteral("draw-by-size"));
    auto *byFraction = new QRadioButton(tr("Share of the frame:"), sizeRow);
    byFraction->setObjectName(QStringLiteral("draw-by-fraction"));
    auto *sizeGroup = new QButtonGroup(sizeRow);
    sizeGroup->addButton(m_bySize);
    sizeGroup->addButton(byFraction);
    m_bySize->setChecked(true);
    m_drawSize = new QSpinBox(sizeRow);
    m_drawSize->setObjectName(QStringLiteral("draw-size"));
    m_drawSize->setRange(1, 100000);
    m_drawSize->setValue(5);
    m_drawPercent = new QDoubleSpinBox(sizeRow);
    m_drawPercent->setObjectName(QStringLiteral("draw-percent"));
    m_drawPercent->setRange(0.1, 100);
    m_drawPercent->setDecimals(1);
    m_drawPercent->setValue(20);
    m_drawPercent->setSuffix(QStringLiteral(" %"));
    // Figures are written with a decimal point in every language, as in the report and the
    // command line (studyCoefficient); the boxes show and read them the same way.
    m_drawPercent->setLocale(QLocale::c());
    sizeLayout->addWidget(m_bySize, 0, 0);
    sizeLayout->addWidget(m_drawSize, 0, 1);
    sizeLayout->addWidget(byFraction, 1, 0);
    sizeLayout->addWidget(m_drawPercent, 1, 1);
    formLayout->addRow(tr("Size:"), sizeRow);

    m_stratify = new QComboBox(form);
    m_stratify->setObjectName(QStringLiteral("draw-stratify"));
    m_stratify->addItem(tr("Simple random sample"), QString());
    m_stratify->addItem(tr("Stratified by outlet"), stratumKey(Stratum::Outlet));
    m_stratify->addItem(tr("Stratified by language"), stratumKey(Stratum::Language));
    m_stratify->addItem(tr("Stratified by topic"), stratumKey(Stratum::Topic));
    m_stratify->setToolTip(tr("Stratified draws allocate the sample to each group in proportion "
                              "to its size in the frame."));
    formLayout->addRow(tr("Method:"), m_stratify);

    m_leaveOutNearCopies = new QCheckBox(tr("Leave near copies out of the sampling frame"), form);
    m_leaveOutNearCopies->setObjectName(QStringLiteral("draw-leave-out-near-copies"));
    m_leaveOutNearCopies->setToolTip(
        tr("An article found at import to be a near copy of an older one (the same story with "
           "small edits) is not drawn; the older article stays in the frame."));
    formLayout->addRow(QString(), m_leaveOutNearCopies);

    auto *seedRow = new QWidget(form);
    auto *seedLayout = new QHBoxLayout(seedRow);
    seedLayout->setContentsMargins(0, 0, 0, 0);
    m_drawSeed = new QLineEdit(seedRow);
    m_drawSeed->setObjectName(QStringLiteral("draw-seed"));
    m_drawSeed->setAccessibleName(tr("Seed"));
    setSeedText(m_drawSeed, QRandomGenerator::global()->bounded(1u, 1000000u));
    auto *newSeed = new QPushButton(tr("New seed"), seedRow);
    connect(newSeed, &QPushButton::clicked, this,
        [this] { setSeedText(m_drawSeed, QRandomGenerator::global()->generate64()); });
    seedLayout->addWidget(m_drawSeed, 1);
    seedLayout->addWidget(newSeed);
    formLayout->addRow(tr("Seed:"), seedRow);
    formLayout->addRow(hint(tr("The seed is recorded with the draw: the same seed on the same "
                               "project draws the same articles on any computer."),
        form));

    m_drawCoders = new QListWidget(form);
    m_drawCoders->setObjectName(QStringLiteral("draw-coders"));
    m_drawCoders->setAccessibleName(tr("Reliability coders"));
    m_drawCoders->setMaximumHeight(110);
    formLayout->addRow(tr("Coded by all of:"), m_drawCoders);

    auto *adviceBox = new QGroupBox(tr("Minimum sample (Krippendorff)"), form);
    auto *adviceForm = new QFormLayout(adviceBox);
    m_alphaMin = new QDoubleSpinBox(adviceBox);
    m_alphaMin->setObjectName(QStringLiteral("draw-alpha-min"));
    m_alphaMin->setRange(0.5, 0.99);
    m_alphaMin->setDecimals(3);
    m_alphaMin->setSingleStep(0.01);
    m_alphaMin->setLocale(QLocale::c());
    m_alphaMin->setValue(0.8);
    m_alphaMin->setToolTip(tr("The smallest alpha you would still accept: 0.800 for firm "
                              "conclusions, 0.667 for tentative ones (Krippendorff)."));
    adviceForm->addRow(tr("α_min:"), m_alphaMin);
    m_significance = new QComboBox(adviceBox);
    m_significance->setObjectName(QStringLiteral("draw-significance"));
    for (double p : {0.05, 0.01, 0.1})
        m_significance->addItem(QString::number(p), p);
    adviceForm->addRow(tr("Significance level:"), m_significance);
    m_rarest = new QDoubleSpinBox(adviceBox);
    m_rarest->setObjectName(QStringLiteral("draw-rarest"));
    m_rarest->setRange(0.01, 0.5);
    m_rarest->setDecimals(2);
    m_rarest->setSingleStep(0.05);
    m_rarest->setLocale(QLocale::c());
    m_rarest->setValue(0.25);
    m_rarest->setToolTip(tr("The expected share of the rarest value: 0.25 when four values are "
                            "equally frequent."));
    adviceForm->addRow(tr("Rarest value's share:"), m_rarest);
    formLayout->addRow(adviceBox);

    auto *buttons = new QHBoxLayout;
    m_drawButton = new QPushButton(tr("Draw"), form);
    m_drawButton->setObjectName(QStringLiteral("draw-plan"));
    m_drawButton->setToolTip(tr("Draw the sample and show it; nothing is written yet."));
    m_commitDraw = new QPushButton(tr("Commit the draw"), form);
    m_commitDraw->setObjectName(QStringLiteral("draw-commit"));
    m_commitDraw->setToolTip(tr("Assign the drawn articles to every chosen coder and record the "
                                "draw with its seed."));
    m_commitDraw->setEnabled(false);
    m_withdrawDraw = new QPushButton(tr("Withdraw the draw"), form);
    m_withdrawDraw->setObjectName(QStringLiteral("draw-withdraw"));
    m_withdrawDraw->setToolTip(
        tr("Remove the committed draw and its assignments, so that the phase can be drawn again; "
           "only while nobody has coded any of its articles."));
    m_withdrawDraw->setEnabled(false);
    buttons->addWidget(m_drawButton);
    buttons->addWidget(m_commitDraw);
    buttons->addWidget(m_withdrawDraw);
    formLayout->addRow(buttons);
    m_drawError = errorLabel(form, QStringLiteral("draw-error"));
    formLayout->addRow(m_drawError);
    auto *left = new QVBoxLayout;
    left->addWidget(form);
    left->addStretch(1);
    layout->addLayout(left, 0);

    auto *result = new QWidget(page);
    auto *resultLayout = new QVBoxLayout(result);
    resultLayout->setContentsMargins(0, 0, 0, 0);
    m_drawState = new QLabel(result);
    m_drawState->setObjectName(QStringLiteral("draw-state"));
    m_drawState->setWordWrap(true);
    m_drawState->setTextFormat(Qt::RichText);
    resultLayout->addWidget(m_drawState);
    m_advice = new QLabel(result);
    m_advice->setObjectName(QStringLiteral("draw-advice"));
    m_advice->setWordWrap(true);
    m_advice->setTextFormat(Qt::RichText);
    m_advice->setFrameShape(QFrame::StyledPanel);
    m_advice->setMargin(8);
    resultLayout->addWidget(m_advice);
    m_strata = makeTable(
        {tr("Stratum"), tr("In the frame"), tr("Drawn")}, result, QStringLiteral("draw-strata"));
    resultLayout->addWidget(m_strata);
    resultLayout->addWidget(new QLabel(tr("Drawn articles:"), result));
    m_drawnArticles = new QListWidget(result);
    m_drawnArticles->setObjectName(QStringLiteral("draw-articles"));
    m_drawnArticles->setAccessibleName(tr("Drawn articles"));
    resultLayout->addWidget(m_drawnArticles, 1);
    layout->addWidget(result, 1);

    connect(m_drawButton, &QPushButton::clicked, this, &StudyDesignWindow::planDraw);
    connect(m_commitDraw, &QPushButton::clicked, this, &StudyDesignWindow::commitDraw);
    connect(m_withdrawDraw, &QPushButton::clicked, this, &StudyDesignWindow::withdrawDraw);
    // Whatever changes the request invalidates the plan on show: what is committed is always
    // exactly what the lead sees.
    auto invalidate = [this] {
        if (m_plannedDraw)
            clearDrawPlan();
    };
    connect(m_drawPhase, &QComboBox::currentIndexChanged, this, [this] { loadRecordedDraw(); });
    connect(m_bySize, &QRadioButton::toggled, this, invalidate);
    connect(m_drawSize, &QSpinBox::valueChanged, this, invalidate);
    connect(m_drawPercent, &QDoubleSpinBox::valueChanged, this, invalidate);
    connect(m_stratify, &QComboBox::currentIndexChanged, this, invalidate);
    connect(m_leaveOutNearCopies, &QCheckBox::toggled, this, invalidate);
    connect(m_drawSeed, &QLineEdit::textChanged, this, invalidate);
    connect(m_drawCoders, &QListWidget::itemChanged, this, invalidate);
    connect(m_alphaMin, &QDoubleSpinBox::valueChanged, this, invalidate);
    connect(m_significance, &QComboBox::currentIndexChanged, this, invalidate);
    connect(m_rarest, &QDoubleSpinBox::valueChanged, this, invalidate);
    return page;
}

Phase StudyDesignWindow::drawPhase() const
{
    return Phase(m_drawPhase->currentData().toInt());
}

void StudyDesignWindow::clearDrawPlan()
{
    m_plannedDraw.reset();
    m_commitDraw->setEnabled(false);
    loadRecordedDraw();
}

void StudyDesignWindow::loadRecordedDraw()
{
    showError(m_drawError, {});
    m_plannedDraw.reset();
    m_commitDraw->setEnabled(false);
    auto recorded = SubsampleDraw::recorded(m_project, drawPhase());
    if (!recorded) {
        m_withdrawDraw->setEnabled(false);
        showError(m_drawError, recorded.error().message);
        return;
    }
    m_withdrawDraw->setEnabled(recorded->has_value());
    if (*recorded) {
        showDraw(**recorded, true);
        m_drawButton->setEnabled(false);
        return;
    }
    m_drawButton->setEnabled(true);
    m_drawState->setText(
        tr("<b>No sample is drawn yet for the phase %1.</b> Choose the size, method, seed and "
           "coders, then press <i>Draw</i> to see the sample and whether it is large enough.")
            .arg(studyPhaseName(drawPhase())));
    m_advice->hide();
    m_strata->hide();
    m_drawnArticles->clear();
}

void StudyDesignWindow::planDraw()
{
    showError(m_drawError, {});
    DrawRequest request;
    request.phase = drawPhase();
    if (m_bySize->isChecked())
        request.size = m_drawSize->value();
    else
        request.fraction = m_drawPercent->value() / 100.0;
    if (const QString key = m_stratify->currentData().toString(); !key.isEmpty())
        request.stratify = stratumFromKey(key);
    auto seed = seedOf(m_drawSeed, m_drawError);
    if (!seed)
        return;
    request.seed = *seed;
    request.coders = checkedCoders(m_drawCoders);
    request.alphaMin = m_alphaMin->value();
    request.significance = m_significance->currentData().toDouble();
    request.rarestProportion = m_rarest->value();
    request.leaveOutNearCopies = m_leaveOutNearCopies->isChecked();
    auto draw = SubsampleDraw::plan(m_project, request);
    if (!draw) {
        showError(m_drawError, draw.error().message);
        return;
    }
    m_plannedDraw = *draw;
    showDraw(*draw, false);
    m_commitDraw->setEnabled(!draw->articles.isEmpty());
}

void StudyDesignWindow::commitDraw()
{
    if (!m_plannedDraw)
        return;
    showError(m_drawError, {});
    Draw draw = *m_plannedDraw;
    auto edit = SubsampleDraw::edit(m_project, draw, m_current);
    if (!edit) {
        showError(m_drawError, edit.error().message);
        return;
    }
    if (push(std::move(*edit), m_drawError))
        m_plannedDraw.reset();
}

void StudyDesignWindow::withdrawDraw()
{
    showError(m_drawError, {});
    const Phase phase = drawPhase();
    auto edit = SubsampleDraw::withdrawEdit(m_project, phase, m_current);
    if (!edit) {
        showError(m_drawError, edit.error().message);
        return;
    }
    // The check sees the project file only: the coder copies out with the draw's assignments
    // are named, read before they become tombstones (core/project/coder_copies.h).
    auto copies = CoderCopies::copiesHoldingDraw(m_project, phase);
    if (!copies) {
        showError(m_drawError, copies.error().message);
        return;
    }
    // Refused with the reason (how many assignments have work) when coding has started.
    WithdrawDrawEdit *withdrawal = edit->get();
    if (!push(std::move(*edit), m_drawError))
        return;
    const int withdrawn = int(withdrawal->withdrawnAssignments());
    QString state = tr("<b>The %1 sample was withdrawn</b>: %n assignment(s) removed, the "
                       "withdrawal recorded in the project's log. The phase can be drawn "
                       "again.",
        nullptr, withdrawn)
                        .arg(studyPhaseName(phase));
    for (const CopyOut &c : *copies)
        state += QStringLiteral("<br>") + CoderCopies::copyOutNotice(c).toHtmlEscaped();
    m_drawState->setText(state);
}

void StudyDesignWindow::showDraw(const Draw &draw, bool recorded)
{
    QMap<QString, ArticleSummary> byId;
    if (auto articles = m_project.articles())
        for (const ArticleSummary &a : *articles)
            byId.insert(a.externalId, a);

    QString method = tr("simple random sample");
    if (draw.stratify == Stratum::Outlet)
        method = tr("stratified by outlet");
    else if (draw.stratify == Stratum::Language)
        method = tr("stratified by language");
    else if (draw.stratify == Stratum::Topic)
        method = tr("stratified by topic");
    const QString facts = tr("%n article(s) of a frame of %1, %2, seed %3, coded by %4.", nullptr,
        int(draw.articles.size()))
                              .arg(draw.frameArticles)
                              .arg(method)
                              .arg(draw.seed)
                              .arg(draw.coders.join(QStringLiteral(", ")));
    if (recorded)
        m_drawState->setText(
            tr("<b>%1 sample drawn on %2.</b> %3 The draw is recorded; it can be withdrawn "
               "until someone codes one of its articles, and then drawn again.")
                .arg(studyPhaseName(draw.phase),
                    draw.drawnAt.left(16).replace(QLatin1Char('T'), QLatin1Char(' ')),
                    facts.toHtmlEscaped()));
    else
        m_drawState->setText(tr("<b>Planned draw, not yet committed.</b> %1 Press <i>Commit the "
                                "draw</i> to assign it.")
                                 .arg(facts.toHtmlEscaped()));

    // Krippendorff (2004, §11.4, table 11.3): the minimum number of values for alpha_min at the
    // significance level, computed in core; here it is set beside what the draw delivers.
    const SampleAdvice &a = draw.advice;
    QString html;
    if (a.minimumValues <= 0) {
        html = tr("No minimum sample can be computed for these settings.");
    } else {
        html = tr("<b>Krippendorff's minimum: %1 values</b> per variable for α_min = %2 at p = %3, "
                  "with the rarest value at %4 %.")
                   .arg(a.minimumValues)
                   .arg(studyCoefficient(a.alphaMin))
                   .arg(a.significance)
                   .arg(a.rarestProportion * 100, 0, 'f', 0);
        html += QStringLiteral("<table cellspacing='0' cellpadding='3' style='margin-top:6px'>");
        html += QStringLiteral("<tr><th align='left'>%1</th><th align='right'>%2</th><th "
                               "align='left'>&nbsp;</th></tr>")
                    .arg(tr("Unit"), tr("Values the draw delivers"));
        auto row = [&](const QString &key, const QString &label, qint64 values) {
            const bool enough = a.sufficientUnits.contains(key);
            const QString verdict = enough
                ? tr("✓ enough")
                : tr("✗ %n short", nullptr,
                    int(std::min<qint64>(a.minimumValues - values, 1 << 30)));
            html += QStringLiteral("<tr><td>%1</td><td align='right'>%2</td><td style='color:%3'>"
                                   "<b>%4</b></td></tr>")
                        .arg(label)
                        .arg(values)
                        .arg((enough ? goodColour() : shortColour()).name(), verdict);
        };
        row(QStringLiteral("article"), tr("Article-level items"), a.articleValues);
        row(QStringLiteral("paragraph"), tr("Paragraphs"), a.paragraphValues);
        row(QStringLiteral("sentence"), tr("Sentences"), a.sentenceValues);
        html += QStringLiteral("</table>");
        html += QStringLiteral("<p style='color:palette(mid)'>%1</p>")
                    .arg(tr("Values are units × coders. For spans, count the codings of each "
                            "function: a rare function (often the remedy) may need a larger or "
                            "stratified sample."));
    }
    m_advice->setText(html);
    m_advice->show();

    m_strata->setRowCount(0);
    m_strata->setVisible(!draw.strata.empty());
    for (const DrawStratum &s : draw.strata) {
        const int r = m_strata->rowCount();
        m_strata->insertRow(r);
        m_strata->setItem(r, 0, cell(s.key));
        m_strata->setItem(r, 1, number(s.frameArticles));
        m_strata->setItem(r, 2, number(s.drawnArticles));
    }
    m_strata->resizeColumnsToContents();
    int height = m_strata->horizontalHeader()->height() + 2 * m_strata->frameWidth();
    for (int r = 0; r < m_strata->rowCount(); ++r)
        height += m_strata->rowHeight(r);
    m_strata->setFixedHeight(std::min(height, 220));

    m_drawnArticles->clear();
    for (const QString &id : draw.articles) {
        const ArticleSummary s = byId.value(id);
        m_drawnArticles->addItem(s.title.isEmpty()
                ? id
                : QStringLiteral("%1 — %2 (%3, %4)").arg(id, s.title, s.outlet, s.language));
    }
}

// --- the rest -----------------------------------------------------------------------------

QWidget *StudyDesignWindow::buildRestPage()
{
    auto *page = new QWidget(this);
    auto *layout = new QHBoxLayout(page);
    auto *form = new QGroupBox(tr("Deal the rest"), page);
    auto *formLayout = new QFormLayout(form);
    formLayout->addRow(hint(tr("Every article with no assignment yet goes to production coding, "
                               "shuffled with the seed and dealt in turn."),
        form));
    auto *coding = new QWidget(form);
    auto *codingLayout = new QVBoxLayout(coding);
    codingLayout->setContentsMargins(0, 0, 0, 0);
    m_single = new QRadioButton(tr("Single-coded: one coder per article"), coding);
    m_single->setObjectName(QStringLiteral("rest-single"));
    auto *dbl =
        new QRadioButton(tr("Double-coded: two coders per article, pairs rotating"), coding);
    dbl->setObjectName(QStringLiteral("rest-double"));
    m_single->setChecked(true);
    codingLayout->addWidget(m_single);
    codingLayout->addWidget(dbl);
    formLayout->addRow(tr("Coding:"), coding);
    m_restCoders = new QListWidget(form);
    m_restCoders->setObjectName(QStringLiteral("rest-coders"));
    m_restCoders->setAccessibleName(tr("Production coders"));
    m_restCoders->setMaximumHeight(110);
    formLayout->addRow(tr("Coders:"), m_restCoders);
    m_restSeed = new QLineEdit(form);
    m_restSeed->setObjectName(QStringLiteral("rest-seed"));
    m_restSeed->setAccessibleName(tr("Seed"));
    setSeedText(m_restSeed, QRandomGenerator::global()->bounded(1u, 1000000u));
    formLayout->addRow(tr("Seed:"), m_restSeed);
    auto *buttons = new QHBoxLayout;
    m_planRest = new QPushButton(tr("Plan"), form);
    m_planRest->setObjectName(QStringLiteral("rest-plan"));
    m_commitRest = new QPushButton(tr("Assign"), form);
    m_commitRest->setObjectName(QStringLiteral("rest-commit"));
    m_commitRest->setEnabled(false);
    buttons->addWidget(m_planRest);
    buttons->addWidget(m_commitRest);
    formLayout->addRow(buttons);
    m_restError = errorLabel(form, QStringLiteral("rest-error"));
    formLayout->addRow(m_restError);
    auto *left = new QVBoxLayout;
    left->addWidget(form);
    left->addStretch(1);
    layout->addLayout(left, 0);

    auto *right = new QWidget(page);
    auto *rightLayout = new QVBoxLayout(right);
    rightLayout->setContentsMargins(0, 0, 0, 0);
    m_restSummary = new QLabel(right);
    m_restSummary->setObjectName(QStringLiteral("rest-summary"));
    m_restSummary->setWordWrap(true);
    rightLayout->addWidget(m_restSummary);
    m_restPlan = makeTable({tr("Article"), tr("Coder")}, right, QStringLiteral("rest-table"));
    m_restPlan->horizontalHeader()->setSectionResizeMode(0, QHeaderView::Stretch);
    m_restPlan->horizontalHeader()->setStretchLastSection(false);
    rightLayout->addWidget(m_restPlan, 1);
    layout->addWidget(right, 1);

    connect(m_planRest, &QPushButton::clicked, this, &StudyDesignWindow::planRest);
    connect(m_commitRest, &QPushButton::clicked, this, &StudyDesignWindow::commitRest);
    connect(m_single, &QRadioButton::toggled, this, &StudyDesignWindow::clearRestPlan);
    connect(m_restCoders, &QListWidget::itemChanged, this, &StudyDesignWindow::clearRestPlan);
    connect(m_restSeed, &QLineEdit::textChanged, this, &StudyDesignWindow::clearRestPlan);
    return page;
}

void StudyDesignWindow::clearRestPlan()
{
    m_plannedRest.reset();
    m_commitRest->setEnabled(false);
    m_restPlan->setRowCount(0);
    m_restSummary->setText(tr("Press <i>Plan</i> to see who would code which article."));
}

void StudyDesignWindow::planRest()
{
    showError(m_restError, {});
    RestRequest request;
    request.coding = m_single->isChecked() ? RestCoding::Single : RestCoding::Double;
    request.coders = checkedCoders(m_restCoders);
    auto seed = seedOf(m_restSeed, m_restError);
    if (!seed)
        return;
    request.seed = *seed;
    auto plan = AssignmentPlans::planRest(m_project, request);
    if (!plan) {
        showError(m_restError, plan.error().message);
        return;
    }
    m_plannedRest = *plan;
    m_restPlan->setRowCount(0);
    QMap<QString, QStringList> byArticle;
    QMap<QString, int> load;
    for (const PlannedAssignment &row : plan->rows) {
        byArticle[row.article] << row.coder;
        ++load[row.coder];
    }
    QMap<QString, QString> titles;
    if (auto articles = m_project.articles())
        for (const ArticleSummary &a : *articles)
            titles.insert(a.externalId, a.title);
    for (auto it = byArticle.cbegin(); it != byArticle.cend(); ++it) {
        const int r = m_restPlan->rowCount();
        m_restPlan->insertRow(r);
        const QString title = titles.value(it.key());
        m_restPlan->setItem(r, 0,
            cell(title.isEmpty() ? it.key() : QStringLiteral("%1 — %2").arg(it.key(), title)));
        m_restPlan->setItem(r, 1, cell(it.value().join(QStringLiteral(" + "))));
    }
    m_restPlan->resizeColumnToContents(1);
    if (plan->rows.empty()) {
        m_restSummary->setText(tr("Every article is assigned already: there is no rest to deal."));
        return;
    }
    QStringList loads;
    for (auto it = load.cbegin(); it != load.cend(); ++it)
        loads << tr("%1: %2").arg(it.key()).arg(it.value());
    m_restSummary->setText(tr("<b>Planned, not yet assigned:</b> %n article(s); load per coder "
                              "%1. Press <i>Assign</i> to write the plan.",
        nullptr, int(byArticle.size()))
                               .arg(loads.join(QStringLiteral(", "))));
    m_commitRest->setEnabled(true);
}

void StudyDesignWindow::commitRest()
{
    if (!m_plannedRest)
        return;
    showError(m_restError, {});
    QJsonObject record;
    record.insert(QStringLiteral("kind"), QStringLiteral("rest"));
    record.insert(QStringLiteral("coding"),
        m_single->isChecked() ? QStringLiteral("single") : QStringLiteral("double"));
    record.insert(QStringLiteral("seed"), m_restSeed->text().trimmed());
    auto edit = AssignmentPlans::edit(m_project, *m_plannedRest, record, m_current);
    if (!edit) {
        showError(m_restError, edit.error().message);
        return;
    }
    if (push(std::move(*edit), m_restError))
        m_restSummary->setText(tr("The rest is assigned."));
}

// --- assignments --------------------------------------------------------------------------

QWidget *StudyDesignWindow::buildAssignmentsPage()
{
    auto *page = new QWidget(this);
    auto *layout = new QHBoxLayout(page);
    auto *split = new QSplitter(Qt::Vertical, page);
    auto *top = new QWidget(split);
    auto *topLayout = new QVBoxLayout(top);
    topLayout->setContentsMargins(0, 0, 0, 0);
    topLayout->addWidget(
        new QLabel(tr("<b>Articles per coder and phase</b> (done / assigned)"), top));
    QStringList headers {tr("Coder")};
    for (Phase p : kPhases)
        headers << studyPhaseName(p);
    headers << tr("Total");
    m_matrix = makeTable(headers, top, QStringLiteral("assignment-matrix"));
    m_matrix->horizontalHeader()->setSectionResizeMode(QHeaderView::Stretch);
    topLayout->addWidget(m_matrix);
    auto *bottom = new QWidget(split);
    auto *bottomLayout = new QVBoxLayout(bottom);
    bottomLayout->setContentsMargins(0, 0, 0, 0);
    bottomLayout->addWidget(new QLabel(tr("<b>Every assignment</b>"), bottom));
    m_rows = makeTable({tr("Phase"), tr("Article"), tr("Coder"), tr("Status")}, bottom,
        QStringLiteral("assignment-rows"));
    bottomLayout->addWidget(m_rows);
    split->addWidget(top);
    split->addWidget(bottom);
    split->setStretchFactor(0, 1);
    split->setStretchFactor(1, 2);
    layout->addWidget(split, 3);

    auto *give = new QGroupBox(tr("Give articles to coders"), page);
    auto *giveLayout = new QVBoxLayout(give);
    giveLayout->addWidget(hint(tr("Every chosen coder gets every chosen article, e.g. the "
                                  "training articles that the lead has master-coded."),
        give));
    m_givePhase = new QComboBox(give);
    m_givePhase->setObjectName(QStringLiteral("give-phase"));
    for (Phase p : kPhases)
        m_givePhase->addItem(studyPhaseName(p), int(p));
    auto *phaseRow = new QFormLayout;
    phaseRow->addRow(tr("Phase:"), m_givePhase);
    giveLayout->addLayout(phaseRow);
    giveLayout->addWidget(new QLabel(tr("Articles:"), give));
    m_giveArticles = new QListWidget(give);
    m_giveArticles->setObjectName(QStringLiteral("give-articles"));
    m_giveArticles->setAccessibleName(tr("Articles to give"));
    m_giveArticles->setSelectionMode(QAbstractItemView::ExtendedSelection);
    giveLayout->addWidget(m_giveArticles, 2);
    giveLayout->addWidget(new QLabel(tr("Coders:"), give));
    m_giveCoders = new QListWidget(give);
    m_giveCoders->setObjectName(QStringLiteral("give-coders"));
    m_giveCoders->setAccessibleName(tr("Coders to give to"));
    giveLayout->addWidget(m_giveCoders, 1);
    auto *giveButton = new QPushButton(tr("Give"), give);
    giveButton->setObjectName(QStringLiteral("give-commit"));
    giveLayout->addWidget(giveButton);
    m_giveError = errorLabel(give, QStringLiteral("give-error"));
    giveLayout->addWidget(m_giveError);
    layout->addWidget(give, 1);
    connect(giveButton, &QPushButton::clicked, this, &StudyDesignWindow::giveArticles);
    return page;
}

void StudyDesignWindow::loadAssignments()
{
    auto rows = AssignmentPlans::rows(m_project);
    if (!rows) {
        showError(m_giveError, rows.error().message);
        return;
    }
    m_rows->setRowCount(0);
    // done / assigned per coder and phase
    QMap<QString, std::array<std::pair<int, int>, 4>> matrix;
    for (const Coder &c : m_coders)
        matrix[c.pseudonym] = {};
    for (const AssignmentRow &a : *rows) {
        const int r = m_rows->rowCount();
        m_rows->insertRow(r);
        auto *phase = cell(studyPhaseName(a.phase));
        phase->setData(Qt::UserRole, int(a.phase));
        m_rows->setItem(r, 0, phase);
        m_rows->setItem(r, 1, cell(a.article));
        m_rows->setItem(r, 2, cell(a.coder));
        const QString status = a.status == QLatin1String("done") ? tr("done")
            : a.status == QLatin1String("started")               ? tr("started")
                                                                 : tr("not started");
        m_rows->setItem(r, 3, cell(status));
        auto &slot = matrix[a.coder][size_t(a.phase)];
        ++slot.second;
        if (a.status == QLatin1String("done"))
            ++slot.first;
    }
    m_rows->resizeColumnsToContents();

    m_matrix->setRowCount(0);
    for (auto it = matrix.cbegin(); it != matrix.cend(); ++it) {
        const int r = m_matrix->rowCount();
        m_matrix->insertRow(r);
        m_matrix->setItem(r, 0, cell(it.key()));
        int done = 0;
        int assigned = 0;
        for (size_t p = 0; p < 4; ++p) {
            const auto [d, n] = it.value()[p];
            done += d;
            assigned += n;
            m_matrix->setItem(r, int(p) + 1,
                cell(n == 0 ? QStringLiteral("·") : QStringLiteral("%1 / %2").arg(d).arg(n),
                    Qt::AlignCenter));
        }
        m_matrix->setItem(
            r, 5, cell(QStringLiteral("%1 / %2").arg(done).arg(assigned), Qt::AlignCenter));
    }

    const QList<QListWidgetItem *> selected = m_giveArticles->selectedItems();
    QStringList keep;
    for (const QListWidgetItem *i : selected)
        keep << i->data(Qt::UserRole).toString();
    m_giveArticles->clear();
    if (auto articles = m_project.articles())
        for (const ArticleSummary &a : *articles) {
            auto *item = new QListWidgetItem(
                QStringLiteral("%1 — %2").arg(a.externalId, a.title), m_giveArticles);
            item->setData(Qt::UserRole, a.externalId);
            item->setSelected(keep.contains(a.externalId));
        }
}

void StudyDesignWindow::giveArticles()
{
    showError(m_giveError, {});
    QStringList articles;
    for (const QListWidgetItem *i : m_giveArticles->selectedItems())
        articles << i->data(Qt::UserRole).toString();
    const Phase phase = Phase(m_givePhase->currentData().toInt());
    auto plan =
        AssignmentPlans::planArticles(m_project, phase, articles, checkedCoders(m_giveCoders));
    if (!plan) {
        showError(m_giveError, plan.error().message);
        return;
    }
    if (plan->rows.empty()) {
        showError(
            m_giveError, tr("Every chosen coder has every chosen article in this phase already."));
        return;
    }
    QJsonObject record;
    record.insert(QStringLiteral("kind"), QStringLiteral("articles"));
    record.insert(QStringLiteral("phase"), phaseKey(phase));
    auto edit = AssignmentPlans::edit(m_project, *plan, record, m_current);
    if (!edit) {
        showError(m_giveError, edit.error().message);
        return;
    }
    if (push(std::move(*edit), m_giveError))
        m_giveArticles->clearSelection();
}

// --- codebook versions --------------------------------------------------------------------

QWidget *StudyDesignWindow::buildCodebookPage()
{
    auto *page = new QWidget(this);
    auto *layout = new QVBoxLayout(page);
    auto *top = new QHBoxLayout;
    m_versions = makeTable({tr("Version"), tr("Made"), tr("By"), tr("Note")}, page,
        QStringLiteral("codebook-versions"));
    m_versions->setMaximumHeight(140);
    top->addWidget(m_versions, 1);
    auto *addVersion = new QPushButton(tr("Add a version from a file…"), page);
    addVersion->setObjectName(QStringLiteral("codebook-add"));
    addVersion->setToolTip(tr("Read a codebook JSON file and store it as the next version, with a "
                              "note that says what changed and why."));
    auto *side = new QVBoxLayout;
    side->addWidget(addVersion);
    side->addStretch();
    top->addLayout(side);
    layout->addLayout(top);

    auto *pick = new QHBoxLayout;
    m_diffFrom = new QComboBox(page);
    m_diffFrom->setObjectName(QStringLiteral("diff-from"));
    m_diffTo = new QComboBox(page);
    m_diffTo->setObjectName(QStringLiteral("diff-to"));
    pick->addWidget(new QLabel(tr("Compare version"), page));
    pick->addWidget(m_diffFrom);
    pick->addWidget(new QLabel(tr("with"), page));
    pick->addWidget(m_diffTo);
    pick->addStretch();
    layout->addLayout(pick);

    auto *split = new QSplitter(Qt::Vertical, page);
    m_diff = new QTextBrowser(split);
    m_diff->setObjectName(QStringLiteral("codebook-diff"));
    m_diff->setAccessibleName(tr("Changes between the versions"));
    auto *outdated = new QWidget(split);
    auto *outdatedLayout = new QVBoxLayout(outdated);
    outdatedLayout->setContentsMargins(0, 0, 0, 0);
    m_outdatedSummary = new QLabel(outdated);
    m_outdatedSummary->setObjectName(QStringLiteral("outdated-summary"));
    m_outdatedSummary->setWordWrap(true);
    outdatedLayout->addWidget(m_outdatedSummary);
    auto *recheckOnly = new QCheckBox(tr("Only those to re-check"), outdated);
    recheckOnly->setObjectName(QStringLiteral("outdated-recheck-only"));
    outdatedLayout->addWidget(recheckOnly);
    m_outdated = makeTable(
        {tr("Article"), tr("Coder"), tr("Function"), tr("Phase"), tr("Made under"), tr("Re-check")},
        outdated, QStringLiteral("outdated-annotations"));
    outdatedLayout->addWidget(m_outdated);
    split->addWidget(m_diff);
    split->addWidget(outdated);
    layout->addWidget(split, 1);
    m_codebookError = errorLabel(page, QStringLiteral("codebook-error"));
    layout->addWidget(m_codebookError);

    connect(m_diffFrom, &QComboBox::currentIndexChanged, this, &StudyDesignWindow::showDiff);
    connect(m_diffTo, &QComboBox::currentIndexChanged, this, &StudyDesignWindow::showDiff);
    connect(addVersion, &QPushButton::clicked, this, &StudyDesignWindow::addCodebookVersion);
    connect(recheckOnly, &QCheckBox::toggled, this, [this](bool only) {
        for (int r = 0; r < m_outdated->rowCount(); ++r)
            m_outdated->setRowHidden(
                r, only && !m_outdated->item(r, 5)->data(Qt::UserRole).toBool());
    });
    return page;
}

void StudyDesignWindow::loadCodebook()
{
    showError(m_codebookError, {});
    auto versions = CodebookVersions::list(m_project);
    if (!versions) {
        showError(m_codebookError, versions.error().message);
        return;
    }
    m_versions->setRowCount(0);
    const QSignalBlocker blockFrom(m_diffFrom);
    const QSignalBlocker blockTo(m_diffTo);
    m_diffFrom->clear();
    m_diffTo->clear();
    for (const CodebookVersionInfo &v : *versions) {
        const int r = m_versions->rowCount();
        m_versions->insertRow(r);
        m_versions->setItem(r, 0, number(v.number));
        m_versions->setItem(
            r, 1, cell(v.createdAt.left(16).replace(QLatin1Char('T'), QLatin1Char(' '))));
        m_versions->setItem(r, 2, cell(v.createdBy));
        m_versions->setItem(r, 3, cell(v.note));
        m_diffFrom->addItem(QString::number(v.number), v.number);
        m_diffTo->addItem(QString::number(v.number), v.number);
    }
    m_versions->resizeColumnsToContents();
    // The newest change by default: the last version against the one before it.
    const int n = m_diffTo->count();
    m_diffTo->setCurrentIndex(n - 1);
    m_diffFrom->setCurrentIndex(std::max(0, n - 2));
    showDiff();

    auto outdated = OutdatedAnnotations::list(m_project);
    if (!outdated) {
        showError(m_codebookError, outdated.error().message);
        return;
    }
    const int current = versions->empty() ? 0 : versions->back().number;
    m_outdated->setRowCount(0);
    int toCheck = 0;
    for (const OutdatedAnnotation &o : *outdated) {
        const int r = m_outdated->rowCount();
        m_outdated->insertRow(r);
        m_outdated->setItem(r, 0, cell(o.article));
        m_outdated->setItem(r, 1, cell(o.coder));
        const FunctionStyle style = functionStyle(o.function);
        auto *fn = cell(QStringLiteral("%1  %2").arg(style.letter).arg(functionName(o.function)));
        fn->setForeground(style.colour.darker(120));
        m_outdated->setItem(r, 2, fn);
        m_outdated->setItem(r, 3, cell(studyPhaseName(o.phase)));
        m_outdated->setItem(r, 4, number(o.version));
        auto *check = cell(o.functionChanged ? tr("yes — its function changed") : tr("no"));
        check->setData(Qt::UserRole, o.functionChanged);
        if (o.functionChanged) {
            check->setForeground(shortColour());
            ++toCheck;
        }
        m_outdated->setItem(r, 5, check);
    }
    m_outdated->resizeColumnsToContents();
    m_outdatedSummary->setText(outdated->empty()
            ? tr("<b>Every annotation was made under the current version (%1).</b>").arg(current)
            : tr("<b>%n annotation(s) were made under an older version</b> than the current one "
                 "(%1); %2 of them belong to a function whose definition, rules, examples or "
                 "attributes changed since, and should be re-checked.",
                nullptr, int(outdated->size()))
                  .arg(current)
                  .arg(toCheck));
}

void StudyDesignWindow::showDiff()
{
    if (m_diffFrom->count() == 0)
        return;
    const int from = m_diffFrom->currentData().toInt();
    const int to = m_diffTo->currentData().toInt();
    if (from == to) {
        m_diff->setHtml(tr("<p>There is only version %1: nothing to compare yet. Add a version "
                           "when the codebook changes.</p>")
                            .arg(to));
        if (m_diffFrom->count() > 1)
            m_diff->setHtml(tr("<p>Choose two different versions to compare.</p>"));
        return;
    }
    auto diff = CodebookVersions::diffBetween(m_project, from, to);
    if (!diff) {
        m_diff->setPlainText(diff.error().message);
        return;
    }
    QString html =
        QStringLiteral("<h3>%1</h3>").arg(tr("Codebook version %1 → %2").arg(from).arg(to));
    if (diff->changes.empty())
        html += tr("<p>No changes.</p>");
    html += QStringLiteral("<table cellspacing='0' cellpadding='4' width='100%'>");
    for (const CodebookChange &c : diff->changes) {
        QString sign;
        QString what;
        switch (c.kind) {
        case CodebookChange::Kind::Added:
            sign = QStringLiteral("+");
            what = tr("added");
            break;
        case CodebookChange::Kind::Removed:
            sign = QStringLiteral("−");
            what = tr("removed");
            break;
        case CodebookChange::Kind::Changed:
            sign = QStringLiteral("~");
            what = tr("changed");
            break;
        }
        QString badge;
        if (c.function) {
            const FunctionStyle style = functionStyle(*c.function);
            badge =
                QStringLiteral("<span style='background:%1;color:%2'>&nbsp;<b>%3</b>&nbsp;</span> ")
                    .arg(style.colour.name(), badgeTextColour(style.colour).name())
                    .arg(style.letter);
        }
        html += QStringLiteral("<tr><td valign='top'><b>%1</b></td><td>%2<b>%3</b> <i>%4</i>")
                    .arg(sign, badge, c.path.toHtmlEscaped(), what);
        const QString was = shortColour().darker(110).name();
        const QString now = goodColour().darker(130).name();
        // Lists (rules, examples, values) come joined with "; ": when the two versions share
        // items, show only the items that went and came, which is what a reader looks for.
        const QStringList before = c.before.split(QStringLiteral("; "), Qt::SkipEmptyParts);
        const QStringList after = c.after.split(QStringLiteral("; "), Qt::SkipEmptyParts);
        const bool shared = std::any_of(before.begin(), before.end(),
            [&](const QString &item) { return after.contains(item); });
        if (c.kind == CodebookChange::Kind::Changed && shared) {
            for (const QString &item : before)
                if (!after.contains(item))
                    html += QStringLiteral("<br><span style='color:%1'>%2&nbsp;%3</span>")
                                .arg(was, tr("item removed:"), item.toHtmlEscaped());
            for (const QString &item : after)
                if (!before.contains(item))
                    html += QStringLiteral("<br><span style='color:%1'>%2&nbsp;%3</span>")
                                .arg(now, tr("item added:"), item.toHtmlEscaped());
            if (std::equal(before.begin(), before.end(), after.begin(), after.end()) == false
                && QSet<QString>(before.begin(), before.end())
                    == QSet<QString>(after.begin(), after.end()))
                html += QStringLiteral("<br><i>%1</i>").arg(tr("the order changed"));
        } else {
            if (!c.before.isEmpty())
                html += QStringLiteral("<br><span style='color:%1'>%2&nbsp;%3</span>")
                            .arg(was, tr("was:"), c.before.toHtmlEscaped());
            if (!c.after.isEmpty())
                html += QStringLiteral("<br><span style='color:%1'>%2&nbsp;%3</span>")
                            .arg(now, tr("now:"), c.after.toHtmlEscaped());
        }
        html += QStringLiteral("</td></tr>");
    }
    html += QStringLiteral("</table>");
    m_diff->setHtml(html);
}

void StudyDesignWindow::addCodebookVersion()
{
    showError(m_codebookError, {});
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Add a codebook version"), QString(), tr("Codebooks (*.json)"));
    if (path.isEmpty())
        return;
    bool ok = false;
    const QString note = QInputDialog::getText(this, tr("Add a codebook version"),
        tr("What changed, and why?"), QLineEdit::Normal, QString(), &ok);
    if (!ok)
        return;
    auto book = CodebookVersions::readFile(path);
    if (!book) {
        showError(m_codebookError, book.error().message);
        return;
    }
    auto edit = CodebookVersions::addEdit(m_project, *book, note, m_current);
    if (!edit) {
        showError(m_codebookError, edit.error().message);
        return;
    }
    push(std::move(*edit), m_codebookError);
}

} // namespace fourfold
