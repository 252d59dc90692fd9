#pragma once
// The computation behind the Frames window, with no widgets: it runs on a worker thread
// (QtConcurrent) with its own connection to the project file. It builds the layer's element
// indicators, clusters them (Ward, then k-means from Ward's centroids), tables the frames by
// outlet and month, and with a bootstrap measures each frame's stability (Hennig 2007).

#include "core/scoring/frame_input.h"

#include <QString>

#include <atomic>
#include <functional>
#include <memory>
#include <vector>

namespace fourfold {

struct FramesRequest {
    QString projectPath;
    QString layer = QStringLiteral("gold");
    int k = 0; // 0: where most k-choice indices point
    int maxK = 10;
    int bootstrap = 0; // replicates; 0: no stability
    quint64 seed = 1; // start value of the bootstrap's generator
};

struct FramesOutcome {
    FramesRequest request;
    FrameInput input;
    frames::FrameAnalysis analysis;
    std::vector<frames::ClusterStability> stability; // one per frame, or empty
    std::vector<FrameGroupTable> tables; // by language, month, outlet
};

// Called on the worker thread with the steps done and the steps in all (the bootstrap counts a
// step per replicate); returns false to cancel.
using FramesProgress = std::function<bool(int done, int total)>;

// The fewest articles frames are computed on.
inline constexpr int kFewestFrameArticles = 3;

// Computes everything the window shows. Fails with the project's error, with InvalidInput when
// the layer holds fewer than kFewestFrameArticles articles (the message names the layer and the
// number), with the kernels' refusal as InvalidInput, or with Cancelled.
Result<FramesOutcome> runFramesJob(const FramesRequest &request, const FramesProgress &progress);

} // namespace fourfold
