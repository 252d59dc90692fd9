#pragma once
// Coder copies: a project file for one coder to code in anywhere, offline, and its merge back.
//
// A copy holds the articles assigned to its coder (with their frozen units), every codebook
// version, that coder alone, and that coder's own assignments, annotations, links and answers;
// never another person's name or labels, no gold, no extractor run, no event of the project.
// It is an ordinary project file (the same program opens it; the coder codes blind because
// nothing else is in it), marked by settings: its own uuid, the uuid of the project it is a copy
// of and the coder's uuid. Its copy_base table holds a digest of every object as handed out.
//
// Merging takes the coder's objects by uuid (assignments by article and phase). For each object
// a three-way comparison with the common base (the project's record of the last merge of this
// copy, else the copy's hand-out state) decides: unchanged in the copy → nothing; changed only
// in the copy (or new) → taken, deletions as tombstones; changed the same way on both sides →
// nothing; changed differently on both sides → a conflict, stored for the lead, the project
// keeping its version until the lead resolves it. Active coding time adds up. A merge is one
// transaction; merging the same copy again writes nothing.

#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/store/copy_tables.h"

#include <QJsonObject>
#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace fourfold {

class Project;

// What makes a project file a coder copy.
struct CopyInfo {
    QString copyUuid;
    QString originProjectUuid; // the project it was handed out from
    QString coderUuid;
    QString handedOutAt; // ISO 8601 UTC
};

struct HandoutReport {
    QString path;
    QString copyUuid;
    Coder coder;
    qint64 articles = 0;
    qint64 assignments = 0;
    qint64 annotations = 0; // live ones
    qint64 links = 0;
    qint64 judgements = 0;
};

struct MergeReport {
    QString path;
    QString copyUuid;
    QString coderPseudonym;
    bool alreadyMerged = false; // nothing was new: nothing was written
    qint64 added = 0; // objects new to the project
    qint64 changed = 0; // objects taken over an older version (deletions included)
    qint64 deleted = 0; // of those, how many were deletions (tombstones)
    qint64 conflicts = 0; // conflicts found (new or changed) in this merge
    qint64 seconds = 0; // active coding time added
};

class CoderCopies
{
public:
    CoderCopies() = delete;

    // Writes a coder copy of `project` for the coder whose pseudonym (or, if no pseudonym
    // matches, whose name) is `coder` to the new file `outPath`. Fails with NotFound for an
    // unknown coder (or one without assigned articles), Duplicate if `outPath` exists,
    // Unsupported if `project` is itself a copy, Io/other store errors if the file cannot be
    // written (no file is left behind). `project` gains its project uuid if it had none, and a
    // "copy.handout" event.
    static Result<HandoutReport> handout(
        Project &project, const QString &coder, const QString &outPath);

    // The copy settings of `project`, or nothing if it is not a coder copy.
    static Result<std::optional<CopyInfo>> copyInfo(const Project &project);

    // Merges the copies `paths` (in this order) into `project`, all in one transaction: on any
    // refusal nothing is written. Refused: a file that is not a Fourfold coder copy (InvalidInput),
    // a copy of another project (InvalidInput), a copy whose article texts differ from the
    // project's (InvalidInput, naming the article), a copy holding other coders' rows or
    // references the project lacks (InvalidInput), a project that is itself a copy (Unsupported).
    static Result<std::vector<MergeReport>> merge(Project &project, const QStringList &paths);

    // The project's merge conflicts: the open ones, or all when `all`.
    static Result<std::vector<store::MergeConflict>> conflicts(const Project &project, bool all);
    // Resolves the open conflict `uuid` (the conflict's uuid, or the object's when it has one
    // open conflict) by keeping the project's version ("mine") or the copy's ("theirs").
    // NotFound if there is no such open conflict; InvalidArgument for another `keep` or an
    // object with several open conflicts.
    static Status resolve(Project &project, const QString &uuid, const QString &keep);
};

} // namespace fourfold
