// The units numbers are shown and typed in, chosen by the user and
// remembered between sessions, and handed to the renderers as plain values.
// The file and the core stay SI; conversion happens only here, at the edge.
#pragma once

#include "render/render_units.h"

#include <QObject>
#include <QString>

namespace clevis::ui {

class DisplayUnits : public QObject {
    Q_OBJECT
public:
    enum class Length { Millimetre, Metre, Inch };
    enum class Force { Newton, Kilonewton, PoundForce };
    enum class Torque { NewtonMetre, PoundForceInch };
    enum class Pressure { Bar, Megapascal, PoundForcePerSquareInch };

    static DisplayUnits& instance();

    Length length() const;
    Force force() const;
    Torque torque() const;
    Pressure pressure() const;
    void setLength(Length);  // persist, emit changed()
    void setForce(Force);
    void setTorque(Torque);
    void setPressure(Pressure);

    double lengthFromSi(double m) const;
    double lengthToSi(double v) const;
    QString lengthSymbol() const;  // "mm", "m", "in"
    double forceFromSi(double n) const;
    double forceToSi(double v) const;
    QString forceSymbol() const;  // "N", "kN", "lbf"
    double torqueFromSi(double nm) const;
    double torqueToSi(double v) const;
    QString torqueSymbol() const;  // "N·m", "lbf·in"
    // A cylinder's pressures: bar by default, as cylinder catalogues give them.
    double pressureFromSi(double pa) const;
    double pressureToSi(double v) const;
    QString pressureSymbol() const;  // "bar", "MPa", "psi"

    // Number + unit, sensible precision.
    QString formatLength(double si) const;
    QString formatForce(double si) const;
    QString formatTorque(double si) const;

    // Spring rates in the current force per length unit ("N/mm", "lbf/in").
    double stiffnessFromSi(double nPerM) const;
    double stiffnessToSi(double v) const;
    QString stiffnessSymbol() const;
    QString formatStiffness(double si) const;

    // Decimals that resolve about a hundredth of a millimetre in the current
    // length unit (for editors).
    int lengthDecimals() const;

signals:
    void changed();

private:
    DisplayUnits();
    double lengthFactor() const;    // metres per display unit
    double forceFactor() const;     // newtons per display unit
    double torqueFactor() const;    // newton-metres per display unit
    double pressureFactor() const;  // pascals per display unit

    Length length_ = Length::Millimetre;
    Force force_ = Force::Newton;
    Torque torque_ = Torque::NewtonMetre;
    Pressure pressure_ = Pressure::Bar;
};

// `value` with four significant figures, in fixed notation, and `unit`.
QString formatWithUnit(double value, const QString& unit);

// The user's display units as the plain values the renderers take.
RenderUnits renderUnits(const DisplayUnits& units);

}  // namespace clevis::ui
