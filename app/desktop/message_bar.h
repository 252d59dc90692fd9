#pragma once
// One non-modal line at the top of a window that says what just happened, with the actions that
// go with it (open the file written, show the details, try again). Windows use it for results
// and for a change that did not happen; a modal box is kept for a command that could not start.

#include <QFrame>
#include <QString>

#include <functional>
#include <vector>

class QLabel;
class QHBoxLayout;
class QPlainTextEdit;
class QToolButton;

namespace fourfold {

class MessageBar : public QFrame
{
    Q_OBJECT
public:
    enum class Kind { Information, Success, Warning, Error };
    struct Action {
        QString text; // with an & mnemonic, e.g. tr("&Open")
        std::function<void()> run;
    };

    explicit MessageBar(QWidget *parent = nullptr);

    // Shows `text` (plain text), replacing any message shown. Each action is a button that runs
    // it and then closes the bar; `details` (plain text), when given, opens under a Details
    // button. Information and success messages close by themselves after `seconds` (0 = stay).
    void showMessage(Kind kind, const QString &text, std::vector<Action> actions = {},
        const QString &details = {}, int seconds = 0);
    void dismiss();

    Kind kind() const { return m_kind; }
    QString text() const;
    QString details() const;
    // The buttons of the actions shown, in order (for tests and keyboard users).
    QStringList actionTexts() const;
    // Runs the action whose button reads `text` (mnemonic ampersands ignored); false if none.
    bool trigger(const QString &text);

private:
    void clearActions();

    Kind m_kind = Kind::Information;
    QLabel *m_icon = nullptr;
    QLabel *m_text = nullptr;
    QHBoxLayout *m_buttons = nullptr;
    QToolButton *m_detailsButton = nullptr;
    QToolButton *m_close = nullptr;
    QPlainTextEdit *m_details = nullptr;
    std::vector<QToolButton *> m_actionButtons;
    int m_generation = 0; // so that an old timer does not close a newer message
};

} // namespace fourfold
