// The cue baseline on constructed sentences. Expected labels follow the cue lists of
// resources/cues/ (written from memory) and the rules documented in cue_baseline.h; offsets are
// code points, counted as Python's str counts them.
#include "core/extract/cue_baseline.h"
#include "tests/extract/extract_fixture.h"

#include <QJsonArray>

#include <cmath>
#include <random>

using namespace fourfold;
using namespace fourfold::test;

namespace {

// One paragraph of nine sentences: [0, 32) [33, 78) [79, 107) [108, 122) [123, 147)
// [148, 180) [181, 215) [216, 233) [234, 267).
const QByteArray kEnglish =
    "{\"id\":\"en\",\"title\":\"Cues\",\"language\":\"en\",\"text\":\"The council must find the "
    "money. The ferry stopped because the budget ran out. This decision is a disgrace. Stop the "
    "cuts. The ferry sails at nine. It closed because of the budget. The mayor must go because "
    "he lied. It\xe2\x80\x99s time to act. What a sensible and welcome plan.\"}\n";
// [0, 24) [25, 69) [70, 104)
const QByteArray kDutch =
    "{\"id\":\"nl\",\"title\":\"Dijk\",\"language\":\"nl\",\"text\":\"De gemeente moet praten. "
    "Bewoners zijn boos omdat de dijk te laag is. Dat is een schandalige beslissing.\"}\n";
// [0, 33) [34, 54) [55, 81) [82, 102); the tag has a region subtag.
const QByteArray kGerman =
    "{\"id\":\"de\",\"title\":\"F\xc3\xa4hre\",\"language\":\"de-AT\",\"text\":\"Die Stadt sollte "
    "endlich handeln. Das ist ein Skandal. Gebt uns die F\xc3\xa4hre zur\xc3\xbc"
    "ck. Der Fluss ist breit.\"}\n";

struct Expected {
    TextRange range;
    FramingFunction function;
    QStringList cues;
    QJsonObject attributes; // without "cues"
    double score = 0.5;
};

void checkSpans(const std::vector<ExtractedSpan> &spans, const std::vector<Expected> &expected)
{
    REQUIRE(spans.size() == expected.size());
    for (size_t i = 0; i < spans.size(); ++i) {
        INFO("span " << i << " " << spans[i].range);
        CHECK(spans[i].range == expected[i].range);
        CHECK(spans[i].function == expected[i].function);
        QJsonObject attributes = expected[i].attributes;
        attributes.insert(QStringLiteral("cues"), QJsonArray::fromStringList(expected[i].cues));
        CHECK(spans[i].attributes == attributes);
        REQUIRE(spans[i].score.has_value());
        CHECK(std::abs(*spans[i].score - expected[i].score) < 1e-12);
    }
}

const QJsonObject kExplicit {{QStringLiteral("explicitness"), QStringLiteral("explicit")}};
const QJsonObject kNegative {{QStringLiteral("polarity"), QStringLiteral("negative")}};
const QJsonObject kPositive {{QStringLiteral("polarity"), QStringLiteral("positive")}};

std::vector<ExtractedSpan> run(
    const std::vector<Article> &articles, const QJsonObject &parameters = {})
{
    auto baseline = CueBaseline::create(parameters);
    REQUIRE(baseline);
    auto spans = baseline->extract(articles);
    REQUIRE(spans);
    return *spans;
}

} // namespace

TEST_CASE("cue baseline: English sentences by their cues")
{
    ProjectFixture f;
    f.importJsonl(kEnglish);
    const Article article = loadArticle(f, QStringLiteral("en"));
    REQUIRE(article.sentences.size() == 9);
    const auto spans = run({article});
    checkSpans(spans,
        {
            {{0, 32}, FramingFunction::Remedy, {QStringLiteral("must")}, kExplicit},
            {{33, 78}, FramingFunction::Cause, {QStringLiteral("because")}, {}},
            {{79, 107}, FramingFunction::Evaluation, {QStringLiteral("disgrace")}, kNegative},
            // An imperative counts only at the sentence's start ("find" in the first does not).
            {{108, 122}, FramingFunction::Remedy, {QStringLiteral("stop")}, kExplicit},
            // "because of" is one cue, not also "because": weight 1.
            {{148, 180}, FramingFunction::Cause, {QStringLiteral("because of")}, {}},
            // A tie between remedy ("must") and cause ("because") goes to remedy.
            {{181, 215}, FramingFunction::Remedy, {QStringLiteral("must")}, kExplicit},
            // U+2019 in "It’s" matches the cue written with an apostrophe.
            {{216, 233}, FramingFunction::Remedy, {QStringLiteral("it's time to")}, kExplicit},
            // Two cues: weight 2, score 1 − 2^−2.
            {{234, 267}, FramingFunction::Evaluation,
                {QStringLiteral("sensible"), QStringLiteral("welcome")}, kPositive, 0.75},
        });
    for (const ExtractedSpan &s : spans)
        CHECK(s.article == article.summary.id);
}

TEST_CASE("cue baseline: Dutch and German lists, chosen by the primary language subtag")
{
    ProjectFixture f;
    f.importJsonl(kDutch + kGerman);
    const auto dutch = run({loadArticle(f, QStringLiteral("nl"))});
    checkSpans(dutch,
        {
            {{0, 24}, FramingFunction::Remedy, {QStringLiteral("moet")}, kExplicit},
            {{25, 69}, FramingFunction::Cause, {QStringLiteral("omdat")}, {}},
            // A prefix cue: "schandalig*" matches the inflected "schandalige".
            {{70, 104}, FramingFunction::Evaluation, {QStringLiteral("schandalig*")}, kNegative},
        });
    const Article german = loadArticle(f, QStringLiteral("de"));
    CHECK(german.summary.language == QStringLiteral("de-AT"));
    checkSpans(run({german}),
        {
            {{0, 33}, FramingFunction::Remedy, {QStringLiteral("sollte")}, kExplicit},
            {{34, 54}, FramingFunction::Evaluation, {QStringLiteral("skandal")}, kNegative},
            {{55, 81}, FramingFunction::Remedy, {QStringLiteral("gebt")}, kExplicit},
        });
}

TEST_CASE("cue baseline: weights, threshold and several functions per sentence")
{
    ProjectFixture f;
    f.importJsonl(kEnglish);
    const Article article = loadArticle(f, QStringLiteral("en"));

    SECTION("multiple=true keeps every function that reaches the threshold")
    {
        const auto spans = run({article}, {{QStringLiteral("multiple"), true}});
        REQUIRE(spans.size() == 9);
        checkSpans({spans[5], spans[6]},
            {
                {{181, 215}, FramingFunction::Cause, {QStringLiteral("because")}, {}},
                {{181, 215}, FramingFunction::Remedy, {QStringLiteral("must")}, kExplicit},
            });
    }
    SECTION("minWeight=2 keeps only the sentence with two cues")
    {
        checkSpans(run({article}, {{QStringLiteral("minWeight"), 2}}),
            {{{234, 267}, FramingFunction::Evaluation,
                {QStringLiteral("sensible"), QStringLiteral("welcome")}, kPositive, 0.75}});
    }
    SECTION("a weight of 0 switches a category off; weights scale the score")
    {
        const auto spans = run({article},
            {{QStringLiteral("weight.modal"), 0}, {QStringLiteral("weight.positive"), 0.25},
                {QStringLiteral("minWeight"), 0.5}});
        // No modal cues: the first and the eighth sentence drop out, the tie sentence is the cause.
        REQUIRE(spans.size() == 6);
        checkSpans(
            {spans[4]}, {{{181, 215}, FramingFunction::Cause, {QStringLiteral("because")}, {}}});
        checkSpans({spans[5]},
            {{{234, 267}, FramingFunction::Evaluation,
                {QStringLiteral("sensible"), QStringLiteral("welcome")}, kPositive,
                1.0 - std::pow(2.0, -0.5)}});
    }
}

TEST_CASE("cue baseline: a language without a cue list is an error unless skipped")
{
    ProjectFixture f;
    f.importJsonl(
        "{\"id\":\"fr1\",\"title\":\"Bac\",\"language\":\"fr\",\"text\":\"Il faut agir.\"}\n"
        + kDutch);
    const std::vector<Article> articles {
        loadArticle(f, QStringLiteral("fr1")), loadArticle(f, QStringLiteral("nl"))};
    auto baseline = CueBaseline::create();
    REQUIRE(baseline);
    auto spans = baseline->extract(articles);
    REQUIRE_FALSE(spans);
    CHECK(spans.error().code == ErrorCode::NotFound);
    CHECK(spans.error().message
        == QStringLiteral("Article fr1 is in language \"fr\", which has no cue list (the cue "
                          "baseline knows en, nl, de); pass otherLanguages=skip to leave such "
                          "articles out."));
    const auto skipped =
        run(articles, {{QStringLiteral("otherLanguages"), QStringLiteral("skip")}});
    CHECK(skipped.size() == 3);
    for (const ExtractedSpan &s : skipped)
        CHECK(s.article == articles[1].summary.id);
}

TEST_CASE("cue baseline: bad parameters are refused")
{
    auto negative = CueBaseline::create({{QStringLiteral("weight.modal"), -1}});
    REQUIRE_FALSE(negative);
    CHECK(negative.error().message
        == QStringLiteral(
            "parameter \"weight.modal\" of the cues extractor must be a number of at least 0, "
            "got -1."));
    auto zero = CueBaseline::create({{QStringLiteral("minWeight"), 0}});
    REQUIRE_FALSE(zero);
    CHECK(zero.error().code == ErrorCode::InvalidArgument);
    auto unknown = CueBaseline::create({{QStringLiteral("weight.modals"), 1}});
    REQUIRE_FALSE(unknown);
    CHECK(unknown.error().message.startsWith(
        QStringLiteral("the cues extractor has no parameter \"weight.modals\"")));
    auto other = CueBaseline::create({{QStringLiteral("otherLanguages"), QStringLiteral("guess")}});
    REQUIRE_FALSE(other);
    CHECK(other.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("cue lists: the built-in lists load, with the six categories and 20-60 cues each")
{
    for (const QString &language : CueList::builtInLanguages()) {
        INFO(language.toStdString());
        auto list = CueList::builtIn(language);
        REQUIRE(list);
        CHECK(list->language() == language);
        REQUIRE(list->categories().size() == 6);
        QStringList names;
        for (const CueList::Category &c : list->categories()) {
            names << c.name;
            CHECK(c.cues.size() >= 20);
            CHECK(c.cues.size() <= 60);
        }
        CHECK(names == CueList::builtInCategoryNames());
    }
    auto french = CueList::builtIn(QStringLiteral("fr-BE"));
    REQUIRE_FALSE(french);
    CHECK(french.error().code == ErrorCode::NotFound);
}

TEST_CASE("cue lists: longest match per category, prefixes, sentence-initial categories")
{
    auto list = CueList::fromJson(R"({"language": "xx", "categories": [
        {"name": "c", "function": "cause", "cues": ["due", "due to", "blam*"]},
        {"name": "i", "function": "remedy", "sentenceInitial": true, "cues": ["stop"]}]})",
        QStringLiteral("test.json"));
    REQUIRE(list);
    const auto hits =
        list->match({QStringLiteral("Stop"), QStringLiteral("it"), QStringLiteral("due"),
            QStringLiteral("TO"), QStringLiteral("blaming"), QStringLiteral("stop")});
    REQUIRE(hits.size() == 3);
    CHECK((hits[0].category == 0 && hits[0].cue == 1 && hits[0].firstWord == 2
        && hits[0].wordCount == 2));
    CHECK((hits[1].category == 0 && hits[1].cue == 2 && hits[1].firstWord == 4));
    CHECK((hits[2].category == 1 && hits[2].firstWord == 0));

    auto broken = CueList::fromJson(R"({"language": "xx", "categories": [
        {"name": "c", "function": "frame", "cues": []}]})",
        QStringLiteral("broken.json"));
    REQUIRE_FALSE(broken);
    CHECK(broken.error().message
        == QStringLiteral("broken.json: every category needs a name and a function."));
}

TEST_CASE("cue lists: matching by first word finds what trying every cue finds")
{
    // The indexed matching (cue_list.cpp) against a deliberately naive one written here: every
    // cue tried at every word, the first of the longest kept; on random sentences of the
    // built-in English list's cue words, prefix cues, repeated words and other words.
    auto list = CueList::builtIn(QStringLiteral("en"));
    REQUIRE(list);
    QStringList vocabulary {QStringLiteral("the"), QStringLiteral("ferry"),
        QStringLiteral("budget"), QStringLiteral("Blames"), QStringLiteral("it\u2019s")};
    for (const CueList::Category &category : list->categories())
        for (const CueList::Cue &cue : category.cues)
            for (qsizetype i = 0; i < cue.words.size(); ++i)
                vocabulary << cue.words[i]
                        + (cue.prefix[size_t(i)] ? QStringLiteral("ing") : QString());
    const auto naive = [&](const QStringList &words) {
        std::vector<CueList::Hit> hits;
        QStringList folded;
        for (const QString &w : words)
            folded << CueList::foldWord(w);
        for (qsizetype c = 0; c < qsizetype(list->categories().size()); ++c) {
            const CueList::Category &category = list->categories()[size_t(c)];
            const qsizetype last =
                category.sentenceInitial ? std::min<qsizetype>(1, folded.size()) : folded.size();
            for (qsizetype at = 0; at < last;) {
                CueList::Hit best {c, 0, at, 0};
                for (qsizetype k = 0; k < qsizetype(category.cues.size()); ++k) {
                    const CueList::Cue &cue = category.cues[size_t(k)];
                    const qsizetype n = cue.words.size();
                    if (n <= best.wordCount || at + n > folded.size())
                        continue;
                    bool all = true;
                    for (qsizetype i = 0; i < n && all; ++i)
                        all = cue.prefix[size_t(i)] ? folded[at + i].startsWith(cue.words[i])
                                                    : folded[at + i] == cue.words[i];
                    if (all)
                        best = {c, k, at, n};
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
    };
    std::mt19937 rng(2004);
    for (int t = 0; t < 2000; ++t) {
        QStringList words;
        const int n = 1 + int(rng() % 14);
        for (int i = 0; i < n; ++i)
            words << vocabulary[qsizetype(rng() % quint32(vocabulary.size()))];
        const auto indexed = list->match(words);
        const auto expected = naive(words);
        INFO(words.join(QLatin1Char(' ')).toStdString());
        REQUIRE(indexed.size() == expected.size());
        for (size_t i = 0; i < indexed.size(); ++i) {
            CHECK(indexed[i].category == expected[i].category);
            CHECK(indexed[i].cue == expected[i].cue);
            CHECK(indexed[i].firstWord == expected[i].firstWord);
            CHECK(indexed[i].wordCount == expected[i].wordCount);
        }
    }
}
