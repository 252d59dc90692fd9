#include "core/store/article_table.h"

#include "core/store/range_blob.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold::store {

namespace {

const QString kSummaryColumns =
    QStringLiteral("id, uuid, external_id, title, outlet, published, language, length, sha256");

ArticleSummary readSummary(const Statement &s)
{
    ArticleSummary a;
    a.id = ArticleId {s.columnInt(0)};
    a.uuid = s.columnText(1);
    a.externalId = s.columnText(2);
    a.title = s.columnText(3);
    a.outlet = s.columnText(4);
    a.published = s.columnText(5);
    a.language = s.columnText(6);
    a.length = s.columnInt(7);
    a.sha256 = s.columnText(8);
    return a;
}

Result<std::optional<ArticleId>> idWhere(
    const Database &db, const QString &column, const QString &value)
{
    // `column` is one of two fixed names chosen in this file, never user text.
    auto stmt = db.prepare(
        QStringLiteral("SELECT id FROM article WHERE %1 = ?1 AND deleted = 0").arg(column));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return std::optional<ArticleId> {};
    return std::optional<ArticleId> {ArticleId {stmt->columnInt(0)}};
}

} // namespace

Result<ArticleId> insertArticle(Database &db, const Article &a)
{
    auto stmt = db.prepare(QStringLiteral(
        "INSERT INTO article (uuid, external_id, title, outlet, published, language, text, length, "
        "sha256, metadata, source, imported_at) VALUES (?1, ?2, ?3, ?4, ?5, ?6, ?7, ?8, ?9, ?10, "
        "?11, ?12)"));
    if (!stmt)
        return std::unexpected(stmt.error());
    const ArticleSummary &s = a.summary;
    stmt->bind(1, s.uuid.isEmpty() ? newUuid() : s.uuid)
        .bind(2, s.externalId)
        .bind(3, s.title)
        .bind(4, s.outlet)
        .bind(5, s.published)
        .bind(6, s.language)
        .bind(7, a.text)
        .bind(8, s.length)
        .bind(9, s.sha256)
        .bind(10, toJsonText(a.metadata))
        .bind(11, a.source)
        .bind(12, now());
    if (auto st = stmt->run(); !st) {
        Error e = st.error();
        if (e.code == ErrorCode::Constraint) {
            e.code = ErrorCode::Duplicate;
            e.message = QCoreApplication::translate(
                "ArticleTable", "The article \"%1\" is already in the project.")
                            .arg(s.externalId);
        }
        return std::unexpected(e);
    }
    const ArticleId id {db.lastInsertRowId()};

    auto para = db.prepare(QStringLiteral(
        "INSERT INTO paragraph (article_id, idx, start, end, role) VALUES (?1, ?2, ?3, ?4, ?5)"));
    if (!para)
        return std::unexpected(para.error());
    for (size_t i = 0; i < a.paragraphs.size(); ++i) {
        const Paragraph &p = a.paragraphs[i];
        para->bind(1, id.value)
            .bind(2, qint64(i))
            .bind(3, p.range.start)
            .bind(4, p.range.end)
            .bind(5, paragraphRoleKey(p.role));
        FOURFOLD_TRY_STATUS(para->run());
    }
    auto units = db.prepare(QStringLiteral(
        "INSERT INTO article_units (article_id, sentence_count, token_count, sentences, tokens) "
        "VALUES (?1, ?2, ?3, ?4, ?5)"));
    if (!units)
        return std::unexpected(units.error());
    units->bind(1, id.value)
        .bind(2, qint64(a.sentences.size()))
        .bind(3, qint64(a.tokens.size()))
        .bind(4, encodeRanges(a.sentences))
        .bind(5, encodeRanges(a.tokens));
    FOURFOLD_TRY_STATUS(units->run());
    return id;
}

Result<std::vector<ArticleSummary>> articleSummaries(const Database &db)
{
    auto stmt = db.prepare(QStringLiteral("SELECT %1 FROM article WHERE deleted = 0 ORDER BY id")
                               .arg(kSummaryColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    return collectRows(*stmt, readSummary);
}

Result<Article> article(const Database &db, ArticleId id)
{
    auto stmt =
        db.prepare(QStringLiteral("SELECT %1, text, metadata, source FROM article WHERE id = ?1")
                       .arg(kSummaryColumns));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ArticleTable", "There is no article #%1 in the project.")
                .arg(id.value));
    Article a;
    a.summary = readSummary(*stmt);
    a.text = stmt->columnText(9);
    a.metadata = fromJsonText(stmt->columnText(10));
    a.source = stmt->columnText(11);

    auto para = db.prepare(QStringLiteral(
        "SELECT start, end, role FROM paragraph WHERE article_id = ?1 ORDER BY idx"));
    if (!para)
        return std::unexpected(para.error());
    para->bind(1, id.value);
    while (true) {
        auto prow = para->step();
        if (!prow)
            return std::unexpected(prow.error());
        if (!*prow)
            break;
        a.paragraphs.push_back(Paragraph {TextRange {para->columnInt(0), para->columnInt(1)},
            paragraphRoleFromKey(para->columnText(2)).value_or(ParagraphRole::Body)});
    }
    auto units = db.prepare(
        QStringLiteral("SELECT sentences, tokens FROM article_units WHERE article_id = ?1"));
    if (!units)
        return std::unexpected(units.error());
    units->bind(1, id.value);
    auto urow = units->step();
    if (!urow)
        return std::unexpected(urow.error());
    if (*urow) {
        auto sentences = decodeRanges(units->columnBlob(0));
        auto tokens = decodeRanges(units->columnBlob(1));
        if (!sentences)
            return std::unexpected(sentences.error());
        if (!tokens)
            return std::unexpected(tokens.error());
        a.sentences = std::move(*sentences);
        a.tokens = std::move(*tokens);
    }
    return a;
}

Status forEachSegmentation(const Database &db, SegmentKind kind,
    const std::function<Status(ArticleId, std::vector<TextRange> &&)> &visit)
{
    if (kind == SegmentKind::Paragraphs) {
        auto stmt = db.prepare(QStringLiteral(
            "SELECT article_id, start, end FROM paragraph ORDER BY article_id, idx"));
        if (!stmt)
            return std::unexpected(stmt.error());
        std::vector<TextRange> ranges;
        qint64 current = 0;
        while (true) {
            auto row = stmt->step();
            if (!row)
                return std::unexpected(row.error());
            const qint64 article = *row ? stmt->columnInt(0) : 0;
            if (!ranges.empty() && (!*row || article != current))
                FOURFOLD_TRY_STATUS(visit(ArticleId {current}, std::move(ranges)));
            if (!*row)
                return {};
            if (article != current)
                ranges.clear();
            current = article;
            ranges.push_back(TextRange {stmt->columnInt(1), stmt->columnInt(2)});
        }
    }
    auto stmt = db.prepare(QStringLiteral("SELECT article_id, %1 FROM article_units ORDER BY "
                                          "article_id")
                               .arg(kind == SegmentKind::Sentences ? QStringLiteral("sentences")
                                                                   : QStringLiteral("tokens")));
    if (!stmt)
        return std::unexpected(stmt.error());
    while (true) {
        auto row = stmt->step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            return {};
        auto ranges = decodeRanges(stmt->columnBlob(1));
        if (!ranges)
            return std::unexpected(ranges.error());
        if (!ranges->empty())
            FOURFOLD_TRY_STATUS(visit(ArticleId {stmt->columnInt(0)}, std::move(*ranges)));
    }
}

Result<ArticleSlice> articleSlice(const Database &db, ArticleId id, const TextRange &range)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT length, substr(text, ?2 + 1, ?3) FROM article WHERE id = ?1"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, id.value).bind(2, range.start).bind(3, range.end - range.start);
    auto row = stmt->step();
    if (!row)
        return std::unexpected(row.error());
    if (!*row)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ArticleTable", "There is no article #%1 in the project.")
                .arg(id.value));
    return ArticleSlice {stmt->columnInt(0), stmt->columnText(1)};
}

Result<std::optional<ArticleId>> articleIdByExternalId(
    const Database &db, const QString &externalId)
{
    return idWhere(db, QStringLiteral("external_id"), externalId);
}

Result<std::optional<ArticleId>> articleIdBySha256(const Database &db, const QString &sha256)
{
    return idWhere(db, QStringLiteral("sha256"), sha256);
}

Result<std::vector<ArticleId>> searchArticles(const Database &db, const QString &query)
{
    auto stmt = db.prepare(
        QStringLiteral("SELECT a.id FROM article_fts JOIN article a ON a.id = article_fts.rowid "
                       "WHERE article_fts MATCH ?1 AND a.deleted = 0 ORDER BY rank"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, query);
    std::vector<ArticleId> out;
    while (true) {
        auto row = stmt->step();
        if (!row) {
            Error e = row.error();
            e.code = ErrorCode::InvalidArgument;
            e.message = QCoreApplication::translate(
                "ArticleTable", "The search \"%1\" could not be understood.")
                            .arg(query);
            return std::unexpected(e);
        }
        if (!*row)
            break;
        out.push_back(ArticleId {stmt->columnInt(0)});
    }
    return out;
}

Status setParagraphRole(Database &db, ArticleId article, qsizetype index, ParagraphRole role)
{
    auto stmt = db.prepare(
        QStringLiteral("UPDATE paragraph SET role = ?3 WHERE article_id = ?1 AND idx = ?2"));
    if (!stmt)
        return std::unexpected(stmt.error());
    stmt->bind(1, article.value).bind(2, qint64(index)).bind(3, paragraphRoleKey(role));
    FOURFOLD_TRY_STATUS(stmt->run());
    if (db.changes() != 1)
        return fail(ErrorCode::NotFound,
            QCoreApplication::translate("ArticleTable", "Article #%1 has no paragraph %2.")
                .arg(article.value)
                .arg(index + 1));
    return {};
}

} // namespace fourfold::store
