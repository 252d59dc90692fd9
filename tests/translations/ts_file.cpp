#include "tests/translations/ts_file.h"

#include <QDir>
#include <QFile>
#include <QXmlStreamReader>

#include <catch2/catch.hpp>

namespace fourfold::test {

QString TsFile::translation(const QString &context, const QString &source) const
{
    const auto it = translations.find({context, source});
    INFO("context " << context.toStdString() << ", source " << source.toStdString());
    REQUIRE(it != translations.end());
    REQUIRE(it->size() == 1);
    return it->first();
}

TsFile readTsFile(const QString &lang)
{
    const QString path =
        QStringLiteral(FOURFOLD_SOURCE_DIR "/translations/fourfold_%1.ts").arg(lang);
    QFile file(path);
    INFO(path.toStdString());
    REQUIRE(file.open(QIODevice::ReadOnly));
    const QDir translationsDir = QFileInfo(path).dir();
    const QDir root(QStringLiteral(FOURFOLD_SOURCE_DIR));

    TsFile ts;
    QXmlStreamReader xml(&file);
    QString context, source;
    QStringList forms;
    bool unfinished = false;
    QStringList locations;
    while (!xml.atEnd()) {
        xml.readNext();
        if (xml.isStartElement()) {
            const auto name = xml.name();
            if (name == QLatin1String("name")) {
                context = xml.readElementText();
            } else if (name == QLatin1String("message")) {
                source.clear();
                forms.clear();
                locations.clear();
                unfinished = false;
            } else if (name == QLatin1String("location")) {
                const QString located = root.relativeFilePath(translationsDir.absoluteFilePath(
                    xml.attributes().value(QLatin1String("filename")).toString()));
                locations << located;
                ts.sourceFiles.insert(located);
            } else if (name == QLatin1String("source")) {
                source = xml.readElementText();
            } else if (name == QLatin1String("translation")) {
                const auto type = xml.attributes().value(QLatin1String("type"));
                unfinished = type == QLatin1String("unfinished");
                // A plain translation is text; a numerus one holds <numerusform> children.
                QString text;
                while (!xml.atEnd()) {
                    xml.readNext();
                    if (xml.isCharacters())
                        text += xml.text();
                    else if (xml.isStartElement() && xml.name() == QLatin1String("numerusform"))
                        forms << xml.readElementText();
                    else if (xml.isEndElement() && xml.name() == QLatin1String("translation"))
                        break;
                }
                if (forms.isEmpty())
                    forms << text;
            }
        } else if (xml.isEndElement() && xml.name() == QLatin1String("message")) {
            ++ts.messages;
            const bool empty =
                std::ranges::any_of(forms, [](const QString &f) { return f.trimmed().isEmpty(); });
            if (unfinished || empty)
                ts.unfinished << context + QStringLiteral(": ") + source;
            ts.translations.insert({context, source}, forms);
            for (const QString &l : locations)
                if (l.startsWith(QLatin1String("core/")))
                    ts.coreContexts.insert(context);
        }
    }
    REQUIRE_FALSE(xml.hasError());
    return ts;
}

} // namespace fourfold::test
