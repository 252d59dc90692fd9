#include "core/extract/cue_list.h"

#include <QCoreApplication>
#include <QFile>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonParseError>
#include <QRegularExpression>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CueListText {
    Q_DECLARE_TR_FUNCTIONS(CueListText)
};

QString primaryLanguage(const QString &tag)
{
    const QString lower = tag.trimmed().toLower();
    const qsizetype dash = lower.indexOf(QRegularExpression(QStringLiteral("[-_]")));
    return dash < 0 ? lower : lower.left(dash);
}

bool wordMatches(const QString &word, const QString &cueWord, bool prefix)
{
    return prefix ? word.startsWith(cueWord) : word == cueWord;
}

} // namespace

QString CueList::foldWord(const QString &word)
{
    QString folded = word.toLower();
    folded.replace(QChar(0x2019), QLatin1Char('\''));
    return folded;
}

QStringList CueList::builtInLanguages()
{
    return {QStringLiteral("en"), QStringLiteral("nl"), QStringLiteral("de")};
}

QStringList CueList::builtInCategoryNames()
{
    return {QStringLiteral("modal"), QStringLiteral("imperative"), QStringLiteral("connective"),
        QStringLiteral("attribution"), QStringLiteral("negative"), QStringLiteral("positive")};
}

Result<CueList> CueList::builtIn(const QString &languageTag)
{
    const QString language = primaryLanguage(languageTag);
    if (!builtInLanguages().contains(language))
        return fail(ErrorCode::NotFound,
            CueListText::tr("There is no cue list for language \"%1\"; the cue baseline knows %2.")
                .arg(languageTag, builtInLanguages().join(QStringLiteral(", "))));
    QFile file(QStringLiteral(":/fourfold/cues/%1.json").arg(language));
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Internal,
            CueListText::tr("The cue list for \"%1\" is missing from this build.").arg(language));
    return fromJson(file.readAll(), file.fileName());
}

Result<CueList> CueList::fromJson(const QByteArray &json, const QString &file)
{
    QJsonParseError parseError;
    const QJsonDocument doc = QJsonDocument::fromJson(json, &parseError);
    if (parseError.error != QJsonParseError::NoError)
        return fail(ErrorCode::InvalidInput,
            CueListText::tr("%1: not valid JSON (%2).").arg(file, parseError.errorString()));
    const QJsonObject root = doc.object();
    CueList list;
    list.m_language = root.value(QLatin1String("language")).toString();
    if (list.m_language.isEmpty())
        return fail(ErrorCode::InvalidInput,
            CueListText::tr("%1: the cue list names no language.").arg(file));
    for (const QJsonValue &categoryValue : root.value(QLatin1String("categories")).toArray()) {
        const QJsonObject o = categoryValue.toObject();
        Category category;
        category.name = o.value(QLatin1String("name")).toString();
        const auto function = functionFromKey(o.value(QLatin1String("function")).toString());
        if (category.name.isEmpty() || !function)
            return fail(ErrorCode::InvalidInput,
                CueListText::tr("%1: every category needs a name and a function.").arg(file));
        category.function = *function;
        category.sentenceInitial = o.value(QLatin1String("sentenceInitial")).toBool();
        category.attributes = o.value(QLatin1String("attributes")).toObject();
        for (const QJsonValue &cueValue : o.value(QLatin1String("cues")).toArray()) {
            Cue cue;
            cue.text = cueValue.toString();
            const QStringList parts = foldWord(cue.text).split(
                QRegularExpression(QStringLiteral("[\\s\\-]+")), Qt::SkipEmptyParts);
            for (QString part : parts) {
                const bool prefix = part.endsWith(u'*');
                if (prefix)
                    part.chop(1);
                if (part.isEmpty())
                    return fail(ErrorCode::InvalidInput,
                        CueListText::tr("%1: cue \"%2\" of category %3 has an empty word.")
                            .arg(file, cue.text, category.name));
                cue.words.append(part);
                cue.prefix.push_back(prefix);
            }
            if (cue.words.isEmpty())
                return fail(ErrorCode::InvalidInput,
                    CueListText::tr("%1: category %2 has an empty cue.").arg(file, category.name));
            const qsizetype index = qsizetype(category.cues.size());
            if (cue.prefix.front())
                category.prefixFirst.push_back(index);
            else
                category.byFirstWord[cue.words.front()].push_back(index);
            category.cues.push_back(std::move(cue));
        }
        list.m_categories.push_back(std::move(category));
    }
    return list;
}

std::vector<CueList::Hit> CueList::match(const QStringList &words) const
{
    QStringList folded;
    folded.reserve(words.size());
    for (const QString &w : words)
        folded.append(foldWord(w));

    std::vector<Hit> hits;
    std::vector<qsizetype> candidates;
    for (qsizetype c = 0; c < qsizetype(m_categories.size()); ++c) {
        const Category &category = m_categories[size_t(c)];
        const qsizetype lastStart =
            category.sentenceInitial ? std::min<qsizetype>(1, folded.size()) : folded.size();
        qsizetype at = 0;
        while (at < lastStart) {
            Hit best;
            best.category = c;
            best.firstWord = at;
            // Only cues whose first word can match here, in file order (the first of the
            // longest wins, as when every cue was tried).
            candidates = category.prefixFirst;
            if (const auto exact = category.byFirstWord.constFind(folded[at]);
                exact != category.byFirstWord.constEnd()) {
                candidates.insert(candidates.end(), exact->begin(), exact->end());
                std::ranges::sort(candidates);
            }
            for (const qsizetype k : candidates) {
                const Cue &cue = category.cues[size_t(k)];
                const qsizetype n = cue.words.size();
                if (n <= best.wordCount || at + n > folded.size())
                    continue;
                bool all = true;
                for (qsizetype i = 0; i < n && all; ++i)
                    all = wordMatches(folded[at + i], cue.words[i], cue.prefix[size_t(i)]);
                if (all) {
                    best.cue = k;
                    best.wordCount = n;
                }
            }
            if (best.wordCount > 0) {
                hits.push_back(best);
                at += best.wordCount;
            } else {
                ++at;
            }
        }
    }
    return hits;
}

} // namespace fourfold
