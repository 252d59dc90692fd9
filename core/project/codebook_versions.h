#pragma once
// Codebook versions (field.md §5.5): every version kept with its note and author, a new version
// added as one undoable edit (AddCodebookVersionEdit) once it is checked against the values in
// use, and the field-by-field diff between two versions. Static functions over a Project, beside
// it like ExtractorRuns; no SQL here (it lives in core/store/codebook_table).

#include "core/model/codebook.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/project/codebook_version_edit.h"

#include <QJsonObject>
#include <QString>

#include <memory>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

struct CodebookVersionInfo {
    CodebookVersionId id;
    int number = 0;
    QString createdAt; // ISO 8601 UTC
    QString createdBy; // pseudonym, empty if unknown
    QString note;
};

struct CodebookChange {
    enum class Kind { Added, Removed, Changed };
    Kind kind = Kind::Changed;
    // Where: "name", "problem.definition", "problem.rules", "evaluation.attributes.polarity",
    // "evaluation.attributes.polarity.values", "items.dominant_function.question", and a
    // translation's texts under its language: "translations.de.problem.definition",
    // "translations.nl.evaluation.attributes.polarity.label",
    // "translations.de.items.dominant_function.question" (a text a translation gives for the
    // first time is added, one it no longer gives removed).
    QString path;
    std::optional<FramingFunction> function; // the function the change belongs to, if any
    QString before; // readable old value (lists joined with "; "), empty when added
    QString after; // readable new value, empty when removed
};

struct CodebookDiff {
    int from = 0;
    int to = 0;
    std::vector<CodebookChange> changes; // in codebook order
    // The functions whose definition, rules, examples or attributes changed (in any language).
    std::vector<FramingFunction> changedFunctions() const;
};

class CodebookVersions
{
public:
    // Every version, oldest first.
    static Result<std::vector<CodebookVersionInfo>> list(const Project &project);
    // Version `number`. NotFound if there is none.
    static Result<Codebook> version(const Project &project, int number);

    // `codebook` as the next version (its versionId and number are ignored) with `note`, made
    // by `author` (may be invalid), as one edit for Project::apply or an undo stack. Fails with
    // InvalidArgument if it equals the current version (nothing to record) or the note is empty,
    // and with InvalidInput naming the value when a live coder's or gold span (or answer)
    // carries a value of a choice attribute (or item) that the new version neither lists nor
    // recodes (apply() checks both again, and that the current version is still the one this
    // edit follows).
    static Result<std::unique_ptr<AddCodebookVersionEdit>> addEdit(
        const Project &project, const Codebook &codebook, const QString &note, CoderId author);
    // Applies addEdit(project, codebook, note, author); the new version on success, nothing
    // written on failure.
    static Result<CodebookVersionInfo> add(
        Project &project, const Codebook &codebook, const QString &note, CoderId author);
    // Reads a codebook JSON file (Codebook::fromJson, every rule): InvalidInput naming the file,
    // line and key for a malformed one, Io if it cannot be read or is not a regular file.
    static Result<Codebook> readFile(const QString &path);
    // Reads a codebook JSON file (readFile) and adds it as above.
    static Result<CodebookVersionInfo> addFromFile(
        Project &project, const QString &path, const QString &note, CoderId author);

    // Compares two codebooks field by field (attributes and items matched by key), their
    // translations last, language by language.
    static CodebookDiff diff(const Codebook &from, const Codebook &to);
    // The diff between stored versions; NotFound for a missing version.
    static Result<CodebookDiff> diffBetween(const Project &project, int from, int to);
    // "~ problem.definition: «old» → «new»", "+ path: «new»", "- path: «old»", one per line, after
    // a heading "Codebook version 1 → 2"; "no changes" when empty.
    static QString diffText(const CodebookDiff &diff);
    // {from, to, changes: [{kind, path, function, before, after}]}
    static QJsonObject diffJson(const CodebookDiff &diff);
};

} // namespace fourfold
