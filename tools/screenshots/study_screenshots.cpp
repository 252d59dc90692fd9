// Writes the README's screenshots of the study-design, progress and training-feedback screens
// from the sample project, offscreen:
//   fourfold_study_screenshots SAMPLE_PROJECT OUT_DIR
// On a temporary copy it sets up a small study as a lead would (training article, a stratified
// reliability draw, the rest dealt, a second codebook version, some finished work); the demo's
// extra codings and times are invented. Nothing here is edited by hand.

#include "app/desktop/coding_session.h"
#include "app/desktop/study/progress_board_window.h"
#include "app/desktop/study/study_design_window.h"
#include "app/desktop/study/training_feedback_dialog.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/codebook_versions.h"
#include "core/project/project.h"
#include "tools/screenshots/screenshot_support.h"

#include <QComboBox>
#include <QLineEdit>
#include <QPushButton>
#include <QSpinBox>

#include <cstdio>

using namespace fourfold;
using fourfold::screenshots::saveGrab;

namespace {

bool check(const Status &st, const char *what)
{
    if (!st)
        std::fprintf(stderr, "%s: %s\n", what, qPrintable(st.error().toString()));
    return bool(st);
}

CoderId coderId(const Project &p, const QString &pseudonym)
{
    auto c = p.coderByPseudonym(pseudonym);
    return c && *c ? (*c)->id : CoderId {};
}

ArticleId articleId(const Project &p, const QString &externalId)
{
    auto a = p.articleByExternalId(externalId);
    return a && *a ? **a : ArticleId {};
}

// The trainee and the master code the training article; sentence numbers per function.
bool codeTraining(Project &p, const QString &externalId, CoderId who,
    const std::vector<std::pair<FramingFunction, int>> &marks)
{
    const ArticleId id = articleId(p, externalId);
    auto article = p.article(id);
    if (!article)
        return false;
    for (const auto &[function, sentence] : marks) {
        if (size_t(sentence) >= article->sentences.size())
            continue;
        AnnotationContent content;
        content.function = function;
        content.range = article->sentences[size_t(sentence)];
        AddAnnotationEdit add(id, who, content, Phase::Training);
        if (!check(p.apply(add), "training span"))
            return false;
    }
    SetArticleStatusEdit done(id, who, QStringLiteral("done"));
    return check(p.apply(done), "training done");
}

} // namespace

int main(int argc, char *argv[])
{
    screenshots::ScreenshotApp app(argc, argv);
    if (app.failure())
        return app.failure();
    const QString out = app.outDir();
    auto project = Project::open(app.project());
    if (!project)
        return 1;
    Project &p = *project;
    const CoderId lead = coderId(p, QStringLiteral("L01"));
    // The lead's windows work in a session of their own on the same file, as on the desk.
    auto leadProject = Project::open(app.project());
    auto leadCoder = p.coderByPseudonym(QStringLiteral("L01"));
    if (!leadProject || !leadCoder || !*leadCoder)
        return 1;
    CodingSession session(std::move(*leadProject), **leadCoder);
    const QStringList coders {QStringLiteral("C01"), QStringLiteral("C02"), QStringLiteral("C03")};
    bool ok = true;

    // Training: every coder and the lead get hb-06; the lead's coding is the master.
    auto training = AssignmentPlans::planArticles(p, Phase::Training, {QStringLiteral("hb-06")},
        coders + QStringList {QStringLiteral("L01")});
    if (!training || !check(AssignmentPlans::commit(p, *training), "training plan"))
        return 1;
    using F = FramingFunction;
    ok &= codeTraining(p, QStringLiteral("hb-06"), lead,
        {{F::Problem, 0}, {F::Problem, 1}, {F::Cause, 2}, {F::Cause, 4}, {F::Evaluation, 3},
            {F::Evaluation, 6}, {F::Remedy, 8}});
    ok &= codeTraining(p, QStringLiteral("hb-06"), coderId(p, QStringLiteral("C01")),
        {{F::Problem, 0}, {F::Problem, 1}, {F::Cause, 2}, {F::Evaluation, 3}, {F::Evaluation, 5},
            {F::Evaluation, 6}, {F::Evaluation, 7}, {F::Remedy, 9}});

    {
        // The draw page with a planned stratified draw, before it is committed.
        StudyDesignWindow w(session);
        w.resize(1280, 800);
        w.show();
        w.findChild<QSpinBox *>(QStringLiteral("draw-size"))->setValue(4);
        auto *stratify = w.findChild<QComboBox *>(QStringLiteral("draw-stratify"));
        stratify->setCurrentIndex(stratify->findData(QStringLiteral("topic")));
        w.findChild<QLineEdit *>(QStringLiteral("draw-seed"))->setText(QStringLiteral("20261202"));
        w.findChild<QPushButton *>(QStringLiteral("draw-plan"))->click();
        ok &= saveGrab(w, out, "study-design.png");
        w.findChild<QPushButton *>(QStringLiteral("draw-commit"))->click();

        // The rest dealt single-coded, then the assignments by coder and phase.
        w.showPage(StudyDesignWindow::RestPage);
        w.findChild<QLineEdit *>(QStringLiteral("rest-seed"))->setText(QStringLiteral("7"));
        w.findChild<QPushButton *>(QStringLiteral("rest-plan"))->click();
        ok &= saveGrab(w, out, "study-rest.png");
        w.findChild<QPushButton *>(QStringLiteral("rest-commit"))->click();
        w.showPage(StudyDesignWindow::AssignmentsPage);
        ok &= saveGrab(w, out, "study-assignments.png");
    }

    // A second codebook version: the remedy narrowed, a decision rule added to the cause.
    if (auto codebook = p.codebook()) {
        Codebook next = *codebook;
        next.functions[size_t(F::Remedy)].definition =
            QStringLiteral("A call for or against a specific action, with the actor who should "
                           "take it named or clearly implied.");
        next.functions[size_t(F::Cause)].rules << QStringLiteral(
            "A cause attributed only through a quoted source is still coded as cause.");
        ok &= bool(CodebookVersions::add(
            p, next, QStringLiteral("Pilot: remedies without an actor were coded unevenly"), lead));
    }
    // Work done: the coders finished reliability articles (their sample codings) and took time.
    const QStringList finished {QStringLiteral("hb-01"), QStringLiteral("hb-02"),
        QStringLiteral("hb-03"), QStringLiteral("mv-01"), QStringLiteral("qs-01")};
    qint64 seconds = 540;
    for (const QString &c : coders) {
        const CoderId who = coderId(p, c);
        for (const QString &a : finished) {
            if (c == QLatin1String("C03") && a == QLatin1String("qs-01"))
                break; // C03 is one article behind
            SetArticleStatusEdit done(articleId(p, a), who, QStringLiteral("done"));
            ok &= check(p.apply(done), "reliability done");
            ok &= check(p.addCodingTime(articleId(p, a), who, seconds), "time");
            seconds += 97;
        }
    }
    for (const QString &c : {QStringLiteral("C02"), QStringLiteral("C03")}) {
        ok &= codeTraining(p, QStringLiteral("hb-06"), coderId(p, c), {{F::Problem, 0}});
        ok &= check(
            p.addCodingTime(articleId(p, QStringLiteral("hb-06")), coderId(p, c), 1260), "time");
    }
    ok &= check(p.addCodingTime(
                    articleId(p, QStringLiteral("hb-06")), coderId(p, QStringLiteral("C01")), 1430),
        "time");
    {
        StudyDesignWindow w(session);
        w.resize(1280, 800);
        w.show();
        w.showPage(StudyDesignWindow::CodebookPage);
        ok &= saveGrab(w, out, "study-codebook.png");
    }
    {
        ProgressBoardWindow board(session);
        board.resize(1100, 720);
        board.show();
        ok &= saveGrab(board, out, "progress.png");
    }
    {
        TrainingFeedbackDialog dialog(p, coderId(p, QStringLiteral("C01")));
        dialog.resize(900, 380);
        dialog.show();
        ok &= saveGrab(dialog, out, "training-feedback.png");
    }
    return ok ? 0 : 1;
}
