#pragma once
// Words and numbers as the study screens show them: phase names, durations, coefficients.

#include "core/model/annotation.h"

#include <QColor>
#include <QString>

#include <optional>

namespace fourfold {

// The translated name of a phase ("Training", "Pilot", "Reliability", "Production").
QString studyPhaseName(Phase phase);
// A duration in seconds as "2 h 05 min", "12 min", "40 s"; "—" for a negative value.
QString studyDuration(qint64 seconds);
// A coefficient with three decimals after a decimal point, with its leading zero, in every
// language, as the reliability window, the report and the command line write it ("0.812",
// "−0.105", "1.000"); "—" when there is none.
QString studyCoefficient(std::optional<double> value);

// `colour` mixed with 60 % white: a background that black text stays readable on.
QColor studyPale(const QColor &colour);

} // namespace fourfold
