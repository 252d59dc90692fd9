#pragma once
// "Who is coding?": picked when a project opens. A coder then sees only their own spans and
// their assigned articles; a lead sees everything, after giving their passphrase (or setting one
// the first time, for a lead of an older project). The checks are People's (core/project/
// people.h); this dialog only asks.

#include "core/model/coder.h"
#include "core/project/people.h"

#include <QDialog>

#include <optional>
#include <vector>

class QLabel;
class QLineEdit;
class QListWidget;

namespace fourfold {

class Project;

class CoderDialog : public QDialog
{
    Q_OBJECT
public:
    // Lists the enabled people of `project`; "Add a person…" adds one (see addPerson()).
    // `preselect`, if given, is the pseudonym selected first.
    explicit CoderDialog(
        Project &project, QWidget *parent = nullptr, const QString &preselect = {});
    // The person chosen and signed in, once the dialog was accepted.
    std::optional<SignedIn> chosen() const { return m_signedIn; }

    // For tests: the passphrase fields and the message under them.
    QLineEdit *passphraseField() const { return m_passphrase; }
    QLineEdit *repeatField() const { return m_repeat; }
    QLabel *messageLabel() const { return m_message; }
    QListWidget *list() const { return m_list; }
    // Selects the person with `pseudonym`; false if they are not listed.
    bool select(const QString &pseudonym);
    // Signs the selected person in with what the fields hold; accepts on success, else shows
    // why and stays open.
    void tryAccept();
    // Opens the "Add a person" form (modal).
    void addPerson();

signals:
    // The "Add a person" form is open (tests fill it in through this).
    void personFormOpened(QDialog *form);

private:
    void reload();
    void updateFields();
    std::optional<Coder> selected() const;

    Project &m_project;
    std::vector<Coder> m_people; // the rows of the list
    std::optional<SignedIn> m_signedIn;
    QListWidget *m_list = nullptr;
    QLabel *m_passphraseLabel = nullptr;
    QLineEdit *m_passphrase = nullptr;
    QLabel *m_repeatLabel = nullptr;
    QLineEdit *m_repeat = nullptr;
    QLabel *m_message = nullptr;
};

} // namespace fourfold
