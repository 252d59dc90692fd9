// Hostile input: a reader pointed at a device, a pipe or a folder — directly or through a
// symbolic link — refuses it at once instead of reading forever (/dev/zero never ends).
#include "core/exchange/w3c_import.h"
#include "core/io/input_file.h"
#include "core/io/json_item_stream.h"
#include "core/io/reliability_table_reader.h"
#include "core/project/coding_import.h"
#include "core/project/testing/project_database.h"
#include "project_fixture.h"
#include "tests/support/db_dump.h"

#include <QDir>
#include <QFile>

using namespace fourfold;
using namespace fourfold::test;

TEST_CASE("readers refuse a symbolic link to /dev/zero and a folder as not a regular file")
{
    ProjectFixture f;
    const QString zero = f.dir.filePath(QStringLiteral("zero.jsonl"));
    REQUIRE(QFile::link(QStringLiteral("/dev/zero"), zero));
    const QString folder = f.dir.filePath(QStringLiteral("folder.csv"));
    REQUIRE(QDir().mkpath(folder));
    const QString before = dumpDatabase(databaseForTesting(f.project));
    const auto refused = [](const Error &e, const QString &path) {
        CHECK(e.code == ErrorCode::Io);
        CHECK(e.file == path);
        CHECK(e.message.contains(QStringLiteral("this is not a regular file")));
    };
    for (const QString &path : {zero, folder}) {
        INFO(path.toStdString());
        const Status direct = requireRegularFile(path);
        REQUIRE_FALSE(direct);
        refused(direct.error(), path);
        auto codings = importQuotedCodings(f.project, path, Phase::Production);
        REQUIRE_FALSE(codings);
        refused(codings.error(), path);
        auto table = readReliabilityTable(path);
        REQUIRE_FALSE(table);
        refused(table.error(), path);
        auto w3c = importW3cAnnotations(f.project, path);
        REQUIRE_FALSE(w3c);
        refused(w3c.error(), path);
        auto articles = readArticles(path, ImportOptions {});
        if (path == zero) { // a folder is a folder of text files for this reader
            REQUIRE_FALSE(articles);
            refused(articles.error(), path);
        }
    }
    // A regular file passes, and a missing one is left to the reader to name.
    const QString plain = f.dir.filePath(QStringLiteral("plain.csv"));
    QFile file(plain);
    REQUIRE(file.open(QIODevice::WriteOnly));
    file.close();
    CHECK(requireRegularFile(plain));
    CHECK(requireRegularFile(f.dir.filePath(QStringLiteral("missing.csv"))));
    CHECK(dumpDatabase(databaseForTesting(f.project)) == before);
}
