#include "core/project/copy_validation.h"

#include "core/model/text_range.h"
#include "core/text/offset_map.h"

#include <QCoreApplication>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CopyValidationText {
    Q_DECLARE_TR_FUNCTIONS(CopyValidationText)
};

Error refused(QString sentence)
{
    return fail(ErrorCode::InvalidInput, std::move(sentence)).error();
}

QString typeName(const QString &type)
{
    if (type == QLatin1String("annotation"))
        return CopyValidationText::tr("span");
    if (type == QLatin1String("judgement"))
        return CopyValidationText::tr("answer");
    if (type == QLatin1String("link"))
        return CopyValidationText::tr("link");
    return CopyValidationText::tr("assignment");
}

// The object types an event of each coding action is about.
const QHash<QString, QString> &codingActions()
{
    static const QHash<QString, QString> actions {
        {QStringLiteral("annotation.add"), QStringLiteral("annotation")},
        {QStringLiteral("annotation.change"), QStringLiteral("annotation")},
        {QStringLiteral("annotation.delete"), QStringLiteral("annotation")},
        {QStringLiteral("link.add"), QStringLiteral("link")},
        {QStringLiteral("link.remove"), QStringLiteral("link")},
        {QStringLiteral("judgement.set"), QStringLiteral("judgement")},
        {QStringLiteral("judgement.withdraw"), QStringLiteral("judgement")},
        {QStringLiteral("article.status"), QStringLiteral("assignment")},
    };
    return actions;
}

// Whether `at` lies within the allowance of [from, to]; `what` says which way it does not.
std::optional<QString> outsideWindow(
    const QDateTime &at, const QDateTime &from, const QDateTime &to)
{
    if (!at.isValid())
        return CopyValidationText::tr("is not a time");
    if (at < from.addSecs(-kCopyClockAllowanceSeconds))
        return CopyValidationText::tr("is dated %1, before the copy was handed out (%2)")
            .arg(at.toString(Qt::ISODateWithMs), from.toString(Qt::ISODateWithMs));
    if (at > to.addSecs(kCopyClockAllowanceSeconds))
        return CopyValidationText::tr("is dated %1, in the future (now %2)")
            .arg(at.toString(Qt::ISODateWithMs), to.toString(Qt::ISODateWithMs));
    return std::nullopt;
}

Status checkUuid(const Database &mainDb, const store::PortableRow &row, const CopyHandout &handout,
    const QString &path)
{
    auto other = store::otherUseOfUuid(mainDb, row.uuid, row.type, handout.coder.uuid);
    if (!other)
        return std::unexpected(other.error());
    if (!other->isEmpty())
        return std::unexpected(refused(
            CopyValidationText::tr("The %1 %2 in %3 reuses the uuid of another object in the "
                                   "project (%4); the copy was changed outside Fourfold; "
                                   "it was not merged.")
                .arg(typeName(row.type), row.uuid, path, *other)));
    return {};
}

Status checkSeconds(const store::PortableRow &row, const CopyHandout &handout,
    const QString &article, const QString &path, qint64 allowed, qint64 &total)
{
    const qint64 base = handout.base.value(row.key()).seconds;
    if (row.seconds < 0 || row.seconds < base)
        return std::unexpected(refused(CopyValidationText::tr(
            "The coding time of article \"%1\" in %2 is %3 s, less than the %4 s it was "
            "handed out with; the copy was changed outside Fourfold; it was not merged.")
                                           .arg(article, path)
                                           .arg(row.seconds)
                                           .arg(base)));
    // Both sides are at most `allowed` here, so neither the difference nor the sum overflows.
    const qint64 added = row.seconds - base;
    if (added > allowed - total)
        return std::unexpected(refused(CopyValidationText::tr(
            "%1 adds more coding time (%2 s on article \"%3\", %4 s before it) than has passed "
            "since it was handed out (%5 s, with a day's allowance for clocks); the copy was "
            "changed outside Fourfold; it was not merged.")
                                           .arg(path)
                                           .arg(added)
                                           .arg(article)
                                           .arg(total)
                                           .arg(allowed)));
    total += added;
    return {};
}

Status checkQuote(
    const store::PortableRow &row, const QHash<QString, QString> &texts, const QString &path)
{
    const QString text = texts.value(row.content.value(QLatin1String("article")).toString());
    const TextRange range {row.content.value(QLatin1String("start")).toInteger(),
        row.content.value(QLatin1String("end")).toInteger()};
    const OffsetMap map(text);
    if (!range.isValid() || range.isEmpty() || range.end > map.codePointCount()
        || OffsetMap::slice(text, range) != row.content.value(QLatin1String("quote")).toString())
        return std::unexpected(refused(CopyValidationText::tr(
            "Span %1 in %2 does not quote its article's text at [%3, %4); the copy "
            "was changed outside Fourfold; it was not merged.")
                                           .arg(row.uuid, path)
                                           .arg(range.start)
                                           .arg(range.end)));
    return {};
}

} // namespace

void CopyHandout::collectArticles()
{
    articles.clear();
    const QString prefix = QStringLiteral("assignment/");
    for (auto it = base.cbegin(); it != base.cend(); ++it)
        if (it.key().startsWith(prefix))
            articles.insert(it.key().mid(prefix.size()).section(QLatin1Char('/'), 0, 0));
}

QDateTime parseStoredTime(const QString &text)
{
    QDateTime at = QDateTime::fromString(text, Qt::ISODateWithMs);
    if (!at.isValid())
        at = QDateTime::fromString(text, Qt::ISODate);
    return at.isValid() ? at.toUTC() : QDateTime();
}

Status validateCopyRows(const Database &mainDb, const std::vector<store::PortableRow> &rows,
    const CopyHandout &handout, const QHash<QString, QString> &texts,
    const QHash<QString, QString> &externalIds, const QString &path, const QDateTime &now)
{
    QHash<QString, QString> typeOfUuid;
    QSet<QString> spans;
    for (const store::PortableRow &row : rows) {
        const auto seen = typeOfUuid.constFind(row.uuid);
        if (seen != typeOfUuid.cend())
            return std::unexpected(
                refused(CopyValidationText::tr(
                    "%1 holds two objects (%2, %3) with the same uuid %4; the copy was "
                    "changed outside Fourfold; it was not merged.")
                            .arg(path, typeName(*seen), typeName(row.type), row.uuid)));
        typeOfUuid.insert(row.uuid, row.type);
        if (row.type == QLatin1String("annotation"))
            spans.insert(row.uuid);
    }

    const qint64 allowed = handout.handedOutAt.secsTo(now) + kCopyClockAllowanceSeconds;
    qint64 addedSeconds = 0;
    for (const store::PortableRow &row : rows) {
        FOURFOLD_TRY_STATUS(checkUuid(mainDb, row, handout, path));
        const QString articleUuid = row.content.value(QLatin1String("article")).toString();
        const QString article = externalIds.value(articleUuid, articleUuid);
        if (row.type == QLatin1String("assignment")) {
            if (!handout.base.contains(row.key()))
                return std::unexpected(refused(
                    CopyValidationText::tr(
                        "%1 holds an assignment of article \"%2\" (phase %3) that was not handed "
                        "out in this copy; it was not merged.")
                        .arg(path, article, row.content.value(QLatin1String("phase")).toString())));
            FOURFOLD_TRY_STATUS(checkSeconds(row, handout, article, path, allowed, addedSeconds));
        } else if (row.type == QLatin1String("link")) {
            for (const char *end : {"source", "target"})
                if (!spans.contains(row.content.value(QLatin1String(end)).toString()))
                    return std::unexpected(refused(CopyValidationText::tr(
                        "The link %1 in %2 joins a span that is not in the copy; it "
                        "was not merged.")
                                                       .arg(row.uuid, path)));
        } else if (!handout.articles.contains(articleUuid)) {
            return std::unexpected(refused(
                CopyValidationText::tr("The %1 %2 in %3 is on article \"%4\", which was "
                                       "not handed out to %5 in this copy; it was not "
                                       "merged.")
                    .arg(typeName(row.type), row.uuid, path, article, handout.coder.pseudonym)));
        }
        if (row.type == QLatin1String("annotation"))
            FOURFOLD_TRY_STATUS(checkQuote(row, texts, path));

        // A row the coder made or changed carries the coder's times: they must be possible.
        const auto base = handout.base.constFind(row.key());
        if (base != handout.base.cend() && base->digest == row.digest())
            continue;
        for (const char *column : {"created_at", "modified_at"}) {
            if (!row.content.contains(QLatin1String(column))
                || (base != handout.base.cend() && QLatin1String(column) == "created_at"))
                continue;
            const QString stored = row.content.value(QLatin1String(column)).toString();
            if (auto wrong = outsideWindow(parseStoredTime(stored), handout.handedOutAt, now))
                return std::unexpected(refused(CopyValidationText::tr(
                    "The %1 %2 in %3 %4 (%5 \"%6\"); the copy was changed outside Fourfold; "
                    "it was not merged.")
                                                   .arg(typeName(row.type), row.uuid, path, *wrong,
                                                       QLatin1String(column), stored)));
        }
    }
    return {};
}

Status validateCopyEvents(const Database &mainDb, const std::vector<store::CopyEvent> &events,
    const CopyHandout &handout, const QString &path, const QDateTime &now)
{
    for (const store::CopyEvent &e : events) {
        const QString which =
            CopyValidationText::tr("Event %1 (%2) of %3").arg(e.id).arg(e.action, path);
        if (auto wrong = outsideWindow(parseStoredTime(e.at), handout.handedOutAt, now))
            return std::unexpected(refused(CopyValidationText::tr(
                "%1 %2; the copy's log was changed outside Fourfold; it was not "
                "merged.")
                                               .arg(which, *wrong)));
        if (!e.byCoder) {
            if (e.action == QLatin1String("copy.create") && e.objectType == QLatin1String("copy")
                && e.objectUuid == handout.copyUuid)
                continue;
            return std::unexpected(
                refused(CopyValidationText::tr("%1 is not one a coder's program writes; the copy's "
                                               "log was changed outside Fourfold; it was not "
                                               "merged.")
                            .arg(which)));
        }
        if (e.coderUuid != handout.coder.uuid)
            return std::unexpected(
                refused(CopyValidationText::tr("%1 is not by the copy's coder %2; it was not "
                                               "merged.")
                            .arg(which, handout.coder.pseudonym)));
        QString action = e.action;
        if (action.startsWith(QLatin1String("undo:")))
            action = action.mid(5);
        const auto type = codingActions().constFind(action);
        const bool assignment =
            type != codingActions().cend() && *type == QLatin1String("assignment");
        if (type == codingActions().cend() || e.objectType != *type || !e.detail.isEmpty()
            || (assignment != e.objectUuid.isEmpty()))
            return std::unexpected(
                refused(CopyValidationText::tr("%1 is not an edit a coder can make (object %2 %3); "
                                               "the copy's log was changed outside Fourfold; it "
                                               "was not merged.")
                            .arg(which, e.objectType, e.objectUuid)));
        if (assignment)
            continue;
        auto other = store::otherUseOfUuid(mainDb, e.objectUuid, *type, handout.coder.uuid);
        if (!other)
            return std::unexpected(other.error());
        if (!other->isEmpty())
            return std::unexpected(refused(
                CopyValidationText::tr("%1 is about %2, which is not the coder's own in the "
                                       "project (%3); it was not merged.")
                    .arg(which, e.objectUuid, *other)));
    }
    return {};
}

} // namespace fourfold
