#include "core/project/project.h"

#include "core/model/logging.h"
#include "core/project/edit.h"
#include "core/store/annotation_table.h"
#include "core/store/article_table.h"
#include "core/store/codebook_table.h"
#include "core/store/coder_table.h"
#include "core/store/database.h"
#include "core/store/event_log.h"
#include "core/store/gold_judgement_table.h"
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

Project::Project(Database db)
    : m_db(std::make_unique<Database>(std::move(db)))
{ }

Project::Project(Project &&) noexcept = default;
Project &Project::operator=(Project &&) noexcept = default;
Project::~Project() = default;

QString Project::path() const
{
    return db().path();
}

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
        FOURFOLD_TRY_STATUS(prepareSchema(project.db()));
        FOURFOLD_TRY_STATUS(project.db().exec(QStringLiteral("BEGIN IMMEDIATE")));
        auto body = [&]() -> Status {
            FOURFOLD_TRY_STATUS(store::setSetting(project.db(), kNameKey,
                settings.name.isEmpty() ? QFileInfo(path).completeBaseName() : settings.name));
            FOURFOLD_TRY_STATUS(store::setSetting(project.db(), kLanguageKey,
                settings.defaultLanguage.isEmpty() ? QStringLiteral("en")
                                                   : settings.defaultLanguage));
            FOURFOLD_TRY_STATUS(store::setSetting(project.db(), kUuidKey, store::newUuid()));
            auto version = store::insertCodebookVersion(
                project.db(), *book, ProjectText::tr("Default codebook"));
            if (!version)
                return std::unexpected(version.error());
            return store::appendEvent(project.db(), CoderId {}, QStringLiteral("project.create"),
                QStringLiteral("project"), QString());
        };
        if (auto st = body(); !st) {
            (void)project.db().exec(QStringLiteral("ROLLBACK"));
            return st;
        }
        return project.db().exec(QStringLiteral("COMMIT"));
    };
    if (auto st = build(); !st) {
        project.db() = Database();
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
    FOURFOLD_TRY_STATUS(prepareSchema(project.db(), &project.m_backupPath));
    FOURFOLD_TRY_STATUS(project.loadSettings());
    return project;
}

Status Project::loadSettings()
{
    auto name = store::setting(db(), kNameKey);
    if (!name)
        return std::unexpected(name.error());
    auto language = store::setting(db(), kLanguageKey);
    if (!language)
        return std::unexpected(language.error());
    m_settings.name = name->value_or(QFileInfo(db().path()).completeBaseName());
    m_settings.defaultLanguage = language->value_or(QStringLiteral("en"));
    return {};
}

Result<std::vector<ArticleSummary>> Project::articles() const
{
    return store::articleSummaries(db());
}

Result<Article> Project::article(ArticleId id) const
{
    return store::article(db(), id);
}

int Project::schemaVersion()
{
    return kSchemaVersion;
}

Status Project::forEachSegmentation(SegmentKind kind,
    const std::function<Status(ArticleId, std::vector<TextRange> &&)> &visit) const
{
    return store::forEachSegmentation(db(), kind, visit);
}

Status Project::forEachAnnotation(const std::function<Status(Annotation &&)> &visit) const
{
    return store::forEachAnnotation(db(), visit);
}

Result<std::vector<std::pair<CoderId, Phase>>> Project::spanCoderPhases() const
{
    return store::spanCoderPhases(db());
}

Status Project::forEachAnnotationOutline(const std::function<Status(Annotation &&)> &visit) const
{
    return store::forEachAnnotationOutline(db(), visit);
}

Status Project::forEachGoldAnnotation(const std::function<Status(GoldAnnotation &&)> &visit) const
{
    return store::forEachGoldAnnotation(db(), visit);
}

Result<std::optional<ArticleId>> Project::articleByExternalId(const QString &externalId) const
{
    return store::articleIdByExternalId(db(), externalId);
}

Result<std::vector<ArticleId>> Project::searchArticles(const QString &query) const
{
    return store::searchArticles(db(), query);
}

Result<CoderId> Project::addCoder(const QString &name, const QString &pseudonym, CoderRole role)
{
    if (name.trimmed().isEmpty() || pseudonym.trimmed().isEmpty())
        return fail(
            ErrorCode::InvalidArgument, ProjectText::tr("A coder needs a name and a pseudonym."));
    // A lead sees every coder's spans: only People adds one, with a passphrase or as the first
    // lead of a project built from files, so no import or builder makes a lead on its own.
    if (role == CoderRole::Lead)
        return fail(ErrorCode::NotAllowed,
            ProjectText::tr("%1 was not added: a lead is added with a passphrase (Lead → People "
                            "or fourfold-cli people --add).")
                .arg(pseudonym.trimmed()));
    auto sp = Savepoint::begin(db());
    if (!sp)
        return std::unexpected(sp.error());
    Coder coder;
    coder.uuid = store::newUuid();
    coder.name = name.trimmed();
    coder.pseudonym = pseudonym.trimmed();
    coder.role = role;
    auto id = store::insertCoder(db(), coder);
    if (!id)
        return std::unexpected(id.error());
    FOURFOLD_TRY_STATUS(
        store::appendEvent(db(), CoderId {}, QStringLiteral("coder.add"), QStringLiteral("coder"),
            coder.uuid, QJsonObject {{QStringLiteral("pseudonym"), coder.pseudonym}}));
    FOURFOLD_TRY_STATUS(sp->commit());
    return id;
}

Result<std::vector<Coder>> Project::coders() const
{
    return store::coders(db());
}

Result<std::optional<Coder>> Project::coderByPseudonym(const QString &pseudonym) const
{
    auto all = store::coders(db());
    if (!all)
        return std::unexpected(all.error());
    for (const Coder &c : *all)
        if (c.pseudonym == pseudonym)
            return std::optional<Coder> {c};
    return std::optional<Coder> {};
}

Result<Codebook> Project::codebook() const
{
    return store::currentCodebook(db());
}

Status Project::assign(ArticleId article, CoderId coder, Phase phase)
{
    auto people = store::coders(db());
    if (!people)
        return std::unexpected(people.error());
    const auto who = std::ranges::find(*people, coder, &Coder::id);
    if (who != people->end() && who->disabled)
        return fail(ErrorCode::InvalidArgument,
            ProjectText::tr("%1 is disabled and takes no new assignments; enable them first.")
                .arg(who->pseudonym));
    auto sp = Savepoint::begin(db());
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(store::insertAssignment(db(), article, coder, phase));
    FOURFOLD_TRY_STATUS(store::appendEvent(db(), CoderId {}, QStringLiteral("assignment.add"),
        QStringLiteral("assignment"), QString(),
        QJsonObject {{QStringLiteral("article"), article.value},
            {QStringLiteral("coder"), coder.value}, {QStringLiteral("phase"), phaseKey(phase)}}));
    return sp->commit();
}

Result<std::vector<Annotation>> Project::annotations(
    ArticleId article, std::optional<CoderId> coder) const
{
    return store::annotations(db(), article, coder);
}

Result<Annotation> Project::annotation(AnnotationId id) const
{
    return store::annotation(db(), id);
}

Result<std::vector<AnnotationLink>> Project::links(ArticleId article) const
{
    return store::links(db(), article);
}

Result<std::vector<Judgement>> Project::judgements(ArticleId article) const
{
    return store::judgements(db(), article);
}

Result<std::vector<GoldAnnotation>> Project::goldAnnotations(ArticleId article) const
{
    return store::goldAnnotations(db(), article);
}

Result<std::vector<GoldRejection>> Project::goldRejections(ArticleId article) const
{
    return store::goldRejections(db(), article);
}

Result<std::vector<GoldJudgement>> Project::goldJudgements(ArticleId article) const
{
    return store::goldJudgements(db(), article);
}

Result<QStringList> Project::attributeValues(const QString &key, std::optional<CoderId> coder) const
{
    return store::attributeTextValues(db(), key, coder);
}

Result<std::vector<Annotation>> Project::allAnnotations() const
{
    return store::allAnnotations(db());
}

Result<std::vector<Judgement>> Project::allJudgements() const
{
    return store::allJudgements(db());
}

Result<std::vector<Assignment>> Project::assignments() const
{
    return store::assignments(db());
}

Result<std::vector<Assignment>> Project::assignments(ArticleId article, CoderId coder) const
{
    return store::coderAssignments(db(), article, coder);
}

Status Project::addCodingTime(ArticleId article, CoderId coder, qint64 seconds)
{
    if (seconds <= 0)
        return {};
    auto all = store::assignments(db());
    if (!all)
        return std::unexpected(all.error());
    for (const Assignment &a : *all)
        if (a.article == article && a.coder == coder)
            return store::addAssignmentSeconds(db(), article, coder, a.phase, seconds);
    return {};
}

Status Project::apply(Edit &edit)
{
    auto sp = Savepoint::begin(db());
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(edit.apply(db()));
    FOURFOLD_TRY_STATUS(store::appendEvent(
        db(), edit.actor(), edit.action(), edit.objectType(), edit.objectUuid(), edit.detail()));
    return sp->commit();
}

Status Project::revert(Edit &edit)
{
    auto sp = Savepoint::begin(db());
    if (!sp)
        return std::unexpected(sp.error());
    FOURFOLD_TRY_STATUS(edit.revert(db()));
    FOURFOLD_TRY_STATUS(store::appendEvent(db(), edit.actor(),
        QStringLiteral("undo:") + edit.action(), edit.objectType(), edit.objectUuid()));
    return sp->commit();
}

Status Project::batch(const std::function<Status()> &work)
{
    auto sp = Savepoint::begin(db());
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
    Status st = edit.apply(db());
    if (st)
        st = store::appendEvent(
            db(), edit.actor(), edit.action(), edit.objectType(), edit.objectUuid(), edit.detail());
    if (!st && !m_batchError)
        m_batchError = st.error();
    return st;
}

Result<ProjectCounts> Project::counts() const
{
    return store::projectCounts(db());
}

} // namespace fourfold
