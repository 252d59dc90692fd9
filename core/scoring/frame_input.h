#pragma once
// What one frame analysis of a project runs on and what is saved of it: a layer's element
// indicators as a matrix with each article's groups (outlet, month, language), the frames ×
// groups tables, and the record of a finished analysis for SaveFrameAnalysisEdit. Shared by
// `fourfold-cli frames` and the desktop's Frames window, so both compute the same figures.

#include "core/frames/chi_square.h"
#include "core/frames/cluster_stability.h"
#include "core/frames/frame_analysis.h"
#include "core/model/article.h"
#include "core/model/error.h"
#include "core/model/saved_frame_analysis.h"
#include "core/scoring/element_indicators.h"

#include <QSet>
#include <QString>
#include <QStringList>

#include <map>
#include <vector>

namespace fourfold {

class Project;

// The articles and variables one analysis runs on, and the groups each article belongs to.
struct FrameInput {
    QString layer; // "gold", "consensus", "coder:P", "run:NAME"; empty for a matrix file
    QString source; // the file or "layer gold"
    QStringList variables;
    QStringList ids; // the articles as the user knows them (external id, else uuid)
    std::vector<ArticleSummary> articles; // project articles (empty for a matrix file)
    frames::FrameMatrix matrix;
    // "outlet", "month", "language" -> each article's group ("(unknown)" when it has none)
    std::map<QString, QStringList> groups;
    // The consensus layer: the share of each article's coders who coded each element (row-major
    // as the matrix); empty otherwise.
    std::vector<double> coderShares;
};

// The input of `project`'s layer `layer` (see elementIndicators; fails as it does). The month is
// the first seven characters of an ISO 8601 date.
Result<FrameInput> frameInput(const Project &project, const QString &layer);
FrameInput frameInput(ElementIndicators &&indicators);
// The rows of `input` whose articles (by id value) are in `keep`, in input order.
FrameInput restrictedFrameInput(const FrameInput &input, const QSet<qint64> &keep);

// A frames × groups table with chi-square and Cramér's V.
struct FrameGroupTable {
    QString name; // "outlet", "month", "language"
    QStringList groups; // sorted
    std::vector<long long> counts; // frames × groups, row-major
    frames::ChiSquareResult test;

    long long at(int frame, qsizetype group) const
    {
        return counts[size_t(frame) * size_t(groups.size()) + size_t(group)];
    }
};

// The table of `partition` by the groups `groupOf` (one per row of the partition).
FrameGroupTable frameGroupTable(
    const QString &name, const QStringList &groupOf, const frames::Partition &partition);
// One table per group kind of `input`, in the order of their names.
std::vector<FrameGroupTable> frameGroupTables(
    const FrameInput &input, const frames::Partition &partition);

// Ward + k-means with k clusters (one thread: bootstrap replicates run side by side), for
// clusterStability.
frames::ClusterMethod twoStepMethod(int k);

// How an analysis was asked for, kept with it when saved.
struct FrameRunSettings {
    int maxK = 10;
    int bootstrap = 0; // replicates; 0: no stability
    quint64 seed = 1; // start value of the bootstrap's generator
};

// The record of a finished analysis of `input` (a project layer) for saving: settings {layer,
// k, k_given, max_k, variables, articles, bootstrap, seed}, each frame's profile {size, share,
// elements: [{variable, share, overall, difference, residual}], closest: [ids], stability} and
// name (`names[f]` where given), each article's frame. Uuid and time are left for the edit.
SavedFrameAnalysis frameAnalysisRecord(const FrameInput &input,
    const frames::FrameAnalysis &analysis, const std::vector<frames::ClusterStability> &stability,
    const FrameRunSettings &settings, const QString &name, const QStringList &names = {});

} // namespace fourfold
