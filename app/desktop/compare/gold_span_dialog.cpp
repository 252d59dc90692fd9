#include "app/desktop/compare/gold_span_dialog.h"

#include "app/desktop/function_style.h"
#include "core/text/offset_map.h"

#include <QComboBox>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QLabel>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

namespace fourfold {

GoldSpanDialog::GoldSpanDialog(
    const Article &article, const AnnotationContent &initial, QWidget *parent)
    : QDialog(parent)
    , m_article(article)
    , m_content(initial)
{
    setWindowTitle(tr("Edit the gold span"));
    auto *form = new QFormLayout;
    m_function = new QComboBox(this);
    for (FramingFunction f : kFramingFunctions)
        m_function->addItem(functionName(f), int(f));
    m_function->setCurrentIndex(int(initial.function));
    form->addRow(tr("&Function:"), m_function);
    const int length = int(OffsetMap(article.text).codePointCount());
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
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, this);
    buttons->button(QDialogButtonBox::Ok)->setText(tr("Decide gold span"));
    connect(buttons, &QDialogButtonBox::accepted, this, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, this, &QDialog::reject);
    auto *layout = new QVBoxLayout(this);
    layout->addLayout(form);
    layout->addWidget(buttons);
    connect(m_start, &QSpinBox::valueChanged, this, &GoldSpanDialog::updatePreview);
    connect(m_end, &QSpinBox::valueChanged, this, &GoldSpanDialog::updatePreview);
    updatePreview();
}

AnnotationContent GoldSpanDialog::content() const
{
    AnnotationContent c = m_content;
    c.function = FramingFunction(m_function->currentData().toInt());
    c.range = TextRange {m_start->value(), m_end->value()};
    // Attributes belong to a function's schema: another function starts without them.
    if (c.function != m_content.function)
        c.attributes = {};
    return c;
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
