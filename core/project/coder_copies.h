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
// The project keeps its own record of each hand-out (the base of every object, and the hand-out
// time in its log); a merge checks every row and log entry of the copy against it
// (core/project/copy_validation.h) and refuses the whole copy on any mismatch.
//
// Merging takes the coder's objects by uuid (assignments by article and phase). For each object
// a three-way comparison with the common base (the project's record of the last merge of this
// copy, else the hand-out) decides: unchanged in the copy → nothing; changed only in the copy
// (or new) → taken, deletions as tombstones; changed the same way on both sides → nothing;
// changed differently (in the project, or in another copy merged before) → a conflict: of the
// competing versions the one modified later wins (ties by the higher digest), the others are
// stored as open conflicts for the lead; a version a copy was built on no longer competes. The
// rule looks at the versions, not at which copy came first, so the order of the copies does not
// change the outcome. Active coding time adds up. A merge is one transaction; merging the same copy
// again writes nothing.
//
// An assignment the project withdrew while the copy was out (a draw withdrawn, or undone, and
// perhaps drawn anew) is not brought back by the coder's work on it: the coder's spans, answers
// and coding time arrive (a coder's codings are never lost), the assignment stays as the project
// holds it (withdrawn, or as the new draw made it, so the work does not count in that draw by
// itself), and the copy's version of the assignment becomes an open conflict on it, whatever its
// modification, for the lead to decide: keep the withdrawal, or take the coder's version (the
// article assigned to the coder again, the work counting once it is done). An assignment whose row
// is gone (its draw undone) comes back as a tombstone, as a withdrawal leaves it, holding the
// coder's time. The merge report names those articles. Refusing the withdrawal while a copy is out
// was the alternative; it was not chosen because a copy has no end (its coder may merge it again
// and again, or never return it), so the lead could be kept from withdrawing forever, and because
// the project could not tell whether the coder had even opened the article.

#include "core/model/annotation.h"
#include "core/model/coder.h"
#include "core/model/error.h"
#include "core/model/merge_conflict.h"

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

// An article the coder worked on in a copy after its assignment was withdrawn in the project.
struct WithdrawnWork {
    QString article; // external id
    QString phase; // phaseKey
};

// A coder copy handed out with some assignments of a draw.
struct CopyOut {
    QString coder; // pseudonym, as recorded at the hand-out
    QString copyUuid;
    QString handedOutAt; // ISO 8601 UTC
    QStringList articles; // external ids of the draw's articles it holds, sorted
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
    // Articles coded in the copy whose assignment the project withdrew meanwhile (each also an
    // open conflict on the assignment), by phase and external id.
    std::vector<WithdrawnWork> withdrawn;
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

    // Merges the copies `paths` into `project`, all in one transaction: on any refusal nothing
    // is written; the result does not depend on the order of `paths`. Refused: a file that is not
    // a Fourfold coder copy (InvalidInput), a copy of another project or one it never handed out
    // (InvalidInput), a copy whose article texts differ from the project's (InvalidInput, naming
    // the article), a copy holding other coders' rows, references the project lacks or anything
    // validateCopyRows / validateCopyEvents refuse (InvalidInput, naming file and row or event),
    // a project that is itself a copy (Unsupported).
    static Result<std::vector<MergeReport>> merge(Project &project, const QStringList &paths);

    // The project's merge conflicts: the open ones, or all when `all`.
    static Result<std::vector<MergeConflict>> conflicts(const Project &project, bool all);
    // Resolves the open conflict `uuid` (the conflict's uuid, or the object's when it has one
    // open conflict) by keeping the version the project holds ("mine") or writing the version
    // that lost ("theirs").
    // NotFound if there is no such open conflict; InvalidArgument for another `keep` or an
    // object with several open conflicts.
    static Status resolve(Project &project, const QString &uuid, const QString &keep);

    // The coder copies the project handed out with assignments of the recorded draw of `phase`
    // (of its articles, to its coders), by hand-out time; none when the phase has no draw. What
    // a lead withdrawing the draw is told: work done there comes back at the merge as above.
    // Fails with Corrupt if the draw's record cannot be read.
    static Result<std::vector<CopyOut>> copiesHoldingDraw(const Project &project, Phase phase);
    // The sentence about one such copy, for the lead who withdrew the draw.
    static QString copyOutNotice(const CopyOut &copy);

    // The sentence that tells the lead about `report.withdrawn` (which coder, how many articles,
    // which, and what to decide), or "" when the copy held no such work.
    static QString withdrawnNotice(const MergeReport &report);
    // Whether `conflict` is about an assignment withdrawn in the project while the coder worked
    // on it in a copy: the project holds no live row of it, or one made anew (another creation
    // time), while the copy's version is live.
    static bool isWithdrawnAssignment(const MergeConflict &conflict);
};

} // namespace fourfold
