#pragma once
// Invented article texts for the near-copy tests: articles made of sentences drawn from a
// topic's vocabulary and common English function words, copies of them with edits, and the
// exact Jaccard similarity of two texts' 5-word shingle sets computed independently of
// core/text/minhash.cpp (a regular expression for words, sets of joined strings).

#include <QRegularExpression>
#include <QSet>
#include <QString>
#include <QStringList>

#include <algorithm>
#include <random>

namespace fourfold::test {

// Pseudo-words made of syllables, `count` of them, different for each `topic`.
inline QStringList topicWords(int topic, int count)
{
    static const char *syllables[] = {"ka", "lo", "mi", "ne", "ru", "sa", "te", "vo", "zi", "da",
        "pe", "qua", "bri", "sto", "gla", "fen", "mor", "tis", "wen", "hul"};
    std::mt19937 rng(unsigned(1000 + topic));
    QStringList words;
    while (words.size() < count) {
        QString w;
        const int n = 2 + int(rng() % 3);
        for (int i = 0; i < n; ++i)
            w += QLatin1String(syllables[rng() % 20]);
        if (!words.contains(w))
            words << w;
    }
    return words;
}

inline const QStringList &functionWords()
{
    static const QStringList words = QStringLiteral(
        "the of and to in a is that for it as was with be by on not he this are or his from at "
        "which but have an they were has had said its been would their more will who")
                                         .split(QLatin1Char(' '));
    return words;
}

// An article of `paragraphs` paragraphs of four sentences, words drawn from the topic (60%) and
// function words (40%); the same `variant` gives the same text.
inline QString inventedArticle(int topic, unsigned variant, int paragraphs = 8)
{
    const QStringList topicVocabulary = topicWords(topic, 300);
    std::mt19937 rng(variant * 7919U + unsigned(topic));
    QStringList paras;
    for (int p = 0; p < paragraphs; ++p) {
        QStringList sentences;
        for (int s = 0; s < 4; ++s) {
            QStringList words;
            const int n = 12 + int(rng() % 9);
            for (int w = 0; w < n; ++w)
                words << (rng() % 10 < 6 ? topicVocabulary[qsizetype(rng() % 300)]
                                         : functionWords()[qsizetype(rng() % 40)]);
            words.front()[0] = words.front()[0].toUpper();
            sentences << words.join(QLatin1Char(' ')) + QLatin1Char('.');
        }
        paras << sentences.join(QLatin1Char(' '));
    }
    return paras.join(QStringLiteral("\n\n"));
}

inline QStringList words(const QString &text)
{
    static const QRegularExpression word(
        QStringLiteral("[\\p{L}\\p{M}\\p{N}]+"), QRegularExpression::UseUnicodePropertiesOption);
    QStringList out;
    for (auto it = word.globalMatch(text); it.hasNext();)
        out << it.next().captured().toCaseFolded();
    return out;
}

// Replaces a share `fraction` of the words with words not in the text ("editedN"), either at
// scattered positions (`runs` = 0) or as `runs` runs of consecutive words (a rewritten phrase or
// sentence). Punctuation and paragraph breaks stay.
inline QString withWordsChanged(const QString &text, double fraction, int runs, unsigned variant)
{
    static const QRegularExpression word(
        QStringLiteral("[\\p{L}\\p{M}\\p{N}]+"), QRegularExpression::UseUnicodePropertiesOption);
    std::vector<std::pair<qsizetype, qsizetype>> spans; // start, length
    for (auto it = word.globalMatch(text); it.hasNext();) {
        const auto m = it.next();
        spans.emplace_back(m.capturedStart(), m.capturedLength());
    }
    const auto n = qsizetype(spans.size());
    const auto change = qsizetype(double(n) * fraction + 0.5);
    std::mt19937 rng(variant);
    std::vector<bool> changed(size_t(n), false);
    if (runs == 0) {
        std::vector<qsizetype> order(static_cast<size_t>(n));
        for (qsizetype i = 0; i < n; ++i)
            order[size_t(i)] = i;
        std::shuffle(order.begin(), order.end(), rng);
        for (qsizetype i = 0; i < change; ++i)
            changed[size_t(order[size_t(i)])] = true;
    } else {
        const qsizetype length = change / runs;
        for (int r = 0; r < runs; ++r) {
            const qsizetype start = (n / runs) * r + qsizetype(rng() % quint32(n / runs - length));
            for (qsizetype i = start; i < start + length; ++i)
                changed[size_t(i)] = true;
        }
    }
    QString out = text;
    for (qsizetype i = n - 1; i >= 0; --i)
        if (changed[size_t(i)])
            out.replace(
                spans[size_t(i)].first, spans[size_t(i)].second, QStringLiteral("edited%1").arg(i));
    return out;
}

// The paragraphs in another order (reversed halves: the second half first).
inline QString withParagraphsReordered(const QString &text)
{
    const QStringList paras = text.split(QStringLiteral("\n\n"));
    const qsizetype half = paras.size() / 2;
    return (paras.mid(half) + paras.mid(0, half)).join(QStringLiteral("\n\n"));
}

// The exact Jaccard similarity of the two texts' sets of 5-word shingles (whole word list when
// shorter).
inline double exactShingleJaccard(const QString &a, const QString &b)
{
    const auto shingles = [](const QString &text) {
        const QStringList w = words(text);
        QSet<QString> set;
        const qsizetype k = std::min<qsizetype>(5, w.size());
        for (qsizetype i = 0; k > 0 && i + k <= w.size(); ++i)
            set.insert(w.mid(i, k).join(QLatin1Char(' ')));
        return set;
    };
    const QSet<QString> sa = shingles(a);
    const QSet<QString> sb = shingles(b);
    const qsizetype shared = QSet<QString>(sa).intersect(sb).size();
    const qsizetype all = sa.size() + sb.size() - shared;
    return all == 0 ? 0.0 : double(shared) / double(all);
}

} // namespace fourfold::test
