#include "core/project/subsample_draw.h"

#include "core/project/near_copies.h"
#include "core/project/project.h"
#include "core/project/reproducible_shuffle.h"
#include "core/project/study_names.h"
#include "core/reliability/sample_size.h"
#include "core/store/project_tables.h"
#include "core/store/store_util.h"
#include "core/store/study_tables.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QSet>

#include <algorithm>
#include <cmath>
#include <map>
#include <random>

namespace fourfold {

using namespace study;

namespace {

QString drawSettingKey(Phase phase)
{
    return QStringLiteral("study.draw.") + phaseKey(phase);
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
// --- the draw -----------------------------------------------------------------------------------

Result<Draw> SubsampleDraw::plan(const Project &project, const DrawRequest &request)
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
    auto existing = SubsampleDraw::recorded(project, request.phase);
    if (!existing)
        return std::unexpected(existing.error());
    if (*existing)
        return fail(ErrorCode::Duplicate,
            StudyDesignText::tr("The %1 phase already has a subsample (drawn %2 with seed %3).")
                .arg(phaseKey(request.phase), (*existing)->drawnAt)
                .arg((*existing)->seed));

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

Result<std::unique_ptr<AssignEdit>> SubsampleDraw::edit(
    const Project &project, Draw &draw, CoderId actor)
{
    auto existing = SubsampleDraw::recorded(project, draw.phase);
    if (!existing)
        return std::unexpected(existing.error());
    if (*existing)
        return fail(ErrorCode::Duplicate,
            StudyDesignText::tr("The %1 phase already has a subsample.").arg(phaseKey(draw.phase)));
    Draw stored = draw;
    stored.drawnAt = store::now();
    const QJsonObject record = toJson(stored);
    auto edit = AssignmentPlans::edit(project, draw.plan, record, actor,
        StudyDesignText::tr("Draw the %1 subsample").arg(phaseKey(draw.phase)));
    if (!edit)
        return std::unexpected(edit.error());
    draw.drawnAt = stored.drawnAt;
    return std::make_unique<AssignEdit>(actor, (*edit)->text(), (*edit)->rows(), record,
        drawSettingKey(draw.phase), store::toJsonText(record));
}

Status SubsampleDraw::commit(Project &project, Draw &draw)
{
    Draw planned = draw;
    auto made = SubsampleDraw::edit(project, planned, CoderId {});
    if (!made)
        return std::unexpected(made.error());
    FOURFOLD_TRY_STATUS(project.apply(**made));
    draw.drawnAt = planned.drawnAt;
    return {};
}

Result<std::unique_ptr<WithdrawDrawEdit>> SubsampleDraw::withdrawEdit(
    const Project &project, Phase phase, CoderId actor)
{
    auto existing = SubsampleDraw::recorded(project, phase);
    if (!existing)
        return std::unexpected(existing.error());
    if (!*existing)
        return fail(ErrorCode::NotFound,
            StudyDesignText::tr("The %1 phase has no subsample to withdraw.").arg(phaseKey(phase)));
    auto names = loadNames(project.db(), project);
    if (!names)
        return std::unexpected(names.error());
    std::vector<AssignmentToWrite> rows;
    for (const PlannedAssignment &row : (*existing)->plan.rows) {
        const auto article = names->articleIndex.constFind(row.article);
        const auto coder = names->coderByPseudonym.constFind(row.coder);
        if (article == names->articleIndex.constEnd()
            || coder == names->coderByPseudonym.constEnd())
            continue; // an article or person gone since holds no assignment to withdraw
        rows.push_back({names->articles[size_t(*article)].id, coder->id, row.phase, {}});
    }
    auto edit = std::make_unique<WithdrawDrawEdit>(actor,
        StudyDesignText::tr("Withdraw the %1 subsample").arg(phaseKey(phase)), phaseKey(phase),
        std::move(rows), toJson(**existing), drawSettingKey(phase));
    return edit;
}

Result<qsizetype> SubsampleDraw::withdraw(Project &project, Phase phase)
{
    auto edit = withdrawEdit(project, phase, CoderId {});
    if (!edit)
        return std::unexpected(edit.error());
    FOURFOLD_TRY_STATUS(project.apply(**edit));
    return (*edit)->withdrawnAssignments();
}

Result<std::optional<Draw>> SubsampleDraw::recorded(const Project &project, Phase phase)
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
    auto draw = fromJson(doc.object());
    if (!draw)
        return std::unexpected(draw.error());
    return std::optional<Draw> {std::move(*draw)};
}

QJsonObject SubsampleDraw::toJson(const Draw &draw)
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

Result<Draw> SubsampleDraw::fromJson(const QJsonObject &json)
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

} // namespace fourfold
