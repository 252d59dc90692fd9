#include "core/project/frame_analysis_edits.h"

#include "core/store/frame_table.h"
#include "core/store/store_util.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct FrameAnalysisEditsText {
    Q_DECLARE_TR_FUNCTIONS(FrameAnalysisEditsText)
};

Status nameTaken(const QString &name)
{
    return fail(ErrorCode::Duplicate,
        FrameAnalysisEditsText::tr(
            "A saved frame analysis is already called \"%1\"; choose another name.")
            .arg(name));
}

// Fails with Duplicate when a live analysis other than `uuid` is called `name`.
Status checkNameFree(const Database &db, const QString &name, const QString &uuid)
{
    auto other = store::frameAnalysisByName(db, name);
    if (!other)
        return std::unexpected(other.error());
    if (*other && (*other)->uuid != uuid)
        return nameTaken(name);
    return {};
}

} // namespace

SaveFrameAnalysisEdit::SaveFrameAnalysisEdit(SavedFrameAnalysis analysis, CoderId actor)
    : Edit(actor)
    , m_analysis(std::move(analysis))
{
    m_analysis.name = m_analysis.name.trimmed();
    m_analysis.createdBy = actor;
}

QString SaveFrameAnalysisEdit::text() const
{
    return FrameAnalysisEditsText::tr("Save frames \"%1\"").arg(m_analysis.name);
}

Status SaveFrameAnalysisEdit::apply(Database &db)
{
    if (m_analysis.name.isEmpty())
        return fail(ErrorCode::InvalidArgument,
            FrameAnalysisEditsText::tr("A saved frame analysis needs a name."));
    if (m_analysis.frames.empty())
        return fail(ErrorCode::InvalidArgument,
            FrameAnalysisEditsText::tr("The frame analysis \"%1\" has no frames to save.")
                .arg(m_analysis.name));
    FOURFOLD_TRY_STATUS(checkNameFree(db, m_analysis.name, m_analysis.uuid));
    if (m_analysis.uuid.isEmpty())
        m_analysis.uuid = store::newUuid();
    if (m_analysis.createdAt.isEmpty())
        m_analysis.createdAt = store::now();
    m_analysis.memberCount = qint64(m_analysis.members.size());
    return store::insertFrameAnalysis(db, m_analysis);
}

Status SaveFrameAnalysisEdit::revert(Database &db)
{
    return store::removeFrameAnalysis(db, m_analysis.uuid);
}

DeleteFrameAnalysisEdit::DeleteFrameAnalysisEdit(QString uuid, QString name, CoderId actor)
    : Edit(actor)
    , m_uuid(std::move(uuid))
    , m_name(std::move(name))
{ }

QString DeleteFrameAnalysisEdit::text() const
{
    return FrameAnalysisEditsText::tr("Delete frames \"%1\"").arg(m_name);
}

Status DeleteFrameAnalysisEdit::apply(Database &db)
{
    auto deleted = store::frameAnalysisDeleted(db, m_uuid);
    if (!deleted)
        return std::unexpected(deleted.error());
    if (!*deleted || **deleted)
        return fail(ErrorCode::NotFound,
            FrameAnalysisEditsText::tr("There is no saved frame analysis \"%1\".").arg(m_name));
    return store::setFrameAnalysisDeleted(db, m_uuid, true);
}

Status DeleteFrameAnalysisEdit::revert(Database &db)
{
    FOURFOLD_TRY_STATUS(checkNameFree(db, m_name, m_uuid));
    return store::setFrameAnalysisDeleted(db, m_uuid, false);
}

NameFrameEdit::NameFrameEdit(QString uuid, int cluster, QString name, CoderId actor)
    : Edit(actor)
    , m_uuid(std::move(uuid))
    , m_cluster(cluster)
    , m_name(name.trimmed())
{ }

QString NameFrameEdit::text() const
{
    return FrameAnalysisEditsText::tr("Name frame %1 \"%2\"").arg(m_cluster + 1).arg(m_name);
}

Status NameFrameEdit::apply(Database &db)
{
    auto analysis = store::frameAnalysisByUuid(db, m_uuid);
    if (!analysis)
        return std::unexpected(analysis.error());
    if (!*analysis || m_cluster < 0 || size_t(m_cluster) >= (*analysis)->frames.size())
        return fail(ErrorCode::NotFound,
            FrameAnalysisEditsText::tr("The saved frame analysis has no frame %1.")
                .arg(m_cluster + 1));
    m_before = (*analysis)->frames[size_t(m_cluster)].name;
    return store::setFrameName(db, m_uuid, m_cluster, m_name);
}

Status NameFrameEdit::revert(Database &db)
{
    return store::setFrameName(db, m_uuid, m_cluster, m_before);
}

} // namespace fourfold
