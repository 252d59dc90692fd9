#pragma once
// Exporting a span layer (gold, coders, coder:PSEUDONYM, run:NAME) for data teams and
// statistics packages, split by article, with a manifest. See the README section "Exports".
//
// Files written into the output directory, per split (train/dev/test, or "all" without a
// split):
//   jsonl  <split>.jsonl           one span per line: article, sha256, start, end (code points),
//                                  function, attributes, coder (pseudonym; null for runs),
//                                  source, id, score (runs), quote (unless the text is withheld)
//          <split>.articles.jsonl  one article per line: article, sha256, language, length,
//                                  title and text (unless withheld)
//          <split>.answers.jsonl   gold layer only: one gold answer per line (the gold answers
//                                  of the split's articles): article, sha256, item, value,
//                                  coder (the deciding lead's pseudonym), source "gold", id
//   w3c    <split>.jsonld          a W3C AnnotationCollection (w3c_format.h)
//   bio    <split>.bio             IOB2 tokens, one column per function (iob2_format.h); with the
//                                  coders layer one file per coder: <split>.<pseudonym>.bio
//   csv    <split>.csv             one row per article and source (RFC 4180): per function
//                                  present (0/1), spans (count), share (covered code points /
//                                  length)
//   manifest.json                  every file's SHA-256 and size, the codebook version, the layer,
//                                  the format, the seed, the split ratios, and per split the
//                                  articles and spans per function (and the gold layer's
//                                  JSON Lines: the gold answers)
// Coders appear only by pseudonym. With the text withheld, no text, quote, token or title is
// written: only offsets and hashes.

#include "core/exchange/article_split.h"
#include "core/model/error.h"
#include "core/scoring/span_layer.h"

#include <QJsonObject>
#include <QString>

#include <cstdint>
#include <functional>
#include <optional>
#include <vector>

namespace fourfold {

class Project;

enum class ExportFormat { Jsonl, W3c, Iob2, Csv };
// "jsonl", "w3c", "bio", "csv".
QString exportFormatKey(ExportFormat format);
std::optional<ExportFormat> exportFormatFromKey(const QString &key);

struct ExportOptions {
    LayerSpec layer;
    ExportFormat format = ExportFormat::Jsonl;
    QString outDir;
    std::optional<SplitRatios> split; // nothing: one split "all"
    std::uint64_t seed = 1;
    bool withText = true;
    QString version; // Fourfold's version, for the generator fields
    // Replace an earlier export in outDir (a folder holding only export files); without it a
    // folder that holds anything is refused.
    bool replace = false;
    // A test hook: called after each file is written (its name relative to outDir, the manifest
    // last), before the export is moved into place; an error stops the export there.
    std::function<Status(const QString &name)> afterFile;
};

struct ExportedFile {
    QString name; // relative to the output directory
    QString split;
    QString sha256;
    qint64 bytes = 0;
};

struct ExportReport {
    std::vector<ExportedFile> files; // without the manifest
    QJsonObject manifest;
    // Split of each exported article by external id.
    std::vector<std::pair<QString, QString>> articleSplits;
    // How many times an article's text was read: the export reads one article at a time, once
    // per split and format whatever the number of sources (coders) covering it.
    qint64 articleReads = 0;
    // The most spans held at once while writing: one article's, never the layer's.
    std::size_t mostSpansHeld = 0;
};

// Writes the export into a hidden folder beside outDir and moves it into place whole once every
// file and the manifest are written (export_folder.h): on any failure outDir is as it was and
// nothing is left behind. Before an article is written its text is checked against its stored
// SHA-256. Fails with NotFound for an unknown coder or run, InvalidArgument when the layer
// covers no article, Io when outDir is a symbolic link or not a folder or a file cannot be
// written (naming it), Duplicate when outDir holds files and `replace` is not set, Corrupt
// naming the article whose text does not match its hash, or with the store's error.
Result<ExportReport> exportLayer(const Project &project, const ExportOptions &options);

} // namespace fourfold
