#pragma once
// A frame analysis as the lead saved it (tables frame_analysis, frame_cluster, frame_member of
// schema migration 8): its settings, each frame's name and profile, and which frame every article
// of the analysis fell into. Frames are numbered 0..k−1 as the analysis numbered them (by size,
// largest first).

#include "core/model/ids.h"

#include <QJsonObject>
#include <QString>

#include <utility>
#include <vector>

namespace fourfold {

struct SavedFrame {
    int cluster = 0; // 0..k−1
    QString name; // the lead's name for it; may be empty
    // {"size", "share", "elements": [{variable, share, overall, difference, residual}], "closest":
    // [article uuid, ...], "stability": {...}} (see frame_records.h)
    QJsonObject profile;
};

struct SavedFrameAnalysis {
    QString uuid;
    QString name; // unique among the live analyses of a project
    QString createdAt; // ISO 8601 UTC
    CoderId createdBy; // invalid for the command line
    // {"layer", "k", "k_given", "max_k", "variables": [...], "articles", "bootstrap", "seed"}
    QJsonObject settings;
    std::vector<SavedFrame> frames; // by cluster
    std::vector<std::pair<ArticleId, int>> members; // article → cluster, by article id
    qint64 memberCount = 0; // members.size() when loaded whole; the count in a listing
};

} // namespace fourfold
