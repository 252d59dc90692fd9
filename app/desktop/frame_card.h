#pragma once
// The article's frame card: its decomposition into the four framing functions at a glance. Each
// function has a section, always all four and always in the order problem, cause, evaluation,
// remedy: a header with the function's badge, name and number of spans, then its spans as
// one-line quotes in reading order. A function with nothing coded keeps its section and says so,
// because a missing function is itself part of how an article frames its issue. In a lead's view
// of every coder's spans each quote says whose it is (the coder's pseudonym, never a name).

#include "core/model/annotation.h"

#include <QHash>
#include <QWidget>

#include <array>
#include <vector>

class QLabel;
class QScrollArea;
class QVBoxLayout;

namespace fourfold {

class FrameCard : public QWidget
{
    Q_OBJECT
public:
    explicit FrameCard(QWidget *parent = nullptr);

    // Shows `spans`, the spans of one article whose canonical text is `articleText`. Deleted
    // spans are left out. A span's quote is its stored Annotation::quote; only if that is empty
    // is it cut from `articleText` at the span's code-point range. Keeps the selected span and
    // the keyboard's current quote if they are still among `spans`; if nothing shown changes
    // (an edit of a note or an attribute), the quotes themselves stay as they are.
    void setSpans(const QString &articleText, const std::vector<Annotation> &spans);
    // The pseudonyms of the spans' coders, by coder id: when set (a lead showing every coder's
    // spans), each quote starts with its coder's pseudonym, and its tooltip and accessible name
    // name it. Empty (the default): one person's spans, no names. Call setSpans() after it.
    void setSpanOwners(const QHash<qint64, QString> &pseudonymByCoder);
    // The pseudonym shown with span `id`'s quote, or empty.
    QString spanOwner(AnnotationId id) const;
    // Marks the quote of span `id` as selected and scrolls it into view. An id that is not on
    // the card, or an invalid id, clears the mark.
    void setSelectedSpan(AnnotationId id);
    // The marked span, or an invalid id.
    AnnotationId selectedSpan() const { return m_selected; }

signals:
    // The user clicked a quote, or pressed Space or Enter on the current one, to go to span `id`.
    void spanActivated(AnnotationId id);

protected:
    // The card is one stop in the tab order, like a list: Up/Down (Home/End) move through the
    // quotes in the order shown, Space or Enter activates the current one.
    void keyPressEvent(QKeyEvent *event) override;
    void focusInEvent(QFocusEvent *event) override;
    void focusOutEvent(QFocusEvent *event) override;

private:
    struct Section {
        QLabel *header = nullptr; // the function's name
        QLabel *count = nullptr; // the number of spans
        QLabel *empty = nullptr; // shown when nothing is coded
        QVBoxLayout *quotes = nullptr;
    };
    // What a quote shows; the card is rebuilt only when this changes.
    struct Shown {
        AnnotationId id;
        FramingFunction function;
        TextRange range;
        QString quote;
        QString owner; // the coder's pseudonym, or empty
        friend bool operator==(const Shown &, const Shown &) = default;
    };
    QWidget *makeSection(FramingFunction function, Section &section);
    void rebuild();
    void setCurrent(int index);
    void updateMarks();

    QScrollArea *m_scroll = nullptr;
    std::array<Section, 4> m_sections;
    std::vector<Shown> m_shown; // in the order shown: by function, then reading order
    std::vector<QWidget *> m_quoteButtons; // one per entry of m_shown
    QHash<qint64, QString> m_owners; // pseudonym by coder id (setSpanOwners)
    AnnotationId m_selected;
    int m_current = -1; // index of the keyboard's current quote, or -1
};

} // namespace fourfold
