// A codebook file (`codebook --update`): a codebook that is read back from its own JSON form
// reads the same, under the file's rules and under the stored rules; a refusal names the file.

#include "core/model/codebook.h"
#include "fuzz/fuzz_support.h"

#include <QJsonDocument>

extern "C" int LLVMFuzzerTestOneInput(const uint8_t *data, size_t size)
{
    using namespace fourfold;
    const auto codebook = Codebook::fromJson(
        fuzz::bytes(data, size), QStringLiteral("codebook.json"), CodebookCheck::File);
    if (!codebook) {
        FOURFOLD_FUZZ_CHECK(codebook.error().message.contains(QStringLiteral("codebook.json")));
        return 0;
    }
    FOURFOLD_FUZZ_CHECK(codebook->functions.size() == 4);
    const QByteArray written = QJsonDocument(codebook->toJson()).toJson();
    for (const CodebookCheck check : {CodebookCheck::File, CodebookCheck::Stored}) {
        const auto reread = Codebook::fromJson(written, QStringLiteral("again.json"), check);
        FOURFOLD_FUZZ_CHECK(reread.has_value());
        FOURFOLD_FUZZ_CHECK(QJsonDocument(reread->toJson()).toJson() == written);
    }
    return 0;
}
