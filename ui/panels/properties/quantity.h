// How a physical quantity is shown and typed in the property editor: its
// unit symbol and the conversion from and to SI, following the display units.
#pragma once

#include <QString>

#include <functional>

namespace clevis::ui {

struct Quantity {
    QString unit;
    std::function<double(double)> fromSi, toSi;
    int decimals = 4;
};

Quantity lengthQuantity();
Quantity forceQuantity();
Quantity torqueQuantity();
Quantity stiffnessQuantity();
Quantity angleQuantity();          // degrees, SI radians
Quantity rotarySpeedQuantity();    // rpm, SI rad/s
Quantity linearSpeedQuantity();    // length per second
Quantity plainQuantity(const QString& unit, int decimals = 4);  // already SI (kg, kg·m², s)

}  // namespace clevis::ui
