#include "core/team/team_rows.h"

#include "core/store/store_util.h"

namespace fourfold {

ServerTable serverTableOf(const QString &type)
{
    if (type == QLatin1String("assignment"))
        return ServerTable::Assignment;
    if (type == QLatin1String("judgement"))
        return ServerTable::Judgement;
    if (type == QLatin1String("link"))
        return ServerTable::Link;
    return ServerTable::Annotation;
}

store::PortableRow portableFromServer(const QString &type, const QByteArray &json)
{
    QJsonObject content = store::fromJsonText(QString::fromUtf8(json));
    store::PortableRow row;
    row.type = type;
    row.uuid = content.take(QStringLiteral("uuid")).toString();
    if (type == QLatin1String("assignment"))
        row.seconds = content.take(QStringLiteral("active_seconds")).toInteger();
    if (type == QLatin1String("link"))
        content.remove(QStringLiteral("coder"));
    row.content = content;
    return row;
}

QByteArray serverFromPortable(
    const store::PortableRow &row, const QString &coderUuid, qint64 seconds)
{
    QJsonObject content = row.content;
    content.insert(QStringLiteral("uuid"), row.uuid);
    if (row.type == QLatin1String("assignment"))
        content.insert(QStringLiteral("active_seconds"), seconds);
    if (row.type == QLatin1String("link"))
        content.insert(QStringLiteral("coder"), coderUuid);
    return store::toJsonText(content).toUtf8();
}

QString teamObjectKey(const store::PortableRow &row)
{
    return row.type + QLatin1Char('/') + row.uuid;
}

QString teamBaseKey(const store::PortableRow &row)
{
    return QLatin1String(kTeamBasePrefix) + teamObjectKey(row);
}

QString teamBaseValue(const store::PortableRow &row)
{
    return row.digest() + QLatin1Char(' ') + QString::number(row.seconds);
}

std::optional<TeamBase> parseTeamBase(const QString &value)
{
    const qsizetype space = value.indexOf(QLatin1Char(' '));
    if (space < 0)
        return std::nullopt;
    return TeamBase {value.left(space), value.mid(space + 1).toLongLong()};
}

} // namespace fourfold
