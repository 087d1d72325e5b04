#include "core/results/results_json.h"

#include "core/file/file_units.h"
#include "core/results/cylinder_ends.h"
#include "core/results/drive_units.h"
#include "core/results/json_writer.h"
#include "core/solver/body_state.h"

namespace clevis {
namespace {

using nlohmann::json;

// -1 (no such step) becomes null.
json stepIndex(int step) { return step < 0 ? json(nullptr) : json(step); }

json drivePositions(const CompiledMechanism& m, const StepResult& s)
{
    json out = json::object();
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        out[m.drivers[d].name] = driveDisplayValue(m.drivers[d].type, s.drivePosition[d]);
    return out;
}

// The steps are streamed: one object per step on a line of its own, in the
// order of docs/results-format.md, bodies and joints in the file's order.
// Every key is escaped once for the whole cycle.
class StepWriter {
public:
    StepWriter(JsonWriter& w, const CompiledMechanism& m, const CycleResult& r, const DriveResults* drive)
        : w_(w), m_(m), r_(r), drive_(drive), ends_(cylinderEnds(m))
    {
        for (const auto& d : m.drivers) driverKeys_.emplace_back(d.name);
        for (const auto& b : m.bodies) bodyKeys_.emplace_back(b.name);
        for (const auto& j : m.joints) jointKeys_.emplace_back(j.name);
        for (const auto& end : ends_) endKeys_.emplace_back(end.name);
        for (const auto& pin : r.transmissionPins) pinKeys_.emplace_back(m.joints[pin.joint].name);
    }

    void write(const StepResult& s)
    {
        const std::size_t step = std::size_t(&s - r_.steps.data());
        w_.beginObject(true);
        w_.field(t_, s.t);
        w_.key(driveKey_).beginObject();
        for (std::size_t d = 0; d < m_.drivers.size(); ++d)
            w_.field(driverKeys_[d], driveDisplayValue(m_.drivers[d].type, s.drivePosition[d]));
        w_.endObject();
        w_.key(bodies_).beginObject();
        for (std::size_t b = 0; b < m_.bodies.size(); ++b) body(s, int(b));
        w_.endObject();
        w_.key(joints_).beginObject();
        // Into each body's own frame, ground's included (at the angle 0), once per step.
        unrotations_.resize(m_.bodies.size() + 1);
        for (int b = kGround; b < int(m_.bodies.size()); ++b)
            unrotations_[std::size_t(b + 1)] = rotation(-bodyAngle(s.q, b));
        for (std::size_t j = 0; j < m_.joints.size(); ++j) joint(s, int(j));
        w_.endObject();
        if (!ends_.empty()) {
            w_.key(cylinderEnds_).beginObject();
            for (std::size_t e = 0; e < ends_.size(); ++e) cylinderEnd(s, e);
            w_.endObject();
        }
        w_.key(drivers_).beginObject();
        for (std::size_t d = 0; d < m_.drivers.size(); ++d) {
            w_.key(driverKeys_[d]).beginObject();
            w_.field(effort_, s.effort[d]);
            w_.field(power_, s.power[d]);
            if (drive_) driveFields(int(d), step);
            w_.endObject();
        }
        w_.endObject();
        w_.key(ground_).beginObject();
        force(s.groundForce);
        w_.field(moment_, s.groundMoment);
        w_.endObject();
        w_.key(energy_).beginObject();
        w_.field(kinetic_, s.kinetic);
        w_.field(gravity_, s.gravityPotential);
        w_.field(spring_, s.springPotential);
        w_.endObject();
        w_.key(transmission_).beginObject();
        for (std::size_t k = 0; k < r_.transmissionPins.size(); ++k) w_.field(pinKeys_[k], s.transmissionDeg[k]);
        w_.endObject();
        w_.field(nearSingular_, s.nearSingular);
        w_.endObject();
    }

private:
    // The motor behind a gearbox, or the cylinder, of driver `d` at `step`.
    void driveFields(int d, std::size_t step)
    {
        if (drive_->found && drive_->found->driver == d)
            w_.field("speed_rpm", fromSi(FileUnit::Rpm, r_.steps[step].driveRate[std::size_t(d)]));
        for (const MotorDuty& motor : drive_->motors)
            if (motor.driver == d) {
                w_.field("motor_speed_rpm", fromSi(FileUnit::Rpm, motor.speed[step]));
                w_.field("motor_torque_Nm", motor.torque[step]);
            }
        for (const CylinderDuty& c : drive_->cylinders)
            if (c.driver == d) {
                w_.field("pressure_Pa", c.pressure[step]);
                w_.field("flow_m3_s", c.flow[step]);
            }
    }

    void force(const Vec2& f)
    {
        w_.field(fx_, f.x());
        w_.field(fy_, f.y());
    }

    void body(const StepResult& s, int b)
    {
        const int i = coordinateIndex(b, 0);
        w_.key(bodyKeys_[std::size_t(b)]).beginObject();
        w_.field(x_, s.q[i]);
        w_.field(y_, s.q[i + 1]);
        w_.field(angle_, radToDeg(s.q[i + 2]));
        w_.field(vx_, s.qd[i]);
        w_.field(vy_, s.qd[i + 1]);
        w_.field(omega_, s.qd[i + 2]);
        w_.field(ax_, s.qdd[i]);
        w_.field(ay_, s.qdd[i + 1]);
        w_.field(alpha_, s.qdd[i + 2]);
        w_.endObject();
    }

    // With the reaction as a bearing fixed in each body feels it: the force
    // on the second body in its own frame, the opposite force on the first
    // body in the first body's frame (ground's frame is the global one).
    void joint(const StepResult& s, int j)
    {
        const CompiledJoint& cj = m_.joints[j];
        reaction(jointKeys_[std::size_t(j)], s.joints[j], unrotations_[std::size_t(cj.body[0] + 1)],
                 unrotations_[std::size_t(cj.body[1] + 1)]);
    }

    // A cylinder's end as a joint whose first body is the cylinder (its frame
    // turned by φ_c, cylinder_ends.h) and second the body at that end.
    void cylinderEnd(const StepResult& s, std::size_t e)
    {
        const CylinderEnd& end = ends_[e];
        reaction(endKeys_[e], endReaction(m_, s, end), rotation(-cylinderAngle(m_, s, end.driver)),
                 unrotations_[std::size_t(end.body + 1)]);
    }

    // `first` and `second`: into the frames the two sides' bearings are fixed in.
    void reaction(const JsonKey& key, const Reaction& r, const Eigen::Matrix2d& first, const Eigen::Matrix2d& second)
    {
        w_.key(key).beginObject();
        force(r.force);
        w_.field(moment_, r.moment);
        w_.key(local_).beginObject();
        w_.key(first_).beginObject();
        force(first * -r.force);
        w_.endObject();
        w_.key(second_).beginObject();
        force(second * r.force);
        w_.endObject();
        w_.endObject();
        w_.endObject();
    }

    JsonWriter& w_;
    const CompiledMechanism& m_;
    const CycleResult& r_;
    const DriveResults* drive_;
    const std::vector<CylinderEnd> ends_;
    std::vector<JsonKey> driverKeys_, bodyKeys_, jointKeys_, endKeys_, pinKeys_;
    std::vector<Eigen::Matrix2d> unrotations_;  // ground's, then each body's at the step
    const JsonKey t_{"t"}, driveKey_{"drive"}, bodies_{"bodies"}, joints_{"joints"}, drivers_{"drivers"};
    const JsonKey ground_{"ground"}, energy_{"energy"}, transmission_{"transmission_deg"};
    const JsonKey nearSingular_{"near_singular"}, effort_{"effort"}, power_{"power"}, moment_{"moment"};
    const JsonKey kinetic_{"kinetic"}, gravity_{"gravity"}, spring_{"spring"}, fx_{"fx"}, fy_{"fy"};
    const JsonKey x_{"x"}, y_{"y"}, angle_{"angle_deg"}, vx_{"vx"}, vy_{"vy"}, omega_{"omega"};
    const JsonKey ax_{"ax"}, ay_{"ay"}, alpha_{"alpha"}, local_{"local"}, first_{"first"}, second_{"second"};
    const JsonKey cylinderEnds_{"cylinder_ends"};
};

// `<key>_near_singular`: the peak's step is flagged; `<key>_near_toggle`: a
// larger value at a flagged step, kept apart ({value, step}, or null).
void addFlags(json& out, const std::string& key, const Peak& p)
{
    out[key + "_near_singular"] = p.nearSingular;
    out[key + "_near_toggle"] =
        p.flagged.step < 0 ? json(nullptr) : json{{"value", p.flagged.value}, {"step", p.flagged.step}};
}

json jointSummary(const CompiledMechanism& m, const CycleResult& r, const JointSummary& j, JointType type)
{
    json out = {{"peak_n", j.peak.value}, {"peak_step", stepIndex(j.peak.step)}, {"rms_n", j.rms}};
    addFlags(out, "peak", j.peak);
    if (j.peak.step >= 0) {
        out["peak_t"] = r.steps[j.peak.step].t;
        out["peak_drive"] = drivePositions(m, r.steps[j.peak.step]);
    }
    if (type == JointType::Slider) {
        out["peak_moment_nm"] = j.peakMoment.value;
        out["peak_moment_step"] = stepIndex(j.peakMoment.step);
        addFlags(out, "peak_moment", j.peakMoment);
    }
    return out;
}

json driverSummary(const DriverSummary& d)
{
    json out = {{"unit", effortUnit(d.type)},
                {"peak", d.peak.value},
                {"peak_step", stepIndex(d.peak.step)},
                {"rms", d.rms},
                {"mean", d.mean},
                {"peak_power_w", d.peakPower.value},
                {"peak_power_step", stepIndex(d.peakPower.step)},
                {"peak_regen_w", d.peakRegenerative.value},
                {"peak_regen_step", stepIndex(d.peakRegenerative.step)},
                {"work_j", d.work},
                {"work_in_j", d.workIn},
                {"work_out_j", d.workOut}};
    addFlags(out, "peak", d.peak);
    addFlags(out, "peak_power", d.peakPower);
    addFlags(out, "peak_regen", d.peakRegenerative);
    return out;
}

json energyBalance(const EnergyBalance& e)
{
    return {{"driver_work_j", e.driverWork},
            {"kinetic_change_j", e.kineticChange},
            {"gravity_change_j", e.gravityChange},
            {"spring_change_j", e.springChange},
            {"damper_work_j", e.damperWork},
            {"load_work_j", e.loadWork},
            {"residual_j", e.residual},
            {"throughput_j", e.throughput},
            {"relative_residual", e.relativeResidual}};
}

json toggleJson(const CompiledMechanism& m, const NearToggle& t)
{
    json bodies = json::array();
    for (const int b : t.bodies)
        if (b != kGround) bodies.push_back(m.bodies[b].name);
    return {{"first_step", t.first},
            {"last_step", t.last},
            {"worst_step", t.worst},
            {"bodies", bodies},
            {"joint", t.joint < 0 ? json(nullptr) : json(m.joints[t.joint].name)}};
}

// `<name><unit>` the value, `<name>_step` and the flags of summary peaks.
json peakJson(const std::string& name, const char* unit, const Peak& p)
{
    json out = {{name + unit, p.value}, {name + "_step", stepIndex(p.step)}};
    addFlags(out, name, p);
    return out;
}

json reflectedJson(const std::optional<ReflectedInertia>& j)
{
    if (!j) return nullptr;
    return {{"min_kgm2", j->smallest.value},
            {"min_step", j->smallest.step},
            {"max_kgm2", j->largest.value},
            {"max_step", j->largest.step},
            {"ratio_to_rotor", j->ratioToRotor ? json(*j->ratioToRotor) : json(nullptr)}};
}

json studyJson(const RatioStudy& s)
{
    json ratios = json::array(), rms = json::array(), peak = json::array();
    for (const RatioPoint& p : s.points) {
        ratios.push_back(p.ratio);
        rms.push_back(p.torqueRms);
        peak.push_back(std::abs(p.torquePeak.value));
    }
    return {{"ratios", ratios},
            {"torque_rms_Nm", rms},
            {"torque_peak_Nm", peak},
            {"best_ratio", s.points[s.best].ratio},
            {"best_index", s.best}};
}

json foundJson(const CompiledMechanism& m, const FoundMotion& f)
{
    const SteadyCycle& c = f.cycle;
    const CompiledDriver& d = m.drivers[std::size_t(f.driver)];
    return {{"speed_fluctuation", c.fluctuation},
            {"mean_speed_rpm", fromSi(FileUnit::Rpm, c.meanSpeed)},
            {"speed_max_rpm", fromSi(FileUnit::Rpm, c.speedMax)},
            {"speed_max_at", driveDisplayValue(d.type, c.maxAt)},
            {"speed_min_rpm", fromSi(FileUnit::Rpm, c.speedMin)},
            {"speed_min_at", driveDisplayValue(d.type, c.minAt)},
            {"period_s", c.period},
            {"turns_to_steady", c.turns},
            {"flywheel_kgm2", f.flywheelInertia}};
}

json flywheelJson(const FlywheelSizing& f)
{
    return {{"energy_estimate_kgm2", f.estimate},
            {"integrated_kgm2", f.integrated},
            {"on", f.on == FlywheelShaft::Motor ? "motor" : "output"},
            {"fluctuation_target", f.target},
            {"fluctuation_achieved", f.achieved},
            {"energy_swing_J", f.energySwing},
            {"estimate_speed_rpm", fromSi(FileUnit::Rpm, f.speed)},
            {"trials", f.trials}};
}

// The drive's figures, added to each driver's summary (docs/results-format.md).
void addDriveSummary(json& drivers, const CompiledMechanism& m, const DriveResults& drive)
{
    if (drive.found) drivers[m.drivers[std::size_t(drive.found->driver)].name].update(foundJson(m, *drive.found));
    for (const MotorDuty& d : drive.motors) {
        json& out = drivers[m.drivers[d.driver].name];
        out.update(peakJson("motor_torque_peak", "_Nm", d.torquePeak));
        out["motor_torque_rms_Nm"] = d.torqueRms;
        out["motor_torque_mean_Nm"] = d.torqueMean;
        Peak speed = d.speedPeak;
        speed.value = fromSi(FileUnit::Rpm, speed.value);
        speed.flagged.value = fromSi(FileUnit::Rpm, speed.flagged.value);
        out.update(peakJson("motor_speed_peak", "_rpm", speed));
        out.update(peakJson("motor_power_peak", "_W", d.powerPeak));
        out["motor_power_rms_W"] = d.powerRms;
        out["regenerated_J_per_cycle"] = d.regenerated;
        out["reflected_inertia"] = reflectedJson(d.reflected);
    }
    for (const RatioStudy& s : drive.studies) drivers[m.drivers[s.driver].name]["ratio_study"] = studyJson(s);
    for (const CylinderDuty& c : drive.cylinders) {
        json& out = drivers[m.drivers[c.driver].name];
        out.update(peakJson("pressure_peak", "_Pa", c.pressurePeak));
        out.update(peakJson("flow_peak", "_m3_s", c.flowPeak));
        out["supply_pressure_Pa"] = c.cylinder.supplyPressure ? json(*c.cylinder.supplyPressure) : json(nullptr);
        out["steps_over_supply"] = c.stepsOverSupply;
    }
}

void writeWarning(JsonWriter& w, const Warning& warning)
{
    w.beginObject();
    w.field("code", warning.code);
    w.field("message", warning.message);
    w.key("step").value(stepIndex(warning.step));
    w.endObject();
}

}  // namespace

json summaryToJson(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s, const DriveResults* drive)
{
    json joints = json::object(), drivers = json::object(), transmission = json::object(), toggles = json::array();
    for (const auto& t : s.toggles) toggles.push_back(toggleJson(m, t));
    json ground = {{"peak_force_n", s.groundForce.value},
                   {"peak_force_step", stepIndex(s.groundForce.step)},
                   {"peak_moment_nm", s.groundMoment.value},
                   {"peak_moment_step", stepIndex(s.groundMoment.step)}};
    addFlags(ground, "peak_force", s.groundForce);
    addFlags(ground, "peak_moment", s.groundMoment);
    for (std::size_t j = 0; j < s.joints.size(); ++j)
        joints[s.joints[j].name] = jointSummary(m, r, s.joints[j], m.joints[j].type);
    json ends = json::object();
    for (const JointSummary& end : s.cylinderEnds) ends[end.name] = jointSummary(m, r, end, JointType::Pin);
    for (const auto& d : s.drivers) drivers[d.name] = driverSummary(d);
    if (drive) addDriveSummary(drivers, m, *drive);
    for (const auto& t : s.transmission)
        transmission[t.joint] = {{"min_deg", t.minimum.value},
                                 {"min_step", stepIndex(t.minimum.step)},
                                 {"max_deg", t.maximum.value},
                                 {"max_step", stepIndex(t.maximum.step)}};
    json out = {{"joints", joints},
                {"drivers", drivers},
                {"ground", ground},
                {"transmission", transmission},
                {"energy_balance", energyBalance(s.energy)},
                {"near_singular_steps", s.nearSingularSteps},
                {"toggles", toggles}};
    if (!ends.empty()) out["cylinder_ends"] = ends;
    if (drive && drive->found && drive->found->sizing) out["flywheel"] = flywheelJson(*drive->found->sizing);
    return out;
}

namespace {

// The whole file into `text`; with `write`, handed on in pieces as it grows.
void streamResultsJson(std::string& text, const TextPieces* write, const CompiledMechanism& m, const CycleResult& r,
                       const CycleSummary& summary, const nlohmann::json& sections, const DriveResults* drive)
{
    JsonWriter w(text);
    w.beginObject();
    w.key("summary").value(summaryToJson(m, r, summary, drive));
    for (const auto& [name, section] : sections.items()) w.key(name).value(section);
    w.key("warnings").beginArray();
    for (const auto& warning : r.warnings) writeWarning(w, warning);
    if (drive)
        for (const auto& warning : drive->warnings) writeWarning(w, warning);
    w.endArray();
    w.field("complete", r.complete);
    w.field("duration_s", r.duration);
    w.field("planned_steps", r.plannedSteps);
    w.key("steps").beginArray();
    StepWriter steps(w, m, r, drive);
    for (const auto& s : r.steps) {
        steps.write(s);
        if (write && text.size() >= kTextPiece) {
            (*write)(text);
            text.clear();
        }
    }
    w.endArray();
    w.endObject();
    text += '\n';
    if (write) (*write)(text);
}

}  // namespace

std::string resultsJsonText(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary,
                            const nlohmann::json& sections, const DriveResults* drive)
{
    std::string text;
    text.reserve(std::size_t(r.steps.size()) * (600 + 400 * (m.bodies.size() + m.joints.size())));
    streamResultsJson(text, nullptr, m, r, summary, sections, drive);
    return text;
}

void writeResultsJson(const TextPieces& write, const CompiledMechanism& m, const CycleResult& r,
                      const CycleSummary& summary, const nlohmann::json& sections, const DriveResults* drive)
{
    std::string text;
    text.reserve(kTextPiece + (kTextPiece >> 2));
    streamResultsJson(text, &write, m, r, summary, sections, drive);
}

}  // namespace clevis
