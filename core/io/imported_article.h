#pragma once
// One article as read from an input file, before it is made canonical and segmented.

#include "core/model/error.h"

#include <QJsonObject>
#include <QString>

#include <atomic>
#include <functional>

namespace fourfold {

// Counts the ImportedArticle objects that exist, so that a test can prove that a reading holds a
// bounded number of articles at once rather than a whole file's.
class ImportedArticleCount
{
public:
    ImportedArticleCount() noexcept { add(); }
    ImportedArticleCount(const ImportedArticleCount &) noexcept { add(); }
    ImportedArticleCount &operator=(const ImportedArticleCount &) noexcept = default;
    ~ImportedArticleCount() { s_alive.fetch_sub(1, std::memory_order_relaxed); }

    // How many exist now.
    static qsizetype alive() { return s_alive.load(std::memory_order_relaxed); }
    // The most that existed at once since the last resetMost().
    static qsizetype most() { return s_most.load(std::memory_order_relaxed); }
    static void resetMost() { s_most.store(alive(), std::memory_order_relaxed); }

private:
    static void add() noexcept
    {
        const qsizetype now = s_alive.fetch_add(1, std::memory_order_relaxed) + 1;
        qsizetype most = s_most.load(std::memory_order_relaxed);
        while (now > most && !s_most.compare_exchange_weak(most, now, std::memory_order_relaxed)) {
        }
    }

    inline static std::atomic<qsizetype> s_alive {0};
    inline static std::atomic<qsizetype> s_most {0};
};

struct ImportedArticle {
    QString externalId; // the id in the source (JSONL/CSV `id`; file name for txt/html)
    QString title;
    QString outlet; // may be empty
    QString published; // as given (ISO 8601 date expected, not enforced); may be empty
    QString language; // BCP 47 tag; empty = the project's default language
    // The article body as decoded text. Paragraphs are separated by a blank line: exactly
    // "\n\n" from plain text and HTML; JSON Lines and CSV texts are kept as given (CRLF or CR
    // line ends possible). The text is not yet canonical (the project normalises it).
    QString text;
    QJsonObject meta; // any further fields, kept as given
    QString sourceFile; // the file it came from
    qint64 sourceLine = 0; // 1-based line where the record begins (JSONL/CSV), 1 for txt/html
    ImportedArticleCount counted; // tests only: see ImportedArticleCount
};

// Takes one article as a reader reads it; a failure stops the reading and is returned as it is.
using ImportedArticleSink = std::function<Status(ImportedArticle &&article)>;

} // namespace fourfold
