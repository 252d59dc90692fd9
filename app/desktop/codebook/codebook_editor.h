#pragma once
// Lead → Codebook…: the codebook's current version as a draft to edit — each function's label,
// definition, decision rules, examples and attributes (key, label, type, level, closed value
// list), and the article-level items (key, question, values, level). The texts (name, labels,
// definitions, rules, examples, questions) are shown and edited in the base language or in one of
// the codebook's translations, chosen above the pages; keys, values, levels and the lists of
// attributes and items are shared by every language and edited in the base language only. Every
// edit is a step on the editor's own undo stack. The draft is checked with the rules a codebook
// file is read with, and a failure is shown at its field. "Save as new version…" shows the diff
// against the current version, asks for a note and stores the draft as one AddCodebookVersionEdit
// (made by CodebookVersions::addEdit, the check `fourfold-cli codebook --update` makes too) on the
// desk's undo stack, then says in the message bar how many annotations are now outdated.

#include "app/desktop/codebook/codebook_field_check.h"
#include "core/model/codebook.h"
#include "core/model/ids.h"

#include <QHash>
#include <QUndoStack>
#include <QWidget>

#include <array>

class QComboBox;
class QLabel;
class QLineEdit;
class QListWidget;
class QPlainTextEdit;
class QPushButton;
class QTabWidget;

namespace fourfold {

class CodingSession;
class MessageBar;
class Project;

class CodebookEditor : public QWidget
{
    Q_OBJECT
public:
    // `session` (a lead's) must outlive the window; its person is recorded as the version's
    // author. A saved version is a step on the session's undo stack; when it (or another version)
    // is undone or added there while the draft holds no edit, the editor takes up the current
    // version. The window is a top-level window even with a parent.
    explicit CodebookEditor(CodingSession &session, QWidget *parent = nullptr);

    const Codebook &stored() const { return m_stored; }
    const Codebook &draft() const { return m_draft; }
    QUndoStack *undoStack() { return &m_undo; }
    MessageBar *messageBar() const { return m_messages; }

    // Which page shows: a function's, or the article-level items (for tests and screenshots).
    void showFunction(FramingFunction f);
    void showItems();
    // Selects an attribute of the function shown, or an item; -1 selects none.
    void selectRow(int row);
    // The widget that edits `field` ("name", "functions[2].definition",
    // "functions[2].attributes[0].values", "items[0].question", ...) after showing its page and
    // selecting its row; nullptr for a field the editor has not.
    QWidget *fieldWidget(const QString &field);
    // The sentence shown under `field`'s widget; empty when the field is fine.
    QString fieldError(const QString &field) const;
    // The note shown under `field`'s widget when its base text changed while translations of it
    // stayed as they were; empty when there is none.
    QString fieldNote(const QString &field) const;

    // The languages whose texts the editor can show: "" (the base language) first, then, by
    // code, every language the current version or the draft has texts in or that was added.
    QStringList languages() const;
    // The language whose texts the text fields show and edit; "" for the base language.
    QString shownLanguage() const { return m_language; }
    // Shows the texts of `language`, one of languages(); false (nothing changes) for another.
    bool showLanguage(const QString &language);
    // Adds `code` to the languages and shows it. The code is read as Codebook::fromJson reads a
    // translation's key (two or three lower-case letters, ISO 639); false, with the reason in the
    // message bar, for another text. The draft holds the language once a text is typed in it.
    bool addLanguage(const QString &code);

    // The diff of the draft against the current version, as `codebook --diff` words it; empty
    // when the draft breaks a rule.
    QString diffText() const;
    // Checks the draft and stores it as the next version with `note`. False, with the reason at
    // the field or in the message bar, when nothing was stored.
    bool saveAsNewVersion(const QString &note);

    // Adds an attribute to the function shown (or an item on the items page), selected.
    void addRow();
    // Removes the selected attribute or item.
    void removeRow();

protected:
    bool eventFilter(QObject *watched, QEvent *event) override;

private:
    struct FieldWidgets {
        QWidget *editor = nullptr;
        QLabel *error = nullptr;
        QLabel *note = nullptr; // translations that may need updating
    };
    struct FunctionPage {
        QLineEdit *label = nullptr;
        QPlainTextEdit *definition = nullptr;
        QPlainTextEdit *rules = nullptr;
        QPlainTextEdit *examples = nullptr;
        QListWidget *attributes = nullptr;
        QPushButton *add = nullptr;
        QWidget *attributeForm = nullptr;
        QLineEdit *key = nullptr;
        QLineEdit *attributeLabel = nullptr;
        QComboBox *type = nullptr;
        QComboBox *level = nullptr;
        QPlainTextEdit *values = nullptr;
        QPushButton *remove = nullptr;
    };
    struct ItemsPage {
        QListWidget *items = nullptr;
        QPushButton *add = nullptr;
        QWidget *form = nullptr;
        QLineEdit *key = nullptr;
        QPlainTextEdit *question = nullptr;
        QPlainTextEdit *values = nullptr;
        QComboBox *level = nullptr;
        QPushButton *remove = nullptr;
    };

    QWidget *buildFunctionPage(FramingFunction f);
    QWidget *buildItemsPage();
    // Puts `editor` with a hidden error line (and note) under it into a column and registers it
    // as `key`
    // (a field path with the row's index left out: "functions[2].attributes.key", "items.key").
    QWidget *withErrorLine(QWidget *editor, const QString &key);
    QComboBox *levelBox(QWidget *parent);

    // Makes `book` the draft; `keepFields` leaves the text fields as they are (the step came from
    // one of them), refreshing only lists and forms.
    void setDraft(const Codebook &book, bool keepFields);
    void load();
    // The language list and the hint above the pages, for the language shown.
    void loadLanguages();
    // The draft with the texts of the language shown in place of its own ("" where that language
    // gives none); the draft itself for the base language.
    Codebook shownTexts() const;
    void loadAttributeForm(int f);
    void loadItemForm();
    // One undoable step: `change` applied to a copy of the draft. Undo and redo show the language
    // the step was made in.
    void edit(
        const QString &field, const QString &text, const std::function<void(Codebook &)> &change);
    // An edit of a text: `own` in the base language, else `translated` on the texts of the
    // language shown (a text left empty there is not given: the base text stands).
    void editText(const QString &field, const QString &text,
        const std::function<void(Codebook &)> &own,
        const std::function<void(CodebookTexts &)> &translated);
    // An edit of a key, value, level or list, shared by every language: nothing while a
    // translation is shown (the fields are read-only then).
    void editShared(
        const QString &field, const QString &text, const std::function<void(Codebook &)> &change);
    // Shows the notes of the fields on screen.
    void refreshNotes();
    void askLanguage();
    int selectedRow(const QListWidget *list) const;

    // Checks the draft and shows its first failure at the field when the field is on screen;
    // `go` first turns to the field's page and row.
    void showCheck(bool go);
    QString fieldKey(const QString &field) const;
    // Whether the project's current version is still the one the draft started from; says why
    // not in the message bar.
    bool currentIsStored();
    void askAndSave();
    // After an edit about no article: with no edit in the draft, takes up the current version
    // if it is another one now.
    void followStored();

    CodingSession &m_session;
    Project &m_project;
    CoderId m_current;
    Codebook m_stored;
    Codebook m_draft;
    CodebookCheckResult m_check;
    QUndoStack m_undo;
    bool m_loading = false;

    MessageBar *m_messages = nullptr;
    QLabel *m_version = nullptr;
    QLineEdit *m_name = nullptr;
    QComboBox *m_languageBox = nullptr;
    QLabel *m_languageHint = nullptr;
    QString m_language; // shown; "" for the base language
    QStringList m_addedLanguages; // added here, perhaps without a text yet
    QTabWidget *m_tabs = nullptr;
    std::array<FunctionPage, 4> m_functions;
    ItemsPage m_items;
    QPushButton *m_save = nullptr;
    QHash<QString, FieldWidgets> m_fields;
    QString m_errorKey; // the key of m_fields whose error line shows
};

} // namespace fourfold
