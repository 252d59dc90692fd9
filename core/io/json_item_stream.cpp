#include "core/io/json_item_stream.h"

#include "core/io/input_file.h"

#include <QCoreApplication>
#include <QFile>
#include <QJsonArray>

#include <nlohmann/json.hpp>

#include <iterator>
#include <optional>
#include <string>
#include <vector>

namespace fourfold {

namespace {

using Json = nlohmann::json;

// The sentences of this file, under a context that lupdate collects.
struct JsonItemStreamText {
    Q_DECLARE_TR_FUNCTIONS(JsonItemStreamText)
};

// The file read in blocks, with the line and column of the last character read.
struct Source {
    QFile *file = nullptr;
    QByteArray block;
    qsizetype at = 0;
    qint64 line = 1;
    qint64 column = 0; // characters read on the current line
    bool failed = false; // a read error, told apart from the end of the file

    bool atEnd()
    {
        if (at < block.size())
            return false;
        block = file->read(1 << 20);
        at = 0;
        if (block.isEmpty() && file->error() != QFileDevice::NoError)
            failed = true;
        return block.isEmpty();
    }
};

// An input iterator over the file for the parser; every copy reads the same Source.
class SourceIterator
{
public:
    using iterator_category = std::input_iterator_tag;
    using value_type = char;
    using difference_type = std::ptrdiff_t;
    using pointer = const char *;
    using reference = const char &;

    SourceIterator() = default;
    explicit SourceIterator(Source *source)
        : m_source(source)
    { }

    reference operator*() const { return m_source->block.constData()[m_source->at]; }
    SourceIterator &operator++()
    {
        const char c = m_source->block.at(m_source->at++);
        if (c == '\n') {
            ++m_source->line;
            m_source->column = 0;
        } else if ((static_cast<unsigned char>(c) & 0xC0) != 0x80) {
            ++m_source->column; // the first byte of a UTF-8 character
        }
        return *this;
    }
    SourceIterator operator++(int)
    {
        SourceIterator before = *this;
        ++*this;
        return before;
    }
    bool operator==(const SourceIterator &other) const { return ended() == other.ended(); }
    bool operator!=(const SourceIterator &other) const { return !(*this == other); }

private:
    bool ended() const { return !m_source || m_source->atEnd(); }

    Source *m_source = nullptr;
};

QJsonValue toQt(const Json &j)
{
    switch (j.type()) {
    case Json::value_t::null:
    case Json::value_t::discarded:
    case Json::value_t::binary:
        return QJsonValue(QJsonValue::Null);
    case Json::value_t::boolean:
        return j.get<bool>();
    case Json::value_t::number_integer:
        return qint64(j.get<std::int64_t>());
    case Json::value_t::number_unsigned: {
        const auto u = j.get<std::uint64_t>();
        return u <= std::uint64_t(std::numeric_limits<qint64>::max()) ? QJsonValue(qint64(u))
                                                                      : QJsonValue(double(u));
    }
    case Json::value_t::number_float:
        return j.get<double>();
    case Json::value_t::string:
        return QString::fromStdString(j.get_ref<const std::string &>());
    case Json::value_t::array: {
        QJsonArray a;
        for (const Json &e : j)
            a.append(toQt(e));
        return a;
    }
    case Json::value_t::object: {
        QJsonObject o;
        for (auto it = j.begin(); it != j.end(); ++it)
            o.insert(QString::fromStdString(it.key()), toQt(it.value()));
        return o;
    }
    }
    return QJsonValue(QJsonValue::Null);
}

// A visit's failure, carried out of the parser.
struct Stop {
    Error error;
};

} // namespace

Result<QJsonValue> streamJsonItems(
    const QString &path, const JsonItemPlace &isItem, const JsonItemVisit &visit)
{
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Io,
            JsonItemStreamText::tr("The file %1 could not be read: %2.")
                .arg(path, file.errorString()));
    Source source;
    source.file = &file;

    // The keys from the root to the container being read, and where each open item started.
    QStringList keys;
    std::vector<bool> isArray;
    QString key; // the last key read in the innermost object
    std::vector<std::optional<JsonPlace>> itemStarts;
    const auto enter = [&](bool array) {
        const bool inArray = !isArray.empty() && isArray.back();
        if (!isArray.empty())
            keys << (inArray ? QString() : key);
        isArray.push_back(array);
    };
    const auto leave = [&] {
        isArray.pop_back();
        if (!keys.isEmpty())
            keys.removeLast();
    };
    const Json::parser_callback_t callback = [&](int, Json::parse_event_t event, Json &parsed) {
        switch (event) {
        case Json::parse_event_t::key:
            key = QString::fromStdString(parsed.get_ref<const std::string &>());
            return true;
        case Json::parse_event_t::object_start: {
            enter(false);
            const bool item = !keys.isEmpty() && isItem(keys);
            itemStarts.push_back(
                item ? std::optional(JsonPlace {source.line, source.column}) : std::nullopt);
            return true;
        }
        case Json::parse_event_t::array_start:
            enter(true);
            return true;
        case Json::parse_event_t::object_end: {
            const std::optional<JsonPlace> start = itemStarts.back();
            itemStarts.pop_back();
            leave();
            if (!start)
                return true;
            Status visited = visit(toQt(parsed).toObject(), *start);
            if (!visited)
                throw Stop {visited.error()};
            return false; // dropped: the document keeps no item
        }
        case Json::parse_event_t::array_end:
            leave();
            return true;
        case Json::parse_event_t::value:
            return true;
        }
        return true;
    };

    Json root;
    try {
        root = Json::parse(SourceIterator(&source), SourceIterator(), callback);
    } catch (const Stop &stop) {
        return std::unexpected(stop.error);
    } catch (const Json::exception &e) {
        if (source.failed)
            return fail(ErrorCode::Io,
                JsonItemStreamText::tr("The file %1 could not be read: %2.")
                    .arg(path, file.errorString()));
        // "[json.exception.parse_error.101] parse error at line 2, column 12: syntax error while
        // parsing value - invalid literal; last read: 'Annotation'": the place is ours already.
        // The parser's English goes into the cause; the message says in the user's language
        // what it read last, so that a German line is German throughout.
        const QString raw = QString::fromUtf8(e.what());
        const qsizetype lastRead = raw.lastIndexOf(QStringLiteral("last read: '"));
        QString token = lastRead >= 0 ? raw.mid(lastRead + 12) : QString();
        if (token.endsWith(QLatin1Char('\'')))
            token.chop(1);
        token = token.simplified();
        QString sentence;
        if (raw.contains(QLatin1String("unexpected end of input")))
            sentence = JsonItemStreamText::tr(
                "This is not valid JSON: the file ends before the JSON is complete.");
        else if (!token.isEmpty())
            sentence = JsonItemStreamText::tr("This is not valid JSON at \"%1\".").arg(token);
        else
            sentence = JsonItemStreamText::tr("This is not valid JSON.");
        auto error = failAt(ErrorCode::InvalidInput, path, source.line,
            std::max<qint64>(1, source.column), sentence);
        error.error().cause = raw;
        return error;
    }
    return toQt(root);
}

} // namespace fourfold
