// Writes the README's screenshots of the comparison window from the sample project, offscreen:
//   fourfold_compare_screenshots SAMPLE_PROJECT OUT_DIR
// (CMake target `screenshots` runs it into docs/screenshots.) Nothing here is edited by hand.

#include "app/desktop/coding_session.h"
#include "app/desktop/compare/answer_panel.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/compare/disagreement_queue_model.h"
#include "app/desktop/compare/gold_span_dialog.h"
#include "core/text/offset_map.h"
#include "tools/screenshots/screenshot_support.h"

using namespace fourfold;
using fourfold::screenshots::saveGrab;

int main(int argc, char *argv[])
{
    screenshots::ScreenshotApp app(argc, argv);
    if (app.failure())
        return app.failure();
    const QString out = app.outDir();
    auto project = Project::open(app.project());
    if (!project)
        return 1;
    auto lead = project->coderByPseudonym(QStringLiteral("L01"));
    if (!lead || !*lead)
        return 1;
    CodingSession session(std::move(*project), **lead);
    bool ok = true;
    {
        // The article with the most undecided disagreements, at its first one.
        ComparisonWindow w(&session);
        w.resize(1600, 960);
        w.show();
        ok &= saveGrab(w, out, "comparison.png");
    }
    {
        // An article whose gold is decided: the gold column beside the coders.
        ComparisonWindow w(&session);
        w.resize(1600, 960);
        w.show();
        for (const ArticleDisagreement &row : w.queueModel()->rows())
            if (row.article.externalId == QStringLiteral("hb-01")) {
                w.openArticle(row.article.id);
                break;
            }
        w.setCurrentPassage(0);
        ok &= saveGrab(w, out, "comparison-gold.png");
    }
    {
        // hb-01's dominant function: two coders say problem, one cause; the lead decides cause.
        ComparisonWindow w(&session);
        w.resize(1600, 960);
        w.show();
        for (const ArticleDisagreement &row : w.queueModel()->rows())
            if (row.article.externalId == QStringLiteral("hb-01")) {
                w.openArticle(row.article.id);
                break;
            }
        ok &= w.decideAnswer(QStringLiteral("dominant_function"), QStringLiteral("cause"),
            QStringLiteral("The headline and the lead paragraph name the grant cuts."));
        w.answerPanel()->setChosenValue(QStringLiteral("cause"));
        ok &= saveGrab(w, out, "comparison-gold-answer.png");
        session.undoStack()->undo(); // the other pictures show the sample as it is
    }
    {
        // Two coders only, at a span one of them does not have.
        ComparisonWindow w(&session);
        w.resize(1600, 960);
        w.show();
        auto c1 = session.project().coderByPseudonym(QStringLiteral("C01"));
        auto c2 = session.project().coderByPseudonym(QStringLiteral("C02"));
        if (c1 && c2 && *c1 && *c2)
            w.setCoderPair((*c1)->id, (*c2)->id);
        for (size_t i = 0; i < w.passages().size(); ++i)
            if (w.passages()[i].has(DisagreementKind::Presence)) {
                w.setCurrentPassage(int(i));
                break;
            }
        ok &= saveGrab(w, out, "comparison-pair.png");
    }
    {
        // Edit…: the gold span chosen on the text, with the cause's actor, from the first cause
        // passage of hb-01.
        ComparisonWindow w(&session);
        for (const ArticleDisagreement &row : w.queueModel()->rows())
            if (row.article.externalId == QStringLiteral("hb-01"))
                w.openArticle(row.article.id);
        auto article = session.project().article(w.currentArticle());
        for (const Passage &passage : w.passages())
            if (article && !passage.spans.empty()
                && passage.spans.front().content.function == FramingFunction::Cause) {
                GoldSpanDialog dialog(*article, passage.spans.front().content, session.codebook());
                const Utf16Range r = OffsetMap(article->text).utf16Range(passage.range);
                dialog.selectOnText(int(r.start + 2), int(r.end - 2)); // snaps to the words
                dialog.show();
                ok &= saveGrab(dialog, out, "gold-span-dialog.png");
                break;
            }
    }
    return ok ? 0 : 1;
}
