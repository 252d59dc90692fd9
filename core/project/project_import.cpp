// Project::importFile: canonical text, hashing, segmentation and storage of new articles as
// they are read, one transaction per source.
#include "core/model/paragraph_role.h"
#include "core/project/near_copy_check.h"
#include "core/project/project.h"
#include "core/store/article_table.h"
#include "core/store/database.h"
#include "core/store/event_log.h"
#include "core/store/savepoint.h"
#include "core/store/store_util.h"
#include "core/text/canonical_text.h"
#include "core/text/offset_map.h"
#include "core/text/segmenter.h"

#include <QCoreApplication>
#include <QDir>
#include <QDirIterator>
#include <QFileInfo>
#include <QHash>
#include <QRegularExpression>

#include <algorithm>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct ProjectImportText {
    Q_DECLARE_TR_FUNCTIONS(ProjectImportText)
};

// Makes one stored article from an imported record, or an error naming its source line.
Result<Article> prepareArticle(
    const ImportedArticle &in, const QString &sourceName, const QString &defaultLanguage)
{
    const QString file = in.sourceFile.isEmpty() ? sourceName : in.sourceFile;
    Article a;
    a.text = canonicalText(in.text);
    if (a.text.trimmed().isEmpty())
        return failAt(ErrorCode::InvalidInput, file, in.sourceLine, 0,
            ProjectImportText::tr("the article \"%1\" has no text.").arg(in.externalId));
    a.summary.uuid = store::newUuid();
    a.summary.externalId = in.externalId;
    a.summary.title = canonicalText(in.title).simplified();
    a.summary.outlet = canonicalText(in.outlet).simplified();
    a.summary.published = in.published.trimmed();
    a.summary.language = in.language.trimmed().isEmpty() ? defaultLanguage : in.language.trimmed();
    a.summary.length = OffsetMap(a.text).codePointCount();
    a.summary.sha256 = textSha256(a.text);
    a.metadata = in.meta;
    a.source = file;

    auto units = segmentText(a.text, a.summary.language);
    if (!units)
        return failAt(units.error().code, file, in.sourceLine, 0,
            ProjectImportText::tr("the article \"%1\" cannot be segmented: %2")
                .arg(in.externalId, units.error().message));
    const qsizetype n = qsizetype(units->paragraphs.size());
    for (qsizetype i = 0; i < n; ++i)
        a.paragraphs.push_back(
            Paragraph {units->paragraphs[size_t(i)], defaultParagraphRole(i, n)});
    a.sentences = std::move(units->sentences);
    a.tokens = std::move(units->tokens);
    return a;
}

// The files of a folder and its subfolders, by path relative to it in code-unit order (the same
// on every system); hidden files and folders (names starting with ".") are left out.
QStringList folderFiles(const QString &folder)
{
    QStringList files;
    QDirIterator it(folder, QDir::Files | QDir::NoDotAndDotDot, QDirIterator::Subdirectories);
    const QDir base(folder);
    while (it.hasNext()) {
        const QString file = it.next();
        const QString relative = base.relativeFilePath(file);
        if (relative.startsWith(QLatin1Char('.')) || relative.contains(QStringLiteral("/.")))
            continue;
        files << relative;
    }
    std::ranges::sort(files);
    return files;
}

} // namespace

Result<ImportReport> Project::importFile(
    const QString &path, const ImportOptions &options, const ImportProgress &progress)
{
    FOURFOLD_TRY_STATUS(NearCopyCheck::checkThreshold(options.nearCopyThreshold));
    FOURFOLD_TRY_STATUS(checkBeforeImport());
    ImportReport report;
    report.source = path;
    auto sp = Savepoint::begin(db());
    if (!sp)
        return std::unexpected(sp.error());

    QHash<QString, QString> shaInThisImport; // sha256 → external id of its first article
    NearCopyCheck nearCopies(options.nearCopyThreshold);
    ImportedFile *current = nullptr; // the entry of report.files being read
    qint64 readBefore = 0; // a folder: the bytes of the files read before this one
    qint64 folderBytes = 0; // a folder: the bytes of all its files
    const auto add = [&](const ImportedArticle &in) -> Status {
        auto prepared = prepareArticle(in, current->path, m_settings.defaultLanguage);
        if (!prepared)
            return std::unexpected(prepared.error());
        const QString &sha = prepared->summary.sha256;

        auto sameText = store::articleIdBySha256(db(), sha);
        if (!sameText)
            return std::unexpected(sameText.error());
        if (*sameText || shaInThisImport.contains(sha)) {
            QString other = shaInThisImport.value(sha);
            if (other.isEmpty()) {
                auto existing = store::article(db(), **sameText);
                other = existing ? existing->summary.externalId : QString();
            }
            ++current->skipped;
            report.skipped.push_back(SkippedArticle {in.externalId, in.sourceLine,
                ProjectImportText::tr("same text as the article \"%1\" already in the project")
                    .arg(other)});
            return {};
        }
        auto sameId = store::articleIdByExternalId(db(), in.externalId);
        if (!sameId)
            return std::unexpected(sameId.error());
        if (*sameId)
            return failAt(ErrorCode::Duplicate, prepared->source, in.sourceLine, 0,
                ProjectImportText::tr(
                    "the id \"%1\" is already used by another article in the project, with a "
                    "different text.")
                    .arg(in.externalId));
        auto id = store::insertArticle(db(), *prepared);
        if (!id)
            return std::unexpected(id.error());
        shaInThisImport.insert(sha, in.externalId);
        report.added.push_back(*id);
        current->articles << in.externalId;
        return nearCopies.check(
            db(), *id, in.externalId, in.sourceLine, prepared->text, report.nearCopies);
    };
    const ArticleVisit visit = [&](ImportedArticle &&in, ReadProgress read) -> Status {
        FOURFOLD_TRY_STATUS(add(in));
        const qint64 total = folderBytes > 0 ? folderBytes : read.totalBytes;
        if (progress && !progress(readBefore + read.bytesRead, total))
            return fail(ErrorCode::Cancelled,
                ProjectImportText::tr("The import of %1 was cancelled; nothing was added.")
                    .arg(path));
        return {};
    };
    if (!QFileInfo(path).isDir()) {
        report.files.push_back(ImportedFile {path, {}, 0, {}});
        current = &report.files.back();
        FOURFOLD_TRY_STATUS(forEachArticle(path, options, visit));
    } else {
        // A folder: every file in it and its subfolders, all or nothing. A file that fails does
        // not stop the reading, so that the report can say what is wrong with each; a file of no
        // format Fourfold reads (told neither by the forced format nor its suffix nor its
        // content) is passed over and listed.
        const QStringList files = folderFiles(path);
        const QDir folder(path);
        for (const QString &file : files)
            folderBytes += QFileInfo(folder.filePath(file)).size();
        report.files.reserve(size_t(files.size()));
        qint64 refused = 0;
        for (const QString &file : files) {
            const QString full = folder.filePath(file);
            report.files.push_back(ImportedFile {full, {}, 0, {}});
            current = &report.files.back();
            // A project kept in the folder it imports (this one or another) and SQLite's files
            // beside it hold no articles; an empty write-ahead log would otherwise fail the
            // whole folder as an empty file.
            static const QRegularExpression projectFile(
                QStringLiteral("\\.fourfold(-wal|-shm|-journal)?$"));
            if (!options.format && projectFile.match(file).hasMatch()) {
                current->passedOver = true;
                current->reason = ProjectImportText::tr("passed over: a Fourfold project file");
                readBefore += QFileInfo(full).size();
                continue;
            }
            const auto added = report.added.size();
            const Status read = forEachArticle(full, options, visit);
            readBefore += QFileInfo(full).size();
            if (read)
                continue;
            if (read.error().code == ErrorCode::Cancelled)
                return std::unexpected(read.error());
            // What a refused file added goes with the rest when the whole folder is undone.
            current->articles.clear();
            if (read.error().code == ErrorCode::Unsupported && !options.format
                && !importFormatFromPath(full)) {
                current->passedOver = true;
                current->reason = ProjectImportText::tr("passed over: not a format Fourfold reads");
                report.added.resize(added);
                continue;
            }
            // The translated sentence only: a raw cause (a library's or the system's English) is
            // left out, as it would mix languages on the report's line.
            current->reason = read.error().message;
            ++refused;
        }
        if (files.isEmpty())
            return fail(ErrorCode::InvalidInput,
                ProjectImportText::tr("The folder %1 holds no files.").arg(path));
        if (refused > 0) {
            QStringList lines;
            for (const ImportedFile &f : report.files)
                lines << (f.reason.isEmpty()
                        ? ProjectImportText::tr(
                            "%1: %n article(s)", nullptr, int(f.articles.size()))
                              .arg(folder.relativeFilePath(f.path))
                        : QStringLiteral("%1: %2").arg(folder.relativeFilePath(f.path), f.reason));
            return fail(ErrorCode::InvalidInput,
                ProjectImportText::tr(
                    "The folder %1 was not imported: %n of its files could not be "
                    "read, so nothing was added.",
                    nullptr, int(refused))
                        .arg(path)
                    + QLatin1Char('\n') + lines.join(QLatin1Char('\n')));
        }
    }
    FOURFOLD_TRY_STATUS(store::appendEvent(db(), CoderId {}, QStringLiteral("articles.import"),
        QStringLiteral("source"), QString(),
        QJsonObject {{QStringLiteral("source"), path},
            {QStringLiteral("added"), qint64(report.added.size())},
            {QStringLiteral("skipped"), qint64(report.skipped.size())}}));
    FOURFOLD_TRY_STATUS(sp->commit());
    return report;
}

} // namespace fourfold
