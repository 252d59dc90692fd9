#pragma once
// The top of Ward's tree as a dendrogram: the last merges of the agglomeration schedule (at most
// kShownMerges), the clusters below them drawn as leaves labelled with their number of articles
// (SciPy's "lastp" truncation), merge heights on the vertical axis, and the cut that gives the
// chosen number of frames as a dashed line.

#include "core/frames/ward_clustering.h"

#include <QWidget>

#include <vector>

namespace fourfold {

class DendrogramView : public QWidget
{
    Q_OBJECT
public:
    static constexpr int kShownMerges = 30;

    explicit DendrogramView(QWidget *parent = nullptr);

    // The schedule of `rows` articles (empty: nothing shown) and the k whose cut is drawn.
    void setSchedule(const std::vector<frames::WardMerge> &schedule, int rows, int k);
    // The leaves drawn (clusters below the shown merges), left to right, with their sizes.
    const std::vector<int> &leafSizes() const { return m_leafSizes; }

    QSize sizeHint() const override { return {520, 300}; }
    QSize minimumSizeHint() const override { return {240, 160}; }

protected:
    void paintEvent(QPaintEvent *event) override;

private:
    struct Node {
        double x = 0; // leaf units
        double height = 0;
        int left = -1; // node indices; -1 for a leaf
        int right = -1;
        int size = 0;
    };
    std::vector<Node> m_nodes; // leaves first, then the shown merges in order; the last is the root
    std::vector<int> m_leafSizes;
    double m_top = 0;
    double m_cut = -1; // height of the cut line; < 0: none
};

} // namespace fourfold
