#include "app/desktop/function_style.h"

#include "app/colour/colour.h"

#include <QCoreApplication>

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
    return readableOn(background);
}

int functionShortcutKey(FramingFunction f)
{
    return int(f) + 1;
}

} // namespace fourfold
