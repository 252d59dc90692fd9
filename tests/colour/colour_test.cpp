// Colour arithmetic shared by the windows and the report. Contrast follows WCAG 2.1 (W3C 2018,
// glossary "contrast ratio": black on white is 21:1, a colour on itself 1:1; success criterion
// 1.4.3 asks 4.5:1 for body text). The agreement scale's stops are Krippendorff's (2004) 0.667
// and 0.800.
#include "app/colour/colour.h"
#include "core/agreement/agreement_report.h"

#include <catch2/catch.hpp>

using namespace fourfold;

TEST_CASE("contrast ratios follow WCAG 2.1")
{
    CHECK(relativeLuminance(QColor(Qt::white)) == Approx(1.0));
    CHECK(relativeLuminance(QColor(Qt::black)) == Approx(0.0));
    CHECK(contrastRatio(QColor(Qt::black), QColor(Qt::white)) == Approx(21.0));
    CHECK(contrastRatio(QColor(Qt::white), QColor(Qt::black)) == Approx(21.0));
    CHECK(contrastRatio(QColor(0x12, 0x34, 0x56), QColor(0x12, 0x34, 0x56)) == Approx(1.0));
    // Mid grey #777777 on white falls just short of 4.5:1, #767676 just reaches it (from memory;
    // the values follow from the formula: 4.48 and 4.54).
    CHECK(
        contrastRatio(QColor(0x77, 0x77, 0x77), QColor(Qt::white)) == Approx(4.48).epsilon(0.005));
    CHECK(
        contrastRatio(QColor(0x76, 0x76, 0x76), QColor(Qt::white)) == Approx(4.54).epsilon(0.005));
}

TEST_CASE("text on a fill takes whichever of dark and light contrasts more")
{
    CHECK(readableOn(QColor(Qt::white)) == QColor(Qt::black));
    CHECK(readableOn(QColor(0x1D, 0x3F, 0x6E)) == QColor(Qt::white));
    CHECK(
        readableOn(QColor(0xF3, 0xF0, 0xE8), QColor(0x22, 0x26, 0x2E)) == QColor(0x22, 0x26, 0x2E));
    for (int v = 0; v <= 255; v += 5) {
        const QColor fill(v, v, v);
        const QColor text = readableOn(fill);
        // The pick is never worse than the other choice, and always reaches 4.5:1 on greys.
        CHECK(contrastRatio(fill, text) >= 4.5);
    }
}

TEST_CASE("the agreement scale darkens with agreement and marks Krippendorff's bands")
{
    double last = 2.0;
    for (int i = 0; i <= 100; ++i) {
        const double luminance = relativeLuminance(agreementColour(i / 100.0));
        CHECK(luminance < last);
        last = luminance;
    }
    CHECK(agreementColour(kAlphaReliable) == QColor(0x3F, 0x6C, 0xA6));
    CHECK(agreementColour(kAlphaTentative) == QColor(0x8E, 0xAE, 0xD3));
    CHECK(agreementColour(1.0) == QColor(0x1D, 0x3F, 0x6E));
    // Below chance the scale turns warm: more red than blue.
    const QColor negative = agreementColour(-0.5);
    CHECK(negative.red() > negative.blue());
    CHECK(mixColours(QColor(Qt::black), QColor(Qt::white), 2.0) == QColor(Qt::white));
}
