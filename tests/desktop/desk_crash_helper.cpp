// Test helper: codes through the same session the window uses, printing "committed N" after each
// committed span, until it is killed. tests/desktop/crash_test.cpp kills it mid-work.
//   desk_crash_helper PROJECT PSEUDONYM

#include "app/desktop/coding_session.h"

#include <QApplication>
#include <QThread>

#include <cstdio>

using namespace fourfold;

int main(int argc, char *argv[])
{
    qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    if (argc < 3)
        return 2;
    auto project = Project::open(QString::fromLocal8Bit(argv[1]));
    if (!project)
        return 1;
    auto coder = project->coderByPseudonym(QString::fromLocal8Bit(argv[2]));
    if (!coder || !*coder)
        return 1;
    CodingSession session(std::move(*project), **coder);
    const std::vector<ArticleRow> rows = session.articleRows();
    if (rows.empty())
        return 1;
    const ArticleSummary &article = rows.front().summary;
    for (qint64 n = 1; n * 4 + 3 < article.length; ++n) {
        if (!session.addSpan(article.id, FramingFunction::Remedy, TextRange {n * 4, n * 4 + 3}))
            return 1;
        std::printf("committed %lld\n", n);
        std::fflush(stdout);
        QThread::msleep(20);
    }
    return 0;
}
