#pragma once
// Importing articles from the window: a progress dialog that can be cancelled (a cancelled file
// adds nothing), then one report of what was added and what was skipped or refused, and why.

#include "core/project/project.h"

#include <QStringList>

class QWidget;

namespace fourfold {

struct ImportOutcome {
    qint64 added = 0;
    QStringList lines; // the report, one line per file and per skipped article
    bool cancelled = false;
};

// Imports `files` into `project` one by one (each file whole or not at all), showing progress
// over `parent`. Returns what happened; never throws up a dialog itself.
// `files` may hold folders (each imported with its subfolders as one, all or nothing).
ImportOutcome importWithProgress(
    Project &project, const QStringList &files, QWidget *parent, const ImportOptions &options = {});

// Shows the report of an import in one non-blocking list.
void showImportReport(const ImportOutcome &outcome, QWidget *parent);

} // namespace fourfold
