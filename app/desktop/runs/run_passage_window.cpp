#include "app/desktop/runs/run_passage_window.h"

#include "app/desktop/compare/comparison_view.h"
#include "app/desktop/function_style.h"

#include <QHBoxLayout>
#include <QKeySequence>
#include <QLabel>
#include <QPushButton>
#include <QVBoxLayout>

namespace fourfold {

namespace {

// Stand-ins for the two columns, so that the view can hatch the side that has no span.
const CoderId kReferenceColumn {-1};
const CoderId kRunColumn {-2};

} // namespace

RunPassageWindow::RunPassageWindow(QWidget *parent)
    : QWidget(parent, Qt::Window)
{
    setWindowTitle(tr("Passage"));
    m_summary = new QLabel(this);
    m_summary->setWordWrap(true);
    m_summary->setTextInteractionFlags(Qt::TextSelectableByMouse);
    m_summary->setMargin(6);
    m_view = new ComparisonView(this);
    m_previous = new QPushButton(tr("◀ &Previous error"), this);
    m_previous->setObjectName(QStringLiteral("previousError"));
    m_previous->setShortcut(QKeySequence(Qt::SHIFT | Qt::Key_F8));
    m_next = new QPushButton(tr("&Next error ▶"), this);
    m_next->setObjectName(QStringLiteral("nextError"));
    m_next->setShortcut(QKeySequence(Qt::Key_F8));
    auto *top = new QHBoxLayout;
    top->addWidget(m_summary, 1);
    top->addWidget(m_previous, 0, Qt::AlignTop);
    top->addWidget(m_next, 0, Qt::AlignTop);
    auto *layout = new QVBoxLayout(this);
    layout->setContentsMargins(4, 4, 4, 4);
    layout->addLayout(top);
    layout->addWidget(m_view, 1);
    resize(1000, 640);
    auto go = [this](int passage) {
        if (passage < 0 || size_t(passage) >= m_outcomes.size())
            return;
        showCurrent(passage);
        emit outcomeActivated(m_outcomes[size_t(passage)]);
    };
    connect(m_view, &ComparisonView::passageClicked, this, [go](int passage, int) { go(passage); });
    connect(
        m_previous, &QPushButton::clicked, this, [this, go] { go(m_view->currentPassage() - 1); });
    connect(m_next, &QPushButton::clicked, this, [this, go] { go(m_view->currentPassage() + 1); });
}

void RunPassageWindow::setContent(const Article &article, const RunErrors &errors, int current)
{
    m_article = article;
    m_errors = errors;
    m_outcomes.clear();
    int currentPassage = -1;
    for (size_t i = 0; i < m_errors.outcomes.size(); ++i) {
        const RunSpanOutcome &o = m_errors.outcomes[i];
        if (o.article != article.summary.id || !o.isError())
            continue;
        if (int(i) == current)
            currentPassage = int(m_outcomes.size());
        m_outcomes.push_back(int(i));
    }
    setWindowTitle(
        tr("%1 — %2 against %3")
            .arg(article.summary.externalId, m_errors.run,
                m_errors.against.kind == LayerKind::Gold ? tr("gold") : m_errors.against.name));
    showCurrent(currentPassage);
}

int RunPassageWindow::currentOutcome() const
{
    const int p = m_view->currentPassage();
    return p < 0 || size_t(p) >= m_outcomes.size() ? -1 : m_outcomes[size_t(p)];
}

void RunPassageWindow::showCurrent(int passage)
{
    const RunSpanOutcome *chosen = passage >= 0 && size_t(passage) < m_outcomes.size()
        ? &m_errors.outcomes[size_t(m_outcomes[size_t(passage)])]
        : nullptr;
    auto same = [](const std::optional<LayerSpan> &a, const std::optional<LayerSpan> &b) {
        return a && b && a->range == b->range && a->function == b->function;
    };

    ComparisonView::Column reference;
    reference.title = m_errors.against.kind == LayerKind::Gold
        ? tr("Gold")
        : tr("Coder %1").arg(m_errors.against.name);
    reference.coder = kReferenceColumn;
    ComparisonView::Column run;
    run.title = tr("Run %1").arg(m_errors.run);
    run.coder = kRunColumn;
    for (const RunSpanOutcome &o : m_errors.outcomes) {
        if (o.article != m_article.summary.id)
            continue;
        if (o.reference)
            reference.marks.push_back({o.reference->function, o.reference->range, false,
                chosen && same(o.reference, chosen->reference)});
        if (o.predicted)
            run.marks.push_back({o.predicted->function, o.predicted->range, false,
                chosen && same(o.predicted, chosen->predicted)});
    }

    std::vector<Passage> passages;
    for (int index : m_outcomes) {
        const RunSpanOutcome &o = m_errors.outcomes[size_t(index)];
        Passage p;
        p.range = o.range();
        auto mark = [&p](DisagreementKind k) { p.kinds |= 1u << unsigned(k); };
        switch (o.kind) {
        case RunErrorKind::FalsePositive:
            mark(DisagreementKind::Presence);
            p.missing.push_back(kReferenceColumn);
            break;
        case RunErrorKind::Miss:
            mark(DisagreementKind::Presence);
            p.missing.push_back(kRunColumn);
            break;
        case RunErrorKind::WrongFunction:
            mark(DisagreementKind::Function);
            if (o.reference->range != o.predicted->range)
                mark(DisagreementKind::Boundary);
            break;
        case RunErrorKind::Boundary:
            mark(DisagreementKind::Boundary);
            break;
        case RunErrorKind::Correct:
            break;
        }
        passages.push_back(std::move(p));
    }
    std::vector<ComparisonView::Column> columns;
    columns.push_back(std::move(reference));
    columns.push_back(std::move(run));
    m_view->setContent(m_article, std::move(columns), std::move(passages), passage);
    m_view->ensurePassageVisible(passage);

    m_summary->setText(chosen ? summaryOf(*chosen) : tr("No error of the run on this article."));
    m_previous->setEnabled(passage > 0);
    m_next->setEnabled(passage >= 0 && size_t(passage) + 1 < m_outcomes.size());
}

QString RunPassageWindow::summary() const
{
    return m_summary->text();
}

QString RunPassageWindow::summaryOf(const RunSpanOutcome &o) const
{
    const QString ref = m_errors.against.kind == LayerKind::Gold
        ? tr("gold")
        : tr("coder %1").arg(m_errors.against.name);
    // Long quotes keep their beginning and end, where boundary errors show.
    auto quote = [](const QString &q) {
        const QString t = q.simplified();
        return (t.size() <= 90 ? t : t.left(55) + QStringLiteral(" … ") + t.right(30))
            .toHtmlEscaped();
    };
    switch (o.kind) {
    case RunErrorKind::FalsePositive:
        return tr("<b>False positive.</b> The run marks “%1” as %2; %3 has no span there.")
            .arg(quote(o.predictedQuote), functionName(o.predicted->function).toLower(), ref);
    case RunErrorKind::Miss:
        return tr("<b>Miss.</b> %1 marks “%2” as %3; the run has no span there.")
            .arg(ref.left(1).toUpper() + ref.mid(1), quote(o.referenceQuote),
                functionName(o.reference->function).toLower());
    case RunErrorKind::WrongFunction:
        return tr("<b>Wrong function.</b> %1 marks “%2” as %3; the run marks “%4” as %5.")
            .arg(ref.left(1).toUpper() + ref.mid(1), quote(o.referenceQuote),
                functionName(o.reference->function).toLower(), quote(o.predictedQuote),
                functionName(o.predicted->function).toLower());
    case RunErrorKind::Boundary: {
        // How far each end of the run's span lies from the reference's, in characters (code
        // points).
        auto shift = [](qint64 delta) {
            if (delta == 0)
                return tr("at the same place");
            return delta < 0 ? tr("%n character(s) earlier", nullptr, int(-delta))
                             : tr("%n character(s) later", nullptr, int(delta));
        };
        auto range = [](const TextRange &r) {
            return QStringLiteral("[%1, %2)").arg(r.start).arg(r.end);
        };
        return tr("<b>Boundary.</b> Both mark %1 here. Compared with the span of %2, the run's "
                  "starts %3 and ends %4.<br>%5: “%6” %7<br>Run: “%8” %9")
            .arg(functionName(o.reference->function).toLower(), ref,
                shift(o.predicted->range.start - o.reference->range.start),
                shift(o.predicted->range.end - o.reference->range.end),
                ref.left(1).toUpper() + ref.mid(1), quote(o.referenceQuote),
                range(o.reference->range), quote(o.predictedQuote), range(o.predicted->range));
    }
    case RunErrorKind::Correct:
        break;
    }
    return {};
}

} // namespace fourfold
