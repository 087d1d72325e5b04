#include "ui/panels/properties/display_quantity.h"

#include "core/file/file_units.h"
#include "core/model/geometry.h"
#include "ui/shell/display_units.h"

namespace clevis::ui {
namespace {
DisplayUnits& units() { return DisplayUnits::instance(); }
}  // namespace

DisplayQuantity lengthQuantity()
{
    return {units().lengthSymbol(), [](double v) { return units().lengthFromSi(v); },
            [](double v) { return units().lengthToSi(v); }, units().lengthDecimals()};
}

DisplayQuantity forceQuantity()
{
    return {units().forceSymbol(), [](double v) { return units().forceFromSi(v); },
            [](double v) { return units().forceToSi(v); }, 3};
}

DisplayQuantity torqueQuantity()
{
    return {units().torqueSymbol(), [](double v) { return units().torqueFromSi(v); },
            [](double v) { return units().torqueToSi(v); }, 3};
}

DisplayQuantity stiffnessQuantity()
{
    return {units().stiffnessSymbol(), [](double v) { return units().stiffnessFromSi(v); },
            [](double v) { return units().stiffnessToSi(v); }, 4};
}

DisplayQuantity angleQuantity()
{
    // The file's own conversions, so a typed 30° is saved as 30 again.
    return {QStringLiteral("°"), [](double v) { return fromSi(FileUnit::Degree, v); },
            [](double v) { return toSi(FileUnit::Degree, v); }, 3};
}

DisplayQuantity rotarySpeedQuantity()
{
    return {QStringLiteral("rpm"), [](double v) { return fromSi(FileUnit::Rpm, v); },
            [](double v) { return toSi(FileUnit::Rpm, v); }, 3};
}

DisplayQuantity linearSpeedQuantity()
{
    const DisplayQuantity l = lengthQuantity();
    return {l.unit + QStringLiteral("/s"), l.fromSi, l.toSi, l.decimals};
}

DisplayQuantity pressureQuantity()
{
    return {units().pressureSymbol(), [](double v) { return units().pressureFromSi(v); },
            [](double v) { return units().pressureToSi(v); },
            units().pressure() == DisplayUnits::Pressure::Bar ? 1 : 3};
}

DisplayQuantity megaQuantity(const QString& unit, int decimals)
{
    return {unit, [](double si) { return si * 1e-6; }, [](double v) { return v * 1e6; }, decimals};
}

DisplayQuantity plainQuantity(const QString& unit, int decimals)
{
    return {unit, [](double v) { return v; }, [](double v) { return v; }, decimals};
}

}  // namespace clevis::ui
