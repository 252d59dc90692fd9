#include "core/store/frame_table.h"

#include "core/store/store_util.h"

#include <QCoreApplication>
#include <QHash>

namespace fourfold::store {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct FrameTableText {
    Q_DECLARE_TR_FUNCTIONS(FrameTableText)
};

const QString kAnalysisColumns = QStringLiteral("id, uuid, name, created_at, created_by, settings");

SavedFrameAnalysis readAnalysis(const Statement &row)
{
    SavedFrameAnalysis a;
    a.uuid = row.columnText(1);
    a.name = row.columnText(2);
    a.createdAt = row.columnText(3);
    a.createdBy = CoderId {row.columnIsNull(4) ? 0 : row.columnInt(4)};
    a.settings = fromJsonText(row.columnText(5));
    return a;
}

Status notFound(const QString &uuid)
{
    return fail(
        ErrorCode::NotFound, FrameTableText::tr("There is no saved frame analysis %1.").arg(uuid));
}

// The row id of analysis `uuid`, or NotFound.
Result<qint64> analysisRow(const Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral("SELECT id FROM frame_analysis WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::unexpected(notFound(uuid).error());
    return stmt->columnInt(0);
}

// Reads the frames and members of the analysis in row `id` into `a`.
Status readWhole(const Database &db, qint64 id, SavedFrameAnalysis &a)
{
    auto frames = db.prepare(QStringLiteral("SELECT cluster, name, profile FROM frame_cluster "
                                            "WHERE analysis_id = ?1 ORDER BY cluster"));
    if (!frames)
        return std::unexpected(frames.error());
    frames->bind(1, id);
    auto read = collectRows(*frames, [](const Statement &row) {
        return SavedFrame {
            int(row.columnInt(0)), row.columnText(1), fromJsonText(row.columnUtf8(2))};
    });
    if (!read)
        return std::unexpected(read.error());
    a.frames = std::move(*read);
    auto members = db.prepare(QStringLiteral("SELECT article_id, cluster FROM frame_member "
                                             "WHERE analysis_id = ?1 ORDER BY article_id"));
    if (!members)
        return std::unexpected(members.error());
    members->bind(1, id);
    auto rows = collectRows(*members, [](const Statement &row) {
        return std::pair {ArticleId {row.columnInt(0)}, int(row.columnInt(1))};
    });
    if (!rows)
        return std::unexpected(rows.error());
    a.members = std::move(*rows);
    a.memberCount = qint64(a.members.size());
    return {};
}

Result<std::optional<SavedFrameAnalysis>> oneAnalysis(
    const Database &db, const QString &where, const QString &value)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT %1 FROM frame_analysis WHERE %2").arg(kAnalysisColumns, where));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::optional<SavedFrameAnalysis> {};
    SavedFrameAnalysis a = readAnalysis(*stmt);
    const qint64 id = stmt->columnInt(0);
    FOURFOLD_TRY_STATUS(readWhole(db, id, a));
    return std::optional<SavedFrameAnalysis> {std::move(a)};
}

} // namespace

Status insertFrameAnalysis(Database &db, const SavedFrameAnalysis &analysis)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO frame_analysis (uuid, name, created_at, created_by, settings, deleted) "
        "VALUES (?1, ?2, ?3, ?4, ?5, 0)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, analysis.uuid)
        .bind(2, analysis.name)
        .bind(3, analysis.createdAt)
        .bind(5, toJsonText(analysis.settings));
    if (analysis.createdBy.isValid())
        stmt->bind(4, analysis.createdBy.value);
    else
        stmt->bindNull(4);
    FOURFOLD_TRY_STATUS(stmt->run());
    const qint64 id = db.lastInsertRowId();
    auto frame = db.prepare(QStringLiteral(
        "INSERT INTO frame_cluster (analysis_id, cluster, name, profile) VALUES (?1, ?2, ?3, ?4)"));
    if (!frame)
        return std::unexpected(frame.error());
    for (const SavedFrame &f : analysis.frames) {
        frame->bind(1, id).bind(2, f.cluster).bind(3, f.name).bind(4, toJsonText(f.profile));
        FOURFOLD_TRY_STATUS(frame->run());
    }
    auto member = db.prepare(QStringLiteral(
        "INSERT INTO frame_member (analysis_id, article_id, cluster) VALUES (?1, ?2, ?3)"));
    if (!member)
        return std::unexpected(member.error());
    for (const auto &[article, cluster] : analysis.members) {
        member->bind(1, id).bind(2, article.value).bind(3, cluster);
        FOURFOLD_TRY_STATUS(member->run());
    }
    return {};
}

Status removeFrameAnalysis(Database &db, const QString &uuid)
{
    auto id = analysisRow(db, uuid);
    if (!id)
        return std::unexpected(id.error());
    for (const char *sql : {"DELETE FROM frame_member WHERE analysis_id = ?1",
             "DELETE FROM frame_cluster WHERE analysis_id = ?1",
             "DELETE FROM frame_analysis WHERE id = ?1"}) {
        auto stmt = db.prepare(QString::fromLatin1(sql));
        if (!stmt)
            return std::unexpected(stmt.error());
        stmt->bind(1, *id);
        FOURFOLD_TRY_STATUS(stmt->run());
    }
    return {};
}

Status setFrameAnalysisDeleted(Database &db, const QString &uuid, bool deleted)
{
    auto stmt =
        db.prepare(QStringLiteral("UPDATE frame_analysis SET deleted = ?2 WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid).bind(2, deleted ? 1 : 0);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() == 0)
        return notFound(uuid);
    return {};
}

Status setFrameName(Database &db, const QString &uuid, int cluster, const QString &name)
{
    auto stmt = db.prepare(
        QStringLiteral("UPDATE frame_cluster SET name = ?3 WHERE cluster = ?2 AND analysis_id = "
                       "(SELECT id FROM frame_analysis WHERE uuid = ?1)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid).bind(2, cluster).bind(3, name);
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() == 0)
        return fail(ErrorCode::NotFound,
            FrameTableText::tr("The saved frame analysis %1 has no frame %2.")
                .arg(uuid)
                .arg(cluster + 1));
    return {};
}

Result<std::vector<SavedFrameAnalysis>> frameAnalyses(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM frame_analysis WHERE deleted = 0 "
                                          "ORDER BY created_at, id")
                               .arg(kAnalysisColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    std::vector<qint64> ids;
    auto analyses = collectRows(*stmt, [&ids](const Statement &row) {
        ids.push_back(row.columnInt(0));
        return readAnalysis(row);
    });
    if (!analyses)
        return std::unexpected(analyses.error());
    QHash<qint64, size_t> index;
    for (size_t i = 0; i < ids.size(); ++i)
        index.insert(ids[i], i);
    auto frames = db.prepare(
        QStringLiteral("SELECT c.analysis_id, c.cluster, c.name, c.profile FROM frame_cluster c "
                       "JOIN frame_analysis a ON a.id = c.analysis_id WHERE a.deleted = 0 "
                       "ORDER BY c.analysis_id, c.cluster"));
    if (!frames)
        return std::unexpected(frames.error());
    FOURFOLD_TRY_STATUS(forEachRow(
        *frames,
        [](const Statement &row) {
            return std::pair {row.columnInt(0),
                SavedFrame {
                    int(row.columnInt(1)), row.columnText(2), fromJsonText(row.columnUtf8(3))}};
        },
        [&](std::pair<qint64, SavedFrame> &&f) -> Status {
            if (index.contains(f.first))
                (*analyses)[index.value(f.first)].frames.push_back(std::move(f.second));
            return {};
        }));
    auto counts = db.prepare(
        QStringLiteral("SELECT m.analysis_id, count(*) FROM frame_member m JOIN frame_analysis a "
                       "ON a.id = m.analysis_id WHERE a.deleted = 0 GROUP BY m.analysis_id"));
    if (!counts)
        return std::unexpected(counts.error());
    FOURFOLD_TRY_STATUS(forEachRow(
        *counts,
        [](const Statement &row) {
            return std::pair {row.columnInt(0), row.columnInt(1)};
        },
        [&](std::pair<qint64, qint64> &&c) -> Status {
            if (index.contains(c.first))
                (*analyses)[index.value(c.first)].memberCount = c.second;
            return {};
        }));
    return analyses;
}

Result<std::optional<SavedFrameAnalysis>> frameAnalysisByUuid(
    const Database &db, const QString &uuid)
{
    return oneAnalysis(db, QStringLiteral("uuid = ?1"), uuid);
}

Result<std::optional<SavedFrameAnalysis>> frameAnalysisByName(
    const Database &db, const QString &name)
{
    return oneAnalysis(db, QStringLiteral("name = ?1 AND deleted = 0 ORDER BY id LIMIT 1"), name);
}

Result<std::optional<bool>> frameAnalysisDeleted(const Database &db, const QString &uuid)
{
    auto stmt = db.prepare(QStringLiteral("SELECT deleted FROM frame_analysis WHERE uuid = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, uuid);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::optional<bool> {};
    return std::optional<bool> {stmt->columnInt(0) != 0};
}

} // namespace fourfold::store
