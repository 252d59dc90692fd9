#include "app/desktop/codebook/codebook_editor.h"

#include "app/desktop/codebook/codebook_edit_command.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/function_style.h"
#include "app/desktop/message_bar.h"
#include "core/project/codebook_versions.h"
#include "core/project/outdated_annotations.h"
#include "core/project/project.h"

#include <QAction>
#include <QComboBox>
#include <QDialog>
#include <QDialogButtonBox>
#include <QFontDatabase>
#include <QFormLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QInputDialog>
#include <QKeyEvent>
#include <QLabel>
#include <QLineEdit>
#include <QListWidget>
#include <QLocale>
#include <QPalette>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QRegularExpression>
#include <QTabWidget>
#include <QToolButton>
#include <QVBoxLayout>

#include <algorithm>

namespace fourfold {

namespace {

const QString kInvalidStyle = QStringLiteral("border: 2px solid #b3261e; border-radius: 2px;");
constexpr int kItemsTab = 4;
// The language list's last entry, which asks for a language to add (not a language code).
const QString kAddLanguage = QStringLiteral("+");

// Decision rules and examples: one per paragraph (an empty line between two), so that a rule
// may run over several lines.
QString paragraphs(const QStringList &texts)
{
    return texts.join(QStringLiteral("\n\n"));
}

QStringList fromParagraphs(const QString &text)
{
    static const QRegularExpression gap(QStringLiteral(R"(\n[ \t]*\n)"));
    QStringList out;
    for (const QString &part : text.split(gap)) {
        const QString t = part.trimmed();
        if (!t.isEmpty())
            out << t;
    }
    return out;
}

// A value list: one value per line, as typed (an empty line is an empty value the check
// names); only the line break after the last value is not a value.
QStringList fromLines(const QString &text)
{
    if (text.isEmpty())
        return {};
    QStringList out = text.split(QLatin1Char('\n'));
    if (out.size() > 1 && out.back().isEmpty())
        out.removeLast();
    return out;
}

QString levelName(MeasurementLevel level)
{
    switch (level) {
    case MeasurementLevel::Nominal:
        return CodebookEditor::tr("nominal");
    case MeasurementLevel::Ordinal:
        return CodebookEditor::tr("ordinal");
    case MeasurementLevel::Interval:
        return CodebookEditor::tr("interval");
    case MeasurementLevel::Ratio:
        return CodebookEditor::tr("ratio");
    }
    return {};
}

QString functionPath(int f)
{
    return QStringLiteral("functions[%1]").arg(f);
}

void setText(QLineEdit *edit, const QString &text)
{
    if (edit->text() != text)
        edit->setText(text);
}

void setText(QPlainTextEdit *edit, const QString &text)
{
    if (edit->toPlainText() != text)
        edit->setPlainText(text);
}

void setLevel(QComboBox *box, MeasurementLevel level)
{
    box->setCurrentIndex(box->findData(measurementLevelKey(level)));
}

MeasurementLevel levelOf(const QComboBox *box)
{
    return measurementLevelFromKey(box->currentData().toString())
        .value_or(MeasurementLevel::Nominal);
}

QPlainTextEdit *textBox(QWidget *parent, int lines)
{
    auto *edit = new QPlainTextEdit(parent);
    edit->setTabChangesFocus(true);
    edit->setUndoRedoEnabled(false); // the editor's stack undoes
    const int line = edit->fontMetrics().lineSpacing();
    edit->setMinimumHeight(line * lines + 12);
    return edit;
}

// A key or value list while a translation is shown: read-only, on the window's colour so that it
// does not look like a field to type in.
template<typename Edit>
void setEditable(Edit *edit, bool editable)
{
    edit->setReadOnly(!editable);
    QPalette shared;
    if (!editable)
        shared.setColor(QPalette::Base, edit->palette().color(QPalette::Window));
    edit->setPalette(shared);
}

QString rulesHint()
{
    return CodebookEditor::tr("One decision rule per paragraph (an empty line between two).");
}

QString examplesHint()
{
    return CodebookEditor::tr("One example per paragraph (an empty line between two).");
}

// "Deutsch (de)": the language's own name, which its readers find whatever the program's language.
QString languageName(const QString &code)
{
    if (code.isEmpty())
        return CodebookEditor::tr("Base language");
    const QLocale locale(code);
    const bool known = locale.language() != QLocale::C && locale.language() != QLocale::AnyLanguage
        && QLocale::languageToCode(locale.language()) == code;
    const QString name = known ? locale.nativeLanguageName() : QString();
    return name.isEmpty() ? code : QStringLiteral("%1 (%2)").arg(name, code);
}

// The texts of `language` in `book` without the ones left empty (those are not given: the base
// text stands), and without the language when it gives none.
void dropEmptyTexts(Codebook &book, const QString &language)
{
    const auto texts = book.translations.find(language);
    if (texts == book.translations.end())
        return;
    for (auto f = texts->functions.begin(); f != texts->functions.end();) {
        for (auto a = f->attributeLabels.begin(); a != f->attributeLabels.end();)
            a = a->isEmpty() ? f->attributeLabels.erase(a) : std::next(a);
        const bool empty = f->label.isEmpty() && f->definition.isEmpty() && f->rules.isEmpty()
            && f->examples.isEmpty() && f->attributeLabels.isEmpty();
        f = empty ? texts->functions.erase(f) : std::next(f);
    }
    for (auto q = texts->questions.begin(); q != texts->questions.end();)
        q = q->isEmpty() ? texts->questions.erase(q) : std::next(q);
    if (texts->name.isEmpty() && texts->functions.isEmpty() && texts->questions.isEmpty())
        book.translations.erase(texts);
}

// After the key of an attribute of `f` changed from `from` to `to`: its translated labels go
// with it, unless another attribute still has `from` or already has `to` (the check names that).
void moveAttributeLabels(Codebook &book, FramingFunction f, const QString &from, const QString &to)
{
    const auto &attributes = book.definition(f).attributes;
    if (std::ranges::count(attributes, from, &AttributeSpec::key) > 0
        || std::ranges::count(attributes, to, &AttributeSpec::key) != 1)
        return;
    for (CodebookTexts &texts : book.translations) {
        const auto t = texts.functions.find(f);
        if (t != texts.functions.end() && t->attributeLabels.contains(from)
            && !t->attributeLabels.contains(to))
            t->attributeLabels.insert(to, t->attributeLabels.take(from));
    }
}

// The same for an article-level item's translated question.
void moveQuestions(Codebook &book, const QString &from, const QString &to)
{
    if (std::ranges::count(book.items, from, &ArticleItem::key) > 0
        || std::ranges::count(book.items, to, &ArticleItem::key) != 1)
        return;
    for (CodebookTexts &texts : book.translations)
        if (texts.questions.contains(from) && !texts.questions.contains(to))
            texts.questions.insert(to, texts.questions.take(from));
}

// A translatable text of `book`: its own with `language` empty, else that language's ("" where
// it gives none); nothing when `book` has no such field (an attribute or item by key).
using TextOf = std::function<std::optional<QString>(const Codebook &book, const QString &language)>;

enum class FunctionPart { Label, Definition, Rules, Examples };

// The part of a FunctionDefinition or of a FunctionTexts.
template<typename T>
QString partOf(const T &texts, FunctionPart part)
{
    switch (part) {
    case FunctionPart::Label:
        return texts.label;
    case FunctionPart::Definition:
        return texts.definition;
    case FunctionPart::Rules:
        return paragraphs(texts.rules);
    case FunctionPart::Examples:
        return paragraphs(texts.examples);
    }
    return {};
}

TextOf functionText(FramingFunction f, FunctionPart part)
{
    return [f, part](const Codebook &book, const QString &language) -> std::optional<QString> {
        if (language.isEmpty())
            return partOf(book.definition(f), part);
        return partOf(book.translations.value(language).functions.value(f), part);
    };
}

TextOf attributeLabelText(FramingFunction f, const QString &key)
{
    return [f, key](const Codebook &book, const QString &language) -> std::optional<QString> {
        const auto &attributes = book.definition(f).attributes;
        const auto a = std::ranges::find(attributes, key, &AttributeSpec::key);
        if (a == attributes.end())
            return std::nullopt;
        if (language.isEmpty())
            return a->label;
        return book.translations.value(language).functions.value(f).attributeLabels.value(key);
    };
}

TextOf questionText(const QString &key)
{
    return [key](const Codebook &book, const QString &language) -> std::optional<QString> {
        const ArticleItem *item = book.item(key);
        if (!item)
            return std::nullopt;
        if (language.isEmpty())
            return item->question;
        return book.translations.value(language).questions.value(key);
    };
}

} // namespace

CodebookEditor::CodebookEditor(CodingSession &session, QWidget *parent)
    : QWidget(parent, Qt::Window)
    , m_session(session)
    , m_project(session.project())
    , m_current(session.coder().id)
{
    setWindowTitle(tr("Codebook"));
    setObjectName(QStringLiteral("codebook-editor"));
    auto *layout = new QVBoxLayout(this);
    m_messages = new MessageBar(this);
    layout->addWidget(m_messages);

    auto *top = new QHBoxLayout;
    top->addWidget(new QLabel(tr("&Name:"), this));
    m_name = new QLineEdit(this);
    m_name->setObjectName(QStringLiteral("codebook-name"));
    static_cast<QLabel *>(top->itemAt(0)->widget())->setBuddy(m_name);
    top->addWidget(withErrorLine(m_name, QStringLiteral("name")), 1);
    auto *languageLabel = new QLabel(tr("Texts &in:"), this);
    top->addWidget(languageLabel);
    m_languageBox = new QComboBox(this);
    m_languageBox->setObjectName(QStringLiteral("codebook-language"));
    m_languageBox->setToolTip(tr("The language whose texts the fields show and edit. Coders "
                                 "whose program speaks that language read these texts."));
    languageLabel->setBuddy(m_languageBox);
    top->addWidget(m_languageBox);
    m_version = new QLabel(this);
    m_version->setObjectName(QStringLiteral("codebook-version"));
    top->addWidget(m_version);
    layout->addLayout(top);
    m_languageHint = new QLabel(this);
    m_languageHint->setObjectName(QStringLiteral("codebook-language-hint"));
    m_languageHint->setWordWrap(true);
    m_languageHint->hide();
    layout->addWidget(m_languageHint);
    connect(m_languageBox, &QComboBox::activated, this, [this](int index) {
        const QString language = m_languageBox->itemData(index).toString();
        if (language == kAddLanguage)
            askLanguage();
        else
            showLanguage(language);
    });

    m_tabs = new QTabWidget(this);
    for (FramingFunction f : kFramingFunctions) {
        const FunctionStyle style = functionStyle(f);
        m_tabs->addTab(
            buildFunctionPage(f), QStringLiteral("%1  %2").arg(style.letter).arg(functionName(f)));
    }
    m_tabs->addTab(buildItemsPage(), tr("Article-level items"));
    layout->addWidget(m_tabs, 1);
    connect(m_tabs, &QTabWidget::currentChanged, this, [this] { showCheck(false); });

    auto *buttons = new QHBoxLayout;
    QAction *undo = m_undo.createUndoAction(this, tr("&Undo:"));
    undo->setShortcut(QKeySequence::Undo);
    QAction *redo = m_undo.createRedoAction(this, tr("&Redo:"));
    QList<QKeySequence> redoKeys = QKeySequence::keyBindings(QKeySequence::Redo);
    if (!redoKeys.contains(QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_Z)))
        redoKeys.prepend(QKeySequence(Qt::CTRL | Qt::SHIFT | Qt::Key_Z));
    redo->setShortcuts(redoKeys);
    addAction(undo);
    addAction(redo);
    for (QAction *a : {undo, redo}) {
        auto *b = new QToolButton(this);
        b->setDefaultAction(a);
        b->setToolButtonStyle(Qt::ToolButtonTextOnly);
        buttons->addWidget(b);
    }
    buttons->addStretch(1);
    m_save = new QPushButton(tr("&Save as new version…"), this);
    m_save->setObjectName(QStringLiteral("codebook-save"));
    buttons->addWidget(m_save);
    layout->addLayout(buttons);
    connect(m_save, &QPushButton::clicked, this, &CodebookEditor::askAndSave);
    connect(&m_undo, &QUndoStack::cleanChanged, this,
        [this](bool clean) { setWindowTitle(clean ? tr("Codebook") : tr("Codebook (changed)")); });

    connect(m_name, &QLineEdit::textChanged, this, [this](const QString &text) {
        editText(
            QStringLiteral("name"), tr("Edit the codebook's name"),
            [&](Codebook &b) { b.name = text; }, [&](CodebookTexts &t) { t.name = text; });
    });

    auto book = m_project.codebook();
    if (book) {
        m_stored = *book;
    } else {
        m_messages->showMessage(MessageBar::Kind::Error, book.error().message);
        m_save->setEnabled(false);
    }
    m_draft = m_stored;
    load();
    showCheck(false);
    resize(1180, 720);
    connect(&m_session, &CodingSession::projectEdited, this, &CodebookEditor::followStored);
}

void CodebookEditor::followStored()
{
    if (m_undo.count() > 0)
        return; // the draft holds edits: saving says that another version came meanwhile
    auto book = m_project.codebook();
    if (!book || book->number == m_stored.number)
        return;
    m_stored = *book;
    m_draft = m_stored;
    load();
    showCheck(false);
}

QWidget *CodebookEditor::withErrorLine(QWidget *editor, const QString &key)
{
    auto *box = new QWidget(editor->parentWidget());
    auto *column = new QVBoxLayout(box);
    column->setContentsMargins(0, 0, 0, 0);
    column->setSpacing(2);
    column->addWidget(editor);
    auto *error = new QLabel(box);
    error->setObjectName(QStringLiteral("field-error"));
    error->setWordWrap(true);
    error->setStyleSheet(QStringLiteral("color: #b3261e;"));
    error->hide();
    column->addWidget(error);
    auto *note = new QLabel(box);
    note->setObjectName(QStringLiteral("field-note"));
    note->setWordWrap(true);
    note->setForegroundRole(QPalette::PlaceholderText);
    note->hide();
    column->addWidget(note);
    m_fields.insert(key, {editor, error, note});
    editor->installEventFilter(this);
    return box;
}

QComboBox *CodebookEditor::levelBox(QWidget *parent)
{
    auto *box = new QComboBox(parent);
    for (MeasurementLevel level : {MeasurementLevel::Nominal, MeasurementLevel::Ordinal,
             MeasurementLevel::Interval, MeasurementLevel::Ratio})
        box->addItem(levelName(level), measurementLevelKey(level));
    box->setToolTip(tr("Level of measurement: it decides which agreement coefficient compares the "
                       "values (Krippendorff 2004, ch. 11)."));
    return box;
}

QWidget *CodebookEditor::buildFunctionPage(FramingFunction f)
{
    const int n = int(f);
    const QString path = functionPath(n);
    FunctionPage &p = m_functions[size_t(n)];
    auto *page = new QWidget(this);
    auto *split = new QHBoxLayout(page);

    auto *texts = new QFormLayout;
    texts->setFieldGrowthPolicy(QFormLayout::ExpandingFieldsGrow);
    p.label = new QLineEdit(page);
    texts->addRow(tr("&Label:"), withErrorLine(p.label, path + QStringLiteral(".label")));
    p.definition = textBox(page, 4);
    texts->addRow(
        tr("&Definition:"), withErrorLine(p.definition, path + QStringLiteral(".definition")));
    p.rules = textBox(page, 6);
    p.rules->setPlaceholderText(rulesHint());
    texts->addRow(tr("Decision &rules:"), withErrorLine(p.rules, path + QStringLiteral(".rules")));
    p.examples = textBox(page, 4);
    p.examples->setPlaceholderText(examplesHint());
    texts->addRow(tr("E&xamples:"), withErrorLine(p.examples, path + QStringLiteral(".examples")));
    split->addLayout(texts, 3);

    auto *group = new QGroupBox(tr("Attributes of %1 spans").arg(functionName(f)), page);
    auto *attributes = new QVBoxLayout(group);
    p.attributes = new QListWidget(group);
    p.attributes->setObjectName(QStringLiteral("attribute-list"));
    p.attributes->setMaximumHeight(p.attributes->fontMetrics().lineSpacing() * 5 + 12);
    attributes->addWidget(p.attributes);
    auto *rowButtons = new QHBoxLayout;
    p.add = new QPushButton(tr("&Add attribute"), group);
    p.remove = new QPushButton(tr("Re&move attribute"), group);
    rowButtons->addWidget(p.add);
    rowButtons->addWidget(p.remove);
    rowButtons->addStretch(1);
    attributes->addLayout(rowButtons);
    p.attributeForm = new QWidget(group);
    auto *form = new QFormLayout(p.attributeForm);
    form->setContentsMargins(0, 0, 0, 0);
    p.key = new QLineEdit(p.attributeForm);
    form->addRow(tr("&Key:"), withErrorLine(p.key, path + QStringLiteral(".attributes.key")));
    p.attributeLabel = new QLineEdit(p.attributeForm);
    form->addRow(
        tr("La&bel:"), withErrorLine(p.attributeLabel, path + QStringLiteral(".attributes.label")));
    p.type = new QComboBox(p.attributeForm);
    p.type->addItem(tr("closed list of values"), QStringLiteral("choice"));
    p.type->addItem(tr("free text"), QStringLiteral("text"));
    form->addRow(tr("&Type:"), withErrorLine(p.type, path + QStringLiteral(".attributes.type")));
    p.level = levelBox(p.attributeForm);
    form->addRow(tr("Le&vel:"), withErrorLine(p.level, path + QStringLiteral(".attributes.level")));
    p.values = textBox(p.attributeForm, 4);
    p.values->setPlaceholderText(tr("One value per line, in order."));
    form->addRow(
        tr("&Values:"), withErrorLine(p.values, path + QStringLiteral(".attributes.values")));
    attributes->addWidget(p.attributeForm);
    attributes->addStretch(1);
    split->addWidget(group, 2);

    const auto attribute = [this, n](const std::function<void(AttributeSpec &)> &change) {
        const int row = selectedRow(m_functions[size_t(n)].attributes);
        return [row, n, change](Codebook &b) {
            auto &list = b.functions[size_t(n)].attributes;
            if (row >= 0 && row < int(list.size()))
                change(list[size_t(row)]);
        };
    };
    const auto attributeField = [this, path, n](const char *member) {
        return QStringLiteral("%1.attributes[%2].%3")
            .arg(path)
            .arg(selectedRow(m_functions[size_t(n)].attributes))
            .arg(QLatin1String(member));
    };
    const QString name = functionName(f);
    connect(p.label, &QLineEdit::textChanged, this, [=, this](const QString &text) {
        editText(
            path + QStringLiteral(".label"), tr("Edit the label of %1").arg(name),
            [&](Codebook &b) { b.functions[size_t(n)].label = text; },
            [&](CodebookTexts &t) { t.functions[f].label = text; });
    });
    connect(p.definition, &QPlainTextEdit::textChanged, this, [=, this] {
        const QString text = m_functions[size_t(n)].definition->toPlainText();
        editText(
            path + QStringLiteral(".definition"), tr("Edit the definition of %1").arg(name),
            [&](Codebook &b) { b.functions[size_t(n)].definition = text; },
            [&](CodebookTexts &t) { t.functions[f].definition = text; });
    });
    connect(p.rules, &QPlainTextEdit::textChanged, this, [=, this] {
        const QStringList rules = fromParagraphs(m_functions[size_t(n)].rules->toPlainText());
        editText(
            path + QStringLiteral(".rules"), tr("Edit the decision rules of %1").arg(name),
            [&](Codebook &b) { b.functions[size_t(n)].rules = rules; },
            [&](CodebookTexts &t) { t.functions[f].rules = rules; });
    });
    connect(p.examples, &QPlainTextEdit::textChanged, this, [=, this] {
        const QStringList examples = fromParagraphs(m_functions[size_t(n)].examples->toPlainText());
        editText(
            path + QStringLiteral(".examples"), tr("Edit the examples of %1").arg(name),
            [&](Codebook &b) { b.functions[size_t(n)].examples = examples; },
            [&](CodebookTexts &t) { t.functions[f].examples = examples; });
    });
    connect(p.key, &QLineEdit::textChanged, this, [=, this](const QString &text) {
        const int row = selectedRow(m_functions[size_t(n)].attributes);
        editShared(attributeField("key"), tr("Edit an attribute's key"), [=](Codebook &b) {
            auto &list = b.functions[size_t(n)].attributes;
            if (row < 0 || row >= int(list.size()))
                return;
            const QString old = list[size_t(row)].key;
            list[size_t(row)].key = text;
            moveAttributeLabels(b, f, old, text);
        });
    });
    connect(p.attributeLabel, &QLineEdit::textChanged, this, [=, this](const QString &text) {
        const int row = selectedRow(m_functions[size_t(n)].attributes);
        const auto &list = m_draft.functions[size_t(n)].attributes;
        const QString key = row >= 0 && row < int(list.size()) ? list[size_t(row)].key : QString();
        editText(attributeField("label"), tr("Edit an attribute's label"),
            attribute([text](AttributeSpec &a) { a.label = text; }), [&](CodebookTexts &t) {
                if (!key.isEmpty())
                    t.functions[f].attributeLabels.insert(key, text);
            });
    });
    connect(p.type, &QComboBox::currentIndexChanged, this, [=, this] {
        const bool text =
            m_functions[size_t(n)].type->currentData().toString() == QLatin1String("text");
        editShared({}, tr("Change an attribute's type"), attribute([text](AttributeSpec &a) {
            a.type = text ? AttributeSpec::Type::Text : AttributeSpec::Type::Choice;
            if (text)
                a.recode.clear();
        }));
    });
    connect(p.level, &QComboBox::currentIndexChanged, this, [=, this] {
        const MeasurementLevel level = levelOf(m_functions[size_t(n)].level);
        editShared({}, tr("Change an attribute's level"),
            attribute([level](AttributeSpec &a) { a.level = level; }));
    });
    connect(p.values, &QPlainTextEdit::textChanged, this, [=, this] {
        const QStringList values = fromLines(m_functions[size_t(n)].values->toPlainText());
        editShared(attributeField("values"), tr("Edit an attribute's values"),
            attribute([values](AttributeSpec &a) { a.values = values; }));
    });
    connect(p.attributes, &QListWidget::currentRowChanged, this, [this, n] {
        if (m_loading)
            return;
        loadAttributeForm(n);
        showCheck(false);
    });
    connect(p.add, &QPushButton::clicked, this, &CodebookEditor::addRow);
    connect(p.remove, &QPushButton::clicked, this, &CodebookEditor::removeRow);
    return page;
}

QWidget *CodebookEditor::buildItemsPage()
{
    ItemsPage &p = m_items;
    auto *page = new QWidget(this);
    auto *split = new QHBoxLayout(page);
    auto *left = new QVBoxLayout;
    auto *intro = new QLabel(
        tr("Questions answered once per article, such as which function dominates it."), page);
    intro->setWordWrap(true);
    left->addWidget(intro);
    p.items = new QListWidget(page);
    p.items->setObjectName(QStringLiteral("item-list"));
    left->addWidget(p.items, 1);
    auto *rowButtons = new QHBoxLayout;
    p.add = new QPushButton(tr("&Add item"), page);
    p.remove = new QPushButton(tr("Re&move item"), page);
    rowButtons->addWidget(p.add);
    rowButtons->addWidget(p.remove);
    rowButtons->addStretch(1);
    left->addLayout(rowButtons);
    split->addLayout(left, 2);

    p.form = new QWidget(page);
    auto *form = new QFormLayout(p.form);
    form->setFieldGrowthPolicy(QFormLayout::ExpandingFieldsGrow);
    p.key = new QLineEdit(p.form);
    form->addRow(tr("&Key:"), withErrorLine(p.key, QStringLiteral("items.key")));
    p.question = textBox(p.form, 3);
    form->addRow(tr("&Question:"), withErrorLine(p.question, QStringLiteral("items.question")));
    p.values = textBox(p.form, 6);
    p.values->setPlaceholderText(tr("One value per line, in order."));
    form->addRow(tr("&Values:"), withErrorLine(p.values, QStringLiteral("items.values")));
    p.level = levelBox(p.form);
    form->addRow(tr("Le&vel:"), withErrorLine(p.level, QStringLiteral("items.level")));
    split->addWidget(p.form, 3);

    const auto item = [this](const std::function<void(ArticleItem &)> &change) {
        const int row = selectedRow(m_items.items);
        return [row, change](Codebook &b) {
            if (row >= 0 && row < int(b.items.size()))
                change(b.items[size_t(row)]);
        };
    };
    const auto itemField = [this](const char *member) {
        return QStringLiteral("items[%1].%2")
            .arg(selectedRow(m_items.items))
            .arg(QLatin1String(member));
    };
    connect(p.key, &QLineEdit::textChanged, this, [=, this](const QString &text) {
        const int row = selectedRow(m_items.items);
        editShared(itemField("key"), tr("Edit an item's key"), [=](Codebook &b) {
            if (row < 0 || row >= int(b.items.size()))
                return;
            const QString old = b.items[size_t(row)].key;
            b.items[size_t(row)].key = text;
            moveQuestions(b, old, text);
        });
    });
    connect(p.question, &QPlainTextEdit::textChanged, this, [=, this] {
        const QString text = m_items.question->toPlainText();
        const int row = selectedRow(m_items.items);
        const QString key = row >= 0 && row < int(m_draft.items.size())
            ? m_draft.items[size_t(row)].key
            : QString();
        editText(itemField("question"), tr("Edit an item's question"),
            item([text](ArticleItem &i) { i.question = text; }), [&](CodebookTexts &t) {
                if (!key.isEmpty())
                    t.questions.insert(key, text);
            });
    });
    connect(p.values, &QPlainTextEdit::textChanged, this, [=, this] {
        const QStringList values = fromLines(m_items.values->toPlainText());
        editShared(itemField("values"), tr("Edit an item's values"),
            item([values](ArticleItem &i) { i.values = values; }));
    });
    connect(p.level, &QComboBox::currentIndexChanged, this, [=, this] {
        const MeasurementLevel level = levelOf(m_items.level);
        editShared(
            {}, tr("Change an item's level"), item([level](ArticleItem &i) { i.level = level; }));
    });
    connect(p.items, &QListWidget::currentRowChanged, this, [this] {
        if (m_loading)
            return;
        loadItemForm();
        showCheck(false);
    });
    connect(p.add, &QPushButton::clicked, this, &CodebookEditor::addRow);
    connect(p.remove, &QPushButton::clicked, this, &CodebookEditor::removeRow);
    return page;
}

int CodebookEditor::selectedRow(const QListWidget *list) const
{
    return list->currentRow();
}

void CodebookEditor::edit(
    const QString &field, const QString &text, const std::function<void(Codebook &)> &change)
{
    if (m_loading)
        return;
    Codebook after = m_draft;
    change(after);
    if (after.toJson() == m_draft.toJson())
        return;
    m_undo.push(new CodebookEditCommand(
        [this, language = m_language](const Codebook &book, bool first) {
            if (!first)
                m_language = language;
            setDraft(book, first);
        },
        m_draft, after, field, text));
}

void CodebookEditor::editText(const QString &field, const QString &text,
    const std::function<void(Codebook &)> &own,
    const std::function<void(CodebookTexts &)> &translated)
{
    if (m_language.isEmpty()) {
        edit(field, text, own);
        return;
    }
    const QString language = m_language;
    edit(QStringLiteral("translations.%1.%2").arg(language, field),
        tr("%1 (%2)").arg(text, language), [&](Codebook &b) {
            translated(b.translations[language]);
            dropEmptyTexts(b, language);
        });
}

void CodebookEditor::editShared(
    const QString &field, const QString &text, const std::function<void(Codebook &)> &change)
{
    if (m_language.isEmpty())
        edit(field, text, change);
}

QStringList CodebookEditor::languages() const
{
    QStringList out = m_stored.translations.keys();
    for (const QStringList &more : {m_draft.translations.keys(), m_addedLanguages})
        for (const QString &l : more)
            if (!out.contains(l))
                out << l;
    out.sort();
    out.prepend(QString());
    return out;
}

bool CodebookEditor::showLanguage(const QString &language)
{
    if (!languages().contains(language))
        return false;
    if (language != m_language) {
        m_language = language;
        load();
        showCheck(false);
    }
    return true;
}

bool CodebookEditor::addLanguage(const QString &code)
{
    // As Codebook::fromJson reads the keys of "translations".
    static const QRegularExpression valid(QStringLiteral("^[a-z]{2,3}$"));
    const QString language = code.trimmed();
    if (!valid.match(language).hasMatch()) {
        m_messages->showMessage(MessageBar::Kind::Warning,
            tr("“%1” is not a language code: a codebook names a language by two or three "
               "lower-case letters (ISO 639), such as “fr” or “pl”.")
                .arg(language));
        loadLanguages();
        return false;
    }
    if (!languages().contains(language))
        m_addedLanguages << language;
    showLanguage(language);
    loadLanguages();
    return true;
}

void CodebookEditor::askLanguage()
{
    bool ok = false;
    const QString code = QInputDialog::getText(this, tr("Add a language"),
        tr("Language code (ISO 639: two or three lower-case letters, such as “fr” or “pl”):"),
        QLineEdit::Normal, QString(), &ok);
    if (ok)
        addLanguage(code);
    else
        loadLanguages();
}

void CodebookEditor::loadLanguages()
{
    const bool was = m_loading;
    m_loading = true;
    m_languageBox->clear();
    for (const QString &l : languages())
        m_languageBox->addItem(languageName(l), l);
    m_languageBox->insertSeparator(m_languageBox->count());
    m_languageBox->addItem(tr("Add a language…"), kAddLanguage);
    m_languageBox->setCurrentIndex(m_languageBox->findData(m_language));
    m_languageHint->setVisible(!m_language.isEmpty());
    m_languageHint->setText(
        tr("Showing the texts in %1. A field left empty shows the base text in grey, and coders "
           "read that one. Keys, values, levels and the lists of attributes and items are the "
           "same in every language: change them in the base language.")
            .arg(languageName(m_language)));
    m_loading = was;
}

Codebook CodebookEditor::shownTexts() const
{
    if (m_language.isEmpty())
        return m_draft;
    const CodebookTexts texts = m_draft.translations.value(m_language);
    Codebook out = m_draft;
    out.name = texts.name;
    for (FunctionDefinition &def : out.functions) {
        const FunctionTexts t = texts.functions.value(def.function);
        def.label = t.label;
        def.definition = t.definition;
        def.rules = t.rules;
        def.examples = t.examples;
        for (AttributeSpec &a : def.attributes)
            a.label = t.attributeLabels.value(a.key);
    }
    for (ArticleItem &item : out.items)
        item.question = texts.questions.value(item.key);
    return out;
}

void CodebookEditor::setDraft(const Codebook &book, bool keepFields)
{
    m_draft = book;
    if (!keepFields) {
        load();
    } else {
        // Only the lists' keys follow the field typed in.
        m_loading = true;
        for (size_t f = 0; f < m_functions.size(); ++f) {
            QListWidget *list = m_functions[f].attributes;
            const auto &attributes = m_draft.functions[f].attributes;
            for (int r = 0; r < list->count() && r < int(attributes.size()); ++r)
                list->item(r)->setText(attributes[size_t(r)].key);
        }
        for (int r = 0; r < m_items.items->count() && r < int(m_draft.items.size()); ++r)
            m_items.items->item(r)->setText(m_draft.items[size_t(r)].key);
        m_loading = false;
    }
    showCheck(false);
}

void CodebookEditor::load()
{
    m_loading = true;
    if (!languages().contains(m_language))
        m_language.clear(); // a language added by a version that was undone
    loadLanguages();
    const bool own = m_language.isEmpty();
    const Codebook shown = shownTexts();
    m_version->setText(m_stored.number > 0
            ? tr("Editing a draft of version %1; saving makes version %2.")
                  .arg(m_stored.number)
                  .arg(m_stored.number + 1)
            : QString());
    setText(m_name, shown.name);
    m_name->setPlaceholderText(own ? QString() : m_draft.name);
    for (size_t f = 0; f < m_functions.size() && f < m_draft.functions.size(); ++f) {
        FunctionPage &p = m_functions[f];
        const FunctionDefinition &def = shown.functions[f];
        const FunctionDefinition &base = m_draft.functions[f];
        setText(p.label, def.label);
        setText(p.definition, def.definition);
        // In a translation the base text shows where the field is empty: it stands there.
        p.label->setPlaceholderText(own ? QString() : base.label);
        p.definition->setPlaceholderText(own ? QString() : base.definition);
        p.rules->setPlaceholderText(own ? rulesHint() : paragraphs(base.rules));
        p.examples->setPlaceholderText(own ? examplesHint() : paragraphs(base.examples));
        p.add->setEnabled(own);
        // A rule or example list that reads back the same keeps its text as typed.
        if (fromParagraphs(p.rules->toPlainText()) != def.rules)
            setText(p.rules, paragraphs(def.rules));
        if (fromParagraphs(p.examples->toPlainText()) != def.examples)
            setText(p.examples, paragraphs(def.examples));
        const int row = p.attributes->currentRow();
        p.attributes->clear();
        for (const AttributeSpec &a : def.attributes)
            p.attributes->addItem(a.key);
        p.attributes->setCurrentRow(
            def.attributes.empty() ? -1 : std::clamp(row, 0, int(def.attributes.size()) - 1));
        m_loading = false;
        loadAttributeForm(int(f));
        m_loading = true;
    }
    m_items.add->setEnabled(own);
    const int row = m_items.items->currentRow();
    m_items.items->clear();
    for (const ArticleItem &item : m_draft.items)
        m_items.items->addItem(item.key);
    m_items.items->setCurrentRow(
        m_draft.items.empty() ? -1 : std::clamp(row, 0, int(m_draft.items.size()) - 1));
    m_loading = false;
    loadItemForm();
}

void CodebookEditor::loadAttributeForm(int f)
{
    FunctionPage &p = m_functions[size_t(f)];
    const auto &attributes = m_draft.functions[size_t(f)].attributes;
    const int row = p.attributes->currentRow();
    const bool has = row >= 0 && row < int(attributes.size());
    const bool own = m_language.isEmpty();
    p.attributeForm->setEnabled(has);
    p.remove->setEnabled(has && own);
    const AttributeSpec shown = has ? attributes[size_t(row)] : AttributeSpec {};
    m_loading = true;
    setText(p.key, shown.key);
    const QString label = own || !has ? shown.label
                                      : m_draft.translations.value(m_language)
                                            .functions.value(FramingFunction(f))
                                            .attributeLabels.value(shown.key);
    setText(p.attributeLabel, label);
    p.attributeLabel->setPlaceholderText(own ? QString() : shown.label);
    setEditable(p.key, own);
    p.type->setEnabled(own);
    p.level->setEnabled(own);
    setEditable(p.values, own);
    p.type->setCurrentIndex(shown.type == AttributeSpec::Type::Text ? 1 : 0);
    setLevel(p.level, shown.level);
    if (fromLines(p.values->toPlainText()) != shown.values || !has)
        setText(p.values, shown.values.join(QLatin1Char('\n')));
    p.values->setEnabled(shown.type == AttributeSpec::Type::Choice);
    m_loading = false;
}

void CodebookEditor::loadItemForm()
{
    ItemsPage &p = m_items;
    const int row = p.items->currentRow();
    const bool has = row >= 0 && row < int(m_draft.items.size());
    const bool own = m_language.isEmpty();
    p.form->setEnabled(has);
    p.remove->setEnabled(has && own);
    const ArticleItem shown = has ? m_draft.items[size_t(row)] : ArticleItem {};
    m_loading = true;
    setText(p.key, shown.key);
    setText(p.question,
        own || !has ? shown.question
                    : m_draft.translations.value(m_language).questions.value(shown.key));
    p.question->setPlaceholderText(own ? QString() : shown.question);
    setEditable(p.key, own);
    setEditable(p.values, own);
    p.level->setEnabled(own);
    if (fromLines(p.values->toPlainText()) != shown.values || !has)
        setText(p.values, shown.values.join(QLatin1Char('\n')));
    setLevel(p.level, shown.level);
    m_loading = false;
}

void CodebookEditor::addRow()
{
    if (!m_language.isEmpty())
        return; // the lists are the same in every language
    const int tab = m_tabs->currentIndex();
    if (tab == kItemsTab) {
        const int row = int(m_draft.items.size());
        edit({}, tr("Add an item"), [row](Codebook &b) {
            ArticleItem item;
            item.key = QStringLiteral("item_%1").arg(row + 1);
            b.items.push_back(item);
        });
        selectRow(row);
        return;
    }
    const int row = int(m_draft.functions[size_t(tab)].attributes.size());
    edit({}, tr("Add an attribute to %1").arg(functionName(kFramingFunctions[size_t(tab)])),
        [tab, row](Codebook &b) {
            AttributeSpec a;
            a.key = QStringLiteral("attribute_%1").arg(row + 1);
            a.label = a.key;
            b.functions[size_t(tab)].attributes.push_back(a);
        });
    selectRow(row);
}

void CodebookEditor::removeRow()
{
    if (!m_language.isEmpty())
        return;
    const int tab = m_tabs->currentIndex();
    if (tab == kItemsTab) {
        const int row = m_items.items->currentRow();
        if (row < 0 || row >= int(m_draft.items.size()))
            return;
        edit(
            {}, tr("Remove the item “%1”").arg(m_draft.items[size_t(row)].key), [row](Codebook &b) {
                const QString key = b.items[size_t(row)].key;
                b.items.erase(b.items.begin() + row);
                // Its question in other languages goes with it (a new item may take the key).
                if (!b.item(key))
                    for (CodebookTexts &t : b.translations)
                        t.questions.remove(key);
            });
        return;
    }
    auto &attributes = m_draft.functions[size_t(tab)].attributes;
    const int row = m_functions[size_t(tab)].attributes->currentRow();
    if (row < 0 || row >= int(attributes.size()))
        return;
    edit({}, tr("Remove the attribute “%1”").arg(attributes[size_t(row)].key),
        [tab, row](Codebook &b) {
            auto &list = b.functions[size_t(tab)].attributes;
            const QString key = list[size_t(row)].key;
            list.erase(list.begin() + row);
            if (std::ranges::find(list, key, &AttributeSpec::key) == list.end())
                for (CodebookTexts &t : b.translations) {
                    const auto texts = t.functions.find(FramingFunction(tab));
                    if (texts != t.functions.end())
                        texts->attributeLabels.remove(key);
                }
        });
}

void CodebookEditor::showFunction(FramingFunction f)
{
    m_tabs->setCurrentIndex(int(f));
}

void CodebookEditor::showItems()
{
    m_tabs->setCurrentIndex(kItemsTab);
}

void CodebookEditor::selectRow(int row)
{
    const int tab = m_tabs->currentIndex();
    QListWidget *list = tab == kItemsTab ? m_items.items : m_functions[size_t(tab)].attributes;
    list->setCurrentRow(row);
}

// "functions[2].attributes[0].values" → "functions[2].attributes.values" (the form's field).
QString CodebookEditor::fieldKey(const QString &field) const
{
    static const QRegularExpression row(QStringLiteral(R"((attributes|^items)\[\d+\])"));
    QString key = field;
    key.replace(row, QStringLiteral("\\1"));
    return key;
}

QWidget *CodebookEditor::fieldWidget(const QString &field)
{
    static const QRegularExpression place(
        QStringLiteral(R"(^(?:functions\[(\d+)\](?:\.attributes\[(\d+)\])?|items\[(\d+)\]))"));
    const QRegularExpressionMatch m = place.match(field);
    if (m.hasMatch()) {
        if (m.capturedLength(3) > 0) {
            showItems();
            selectRow(m.captured(3).toInt());
        } else {
            m_tabs->setCurrentIndex(m.captured(1).toInt());
            if (m.capturedLength(2) > 0)
                selectRow(m.captured(2).toInt());
        }
    }
    const auto it = m_fields.constFind(fieldKey(field));
    return it == m_fields.constEnd() ? nullptr : it->editor;
}

QString CodebookEditor::fieldError(const QString &field) const
{
    const QString key = fieldKey(field);
    if (key != m_errorKey || !m_check.error)
        return {};
    // The form shows one row: the error is this field's only when it names the row shown.
    return m_check.error->field == field ? m_check.error->sentence : QString();
}

QString CodebookEditor::fieldNote(const QString &field) const
{
    const auto it = m_fields.constFind(fieldKey(field));
    return it == m_fields.constEnd() ? QString() : it->note->text();
}

void CodebookEditor::refreshNotes()
{
    // A base text that changed while a translation still gives the text of the current version.
    const auto note = [this](const QString &key, const TextOf &text) {
        QStringList stale;
        const auto now = text(m_draft, {});
        const auto was = text(m_stored, {});
        if (m_language.isEmpty() && now && was && *now != *was)
            for (const QString &l : m_draft.translations.keys()) {
                const auto given = text(m_draft, l);
                if (given && !given->isEmpty() && given == text(m_stored, l))
                    stale << l;
            }
        QLabel *label = m_fields.value(key).note;
        label->setText(stale.isEmpty()
                ? QString()
                : tr("The translation of this text may need updating too: %1 (choose the language "
                     "under “Texts in”).")
                      .arg(stale.join(QStringLiteral(", "))));
        label->setVisible(!stale.isEmpty());
    };
    note(QStringLiteral("name"), [](const Codebook &book, const QString &language) {
        return std::optional<QString>(
            language.isEmpty() ? book.name : book.translations.value(language).name);
    });
    const TextOf none = [](const Codebook &, const QString &) { return std::nullopt; };
    for (FramingFunction f : kFramingFunctions) {
        const QString path = functionPath(int(f));
        note(path + QStringLiteral(".label"), functionText(f, FunctionPart::Label));
        note(path + QStringLiteral(".definition"), functionText(f, FunctionPart::Definition));
        note(path + QStringLiteral(".rules"), functionText(f, FunctionPart::Rules));
        note(path + QStringLiteral(".examples"), functionText(f, FunctionPart::Examples));
        const auto &attributes = m_draft.definition(f).attributes;
        const int row = m_functions[size_t(f)].attributes->currentRow();
        note(path + QStringLiteral(".attributes.label"),
            row >= 0 && row < int(attributes.size())
                ? attributeLabelText(f, attributes[size_t(row)].key)
                : none);
    }
    const int row = m_items.items->currentRow();
    note(QStringLiteral("items.question"),
        row >= 0 && row < int(m_draft.items.size()) ? questionText(m_draft.items[size_t(row)].key)
                                                    : none);
}

void CodebookEditor::showCheck(bool go)
{
    if (!m_errorKey.isEmpty()) {
        const FieldWidgets &was = m_fields.value(m_errorKey);
        was.editor->setStyleSheet({});
        was.error->hide();
        was.error->clear();
        m_errorKey.clear();
    }
    refreshNotes();
    m_check = checkCodebookDraft(m_draft);
    m_save->setToolTip(m_check.error ? tr("Fix the marked field first.") : QString());
    if (!m_check.error)
        return;
    const CodebookFieldError &error = *m_check.error;
    if (go && !m_language.isEmpty()) {
        // The check reads the codebook's own fields: turning to one shows the base language.
        m_language.clear();
        load();
    }
    static const QRegularExpression place(
        QStringLiteral(R"(^(?:functions\[(\d+)\](?:\.attributes\[(\d+)\])?|items\[(\d+)\]))"));
    const QRegularExpressionMatch m = place.match(error.field);
    bool onScreen = true;
    if (m.hasMatch()) {
        const int tab = m.capturedLength(3) > 0 ? kItemsTab : m.captured(1).toInt();
        const int row = m.capturedLength(3) > 0 ? m.captured(3).toInt()
            : m.capturedLength(2) > 0           ? m.captured(2).toInt()
                                                : -1;
        if (go) {
            m_tabs->setCurrentIndex(tab);
            if (row >= 0)
                selectRow(row);
        }
        const QListWidget *list =
            tab == kItemsTab ? m_items.items : m_functions[size_t(tab)].attributes;
        onScreen = m_tabs->currentIndex() == tab && (row < 0 || list->currentRow() == row);
    }
    const QString key = fieldKey(error.field);
    if (!onScreen || !m_fields.contains(key))
        return;
    const FieldWidgets &at = m_fields.value(key);
    at.editor->setStyleSheet(
        QStringLiteral("%1 { %2 }")
            .arg(QLatin1String(at.editor->metaObject()->className()), kInvalidStyle));
    at.error->setText(error.sentence);
    at.error->show();
    m_errorKey = key;
    if (go)
        at.editor->setFocus();
}

QString CodebookEditor::diffText() const
{
    if (!m_check.candidate)
        return {};
    CodebookDiff diff = CodebookVersions::diff(m_stored, *m_check.candidate);
    diff.from = m_stored.number;
    diff.to = m_stored.number + 1;
    return CodebookVersions::diffText(diff);
}

bool CodebookEditor::currentIsStored()
{
    auto book = m_project.codebook();
    if (!book) {
        m_messages->showMessage(MessageBar::Kind::Error, book.error().message);
        return false;
    }
    if (book->number == m_stored.number)
        return true;
    // Another window or the command line added a version: the diff would be against an old one.
    m_messages->showMessage(MessageBar::Kind::Warning,
        tr("Version %1 was added since this draft was started from version %2; nothing was "
           "saved. Close the editor and open it again to edit the new version.")
            .arg(book->number)
            .arg(m_stored.number));
    return false;
}

bool CodebookEditor::saveAsNewVersion(const QString &note)
{
    if (!currentIsStored())
        return false;
    showCheck(true);
    if (!m_check.candidate) {
        m_messages->showMessage(MessageBar::Kind::Warning,
            tr("The codebook was not saved: the marked field needs a change first."));
        return false;
    }
    if (CodebookVersions::diff(m_stored, *m_check.candidate).changes.empty()) {
        m_messages->showMessage(MessageBar::Kind::Information,
            tr("Nothing was saved: the draft is the same as version %1.").arg(m_stored.number), {},
            {}, 8);
        return false;
    }
    auto edit = CodebookVersions::addEdit(m_project, *m_check.candidate, note, m_current);
    Status applied = edit ? m_project.apply(**edit) : Status(std::unexpected(edit.error()));
    if (!applied) {
        m_messages->showMessage(MessageBar::Kind::Error, applied.error().message);
        return false;
    }
    const int number = (*edit)->number();
    m_undo.clear(); // the draft's steps end here; the version is one step on the desk's stack
    m_session.pushApplied(std::move(*edit), ArticleId {}, {});
    auto book = m_project.codebook();
    auto outdated = OutdatedAnnotations::list(m_project);
    if (!book || !outdated) {
        m_messages->showMessage(
            MessageBar::Kind::Error, (!book ? book.error() : outdated.error()).message);
        return false;
    }
    m_stored = *book;
    m_draft = m_stored;
    load();
    showCheck(false);
    const auto recheck = std::ranges::count_if(
        *outdated, [](const OutdatedAnnotation &a) { return a.functionChanged; });
    m_messages->showMessage(MessageBar::Kind::Success,
        tr("Codebook version %1 saved. %n annotation(s) made under an older version are now "
           "outdated; %2 of them belong to a function that changed and need a re-check.",
            nullptr, int(outdated->size()))
            .arg(number)
            .arg(recheck));
    return true;
}

void CodebookEditor::askAndSave()
{
    if (!currentIsStored())
        return;
    showCheck(true);
    if (!m_check.candidate) {
        m_messages->showMessage(MessageBar::Kind::Warning,
            tr("The codebook was not saved: the marked field needs a change first."));
        return;
    }
    QDialog dialog(this);
    dialog.setWindowTitle(tr("Save as version %1").arg(m_stored.number + 1));
    auto *layout = new QVBoxLayout(&dialog);
    layout->addWidget(new QLabel(tr("What changes against version %1:").arg(m_stored.number)));
    auto *diff = new QPlainTextEdit(&dialog);
    diff->setReadOnly(true);
    diff->setFont(QFontDatabase::systemFont(QFontDatabase::FixedFont));
    diff->setPlainText(diffText());
    layout->addWidget(diff, 1);
    auto *noteLabel = new QLabel(tr("&Note (what changed and why):"), &dialog);
    auto *note = new QLineEdit(&dialog);
    noteLabel->setBuddy(note);
    layout->addWidget(noteLabel);
    layout->addWidget(note);
    auto *buttons =
        new QDialogButtonBox(QDialogButtonBox::Save | QDialogButtonBox::Cancel, &dialog);
    QPushButton *save = buttons->button(QDialogButtonBox::Save);
    save->setEnabled(false);
    connect(note, &QLineEdit::textChanged, save,
        [save](const QString &text) { save->setEnabled(!text.trimmed().isEmpty()); });
    connect(buttons, &QDialogButtonBox::accepted, &dialog, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, &dialog, &QDialog::reject);
    layout->addWidget(buttons);
    dialog.resize(720, 420);
    if (dialog.exec() == QDialog::Accepted)
        saveAsNewVersion(note->text());
}

bool CodebookEditor::eventFilter(QObject *watched, QEvent *event)
{
    // The fields' own undo would undo keystrokes the stack already holds: the editor's stack
    // answers Ctrl+Z and Ctrl+Shift+Z in every field.
    if (event->type() == QEvent::ShortcutOverride || event->type() == QEvent::KeyPress) {
        auto *key = static_cast<QKeyEvent *>(event);
        const bool undo = key->matches(QKeySequence::Undo);
        const bool redo = key->matches(QKeySequence::Redo)
            || key->keyCombination()
                == QKeyCombination(Qt::ControlModifier | Qt::ShiftModifier, Qt::Key_Z);
        if (undo || redo) {
            event->accept();
            if (event->type() == QEvent::KeyPress) {
                if (undo)
                    m_undo.undo();
                else
                    m_undo.redo();
            }
            return true;
        }
    }
    return QWidget::eventFilter(watched, event);
}

} // namespace fourfold
