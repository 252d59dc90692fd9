#pragma once
// A translation file (translations/fourfold_<lang>.ts) as the tests read it: each message's
// translation by context and source, what is unfinished, and where lupdate found each context.

#include <QMap>
#include <QSet>
#include <QString>
#include <QStringList>

namespace fourfold::test {

struct TsFile {
    // (context, source) → the translation; numerus messages hold one entry per plural form.
    QMap<QPair<QString, QString>, QStringList> translations;
    int messages = 0;
    // Messages still marked unfinished or with an empty translation (or an empty plural form).
    QStringList unfinished;
    // The source files lupdate names in <location>, relative to the repository.
    QSet<QString> sourceFiles;
    // The contexts with a message found in a file under core/.
    QSet<QString> coreContexts;

    // The translation of `source` in `context`; fails the test when the file does not hold it.
    QString translation(const QString &context, const QString &source) const;
};

// Reads translations/fourfold_<lang>.ts of the source tree; fails the test if it cannot.
TsFile readTsFile(const QString &lang);

} // namespace fourfold::test
