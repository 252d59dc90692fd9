#include "app/desktop/message_bar.h"

#include "app/colour/colour.h"

#include <QApplication>
#include <QHBoxLayout>
#include <QLabel>
#include <QPlainTextEdit>
#include <QStyle>
#include <QTextDocument>
#include <QTimer>
#include <QToolButton>
#include <QVBoxLayout>

#include <algorithm>

namespace fourfold {

namespace {

// A tint of the window colour towards the kind's colour, dark enough text either way.
QColor tint(MessageBar::Kind kind, const QColor &window)
{
    QColor towards;
    switch (kind) {
    case MessageBar::Kind::Information:
        towards = QColor(0x3F, 0x6C, 0xA6);
        break;
    case MessageBar::Kind::Success:
        towards = QColor(0x1E, 0x6B, 0x3A);
        break;
    case MessageBar::Kind::Warning:
        towards = QColor(0xB0, 0x7A, 0x00);
        break;
    case MessageBar::Kind::Error:
        towards = QColor(0xA1, 0x3A, 0x1C);
        break;
    }
    return mixColours(window, towards, 0.18);
}

QStyle::StandardPixmap iconOf(MessageBar::Kind kind)
{
    switch (kind) {
    case MessageBar::Kind::Information:
    case MessageBar::Kind::Success:
        return QStyle::SP_MessageBoxInformation;
    case MessageBar::Kind::Warning:
        return QStyle::SP_MessageBoxWarning;
    case MessageBar::Kind::Error:
        break;
    }
    return QStyle::SP_MessageBoxCritical;
}

QString withoutMnemonic(QString text)
{
    return text.remove(QLatin1Char('&'));
}

} // namespace

MessageBar::MessageBar(QWidget *parent)
    : QFrame(parent)
{
    setFrameShape(QFrame::StyledPanel);
    setAutoFillBackground(true);
    setAccessibleName(tr("Message"));
    auto *column = new QVBoxLayout(this);
    column->setContentsMargins(8, 4, 4, 4);
    auto *row = new QHBoxLayout;
    m_icon = new QLabel(this);
    m_text = new QLabel(this);
    m_text->setTextFormat(Qt::PlainText);
    m_text->setWordWrap(true);
    m_text->setTextInteractionFlags(Qt::TextSelectableByMouse);
    m_text->setSizePolicy(QSizePolicy::Expanding, QSizePolicy::Preferred);
    row->addWidget(m_icon, 0, Qt::AlignTop);
    row->addWidget(m_text, 1);
    m_buttons = new QHBoxLayout;
    row->addLayout(m_buttons);
    m_detailsButton = new QToolButton(this);
    m_detailsButton->setText(tr("&Details"));
    m_detailsButton->setCheckable(true);
    row->addWidget(m_detailsButton);
    m_close = new QToolButton(this);
    m_close->setText(QStringLiteral("✕"));
    m_close->setAutoRaise(true);
    m_close->setAccessibleName(tr("Close the message"));
    m_close->setToolTip(tr("Close the message"));
    row->addWidget(m_close);
    column->addLayout(row);
    m_details = new QPlainTextEdit(this);
    m_details->setReadOnly(true);
    m_details->setAccessibleName(tr("Details of the message"));
    m_details->hide();
    column->addWidget(m_details);
    connect(m_detailsButton, &QToolButton::toggled, m_details, &QWidget::setVisible);
    connect(m_close, &QToolButton::clicked, this, &MessageBar::dismiss);
    hide();
}

void MessageBar::showMessage(Kind kind, const QString &text, std::vector<Action> actions,
    const QString &details, int seconds)
{
    ++m_generation;
    m_kind = kind;
    QPalette p = palette();
    p.setColor(QPalette::Window, tint(kind, QApplication::palette().color(QPalette::Window)));
    setPalette(p);
    const int size = style()->pixelMetric(QStyle::PM_SmallIconSize, nullptr, this);
    m_icon->setPixmap(style()->standardIcon(iconOf(kind), nullptr, this).pixmap(size, size));
    m_text->setText(text);
    clearActions();
    for (Action &action : actions) {
        auto *button = new QToolButton(this);
        button->setText(action.text);
        connect(button, &QToolButton::clicked, this, [this, run = std::move(action.run)] {
            dismiss();
            if (run)
                run();
        });
        m_buttons->addWidget(button);
        m_actionButtons.push_back(button);
    }
    m_details->setPlainText(details);
    // As tall as the details, up to eight lines (then it scrolls).
    const int lines = std::min(int(details.count(QLatin1Char('\n'))) + 1, 8);
    m_details->setFixedHeight(lines * m_details->fontMetrics().lineSpacing()
        + 2 * m_details->frameWidth() + int(2 * m_details->document()->documentMargin()) + 6);
    m_detailsButton->setChecked(false);
    m_detailsButton->setVisible(!details.isEmpty());
    m_details->hide();
    show();
    if (seconds > 0 && (kind == Kind::Information || kind == Kind::Success)) {
        const int generation = m_generation;
        QTimer::singleShot(seconds * 1000, this, [this, generation] {
            if (generation == m_generation)
                dismiss();
        });
    }
}

void MessageBar::dismiss()
{
    ++m_generation;
    hide();
}

QString MessageBar::text() const
{
    return m_text->text();
}

QString MessageBar::details() const
{
    return m_details->toPlainText();
}

QStringList MessageBar::actionTexts() const
{
    QStringList out;
    for (const QToolButton *b : m_actionButtons)
        out << withoutMnemonic(b->text());
    return out;
}

bool MessageBar::trigger(const QString &text)
{
    for (QToolButton *b : m_actionButtons)
        if (withoutMnemonic(b->text()) == withoutMnemonic(text)) {
            b->click();
            return true;
        }
    return false;
}

void MessageBar::clearActions()
{
    for (QToolButton *b : m_actionButtons)
        b->deleteLater();
    m_actionButtons.clear();
}

} // namespace fourfold
