#pragma once
// A reproducible generated study for benchmarks and counting tests (not a product command):
// N articles of about 5 KB in English with invented words, each coded by two of C coders
// (pairs rotate) with about 17 spans per coder and article (about 34 per article), attributes,
// an answer to the dominant-function item, and the lead's gold on every tenth article. Written
// in the formats Fourfold imports: articles as JSON Lines, codings as quote-anchored JSON Lines
// (see core/project/coding_import.h). The same seed gives the same files.

#include <QString>

#include <cstdint>

namespace fourfold::bench {

struct StudySpec {
    int articles = 1000;
    int coders = 4; // C01 … Cnn; the lead is L01
    int sentencesPerArticle = 30;
    // Each coder of an article marks this share of its sentences (about 17 of 30).
    double markedShare = 0.57;
    // Chance that the second coder gives a marked sentence another function than the first.
    double disagreement = 0.15;
    std::uint64_t seed = 1;
};

struct StudyFiles {
    QString articles; // articles.jsonl
    QString codings; // codings.jsonl (spans and answers, then gold lines)
    qint64 spans = 0;
    qint64 answers = 0;
    qint64 goldSpans = 0;
};

// Writes the study into `dir` (which must exist). Returns empty paths if a file cannot be
// written.
StudyFiles writeStudy(const StudySpec &spec, const QString &dir);
// The same for a benchmark program: says why on stderr and ends the program if the files cannot
// be written.
StudyFiles writeStudyOrExit(const StudySpec &spec, const QString &dir);

} // namespace fourfold::bench
