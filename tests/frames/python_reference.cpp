#include "tests/frames/python_reference.h"

#include "tests/support/cli_run.h"

#include <QJsonDocument>
#include <QTemporaryDir>

#include <catch2/catch.hpp>

namespace fourfold::test {

QJsonArray referenceResults(const QJsonArray &cases)
{
    QTemporaryDir dir;
    REQUIRE(dir.isValid());
    const QString input = dir.filePath(QStringLiteral("cases.json"));
    QFile file(input);
    REQUIRE(file.open(QIODevice::WriteOnly));
    file.write(QJsonDocument(QJsonObject {{QStringLiteral("cases"), cases}})
                   .toJson(QJsonDocument::Compact));
    file.close();
    const CliRun run = runCli(QStringLiteral("/usr/bin/python3"),
        {QStringLiteral(FOURFOLD_SOURCE_DIR "/tests/frames/frames_reference.py"), input});
    INFO(run.err.toStdString());
    REQUIRE(run.exitCode == 0);
    const QJsonArray results = cliJson(run).value(QStringLiteral("results")).toArray();
    REQUIRE(results.size() == cases.size());
    return results;
}

QJsonArray jsonRows(const std::vector<double> &values, std::size_t columns)
{
    QJsonArray rows;
    for (std::size_t r = 0; r * columns < values.size(); ++r) {
        QJsonArray row;
        for (std::size_t c = 0; c < columns; ++c)
            row.append(values[r * columns + c]);
        rows.append(row);
    }
    return rows;
}

QJsonArray jsonRows(const frames::FrameMatrix &matrix)
{
    return jsonRows(matrix.values, matrix.columns);
}

QJsonArray jsonInts(const std::vector<int> &values)
{
    QJsonArray array;
    for (int v : values)
        array.append(v);
    return array;
}

} // namespace fourfold::test
