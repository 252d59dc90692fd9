// W3C Web Annotations (`import --w3c`) into a copy of a project with the demo articles. The
// import is all-or-nothing (a refused file changes no figure of the project and names the file)
// and importing the same file twice adds nothing.

#include "core/exchange/w3c_import.h"
#include "fuzz/fuzz_support.h"

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    const QString path = fuzz::writeInput(QStringLiteral("w3c.json"), fuzz::bytes(data, size));
    Project project = fuzz::freshProject();
    const auto before = project.counts();
    FOURFOLD_FUZZ_CHECK(before.has_value());

    const auto first = importW3cAnnotations(project, path);
    const auto after = project.counts();
    FOURFOLD_FUZZ_CHECK(after.has_value());
    if (!first) {
        FOURFOLD_FUZZ_CHECK(first.error().message.contains(QStringLiteral("w3c.json")));
        FOURFOLD_FUZZ_CHECK(fuzz::sameCounts(*before, *after));
        return 0;
    }
    FOURFOLD_FUZZ_CHECK(after->annotations - before->annotations == first->spans);
    const auto integrity = project.check();
    FOURFOLD_FUZZ_CHECK(integrity.has_value() && integrity->isClean());

    const auto second = importW3cAnnotations(project, path);
    FOURFOLD_FUZZ_CHECK(second.has_value());
    FOURFOLD_FUZZ_CHECK(second->spans == 0);
    const auto again = project.counts();
    FOURFOLD_FUZZ_CHECK(again.has_value() && again->annotations == after->annotations);
    return 0;
}
