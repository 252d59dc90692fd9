#pragma once
// A cue list for one language (resources/cues/<language>.json): categories of words and short
// phrases, each pointing to a framing function, matched on the word tokens of one sentence.
//
// File format: {"language": "en", "source": "...", "categories": [{"name": "modal",
// "function": "remedy", "sentenceInitial": false, "attributes": {...}, "cues": ["should", ...]}]}.
// A cue is one or more words separated by spaces (a hyphen also separates words, as the
// tokenizer splits at it); a word ending in "*" matches every word that starts with the rest.
// Matching ignores case (Unicode lower-casing) and treats U+2019 as an apostrophe. A category
// with "sentenceInitial" matches only at the sentence's first word.

#include "core/model/error.h"
#include "core/model/framing_function.h"

#include <QByteArray>
#include <QHash>
#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <vector>

namespace fourfold {

class CueList
{
public:
    struct Cue {
        QString text; // as written in the file
        QStringList words; // lower case, without the '*'
        std::vector<bool> prefix; // per word: matches any word starting with it
    };
    struct Category {
        QString name;
        FramingFunction function = FramingFunction::Problem;
        bool sentenceInitial = false;
        QJsonObject attributes; // given to spans this category decides (e.g. polarity)
        std::vector<Cue> cues;
        // The cues by their first word, for cues whose first word is whole (not a prefix), and
        // the cues whose first word is a prefix: the only ones that can start at a word.
        QHash<QString, std::vector<qsizetype>> byFirstWord;
        std::vector<qsizetype> prefixFirst;
    };
    struct Hit {
        qsizetype category = 0; // index into categories()
        qsizetype cue = 0; // index into that category's cues
        qsizetype firstWord = 0;
        qsizetype wordCount = 0;
    };

    // The built-in list for a BCP 47 tag's primary language ("de-AT" → de). NotFound if there
    // is none (built in: en, nl, de).
    static Result<CueList> builtIn(const QString &languageTag);
    // The languages with a built-in list.
    static QStringList builtInLanguages();
    // Parses a cue list; InvalidInput naming `file` and what is wrong.
    static Result<CueList> fromJson(const QByteArray &json, const QString &file);

    QString language() const { return m_language; }
    const std::vector<Category> &categories() const { return m_categories; }
    // Every category name across the built-in lists, in file order of the English list.
    static QStringList builtInCategoryNames();

    // The cues found in `words` (one sentence's word tokens as written). Per category, the
    // longest cue starting at a word wins and matching goes on after it, so "because of" counts
    // once, not also as "because". Sorted by category, then position.
    std::vector<Hit> match(const QStringList &words) const;

    // A word as it is compared: lower case, U+2019 as an apostrophe.
    static QString foldWord(const QString &word);

private:
    QString m_language;
    std::vector<Category> m_categories;
};

} // namespace fourfold
