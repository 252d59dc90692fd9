#pragma once
// The text of a word-processing document (DOCX, ODT) as its reader gathers it: paragraphs with
// their kind (body, title, heading), footnotes and endnotes in the order they are referred to,
// and the rules every such document shares for the title and the article's text.

#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {

class DocumentText
{
public:
    enum class Kind { Body, Title, Heading };

    // Adds a paragraph: each of its lines (split at "\n") has its whitespace collapsed and is
    // trimmed; empty lines are left out, and a paragraph left empty is not added. `level` is a
    // heading's outline level (1 = top).
    void addParagraph(const QString &text, Kind kind = Kind::Body, int level = 0);
    // Takes the text of a note referred to where the reader stands and returns the marker that
    // stands in the body for it: "[1]", "[2]", ... in the order of reference.
    QString addNote(const QStringList &paragraphs);

    // The title: `metadataTitle` when not blank, else the first paragraph in the document's
    // Title style, else the first heading of level 1, else `fallback`.
    QString title(const QString &metadataTitle, const QString &fallback) const;
    // The article's text: the paragraphs joined by "\n\n" (the first title or heading paragraph
    // is left out when its text equals `title`, so the headline is not there twice), then each
    // note as a paragraph "[n] text" (a note of several paragraphs: the first with the marker).
    QString text(const QString &title) const;
    bool isEmpty() const { return m_paragraphs.empty(); }

private:
    struct Paragraph {
        QString text;
        Kind kind = Kind::Body;
        int level = 0;
    };
    std::vector<Paragraph> m_paragraphs;
    QStringList m_notes;
};

// The paragraph's lines with their whitespace collapsed and trimmed, empty lines left out,
// joined by "\n".
QString tidyParagraph(const QString &text);

} // namespace fourfold
