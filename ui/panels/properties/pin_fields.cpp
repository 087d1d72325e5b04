#include "ui/panels/properties/pin_fields.h"

#include "core/results/pin_sizing.h"
#include "ui/shell/display_units.h"

namespace clevis::ui {
namespace {

// Where the bearing length comes from when none is typed (pin_sizing.h).
QString defaultBearingText(const Mechanism& m, const std::vector<std::string>& bodies)
{
    const auto fallback = thinnestThickness(m, bodies);
    const QString typeOne = QObject::tr("Type one to get the bearing pressure and p·v.");
    if (!fallback && bodies.size() == 1)
        return (bodies[0] == kGroundName ? QObject::tr("No bearing length: the frame's thickness here is not known.")
                                         : QObject::tr("No bearing length: the body at this end has no section or "
                                                       "plate thickness.")) +
               ' ' + typeOne;
    if (!fallback)
        return QObject::tr("No bearing length: neither body has a section or plate thickness.") + ' ' + typeOne;
    return QObject::tr("Bearing length by default: %1, the thickness of %2.")
        .arg(DisplayUnits::instance().formatLength(fallback->length), QString::fromStdString(fallback->fromBody));
}

}  // namespace

void pinFields(FormBuilder& f, const Mechanism& m, const PinPlace& place, const std::optional<PinData>& pin,
               const std::function<std::optional<PinData>&(Mechanism&)>& self)
{
    const auto key = [&place](const QString& name) {
        return place.keyPrefix.isEmpty() ? name : place.keyPrefix + name.front().toUpper() + name.mid(1);
    };
    const QString& undo = place.undo;
    f.heading(place.heading);
    f.check(key("pinData"), place.sizeLabel, pin.has_value(), undo, [self](Mechanism& m, bool on) {
        if (!on) self(m).reset();
        else if (!self(m)) self(m) = PinData{0.01};  // a 10 mm pin to start from
    });
    if (!pin) return;
    const PinData& p = *pin;
    const auto data = [self](Mechanism& m) -> PinData& { return *self(m); };
    f.number(key("pinDiameter"), QObject::tr("Pin diameter"), p.diameter, lengthQuantity(), undo,
             [data](Mechanism& m, double v) { data(m).diameter = v; });
    f.choice(key("shearPlanes"), QObject::tr("Shear"),
             {QObject::tr("single (one plane)"), QObject::tr("double (two planes)")}, p.shearPlanes == 2 ? 1 : 0, undo,
             [data](Mechanism& m, int i) { data(m).shearPlanes = i + 1; });
    f.optionalNumber(key("bearingLength"), QObject::tr("Bearing length"), p.bearingLength, lengthQuantity(), undo,
                     [data](Mechanism& m, std::optional<double> v) { data(m).bearingLength = v; });
    if (!p.bearingLength) f.info({}, defaultBearingText(m, place.bodies), key("bearingDefault"));
    const QString none = QObject::tr("none");
    f.optionalNumber(
        key("allowableShear"), QObject::tr("Allowable shear"), p.allowableShear, megaQuantity(QStringLiteral("MPa"), 2),
        undo, [data](Mechanism& m, std::optional<double> v) { data(m).allowableShear = v; }, none);
    f.optionalNumber(
        key("allowablePressure"), QObject::tr("Allowable pressure"), p.allowablePressure,
        megaQuantity(QStringLiteral("MPa"), 2), undo,
        [data](Mechanism& m, std::optional<double> v) { data(m).allowablePressure = v; }, none);
    f.optionalNumber(
        key("allowablePv"), QObject::tr("Allowable p·v"), p.allowablePv, megaQuantity(QStringLiteral("MPa·m/s"), 3),
        undo, [data](Mechanism& m, std::optional<double> v) { data(m).allowablePv = v; }, none);
    f.info({}, QObject::tr("Utilisations are fractions of the allowables you give, not a verdict that the pin is "
                           "safe; leave one empty for none."));
}

}  // namespace clevis::ui
