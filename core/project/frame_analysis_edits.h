#pragma once
// The lead's edits of saved frame analyses: saving one (its undo removes it again), deleting one
// (a tombstone; its undo brings it back) and naming one of its frames.

#include "core/model/saved_frame_analysis.h"
#include "core/project/edit.h"

namespace fourfold {

// Saves `analysis` whole. A missing uuid or time is made on the first apply and kept for redo.
// apply() fails with InvalidArgument for an empty name or an analysis without frames, Duplicate
// when a live analysis has the name, Constraint for an article not in the project.
class SaveFrameAnalysisEdit : public Edit
{
public:
    SaveFrameAnalysisEdit(SavedFrameAnalysis analysis, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("frames.save"); }
    QString objectType() const override { return QStringLiteral("frame_analysis"); }
    QString objectUuid() const override { return m_analysis.uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;
    // The analysis as stored (uuid and time set after the first apply).
    const SavedFrameAnalysis &analysis() const { return m_analysis; }

private:
    SavedFrameAnalysis m_analysis;
};

// Deletes the live analysis `uuid` (called `name`, for the undo text). apply() fails with
// NotFound when there is no live analysis `uuid`; revert() with Duplicate when a live analysis
// has taken the name meanwhile.
class DeleteFrameAnalysisEdit : public Edit
{
public:
    DeleteFrameAnalysisEdit(QString uuid, QString name, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("frames.delete"); }
    QString objectType() const override { return QStringLiteral("frame_analysis"); }
    QString objectUuid() const override { return m_uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    QString m_uuid;
    QString m_name;
};

// Names frame `cluster` (0-based) of the saved analysis `uuid`. apply() fails with NotFound for
// no such analysis or frame.
class NameFrameEdit : public Edit
{
public:
    NameFrameEdit(QString uuid, int cluster, QString name, CoderId actor);
    QString text() const override;
    QString action() const override { return QStringLiteral("frames.name"); }
    QString objectType() const override { return QStringLiteral("frame_analysis"); }
    QString objectUuid() const override { return m_uuid; }
    Status apply(Database &db) override;
    Status revert(Database &db) override;

private:
    QString m_uuid;
    int m_cluster = 0;
    QString m_name;
    QString m_before;
};

} // namespace fourfold
