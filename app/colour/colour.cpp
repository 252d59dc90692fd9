#include "app/colour/colour.h"

#include "core/agreement/agreement_report.h"

#include <algorithm>
#include <cmath>
#include <iterator>

namespace fourfold {

double relativeLuminance(const QColor &colour)
{
    auto linear = [](double v) {
        return v <= 0.04045 ? v / 12.92 : std::pow((v + 0.055) / 1.055, 2.4);
    };
    return 0.2126 * linear(colour.redF()) + 0.7152 * linear(colour.greenF())
        + 0.0722 * linear(colour.blueF());
}

double contrastRatio(const QColor &a, const QColor &b)
{
    const double la = relativeLuminance(a);
    const double lb = relativeLuminance(b);
    return (std::max(la, lb) + 0.05) / (std::min(la, lb) + 0.05);
}

QColor readableOn(const QColor &background, const QColor &dark, const QColor &light)
{
    return contrastRatio(background, dark) >= contrastRatio(background, light) ? dark : light;
}

QColor mixColours(const QColor &a, const QColor &b, double t)
{
    t = std::clamp(t, 0.0, 1.0);
    return QColor::fromRgbF(float(a.redF() + (b.redF() - a.redF()) * t),
        float(a.greenF() + (b.greenF() - a.greenF()) * t),
        float(a.blueF() + (b.blueF() - a.blueF()) * t));
}

QColor agreementColour(double value)
{
    const QColor zero(0xF3, 0xF0, 0xE8);
    const QColor negative(0xB5, 0x4A, 0x2C);
    if (value < 0)
        return mixColours(zero, negative, -value);
    struct Stop {
        double at;
        QColor colour;
    };
    static const Stop stops[] {{0.0, zero}, {0.5, QColor(0xCF, 0xDB, 0xE8)},
        {kAlphaTentative, QColor(0x8E, 0xAE, 0xD3)}, {kAlphaReliable, QColor(0x3F, 0x6C, 0xA6)},
        {1.0, QColor(0x1D, 0x3F, 0x6E)}};
    for (size_t i = 1; i < std::size(stops); ++i)
        if (value <= stops[i].at)
            return mixColours(stops[i - 1].colour, stops[i].colour,
                (value - stops[i - 1].at) / (stops[i].at - stops[i - 1].at));
    return stops[std::size(stops) - 1].colour;
}

} // namespace fourfold
