// Quote-anchored codings (`import --codings`) into a copy of a project with the demo articles
// and coders. The import is all-or-nothing: a refused file leaves every figure of the project as
// it was, the refusal names the file, and a second import of the same file adds nothing.

#include "core/project/coding_import.h"
#include "fuzz/fuzz_support.h"

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    const QString path = fuzz::writeInput(QStringLiteral("codings.jsonl"), fuzz::bytes(data, size));
    Project project = fuzz::freshProject();
    const auto before = project.counts();
    FOURFOLD_FUZZ_CHECK(before.has_value());

    const auto imported = importQuotedCodings(project, path, Phase::Production);
    const auto after = project.counts();
    FOURFOLD_FUZZ_CHECK(after.has_value());
    if (!imported) {
        FOURFOLD_FUZZ_CHECK(imported.error().message.contains(QStringLiteral("codings.jsonl")));
        FOURFOLD_FUZZ_CHECK(fuzz::sameCounts(*before, *after));
        return 0;
    }
    FOURFOLD_FUZZ_CHECK(after->annotations - before->annotations == imported->spans);
    FOURFOLD_FUZZ_CHECK(after->goldAnnotations - before->goldAnnotations == imported->gold);
    const auto integrity = project.check();
    FOURFOLD_FUZZ_CHECK(integrity.has_value() && integrity->isClean());

    // Importing the same file twice adds nothing.
    const auto second = importQuotedCodings(project, path, Phase::Production);
    FOURFOLD_FUZZ_CHECK(second.has_value());
    FOURFOLD_FUZZ_CHECK(second->spans == 0 && second->judgements == 0 && second->gold == 0);
    const auto again = project.counts();
    FOURFOLD_FUZZ_CHECK(again.has_value() && fuzz::sameCounts(*after, *again));
    return 0;
}
