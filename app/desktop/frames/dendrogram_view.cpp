#include "app/desktop/frames/dendrogram_view.h"

#include <QHash>
#include <QPainter>
#include <QPainterPath>

#include <algorithm>
#include <cmath>
#include <functional>

namespace fourfold {

DendrogramView::DendrogramView(QWidget *parent)
    : QWidget(parent)
{
    setBackgroundRole(QPalette::Base);
    setAutoFillBackground(true);
}

void DendrogramView::setSchedule(const std::vector<frames::WardMerge> &schedule, int rows, int k)
{
    m_nodes.clear();
    m_leafSizes.clear();
    m_top = 0;
    m_cut = -1;
    const int merges = int(schedule.size());
    if (rows < 2 || merges != rows - 1) {
        update();
        return;
    }
    const int shown = std::min(kShownMerges, merges);
    const int firstShown = merges - shown; // merges before it are hidden inside the leaves
    auto sizeOf = [&](int cluster) {
        return cluster < rows ? 1 : schedule[size_t(cluster - rows)].size;
    };
    // Cluster id -> node; leaves found by walking down from the root, left before right, so that
    // no branches cross.
    QHash<int, int> nodeOf;
    std::vector<int> leafOrder;
    std::function<void(int)> walk = [&](int cluster) {
        const int s = cluster - rows;
        if (s < firstShown) {
            leafOrder.push_back(cluster);
            return;
        }
        walk(schedule[size_t(s)].first);
        walk(schedule[size_t(s)].second);
    };
    walk(rows + merges - 1);
    for (size_t i = 0; i < leafOrder.size(); ++i) {
        Node leaf;
        leaf.x = double(i);
        leaf.size = sizeOf(leafOrder[i]);
        nodeOf.insert(leafOrder[i], int(m_nodes.size()));
        m_nodes.push_back(leaf);
        m_leafSizes.push_back(leaf.size);
    }
    for (int s = firstShown; s < merges; ++s) {
        const frames::WardMerge &m = schedule[size_t(s)];
        Node node;
        node.left = nodeOf.value(m.first);
        node.right = nodeOf.value(m.second);
        node.height = m.height;
        node.size = m.size;
        node.x = (m_nodes[size_t(node.left)].x + m_nodes[size_t(node.right)].x) / 2;
        nodeOf.insert(rows + s, int(m_nodes.size()));
        m_nodes.push_back(node);
    }
    m_top = schedule.back().height;
    // The k − 1 last merges lie above the cut: it runs halfway between merge n − k − 1 and n − k.
    if (k >= 2 && k <= rows && k - 1 <= shown)
        m_cut = (k == rows
                ? 0
                : (schedule[size_t(rows - k - 1)].height + schedule[size_t(rows - k)].height) / 2);
    update();
}

void DendrogramView::paintEvent(QPaintEvent *)
{
    QPainter painter(this);
    painter.setRenderHint(QPainter::Antialiasing);
    if (m_nodes.empty() || m_top <= 0) {
        painter.setPen(palette().color(QPalette::PlaceholderText));
        painter.drawText(rect(), Qt::AlignCenter, tr("No tree yet."));
        return;
    }
    const QFontMetrics fm = fontMetrics();
    const int left = fm.horizontalAdvance(QStringLiteral("0.000")) + 12;
    const int bottom = fm.height() + 8;
    const QRectF plot(left, 8, width() - left - 10, height() - bottom - 16);
    const double leaves = double(m_leafSizes.size());
    auto xOf = [&](double x) { return plot.left() + (x + 0.5) * plot.width() / leaves; };
    auto yOf = [&](double h) { return plot.bottom() - h / m_top * plot.height(); };

    // Axis with four ticks.
    painter.setPen(palette().color(QPalette::Mid));
    painter.drawLine(QPointF(plot.left(), plot.top()), QPointF(plot.left(), plot.bottom()));
    for (int t = 0; t <= 4; ++t) {
        const double h = m_top * t / 4;
        const double y = yOf(h);
        painter.drawLine(QPointF(plot.left() - 4, y), QPointF(plot.left(), y));
        painter.drawText(QRectF(0, y - fm.height() / 2.0, left - 6, fm.height()),
            Qt::AlignRight | Qt::AlignVCenter, QString::number(h, 'f', h < 10 ? 2 : 1));
    }

    QPen branch(palette().color(QPalette::Text), 1.4);
    painter.setPen(branch);
    for (const Node &node : m_nodes) {
        if (node.left < 0)
            continue;
        const Node &a = m_nodes[size_t(node.left)];
        const Node &b = m_nodes[size_t(node.right)];
        QPainterPath path;
        path.moveTo(xOf(a.x), yOf(a.height));
        path.lineTo(xOf(a.x), yOf(node.height));
        path.lineTo(xOf(b.x), yOf(node.height));
        path.lineTo(xOf(b.x), yOf(b.height));
        painter.drawPath(path);
    }
    // Leaves: their number of articles, when there is room for it.
    const double step = plot.width() / leaves;
    painter.setPen(palette().color(QPalette::Text));
    for (size_t i = 0; i < m_leafSizes.size(); ++i) {
        const QString label = QString::number(m_leafSizes[i]);
        if (fm.horizontalAdvance(label) > step - 2 && m_leafSizes.size() > 1)
            continue;
        painter.drawText(QRectF(xOf(double(i)) - step / 2, plot.bottom() + 4, step, fm.height()),
            Qt::AlignCenter, label);
    }
    if (m_cut >= 0) {
        QPen cut(palette().color(QPalette::Highlight), 1.2, Qt::DashLine);
        painter.setPen(cut);
        painter.drawLine(QPointF(plot.left(), yOf(m_cut)), QPointF(plot.right(), yOf(m_cut)));
    }
}

} // namespace fourfold
