#pragma once
// What goes into the reliability report before it is written: the unit of the per-function
// variables, the phase, the coders, the bootstrap, whether articles in progress count, and the
// title. Opened from the Lead menu; it starts from the Reliability window's choices when that
// window is open, so the report shows what the lead has been looking at.

#include "app/report/report_data.h"

#include <QDialog>

class QCheckBox;
class QComboBox;
class QLineEdit;
class QListWidget;
class QSpinBox;

namespace fourfold {

class Project;
struct ReliabilityRequest;

class ReportOptionsDialog : public QDialog
{
    Q_OBJECT
public:
    // Lists the project's coders; every coder starts ticked who has anything that counts.
    explicit ReportOptionsDialog(const Project &project, QWidget *parent = nullptr);

    ReportOptions options() const;
    // Sets the controls; coders not in the project are ignored, an empty list ticks the
    // starting set.
    void setOptions(const ReportOptions &options);

private:
    QComboBox *m_unit = nullptr;
    QComboBox *m_phase = nullptr;
    QListWidget *m_coders = nullptr;
    QSpinBox *m_replicates = nullptr;
    QSpinBox *m_seed = nullptr;
    QCheckBox *m_unfinished = nullptr;
    QLineEdit *m_title = nullptr;
};

// The report options that match the Reliability window's request: its phase, coders,
// bootstrap, seed and whether articles in progress count; its unit when it is paragraph,
// sentence or token (the report's per-function units), sentence otherwise.
ReportOptions reportOptionsFor(const ReliabilityRequest &request);

} // namespace fourfold
