#pragma once
// Lead → Merge conflicts…: the objects a merge of coder copies (or a team sync) found changed on
// both sides. The later change was kept; the other version waits here. Both versions side by side
// (a span's function, text, attributes, note; an answer's value), and the lead keeps the
// project's version or takes the other, each decision one undoable step on the desk's Edit menu.

#include "core/store/copy_tables.h"

#include <QHash>
#include <QWidget>

#include <vector>

class QCheckBox;
class QLabel;
class QPushButton;
class QTableWidget;
class QTextBrowser;

namespace fourfold {

class CodingSession;

class ConflictsWindow : public QWidget
{
    Q_OBJECT
public:
    // `session` must outlive the window; its person should be a lead.
    explicit ConflictsWindow(CodingSession *session, QWidget *parent = nullptr);

    // Reads the conflicts again (after a merge, an undo).
    void reload();
    // For tests: the listed conflicts (open ones, or all with "Show decided"), the current row.
    const std::vector<MergeConflict> &conflicts() const { return m_conflicts; }
    void setCurrent(int row);
    void setShowDecided(bool on);
    // Decides the current conflict; false (with a message) if none is chosen or it is decided.
    bool keepProjectVersion();
    bool takeOtherVersion();
    QString message() const;

private:
    bool decide(bool keepTheirs);
    void showCurrent();
    QString describe(const QJsonObject &row, const QString &type) const;
    QString coderOf(const MergeConflict &c) const;

    CodingSession *m_session;
    std::vector<MergeConflict> m_conflicts;
    QHash<QString, QString> m_articleTitles; // article uuid → title
    QHash<QString, qint64> m_articleIds; // article uuid → id
    QHash<QString, QString> m_pseudonyms; // coder uuid → pseudonym
    QCheckBox *m_showDecided = nullptr;
    QTableWidget *m_table = nullptr;
    QTextBrowser *m_mine = nullptr;
    QTextBrowser *m_theirs = nullptr;
    QPushButton *m_keepMine = nullptr;
    QPushButton *m_keepTheirs = nullptr;
    QLabel *m_message = nullptr;
};

} // namespace fourfold
