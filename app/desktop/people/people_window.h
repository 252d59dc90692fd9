#pragma once
// Lead → People…: everyone in the project (pseudonym, name, role, enabled or disabled), and the
// lead's changes to them — add, rename, disable, enable — through People's checked edits
// (core/project/people.h), each one step on the desk's undo stack. Results and refusals are told
// in the window's message bar.

#include "core/project/people.h"

#include <QWidget>

class QPushButton;
class QTableWidget;

namespace fourfold {

class CodingSession;
class MessageBar;

class PeopleWindow : public QWidget
{
    Q_OBJECT
public:
    explicit PeopleWindow(CodingSession *session, QWidget *parent = nullptr);

    // The changes the buttons make, for the buttons and for tests: each tells its result or
    // refusal in the message bar and returns it.
    Status addPerson(const NewPerson &person);
    Status rename(const QString &pseudonym, const QString &name);
    Status setDisabled(const QString &pseudonym, bool disabled);

    MessageBar *messageBar() const { return m_messages; }
    QTableWidget *table() const { return m_table; }
    // Reads the people again (after an undo or redo, too).
    void reload();

private:
    Status apply(Result<std::unique_ptr<Edit>> edit, const QString &done);
    Status refuseWithoutLead();
    QString selectedPseudonym() const;
    void askAdd();
    void askRename();
    void toggleSelected();
    void updateButtons();

    CodingSession *m_session;
    std::vector<Coder> m_people;
    MessageBar *m_messages = nullptr;
    QTableWidget *m_table = nullptr;
    QPushButton *m_add = nullptr;
    QPushButton *m_rename = nullptr;
    QPushButton *m_toggle = nullptr;
};

} // namespace fourfold
