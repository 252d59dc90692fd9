#pragma once
// The unit ids of a table being read, for finding a repeated one (core/io's matrix readers).

#include "core/model/reliability_table.h"

#include <QHash>
#include <QtGlobal>

#include <algorithm>
#include <bit>
#include <vector>

namespace fourfold {

// The units read so far, for finding a repeated unit id without a second string per unit: an
// open-addressing set of positions in the table with their ids' hashes, so that a probe compares
// ids only when the hashes agree.
class UnitIndex
{
public:
    // `expected`: how many units will come (the table grows past it if need be).
    UnitIndex(const ReliabilityTable &table, qsizetype expected)
        : m_table(table)
    {
        resize(std::bit_ceil(size_t(std::max<qsizetype>(32, 2 * expected))));
    }

    // Adds the last unit of the list. Returns the position of an earlier unit with the same
    // id (the last one is then not added), or -1.
    qsizetype insertLast()
    {
        if (2 * (m_count + 1) > m_slots.size())
            resize(2 * m_slots.size());
        const quint32 position = quint32(m_table.unitCount() - 1);
        const QStringView unit = m_table.ownId(position);
        const quint32 hash = quint32(qHash(unit));
        for (size_t at = hash & m_mask;; at = (at + 1) & m_mask) {
            Slot &slot = m_slots[at];
            if (slot.position == 0) {
                slot = Slot {hash, position + 1};
                ++m_count;
                return -1;
            }
            if (slot.hash == hash && m_table.ownId(slot.position - 1) == unit)
                return slot.position - 1;
        }
    }

private:
    struct Slot {
        quint32 hash = 0;
        quint32 position = 0; // in the table, plus one; 0 for an empty slot
    };

    void resize(size_t size)
    {
        std::vector<Slot> previous(size);
        previous.swap(m_slots);
        m_mask = size - 1;
        for (const Slot &slot : previous)
            if (slot.position != 0) {
                size_t at = slot.hash & m_mask;
                while (m_slots[at].position != 0)
                    at = (at + 1) & m_mask;
                m_slots[at] = slot;
            }
    }

    const ReliabilityTable &m_table;
    std::vector<Slot> m_slots; // a power of two, at most half full
    size_t m_mask = 0;
    size_t m_count = 0;
};

} // namespace fourfold
