#pragma once
// Project: the one facade both front ends use (design.md §2). A project is one SQLite file;
// every change is committed at once through an Edit or an import, so there is no Save.

#include "core/io/article_reader.h"
#include "core/model/annotation.h"
#include "core/model/article.h"
#include "core/model/codebook.h"
#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/model/gold_judgement.h"
#include "core/model/project_counts.h"
#include "core/project/import_report.h"
#include "core/project/integrity_report.h"

#include <QString>
#include <QStringList>

#include <functional>
#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Database;
class Edit;

class Project
{
public:
    struct Settings {
        QString name; // shown in window titles and reports
        QString defaultLanguage = QStringLiteral("en"); // BCP 47, for articles naming none
    };

    // Creates a new project file at `path` with the default codebook. Fails with Duplicate if
    // the file exists, Io if it cannot be written; a failed creation leaves no file behind.
    static Result<Project> create(const QString &path, const Settings &settings);
    static Result<Project> create(const QString &path) { return create(path, Settings {}); }
    // Opens an existing project file. NotFound if there is none; Corrupt if it is not a
    // Fourfold project; NewerSchema if a newer Fourfold wrote it (the file is not touched); an
    // older file is backed up (see backupPath()) and upgraded.
    static Result<Project> open(const QString &path);
    // Opens an existing project file for a command that only reads it (check, info, agree,
    // export, report): as open() where this process may write the file and its folder, and
    // read-only otherwise (a read-only file, folder or mount), writing nothing. A file at an
    // older schema is opened with open() and upgraded (it needs write permission then). Fails
    // as open() does; a change through a read-only project fails with Io.
    static Result<Project> openForReading(const QString &path);
    // True when the file was opened read-only (openForReading on a file this process may not
    // write): every change then fails.
    bool isReadOnly() const;
    // The schema version this program writes (older files are migrated up to it when opened).
    static int schemaVersion();

    Project(Project &&) noexcept;
    Project &operator=(Project &&) noexcept;
    ~Project();

    QString path() const;
    // Where the pre-upgrade copy went if open() upgraded the file; empty otherwise.
    QString backupPath() const { return m_backupPath; }
    Settings settings() const { return m_settings; }

    // --- articles -------------------------------------------------------------------------
    // Told the bytes of the file read so far and the file's size (ReadProgress); returning false
    // cancels.
    using ImportProgress = std::function<bool(qint64 bytesRead, qint64 totalBytes)>;
    // Reads `path` (see forEachArticle) and adds its articles in one transaction as they are
    // read, one at a time: texts are made canonical, hashed and segmented. Articles whose text
    // is already in the project (same SHA-256) are skipped and listed in the report. All-or-
    // nothing: on any error (including an external id that is already in the project with
    // another text, or a bad line after many good ones) nothing is added. `progress`, if given,
    // is called after each article; returning false cancels (Cancelled). Added articles close to
    // one already there are near copies (ImportOptions::nearCopyThreshold, near_copy_check.h). A
    // folder `path` is read with its subfolders, every file by its own format, as one import:
    // any refused file makes it fail (InvalidInput, the message listing every file with its
    // articles or why it was refused); files of no known format are passed over and listed.
    Result<ImportReport> importFile(
        const QString &path, const ImportOptions &options, const ImportProgress &progress = {});

    Result<std::vector<ArticleSummary>> articles() const;
    Result<Article> article(ArticleId id) const;
    // One segmentation of every article, streamed in article id order from one statement (see
    // store::forEachSegmentation): what a table of units over thousands of articles reads.
    Status forEachSegmentation(SegmentKind kind,
        const std::function<Status(ArticleId, std::vector<TextRange> &&)> &visit) const;
    Result<std::optional<ArticleId>> articleByExternalId(const QString &externalId) const;
    // Full-text search over titles and texts (SQLite FTS5 syntax), best match first.
    Result<std::vector<ArticleId>> searchArticles(const QString &query) const;

    // --- coders and codebook --------------------------------------------------------------
    // Adds a coder for a program building a project (tests, build-sample, W3C import); never a
    // lead (NotAllowed, nothing written: leads come through People, people.h). Duplicate if the
    // pseudonym is taken, InvalidArgument if name or pseudonym is empty.
    Result<CoderId> addCoder(const QString &name, const QString &pseudonym, CoderRole role);
    Result<std::vector<Coder>> coders() const;
    Result<std::optional<Coder>> coderByPseudonym(const QString &pseudonym) const;
    // The current codebook version.
    Result<Codebook> codebook() const;
    Status assign(ArticleId article, CoderId coder, Phase phase);

    // --- annotations ----------------------------------------------------------------------
    Result<std::vector<Annotation>> annotations(
        ArticleId article, std::optional<CoderId> coder = std::nullopt) const;
    Result<Annotation> annotation(AnnotationId id) const;
    Result<std::vector<AnnotationLink>> links(ArticleId article) const;
    Result<std::vector<Judgement>> judgements(ArticleId article) const;
    // The live gold spans of an article (of every article when `article` is invalid).
    Result<std::vector<GoldAnnotation>> goldAnnotations(ArticleId article = {}) const;
    // The live rejections of coders' spans of an article (every article when invalid).
    Result<std::vector<GoldRejection>> goldRejections(ArticleId article = {}) const;
    // The live gold answers to article-level items of an article (every article when invalid),
    // by article, item and id: at most one per article and item (gold_answer_edits.h).
    Result<std::vector<GoldJudgement>> goldJudgements(ArticleId article = {}) const;
    // Every live annotation / judgement / assignment of the project (for reliability work).
    Result<std::vector<Annotation>> allAnnotations() const;
    // The distinct values of the text attribute `key` on live spans of any function, most used
    // first (ties by value): what a field offers to complete. With `coder`, only that coder's own
    // spans — a coder never sees another coder's values — else every coder's and gold.
    Result<QStringList> attributeValues(
        const QString &key, std::optional<CoderId> coder = std::nullopt) const;
    // The same annotations (by article, coder, start) and the live gold spans (by article, start,
    // without their sources), handed over one at a time: one statement each, one row held.
    Status forEachAnnotation(const std::function<Status(Annotation &&)> &visit) const;
    // The same as outlines (id, article, coder, function, range, attributes, phase, creation
    // time; the rest empty): what comparing every article's spans needs.
    Status forEachAnnotationOutline(const std::function<Status(Annotation &&)> &visit) const;
    Status forEachGoldAnnotation(const std::function<Status(GoldAnnotation &&)> &visit) const;
    Result<std::vector<Judgement>> allJudgements() const;
    Result<std::vector<Assignment>> assignments() const;
    // Every (coder, phase) holding at least one live span, once: who coded what, without
    // reading the spans.
    Result<std::vector<std::pair<CoderId, Phase>>> spanCoderPhases() const;
    // The live assignments of `coder` on `article`, in any phase (one indexed query).
    Result<std::vector<Assignment>> assignments(ArticleId article, CoderId coder) const;

    // Adds `seconds` of active coding time to the coder's first assignment of the article (no
    // assignment: nothing is recorded). Not an edit: time is not undone.
    Status addCodingTime(ArticleId article, CoderId coder, qint64 seconds);

    // Applies `edit` in one savepoint and logs it: committed at once or not at all.
    Status apply(Edit &edit);
    // Reverts an applied `edit` the same way (logged as an undo).
    Status revert(Edit &edit);
    // Runs `work` (which may apply many edits) as one unit: if it fails, everything it wrote is
    // rolled back and its error returned.
    Status batch(const std::function<Status()> &work);
    // Applies and logs `edit` inside the running batch() without a savepoint of its own, for
    // imports of many rows that give up at their first failure: a failed edit may leave partial
    // writes, so its failure also fails the batch (rolled back with that error even if `work`
    // goes on and returns success). Internal if no batch is running.
    Status applyInBatch(Edit &edit);

    // --- overview -------------------------------------------------------------------------
    Result<ProjectCounts> counts() const;
    // Checks the file (see IntegrityReport). Fails only if the checks themselves cannot run.
    Result<IntegrityReport> check() const;
    // SQLite's quick check of the file, made before an import writes into it: Corrupt naming the
    // file when it is damaged (see store::quickCheck). Takes time in proportion to the file.
    Status checkBeforeImport() const;

private:
    // Facades of core that sit beside Project and share its connection (design.md §2).
    friend class ExtractorRuns;
    friend class CoderCopies;
    friend class AssignmentPlans;
    friend class SubsampleDraw;
    friend class CodebookVersions;
    friend class OutdatedAnnotations;
    friend class Training;
    friend class StudyProgress;
    friend class CodingScope;
    friend class TeamProject;
    friend class People;
    friend class NearCopies;
    friend class SavedFrames;
    // Tests reach the connection through core/project/testing/project_database.h.
    friend struct ProjectTestAccess;

    explicit Project(Database db);
    Status loadSettings();
    // The connection; the store's Database is private to core, so it is held behind a pointer
    // and front ends that include this header never see its definition.
    Database &db() { return *m_db; }
    const Database &db() const { return *m_db; }

    std::unique_ptr<Database> m_db;
    Settings m_settings;
    QString m_backupPath;
    int m_batchDepth = 0;
    std::optional<Error> m_batchError; // set by a failed applyInBatch() of the innermost batch
};

} // namespace fourfold
