#include "app/desktop/codebook/codebook_field_check.h"

#include <QCoreApplication>
#include <QJsonDocument>
#include <QRegularExpression>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct CodebookEditorText {
    Q_DECLARE_TR_FUNCTIONS(CodebookEditorText)
};

// The first key path the reader's sentence names ("functions[2].attributes[0].values[1]").
QString namedPath(const QString &message)
{
    static const QRegularExpression path(
        QStringLiteral(R"((?:functions|items)\[\d+\](?:\.[A-Za-z_]+(?:\[\d+\])?)*)"));
    const QRegularExpressionMatch m = path.match(message);
    if (m.hasMatch())
        return m.captured(0);
    return message.contains(QLatin1String("name")) ? QStringLiteral("name") : QString();
}

// The path cut to an edited field: a list element to its list, a recoding to the value list
// (recodings are kept, not edited, and fail when a value they point to was taken out).
QString editedField(const QString &path)
{
    static const QRegularExpression field(QStringLiteral(
        R"(^((?:functions\[\d+\](?:\.attributes\[\d+\])?|items\[\d+\])\.([A-Za-z_]+)))"));
    const QRegularExpressionMatch m = field.match(path);
    if (!m.hasMatch())
        return path;
    if (m.captured(2) == QLatin1String("recode"))
        return m.captured(0).chopped(6) + QStringLiteral("values");
    return m.captured(1);
}

int indexIn(const QString &path, const QString &list)
{
    static const QRegularExpression index(QStringLiteral(R"(\[(\d+)\])"));
    const qsizetype at = path.indexOf(list + QLatin1Char('['));
    if (at < 0)
        return -1;
    const QRegularExpressionMatch m = index.match(path, at + list.size());
    return m.hasMatch() ? m.captured(1).toInt() : -1;
}

// A sentence for the value list `values`, when it breaks a rule the editor can say plainly.
QString valuesSentence(const QStringList &values)
{
    if (values.isEmpty())
        return CodebookEditorText::tr("A choice list needs at least one value (one per line).");
    for (qsizetype i = 0; i < values.size(); ++i) {
        if (values[i].trimmed().isEmpty())
            return CodebookEditorText::tr("Line %1 is empty: every value needs a name.").arg(i + 1);
        const qsizetype first = values.indexOf(values[i]);
        if (first < i)
            return CodebookEditorText::tr("“%1” is listed twice (lines %2 and %3).")
                .arg(values[i])
                .arg(first + 1)
                .arg(i + 1);
    }
    return {};
}

QString sentenceFor(const Codebook &draft, const QString &field, const QString &fallback)
{
    const int f = indexIn(field, QStringLiteral("functions"));
    const int a = indexIn(field, QStringLiteral("attributes"));
    const int i = indexIn(field, QStringLiteral("items"));
    const AttributeSpec *attribute = f >= 0 && f < int(draft.functions.size()) && a >= 0
            && a < int(draft.functions[size_t(f)].attributes.size())
        ? &draft.functions[size_t(f)].attributes[size_t(a)]
        : nullptr;
    const ArticleItem *item =
        f < 0 && i >= 0 && i < int(draft.items.size()) ? &draft.items[size_t(i)] : nullptr;
    QString sentence;
    if (field.endsWith(QLatin1String(".values")) && (attribute || item))
        sentence = valuesSentence(attribute ? attribute->values : item->values);
    else if (field.endsWith(QLatin1String(".key")) && (attribute || item)) {
        const QString key = attribute ? attribute->key : item->key;
        if (key.isEmpty())
            sentence =
                CodebookEditorText::tr("The key is empty: give a short name such as “polarity”.");
        else if (attribute)
            sentence = CodebookEditorText::tr(
                "Another attribute of this function already has the key “%1”.")
                           .arg(key);
        else
            sentence = CodebookEditorText::tr("Another item already has the key “%1”.").arg(key);
    }
    return sentence.isEmpty() ? fallback : sentence;
}

} // namespace

CodebookCheckResult checkCodebookDraft(const Codebook &draft)
{
    const QByteArray json = QJsonDocument(draft.toJson()).toJson(QJsonDocument::Indented);
    auto book = Codebook::fromJson(
        json, CodebookEditorText::tr("the codebook being edited"), CodebookCheck::File);
    if (book)
        return {std::move(*book), std::nullopt};
    const QString field = editedField(namedPath(book.error().message));
    return {
        std::nullopt, CodebookFieldError {field, sentenceFor(draft, field, book.error().message)}};
}

} // namespace fourfold
