#include "render/render_units.h"

#include <algorithm>
#include <cmath>

namespace clevis::ui {

QString formatQuantity(double value, const QString& unit)
{
    const double magnitude = std::abs(value);
    // Below this a value is rounding noise of the solver, shown as zero.
    if (magnitude < 1e-9) return QString("0 %1").arg(unit);
    const int digitsBeforePoint = int(std::floor(std::log10(magnitude))) + 1;
    const int decimals = std::clamp(4 - digitsBeforePoint, 0, 9);
    return QString("%1 %2").arg(QString::number(value, 'f', decimals), unit);
}

QString formatDirection(double degrees) { return QString::number(degrees, 'f', 1) + QStringLiteral("°"); }

QString RenderUnits::length(double metres) const { return formatQuantity(metres * lengthPerMetre, lengthSymbol); }
QString RenderUnits::force(double newtons) const { return formatQuantity(newtons * forcePerNewton, forceSymbol); }
QString RenderUnits::torque(double newtonMetres) const
{
    return formatQuantity(newtonMetres * torquePerNewtonMetre, torqueSymbol);
}

QString RenderUnits::pressure(double pascals) const
{
    return formatQuantity(pascals * pressurePerPascal, pressureSymbol);
}

QString formatUtilisation(double fraction)
{
    const double p = 100.0 * fraction;
    if (p <= 0.0) return QStringLiteral("0 %");
    if (p < 0.995) return QStringLiteral("<1 %");
    return QString("%1 %").arg(p, 0, 'f', p < 9.95 ? 1 : 0);
}

QString partLabel(const QString& kind, const QString& name)
{
    const bool saysKind = name.startsWith(kind + QLatin1Char(' '), Qt::CaseInsensitive);
    return saysKind ? kind + name.mid(kind.size()) : kind + QLatin1Char(' ') + name;
}

}  // namespace clevis::ui
