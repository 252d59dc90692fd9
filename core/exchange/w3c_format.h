#pragma once
// Spans as W3C Web Annotations (Web Annotation Data Model, W3C Recommendation 23 February 2017;
// JSON-LD context http://www.w3.org/ns/anno.jsonld, Web Annotation Vocabulary §4.2 for the
// selectors). One file is an AnnotationCollection whose first AnnotationPage holds every
// annotation (Web Annotation Data Model §5). One annotation:
//
//   {"@context": "http://www.w3.org/ns/anno.jsonld",
//    "id": "urn:uuid:…", "type": "Annotation", "motivation": "classifying",
//    "created": "2026-…Z",
//    "creator": {"id": "urn:fourfold:coder:C01", "type": "Person", "nickname": "C01"},
//    "generator": {"type": "Software", "name": "Fourfold", "softwareVersion": "0.1.0"},
//    "body": [{"type": "TextualBody", "purpose": "classifying", "value": "cause"},
//             {"type": "TextualBody", "purpose": "describing", "format": "application/json",
//              "value": "{\"actor\":\"the council\"}"}],
//    "target": {"source": "ni:///sha-256;…",
//               "selector": [{"type": "TextPositionSelector", "start": 4, "end": 9},
//                            {"type": "TextQuoteSelector", "exact": "ferry",
//                             "prefix": "The ", "suffix": " to Brakwater"}]}}
//
// - The source names the article by the SHA-256 of its canonical UTF-8 text as an RFC 6920
//   "ni" URI (Farrell et al. 2013, "Naming Things with Hashes": base64url without padding).
// - Positions are code points of the canonical text, as TextPositionSelector counts them.
// - The creator is the coder's pseudonym (gold: the lead who decided; a run: Software named
//   "run:NAME"). Names never appear. The attributes body is left out when there are none; the
//   quote selector (prefix and suffix up to 32 code points) when the text is withheld.

#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/model/text_range.h"

#include <QJsonArray>
#include <QJsonObject>
#include <QString>

#include <optional>

namespace fourfold {

struct W3cSpan {
    QString id; // "urn:uuid:…"
    QString articleSha256; // lower-case hex
    FramingFunction function = FramingFunction::Problem;
    TextRange range;
    QJsonObject attributes;
    QString creator; // pseudonym, or "run:NAME" for software
    bool creatorIsSoftware = false;
    QString created;
    // The exact text at the range with up to 32 code points before and after (TextQuoteSelector);
    // no quote when the text is withheld.
    std::optional<QString> quote;
    QString prefix, suffix;
};

// "ni:///sha-256;<base64url>" for a lower-case hex SHA-256; empty if `hex` is not 64 hex digits.
QString niUriFromSha256(const QString &hex);
// The lower-case hex SHA-256 of an "ni:///sha-256;…" URI, or nothing.
std::optional<QString> sha256FromNiUri(const QString &uri);

// The annotation for `span` (with a TextQuoteSelector when span.quote is set); `version` is
// Fourfold's version for the generator.
QJsonObject w3cAnnotation(const W3cSpan &span, const QString &version);
// The collection holding `items` (Web Annotation Data Model §5.1–5.2).
QJsonObject w3cCollection(const QString &id, const QString &label, const QJsonArray &items);

// Reads one annotation as written by w3cAnnotation. Fails with InvalidInput and a sentence
// saying what is missing or wrong (no location: the caller adds file and position): type not
// "Annotation", no target source or not an ni URI, no TextPositionSelector or a bad range, no
// classifying body naming a function, attributes that are not a JSON object, no creator.
Result<W3cSpan> readW3cAnnotation(const QJsonObject &annotation);

} // namespace fourfold
