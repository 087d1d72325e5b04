#include "core/results/drive_train.h"

#include "core/file/mechanism_file_format.h"
#include "core/results/drive_units.h"
#include "core/results/number_text.h"
#include "core/results/step_integral.h"
#include "core/solver/body_state.h"

#include <cmath>
#include <numbers>

namespace clevis {
namespace {

// The motor shaft turns i times as fast as the output (driven joint):
//   ω_m = i·ω,  α_m = i·α.
// The gearbox loses (1 − η) of the power that passes through it, in the
// direction it flows. With T the driver's effort at the output and
// P = T·ω its power into the mechanism:
//   driving (P ≥ 0):      T_m·ω_m·η = T·ω  ⇒  T_m = T/(i·η)
//   regenerating (P < 0): T_m·ω_m = η·T·ω  ⇒  T_m = T·η/i
// and the motor also accelerates its rotor and the gearbox (J_m + J_g at the
// motor shaft): + (J_m + J_g)·α_m = (J_m + J_g)·i·α.
// (The gear-train relations of machine-design texts.)
double outputToMotor(const Gearbox& g, double ratio, double torque, double speed)
{
    return torque * speed >= 0.0 ? torque / (ratio * g.efficiency) : torque * g.efficiency / ratio;
}

// J = 2·KE/θ̇², KE = ½ Σ (m v_G² + I ω²): the mechanism's generalised
// inertia at the driver when it alone sets the motion; none at rest.
std::optional<double> generalisedInertia(const StepResult& s, int d)
{
    const double rate = s.driveRate[d];
    if (rate == 0.0) return std::nullopt;
    return 2.0 * s.kinetic / (rate * rate);
}

std::optional<ReflectedInertia> reflectedInertia(const CompiledMechanism& m, const CycleResult& r,
                                                 const std::vector<bool>& unreliable, int d, const Gearbox& g)
{
    if (m.drivers.size() != 1) return std::nullopt;
    ReflectedInertia out;
    const double scale = 1.0 / (g.ratio * g.ratio);
    for (std::size_t i = 0; i < r.steps.size(); ++i) {
        const auto j = generalisedInertia(r.steps[i], d);
        if (!j) continue;
        const PeakAt here{*j * scale, int(i), bool(unreliable[i])};
        if (out.smallest.step < 0 || here.value < out.smallest.value) out.smallest = here;
        if (out.largest.step < 0 || here.value > out.largest.value) out.largest = here;
    }
    if (out.largest.step < 0) return std::nullopt;
    if (g.motorInertia > 0.0) out.ratioToRotor = out.largest.value / g.motorInertia;
    return out;
}

// A flywheel on the output adds J_f·α to the torque through the gearbox; one
// on the motor shaft J_f·i·α to the motor's, as the rotor does.
MotorDuty motorDuty(const CompiledMechanism& m, const CycleResult& r, const Steps& steps, int d, const Gearbox& g,
                    const std::optional<Flywheel>& flywheel)
{
    MotorDuty out;
    out.driver = d;
    out.gearbox = g;
    out.flywheel = flywheel;
    Gearbox withFlywheel = g;
    double outputFlywheel = 0.0;
    if (flywheel) (flywheel->on == FlywheelShaft::Motor ? withFlywheel.gearboxInertia : outputFlywheel) += flywheel->inertia;
    const StepValue torque = [&](const StepResult& s) {
        const double accel = driverAcceleration(m, d, s);
        return motorTorque(withFlywheel, g.ratio, s.effort[d] + outputFlywheel * accel, s.driveRate[d], accel);
    };
    const StepValue speed = [&](const StepResult& s) { return g.ratio * s.driveRate[d]; };
    const StepValue power = [&](const StepResult& s) { return torque(s) * speed(s); };
    for (const StepResult& s : r.steps) {
        out.speed.push_back(speed(s));
        out.torque.push_back(torque(s));
    }
    out.torquePeak = largestMagnitude(steps, torque);
    out.torqueRms = timeRms(r.steps, torque);
    out.torqueMean = timeMean(r.steps, torque);
    out.speedPeak = largest(steps, [&](const StepResult& s) { return std::abs(speed(s)); });
    out.powerPeak = largest(steps, power);
    if (out.powerPeak.value <= 0.0) out.powerPeak = {};
    out.powerRms = timeRms(r.steps, power);
    // E_regen = −∫ min(T_m·ω_m, 0) dt: what a brake resistor or a
    // regenerative drive must take each cycle.
    out.regenerated = -positiveAndNegative(r.steps, power).second;
    return out;
}

// The cylinder pushes (effort F ≥ 0, along the driver's coordinate: the
// cylinder lengthens) with pressure on its cap side, and pulls with pressure
// on its rod side:
//   p = F/A_cap (F ≥ 0),  p = −F/A_annulus (F < 0),
//   A_cap = π·D²/4,  A_annulus = π·(D² − d²)/4.
// The flow into the pressurised chamber is its area times the speed at which
// it grows (v along the coordinate):
//   q = v·A_cap (F ≥ 0),  q = −v·A_annulus (F < 0),
// negative where the load drives the cylinder (fluid pushed out of the
// pressurised side). Hydraulic power p·q = F·v, the driver's power.
CylinderDuty cylinderDuty(const CycleResult& r, const Steps& steps, int d, const Cylinder& c)
{
    CylinderDuty out;
    out.driver = d;
    out.cylinder = c;
    const double cap = capArea(c), annulus = annulusArea(c);
    const StepValue pressure = [&](const StepResult& s) {
        const double f = s.effort[d];
        return f >= 0.0 ? f / cap : -f / annulus;
    };
    const StepValue flow = [&](const StepResult& s) {
        const double v = s.driveRate[d];
        return s.effort[d] >= 0.0 ? v * cap : -v * annulus;
    };
    for (std::size_t i = 0; i < r.steps.size(); ++i) {
        out.pressure.push_back(pressure(r.steps[i]));
        out.flow.push_back(flow(r.steps[i]));
        if (c.supplyPressure && out.pressure.back() > *c.supplyPressure) {
            if (out.firstOverSupply < 0) out.firstOverSupply = int(i);
            ++out.stepsOverSupply;
        }
    }
    out.pressurePeak = largest(steps, pressure);
    out.flowPeak = largestMagnitude(steps, flow);
    return out;
}

std::string megapascals(double pa) { return significant(pa * 1e-6) + " MPa"; }

Warning overSupply(const CompiledMechanism& m, const CycleResult& r, const CylinderDuty& c)
{
    const CompiledDriver& d = m.drivers[c.driver];
    const int peak = c.pressurePeak.step;
    return {kCylinderOverSupply,
            "driver " + d.name + ": the cylinder needs more than its supply pressure of " +
                megapascals(*c.cylinder.supplyPressure) + " at " + std::to_string(c.stepsOverSupply) +
                " steps, first at " + formatDrivePosition(d, r.steps[c.firstOverSupply].drivePosition[c.driver]) +
                "; at most " + megapascals(c.pressurePeak.value) + " at " +
                formatDrivePosition(d, r.steps[peak].drivePosition[c.driver]),
            c.firstOverSupply};
}

// A motor characteristic whose motion was not found (the cycle could not be
// completed at the expected speed), and a flywheel or fluctuation target
// without a motor to change the speed: said, never passed over.
std::optional<Warning> notUsed(const Driver& d, bool found)
{
    const auto* c = std::get_if<ConstantSpeed>(&d.motion);
    const std::string motion =
        c && c->accel == 0.0 ? "the constant speed given (" + significant(fromSi(FileUnit::Rpm, c->speed)) + " rpm)"
                             : "its prescribed motion";
    if (d.motor && !found)
        return Warning{kDriveNotIntegrated,
                       "driver " + d.name + ": its motor characteristic is not used: the cycle is solved at " +
                           motion + ", not at the speed the motor, the flywheel and the loads would give",
                       -1};
    if (d.motor || (!d.flywheel && !d.fluctuationTarget)) return std::nullopt;
    const std::string what = d.flywheel && d.fluctuationTarget ? "flywheel and fluctuation target act"
                             : d.flywheel                      ? "flywheel acts"
                                                               : "fluctuation target acts";
    return Warning{kDriveNotIntegrated,
                   "driver " + d.name + ": its " + what +
                       " only with a motor characteristic (\"motor\"), which lets the speed vary: the cycle is "
                       "solved at " +
                       motion,
                   -1};
}

}  // namespace

double motorTorque(const Gearbox& g, double ratio, double torque, double speed, double accel)
{
    return outputToMotor(g, ratio, torque, speed) + (g.motorInertia + g.gearboxInertia) * ratio * accel;
}

double driverAcceleration(const CompiledMechanism& m, int driver, const StepResult& s)
{
    const CompiledJoint& j = m.joints[m.drivers[driver].joint];
    return bodyRate(s.qdd, j.body[1]) - bodyRate(s.qdd, j.body[0]);
}

double capArea(const Cylinder& c) { return std::numbers::pi / 4.0 * c.bore * c.bore; }

double annulusArea(const Cylinder& c) { return std::numbers::pi / 4.0 * (c.bore * c.bore - c.rod * c.rod); }

DriveResults driveResults(const Mechanism& doc, const CompiledMechanism& m, const CycleResult& r,
                          const std::vector<bool>& unreliable, const std::optional<FoundMotion>& found)
{
    DriveResults out;
    out.found = found;
    const Steps steps{r.steps, unreliable};
    for (std::size_t d = 0; d < m.drivers.size(); ++d) {
        const Driver* driver = findDriver(doc.drivers, m.drivers[d].name);
        if (!driver) continue;
        // A motor with no gearbox drives the joint directly: ratio 1, no losses.
        if (driver->gearbox || driver->motor) {
            const Gearbox gearbox = driver->gearbox.value_or(Gearbox{});
            std::optional<Flywheel> flywheel = driver->flywheel;
            if (found && found->driver == int(d)) {
                if (!flywheel) flywheel = Flywheel{};
                flywheel->inertia = found->flywheelInertia;
            }
            out.motors.push_back(motorDuty(m, r, steps, int(d), gearbox, flywheel));
            out.motors.back().reflected = reflectedInertia(m, r, unreliable, int(d), gearbox);
        }
        if (driver->cylinder) {
            out.cylinders.push_back(cylinderDuty(r, steps, int(d), *driver->cylinder));
            if (out.cylinders.back().firstOverSupply >= 0)
                out.warnings.push_back(overSupply(m, r, out.cylinders.back()));
        }
        if (driver->type == DriverType::Rotary)
            if (auto w = notUsed(*driver, found && found->driver == int(d))) out.warnings.push_back(*w);
    }
    return out;
}

}  // namespace clevis
