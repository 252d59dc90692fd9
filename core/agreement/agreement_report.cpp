#include "core/agreement/agreement_report.h"

#include "core/reliability/sample_size.h"

#include <QCoreApplication>
#include <QJsonArray>

#include <cmath>

namespace fourfold {

using namespace reliability;

namespace {

// The sentences of this file, under a context that lupdate collects.
struct AgreementReportText {
    Q_DECLARE_TR_FUNCTIONS(AgreementReportText)
};

QJsonValue number(const std::optional<double> &v)
{
    return v ? QJsonValue(*v) : QJsonValue(QJsonValue::Null);
}

// {"value": v} or {"value": null, "reason": "..."} plus any extra fields.
QJsonObject valueObject(const std::optional<double> &value, const UndefinedReason &reason)
{
    QJsonObject o {{QStringLiteral("value"), number(value)}};
    if (!value)
        o.insert(QStringLiteral("reason"), QString::fromStdString(reason));
    return o;
}

// D_o or D_e: four decimals, or four significant digits for very large data values.
QString disagreementText(double d)
{
    if (!std::isfinite(d))
        return AgreementReportText::tr("beyond a double");
    return std::abs(d) < 1e6 ? QString::number(d, 'f', 4) : QString::number(d, 'g', 4);
}

QJsonObject kappaJson(const KappaResult &k)
{
    QJsonObject o = valueObject(k.value, k.reason);
    o.insert(QStringLiteral("se"), number(k.standardError));
    o.insert(QStringLiteral("ci95"),
        k.ciLow && k.ciHigh ? QJsonValue(QJsonArray {*k.ciLow, *k.ciHigh})
                            : QJsonValue(QJsonValue::Null));
    o.insert(QStringLiteral("se0"), number(k.nullStandardError));
    o.insert(QStringLiteral("observed_agreement"), k.observedAgreement);
    o.insert(QStringLiteral("chance_agreement"), k.chanceAgreement);
    o.insert(QStringLiteral("kappa_max"), number(k.kappaMax));
    o.insert(QStringLiteral("weights"), QString::fromLatin1(kappaWeightsKey(k.weights)));
    return o;
}

QJsonObject bootstrapJson(const BootstrapResult &b)
{
    QJsonObject q;
    for (const auto &[alphaMin, share] : b.qBelow)
        q.insert(QString::number(alphaMin, 'g', 6), share);
    QJsonObject o {{QStringLiteral("method"), QString::fromLatin1(bootstrapMethodName(b.method))},
        {QStringLiteral("replicates"), b.replicates},
        {QStringLiteral("seed"), QString::number(b.seed)},
        {QStringLiteral("ci95"),
            b.ciLow && b.ciHigh ? QJsonValue(QJsonArray {*b.ciLow, *b.ciHigh})
                                : QJsonValue(QJsonValue::Null)},
        {QStringLiteral("q_below"), q}};
    if (!b.reason.empty())
        o.insert(QStringLiteral("reason"), QString::fromStdString(b.reason));
    return o;
}

// Inserts key: value, or key: null and key_reason: reason.
void insertScalar(QJsonObject &o, const QString &key, const SimpleAgreement &a)
{
    o.insert(key, number(a.value));
    if (!a.value)
        o.insert(key + QStringLiteral("_reason"), QString::fromStdString(a.reason));
}

QString fixed(const std::optional<double> &v, int decimals = 3)
{
    return v ? QString::number(*v, 'f', decimals) : AgreementReportText::tr("undefined");
}

} // namespace

AlphaBand alphaBand(const std::optional<double> &alpha)
{
    if (!alpha)
        return AlphaBand::Undefined;
    if (*alpha >= kAlphaReliable)
        return AlphaBand::Reliable;
    return *alpha >= kAlphaTentative ? AlphaBand::Tentative : AlphaBand::Unreliable;
}

QString alphaVerdict(const std::optional<double> &alpha)
{
    switch (alphaBand(alpha)) {
    case AlphaBand::Undefined:
        return AgreementReportText::tr("undefined");
    case AlphaBand::Reliable:
        return AgreementReportText::tr("reliable (≥ 0.800)");
    case AlphaBand::Tentative:
        return AgreementReportText::tr("tentative conclusions only (0.667–0.800)");
    case AlphaBand::Unreliable:
        break;
    }
    return AgreementReportText::tr("unreliable (< 0.667)");
}

AgreementReport computeAgreement(const EncodedData &encoded, const QStringList &coders,
    const QString &scale, const AgreementOptions &options)
{
    const ReliabilityData &data = encoded.data;
    AgreementReport r;
    r.coders = coders;
    r.units = data.units;
    r.scale = scale;
    r.valueLabels = encoded.valueLabels;
    r.alphaMin = options.alphaMin;
    r.complete =
        std::none_of(data.cells.begin(), data.cells.end(), [](int v) { return v == kMissing; });
    r.alpha = krippendorffAlpha(data, encoded.metric);
    if (options.bootstrapReplicates > 0) {
        BootstrapOptions b;
        b.replicates = options.bootstrapReplicates;
        b.seed = options.seed;
        b.threads = options.threads;
        b.method = BootstrapMethod::PairResampling;
        r.pairBootstrap = bootstrapAlpha(data, encoded.metric, b);
        b.method = BootstrapMethod::UnitResampling;
        r.unitBootstrap = bootstrapAlpha(data, encoded.metric, b);
    }
    r.percentAgreement = percentAgreement(data);
    // Every pair's table, counted once, for Light's kappa, two coders' figures and the pairs.
    const std::vector<ContingencyTable> tables = pairContingencyTables(data);
    r.lightKappa = lightKappa(tables, data.coders);
    if (r.complete && data.coders == 2) {
        const ContingencyTable &table = tables.front();
        r.cohenKappa = cohenKappa(table, options.kappaWeights);
        r.scottPi = scottPi(table);
        r.bennettS = bennettS(table);
    }
    if (r.complete)
        r.fleissKappa = fleissKappa(data);
    std::size_t pair = 0;
    for (int a = 0; a < data.coders; ++a)
        for (int b = a + 1; b < data.coders; ++b, ++pair) {
            PairAgreement p;
            p.coderA = a;
            p.coderB = b;
            const ContingencyTable &table = tables[pair];
            p.units = int(table.total());
            p.percentAgreement = percentAgreement(table);
            p.cohenKappa = cohenKappa(table, options.kappaWeights);
            r.pairs.push_back(p);
        }
    // Sample-size advice for the rarest value among the pairable values (Krippendorff 2004,
    // §11.4); for set-valued data the "values" are whole sets, so it is left out there.
    if (encoded.metric.custom.empty() && r.alpha.pairableValues > 0) {
        double rarest = 1.0;
        for (double m : r.alpha.coincidences.marginals)
            if (m > 0)
                rarest = std::min(rarest, m / r.alpha.pairableValues);
        if (rarest < 1.0) {
            r.rarestProportion = rarest;
            r.minimumValues =
                minimumReliabilityValues(options.alphaMin, options.significance, rarest);
        }
    }
    return r;
}

QJsonObject agreementJson(const AgreementReport &r)
{
    QJsonObject alpha = valueObject(r.alpha.value, r.alpha.reason);
    alpha.insert(QStringLiteral("level"), r.scale);
    // In the data's own units; null where that is beyond a double (values near 1e154 and up).
    const auto finite = [](double d) {
        return std::isfinite(d) ? QJsonValue(d) : QJsonValue(QJsonValue::Null);
    };
    alpha.insert(QStringLiteral("observed_disagreement"), finite(r.alpha.observedUnscaled()));
    alpha.insert(QStringLiteral("expected_disagreement"), finite(r.alpha.expectedUnscaled()));
    alpha.insert(QStringLiteral("verdict"), alphaVerdict(r.alpha.value));

    QJsonObject o {{QStringLiteral("coders"), QJsonArray::fromStringList(r.coders)},
        {QStringLiteral("units"), r.units},
        {QStringLiteral("values"), QJsonArray::fromStringList(r.valueLabels)},
        {QStringLiteral("complete"), r.complete},
        {QStringLiteral("pairable_units"), r.alpha.pairableUnits},
        {QStringLiteral("pairable_values"), r.alpha.pairableValues},
        {QStringLiteral("alpha"), alpha}};
    if (r.pairBootstrap)
        o.insert(QStringLiteral("bootstrap"), bootstrapJson(*r.pairBootstrap));
    if (r.unitBootstrap)
        o.insert(QStringLiteral("bootstrap_units"), bootstrapJson(*r.unitBootstrap));
    insertScalar(o, QStringLiteral("percent_agreement"), r.percentAgreement);
    if (r.cohenKappa)
        o.insert(QStringLiteral("cohen_kappa"), kappaJson(*r.cohenKappa));
    if (r.scottPi)
        insertScalar(o, QStringLiteral("scott_pi"), *r.scottPi);
    if (r.bennettS)
        insertScalar(o, QStringLiteral("bennett_s"), *r.bennettS);
    if (r.fleissKappa) {
        QJsonObject f = valueObject(r.fleissKappa->value, r.fleissKappa->reason);
        f.insert(QStringLiteral("se0"), number(r.fleissKappa->nullStandardError));
        QJsonObject perValue;
        for (size_t i = 0;
             i < r.fleissKappa->perCategory.size() && i < size_t(r.valueLabels.size()); ++i)
            perValue.insert(r.valueLabels[qsizetype(i)], number(r.fleissKappa->perCategory[i]));
        f.insert(QStringLiteral("per_value"), perValue);
        o.insert(QStringLiteral("fleiss_kappa"), f);
    }
    insertScalar(o, QStringLiteral("light_kappa"), r.lightKappa);
    QJsonArray pairs;
    for (const PairAgreement &p : r.pairs) {
        QJsonObject po {{QStringLiteral("coders"),
                            QJsonArray {r.coders.value(p.coderA), r.coders.value(p.coderB)}},
            {QStringLiteral("units"), p.units},
            {QStringLiteral("cohen_kappa"), kappaJson(p.cohenKappa)}};
        insertScalar(po, QStringLiteral("percent_agreement"), p.percentAgreement);
        pairs.append(po);
    }
    o.insert(QStringLiteral("pairs"), pairs);
    if (r.minimumValues)
        o.insert(QStringLiteral("sample_size"),
            QJsonObject {{QStringLiteral("alpha_min"), r.alphaMin},
                {QStringLiteral("significance"), 0.05},
                {QStringLiteral("rarest_proportion"), number(r.rarestProportion)},
                {QStringLiteral("minimum_values"), *r.minimumValues},
                {QStringLiteral("pairable_values"), r.alpha.pairableValues}});
    return o;
}

QString agreementText(const AgreementReport &r)
{
    QStringList lines;
    lines << AgreementReportText::tr("Coders        %1 (%2)")
                 .arg(r.coders.size())
                 .arg(r.coders.join(QStringLiteral(", ")));
    lines << AgreementReportText::tr("Units         %1; pairable units %2; pairable values %3")
                 .arg(r.units)
                 .arg(r.alpha.pairableUnits)
                 .arg(r.alpha.pairableValues, 0, 'f', 0);
    QString alphaLine =
        AgreementReportText::tr("Alpha (%1)  %2").arg(r.scale, fixed(r.alpha.value));
    if (!r.alpha.value)
        alphaLine += QStringLiteral(" — ") + QString::fromStdString(r.alpha.reason);
    else
        alphaLine += QStringLiteral("   D_o %1, D_e %2   %3")
                         .arg(disagreementText(r.alpha.observedUnscaled()))
                         .arg(disagreementText(r.alpha.expectedUnscaled()))
                         .arg(alphaVerdict(r.alpha.value));
    lines << alphaLine;
    // Units resampled first: with more than two coders the pair interval of Hayes & Krippendorff
    // (2007) is narrower than its nominal 95% (see the README's "The figures and their sources").
    for (const auto &b : {r.unitBootstrap, r.pairBootstrap}) {
        if (!b)
            continue;
        QStringList q;
        for (const auto &[alphaMin, share] : b->qBelow)
            q << QStringLiteral("q(α<%1) %2").arg(alphaMin, 0, 'g', 3).arg(share, 0, 'f', 3);
        lines << AgreementReportText::tr("  95% CI      [%1, %2]  %3, %4 replicates, seed %5")
                     .arg(fixed(b->ciLow), fixed(b->ciHigh),
                         QString::fromLatin1(bootstrapMethodName(b->method)))
                     .arg(b->replicates)
                     .arg(b->seed);
        lines << QStringLiteral("              ") + q.join(QStringLiteral("  "));
    }
    lines << AgreementReportText::tr("Percent agreement  %1")
                 .arg(r.percentAgreement.value
                         ? QString::number(*r.percentAgreement.value * 100.0, 'f', 1)
                             + QLatin1Char('%')
                         : AgreementReportText::tr("undefined"));
    if (r.cohenKappa) {
        const KappaResult &k = *r.cohenKappa;
        const QString weighting = k.weights == KappaWeights::Linear
            ? AgreementReportText::tr(", linear weights")
            : k.weights == KappaWeights::Quadratic ? AgreementReportText::tr(", quadratic weights")
                                                   : QString();
        lines << AgreementReportText::tr("Cohen's kappa %1  (SE %2, 95% CI [%3, %4]%5)")
                     .arg(fixed(k.value), fixed(k.standardError), fixed(k.ciLow), fixed(k.ciHigh),
                         weighting);
    }
    if (r.scottPi)
        lines << AgreementReportText::tr("Scott's pi    %1").arg(fixed(r.scottPi->value));
    if (r.bennettS)
        lines << AgreementReportText::tr("Bennett's S   %1").arg(fixed(r.bennettS->value));
    if (r.fleissKappa)
        lines << AgreementReportText::tr("Fleiss' kappa %1").arg(fixed(r.fleissKappa->value));
    if (r.coders.size() > 2)
        lines << AgreementReportText::tr("Light's kappa %1").arg(fixed(r.lightKappa.value));
    if (r.pairs.size() > 1) {
        lines << AgreementReportText::tr("Pairs");
        for (const PairAgreement &p : r.pairs)
            lines << AgreementReportText::tr("  %1 × %2  units %3  agreement %4  kappa %5")
                         .arg(r.coders.value(p.coderA), r.coders.value(p.coderB))
                         .arg(p.units)
                         .arg(p.percentAgreement.value
                                 ? QString::number(*p.percentAgreement.value * 100.0, 'f', 1)
                                     + QLatin1Char('%')
                                 : AgreementReportText::tr("undefined"))
                         .arg(fixed(p.cohenKappa.value));
    }
    if (r.minimumValues) {
        QString line = AgreementReportText::tr(
            "Sample size   %1 pairable values; Krippendorff's minimum for alpha ≥ %2 "
            "at p = 0.05 with the rarest value at %3%: %4")
                           .arg(r.alpha.pairableValues, 0, 'f', 0)
                           .arg(r.alphaMin, 0, 'f', 3)
                           .arg(*r.rarestProportion * 100.0, 0, 'f', 1)
                           .arg(*r.minimumValues);
        if (r.alpha.pairableValues < *r.minimumValues)
            line += AgreementReportText::tr(" — the sample is too small");
        lines << line;
    }
    return lines.join(QLatin1Char('\n'));
}

QJsonObject unitizingJson(const reliability::UnitizingCategoryResult &result)
{
    QJsonObject o {{QStringLiteral("value"),
                       result.value ? QJsonValue(*result.value) : QJsonValue(QJsonValue::Null)},
        {QStringLiteral("observed_disagreement"), result.observedDisagreement},
        {QStringLiteral("expected_disagreement"), result.expectedDisagreement},
        {QStringLiteral("verdict"), alphaVerdict(result.value)}};
    if (!result.value)
        o.insert(QStringLiteral("reason"), QString::fromStdString(result.reason));
    return o;
}

} // namespace fourfold
