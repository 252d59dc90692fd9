#include "core/project/codebook_versions.h"

#include "core/io/input_file.h"
#include "core/project/project.h"
#include "core/project/study_names.h"
#include "core/store/codebook_table.h"

#include <QJsonArray>
#include <QJsonDocument>

#include <algorithm>

namespace fourfold {

using namespace study;

namespace {

// --- codebook diff -----------------------------------------------------------------------------

QString joined(const QStringList &list)
{
    return list.join(QStringLiteral("; "));
}

QString attributeTypeKey(AttributeSpec::Type type)
{
    return type == AttributeSpec::Type::Choice ? QStringLiteral("choice") : QStringLiteral("text");
}

QString describe(const AttributeSpec &a)
{
    QString s = QStringLiteral("%1 (%2").arg(a.label, attributeTypeKey(a.type));
    if (a.type == AttributeSpec::Type::Choice)
        s += QStringLiteral(": %1; %2").arg(joined(a.values), measurementLevelKey(a.level));
    return s + QLatin1Char(')');
}

// "neutral → negative; unsure → neutral", in order of the recoded value.
QString recodeText(const QMap<QString, QString> &recode)
{
    QStringList parts;
    for (auto it = recode.begin(); it != recode.end(); ++it)
        parts << QStringLiteral("%1 → %2").arg(it.key(), it.value());
    return joined(parts);
}

QString describe(const ArticleItem &item)
{
    return QStringLiteral("%1 (%2; %3)")
        .arg(item.question, joined(item.values), measurementLevelKey(item.level));
}

class DiffBuilder
{
public:
    std::vector<CodebookChange> changes;

    void compare(const QString &path, std::optional<FramingFunction> f, const QString &before,
        const QString &after)
    {
        if (before != after)
            changes.push_back({CodebookChange::Kind::Changed, path, f, before, after});
    }
    void added(const QString &path, std::optional<FramingFunction> f, const QString &after)
    {
        changes.push_back({CodebookChange::Kind::Added, path, f, QString(), after});
    }
    void removed(const QString &path, std::optional<FramingFunction> f, const QString &before)
    {
        changes.push_back({CodebookChange::Kind::Removed, path, f, before, QString()});
    }
    // A text that a translation may leave out (empty: not given, the codebook's own stands).
    void text(const QString &path, std::optional<FramingFunction> f, const QString &before,
        const QString &after)
    {
        if (before.isEmpty() && !after.isEmpty())
            added(path, f, after);
        else if (!before.isEmpty() && after.isEmpty())
            removed(path, f, before);
        else
            compare(path, f, before, after);
    }
};

// The keys of `from`'s list, then those only `to` has.
template<typename T>
QStringList keysOfBoth(const std::vector<T> &from, const std::vector<T> &to)
{
    QStringList keys;
    for (const auto &list : {&from, &to})
        for (const T &x : *list)
            if (!keys.contains(x.key))
                keys << x.key;
    return keys;
}

// The texts of every language either codebook has, under "translations.<code>.": a text changed
// for a function counts as a change of that function, as its own text does.
void compareTranslations(DiffBuilder &d, const Codebook &from, const Codebook &to)
{
    QStringList languages = from.translations.keys();
    for (const QString &l : to.translations.keys())
        if (!languages.contains(l))
            languages << l;
    languages.sort();
    for (const QString &l : languages) {
        const CodebookTexts a = from.translations.value(l);
        const CodebookTexts b = to.translations.value(l);
        const QString tp = QStringLiteral("translations.%1.").arg(l);
        d.text(tp + QStringLiteral("name"), std::nullopt, a.name, b.name);
        for (FramingFunction f : kFramingFunctions) {
            const FunctionTexts x = a.functions.value(f);
            const FunctionTexts y = b.functions.value(f);
            const QString p = tp + functionKey(f) + QLatin1Char('.');
            d.text(p + QStringLiteral("label"), f, x.label, y.label);
            d.text(p + QStringLiteral("definition"), f, x.definition, y.definition);
            d.text(p + QStringLiteral("rules"), f, joined(x.rules), joined(y.rules));
            d.text(p + QStringLiteral("examples"), f, joined(x.examples), joined(y.examples));
            const auto &fa = from.definition(f).attributes;
            const auto &ta = to.definition(f).attributes;
            for (const QString &key : keysOfBoth(fa, ta)) {
                // Only a label of an attribute the codebook has is stored with it.
                const auto label = [&key](const auto &attributes, const FunctionTexts &t) {
                    return std::ranges::find(attributes, key, &AttributeSpec::key)
                            == attributes.end()
                        ? QString()
                        : t.attributeLabels.value(key);
                };
                d.text(p + QStringLiteral("attributes.%1.label").arg(key), f, label(fa, x),
                    label(ta, y));
            }
        }
        for (const QString &key : keysOfBoth(from.items, to.items))
            d.text(QStringLiteral("%1items.%2.question").arg(tp, key), std::nullopt,
                from.item(key) ? a.questions.value(key) : QString(),
                to.item(key) ? b.questions.value(key) : QString());
    }
}

QString changeKindKey(CodebookChange::Kind kind)
{
    switch (kind) {
    case CodebookChange::Kind::Added:
        return QStringLiteral("added");
    case CodebookChange::Kind::Removed:
        return QStringLiteral("removed");
    case CodebookChange::Kind::Changed:
        break;
    }
    return QStringLiteral("changed");
}

} // namespace

std::vector<FramingFunction> CodebookDiff::changedFunctions() const
{
    std::vector<FramingFunction> out;
    for (FramingFunction f : kFramingFunctions)
        if (std::ranges::any_of(changes, [&](const CodebookChange &c) { return c.function == f; }))
            out.push_back(f);
    return out;
}

Result<std::vector<CodebookVersionInfo>> CodebookVersions::list(const Project &project)
{
    auto rows = store::codebookVersionRows(project.db());
    if (!rows)
        return std::unexpected(rows.error());
    std::vector<CodebookVersionInfo> out;
    for (const store::CodebookVersionRow &r : *rows)
        out.push_back({r.id, r.number, r.createdAt, r.createdBy, r.note});
    return out;
}

Result<Codebook> CodebookVersions::version(const Project &project, int number)
{
    return store::codebookByNumber(project.db(), number);
}

Result<std::unique_ptr<AddCodebookVersionEdit>> CodebookVersions::addEdit(
    const Project &project, const Codebook &codebook, const QString &note, CoderId author)
{
    if (note.trimmed().isEmpty())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr(
                "A new codebook version needs a note that says what changed and why."));
    auto current = store::currentCodebook(project.db());
    if (!current)
        return std::unexpected(current.error());
    // The codebook as it will be stored and read back, so the recorded diff is the stored one.
    auto stored =
        Codebook::fromJson(QJsonDocument(codebook.toJson()).toJson(QJsonDocument::Compact),
            QString(), CodebookCheck::Stored);
    if (!stored)
        return std::unexpected(stored.error());
    CodebookDiff changes = diff(*current, *stored);
    if (changes.changes.empty())
        return fail(ErrorCode::InvalidArgument,
            StudyDesignText::tr("The codebook is the same as version %1; no new version was made.")
                .arg(current->number));
    FOURFOLD_TRY_STATUS(AddCodebookVersionEdit::checkValuesInUse(project.db(), *current, codebook));
    changes.from = current->number;
    changes.to = current->number + 1;
    QJsonObject detail = diffJson(changes);
    detail.insert(QStringLiteral("note"), note.trimmed());
    return std::make_unique<AddCodebookVersionEdit>(
        author, codebook, note.trimmed(), changes.to, detail);
}

Result<CodebookVersionInfo> CodebookVersions::add(
    Project &project, const Codebook &codebook, const QString &note, CoderId author)
{
    auto edit = addEdit(project, codebook, note, author);
    if (!edit)
        return std::unexpected(edit.error());
    FOURFOLD_TRY_STATUS(project.apply(**edit));
    auto versions = list(project);
    if (!versions)
        return std::unexpected(versions.error());
    return versions->back();
}

Result<Codebook> CodebookVersions::readFile(const QString &path)
{
    const auto bytes = readWholeFile(path, maxCodebookFileSize);
    if (!bytes)
        return std::unexpected(bytes.error());
    return Codebook::fromJson(*bytes, path);
}

Result<CodebookVersionInfo> CodebookVersions::addFromFile(
    Project &project, const QString &path, const QString &note, CoderId author)
{
    auto book = readFile(path);
    if (!book)
        return std::unexpected(book.error());
    return add(project, *book, note, author);
}

CodebookDiff CodebookVersions::diff(const Codebook &from, const Codebook &to)
{
    DiffBuilder d;
    d.compare(QStringLiteral("name"), std::nullopt, from.name, to.name);
    for (FramingFunction f : kFramingFunctions) {
        const FunctionDefinition &a = from.definition(f);
        const FunctionDefinition &b = to.definition(f);
        const QString p = functionKey(f) + QLatin1Char('.');
        d.compare(p + QStringLiteral("label"), f, a.label, b.label);
        d.compare(p + QStringLiteral("definition"), f, a.definition, b.definition);
        d.compare(p + QStringLiteral("rules"), f, joined(a.rules), joined(b.rules));
        d.compare(p + QStringLiteral("examples"), f, joined(a.examples), joined(b.examples));
        for (const AttributeSpec &x : a.attributes) {
            const QString ap = p + QStringLiteral("attributes.") + x.key;
            const auto y = std::ranges::find(b.attributes, x.key, &AttributeSpec::key);
            if (y == b.attributes.end()) {
                d.removed(ap, f, describe(x));
                continue;
            }
            d.compare(ap + QStringLiteral(".label"), f, x.label, y->label);
            d.compare(ap + QStringLiteral(".type"), f, attributeTypeKey(x.type),
                attributeTypeKey(y->type));
            d.compare(ap + QStringLiteral(".values"), f, joined(x.values), joined(y->values));
            d.compare(ap + QStringLiteral(".level"), f, measurementLevelKey(x.level),
                measurementLevelKey(y->level));
            d.compare(
                ap + QStringLiteral(".recode"), f, recodeText(x.recode), recodeText(y->recode));
        }
        for (const AttributeSpec &y : b.attributes)
            if (std::ranges::find(a.attributes, y.key, &AttributeSpec::key) == a.attributes.end())
                d.added(p + QStringLiteral("attributes.") + y.key, f, describe(y));
    }
    for (const ArticleItem &x : from.items) {
        const QString ip = QStringLiteral("items.") + x.key;
        const ArticleItem *y = to.item(x.key);
        if (!y) {
            d.removed(ip, std::nullopt, describe(x));
            continue;
        }
        d.compare(ip + QStringLiteral(".question"), std::nullopt, x.question, y->question);
        d.compare(
            ip + QStringLiteral(".values"), std::nullopt, joined(x.values), joined(y->values));
        d.compare(ip + QStringLiteral(".level"), std::nullopt, measurementLevelKey(x.level),
            measurementLevelKey(y->level));
        d.compare(ip + QStringLiteral(".recode"), std::nullopt, recodeText(x.recode),
            recodeText(y->recode));
    }
    for (const ArticleItem &y : to.items)
        if (!from.item(y.key))
            d.added(QStringLiteral("items.") + y.key, std::nullopt, describe(y));
    compareTranslations(d, from, to);
    return CodebookDiff {from.number, to.number, std::move(d.changes)};
}

Result<CodebookDiff> CodebookVersions::diffBetween(const Project &project, int from, int to)
{
    auto a = version(project, from);
    if (!a)
        return std::unexpected(a.error());
    auto b = version(project, to);
    if (!b)
        return std::unexpected(b.error());
    return diff(*a, *b);
}

QString CodebookVersions::diffText(const CodebookDiff &diff)
{
    QStringList lines;
    lines << StudyDesignText::tr("Codebook version %1 → %2").arg(diff.from).arg(diff.to);
    if (diff.changes.empty())
        lines << StudyDesignText::tr("no changes");
    for (const CodebookChange &c : diff.changes) {
        switch (c.kind) {
        case CodebookChange::Kind::Added:
            lines << QStringLiteral("+ %1: «%2»").arg(c.path, c.after);
            break;
        case CodebookChange::Kind::Removed:
            lines << QStringLiteral("- %1: «%2»").arg(c.path, c.before);
            break;
        case CodebookChange::Kind::Changed:
            lines << QStringLiteral("~ %1: «%2» → «%3»").arg(c.path, c.before, c.after);
            break;
        }
    }
    return lines.join(QLatin1Char('\n'));
}

QJsonObject CodebookVersions::diffJson(const CodebookDiff &diff)
{
    QJsonArray changes;
    for (const CodebookChange &c : diff.changes) {
        QJsonObject o {
            {QStringLiteral("kind"), changeKindKey(c.kind)}, {QStringLiteral("path"), c.path}};
        if (c.function)
            o.insert(QStringLiteral("function"), functionKey(*c.function));
        if (c.kind != CodebookChange::Kind::Added)
            o.insert(QStringLiteral("before"), c.before);
        if (c.kind != CodebookChange::Kind::Removed)
            o.insert(QStringLiteral("after"), c.after);
        changes.append(o);
    }
    return QJsonObject {{QStringLiteral("from"), diff.from}, {QStringLiteral("to"), diff.to},
        {QStringLiteral("changes"), changes}};
}

} // namespace fourfold
