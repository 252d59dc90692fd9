#include "core/io/chunked_input.h"

#include "core/io/input_file.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ArticleReaderText {
    Q_DECLARE_TR_FUNCTIONS(ArticleReaderText)
};

} // namespace

Result<ChunkedInput> ChunkedInput::open(const QString &path, qsizetype chunkSize)
{
    const QFileInfo info(path);
    if (!info.exists())
        return failAt(ErrorCode::Io, path, 0, 0, ArticleReaderText::tr("the file does not exist"));
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    ChunkedInput input;
    input.m_path = path;
    input.m_file = std::make_unique<QFile>(path);
    input.m_size = info.size();
    input.m_chunkSize = std::max<qsizetype>(chunkSize, 1);
    if (!input.m_file->open(QIODevice::ReadOnly)) {
        auto error = failAt(ErrorCode::Io, path, 0, 0,
            ArticleReaderText::tr("the file cannot be opened for reading"));
        error.error().cause = input.m_file->errorString();
        return error;
    }
    return input;
}

ChunkedInput::ChunkedInput(ChunkedInput &&) noexcept = default;
ChunkedInput &ChunkedInput::operator=(ChunkedInput &&) noexcept = default;
ChunkedInput::~ChunkedInput() = default;

Result<bool> ChunkedInput::readMore()
{
    // Move the pending bytes to the front first, so the buffer never holds consumed bytes
    // for long.
    if (m_start > 0) {
        m_buffer.remove(0, m_start);
        m_start = 0;
    }
    const qsizetype old = m_buffer.size();
    m_buffer.resize(old + m_chunkSize);
    const qint64 got = m_file->read(m_buffer.data() + old, m_chunkSize);
    m_buffer.resize(old + std::max<qint64>(got, 0));
    if (got < 0 || m_file->error() != QFileDevice::NoError) {
        auto error =
            failAt(ErrorCode::Io, m_path, 0, 0, ArticleReaderText::tr("the file cannot be read"));
        error.error().cause = m_file->errorString();
        return error;
    }
    m_read += got;
    return got > 0;
}

Status ChunkedInput::dropByteOrderMark()
{
    while (m_read < 3) {
        auto more = readMore();
        if (!more)
            return std::unexpected(more.error());
        if (!*more)
            break;
    }
    if (m_read - pending().size() == 0 && pending().startsWith("\xEF\xBB\xBF"))
        consume(3);
    return {};
}

Result<QByteArray> ChunkedInput::readAll()
{
    for (;;) {
        auto more = readMore();
        if (!more)
            return std::unexpected(more.error());
        if (!*more)
            break;
    }
    QByteArray all = std::move(m_buffer);
    m_buffer.clear();
    all.remove(0, m_start);
    m_start = 0;
    return all;
}

} // namespace fourfold
