#pragma once
// What a coder sees after finishing the training articles: their agreement with the lead's
// master coding, per framing function, before moving on to the real work (field.md §1.1: coders
// should know how they are doing; Krippendorff's "accuracy" is agreement with a known standard).

#include "core/model/coder.h"
#include "core/project/training_feedback.h"

#include <QDialog>

class QComboBox;
class QLabel;
class QPushButton;
class QTableWidget;

namespace fourfold {

class Project;

class TrainingFeedbackDialog : public QDialog
{
    Q_OBJECT
public:
    // Shows the feedback of `coder` (the person coding; a lead may open it for any coder with
    // the chooser). The master is the one lead with training annotations.
    TrainingFeedbackDialog(Project &project, CoderId coder, QWidget *parent = nullptr);

    // True when `coder` has training assignments and every one of them is done: the moment to
    // show this dialog once (after the coder marks the last training article done). False on any
    // error, or when the coder has no training.
    static bool isDue(const Project &project, CoderId coder);

    // Reloads the feedback for the unit kind chosen (Paragraph, Sentence or Token).
    void refresh();

    QTableWidget *table() const { return m_table; }
    // The feedback shown, if it could be computed.
    const std::optional<TrainingFeedback> &feedback() const { return m_feedback; }

private:
    Project &m_project;
    QString m_pseudonym;
    QComboBox *m_unit = nullptr;
    QLabel *m_heading = nullptr;
    QLabel *m_next = nullptr;
    QTableWidget *m_table = nullptr;
    QPushButton *m_continue = nullptr;
    std::optional<TrainingFeedback> m_feedback;
};

} // namespace fourfold
