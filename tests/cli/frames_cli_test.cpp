// fourfold-cli frames: a matrix file (--data), a project's layers, --out, --compare and the strict
// reader's errors.
#include "tests/support/cli_run.h"

#include <QDir>
#include <QFile>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QMap>
#include <QSet>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

#include <random>

using namespace fourfold;
using namespace fourfold::test;

namespace {

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

void writeFile(const QString &path, const QByteArray &bytes)
{
    QFile file(path);
    REQUIRE(file.open(QIODevice::WriteOnly));
    file.write(bytes);
}

// 120 invented articles from 3 element profiles over 9 elements (3 each; 0.85 inside, 0.05
// outside), interleaved; `truth` receives each article's profile.
QByteArray plantedMatrix(std::vector<int> &truth)
{
    std::mt19937_64 generator(17);
    std::uniform_real_distribution<double> uniform(0.0, 1.0);
    QByteArray csv = "article";
    for (int e = 0; e < 9; ++e)
        csv += ",e" + QByteArray::number(e);
    csv += '\n';
    for (int a = 0; a < 120; ++a) {
        truth.push_back(a % 3);
        csv += "a" + QByteArray::number(a);
        for (int e = 0; e < 9; ++e)
            csv += uniform(generator) < (e / 3 == a % 3 ? 0.85 : 0.05) ? ",1" : ",0";
        csv += '\n';
    }
    return csv;
}

// The element indicators of the sample project's codings.jsonl for `coders` (one coder, or all
// three for the consensus: an element counts when at least half of the article's coders coded
// it), as a --data matrix in the articles' file order. Built here from the source file, apart
// from the program's own reading of the project. Polarity and explicitness are the default
// codebook's closed lists.
// `shares` (if given) receives each article's share of its coders who coded each variable.
QByteArray indicatorsFromSampleFile(
    const QStringList &coders, QMap<QString, QList<double>> *shares = nullptr)
{
    // The element variables by the rule of README "Frames", read from the codebook file the
    // sample project uses: each function, then each value of its closed-list attributes.
    QStringList variables;
    QFile codebook(QStringLiteral(FOURFOLD_SOURCE_DIR "/resources/codebook/default_codebook.json"));
    REQUIRE(codebook.open(QIODevice::ReadOnly));
    for (const QJsonValue &function :
        QJsonDocument::fromJson(codebook.readAll()).object().value("functions").toArray()) {
        const QString key = function.toObject().value("key").toString();
        variables << key;
        for (const QJsonValue &attribute : function.toObject().value("attributes").toArray())
            if (attribute.toObject().value("type").toString() == "choice")
                for (const QJsonValue &value : attribute.toObject().value("values").toArray())
                    variables << key + ":" + attribute.toObject().value("key").toString() + "="
                            + value.toString();
    }
    REQUIRE(variables.size() > 4);
    QStringList articleOrder;
    QFile articles(QStringLiteral(FOURFOLD_SAMPLE_DIR "/articles.jsonl"));
    REQUIRE(articles.open(QIODevice::ReadOnly));
    for (const QByteArray &line : articles.readAll().split('\n'))
        if (!line.trimmed().isEmpty())
            articleOrder << QJsonDocument::fromJson(line).object().value("id").toString();
    // article -> coder -> elements present
    QMap<QString, QMap<QString, QSet<QString>>> present;
    QFile codings(QStringLiteral(FOURFOLD_SAMPLE_DIR "/codings.jsonl"));
    REQUIRE(codings.open(QIODevice::ReadOnly));
    for (const QByteArray &line : codings.readAll().split('\n')) {
        if (line.trimmed().isEmpty())
            continue;
        const QJsonObject o = QJsonDocument::fromJson(line).object();
        const QString coder = o.value("coder").toString();
        if (!coders.contains(coder) || !o.contains("function"))
            continue;
        QSet<QString> &set = present[o.value("article").toString()][coder];
        const QString f = o.value("function").toString();
        set.insert(f);
        const QJsonObject attributes = o.value("attributes").toObject();
        for (auto it = attributes.begin(); it != attributes.end(); ++it)
            set.insert(f + ":" + it.key() + "=" + it.value().toString());
    }
    QByteArray csv = "article," + variables.join(',').toUtf8() + '\n';
    for (const QString &article : articleOrder) {
        if (!present.contains(article))
            continue;
        const auto &byCoder = present[article];
        csv += article.toUtf8();
        for (const QString &v : variables) {
            int count = 0;
            for (const QSet<QString> &set : byCoder)
                count += set.contains(v) ? 1 : 0;
            csv += 2 * count >= int(byCoder.size()) && count > 0 ? ",1" : ",0";
            if (shares)
                (*shares)[article] << double(count) / double(byCoder.size());
        }
        csv += '\n';
    }
    return csv;
}

} // namespace

TEST_CASE("frames --data recovers planted frames and writes article and frame rows")
{
    QTemporaryDir dir;
    std::vector<int> truth;
    const QString matrix = dir.filePath("matrix.csv");
    writeFile(matrix, plantedMatrix(truth));
    const QString out = dir.filePath("frames.csv");
    const CliRun run = cli({"frames", "--data", matrix, "--max-k", "6", "--bootstrap", "20",
        "--seed", "3", "--json", "--out", out});
    INFO(run.err.toStdString());
    REQUIRE(run.exitCode == 0);
    const QJsonObject o = cliJson(run);
    CHECK(o.value("articles").toInt() == 120);
    CHECK(o.value("k").toInt() == 3);
    CHECK(o.value("k_given").toBool() == false);
    CHECK(o.value("k_by").toObject().value("silhouette").toInt() == 3);
    CHECK(o.value("k_choice").toArray().size() == 5);
    CHECK(o.value("schedule").toArray().size() == 119);
    const QJsonArray frames = o.value("frames").toArray();
    REQUIRE(frames.size() == 3);
    for (const QJsonValue &f : frames) {
        CHECK(f.toObject().value("stability").toObject().value("mean_jaccard").toDouble() > 0.75);
        CHECK(f.toObject().value("closest").toArray().size() == 3);
    }
    // --out: a header and one row per article; each planted profile lands in one frame.
    QFile file(out);
    REQUIRE(file.open(QIODevice::ReadOnly));
    const QList<QByteArray> lines = file.readAll().trimmed().split('\n');
    REQUIRE(lines.size() == 121);
    CHECK(lines[0] == "article,frame");
    QMap<int, QMap<QByteArray, int>> framesOfProfile;
    for (int a = 0; a < 120; ++a) {
        const QList<QByteArray> fields = lines[a + 1].split(',');
        REQUIRE(fields.size() == 2);
        CHECK(fields[0] == "a" + QByteArray::number(a));
        ++framesOfProfile[truth[size_t(a)]][fields[1]];
    }
    for (const auto &counts : framesOfProfile) {
        int largest = 0;
        for (int c : counts)
            largest = std::max(largest, c);
        CHECK(largest >= 36); // at least 90% of the profile's 40 articles in one frame
    }
    // The same run again gives the same figures (seeded bootstrap); --out refuses to overwrite.
    const CliRun again = cli(
        {"frames", "--data", matrix, "--max-k", "6", "--bootstrap", "20", "--seed", "3", "--json"});
    CHECK(cliJson(again).value("frames") == o.value("frames"));
    const CliRun refused = cli({"frames", "--data", matrix, "--out", out});
    CHECK(refused.exitCode == 1);
    CHECK(refused.err.contains("--force"));
}

TEST_CASE("frames --data names file line and column of a bad cell")
{
    QTemporaryDir dir;
    struct Case {
        const char *csv;
        const char *expected;
    };
    const std::vector<Case> cases {
        {"article,a,b\nx,1,0\ny,1,abc\n",
            ":3:3: column 3 (\"b\") holds \"abc\", which is not a number."},
        {"article,a,b\nx,1,\n", ":2:3: column 3 (\"b\") is empty"},
        {"article,a,b\nx,1\n", ":2: this row has 2 fields but the header has 3."},
        {"article,a,b\nx,1,0\nx,0,1\n", ":3:1: the article \"x\" appears twice (first on line 2)."},
        {"article,a,a\nx,1,0\n", ":1:3: the variable \"a\" appears twice in the header."},
        {"article\nx\n", ":1: the header names no variable"},
        {"article,a\n", ":1: the file has a header but no articles."},
        {"article,a\nx,inf\n", ":2:2: column 2 (\"a\") holds \"inf\", which is not a number."},
    };
    for (const Case &c : cases) {
        const QString path = dir.filePath("bad.csv");
        writeFile(path, c.csv);
        const CliRun run = cli({"frames", "--data", path});
        INFO(c.csv);
        INFO(run.err.toStdString());
        CHECK(run.exitCode == 1);
        CHECK(run.err.contains(path + QString::fromUtf8(c.expected)));
    }
    // Ward's method keeps n(n − 1)/2 distances: above 20,000 articles it refuses (README, Frames).
    QByteArray large = "article,a\n";
    for (int a = 0; a < 20001; ++a)
        large += "a" + QByteArray::number(a) + "," + QByteArray::number(a % 2) + "\n";
    const QString largeFile = dir.filePath("large.csv");
    writeFile(largeFile, large);
    const CliRun tooMany = cli({"frames", "--data", largeFile});
    CHECK(tooMany.exitCode == 1);
    CHECK(tooMany.err.contains("takes at most 20000 articles, not 20001"));
    CHECK(cli({"frames", "--help"}).exitCode == 0);
    const QString small = dir.filePath("small.csv");
    writeFile(small, "article,a\nx,1\ny,0\n");
    CHECK(cli({"frames", "--data", small}).err.contains("frames need at least 3"));
    CHECK(cli({"frames", "--data", small, "--k", "0"}).exitCode == 2);
    CHECK(cli({"frames", "--data", small, "--layer", "gold"}).exitCode == 2);
}

TEST_CASE("frames of a project layer equal frames of the indicators built from the source file")
{
    QTemporaryDir dir;
    const QString project = dir.filePath("demo.fourfold");
    REQUIRE(cli({"build-sample", FOURFOLD_SAMPLE_DIR, project}).exitCode == 0);
    // One coder's layer and the consensus of the three: the program's indicators, clustered,
    // give exactly the figures of the indicators built independently from codings.jsonl.
    const std::vector<std::pair<QString, QStringList>> layers {
        {"coder:C01", {"C01"}}, {"consensus", {"C01", "C02", "C03"}}};
    for (const auto &[layer, coders] : layers) {
        INFO(layer.toStdString());
        const QString matrix = dir.filePath("indicators.csv");
        QMap<QString, QList<double>> shares;
        writeFile(matrix, indicatorsFromSampleFile(coders, &shares));
        const QString assignments = dir.filePath(layer.section(':', 0, 0) + ".csv");
        const CliRun fromProject = cli({"frames", project, "--layer", layer, "--k", "3", "--max-k",
            "4", "--json", "--out", assignments});
        INFO(fromProject.err.toStdString());
        REQUIRE(fromProject.exitCode == 0);
        const CliRun fromFile =
            cli({"frames", "--data", matrix, "--k", "3", "--max-k", "4", "--json"});
        REQUIRE(fromFile.exitCode == 0);
        QJsonObject a = cliJson(fromProject);
        const QJsonObject b = cliJson(fromFile);
        // The consensus adds each element's mean share of coders per frame: the mean, over the
        // frame's articles (from --out), of the shares counted above. Then it is set aside.
        QMap<int, QStringList> articlesOf;
        QFile out(assignments);
        REQUIRE(out.open(QIODevice::ReadOnly));
        for (const QByteArray &line : out.readAll().trimmed().split('\n').mid(1))
            articlesOf[line.split(',')[1].toInt()] << QString::fromUtf8(line.split(',')[0]);
        QJsonArray frames = a.value("frames").toArray();
        for (qsizetype f = 0; f < frames.size(); ++f) {
            QJsonObject frame = frames[f].toObject();
            QJsonArray elements = frame.value("elements").toArray();
            for (qsizetype v = 0; v < elements.size(); ++v) {
                QJsonObject element = elements[v].toObject();
                CHECK(element.contains("coder_share") == (layer == "consensus"));
                if (layer == "consensus") {
                    double sum = 0;
                    for (const QString &article : articlesOf[int(f) + 1])
                        sum += shares[article][v];
                    CHECK(element.value("coder_share").toDouble()
                        == Approx(sum / double(articlesOf[int(f) + 1].size())).margin(1e-12));
                }
                element.remove("coder_share");
                elements[v] = element;
            }
            frame.insert("elements", elements);
            frames[f] = frame;
        }
        a.insert("frames", frames);
        CHECK(a.value("variables") == b.value("variables"));
        CHECK(a.value("articles").toInt() == b.value("articles").toInt());
        CHECK(a.value("articles").toInt() >= 9);
        CHECK(a.value("schedule") == b.value("schedule"));
        CHECK(a.value("frames") == b.value("frames"));
        CHECK(a.value("k_choice") == b.value("k_choice"));
        // Frames by outlet: one column per outlet, counts adding up to the articles.
        const QJsonObject byOutlet = a.value("by").toObject().value("outlet").toObject();
        long long total = 0;
        for (const QJsonValue &row : byOutlet.value("counts").toArray())
            for (const QJsonValue &cell : row.toArray())
                total += cell.toInteger();
        CHECK(total == a.value("articles").toInt());
        CHECK(b.value("by").isUndefined()); // --data has no outlets
    }
    // --compare: a layer against itself agrees perfectly (ARI 1, all articles on matched frames).
    const CliRun self = cli({"frames", project, "--layer", "coder:C02", "--compare", "coder:C02",
        "--k", "3", "--max-k", "3", "--json"});
    REQUIRE(self.exitCode == 0);
    const QJsonObject compare = cliJson(self).value("compare").toObject();
    CHECK(compare.value("adjusted_rand_index").toDouble() == 1.0);
    CHECK(compare.value("matched_share").toDouble() == 1.0);
    CHECK(compare.value("cross_table").toArray().size() == 3);
    // Two coders: the ARI is the one of the printed cross-table (Hubert & Arabie 1985, eq. 5).
    const CliRun pair = cli({"frames", project, "--layer", "coder:C01", "--compare", "coder:C02",
        "--k", "2", "--max-k", "2", "--json"});
    REQUIRE(pair.exitCode == 0);
    const QJsonObject c = cliJson(pair).value("compare").toObject();
    double cells = 0, rowPairs = 0, columnPairs = 0, n = 0;
    std::vector<double> columnSums(2, 0.0);
    for (const QJsonValue &row : c.value("cross_table").toArray()) {
        double rowSum = 0;
        for (qsizetype j = 0; j < row.toArray().size(); ++j) {
            const double x = row.toArray()[j].toDouble();
            cells += x * (x - 1) / 2;
            rowSum += x;
            columnSums[size_t(j)] += x;
        }
        rowPairs += rowSum * (rowSum - 1) / 2;
        n += rowSum;
    }
    for (double s : columnSums)
        columnPairs += s * (s - 1) / 2;
    const double expected = rowPairs * columnPairs / (n * (n - 1) / 2);
    const double ari = (cells - expected) / ((rowPairs + columnPairs) / 2 - expected);
    CHECK(c.value("adjusted_rand_index").toDouble() == Approx(ari).margin(1e-12));
    // An extractor run covers every article (40 in the sample); gold only the 27 adjudicated.
    const CliRun run = cli({"frames", project, "--layer", "run:cues", "--compare", "gold", "--k",
        "2", "--max-k", "3", "--json"});
    REQUIRE(run.exitCode == 0);
    CHECK(cliJson(run).value("articles").toInt() == 40);
    CHECK(cliJson(run).value("compare").toObject().value("articles").toInt() == 27);
    // The line that names the k used says why: where at least two of the three indices point,
    // else the largest mean silhouette (the three disagree on the sample's gold layer).
    const CliRun chosen = cli({"frames", project, "--json"});
    REQUIRE(chosen.exitCode == 0);
    const QJsonObject by = cliJson(chosen).value("k_by").toObject();
    const int k = cliJson(chosen).value("k").toInt();
    const int pointing = int(by.value("silhouette").toInt() == k)
        + int(by.value("calinski_harabasz").toInt() == k)
        + int(by.value("fusion_elbow").toInt() == k);
    const QString text = cli({"frames", project}).out;
    CHECK(text.contains(QStringLiteral("Frames (k = %1, where most indices point)").arg(k))
        == (pointing >= 2));
    CHECK(text.contains(QStringLiteral("Frames (k = %1, the largest mean silhouette").arg(k))
        == (pointing < 2));
    CHECK(by.value("silhouette").toInt() == k);
    CHECK(cli({"frames", project, "--layer", "coders"}).err.contains("not a layer for frames"));
    CHECK(cli({"frames", project, "--layer", "coder:NOBODY"}).exitCode == 1);
}

TEST_CASE("frames --save stores the analysis --saved lists it and --delete-saved removes it")
{
    QTemporaryDir dir;
    const QString project = dir.filePath("demo.fourfold");
    REQUIRE(cli({"build-sample", FOURFOLD_SAMPLE_DIR, project}).exitCode == 0);
    CHECK(cli({"frames", project, "--saved"}).out.contains("no saved frame analysis"));
    const QString assignments = dir.filePath("frames.csv");
    const CliRun saved = cli({"frames", project, "--layer", "coder:C01", "--k", "3", "--max-k", "4",
        "--save", "C01 frames", "--frame-name", "First", "--frame-name", "Second", "--json",
        "--out", assignments});
    INFO(saved.err.toStdString());
    REQUIRE(saved.exitCode == 0);
    CHECK(saved.err.contains("Saved the frames as \"C01 frames\""));
    const QJsonObject computed = cliJson(saved);

    const CliRun list = cli({"frames", project, "--saved", "--json"});
    REQUIRE(list.exitCode == 0);
    const QJsonArray analyses = cliJson(list).value("analyses").toArray();
    REQUIRE(analyses.size() == 1);
    const QJsonObject a = analyses[0].toObject();
    CHECK(a.value("name").toString() == "C01 frames");
    CHECK(a.value("articles").toInt() == computed.value("articles").toInt());
    const QJsonObject settings = a.value("settings").toObject();
    CHECK(settings.value("layer").toString() == "coder:C01");
    CHECK(settings.value("k").toInt() == 3);
    CHECK(settings.value("max_k").toInt() == 4);
    CHECK(settings.value("seed").toString() == "1");
    CHECK(settings.value("variables") == computed.value("variables"));
    const QJsonArray frames = a.value("frames").toArray();
    REQUIRE(frames.size() == 3);
    CHECK(frames[0].toObject().value("name").toString() == "First");
    CHECK(frames[1].toObject().value("name").toString() == "Second");
    CHECK(frames[2].toObject().value("name").toString().isEmpty());
    // Each frame's size is the one the analysis printed and the one --out wrote.
    QMap<int, int> written;
    QFile out(assignments);
    REQUIRE(out.open(QIODevice::ReadOnly));
    for (const QByteArray &line : out.readAll().trimmed().split('\n').mid(1))
        ++written[line.split(',')[1].toInt()];
    for (qsizetype f = 0; f < 3; ++f) {
        const int size = frames[f].toObject().value("size").toInt();
        CHECK(size == computed.value("frames").toArray()[f].toObject().value("size").toInt());
        CHECK(size == written.value(int(f) + 1));
    }
    CHECK(cli({"frames", project, "--saved"}).out.contains("F1  First"));

    // Names are unique; --frame-name needs --save; --save is for a project.
    const CliRun again = cli({"frames", project, "--layer", "coder:C01", "--save", "C01 frames"});
    CHECK(again.exitCode != 0);
    CHECK(again.err.contains("already called \"C01 frames\""));
    CHECK(cli({"frames", project, "--frame-name", "x"}).exitCode == 2);
    const QString matrix = dir.filePath("m.csv");
    writeFile(matrix, "article,a\nx,1\ny,0\nz,1\n");
    CHECK(cli({"frames", "--data", matrix, "--save", "x"}).exitCode == 2);
    const CliRun tooMany = cli({"frames", project, "--layer", "coder:C01", "--k", "2", "--save",
        "two", "--frame-name", "a", "--frame-name", "b", "--frame-name", "c"});
    CHECK(tooMany.exitCode == 2);

    // Deleting: gone from the list, the name free again; an unknown name is NotFound.
    REQUIRE(cli({"frames", project, "--delete-saved", "C01 frames"}).exitCode == 0);
    CHECK(cli({"frames", project, "--saved", "--json"}).out.contains("\"analyses\": [\n    ]"));
    const CliRun missing = cli({"frames", project, "--delete-saved", "C01 frames"});
    CHECK(missing.exitCode != 0);
    CHECK(missing.err.contains("no saved frame analysis \"C01 frames\""));
    CHECK(cli({"frames", project, "--layer", "coder:C01", "--save", "C01 frames"}).exitCode == 0);
}
