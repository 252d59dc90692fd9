#include "app/desktop/compare/gold_span_dialog.h"

#include "app/desktop/function_style.h"
#include "core/text/offset_map.h"

#include <QCheckBox>
#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QJsonObject>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QScopedValueRollback>
#include <QSpinBox>
#include <QTextBlock>
#include <QVBoxLayout>

namespace fourfold {

GoldSpanDialog::GoldSpanDialog(const Article &article, const AnnotationContent &initial,
    const Codebook &codebook, QWidget *parent)
    : QDialog(parent)
    , m_article(article)
    , m_content(initial)
    , m_codebook(codebook)
    , m_offsets(std::make_unique<OffsetMap>(article.text))
{
    setWindowTitle(tr("Edit the gold span"));
    if (auto seg = segmentText(article.text, article.summary.language))
        m_segmentation = std::move(*seg); // without it, selections snap to grapheme clusters

    auto *layout = new QVBoxLayout(this);
    auto *hint = new QLabel(tr("Select the span on the text: it snaps to whole words, as on the "
                               "desk. Tick \u201C"
                               "Exact selection\u201D to take the selection as it "
                               "is, or set start and end to the character."),
        this);
    hint->setWordWrap(true);
    layout->addWidget(hint);
    m_text = new QPlainTextEdit(this);
    m_text->setReadOnly(true);
    m_text->setTextInteractionFlags(Qt::TextSelectableByMouse | Qt::TextSelectableByKeyboard);
    m_text->setPlainText(article.text);
    m_text->setAccessibleName(tr("Article text"));
    m_text->setMinimumSize(560, 220);
    layout->addWidget(m_text, 1);

    auto *form = new QFormLayout;
    m_function = new QComboBox(this);
    for (FramingFunction f : kFramingFunctions)
        m_function->addItem(functionName(f), int(f));
    m_function->setCurrentIndex(int(initial.function));
    form->addRow(tr("&Function:"), m_function);
    m_exact = new QCheckBox(tr("E&xact selection (no snapping to words)"), this);
    form->addRow(QString(), m_exact);
    const int length = int(m_offsets->codePointCount());
    m_start = new QSpinBox(this);
    m_start->setRange(0, length);
    m_start->setValue(int(initial.range.start));
    m_end = new QSpinBox(this);
    m_end->setRange(0, length);
    m_end->setValue(int(initial.range.end));
    form->addRow(tr("&Start (character):"), m_start);
    form->addRow(tr("&End (character, not included):"), m_end);
    m_preview = new QLabel(this);
    m_preview->setWordWrap(true);
    m_preview->setMinimumWidth(420);
    m_preview->setTextFormat(Qt::PlainText);
    form->addRow(tr("Text:"), m_preview);
    layout->addLayout(form);
    m_attributeForm = new QFormLayout;
    layout->addLayout(m_attributeForm);

    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    buttons->button(QDialogButtonBox::Ok)->setText(tr("Decide gold span"));
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    layout->addWidget(buttons);

    connect(m_start, &QSpinBox::valueChanged, this, &GoldSpanDialog::updatePreview);
    connect(m_end, &QSpinBox::valueChanged, this, &GoldSpanDialog::updatePreview);
    connect(m_text, &QPlainTextEdit::selectionChanged, this, &GoldSpanDialog::takeTextSelection);
    connect(m_exact, &QCheckBox::toggled, this, &GoldSpanDialog::takeTextSelection);
    connect(m_function, &QComboBox::currentIndexChanged, this, [this] {
        const auto f = FramingFunction(m_function->currentData().toInt());
        // Attributes belong to a function's schema: another function starts without them.
        buildAttributeFields(f, f == m_content.function ? m_content.attributes : QJsonObject {});
    });
    buildAttributeFields(initial.function, initial.attributes);
    updatePreview();

    // Show where the span starts from.
    QTextCursor cursor(m_text->document());
    cursor.setPosition(int(m_offsets->utf16FromCodePoint(initial.range.start)));
    m_text->setTextCursor(cursor);
    m_text->ensureCursorVisible();
    resize(760, 620);
}

GoldSpanDialog::~GoldSpanDialog() = default;

void GoldSpanDialog::selectOnText(int utf16Start, int utf16End)
{
    QTextCursor cursor(m_text->document());
    cursor.setPosition(utf16Start);
    cursor.setPosition(utf16End, QTextCursor::KeepAnchor);
    m_text->setTextCursor(cursor); // emits selectionChanged
}

void GoldSpanDialog::setExact(bool exact)
{
    m_exact->setChecked(exact);
}

void GoldSpanDialog::takeTextSelection()
{
    const QTextCursor cursor = m_text->textCursor();
    if (!cursor.hasSelection() || m_settingRange)
        return;
    const TextRange selected = m_offsets->codePointRange(
        Utf16Range {qint64(cursor.selectionStart()), qint64(cursor.selectionEnd())});
    const TextRange r = m_exact->isChecked()
        ? snapToGraphemes(m_article.text, selected)
        : snapToWords(m_article.text, m_segmentation, selected);
    if (r.start < 0 || r.isEmpty())
        return;
    const QScopedValueRollback guard(m_settingRange, true);
    m_start->setValue(int(r.start));
    m_end->setValue(int(r.end));
}

AnnotationContent GoldSpanDialog::content() const
{
    AnnotationContent c = m_content;
    c.function = FramingFunction(m_function->currentData().toInt());
    c.range = TextRange {m_start->value(), m_end->value()};
    if (m_codebook.functions.size() == kFramingFunctions.size())
        c.attributes = attributesFromFields();
    else if (c.function != m_content.function)
        c.attributes = {};
    return c;
}

void GoldSpanDialog::buildAttributeFields(FramingFunction function, const QJsonObject &values)
{
    for (auto &[spec, field] : m_attributeFields)
        m_attributeForm->removeRow(field); // deletes the label and the field
    m_attributeFields.clear();
    if (m_codebook.functions.size() != kFramingFunctions.size())
        return;
    for (const AttributeSpec &spec : m_codebook.definition(function).attributes) {
        const QString value = values.value(spec.key).toString();
        QWidget *field = nullptr;
        if (spec.type == AttributeSpec::Type::Choice) {
            auto *choice = new QComboBox(this);
            choice->addItem(tr("not set"), QString());
            for (const QString &v : spec.values)
                choice->addItem(v, v);
            choice->setCurrentIndex(std::max(0, choice->findData(value)));
            field = choice;
        } else {
            auto *text = new QLineEdit(value, this);
            text->setPlaceholderText(tr("not set"));
            field = text;
        }
        field->setAccessibleName(spec.label);
        m_attributeForm->addRow(tr("%1:").arg(spec.label), field);
        m_attributeFields.emplace_back(spec, field);
    }
}

QJsonObject GoldSpanDialog::attributesFromFields() const
{
    QJsonObject out;
    for (const auto &[spec, field] : m_attributeFields) {
        QString value;
        if (auto *choice = qobject_cast<QComboBox *>(field))
            value = choice->currentData().toString();
        else if (auto *text = qobject_cast<QLineEdit *>(field))
            value = text->text().trimmed();
        if (!value.isEmpty())
            out.insert(spec.key, value);
    }
    return out;
}

void GoldSpanDialog::updatePreview()
{
    const TextRange r {m_start->value(), m_end->value()};
    if (r.isEmpty()) {
        m_preview->setText(tr("(The end must come after the start.)"));
        return;
    }
    m_preview->setText(QChar(0x201C) + OffsetMap::slice(m_article.text, r) + QChar(0x201D));
}

} // namespace fourfold
