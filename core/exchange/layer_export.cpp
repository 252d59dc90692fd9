#include "core/exchange/layer_export.h"

#include "core/exchange/export_folder.h"
#include "core/exchange/iob2_format.h"
#include "core/exchange/w3c_format.h"
#include "core/project/project.h"
#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QCryptographicHash>
#include <QDir>
#include <QHash>
#include <QJsonArray>
#include <QJsonDocument>
#include <QSaveFile>
#include <QSet>
#include <QUrl>
#include <QUuid>

#include <array>
#include <memory>
#include <optional>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct LayerExportText {
    Q_DECLARE_TR_FUNCTIONS(LayerExportText)
};

// RFC 4180 §2: a field holding a comma, a quote or a line break is quoted, quotes doubled. A
// text that a spreadsheet would run as a formula (starting with =, +, -, @, a tab or a carriage
// return) gets a leading apostrophe, unless it is a number (OWASP's advice on CSV injection;
// common practice).
QString csvField(const QString &text)
{
    QString value = text;
    static const QString formulaStarts = QStringLiteral("=+-@\t\r");
    if (!value.isEmpty() && formulaStarts.contains(value.front())) {
        bool number = false;
        value.toDouble(&number);
        if (!number)
            value.prepend(QLatin1Char('\''));
    }
    if (!value.contains(QLatin1Char(',')) && !value.contains(QLatin1Char('"'))
        && !value.contains(QLatin1Char('\n')) && !value.contains(QLatin1Char('\r')))
        return value;
    QString q = value;
    q.replace(QLatin1Char('"'), QStringLiteral("\"\""));
    return QLatin1Char('"') + q + QLatin1Char('"');
}

QByteArray jsonLine(const QJsonObject &o)
{
    return QJsonDocument(o).toJson(QJsonDocument::Compact) + '\n';
}

// A stable id for a run span (runs have no row uuid): a name-based UUID (RFC 4122 §4.3).
QString runSpanId(const QString &source, const QString &sha, const LayerSpan &s)
{
    static const QUuid ns =
        QUuid::fromString(QStringLiteral("6f0c2a4e-3f57-4c1b-9a51-7f3c2f0d1e11"));
    const QString name = QStringLiteral("%1|%2|%3|%4|%5")
                             .arg(source, sha, functionKey(s.function))
                             .arg(s.range.start)
                             .arg(s.range.end);
    return QStringLiteral("urn:uuid:")
        + QUuid::createUuidV5(ns, name).toString(QUuid::WithoutBraces);
}

qint64 covered(std::vector<TextRange> ranges)
{
    std::sort(ranges.begin(), ranges.end());
    qint64 total = 0, reach = 0;
    for (const TextRange &r : ranges) {
        const qint64 from = std::max(r.start, reach);
        if (r.end > from)
            total += r.end - from;
        reach = std::max(reach, r.end);
    }
    return total;
}

QString fileSafe(const QString &s)
{
    QString out;
    for (QChar c : s)
        out += c.isLetterOrNumber() || c == QLatin1Char('-') || c == QLatin1Char('_')
            ? c
            : QLatin1Char('_');
    return out;
}

// One file-name part per source, distinct even where their safe forms meet ("X/1", "X_1" and
// "X?1" all read "X_1") and where only case differs (case-insensitive file systems): the first
// keeps the plain form, the next get "-2", "-3", ... in source order. Parts are at most 60
// characters, so a long pseudonym never makes a name the file system refuses.
QStringList sourceFileParts(const QStringList &sources)
{
    constexpr qsizetype kMost = 60;
    QStringList parts;
    QSet<QString> taken;
    for (const QString &source : sources) {
        const QString base = fileSafe(source).left(kMost);
        QString part = base;
        for (int n = 2; taken.contains(part.toCaseFolded()); ++n)
            part = base + QStringLiteral("-%1").arg(n);
        taken.insert(part.toCaseFolded());
        parts << part;
    }
    return parts;
}

// A file of the export written as it is made: its bytes go to disk and into its SHA-256 at
// once. It appears only when committed (QSaveFile), so a failed export leaves no half file.
class StreamedFile
{
public:
    // Written into `dir`; messages name it as `shownDir`/name (the folder it will be moved to).
    StreamedFile(const QDir &dir, const QString &name, const QString &shownDir)
        : m_file(dir.filePath(name))
        , m_name(name)
        , m_shown(QDir::toNativeSeparators(QDir(shownDir).filePath(name)))
    { }

    // Io naming the file if it cannot be created.
    Status open()
    {
        if (!m_file.open(QIODevice::WriteOnly))
            return failure();
        return {};
    }

    void write(const QByteArray &bytes)
    {
        m_hash.addData(bytes);
        m_bytes += bytes.size();
        if (m_file.write(bytes) != bytes.size())
            m_file.cancelWriting();
    }

    // Io naming the file if any write or the commit failed.
    Status commit()
    {
        if (!m_file.commit())
            return failure();
        return {};
    }

    ExportedFile exported() const
    {
        ExportedFile e;
        e.name = m_name;
        e.split = m_name.section(QLatin1Char('.'), 0, 0);
        e.sha256 = QString::fromLatin1(m_hash.result().toHex());
        e.bytes = m_bytes;
        return e;
    }

private:
    std::unexpected<Error> failure() const
    {
        return fail(ErrorCode::Io,
            LayerExportText::tr("The file %1 could not be written: %2.")
                .arg(m_shown, m_file.errorString()));
    }

    QSaveFile m_file;
    QString m_name;
    QString m_shown;
    QCryptographicHash m_hash {QCryptographicHash::Sha256};
    qint64 m_bytes = 0;
};

} // namespace

QString exportFormatKey(ExportFormat format)
{
    switch (format) {
    case ExportFormat::Jsonl:
        return QStringLiteral("jsonl");
    case ExportFormat::W3c:
        return QStringLiteral("w3c");
    case ExportFormat::Iob2:
        return QStringLiteral("bio");
    case ExportFormat::Csv:
        return QStringLiteral("csv");
    }
    return {};
}

std::optional<ExportFormat> exportFormatFromKey(const QString &key)
{
    for (auto f : {ExportFormat::Jsonl, ExportFormat::W3c, ExportFormat::Iob2, ExportFormat::Csv})
        if (exportFormatKey(f) == key)
            return f;
    return std::nullopt;
}

namespace {

// The collection around a split's items, printed with one item standing in for them all: the
// items go where it stands, each indented as the document indents it. The count ("total") comes
// after the items in the printed order, so the tail is printed once the items are counted.
struct W3cFrame {
    QByteArray head; // up to the line of the stand-in item
    QByteArray indent; // the stand-in item's indentation
    QByteArray tail; // from the end of the stand-in item's line
    QByteArray emptyTail; // from the start of the line after it (no items: the line goes)
};

W3cFrame w3cFrame(const QString &layerKey, const QString &split, qint64 total)
{
    const QString id = QStringLiteral("urn:fourfold:export:")
        + QString::fromLatin1(QUrl::toPercentEncoding(layerKey)) + QLatin1Char(':') + split;
    const QString marker = QStringLiteral("fourfold-items-1f6e3c58-5d0b-4a8e-9c2f-7b41d09e6a35");
    QJsonObject collection =
        w3cCollection(id, LayerExportText::tr("Fourfold %1 spans, split %2").arg(layerKey, split),
            QJsonArray {marker});
    collection.insert(QStringLiteral("total"), total);
    const QByteArray frame = QJsonDocument(collection).toJson(QJsonDocument::Indented);
    const qsizetype at = frame.indexOf('"' + marker.toUtf8() + '"');
    const qsizetype lineStart = frame.lastIndexOf('\n', at) + 1;
    const qsizetype lineEnd = frame.indexOf('\n', at);
    return W3cFrame {frame.left(lineStart), frame.mid(lineStart, at - lineStart),
        frame.mid(lineEnd), frame.mid(lineEnd + 1)};
}

// The files of one split and what the manifest says of it.
struct SplitOutput {
    QString name;
    std::vector<std::unique_ptr<StreamedFile>> files;
    bool noItemYet = true; // w3c
    QByteArray indent; // w3c: of each item
    std::array<qint64, 4> spanCount {}, articleCount {};
    qint64 articles = 0, spans = 0;
    qint64 answers = 0; // gold answers (gold layer, jsonl)
};

} // namespace

Result<ExportReport> exportLayer(const Project &project, const ExportOptions &options)
{
    auto layer = LayerReader::open(project, options.layer);
    if (!layer)
        return std::unexpected(layer.error());
    const std::vector<ArticleId> ids = layer->articles();
    if (ids.empty())
        return fail(ErrorCode::InvalidArgument,
            LayerExportText::tr(
                "The layer \"%1\" covers no article, so there is nothing to export.")
                .arg(options.layer.key()));
    auto codebook = project.codebook();
    if (!codebook)
        return std::unexpected(codebook.error());

    // The covered articles without their texts; a text is read when its article is written.
    auto all = project.articles();
    if (!all)
        return std::unexpected(all.error());
    QHash<qint64, std::size_t> index;
    for (ArticleId id : ids)
        index.insert(id.value, std::size_t(index.size()));
    std::vector<ArticleSummary> articles(ids.size());
    for (ArticleSummary &a : *all)
        if (auto it = index.constFind(a.id.value); it != index.constEnd())
            articles[*it] = std::move(a);
    all->clear();

    // The split is stratified by the functions present in each article: a first pass over the
    // spans reads them (one article's spans held at a time), the second writes.
    SplitRatios ratios;
    std::vector<int> splitOf(articles.size(), 0);
    if (options.split) {
        std::vector<unsigned> masks(articles.size(), 0);
        FOURFOLD_TRY_STATUS(layer->forEachArticle([&](LayerArticle &&a) -> Status {
            unsigned &mask = masks[index.value(a.article.value)];
            for (const LayerSpan &sp : a.spans)
                mask |= 1u << unsigned(sp.function);
            return {};
        }));
        ratios = *options.split;
        QStringList keys;
        for (const ArticleSummary &a : articles)
            keys << a.externalId;
        splitOf = splitArticles(masks, keys, ratios, options.seed);
    } else {
        ratios.names = {QStringLiteral("all")};
        ratios.ratios = {1.0};
    }

    ExportReport report;
    for (std::size_t i = 0; i < articles.size(); ++i)
        report.articleSplits.emplace_back(articles[i].externalId, ratios.names[splitOf[i]]);

    auto folder = ExportFolder::prepare(options.outDir, options.replace);
    if (!folder)
        return std::unexpected(folder.error());
    const QDir dir(folder->path());
    const auto written = [&](const QString &name) -> Status {
        return options.afterFile ? options.afterFile(name) : Status {};
    };

    // The gold layer's JSON Lines carry the gold answers of its articles too: one per article and
    // item, so the project's are held (by article), with the deciding lead's pseudonym.
    const bool withAnswers =
        options.layer.kind == LayerKind::Gold && options.format == ExportFormat::Jsonl;
    QHash<qint64, std::vector<GoldJudgement>> goldAnswers;
    QHash<qint64, QString> pseudonyms;
    if (withAnswers) {
        auto answers = project.goldJudgements();
        if (!answers)
            return std::unexpected(answers.error());
        for (GoldJudgement &g : *answers)
            goldAnswers[g.article.value].push_back(std::move(g));
        auto coders = project.coders();
        if (!coders)
            return std::unexpected(coders.error());
        for (const Coder &c : *coders)
            pseudonyms.insert(c.id.value, c.pseudonym);
    }

    // Every split's files are open at once and written in one pass over the layer.
    const QStringList &sources = layer->sources();
    const QStringList sourceParts = sourceFileParts(sources);
    std::vector<SplitOutput> outputs(std::size_t(ratios.names.size()));
    for (std::size_t s = 0; s < outputs.size(); ++s) {
        SplitOutput &out = outputs[s];
        out.name = ratios.names[qsizetype(s)];
        QStringList names;
        switch (options.format) {
        case ExportFormat::Jsonl:
            names << out.name + QStringLiteral(".jsonl")
                  << out.name + QStringLiteral(".articles.jsonl");
            if (withAnswers)
                names << out.name + QStringLiteral(".answers.jsonl");
            break;
        case ExportFormat::W3c:
            names << out.name + QStringLiteral(".jsonld");
            break;
        case ExportFormat::Iob2:
            // One file per source.
            for (const QString &part : sourceParts)
                names << (sources.size() > 1 ? QStringLiteral("%1.%2.bio").arg(out.name, part)
                                             : out.name + QStringLiteral(".bio"));
            break;
        case ExportFormat::Csv:
            names << out.name + QStringLiteral(".csv");
            break;
        }
        for (const QString &name : names) {
            out.files.push_back(std::make_unique<StreamedFile>(dir, name, options.outDir));
            FOURFOLD_TRY_STATUS(out.files.back()->open());
        }
        switch (options.format) {
        case ExportFormat::Jsonl:
            break;
        case ExportFormat::W3c: {
            const W3cFrame frame = w3cFrame(options.layer.key(), out.name, 0);
            out.files[0]->write(frame.head);
            out.indent = frame.indent;
            break;
        }
        case ExportFormat::Iob2:
            for (auto &file : out.files)
                file->write(iob2Header());
            break;
        case ExportFormat::Csv: {
            QStringList header {QStringLiteral("article"), QStringLiteral("sha256"),
                QStringLiteral("language"), QStringLiteral("length"), QStringLiteral("source")};
            for (FramingFunction f : kFramingFunctions)
                header << functionKey(f) + QStringLiteral("_present")
                       << functionKey(f) + QStringLiteral("_spans")
                       << functionKey(f) + QStringLiteral("_share");
            out.files[0]->write((header.join(QLatin1Char(',')) + QStringLiteral("\r\n")).toUtf8());
            break;
        }
        }
    }

    const bool text = options.withText;
    FOURFOLD_TRY_STATUS(layer->forEachArticle([&](LayerArticle &&la) -> Status {
        const std::size_t i = index.value(la.article.value);
        const ArticleSummary &a = articles[i];
        SplitOutput &out = outputs[std::size_t(splitOf[i])];
        // Counts for the manifest.
        unsigned mask = 0;
        for (const LayerSpan &sp : la.spans) {
            ++out.spanCount[std::size_t(sp.function)];
            mask |= 1u << unsigned(sp.function);
        }
        for (FramingFunction f : kFramingFunctions)
            if (mask & (1u << unsigned(f)))
                ++out.articleCount[std::size_t(f)];
        ++out.articles;
        out.spans += qint64(la.spans.size());

        // The article's text, read once whatever the number of sources covering it, and checked
        // against the SHA-256 the export writes beside it: a damaged file must not hand out a
        // hash that does not match its text.
        std::optional<Article> current;
        const bool hasOutput = options.format != ExportFormat::W3c || !la.spans.empty();
        if (hasOutput) {
            auto read = project.article(la.article);
            if (!read)
                return std::unexpected(read.error());
            current = std::move(*read);
            ++report.articleReads;
            if (textSha256(current->text) != a.sha256)
                return fail(ErrorCode::Corrupt,
                    LayerExportText::tr(
                        "The text of article \"%1\" does not match its stored SHA-256 (the "
                        "project file is damaged); nothing was exported.")
                        .arg(a.externalId));
        }
        const auto spanId = [&](const LayerSpan &sp) {
            return sp.uuid.isEmpty() ? runSpanId(sp.source, a.sha256, sp)
                                     : QStringLiteral("urn:uuid:") + sp.uuid;
        };

        switch (options.format) {
        case ExportFormat::Jsonl: {
            for (const LayerSpan &sp : la.spans) {
                QJsonObject o {{QStringLiteral("article"), a.externalId},
                    {QStringLiteral("sha256"), a.sha256}, {QStringLiteral("start"), sp.range.start},
                    {QStringLiteral("end"), sp.range.end},
                    {QStringLiteral("function"), functionKey(sp.function)},
                    {QStringLiteral("attributes"), sp.attributes},
                    {QStringLiteral("coder"),
                        sp.coder.isEmpty() ? QJsonValue(QJsonValue::Null) : QJsonValue(sp.coder)},
                    {QStringLiteral("source"), sp.source}, {QStringLiteral("id"), spanId(sp)}};
                if (sp.score)
                    o.insert(QStringLiteral("score"), *sp.score);
                if (text)
                    o.insert(QStringLiteral("quote"), OffsetMap::slice(current->text, sp.range));
                out.files[0]->write(jsonLine(o));
            }
            QJsonObject o {{QStringLiteral("article"), a.externalId},
                {QStringLiteral("sha256"), a.sha256}, {QStringLiteral("language"), a.language},
                {QStringLiteral("length"), a.length}};
            if (text) {
                o.insert(QStringLiteral("title"), a.title);
                o.insert(QStringLiteral("text"), current->text);
            }
            out.files[1]->write(jsonLine(o));
            if (withAnswers)
                for (const GoldJudgement &g : goldAnswers.value(la.article.value)) {
                    out.files[2]->write(
                        jsonLine(QJsonObject {{QStringLiteral("article"), a.externalId},
                            {QStringLiteral("sha256"), a.sha256},
                            {QStringLiteral("item"), g.itemKey}, {QStringLiteral("value"), g.value},
                            {QStringLiteral("coder"), pseudonyms.value(g.decidedBy.value)},
                            {QStringLiteral("source"), QStringLiteral("gold")},
                            {QStringLiteral("id"), QStringLiteral("urn:uuid:") + g.uuid}}));
                    ++out.answers;
                }
            break;
        }
        case ExportFormat::W3c: {
            if (la.spans.empty())
                break;
            std::optional<OffsetMap> map;
            if (text)
                map.emplace(current->text);
            const QByteArray &indent = out.indent;
            for (const LayerSpan &sp : la.spans) {
                W3cSpan w;
                w.id = spanId(sp);
                w.articleSha256 = a.sha256;
                w.function = sp.function;
                w.range = sp.range;
                w.attributes = sp.attributes;
                w.creatorIsSoftware = options.layer.kind == LayerKind::Run;
                w.creator =
                    w.creatorIsSoftware ? sp.source : (sp.coder.isEmpty() ? sp.source : sp.coder);
                w.created = sp.createdAt;
                if (text) {
                    const QString &t = current->text;
                    const Utf16Range u = map->utf16Range(sp.range);
                    const Utf16Range before = map->utf16Range(
                        TextRange {std::max<qint64>(0, sp.range.start - 32), sp.range.start});
                    const Utf16Range after = map->utf16Range(TextRange {
                        sp.range.end, std::min(map->codePointCount(), sp.range.end + 32)});
                    w.quote = t.mid(u.start, u.length());
                    w.prefix = t.mid(before.start, before.length());
                    w.suffix = t.mid(after.start, after.length());
                }
                const QByteArray item = QJsonDocument(w3cAnnotation(w, options.version))
                                            .toJson(QJsonDocument::Indented);
                QByteArray indented = out.noItemYet ? QByteArray() : QByteArrayLiteral(",\n");
                out.noItemYet = false;
                for (qsizetype from = 0; from < item.size();) {
                    qsizetype end = item.indexOf('\n', from);
                    if (end < 0)
                        end = item.size();
                    if (from > 0)
                        indented += '\n';
                    indented += indent + item.mid(from, end - from);
                    from = end + 1;
                }
                out.files[0]->write(indented);
            }
            break;
        }
        case ExportFormat::Iob2:
            for (const QString &source : la.sources) {
                Iob2Document d;
                d.externalId = a.externalId;
                d.sha256 = a.sha256;
                d.source = source;
                if (text)
                    d.text = current->text;
                d.tokens = current->tokens;
                for (const LayerSpan &sp : la.spans)
                    if (sp.source == source)
                        d.spans.push_back(Iob2Span {sp.function, sp.range});
                out.files[std::size_t(sources.indexOf(source))]->write(writeIob2Document(d, text));
            }
            break;
        case ExportFormat::Csv:
            for (const QString &source : la.sources) {
                std::array<std::vector<TextRange>, 4> ranges;
                for (const LayerSpan &sp : la.spans)
                    if (sp.source == source)
                        ranges[std::size_t(sp.function)].push_back(sp.range);
                QStringList row {csvField(a.externalId), a.sha256, csvField(a.language),
                    QString::number(a.length), csvField(source)};
                for (const auto &r : ranges) {
                    const double share = a.length > 0 ? double(covered(r)) / double(a.length) : 0.0;
                    row << QString::number(r.empty() ? 0 : 1) << QString::number(r.size())
                        << QString::number(share, 'f', 4);
                }
                out.files[0]->write((row.join(QLatin1Char(',')) + QStringLiteral("\r\n")).toUtf8());
            }
            break;
        }
        return {};
    }));
    report.mostSpansHeld = layer->mostSpansHeld();

    QJsonArray fileList;
    QJsonObject splitCounts;
    for (SplitOutput &out : outputs) {
        if (options.format == ExportFormat::W3c) {
            const W3cFrame frame = w3cFrame(options.layer.key(), out.name, out.spans);
            out.files[0]->write(out.noItemYet ? frame.emptyTail : frame.tail);
        }
        for (auto &file : out.files) {
            FOURFOLD_TRY_STATUS(file->commit());
            const ExportedFile e = file->exported();
            FOURFOLD_TRY_STATUS(written(e.name));
            fileList.append(
                QJsonObject {{QStringLiteral("name"), e.name}, {QStringLiteral("split"), e.split},
                    {QStringLiteral("sha256"), e.sha256}, {QStringLiteral("bytes"), e.bytes}});
            report.files.push_back(e);
        }
        QJsonObject perFunction;
        for (FramingFunction f : kFramingFunctions)
            perFunction.insert(functionKey(f),
                QJsonObject {{QStringLiteral("spans"), out.spanCount[std::size_t(f)]},
                    {QStringLiteral("articles"), out.articleCount[std::size_t(f)]}});
        QJsonObject counts {{QStringLiteral("articles"), out.articles},
            {QStringLiteral("spans"), out.spans}, {QStringLiteral("per_function"), perFunction}};
        if (withAnswers)
            counts.insert(QStringLiteral("answers"), out.answers);
        splitCounts.insert(out.name, counts);
    }

    QJsonObject ratioObject;
    for (qsizetype s = 0; s < ratios.names.size(); ++s)
        ratioObject.insert(ratios.names[s], ratios.ratios[std::size_t(s)]);
    report.manifest =
        QJsonObject {{QStringLiteral("generator"),
                         QJsonObject {{QStringLiteral("name"), QStringLiteral("Fourfold")},
                             {QStringLiteral("version"), options.version}}},
            {QStringLiteral("layer"), options.layer.key()},
            {QStringLiteral("format"), exportFormatKey(options.format)},
            {QStringLiteral("text_included"), text},
            {QStringLiteral("offsets"), QStringLiteral("code points, half-open [start, end)")},
            {QStringLiteral("codebook_version"), codebook->number},
            {QStringLiteral("seed"), QString::number(options.seed)},
            {QStringLiteral("split_ratios"),
                options.split ? QJsonValue(ratioObject) : QJsonValue(QJsonValue::Null)},
            {QStringLiteral("splits"), splitCounts}, {QStringLiteral("files"), fileList}};
    StreamedFile manifest(dir, QStringLiteral("manifest.json"), options.outDir);
    FOURFOLD_TRY_STATUS(manifest.open());
    manifest.write(QJsonDocument(report.manifest).toJson(QJsonDocument::Indented));
    FOURFOLD_TRY_STATUS(manifest.commit());
    FOURFOLD_TRY_STATUS(written(QStringLiteral("manifest.json")));
    FOURFOLD_TRY_STATUS(folder->commit());
    return report;
}

} // namespace fourfold
