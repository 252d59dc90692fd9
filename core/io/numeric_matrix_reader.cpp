#include "core/io/numeric_matrix_reader.h"

#include "core/io/csv_reader.h"
#include "core/io/input_file.h"
#include "core/text/canonical_text.h"

#include <QCoreApplication>
#include <QHash>

#include <cmath>

namespace fourfold {

namespace {

// The sentences of this file, under a context that lupdate collects.
struct NumericMatrixReaderText {
    Q_DECLARE_TR_FUNCTIONS(NumericMatrixReaderText)
};

} // namespace

Result<NumericMatrix> readNumericMatrix(const QString &path)
{
    const auto bytes = readWholeFile(path, maxWholeFileSize);
    if (!bytes)
        return std::unexpected(bytes.error());
    auto text = decodeUtf8Strict(*bytes, path);
    if (!text)
        return std::unexpected(text.error());

    NumericMatrix matrix;
    matrix.source = path;
    qsizetype columns = 0; // of the header; 0 until it is read
    qint64 headerLine = 0;
    QHash<QString, qint64> seen; // article id -> line
    const auto readRecord = [&](const std::vector<QStringView> &fields, qint64 line) -> Status {
        if (columns == 0) {
            headerLine = line;
            columns = qsizetype(fields.size());
            for (qsizetype i = 1; i < columns; ++i) {
                const QString name = fields[size_t(i)].trimmed().toString();
                if (name.isEmpty())
                    return failAt(ErrorCode::InvalidInput, path, line, i + 1,
                        NumericMatrixReaderText::tr("column %1 of the header has no variable name.")
                            .arg(i + 1));
                if (matrix.variables.contains(name))
                    return failAt(ErrorCode::InvalidInput, path, line, i + 1,
                        NumericMatrixReaderText::tr(
                            "the variable \"%1\" appears twice in the header.")
                            .arg(name));
                matrix.variables << name;
            }
            if (matrix.variables.isEmpty())
                return failAt(ErrorCode::InvalidInput, path, line, 0,
                    NumericMatrixReaderText::tr(
                        "the header names no variable; expected \"article,<variable>,...\"."));
            return {};
        }
        if (qsizetype(fields.size()) != columns)
            return failAt(ErrorCode::InvalidInput, path, line, 0,
                NumericMatrixReaderText::tr("this row has %1 fields but the header has %2.")
                    .arg(fields.size())
                    .arg(columns));
        const QString id = fields[0].trimmed().toString();
        if (id.isEmpty())
            return failAt(ErrorCode::InvalidInput, path, line, 1,
                NumericMatrixReaderText::tr("the article id is empty."));
        if (const auto it = seen.constFind(id); it != seen.constEnd())
            return failAt(ErrorCode::InvalidInput, path, line, 1,
                NumericMatrixReaderText::tr("the article \"%1\" appears twice (first on line %2).")
                    .arg(id)
                    .arg(*it));
        seen.insert(id, line);
        matrix.rows << id;
        for (qsizetype c = 1; c < columns; ++c) {
            const QStringView cell = fields[size_t(c)].trimmed();
            bool ok = false;
            const double value = cell.toDouble(&ok); // C locale: a point, no grouping
            if (!ok || !std::isfinite(value))
                return failAt(ErrorCode::InvalidInput, path, line, c + 1,
                    cell.isEmpty() ? NumericMatrixReaderText::tr(
                        "column %1 (\"%2\") is empty; every cell needs a number.")
                                         .arg(c + 1)
                                         .arg(matrix.variables[c - 1])
                                   : NumericMatrixReaderText::tr(
                                       "column %1 (\"%2\") holds \"%3\", which is not a number.")
                                         .arg(c + 1)
                                         .arg(matrix.variables[c - 1], cell.toString()));
            matrix.values.push_back(value);
        }
        return {};
    };
    FOURFOLD_TRY_STATUS(forEachCsvRecord(*text, path, readRecord));
    if (columns == 0)
        return failAt(ErrorCode::InvalidInput, path, 1, 0,
            NumericMatrixReaderText::tr(
                "the file is empty; expected a header row \"article,<variable>,...\"."));
    if (matrix.rows.isEmpty())
        return failAt(ErrorCode::InvalidInput, path, headerLine, 0,
            NumericMatrixReaderText::tr("the file has a header but no articles."));
    return matrix;
}

} // namespace fourfold
