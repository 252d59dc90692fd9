#include "app/desktop/lead_windows.h"

#include "app/desktop/codebook/codebook_editor.h"
#include "app/desktop/coding_session.h"
#include "app/desktop/compare/comparison_window.h"
#include "app/desktop/conflicts/conflicts_window.h"
#include "app/desktop/frames/frames_window.h"
#include "app/desktop/message_bar.h"
#include "app/desktop/people/people_window.h"
#include "app/desktop/reliability/reliability_window.h"
#include "app/desktop/reliability/report_options_dialog.h"
#include "app/desktop/runs/extractor_window.h"
#include "app/desktop/study/progress_board_window.h"
#include "app/desktop/study/study_design_window.h"
#include "app/desktop/window_placement.h"
#include "app/report/report_writer.h"
#include "core/project/coder_copies.h"

#include <QApplication>
#include <QDesktopServices>
#include <QDir>
#include <QFileDialog>
#include <QFileInfo>
#include <QInputDialog>
#include <QMessageBox>
#include <QUrl>
#include <QWidget>

namespace fourfold {

LeadWindows::LeadWindows(QWidget *owner, MessageBar *messages)
    : QObject(owner)
    , m_owner(owner)
    , m_messages(messages)
{ }

LeadWindows::~LeadWindows()
{
    closeAll();
}

void LeadWindows::setSession(CodingSession *session)
{
    closeAll();
    m_session = session;
    // A team sync brought coders' work into the file: the progress board shows it. (The
    // comparison window reads its queue again by itself.)
    if (session)
        connect(session, &CodingSession::articleChanged, this, [this](ArticleId article) {
            if (auto *board = qobject_cast<ProgressBoardWindow *>(m_progress.data());
                board && !article.isValid())
                board->refresh();
        });
}

void LeadWindows::closeAll()
{
    // Deleted at once, not later: each window holds a reference to the session's project.
    for (QPointer<QWidget> *w : {&m_comparison, &m_reliability, &m_studyDesign, &m_progress,
             &m_extractors, &m_people, &m_codebook, &m_frames, &m_conflicts})
        delete w->data();
}

void LeadWindows::raise(QWidget *window)
{
    window->setAttribute(Qt::WA_DeleteOnClose);
    if (!window->isVisible()) // each window opens where it was left, at a size that fits
        placeWindow(window, QString::fromLatin1(window->metaObject()->className()),
            window->testAttribute(Qt::WA_Resized) ? window->size() : window->sizeHint());
    window->show();
    window->raise();
    window->activateWindow();
}

void LeadWindows::openComparison()
{
    if (!m_session)
        return;
    if (!m_comparison) {
        auto *w = new ComparisonWindow(m_session);
        connect(m_session, &QObject::destroyed, w, &QObject::deleteLater);
        m_comparison = w;
    }
    raise(m_comparison);
}

void LeadWindows::openReliability()
{
    if (!m_session)
        return;
    if (!m_reliability)
        m_reliability = new ReliabilityWindow(m_session->project());
    raise(m_reliability);
}

void LeadWindows::openStudyDesign()
{
    if (!m_session)
        return;
    if (!m_studyDesign) {
        m_studyDesign = new StudyDesignWindow(*m_session);
    }
    raise(m_studyDesign);
}

void LeadWindows::openProgress()
{
    if (!m_session)
        return;
    if (!m_progress)
        m_progress = new ProgressBoardWindow(*m_session);
    raise(m_progress);
}

void LeadWindows::openExtractors()
{
    if (!m_session)
        return;
    if (!m_extractors)
        m_extractors = new ExtractorWindow(m_session->project());
    raise(m_extractors);
}

void LeadWindows::openPeople()
{
    if (!m_session)
        return;
    if (!m_people) {
        auto *w = new PeopleWindow(m_session);
        connect(m_session, &QObject::destroyed, w, &QObject::deleteLater);
        m_people = w;
    }
    raise(m_people);
}

void LeadWindows::openCodebook()
{
    if (!m_session)
        return;
    if (!m_codebook) {
        m_codebook = new CodebookEditor(*m_session);
    }
    raise(m_codebook);
}

void LeadWindows::openFrames()
{
    if (!m_session)
        return;
    const bool first = !m_frames;
    if (first) {
        auto *w = new FramesWindow(m_session);
        connect(m_session, &QObject::destroyed, w, &QObject::deleteLater);
        connect(w, &FramesWindow::articleRequested, this, &LeadWindows::articleRequested);
        m_frames = w;
    }
    raise(m_frames);
    if (first)
        static_cast<FramesWindow *>(m_frames.data())->compute();
}

void LeadWindows::openConflicts()
{
    if (!m_session)
        return;
    if (!m_conflicts) {
        auto *w = new ConflictsWindow(m_session);
        connect(m_session, &QObject::destroyed, w, &QObject::deleteLater);
        m_conflicts = w;
    } else if (auto *w = qobject_cast<ConflictsWindow *>(m_conflicts.data())) {
        w->reload();
    }
    raise(m_conflicts);
}

void LeadWindows::writeReport()
{
    if (!m_session)
        return;
    ReportOptionsDialog choose(m_session->project(), m_owner);
    // Start from what the lead is looking at in the Reliability window.
    if (auto *window = qobject_cast<ReliabilityWindow *>(m_reliability.data()))
        choose.setOptions(reportOptionsFor(window->request()));
    if (choose.exec() != QDialog::Accepted)
        return;
    const ReportOptions options = choose.options();
    const QString base = QFileInfo(m_session->project().path()).completeBaseName();
    const QString path = QFileDialog::getSaveFileName(m_owner, tr("Write the reliability report"),
        base + QStringLiteral("-reliability.html"), tr("Web page (*.html);;PDF document (*.pdf)"));
    if (path.isEmpty())
        return;
    QApplication::setOverrideCursor(Qt::WaitCursor);
    const Status written = fourfold::writeReport(m_session->project(), options, path);
    QApplication::restoreOverrideCursor();
    if (!written) {
        QMessageBox::warning(m_owner, tr("Reliability report"), written.error().message);
        return;
    }
    m_messages->showMessage(MessageBar::Kind::Success,
        tr("The reliability report was written to %1.").arg(QDir::toNativeSeparators(path)),
        {{tr("&Open"), [path] { QDesktopServices::openUrl(QUrl::fromLocalFile(path)); }},
            {tr("Open the &folder"), [path] {
                 QDesktopServices::openUrl(QUrl::fromLocalFile(QFileInfo(path).absolutePath()));
             }}});
}

void LeadWindows::handOutCopy()
{
    if (!m_session)
        return;
    auto coders = m_session->project().coders();
    if (!coders) {
        QMessageBox::warning(m_owner, tr("Coder copy"), coders.error().message);
        return;
    }
    QStringList choices;
    for (const Coder &c : *coders)
        if (c.role == CoderRole::Coder)
            choices << c.pseudonym;
    bool ok = false;
    const QString pseudonym = QInputDialog::getItem(m_owner, tr("Coder copy"),
        tr("A coder copy holds only the articles assigned to this coder, the codebook and the "
           "coder's own codings. Whose copy?"),
        choices, 0, false, &ok);
    if (!ok || pseudonym.isEmpty())
        return;
    const QString base = QFileInfo(m_session->project().path()).completeBaseName();
    const QString path = QFileDialog::getSaveFileName(m_owner, tr("Write the coder copy"),
        QStringLiteral("%1-%2.fourfold").arg(base, pseudonym), tr("Fourfold project (*.fourfold)"));
    if (path.isEmpty())
        return;
    auto report = CoderCopies::handout(m_session->project(), pseudonym, path);
    if (!report) {
        QMessageBox::warning(m_owner, tr("Coder copy"), report.error().message);
        return;
    }
    m_messages->showMessage(MessageBar::Kind::Success,
        tr("Wrote %1 for %2: %n article(s), %3 span(s).", nullptr, int(report->articles))
            .arg(QDir::toNativeSeparators(path), pseudonym)
            .arg(report->annotations),
        {{tr("Open the &folder"), [path] {
              QDesktopServices::openUrl(QUrl::fromLocalFile(QFileInfo(path).absolutePath()));
          }}});
}

void LeadWindows::mergeCopies()
{
    if (!m_session)
        return;
    const QStringList paths = QFileDialog::getOpenFileNames(
        m_owner, tr("Merge returned coder copies"), QString(), tr("Fourfold project (*.fourfold)"));
    if (paths.isEmpty())
        return;
    auto reports = CoderCopies::merge(m_session->project(), paths);
    if (!reports) {
        QMessageBox::warning(m_owner, tr("Merge coder copies"),
            tr("Nothing was merged.\n\n%1").arg(reports.error().message));
        return;
    }
    QStringList lines;
    qint64 conflicts = 0;
    for (const MergeReport &r : *reports) {
        conflicts += r.conflicts;
        lines << (r.alreadyMerged ? tr("%1 (%2): already merged, nothing new.")
                                        .arg(QFileInfo(r.path).fileName(), r.coderPseudonym)
                                  : tr("%1 (%2): %3 new, %4 changed (%5 deleted), %6 conflict(s).")
                                        .arg(QFileInfo(r.path).fileName(), r.coderPseudonym)
                                        .arg(r.added)
                                        .arg(r.changed)
                                        .arg(r.deleted)
                                        .arg(r.conflicts));
        if (const QString notice = CoderCopies::withdrawnNotice(r); !notice.isEmpty())
            lines << notice;
    }
    const QString summary = conflicts > 0
        ? tr("Merged %n copy(ies); %1 conflict(s): the later change is kept, the other waits "
             "for you to decide (Lead → Merge conflicts…).",
            nullptr, int(reports->size()))
              .arg(conflicts)
        : tr("Merged %n copy(ies).", nullptr, int(reports->size()));
    m_messages->showMessage(conflicts > 0 ? MessageBar::Kind::Warning : MessageBar::Kind::Success,
        summary,
        conflicts > 0 ? std::vector<MessageBar::Action> {{tr("&Decide conflicts"),
            [this] { openConflicts(); }}}
                      : std::vector<MessageBar::Action> {},
        lines.join(QLatin1Char('\n')));
    emit projectChanged();
}

} // namespace fourfold
