#include "core/io/document_text.h"

namespace fourfold {

QString tidyParagraph(const QString &text)
{
    QStringList lines;
    for (const QStringView line : QStringView(text).split(u'\n')) {
        QString tidy = line.toString().simplified();
        if (!tidy.isEmpty())
            lines.append(std::move(tidy));
    }
    return lines.join(u'\n');
}

void DocumentText::addParagraph(const QString &text, Kind kind, int level)
{
    QString tidy = tidyParagraph(text);
    if (!tidy.isEmpty())
        m_paragraphs.push_back({std::move(tidy), kind, level});
}

QString DocumentText::addNote(const QStringList &paragraphs)
{
    QStringList tidy;
    for (const QString &paragraph : paragraphs) {
        QString t = tidyParagraph(paragraph);
        if (!t.isEmpty())
            tidy.append(std::move(t));
    }
    m_notes.append(tidy.join(QStringLiteral("\n\n")));
    return QStringLiteral("[%1]").arg(m_notes.size());
}

QString DocumentText::title(const QString &metadataTitle, const QString &fallback) const
{
    const QString given = metadataTitle.simplified();
    if (!given.isEmpty())
        return given;
    for (const Paragraph &p : m_paragraphs) {
        if (p.kind == Kind::Title)
            return QString(p.text).replace(u'\n', u' ');
    }
    for (const Paragraph &p : m_paragraphs) {
        if (p.kind == Kind::Heading && p.level == 1)
            return QString(p.text).replace(u'\n', u' ');
    }
    return fallback;
}

QString DocumentText::text(const QString &title) const
{
    QStringList parts;
    bool headlineSeen = false;
    for (const Paragraph &p : m_paragraphs) {
        if (!headlineSeen && p.kind != Kind::Body) {
            headlineSeen = true;
            if (QString(p.text).replace(u'\n', u' ') == title)
                continue;
        }
        parts.append(p.text);
    }
    for (qsizetype i = 0; i < m_notes.size(); ++i) {
        if (!m_notes.at(i).isEmpty())
            parts.append(QStringLiteral("[%1] %2").arg(i + 1).arg(m_notes.at(i)));
    }
    return parts.join(QStringLiteral("\n\n"));
}

} // namespace fourfold
