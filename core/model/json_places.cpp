#include "core/model/json_places.h"

#include <QJsonArray>
#include <QJsonDocument>

namespace fourfold {

namespace {

// A scan of a document QJsonDocument accepted (RFC 8259 syntax), so every token is well formed;
// recursive, as deep as QJsonDocument's nesting limit allows.
class Scanner
{
public:
    Scanner(const QByteArray &json, QHash<QString, qint64> &lines, QString &repeated,
        qint64 &repeatedLine)
        : m_json(json)
        , m_lines(lines)
        , m_repeated(repeated)
        , m_repeatedLine(repeatedLine)
    { }

    void value(const QString &path)
    {
        space();
        if (atEnd())
            return;
        const char c = m_json[m_at];
        if (c == '{')
            object(path);
        else if (c == '[')
            array(path);
        else if (c == '"')
            string();
        else
            while (!atEnd() && !QByteArrayView(",]} \t\r\n").contains(m_json[m_at]))
                ++m_at;
    }

private:
    bool atEnd() const { return m_at >= m_json.size(); }

    void step()
    {
        if (m_json[m_at] == '\n')
            ++m_line;
        ++m_at;
    }

    void space()
    {
        while (!atEnd() && QByteArrayView(" \t\r\n").contains(m_json[m_at]))
            step();
    }

    // Reads a string from its opening quote; returns its raw bytes between the quotes.
    QByteArray string()
    {
        step();
        const qsizetype begin = m_at;
        while (!atEnd() && m_json[m_at] != '"') {
            if (m_json[m_at] == '\\')
                step();
            if (!atEnd())
                step();
        }
        const QByteArray raw = m_json.mid(begin, m_at - begin);
        if (!atEnd())
            step();
        return raw;
    }

    // A key as QJsonDocument decodes it (escapes resolved).
    static QString decodedKey(const QByteArray &raw)
    {
        const QJsonDocument doc = QJsonDocument::fromJson("[\"" + raw + "\"]");
        return doc.array().at(0).toString();
    }

    void object(const QString &path)
    {
        step();
        while (true) {
            space();
            if (atEnd() || m_json[m_at] == '}')
                break;
            if (m_json[m_at] == ',') {
                step();
                continue;
            }
            const qint64 keyLine = m_line;
            const QString key = decodedKey(string());
            const QString member = path.isEmpty() ? key : path + QLatin1Char('.') + key;
            if (m_lines.contains(member)) {
                if (m_repeated.isEmpty()) {
                    m_repeated = member;
                    m_repeatedLine = keyLine;
                }
            } else {
                m_lines.insert(member, keyLine);
            }
            space();
            if (!atEnd() && m_json[m_at] == ':')
                step();
            value(member);
        }
        if (!atEnd())
            step();
    }

    void array(const QString &path)
    {
        step();
        for (qsizetype index = 0;; ++index) {
            space();
            if (atEnd() || m_json[m_at] == ']')
                break;
            const QString element = QStringLiteral("%1[%2]").arg(path).arg(index);
            m_lines.insert(element, m_line);
            const qsizetype begin = m_at;
            value(element);
            if (m_at == begin && !atEnd())
                step(); // text QJsonDocument would refuse: move on all the same
            space();
            if (!atEnd() && m_json[m_at] == ',')
                step();
        }
        if (!atEnd())
            step();
    }

    const QByteArray &m_json;
    QHash<QString, qint64> &m_lines;
    QString &m_repeated;
    qint64 &m_repeatedLine;
    qsizetype m_at = 0;
    qint64 m_line = 1;
};

} // namespace

JsonPlaces::JsonPlaces(const QByteArray &json)
{
    Scanner(json, m_lines, m_repeated, m_repeatedLine).value(QString());
}

qint64 JsonPlaces::line(const QString &path) const
{
    return m_lines.value(path, 0);
}

} // namespace fourfold
