#include "core/model/huge_pages.h"
#include "tests/support/test_support.h"

#include <QFile>

#include <cstdint>
#include <vector>

using namespace fourfold;

namespace {

// The kB of anonymous huge pages in the mapping that holds `address` (/proc/self/smaps, Linux
// proc(5)), or -1 when no mapping holds it.
qint64 hugePagesKbAt(const void *address)
{
    QFile smaps(QStringLiteral("/proc/self/smaps"));
    REQUIRE(smaps.open(QIODevice::ReadOnly));
    const auto at = reinterpret_cast<std::uintptr_t>(address);
    bool inside = false;
    for (const QByteArray &line : smaps.readAll().split('\n')) {
        const qsizetype dash = line.indexOf('-');
        const qsizetype space = line.indexOf(' ');
        // A mapping's header ("begin-end perms offset dev inode path") begins with its range;
        // its fields ("AnonHugePages:   2048 kB") follow.
        if (dash > 0 && space > dash) {
            bool okBegin = false, okEnd = false;
            const auto begin = line.left(dash).toULongLong(&okBegin, 16);
            const auto end = line.mid(dash + 1, space - dash - 1).toULongLong(&okEnd, 16);
            inside = okBegin && okEnd && at >= begin && at < end;
            continue;
        }
        if (inside && line.startsWith("AnonHugePages:"))
            return line.mid(14).trimmed().split(' ').front().toLongLong();
    }
    return -1;
}

} // namespace

TEST_CASE("huge-page advice backs a large buffer with 2 MiB pages where the system allows")
{
    // The mode in brackets (Linux admin-guide/mm/transhuge): "never" ignores the advice.
    QFile mode(QStringLiteral("/sys/kernel/mm/transparent_hugepage/enabled"));
    const bool allowed = mode.open(QIODevice::ReadOnly) && !mode.readAll().contains("[never]");

    std::vector<std::int32_t> cells;
    cells.reserve(std::size_t(16) << 20 >> 2); // 16 MiB
    adviseHugePagesFor(cells);
    cells.resize(cells.capacity(), 7);
    const qint64 huge = hugePagesKbAt(cells.data() + cells.size() / 2);
    REQUIRE(huge >= 0);
    if (allowed)
        CHECK(huge >= 2048);
    CHECK(cells[cells.size() - 1] == 7);

    // Small, empty and unaligned buffers are left alone and stay usable.
    std::vector<char> small(1000, 'x');
    adviseHugePages(small.data(), small.size());
    adviseHugePages(nullptr, std::size_t(64) << 20);
    adviseHugePages(cells.data() + 1, 5 * 1024 * 1024);
    CHECK(small[999] == 'x');
    CHECK(cells[1] == 7);
}
