#pragma once
// The frame kernels' reference figures from Debian's python3-scipy and python3-sklearn: the test
// writes its cases to a file, runs /usr/bin/python3 tests/frames/frames_reference.py on it (as
// tests/reference/ runs its cross-checks) and reads one result per case.

#include "core/frames/frame_matrix.h"

#include <QJsonArray>
#include <QJsonObject>
#include <QJsonValue>

#include <vector>

namespace fourfold::test {

// Runs the reference script on `cases` ({"op": ..., ...} objects) and returns its results in the
// same order. Fails the test (REQUIRE) when Python fails.
QJsonArray referenceResults(const QJsonArray &cases);

// `matrix` as a JSON array of rows.
QJsonArray jsonRows(const frames::FrameMatrix &matrix);
QJsonArray jsonRows(const std::vector<double> &values, std::size_t columns);
QJsonArray jsonInts(const std::vector<int> &values);

} // namespace fourfold::test
