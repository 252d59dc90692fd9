#include "app/desktop/function_style.h"

#include <QCoreApplication>

#include <cmath>

namespace fourfold {

FunctionStyle functionStyle(FramingFunction f)
{
    // Okabe, M. & Ito, K. (2008), "Color Universal Design": vermillion, blue, reddish purple and
    // bluish green stay distinct for the common forms of colour blindness.
    switch (f) {
    case FramingFunction::Problem:
        return {QColor(0xD5, 0x5E, 0x00), QLatin1Char('P'), Qt::SolidLine, 0};
    case FramingFunction::Cause:
        return {QColor(0x00, 0x72, 0xB2), QLatin1Char('C'), Qt::DashLine, 1};
    case FramingFunction::Evaluation:
        return {QColor(0xCC, 0x79, 0xA7), QLatin1Char('E'), Qt::DotLine, 2};
    case FramingFunction::Remedy:
        return {QColor(0x00, 0x9E, 0x73), QLatin1Char('R'), Qt::DashDotLine, 3};
    }
    return {};
}

QString functionName(FramingFunction f)
{
    switch (f) {
    case FramingFunction::Problem:
        return QCoreApplication::translate("FunctionStyle", "Problem");
    case FramingFunction::Cause:
        return QCoreApplication::translate("FunctionStyle", "Cause");
    case FramingFunction::Evaluation:
        return QCoreApplication::translate("FunctionStyle", "Evaluation");
    case FramingFunction::Remedy:
        return QCoreApplication::translate("FunctionStyle", "Remedy");
    }
    return {};
}

QColor badgeTextColour(const QColor &background)
{
    // WCAG 2.1 relative luminance (W3C, "Web Content Accessibility Guidelines 2.1", definition
    // of relative luminance and contrast ratio).
    auto linear = [](float v) {
        return v <= 0.04045f ? double(v) / 12.92 : std::pow((double(v) + 0.055) / 1.055, 2.4);
    };
    const double l = 0.2126 * linear(background.redF()) + 0.7152 * linear(background.greenF())
        + 0.0722 * linear(background.blueF());
    return (l + 0.05) / 0.05 >= 1.05 / (l + 0.05) ? QColor(Qt::black) : QColor(Qt::white);
}

int functionShortcutKey(FramingFunction f)
{
    return int(f) + 1;
}

} // namespace fourfold
