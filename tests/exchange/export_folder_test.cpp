// Issue 20, items 4 and 10: an export appears whole or not at all, never through a symbolic
// link, never over files it did not write, and never with a hash that does not match its text.

#include "core/exchange/layer_export.h"
#include "core/store/database.h"
#include "tests/scoring/scoring_fixture.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>

using namespace fourfold;

namespace {

using F = FramingFunction;

// Two coders' spans on both articles: a split IOB2 export of the coders layer writes six files
// and the manifest.
struct FolderFixture : test::ScoringFixture {
    QString out = dir.filePath(QStringLiteral("out"));

    FolderFixture()
    {
        const CoderId c1 = addCoder(QStringLiteral("C01"));
        const CoderId c2 = addCoder(QStringLiteral("C02"));
        code(f1, c1, F::Problem, 0, 9);
        code(f2, c1, F::Cause, 0, 9);
        code(f1, c2, F::Remedy, 10, 20);
        code(f2, c2, F::Problem, 0, 5);
    }

    ExportOptions options() const
    {
        ExportOptions o;
        o.layer = LayerSpec {LayerKind::Coders, {}};
        o.format = ExportFormat::Iob2;
        o.outDir = out;
        o.split = *SplitRatios::parse(QStringLiteral("50/50"));
        return o;
    }

    // Every entry of the test folder (hidden ones too) but the project's files and the
    // fixture's article file.
    QStringList entries() const
    {
        QStringList names =
            QDir(dir.path())
                .entryList(QDir::AllEntries | QDir::Hidden | QDir::System | QDir::NoDotAndDotDot,
                    QDir::Name);
        names.removeIf([](const QString &n) {
            return n.startsWith(QLatin1String("t.fourfold")) || n == QLatin1String("a.jsonl");
        });
        return names;
    }
};

bool writeBytes(const QString &path, const QByteArray &bytes)
{
    QFile f(path);
    return f.open(QIODevice::WriteOnly) && f.write(bytes) == bytes.size();
}

QStringList folderEntries(const QString &path)
{
    return QDir(path).entryList(
        QDir::AllEntries | QDir::Hidden | QDir::System | QDir::NoDotAndDotDot, QDir::Name);
}

} // namespace

TEST_CASE_METHOD(FolderFixture,
    "issue 20 item 4: an export stopped between any two files leaves nothing behind",
    "[exchange][files]")
{
    auto whole = exportLayer(project, options());
    REQUIRE(whole);
    const qsizetype files = qsizetype(whole->files.size()) + 1; // and the manifest
    REQUIRE(files == 5);
    REQUIRE(QDir(out).removeRecursively());
    const QStringList before = entries();
    for (qsizetype stopAfter = 1; stopAfter <= files; ++stopAfter) {
        ExportOptions o = options();
        qsizetype written = 0;
        o.afterFile = [&](const QString &name) -> Status {
            if (++written == stopAfter)
                return fail(ErrorCode::Io, QStringLiteral("injected after %1").arg(name));
            return {};
        };
        auto r = exportLayer(project, o);
        INFO("stopped after file " << stopAfter);
        REQUIRE_FALSE(r);
        CHECK(r.error().message.startsWith(QStringLiteral("injected after")));
        CHECK_FALSE(QFileInfo::exists(out));
        CHECK(entries() == before); // no hidden partial folder either
    }
}

TEST_CASE_METHOD(FolderFixture,
    "issue 20 item 4: a failed export over an earlier one leaves the earlier one as it was",
    "[exchange][files]")
{
    REQUIRE(exportLayer(project, options()));
    QHash<QString, QByteArray> earlier;
    for (const QString &name : folderEntries(out))
        earlier.insert(name, test::readFile(QDir(out).filePath(name)));
    REQUIRE(earlier.size() == 5);
    code(f1, addCoder(QStringLiteral("C03")), F::Evaluation, 0, 4);
    ExportOptions o = options();
    o.replace = true;
    o.afterFile = [](const QString &name) -> Status {
        if (name == QLatin1String("manifest.json"))
            return fail(ErrorCode::Io, QStringLiteral("injected"));
        return {};
    };
    REQUIRE_FALSE(exportLayer(project, o));
    QHash<QString, QByteArray> after;
    for (const QString &name : folderEntries(out))
        after.insert(name, test::readFile(QDir(out).filePath(name)));
    CHECK(after == earlier);
    CHECK(entries() == QStringList {QStringLiteral("out")});
}

TEST_CASE_METHOD(FolderFixture, "issue 20 item 10: an export refuses a symbolic link as its folder",
    "[exchange][files]")
{
    const QString real = dir.filePath(QStringLiteral("real"));
    REQUIRE(QDir().mkpath(real));
    REQUIRE(QFile::link(real, out));
    auto r = exportLayer(project, options());
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::Io);
    CHECK(r.error().message.contains(out));
    CHECK(r.error().message.contains(QStringLiteral("symbolic link")));
    CHECK(folderEntries(real).isEmpty());
    CHECK(QFileInfo(out).isSymLink());
}

TEST_CASE_METHOD(FolderFixture,
    "issue 20 item 10: an export refuses a folder holding files unless asked to replace it",
    "[exchange][files]")
{
    REQUIRE(QDir().mkpath(out));
    REQUIRE(writeBytes(QDir(out).filePath(QStringLiteral("stale.test.bio")), "old\n"));
    auto refused = exportLayer(project, options());
    REQUIRE_FALSE(refused);
    CHECK(refused.error().code == ErrorCode::Duplicate);
    CHECK(refused.error().message.contains(out));
    CHECK(refused.error().message.contains(QStringLiteral("not empty")));
    CHECK(folderEntries(out) == QStringList {QStringLiteral("stale.test.bio")});

    ExportOptions o = options();
    o.replace = true;
    auto replaced = exportLayer(project, o);
    REQUIRE(replaced);
    QStringList expected {QStringLiteral("manifest.json")};
    for (const ExportedFile &f : replaced->files)
        expected << f.name;
    expected.sort();
    CHECK(folderEntries(out) == expected); // the stale file went with the earlier export
    CHECK(entries() == QStringList {QStringLiteral("out")});
}

TEST_CASE_METHOD(FolderFixture,
    "issue 20 item 10: replacing never deletes what an export did not write", "[exchange][files]")
{
    REQUIRE(QDir().mkpath(out + QStringLiteral("/sub")));
    REQUIRE(writeBytes(QDir(out).filePath(QStringLiteral("notes.txt")), "mine\n"));
    ExportOptions o = options();
    o.replace = true;
    auto r = exportLayer(project, o);
    REQUIRE_FALSE(r);
    CHECK(r.error().code == ErrorCode::Duplicate);
    CHECK(r.error().message.contains(QStringLiteral("notes.txt")));
    CHECK(folderEntries(out) == (QStringList {QStringLiteral("notes.txt"), QStringLiteral("sub")}));
    CHECK(entries() == QStringList {QStringLiteral("out")});
}

TEST_CASE_METHOD(FolderFixture,
    "issue 20 item 10: an export refuses an article whose text does not match its hash",
    "[exchange][files]")
{
    {
        // Damage one article's text behind the program's back, as a bad sector would.
        auto db = Database::open(project.path(), Database::OpenMode::ReadWrite);
        REQUIRE(db);
        REQUIRE(db->exec(QStringLiteral(
            "UPDATE article SET text = 'Tampered' || substr(text, 9) WHERE external_id = 'f2'")));
    }
    for (ExportFormat format :
        {ExportFormat::Jsonl, ExportFormat::W3c, ExportFormat::Iob2, ExportFormat::Csv}) {
        ExportOptions o = options();
        o.format = format;
        o.withText = false;
        auto r = exportLayer(project, o);
        INFO(exportFormatKey(format).toStdString());
        REQUIRE_FALSE(r);
        CHECK(r.error().code == ErrorCode::Corrupt);
        CHECK(r.error().message.contains(QStringLiteral("\"f2\"")));
        CHECK(r.error().message.contains(QStringLiteral("SHA-256")));
        CHECK_FALSE(QFileInfo::exists(out));
        CHECK(entries().isEmpty());
    }
}
