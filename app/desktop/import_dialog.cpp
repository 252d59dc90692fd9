#include "app/desktop/import_dialog.h"

#include <QApplication>
#include <QDialog>
#include <QDialogButtonBox>
#include <QDir>
#include <QFileInfo>
#include <QLabel>
#include <QListWidget>
#include <QProgressDialog>
#include <QVBoxLayout>

#include <algorithm>

namespace fourfold {

ImportOutcome importWithProgress(
    Project &project, const QStringList &files, QWidget *parent, const ImportOptions &options)
{
    ImportOutcome outcome;
    // In thousandths of each file's bytes: a JSON Lines or CSV file is imported as it is read,
    // so the number of its articles is not known until the end.
    constexpr int steps = 1000;
    QProgressDialog progress(QApplication::translate("ImportDialog", "Importing articles…"),
        QApplication::translate("ImportDialog", "Cancel"), 0, steps, parent);
    progress.setWindowModality(Qt::WindowModal);
    progress.setMinimumDuration(300);
    for (qsizetype i = 0; i < files.size(); ++i) {
        const QString name = QFileInfo(files[i]).fileName();
        progress.setLabelText(QApplication::translate("ImportDialog", "Importing %1 (%2 of %3)…")
                                  .arg(name)
                                  .arg(i + 1)
                                  .arg(files.size()));
        progress.setValue(0);
        auto report =
            project.importFile(files[i], options, [&](qint64 bytesRead, qint64 totalBytes) {
                progress.setValue(totalBytes > 0
                        ? int(std::min(bytesRead, totalBytes) * steps / totalBytes)
                        : steps);
                QApplication::processEvents();
                return !progress.wasCanceled();
            });
        if (!report) {
            if (report.error().code == ErrorCode::Cancelled) {
                outcome.cancelled = true;
                outcome.lines << QApplication::translate(
                    "ImportDialog", "%1: cancelled; nothing from this file was added.")
                                     .arg(name);
                break;
            }
            outcome.lines << QApplication::translate("ImportDialog", "%1: not imported — %2")
                                 .arg(name, report.error().message);
            continue;
        }
        outcome.added += qint64(report->added.size());
        outcome.lines << QApplication::translate(
            "ImportDialog", "%1: %n article(s) added", nullptr, int(report->added.size()))
                             .arg(name);
        for (const SkippedArticle &s : report->skipped)
            outcome.lines << QApplication::translate(
                "ImportDialog", "    line %1 (%2): skipped, %3")
                                 .arg(s.line)
                                 .arg(s.externalId, s.reason);
        for (const NearCopyFound &n : report->nearCopies)
            outcome.lines << QApplication::translate(
                "ImportDialog", "    line %1 (%2): added, a near copy of \"%3\" (similarity %4)")
                                 .arg(n.line)
                                 .arg(n.externalId, n.otherExternalId)
                                 .arg(n.similarity, 0, 'f', 2);
        if (QFileInfo(files[i]).isDir())
            for (const ImportedFile &f : report->files)
                outcome.lines << (f.passedOver
                        ? QApplication::translate("ImportDialog", "    %1: %2")
                              .arg(QDir(files[i]).relativeFilePath(f.path), f.reason)
                        : QApplication::translate("ImportDialog", "    %1: %n article(s) added",
                            nullptr, int(f.articles.size()))
                              .arg(QDir(files[i]).relativeFilePath(f.path)));
    }
    progress.setValue(progress.maximum());
    return outcome;
}

void showImportReport(const ImportOutcome &outcome, QWidget *parent)
{
    auto *dialog = new QDialog(parent);
    dialog->setAttribute(Qt::WA_DeleteOnClose);
    dialog->setWindowTitle(QApplication::translate("ImportDialog", "Import report"));
    auto *layout = new QVBoxLayout(dialog);
    layout->addWidget(new QLabel(QApplication::translate("ImportDialog", "%n article(s) added.",
                                     nullptr, int(outcome.added)),
        dialog));
    auto *list = new QListWidget(dialog);
    list->setAccessibleName(QApplication::translate("ImportDialog", "Import report"));
    list->addItems(outcome.lines);
    layout->addWidget(list);
    auto *buttons = new QDialogButtonBox(QDialogButtonBox::Close, dialog);
    QObject::connect(buttons, &QDialogButtonBox::rejected, dialog, &QDialog::close);
    layout->addWidget(buttons);
    dialog->resize(640, 360);
    dialog->show();
}

} // namespace fourfold
