// Writes the README's screenshots of the codebook editor (Lead → Codebook…) from the sample
// project, offscreen:
//   fourfold_codebook_screenshots SAMPLE_PROJECT OUT_DIR
// On a temporary copy: the evaluation page with a value added to the polarity list, the remedy
// page with a new attribute whose key repeats the first (the error at the field), and the problem
// page with the German texts shown, the definition changed (the structural fields read-only).

#include "app/desktop/codebook/codebook_editor.h"
#include "app/desktop/coding_session.h"
#include "core/project/project.h"
#include "tools/screenshots/screenshot_support.h"

#include <QLineEdit>
#include <QPlainTextEdit>

using namespace fourfold;
using fourfold::screenshots::saveGrab;

int main(int argc, char *argv[])
{
    screenshots::ScreenshotApp app(argc, argv);
    if (app.failure())
        return app.failure();
    auto project = Project::open(app.project());
    if (!project)
        return 1;
    auto lead = project->coderByPseudonym(QStringLiteral("L01"));
    if (!lead || !*lead)
        return 1;
    CodingSession session(std::move(*project), **lead);
    CodebookEditor w(session);
    w.resize(1280, 720); // fits a 1366×768 screen with the desktop's panel
    w.show();
    bool ok = true;

    auto *values = qobject_cast<QPlainTextEdit *>(
        w.fieldWidget(QStringLiteral("functions[2].attributes[0].values")));
    if (!values)
        return 1;
    values->setPlainText(values->toPlainText() + QStringLiteral("\nmixed"));
    ok &= saveGrab(w, app.outDir(), "codebook-editor.png");

    // The sample's remedy has two attributes (explicitness, kind of remedy): the new one is third.
    w.showFunction(FramingFunction::Remedy);
    w.addRow();
    auto *key =
        qobject_cast<QLineEdit *>(w.fieldWidget(QStringLiteral("functions[3].attributes[2].key")));
    if (!key)
        return 1;
    auto *newValues = qobject_cast<QPlainTextEdit *>(
        w.fieldWidget(QStringLiteral("functions[3].attributes[2].values")));
    if (!newValues)
        return 1;
    newValues->setPlainText(QStringLiteral("one\nseveral"));
    key->setText(QStringLiteral("explicitness"));
    ok &= saveGrab(w, app.outDir(), "codebook-editor-error.png");

    // The draft's edits taken back, then the German texts of problem with its definition extended.
    while (w.undoStack()->canUndo())
        w.undoStack()->undo();
    if (!w.showLanguage(QStringLiteral("de")))
        return 1;
    auto *definition =
        qobject_cast<QPlainTextEdit *>(w.fieldWidget(QStringLiteral("functions[0].definition")));
    if (!definition)
        return 1;
    w.selectRow(0);
    definition->setPlainText(definition->toPlainText()
        + QStringLiteral(" Auch was es kostet und wer es bezahlt, gehört dazu."));
    ok &= saveGrab(w, app.outDir(), "codebook-editor-translation.png");
    return ok ? 0 : 1;
}
