#include "core/project/study_design.h"

#include "core/io/input_file.h"
#include "core/project/near_copies.h"
#include "core/project/project.h"
#include "core/project/study_edits.h"
#include "core/reliability/krippendorff_alpha.h"
#include "core/reliability/sample_size.h"
#include "core/store/codebook_table.h"
#include "core/store/database.h"
#include "core/store/event_log.h"
#include "core/store/project_tables.h"
#include "core/store/savepoint.h"
#include "core/store/store_util.h"
#include "core/store/study_tables.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>
#include <QJsonArray>
#include <QJsonDocument>

#include <algorithm>
#include <cmath>
#include <map>
#include <random>
#include <set>
#include <unordered_map>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct StudyDesignText {
    Q_DECLARE_TR_FUNCTIONS(StudyDesignText)
};

const QString kEffortKey = QStringLiteral("study.effort_per_coder");

QString drawSettingKey(Phase phase)
{
    return QStringLiteral("study.draw.") + phaseKey(phase);
}

// Study order: training, pilot, reliability, production.
int phaseRank(Phase phase)
{
    return int(phase);
}

constexpr std::array<Phase, 4> kPhases {
    Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production};

// A uniform integer in [0, n) from the 64-bit generator, by rejection so that no value is
// favoured: values below 2^64 mod n are redrawn (the method of OpenBSD's arc4random_uniform;
// common practice). std::uniform_int_distribution is not used: its output differs between
// standard libraries, and the draw must be reproducible from its seed everywhere.
std::uint64_t uniformBelow(std::mt19937_64 &engine, std::uint64_t n)
{
    const std::uint64_t threshold = (std::uint64_t(0) - n) % n; // 2^64 mod n
    while (true) {
        const std::uint64_t r = engine();
        if (r >= threshold)
            return r % n;
    }
}

// Fisher–Yates shuffle in Durstenfeld's form (Knuth, TAOCP vol. 2, §3.4.2, Algorithm P).
template<typename T>
void shuffle(std::vector<T> &items, std::mt19937_64 &engine)
{
    for (std::size_t i = items.size(); i > 1; --i) {
        const auto j = std::size_t(uniformBelow(engine, std::uint64_t(i)));
        std::swap(items[i - 1], items[j]);
    }
}

// Coders and articles of a project, looked up by pseudonym / external id and by row id.
struct Names {
    std::vector<Coder> coders;
    QHash<QString, Coder> coderByPseudonym;
    QHash<qint64, QString> pseudonymById;
    std::vector<store::FrameArticle> articles; // live, by external id
    QHash<QString, qsizetype> articleIndex; // external id → index in articles
    QHash<qint64, QString> externalIdById;
};

Result<Names> loadNames(const Database &db, const Project &project)
{
    Names n;
    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    n.coders = *coders;
    for (const Coder &c : n.coders) {
        n.coderByPseudonym.insert(c.pseudonym, c);
        n.pseudonymById.insert(c.id.value, c.pseudonym);
    }
    auto articles = store::frameArticles(db);
    if (!articles)
        return std::unexpected(articles.error());
    n.articles = std::move(*articles);
    for (qsizetype i = 0; i < qsizetype(n.articles.size()); ++i) {
        n.articleIndex.insert(n.articles[size_t(i)].externalId, i);
        n.externalIdById.insert(n.articles[size_t(i)].id.value, n.articles[size_t(i)].externalId);
    }
    return n;
}

// The coders named by `pseudonyms`: NotFound for an unknown one, InvalidArgument for one named
// twice or a disabled one.
Result<std::vector<Coder>> resolveCoders(const Names &names, const QStringList &pseudonyms)
{
    std::vector<Coder> out;
    QSet<QString> seen;
    for (const QString &p : pseudonyms) {
        const auto it = names.coderByPseudonym.constFind(p);
        if (it == names.coderByPseudonym.constEnd())
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no coder \"%1\" in the project.").arg(p));
        if (seen.contains(p))
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr("The coder \"%1\" is named twice.").arg(p));
        if (it->disabled) // keeps their codings, takes no new work
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr(
                    "%1 is disabled and takes no new assignments; enable them first.")
                    .arg(p));
        seen.insert(p);
        out.push_back(*it);
    }
    return out;
}

QString coderLabel(const Names &names, CoderId id)
{
    return names.pseudonymById.value(id.value, QStringLiteral("#%1").arg(id.value));
}

// --- units for agreement ------------------------------------------------------------------------

// The units of `article` of one kind (paragraph, sentence or token).
std::vector<TextRange> unitsOf(const Article &article, UnitKind kind)
{
    std::vector<TextRange> out;
    if (kind == UnitKind::Paragraph)
        for (const Paragraph &p : article.paragraphs)
            out.push_back(p.range);
    else if (kind == UnitKind::Token)
        out = article.tokens;
    else
        out = article.sentences;
    return out;
}

// Whether any of `spans` of function `f` overlaps `unit` by at least one code point (the rule of
// core/agreement/project_units.h).
bool marks(const std::vector<const Annotation *> &spans, FramingFunction f, const TextRange &unit)
{
    return std::ranges::any_of(spans, [&](const Annotation *a) {
        return a->content.function == f && a->content.range.start < unit.end
            && unit.start < a->content.range.end;
    });
}

// The units of one kind (paragraphs, sentences or tokens) of the articles a reading function
// compares, each read once: article by article as asked for, or every article's with one
// statement (loadAll(), for work across the whole study). Holds the ranges only, not the texts.
class UnitCache
{
public:
    UnitCache(const Project &project, UnitKind kind)
        : m_project(project)
        , m_kind(kind)
    { }

    Status loadAll()
    {
        const SegmentKind segments = m_kind == UnitKind::Paragraph ? SegmentKind::Paragraphs
            : m_kind == UnitKind::Token                            ? SegmentKind::Tokens
                                                                   : SegmentKind::Sentences;
        return m_project.forEachSegmentation(
            segments, [&](ArticleId id, std::vector<TextRange> &&units) -> Status {
                m_units.insert_or_assign(id.value, std::move(units));
                return {};
            });
    }

    Result<const std::vector<TextRange> *> get(ArticleId id)
    {
        auto it = m_units.find(id.value);
        if (it == m_units.end()) {
            auto a = m_project.article(id);
            if (!a)
                return std::unexpected(a.error());
            it = m_units.emplace(id.value, unitsOf(*a, m_kind)).first;
        }
        return &it->second;
    }

private:
    const Project &m_project;
    UnitKind m_kind;
    std::unordered_map<qint64, std::vector<TextRange>> m_units;
};

// The two-coder present/absent matrix of `functions` over the units of `articles`: a row per
// (unit, function), codes 0 = absent, 1 = present; `a` and `b` hold each coder's spans.
struct PairMatrix {
    reliability::ReliabilityData data;
    int agreeing = 0;
    int aMarked = 0;
    int bMarked = 0;
};

Result<PairMatrix> pairMatrix(UnitCache &cache, const std::vector<ArticleId> &articles,
    const std::vector<FramingFunction> &functions, const std::vector<Annotation> &a,
    const std::vector<Annotation> &b)
{
    PairMatrix m;
    m.data.coders = 2;
    m.data.values = 2;
    // Each coder's spans by article, gathered once rather than filtered per article.
    std::map<qint64, std::vector<const Annotation *>> byArticleA, byArticleB;
    for (const Annotation &x : a)
        byArticleA[x.article.value].push_back(&x);
    for (const Annotation &x : b)
        byArticleB[x.article.value].push_back(&x);
    const std::vector<const Annotation *> none;
    for (ArticleId id : articles) {
        auto units = cache.get(id);
        if (!units)
            return std::unexpected(units.error());
        const auto itA = byArticleA.find(id.value);
        const auto itB = byArticleB.find(id.value);
        const std::vector<const Annotation *> &spansA =
            itA == byArticleA.end() ? none : itA->second;
        const std::vector<const Annotation *> &spansB =
            itB == byArticleB.end() ? none : itB->second;
        for (const TextRange &u : **units) {
            for (FramingFunction f : functions) {
                const bool inA = marks(spansA, f, u);
                const bool inB = marks(spansB, f, u);
                m.data.cells.push_back(inA ? 1 : 0);
                m.data.cells.push_back(inB ? 1 : 0);
                ++m.data.units;
                m.agreeing += inA == inB ? 1 : 0;
                m.aMarked += inA ? 1 : 0;
                m.bMarked += inB ? 1 : 0;
            }
        }
    }
    return m;
}

std::vector<FramingFunction> allFunctions()
{
    return {kFramingFunctions.begin(), kFramingFunctions.end()};
}

// Live annotations of `coder` in `phase`.
std::vector<Annotation> spansOf(
    const std::vector<Annotation> &all, CoderId coder, std::optional<Phase> phase)
{
    std::vector<Annotation> out;
    std::ranges::copy_if(all, std::back_inserter(out), [&](const Annotation &x) {
        return x.coder == coder && (!phase || x.phase == *phase) && !x.deleted;
    });
    return out;
}

// The one lead with training-phase annotations, if there is exactly one.
std::optional<Coder> soleTrainingLead(const Names &names, const std::vector<Annotation> &all)
{
    std::optional<Coder> found;
    for (const Coder &c : names.coders) {
        if (c.role != CoderRole::Lead)
            continue;
        const bool coded = std::ranges::any_of(all, [&](const Annotation &a) {
            return a.coder == c.id && a.phase == Phase::Training && !a.deleted;
        });
        if (!coded)
            continue;
        if (found)
            return std::nullopt;
        found = c;
    }
    return found;
}

// --- codebook diff -----------------------------------------------------------------------------

QString joined(const QStringList &list)
{
    return list.join(QStringLiteral("; "));
}

QString attributeTypeKey(AttributeSpec::Type type)
{
    return type == AttributeSpec::Type::Choice ? QStringLiteral("choice") : QStringLiteral("text");
}

QString describe(const AttributeSpec &a)
{
    QString s = QStringLiteral("%1 (%2").arg(a.label, attributeTypeKey(a.type));
    if (a.type == AttributeSpec::Type::Choice)
        s += QStringLiteral(": %1; %2").arg(joined(a.values), measurementLevelKey(a.level));
    return s + QLatin1Char(')');
}

// "neutral → negative; unsure → neutral", in order of the recoded value.
QString recodeText(const QMap<QString, QString> &recode)
{
    QStringList parts;
    for (auto it = recode.begin(); it != recode.end(); ++it)
        parts << QStringLiteral("%1 → %2").arg(it.key(), it.value());
    return joined(parts);
}

QString describe(const ArticleItem &item)
{
    return QStringLiteral("%1 (%2; %3)")
        .arg(item.question, joined(item.values), measurementLevelKey(item.level));
}

class DiffBuilder
{
public:
    std::vector<CodebookChange> changes;

    void compare(const QString &path, std::optional<FramingFunction> f, const QString &before,
        const QString &after)
    {
        if (before != after)
            changes.push_back({CodebookChange::Kind::Changed, path, f, before, after});
    }
    void added(const QString &path, std::optional<FramingFunction> f, const QString &after)
    {
        changes.push_back({CodebookChange::Kind::Added, path, f, QString(), after});
    }
    void removed(const QString &path, std::optional<FramingFunction> f, const QString &before)
    {
        changes.push_back({CodebookChange::Kind::Removed, path, f, before, QString()});
    }
};

QString changeKindKey(CodebookChange::Kind kind)
{
    switch (kind) {
    case CodebookChange::Kind::Added:
        return QStringLiteral("added");
    case CodebookChange::Kind::Removed:
        return QStringLiteral("removed");
    case CodebookChange::Kind::Changed:
        break;
    }
    return QStringLiteral("changed");
}

} // namespace

QString stratumKey(Stratum stratum)
{
    switch (stratum) {
    case Stratum::Outlet:
        return QStringLiteral("outlet");
    case Stratum::Language:
        return QStringLiteral("language");
    case Stratum::Topic:
        break;
    }
    return QStringLiteral("topic");
}

std::optional<Stratum> stratumFromKey(const QString &key)
{
    for (Stratum s : {Stratum::Outlet, Stratum::Language, Stratum::Topic})
        if (key.compare(stratumKey(s), Qt::CaseInsensitive) == 0)
            return s;
    return std::nullopt;
}

std::vector<FramingFunction> CodebookDiff::changedFunctions() const
{
    std::vector<FramingFunction> out;
    for (FramingFunction f : kFramingFunctions)
        if (std::ranges::any_of(changes, [&](const CodebookChange &c) { return c.function == f; }))
            out.push_back(f);
    return out;
}

// --- the draw -----------------------------------------------------------------------------------

Result<Draw> StudyDesign::planDraw(const Project &project, const DrawRequest &request)
{
    const Database &db = project.db();
    if (request.phase != Phase::Reliability && request.phase != Phase::Pilot)
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "A subsample is drawn for the reliability or the pilot phase, not for %1.")
                .arg(phaseKey(request.phase)));
    if (request.size.has_value() == request.fraction.has_value())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "Give either the size of the subsample or its fraction of the articles."));
    if (request.fraction && !(*request.fraction > 0.0 && *request.fraction <= 1.0))
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr("The fraction %1 does not lie in (0, 1].").arg(*request.fraction));
    if (request.coders.size() < 2)
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr("A reliability subsample needs at least two coders; %1 given.")
                .arg(request.coders.size()));
    auto names = loadNames(db, project);
    if (!names)
        return std::unexpected(names.error());
    auto coders = resolveCoders(*names, request.coders);
    if (!coders)
        return std::unexpected(coders.error());
    auto recorded = recordedDraw(project, request.phase);
    if (!recorded)
        return std::unexpected(recorded.error());
    if (*recorded)
        return fail(ErrorCode::Duplicate,
            StudyDesignText::tr("The %1 phase already has a subsample (drawn %2 with seed %3).")
                .arg(phaseKey(request.phase), (*recorded)->drawnAt)
                .arg((*recorded)->seed));

    // The frame: articles not used for training, piloting or reliability yet; pilot articles
    // stay out of the final reliability sample and the reverse (field.md §1.1, after Lombard et
    // al. 2002), and training articles out of both.
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    QSet<qint64> excluded;
    for (const Assignment &a : *assignments)
        if (a.phase != Phase::Production)
            excluded.insert(a.article.value);
    if (request.leaveOutNearCopies) {
        auto nearCopies = NearCopies::list(project);
        if (!nearCopies)
            return std::unexpected(nearCopies.error());
        for (const NearCopy &row : *nearCopies)
            excluded.insert(row.article.value);
    }
    std::vector<store::FrameArticle> frame;
    std::ranges::copy_if(names->articles, std::back_inserter(frame),
        [&](const store::FrameArticle &a) { return !excluded.contains(a.id.value); });
    const int frameSize = int(frame.size());

    int size = 0;
    if (request.size)
        size = *request.size;
    else
        size = int(std::ceil(*request.fraction * frameSize - 1e-9));
    if (size < 1 || size > frameSize)
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "A subsample of %1 articles cannot be drawn from a sampling frame of %2 articles.")
                .arg(size)
                .arg(frameSize));

    Draw draw;
    draw.phase = request.phase;
    draw.method = request.stratify ? QStringLiteral("stratified") : QStringLiteral("random");
    draw.stratify = request.stratify;
    draw.seed = request.seed;
    draw.coders = request.coders;
    draw.nearCopiesLeftOut = request.leaveOutNearCopies;
    draw.frameArticles = frameSize;

    std::mt19937_64 engine(request.seed);
    std::vector<std::size_t> drawn; // indexes into frame
    if (!request.stratify) {
        std::vector<std::size_t> order(frame.size());
        for (std::size_t i = 0; i < order.size(); ++i)
            order[i] = i;
        shuffle(order, engine);
        drawn.assign(order.begin(), order.begin() + size);
    } else {
        std::map<QString, std::vector<std::size_t>> strata;
        for (std::size_t i = 0; i < frame.size(); ++i) {
            QString key;
            switch (*request.stratify) {
            case Stratum::Outlet:
                key = frame[i].outlet;
                break;
            case Stratum::Language:
                key = frame[i].language;
                break;
            case Stratum::Topic:
                key = frame[i].topic;
                break;
            }
            if (key.isEmpty())
                key = QStringLiteral("(none)");
            strata[key].push_back(i);
        }
        // Proportional allocation, rounded by largest remainder (Hamilton's method; Cochran
        // 1977, §5.5 for proportional allocation): floors first, then one more article to the
        // strata with the largest remainders, ties in key order.
        struct Share {
            QString key;
            int floor = 0;
            double remainder = 0;
            int members = 0;
        };
        std::vector<Share> shares;
        int allocated = 0;
        for (const auto &[key, members] : strata) {
            const double exact = double(size) * double(members.size()) / double(frameSize);
            const int whole = int(std::floor(exact + 1e-9));
            shares.push_back({key, whole, exact - whole, int(members.size())});
            allocated += whole;
        }
        std::vector<std::size_t> byRemainder(shares.size());
        for (std::size_t i = 0; i < byRemainder.size(); ++i)
            byRemainder[i] = i;
        std::ranges::stable_sort(byRemainder, [&](std::size_t x, std::size_t y) {
            return shares[x].remainder > shares[y].remainder + 1e-12;
        });
        for (std::size_t k = 0; allocated < size && k < byRemainder.size(); ++k) {
            Share &share = shares[byRemainder[k]];
            if (share.floor < share.members) { // guards against rounding at the edges
                ++share.floor;
                ++allocated;
            }
        }
        std::size_t s = 0;
        for (auto &[key, members] : strata) {
            const int take = shares[s++].floor;
            shuffle(members, engine);
            drawn.insert(drawn.end(), members.begin(), members.begin() + take);
            draw.strata.push_back({key, int(members.size()), take});
        }
    }
    std::ranges::sort(drawn); // the frame is in external-id order

    const qint64 k = qint64(coders->size());
    SampleAdvice &advice = draw.advice;
    advice.alphaMin = request.alphaMin;
    advice.significance = request.significance;
    advice.rarestProportion = request.rarestProportion;
    advice.minimumValues = reliability::minimumReliabilityValues(
        request.alphaMin, request.significance, request.rarestProportion);
    for (std::size_t i : drawn) {
        const store::FrameArticle &a = frame[i];
        draw.articles << a.externalId;
        advice.articleValues += k;
        advice.paragraphValues += a.paragraphs * k;
        advice.sentenceValues += a.sentences * k;
        for (const Coder &c : *coders)
            draw.plan.rows.push_back({a.externalId, c.pseudonym, request.phase});
    }
    if (advice.minimumValues > 0) {
        if (advice.articleValues >= advice.minimumValues)
            advice.sufficientUnits << QStringLiteral("article");
        if (advice.paragraphValues >= advice.minimumValues)
            advice.sufficientUnits << QStringLiteral("paragraph");
        if (advice.sentenceValues >= advice.minimumValues)
            advice.sufficientUnits << QStringLiteral("sentence");
    }
    return draw;
}

Result<std::unique_ptr<AssignEdit>> StudyDesign::drawEdit(
    const Project &project, Draw &draw, CoderId actor)
{
    auto recorded = recordedDraw(project, draw.phase);
    if (!recorded)
        return std::unexpected(recorded.error());
    if (*recorded)
        return fail(ErrorCode::Duplicate,
            StudyDesignText::tr("The %1 phase already has a subsample.").arg(phaseKey(draw.phase)));
    Draw stored = draw;
    stored.drawnAt = store::now();
    const QJsonObject record = drawJson(stored);
    auto edit = assignEdit(project, draw.plan, record, actor,
        StudyDesignText::tr("Draw the %1 subsample").arg(phaseKey(draw.phase)));
    if (!edit)
        return std::unexpected(edit.error());
    draw.drawnAt = stored.drawnAt;
    return std::make_unique<AssignEdit>(actor, (*edit)->text(), (*edit)->rows(), record,
        drawSettingKey(draw.phase), store::toJsonText(record));
}

Status StudyDesign::commitDraw(Project &project, Draw &draw)
{
    Draw planned = draw;
    auto edit = drawEdit(project, planned, CoderId {});
    if (!edit)
        return std::unexpected(edit.error());
    FOURFOLD_TRY_STATUS(project.apply(**edit));
    draw.drawnAt = planned.drawnAt;
    return {};
}

Result<std::unique_ptr<WithdrawDrawEdit>> StudyDesign::withdrawDrawEdit(
    const Project &project, Phase phase, CoderId actor)
{
    auto recorded = recordedDraw(project, phase);
    if (!recorded)
        return std::unexpected(recorded.error());
    if (!*recorded)
        return fail(ErrorCode::NotFound,
            StudyDesignText::tr("The %1 phase has no subsample to withdraw.").arg(phaseKey(phase)));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    std::vector<AssignmentToWrite> rows;
    for (const PlannedAssignment &row : (*recorded)->plan.rows) {
        const auto article = names->articleIndex.constFind(row.article);
        const auto coder = names->coderByPseudonym.constFind(row.coder);
        if (article == names->articleIndex.constEnd()
            || coder == names->coderByPseudonym.constEnd())
            continue; // an article or person gone since holds no assignment to withdraw
        rows.push_back({names->articles[size_t(*article)].id, coder->id, row.phase, {}});
    }
    auto edit = std::make_unique<WithdrawDrawEdit>(actor,
        StudyDesignText::tr("Withdraw the %1 subsample").arg(phaseKey(phase)), phaseKey(phase),
        std::move(rows), drawJson(**recorded), drawSettingKey(phase));
    return edit;
}

Result<qsizetype> StudyDesign::withdrawDraw(Project &project, Phase phase)
{
    auto edit = withdrawDrawEdit(project, phase, CoderId {});
    if (!edit)
        return std::unexpected(edit.error());
    FOURFOLD_TRY_STATUS(project.apply(**edit));
    return (*edit)->withdrawnAssignments();
}

Result<std::optional<Draw>> StudyDesign::recordedDraw(const Project &project, Phase phase)
{
    auto text = store::setting(project.db(), drawSettingKey(phase));
    if (!text)
        return std::unexpected(text.error());
    if (!*text)
        return std::optional<Draw> {};
    QJsonParseError parseError;
    const QJsonDocument doc = QJsonDocument::fromJson((*text)->toUtf8(), &parseError);
    if (!doc.isObject())
        return fail(ErrorCode::Corrupt,
            StudyDesignText::tr("The record of the %1 subsample is not a JSON object.")
                .arg(phaseKey(phase)),
            parseError.errorString());
    auto draw = drawFromJson(doc.object());
    if (!draw)
        return std::unexpected(draw.error());
    return std::optional<Draw> {std::move(*draw)};
}

QJsonObject StudyDesign::drawJson(const Draw &draw)
{
    QJsonArray strata;
    for (const DrawStratum &s : draw.strata)
        strata.append(
            QJsonObject {{QStringLiteral("key"), s.key}, {QStringLiteral("frame"), s.frameArticles},
                {QStringLiteral("drawn"), s.drawnArticles}});
    const SampleAdvice &a = draw.advice;
    return QJsonObject {
        {QStringLiteral("phase"), phaseKey(draw.phase)},
        {QStringLiteral("method"), draw.method},
        {QStringLiteral("stratify"),
            draw.stratify ? QJsonValue(stratumKey(*draw.stratify)) : QJsonValue()},
        {QStringLiteral("seed"), QString::number(draw.seed)},
        {QStringLiteral("coders"), QJsonArray::fromStringList(draw.coders)},
        {QStringLiteral("frame_articles"), draw.frameArticles},
        {QStringLiteral("near_copies_left_out"), draw.nearCopiesLeftOut},
        {QStringLiteral("articles"), QJsonArray::fromStringList(draw.articles)},
        {QStringLiteral("strata"), strata},
        {QStringLiteral("advice"),
            QJsonObject {{QStringLiteral("alpha_min"), a.alphaMin},
                {QStringLiteral("significance"), a.significance},
                {QStringLiteral("rarest_proportion"), a.rarestProportion},
                {QStringLiteral("minimum_values"), a.minimumValues},
                {QStringLiteral("article_values"), a.articleValues},
                {QStringLiteral("paragraph_values"), a.paragraphValues},
                {QStringLiteral("sentence_values"), a.sentenceValues},
                {QStringLiteral("sufficient_units"),
                    QJsonArray::fromStringList(a.sufficientUnits)}}},
        {QStringLiteral("drawn_at"), draw.drawnAt},
    };
}

Result<Draw> StudyDesign::drawFromJson(const QJsonObject &json)
{
    auto bad = [](const QString &what) {
        return fail(ErrorCode::Corrupt,
            StudyDesignText::tr("The subsample record is damaged: %1.").arg(what));
    };
    auto strings = [](const QJsonValue &v) {
        QStringList out;
        for (const QJsonValue &x : v.toArray())
            out << x.toString();
        return out;
    };
    Draw d;
    const auto phase = phaseFromKey(json.value(QStringLiteral("phase")).toString());
    if (!phase)
        return bad(StudyDesignText::tr("no valid phase"));
    d.phase = *phase;
    d.method = json.value(QStringLiteral("method")).toString();
    if (d.method != QStringLiteral("random") && d.method != QStringLiteral("stratified"))
        return bad(StudyDesignText::tr("unknown method \"%1\"").arg(d.method));
    const QJsonValue stratify = json.value(QStringLiteral("stratify"));
    if (stratify.isString()) {
        d.stratify = stratumFromKey(stratify.toString());
        if (!d.stratify)
            return bad(StudyDesignText::tr("unknown stratum \"%1\"").arg(stratify.toString()));
    }
    bool ok = false;
    d.seed = json.value(QStringLiteral("seed")).toString().toULongLong(&ok);
    if (!ok)
        return bad(StudyDesignText::tr("no valid seed"));
    d.coders = strings(json.value(QStringLiteral("coders")));
    d.frameArticles = json.value(QStringLiteral("frame_articles")).toInt();
    // Absent in records written before near copies were found: nothing was left out then.
    d.nearCopiesLeftOut = json.value(QStringLiteral("near_copies_left_out")).toBool(false);
    d.articles = strings(json.value(QStringLiteral("articles")));
    for (const QJsonValue &s : json.value(QStringLiteral("strata")).toArray()) {
        const QJsonObject o = s.toObject();
        d.strata.push_back({o.value(QStringLiteral("key")).toString(),
            o.value(QStringLiteral("frame")).toInt(), o.value(QStringLiteral("drawn")).toInt()});
    }
    const QJsonObject a = json.value(QStringLiteral("advice")).toObject();
    d.advice.alphaMin = a.value(QStringLiteral("alpha_min")).toDouble();
    d.advice.significance = a.value(QStringLiteral("significance")).toDouble();
    d.advice.rarestProportion = a.value(QStringLiteral("rarest_proportion")).toDouble();
    d.advice.minimumValues = a.value(QStringLiteral("minimum_values")).toInt();
    d.advice.articleValues = a.value(QStringLiteral("article_values")).toInteger();
    d.advice.paragraphValues = a.value(QStringLiteral("paragraph_values")).toInteger();
    d.advice.sentenceValues = a.value(QStringLiteral("sentence_values")).toInteger();
    d.advice.sufficientUnits = strings(a.value(QStringLiteral("sufficient_units")));
    d.drawnAt = json.value(QStringLiteral("drawn_at")).toString();
    for (const QString &article : d.articles)
        for (const QString &coder : d.coders)
            d.plan.rows.push_back({article, coder, d.phase});
    return d;
}

// --- the rest and explicit assignments -----------------------------------------------------------

Result<AssignmentPlan> StudyDesign::planRest(const Project &project, const RestRequest &request)
{
    const qsizetype need = request.coding == RestCoding::Double ? 2 : 1;
    if (request.coders.size() < need)
        return fail(ErrorCode::InvalidArgument,
            request.coding == RestCoding::Double
                ? StudyDesignText::tr("Double coding needs at least two coders; %1 given.")
                      .arg(request.coders.size())
                : StudyDesignText::tr("Name at least one coder for the remaining articles."));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto coders = resolveCoders(*names, request.coders);
    if (!coders)
        return std::unexpected(coders.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    QSet<qint64> assigned;
    for (const Assignment &a : *assignments)
        assigned.insert(a.article.value);
    std::vector<QString> rest;
    for (const store::FrameArticle &a : names->articles)
        if (!assigned.contains(a.id.value))
            rest.push_back(a.externalId);
    std::mt19937_64 engine(request.seed);
    shuffle(rest, engine);

    const std::size_t k = coders->size();
    AssignmentPlan plan;
    if (request.coding == RestCoding::Single) {
        for (std::size_t i = 0; i < rest.size(); ++i)
            plan.rows.push_back({rest[i], (*coders)[i % k].pseudonym, Phase::Production});
        return plan;
    }
    // Pairs in the order of a round-robin tournament (the circle method, common practice):
    // every round holds each coder at most once, so loads stay even while pairs rotate.
    const std::size_t m = k % 2 == 0 ? k : k + 1; // with a "bye" when k is odd
    std::vector<std::pair<std::size_t, std::size_t>> pairs;
    for (std::size_t round = 0; round + 1 < m; ++round) {
        for (std::size_t i = 0; i < m / 2; ++i) {
            const std::size_t a = i == 0 ? m - 1 : (round + i) % (m - 1);
            const std::size_t b = (round + (m - 1) - i) % (m - 1);
            if (a < k && b < k)
                pairs.emplace_back(std::min(a, b), std::max(a, b));
        }
    }
    for (std::size_t i = 0; i < rest.size(); ++i) {
        const auto &[a, b] = pairs[i % pairs.size()];
        plan.rows.push_back({rest[i], (*coders)[a].pseudonym, Phase::Production});
        plan.rows.push_back({rest[i], (*coders)[b].pseudonym, Phase::Production});
    }
    return plan;
}

Result<AssignmentPlan> StudyDesign::planArticles(
    const Project &project, Phase phase, const QStringList &articles, const QStringList &coders)
{
    if (articles.isEmpty() || coders.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr("Name at least one article and one coder."));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto resolved = resolveCoders(*names, coders);
    if (!resolved)
        return std::unexpected(resolved.error());
    for (const QString &a : articles)
        if (!names->articleIndex.contains(a))
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no article \"%1\" in the project.").arg(a));
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    QSet<QString> existing;
    for (const Assignment &a : *assignments)
        if (a.phase == phase)
            existing.insert(names->externalIdById.value(a.article.value) + QLatin1Char('\n')
                + coderLabel(*names, a.coder));
    AssignmentPlan plan;
    QSet<QString> planned;
    for (const QString &a : articles)
        for (const Coder &c : *resolved) {
            const QString key = a + QLatin1Char('\n') + c.pseudonym;
            if (!existing.contains(key) && !planned.contains(key)) {
                planned.insert(key);
                plan.rows.push_back({a, c.pseudonym, phase});
            }
        }
    return plan;
}

Result<std::unique_ptr<AssignEdit>> StudyDesign::assignEdit(const Project &project,
    const AssignmentPlan &plan, const QJsonObject &record, CoderId actor, const QString &text)
{
    const Database &db = project.db();
    auto names = loadNames(db, project);
    if (!names)
        return std::unexpected(names.error());
    auto existing = project.assignments();
    if (!existing)
        return std::unexpected(existing.error());
    QSet<QString> present;
    for (const Assignment &a : *existing)
        present.insert(QStringLiteral("%1/%2/%3")
                           .arg(a.article.value)
                           .arg(a.coder.value)
                           .arg(phaseKey(a.phase)));
    std::vector<AssignmentToWrite> rows;
    rows.reserve(plan.rows.size());
    for (const PlannedAssignment &row : plan.rows) {
        const auto article = names->articleIndex.constFind(row.article);
        if (article == names->articleIndex.constEnd())
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no article \"%1\" in the project.").arg(row.article));
        const auto coder = names->coderByPseudonym.constFind(row.coder);
        if (coder == names->coderByPseudonym.constEnd())
            return fail(ErrorCode::NotFound,
                StudyDesignText::tr("There is no coder \"%1\" in the project.").arg(row.coder));
        if (coder->disabled)
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr(
                    "%1 is disabled and takes no new assignments; enable them first.")
                    .arg(row.coder));
        const ArticleId articleId = names->articles[size_t(*article)].id;
        const QString key = QStringLiteral("%1/%2/%3")
                                .arg(articleId.value)
                                .arg(coder->id.value)
                                .arg(phaseKey(row.phase));
        if (present.contains(key))
            return fail(ErrorCode::Duplicate,
                StudyDesignText::tr("Article \"%1\" is already assigned to %2 in the %3 phase.")
                    .arg(row.article, row.coder, phaseKey(row.phase)));
        present.insert(key);
        rows.push_back({articleId, coder->id, row.phase, store::newUuid()});
    }
    const QString undoText = !text.isEmpty()
        ? text
        : StudyDesignText::tr("Assign %n article(s)", nullptr, int(rows.size()));
    return std::make_unique<AssignEdit>(actor, undoText, std::move(rows), record);
}

Status StudyDesign::commitPlan(
    Project &project, const AssignmentPlan &plan, const QJsonObject &record)
{
    auto edit = assignEdit(project, plan, record);
    if (!edit)
        return std::unexpected(edit.error());
    return project.apply(**edit);
}

Result<std::vector<AssignmentRow>> StudyDesign::assignmentRows(
    const Project &project, std::optional<Phase> phase)
{
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    std::vector<AssignmentRow> rows;
    for (const Assignment &a : *assignments) {
        if (phase && a.phase != *phase)
            continue;
        if (!names->externalIdById.contains(a.article.value))
            continue; // a deleted article
        rows.push_back({names->externalIdById.value(a.article.value), coderLabel(*names, a.coder),
            a.phase, a.status});
    }
    std::ranges::stable_sort(rows, [](const AssignmentRow &x, const AssignmentRow &y) {
        if (x.phase != y.phase)
            return phaseRank(x.phase) < phaseRank(y.phase);
        if (x.article != y.article)
            return x.article < y.article;
        return x.coder < y.coder;
    });
    return rows;
}

Result<Phase> StudyDesign::phaseForNewCoding(
    const Database &db, ArticleId article, CoderId coder, Phase requested)
{
    auto mine = store::coderAssignments(db, article, coder);
    if (!mine)
        return std::unexpected(mine.error());
    if (mine->empty())
        return requested;
    const auto isDone = [](const Assignment &a) { return a.status == QStringLiteral("done"); };
    if (std::ranges::any_of(
            *mine, [&](const Assignment &a) { return a.phase == requested && !isDone(a); }))
        return requested;
    std::optional<Phase> open;
    std::optional<Phase> last;
    for (const Assignment &a : *mine) {
        if (!isDone(a)) {
            if (!open || phaseRank(a.phase) < phaseRank(*open))
                open = a.phase;
        } else if (!last || phaseRank(a.phase) > phaseRank(*last)) {
            last = a.phase;
        }
    }
    if (open)
        return *open;
    if (std::ranges::any_of(*mine, [&](const Assignment &a) { return a.phase == requested; }))
        return requested;
    return *last;
}

// --- codebook versions ---------------------------------------------------------------------------

namespace {

// Whether every value that counts under the version before (its values and recodings) still
// counts after it: then no value in use can have lost its place.
bool keepsEveryValue(const QStringList &values, const QMap<QString, QString> &recode,
    const QStringList &nextValues, const QMap<QString, QString> &nextRecode)
{
    const auto counts = [&](const QString &v) {
        return countedValue(nextValues, nextRecode, v).has_value();
    };
    return std::ranges::all_of(values, counts) && std::ranges::all_of(recode.keys(), counts);
}

Status checkValuesInUse(const Database &db, const Codebook &current, const Codebook &next)
{
    for (FramingFunction f : kFramingFunctions) {
        for (const AttributeSpec &spec : next.definition(f).attributes) {
            if (spec.type != AttributeSpec::Type::Choice)
                continue;
            const auto &before = current.definition(f).attributes;
            const auto old = std::ranges::find(before, spec.key, &AttributeSpec::key);
            if (old != before.end() && old->type == AttributeSpec::Type::Choice
                && keepsEveryValue(old->values, old->recode, spec.values, spec.recode))
                continue;
            auto used = store::attributeValuesInUse(db, f, spec.key);
            if (!used)
                return std::unexpected(used.error());
            for (const store::ValueInUse &u : *used)
                if (!countedValue(spec.values, spec.recode, u.value))
                    return fail(ErrorCode::InvalidInput,
                        StudyDesignText::tr(
                            "%1 span(s) of %2 carry the value \"%3\" of the attribute \"%4\", "
                            "which the new version neither lists nor recodes; add \"recode\": "
                            "{\"%3\": \"…\"} to the attribute with one of its values (%5).")
                            .arg(u.count)
                            .arg(functionKey(f), u.value, spec.key,
                                spec.values.join(QStringLiteral(", "))));
        }
    }
    for (const ArticleItem &item : next.items) {
        const ArticleItem *old = current.item(item.key);
        if (old && keepsEveryValue(old->values, old->recode, item.values, item.recode))
            continue;
        auto used = store::itemValuesInUse(db, item.key);
        if (!used)
            return std::unexpected(used.error());
        for (const store::ValueInUse &u : *used)
            if (!countedValue(item.values, item.recode, u.value))
                return fail(ErrorCode::InvalidInput,
                    StudyDesignText::tr(
                        "%1 answer(s) to the item \"%2\" are \"%3\", which the new version "
                        "neither lists nor recodes; add \"recode\": {\"%3\": \"…\"} to the item "
                        "with one of its values (%4).")
                        .arg(u.count)
                        .arg(item.key, u.value, item.values.join(QStringLiteral(", "))));
    }
    return {};
}

} // namespace

Result<std::vector<CodebookVersionInfo>> StudyDesign::codebookVersions(const Project &project)
{
    auto rows = store::codebookVersionRows(project.db());
    if (!rows)
        return std::unexpected(rows.error());
    std::vector<CodebookVersionInfo> out;
    for (const store::CodebookVersionRow &r : *rows)
        out.push_back({r.id, r.number, r.createdAt, r.createdBy, r.note});
    return out;
}

Result<Codebook> StudyDesign::codebookVersion(const Project &project, int number)
{
    return store::codebookByNumber(project.db(), number);
}

Result<CodebookVersionInfo> StudyDesign::addCodebookVersion(
    Project &project, const Codebook &codebook, const QString &note, CoderId author)
{
    if (note.trimmed().isEmpty())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "A new codebook version needs a note that says what changed and why."));
    auto current = store::currentCodebook(project.db());
    if (!current)
        return std::unexpected(current.error());
    if (diffCodebooks(*current, codebook).changes.empty())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr("The codebook is the same as version %1; no new version was made.")
                .arg(current->number));
    FOURFOLD_TRY_STATUS(checkValuesInUse(project.db(), *current, codebook));
    auto sp = Savepoint::begin(project.db());
    if (!sp)
        return std::unexpected(sp.error());
    auto id = store::insertCodebookVersion(project.db(), codebook, note.trimmed(), author);
    if (!id)
        return std::unexpected(id.error());
    auto stored = store::currentCodebook(project.db());
    if (!stored)
        return std::unexpected(stored.error());
    const CodebookDiff diff = diffCodebooks(*current, *stored);
    QJsonObject detail =
        codebookDiffJson(CodebookDiff {current->number, stored->number, diff.changes});
    detail.insert(QStringLiteral("note"), note.trimmed());
    FOURFOLD_TRY_STATUS(store::appendEvent(project.db(), author, QStringLiteral("codebook.version"),
        QStringLiteral("codebook"), QString(), detail));
    FOURFOLD_TRY_STATUS(sp->commit());
    auto versions = codebookVersions(project);
    if (!versions)
        return std::unexpected(versions.error());
    return versions->back();
}

Result<CodebookVersionInfo> StudyDesign::addCodebookVersionFromFile(
    Project &project, const QString &path, const QString &note, CoderId author)
{
    const auto bytes = readWholeFile(path, maxCodebookFileSize);
    if (!bytes)
        return std::unexpected(bytes.error());
    auto book = Codebook::fromJson(*bytes, path);
    if (!book)
        return std::unexpected(book.error());
    return addCodebookVersion(project, *book, note, author);
}

CodebookDiff StudyDesign::diffCodebooks(const Codebook &from, const Codebook &to)
{
    DiffBuilder d;
    d.compare(QStringLiteral("name"), std::nullopt, from.name, to.name);
    for (FramingFunction f : kFramingFunctions) {
        const FunctionDefinition &a = from.definition(f);
        const FunctionDefinition &b = to.definition(f);
        const QString p = functionKey(f) + QLatin1Char('.');
        d.compare(p + QStringLiteral("label"), f, a.label, b.label);
        d.compare(p + QStringLiteral("definition"), f, a.definition, b.definition);
        d.compare(p + QStringLiteral("rules"), f, joined(a.rules), joined(b.rules));
        d.compare(p + QStringLiteral("examples"), f, joined(a.examples), joined(b.examples));
        for (const AttributeSpec &x : a.attributes) {
            const QString ap = p + QStringLiteral("attributes.") + x.key;
            const auto y = std::ranges::find(b.attributes, x.key, &AttributeSpec::key);
            if (y == b.attributes.end()) {
                d.removed(ap, f, describe(x));
                continue;
            }
            d.compare(ap + QStringLiteral(".label"), f, x.label, y->label);
            d.compare(ap + QStringLiteral(".type"), f, attributeTypeKey(x.type),
                attributeTypeKey(y->type));
            d.compare(ap + QStringLiteral(".values"), f, joined(x.values), joined(y->values));
            d.compare(ap + QStringLiteral(".level"), f, measurementLevelKey(x.level),
                measurementLevelKey(y->level));
            d.compare(
                ap + QStringLiteral(".recode"), f, recodeText(x.recode), recodeText(y->recode));
        }
        for (const AttributeSpec &y : b.attributes)
            if (std::ranges::find(a.attributes, y.key, &AttributeSpec::key) == a.attributes.end())
                d.added(p + QStringLiteral("attributes.") + y.key, f, describe(y));
    }
    for (const ArticleItem &x : from.items) {
        const QString ip = QStringLiteral("items.") + x.key;
        const ArticleItem *y = to.item(x.key);
        if (!y) {
            d.removed(ip, std::nullopt, describe(x));
            continue;
        }
        d.compare(ip + QStringLiteral(".question"), std::nullopt, x.question, y->question);
        d.compare(
            ip + QStringLiteral(".values"), std::nullopt, joined(x.values), joined(y->values));
        d.compare(ip + QStringLiteral(".level"), std::nullopt, measurementLevelKey(x.level),
            measurementLevelKey(y->level));
        d.compare(ip + QStringLiteral(".recode"), std::nullopt, recodeText(x.recode),
            recodeText(y->recode));
    }
    for (const ArticleItem &y : to.items)
        if (!from.item(y.key))
            d.added(QStringLiteral("items.") + y.key, std::nullopt, describe(y));
    return CodebookDiff {from.number, to.number, std::move(d.changes)};
}

Result<CodebookDiff> StudyDesign::codebookDiff(const Project &project, int from, int to)
{
    auto a = codebookVersion(project, from);
    if (!a)
        return std::unexpected(a.error());
    auto b = codebookVersion(project, to);
    if (!b)
        return std::unexpected(b.error());
    return diffCodebooks(*a, *b);
}

QString StudyDesign::codebookDiffText(const CodebookDiff &diff)
{
    QStringList lines;
    lines << StudyDesignText::tr("Codebook version %1 → %2").arg(diff.from).arg(diff.to);
    if (diff.changes.empty())
        lines << StudyDesignText::tr("no changes");
    for (const CodebookChange &c : diff.changes) {
        switch (c.kind) {
        case CodebookChange::Kind::Added:
            lines << QStringLiteral("+ %1: «%2»").arg(c.path, c.after);
            break;
        case CodebookChange::Kind::Removed:
            lines << QStringLiteral("- %1: «%2»").arg(c.path, c.before);
            break;
        case CodebookChange::Kind::Changed:
            lines << QStringLiteral("~ %1: «%2» → «%3»").arg(c.path, c.before, c.after);
            break;
        }
    }
    return lines.join(QLatin1Char('\n'));
}

QJsonObject StudyDesign::codebookDiffJson(const CodebookDiff &diff)
{
    QJsonArray changes;
    for (const CodebookChange &c : diff.changes) {
        QJsonObject o {
            {QStringLiteral("kind"), changeKindKey(c.kind)}, {QStringLiteral("path"), c.path}};
        if (c.function)
            o.insert(QStringLiteral("function"), functionKey(*c.function));
        if (c.kind != CodebookChange::Kind::Added)
            o.insert(QStringLiteral("before"), c.before);
        if (c.kind != CodebookChange::Kind::Removed)
            o.insert(QStringLiteral("after"), c.after);
        changes.append(o);
    }
    return QJsonObject {{QStringLiteral("from"), diff.from}, {QStringLiteral("to"), diff.to},
        {QStringLiteral("changes"), changes}};
}

Result<std::vector<OutdatedAnnotation>> StudyDesign::outdatedAnnotations(const Project &project)
{
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto current = store::currentCodebook(project.db());
    if (!current)
        return std::unexpected(current.error());
    auto versions = store::codebookVersionRows(project.db());
    if (!versions)
        return std::unexpected(versions.error());
    QHash<qint64, int> numberOf;
    for (const store::CodebookVersionRow &v : *versions)
        numberOf.insert(v.id.value, v.number);
    // Which functions changed between each older version and the current one.
    std::map<int, std::vector<FramingFunction>> changedSince;
    for (const store::CodebookVersionRow &v : *versions) {
        if (v.number >= current->number)
            continue;
        auto old = store::codebookByNumber(project.db(), v.number);
        if (!old)
            return std::unexpected(old.error());
        changedSince[v.number] = diffCodebooks(*old, *current).changedFunctions();
    }
    auto all = project.allAnnotations();
    if (!all)
        return std::unexpected(all.error());
    std::vector<std::pair<Annotation, OutdatedAnnotation>> found;
    for (const Annotation &a : *all) {
        if (a.deleted)
            continue;
        const int number = numberOf.value(a.codebookVersion.value, current->number);
        if (number >= current->number)
            continue;
        const auto &changed = changedSince[number];
        found.push_back({a,
            OutdatedAnnotation {a.id, names->externalIdById.value(a.article.value),
                coderLabel(*names, a.coder), a.content.function, a.phase, number,
                std::ranges::find(changed, a.content.function) != changed.end()}});
    }
    std::ranges::stable_sort(found, [](const auto &x, const auto &y) {
        if (x.second.article != y.second.article)
            return x.second.article < y.second.article;
        if (x.second.coder != y.second.coder)
            return x.second.coder < y.second.coder;
        return x.first.content.range.start < y.first.content.range.start;
    });
    std::vector<OutdatedAnnotation> out;
    for (auto &f : found)
        out.push_back(std::move(f.second));
    return out;
}

// --- training ---------------------------------------------------------------------------------

Result<TrainingFeedback> StudyDesign::trainingFeedback(
    const Project &project, const TrainingRequest &request)
{
    if (request.unit != UnitKind::Paragraph && request.unit != UnitKind::Sentence
        && request.unit != UnitKind::Token)
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "Training feedback is computed on paragraphs, sentences or tokens, not on %1 "
                "units.")
                .arg(unitKindKey(request.unit)));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto coder = resolveCoders(*names, {request.coder});
    if (!coder)
        return std::unexpected(coder.error());
    auto all = project.allAnnotations();
    if (!all)
        return std::unexpected(all.error());
    Coder master;
    if (request.master.isEmpty()) {
        auto lead = soleTrainingLead(*names, *all);
        if (!lead)
            return fail(ErrorCode::InvalidArgument,
                StudyDesignText::tr(
                    "Name the lead whose training coding is the master: there is not exactly one "
                    "lead with training annotations."));
        master = *lead;
    } else {
        auto m = resolveCoders(*names, {request.master});
        if (!m)
            return std::unexpected(m.error());
        master = m->front();
    }
    const Coder trainee = coder->front();
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());

    TrainingFeedback fb;
    fb.coder = trainee.pseudonym;
    fb.master = master.pseudonym;
    fb.unit = request.unit;
    const std::vector<Annotation> mine = spansOf(*all, trainee.id, Phase::Training);
    const std::vector<Annotation> theirs = spansOf(*all, master.id, Phase::Training);
    QSet<qint64> masterCoded;
    for (const Annotation &a : theirs)
        masterCoded.insert(a.article.value);
    for (const Assignment &a : *assignments)
        if (a.coder == master.id && a.phase == Phase::Training)
            masterCoded.insert(a.article.value);
    std::vector<ArticleId> compared;
    int trainingAssignments = 0;
    for (const Assignment &a : *assignments) {
        if (a.coder != trainee.id || a.phase != Phase::Training)
            continue;
        ++trainingAssignments;
        if (a.status != QStringLiteral("done"))
            ++fb.openArticles;
        else if (masterCoded.contains(a.article.value))
            compared.push_back(a.article);
    }
    std::ranges::sort(
        compared, {}, [&](ArticleId id) { return names->externalIdById.value(id.value); });
    for (ArticleId id : compared)
        fb.articles << names->externalIdById.value(id.value);
    fb.trainingComplete = trainingAssignments > 0 && fb.openArticles == 0;

    UnitCache cache(project, request.unit);
    for (std::size_t i = 0; i < kFramingFunctions.size(); ++i) {
        const FramingFunction f = kFramingFunctions[i];
        auto m = pairMatrix(cache, compared, {f}, mine, theirs);
        if (!m)
            return std::unexpected(m.error());
        FunctionAgreement &fa = fb.functions[i];
        fa.function = f;
        fa.units = m->data.units;
        fa.agreeingUnits = m->agreeing;
        fa.percentAgreement = fa.units > 0 ? double(fa.agreeingUnits) / fa.units : 0.0;
        fa.coderUnits = m->aMarked;
        fa.masterUnits = m->bMarked;
        const reliability::AlphaResult alpha = reliability::krippendorffAlpha(
            m->data, reliability::Metric {reliability::Level::Nominal, {}, {}});
        fa.alpha = alpha.value;
        fa.alphaUndefinedReason = QString::fromStdString(alpha.reason);
    }
    return fb;
}

QJsonObject StudyDesign::trainingFeedbackJson(const TrainingFeedback &feedback)
{
    QJsonArray functions;
    for (const FunctionAgreement &f : feedback.functions) {
        QJsonObject o {{QStringLiteral("function"), functionKey(f.function)},
            {QStringLiteral("units"), f.units}, {QStringLiteral("agreeing_units"), f.agreeingUnits},
            {QStringLiteral("percent_agreement"), f.percentAgreement},
            {QStringLiteral("alpha"), f.alpha ? QJsonValue(*f.alpha) : QJsonValue()},
            {QStringLiteral("coder_units"), f.coderUnits},
            {QStringLiteral("master_units"), f.masterUnits}};
        if (!f.alpha)
            o.insert(QStringLiteral("alpha_undefined"), f.alphaUndefinedReason);
        functions.append(o);
    }
    return QJsonObject {{QStringLiteral("coder"), feedback.coder},
        {QStringLiteral("master"), feedback.master},
        {QStringLiteral("unit"), unitKindKey(feedback.unit)},
        {QStringLiteral("articles"), QJsonArray::fromStringList(feedback.articles)},
        {QStringLiteral("open_articles"), feedback.openArticles},
        {QStringLiteral("training_complete"), feedback.trainingComplete},
        {QStringLiteral("functions"), functions}};
}

// --- progress and effort ------------------------------------------------------------------------

Result<bool> StudyDesign::effortPerCoderVisible(const Project &project)
{
    auto value = store::setting(project.db(), kEffortKey);
    if (!value)
        return std::unexpected(value.error());
    return *value && **value == QStringLiteral("on");
}

std::unique_ptr<Edit> StudyDesign::effortEdit(bool visible, CoderId lead)
{
    return std::make_unique<SetProjectSettingEdit>(lead,
        visible ? StudyDesignText::tr("Show effort per coder")
                : StudyDesignText::tr("Hide effort per coder"),
        QStringLiteral("setting.effort_per_coder"), kEffortKey,
        visible ? QStringLiteral("on") : QStringLiteral("off"));
}

Status StudyDesign::setEffortPerCoderVisible(Project &project, bool visible, CoderId lead)
{
    return project.apply(*effortEdit(visible, lead));
}

Result<ProgressBoard> StudyDesign::progressBoard(const Project &project, std::optional<Phase> phase)
{
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    auto visible = effortPerCoderVisible(project);
    if (!visible)
        return std::unexpected(visible.error());
    auto assignments = project.assignments();
    if (!assignments)
        return std::unexpected(assignments.error());
    // Every live span as an outline, by (coder, phase): read once, with one statement.
    std::map<std::pair<qint64, Phase>, std::vector<Annotation>> spansBy;
    FOURFOLD_TRY_STATUS(project.forEachAnnotationOutline([&](Annotation &&a) -> Status {
        spansBy[{a.coder.value, a.phase}].push_back(std::move(a));
        return {};
    }));
    const std::vector<Annotation> noSpans;
    const auto spansOfIn = [&](CoderId coder, Phase ph) -> const std::vector<Annotation> & {
        auto it = spansBy.find({coder.value, ph});
        return it == spansBy.end() ? noSpans : it->second;
    };

    ProgressBoard board;
    board.effortPerCoder = *visible;
    // The one lead with training spans, if there is exactly one.
    std::optional<Coder> master;
    int trainingLeads = 0;
    for (const Coder &c : names->coders)
        if (c.role == CoderRole::Lead && !spansOfIn(c.id, Phase::Training).empty()) {
            master = c;
            ++trainingLeads;
        }
    if (trainingLeads != 1)
        master.reset();
    // Sentence ranges of every article, read with one statement when first needed.
    UnitCache cache(project, UnitKind::Sentence);
    bool unitsLoaded = false;
    const reliability::Metric nominal {reliability::Level::Nominal, {}, {}};

    for (Phase ph : kPhases) {
        if (phase && ph != *phase)
            continue;
        // Per coder of the phase (by pseudonym): their assignments and finished articles.
        std::map<QString, std::vector<Assignment>> byCoder;
        for (const Assignment &a : *assignments)
            if (a.phase == ph && names->externalIdById.contains(a.article.value))
                byCoder[coderLabel(*names, a.coder)].push_back(a);
        if (byCoder.empty())
            continue;
        PhaseEffort effort;
        effort.phase = ph;
        std::map<qint64, std::set<qint64>> doneBy; // coder → articles done
        std::map<qint64, std::set<qint64>> spannedBy; // coder → articles with spans in the phase
        for (const auto &[key, spans] : spansBy)
            if (key.second == ph)
                for (const Annotation &a : spans)
                    spannedBy[key.first].insert(a.article.value);
        for (const auto &[pseudonym, list] : byCoder)
            for (const Assignment &a : list)
                if (a.status == QStringLiteral("done"))
                    doneBy[a.coder.value].insert(a.article.value);

        // Alpha of two coders over the articles both finished (present/absent per unit and
        // function, pooled as one nominal variable); none when undefined. Between two coders who
        // both must have finished, the figure is the same both ways and computed once.
        std::map<std::pair<qint64, qint64>, std::pair<std::optional<double>, int>> mutual;
        auto pairAlpha = [&](CoderId x, CoderId y, bool yNeedsDone,
                             int *articles) -> Result<std::optional<double>> {
            const std::pair<qint64, qint64> key {
                std::min(x.value, y.value), std::max(x.value, y.value)};
            if (yNeedsDone)
                if (auto known = mutual.find(key); known != mutual.end()) {
                    *articles = known->second.second;
                    return known->second.first;
                }
            std::vector<ArticleId> common;
            for (qint64 id : doneBy[x.value]) {
                const bool yCoded =
                    yNeedsDone ? doneBy[y.value].contains(id) : spannedBy[y.value].contains(id);
                if (yCoded)
                    common.push_back(ArticleId {id});
            }
            *articles = int(common.size());
            std::optional<double> alpha;
            if (!common.empty()) {
                if (!unitsLoaded) {
                    FOURFOLD_TRY_STATUS(cache.loadAll());
                    unitsLoaded = true;
                }
                auto m =
                    pairMatrix(cache, common, allFunctions(), spansOfIn(x, ph), spansOfIn(y, ph));
                if (!m)
                    return std::unexpected(m.error());
                alpha = reliability::krippendorffAlpha(m->data, nominal).value;
            }
            if (yNeedsDone)
                mutual.emplace(key, std::pair {alpha, *articles});
            return alpha;
        };

        for (const auto &[pseudonym, list] : byCoder) {
            ProgressRow row;
            row.coder = pseudonym;
            row.phase = ph;
            qint64 seconds = 0;
            for (const Assignment &a : list) {
                ++row.assigned;
                if (a.status == QStringLiteral("started"))
                    ++row.started;
                else if (a.status == QStringLiteral("done"))
                    ++row.done;
                seconds += a.activeSeconds;
            }
            effort.doneArticles += row.done;
            effort.activeSeconds += seconds;
            if (board.effortPerCoder)
                row.activeSeconds = seconds;
            const CoderId me = list.front().coder;
            if (ph == Phase::Training) {
                if (master && master->id != me) {
                    auto alpha = pairAlpha(me, master->id, false, &row.comparedArticles);
                    if (!alpha)
                        return std::unexpected(alpha.error());
                    row.agreement = *alpha;
                }
            } else {
                double sum = 0;
                int defined = 0;
                for (const auto &[other, otherList] : byCoder) {
                    if (other == pseudonym)
                        continue;
                    int n = 0;
                    auto alpha = pairAlpha(me, otherList.front().coder, true, &n);
                    if (!alpha)
                        return std::unexpected(alpha.error());
                    row.comparedArticles += n;
                    if (*alpha) {
                        sum += **alpha;
                        ++defined;
                    }
                }
                if (defined > 0)
                    row.agreement = sum / defined;
            }
            board.rows.push_back(row);
        }
        if (effort.doneArticles > 0)
            effort.meanSecondsPerDoneArticle = double(effort.activeSeconds) / effort.doneArticles;
        board.effort.push_back(effort);
    }
    return board;
}

QJsonObject StudyDesign::progressBoardJson(const ProgressBoard &board)
{
    QJsonArray rows;
    for (const ProgressRow &r : board.rows) {
        QJsonObject o {{QStringLiteral("coder"), r.coder},
            {QStringLiteral("phase"), phaseKey(r.phase)}, {QStringLiteral("assigned"), r.assigned},
            {QStringLiteral("started"), r.started}, {QStringLiteral("done"), r.done},
            {QStringLiteral("agreement"), r.agreement ? QJsonValue(*r.agreement) : QJsonValue()},
            {QStringLiteral("compared_articles"), r.comparedArticles}};
        if (r.activeSeconds)
            o.insert(QStringLiteral("active_seconds"), *r.activeSeconds);
        rows.append(o);
    }
    QJsonArray effort;
    for (const PhaseEffort &e : board.effort)
        effort.append(QJsonObject {{QStringLiteral("phase"), phaseKey(e.phase)},
            {QStringLiteral("done_articles"), e.doneArticles},
            {QStringLiteral("active_seconds"), e.activeSeconds},
            {QStringLiteral("mean_seconds_per_done_article"),
                e.meanSecondsPerDoneArticle ? QJsonValue(*e.meanSecondsPerDoneArticle)
                                            : QJsonValue()}});
    return QJsonObject {{QStringLiteral("effort_per_coder"), board.effortPerCoder},
        {QStringLiteral("rows"), rows}, {QStringLiteral("effort"), effort}};
}

} // namespace fourfold
