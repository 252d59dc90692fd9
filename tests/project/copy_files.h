#pragma once
// Helpers of the coder-copy tests that read and change project files directly: a dump that is
// the same for the same objects whatever their row ids, SQL run with the SQLite C API (as a
// hostile user would), and short ways to find a project's coders, articles and spans.

#include "tests/project/copies_fixture.h"

#include <QString>
#include <QStringList>

#include <sqlite3.h>

#include <algorithm>
#include <map>
#include <vector>

namespace fourfold::test {

// A dump in which row ids are replaced by the uuids they stand for, rows sorted: two files that
// hold the same objects compare equal whatever order their rows were inserted in.
inline QString uuidDump(const Database &db, const QStringList &skip)
{
    auto tables = db.prepare(QStringLiteral(
        "SELECT name FROM sqlite_schema WHERE type = 'table' AND name NOT LIKE 'sqlite_%' "
        "AND name NOT LIKE 'article_fts%' ORDER BY name"));
    REQUIRE(tables);
    QStringList names;
    while (*tables->step())
        names << tables->columnText(0);
    auto hasUuid = [&](const QString &table) {
        auto s = db.prepare(
            QStringLiteral("SELECT count(*) FROM pragma_table_info(?1) WHERE name = 'uuid'"));
        REQUIRE(s);
        s->bind(1, table);
        REQUIRE(*s->step());
        return s->columnInt(0) == 1;
    };
    QString dump;
    for (const QString &name : names) {
        if (skip.contains(name))
            continue;
        std::map<QString, QString> foreign; // column → referenced table (with a uuid)
        auto fks = db.prepare(
            QStringLiteral("SELECT \"from\", \"table\" FROM pragma_foreign_key_list(?1)"));
        REQUIRE(fks);
        fks->bind(1, name);
        while (*fks->step())
            if (hasUuid(fks->columnText(1)))
                foreign[fks->columnText(0)] = fks->columnText(1);
        auto cols =
            db.prepare(QStringLiteral("SELECT name FROM pragma_table_info(?1) ORDER BY cid"));
        REQUIRE(cols);
        cols->bind(1, name);
        QStringList columns;
        while (*cols->step())
            columns << cols->columnText(0);
        const bool ownUuid = hasUuid(name);
        // Table and column names come from sqlite_schema, not from users.
        auto rows = db.prepare(QStringLiteral("SELECT * FROM \"%1\"").arg(name));
        REQUIRE(rows);
        QStringList lines;
        while (*rows->step()) {
            QStringList cells;
            for (int c = 0; c < columns.size(); ++c) {
                const QString col = columns[c];
                QString cell = rows->columnIsNull(c) ? QStringLiteral("NULL") : rows->columnText(c);
                if (col == QLatin1String("id") && ownUuid)
                    cell = QStringLiteral("#");
                else if (foreign.contains(col) && !rows->columnIsNull(c)) {
                    auto ref = db.prepare(
                        QStringLiteral("SELECT uuid FROM \"%1\" WHERE id = ?1").arg(foreign[col]));
                    REQUIRE(ref);
                    ref->bind(1, rows->columnInt(c));
                    REQUIRE(*ref->step());
                    cell = QStringLiteral("->") + ref->columnText(0);
                }
                cells << cell;
            }
            lines << cells.join(QLatin1Char('|'));
        }
        lines.sort();
        dump += QStringLiteral("## %1\n%2\n").arg(name, lines.join(QLatin1Char('\n')));
    }
    return dump;
}

// What a merge may leave different between orders: the log and the merge bookkeeping.
inline const QStringList kOrderFree {QStringLiteral("event_log"), QStringLiteral("copy_merge")};

inline Project openProject(const QString &path)
{
    auto p = Project::open(path);
    INFO(path.toStdString());
    REQUIRE(p);
    return std::move(*p);
}

inline Annotation onlyAnnotation(const Project &p, ArticleId a, CoderId c, FramingFunction f)
{
    auto list = p.annotations(a, c);
    REQUIRE(list);
    std::vector<Annotation> hits;
    std::ranges::copy_if(*list, std::back_inserter(hits),
        [&](const Annotation &x) { return x.content.function == f; });
    REQUIRE(hits.size() == 1);
    return hits.front();
}

inline CoderId coderIn(const Project &p, const QString &pseudonym)
{
    auto c = p.coderByPseudonym(pseudonym);
    REQUIRE(c);
    REQUIRE(c->has_value());
    return (*c)->id;
}

inline ArticleId articleIn(const Project &p, const QString &externalId)
{
    auto id = p.articleByExternalId(externalId);
    REQUIRE(id);
    REQUIRE(id->has_value());
    return **id;
}

inline QString textOf(const Project &p, ArticleId a)
{
    auto art = p.article(a);
    REQUIRE(art);
    return art->text;
}

inline std::vector<MergeReport> mergeInto(Project &p, const QStringList &copies)
{
    auto r = CoderCopies::merge(p, copies);
    INFO((r ? QString() : r.error().toString()).toStdString());
    REQUIRE(r);
    return *r;
}

inline qint64 count(const QString &path, const char *sql)
{
    sqlite3 *db = nullptr;
    REQUIRE(sqlite3_open_v2(path.toUtf8().constData(), &db, SQLITE_OPEN_READONLY, nullptr)
        == SQLITE_OK);
    sqlite3_stmt *s = nullptr;
    INFO(sql);
    REQUIRE(sqlite3_prepare_v2(db, sql, -1, &s, nullptr) == SQLITE_OK);
    REQUIRE(sqlite3_step(s) == SQLITE_ROW);
    const qint64 n = sqlite3_column_int64(s, 0);
    sqlite3_finalize(s);
    sqlite3_close(db);
    return n;
}

inline void execSql(const QString &path, const char *sql)
{
    sqlite3 *db = nullptr;
    REQUIRE(sqlite3_open_v2(path.toUtf8().constData(), &db, SQLITE_OPEN_READWRITE, nullptr)
        == SQLITE_OK);
    char *message = nullptr;
    const int rc = sqlite3_exec(db, sql, nullptr, nullptr, &message);
    INFO((message ? message : ""));
    sqlite3_free(message);
    sqlite3_close(db);
    REQUIRE(rc == SQLITE_OK);
}

// execSql with a QString.
inline void execSql(const QString &path, const QString &sql)
{
    execSql(path, sql.toUtf8().constData());
}

// The open and resolved conflicts without what differs between runs (their uuid and time).
inline QString conflictDump(const QString &path)
{
    sqlite3 *db = nullptr;
    REQUIRE(sqlite3_open_v2(path.toUtf8().constData(), &db, SQLITE_OPEN_READONLY, nullptr)
        == SQLITE_OK);
    sqlite3_stmt *s = nullptr;
    REQUIRE(sqlite3_prepare_v2(db,
                "SELECT object_type, object_uuid, copy_uuid, mine, theirs, resolution "
                "FROM merge_conflict ORDER BY object_type, object_uuid, theirs",
                -1, &s, nullptr)
        == SQLITE_OK);
    QString dump;
    while (sqlite3_step(s) == SQLITE_ROW) {
        for (int c = 0; c < 6; ++c)
            dump += QString::fromUtf8(reinterpret_cast<const char *>(sqlite3_column_text(s, c)))
                + QLatin1Char('|');
        dump += QLatin1Char('\n');
    }
    sqlite3_finalize(s);
    sqlite3_close(db);
    return dump;
}

} // namespace fourfold::test
