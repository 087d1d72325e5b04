#include "ui/shell/display_units.h"

#include <QSettings>

#include <algorithm>
#include <cmath>

namespace clevis::ui {
namespace {

// Exact by definition: 1 in = 25.4 mm, 1 lbf = 0.45359237 kg × 9.80665 m/s².
constexpr double kInch = 0.0254;
constexpr double kPoundForce = 0.45359237 * 9.80665;

const char* kLengthKey = "units/length";
const char* kForceKey = "units/force";
const char* kTorqueKey = "units/torque";
const char* kPressureKey = "units/pressure";

template <typename E>
E readSetting(const char* key, E fallback, int count)
{
    const int v = QSettings().value(key, int(fallback)).toInt();
    return v >= 0 && v < count ? E(v) : fallback;
}

}  // namespace

DisplayUnits& DisplayUnits::instance()
{
    static DisplayUnits units;
    return units;
}

DisplayUnits::DisplayUnits()
    : length_(readSetting(kLengthKey, Length::Millimetre, 3))
    , force_(readSetting(kForceKey, Force::Newton, 3))
    , torque_(readSetting(kTorqueKey, Torque::NewtonMetre, 2))
    , pressure_(readSetting(kPressureKey, Pressure::Bar, 3))
{}

DisplayUnits::Length DisplayUnits::length() const { return length_; }
DisplayUnits::Force DisplayUnits::force() const { return force_; }
DisplayUnits::Torque DisplayUnits::torque() const { return torque_; }
DisplayUnits::Pressure DisplayUnits::pressure() const { return pressure_; }

void DisplayUnits::setLength(Length l)
{
    if (l == length_) return;
    length_ = l;
    QSettings().setValue(kLengthKey, int(l));
    emit changed();
}

void DisplayUnits::setForce(Force f)
{
    if (f == force_) return;
    force_ = f;
    QSettings().setValue(kForceKey, int(f));
    emit changed();
}

void DisplayUnits::setTorque(Torque t)
{
    if (t == torque_) return;
    torque_ = t;
    QSettings().setValue(kTorqueKey, int(t));
    emit changed();
}

void DisplayUnits::setPressure(Pressure p)
{
    if (p == pressure_) return;
    pressure_ = p;
    QSettings().setValue(kPressureKey, int(p));
    emit changed();
}

double DisplayUnits::lengthFactor() const
{
    switch (length_) {
    case Length::Millimetre: return 1e-3;
    case Length::Metre: return 1.0;
    case Length::Inch: return kInch;
    }
    return 1.0;
}

double DisplayUnits::forceFactor() const
{
    switch (force_) {
    case Force::Newton: return 1.0;
    case Force::Kilonewton: return 1e3;
    case Force::PoundForce: return kPoundForce;
    }
    return 1.0;
}

double DisplayUnits::torqueFactor() const
{
    switch (torque_) {
    case Torque::NewtonMetre: return 1.0;
    case Torque::PoundForceInch: return kPoundForce * kInch;
    }
    return 1.0;
}

// 1 bar = 10⁵ Pa exactly; 1 psi = 1 lbf/in² = 6894.757… Pa.
double DisplayUnits::pressureFactor() const
{
    switch (pressure_) {
    case Pressure::Bar: return 1e5;
    case Pressure::Megapascal: return 1e6;
    case Pressure::PoundForcePerSquareInch: return kPoundForce / (kInch * kInch);
    }
    return 1.0;
}

// Millimetres divide by 1000 rather than multiply by 0.001, so that a typed
// "30" is exactly the double nearest 0.03 m, as a file would hold it.
double DisplayUnits::lengthFromSi(double m) const
{
    return length_ == Length::Millimetre ? m * 1000.0 : m / lengthFactor();
}
double DisplayUnits::lengthToSi(double v) const
{
    return length_ == Length::Millimetre ? v / 1000.0 : v * lengthFactor();
}
double DisplayUnits::forceFromSi(double n) const { return n / forceFactor(); }
double DisplayUnits::forceToSi(double v) const { return v * forceFactor(); }
double DisplayUnits::torqueFromSi(double nm) const { return nm / torqueFactor(); }
double DisplayUnits::torqueToSi(double v) const { return v * torqueFactor(); }
double DisplayUnits::pressureFromSi(double pa) const { return pa / pressureFactor(); }
double DisplayUnits::pressureToSi(double v) const { return v * pressureFactor(); }

QString DisplayUnits::lengthSymbol() const
{
    switch (length_) {
    case Length::Millimetre: return QStringLiteral("mm");
    case Length::Metre: return QStringLiteral("m");
    case Length::Inch: return QStringLiteral("in");
    }
    return {};
}

QString DisplayUnits::forceSymbol() const
{
    switch (force_) {
    case Force::Newton: return QStringLiteral("N");
    case Force::Kilonewton: return QStringLiteral("kN");
    case Force::PoundForce: return QStringLiteral("lbf");
    }
    return {};
}

QString DisplayUnits::torqueSymbol() const
{
    switch (torque_) {
    case Torque::NewtonMetre: return QStringLiteral("N·m");
    case Torque::PoundForceInch: return QStringLiteral("lbf·in");
    }
    return {};
}

QString DisplayUnits::pressureSymbol() const
{
    switch (pressure_) {
    case Pressure::Bar: return QStringLiteral("bar");
    case Pressure::Megapascal: return QStringLiteral("MPa");
    case Pressure::PoundForcePerSquareInch: return QStringLiteral("psi");
    }
    return {};
}

int DisplayUnits::lengthDecimals() const
{
    switch (length_) {
    case Length::Millimetre: return 2;
    case Length::Metre: return 5;
    case Length::Inch: return 4;
    }
    return 3;
}

QString DisplayUnits::formatLength(double si) const
{
    return QString::number(lengthFromSi(si), 'f', lengthDecimals()) + QChar(' ') + lengthSymbol();
}

QString DisplayUnits::formatForce(double si) const { return formatWithUnit(forceFromSi(si), forceSymbol()); }

QString DisplayUnits::formatTorque(double si) const { return formatWithUnit(torqueFromSi(si), torqueSymbol()); }

double DisplayUnits::stiffnessFromSi(double nPerM) const { return nPerM * lengthFactor() / forceFactor(); }
double DisplayUnits::stiffnessToSi(double v) const { return v * forceFactor() / lengthFactor(); }
QString DisplayUnits::stiffnessSymbol() const { return forceSymbol() + QChar('/') + lengthSymbol(); }
QString DisplayUnits::formatStiffness(double si) const
{
    return formatWithUnit(stiffnessFromSi(si), stiffnessSymbol());
}

QString formatWithUnit(double value, const QString& unit)
{
    const double magnitude = std::abs(value);
    const int leading = magnitude > 0 ? int(std::floor(std::log10(magnitude))) : 0;
    const int decimals = std::clamp(3 - leading, 0, 6);
    // Values that round to zero print as "0", never "-0".
    if (magnitude < 0.5 * std::pow(10.0, -decimals)) value = 0.0;
    return QString::number(value, 'f', decimals) + QChar(' ') + unit;
}

RenderUnits renderUnits(const DisplayUnits& units)
{
    // Every unit choice is a pure scale of SI, so one factor each describes it.
    return {units.lengthFromSi(1.0), units.lengthSymbol(), units.forceFromSi(1.0),    units.forceSymbol(),
            units.torqueFromSi(1.0), units.torqueSymbol(), units.pressureFromSi(1.0), units.pressureSymbol()};
}

}  // namespace clevis::ui
