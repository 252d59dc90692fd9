// One agreement run (core/agreement/agreement_run.h): what it reads, how each analysis is encoded,
// and that restricting sets of functions and taking the run's codings change what they should.
// The alpha values themselves are checked against published examples in tests/reliability; here
// they are only compared with each other (agreement of 1 where both coders gave the same values is
// Krippendorff's definition: no observed disagreement).
#include "core/agreement/agreement_run.h"
#include "core/project/annotation_edits.h"
#include "tests/project/double_coded_project.h"

using namespace fourfold;
using namespace fourfold::test;

namespace {

// Every analysis a report asks of a run, with diagnostics and periods.
void everyAnalysis(const Project &project)
{
    // Two coders, so that the continuum (articles every coder coded) is not empty.
    UnitSelection coders;
    coders.coders = QStringList {QStringLiteral("C01"), QStringLiteral("C02")};
    auto run = AgreementRun::load(project, coders);
    REQUIRE(run);
    AgreementOptions options;
    for (FramingFunction f : kFramingFunctions) {
        AnalysisRequest request;
        request.function = f;
        auto analysed = run->analyse(request, options);
        REQUIRE(analysed);
        REQUIRE(leaveOneOutCosts(*analysed));
        REQUIRE(run->periods(*analysed, PeriodKind::Batch, 3));
    }
    for (UnitKind unit : {UnitKind::Paragraph, UnitKind::Sentence, UnitKind::Token}) {
        AnalysisRequest sets;
        sets.unit = unit;
        REQUIRE(run->analyse(sets, options));
    }
    REQUIRE(run->continuum(std::nullopt));
    REQUIRE(run->matching());
}

} // namespace

TEST_CASE("an agreement run reads the same number of statements for 8 and for 40 articles")
{
    DoubleCodedProject small(8), large(40);
    const qint64 atSmall = small.statementsRunBy([&] { everyAnalysis(small.project); });
    const qint64 atLarge = large.statementsRunBy([&] { everyAnalysis(large.project); });
    CHECK(atSmall == atLarge);
    // A handful per read (coders, articles, scope, spans, answers, codebook, segmentations).
    CHECK(atLarge < 40);
}

TEST_CASE("set units keep only the chosen functions and are compared with MASI")
{
    // Both coders mark the first sentence as problem; in the second, one marks cause and the
    // other remedy (tests/project/double_coded_project.h).
    DoubleCodedProject p(6);
    auto run = AgreementRun::load(p.project, {});
    REQUIRE(run);
    AnalysisRequest all;
    auto allFour = run->analyse(all, {});
    REQUIRE(allFour);
    CHECK(allFour->report.scale == QLatin1String("masi"));
    REQUIRE(allFour->report.alpha.value);
    CHECK(*allFour->report.alpha.value < 0.9);

    AnalysisRequest problemOnly;
    problemOnly.setFunctions = {FramingFunction::Problem};
    auto restricted = run->analyse(problemOnly, {});
    REQUIRE(restricted);
    // Every value left is "problem" or the empty set.
    for (const QString &value : restricted->encoded.valueLabels)
        CHECK((value == QLatin1String("problem") || value == QLatin1String("{}")));
    CHECK(restricted->encoded.valueLabels.size() == 2);
    REQUIRE(restricted->report.alpha.value);
    CHECK(*restricted->report.alpha.value == 1.0);
    // The same table as the problem function alone, labelled as sets.
    AnalysisRequest problem;
    problem.function = FramingFunction::Problem;
    auto single = run->analyse(problem, {});
    REQUIRE(single);
    CHECK(single->table.unitIds() == restricted->table.unitIds());
    CHECK(single->report.scale == QLatin1String("nominal"));
}

TEST_CASE("an analysis takes the codebook's level unless the request gives an encoding")
{
    DoubleCodedProject p(6);
    auto run = AgreementRun::load(p.project, {});
    REQUIRE(run);
    const Codebook &book = run->codebook();

    AnalysisRequest item;
    item.unit = UnitKind::Article;
    item.item = QStringLiteral("dominant_function");
    auto fromBook = encodingFor(book, item);
    REQUIRE(fromBook);
    CHECK(fromBook->level == reliability::Level::Nominal);
    CHECK_FALSE(fromBook->distance);

    AnalysisRequest given = item;
    given.encoding = EncodingOptions {reliability::Level::Ordinal, std::nullopt,
        {QStringLiteral("problem"), QStringLiteral("cause")}};
    auto replaced = encodingFor(book, given);
    REQUIRE(replaced);
    CHECK(replaced->level == reliability::Level::Ordinal);
    CHECK(replaced->order.size() == 2);

    AnalysisRequest span;
    span.unit = UnitKind::Span;
    span.function = FramingFunction::Evaluation;
    span.attribute = QStringLiteral("no_such_attribute");
    auto missing = encodingFor(book, span);
    REQUIRE_FALSE(missing);
    CHECK(missing.error().code == ErrorCode::InvalidArgument);
    CHECK(missing.error().message.contains(QLatin1String("no_such_attribute")));

    AnalysisRequest continuum;
    continuum.unit = UnitKind::Continuum;
    auto refused = run->analyse(continuum, {});
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::InvalidArgument);
}

TEST_CASE("the continuum of a run names its functions and scores every pair of coders")
{
    // The continuum holds the articles every selected coder coded: C01 and C02 share every
    // third article.
    DoubleCodedProject p(6);
    UnitSelection twoCoders;
    twoCoders.coders = QStringList {QStringLiteral("C01"), QStringLiteral("C02")};
    auto run = AgreementRun::load(p.project, twoCoders);
    REQUIRE(run);
    auto all = run->continuum(std::nullopt);
    REQUIRE(all);
    CHECK(all->categories
        == QStringList {QStringLiteral("problem"), QStringLiteral("cause"),
            QStringLiteral("evaluation"), QStringLiteral("remedy")});
    CHECK(all->data.articles == QStringList {QStringLiteral("d3"), QStringLiteral("d6")});
    REQUIRE(all->pairs.size() == 1);
    for (const PairSpanAgreement &pair : all->pairs) {
        REQUIRE(pair.strict.size() == 4);
        // Problem spans are the same in every shared article: strict F1 of 1.
        REQUIRE(pair.strict[0]);
        CHECK(*pair.strict[0] == 1.0);
    }
    auto one = run->continuum(FramingFunction::Problem);
    REQUIRE(one);
    CHECK(one->categories == QStringList {QStringLiteral("problem")});
    REQUIRE(one->unitizing.perCategory.size() == 1);
    const QJsonObject json = continuumJson(*one);
    CHECK(json.value(QStringLiteral("unit")).toString() == QLatin1String("continuum"));
    CHECK(json.value(QStringLiteral("span_agreement")).toArray().size() == 1);
    CHECK(json.value(QStringLiteral("length")).toInteger() == one->data.length);
}

TEST_CASE("unitizing alpha of a project does not depend on the order its articles were imported")
{
    // The same three articles and the same codings, imported in two orders. Each article is its
    // own section of the continuum, so gaps at article ends never join (Krippendorff 2004, §11.6,
    // defines the measure on one continuum; sections per article are this program's reading of
    // it for many articles, stated in the README).
    const QStringList lines {
        QStringLiteral("{\"id\":\"o1\",\"title\":\"One\",\"language\":\"en\",\"text\":\"The "
                       "harbour of Wendmoor will close. The levy is to blame for it all.\"}"),
        QStringLiteral("{\"id\":\"o2\",\"title\":\"Two\",\"language\":\"en\",\"text\":\"Fares "
                       "rise again. Nobody asked the riders. The board should listen.\"}"),
        QStringLiteral("{\"id\":\"o3\",\"title\":\"Three\",\"language\":\"en\",\"text\":\"A "
                       "quiet week at the quay.\"}")};
    struct Coding {
        const char *article;
        int coder;
        FramingFunction function;
        TextRange range;
    };
    const std::vector<Coding> codings {{"o1", 0, FramingFunction::Problem, {0, 31}},
        {"o1", 1, FramingFunction::Problem, {4, 31}}, {"o1", 0, FramingFunction::Cause, {32, 50}},
        {"o2", 0, FramingFunction::Problem, {0, 17}}, {"o2", 1, FramingFunction::Problem, {0, 12}},
        {"o2", 1, FramingFunction::Remedy, {38, 60}}, {"o3", 1, FramingFunction::Problem, {2, 12}}};
    auto alphaFor = [&](const QList<int> &order) {
        ProjectFixture f;
        QByteArray jsonl;
        for (int i : order)
            jsonl += (lines[i] + QLatin1Char('\n')).toUtf8();
        f.importJsonl(jsonl);
        const std::array<CoderId, 2> coders {
            f.addCoder(QStringLiteral("C01")), f.addCoder(QStringLiteral("C02"))};
        for (const Coding &c : codings) {
            AddAnnotationEdit edit(f.articleId(QLatin1String(c.article)), coders[size_t(c.coder)],
                AnnotationContent {c.function, c.range, {}, {}, {}});
            REQUIRE(f.project.apply(edit));
        }
        for (const char *a : {"o1", "o2", "o3"})
            for (CoderId c : coders)
                markDone(f.project, f.articleId(QLatin1String(a)), c);
        auto run = AgreementRun::load(f.project, {});
        REQUIRE(run);
        auto continuum = run->continuum(std::nullopt);
        REQUIRE(continuum);
        CHECK(continuum->data.sectionBreaks.size() == 2);
        REQUIRE(continuum->unitizing.overall.value);
        return *continuum->unitizing.overall.value;
    };
    const double forward = alphaFor({0, 1, 2});
    CHECK_THAT(alphaFor({2, 0, 1}), Catch::Matchers::WithinAbs(forward, 1e-12));
    CHECK_THAT(alphaFor({1, 2, 0}), Catch::Matchers::WithinAbs(forward, 1e-12));
}

TEST_CASE("the text of a report prints counts of a million values as whole numbers")
{
    // 600,000 units × 2 coders, every cell filled: n = 1,200,000 pairable values (Krippendorff
    // 2011, §C: n counts the values in units coded by at least two coders). QString::arg of a
    // double would print 1.2e+06.
    ReliabilityTable table;
    table.coders = QStringList {QStringLiteral("A"), QStringLiteral("B")};
    const qint32 yes = table.labelIndex(u"yes");
    const qint32 no = table.labelIndex(u"no");
    std::vector<qint32> column(600000);
    for (size_t u = 0; u < column.size(); ++u)
        column[u] = u % 3 == 0 ? no : yes;
    std::vector<qint32> cells;
    cells.reserve(2 * column.size());
    for (size_t u = 0; u < column.size(); ++u) {
        cells.push_back(column[u]);
        cells.push_back(u % 5 == 0 ? no : column[u]);
    }
    table.appendNumberedUnits(QStringLiteral("a"), QStringLiteral("#u"), cells);
    auto analysed = analyseTable(std::move(table), EncodingOptions {}, AgreementOptions {});
    REQUIRE(analysed);
    const QString text = agreementText(analysed->report);
    CHECK(text.contains(QStringLiteral("pairable units 600000; pairable values 1200000")));
    CHECK(text.contains(QStringLiteral("Sample size   1200000 pairable values")));
}
