#include "core/io/reliability_table_bytes.h"

#include "core/model/huge_pages.h"

#include <QChar>
#include <QStringDecoder>

#include <algorithm>
#include <cstdint>
#include <cstring>
#include <deque>
#include <string>
#include <string_view>
#include <unordered_map>
#include <vector>

namespace fourfold {

namespace {

// True if `bytes` is UTF-8 without a NUL byte, by the rules decodeUtf8Strict applies (Unicode
// 15.0 §3.9 Table 3-7: the lead byte fixes the length and the range allowed for the second byte;
// every later byte is 0x80..0xBF). Eight ASCII bytes are passed at a time.
bool isCleanUtf8(std::string_view bytes)
{
    const auto *p = reinterpret_cast<const unsigned char *>(bytes.data());
    const size_t n = bytes.size();
    size_t i = 0;
    while (i < n) {
        if (i + 8 <= n) {
            std::uint64_t word;
            std::memcpy(&word, p + i, 8);
            // No byte with its high bit set and none zero (the classic has-zero-byte test).
            const bool ascii = (word & 0x8080808080808080ULL) == 0;
            const bool zero = ((word - 0x0101010101010101ULL) & ~word & 0x8080808080808080ULL) != 0;
            if (ascii && !zero) {
                i += 8;
                continue;
            }
        }
        const unsigned char b = p[i];
        if (b < 0x80) {
            if (b == 0)
                return false;
            ++i;
            continue;
        }
        size_t length = 0;
        unsigned char low = 0x80;
        unsigned char high = 0xBF;
        if (b < 0xC2)
            return false;
        if (b < 0xE0) {
            length = 2;
        } else if (b < 0xF0) {
            length = 3;
            low = b == 0xE0 ? 0xA0 : 0x80;
            high = b == 0xED ? 0x9F : 0xBF;
        } else if (b < 0xF5) {
            length = 4;
            low = b == 0xF0 ? 0x90 : 0x80;
            high = b == 0xF4 ? 0x8F : 0xBF;
        } else {
            return false;
        }
        if (i + length > n || p[i + 1] < low || p[i + 1] > high)
            return false;
        for (size_t k = 2; k < length; ++k)
            if ((p[i + k] & 0xC0) != 0x80)
                return false;
        i += length;
    }
    return true;
}

// The code point that starts at `p` (valid UTF-8).
char32_t codePointAt(const unsigned char *p)
{
    if (p[0] < 0x80)
        return p[0];
    if (p[0] < 0xE0)
        return char32_t((p[0] & 0x1F) << 6 | (p[1] & 0x3F));
    if (p[0] < 0xF0)
        return char32_t((p[0] & 0x0F) << 12 | (p[1] & 0x3F) << 6 | (p[2] & 0x3F));
    return char32_t((p[0] & 0x07) << 18 | (p[1] & 0x3F) << 12 | (p[2] & 0x3F) << 6 | (p[3] & 0x3F));
}

// Trims what QStringView::trimmed() trims (QChar::isSpace), straight on valid UTF-8.
std::string_view trimmed(std::string_view s)
{
    const auto *p = reinterpret_cast<const unsigned char *>(s.data());
    size_t begin = 0;
    size_t end = s.size();
    while (begin < end) {
        size_t width = 1;
        if (p[begin] >= 0x80)
            width = p[begin] < 0xE0 ? 2 : p[begin] < 0xF0 ? 3 : 4;
        if (!QChar::isSpace(codePointAt(p + begin)))
            break;
        begin += width;
    }
    while (end > begin) {
        size_t last = end - 1;
        while (last > begin && (p[last] & 0xC0) == 0x80)
            --last;
        if (!QChar::isSpace(codePointAt(p + last)))
            break;
        end = last;
    }
    return s.substr(begin, end - begin);
}

// The text of a piece of the file. QString::fromUtf8 drops a leading BOM, which inside a file is
// a character (ZERO WIDTH NO-BREAK SPACE) that the decoded reading keeps.
QString text(std::string_view bytes)
{
    if (!bytes.starts_with("\xEF\xBB\xBF"))
        return QString::fromUtf8(bytes.data(), qsizetype(bytes.size()));
    QStringDecoder decoder(QStringConverter::Utf8,
        QStringConverter::Flag::Stateless | QStringConverter::Flag::ConvertInitialBom);
    return decoder.decode(QByteArrayView(bytes.data(), qsizetype(bytes.size())));
}

struct ViewHash {
    using is_transparent = void;
    size_t operator()(std::string_view s) const { return std::hash<std::string_view> {}(s); }
};

// The label indices of the table by their UTF-8 bytes, so a cell costs a lookup, never a string.
class Labels
{
public:
    explicit Labels(ReliabilityTable &table)
        : m_table(table)
    { }

    qint32 index(std::string_view label)
    {
        // A handful of short labels is the common case: comparing with each, eight bytes at a
        // time, beats hashing.
        const std::uint64_t key = packed(label);
        for (const Few &known : m_few)
            if (known.key == key && known.label.size() == label.size()
                && (label.size() <= 8 || known.label == label))
                return known.index;
        if (m_few.size() < kFew && m_many.empty()) {
            const qint32 index = add(label);
            m_few.push_back({m_stored.back(), key, index});
            return index;
        }
        if (const auto found = m_many.find(label); found != m_many.end())
            return found->second;
        const qint32 index = add(label);
        m_many.emplace(m_stored.back(), index);
        return index;
    }

private:
    static constexpr size_t kFew = 16;

    qint32 add(std::string_view label)
    {
        m_stored.emplace_back(label);
        return m_table.labelIndex(text(label));
    }

    struct Few {
        std::string_view label;
        std::uint64_t key; // its first eight bytes
        qint32 index;
    };

    // The first eight bytes of `label`, zero-filled.
    static std::uint64_t packed(std::string_view label)
    {
        std::uint64_t key = 0;
        std::memcpy(&key, label.data(), std::min<size_t>(label.size(), 8));
        return key;
    }

    ReliabilityTable &m_table;
    std::vector<Few> m_few;
    std::unordered_map<std::string, qint32, ViewHash, std::equal_to<>> m_many;
    std::deque<std::string> m_stored; // the labels' bytes, at fixed addresses
};

// True if two units share an id. `keys`: each unit's id hash in the high half and its position
// in the low half; sorted here by hash (least significant digit radix sort of the high half,
// eight bits a pass: Knuth, TAOCP vol. 3, §5.2.5), so that units with equal ids are neighbours.
bool hasRepeatedId(const ReliabilityTable &table, std::vector<quint64> &keys)
{
    std::vector<quint64> buffer;
    buffer.reserve(keys.size());
    adviseHugePagesFor(buffer);
    buffer.resize(keys.size());
    for (int shift = 32; shift < 64; shift += 8) {
        size_t start[257] = {};
        for (const quint64 key : keys)
            ++start[((key >> shift) & 0xFF) + 1];
        for (int digit = 0; digit < 256; ++digit)
            start[digit + 1] += start[digit];
        for (const quint64 key : keys)
            buffer[start[(key >> shift) & 0xFF]++] = key;
        keys.swap(buffer);
    }
    for (size_t i = 1; i < keys.size(); ++i)
        for (size_t j = i; j-- > 0 && (keys[j] >> 32) == (keys[i] >> 32);)
            if (table.ownId(size_t(quint32(keys[j]))) == table.ownId(size_t(quint32(keys[i]))))
                return true;
    return false;
}

} // namespace

std::optional<ReliabilityTable> readReliabilityTableBytes(
    std::string_view bytes, const QString &path)
{
    if (!isCleanUtf8(bytes))
        return std::nullopt;
    if (bytes.starts_with("\xEF\xBB\xBF"))
        bytes.remove_prefix(3);

    ReliabilityTable table;
    table.source = path;
    Labels labels(table);
    const qsizetype lines = qsizetype(std::ranges::count(bytes, '\n')) + 1;
    // Each unit's id hash (high half) and position (low half), checked for repeats at the end:
    // written in file order, then sorted, which costs less than a probe into a large hash table
    // per row (a cache miss each).
    std::vector<quint64> idHashes;

    std::vector<std::string_view> fields;
    std::string unescaped; // this record's quoted fields that held doubled quotes, end to end
    std::vector<std::pair<size_t, size_t>> unescapedFields; // (field, offset) into `unescaped`
    std::vector<qint32> cells;
    qsizetype columns = 0;

    // One record, as the decoded reading takes it; false where that reading would fail (it
    // then says why).
    const auto record = [&](qint64 line) -> bool {
        for (const auto &[field, offset] : unescapedFields)
            fields[field] = std::string_view(unescaped).substr(offset, fields[field].size());
        if (columns == 0) {
            columns = qsizetype(fields.size());
            const std::string_view first = trimmed(fields[0]);
            if (text(first).compare(QLatin1String("unit"), Qt::CaseInsensitive) != 0)
                return false;
            for (qsizetype i = 1; i < columns; ++i) {
                const std::string_view name = trimmed(fields[size_t(i)]);
                const QString coder = text(name);
                if (coder.isEmpty() || table.coders.contains(coder))
                    return false;
                table.coders << coder;
            }
            if (table.coders.size() < 2)
                return false;
            // The ids are at most the file's bytes: their text is not copied as it grows.
            table.reserve(size_t(lines), bytes.size());
            idHashes.reserve(size_t(lines));
            adviseHugePagesFor(idHashes);
            return true;
        }
        if (qsizetype(fields.size()) != columns)
            return false;
        const std::string_view id = trimmed(fields[0]);
        if (id.empty())
            return false;
        cells.clear();
        for (qsizetype c = 1; c < columns; ++c) {
            const std::string_view cell = trimmed(fields[size_t(c)]);
            cells.push_back(cell.empty() ? ReliabilityTable::kMissing : labels.index(cell));
        }
        idHashes.push_back(quint64(quint32(std::hash<std::string_view> {}(id))) << 32
            | quint64(table.unitCount()));
        // An ASCII id is widened as the table stores it; any other is decoded first.
        if (std::ranges::all_of(id, [](char c) { return (c & 0x80) == 0; }))
            table.appendUnit(QLatin1String(id.data(), qsizetype(id.size())), cells, line);
        else
            table.appendUnit(text(id), cells, line);
        return true;
    };

    // RFC 4180 §2 on the bytes, as forEachCsvRecord reads the decoded text (quotes, commas and
    // line breaks are ASCII, so UTF-8 cannot hide them): CRLF, LF or a lone CR end a line; an
    // empty line is no record; a quoted field holds commas, line breaks and doubled quotes.
    const size_t n = bytes.size();
    qint64 line = 1;
    qint64 recordLine = 0;
    bool inRecord = false;
    size_t i = 0;
    const auto lineBreakWidth = [&](size_t at) -> size_t {
        if (bytes[at] == '\n')
            return 1;
        if (bytes[at] == '\r')
            return at + 1 < n && bytes[at + 1] == '\n' ? 2 : 1;
        return 0;
    };
    const auto endRecord = [&]() -> bool {
        const bool taken = record(recordLine);
        fields.clear();
        unescaped.clear();
        unescapedFields.clear();
        inRecord = false;
        return taken;
    };
    while (i < n) {
        // At the start of a field.
        if (const size_t width = lineBreakWidth(i)) {
            if (inRecord) {
                fields.emplace_back();
                if (!endRecord())
                    return std::nullopt;
            }
            i += width;
            ++line;
            continue;
        }
        if (!inRecord) {
            inRecord = true;
            recordLine = line;
        }
        if (bytes[i] == '"') {
            const size_t start = i + 1;
            bool doubled = false;
            size_t at = start;
            for (;;) {
                const size_t quote = bytes.find('"', at);
                if (quote == std::string_view::npos)
                    return std::nullopt; // never closed
                line += std::count(
                    bytes.begin() + qsizetype(at), bytes.begin() + qsizetype(quote), '\n');
                // A lone CR inside is a line break too; count it where no LF follows it.
                for (size_t k = at; k < quote; ++k)
                    if (bytes[k] == '\r' && (k + 1 >= n || bytes[k + 1] != '\n'))
                        ++line;
                if (quote + 1 < n && bytes[quote + 1] == '"') {
                    doubled = true;
                    at = quote + 2;
                    continue;
                }
                std::string_view field = bytes.substr(start, quote - start);
                if (doubled) {
                    const size_t offset = unescaped.size();
                    for (size_t k = 0; k < field.size(); ++k) {
                        unescaped.push_back(field[k]);
                        if (field[k] == '"')
                            ++k; // §2.7: a doubled quote stands for one
                    }
                    unescapedFields.emplace_back(fields.size(), offset);
                    field = std::string_view(unescaped).substr(offset);
                }
                fields.push_back(field);
                i = quote + 1;
                break;
            }
        } else {
            // An unquoted field: up to a comma or a line break; a quote inside is a fault.
            size_t end = i;
            while (end < n && bytes[end] != ',' && bytes[end] != '\n' && bytes[end] != '\r') {
                if (bytes[end] == '"')
                    return std::nullopt;
                ++end;
            }
            fields.push_back(bytes.substr(i, end - i));
            i = end;
        }
        // After a field: the end, a comma or a line break (after a closing quote anything else
        // is a fault).
        if (i == n)
            break;
        if (bytes[i] == ',') {
            ++i;
            if (i == n || lineBreakWidth(i)) {
                // A record that ends in a comma has an empty last field.
                fields.emplace_back();
                if (!endRecord())
                    return std::nullopt;
                if (i < n) {
                    i += lineBreakWidth(i);
                    ++line;
                }
            }
            continue;
        }
        const size_t width = lineBreakWidth(i);
        if (width == 0 || !endRecord())
            return std::nullopt;
        i += width;
        ++line;
    }
    if (inRecord && !endRecord())
        return std::nullopt;
    if (columns == 0 || table.isEmpty() || hasRepeatedId(table, idHashes))
        return std::nullopt;
    return table;
}

} // namespace fourfold
