#include "core/io/input_file.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

#include <sys/mman.h>

#include <algorithm>
#include <utility>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct InputFileText {
    Q_DECLARE_TR_FUNCTIONS(InputFileText)
};

} // namespace

Status requireRegularFile(const QString &path)
{
    const QFileInfo info(path); // follows symbolic links
    if (info.exists() && !info.isFile())
        return failAt(ErrorCode::Io, path, 0, 0, InputFileText::tr("this is not a regular file"));
    return {};
}

Result<QByteArray> readWholeFile(const QString &path, qint64 maxBytes)
{
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly)) {
        auto error = failAt(
            ErrorCode::Io, path, 0, 0, InputFileText::tr("the file cannot be opened for reading"));
        error.error().cause = file.errorString();
        return error;
    }
    const auto tooLong = [&] {
        return failAt(ErrorCode::InvalidInput, path, 0, 0,
            InputFileText::tr("the file is longer than %1 MiB, the most this reader takes")
                .arg(maxBytes >> 20));
    };
    if (file.size() > maxBytes)
        return tooLong();
    // Read into a buffer the size the file has now, plus one step of room for the read that
    // finds the end: QIODevice::read(maxBytes + 1) would allocate the whole cap (1 GiB) first,
    // for any file. A file that grows while it is read is read on in steps, up to the limit.
    constexpr qint64 step = qint64(1) << 20;
    QByteArray bytes;
    bytes.reserve(qsizetype(std::min(file.size(), maxBytes) + step));
    while (bytes.size() <= maxBytes) {
        const qsizetype at = bytes.size();
        const qint64 want = std::min(maxBytes + 1 - at, at < file.size() ? file.size() - at : step);
        bytes.resize(at + qsizetype(want));
        const qint64 got = file.read(bytes.data() + at, want);
        if (got < 0) {
            auto error =
                failAt(ErrorCode::Io, path, 0, 0, InputFileText::tr("the file cannot be read"));
            error.error().cause = file.errorString();
            return error;
        }
        bytes.resize(at + qsizetype(got));
        if (got == 0)
            break;
    }
    if (bytes.size() > maxBytes)
        return tooLong();
    return bytes;
}

Result<WholeFile> WholeFile::open(const QString &path, qint64 maxBytes)
{
    WholeFile out;
    {
        FOURFOLD_TRY_STATUS(requireRegularFile(path));
        QFile file(path);
        const qint64 size = file.open(QIODevice::ReadOnly) ? file.size() : 0;
        if (size > 0 && size <= maxBytes) {
            // MAP_POPULATE maps every page now: no page fault per 4 KiB while the file is parsed.
            void *address = ::mmap(
                nullptr, size_t(size), PROT_READ, MAP_PRIVATE | MAP_POPULATE, file.handle(), 0);
            if (address != MAP_FAILED) {
                out.m_address = address;
                out.m_size = size_t(size);
                return out;
            }
        }
    }
    // Not mapped: readWholeFile reads it, or names what is wrong (cannot open, too long).
    auto bytes = readWholeFile(path, maxBytes);
    if (!bytes)
        return std::unexpected(bytes.error());
    out.m_read = std::move(*bytes);
    return out;
}

WholeFile::WholeFile(WholeFile &&other) noexcept
    : m_address(std::exchange(other.m_address, nullptr))
    , m_size(std::exchange(other.m_size, 0))
    , m_read(std::move(other.m_read))
{ }

WholeFile &WholeFile::operator=(WholeFile &&other) noexcept
{
    if (this != &other) {
        unmap();
        m_address = std::exchange(other.m_address, nullptr);
        m_size = std::exchange(other.m_size, 0);
        m_read = std::move(other.m_read);
    }
    return *this;
}

WholeFile::~WholeFile()
{
    unmap();
}

void WholeFile::unmap()
{
    if (m_address)
        ::munmap(m_address, m_size);
    m_address = nullptr;
    m_size = 0;
}

std::string_view WholeFile::bytes() const
{
    if (m_address)
        return {static_cast<const char *>(m_address), m_size};
    return {m_read.constData(), size_t(m_read.size())};
}

QByteArray WholeFile::rawData() const
{
    const std::string_view b = bytes();
    return QByteArray::fromRawData(b.data(), qsizetype(b.size()));
}

} // namespace fourfold
