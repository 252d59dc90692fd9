// The article list marks an article that is a near copy of an older one: a small mark beside
// its title and a tooltip naming the other article and the similarity (found at import by
// core/project/near_copy_check.h). FOURFOLD_NEAR_COPY_SHOT=FILE.png saves a picture of the list.

#include "app/desktop/article_list_model.h"
#include "app/desktop/coding_session.h"
#include "core/project/project.h"
#include "core/project/testing/older_lead.h"
#include "tests/support/test_support.h"
#include "tests/text/near_copy_texts.h"

#include <QHeaderView>
#include <QJsonDocument>
#include <QJsonObject>
#include <QPixmap>
#include <QTableView>
#include <QTemporaryDir>

using namespace fourfold;
using namespace fourfold::test;

namespace {

QByteArray jsonLine(const QString &id, const QString &title, const QString &text)
{
    return QJsonDocument(QJsonObject {{QStringLiteral("id"), id}, {QStringLiteral("title"), title},
                             {QStringLiteral("text"), text}})
               .toJson(QJsonDocument::Compact)
        + '\n';
}

} // namespace

TEST_CASE("the article list marks a near copy and names the other article in its tooltip")
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    auto project = Project::create(dir.filePath(QStringLiteral("p.fourfold")));
    REQUIRE(project);
    const QString original = inventedArticle(0, 41);
    const QString path = writeFile(dir, QStringLiteral("a.jsonl"),
        jsonLine(QStringLiteral("wire-17"), QStringLiteral("Ferry fares rise in spring"), original)
            + jsonLine(QStringLiteral("north-3"), QStringLiteral("Council plans a new dyke"),
                inventedArticle(1, 42))
            + jsonLine(QStringLiteral("coast-9"), QStringLiteral("Fares for the ferry go up"),
                withWordsChanged(original, 0.05, 3, 2)));
    auto report = project->importFile(path, ImportOptions {});
    REQUIRE(report);
    REQUIRE(report->nearCopies.size() == 1);
    const double similarity = report->nearCopies[0].similarity;
    auto lead = addOlderLeadForTesting(*project, QStringLiteral("Lead"), QStringLiteral("L01"));
    REQUIRE(lead);
    auto coders = project->coders();
    REQUIRE(coders);
    CodingSession session(std::move(*project), coders->front());

    ArticleListModel model;
    model.setArticles(session.articleRows());
    REQUIRE(model.rowCount() == 3);
    const QModelIndex original0 = model.index(0, ArticleListModel::Title);
    const QModelIndex copy = model.index(2, ArticleListModel::Title);
    CHECK_FALSE(original0.data(ArticleListModel::NearCopyRole).toBool());
    CHECK_FALSE(original0.data(Qt::DecorationRole).isValid());
    CHECK(copy.data(ArticleListModel::NearCopyRole).toBool());
    CHECK_FALSE(copy.data(Qt::DecorationRole).value<QPixmap>().isNull());
    const QString tip = copy.data(Qt::ToolTipRole).toString();
    CHECK(tip.startsWith(QStringLiteral("Fares for the ferry go up\nNear copy of ")));
    CHECK(tip.contains(QStringLiteral("“Ferry fares rise in spring” (wire-17), similarity %1")
                           .arg(similarity, 0, 'f', 2)));
    // Only the title column carries the mark.
    CHECK_FALSE(model.index(2, ArticleListModel::Outlet).data(Qt::DecorationRole).isValid());

    const QString shot = qEnvironmentVariable("FOURFOLD_NEAR_COPY_SHOT");
    if (!shot.isEmpty()) {
        QTableView view;
        view.setModel(&model);
        view.horizontalHeader()->setSectionResizeMode(
            ArticleListModel::Title, QHeaderView::Stretch);
        view.resize(640, 160);
        CHECK(view.grab().save(shot));
    }
}
