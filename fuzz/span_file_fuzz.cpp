// The extractor's side of the protocol: the same bytes read as a span file (`runs --import`)
// and as an external extractor's output. Every span accepted lies inside its article and has a
// non-empty range; a refusal names the file.

#include "core/extract/extractor_protocol.h"
#include "fuzz/fuzz_support.h"

#include <cmath>

namespace {

const QHash<QString, fourfold::SpanTarget> &targets()
{
    using namespace fourfold;
    static const QHash<QString, SpanTarget> known {
        {QStringLiteral("a1"), SpanTarget {ArticleId {1}, 120}},
        {QStringLiteral("a2"), SpanTarget {ArticleId {2}, 40}},
        {QStringLiteral("ü-3"), SpanTarget {ArticleId {3}, 5}},
    };
    return known;
}

void checkSpans(const fourfold::Result<std::vector<fourfold::ExtractedSpan>> &spans)
{
    using namespace fourfold;
    if (!spans) {
        FOURFOLD_FUZZ_CHECK(spans.error().message.contains(QStringLiteral("spans.jsonl")));
        return;
    }
    for (const ExtractedSpan &span : *spans) {
        qint64 length = -1;
        for (const SpanTarget &target : targets())
            if (target.id == span.article)
                length = target.length;
        FOURFOLD_FUZZ_CHECK(length >= 0);
        FOURFOLD_FUZZ_CHECK(0 <= span.range.start && span.range.start < span.range.end);
        FOURFOLD_FUZZ_CHECK(span.range.end <= length);
        if (span.score)
            FOURFOLD_FUZZ_CHECK(std::isfinite(*span.score));
    }
}

} // namespace

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    const QByteArray input = fuzz::bytes(data, size);
    checkSpans(readSpanFile(input, QStringLiteral("spans.jsonl"), targets()));
    checkSpans(readExtractorOutput(input, QStringLiteral("spans.jsonl"), targets()));
    return 0;
}
