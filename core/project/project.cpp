#include "core/project/project.h"

#include "core/model/logging.h"
#include "core/project/edit.h"
#include "core/store/annotation_table.h"
#include "core/store/article_table.h"
#include "core/store/codebook_table.h"
#include "core/store/coder_table.h"
#include "core/store/event_log.h"
#include "core/store/gold_table.h"
#include "core/store/project_tables.h"
#include "core/store/savepoint.h"
#include "core/store/schema.h"
#include "core/store/store_util.h"
#include "core/store/study_tables.h"

#include <QCoreApplication>
#include <QFile>
#include <QFileInfo>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ProjectText {
    Q_DECLARE_TR_FUNCTIONS(ProjectText)
};

const QString kNameKey = QStringLiteral("name");
const QString kLanguageKey = QStringLiteral("default_language");
const QString kUuidKey = QStringLiteral("project_uuid");

Result<Codebook> defaultCodebook()
{
    QFile file(QStringLiteral(":/fourfold/codebook/default_codebook.json"));
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Internal,
            ProjectText::tr("The default codebook is missing from this build."));
    return Codebook::fromJson(file.readAll(), file.fileName());
}

void removeProjectFiles(const QString &path)
{
    for (const char *suffix : {"", "-wal", "-shm"})
        QFile::remove(path + QLatin1String(suffix));
}

} // namespace

Result<Project> Project::create(const QString &path, const Settings &settings)
{
    if (QFileInfo::exists(path))
        return fail(ErrorCode::Duplicate,
            ProjectText::tr("%1 already exists; choose another name or open it.").arg(path));
    auto book = defaultCodebook();
    if (!book)
        return std::unexpected(book.error());
    auto db = Database::open(path, Database::OpenMode::ReadWriteCreate);
    if (!db)
        return std::unexpected(db.error());
    Project project(std::move(*db));
    auto build = [&]() -> Status {
        FOURFOLD_TRY_STATUS(prepareSchema(project.m_db));
        FOURFOLD_TRY_STATUS(project.m_db.exec(QStringLiteral("BEGIN IMMEDIATE")));
        auto body = [&]() -> Status {
            FOURFOLD_TRY_STATUS(store::setSetting(project.m_db, kNameKey,
                settings.name.isEmpty() ? QFileInfo(path).completeBaseName() : settings.name));
            FOURFOLD_TRY_STATUS(store::setSetting(project.m_db, kLanguageKey,
                settings.defaultLanguage.isEmpty() ? QStringLiteral("en")
                                                   : settings.defaultLanguage));
            FOURFOLD_TRY_STATUS(store::setSetting(project.m_db, kUuidKey, store::newUuid()));
            auto version = store::insertCodebookVersion(
                project.m_db, *book, ProjectText::tr("Default codebook"));
            if (!version)
                return std::unexpected(version.error());
            return store::appendEvent(project.m_db, CoderId {}, QStringLiteral("project.create"),
                QStringLiteral("project"), QString());
        };
        if (auto st = body(); !st) {
            (void)project.m_db.exec(QStringLiteral("ROLLBACK"));
            return st;
        }
        return project.m_db.exec(QStringLiteral("COMMIT"));
    };
    if (auto st = build(); !st) {
        project.m_db = Database();
        removeProjectFiles(path);
        return std::unexpected(st.error());
    }
    FOURFOLD_TRY_STATUS(project.loadSettings());
    return project;
}

Result<Project> Project::open(const QString &path)
{
    if (!QFileInfo::exists(path))
        return fail(ErrorCode::NotFound, ProjectText::tr("There is no project file %1.").arg(path));
    auto db = Database::open(path, Database::OpenMode::ReadWrite);
    if (!db)
        return std::unexpected(db.error());
    Project project(std::move(*db));
    FOURFOLD_TRY_STATUS(prepareSchema(project.m_db, &project.m_backupPath));
    FOURFOLD_TRY_STATUS(project.loadSettings());
    return project;
}

Status Project::loadSettings()
{
    auto name = store::setting(m_db, kNameKey);
    if (!name)
        return std::unexpected(name.error());
    auto language = store::setting(m_db, kLanguageKey);
    if (!language)
        return std::unexpected(language.error());
    m_settings.name = name->value_or(QFileInfo(m_db.path()).completeBaseName());
    m_settings.defaultLanguage = language->value_or(QStringLiteral("en"));
    return {};
}

Result<std::vector<ArticleSummary>> Project::articles() const
{
    return store::articleSummaries(m_db);
}

Result<Article> Project::article(ArticleId id) const
{
    return store::article(m_db, id);
}

int Project::schemaVersion()
{
    return kSchemaVersion;
}

Status Project::forEachSegmentation(SegmentKind kind,
    const std::function<Status(ArticleId, std::vector<TextRange> &&)> &visit) const
{
    return store::forEachSegmentation(m_db, kind, visit);
}

Status Project::forEachAnnotation(const std::function<Status(Annotation &&)> &visit) const
{
    return store::forEachAnnotation(m_db, visit);
}

Result<std::vector<std::pair<CoderId, Phase>>> Project::spanCoderPhases() const
{
    return store::spanCoderPhases(m_db);
}

Status Project::forEachAnnotationOutline(const std::function<Status(Annotation &&)> &visit) const
{
    return store::forEachAnnotationOutline(m_db, visit);
}

Status Project::forEachGoldAnnotation(const std::function<Status(GoldAnnotation &&)> &visit) const
{
    return store::forEachGoldAnnotation(m_db, visit);
}

Result<std::optional<ArticleId>> Project::articleByExternalId(const QString &externalId) const
{
    return store::articleIdByExternalId(m_db, externalId);
}

Result<std::vector<ArticleId>> Project::searchArticles(const QString &query) const
{
    return store::searchArticles(m_db, query);
}

Result<CoderId> Project::addCoder(const QString &name, const QString &pseudonym, CoderRole role)
{
    if (name.trimmed().isEmpty() || pseudonym.trimmed().isEmpty())
        return fail(
            ErrorCode::InvalidArgument, ProjectText::tr("A coder needs a name and a pseudonym."));
    auto sp = Savepoint::begin(m_db);
    if (!sp)
        return std::unexpected(sp.error());
    Coder coder;
    coder.uuid = store::newUuid();
    coder.name = name.trimmed();
    coder.pseudonym = pseudonym.trimmed();
    coder.role = role;
    auto id = store::insertCoder(m_db, coder);
    if (!id)
        return std::unexpected(id.error());
    FOURFOLD_TRY_STATUS(
        store::appendEvent(m_db, CoderId {}, QStringLiteral("coder.add"), QStringLiteral("coder"),
            coder.uuid, QJsonObject {{QStringLiteral("pseudonym"), coder.pseudonym}}));
    FOURFOLD_TRY_STATUS(sp->commit());
    return id;
}

Result<std::vector<Coder>> Project::coders() const
{
    return store::coders(m_db);
}

Result<std::optional<Coder>> Project::coderByPseudonym(const QString &pseudonym) const
{
    auto all = store::coders(m_db);
    if (!all)
        return std::unexpected(all.error());
    for (const Coder &c : *all)
        if (c.pseudonym == pseudonym)
            return std::optional<Coder> {c};
    return std::optional<Coder> {};
}

Result<Codebook> Project::codebook() const
{
    return store::currentCodebook(m_db);
}

Status Project::assign(ArticleId article, CoderId coder, Phase phase)
{
    auto people = store::coders(m_db);
    if (!people)
        return std::unexpected(people.error());
    const auto who = std::ranges::find(*people, coder, &Coder::id);
    if (who != people->end() && who->disabled)
        return fail(ErrorCode::InvalidArgument,
            ProjectText::tr("%1 is disabled and takes no new assignments; enable them first.")
                .arg(who->pseudonym));
    auto sp = Savepoint::begin(m_db);
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(store::insertAssignment(m_db, article, coder, phase));
    FOURFOLD_TRY_STATUS(store::appendEvent(m_db, CoderId {}, QStringLiteral("assignment.add"),
        QStringLiteral("assignment"), QString(),
        QJsonObject {{QStringLiteral("article"), article.value},
            {QStringLiteral("coder"), coder.value}, {QStringLiteral("phase"), phaseKey(phase)}}));
    return sp->commit();
}

Result<std::vector<Annotation>> Project::annotations(
    ArticleId article, std::optional<CoderId> coder) const
{
    return store::annotations(m_db, article, coder);
}

Result<Annotation> Project::annotation(AnnotationId id) const
{
    return store::annotation(m_db, id);
}

Result<std::vector<AnnotationLink>> Project::links(ArticleId article) const
{
    return store::links(m_db, article);
}

Result<std::vector<Judgement>> Project::judgements(ArticleId article) const
{
    return store::judgements(m_db, article);
}

Result<std::vector<GoldAnnotation>> Project::goldAnnotations(ArticleId article) const
{
    return store::goldAnnotations(m_db, article);
}

Result<std::vector<GoldRejection>> Project::goldRejections(ArticleId article) const
{
    return store::goldRejections(m_db, article);
}

Result<std::vector<Annotation>> Project::allAnnotations() const
{
    return store::allAnnotations(m_db);
}

Result<std::vector<Judgement>> Project::allJudgements() const
{
    return store::allJudgements(m_db);
}

Result<std::vector<Assignment>> Project::assignments() const
{
    return store::assignments(m_db);
}

Result<std::vector<Assignment>> Project::assignments(ArticleId article, CoderId coder) const
{
    return store::coderAssignments(m_db, article, coder);
}

Status Project::addCodingTime(ArticleId article, CoderId coder, qint64 seconds)
{
    if (seconds <= 0)
        return {};
    auto all = store::assignments(m_db);
    if (!all)
        return std::unexpected(all.error());
    for (const Assignment &a : *all)
        if (a.article == article && a.coder == coder)
            return store::addAssignmentSeconds(m_db, article, coder, a.phase, seconds);
    return {};
}

Status Project::apply(Edit &edit)
{
    auto sp = Savepoint::begin(m_db);
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(edit.apply(m_db));
    FOURFOLD_TRY_STATUS(store::appendEvent(
        m_db, edit.actor(), edit.action(), edit.objectType(), edit.objectUuid()));
    return sp->commit();
}

Status Project::revert(Edit &edit)
{
    auto sp = Savepoint::begin(m_db);
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(edit.revert(m_db));
    FOURFOLD_TRY_STATUS(store::appendEvent(m_db, edit.actor(),
        QStringLiteral("undo:") + edit.action(), edit.objectType(), edit.objectUuid()));
    return sp->commit();
}

Status Project::batch(const std::function<Status()> &work)
{
    auto sp = Savepoint::begin(m_db);
    if (!sp)
        return std::unexpected(sp.error());
    std::optional<Error> outerError = std::exchange(m_batchError, std::nullopt);
    ++m_batchDepth;
    Status st = work();
    --m_batchDepth;
    std::optional<Error> failedEdit = std::exchange(m_batchError, std::move(outerError));
    FOURFOLD_TRY_STATUS(st);
    if (failedEdit)
        return std::unexpected(*failedEdit);
    return sp->commit();
}

Status Project::applyInBatch(Edit &edit)
{
    if (!FOURFOLD_SOFT_ASSERT(lcProject(), m_batchDepth > 0))
        return fail(ErrorCode::Internal,
            ProjectText::tr("An edit without its own savepoint needs a batch."));
    Status st = edit.apply(m_db);
    if (st)
        st = store::appendEvent(
            m_db, edit.actor(), edit.action(), edit.objectType(), edit.objectUuid());
    if (!st && !m_batchError)
        m_batchError = st.error();
    return st;
}

Result<ProjectCounts> Project::counts() const
{
    return store::projectCounts(m_db);
}

} // namespace fourfold
