#include "core/file/file_units.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"
#include "ui/panels/properties/pin_fields.h"

namespace clevis::ui {
namespace {

enum Law { Constant, Cycloidal, Poly345, ModTrapezoid, Table };

Law lawOf(const Motion& motion)
{
    if (std::holds_alternative<ConstantSpeed>(motion)) return Constant;
    if (const auto* r = std::get_if<Rise>(&motion)) {
        switch (r->law) {
        case CamLaw::Cycloidal: return Cycloidal;
        case CamLaw::Polynomial345: return Poly345;
        case CamLaw::ModifiedTrapezoid: return ModTrapezoid;
        }
    }
    return Table;
}

// Switching law keeps what can be kept: a rise starts where the driver is drawn.
Motion motionFor(Law law, const Driver& d)
{
    const bool rotary = d.type == DriverType::Rotary;
    const double from = d.offset, stroke = rotary ? kPi / 2 : 0.05;
    switch (law) {
    case Constant: return ConstantSpeed{rotary ? toSi(FileUnit::Rpm, 60.0) : 0.05, 0.0};
    case Cycloidal: return Rise{CamLaw::Cycloidal, from, from + stroke, 0.0, std::nullopt};
    case Poly345: return Rise{CamLaw::Polynomial345, from, from + stroke, 0.0, std::nullopt};
    case ModTrapezoid: return Rise{CamLaw::ModifiedTrapezoid, from, from + stroke, 0.0, std::nullopt};
    case Table: return MotionTable{{0.0, 1.0, 2.0}, {from, from + stroke, from}};
    }
    return ConstantSpeed{};
}

DisplayQuantity positionQuantity(const Driver& d)
{
    return d.type == DriverType::Rotary ? angleQuantity() : lengthQuantity();
}

// Rotor and gearbox inertias in kg·cm² as motor and gearbox data sheets do.
DisplayQuantity smallInertiaQuantity()
{
    return {QStringLiteral("kg·cm²"), [](double si) { return si * 1e4; }, [](double v) { return v * 1e-4; }, 3};
}

DisplayQuantity percentQuantity()
{
    return {QStringLiteral("%"), [](double si) { return si * 100.0; }, [](double v) { return v / 100.0; }, 1};
}

// The gearbox between a rotary driver's motor and its joint; the document
// checks each value by the file reader's rules.
void gearboxFields(FormBuilder& f, const Driver& driver, const std::function<Driver&(Mechanism&)>& self)
{
    const QString undo = QObject::tr("Set %1 gearbox").arg(QString::fromStdString(driver.name));
    f.heading(QObject::tr("Gearbox and motor"));
    f.check("gearbox", QObject::tr("Size the motor through a gearbox"), driver.gearbox.has_value(), undo,
            [self](Mechanism& m, bool on) {
                if (!on) self(m).gearbox.reset();
                else if (!self(m).gearbox) self(m).gearbox = Gearbox{10.0};  // a ratio to start from
            });
    if (!driver.gearbox) return;
    const Gearbox& g = *driver.gearbox;
    const auto gearbox = [self](Mechanism& m) -> Gearbox& { return *self(m).gearbox; };
    f.number("gearRatio", QObject::tr("Ratio (motor turns per output turn)"), g.ratio, plainQuantity({}, 3), undo,
             [gearbox](Mechanism& m, double v) { gearbox(m).ratio = v; });
    f.number("gearEfficiency", QObject::tr("Efficiency"), g.efficiency, percentQuantity(), undo,
             [gearbox](Mechanism& m, double v) { gearbox(m).efficiency = v; });
    f.number("motorInertia", QObject::tr("Rotor inertia"), g.motorInertia, smallInertiaQuantity(), undo,
             [gearbox](Mechanism& m, double v) { gearbox(m).motorInertia = v; });
    f.number("gearboxInertia", QObject::tr("Gearbox inertia at the motor"), g.gearboxInertia, smallInertiaQuantity(),
             undo, [gearbox](Mechanism& m, double v) { gearbox(m).gearboxInertia = v; });
    f.info({}, QObject::tr("Efficiency counts in the direction power flows; inertias at the motor shaft."));
}

// A motor characteristic to start from when one is ticked: no torque at 10 %
// above the motor's expected speed (the driver's through the gearbox), and
// a stall torque to be replaced by the motor's own.
MotorLine startingLine(const Driver& d)
{
    const auto* c = std::get_if<ConstantSpeed>(&d.motion);
    const double expected = c && c->speed > 0.0 ? c->speed : toSi(FileUnit::Rpm, 60.0);
    return {10.0, 1.1 * expected * (d.gearbox ? d.gearbox->ratio : 1.0)};
}

// What sets a rotary driver's real speed: the motor's characteristic (a
// straight line here; a table stays in the file), a flywheel, and the speed
// fluctuation wanted. The file reader allows them only on a mechanism's one
// driver, a characteristic only with a constant speed; the document refuses
// an edit that breaks either and says why.
void motorFields(FormBuilder& f, const Mechanism& m, const Driver& driver,
                 const std::function<Driver&(Mechanism&)>& self)
{
    const QString undo = QObject::tr("Set %1 motor").arg(QString::fromStdString(driver.name));
    f.heading(QObject::tr("Motor characteristic and flywheel"));
    if (m.drivers.size() > 1 && !driver.motor && !driver.flywheel && !driver.fluctuationTarget) {
        f.info({}, QObject::tr("Only for a mechanism's one driver: with another driver the speed is prescribed."));
        return;
    }
    f.check("motorCharacteristic", QObject::tr("Motor torque against speed"), driver.motor.has_value(), undo,
            [self](Mechanism& m, bool on) {
                if (!on) self(m).motor.reset();
                else if (!self(m).motor) self(m).motor = startingLine(self(m));
            });
    if (const auto* line = driver.motor ? std::get_if<MotorLine>(&*driver.motor) : nullptr) {
        const auto motor = [self](Mechanism& m) -> MotorLine& { return std::get<MotorLine>(*self(m).motor); };
        f.number("stallTorque", QObject::tr("Stall torque"), line->stallTorque, torqueQuantity(), undo,
                 [motor](Mechanism& m, double v) { motor(m).stallTorque = v; });
        f.number("noLoadSpeed", QObject::tr("No-load speed"), line->noLoadSpeed, rotarySpeedQuantity(), undo,
                 [motor](Mechanism& m, double v) { motor(m).noLoadSpeed = v; });
        f.info({}, QObject::tr("At the motor shaft, a straight line from the stall torque at rest to none at the "
                               "no-load speed. The speed above is the output speed expected."));
    } else if (driver.motor) {
        f.info(QObject::tr("Characteristic"),
               QObject::tr("a table of %1 speeds and torques, from the file: edit it there")
                   .arg(std::get<MotorTable>(*driver.motor).speed.size()),
               "motorTable");
    }
    f.check("flywheel", QObject::tr("Flywheel"), driver.flywheel.has_value(), undo, [self](Mechanism& m, bool on) {
        if (!on) self(m).flywheel.reset();
        else if (!self(m).flywheel) self(m).flywheel = Flywheel{0.1};  // an inertia to start from
    });
    if (driver.flywheel) {
        const auto flywheel = [self](Mechanism& m) -> Flywheel& { return *self(m).flywheel; };
        f.number("flywheelInertia", QObject::tr("Flywheel inertia"), driver.flywheel->inertia,
                 plainQuantity(QStringLiteral("kg·m²"), 4), undo,
                 [flywheel](Mechanism& m, double v) { flywheel(m).inertia = v; });
        f.choice("flywheelShaft", QObject::tr("Flywheel on"),
                 {QObject::tr("the output shaft (the driven joint)"), QObject::tr("the motor shaft")},
                 driver.flywheel->on == FlywheelShaft::Motor ? 1 : 0, undo, [flywheel](Mechanism& m, int on) {
                     flywheel(m).on = on == 1 ? FlywheelShaft::Motor : FlywheelShaft::Output;
                 });
    }
    f.optionalNumber(
        "fluctuationTarget", QObject::tr("Speed fluctuation wanted"), driver.fluctuationTarget, percentQuantity(), undo,
        [self](Mechanism& m, std::optional<double> v) { self(m).fluctuationTarget = v; }, QObject::tr("none"));
    f.info({}, QObject::tr("(ω_max − ω_min)/ω_mean, below 200 %: asks for the flywheel that gives it."));
}

// The cylinder doing a linear driver's work.
void cylinderFields(FormBuilder& f, const Driver& driver, const std::function<Driver&(Mechanism&)>& self)
{
    const QString undo = QObject::tr("Set %1 cylinder").arg(QString::fromStdString(driver.name));
    f.heading(QObject::tr("Cylinder"));
    f.check("cylinder", QObject::tr("Size a hydraulic or pneumatic cylinder"), driver.cylinder.has_value(), undo,
            [self](Mechanism& m, bool on) {
                if (!on) self(m).cylinder.reset();
                else if (!self(m).cylinder) self(m).cylinder = Cylinder{0.05, 0.028};  // a common bore and rod
            });
    if (!driver.cylinder) return;
    const Cylinder& c = *driver.cylinder;
    const auto cylinder = [self](Mechanism& m) -> Cylinder& { return *self(m).cylinder; };
    f.number("cylinderBore", QObject::tr("Bore"), c.bore, lengthQuantity(), undo,
             [cylinder](Mechanism& m, double v) { cylinder(m).bore = v; });
    f.number("cylinderRod", QObject::tr("Rod"), c.rod, lengthQuantity(), undo,
             [cylinder](Mechanism& m, double v) { cylinder(m).rod = v; });
    f.optionalNumber(
        "supplyPressure", QObject::tr("Supply pressure"), c.supplyPressure, pressureQuantity(), undo,
        [cylinder](Mechanism& m, std::optional<double> v) { cylinder(m).supplyPressure = v; }, QObject::tr("none"));
    f.info({}, QObject::tr("Pushes on the full bore, pulls on the ring round the rod."));
}

// The pin at each end of a cylinder between two points, sized as a joint's
// pin is; its results are named <driver>.cap and <driver>.rod.
void endPinFields(FormBuilder& f, const Mechanism& m, const Driver& driver,
                  const std::function<Driver&(Mechanism&)>& self)
{
    const QString qname = QString::fromStdString(driver.name);
    for (int e = 0; e < 2; ++e) {
        if (!driver.ends[e]) continue;
        const QString end = e ? QStringLiteral("rod") : QStringLiteral("cap");
        pinFields(f, m,
                  {e ? QObject::tr("Rod end pin") : QObject::tr("Barrel end pin"),
                   QObject::tr("Size %1.%2").arg(qname, end),
                   QObject::tr("Set %1.%2 pin").arg(qname, end),
                   end,
                   {driver.ends[e]->body}},
                  driver.endPins[e], [self, e](Mechanism& m) -> std::optional<PinData>& { return self(m).endPins[e]; });
    }
}

}  // namespace

void driverForm(FormBuilder& f, const Mechanism& m, const Driver& driver)
{
    const std::string name = driver.name;
    const QString qname = QString::fromStdString(name);
    const std::function<Driver&(Mechanism&)> self = [name](Mechanism& m) -> Driver& {
        return m.drivers[driverIndex(m, name)];
    };
    const bool rotary = driver.type == DriverType::Rotary;
    const QString undo = QObject::tr("Set %1 motion").arg(qname);
    f.partHeading(rotary ? QObject::tr("Motor") : QObject::tr("Linear drive"), qname);
    f.text("name", QObject::tr("Name"), qname, QObject::tr("Rename %1").arg(qname),
           [name](Mechanism& m, const QString& v) {
               const QString problem = nameProblem(m, v);
               if (problem.isEmpty()) edits::renameDriver(m, name, v.toStdString());
               return problem;
           });
    if (!driver.joint.empty()) f.info(QObject::tr("At joint"), QString::fromStdString(driver.joint));
    for (int e = 0; e < 2; ++e)
        if (driver.ends[e]) {
            f.info(e ? QObject::tr("Rod end on") : QObject::tr("Barrel on"),
                   QString::fromStdString(driver.ends[e]->body));
            pointFields(f, e ? "rodEnd" : "barrelEnd", e ? QObject::tr("Rod end") : QObject::tr("Barrel end"),
                        driver.ends[e]->at, QObject::tr("Move %1").arg(qname),
                        [self, e](Mechanism& m) -> Vec2& { return self(m).ends[e]->at; });
        }
    const DisplayQuantity pos = positionQuantity(driver);
    if (!driver.joint.empty())
        f.number("offset", QObject::tr("Position as drawn"), driver.offset, pos, undo,
                 [self](Mechanism& m, double v) { self(m).offset = v; });
    f.choice("law", QObject::tr("Motion law"),
             {QObject::tr("constant speed"), QObject::tr("cycloidal rise"), QObject::tr("3-4-5 polynomial rise"),
              QObject::tr("modified trapezoid rise"), QObject::tr("table of positions")},
             lawOf(driver.motion), undo,
             [self](Mechanism& m, int law) { self(m).motion = motionFor(Law(law), self(m)); });
    if (const auto* c = std::get_if<ConstantSpeed>(&driver.motion)) {
        f.number("speed", QObject::tr("Speed"), c->speed, rotary ? rotarySpeedQuantity() : linearSpeedQuantity(), undo,
                 [self](Mechanism& m, double v) { std::get<ConstantSpeed>(self(m).motion).speed = v; });
        DisplayQuantity accel = pos;
        accel.unit += QStringLiteral("/s²");
        f.number("accel", QObject::tr("Acceleration"), c->accel, accel, undo,
                 [self](Mechanism& m, double v) { std::get<ConstantSpeed>(self(m).motion).accel = v; });
    }
    if (const auto* r = std::get_if<Rise>(&driver.motion)) {
        const auto rise = [self](Mechanism& m) -> Rise& { return std::get<Rise>(self(m).motion); };
        f.number("riseFrom", QObject::tr("From"), r->from, pos, undo,
                 [rise](Mechanism& m, double v) { rise(m).from = v; });
        f.number("riseTo", QObject::tr("To"), r->to, pos, undo, [rise](Mechanism& m, double v) { rise(m).to = v; });
        f.number("riseStart", QObject::tr("Starts at"), r->start, plainQuantity("s", 3), undo,
                 [rise](Mechanism& m, double v) { rise(m).start = v; });
        f.optionalNumber("riseEnd", QObject::tr("Ends at"), r->end, plainQuantity("s", 3), undo,
                         [rise](Mechanism& m, std::optional<double> v) { rise(m).end = v; });
    }
    if (const auto* t = std::get_if<MotionTable>(&driver.motion)) {
        const auto table = [self](Mechanism& m) -> MotionTable& { return std::get<MotionTable>(self(m).motion); };
        f.numberList("tableTime", QObject::tr("Times"), t->time, plainQuantity("s", 3), undo,
                     [table](Mechanism& m, std::vector<double> v) { table(m).time = std::move(v); });
        f.numberList("tablePosition", QObject::tr("Positions"), t->position, pos, undo,
                     [table](Mechanism& m, std::vector<double> v) { table(m).position = std::move(v); });
        f.info({},
               QObject::tr(
                   "Times increase strictly; one position per time. Between them the motion follows a smooth curve."));
    }
    if (rotary) {
        gearboxFields(f, driver, self);
        motorFields(f, m, driver, self);
    } else cylinderFields(f, driver, self);
    endPinFields(f, m, driver, self);
}

}  // namespace clevis::ui
