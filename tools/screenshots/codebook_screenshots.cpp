// Writes the README's screenshots of the codebook editor (Lead → Codebook…) from the sample
// project, offscreen:
//   fourfold_codebook_screenshots SAMPLE_PROJECT OUT_DIR
// On a temporary copy: the evaluation page with a value added to the polarity list, and the
// remedy page with a second attribute whose key repeats the first (the error at the field).

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

    w.showFunction(FramingFunction::Remedy);
    w.addRow();
    auto *key =
        qobject_cast<QLineEdit *>(w.fieldWidget(QStringLiteral("functions[3].attributes[1].key")));
    if (!key)
        return 1;
    auto *newValues = qobject_cast<QPlainTextEdit *>(
        w.fieldWidget(QStringLiteral("functions[3].attributes[1].values")));
    if (!newValues)
        return 1;
    newValues->setPlainText(QStringLiteral("one\nseveral"));
    key->setText(QStringLiteral("explicitness"));
    ok &= saveGrab(w, app.outDir(), "codebook-editor-error.png");
    return ok ? 0 : 1;
}
