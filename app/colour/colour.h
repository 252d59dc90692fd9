#pragma once
// Colour arithmetic shared by the windows and the report: WCAG contrast, mixing, and the one
// colour scale for agreement coefficients (kappa per pair, alpha per variable).

#include <QColor>

namespace fourfold {

// Relative luminance and contrast ratio of WCAG 2.1 (W3C 2018, glossary: "relative luminance",
// "contrast ratio"); the sRGB threshold 0.04045 is that of IEC 61966-2-1 (WCAG's 0.03928 differs
// from it only below one 8-bit step).
double relativeLuminance(const QColor &colour);
double contrastRatio(const QColor &a, const QColor &b);
// Whichever of `dark` and `light` contrasts more with `background`.
QColor readableOn(const QColor &background, const QColor &dark = QColor(Qt::black),
    const QColor &light = QColor(Qt::white));
// `a` moved towards `b` by `t` (clamped to 0..1), channel by channel.
QColor mixColours(const QColor &a, const QColor &b, double t);

// The colour of an agreement coefficient: warm below 0, pale at 0, blues that darken through
// Krippendorff's (2004) 0.667 and 0.800 so that the bands show, darkest at 1.
QColor agreementColour(double value);

} // namespace fourfold
