// The desktop's team projects against a real server (the test program's throwaway PostgreSQL
// cluster, tests/support/postgres_cluster.h): Project → Join a team project… makes a working
// file and keeps the password out of it; two working files open in two windows exchange an edit
// by background sync, the server's change notice bringing it; the status bar's line while
// changes wait offline and when a conflict waits for the lead; the notice itself, read with
// plain libpq (an independent view) and through TeamListener. Waits are generous upper bounds
// (QTest::qWaitFor), never asserted times: what is counted is syncs and notices.

#include "app/desktop/coding_session.h"
#include "app/desktop/main_window.h"
#include "app/desktop/message_bar.h"
#include "app/desktop/team/background_sync.h"
#include "app/desktop/team/join_team_dialog.h"
#include "core/project/annotation_edits.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/project_tables.h"
#include "core/team/team_credentials.h"
#include "core/team/team_listener.h"
#include "core/team/team_project.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QDir>
#include <QFile>
#include <QLabel>
#include <QLineEdit>
#include <QPainter>
#include <QPixmap>
#include <QSignalSpy>
#include <QStatusBar>
#include <QTest>
#include <QThread>

#include <catch2/catch.hpp>
#include <libpq-fe.h>
#include <poll.h>

#include <functional>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Upper bound of every wait: a sync on this machine takes milliseconds, a loaded machine more.
constexpr int kPatience = 60000;

// The password in a pgpass line (host:port:database:role:password; no escapes in ours).
QString passwordIn(const QString &pgpassFile)
{
    QFile f(pgpassFile);
    REQUIRE(f.open(QIODevice::ReadOnly));
    const QString line = QString::fromUtf8(f.readAll()).trimmed();
    return line.section(QLatin1Char(':'), 4);
}

QString passwordFileOf(const PublishedProject &p, const QString &pseudonym)
{
    for (const TeamLogin &l : p.report.logins)
        if (l.pseudonym == pseudonym)
            return l.passwordFile;
    FAIL("no login for " << pseudonym.toStdString());
    return {};
}

QString joined(PublishedProject &p, const QString &pseudonym)
{
    const QString file = p.dir.filePath(pseudonym + QStringLiteral(".fourfold"));
    auto r = TeamProject::join(p.loginOf(pseudonym), pseudonym, file);
    INFO((r ? QString() : r.error().toString()).toStdString());
    REQUIRE(r);
    return file;
}

// The published file as the lead's working file, syncing through the lead's own login.
QString leadFile(PublishedProject &p)
{
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
    return p.mainPath;
}

ArticleId articleIn(Project &project, const QString &externalId)
{
    auto a = project.articleByExternalId(externalId);
    REQUIRE(a);
    REQUIRE(a->has_value());
    return **a;
}

void openAs(MainWindow &w, const QString &path, const QString &pseudonym,
    const std::optional<QString> &passphrase = std::nullopt)
{
    auto st = w.openProject(path, pseudonym, passphrase);
    INFO((st ? QString() : st.error().toString()).toStdString());
    REQUIRE(st);
    REQUIRE(w.backgroundSync());
}

// Runs the event loop until `condition` holds, at most kPatience; whether it came to hold.
// (Not QTRY_*: inside a Catch2 test their failure only returns from the test case.)
bool eventually(const std::function<bool()> &condition)
{
    return QTest::qWaitFor(condition, kPatience);
}

void waitForSyncs(MainWindow &w, int count)
{
    REQUIRE(eventually([&] { return w.backgroundSync()->syncsFinished() >= count; }));
}

// The lead and then the coder change the same span's note (team_sync_test's conflict): the
// coder's next sync records a conflict in the coder's file.
void makeConflict(PublishedProject &p, const QString &coderPath)
{
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
    {
        // The lead and then the coder change the same span's note (team_sync_test's conflict).
        auto c1 = Project::open(coderPath);
        REQUIRE(c1);
        auto me = c1->coderByPseudonym(QStringLiteral("C01"));
        REQUIRE(me);
        REQUIRE(me->has_value());
        auto mine = c1->annotations(articleIn(*c1, QStringLiteral("f1")), (*me)->id);
        REQUIRE(mine);
        REQUIRE_FALSE(mine->empty());
        const Annotation target = mine->front();
        auto inLead = p.main->annotations(articleIn(*p.main, QStringLiteral("f1")), p.c1);
        REQUIRE(inLead);
        const auto leadCopy = std::ranges::find_if(
            *inLead, [&](const Annotation &a) { return a.uuid == target.uuid; });
        REQUIRE(leadCopy != inLead->end());
        AnnotationContent leadContent = leadCopy->content;
        leadContent.note = QStringLiteral("lead's note");
        ChangeAnnotationEdit leadEdit(leadCopy->id, leadContent, p.lead);
        REQUIRE(p.main->apply(leadEdit));
        REQUIRE(TeamProject::sync(*p.main));
        QThread::msleep(5); // a later modification time (milliseconds)
        AnnotationContent coderContent = target.content;
        coderContent.note = QStringLiteral("coder's note");
        ChangeAnnotationEdit coderEdit(target.id, coderContent, (*me)->id);
        REQUIRE(c1->apply(coderEdit));
    }
}

} // namespace

TEST_CASE("The join dialog makes a working file from a published project without its password")
{
    PublishedProject p;
    const QString password = passwordIn(passwordFileOf(p, QStringLiteral("C01")));
    REQUIRE(password.size() == 24); // publish's passwords (team_project.cpp)
    const QString file = p.dir.filePath(QStringLiteral("joined-C01.fourfold"));

    JoinTeamDialog dialog;
    dialog.hostField()->setText(p.cluster.socketDir());
    dialog.databaseField()->setText(p.db.name);
    dialog.pseudonymField()->setText(QStringLiteral("C01"));
    CHECK(dialog.passwordField()->echoMode() == QLineEdit::Password);

    // A wrong password: refused at the dialog, in its message bar, with nothing left behind.
    dialog.passwordField()->setText(QStringLiteral("not-the-password"));
    dialog.fileField()->setText(file);
    QSignalSpy ends(&dialog, &JoinTeamDialog::joinFinished);
    dialog.join();
    REQUIRE(eventually([&] { return ends.count() == 1; }));
    CHECK(ends.at(0).at(0).toBool() == false);
    CHECK(dialog.result() != QDialog::Accepted);
    CHECK(dialog.messageBar()->kind() == MessageBar::Kind::Error);
    // ServerConnection's translated sentence for a refused login, not libpq's English.
    CHECK(dialog.messageBar()->text().startsWith(QStringLiteral("The server refused the login")));
    CHECK_FALSE(QFile::exists(file));
    const QString server = TeamCredentials::connectionString(p.cluster.socketDir(), QString(),
        p.db.name, TeamCredentials::loginRole(p.db.name, QStringLiteral("C01")));
    CHECK_FALSE(TeamCredentials::rememberedPassword(server).has_value());

    dialog.passwordField()->setText(password);
    dialog.join();
    REQUIRE(eventually([&] { return ends.count() == 2; }));
    INFO(dialog.messageBar()->text().toStdString());
    CHECK(ends.at(1).at(0).toBool() == true);
    CHECK(dialog.result() == QDialog::Accepted);
    CHECK(dialog.workingFile() == file);
    CHECK(dialog.pseudonym() == QStringLiteral("C01"));

    auto project = Project::open(file);
    REQUIRE(project);
    auto status = TeamProject::status(*project);
    REQUIRE(status);
    CHECK(status->pseudonym == QStringLiteral("C01"));
    // The server as recorded: the login of C01, and no password in any form.
    CHECK(status->server.contains(QStringLiteral("user='%1_c01'").arg(p.db.name)));
    CHECK_FALSE(status->server.contains(QStringLiteral("password")));
    CHECK_FALSE(status->server.contains(password));
    // The whole file holds the password nowhere (settings, event log, anything).
    QFile raw(file);
    REQUIRE(raw.open(QIODevice::ReadOnly));
    CHECK_FALSE(raw.readAll().contains(password.toUtf8()));
    // C01 codes f1 and f2 (tests/project/copies_fixture.h).
    auto articles = project->articles();
    REQUIRE(articles);
    CHECK(articles->size() == 2);
    // Kept in memory for the background sync of this session.
    CHECK(TeamCredentials::rememberedPassword(status->server) == password.toUtf8());
    TeamCredentials::forgetPassword(status->server);
    CHECK_FALSE(TeamCredentials::rememberedPassword(status->server).has_value());
}

TEST_CASE("Joining with a password in the connection string records the server without it")
{
    PublishedProject p;
    const QString password = passwordIn(passwordFileOf(p, QStringLiteral("C02")));
    const QString file = p.dir.filePath(QStringLiteral("c02.fourfold"));
    const QString server = p.cluster.conninfo(
        p.db.name, TeamCredentials::loginRole(p.db.name, QStringLiteral("C02")), password);
    REQUIRE(server.contains(password)); // the string given carries it
    auto r = TeamProject::join(server, QStringLiteral("C02"), file);
    INFO((r ? QString() : r.error().toString()).toStdString());
    REQUIRE(r);
    auto project = Project::open(file);
    REQUIRE(project);
    auto status = TeamProject::status(*project);
    REQUIRE(status);
    CHECK_FALSE(status->server.contains(QStringLiteral("password")));
    CHECK_FALSE(status->server.contains(password));
    CHECK(status->server.contains(QStringLiteral("dbname='%1'").arg(p.db.name)));
}

TEST_CASE("A coder's edit reaches the lead's open window through the server's notice")
{
    PublishedProject p;
    const QString coderPath = joined(p, QStringLiteral("C01"));
    const QString leadPath = leadFile(p);
    p.main.reset(); // the lead's window opens the file itself

    MainWindow lead;
    openAs(lead, leadPath, QStringLiteral("L01"), QStringLiteral("a long test passphrase"));
    // No polling: only a notice can start the lead's next sync.
    lead.backgroundSync()->setPullInterval(3600 * 1000);
    lead.session()->setShowAllCoders(true);
    const ArticleId leadF1 = articleIn(lead.session()->project(), QStringLiteral("f1"));
    lead.openArticle(leadF1);
    const size_t before = lead.session()->document().spans().size();
    waitForSyncs(lead, 1); // the first sync, after which the lead's window listens

    MainWindow coder;
    openAs(coder, coderPath, QStringLiteral("C01"));
    waitForSyncs(coder, 1);
    const int leadSyncs = lead.backgroundSync()->syncsFinished();
    const ArticleId f1 = articleIn(coder.session()->project(), QStringLiteral("f1"));
    REQUIRE(coder.session()->openDocument(f1));
    const QString text = coder.session()->document().article().text;
    REQUIRE(coder.session()->addSpan(
        f1, FramingFunction::Remedy, rangeOf(text, QStringLiteral("find the money"))));

    // The coder's window pushes after the edit; the server's notice makes the lead's pull.
    REQUIRE(eventually([&] { return lead.session()->document().spans().size() == before + 1; }));
    CHECK(lead.backgroundSync()->noticesReceived() >= 1);
    CHECK(lead.backgroundSync()->syncsFinished() > leadSyncs);
    CHECK(lead.backgroundSync()->lastOutcome().report.pulled >= 1);
    const auto spans = lead.session()->document().spans();
    CHECK(std::ranges::count_if(spans, [](const Annotation &a) {
        return a.content.function == FramingFunction::Remedy
            && a.quote == QStringLiteral("find the money");
    }) == 1);
    CHECK(lead.syncStatusLabel()->text().startsWith(QStringLiteral("synced ")));
}

TEST_CASE("The status bar counts changes waiting while the server is stopped")
{
    PublishedProject p;
    const QString coderPath = joined(p, QStringLiteral("C01"));
    MainWindow coder;
    openAs(coder, coderPath, QStringLiteral("C01"));
    waitForSyncs(coder, 1);
    QLabel *line = coder.syncStatusLabel();
    CHECK(line->isVisibleTo(&coder));
    REQUIRE(eventually([&] { return line->text().startsWith(QStringLiteral("synced ")); }));

    p.cluster.stopServer(); // pg_ctl stop -m fast: the server is gone
    const ArticleId f1 = articleIn(coder.session()->project(), QStringLiteral("f1"));
    REQUIRE(coder.session()->openDocument(f1));
    const QString text = coder.session()->document().article().text;
    REQUIRE(coder.session()->addSpan(
        f1, FramingFunction::Remedy, rangeOf(text, QStringLiteral("find the money"))));
    // One new span waits (the assignment of f1 had started already: C01 has spans there).
    eventually([&] { return line->text().startsWith(QStringLiteral("offline")); });
    INFO(line->text().toStdString());
    REQUIRE(line->text() == QStringLiteral("offline — 1 change(s) waiting"));
    CHECK(coder.backgroundSync()->isOffline());
    REQUIRE(coder.session()->addSpan(
        f1, FramingFunction::Evaluation, rangeOf(text, QStringLiteral("It is a disgrace"))));
    REQUIRE(eventually(
        [&] { return line->text() == QStringLiteral("offline — 2 change(s) waiting"); }));

    p.cluster.startServer();
    REQUIRE(eventually([&] { return line->text().startsWith(QStringLiteral("synced ")); }));
    CHECK_FALSE(coder.backgroundSync()->isOffline());
    auto status = TeamProject::status(coder.session()->project());
    REQUIRE(status);
    CHECK(status->waiting == 0);
    // The lead's login sees both spans on the server.
    ServerSql lead(p.loginOf(QStringLiteral("L01")));
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.annotation a JOIN "
                                    "fourfold.person p ON p.uuid = a.coder WHERE p.pseudonym = "
                                    "'C01' AND a.quote IN ('find the money', 'It is a disgrace')"))
        == QStringLiteral("2"));
}

TEST_CASE("The status bar says so while a conflict waits for the lead")
{
    PublishedProject p;
    const QString coderPath = joined(p, QStringLiteral("C01"));
    makeConflict(p, coderPath);
    MainWindow coder;
    openAs(coder, coderPath, QStringLiteral("C01"));
    waitForSyncs(coder, 1);
    INFO(coder.backgroundSync()->problem().toStdString());
    REQUIRE(eventually([&] {
        return coder.syncStatusLabel()->text().endsWith(
            QStringLiteral(" · conflict — lead decides"));
    }));
    auto status = TeamProject::status(coder.session()->project());
    REQUIRE(status);
    CHECK(status->openConflicts == 1);
    CHECK(coder.syncStatusLabel()->text().startsWith(QStringLiteral("synced ")));
}

TEST_CASE("The server sends an empty change notice when another client's sync commits")
{
    PublishedProject p;
    const QString coderPath = joined(p, QStringLiteral("C01"));
    const QString leadPath = leadFile(p);

    // Plain libpq as C01's login, as psql would LISTEN (PostgreSQL 15 documentation, LISTEN).
    std::unique_ptr<PGconn, decltype(&PQfinish)> raw(
        PQconnectdb(p.loginOf(QStringLiteral("C01")).toUtf8().constData()), &PQfinish);
    REQUIRE(PQstatus(raw.get()) == CONNECTION_OK);
    PQclear(PQexec(raw.get(), "LISTEN fourfold_change"));
    auto listener = TeamListener::open(p.loginOf(QStringLiteral("C02")));
    INFO((listener ? QString() : listener.error().toString()).toStdString());
    REQUIRE(listener);
    REQUIRE(*listener->take() == 0);

    // The lead's client changes a span and syncs.
    auto spans = p.main->annotations(articleIn(*p.main, QStringLiteral("f2")), p.c3);
    REQUIRE(spans);
    REQUIRE_FALSE(spans->empty());
    AnnotationContent content = spans->front().content;
    content.note = QStringLiteral("seen by the lead");
    ChangeAnnotationEdit edit(spans->front().id, content, p.lead);
    REQUIRE(p.main->apply(edit));
    auto r = TeamProject::sync(*p.main);
    REQUIRE(r);
    REQUIRE(r->pushed == 1);

    auto heard = listener->wait(kPatience);
    REQUIRE(heard);
    CHECK(*heard >= 1);

    std::vector<std::pair<std::string, std::string>> notices;
    for (int tries = 0; notices.empty() && tries < kPatience / 100; ++tries) {
        pollfd fd {PQsocket(raw.get()), POLLIN, 0};
        ::poll(&fd, 1, 100);
        REQUIRE(PQconsumeInput(raw.get()) == 1);
        while (PGnotify *n = PQnotifies(raw.get())) {
            notices.emplace_back(n->relname, n->extra);
            PQfreemem(n);
        }
    }
    REQUIRE_FALSE(notices.empty());
    for (const auto &[channel, payload] : notices) {
        CHECK(channel == "fourfold_change");
        CHECK(payload.empty()); // nothing about whose rows changed
    }
    (void)coderPath;
    (void)leadPath;
}

// Not a check: writes the manual's pictures of the join dialog and of the status bar's line.
// Run by hand with FOURFOLD_SCREENSHOT_DIR=dir team_desktop_tests "[.screenshots]".
TEST_CASE("screenshots of the team join dialog and the sync status", "[.screenshots]")
{
    const QString out = qEnvironmentVariable("FOURFOLD_SCREENSHOT_DIR");
    REQUIRE_FALSE(out.isEmpty());
    {
        JoinTeamDialog dialog;
        dialog.hostField()->setText(QStringLiteral("db.example.org"));
        dialog.databaseField()->setText(QStringLiteral("study"));
        dialog.pseudonymField()->setText(QStringLiteral("C01"));
        dialog.passwordField()->setText(QStringLiteral("example-password"));
        dialog.fileField()->setText(QStringLiteral("/home/noor/study-C01.fourfold"));
        dialog.show();
        QTest::qWait(100);
        REQUIRE(dialog.grab().save(QDir(out).filePath(QStringLiteral("team-join.png"))));
    }
    // The status bar's right end in each state, one above the other in one picture.
    std::vector<QPixmap> states;
    auto grabState = [&](MainWindow &w) {
        QTest::qWait(100);
        const QPixmap bar = w.statusBar()->grab();
        const int width = std::min(bar.width(), 720);
        states.push_back(bar.copy(bar.width() - width, 0, width, bar.height()));
    };
    PublishedProject p;
    const QString coderPath = joined(p, QStringLiteral("C01"));
    {
        MainWindow coder;
        openAs(coder, coderPath, QStringLiteral("C01"));
        coder.resize(900, 600);
        coder.show();
        waitForSyncs(coder, 1);
        REQUIRE(eventually(
            [&] { return coder.syncStatusLabel()->text().startsWith(QStringLiteral("synced ")); }));
        grabState(coder);
        p.cluster.stopServer(); // pg_ctl stop -m fast: the server is gone
        const ArticleId f1 = articleIn(coder.session()->project(), QStringLiteral("f1"));
        REQUIRE(coder.session()->openDocument(f1));
        const QString text = coder.session()->document().article().text;
        REQUIRE(coder.session()->addSpan(
            f1, FramingFunction::Remedy, rangeOf(text, QStringLiteral("find the money"))));
        REQUIRE(eventually(
            [&] { return coder.syncStatusLabel()->text().startsWith(QStringLiteral("offline")); }));
        grabState(coder);
        p.cluster.startServer();
        REQUIRE(eventually(
            [&] { return coder.syncStatusLabel()->text().startsWith(QStringLiteral("synced ")); }));
    }
    makeConflict(p, coderPath);
    MainWindow coder;
    openAs(coder, coderPath, QStringLiteral("C01"));
    coder.resize(900, 600);
    coder.show();
    REQUIRE(eventually([&] {
        return coder.syncStatusLabel()->text().endsWith(QStringLiteral("conflict — lead decides"));
    }));
    grabState(coder);
    QPixmap picture(states.front().width(), int(states.size()) * states.front().height());
    picture.fill(Qt::white);
    QPainter painter(&picture);
    for (size_t i = 0; i < states.size(); ++i)
        painter.drawPixmap(0, int(i) * states.front().height(), states[i]);
    painter.end();
    REQUIRE(picture.save(QDir(out).filePath(QStringLiteral("team-status.png"))));
}
