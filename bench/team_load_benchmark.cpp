// Team projects under load: CODERS coder processes each make EDITS new spans on their own
// working files, syncing after a random few, while the lead's working file syncs in a loop.
// Prints the edit-to-lead latency (from a span's creation in a coder's file to its arrival in
// the lead's file: median, 95th percentile, largest), the edits per second that reached the
// lead, and whether every edit arrived exactly once. Needs an empty PostgreSQL database whose
// login may create roles (bench/team-load starts a throwaway cluster and runs this).
//
//   team_load_benchmark --host H [--port P] --database D --admin ROLE --dir DIR
//                       [--coders 20] [--edits 500]
//   (the administrator's password from PGPASSFILE or ~/.pgpass)
//
// Inside, each coder runs as `team_load_benchmark --coder FILE --edits N --seed S`.

#include "bench/bench_support.h"
#include "core/project/annotation_edits.h"
#include "core/project/project.h"
#include "core/team/team_project.h"

#include <QCommandLineParser>
#include <QCoreApplication>
#include <QDateTime>
#include <QDir>
#include <QElapsedTimer>
#include <QFile>
#include <QHash>
#include <QJsonDocument>
#include <QJsonObject>
#include <QProcess>
#include <QRandomGenerator>
#include <QSet>
#include <QThread>

#include <algorithm>
#include <cstdio>
#include <memory>
#include <vector>

using namespace fourfold;
using namespace fourfold::bench;

namespace {

constexpr int kArticlesPerCoder = 10;

QByteArray articles(int count)
{
    QByteArray out;
    for (int i = 0; i < count; ++i) {
        QString text;
        for (int p = 0; p < 4; ++p) {
            for (int s = 0; s < 5; ++s)
                text += QStringLiteral("The harbour board of Tessel %1 the ferry fee for the "
                                       "%2th time this year. ")
                            .arg(s % 2 ? QStringLiteral("raises") : QStringLiteral("defends"))
                            .arg(i * 20 + p * 5 + s);
            text += QStringLiteral("\n\n");
        }
        out += QJsonDocument(QJsonObject {{QStringLiteral("id"), QStringLiteral("a%1").arg(i)},
                                 {QStringLiteral("title"), QStringLiteral("Ferry fees %1").arg(i)},
                                 {QStringLiteral("language"), QStringLiteral("en")},
                                 {QStringLiteral("text"), text.trimmed()}})
                   .toJson(QJsonDocument::Compact)
            + '\n';
    }
    return out;
}

bool syncOnce(Project &project)
{
    return bool(TeamProject::sync(project));
}

// A coder's process: EDITS new spans, one every 20–60 ms, syncing after each with the chance
// 1 in 5 (and at the end until a sync succeeds).
int runCoder(const QString &file, int edits, quint32 seed)
{
    QRandomGenerator random(seed);
    Project project = check(Project::open(file), "open");
    auto me = check(
        project.coderByPseudonym(check(TeamProject::status(project), "status").pseudonym), "me");
    const std::vector<Assignment> assigned = check(project.assignments(), "assignments");
    std::vector<std::pair<ArticleId, qsizetype>> texts;
    for (const Assignment &a : assigned)
        texts.emplace_back(a.article, check(project.article(a.article), "article").text.size());
    int failedSyncs = 0;
    for (int i = 0; i < edits; ++i) {
        QThread::msleep(20 + random.bounded(41));
        const auto &[article, length] = texts[random.bounded(int(texts.size()))];
        const qint64 start = random.bounded(int(length - 40));
        const qint64 end = start + 5 + random.bounded(30);
        AddAnnotationEdit add(article, me->id,
            AnnotationContent {
                kFramingFunctions[random.bounded(4)], TextRange {start, end}, {}, {}, {}},
            Phase::Production);
        check(project.apply(add), "span");
        if (random.bounded(5) == 0 && !syncOnce(project))
            ++failedSyncs;
    }
    while (!syncOnce(project)) {
        ++failedSyncs;
        QThread::msleep(200);
    }
    std::printf("%d\n", failedSyncs);
    return 0;
}

QString login(const QString &host, const QString &port, const QString &database,
    const QString &role, const QString &passfile)
{
    return QStringLiteral("host='%1' port='%2' dbname='%3' user='%4' passfile='%5'")
        .arg(host, port, database, role, passfile);
}

double percentile(std::vector<double> v, double p)
{
    if (v.empty())
        return 0;
    std::sort(v.begin(), v.end());
    const size_t i = size_t(p * double(v.size() - 1) + 0.5);
    return v[std::min(i, v.size() - 1)];
}

} // namespace

int main(int argc, char **argv)
{
    QCoreApplication app(argc, argv);
    QCommandLineParser parser;
    const QCommandLineOption host(
        QStringLiteral("host"), QStringLiteral("server host"), QStringLiteral("H"));
    const QCommandLineOption port(QStringLiteral("port"), QStringLiteral("server port"),
        QStringLiteral("P"), QStringLiteral("5432"));
    const QCommandLineOption database(
        QStringLiteral("database"), QStringLiteral("empty database"), QStringLiteral("D"));
    const QCommandLineOption admin(
        QStringLiteral("admin"), QStringLiteral("its owner's login"), QStringLiteral("ROLE"));
    const QCommandLineOption dir(
        QStringLiteral("dir"), QStringLiteral("a new folder for the files"), QStringLiteral("DIR"));
    const QCommandLineOption coders(QStringLiteral("coders"), QStringLiteral("coder processes"),
        QStringLiteral("N"), QStringLiteral("20"));
    const QCommandLineOption edits(QStringLiteral("edits"), QStringLiteral("spans per coder"),
        QStringLiteral("N"), QStringLiteral("500"));
    const QCommandLineOption coder(QStringLiteral("coder"),
        QStringLiteral("(internal) run as a coder"), QStringLiteral("FILE"));
    const QCommandLineOption seed(QStringLiteral("seed"), QStringLiteral("(internal)"),
        QStringLiteral("S"), QStringLiteral("1"));
    parser.addOptions({host, port, database, admin, dir, coders, edits, coder, seed});
    parser.process(app);
    const int editCount = parser.value(edits).toInt();
    if (parser.isSet(coder))
        return runCoder(parser.value(coder), editCount, parser.value(seed).toUInt());

    const int coderCount = parser.value(coders).toInt();
    const QDir work(parser.value(dir));
    QDir().mkpath(work.path());
    const QString h = parser.value(host), p = parser.value(port), d = parser.value(database);

    // The study: CODERS coders with ten articles each, a lead, published to the server.
    const QString mainPath = work.filePath(QStringLiteral("lead.fourfold"));
    Project lead = check(Project::create(mainPath), "create");
    QFile jsonl(work.filePath(QStringLiteral("articles.jsonl")));
    jsonl.open(QIODevice::WriteOnly);
    jsonl.write(articles(coderCount * kArticlesPerCoder));
    jsonl.close();
    check(lead.importFile(jsonl.fileName(), ImportOptions {}), "import");
    addStudyPeople(lead, coderCount);
    for (int c = 0; c < coderCount; ++c) {
        const auto person = check(
            lead.coderByPseudonym(QStringLiteral("C%1").arg(c + 1, 2, 10, QLatin1Char('0'))), "c");
        for (int a = 0; a < kArticlesPerCoder; ++a) {
            const auto article = check(
                lead.articleByExternalId(QStringLiteral("a%1").arg(c * kArticlesPerCoder + a)),
                "a");
            check(lead.assign(*article, person->id, Phase::Production), "assign");
        }
    }
    const PublishReport report = check(TeamProject::publish(lead,
                                           QStringLiteral("host='%1' port='%2' dbname='%3' "
                                                          "user='%4'")
                                               .arg(h, p, d, parser.value(admin)),
                                           work.filePath(QStringLiteral("logins"))),
        "publish");
    QHash<QString, QString> loginOf;
    for (const TeamLogin &l : report.logins)
        loginOf.insert(l.pseudonym, login(h, p, d, l.role, l.passwordFile));
    check(TeamProject::setServer(lead, loginOf.value(QStringLiteral("L01"))), "lead login");

    // Each coder's working file, then the coders at work while the lead syncs in a loop.
    std::vector<QString> files;
    for (int c = 0; c < coderCount; ++c) {
        const QString pseudonym = QStringLiteral("C%1").arg(c + 1, 2, 10, QLatin1Char('0'));
        files.push_back(work.filePath(pseudonym + QStringLiteral(".fourfold")));
        check(TeamProject::join(loginOf.value(pseudonym), pseudonym, files.back()), "join");
    }
    QSet<QString> seen; // the spans the lead's file holds, published ones first
    for (const Annotation &a : check(lead.allAnnotations(), "spans"))
        seen.insert(a.uuid);
    const qsizetype seenAtStart = seen.size();
    std::vector<std::unique_ptr<QProcess>> processes;
    QElapsedTimer clock;
    clock.start();
    for (int c = 0; c < coderCount; ++c) {
        auto process = std::make_unique<QProcess>();
        process->setProcessChannelMode(QProcess::ForwardedErrorChannel);
        process->start(QCoreApplication::applicationFilePath(),
            {QStringLiteral("--coder"), files[size_t(c)], QStringLiteral("--edits"),
                QString::number(editCount), QStringLiteral("--seed"), QString::number(c + 1)});
        processes.push_back(std::move(process));
    }
    const qint64 expected = qint64(coderCount) * editCount;
    std::vector<double> latencies; // seconds from a span's creation to its arrival here
    int leadSyncs = 0, leadFailures = 0;
    while (qint64(latencies.size()) < expected && clock.elapsed() < 30 * 60 * 1000) {
        auto r = TeamProject::sync(lead);
        if (!r) {
            ++leadFailures;
            QThread::msleep(100);
            continue;
        }
        ++leadSyncs;
        if (r->pulled == 0) {
            QThread::msleep(50);
            continue;
        }
        const QDateTime now = QDateTime::currentDateTimeUtc();
        for (const Annotation &a : check(lead.allAnnotations(), "spans")) {
            if (seen.contains(a.uuid))
                continue;
            seen.insert(a.uuid);
            latencies.push_back(
                double(QDateTime::fromString(a.createdAt, Qt::ISODateWithMs).msecsTo(now))
                / 1000.0);
        }
    }
    const double seconds = double(clock.elapsed()) / 1000.0;
    int coderFailures = 0;
    bool allExited = true;
    for (auto &process : processes) {
        allExited = process->waitForFinished(60000) && process->exitStatus() == QProcess::NormalExit
            && process->exitCode() == 0 && allExited;
        coderFailures += process->readAllStandardOutput().trimmed().toInt();
    }
    // Exactly once: each coder's file holds its spans, the lead's file the same number more,
    // and no more (a span arriving twice would be a second row: uuids are unique).
    qint64 made = 0;
    for (const QString &file : files) {
        Project coderFile = check(Project::open(file), "open coder file");
        made += check(coderFile.counts(), "counts").annotations;
    }
    const qint64 before = qint64(seenAtStart);
    std::printf("team load: %d coders x %d spans, syncing after 1 in 5 edits (one every "
                "20-60 ms); lead syncs in a loop\n",
        coderCount, editCount);
    std::printf("arrived at the lead: %zu of %lld (the coders' files hold %lld new spans, the "
                "lead's %lld); every coder exited cleanly: %s\n",
        latencies.size(), static_cast<long long>(expected), static_cast<long long>(made),
        static_cast<long long>(check(lead.counts(), "counts").annotations - before),
        allExited ? "yes" : "no");
    std::printf("edit-to-lead latency: median %.2f s, 95th percentile %.2f s, largest %.2f s\n",
        percentile(latencies, 0.5), percentile(latencies, 0.95), percentile(latencies, 1.0));
    std::printf("edits per second reaching the lead: %.1f (%.1f s in all); lead syncs %d, "
                "failed syncs: lead %d, coders %d\n",
        double(latencies.size()) / seconds, seconds, leadSyncs, leadFailures, coderFailures);
    const bool once = qint64(latencies.size()) == expected && made == expected
        && check(lead.counts(), "counts").annotations - before == expected;
    std::printf("every edit exactly once: %s\n", once ? "yes" : "NO");
    return once && allExited ? 0 : 1;
}
