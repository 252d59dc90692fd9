#include "app/desktop/frame_card.h"

#include "app/desktop/function_style.h"
#include "app/desktop/span_quote.h"
#include "core/text/offset_map.h"

#include <QAbstractButton>
#include <QAccessible>
#include <QGridLayout>
#include <QHBoxLayout>
#include <QKeyEvent>
#include <QLabel>
#include <QLocale>
#include <QPainter>
#include <QScrollArea>
#include <QVBoxLayout>

#include <algorithm>
#include <cmath>

namespace fourfold {

namespace {

// The function's letter on its colour.
class FunctionBadge : public QWidget
{
public:
    FunctionBadge(FramingFunction function, QWidget *parent)
        : QWidget(parent)
        , m_style(functionStyle(function))
    {
        setSizePolicy(QSizePolicy::Fixed, QSizePolicy::Fixed);
    }
    QSize sizeHint() const override
    {
        const int h = fontMetrics().height() + 2;
        return {h, h};
    }

protected:
    void paintEvent(QPaintEvent *) override
    {
        QPainter p(this);
        p.setRenderHint(QPainter::Antialiasing);
        p.setPen(Qt::NoPen);
        p.setBrush(m_style.colour);
        p.drawRoundedRect(QRectF(rect()), 3, 3);
        QFont f = font();
        f.setBold(true);
        p.setFont(f);
        p.setPen(badgeTextColour(m_style.colour));
        p.drawText(rect(), Qt::AlignCenter, QString(m_style.letter));
    }

private:
    FunctionStyle m_style;
};

// The vertical rule beside a function's quotes, in the function's colour and line pattern, so
// that the sections differ by more than colour.
class FunctionRule : public QWidget
{
public:
    FunctionRule(FramingFunction function, QWidget *parent)
        : QWidget(parent)
        , m_style(functionStyle(function))
    {
        setSizePolicy(QSizePolicy::Fixed, QSizePolicy::Preferred);
    }
    QSize sizeHint() const override { return {fontMetrics().height() + 2, 1}; }

protected:
    void paintEvent(QPaintEvent *) override
    {
        QPainter p(this);
        QPen pen(m_style.colour, 3, m_style.line, Qt::FlatCap);
        p.setPen(pen);
        const qreal x = width() / 2.0;
        p.drawLine(QPointF(x, 2), QPointF(x, height() - 2));
    }

private:
    FunctionStyle m_style;
};

// One span as a one-line quote: elided to the width it gets, focusable, clickable. With an owner
// (a lead's view of every coder's spans) the coder's pseudonym stands before the quote, in a
// column `ownerWidth` pixels wide that the card gives all its quotes alike.
class QuoteButton : public QAbstractButton
{
public:
    QuoteButton(const QString &quote, const QString &owner, int ownerWidth, QWidget *parent)
        : QAbstractButton(parent)
        , m_owner(owner)
        , m_ownerWidth(owner.isEmpty() ? 0 : ownerWidth)
    {
        setText(spanQuote(quote.simplified()));
        // The card takes the focus and moves through its quotes itself.
        setFocusPolicy(Qt::NoFocus);
        setCursor(Qt::PointingHandCursor);
        setAttribute(Qt::WA_Hover);
        setSizePolicy(QSizePolicy::Expanding, QSizePolicy::Fixed);
        const QString tip = owner.isEmpty()
            ? text().toHtmlEscaped()
            : FrameCard::tr("%1 \u00B7 %2").arg(owner.toHtmlEscaped(), text().toHtmlEscaped());
        setToolTip(QStringLiteral("<p>%1</p>").arg(tip));
    }
    const QString &owner() const { return m_owner; }
    void setMarks(bool selected, bool current)
    {
        if (selected != m_selected || current != m_current) {
            m_selected = selected;
            m_current = current;
            update();
        }
    }
    QSize sizeHint() const override
    {
        const QFontMetrics fm = fontMetrics();
        return {std::min(fm.horizontalAdvance(text()), fm.averageCharWidth() * 30) + 2 * kPad
                + ownerSpace(),
            fm.height() + 2 * kPad};
    }
    QSize minimumSizeHint() const override
    {
        const QFontMetrics fm = fontMetrics();
        return {fm.averageCharWidth() * 8 + ownerSpace(), fm.height() + 2 * kPad};
    }
    // The font the pseudonym is drawn in (FrameCard measures its column with it).
    static QFont ownerFont(QFont font)
    {
        font.setBold(true);
        font.setPointSizeF(font.pointSizeF() * 0.85);
        return font;
    }

protected:
    void paintEvent(QPaintEvent *) override
    {
        QPainter p(this);
        p.setRenderHint(QPainter::Antialiasing);
        const QRectF box = QRectF(rect()).adjusted(0.5, 0.5, -0.5, -0.5);
        QColor ink = palette().color(QPalette::WindowText);
        if (m_selected) {
            p.setPen(Qt::NoPen);
            p.setBrush(palette().highlight());
            p.drawRoundedRect(box, 3, 3);
            ink = palette().color(QPalette::HighlightedText);
        } else if (underMouse() || isDown()) {
            QColor hover = palette().color(QPalette::Highlight);
            hover.setAlphaF(0.18f);
            p.setPen(Qt::NoPen);
            p.setBrush(hover);
            p.drawRoundedRect(box, 3, 3);
        }
        if (m_current) {
            p.setPen(QPen(m_selected ? ink : palette().color(QPalette::Highlight), 1));
            p.setBrush(Qt::NoBrush);
            p.drawRoundedRect(box, 3, 3);
        }
        if (!m_owner.isEmpty()) {
            // Quieter than the quote, unless the quote is selected (then the highlight's ink).
            QColor quiet = ink;
            if (!m_selected)
                quiet = palette().color(QPalette::PlaceholderText);
            p.setPen(quiet);
            p.setFont(ownerFont(font()));
            p.drawText(
                QRect(kPad, 0, m_ownerWidth, height()), Qt::AlignLeft | Qt::AlignVCenter, m_owner);
            p.setFont(font());
        }
        p.setPen(ink);
        const QRect textBox = rect().adjusted(kPad + ownerSpace(), 0, -kPad, 0);
        p.drawText(textBox, Qt::AlignLeft | Qt::AlignVCenter,
            fontMetrics().elidedText(text(), Qt::ElideRight, textBox.width()));
    }

private:
    static constexpr int kPad = 3;
    // The pseudonym's column and the gap after it, or nothing.
    int ownerSpace() const { return m_ownerWidth == 0 ? 0 : m_ownerWidth + 2 * kPad; }
    QString m_owner;
    int m_ownerWidth = 0;
    bool m_selected = false;
    bool m_current = false; // the keyboard's current quote while the card has the focus
};

} // namespace

FrameCard::FrameCard(QWidget *parent)
    : QWidget(parent)
{
    setAccessibleName(tr("Frame card"));
    setFocusPolicy(Qt::StrongFocus);
    auto *content = new QWidget;
    auto *column = new QVBoxLayout(content);
    column->setSpacing(fontMetrics().height() / 2);
    for (FramingFunction f : kFramingFunctions)
        column->addWidget(makeSection(f, m_sections[size_t(f)]));
    column->addStretch(1);

    m_scroll = new QScrollArea(this);
    m_scroll->setWidget(content);
    m_scroll->setWidgetResizable(true);
    m_scroll->setFrameShape(QFrame::NoFrame);
    m_scroll->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    m_scroll->setFocusPolicy(Qt::NoFocus);
    auto *outer = new QVBoxLayout(this);
    outer->setContentsMargins(0, 0, 0, 0);
    outer->addWidget(m_scroll);
    rebuild();
}

QWidget *FrameCard::makeSection(FramingFunction function, Section &section)
{
    auto *box = new QWidget;
    box->setObjectName(QStringLiteral("section-%1").arg(functionKey(function)));
    auto *grid = new QGridLayout(box);
    grid->setContentsMargins(0, 0, 0, 0);
    grid->setHorizontalSpacing(fontMetrics().averageCharWidth());
    grid->setVerticalSpacing(2);
    grid->addWidget(new FunctionBadge(function, box), 0, 0, Qt::AlignCenter);

    section.header = new QLabel(functionName(function), box);
    QFont bold = section.header->font();
    bold.setBold(true);
    section.header->setFont(bold);
    section.count = new QLabel(box);
    section.count->setObjectName(QStringLiteral("count"));
    section.count->setFont(bold);
    auto *headerRow = new QHBoxLayout;
    headerRow->addWidget(section.header);
    headerRow->addStretch(1);
    headerRow->addWidget(section.count);
    grid->addLayout(headerRow, 0, 1);

    grid->addWidget(new FunctionRule(function, box), 1, 0);
    section.quotes = new QVBoxLayout;
    section.quotes->setSpacing(0);
    section.empty = new QLabel(tr("— nothing coded yet"), box);
    section.empty->setObjectName(QStringLiteral("empty"));
    section.empty->setIndent(3); // in line with the quotes' text
    section.empty->setForegroundRole(QPalette::PlaceholderText);
    QFont italic = section.empty->font();
    italic.setItalic(true);
    section.empty->setFont(italic);
    section.quotes->addWidget(section.empty);
    grid->addLayout(section.quotes, 1, 1);
    grid->setColumnStretch(1, 1);
    return box;
}

void FrameCard::setSpans(const QString &articleText, const std::vector<Annotation> &spans)
{
    std::vector<Shown> shown;
    for (const Annotation &a : spans)
        if (!a.deleted)
            shown.push_back({a.id, a.content.function, a.content.range,
                a.quote.isEmpty() ? OffsetMap::slice(articleText, a.content.range) : a.quote,
                m_owners.value(a.coder.value)});
    std::ranges::stable_sort(shown, [](const Shown &a, const Shown &b) {
        return std::tuple(a.function, a.range.start, a.range.end)
            < std::tuple(b.function, b.range.start, b.range.end);
    });
    // Most edits (an attribute, a note) change nothing the card shows; it then stays as it is,
    // and so do the mouse press and the keyboard position on it.
    if (shown == m_shown && !m_quoteButtons.empty())
        return;
    const AnnotationId current = m_current >= 0 ? m_shown[size_t(m_current)].id : AnnotationId {};
    m_shown = std::move(shown);
    m_current = -1;
    for (size_t i = 0; i < m_shown.size(); ++i)
        if (m_shown[i].id == current)
            m_current = int(i);
    if (std::ranges::find(m_shown, m_selected, &Shown::id) == m_shown.end())
        m_selected = {};
    rebuild();
}

void FrameCard::setSpanOwners(const QHash<qint64, QString> &pseudonymByCoder)
{
    m_owners = pseudonymByCoder;
}

QString FrameCard::spanOwner(AnnotationId id) const
{
    const auto found = std::ranges::find(m_shown, id, &Shown::id);
    return found == m_shown.end() ? QString() : found->owner;
}

void FrameCard::rebuild()
{
    // A handler of spanActivated may call setSpans() while the clicked quote is still emitting,
    // so old quotes are deleted later, never at once.
    for (QWidget *b : m_quoteButtons) {
        b->hide();
        b->deleteLater();
    }
    m_quoteButtons.clear();

    // One column for the pseudonyms, as wide as the widest of them.
    const QFontMetrics ownerMetrics(QuoteButton::ownerFont(font()));
    int ownerWidth = 0;
    for (const Shown &q : m_shown)
        ownerWidth = std::max(ownerWidth, ownerMetrics.horizontalAdvance(q.owner));
    std::array<int, 4> counts {};
    for (size_t i = 0; i < m_shown.size(); ++i) {
        const Shown &q = m_shown[i];
        Section &s = m_sections[size_t(q.function)];
        auto *button = new QuoteButton(q.quote, q.owner, ownerWidth, s.empty->parentWidget());
        button->setAccessibleName(q.owner.isEmpty()
                ? tr("%1: %2").arg(functionName(q.function), button->text())
                : tr("%1, coded by %2: %3").arg(functionName(q.function), q.owner, button->text()));
        const AnnotationId id = q.id;
        connect(button, &QAbstractButton::clicked, this, [this, i, id] {
            setCurrent(int(i));
            emit spanActivated(id);
        });
        s.quotes->addWidget(button);
        m_quoteButtons.push_back(button);
        ++counts[size_t(q.function)];
    }

    for (FramingFunction f : kFramingFunctions) {
        Section &s = m_sections[size_t(f)];
        const int n = counts[size_t(f)];
        s.count->setText(QLocale().toString(n));
        s.count->setForegroundRole(n == 0 ? QPalette::PlaceholderText : QPalette::WindowText);
        s.count->setAccessibleName(tr("%n span(s)", nullptr, n));
        s.empty->setVisible(n == 0);
        s.header->setAccessibleName(tr("%1: %n span(s)", nullptr, n).arg(functionName(f)));
    }
    updateMarks();
}

void FrameCard::setSelectedSpan(AnnotationId id)
{
    const auto found = std::ranges::find(m_shown, id, &Shown::id);
    m_selected = id.isValid() && found != m_shown.end() ? id : AnnotationId {};
    updateMarks();
    if (m_selected.isValid()) {
        m_current = int(found - m_shown.begin());
        m_scroll->ensureWidgetVisible(m_quoteButtons[size_t(m_current)]);
    }
}

void FrameCard::setCurrent(int index)
{
    if (m_shown.empty())
        return;
    m_current = std::clamp(index, 0, int(m_shown.size()) - 1);
    updateMarks();
    QWidget *button = m_quoteButtons[size_t(m_current)];
    m_scroll->ensureWidgetVisible(button);
    if (hasFocus() && QAccessible::isActive()) {
        QAccessibleEvent moved(button, QAccessible::Focus);
        QAccessible::updateAccessibility(&moved);
    }
}

void FrameCard::keyPressEvent(QKeyEvent *event)
{
    switch (event->key()) {
    case Qt::Key_Down:
        setCurrent(m_current + 1);
        break;
    case Qt::Key_Up:
        setCurrent(m_current < 0 ? 0 : m_current - 1);
        break;
    case Qt::Key_Home:
        setCurrent(0);
        break;
    case Qt::Key_End:
        setCurrent(int(m_shown.size()) - 1);
        break;
    case Qt::Key_Space:
    case Qt::Key_Return:
    case Qt::Key_Enter:
        if (m_current >= 0)
            emit spanActivated(m_shown[size_t(m_current)].id);
        break;
    default:
        QWidget::keyPressEvent(event);
        return;
    }
    event->accept();
}

void FrameCard::focusInEvent(QFocusEvent *event)
{
    QWidget::focusInEvent(event);
    if (m_current < 0 && !m_shown.empty())
        m_current = 0;
    updateMarks();
}

void FrameCard::focusOutEvent(QFocusEvent *event)
{
    QWidget::focusOutEvent(event);
    updateMarks();
}

void FrameCard::updateMarks()
{
    for (size_t i = 0; i < m_quoteButtons.size(); ++i) {
        const bool selected = m_selected.isValid() && m_shown[i].id == m_selected;
        static_cast<QuoteButton *>(m_quoteButtons[i])
            ->setMarks(selected, hasFocus() && int(i) == m_current);
    }
}

} // namespace fourfold
