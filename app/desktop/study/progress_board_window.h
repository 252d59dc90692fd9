#pragma once
// The lead's progress board: per coder and phase, the articles assigned, started and done and
// the coder's agreement so far; the effort (active coding time) per phase in aggregate. Effort
// per coder is a column that stays hidden unless the lead turns the project setting on, with an
// explanation of why it is off by default (monitoring coders can be regulated at work).

#include "core/model/coder.h"

#include <QWidget>

class QCheckBox;
class QComboBox;
class QLabel;
class QTableWidget;

namespace fourfold {

class CodingSession;
class Project;

class ProgressBoardWindow : public QWidget
{
    Q_OBJECT
public:
    // Board columns, for tests and screenshots.
    enum Column {
        CoderColumn,
        PhaseColumn,
        AssignedColumn,
        StartedColumn,
        DoneColumn,
        AgreementColumn,
        ComparedColumn,
        EffortColumn,
        ColumnCount
    };

    // `session` must outlive the window; its person is the one looking: only a lead can switch
    // effort per coder on or off, as one edit on the session's undo stack. The board is read
    // again after any edit about no article (its undo among them). A top-level window even with
    // a parent.
    explicit ProgressBoardWindow(CodingSession &session, QWidget *parent = nullptr);

    // Reloads the board from the project (call after coders finished articles).
    void refresh();

    QTableWidget *board() const { return m_board; }
    QTableWidget *effortTable() const { return m_effort; }
    QCheckBox *effortSwitch() const { return m_effortSwitch; }

private:
    void setEffortPerCoder(bool on);

    CodingSession &m_session;
    Project &m_project;
    CoderId m_current;
    bool m_isLead = false;
    QComboBox *m_phase = nullptr;
    QTableWidget *m_board = nullptr;
    QTableWidget *m_effort = nullptr;
    QCheckBox *m_effortSwitch = nullptr;
    QLabel *m_summary = nullptr;
    QLabel *m_error = nullptr;
};

} // namespace fourfold
