#include "tests/support/db_dump.h"

#include "core/store/statement.h"

#include <QRegularExpression>

#include <catch2/catch.hpp>

namespace fourfold::test {

QString dumpDatabase(const Database &db, const QStringList &skip)
{
    auto tables = db.prepare(QStringLiteral(
        "SELECT name FROM sqlite_schema WHERE type = 'table' AND name NOT LIKE 'sqlite_%' "
        "AND name NOT LIKE 'article_fts%' ORDER BY name"));
    REQUIRE(tables);
    QStringList names;
    while (*tables->step())
        names << tables->columnText(0);
    QString dump;
    for (const QString &name : names) {
        if (skip.contains(name))
            continue;
        // Table names come from sqlite_schema, not from users.
        auto rows = db.prepare(QStringLiteral("SELECT * FROM \"%1\" ORDER BY 1, 2").arg(name));
        REQUIRE(rows);
        dump += QStringLiteral("## %1\n").arg(name);
        auto cols =
            db.prepare(QStringLiteral("SELECT count(*) FROM pragma_table_info('%1')").arg(name));
        REQUIRE(cols);
        REQUIRE(*cols->step());
        const int n = int(cols->columnInt(0));
        while (*rows->step()) {
            QStringList cells;
            for (int c = 0; c < n; ++c)
                cells << (rows->columnIsNull(c) ? QStringLiteral("NULL") : rows->columnText(c));
            dump += cells.join(QLatin1Char('|')) + QLatin1Char('\n');
        }
    }
    return dump;
}

QString withoutTimes(QString dump)
{
    static const QRegularExpression time(QStringLiteral(
        "\\d{4}-\\d\\d-\\d\\dT\\d\\d:\\d\\d:\\d\\d(\\.\\d+)?(Z|[+-]\\d\\d:\\d\\d)?"));
    return dump.replace(time, QStringLiteral("TIME"));
}

} // namespace fourfold::test
