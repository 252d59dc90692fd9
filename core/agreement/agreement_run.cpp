#include "core/agreement/agreement_run.h"

#include "core/project/project.h"
#include "core/reliability/span_scores.h"

#include <QCoreApplication>
#include <QHash>
#include <QJsonArray>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct AgreementRunText {
    Q_DECLARE_TR_FUNCTIONS(AgreementRunText)
};

// Keeps only `keep` (function keys) in set labels "cause|problem" ("{}" when none is left): each
// label is restricted once and the cells follow their labels.
void restrictSets(ReliabilityTable &table, const QStringList &keep)
{
    QStringList labels;
    std::vector<qint32> relabel;
    for (const QString &label : table.labels()) {
        QStringList kept;
        for (const QString &key : label.split(QLatin1Char('|'), Qt::SkipEmptyParts))
            if (keep.contains(key))
                kept << key;
        const QString restricted =
            kept.isEmpty() ? QStringLiteral("{}") : kept.join(QLatin1Char('|'));
        qsizetype at = labels.indexOf(restricted);
        if (at < 0) {
            at = labels.size();
            labels << restricted;
        }
        relabel.push_back(qint32(at));
    }
    table.relabel(relabel, labels);
}

bool isSetUnit(const AnalysisRequest &request)
{
    return request.unit != UnitKind::Article && request.unit != UnitKind::Span && !request.function;
}

std::vector<PairSpanAgreement> pairSpanAgreement(const ContinuumData &c)
{
    std::vector<PairSpanAgreement> out;
    for (int a = 0; a < int(c.coders.size()); ++a)
        for (int b = a + 1; b < int(c.coders.size()); ++b) {
            PairSpanAgreement p;
            p.coderA = a;
            p.coderB = b;
            for (int category = 0; category < c.categories; ++category) {
                // Each article (section of the continuum) is its own document, so matching
                // advances article by article instead of scanning the whole continuum.
                std::vector<reliability::LabelledSpan> ref, pred;
                for (const reliability::ContinuumUnit &u : c.units)
                    if (u.category == category && (u.coder == a || u.coder == b)) {
                        const int section = int(std::upper_bound(c.sectionBreaks.begin(),
                                                    c.sectionBreaks.end(), u.begin)
                            - c.sectionBreaks.begin());
                        (u.coder == a ? ref : pred)
                            .push_back(reliability::LabelledSpan {section, 0, u.begin, u.end});
                    }
                p.strict.push_back(
                    reliability::scoreSpans(ref, pred, 1, reliability::MatchMode::Strict).micro.f1);
                p.overlap.push_back(
                    reliability::scoreSpans(ref, pred, 1, reliability::MatchMode::Type).micro.f1);
            }
            out.push_back(std::move(p));
        }
    return out;
}

QJsonValue optionalNumber(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

} // namespace

Result<EncodingOptions> encodingFor(const Codebook &codebook, const AnalysisRequest &request)
{
    EncodingOptions encoding;
    if (request.encoding) {
        encoding = *request.encoding;
    } else {
        UnitSelection s;
        s.unit = request.unit;
        s.function = request.function;
        s.item = request.item;
        s.attribute = request.attribute;
        FOURFOLD_TRY_STATUS(applyCodebookLevel(codebook, s, encoding));
    }
    if (isSetUnit(request) && !encoding.distance)
        encoding.distance = reliability::SetDistance::Masi;
    return encoding;
}

Result<AnalysisResult> analyseTable(
    ReliabilityTable table, const EncodingOptions &encoding, const AgreementOptions &options)
{
    // The cells live on as the encoded data: one copy of the unit matrix is kept, not two.
    auto encoded = encodeTableCells(table, encoding);
    if (!encoded)
        return std::unexpected(encoded.error());
    const QString scale =
        encoding.distance ? setDistanceKey(*encoding.distance) : levelKey(encoding.level);
    AgreementReport report = computeAgreement(*encoded, table.coders, scale, options);
    return AnalysisResult {std::move(table), encoding, std::move(*encoded), std::move(report)};
}

Result<LeaveOneOutCosts> leaveOneOutCosts(
    const AnalysisResult &analysis, const DiagnosticsProgress &progress)
{
    auto coders = leaveOneCoderOut(analysis.encoded, analysis.table.coders, progress);
    if (!coders)
        return std::unexpected(coders.error());
    auto articles = leaveOneArticleOut(analysis.encoded, analysis.table, progress);
    if (!articles)
        return std::unexpected(articles.error());
    return LeaveOneOutCosts {std::move(*coders), std::move(*articles)};
}

Result<AgreementRun> AgreementRun::load(const Project &project, const UnitSelection &selection)
{
    AgreementRun run(project, selection);
    auto codings = countedCodings(project, selection);
    if (!codings)
        return std::unexpected(codings.error());
    run.m_codings = std::move(*codings);
    auto book = project.codebook();
    if (!book)
        return std::unexpected(book.error());
    run.m_codebook = std::move(*book);
    return run;
}

UnitSelection AgreementRun::selectionFor(const AnalysisRequest &request) const
{
    UnitSelection s = m_selection;
    s.unit = request.unit;
    s.function = request.function;
    s.item = request.item;
    s.attribute = request.attribute;
    return s;
}

Result<AnalysisResult> AgreementRun::analyse(
    const AnalysisRequest &request, const AgreementOptions &options) const
{
    if (request.unit == UnitKind::Continuum)
        return fail(ErrorCode::InvalidArgument,
            AgreementRunText::tr(
                "The continuum is compared with unitizing alpha, not as a table of units."));
    auto encoding = encodingFor(m_codebook, request);
    if (!encoding)
        return std::unexpected(encoding.error());
    auto table = unitTable(*m_project, m_codings, selectionFor(request));
    if (!table)
        return std::unexpected(table.error());
    // A value of an older codebook version counts as the current version recodes it; one it does
    // not know is missing, so that no analysis fails on an older annotation.
    if (request.unit == UnitKind::Span && request.function)
        table->recodeLabels([&](const QString &v) {
            return m_codebook.countedAttributeValue(*request.function, request.attribute, v);
        });
    else if (request.unit == UnitKind::Article)
        table->recodeLabels(
            [&](const QString &v) { return m_codebook.countedAnswer(request.item, v); });
    if (isSetUnit(request) && !request.setFunctions.empty()) {
        QStringList keep;
        for (FramingFunction f : request.setFunctions)
            keep << functionKey(f);
        restrictSets(*table, keep);
    }
    return analyseTable(std::move(*table), *encoding, options);
}

Result<ContinuumResult> AgreementRun::continuum(std::optional<FramingFunction> function) const
{
    UnitSelection selection = m_selection;
    selection.unit = UnitKind::Continuum;
    selection.function = function;
    auto data = continuumData(m_codings, selection);
    if (!data)
        return std::unexpected(data.error());
    ContinuumResult out;
    out.unitizing = reliability::unitizingAlpha(0, data->length, int(data->coders.size()),
        data->categories, data->units, data->sectionBreaks);
    if (!out.unitizing.inputError.empty())
        return fail(ErrorCode::Internal,
            AgreementRunText::tr("The continuum could not be compared."),
            QString::fromStdString(out.unitizing.inputError));
    if (function)
        out.categories << functionKey(*function);
    else
        for (FramingFunction f : kFramingFunctions)
            out.categories << functionKey(f);
    out.pairs = pairSpanAgreement(*data);
    out.data = std::move(*data);
    return out;
}

Result<SpanMatching> AgreementRun::matching(const DiagnosticsProgress &progress) const
{
    return matchSpans(m_codings, m_selection, progress);
}

Result<std::vector<PeriodAlpha>> AgreementRun::periods(const AnalysisResult &analysis,
    PeriodKind kind, int batchSize, const DiagnosticsProgress &progress) const
{
    // The codings this run read once: a period's first coding is a coder's, never gold's.
    return alphaByPeriod(m_codings, analysis.table, analysis.encoded, kind, batchSize, progress);
}

QJsonObject continuumJson(const ContinuumResult &result)
{
    const QStringList &names = result.categories;
    QJsonObject perFunction;
    for (qsizetype i = 0; i < names.size() && size_t(i) < result.unitizing.perCategory.size(); ++i)
        perFunction.insert(names[i], unitizingJson(result.unitizing.perCategory[size_t(i)]));
    QJsonArray pairs;
    for (const PairSpanAgreement &p : result.pairs) {
        QJsonObject per;
        for (qsizetype i = 0; i < names.size(); ++i)
            per.insert(names[i],
                QJsonObject {{QStringLiteral("strict_f1"), optionalNumber(p.strict[size_t(i)])},
                    {QStringLiteral("overlap_f1"), optionalNumber(p.overlap[size_t(i)])}});
        pairs.append(QJsonObject {
            {QStringLiteral("coders"),
                QJsonArray {result.data.coders[p.coderA], result.data.coders[p.coderB]}},
            {QStringLiteral("per_function"), per}});
    }
    return QJsonObject {{QStringLiteral("unit"), QStringLiteral("continuum")},
        {QStringLiteral("span_agreement"), pairs},
        {QStringLiteral("coders"), QJsonArray::fromStringList(result.data.coders)},
        {QStringLiteral("articles"), QJsonArray::fromStringList(result.data.articles)},
        {QStringLiteral("length"), qint64(result.data.length)},
        {QStringLiteral("unitizing_alpha"),
            QJsonObject {{QStringLiteral("per_function"), perFunction},
                {QStringLiteral("overall"), unitizingJson(result.unitizing.overall)}}}};
}

} // namespace fourfold
