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
#include <QUrl>
#include <QUuid>

#include <array>
#include <map>

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

    std::vector<Article> articles;
    QHash<qint64, std::size_t> index;
    for (ArticleId id : ids) {
        auto a = project.article(id);
        if (!a)
            return std::unexpected(a.error());
        index.insert(id.value, articles.size());
        articles.push_back(std::move(*a));
    }
    // Function presence per article, the stratum of the split.
    std::vector<unsigned> masks(articles.size(), 0);
    for (const LayerSpan &s : layer->spans)
        if (auto it = index.constFind(s.article.value); it != index.constEnd())
            masks[*it] |= 1u << unsigned(s.function);
    SplitRatios ratios;
    std::vector<int> splitOf(articles.size(), 0);
    if (options.split) {
        ratios = *options.split;
        QStringList keys;
        for (const Article &a : articles)
            keys << a.summary.externalId;
        splitOf = splitArticles(masks, keys, ratios, options.seed);
    } else {
        ratios.names = {QStringLiteral("all")};
        ratios.ratios = {1.0};
    }

    ExportReport report;
    for (std::size_t i = 0; i < articles.size(); ++i)
        report.articleSplits.emplace_back(articles[i].summary.externalId, ratios.names[splitOf[i]]);

    const bool text = options.withText;
    std::vector<std::pair<QString, QByteArray>> files; // name, content
    QJsonObject splitCounts;
    for (qsizetype s = 0; s < ratios.names.size(); ++s) {
        const QString split = ratios.names[s];
        std::vector<std::size_t> members;
        for (std::size_t i = 0; i < articles.size(); ++i)
            if (splitOf[i] == int(s))
                members.push_back(i);
        std::vector<const LayerSpan *> spans;
        for (const LayerSpan &sp : layer->spans)
            if (auto it = index.constFind(sp.article.value);
                it != index.constEnd() && splitOf[*it] == int(s))
                spans.push_back(&sp);
        // Counts for the manifest.
        std::array<int, 4> spanCount {}, articleCount {};
        for (const LayerSpan *sp : spans)
            ++spanCount[std::size_t(sp->function)];
        for (std::size_t i : members)
            for (FramingFunction f : kFramingFunctions)
                if (masks[i] & (1u << unsigned(f)))
                    ++articleCount[std::size_t(f)];
        QJsonObject perFunction;
        for (FramingFunction f : kFramingFunctions)
            perFunction.insert(functionKey(f),
                QJsonObject {{QStringLiteral("spans"), spanCount[std::size_t(f)]},
                    {QStringLiteral("articles"), articleCount[std::size_t(f)]}});
        splitCounts.insert(split,
            QJsonObject {{QStringLiteral("articles"), qint64(members.size())},
                {QStringLiteral("spans"), qint64(spans.size())},
                {QStringLiteral("per_function"), perFunction}});

        switch (options.format) {
        case ExportFormat::Jsonl: {
            QByteArray lines, articleLines;
            for (const LayerSpan *sp : spans) {
                const Article &a = articles[index.value(sp->article.value)];
                QJsonObject o {{QStringLiteral("article"), a.summary.externalId},
                    {QStringLiteral("sha256"), a.summary.sha256},
                    {QStringLiteral("start"), sp->range.start},
                    {QStringLiteral("end"), sp->range.end},
                    {QStringLiteral("function"), functionKey(sp->function)},
                    {QStringLiteral("attributes"), sp->attributes},
                    {QStringLiteral("coder"),
                        sp->coder.isEmpty() ? QJsonValue(QJsonValue::Null) : QJsonValue(sp->coder)},
                    {QStringLiteral("source"), sp->source},
                    {QStringLiteral("id"),
                        sp->uuid.isEmpty() ? runSpanId(sp->source, a.summary.sha256, *sp)
                                           : QStringLiteral("urn:uuid:") + sp->uuid}};
                if (sp->score)
                    o.insert(QStringLiteral("score"), *sp->score);
                if (text)
                    o.insert(QStringLiteral("quote"), OffsetMap::slice(a.text, sp->range));
                lines += jsonLine(o);
            }
            for (std::size_t i : members) {
                const Article &a = articles[i];
                QJsonObject o {{QStringLiteral("article"), a.summary.externalId},
                    {QStringLiteral("sha256"), a.summary.sha256},
                    {QStringLiteral("language"), a.summary.language},
                    {QStringLiteral("length"), a.summary.length}};
                if (text) {
                    o.insert(QStringLiteral("title"), a.summary.title);
                    o.insert(QStringLiteral("text"), a.text);
                }
                articleLines += jsonLine(o);
            }
            files.emplace_back(split + QStringLiteral(".jsonl"), lines);
            files.emplace_back(split + QStringLiteral(".articles.jsonl"), articleLines);
            break;
        }
        case ExportFormat::W3c: {
            QJsonArray items;
            std::size_t current = std::size_t(-1);
            std::optional<OffsetMap> map;
            for (const LayerSpan *sp : spans) {
                const std::size_t ai = index.value(sp->article.value);
                const Article &a = articles[ai];
                if (ai != current) {
                    current = ai;
                    map.emplace(a.text);
                }
                W3cSpan w;
                w.id = sp->uuid.isEmpty() ? runSpanId(sp->source, a.summary.sha256, *sp)
                                          : QStringLiteral("urn:uuid:") + sp->uuid;
                w.articleSha256 = a.summary.sha256;
                w.function = sp->function;
                w.range = sp->range;
                w.attributes = sp->attributes;
                w.creatorIsSoftware = options.layer.kind == LayerKind::Run;
                w.creator = w.creatorIsSoftware ? sp->source
                                                : (sp->coder.isEmpty() ? sp->source : sp->coder);
                w.created = sp->createdAt;
                if (text) {
                    const TextRange u = map->utf16Range(sp->range);
                    const TextRange before = map->utf16Range(
                        TextRange {std::max<qint64>(0, sp->range.start - 32), sp->range.start});
                    const TextRange after = map->utf16Range(TextRange {
                        sp->range.end, std::min(map->codePointCount(), sp->range.end + 32)});
                    w.quote = a.text.mid(u.start, u.length());
                    w.prefix = a.text.mid(before.start, before.length());
                    w.suffix = a.text.mid(after.start, after.length());
                }
                items.append(w3cAnnotation(w, options.version));
            }
            const QString id = QStringLiteral("urn:fourfold:export:")
                + QString::fromLatin1(QUrl::toPercentEncoding(options.layer.key()))
                + QLatin1Char(':') + split;
            files.emplace_back(split + QStringLiteral(".jsonld"),
                QJsonDocument(
                    w3cCollection(id,
                        tr("Fourfold %1 spans, split %2").arg(options.layer.key(), split), items))
                    .toJson(QJsonDocument::Indented));
            break;
        }
        case ExportFormat::Iob2: {
            for (const QString &source : layer->sources) {
                std::vector<Iob2Document> docs;
                for (const LayerCoverage &c : layer->coverage) {
                    if (c.source != source)
                        continue;
                    const std::size_t ai = index.value(c.article.value);
                    if (splitOf[ai] != int(s))
                        continue;
                    const Article &a = articles[ai];
                    Iob2Document d;
                    d.externalId = a.summary.externalId;
                    d.sha256 = a.summary.sha256;
                    d.source = source;
                    if (text)
                        d.text = a.text;
                    d.tokens = a.tokens;
                    for (const LayerSpan *sp : spans)
                        if (sp->article == c.article && sp->source == source)
                            d.spans.push_back(Iob2Span {sp->function, sp->range});
                    docs.push_back(std::move(d));
                }
                const QString name = layer->sources.size() > 1
                    ? QStringLiteral("%1.%2.bio").arg(split, fileSafe(source))
                    : split + QStringLiteral(".bio");
                files.emplace_back(name, writeIob2(docs, text));
            }
            break;
        }
        case ExportFormat::Csv: {
            QStringList header {QStringLiteral("article"), QStringLiteral("sha256"),
                QStringLiteral("language"), QStringLiteral("length"), QStringLiteral("source")};
            for (FramingFunction f : kFramingFunctions)
                header << functionKey(f) + QStringLiteral("_present")
                       << functionKey(f) + QStringLiteral("_spans")
                       << functionKey(f) + QStringLiteral("_share");
            QString csv = header.join(QLatin1Char(',')) + QStringLiteral("\r\n");
            // The spans of each (article, source), gathered once rather than per row.
            std::map<std::pair<qint64, QString>, std::array<std::vector<TextRange>, 4>> rangesOf;
            for (const LayerSpan *sp : spans)
                rangesOf[{sp->article.value, sp->source}][std::size_t(sp->function)].push_back(
                    sp->range);
            for (const LayerCoverage &c : layer->coverage) {
                const std::size_t ai = index.value(c.article.value);
                if (splitOf[ai] != int(s))
                    continue;
                const Article &a = articles[ai];
                const auto found = rangesOf.find({c.article.value, c.source});
                const std::array<std::vector<TextRange>, 4> ranges = found == rangesOf.end()
                    ? std::array<std::vector<TextRange>, 4> {}
                    : found->second;
                QStringList row {csvField(a.summary.externalId), a.summary.sha256,
                    csvField(a.summary.language), QString::number(a.summary.length),
                    csvField(c.source)};
                for (const auto &r : ranges) {
                    const double share =
                        a.summary.length > 0 ? double(covered(r)) / double(a.summary.length) : 0.0;
                    row << QString::number(r.empty() ? 0 : 1) << QString::number(r.size())
                        << QString::number(share, 'f', 4);
                }
                csv += row.join(QLatin1Char(',')) + QStringLiteral("\r\n");
            }
            files.emplace_back(split + QStringLiteral(".csv"), csv.toUtf8());
            break;
        }
        }
    }

    QDir dir(options.outDir);
    if (!dir.mkpath(QStringLiteral(".")))
        return fail(
            ErrorCode::Io, tr("The directory %1 could not be created.").arg(options.outDir));
    auto write = [&](const QString &name, const QByteArray &bytes) -> Status {
        QSaveFile f(dir.filePath(name));
        if (!f.open(QIODevice::WriteOnly) || f.write(bytes) != bytes.size() || !f.commit())
            return fail(ErrorCode::Io,
                tr("The file %1 could not be written: %2.")
                    .arg(dir.filePath(name), f.errorString()));
        return {};
    };
    QJsonArray fileList;
    for (const auto &[name, bytes] : files) {
        FOURFOLD_TRY_STATUS(write(name, bytes));
        ExportedFile e;
        e.name = name;
        e.split = name.section(QLatin1Char('.'), 0, 0);
        e.sha256 = QString::fromLatin1(
            QCryptographicHash::hash(bytes, QCryptographicHash::Sha256).toHex());
        e.bytes = bytes.size();
        fileList.append(
            QJsonObject {{QStringLiteral("name"), e.name}, {QStringLiteral("split"), e.split},
                {QStringLiteral("sha256"), e.sha256}, {QStringLiteral("bytes"), e.bytes}});
        report.files.push_back(e);
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
    FOURFOLD_TRY_STATUS(write(QStringLiteral("manifest.json"),
        QJsonDocument(report.manifest).toJson(QJsonDocument::Indented)));
    return report;
}

} // namespace fourfold
