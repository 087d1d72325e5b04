#include "core/results/results_json.h"

#include "core/results/drive_units.h"
#include "core/solver/body_state.h"

namespace clevis {
namespace {

using nlohmann::json;

json xy(const Vec2& v) { return {{"fx", v.x()}, {"fy", v.y()}}; }

// -1 (no such step) becomes null.
json stepIndex(int step) { return step < 0 ? json(nullptr) : json(step); }

json drivePositions(const CompiledMechanism& m, const StepResult& s)
{
    json out = json::object();
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        out[m.drivers[d].name] = driveDisplayValue(m.drivers[d].type, s.drivePosition[d]);
    return out;
}

json bodyState(const StepResult& s, int b)
{
    const int i = coordinateIndex(b, 0);
    return {{"x", s.q[i]},    {"y", s.q[i + 1]},    {"angle_deg", radToDeg(s.q[i + 2])},
            {"vx", s.qd[i]},  {"vy", s.qd[i + 1]},  {"omega", s.qd[i + 2]},
            {"ax", s.qdd[i]}, {"ay", s.qdd[i + 1]}, {"alpha", s.qdd[i + 2]}};
}

// The reaction as a bearing fixed in each body feels it: the force on the
// second body in its own frame, the opposite force on the first body in the
// first body's frame (ground's frame is the global one).
json bearingForces(const CompiledJoint& j, const StepResult& s, const Reaction& reaction)
{
    const auto inFrame = [&](int body, const Vec2& global) -> Vec2 { return rotation(-bodyAngle(s.q, body)) * global; };
    return {{"first", xy(inFrame(j.body[0], -reaction.force))}, {"second", xy(inFrame(j.body[1], reaction.force))}};
}

json stepToJson(const CompiledMechanism& m, const CycleResult& r, const StepResult& s)
{
    json bodies = json::object(), joints = json::object(), drivers = json::object(), transmission = json::object();
    for (std::size_t b = 0; b < m.bodies.size(); ++b) bodies[m.bodies[b].name] = bodyState(s, int(b));
    for (std::size_t j = 0; j < m.joints.size(); ++j) {
        const Reaction& reaction = s.joints[j];
        json entry = xy(reaction.force);
        entry["moment"] = reaction.moment;
        entry["local"] = bearingForces(m.joints[j], s, reaction);
        joints[m.joints[j].name] = entry;
    }
    for (std::size_t d = 0; d < m.drivers.size(); ++d)
        drivers[m.drivers[d].name] = {{"effort", s.effort[d]}, {"power", s.power[d]}};
    for (std::size_t k = 0; k < r.transmissionPins.size(); ++k)
        transmission[m.joints[r.transmissionPins[k].joint].name] = s.transmissionDeg[k];
    json ground = xy(s.groundForce);
    ground["moment"] = s.groundMoment;
    return {{"t", s.t},
            {"drive", drivePositions(m, s)},
            {"bodies", bodies},
            {"joints", joints},
            {"drivers", drivers},
            {"ground", ground},
            {"energy", {{"kinetic", s.kinetic}, {"gravity", s.gravityPotential}, {"spring", s.springPotential}}},
            {"transmission_deg", transmission},
            {"near_singular", s.nearSingular}};
}

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

json summaryToJson(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& s)
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
    for (const auto& d : s.drivers) drivers[d.name] = driverSummary(d);
    for (const auto& t : s.transmission)
        transmission[t.joint] = {{"min_deg", t.minimum.value},
                                 {"min_step", stepIndex(t.minimum.step)},
                                 {"max_deg", t.maximum.value},
                                 {"max_step", stepIndex(t.maximum.step)}};
    return {{"joints", joints},
            {"drivers", drivers},
            {"ground", ground},
            {"transmission", transmission},
            {"energy_balance", energyBalance(s.energy)},
            {"near_singular_steps", s.nearSingularSteps},
            {"toggles", toggles}};
}

}  // namespace

json resultsToJson(const CompiledMechanism& m, const CycleResult& r, const CycleSummary& summary)
{
    json steps = json::array();
    for (const auto& s : r.steps) steps.push_back(stepToJson(m, r, s));
    json warnings = json::array();
    for (const auto& w : r.warnings)
        warnings.push_back({{"code", w.code}, {"message", w.message}, {"step", stepIndex(w.step)}});
    return {{"steps", std::move(steps)},       {"summary", summaryToJson(m, r, summary)},
            {"warnings", std::move(warnings)}, {"complete", r.complete},
            {"duration_s", r.duration},        {"planned_steps", r.plannedSteps}};
}

}  // namespace clevis
