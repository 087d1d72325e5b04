// The units a drawing or report is labelled in, and how its numbers are
// written with them. Plain values, so the renderers need no settings or
// widgets: the desktop app fills them from the user's display units, the
// command line uses millimetres, newtons, newton-metres and megapascals.
#pragma once

#include <QString>

namespace clevis::ui {

struct RenderUnits {
    double lengthPerMetre = 1000.0;
    QString lengthSymbol = "mm";
    double forcePerNewton = 1.0;
    QString forceSymbol = "N";
    double torquePerNewtonMetre = 1.0;
    QString torqueSymbol = "N·m";
    double pressurePerPascal = 1e-6;  // a cylinder's pressure
    QString pressureSymbol = "MPa";

    QString length(double metres) const;
    QString force(double newtons) const;
    QString torque(double newtonMetres) const;
    QString pressure(double pascals) const;
};

// `value` to four significant figures in fixed notation (no exponent for
// the magnitudes a machine carries), with `unit`.
QString formatQuantity(double value, const QString& unit);

// A part named with its kind, "link crank", but "link 3" for a part named
// "link 3": the kind is not said twice (whatever the case of `kind`).
QString partLabel(const QString& kind, const QString& name);

// A utilisation (a fraction) as a percentage: two significant figures at
// most, and "<1 %" rather than "0 %" for a figure that is small but there.
QString formatUtilisation(double fraction);

// An angle in degrees as "37.2°", measured counter-clockwise from +x.
QString formatDirection(double degrees);

}  // namespace clevis::ui
