#pragma once
// The codebook editor's check of a draft: the very rules a codebook file is read with
// (Codebook::fromJson with CodebookCheck::File on the draft's own JSON), with the first failure
// turned into the field it concerns and a sentence for under that field.

#include "core/model/codebook.h"

#include <QString>

#include <optional>

namespace fourfold {

struct CodebookFieldError {
    // The field as the codebook's JSON names it, cut to what the editor edits:
    // "name", "functions[2].definition", "functions[2].rules", "functions[2].attributes[0].key",
    // "functions[2].attributes[0].values", "items[0].question", ...; empty if none was named.
    QString field;
    QString sentence;
};

struct CodebookCheckResult {
    std::optional<Codebook> candidate; // the draft as the file reader reads it, when it passes
    std::optional<CodebookFieldError> error;
};

CodebookCheckResult checkCodebookDraft(const Codebook &draft);

} // namespace fourfold
