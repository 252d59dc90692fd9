#include "core/project/coding_import.h"

#include "core/io/article_reader.h"
#include "core/io/input_file.h"
#include "core/project/annotation_edits.h"
#include "core/project/article_status_edit.h"
#include "core/project/gold_edits.h"
#include "core/project/project.h"
#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>
#include <QFile>
#include <QHash>
#include <QJsonDocument>
#include <QJsonObject>

#include <map>
#include <optional>
#include <set>
#include <tuple>
#include <utility>

namespace fourfold {

namespace {

// One line of `file` with its line break, read in steps of 64 KiB and stopped once it is longer
// than `maxBytes`. QIODevice::readLine(maxSize) would allocate maxSize bytes for every line
// (64 MiB a line here), which made a codings import of 136,000 lines spend most of its time
// mapping and unmapping memory.
QByteArray readBoundedLine(QIODevice &file, qint64 maxBytes)
{
    QByteArray line;
    char step[1 << 16];
    while (line.size() <= maxBytes) {
        const qint64 got = file.readLine(step, qint64(sizeof step));
        if (got <= 0)
            break;
        line.append(step, qsizetype(got));
        if (step[got - 1] == '\n')
            break;
    }
    return line;
}

// The sentences of this file, under a context that lupdate collects.
struct CodingImportText {
    Q_DECLARE_TR_FUNCTIONS(CodingImportText)
};

Result<QString> requiredString(
    const QJsonObject &o, const char *key, const QString &file, qint64 line)
{
    const QJsonValue v = o.value(QLatin1String(key));
    if (v.isUndefined())
        return failAt(ErrorCode::InvalidInput, file, line, 0,
            CodingImportText::tr("missing required field \"%1\".").arg(QLatin1String(key)));
    if (!v.isString() || v.toString().isEmpty())
        return failAt(ErrorCode::InvalidInput, file, line, 0,
            CodingImportText::tr("field \"%1\" must be a non-empty string.")
                .arg(QLatin1String(key)));
    return v.toString();
}

} // namespace

Result<CodingImportReport> importQuotedCodings(Project &project, const QString &path, Phase phase)
{
    return importQuotedCodings(project, path, [phase](const QString &) { return phase; });
}

Result<CodingImportReport> importQuotedCodings(Project &project, const QString &path,
    const std::function<Phase(const QString &article)> &phaseOf)
{
    FOURFOLD_TRY_STATUS(requireRegularFile(path));
    FOURFOLD_TRY_STATUS(project.checkBeforeImport());
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        return fail(ErrorCode::Io,
            CodingImportText::tr("Cannot read %1: %2").arg(path, file.errorString()));

    auto coders = project.coders();
    if (!coders)
        return std::unexpected(coders.error());
    QHash<QString, CoderId> coderIds;
    for (const Coder &c : *coders)
        coderIds.insert(c.pseudonym, c.id);

    // Article ids by external id, looked up once each; the text (and its offset map) of the
    // article of the last line only, since lines come grouped by article: memory stays bounded
    // by one article, not the study.
    QHash<QString, ArticleId> articleIds;
    struct Current {
        ArticleId id;
        QString text;
        OffsetMap map {QString()};
        // Its live spans, read at its first gold line; a span added after them drops them.
        std::optional<std::vector<Annotation>> spans;
        // What it already holds (read when the article's first line comes), and what the file
        // added to it: a line found here is skipped, so importing a file twice adds nothing.
        std::set<std::tuple<qint64, int, qint64, qint64, int>>
            spanKeys; // coder, function, range, phase
        std::set<std::tuple<int, qint64, qint64>> goldKeys; // function, range
        std::map<std::tuple<qint64, QString, int>, QString> answers; // (coder, item, phase) → value
    } article;
    CodingImportReport report;
    // (article, coder) with imported codings, and the phase of their article
    std::map<std::pair<qint64, qint64>, Phase> finished;

    // Known keys of a line. Strict, as the article readers are: a misspelled or unknown key is
    // an error, never silently dropped, and so is a value of the wrong type.
    const QStringList known {QStringLiteral("article"), QStringLiteral("coder"),
        QStringLiteral("function"), QStringLiteral("quote"), QStringLiteral("occurrence"),
        QStringLiteral("attributes"), QStringLiteral("note"), QStringLiteral("confidence"),
        QStringLiteral("gold"), QStringLiteral("rationale"), QStringLiteral("item"),
        QStringLiteral("value")};
    auto work = [&]() -> Status {
        // The file is read a line at a time: memory stays bounded by one line.
        QByteArray line;
        for (qint64 lineNo = 1; !file.atEnd(); ++lineNo) {
            // A line is at most maxJsonLineSize bytes (and its line break): a file of one
            // endless line must not be held whole.
            line = readBoundedLine(file, maxJsonLineSize);
            if (line.size() > maxJsonLineSize && !line.endsWith('\n'))
                return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                    CodingImportText::tr("the line is longer than %1 MiB")
                        .arg(maxJsonLineSize >> 20));
            if (lineNo == 1 && line.startsWith("\xEF\xBB\xBF"))
                line.remove(0, 3);
            if (auto valid = decodeUtf8Strict(line, path); !valid) {
                // Reported as the check of the whole file reports it, at the line and column a
                // text editor shows (there a lone CR ends a line too).
                file.seek(0);
                if (auto whole = decodeUtf8Strict(file.readAll(), path); !whole)
                    return std::unexpected(whole.error());
                return std::unexpected(valid.error());
            }
            if (QByteArrayView(line).trimmed().isEmpty())
                continue;
            QJsonParseError error;
            const QJsonDocument doc = QJsonDocument::fromJson(line, &error);
            if (error.error != QJsonParseError::NoError || !doc.isObject())
                return failAt(ErrorCode::InvalidInput, path, lineNo,
                    error.error != QJsonParseError::NoError ? error.offset + 1 : 0,
                    CodingImportText::tr("not a JSON object (%1).")
                        .arg(error.error != QJsonParseError::NoError
                                ? error.errorString()
                                : CodingImportText::tr("another JSON value")));
            const QJsonObject o = doc.object();
            for (auto it = o.begin(); it != o.end(); ++it)
                if (const QString key = it.key(); !known.contains(key))
                    return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                        CodingImportText::tr(
                            "unknown field \"%1\" (expected article, coder, function, quote, "
                            "occurrence, attributes, note, confidence, gold, rationale, item, "
                            "value).")
                            .arg(key));
            const auto typed = [&](const char *key, QJsonValue::Type type,
                                   const QString &what) -> Status {
                const QJsonValue v = o.value(QLatin1String(key));
                if (!v.isUndefined() && v.type() != type)
                    return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                        CodingImportText::tr("field \"%1\" must be %2.")
                            .arg(QLatin1String(key), what));
                return {};
            };
            FOURFOLD_TRY_STATUS(
                typed("attributes", QJsonValue::Object, CodingImportText::tr("an object")));
            FOURFOLD_TRY_STATUS(typed("note", QJsonValue::String, CodingImportText::tr("text")));
            FOURFOLD_TRY_STATUS(typed(
                "confidence", QJsonValue::Double, CodingImportText::tr("a number from 0 to 1")));
            FOURFOLD_TRY_STATUS(
                typed("rationale", QJsonValue::String, CodingImportText::tr("text")));
            auto articleKey = requiredString(o, "article", path, lineNo);
            if (!articleKey)
                return std::unexpected(articleKey.error());
            const Phase phase = phaseOf(*articleKey);
            auto coderKey = requiredString(o, "coder", path, lineNo);
            if (!coderKey)
                return std::unexpected(coderKey.error());
            if (!coderIds.contains(*coderKey))
                return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                    CodingImportText::tr("unknown coder \"%1\".").arg(*coderKey));
            auto articleId = articleIds.constFind(*articleKey);
            if (articleId == articleIds.constEnd()) {
                auto id = project.articleByExternalId(*articleKey);
                if (!id)
                    return std::unexpected(id.error());
                if (!*id)
                    return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                        CodingImportText::tr("unknown article \"%1\".").arg(*articleKey));
                articleId = articleIds.insert(*articleKey, **id);
            }
            if (article.id != *articleId) {
                auto loaded = project.article(*articleId);
                if (!loaded)
                    return std::unexpected(loaded.error());
                article =
                    Current {*articleId, loaded->text, OffsetMap(loaded->text), {}, {}, {}, {}};
                auto spans = project.annotations(article.id);
                if (!spans)
                    return std::unexpected(spans.error());
                for (const Annotation &a : *spans)
                    article.spanKeys.insert({a.coder.value, int(a.content.function),
                        a.content.range.start, a.content.range.end, int(a.phase)});
                article.spans = std::move(*spans);
                auto gold = project.goldAnnotations(article.id);
                if (!gold)
                    return std::unexpected(gold.error());
                for (const GoldAnnotation &g : *gold)
                    if (!g.deleted)
                        article.goldKeys.insert(
                            {int(g.content.function), g.content.range.start, g.content.range.end});
                auto answers = project.judgements(article.id);
                if (!answers)
                    return std::unexpected(answers.error());
                for (const Judgement &j : *answers)
                    article.answers[{j.coder.value, j.itemKey, int(j.phase)}] = j.value;
            }
            const CoderId coder = coderIds.value(*coderKey);

            if (o.contains(QLatin1String("item"))) {
                auto item = requiredString(o, "item", path, lineNo);
                if (!item)
                    return std::unexpected(item.error());
                auto value = requiredString(o, "value", path, lineNo);
                if (!value)
                    return std::unexpected(value.error());
                // An answer that is already the coder's answer is skipped; a different one
                // replaces it, as on the desk.
                QString &current = article.answers[{coder.value, *item, int(phase)}];
                if (current == *value) {
                    ++report.skipped;
                    continue;
                }
                current = *value;
                SetJudgementEdit edit(article.id, coder, *item, *value, phase);
                if (auto st = project.applyInBatch(edit); !st)
                    return failAt(st.error().code, path, lineNo, 0, st.error().message);
                ++report.judgements;
                finished.insert({{article.id.value, coder.value}, phase});
                continue;
            }

            auto functionName = requiredString(o, "function", path, lineNo);
            if (!functionName)
                return std::unexpected(functionName.error());
            const auto function = functionFromKey(*functionName);
            if (!function)
                return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                    CodingImportText::tr(
                        "unknown function \"%1\" (expected problem, cause, evaluation or remedy).")
                        .arg(*functionName));
            auto quoteRaw = requiredString(o, "quote", path, lineNo);
            if (!quoteRaw)
                return std::unexpected(quoteRaw.error());
            const QString quote = canonicalText(*quoteRaw);
            const QJsonValue occurrenceValue = o.value(QLatin1String("occurrence"));
            if (!occurrenceValue.isUndefined()
                && (!occurrenceValue.isDouble() || occurrenceValue.toInt() < 1))
                return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                    CodingImportText::tr("field \"occurrence\" must be a whole number from 1."));
            const int occurrence = occurrenceValue.isUndefined() ? 1 : occurrenceValue.toInt();
            qsizetype at = -1;
            for (int n = 0; n < occurrence; ++n) {
                at = article.text.indexOf(quote, at + 1);
                if (at < 0)
                    return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                        CodingImportText::tr(
                            "the quote \"%1\" does not occur %2 time(s) in article \"%3\".")
                            .arg(quote.left(60))
                            .arg(occurrence)
                            .arg(*articleKey));
            }
            AnnotationContent content;
            content.function = *function;
            content.range = article.map.codePointRange(Utf16Range {at, at + quote.size()});
            content.attributes = o.value(QLatin1String("attributes")).toObject();
            content.note = o.value(QLatin1String("note")).toString();
            if (o.value(QLatin1String("confidence")).isDouble())
                content.confidence = o.value(QLatin1String("confidence")).toDouble();
            const QJsonValue goldValue = o.value(QLatin1String("gold"));
            if (!goldValue.isUndefined() && !goldValue.isBool())
                return failAt(ErrorCode::InvalidInput, path, lineNo, 0,
                    CodingImportText::tr("field \"gold\" must be true or false."));
            if (goldValue.toBool()) {
                if (!article.goldKeys
                         .insert({int(content.function), content.range.start, content.range.end})
                         .second) {
                    ++report.skipped;
                    continue;
                }
                // A lead's gold span: its provenance is every live span of the same function
                // that overlaps it.
                if (!article.spans) {
                    auto existing = project.annotations(article.id);
                    if (!existing)
                        return std::unexpected(existing.error());
                    article.spans = std::move(*existing);
                }
                std::vector<AnnotationId> sources;
                for (const Annotation &a : *article.spans)
                    if (a.content.function == content.function
                        && a.content.range.overlaps(content.range))
                        sources.push_back(a.id);
                content.note.clear();
                content.confidence.reset();
                AdjudicateSpanEdit edit(article.id, coder, content, std::move(sources),
                    o.value(QLatin1String("rationale")).toString());
                if (auto st = project.applyInBatch(edit); !st)
                    return failAt(st.error().code, path, lineNo, 0, st.error().message);
                ++report.gold;
                continue;
            }
            if (!article.spanKeys
                     .insert({coder.value, int(content.function), content.range.start,
                         content.range.end, int(phase)})
                     .second) {
                ++report.skipped;
                continue;
            }
            AddAnnotationEdit edit(article.id, coder, content, phase);
            if (auto st = project.applyInBatch(edit); !st)
                return failAt(st.error().code, path, lineNo, 0, st.error().message);
            ++report.spans;
            article.spans.reset();
            finished.insert({{article.id.value, coder.value}, phase});
        }
        // Imported codings are finished work: each article is marked done for its coder, so
        // that it counts (CodingScope).
        for (const auto &[pair, phase] : finished) {
            SetArticleStatusEdit done(
                ArticleId {pair.first}, CoderId {pair.second}, QStringLiteral("done"), phase);
            FOURFOLD_TRY_STATUS(project.applyInBatch(done));
        }
        report.articlesDone = qint64(finished.size());
        return {};
    };
    FOURFOLD_TRY_STATUS(project.batch(work));
    return report;
}

} // namespace fourfold
