#include "ui/panels/properties/quantity.h"

#include "ui/shell/display_units.h"
#include "core/file/file_units.h"
#include "core/model/geometry.h"

namespace clevis::ui {
namespace {
DisplayUnits& units() { return DisplayUnits::instance(); }
}

Quantity lengthQuantity()
{
    return {units().lengthSymbol(), [](double v) { return units().lengthFromSi(v); }, [](double v) { return units().lengthToSi(v); },
            units().lengthDecimals()};
}

Quantity forceQuantity()
{
    return {units().forceSymbol(), [](double v) { return units().forceFromSi(v); }, [](double v) { return units().forceToSi(v); }, 3};
}

Quantity torqueQuantity()
{
    return {units().torqueSymbol(), [](double v) { return units().torqueFromSi(v); }, [](double v) { return units().torqueToSi(v); }, 3};
}

Quantity stiffnessQuantity()
{
    return {units().stiffnessSymbol(), [](double v) { return units().stiffnessFromSi(v); },
            [](double v) { return units().stiffnessToSi(v); }, 4};
}

Quantity angleQuantity()
{
    // The file's own conversions, so a typed 30° is saved as 30 again.
    return {QStringLiteral("°"), [](double v) { return fromSi(FileUnit::Degree, v); }, [](double v) { return toSi(FileUnit::Degree, v); }, 3};
}

Quantity rotarySpeedQuantity()
{
    return {QStringLiteral("rpm"), [](double v) { return fromSi(FileUnit::Rpm, v); }, [](double v) { return toSi(FileUnit::Rpm, v); }, 3};
}

Quantity linearSpeedQuantity()
{
    const Quantity l = lengthQuantity();
    return {l.unit + QStringLiteral("/s"), l.fromSi, l.toSi, l.decimals};
}

Quantity plainQuantity(const QString& unit, int decimals)
{
    return {unit, [](double v) { return v; }, [](double v) { return v; }, decimals};
}

}  // namespace clevis::ui
