// The rows a team shares beside the coders' own objects, moved by TeamProject::sync against a
// real server: gold decided in one lead's file reaches every lead's file and no coder's;
// articles a lead imports and assigns reach the assigned coder alone; people and codebook
// versions follow; each file's events reach the server once; a row changed in two leads' files
// keeps one version on both sides and the other in the event log. The server's row-level
// security is the reference for who may see what (README "What the server enforces").

#include "core/project/codebook_versions.h"
#include "core/project/gold_edits.h"
#include "core/project/people.h"
#include "core/project/project.h"
#include "core/project/testing/project_database.h"
#include "core/store/event_log.h"
#include "core/store/project_tables.h"
#include "core/store/shared_rows.h"
#include "core/store/store_util.h"
#include "core/team/team_project.h"
#include "tests/team/published_project.h"
#include "tests/team/server_sql.h"

#include <QJsonDocument>
#include <QJsonObject>

#include <catch2/catch.hpp>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Every row of `kind` in the file, whole, with sorted keys (the server keeps JSON as jsonb, which
// orders keys its own way), sorted (row ids are not in them).
QStringList sharedRows(Project &project, store::SharedKind kind)
{
    QStringList out;
    REQUIRE(store::forEachSharedRow(
        databaseForTesting(project), kind, [&](const QByteArray &json) -> Status {
            out << QString::fromUtf8(QJsonDocument::fromJson(json).toJson(QJsonDocument::Compact));
            return {};
        }));
    out.sort();
    return out;
}

QString articleUuid(Project &project, const QString &externalId)
{
    auto stmt = databaseForTesting(project).prepare(
        QStringLiteral("SELECT uuid FROM article WHERE external_id = ?1"));
    REQUIRE(stmt);
    stmt->bind(1, externalId);
    auto found = stmt->step();
    REQUIRE(found);
    REQUIRE(*found);
    return stmt->columnText(0);
}

ArticleId articleOf(const Project &project, const QString &externalId)
{
    auto a = project.articleByExternalId(externalId);
    REQUIRE(a);
    REQUIRE(a->has_value());
    return **a;
}

AnnotationId annotationWithQuote(const Project &project, ArticleId article, const QString &quote)
{
    auto all = project.allAnnotations();
    REQUIRE(all);
    for (const Annotation &a : *all)
        if (a.article == article && a.quote == quote)
            return a.id;
    FAIL("no span " << quote.toStdString());
    return {};
}

void checkNothingMoves(std::initializer_list<Project *> files)
{
    for (Project *f : files) {
        const SyncReport r = synced(*f);
        CHECK(r.pushed == 0);
        CHECK(r.pulled == 0);
        CHECK(r.conflicts == 0);
    }
}

// The lead's published file syncs through the lead's own login (as in team_sync_test.cpp).
void useLeadLogin(PublishedProject &p)
{
    REQUIRE(store::setSetting(databaseForTesting(*p.main), TeamProject::serverSettingKey(),
        p.loginOf(QStringLiteral("L01"))));
}

} // namespace

TEST_CASE("Gold decided in one lead's file reaches every lead's file and no coder's")
{
    PublishedProject p;
    useLeadLogin(p);
    Project lead2 = joinAs(p, QStringLiteral("L01"), QStringLiteral("L01-laptop.fourfold"));
    Project c2 = joinAs(p, QStringLiteral("C02"), QStringLiteral("C02.fourfold"));
    checkNothingMoves({&*p.main, &lead2, &c2});

    // On the laptop the lead takes C02's evaluation of f3 as gold.
    const ArticleId f3 = articleOf(lead2, QStringLiteral("f3"));
    const AnnotationId source =
        annotationWithQuote(lead2, f3, QStringLiteral("Closing it outright is reckless."));
    auto leadId = lead2.coderByPseudonym(QStringLiteral("L01"));
    REQUIRE(leadId);
    REQUIRE(leadId->has_value());
    AdjudicateSpanEdit gold(f3, (*leadId)->id,
        span(FramingFunction::Evaluation, p.text3,
            QStringLiteral("Closing it outright is reckless.")),
        {source}, QStringLiteral("Both agree on the words."));
    REQUIRE(lead2.apply(gold));

    // The status of the laptop's file counts the gold span and its source as waiting.
    auto status = TeamProject::status(lead2);
    REQUIRE(status);
    CHECK(status->waitingByType.value(QStringLiteral("gold_annotation")) == 1);
    CHECK(status->waitingByType.value(QStringLiteral("gold_source")) == 1);

    const SyncReport up = synced(lead2);
    CHECK(up.pushed == 2); // the gold span and its source
    CHECK(up.pulled == 0);
    CHECK(up.events >= 1); // the adjudication's event

    const SyncReport down = synced(*p.main);
    CHECK(down.pulled == 2);
    CHECK(down.pushed == 0);
    CHECK(sharedRows(*p.main, store::SharedKind::GoldAnnotation)
        == sharedRows(lead2, store::SharedKind::GoldAnnotation));
    CHECK(sharedRows(*p.main, store::SharedKind::GoldSource)
        == sharedRows(lead2, store::SharedKind::GoldSource));
    CHECK(sharedRows(*p.main, store::SharedKind::GoldAnnotation).size() == 2);

    // A coder receives no gold: the server shows the role none.
    const SyncReport coder = synced(c2);
    CHECK(coder.pulled == 0);
    CHECK(sharedRows(c2, store::SharedKind::GoldAnnotation).isEmpty());

    checkNothingMoves({&*p.main, &lead2, &c2});
}

TEST_CASE("Articles a lead imports and assigns reach the assigned coder and no other")
{
    PublishedProject p;
    useLeadLogin(p);
    Project lead2 = joinAs(p, QStringLiteral("L01"), QStringLiteral("L01-laptop.fourfold"));
    Project c1 = joinAs(p, QStringLiteral("C01"), QStringLiteral("C01.fourfold"));
    Project c2 = joinAs(p, QStringLiteral("C02"), QStringLiteral("C02.fourfold"));

    const QByteArray more =
        "{\"id\":\"f4\",\"title\":\"Harbour fees\",\"language\":\"en\",\"text\":\"Harbour fees "
        "rise again.\\n\\nThe port board blames fuel costs.\"}\n"
        "{\"id\":\"f5\",\"title\":\"Library hours\",\"language\":\"en\",\"text\":\"The library "
        "closes on Mondays.\\n\\nReaders want it open.\"}\n";
    REQUIRE(p.main->importFile(writeFile(p.dir, QStringLiteral("more.jsonl"), more), {}));
    const ArticleId f4 = articleOf(*p.main, QStringLiteral("f4"));
    REQUIRE(p.main->assign(f4, p.c1, Phase::Production));

    const SyncReport up = synced(*p.main);
    CHECK(up.pushed == 3); // two articles and one assignment
    CHECK(up.pulled == 0);

    // C01 receives f4, its text and frozen units as the lead's file has them, and the
    // assignment; not f5.
    const SyncReport toC1 = synced(c1);
    CHECK(toC1.pulled == 2);
    CHECK(toC1.pushed == 0);
    auto inC1 = store::sharedRowsOf(databaseForTesting(c1), store::SharedKind::Article,
        QStringList {articleUuid(*p.main, QStringLiteral("f4"))});
    auto inLead = store::sharedRowsOf(databaseForTesting(*p.main), store::SharedKind::Article,
        QStringList {articleUuid(*p.main, QStringLiteral("f4"))});
    REQUIRE(inC1);
    REQUIRE(inLead);
    REQUIRE(inC1->size() == 1);
    CHECK(*inC1 == *inLead);
    auto f5InC1 = c1.articleByExternalId(QStringLiteral("f5"));
    REQUIRE(f5InC1);
    CHECK_FALSE(f5InC1->has_value());
    auto assigned = c1.assignments();
    REQUIRE(assigned);
    CHECK(assigned->size() == 3); // f1, f2 and now f4

    // C02 receives nothing; the other lead file receives all three.
    const SyncReport toC2 = synced(c2);
    CHECK(toC2.pulled == 0);
    auto f4InC2 = c2.articleByExternalId(QStringLiteral("f4"));
    REQUIRE(f4InC2);
    CHECK_FALSE(f4InC2->has_value());
    const SyncReport toLead2 = synced(lead2);
    CHECK(toLead2.pulled == 3);
    CHECK(sharedRows(lead2, store::SharedKind::Article)
        == sharedRows(*p.main, store::SharedKind::Article));

    checkNothingMoves({&*p.main, &lead2, &c1, &c2});
}

TEST_CASE("A new codebook version and a renamed person reach the files that may read them")
{
    PublishedProject p;
    useLeadLogin(p);
    Project lead2 = joinAs(p, QStringLiteral("L01"), QStringLiteral("L01-laptop.fourfold"));
    Project c1 = joinAs(p, QStringLiteral("C01"), QStringLiteral("C01.fourfold"));

    auto current = CodebookVersions::version(*p.main, 1);
    REQUIRE(current);
    Codebook next = *current;
    next.functions[0].definition += QStringLiteral(" Name the problem as the article does.");
    REQUIRE(CodebookVersions::add(*p.main, next, QStringLiteral("sharper"), p.lead));
    auto signedIn =
        People::signIn(*p.main, QStringLiteral("L01"), QStringLiteral("ferry harbour dyke"));
    REQUIRE(signedIn);
    auto rename =
        People::rename(*p.main, *signedIn, QStringLiteral("C01"), QStringLiteral("Noor Renamed"));
    REQUIRE(rename);
    REQUIRE(p.main->apply(**rename));

    CHECK(synced(*p.main).pushed == 2);
    CHECK(synced(c1).pulled == 2); // the version, and the coder's own person row
    CHECK(synced(lead2).pulled == 2);
    // The same versions, but for their author: a coder's file holds no lead to name.
    auto withoutAuthor = [](QStringList rows) {
        for (QString &row : rows) {
            QJsonObject o = QJsonDocument::fromJson(row.toUtf8()).object();
            o.remove(QStringLiteral("created_by"));
            row = QString::fromUtf8(QJsonDocument(o).toJson(QJsonDocument::Compact));
        }
        return rows;
    };
    CHECK(withoutAuthor(sharedRows(c1, store::SharedKind::CodebookVersion))
        == withoutAuthor(sharedRows(*p.main, store::SharedKind::CodebookVersion)));
    CHECK(sharedRows(c1, store::SharedKind::CodebookVersion).size() == 2);
    CHECK(sharedRows(lead2, store::SharedKind::CodebookVersion)
        == sharedRows(*p.main, store::SharedKind::CodebookVersion));
    auto me = c1.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(me);
    REQUIRE(me->has_value());
    CHECK((*me)->name == "Noor Renamed");
    CHECK(sharedRows(lead2, store::SharedKind::Person)
        == sharedRows(*p.main, store::SharedKind::Person));
    // The coder's file holds no one else.
    CHECK(sharedRows(c1, store::SharedKind::Person).size() == 1);
    checkNothingMoves({&*p.main, &lead2, &c1});
}

TEST_CASE("A person renamed in two leads' files keeps the server's name on both sides and the "
          "other in the event log")
{
    PublishedProject p;
    useLeadLogin(p);
    Project lead2 = joinAs(p, QStringLiteral("L01"), QStringLiteral("L01-laptop.fourfold"));
    for (auto [file, name] : {std::pair {&*p.main, QStringLiteral("Lena First")},
             std::pair {&lead2, QStringLiteral("Lena Second")}}) {
        auto signedIn =
            People::signIn(*file, QStringLiteral("L01"), QStringLiteral("ferry harbour dyke"));
        REQUIRE(signedIn);
        auto rename = People::rename(*file, *signedIn, QStringLiteral("C03"), name);
        REQUIRE(rename);
        REQUIRE(file->apply(**rename));
    }
    CHECK(synced(*p.main).pushed == 1);
    const SyncReport second = synced(lead2);
    CHECK(second.conflicts == 1);
    CHECK(second.pulled == 1);
    CHECK(second.pushed == 0);
    auto c3 = lead2.coderByPseudonym(QStringLiteral("C03"));
    REQUIRE(c3);
    CHECK((*c3)->name == "Lena First");
    // The name that lost is in the laptop's event log.
    auto stmt = databaseForTesting(lead2).prepare(QStringLiteral(
        "SELECT detail FROM event_log WHERE action = 'team.sync.overwritten' AND object_type = "
        "'person'"));
    REQUIRE(stmt);
    auto found = stmt->step();
    REQUIRE(found);
    REQUIRE(*found);
    const QJsonObject detail = QJsonDocument::fromJson(stmt->columnText(0).toUtf8()).object();
    CHECK(detail.value(QLatin1String("lost")).toObject().value(QLatin1String("name")).toString()
        == "Lena Second");
    CHECK(detail.value(QLatin1String("kept")).toString() == "server");
    checkNothingMoves({&*p.main, &lead2});
    CHECK(sharedRows(lead2, store::SharedKind::Person)
        == sharedRows(*p.main, store::SharedKind::Person));
}

TEST_CASE("Each file's events reach the server once, a coder's under the coder alone")
{
    PublishedProject p;
    useLeadLogin(p);
    Project c1 = joinAs(p, QStringLiteral("C01"), QStringLiteral("C01.fourfold"));
    ServerSql lead(p.loginOf(QStringLiteral("L01")));
    const QString before = lead.value(QStringLiteral("SELECT count(*) FROM fourfold.event"));

    auto mine = c1.coderByPseudonym(QStringLiteral("C01"));
    REQUIRE(mine);
    const ArticleId f1 = articleOf(c1, QStringLiteral("f1"));
    SetJudgementEdit answer(f1, (*mine)->id, QStringLiteral("dominant_function"),
        QStringLiteral("cause"), Phase::Reliability);
    REQUIRE(c1.apply(answer));
    auto logged = store::scalar(databaseForTesting(c1),
        QStringLiteral("SELECT count(*) FROM event_log WHERE coder_id = %1")
            .arg((*mine)->id.value));
    REQUIRE(logged);
    REQUIRE(*logged >= 1);

    const SyncReport first = synced(c1);
    CHECK(first.events == *logged);
    auto fileMark = store::setting(databaseForTesting(c1), TeamProject::fileSettingKey());
    REQUIRE(fileMark);
    REQUIRE(fileMark->has_value());
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.event WHERE source = '%1' AND "
                                    "person = '%2'")
                         .arg(**fileMark, p.uuidOf(QStringLiteral("C01"))))
        == QString::number(*logged));
    CHECK(synced(c1).events == 0);
    CHECK(lead.value(QStringLiteral("SELECT count(*) FROM fourfold.event")).toLongLong()
        == before.toLongLong() + *logged);
    // The coder reads its own events on the server and no one else's.
    ServerSql coder(p.loginOf(QStringLiteral("C01")));
    CHECK(coder.value(QStringLiteral("SELECT count(*) FROM fourfold.event WHERE person IS DISTINCT "
                                     "FROM '%1'")
                          .arg(p.uuidOf(QStringLiteral("C01"))))
        == "0");
}
