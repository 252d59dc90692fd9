#pragma once
// Where the members and elements of a JSON document begin: QJsonDocument parses without
// positions, so a reader that checks what it parsed finds the line of a bad key here. Also finds
// a key repeated within one object (QJsonDocument keeps one of them without a word).

#include <QByteArray>
#include <QHash>
#include <QString>

namespace fourfold {

// Paths name a member by its key after a dot ("functions[1].definition"; a member of the root
// has no dot: "functions") and an element by its index from 0 in brackets.
class JsonPlaces
{
public:
    // Scans `json`, which must be a document QJsonDocument::fromJson has accepted (for any other
    // text the places found are incomplete, never out of range).
    explicit JsonPlaces(const QByteArray &json);

    // The line (from 1) on which the member's key or the element at `path` begins; 0 if the
    // document has no such path.
    qint64 line(const QString &path) const;
    // The first member whose key was used before in the same object ("" if none), and its line.
    const QString &repeatedKey() const { return m_repeated; }
    qint64 repeatedKeyLine() const { return m_repeatedLine; }

private:
    QHash<QString, qint64> m_lines;
    QString m_repeated;
    qint64 m_repeatedLine = 0;
};

} // namespace fourfold
