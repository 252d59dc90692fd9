#pragma once
// The lead's windows beside the coding desk: comparison and adjudication, reliability, study
// design, progress, extractor runs; the reliability report; handing out and merging coder copies.
// Each window is opened once and raised when asked again; all are closed before the project they
// show goes away.

#include "core/model/ids.h"

#include <QObject>
#include <QPointer>

class QWidget;

namespace fourfold {

class CodingSession;

class MessageBar;

class LeadWindows : public QObject
{
    Q_OBJECT
public:
    // `owner` parents the dialogs; results are told in `messages` (the owner's message bar).
    LeadWindows(QWidget *owner, MessageBar *messages);
    ~LeadWindows() override;

    // The session the windows work on; closes every window of the previous one first. May be
    // null (no project open).
    void setSession(CodingSession *session);
    // Closes (and deletes) every open lead window.
    void closeAll();

    void openComparison();
    void openReliability();
    void openStudyDesign();
    void openProgress();
    void openExtractors();
    void openPeople();
    void openCodebook();
    // Lead → Frames…: computes the gold layer's frames when first opened.
    void openFrames();
    void openConflicts();
    // Asks for a file name and writes the reliability report (HTML or PDF by its suffix).
    void writeReport();
    // Asks for a coder and a file name and writes that coder's copy.
    void handOutCopy();
    // Asks for returned copies and merges them; tells what was taken and any conflicts.
    void mergeCopies();

    // The windows open now (for tests); null when closed.
    QWidget *comparison() const { return m_comparison; }
    QWidget *reliability() const { return m_reliability; }
    QWidget *studyDesign() const { return m_studyDesign; }
    QWidget *progress() const { return m_progress; }
    QWidget *extractors() const { return m_extractors; }
    QWidget *people() const { return m_people; }
    QWidget *codebook() const { return m_codebook; }
    QWidget *frames() const { return m_frames; }
    QWidget *conflicts() const { return m_conflicts; }

signals:
    // Assignments or codings changed outside the desk (study design, merge): reload the list.
    void projectChanged();
    // A window asks for an article to be opened on the desk (Frames: a double-clicked article).
    void articleRequested(ArticleId article);

private:
    void raise(QWidget *window);

    QWidget *m_owner;
    MessageBar *m_messages;
    CodingSession *m_session = nullptr;
    QPointer<QWidget> m_comparison;
    QPointer<QWidget> m_reliability;
    QPointer<QWidget> m_studyDesign;
    QPointer<QWidget> m_progress;
    QPointer<QWidget> m_extractors;
    QPointer<QWidget> m_people;
    QPointer<QWidget> m_codebook;
    QPointer<QWidget> m_frames;
    QPointer<QWidget> m_conflicts;
};

} // namespace fourfold
