// How a physical quantity is shown and typed in the property editor: its
// unit symbol and the conversion from and to SI, following the display units.
#pragma once

#include <QString>

#include <functional>

namespace clevis::ui {

struct DisplayQuantity {
    QString unit;
    std::function<double(double)> fromSi, toSi;
    int decimals = 4;
};

DisplayQuantity lengthQuantity();
DisplayQuantity forceQuantity();
DisplayQuantity torqueQuantity();
DisplayQuantity stiffnessQuantity();
DisplayQuantity angleQuantity();        // degrees, SI radians
DisplayQuantity rotarySpeedQuantity();  // rpm, SI rad/s
DisplayQuantity linearSpeedQuantity();  // length per second
DisplayQuantity pressureQuantity();     // a cylinder's: bar, MPa or psi
// Stresses and pressures in MPa, p·v in MPa·m/s, as handbooks and bearing
// tables give them (`unit` names the SI quantity times 10⁻⁶).
DisplayQuantity megaQuantity(const QString& unit, int decimals);
DisplayQuantity plainQuantity(const QString& unit, int decimals = 4);  // already SI (kg, kg·m², s)

}  // namespace clevis::ui
