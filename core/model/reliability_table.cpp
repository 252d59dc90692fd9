#include "core/model/reliability_table.h"

#include "core/model/huge_pages.h"

#include <algorithm>

namespace fourfold {

QString unitArticle(QStringView unitId)
{
    // The unit suffix "#" + one of p, s, t, a + digits, if the id ends in one. Called per unit
    // of tables with millions, so read by hand rather than by a regular expression.
    const qsizetype hash = unitId.lastIndexOf(QLatin1Char('#'));
    if (hash < 0 || hash + 2 >= unitId.size()
        || !QStringView(u"psta").contains(unitId.at(hash + 1)))
        return unitId.toString();
    for (qsizetype i = hash + 2; i < unitId.size(); ++i)
        if (unitId.at(i) < QLatin1Char('0') || unitId.at(i) > QLatin1Char('9'))
            return unitId.toString();
    return unitId.left(hash).toString();
}

qint32 ReliabilityTable::labelIndex(QStringView label)
{
    // A study has a handful of labels: comparing with each is cheaper than hashing.
    if (m_labelIndex.isEmpty()) {
        for (qsizetype i = 0; i < m_labels.size(); ++i)
            if (m_labels[i].size() == label.size() && QStringView(m_labels[i]) == label)
                return qint32(i);
        m_labels << label.toString();
        if (m_labels.size() > kScannedLabels)
            indexLabels();
        return qint32(m_labels.size() - 1);
    }
    auto found = m_labelIndex.constFind(label.toString());
    if (found == m_labelIndex.constEnd()) {
        m_labels << label.toString();
        found = m_labelIndex.insert(m_labels.back(), qint32(m_labels.size() - 1));
    }
    return *found;
}

QString ReliabilityTable::cellText(size_t unit, qsizetype coder) const
{
    const qint32 l = cell(unit, coder);
    return l == kMissing ? QString() : m_labels[l];
}

QStringList ReliabilityTable::rowText(size_t unit) const
{
    QStringList out;
    for (qsizetype c = 0; c < coders.size(); ++c)
        out << cellText(unit, c);
    return out;
}

void ReliabilityTable::relabel(const std::vector<qint32> &relabel, const QStringList &labels)
{
    for (qint32 &c : m_cells)
        if (c != kMissing)
            c = relabel[size_t(c)];
    m_labels = labels;
    m_labelIndex.clear();
    if (m_labels.size() > kScannedLabels)
        indexLabels();
}

void ReliabilityTable::recodeLabels(
    const std::function<std::optional<QString>(const QString &)> &counted)
{
    QStringList labels;
    QHash<QString, qint32> index;
    std::vector<qint32> to(size_t(m_labels.size()), kMissing);
    for (qsizetype l = 0; l < m_labels.size(); ++l) {
        const std::optional<QString> label = counted(m_labels[l]);
        if (!label)
            continue;
        const auto found = index.constFind(*label);
        if (found != index.constEnd()) {
            to[size_t(l)] = *found;
            continue;
        }
        to[size_t(l)] = qint32(labels.size());
        index.insert(*label, qint32(labels.size()));
        labels << *label;
    }
    relabel(to, labels);
}

void ReliabilityTable::indexLabels()
{
    for (qsizetype i = 0; i < m_labels.size(); ++i)
        m_labelIndex.insert(m_labels[i], qint32(i));
}

void ReliabilityTable::reserve(size_t units, size_t idCharacters)
{
    m_ownText.reserve(m_ownText.size() + qsizetype(idCharacters));
    m_cells.reserve(m_cells.size() + units * size_t(coders.size()));
    m_ownEnd.reserve(m_ownEnd.size() + units);
    // Filled from start to end: 2 MiB pages spare a page fault per 4 KiB (huge_pages.h).
    adviseHugePages(m_ownText.constData(), size_t(m_ownText.capacity()) * sizeof(QChar));
    adviseHugePagesFor(m_cells);
    adviseHugePagesFor(m_ownEnd);
}

void ReliabilityTable::appendUnit(QStringView id, std::span<const qint32> cells, qint64 line)
{
    m_ownText += id;
    appendOwnUnit(cells, line);
}

void ReliabilityTable::appendUnit(QLatin1String id, std::span<const qint32> cells, qint64 line)
{
    m_ownText += id;
    appendOwnUnit(cells, line);
}

void ReliabilityTable::appendOwnUnit(std::span<const qint32> cells, qint64 line)
{
    if (m_blocks.empty() || m_blocks.back().numbered)
        m_blocks.push_back(Block {m_unitCount, 0, false, {}, {}, 0, m_ownEnd.size()});
    ++m_blocks.back().count;
    m_ownEnd.push_back(m_ownText.size());
    appendOwnLine(m_ownEnd.size() - 1, line);
    m_cells.insert(m_cells.end(), cells.begin(), cells.end());
    ++m_unitCount;
}

void ReliabilityTable::appendOwnLine(size_t own, qint64 line)
{
    if (own == 0) {
        m_firstOwnLine = line;
        m_ownLinesFollow = true;
        m_ownLine.clear();
        return;
    }
    if (m_ownLinesFollow) {
        if (line == m_firstOwnLine + qint64(own))
            return;
        // The first id off the run: every line so far is written out.
        m_ownLinesFollow = false;
        m_ownLine.reserve(own + 1);
        for (size_t k = 0; k < own; ++k)
            m_ownLine.push_back(m_firstOwnLine + qint64(k));
    }
    m_ownLine.push_back(line);
}

qint64 ReliabilityTable::ownLine(size_t own) const
{
    return m_ownLinesFollow ? m_firstOwnLine + qint64(own) : m_ownLine[own];
}

void ReliabilityTable::appendUnit(QStringView id, const QStringList &cells, qint64 line)
{
    std::vector<qint32> row;
    for (const QString &c : cells)
        row.push_back(c.isEmpty() ? kMissing : labelIndex(c));
    appendUnit(id, row, line);
}

void ReliabilityTable::appendNumberedUnits(
    const QString &article, const QString &marker, std::span<const qint32> cells)
{
    const size_t count = coders.isEmpty() ? 0 : cells.size() / size_t(coders.size());
    if (count == 0)
        return;
    m_blocks.push_back(Block {m_unitCount, count, true, article, marker, 1, 0});
    m_cells.insert(m_cells.end(), cells.begin(), cells.begin() + qsizetype(count) * coders.size());
    m_unitCount += count;
}

void ReliabilityTable::appendColumn(const QString &coder, std::span<const qint32> cells)
{
    const size_t was = size_t(coders.size());
    std::vector<qint32> grown(m_unitCount * (was + 1));
    for (size_t u = 0; u < m_unitCount; ++u) {
        std::copy_n(
            m_cells.begin() + qsizetype(u * was), was, grown.begin() + qsizetype(u * (was + 1)));
        grown[u * (was + 1) + was] = u < cells.size() ? cells[u] : kMissing;
    }
    m_cells = std::move(grown);
    coders << coder;
}

const ReliabilityTable::Block &ReliabilityTable::blockOf(size_t unit) const
{
    auto after = std::upper_bound(m_blocks.begin(), m_blocks.end(), unit,
        [](size_t u, const Block &b) { return u < b.first; });
    return *(after - 1);
}

QString ReliabilityTable::unitId(size_t unit) const
{
    const Block &b = blockOf(unit);
    if (b.numbered)
        return b.article + b.marker + QString::number(b.firstNumber + (unit - b.first));
    return ownId(unit).toString();
}

QStringList ReliabilityTable::unitIds() const
{
    QStringList out;
    out.reserve(qsizetype(m_unitCount));
    for (size_t u = 0; u < m_unitCount; ++u)
        out << unitId(u);
    return out;
}

QStringView ReliabilityTable::ownId(size_t unit) const
{
    const Block &b = blockOf(unit);
    if (b.numbered)
        return {};
    const size_t own = b.firstOwn + (unit - b.first);
    const qsizetype start = own == 0 ? 0 : m_ownEnd[own - 1];
    return QStringView(m_ownText).mid(start, m_ownEnd[own] - start);
}

qint64 ReliabilityTable::unitLine(size_t unit) const
{
    if (unit >= m_unitCount)
        return 0;
    const Block &b = blockOf(unit);
    return b.numbered ? 0 : ownLine(b.firstOwn + (unit - b.first));
}

std::vector<qint32> ReliabilityTable::unitArticles(QStringList &articles) const
{
    std::vector<qint32> out(m_unitCount);
    QHash<QString, qint32> index;
    const auto indexOf = [&](const QString &article) {
        auto it = index.constFind(article);
        if (it == index.constEnd()) {
            it = index.insert(article, qint32(articles.size()));
            articles << article;
        }
        return *it;
    };
    for (const Block &b : m_blocks) {
        if (b.numbered) {
            std::fill_n(out.begin() + qsizetype(b.first), b.count, indexOf(b.article));
            continue;
        }
        for (size_t u = b.first; u < b.first + b.count; ++u)
            out[u] = indexOf(unitArticle(ownId(u)));
    }
    return out;
}

void ReliabilityTable::appendBlockUnit(
    const Block &from, size_t unit, const ReliabilityTable &origin)
{
    const auto cells = origin.row(unit);
    if (!from.numbered) {
        appendUnit(origin.ownId(unit), cells, origin.unitLine(unit));
        return;
    }
    // A numbered unit joins the last block when it follows on from it.
    const size_t number = from.firstNumber + (unit - from.first);
    if (m_blocks.empty() || !m_blocks.back().numbered || m_blocks.back().article != from.article
        || m_blocks.back().marker != from.marker
        || m_blocks.back().firstNumber + m_blocks.back().count != number)
        m_blocks.push_back(Block {m_unitCount, 0, true, from.article, from.marker, number, 0});
    ++m_blocks.back().count;
    m_cells.insert(m_cells.end(), cells.begin(), cells.end());
    ++m_unitCount;
}

ReliabilityTable ReliabilityTable::rows(std::span<const size_t> units) const
{
    ReliabilityTable out;
    out.coders = coders;
    out.source = source;
    out.m_labels = m_labels;
    out.m_labelIndex = m_labelIndex;
    out.m_cells.reserve(units.size() * size_t(coders.size()));
    for (size_t u : units)
        out.appendBlockUnit(blockOf(u), u, *this);
    return out;
}

ReliabilityTable ReliabilityTable::columns(std::span<const qsizetype> columns) const
{
    // Everything but the cells is shared (implicitly, for the Qt members) or small; the cells
    // are not copied only to be replaced.
    ReliabilityTable out;
    out.source = source;
    out.m_labels = m_labels;
    out.m_labelIndex = m_labelIndex;
    out.m_unitCount = m_unitCount;
    out.m_blocks = m_blocks;
    out.m_ownText = m_ownText;
    out.m_ownEnd = m_ownEnd;
    out.m_firstOwnLine = m_firstOwnLine;
    out.m_ownLinesFollow = m_ownLinesFollow;
    out.m_ownLine = m_ownLine;
    for (qsizetype c : columns)
        out.coders << coders[c];
    out.m_cells.reserve(m_unitCount * columns.size());
    for (size_t u = 0; u < m_unitCount; ++u)
        for (qsizetype c : columns)
            out.m_cells.push_back(cell(u, c));
    return out;
}

} // namespace fourfold
