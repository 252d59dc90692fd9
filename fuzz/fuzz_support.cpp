#include "fuzz/fuzz_support.h"

#include "core/io/article_reader.h"
#include "core/project/edit.h"
#include "core/project/people.h"

#include <QDir>
#include <QFile>
#include <QFileInfo>
#include <QTemporaryDir>

#include <cstdio>
#include <cstdlib>
#include <memory>

namespace fourfold::fuzz {

void check(bool condition, const char *what)
{
    if (condition)
        return;
    std::fprintf(stderr, "fuzz check failed: %s\n", what);
    std::abort();
}

QByteArray bytes(const uint8_t *data, size_t size)
{
    return QByteArray(reinterpret_cast<const char *>(data), qsizetype(size));
}

QString workFolder()
{
    static const auto folder = [] {
        // In memory where the system offers it: each input is written to a file (and a project
        // copied and synced for the import targets), which a disk makes slow.
        const QFileInfo shm(QStringLiteral("/dev/shm"));
        const QString base = shm.isDir() && shm.isWritable() ? shm.filePath() : QDir::tempPath();
        auto dir = std::make_unique<QTemporaryDir>(base + "/fourfold-fuzz-XXXXXX");
        check(dir->isValid(), "a temporary folder can be made");
        return dir;
    }();
    return folder->path();
}

QString writeInput(const QString &name, const QByteArray &bytes)
{
    const QString path = workFolder() + '/' + name;
    QFile file(path);
    check(file.open(QIODevice::WriteOnly | QIODevice::Truncate), "the input file can be written");
    check(file.write(bytes) == bytes.size(), "the whole input is written");
    file.close();
    return path;
}

namespace {

QString templateProject()
{
    static const QString path = [] {
        const QString file = workFolder() + "/template.fourfold";
        auto project = Project::create(file);
        check(project.has_value(), "the template project is made");
        ImportOptions options;
        const auto imported = project->importFile(
            QStringLiteral(FOURFOLD_SOURCE_DIR "/sample-project/articles.jsonl"), options);
        check(imported.has_value(), "the demo articles import");
        for (const char *pseudonym : {"C01", "C02", "C03"})
            check(project->addCoder(pseudonym, pseudonym, CoderRole::Coder).has_value(),
                "a coder is added");
        auto lead = People::addLeadWithoutPassphrase(*project, "L01", "L01");
        check(lead.has_value() && project->apply(**lead).has_value(), "the lead is added");
        return file;
    }();
    return path;
}

} // namespace

Project freshProject()
{
    const QString path = workFolder() + "/input.fourfold";
    QFile::remove(path);
    check(QFile::copy(templateProject(), path), "the template project is copied");
    auto project = Project::open(path);
    check(project.has_value(), "the copied project opens");
    return std::move(*project);
}

bool sameCounts(const ProjectCounts &a, const ProjectCounts &b)
{
    return a.articles == b.articles && a.coders == b.coders && a.assignments == b.assignments
        && a.annotations == b.annotations && a.links == b.links && a.judgements == b.judgements
        && a.goldAnnotations == b.goldAnnotations && a.events == b.events
        && a.codebookVersion == b.codebookVersion;
}

} // namespace fourfold::fuzz
