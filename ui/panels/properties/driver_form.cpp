#include "core/file/file_units.h"
#include "ui/document/mechanism_edits.h"
#include "ui/document/sketch_geometry.h"
#include "ui/panels/properties/forms.h"

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

// Pressures in bar as cylinder catalogues give them;
// rotor and gearbox inertias in kg·cm² as motor and gearbox data sheets do.
DisplayQuantity barQuantity()
{
    return {QStringLiteral("bar"), [](double si) { return si * 1e-5; }, [](double v) { return v * 1e5; }, 1};
}

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
        "supplyPressure", QObject::tr("Supply pressure"), c.supplyPressure, barQuantity(), undo,
        [cylinder](Mechanism& m, std::optional<double> v) { cylinder(m).supplyPressure = v; }, QObject::tr("none"));
    f.info({}, QObject::tr("Pushes on the full bore, pulls on the ring round the rod."));
}

}  // namespace

void driverForm(FormBuilder& f, const Mechanism& /*every form takes it; a motion needs no other part*/,
                const Driver& driver)
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
    if (rotary) gearboxFields(f, driver, self);
    else cylinderFields(f, driver, self);
}

}  // namespace clevis::ui
