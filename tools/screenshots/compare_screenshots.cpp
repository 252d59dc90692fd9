// Writes the README's screenshots of the comparison window from the sample project, offscreen:
//   fourfold_compare_screenshots SAMPLE_PROJECT OUT_DIR
// (CMake target `screenshots` runs it into docs/screenshots.) Nothing here is edited by hand.

#include "app/desktop/coding_session.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/compare/disagreement_queue_model.h"

#include <QApplication>
#include <QDir>
#include <QFile>
#include <QStandardPaths>
#include <QTemporaryDir>
#include <QThread>

#include <cstdio>

using namespace fourfold;

namespace {

bool save(QWidget &w, const QString &dir, const char *name)
{
    for (int i = 0; i < 10; ++i) {
        QApplication::processEvents();
        QThread::msleep(10);
    }
    const QString path = QDir(dir).filePath(QString::fromLatin1(name));
    const bool ok = w.grab().save(path);
    std::printf("%s %s\n", ok ? "wrote" : "FAILED", qPrintable(path));
    return ok;
}

} // namespace

int main(int argc, char *argv[])
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QStandardPaths::setTestModeEnabled(true);
    QApplication app(argc, argv);
    QApplication::setOrganizationName(QStringLiteral("FourfoldScreenshots"));
    if (argc < 3) {
        std::fprintf(stderr, "usage: fourfold_compare_screenshots SAMPLE_PROJECT OUT_DIR\n");
        return 2;
    }
    QTemporaryDir temp;
    const QString path = temp.filePath(QStringLiteral("demo.fourfold"));
    if (!QFile::copy(QString::fromLocal8Bit(argv[1]), path))
        return 1;
    QFile::setPermissions(path, QFile::ReadOwner | QFile::WriteOwner);
    const QString out = QString::fromLocal8Bit(argv[2]);
    QDir().mkpath(out);
    auto project = Project::open(path);
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
        ok &= save(w, out, "comparison.png");
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
        ok &= save(w, out, "comparison-gold.png");
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
        ok &= save(w, out, "comparison-pair.png");
    }
    return ok ? 0 : 1;
}
