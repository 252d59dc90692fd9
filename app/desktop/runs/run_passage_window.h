#pragma once
// One article with the reference (gold or a coder) and an extractor run side by side, for the
// extractor window's error browser: every span of both in its function's lanes, each error of
// the run on this article marked in the gutter (∅ a span without partner, ≠ wrong function,
// ↔ boundary), the chosen error banded and its spans tinted. Clicking another marked passage,
// or Previous / Next error (Shift+F8 / F8), makes its error the current one.

#include "core/model/article.h"
#include "core/scoring/run_errors.h"

#include <QWidget>

#include <vector>

class QLabel;
class QPushButton;

namespace fourfold {

class ComparisonView;

class RunPassageWindow : public QWidget
{
    Q_OBJECT
public:
    explicit RunPassageWindow(QWidget *parent = nullptr);

    // Shows `article` with the spans of `errors` on it and makes errors.outcomes[current] the
    // current passage (it must lie on this article).
    void setContent(const Article &article, const RunErrors &errors, int current);
    // The index (into RunErrors::outcomes) of the current error, -1 if none.
    int currentOutcome() const;
    // The indices (into RunErrors::outcomes) of the errors marked on this article, in order.
    const std::vector<int> &markedOutcomes() const { return m_outcomes; }
    ComparisonView *view() const { return m_view; }
    QString summary() const;

signals:
    // The user clicked another error's passage.
    void outcomeActivated(int outcomeIndex);

private:
    void showCurrent(int passage);
    QString summaryOf(const RunSpanOutcome &o) const;

    ComparisonView *m_view = nullptr;
    QLabel *m_summary = nullptr;
    QPushButton *m_previous = nullptr;
    QPushButton *m_next = nullptr;
    Article m_article;
    RunErrors m_errors;
    std::vector<int> m_outcomes; // one per passage of the view
};

} // namespace fourfold
