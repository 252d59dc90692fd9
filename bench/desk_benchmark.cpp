// The reading desk's speed on a long article: a synthetic text of WORDS words (default 20,000)
// with SPANS spans (default 2,000) of all four functions, many overlapping. Prints
//   - time to first paint: construct the ReadingView, setArticle, setSpans, show, and the first
//     paint event processed (target under 200 ms);
//   - time to add one span: setSpans with one span more (inside the visible page) and a
//     synchronous repaint of the viewport (target under 16 ms, one frame at 60 Hz), as the
//     median and the maximum of ROUNDS additions;
//   - time to scroll to the last span right after the first paint (lays out the whole text)
//     and to repaint there, then to jump to the middle.
// The segmentation (ICU, done once at import in the real program) is timed separately.
// Build in a Release tree; runs on the offscreen platform unless QT_QPA_PLATFORM is set.
//
//   desk_benchmark [WORDS=20000] [SPANS=2000] [ROUNDS=50]

#include "app/desktop/reading_view.h"
#include "core/model/paragraph_role.h"
#include "core/text/offset_map.h"
#include "core/text/segmenter.h"

#include <QApplication>
#include <QElapsedTimer>
#include <QScrollBar>

#include <algorithm>
#include <cstdio>
#include <random>

using namespace fourfold;

namespace {

// Invented filler vocabulary (Latin letters with accents, digits, punctuation), so that the
// text has code points wider than one UTF-8 byte and word tokens of several kinds.
const char *const kWords[] = {"ferry", "council", "budget", "harbour", "residents", "dyke",
    "turbine", "market", "square", "crossing", "subsidy", "vote", "café", "naïve", "Straße", "über",
    "detour", "because", "should", "must", "unfair", "1,900", "£410,000", "Tillney", "Harbrook",
    "Marrevoort", "windpark", "council’s", "timetable", "pier"};

Article makeArticle(std::mt19937 &rng, int words)
{
    std::uniform_int_distribution<std::size_t> word(0, std::size(kWords) - 1);
    std::uniform_int_distribution<int> sentenceLength(6, 24);
    std::uniform_int_distribution<int> paragraphLength(2, 6);
    QString text;
    int written = 0;
    while (written < words) {
        if (!text.isEmpty())
            text += QStringLiteral("\n\n");
        const int sentences = paragraphLength(rng);
        for (int s = 0; s < sentences && written < words; ++s) {
            if (s > 0)
                text += QLatin1Char(' ');
            const int length = sentenceLength(rng);
            for (int w = 0; w < length && written < words; ++w, ++written) {
                QString next = QString::fromUtf8(kWords[word(rng)]);
                if (w == 0)
                    next[0] = next[0].toUpper();
                if (w > 0)
                    text += QLatin1Char(' ');
                text += next;
            }
            text += QLatin1Char('.');
        }
    }
    Article article;
    article.text = text;
    article.summary.language = QStringLiteral("en");
    return article;
}

std::vector<Annotation> makeSpans(std::mt19937 &rng, const Article &article, int count)
{
    std::uniform_int_distribution<std::size_t> token(0, article.tokens.size() - 1);
    std::uniform_int_distribution<std::size_t> length(0, 14);
    std::uniform_int_distribution<int> function(0, 3);
    std::vector<Annotation> spans;
    spans.reserve(std::size_t(count));
    for (int i = 0; i < count; ++i) {
        const std::size_t first = token(rng);
        const std::size_t last = std::min(article.tokens.size() - 1, first + length(rng));
        Annotation a;
        a.id = AnnotationId {i + 1};
        a.content.function = FramingFunction(function(rng));
        a.content.range = {article.tokens[first].start, article.tokens[last].end};
        spans.push_back(a);
    }
    return spans;
}

double ms(const QElapsedTimer &timer)
{
    return double(timer.nsecsElapsed()) / 1e6;
}

// Counts the paint events the view's viewport receives.
class PaintCounter : public QObject
{
public:
    int count = 0;

protected:
    bool eventFilter(QObject *watched, QEvent *event) override
    {
        if (event->type() == QEvent::Paint)
            ++count;
        return QObject::eventFilter(watched, event);
    }
};

} // namespace

int main(int argc, char *argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    const int words = argc > 1 ? std::max(1, std::atoi(argv[1])) : 20000;
    const int spanCount = argc > 2 ? std::max(1, std::atoi(argv[2])) : 2000;
    const int rounds = argc > 3 ? std::max(1, std::atoi(argv[3])) : 50;

    std::mt19937 rng(20240611);
    Article article = makeArticle(rng, words);
    QElapsedTimer timer;
    timer.start();
    Result<Segmentation> segmentation = segmentText(article.text, article.summary.language);
    if (!segmentation) {
        std::fprintf(
            stderr, "segmentation failed: %s\n", qPrintable(segmentation.error().toString()));
        return 1;
    }
    const double segmentMs = ms(timer);
    for (std::size_t i = 0; i < segmentation->paragraphs.size(); ++i)
        article.paragraphs.push_back({segmentation->paragraphs[i],
            defaultParagraphRole(qsizetype(i), qsizetype(segmentation->paragraphs.size()))});
    article.sentences = segmentation->sentences;
    article.tokens = segmentation->tokens;
    std::vector<Annotation> spans = makeSpans(rng, article, spanCount);

    std::printf("article: %d words, %lld UTF-16 units, %zu paragraphs, %zu tokens; %zu spans\n",
        words, qint64(article.text.size()), article.paragraphs.size(), article.tokens.size(),
        spans.size());
    std::printf("segmentation (import time, not part of the desk): %.1f ms\n", segmentMs);

    // Time to first paint.
    PaintCounter counter;
    timer.restart();
    auto *view = new ReadingView;
    view->viewport()->installEventFilter(&counter);
    view->resize(1000, 800);
    view->setArticle(article);
    view->setSpans(spans);
    const double loadMs = ms(timer);
    view->show();
    QElapsedTimer wait;
    wait.start();
    while (counter.count == 0 && wait.elapsed() < 5000)
        QCoreApplication::processEvents(QEventLoop::AllEvents, 5);
    const double firstPaintMs = ms(timer);
    std::printf("first paint: %.1f ms (construct + setArticle + setSpans: %.1f ms)%s\n",
        firstPaintMs, loadMs, counter.count == 0 ? "  [no paint event seen]" : "");

    // Jump to the far end at once, before the lazy layout has caught up: lays out the whole text.
    const auto last =
        std::max_element(spans.begin(), spans.end(), [](const Annotation &a, const Annotation &b) {
            return a.content.range.start < b.content.range.start;
        });
    timer.restart();
    view->scrollToSpan(last->id);
    view->viewport()->repaint();
    std::printf(
        "scroll to the last span + repaint, right after the first paint: %.1f ms (at %d of %d)\n",
        ms(timer), view->verticalScrollBar()->value(), view->verticalScrollBar()->maximum());
    timer.restart();
    view->verticalScrollBar()->setValue(view->verticalScrollBar()->value() / 2);
    view->viewport()->repaint();
    std::printf("jump to the middle + repaint: %.1f ms\n", ms(timer));
    view->verticalScrollBar()->setValue(0);

    // Let the lazy layout of the rest of the text finish, as it would while the coder reads.
    QElapsedTimer settle;
    settle.start();
    while (settle.elapsed() < 300)
        QCoreApplication::processEvents(QEventLoop::AllEvents, 5);

    // Time to add one span inside the visible page.
    const OffsetMap map(article.text);
    const int middle = view->viewport()->width() / 2;
    const qint64 firstVisible =
        map.codePointFromUtf16(view->cursorForPosition(QPoint(middle, 10)).position());
    const qint64 lastVisible = map.codePointFromUtf16(
        view->cursorForPosition(QPoint(middle, view->viewport()->height() - 10)).position());
    std::vector<std::size_t> visibleTokens;
    for (std::size_t i = 0; i < article.tokens.size(); ++i) {
        if (article.tokens[i].start >= firstVisible && article.tokens[i].end <= lastVisible)
            visibleTokens.push_back(i);
    }
    if (visibleTokens.size() < 4) {
        std::fprintf(stderr, "too few visible tokens\n");
        return 1;
    }
    std::vector<double> addMs;
    std::uniform_int_distribution<std::size_t> pick(0, visibleTokens.size() - 4);
    for (int round = 0; round < rounds; ++round) {
        const std::size_t first = visibleTokens[pick(rng)];
        Annotation a;
        a.id = AnnotationId {spanCount + round + 1};
        a.content.function = FramingFunction(round % 4);
        a.content.range = {article.tokens[first].start, article.tokens[first + 3].end};
        spans.push_back(a);
        const int before = counter.count;
        timer.restart();
        view->setSpans(spans);
        view->viewport()->repaint();
        addMs.push_back(ms(timer));
        if (counter.count == before)
            std::printf("  [round %d: no synchronous paint]\n", round);
    }
    std::sort(addMs.begin(), addMs.end());
    std::printf("add one span + repaint: median %.2f ms, max %.2f ms over %d rounds (%zu spans)\n",
        addMs[addMs.size() / 2], addMs.back(), rounds, spans.size());

    delete view;
    return 0;
}
