// A reliability matrix (`agree --data`): read, encoded and compared at the nominal and interval
// levels, as the command does. The reading from bytes gives what the decoded reading gives; a
// refusal names the file; a figure is a number or undefined.

#include "core/agreement/agreement_run.h"
#include "core/io/reliability_table_reader.h"
#include "fuzz/fuzz_support.h"

#include <cmath>

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    const QByteArray input = fuzz::bytes(data, size);
    const QString path = fuzz::writeInput(QStringLiteral("matrix.csv"), input);
    auto table = readReliabilityTable(path);
    // The reading from bytes and the decoded reading agree on every file.
    const auto decoded = readReliabilityTableDecoded(input, path);
    FOURFOLD_FUZZ_CHECK(table.has_value() == decoded.has_value());
    if (!table) {
        FOURFOLD_FUZZ_CHECK(table.error().message.contains(QStringLiteral("matrix.csv")));
        FOURFOLD_FUZZ_CHECK(table.error().toString() == decoded.error().toString());
        return 0;
    }
    FOURFOLD_FUZZ_CHECK(table->coders == decoded->coders);
    FOURFOLD_FUZZ_CHECK(table->labels() == decoded->labels());
    FOURFOLD_FUZZ_CHECK(table->cells() == decoded->cells());
    FOURFOLD_FUZZ_CHECK(table->unitCount() == decoded->unitCount());
    for (size_t u = 0; u < table->unitCount(); ++u) {
        FOURFOLD_FUZZ_CHECK(table->unitId(u) == decoded->unitId(u));
        FOURFOLD_FUZZ_CHECK(table->unitLine(u) == decoded->unitLine(u));
    }
    for (const reliability::Level level :
        {reliability::Level::Nominal, reliability::Level::Interval}) {
        EncodingOptions encoding;
        encoding.level = level;
        const auto analysed = analyseTable(*table, encoding, AgreementOptions {});
        if (!analysed) {
            FOURFOLD_FUZZ_CHECK(!analysed.error().message.isEmpty());
            continue;
        }
        // Alpha = 1 − D_o/D_e with D_o ≥ 0 and D_e > 0 (Krippendorff 2011): at most 1.
        if (const auto alpha = analysed->report.alpha.value)
            FOURFOLD_FUZZ_CHECK(std::isfinite(*alpha) && *alpha <= 1 + 1e-9);
    }
    return 0;
}
