// Saved frame analyses: the record of a finished analysis of the sample project's layer, saved
// through SaveFrameAnalysisEdit, listed and loaded back whole (settings, names, profiles, each
// article's frame), names unique, undo and redo of saving, deleting and naming a frame.
#include "core/frames/frame_analysis.h"
#include "core/project/frame_analysis_edits.h"
#include "core/project/project.h"
#include "core/project/saved_frames.h"
#include "core/project/testing/project_database.h"
#include "core/scoring/frame_input.h"
#include "tests/support/db_dump.h"

#include <QFile>
#include <QJsonArray>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

#include <map>

using namespace fourfold;

namespace {

// A copy of the sample project (built by fourfold-cli build-sample from sample-project/).
QString sampleCopy(const QTemporaryDir &dir)
{
    const QString path = dir.filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(QFile::copy(QStringLiteral(FOURFOLD_SAMPLE_PROJECT), path));
    return path;
}

struct Computed {
    FrameInput input;
    frames::FrameAnalysis analysis;
};

Computed analyse(const Project &project, const QString &layer, int k)
{
    auto input = frameInput(project, layer);
    REQUIRE(input);
    frames::FrameAnalysisOptions options;
    options.k = k;
    options.maxK = 4;
    auto analysis = frames::analyseFrames(input->matrix, options);
    REQUIRE(analysis);
    return {std::move(*input), std::move(*analysis)};
}

} // namespace

TEST_CASE("A saved frame analysis loads back with its settings names profiles and members")
{
    QTemporaryDir dir;
    const QString path = sampleCopy(dir);
    {
        auto project = Project::open(path);
        REQUIRE(project);
        const Computed c = analyse(*project, QStringLiteral("consensus"), 3);
        REQUIRE(c.input.matrix.rows >= 9);
        FrameRunSettings settings;
        settings.maxK = 4;
        settings.bootstrap = 20;
        settings.seed = 18446744073709551557ull; // above 2^53: kept exactly as text
        std::vector<frames::ClusterStability> stability(3);
        stability[1].meanJaccard = 0.42;
        stability[1].flagged = true;
        SaveFrameAnalysisEdit edit(frameAnalysisRecord(c.input, c.analysis, stability, settings,
                                       QStringLiteral("  Debate frames  "),
                                       {QStringLiteral("Costs"), QStringLiteral(" Blame ")}),
            CoderId {});
        REQUIRE(project->apply(edit));
        CHECK(!edit.analysis().uuid.isEmpty());

        auto list = SavedFrames::list(*project);
        REQUIRE(list);
        REQUIRE(list->size() == 1);
        CHECK(list->front().name == QStringLiteral("Debate frames"));
        CHECK(list->front().memberCount == qint64(c.input.matrix.rows));
        CHECK(list->front().members.empty()); // a listing leaves the members out
        REQUIRE(list->front().frames.size() == 3);
        CHECK(list->front().frames[2].name.isEmpty());
    }
    // Reopened: everything is in the file.
    auto project = Project::open(path);
    REQUIRE(project);
    const Computed c = analyse(*project, QStringLiteral("consensus"), 3);
    auto saved = SavedFrames::load(*project, QStringLiteral("Debate frames"));
    REQUIRE(saved);
    CHECK(saved->settings.value("layer").toString() == QStringLiteral("consensus"));
    CHECK(saved->settings.value("k").toInt() == 3);
    CHECK(saved->settings.value("k_given").toBool());
    CHECK(saved->settings.value("max_k").toInt() == 4);
    CHECK(saved->settings.value("bootstrap").toInt() == 20);
    CHECK(saved->settings.value("seed").toString() == QStringLiteral("18446744073709551557"));
    CHECK(saved->settings.value("articles").toInt() == int(c.input.matrix.rows));
    CHECK(saved->settings.value("variables").toVariant().toStringList() == c.input.variables);
    REQUIRE(saved->frames.size() == 3);
    CHECK(saved->frames[0].name == QStringLiteral("Costs"));
    CHECK(saved->frames[1].name == QStringLiteral("Blame"));
    // Each frame's profile: the kernel's size, shares and residuals, and the stability given.
    for (size_t f = 0; f < 3; ++f) {
        const QJsonObject profile = saved->frames[f].profile;
        const frames::FrameProfile &computed = c.analysis.profiles[f];
        CHECK(profile.value("size").toInt() == computed.size);
        const QJsonArray elements = profile.value("elements").toArray();
        REQUIRE(elements.size() == c.input.variables.size());
        for (qsizetype v = 0; v < elements.size(); ++v) {
            const QJsonObject e = elements[v].toObject();
            CHECK(e.value("variable").toString() == c.input.variables[v]);
            CHECK(e.value("share").toDouble() == computed.variables[size_t(v)].share);
            CHECK(e.value("overall").toDouble() == computed.variables[size_t(v)].overall);
            const auto residual = computed.variables[size_t(v)].residual;
            CHECK(e.value("residual").isNull() == !residual);
            if (residual)
                CHECK(e.value("residual").toDouble() == *residual);
        }
        CHECK(profile.value("closest").toArray().size() == qsizetype(computed.closest.size()));
    }
    CHECK(saved->frames[1].profile.value("stability").toObject().value("flagged").toBool());
    CHECK(saved->frames[1].profile.value("stability").toObject().value("mean_jaccard").toDouble()
        == 0.42);
    // Membership: each article in the frame the analysis put it in, sizes adding up.
    std::map<qint64, int> computedFrame;
    for (size_t i = 0; i < c.input.articles.size(); ++i)
        computedFrame[c.input.articles[i].id.value] = c.analysis.frames.partition.labels[i];
    REQUIRE(saved->members.size() == computedFrame.size());
    std::vector<int> sizes(3, 0);
    for (const auto &[article, cluster] : saved->members) {
        CHECK(computedFrame.at(article.value) == cluster);
        ++sizes[size_t(cluster)];
    }
    for (size_t f = 0; f < 3; ++f)
        CHECK(sizes[f] == c.analysis.profiles[f].size);
}

TEST_CASE("Saving frames needs a free name and its undo and redo restore the file")
{
    QTemporaryDir dir;
    auto project = Project::open(sampleCopy(dir));
    REQUIRE(project);
    const Computed c = analyse(*project, QStringLiteral("coder:C01"), 2);
    const QString before = test::dumpDatabase(databaseForTesting(*project));

    SaveFrameAnalysisEdit first(
        frameAnalysisRecord(c.input, c.analysis, {}, {}, QStringLiteral("C01")), CoderId {});
    REQUIRE(project->apply(first));
    const QString saved = test::dumpDatabase(databaseForTesting(*project));
    CHECK(saved != before);

    // The same name again is refused and adds nothing; so is an empty name.
    SaveFrameAnalysisEdit again(
        frameAnalysisRecord(c.input, c.analysis, {}, {}, QStringLiteral("C01")), CoderId {});
    const Status duplicate = project->apply(again);
    REQUIRE(!duplicate);
    CHECK(duplicate.error().code == ErrorCode::Duplicate);
    CHECK(duplicate.error().message.contains(QStringLiteral("\"C01\"")));
    SaveFrameAnalysisEdit unnamed(
        frameAnalysisRecord(c.input, c.analysis, {}, {}, QStringLiteral("  ")), CoderId {});
    const Status empty = project->apply(unnamed);
    REQUIRE(!empty);
    CHECK(empty.error().code == ErrorCode::InvalidArgument);
    CHECK(test::dumpDatabase(databaseForTesting(*project)) == saved);

    // Undo removes every row; redo brings back the same analysis (same uuid).
    REQUIRE(project->revert(first));
    CHECK(test::dumpDatabase(databaseForTesting(*project)) == before);
    CHECK(SavedFrames::load(*project, QStringLiteral("C01")).error().code == ErrorCode::NotFound);
    const QString uuid = first.analysis().uuid;
    REQUIRE(project->apply(first));
    CHECK(test::dumpDatabase(databaseForTesting(*project)) == saved);
    CHECK(SavedFrames::load(*project, QStringLiteral("C01"))->uuid == uuid);

    // Naming a frame, and its undo.
    NameFrameEdit name(uuid, 1, QStringLiteral("Second frame"), CoderId {});
    REQUIRE(project->apply(name));
    CHECK(SavedFrames::load(*project, QStringLiteral("C01"))->frames[1].name
        == QStringLiteral("Second frame"));
    REQUIRE(project->revert(name));
    CHECK(test::dumpDatabase(databaseForTesting(*project)) == saved);
    NameFrameEdit noFrame(uuid, 2, QStringLiteral("x"), CoderId {});
    CHECK(project->apply(noFrame).error().code == ErrorCode::NotFound);

    // Deleting leaves a tombstone: the name is free again; undo brings it back unless the name
    // was taken meanwhile.
    DeleteFrameAnalysisEdit remove(uuid, QStringLiteral("C01"), CoderId {});
    REQUIRE(project->apply(remove));
    CHECK(SavedFrames::list(*project)->empty());
    CHECK(project->apply(remove).error().code == ErrorCode::NotFound); // already deleted
    REQUIRE(project->revert(remove));
    CHECK(test::dumpDatabase(databaseForTesting(*project)) == saved);
    REQUIRE(project->apply(remove));
    SaveFrameAnalysisEdit replacement(
        frameAnalysisRecord(c.input, c.analysis, {}, {}, QStringLiteral("C01")), CoderId {});
    REQUIRE(project->apply(replacement));
    const Status back = project->revert(remove);
    REQUIRE(!back);
    CHECK(back.error().code == ErrorCode::Duplicate);
    REQUIRE(SavedFrames::list(*project)->size() == 1);
    CHECK(SavedFrames::list(*project)->front().uuid == replacement.analysis().uuid);
}
