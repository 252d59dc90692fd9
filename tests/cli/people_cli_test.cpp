// fourfold-cli people: people listed, added, renamed, disabled and enabled by pseudonym, changes
// made by a lead who gives their passphrase (from a file or standard input, never an argument),
// and names that never leave the project.
#include "tests/support/cli_run.h"
#include "tests/support/test_support.h"

#include <QDir>
#include <QDirIterator>
#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QProcess>

using namespace fourfold;
using namespace fourfold::test;

namespace {

const QString kLeadPass = QStringLiteral("harbour lead passphrase");

CliRun cli(const QStringList &args)
{
    return runCli(QStringLiteral(FOURFOLD_CLI), args);
}

// Runs fourfold-cli with `input` on its standard input.
CliRun cliWithInput(const QStringList &args, const QByteArray &input)
{
    QProcess proc;
    proc.start(QStringLiteral(FOURFOLD_CLI), args);
    REQUIRE(proc.waitForStarted(30000));
    proc.write(input);
    proc.closeWriteChannel();
    REQUIRE(proc.waitForFinished(120000));
    return {proc.exitCode(), QString::fromUtf8(proc.readAllStandardOutput()),
        QString::fromUtf8(proc.readAllStandardError())};
}

QStringList people(const QString &project, const QStringList &more)
{
    return QStringList {QStringLiteral("people"), project} + more;
}

QJsonArray listed(const QString &project)
{
    const CliRun r = cli(people(project, {QStringLiteral("--list"), QStringLiteral("--json")}));
    REQUIRE(r.exitCode == 0);
    return cliJson(r).value(QStringLiteral("people")).toArray();
}

QJsonObject personOf(const QJsonArray &all, const QString &pseudonym)
{
    for (const QJsonValue &v : all)
        if (v.toObject().value(QStringLiteral("pseudonym")).toString() == pseudonym)
            return v.toObject();
    FAIL("no person " << pseudonym.toStdString());
    return {};
}

} // namespace

TEST_CASE("people adds a first lead then only that lead adds renames disables and enables")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("p.fourfold"));
    REQUIRE(cli({QStringLiteral("new"), project}).exitCode == 0);
    const QString passFile = writeFile(dir, QStringLiteral("lead.pass"), kLeadPass.toUtf8() + "\n");

    // A lead needs a passphrase, from a file or standard input; there is no option for it.
    CliRun r = cli(people(project,
        {QStringLiteral("--add"), QStringLiteral("Lena Lead"), QStringLiteral("--pseudonym"),
            QStringLiteral("L01"), QStringLiteral("--role"), QStringLiteral("lead")}));
    CHECK(r.exitCode == 2);
    CHECK(r.err.contains(QStringLiteral("--passphrase-file")));
    r = cli(people(project,
        {QStringLiteral("--add"), QStringLiteral("Lena Lead"), QStringLiteral("--pseudonym"),
            QStringLiteral("L01"), QStringLiteral("--role"), QStringLiteral("lead"),
            QStringLiteral("--passphrase"), kLeadPass}));
    CHECK(r.exitCode == 2);

    // The project's first lead: nobody needs to sign in.
    r = cli(people(project,
        {QStringLiteral("--add"), QStringLiteral("Lena Lead"), QStringLiteral("--pseudonym"),
            QStringLiteral("L01"), QStringLiteral("--role"), QStringLiteral("lead"),
            QStringLiteral("--passphrase-file"), passFile}));
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.trimmed() == QStringLiteral("Added L01 (lead)."));

    // From now on a change needs the lead.
    r = cli(people(project,
        {QStringLiteral("--add"), QStringLiteral("Cas Coder"), QStringLiteral("--pseudonym"),
            QStringLiteral("C01")}));
    CHECK(r.exitCode == 2);
    CHECK(r.err.contains(QStringLiteral("needs a lead")));
    r = cliWithInput(
        people(project,
            {QStringLiteral("--add"), QStringLiteral("Cas Coder"), QStringLiteral("--pseudonym"),
                QStringLiteral("C01"), QStringLiteral("--lead"), QStringLiteral("L01")}),
        "not the passphrase\n");
    CHECK(r.exitCode == 1);
    CHECK(r.err.trimmed() == QStringLiteral("fourfold-cli: That is not the passphrase of L01."));
    // The lead's passphrase on standard input.
    r = cliWithInput(
        people(project,
            {QStringLiteral("--add"), QStringLiteral("Cas Coder"), QStringLiteral("--pseudonym"),
                QStringLiteral("C01"), QStringLiteral("--lead"), QStringLiteral("L01")}),
        kLeadPass.toUtf8() + "\n");
    REQUIRE(r.exitCode == 0);
    // A coder cannot act as the lead.
    r = cliWithInput(
        people(project,
            {QStringLiteral("--add"), QStringLiteral("Eve"), QStringLiteral("--pseudonym"),
                QStringLiteral("L02"), QStringLiteral("--role"), QStringLiteral("lead"),
                QStringLiteral("--passphrase-file"), passFile, QStringLiteral("--lead"),
                QStringLiteral("C01")}),
        "\n");
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("Only a lead")));
    // Pseudonyms are unique.
    r = cli(people(project,
        {QStringLiteral("--add"), QStringLiteral("Other"), QStringLiteral("--pseudonym"),
            QStringLiteral("C01"), QStringLiteral("--lead"), QStringLiteral("L01"),
            QStringLiteral("--lead-passphrase-file"), passFile}));
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("\"C01\" is already taken")));

    QJsonArray all = listed(project);
    REQUIRE(all.size() == 2);
    CHECK(personOf(all, QStringLiteral("L01"))
        == QJsonObject {{QStringLiteral("pseudonym"), QStringLiteral("L01")},
            {QStringLiteral("role"), QStringLiteral("lead")}, {QStringLiteral("disabled"), false},
            {QStringLiteral("passphrase"), QStringLiteral("set")}});
    CHECK(personOf(all, QStringLiteral("C01")).value(QStringLiteral("role")).toString()
        == QStringLiteral("coder"));

    const QStringList asLead {QStringLiteral("--lead"), QStringLiteral("L01"),
        QStringLiteral("--lead-passphrase-file"), passFile};
    r = cli(people(project,
        QStringList {QStringLiteral("--rename"), QStringLiteral("C01"), QStringLiteral("Cas Other")}
            + asLead));
    REQUIRE(r.exitCode == 0);
    CHECK(r.out.trimmed() == QStringLiteral("Renamed C01."));
    r = cli(
        people(project, QStringList {QStringLiteral("--disable"), QStringLiteral("C01")} + asLead));
    REQUIRE(r.exitCode == 0);
    CHECK(personOf(listed(project), QStringLiteral("C01"))
              .value(QStringLiteral("disabled"))
              .toBool());
    // The only lead cannot be disabled.
    r = cli(
        people(project, QStringList {QStringLiteral("--disable"), QStringLiteral("L01")} + asLead));
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("only enabled lead")));
    r = cli(
        people(project, QStringList {QStringLiteral("--enable"), QStringLiteral("C01")} + asLead));
    REQUIRE(r.exitCode == 0);
    CHECK_FALSE(personOf(listed(project), QStringLiteral("C01"))
                    .value(QStringLiteral("disabled"))
                    .toBool());

    // The plain list names pseudonyms, roles and states, never a name.
    r = cli(people(project, {QStringLiteral("--list")}));
    REQUIRE(r.exitCode == 0);
    CHECK(r.out
        == QStringLiteral("C01       coder  enabled\nL01       lead   enabled   passphrase set\n"));
}

TEST_CASE("a disabled coder keeps their codings and takes no new assignments")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(
        cli({QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project}).exitCode
        == 0);
    const QString passFile = writeFile(dir, QStringLiteral("lead.pass"), kLeadPass.toUtf8());
    const QStringList asLead {QStringLiteral("--lead"), QStringLiteral("L01"),
        QStringLiteral("--lead-passphrase-file"), passFile};
    // The demo lead has no passphrase yet: the first one given becomes theirs.
    CHECK(personOf(listed(project), QStringLiteral("L01")).value(QStringLiteral("passphrase"))
        == QStringLiteral("not-set"));
    const QString outBefore = dir.filePath(QStringLiteral("before"));
    REQUIRE(cli({QStringLiteral("export"), project, QStringLiteral("--layer"),
                    QStringLiteral("coder:C03"), QStringLiteral("--format"),
                    QStringLiteral("jsonl"), QStringLiteral("--out"), outBefore})
                .exitCode
        == 0);
    CliRun r = cli(
        people(project, QStringList {QStringLiteral("--disable"), QStringLiteral("C03")} + asLead));
    REQUIRE(r.exitCode == 0);
    CHECK(personOf(listed(project), QStringLiteral("L01")).value(QStringLiteral("passphrase"))
        == QStringLiteral("set"));

    // Their codings stay: the same export, byte for byte.
    const QString outAfter = dir.filePath(QStringLiteral("after"));
    REQUIRE(cli({QStringLiteral("export"), project, QStringLiteral("--layer"),
                    QStringLiteral("coder:C03"), QStringLiteral("--format"),
                    QStringLiteral("jsonl"), QStringLiteral("--out"), outAfter})
                .exitCode
        == 0);
    QDir before(outBefore);
    const QStringList files = before.entryList(QDir::Files);
    REQUIRE(files.contains(QStringLiteral("manifest.json")));
    for (const QString &name : files) {
        if (name == QLatin1String("manifest.json"))
            continue; // holds the time of the export
        INFO(name.toStdString());
        CHECK(readFile(before.filePath(name)) == readFile(QDir(outAfter).filePath(name)));
    }
    // No new assignment for them; the others still take one.
    r = cli({QStringLiteral("assign"), project, QStringLiteral("--articles"),
        QStringLiteral("hb-01"), QStringLiteral("--coders"), QStringLiteral("C03"),
        QStringLiteral("--phase"), QStringLiteral("production")});
    CHECK(r.exitCode == 1);
    CHECK(r.err.contains(QStringLiteral("C03 is disabled")));
}

TEST_CASE("names never leave the project in exports or command output")
{
    QTemporaryDir dir;
    const QString project = dir.filePath(QStringLiteral("demo.fourfold"));
    REQUIRE(
        cli({QStringLiteral("build-sample"), QStringLiteral(FOURFOLD_SAMPLE_DIR), project}).exitCode
        == 0);
    const QString passFile = writeFile(dir, QStringLiteral("lead.pass"), kLeadPass.toUtf8());
    const QStringList asLead {QStringLiteral("--lead"), QStringLiteral("L01"),
        QStringLiteral("--lead-passphrase-file"), passFile};
    // A name no text of the sample holds, given through the CLI, plus the sample's own names
    // (sample-project/study.json).
    REQUIRE(cli(people(project,
                    QStringList {QStringLiteral("--rename"), QStringLiteral("C01"),
                        QStringLiteral("Zebulon Quartermaine")}
                        + asLead))
                .exitCode
        == 0);
    REQUIRE(cli(people(project,
                    QStringList {QStringLiteral("--add"), QStringLiteral("Xanthe Oddbody"),
                        QStringLiteral("--pseudonym"), QStringLiteral("C09")}
                        + asLead))
                .exitCode
        == 0);
    const QStringList names {QStringLiteral("Zebulon"), QStringLiteral("Quartermaine"),
        QStringLiteral("Xanthe"), QStringLiteral("Oddbody"), QStringLiteral("Sam Whitfield"),
        QStringLiteral("Lena Hartwig"), QStringLiteral("Mira Castellan")};

    QByteArray everything; // every byte the commands wrote, to files or to the terminal
    auto run = [&](const QStringList &args) {
        const CliRun r = cli(args);
        INFO(args.join(QLatin1Char(' ')).toStdString() << "\n" << r.err.toStdString());
        CHECK(r.exitCode == 0);
        everything += r.out.toUtf8() + r.err.toUtf8();
    };
    int exports = 0;
    for (const char *layer : {"gold", "coders", "coder:C01"})
        for (const char *format : {"jsonl", "w3c", "bio", "csv"}) {
            const QString out = dir.filePath(QStringLiteral("export-%1").arg(++exports));
            run({QStringLiteral("export"), project, QStringLiteral("--layer"),
                QString::fromLatin1(layer), QStringLiteral("--format"), QString::fromLatin1(format),
                QStringLiteral("--out"), out});
        }
    run({QStringLiteral("info"), project, QStringLiteral("--json")});
    run({QStringLiteral("info"), project});
    run({QStringLiteral("people"), project, QStringLiteral("--list")});
    run({QStringLiteral("people"), project, QStringLiteral("--list"), QStringLiteral("--json")});
    run({QStringLiteral("agree"), project, QStringLiteral("--unit"), QStringLiteral("sentence"),
        QStringLiteral("--json")});
    run({QStringLiteral("assign"), project, QStringLiteral("--show")});
    int files = 0;
    for (QDirIterator it(dir.path(), QStringList {QStringLiteral("export-*")}, QDir::Dirs);
         it.hasNext();) {
        for (QDirIterator f(it.next(), QDir::Files, QDirIterator::Subdirectories); f.hasNext();) {
            everything += readFile(f.next());
            ++files;
        }
    }
    CHECK(files >= 12 * 2); // each export: at least its data and its manifest
    REQUIRE(everything.size() > 10000);
    for (const QString &name : names) {
        INFO(name.toStdString());
        CHECK_FALSE(everything.contains(name.toUtf8()));
    }
    // The names are in the project itself (the search would find them there).
    const QByteArray file = readFile(project);
    CHECK(file.contains("Zebulon Quartermaine"));
    CHECK(file.contains("Xanthe Oddbody"));
}
