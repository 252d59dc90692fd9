#pragma once
// Articles as stored: canonical text (immutable after import) and its frozen segmentation.

#include "core/model/ids.h"
#include "core/model/paragraph_role.h"
#include "core/model/text_range.h"

#include <QJsonObject>
#include <QString>

#include <vector>

namespace fourfold {

// What a list of articles shows; no text.
struct ArticleSummary {
    ArticleId id;
    QString uuid;
    QString externalId;
    QString title;
    QString outlet;
    QString published;
    QString language; // BCP 47
    qint64 length = 0; // code points
    QString sha256; // of the canonical UTF-8 text, lower-case hex
};

struct Paragraph {
    TextRange range;
    ParagraphRole role = ParagraphRole::Body;
};

// The frozen segmentations of an article's text.
enum class SegmentKind { Paragraphs, Sentences, Tokens };

struct Article {
    ArticleSummary summary;
    QString text; // canonical: NFC, LF
    QJsonObject metadata;
    QString source; // the file it was imported from
    std::vector<Paragraph> paragraphs;
    std::vector<TextRange> sentences;
    std::vector<TextRange> tokens;
};

} // namespace fourfold
