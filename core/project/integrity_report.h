#pragma once
// The result of checking a project file: SQLite's own checks, then every article's hash,
// length and canonical form, and every stored span against its text.

#include <QString>
#include <QStringList>

namespace fourfold {

struct IntegrityReport {
    qint64 articlesChecked = 0;
    qint64 spansChecked = 0;
    QStringList problems; // one translated sentence per problem, naming the object

    bool isClean() const { return problems.isEmpty(); }
};

} // namespace fourfold
