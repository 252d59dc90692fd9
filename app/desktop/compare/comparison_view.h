#pragma once
// One article shown once per coder (and for gold), side by side, scrolled together. Every column
// lays out the same paragraph at the same width, so paragraphs and lines stay aligned across
// columns. Spans are drawn as in the reading desk: one lane per function under each line, the
// function's colour and line pattern (function_style.h). Passages with a disagreement carry a
// mark in the left gutter (its kind as a symbol); the current passage is banded across every
// column; a coder without a span in a passage has the passage hatched in their column.
// Positions in this class's API are code-point ranges (TextRange) and passage indices; inside,
// Qt's UTF-16 positions are Utf16Range, converted with OffsetMap.

#include "core/agreement/disagreements.h"
#include "core/model/article.h"
#include "core/text/offset_map.h"

#include <QAbstractScrollArea>
#include <QTextLayout>

#include <memory>
#include <vector>

namespace fourfold {

class ComparisonView : public QAbstractScrollArea
{
    Q_OBJECT
public:
    struct Mark {
        FramingFunction function = FramingFunction::Problem;
        TextRange range; // code points
        bool rejected = false;
        bool selected = false;
    };
    struct Column {
        QString title; // "C01", "Gold"
        CoderId coder; // invalid for gold
        std::vector<Mark> marks;
    };

    explicit ComparisonView(QWidget *parent = nullptr);
    ~ComparisonView() override;

    // Shows `article` with its columns and passages; `current` is the banded passage (-1: none).
    void setContent(const Article &article, std::vector<Column> columns,
        std::vector<Passage> passages, int current);
    void setCurrentPassage(int index);
    int currentPassage() const { return m_current; }
    // Scrolls so that the passage is in view (centred if it was not).
    void ensurePassageVisible(int index);
    // The number of paragraphs laid out (for tests).
    qsizetype paragraphCount() const { return m_paragraphs.size(); }

signals:
    // The user clicked inside a passage (index) in the given column (-1 in the gutter).
    void passageClicked(int passage, int column);

protected:
    void paintEvent(QPaintEvent *e) override;
    void resizeEvent(QResizeEvent *e) override;
    void mousePressEvent(QMouseEvent *e) override;
    void changeEvent(QEvent *e) override;
    bool viewportEvent(QEvent *e) override;

private:
    struct Para {
        Utf16Range range16; // into the article's UTF-16 text
        std::unique_ptr<QTextLayout> layout;
        qreal top = 0; // in content coordinates
        qreal height = 0;
    };
    void relayout();
    qreal columnWidth() const;
    qreal columnLeft(int column) const;
    qreal headerHeight() const;
    qreal lineAdvance() const;
    qreal lanePitch() const;
    // Rectangles (content coordinates, relative to a column's left edge) covering `range16`.
    std::vector<QRectF> lineRects(const Utf16Range &range16) const;
    int passageAt(qint64 pos16) const;
    QString kindSymbols(const Passage &p) const;
    QString passageToolTip(const Passage &p) const;

    Article m_article;
    OffsetMap m_map {QString()};
    std::vector<Column> m_columns;
    std::vector<Passage> m_passages;
    std::vector<Utf16Range> m_passages16;
    int m_current = -1;
    std::vector<Para> m_paragraphs;
    qreal m_contentHeight = 0;
    qreal m_layoutWidth = -1;
};

} // namespace fourfold
