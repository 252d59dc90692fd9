#include "core/exchange/iob2_format.h"

#include "core/text/offset_map.h"

#include <QCoreApplication>

#include <algorithm>
#include <array>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct Iob2FormatText {
    Q_DECLARE_TR_FUNCTIONS(Iob2FormatText)
};

// Ranges of one function, overlapping ones merged (a column holds one chunk at a time).
std::vector<TextRange> mergedRanges(const std::vector<Iob2Span> &spans, FramingFunction f)
{
    std::vector<TextRange> ranges;
    for (const Iob2Span &s : spans)
        if (s.function == f && !s.range.isEmpty())
            ranges.push_back(s.range);
    std::sort(ranges.begin(), ranges.end());
    std::vector<TextRange> merged;
    for (const TextRange &r : ranges) {
        if (!merged.empty() && r.start < merged.back().end)
            merged.back().end = std::max(merged.back().end, r.end);
        else
            merged.push_back(r);
    }
    return merged;
}

// The token's text in UTF-8, "_" for none.
QByteArray tokenText(const QString &text, const OffsetMap &map, const TextRange &token)
{
    const Utf16Range u = map.utf16Range(token);
    if (u.start < 0 || u.isEmpty())
        return QByteArrayLiteral("_");
    QByteArray t = QStringView(text).mid(u.start, u.length()).toUtf8();
    // Tokens hold no white space; guard the format's separators all the same.
    for (char &c : t)
        if (c == '\t' || c == '\n' || c == '\r')
            c = ' ';
    return t;
}

} // namespace

QByteArray iob2Header()
{
    QString out = QStringLiteral("# fourfold iob2: token start end");
    for (FramingFunction f : kFramingFunctions)
        out += QLatin1Char(' ') + functionKey(f);
    out += QLatin1Char('\n');
    return out.toUtf8();
}

QByteArray writeIob2(const std::vector<Iob2Document> &documents, bool withText)
{
    QByteArray out = iob2Header();
    for (const Iob2Document &d : documents)
        out += writeIob2Document(d, withText);
    return out;
}

QByteArray writeIob2Document(const Iob2Document &d, bool withText)
{
    // Written straight into UTF-8 bytes, a token line at a time: a document has thousands.
    static const auto tags = [] {
        std::array<std::array<QByteArray, 2>, 4> t; // per function: begin, inside
        for (FramingFunction f : kFramingFunctions) {
            const QByteArray key = functionKey(f).toUtf8();
            t[std::size_t(f)] = {"\tB-" + key, "\tI-" + key};
        }
        return t;
    }();
    QByteArray out = QStringLiteral("# article = %1\n# sha256 = %2\n# source = %3\n")
                         .arg(d.externalId, d.sha256, d.source)
                         .toUtf8();
    out.reserve(out.size() + qsizetype(d.tokens.size()) * 56 + 1);
    const bool text = withText && !d.text.isEmpty();
    const OffsetMap map(text ? d.text : QString());
    std::array<std::vector<TextRange>, 4> ranges;
    std::array<std::size_t, 4> next {};
    std::array<qint64, 4> open {-1, -1, -1, -1}; // start of the chunk the last token was in
    for (FramingFunction f : kFramingFunctions)
        ranges[std::size_t(f)] = mergedRanges(d.spans, f);
    for (const TextRange &token : d.tokens) {
        if (text)
            out += tokenText(d.text, map, token);
        else
            out += '_';
        out += '\t';
        out += QByteArray::number(token.start);
        out += '\t';
        out += QByteArray::number(token.end);
        for (FramingFunction f : kFramingFunctions) {
            const std::size_t i = std::size_t(f);
            auto &n = next[i];
            while (n < ranges[i].size() && ranges[i][n].end <= token.start)
                ++n;
            if (n < ranges[i].size() && ranges[i][n].overlaps(token)) {
                const bool continues = open[i] == ranges[i][n].start;
                out += tags[i][continues ? 1 : 0];
                open[i] = ranges[i][n].start;
            } else {
                out += "\tO";
                open[i] = -1;
            }
        }
        out += '\n';
    }
    out += '\n';
    return out;
}

Result<std::vector<Iob2Document>> readIob2(const QByteArray &bytes, const QString &file)
{
    std::vector<Iob2Document> docs;
    const QString all = QString::fromUtf8(bytes);
    const QStringList lines = all.split(QLatin1Char('\n'));
    Iob2Document *doc = nullptr;
    std::array<qint64, 4> open {-1, -1, -1, -1};
    std::array<qint64, 4> openEnd {};
    auto close = [&](std::size_t i) {
        if (doc && open[i] >= 0)
            doc->spans.push_back(Iob2Span {kFramingFunctions[i], TextRange {open[i], openEnd[i]}});
        open[i] = -1;
    };
    auto finish = [&]() {
        for (std::size_t i = 0; i < 4; ++i)
            close(i);
        if (doc)
            std::sort(
                doc->spans.begin(), doc->spans.end(), [](const Iob2Span &a, const Iob2Span &b) {
                    return std::pair(int(a.function), a.range)
                        < std::pair(int(b.function), b.range);
                });
    };
    for (qsizetype n = 0; n < lines.size(); ++n) {
        const QString &line = lines[n];
        const qint64 lineNo = n + 1;
        if (line.isEmpty()) {
            finish();
            doc = nullptr;
            continue;
        }
        if (line.startsWith(QLatin1Char('#'))) {
            const qsizetype eq = line.indexOf(QStringLiteral(" = "));
            if (eq < 0)
                continue;
            const QString key = line.mid(1, eq - 1).trimmed();
            const QString value = line.mid(eq + 3);
            if (key == QLatin1String("article")) {
                finish();
                docs.push_back(Iob2Document {});
                doc = &docs.back();
                doc->externalId = value;
            } else if (doc && key == QLatin1String("sha256")) {
                doc->sha256 = value;
            } else if (doc && key == QLatin1String("source")) {
                doc->source = value;
            }
            continue;
        }
        if (!doc)
            return failAt(ErrorCode::InvalidInput, file, lineNo, 1,
                Iob2FormatText::tr("A token row comes before any \"# article = ...\" line."));
        const QStringList fields = line.split(QLatin1Char('\t'));
        if (fields.size() != 7)
            return failAt(ErrorCode::InvalidInput, file, lineNo, 1,
                Iob2FormatText::tr(
                    "A token row needs 7 tab-separated fields (token, start, end and one tag per "
                    "function); this one has %1.")
                    .arg(fields.size()));
        bool okStart = false, okEnd = false;
        const TextRange token {fields[1].toLongLong(&okStart), fields[2].toLongLong(&okEnd)};
        if (!okStart || !okEnd || token.start < 0 || token.end <= token.start)
            return failAt(ErrorCode::InvalidInput, file, lineNo, fields[0].size() + 2,
                Iob2FormatText::tr(
                    "The token's start and end must be whole numbers with start < end."));
        doc->tokens.push_back(token);
        qint64 column = fields[0].size() + fields[1].size() + fields[2].size() + 4;
        for (std::size_t i = 0; i < 4; ++i) {
            const QString &tag = fields[qsizetype(i) + 3];
            const QString key = functionKey(kFramingFunctions[i]);
            if (tag == QLatin1String("O")) {
                close(i);
            } else if (tag == QStringLiteral("B-") + key) {
                close(i);
                open[i] = token.start;
                openEnd[i] = token.end;
            } else if (tag == QStringLiteral("I-") + key) {
                if (open[i] < 0)
                    return failAt(ErrorCode::InvalidInput, file, lineNo, column,
                        Iob2FormatText::tr(
                            "\"%1\" continues no chunk: in IOB2 a chunk starts with B-.")
                            .arg(tag));
                openEnd[i] = token.end;
            } else {
                return failAt(ErrorCode::InvalidInput, file, lineNo, column,
                    Iob2FormatText::tr("The tag \"%1\" is not O, B-%2 or I-%2.").arg(tag, key));
            }
            column += tag.size() + 1;
        }
    }
    finish();
    return docs;
}

} // namespace fourfold
