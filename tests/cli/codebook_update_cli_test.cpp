// fourfold-cli codebook --update refuses a file that is not a codebook (wrong types, unknown
// keys, a fifth function, control characters) naming file, line and key, and leaves the
// project as it was; it refuses to drop an attribute value that annotations carry unless the
// file recodes it; and agree counts a value of an older version as the current one recodes it.

#include "core/project/article_status_edit.h"
#include "core/project/testing/project_database.h"
#include "core/store/codebook_table.h"
#include "tests/project/study_fixture.h"
#include "tests/support/cli_run.h"
#include "tests/support/db_dump.h"

#include <QFile>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>

#include <functional>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

// The current codebook as `codebook --show` prints it, edited by `edit`, written to `name`.
template<typename Edit>
QString editedCodebook(ProjectFixture &f, const QString &name, Edit edit)
{
    const CliRun shown = cli({QStringLiteral("codebook"), f.project.path(),
        QStringLiteral("--show"), QStringLiteral("1")});
    REQUIRE(shown.exitCode == 0);
    QJsonObject book = QJsonDocument::fromJson(shown.out.toUtf8()).object();
    REQUIRE(book.contains(QStringLiteral("functions")));
    edit(book);
    return writeFile(f.dir, name, QJsonDocument(book).toJson(QJsonDocument::Indented));
}

// The function object with `key` in a codebook's JSON form, changed by `change`.
template<typename Change>
void changeFunction(QJsonObject &book, const QString &key, Change change)
{
    QJsonArray functions = book.value(QStringLiteral("functions")).toArray();
    for (qsizetype i = 0; i < functions.size(); ++i) {
        QJsonObject f = functions[i].toObject();
        if (f.value(QStringLiteral("key")).toString() == key) {
            change(f);
            functions[i] = f;
        }
    }
    book.insert(QStringLiteral("functions"), functions);
}

// The polarity attribute of evaluation with `values` and, if not empty, `recode`.
void setPolarity(QJsonObject &book, const QStringList &values, const QJsonObject &recode)
{
    changeFunction(book, QStringLiteral("evaluation"), [&](QJsonObject &f) {
        QJsonArray attributes = f.value(QStringLiteral("attributes")).toArray();
        QJsonObject polarity = attributes[0].toObject();
        REQUIRE(polarity.value(QStringLiteral("key")).toString() == QStringLiteral("polarity"));
        polarity.insert(QStringLiteral("values"), QJsonArray::fromStringList(values));
        if (!recode.isEmpty())
            polarity.insert(QStringLiteral("recode"), recode);
        attributes[0] = polarity;
        f.insert(QStringLiteral("attributes"), attributes);
    });
}

// The line (from 1) of the first occurrence of `needle` in the file at `path`.
qint64 lineIn(const QString &path, const QByteArray &needle)
{
    QFile file(path);
    REQUIRE(file.open(QIODevice::ReadOnly));
    const QByteArray text = file.readAll();
    const qsizetype at = text.indexOf(needle);
    REQUIRE(at >= 0);
    return text.left(at).count('\n') + 1;
}

// Ten sentences; C01 and C02 each mark sentences 1–4 as evaluation with a polarity, and are done:
// s1 neutral/negative, s2 positive/positive, s3 negative/neutral, s4 positive/negative.
struct PolarityFixture : TenFixture {
    PolarityFixture()
    {
        const CoderId c1 = addCoder(QStringLiteral("C01"));
        const CoderId c2 = addCoder(QStringLiteral("C02"));
        const char *first[] = {"neutral", "positive", "negative", "positive"};
        const char *second[] = {"negative", "positive", "neutral", "negative"};
        for (int s = 0; s < 4; ++s) {
            for (auto [coder, value] : {std::pair {c1, first[s]}, std::pair {c2, second[s]}}) {
                AddAnnotationEdit e(article, coder,
                    AnnotationContent {FramingFunction::Evaluation, sentences[size_t(s)],
                        QJsonObject {{QStringLiteral("polarity"), QString::fromLatin1(value)}}, {},
                        {}},
                    Phase::Production);
                REQUIRE(project.apply(e));
            }
        }
        for (CoderId c : {c1, c2}) {
            SetArticleStatusEdit done(article, c, QStringLiteral("done"));
            REQUIRE(project.apply(done));
        }
    }

    int versions()
    {
        const CliRun run =
            cli({QStringLiteral("codebook"), project.path(), QStringLiteral("--json")});
        REQUIRE(run.exitCode == 0);
        return int(cliJson(run).value(QStringLiteral("versions")).toArray().size());
    }

    // alpha of the polarity of evaluation spans, through the project.
    QJsonObject agreePolarity()
    {
        const CliRun run = cli({QStringLiteral("agree"), project.path(), QStringLiteral("--unit"),
            QStringLiteral("span"), QStringLiteral("--function"), QStringLiteral("evaluation"),
            QStringLiteral("--attribute"), QStringLiteral("polarity"), QStringLiteral("--json")});
        INFO(run.err.toStdString());
        REQUIRE(run.exitCode == 0);
        return cliJson(run);
    }

    // alpha of a raw matrix (agree --data), ordinal in the order negative < positive: the oracle.
    QJsonObject agreeMatrix(const QByteArray &csv)
    {
        const CliRun run = cli({QStringLiteral("agree"), QStringLiteral("--data"),
            writeFile(dir, QStringLiteral("m.csv"), csv), QStringLiteral("--level"),
            QStringLiteral("ordinal"), QStringLiteral("--order"),
            QStringLiteral("negative,positive"), QStringLiteral("--json")});
        INFO(run.err.toStdString());
        REQUIRE(run.exitCode == 0);
        return cliJson(run);
    }
};

double alphaOf(const QJsonObject &o)
{
    return o.value(QStringLiteral("alpha")).toObject().value(QStringLiteral("value")).toDouble();
}

} // namespace

TEST_CASE("Issue 20 item 3: codebook --update refuses wrong types and unknown keys and keeps "
          "the project")
{
    PolarityFixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project));
    struct Case {
        const char *what;
        std::function<void(QJsonObject &)> edit;
        QByteArray lineOf; // the error names the line of this text in the written file
        const char *message;
    };
    const Case cases[] = {
        {"a number for a definition",
            [](QJsonObject &b) {
                changeFunction(b, QStringLiteral("problem"),
                    [](QJsonObject &fn) { fn.insert(QStringLiteral("definition"), 5); });
            },
            "\"definition\": 5", "\"functions[0].definition\" must be a string, not a number"},
        {"a string for the rules",
            [](QJsonObject &b) {
                changeFunction(b, QStringLiteral("cause"), [](QJsonObject &fn) {
                    fn.insert(QStringLiteral("rules"), QStringLiteral("Blame someone."));
                });
            },
            "\"Blame someone.\"", "\"functions[1].rules\" must be an array, not a string"},
        {"an object for the items",
            [](QJsonObject &b) {
                b.insert(QStringLiteral("items"),
                    QJsonObject {{QStringLiteral("dominant_function"), QStringLiteral("x")}});
            },
            "\"items\"", "\"items\" must be an array, not an object"},
        {"a fifth function",
            [](QJsonObject &b) {
                QJsonArray functions = b.value(QStringLiteral("functions")).toArray();
                functions.append(QJsonObject {{QStringLiteral("key"), QStringLiteral("frame")},
                    {QStringLiteral("definition"), QStringLiteral("Another one.")}});
                b.insert(QStringLiteral("functions"), functions);
            },
            "\"frame\"", "\"functions[4].key\" is \"frame\", not one of the four functions"},
        {"a control character in a definition",
            [](QJsonObject &b) {
                changeFunction(b, QStringLiteral("remedy"), [](QJsonObject &fn) {
                    fn.insert(QStringLiteral("definition"), QStringLiteral("Act \u001B[31mnow"));
                });
            },
            "Act \\u001", "\"functions[3].definition\" contains the control character U+001B"},
        {"a NUL in a rule",
            [](QJsonObject &b) {
                changeFunction(b, QStringLiteral("problem"), [](QJsonObject &fn) {
                    fn.insert(QStringLiteral("rules"),
                        QJsonArray {QString::fromUtf16(u"Code\u0000 this", 10)});
                });
            },
            "Code\\u0000", "\"functions[0].rules[0]\" contains the control character U+0000"},
        {"an unknown key",
            [](QJsonObject &b) {
                changeFunction(b, QStringLiteral("evaluation"), [](QJsonObject &fn) {
                    fn.insert(QStringLiteral("decision_rules"), QJsonArray {});
                });
            },
            "\"decision_rules\"", "unknown key \"functions[2].decision_rules\""},
    };
    for (const Case &c : cases) {
        INFO(c.what);
        const QString file = editedCodebook(f, QStringLiteral("bad.json"), c.edit);
        const CliRun run = cli({QStringLiteral("codebook"), f.project.path(),
            QStringLiteral("--update"), file, QStringLiteral("--note"), QStringLiteral("bad")});
        INFO(run.err.toStdString());
        CHECK(run.exitCode == 1);
        CHECK(run.err.contains(QStringLiteral("%1:%2: ").arg(file).arg(lineIn(file, c.lineOf))));
        CHECK(run.err.contains(QString::fromUtf8(c.message)));
        // The escape sequence of the control character never reaches the terminal raw.
        CHECK_FALSE(run.err.contains(QChar(0x1B)));
        CHECK(f.versions() == 1);
    }
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}

TEST_CASE("Issue 20 item 3: dropping a polarity value that annotations carry needs a recode")
{
    PolarityFixture f;
    const QString before = dumpDatabase(databaseForTesting(f.project));

    // neutral dropped without saying what it counts as: refused, nothing stored.
    const QString dropped = editedCodebook(f, QStringLiteral("dropped.json"), [](QJsonObject &b) {
        setPolarity(b, {QStringLiteral("negative"), QStringLiteral("positive")}, {});
    });
    CliRun run = cli({QStringLiteral("codebook"), f.project.path(), QStringLiteral("--update"),
        dropped, QStringLiteral("--note"), QStringLiteral("No neutral")});
    CHECK(run.exitCode == 1);
    CHECK(run.err.contains(
        QStringLiteral("2 span(s) of evaluation carry the value \"neutral\" of the attribute "
                       "\"polarity\", which the new version neither lists nor recodes")));
    CHECK(run.err.contains(QStringLiteral("\"recode\": {\"neutral\": \"…\"}")));
    CHECK(f.versions() == 1);
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);

    // A recoding that leaves another value in use out is refused as well.
    const QString partial = editedCodebook(f, QStringLiteral("partial.json"), [](QJsonObject &b) {
        setPolarity(b, {QStringLiteral("negative"), QStringLiteral("neutral")},
            QJsonObject {{QStringLiteral("unsure"), QStringLiteral("neutral")}});
    });
    run = cli({QStringLiteral("codebook"), f.project.path(), QStringLiteral("--update"), partial,
        QStringLiteral("--note"), QStringLiteral("No positive")});
    CHECK(run.exitCode == 1);
    CHECK(run.err.contains(QStringLiteral("3 span(s) of evaluation carry the value \"positive\"")));
    CHECK(f.versions() == 1);

    // With "recode": {"neutral": "negative"} the version is stored, recode and all.
    const QString recoded = editedCodebook(f, QStringLiteral("recoded.json"), [](QJsonObject &b) {
        setPolarity(b, {QStringLiteral("negative"), QStringLiteral("positive")},
            QJsonObject {{QStringLiteral("neutral"), QStringLiteral("negative")}});
    });
    run = cli({QStringLiteral("codebook"), f.project.path(), QStringLiteral("--update"), recoded,
        QStringLiteral("--note"), QStringLiteral("Neutral merged into negative")});
    INFO(run.err.toStdString());
    REQUIRE(run.exitCode == 0);
    CHECK(run.out.contains(
        QStringLiteral("~ evaluation.attributes.polarity.recode: «» → «neutral → negative»")));
    CHECK(f.versions() == 2);
    run = cli({QStringLiteral("codebook"), f.project.path(), QStringLiteral("--show"),
        QStringLiteral("2")});
    REQUIRE(run.exitCode == 0);
    const QJsonObject shown = QJsonDocument::fromJson(run.out.toUtf8()).object();
    const QJsonObject polarity = shown.value(QStringLiteral("functions"))
                                     .toArray()[2]
                                     .toObject()
                                     .value(QStringLiteral("attributes"))
                                     .toArray()[0]
                                     .toObject();
    CHECK(polarity.value(QStringLiteral("recode")).toObject()
        == QJsonObject {{QStringLiteral("neutral"), QStringLiteral("negative")}});
    // The annotations keep the value they were coded with.
    auto all = f.project.allAnnotations();
    REQUIRE(all);
    CHECK(std::ranges::count_if(*all, [](const Annotation &a) {
        return a.content.attributes.value(QStringLiteral("polarity")).toString()
            == QStringLiteral("neutral");
    }) == 2);

    // agree counts neutral as negative: the same alpha as the recoded matrix.
    const QJsonObject project = f.agreePolarity();
    const QJsonObject matrix = f.agreeMatrix("unit,C01,C02\n"
                                             "s1,negative,negative\n"
                                             "s2,positive,positive\n"
                                             "s3,negative,negative\n"
                                             "s4,positive,negative\n");
    CHECK(project.value(QStringLiteral("pairable_values")).toInt() == 8);
    CHECK(alphaOf(project) == Approx(alphaOf(matrix)).margin(1e-12));
    CHECK(alphaOf(project) < 1.0);
}

TEST_CASE("Issue 20 item 3: agree counts a value no version lists or recodes as missing")
{
    // A project whose codebook dropped neutral before updates were checked (stored directly):
    // agree --attribute polarity used to fail on it.
    PolarityFixture f;
    auto book = f.project.codebook();
    REQUIRE(book);
    auto &polarity = book->functions[size_t(FramingFunction::Evaluation)].attributes.front();
    polarity.values = QStringList {QStringLiteral("negative"), QStringLiteral("positive")};
    REQUIRE(store::insertCodebookVersion(
        databaseForTesting(f.project), *book, QStringLiteral("old rules")));

    const QJsonObject project = f.agreePolarity();
    const QJsonObject matrix = f.agreeMatrix("unit,C01,C02\n"
                                             "s1,,negative\n"
                                             "s2,positive,positive\n"
                                             "s3,negative,\n"
                                             "s4,positive,negative\n");
    CHECK(project.value(QStringLiteral("pairable_values")).toInt() == 4);
    CHECK(alphaOf(project) == Approx(alphaOf(matrix)).margin(1e-12));
}
