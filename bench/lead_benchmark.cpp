// The lead's windows on a generated study (bench/study_generator.h), driven as a lead drives
// them: the comparison window opened, decisions taken in it (accept, merge, edit, reject,
// withdraw, undo, redo), each timed from the call until the window has redrawn its queue row and
// passages, and the Reliability window's Compute timed until its results are shown. Prints the
// latencies (min, median and max over ROUNDS decisions of each kind) and the peak memory.
// Runs on the offscreen platform unless QT_QPA_PLATFORM is set.
//
//   lead_benchmark [ARTICLES=1000] [ROUNDS=5] [WORK_DIR=a temporary directory]
// ROUNDS=0 takes no decisions; with FOURFOLD_BENCH_REUSE set, the study an earlier run left in
// WORK_DIR is used again (its decisions included). FOURFOLD_BENCH_SHOTS=DIR saves pictures of
// the Reliability window's diagnostics and drift tabs there.

#include "app/desktop/coding_session.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/reliability/reliability_job.h"
#include "app/desktop/reliability/reliability_window.h"
#include "bench/bench_support.h"
#include "bench/study_generator.h"
#include "core/project/coding_import.h"
#include "core/project/project.h"

#include <QApplication>
#include <QDir>
#include <QElapsedTimer>
#include <QEventLoop>
#include <QFile>
#include <QTabWidget>
#include <QTemporaryDir>
#include <QTimer>
#include <QUndoStack>

#include <algorithm>
#include <cstdio>
#include <functional>
#include <vector>

using namespace fourfold;
using namespace fourfold::bench;

namespace {

// Runs `work`, lets the event loop paint what it changed, and returns the seconds taken.
double latency(
    const std::function<bool()> &work, const char *what, const ComparisonWindow *w = nullptr)
{
    QElapsedTimer t;
    t.start();
    if (!work()) {
        std::fprintf(stderr, "%s failed: %s\n", what, w ? qPrintable(w->lastMessage()) : "");
        std::exit(1);
    }
    QCoreApplication::processEvents();
    return double(t.nsecsElapsed()) / 1e9;
}

void print(const char *path, int articles, std::vector<double> seconds)
{
    std::sort(seconds.begin(), seconds.end());
    std::printf("%-40s %7d %9.4f %9.4f %9.4f %9.0f\n", path, articles, seconds.front(),
        seconds[seconds.size() / 2], seconds.back(), peakMiB());
    std::fflush(stdout);
}

// Moves to a passage with an undecided disagreement and no gold yet, and selects `spans` of its
// spans (all of one function when `oneFunction`); false if there is none left.
bool selectDisagreement(ComparisonWindow &w, std::size_t spans, bool oneFunction = false)
{
    for (int tries = 0; tries < 200; ++tries) {
        const int at = w.currentPassage();
        if (at >= 0) {
            const Passage &p = w.passages()[std::size_t(at)];
            if (!p.isAgreed() && p.gold.empty()) {
                std::vector<AnnotationId> ids;
                for (std::size_t k = 0; k < p.spans.size(); ++k)
                    if (ids.size() < spans && !p.rejected[k]
                        && (!oneFunction
                            || p.spans[k].content.function == p.spans.front().content.function))
                        ids.push_back(p.spans[k].id);
                if (ids.size() == spans) {
                    w.selectSpans(ids);
                    return true;
                }
            }
        }
        if (!w.nextDisagreement())
            return false;
    }
    return false;
}

} // namespace

int main(int argc, char **argv)
{
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    QApplication app(argc, argv);
    const int n = argc > 1 ? std::atoi(argv[1]) : 1000;
    const int rounds = std::max(0, argc > 2 ? std::atoi(argv[2]) : 5);
    QTemporaryDir temporary;
    const QString dir = argc > 3 ? QString::fromLocal8Bit(argv[3]) : temporary.path();
    QDir().mkpath(dir);

    StudySpec spec;
    spec.articles = n;
    const QString path = QDir(dir).filePath(QStringLiteral("lead.fourfold"));
    // A study made by an earlier run in WORK_DIR is reused when FOURFOLD_BENCH_REUSE is set
    // (a study of 50,000 articles takes minutes to make).
    if (qEnvironmentVariableIsEmpty("FOURFOLD_BENCH_REUSE") || !QFile::exists(path)) {
        const StudyFiles files = writeStudyOrExit(spec, dir);
        for (const char *suffix : {"", "-wal", "-shm"})
            QFile::remove(path + QLatin1String(suffix));
        Project project = check(Project::create(path), "create");
        addStudyPeople(project, spec.coders);
        check(project.importFile(files.articles, ImportOptions {}), "import articles");
        check(importQuotedCodings(project, files.codings, Phase::Production), "import codings");
        std::printf("study: %d articles, %d coders, %lld spans\n", n, spec.coders, files.spans);
    }
    std::printf("%-40s %7s %9s %9s %9s %9s\n", "path", "articles", "min s", "median s", "max s",
        "peak MiB");

    Project project = check(Project::open(path), "open");
    const auto lead = check(project.coderByPseudonym(QStringLiteral("L01")), "lead");
    if (!lead) {
        std::fprintf(stderr, "no lead\n");
        return 1;
    }
    CodingSession session(std::move(project), *lead);

    // Opened three times (the first one reads a cold file); the last one stays for decisions.
    std::unique_ptr<ComparisonWindow> window;
    std::vector<double> opened;
    for (int round = 0; round < 3; ++round) {
        window.reset();
        QCoreApplication::processEvents();
        opened.push_back(latency(
            [&] {
                window = std::make_unique<ComparisonWindow>(&session);
                window->resize(1400, 900);
                window->show();
                return true;
            },
            "open"));
    }
    print("open the comparison window", n, opened);
    ComparisonWindow &w = *window;
    QUndoStack &undo = *session.undoStack();

    std::vector<double> accept, merge, edit, reject, withdraw, undone, redone;
    for (int round = 0; round < rounds; ++round) {
        if (!selectDisagreement(w, 1))
            break;
        accept.push_back(latency([&] { return w.acceptSelected(); }, "accept", &w));
        undone.push_back(latency(
            [&] {
                undo.undo();
                return true;
            },
            "undo"));
        redone.push_back(latency(
            [&] {
                undo.redo();
                return true;
            },
            "redo"));
        if (!selectDisagreement(w, 1))
            break;
        reject.push_back(latency([&] { return w.rejectSelected(); }, "reject", &w));
        if (selectDisagreement(w, 2, true))
            merge.push_back(latency([&] { return w.mergeSelected(); }, "merge", &w));
        if (!selectDisagreement(w, 1))
            break;
        const std::vector<Annotation> chosen = w.selectedSpans();
        GoldCandidate candidate {chosen.front().content, {chosen.front().id}};
        candidate.content.range.end =
            std::max(candidate.content.range.start + 1, candidate.content.range.end - 1);
        edit.push_back(latency([&] { return w.decide(candidate); }, "edit", &w));
        // The gold span just decided is in the current passage: withdraw it.
        const Passage &p = w.passages()[std::size_t(w.currentPassage())];
        const auto decided = std::ranges::find_if(p.gold,
            [&](const GoldAnnotation &g) { return g.content.range == candidate.content.range; });
        if (decided == p.gold.end()) {
            std::fprintf(stderr, "the edited gold span is not in the current passage\n");
            return 1;
        }
        w.selectGold({decided->id});
        withdraw.push_back(latency([&] { return w.withdrawSelectedGold(); }, "withdraw", &w));
    }
    if (accept.empty() && rounds > 0) {
        std::fprintf(stderr, "the study has no disagreement to decide\n");
        return 1;
    }
    for (const auto &[what, seconds] : {std::pair {"accept one span", &accept}, {"undo", &undone},
             {"redo", &redone}, {"reject one span", &reject}, {"merge two spans", &merge},
             {"edit (decide changed boundaries)", &edit}, {"withdraw a gold span", &withdraw}})
        if (!seconds->empty())
            print(what, n, *seconds);
    window.reset();

    // The computation alone, as the window runs it on its worker thread.
    {
        std::vector<double> job;
        ReliabilityWindow r(session.project());
        const ReliabilityRequest request = r.request();
        for (int round = 0; round < 3; ++round)
            job.push_back(latency(
                [&] { return bool(runReliabilityJob(request)); }, "reliability computation"));
        print("reliability computation alone", n, job);
    }
    std::vector<double> compute;
    for (int round = 0; round < 3; ++round) {
        ReliabilityWindow r(session.project());
        r.resize(1200, 800);
        r.show();
        QCoreApplication::processEvents();
        QEventLoop loop;
        bool ok = false;
        QObject::connect(&r, &ReliabilityWindow::computed, &loop, [&](bool success) {
            ok = success;
            loop.quit();
        });
        QElapsedTimer t;
        t.start();
        r.compute();
        loop.exec();
        QCoreApplication::processEvents();
        compute.push_back(double(t.nsecsElapsed()) / 1e9);
        // FOURFOLD_BENCH_SHOTS=DIR: pictures of the diagnostics and drift tabs at this size.
        if (const QString shots = qEnvironmentVariable("FOURFOLD_BENCH_SHOTS");
            !shots.isEmpty() && round == 0)
            for (const int tab : {1, 5}) {
                r.tabs()->setCurrentIndex(tab);
                QCoreApplication::processEvents();
                r.grab().save(
                    QDir(shots).filePath(QStringLiteral("reliability-%1-%2.png").arg(n).arg(tab)));
            }
        if (!ok) {
            std::fprintf(stderr, "compute failed: %s\n", qPrintable(r.errorMessage()));
            return 1;
        }
    }
    print("Reliability window: Compute", n, compute);
    return 0;
}
