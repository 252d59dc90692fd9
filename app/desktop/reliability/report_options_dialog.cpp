#include "app/desktop/reliability/report_options_dialog.h"

#include "app/desktop/interface_language.h"
#include "app/desktop/reliability/reliability_job.h"
#include "core/project/project.h"

#include <QCheckBox>
#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLineEdit>
#include <QListWidget>
#include <QPushButton>
#include <QSet>
#include <QSpinBox>
#include <QVBoxLayout>

namespace fourfold {

ReportOptionsDialog::ReportOptionsDialog(const Project &project, QWidget *parent)
    : QDialog(parent)
{
    setWindowTitle(tr("Reliability report"));
    auto *form = new QFormLayout;

    m_unit = new QComboBox(this);
    m_unit->addItem(tr("Paragraph"), unitKindKey(UnitKind::Paragraph));
    m_unit->addItem(tr("Sentence"), unitKindKey(UnitKind::Sentence));
    m_unit->addItem(tr("Token (word)"), unitKindKey(UnitKind::Token));
    m_unit->setCurrentIndex(1);
    form->addRow(tr("&Unit of the functions"), m_unit);

    m_phase = new QComboBox(this);
    m_phase->addItem(tr("All phases"), QString());
    for (Phase p : {Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production})
        m_phase->addItem(phaseKey(p), phaseKey(p));
    form->addRow(tr("&Phase"), m_phase);

    // Coders who marked any article done start ticked (those whose coding counts).
    QSet<qint64> counting;
    if (auto assignments = project.assignments())
        for (const Assignment &a : *assignments)
            if (a.status == QLatin1String("done"))
                counting.insert(a.coder.value);
    m_coders = new QListWidget(this);
    m_coders->setMaximumHeight(140);
    if (auto coders = project.coders())
        for (const Coder &c : *coders) {
            auto *item =
                new QListWidgetItem(QStringLiteral("%1  %2").arg(c.pseudonym, c.name), m_coders);
            item->setData(Qt::UserRole, c.pseudonym);
            item->setFlags(Qt::ItemIsEnabled | Qt::ItemIsUserCheckable);
            item->setCheckState(counting.contains(c.id.value) ? Qt::Checked : Qt::Unchecked);
        }
    form->addRow(tr("&Coders"), m_coders);

    m_replicates = new QSpinBox(this);
    m_replicates->setRange(0, 100000);
    m_replicates->setSingleStep(1000);
    m_replicates->setValue(ReportOptions {}.bootstrapReplicates);
    m_replicates->setSpecialValueText(tr("none"));
    m_replicates->setSuffix(tr(" replicates"));
    form->addRow(tr("&Bootstrap"), m_replicates);
    m_seed = new QSpinBox(this);
    m_seed->setRange(0, 999999999);
    m_seed->setValue(1);
    form->addRow(tr("S&eed"), m_seed);

    m_unfinished = new QCheckBox(tr("Count articles in progress"), this);
    m_unfinished->setToolTip(tr("By default a coder's article counts only once the coder has "
                                "marked it done; tick to count articles still in progress too."));
    form->addRow(QString(), m_unfinished);

    m_title = new QLineEdit(this);
    m_title->setPlaceholderText(tr("Reliability report: %1").arg(project.settings().name));
    form->addRow(tr("&Title"), m_title);

    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Cancel, this);
    QPushButton *write = buttons->addButton(tr("&Write\u2026"), QDialogButtonBox::AcceptRole);
    write->setDefault(true);
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);

    auto *layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(buttons);
    setMinimumWidth(420);
}

ReportOptions ReportOptionsDialog::options() const
{
    ReportOptions o;
    o.language = interfaceLanguage(); // the codebook's texts as the desk shows them
    o.unit = unitKindFromKey(m_unit->currentData().toString()).value_or(UnitKind::Sentence);
    o.phase = phaseFromKey(m_phase->currentData().toString());
    bool all = true;
    QStringList coders;
    for (int i = 0; i < m_coders->count(); ++i) {
        if (m_coders->item(i)->checkState() == Qt::Checked)
            coders << m_coders->item(i)->data(Qt::UserRole).toString();
        else
            all = false;
    }
    // Every coder ticked is the report's own default: everyone whose coding counts.
    if (!all)
        o.coders = coders;
    o.bootstrapReplicates = m_replicates->value();
    o.seed = std::uint64_t(m_seed->value());
    o.includeUnfinished = m_unfinished->isChecked();
    o.title = m_title->text().trimmed();
    return o;
}

void ReportOptionsDialog::setOptions(const ReportOptions &o)
{
    m_unit->setCurrentIndex(std::max(0, m_unit->findData(unitKindKey(o.unit))));
    m_phase->setCurrentIndex(
        std::max(0, m_phase->findData(o.phase ? phaseKey(*o.phase) : QString())));
    if (!o.coders.isEmpty())
        for (int i = 0; i < m_coders->count(); ++i)
            m_coders->item(i)->setCheckState(
                o.coders.contains(m_coders->item(i)->data(Qt::UserRole).toString())
                    ? Qt::Checked
                    : Qt::Unchecked);
    m_replicates->setValue(o.bootstrapReplicates);
    m_seed->setValue(int(std::min<std::uint64_t>(o.seed, 999999999)));
    m_unfinished->setChecked(o.includeUnfinished);
    m_title->setText(o.title);
}

ReportOptions reportOptionsFor(const ReliabilityRequest &request)
{
    ReportOptions o;
    if (request.unit == UnitKind::Paragraph || request.unit == UnitKind::Sentence
        || request.unit == UnitKind::Token)
        o.unit = request.unit;
    o.phase = request.phase;
    o.coders = request.coders;
    o.bootstrapReplicates = request.bootstrapReplicates;
    o.seed = request.seed;
    o.includeUnfinished = request.includeUnfinished;
    return o;
}

} // namespace fourfold
