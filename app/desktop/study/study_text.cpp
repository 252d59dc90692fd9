#include "app/desktop/study/study_text.h"

#include <QCoreApplication>

#include <cmath>

namespace fourfold {

QString studyPhaseName(Phase phase)
{
    switch (phase) {
    case Phase::Training:
        return QCoreApplication::translate("StudyText", "Training");
    case Phase::Pilot:
        return QCoreApplication::translate("StudyText", "Pilot");
    case Phase::Reliability:
        return QCoreApplication::translate("StudyText", "Reliability");
    case Phase::Production:
        return QCoreApplication::translate("StudyText", "Production");
    }
    return {};
}

QString studyDuration(qint64 seconds)
{
    if (seconds < 0)
        return QStringLiteral("—");
    if (seconds < 60)
        return QCoreApplication::translate("StudyText", "%1 s").arg(seconds);
    const qint64 minutes = (seconds + 30) / 60;
    if (minutes < 60)
        return QCoreApplication::translate("StudyText", "%1 min").arg(minutes);
    return QCoreApplication::translate("StudyText", "%1 h %2 min")
        .arg(minutes / 60)
        .arg(minutes % 60, 2, 10, QLatin1Char('0'));
}

QString studyCoefficient(std::optional<double> value)
{
    if (!value)
        return QStringLiteral("—");
    // Written as every screen, the report and the command line write a coefficient: three
    // decimals after a decimal point, with the leading zero, whatever the language, so that
    // one figure looks the same on every screen; the minus sign is U+2212.
    const QString text = QString::number(std::abs(*value), 'f', 3);
    return *value < 0 && text != QLatin1String("0.000") ? QStringLiteral("−") + text : text;
}

QColor studyPale(const QColor &colour)
{
    return QColor::fromRgbF(float(0.4 * colour.redF() + 0.6), float(0.4 * colour.greenF() + 0.6),
        float(0.4 * colour.blueF() + 0.6));
}

} // namespace fourfold
