#include "core/exchange/layer_export.h"

#include "core/exchange/iob2_format.h"
#include "core/exchange/w3c_format.h"
#include "core/project/project.h"
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

QString tr(const char *text)
{
    return QCoreApplication::translate("LayerExport", text);
}

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
    StreamedFile(const QDir &dir, const QString &name)
        : m_file(dir.filePath(name))
        , m_name(name)
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
            tr("The file %1 could not be written: %2.")
                .arg(m_file.fileName(), m_file.errorString()));
    }

    QSaveFile m_file;
    QString m_name;
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

Result<ExportReport> exportLayer(const Project &project, const ExportOptions &options)
{
    auto layer = resolveLayer(project, options.layer);
    if (!layer)
        return std::unexpected(layer.error());
    const std::vector<ArticleId> ids = layer->articles();
    if (ids.empty())
        return fail(ErrorCode::InvalidArgument,
            tr("The layer \"%1\" covers no article, so there is nothing to export.")
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
    // The layer lists spans and coverage by article in project order, as `ids` does: each
    // article's part of them is one run.
    std::vector<std::pair<std::size_t, std::size_t>> spansOf(articles.size(), {0, 0});
    for (std::size_t k = 0; k < layer->spans.size(); ++k) {
        const auto at = index.constFind(layer->spans[k].article.value);
        if (at == index.constEnd())
            continue;
        auto &[begin, end] = spansOf[*at];
        if (begin == end)
            begin = k;
        end = k + 1;
    }
    std::vector<std::vector<QString>> sourcesOf(articles.size());
    for (const LayerCoverage &c : layer->coverage)
        sourcesOf[index.value(c.article.value)].push_back(c.source);
    // Function presence per article, the stratum of the split.
    std::vector<unsigned> masks(articles.size(), 0);
    for (std::size_t i = 0; i < articles.size(); ++i)
        for (std::size_t k = spansOf[i].first; k < spansOf[i].second; ++k)
            masks[i] |= 1u << unsigned(layer->spans[k].function);
    SplitRatios ratios;
    std::vector<int> splitOf(articles.size(), 0);
    if (options.split) {
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

    QDir dir(options.outDir);
    if (!dir.mkpath(QStringLiteral(".")))
        return fail(
            ErrorCode::Io, tr("The directory %1 could not be created.").arg(options.outDir));
    QJsonArray fileList;
    const auto finish = [&](StreamedFile &file) -> Status {
        FOURFOLD_TRY_STATUS(file.commit());
        const ExportedFile e = file.exported();
        fileList.append(
            QJsonObject {{QStringLiteral("name"), e.name}, {QStringLiteral("split"), e.split},
                {QStringLiteral("sha256"), e.sha256}, {QStringLiteral("bytes"), e.bytes}});
        report.files.push_back(e);
        return {};
    };

    const bool text = options.withText;
    // The article being written; only one is held at a time.
    std::optional<Article> current;
    const auto load = [&](std::size_t i) -> Status {
        if (current && current->summary.id == ids[i])
            return {};
        current.reset();
        auto a = project.article(ids[i]);
        if (!a)
            return std::unexpected(a.error());
        current = std::move(*a);
        ++report.articleReads;
        return {};
    };
    QJsonObject splitCounts;
    for (qsizetype s = 0; s < ratios.names.size(); ++s) {
        const QString split = ratios.names[s];
        std::vector<std::size_t> members;
        for (std::size_t i = 0; i < articles.size(); ++i)
            if (splitOf[i] == int(s))
                members.push_back(i);
        // Counts for the manifest.
        std::array<int, 4> spanCount {}, articleCount {};
        qint64 spans = 0;
        for (std::size_t i : members) {
            for (std::size_t k = spansOf[i].first; k < spansOf[i].second; ++k)
                ++spanCount[std::size_t(layer->spans[k].function)];
            spans += qint64(spansOf[i].second - spansOf[i].first);
            for (FramingFunction f : kFramingFunctions)
                if (masks[i] & (1u << unsigned(f)))
                    ++articleCount[std::size_t(f)];
        }
        QJsonObject perFunction;
        for (FramingFunction f : kFramingFunctions)
            perFunction.insert(functionKey(f),
                QJsonObject {{QStringLiteral("spans"), spanCount[std::size_t(f)]},
                    {QStringLiteral("articles"), articleCount[std::size_t(f)]}});
        splitCounts.insert(split,
            QJsonObject {{QStringLiteral("articles"), qint64(members.size())},
                {QStringLiteral("spans"), spans}, {QStringLiteral("per_function"), perFunction}});

        switch (options.format) {
        case ExportFormat::Jsonl: {
            StreamedFile lines(dir, split + QStringLiteral(".jsonl"));
            StreamedFile articleLines(dir, split + QStringLiteral(".articles.jsonl"));
            FOURFOLD_TRY_STATUS(lines.open());
            FOURFOLD_TRY_STATUS(articleLines.open());
            for (std::size_t i : members) {
                const ArticleSummary &a = articles[i];
                if (text)
                    FOURFOLD_TRY_STATUS(load(i));
                for (std::size_t k = spansOf[i].first; k < spansOf[i].second; ++k) {
                    const LayerSpan *sp = &layer->spans[k];
                    QJsonObject o {{QStringLiteral("article"), a.externalId},
                        {QStringLiteral("sha256"), a.sha256},
                        {QStringLiteral("start"), sp->range.start},
                        {QStringLiteral("end"), sp->range.end},
                        {QStringLiteral("function"), functionKey(sp->function)},
                        {QStringLiteral("attributes"), sp->attributes},
                        {QStringLiteral("coder"),
                            sp->coder.isEmpty() ? QJsonValue(QJsonValue::Null)
                                                : QJsonValue(sp->coder)},
                        {QStringLiteral("source"), sp->source},
                        {QStringLiteral("id"),
                            sp->uuid.isEmpty() ? runSpanId(sp->source, a.sha256, *sp)
                                               : QStringLiteral("urn:uuid:") + sp->uuid}};
                    if (sp->score)
                        o.insert(QStringLiteral("score"), *sp->score);
                    if (text)
                        o.insert(
                            QStringLiteral("quote"), OffsetMap::slice(current->text, sp->range));
                    lines.write(jsonLine(o));
                }
                QJsonObject o {{QStringLiteral("article"), a.externalId},
                    {QStringLiteral("sha256"), a.sha256}, {QStringLiteral("language"), a.language},
                    {QStringLiteral("length"), a.length}};
                if (text) {
                    o.insert(QStringLiteral("title"), a.title);
                    o.insert(QStringLiteral("text"), current->text);
                }
                articleLines.write(jsonLine(o));
            }
            FOURFOLD_TRY_STATUS(finish(lines));
            FOURFOLD_TRY_STATUS(finish(articleLines));
            break;
        }
        case ExportFormat::W3c: {
            StreamedFile file(dir, split + QStringLiteral(".jsonld"));
            FOURFOLD_TRY_STATUS(file.open());
            const QString id = QStringLiteral("urn:fourfold:export:")
                + QString::fromLatin1(QUrl::toPercentEncoding(options.layer.key()))
                + QLatin1Char(':') + split;
            // The collection around its items, written with one item standing in for them all:
            // the items go where it stands, each indented as the document indents it.
            const QString marker = QStringLiteral("fourfold-items-")
                + QUuid::createUuid().toString(QUuid::WithoutBraces);
            QJsonObject collection =
                w3cCollection(id, tr("Fourfold %1 spans, split %2").arg(options.layer.key(), split),
                    QJsonArray {marker});
            collection.insert(QStringLiteral("total"), spans);
            const QByteArray frame = QJsonDocument(collection).toJson(QJsonDocument::Indented);
            const qsizetype at = frame.indexOf('"' + marker.toUtf8() + '"');
            const qsizetype lineStart = frame.lastIndexOf('\n', at) + 1;
            const QByteArray indent = frame.mid(lineStart, at - lineStart);
            const qsizetype lineEnd = frame.indexOf('\n', at);
            file.write(frame.left(lineStart));
            bool first = true;
            for (std::size_t i : members) {
                if (spansOf[i].first == spansOf[i].second)
                    continue;
                const ArticleSummary &a = articles[i];
                std::optional<OffsetMap> map;
                if (text) {
                    FOURFOLD_TRY_STATUS(load(i));
                    map.emplace(current->text);
                }
                for (std::size_t k = spansOf[i].first; k < spansOf[i].second; ++k) {
                    const LayerSpan *sp = &layer->spans[k];
                    W3cSpan w;
                    w.id = sp->uuid.isEmpty() ? runSpanId(sp->source, a.sha256, *sp)
                                              : QStringLiteral("urn:uuid:") + sp->uuid;
                    w.articleSha256 = a.sha256;
                    w.function = sp->function;
                    w.range = sp->range;
                    w.attributes = sp->attributes;
                    w.creatorIsSoftware = options.layer.kind == LayerKind::Run;
                    w.creator = w.creatorIsSoftware
                        ? sp->source
                        : (sp->coder.isEmpty() ? sp->source : sp->coder);
                    w.created = sp->createdAt;
                    if (text) {
                        const QString &t = current->text;
                        const TextRange u = map->utf16Range(sp->range);
                        const TextRange before = map->utf16Range(
                            TextRange {std::max<qint64>(0, sp->range.start - 32), sp->range.start});
                        const TextRange after = map->utf16Range(TextRange {
                            sp->range.end, std::min(map->codePointCount(), sp->range.end + 32)});
                        w.quote = t.mid(u.start, u.length());
                        w.prefix = t.mid(before.start, before.length());
                        w.suffix = t.mid(after.start, after.length());
                    }
                    const QByteArray item = QJsonDocument(w3cAnnotation(w, options.version))
                                                .toJson(QJsonDocument::Indented);
                    QByteArray indented = first ? QByteArray() : QByteArrayLiteral(",\n");
                    first = false;
                    for (qsizetype from = 0; from < item.size();) {
                        qsizetype end = item.indexOf('\n', from);
                        if (end < 0)
                            end = item.size();
                        if (from > 0)
                            indented += '\n';
                        indented += indent + item.mid(from, end - from);
                        from = end + 1;
                    }
                    file.write(indented);
                }
            }
            // Without items, the line that stood for them goes with its line break.
            file.write(frame.mid(first ? lineEnd + 1 : lineEnd));
            FOURFOLD_TRY_STATUS(finish(file));
            break;
        }
        case ExportFormat::Iob2: {
            // One file per source, all written in one pass over the articles.
            std::vector<std::unique_ptr<StreamedFile>> files;
            const QStringList parts = sourceFileParts(layer->sources);
            for (const QString &part : parts) {
                const QString name = layer->sources.size() > 1
                    ? QStringLiteral("%1.%2.bio").arg(split, part)
                    : split + QStringLiteral(".bio");
                files.push_back(std::make_unique<StreamedFile>(dir, name));
                FOURFOLD_TRY_STATUS(files.back()->open());
                files.back()->write(iob2Header());
            }
            for (std::size_t i : members) {
                if (sourcesOf[i].empty())
                    continue;
                FOURFOLD_TRY_STATUS(load(i));
                for (const QString &source : sourcesOf[i]) {
                    Iob2Document d;
                    d.externalId = articles[i].externalId;
                    d.sha256 = articles[i].sha256;
                    d.source = source;
                    if (text)
                        d.text = current->text;
                    d.tokens = current->tokens;
                    for (std::size_t k = spansOf[i].first; k < spansOf[i].second; ++k)
                        if (layer->spans[k].source == source)
                            d.spans.push_back(
                                Iob2Span {layer->spans[k].function, layer->spans[k].range});
                    files[std::size_t(layer->sources.indexOf(source))]->write(
                        writeIob2Document(d, text));
                }
            }
            for (auto &file : files)
                FOURFOLD_TRY_STATUS(finish(*file));
            break;
        }
        case ExportFormat::Csv: {
            StreamedFile file(dir, split + QStringLiteral(".csv"));
            FOURFOLD_TRY_STATUS(file.open());
            QStringList header {QStringLiteral("article"), QStringLiteral("sha256"),
                QStringLiteral("language"), QStringLiteral("length"), QStringLiteral("source")};
            for (FramingFunction f : kFramingFunctions)
                header << functionKey(f) + QStringLiteral("_present")
                       << functionKey(f) + QStringLiteral("_spans")
                       << functionKey(f) + QStringLiteral("_share");
            file.write((header.join(QLatin1Char(',')) + QStringLiteral("\r\n")).toUtf8());
            for (std::size_t i : members) {
                const ArticleSummary &a = articles[i];
                for (const QString &source : sourcesOf[i]) {
                    std::array<std::vector<TextRange>, 4> ranges;
                    for (std::size_t k = spansOf[i].first; k < spansOf[i].second; ++k)
                        if (layer->spans[k].source == source)
                            ranges[std::size_t(layer->spans[k].function)].push_back(
                                layer->spans[k].range);
                    QStringList row {csvField(a.externalId), a.sha256, csvField(a.language),
                        QString::number(a.length), csvField(source)};
                    for (const auto &r : ranges) {
                        const double share =
                            a.length > 0 ? double(covered(r)) / double(a.length) : 0.0;
                        row << QString::number(r.empty() ? 0 : 1) << QString::number(r.size())
                            << QString::number(share, 'f', 4);
                    }
                    file.write((row.join(QLatin1Char(',')) + QStringLiteral("\r\n")).toUtf8());
                }
            }
            FOURFOLD_TRY_STATUS(finish(file));
            break;
        }
        }
    }
    current.reset();

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
    StreamedFile manifest(dir, QStringLiteral("manifest.json"));
    FOURFOLD_TRY_STATUS(manifest.open());
    manifest.write(QJsonDocument(report.manifest).toJson(QJsonDocument::Indented));
    FOURFOLD_TRY_STATUS(manifest.commit());
    return report;
}

} // namespace fourfold
