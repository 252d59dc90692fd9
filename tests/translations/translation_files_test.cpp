// The translation files themselves: every message of Dutch and German is translated, and lupdate
// reads core, the CLI, the report and the desktop, so that a sentence the core says (an error,
// an undo text) reaches the translators under the context it is looked up in at run time.
#include "tests/translations/ts_file.h"

#include <QDirIterator>
#include <QFile>
#include <QRegularExpression>

#include <catch2/catch.hpp>

using namespace fourfold::test;

namespace {

// The C++ sources under `folder` of the repository, relative to it.
QStringList sources(const QString &folder)
{
    QStringList files;
    const QString root = QStringLiteral(FOURFOLD_SOURCE_DIR "/");
    QDirIterator it(root + folder, {QStringLiteral("*.cpp"), QStringLiteral("*.h")}, QDir::Files,
        QDirIterator::Subdirectories);
    while (it.hasNext())
        files << it.next().mid(root.size());
    files.sort();
    return files;
}

// A source's code without its // comments (a comment may show a call; only code counts).
QString code(const QString &relative)
{
    QFile f(QStringLiteral(FOURFOLD_SOURCE_DIR "/") + relative);
    REQUIRE(f.open(QIODevice::ReadOnly));
    return QString::fromUtf8(f.readAll()).remove(QRegularExpression(QStringLiteral("//[^\n]*")));
}

} // namespace

TEST_CASE("Every message of the Dutch and German translations is translated")
{
    for (const QString &lang : {QStringLiteral("de"), QStringLiteral("nl")}) {
        const TsFile ts = readTsFile(lang);
        INFO(lang.toStdString() << " unfinished: " << ts.unfinished.join(u'\n').toStdString());
        CHECK(ts.messages > 1000);
        CHECK(ts.unfinished.isEmpty());
    }
}

TEST_CASE("The Dutch and German translations hold the same messages")
{
    const TsFile de = readTsFile(QStringLiteral("de"));
    const TsFile nl = readTsFile(QStringLiteral("nl"));
    CHECK(de.translations.keys() == nl.translations.keys());
}

TEST_CASE("lupdate reads core the CLI the report and the desktop")
{
    const TsFile ts = readTsFile(QStringLiteral("de"));
    CHECK(ts.coreContexts.size() > 0);
    for (const QString &folder : {QStringLiteral("core/"), QStringLiteral("app/cli/"),
             QStringLiteral("app/report/"), QStringLiteral("app/desktop/")}) {
        INFO(folder.toStdString());
        CHECK(std::ranges::any_of(
            ts.sourceFiles, [&](const QString &f) { return f.startsWith(folder); }));
    }
}

TEST_CASE("Every source with a translated sentence is in the translations")
{
    // A file that translates something must appear among lupdate's locations: if it does not,
    // lupdate was not run since the sentence was added, or it does not read the file.
    const TsFile ts = readTsFile(QStringLiteral("de"));
    const QRegularExpression translates(
        QStringLiteral(R"(\b(\w+::)?tr\(\s*"|QCoreApplication::translate\(\s*")"));
    int checked = 0;
    for (const QString &folder : {QStringLiteral("core"), QStringLiteral("app")}) {
        for (const QString &file : sources(folder)) {
            if (!code(file).contains(translates))
                continue;
            ++checked;
            INFO(file.toStdString());
            CHECK(ts.sourceFiles.contains(file));
        }
    }
    CHECK(checked > 50);
}

TEST_CASE("No source hides its sentences from lupdate behind a file-local tr function")
{
    // `QString tr(const char *text) { return QCoreApplication::translate("X", text); }` translates
    // at run time under "X", but lupdate files the calls under the enclosing class or namespace,
    // so no translation ever matches. Files use a struct with Q_DECLARE_TR_FUNCTIONS and call
    // Struct::tr() instead; an unqualified tr() outside a QObject is the same mistake.
    const QRegularExpression helper(QStringLiteral(R"(^\s*(static\s+)?QString\s+tr\s*\()"),
        QRegularExpression::MultilineOption);
    const QRegularExpression unqualified(QStringLiteral(R"((?<![\w:.>])tr\()"));
    for (const QString &file : sources(QStringLiteral("app")) + sources(QStringLiteral("core"))) {
        const QString source = code(file);
        INFO(file.toStdString());
        CHECK_FALSE(source.contains(helper));
        // The desktop's QObject classes have a tr() of their own (declared in their headers).
        if (!file.startsWith(QLatin1String("app/desktop/")))
            CHECK_FALSE(source.contains(unqualified));
    }
}

TEST_CASE("Every translation keeps the placeholders of its source")
{
    // A lost %2 prints the argument nowhere; an extra one prints "%3" to the user.
    const QRegularExpression placeholder(QStringLiteral("%(\\d+|n)"));
    auto placeholders = [&](const QString &s) {
        QStringList found;
        for (auto it = placeholder.globalMatch(s); it.hasNext();)
            found << it.next().captured(0);
        found.removeDuplicates();
        found.sort();
        return found;
    };
    for (const QString &lang : {QStringLiteral("de"), QStringLiteral("nl")}) {
        const TsFile ts = readTsFile(lang);
        int compared = 0;
        for (auto it = ts.translations.cbegin(); it != ts.translations.cend(); ++it) {
            for (const QString &form : it.value()) {
                INFO(lang.toStdString()
                    << " " << it.key().first.toStdString() << ": " << it.key().second.toStdString()
                    << " -> " << form.toStdString());
                CHECK(placeholders(form) == placeholders(it.key().second));
                ++compared;
            }
        }
        CHECK(compared >= ts.messages);
    }
}

TEST_CASE("Every message sits under a context that is looked up at run time")
{
    // An empty context or a namespace ("fourfold") is what lupdate gives a tr() it cannot place
    // (a free function, a type alias of a struct with Q_DECLARE_TR_FUNCTIONS): at run time the
    // call asks another context and the translation is never found.
    const QRegularExpression runTimeContext(
        QStringLiteral("^(cli|main|([A-Za-z]\\w*::)*[A-Z]\\w*)$"));
    const TsFile ts = readTsFile(QStringLiteral("de"));
    QSet<QString> contexts;
    for (auto it = ts.translations.cbegin(); it != ts.translations.cend(); ++it)
        contexts.insert(it.key().first);
    CHECK(contexts.size() > 50);
    for (const QString &context : contexts) {
        INFO("context \"" << context.toStdString() << "\"");
        CHECK(runTimeContext.match(context).hasMatch());
    }
}
