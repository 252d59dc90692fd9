#include "core/io/document_split.h"

#include <QCoreApplication>
#include <QStringList>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct DocumentSplitText {
    Q_DECLARE_TR_FUNCTIONS(DocumentSplitText)
};

const QStringList &groupNames()
{
    static const QStringList names {
        QStringLiteral("title"), QStringLiteral("outlet"), QStringLiteral("date")};
    return names;
}

struct Part {
    qint64 line = 0; // 1-based line of the document's text where the part begins
    QString title;
    QString outlet;
    QString published;
    QStringList lines;
};

} // namespace

Result<QRegularExpression> compileSplitPattern(const QString &pattern)
{
    QRegularExpression re(pattern, QRegularExpression::UseUnicodePropertiesOption);
    if (pattern.isEmpty())
        return fail(
            ErrorCode::InvalidArgument, DocumentSplitText::tr("The split pattern is empty."));
    if (!re.isValid())
        return fail(ErrorCode::InvalidArgument,
            DocumentSplitText::tr(
                "The split pattern \"%1\" is not a valid regular expression: %2 (at character "
                "%3).")
                .arg(pattern, re.errorString())
                .arg(re.patternErrorOffset() + 1));
    for (const QString &name : re.namedCaptureGroups())
        if (!name.isEmpty() && !groupNames().contains(name))
            return fail(ErrorCode::InvalidArgument,
                DocumentSplitText::tr(
                    "The split pattern \"%1\" names the group \"%2\"; the groups it may name are "
                    "title, outlet and date.")
                    .arg(pattern, name));
    return re;
}

Status splitDocument(const ImportedArticle &document, const QRegularExpression &pattern,
    const ImportedArticleSink &sink)
{
    const QString file = document.sourceFile;
    const QStringList lines = document.text.split(QLatin1Char('\n'));
    std::vector<Part> parts;
    Part before; // the text before the first matching line
    before.line = 1;
    bool matched = false;
    for (qsizetype i = 0; i < lines.size(); ++i) {
        const QRegularExpressionMatch m = pattern.match(lines[i]);
        if (m.hasMatch()) {
            matched = true;
            Part p;
            p.line = i + 1;
            p.title = m.captured(QStringLiteral("title")).simplified();
            p.outlet = m.captured(QStringLiteral("outlet")).simplified();
            p.published = m.captured(QStringLiteral("date")).trimmed();
            parts.push_back(std::move(p));
            continue;
        }
        (parts.empty() ? before : parts.back()).lines << lines[i];
    }
    if (!matched)
        return failAt(ErrorCode::InvalidInput, file, 0, 0,
            DocumentSplitText::tr("the split pattern \"%1\" matches no line of the document")
                .arg(pattern.pattern()));
    // A lone line before the first match is the document's heading, not a part.
    const auto filled = std::ranges::count_if(
        before.lines, [](const QString &l) { return !l.trimmed().isEmpty(); });
    if (filled > 1)
        parts.insert(parts.begin(), std::move(before));

    for (size_t n = 0; n < parts.size(); ++n) {
        Part &p = parts[n];
        // Blank lines at either end go; inside, the paragraph breaks stay.
        while (!p.lines.isEmpty() && p.lines.front().trimmed().isEmpty())
            p.lines.removeFirst();
        while (!p.lines.isEmpty() && p.lines.back().trimmed().isEmpty())
            p.lines.removeLast();
        if (p.title.isEmpty() && !p.lines.isEmpty()) {
            p.title = p.lines.takeFirst().simplified();
            while (!p.lines.isEmpty() && p.lines.front().trimmed().isEmpty())
                p.lines.removeFirst();
        }
        if (p.lines.isEmpty())
            return failAt(ErrorCode::InvalidInput, file, p.line, 0,
                DocumentSplitText::tr(
                    "part %1 of the document (from this line) holds no text besides its title")
                    .arg(n + 1));
        ImportedArticle a;
        a.externalId = QStringLiteral("%1#%2").arg(document.externalId).arg(n + 1);
        a.title = p.title;
        a.outlet = p.outlet;
        a.published = p.published;
        a.language = document.language;
        a.text = p.lines.join(QLatin1Char('\n'));
        a.meta = document.meta;
        a.meta.insert(QStringLiteral("part"), qint64(n + 1));
        a.sourceFile = document.sourceFile;
        a.sourceLine = p.line;
        FOURFOLD_TRY_STATUS(sink(std::move(a)));
    }
    return {};
}

} // namespace fourfold
