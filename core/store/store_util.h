#pragma once
// Small helpers shared by the table code of core/store.

#include "core/model/annotation.h"
#include "core/model/error.h"
#include "core/model/framing_function.h"
#include "core/store/database.h"
#include "core/store/statement.h"

#include <QDateTime>
#include <QJsonDocument>
#include <QJsonObject>
#include <QUuid>

#include <type_traits>
#include <vector>

namespace fourfold::store {

inline QString newUuid()
{
    return QUuid::createUuid().toString(QUuid::WithoutBraces);
}

// Now, as stored: ISO 8601 UTC with milliseconds. Formatted once per millisecond (per thread):
// an import stamps many rows within one.
inline QString now()
{
    thread_local qint64 formattedAt = -1;
    thread_local QString formatted;
    const qint64 ms = QDateTime::currentMSecsSinceEpoch();
    if (ms != formattedAt) {
        formatted = QDateTime::fromMSecsSinceEpoch(ms, Qt::UTC).toString(Qt::ISODateWithMs);
        formattedAt = ms;
    }
    return formatted;
}

inline QString toJsonText(const QJsonObject &o)
{
    return QString::fromUtf8(QJsonDocument(o).toJson(QJsonDocument::Compact));
}

inline QJsonObject fromJsonText(const QString &text)
{
    return QJsonDocument::fromJson(text.toUtf8()).object();
}

// The same from the column's bytes (Statement::columnUtf8): no string per row, and none at all
// for the empty object most rows hold.
inline QJsonObject fromJsonText(QByteArrayView utf8)
{
    if (utf8.isEmpty() || utf8 == "{}")
        return {};
    return QJsonDocument::fromJson(QByteArray::fromRawData(utf8.data(), utf8.size())).object();
}

// A framing function or phase as stored (its key), read from the column's bytes.
inline std::optional<FramingFunction> storedFunction(QByteArrayView key)
{
    for (FramingFunction f : kFramingFunctions)
        if (functionKey(f) == QLatin1StringView(key))
            return f;
    return std::nullopt;
}

inline std::optional<Phase> storedPhase(QByteArrayView key)
{
    for (Phase p : {Phase::Training, Phase::Pilot, Phase::Reliability, Phase::Production})
        if (phaseKey(p) == QLatin1StringView(key))
            return p;
    return std::nullopt;
}

// Steps through every row of `stmt` and turns each into a value with `read(stmt)`; the first
// stepping error ends it.
template<typename Reader>
auto collectRows(Statement &stmt, Reader read)
    -> Result<std::vector<std::invoke_result_t<Reader, const Statement &>>>
{
    std::vector<std::invoke_result_t<Reader, const Statement &>> out;
    while (true) {
        auto row = stmt.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            return out;
        out.push_back(read(stmt));
    }
}

// Steps through every row of `stmt`, turns each into a value with `read(stmt)` and hands it to
// `visit`, holding one row at a time; the first stepping error or failed visit ends it.
template<typename Reader, typename Visit>
Status forEachRow(Statement &stmt, Reader read, const Visit &visit)
{
    while (true) {
        auto row = stmt.step();
        if (!row)
            return std::unexpected(row.error());
        if (!*row)
            return {};
        FOURFOLD_TRY_STATUS(visit(read(stmt)));
    }
}

// Runs `sql` with no bindings and returns the first column of the first row as an integer
// (0 when there is no row).
Result<qint64> scalar(const Database &db, const QString &sql);

} // namespace fourfold::store
